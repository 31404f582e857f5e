// The health check's database probe, on the app's own pool.
import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";

export async function selectOne(): Promise<void> {
  await db.execute(sql`select 1`);
}
