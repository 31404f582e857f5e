// The demo people the benches act as: a manager (reads everything) and an inspector (one shop).
import { sql } from "drizzle-orm";
import { db } from "@/db";

export type BenchViewer = { id: string; role: string; siteId: string | null };

export async function benchViewers(): Promise<Record<"manager" | "engineer" | "inspector", BenchViewer>> {
  const { rows } = await db.execute<{ id: string; role: string; site_id: string | null }>(
    sql`select id, role, site_id from "user" where role in ('manager', 'engineer', 'inspector') order by email`,
  );
  const pick = (role: string) => {
    const r = rows.find((x) => x.role === role);
    if (!r) throw new Error(`no demo ${role}: run the demo seed first`);
    return { id: r.id, role: r.role, siteId: r.site_id };
  };
  return { manager: pick("manager"), engineer: pick("engineer"), inspector: pick("inspector") };
}
