// Loads the removal-yield counts within the viewer's reach and shapes them. Names of inspectors go
// only to managers and admins; others see stable "Inspector n" labels, an inspector sees "You".
import "server-only";
import { allSites } from "@/db/queries/tallies/sites";
import { viewerSiteLimit } from "./site-limit";
import { acousticLevels, detectorCounts, hotReadings, triggerCosts } from "@/db/queries/tallies/yield-alarms";
import { keepCalls, removeCalls, type CallViewer } from "@/db/queries/tallies/yield-calls";
import type { Role } from "@/lib/auth/permissions";
import type { TallyFilters } from "./filters";
import { triggerLabel } from "@/lib/classification/labels";
import { readingFits, shapeYield } from "./shape-yield";
import type { YieldData } from "./yield-data";

const NAME_ROLES: readonly string[] = ["manager", "admin"] satisfies Role[];

export async function loadYield(filters: TallyFilters, viewer: CallViewer, missWindow: number): Promise<YieldData> {
  const namesShown = NAME_ROLES.includes(viewer.role);
  // Small statements side by side (the slowest sets the time on a busy machine); the names come
  // with the calls, and the reading fits are worked out while the other statements still run.
  const [{ hot, fits }, acoustic, detectors, triggers, calls, keeps, sites] = await Promise.all([
    hotReadings(filters, viewer).then((cells) => ({ hot: cells, fits: readingFits(cells.cells) })),
    acousticLevels(filters, viewer),
    detectorCounts(filters, viewer),
    triggerCosts(filters, viewer),
    removeCalls(filters, viewer, namesShown),
    keepCalls(filters, viewer, missWindow, namesShown),
    allSites(),
  ]);
  const limit = viewerSiteLimit(viewer);
  const people = [...new Set([...calls.byInspector.map((c) => c.key), ...keeps.byInspector.map((k) => k.key)])].sort();
  const names = new Map([...keeps.names, ...calls.names]);
  // Pseudonyms follow a fixed order (the ids), so the same person keeps a number while filters change.
  const person = (id: string) =>
    id === viewer.id
      ? namesShown
        ? `${names.get(id) ?? "You"} (you)`
        : "You"
      : namesShown
        ? (names.get(id) ?? "Unknown person")
        : `Inspector ${people.indexOf(id) + 1}`;
  const siteById = new Map(sites.map((s) => [s.id, s]));
  const limitedTo = limit.limited && limit.siteId ? siteById.get(limit.siteId) : undefined;

  const shaped = shapeYield(
    {
      hot: hot.cells,
      hotWithoutReading: hot.withoutReading,
      acoustic,
      detectors,
      triggers,
      callsByShop: calls.byShop,
      callsByInspector: calls.byInspector,
      callsByQuarter: calls.byQuarter,
      keepsByShop: keeps.byShop,
      keepsByInspector: keeps.byInspector,
    },
    { site: (id) => siteById.get(id)?.name ?? "Unknown site", person, trigger: triggerLabel },
    fits,
  );
  return {
    filters,
    missWindow,
    siteLimit: limit.limited ? { code: limitedTo?.code ?? "", name: limitedTo?.name ?? "No home site" } : null,
    ownCallsOnly: limit.limited,
    namesShown,
    generatedAt: new Date().toISOString(),
    ...shaped,
  };
}
