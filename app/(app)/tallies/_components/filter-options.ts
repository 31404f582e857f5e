// Choices for the filter bar: removal sites, bearing classes and triggers.
import type { SiteInfo } from "@/lib/tallies/types";
import { BEARING_CLASSES } from "@/lib/cases/schemas";
import { TRIGGERS } from "@/lib/classification";
import { bearingClassLabel } from "@/lib/classification/labels";

export function filterOptions(sites: SiteInfo[]) {
  return {
    sites: sites.filter((s) => s.kind !== "lab").map((s) => ({ value: s.code, label: s.name })),
    classes: BEARING_CLASSES.map((c) => ({ value: c, label: bearingClassLabel(c, true) })),
    triggers: TRIGGERS.map((t) => ({ value: t.code, label: t.label })),
  };
}

export function currentMonth(now = new Date()): string {
  return now.toISOString().slice(0, 7);
}
