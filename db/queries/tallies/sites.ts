// Sites by id and code, for chart labels and the filter bar.
import "server-only";
import { asc } from "drizzle-orm";
import { db } from "@/db";
import { sites } from "@/db/schema";
import type { SiteInfo } from "@/lib/tallies/types";

export async function allSites(): Promise<SiteInfo[]> {
  return db.select({ id: sites.id, code: sites.code, name: sites.name, kind: sites.kind }).from(sites).orderBy(asc(sites.name));
}
