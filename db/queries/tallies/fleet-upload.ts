// Stores a validated fleet list as one new batch, all rows or none.
import "server-only";
import { randomUUID } from "node:crypto";
import { db } from "@/db";
import { fleetUnits } from "@/db/schema";
import type { FleetRow } from "@/lib/tallies/fleet-csv";

const CHUNK = 2000;

export async function storeFleetBatch(rows: readonly FleetRow[], uploadedBy: string): Promise<{ batchId: string; units: number }> {
  const batchId = randomUUID();
  await db.transaction(async (tx) => {
    for (let i = 0; i < rows.length; i += CHUNK) {
      await tx.insert(fleetUnits).values(rows.slice(i, i + CHUNK).map((r) => ({ ...r, batchId, uploadedBy })));
    }
  });
  return { batchId, units: rows.length };
}
