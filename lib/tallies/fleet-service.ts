// The fleet list (units still in service) that the life statistics count as survivors.
import "server-only";
import { storeFleetBatch } from "@/db/queries/tallies/fleet-upload";
import { latestFleetBatch } from "@/db/queries/tallies/life-counts";
import type { FleetRow } from "./fleet-csv";

/** The list in use (the latest upload), or null before the first one. */
export async function currentFleetBatch() {
  return latestFleetBatch();
}

/** Stores checked rows as the new list in use. */
export async function storeFleetList(rows: readonly FleetRow[], uploadedBy: string) {
  return storeFleetBatch(rows, uploadedBy);
}
