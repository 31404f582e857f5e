// What the profile page shows besides the notice switches.
import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { sites } from "@/db/schema";

export async function siteNameOf(siteId: string | null): Promise<string | null> {
  if (!siteId) return null;
  const [row] = await db.select({ name: sites.name }).from(sites).where(eq(sites.id, siteId));
  return row?.name ?? null;
}
