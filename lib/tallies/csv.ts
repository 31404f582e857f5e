// CSV for chart tables and fleet uploads, on top of the shared RFC 4180 writer and reader.
import { parseCsv as readCsv, toCsv as writeCsv } from "@/lib/csv";

export type Cell = string | number | boolean | null | undefined;

/** Chart tables say yes/no for flags, the way a manager reads them in a spreadsheet. */
export function toCsv(header: readonly string[], rows: readonly (readonly Cell[])[]): string {
  return writeCsv(
    header,
    rows.map((row) => row.map((c) => (typeof c === "boolean" ? (c ? "yes" : "no") : c))),
  );
}

/**
 * The filters that made a chart's numbers, as one line above its table: "Filters: site MJC;
 * from 2026-01-01". Keys a chart only uses for display (which cause is picked) are left out.
 */
export function filtersLine(search: string): string {
  const sp = new URLSearchParams(search);
  const parts: string[] = [];
  for (const [k, v] of sp) if (v.trim() && !DISPLAY_ONLY.has(k)) parts.push(`${k.replace(/([a-z])([A-Z])/g, "$1 $2").toLowerCase()} ${v}`);
  return `Filters: ${parts.length ? parts.join("; ") : "none (every case you may see)"}`;
}
const DISPLAY_ONLY = new Set(["cause", "tab", "view"]);

/** A chart table's CSV with its filters stated on the first line. */
export function chartCsv(search: string, header: readonly string[], rows: readonly (readonly Cell[])[]): string {
  return writeCsv([filtersLine(search)], []) + toCsv(header, rows);
}

/** Uploaded lists are read leniently; the fleet parser reports bad rows by number. */
export function parseCsv(input: string): string[][] {
  return readCsv(input, { lenient: true });
}

/** A file name safe on every system: "tearline-cause-pareto-2026-03.csv". */
export function downloadName(chart: string, ext: "csv" | "png", stamp = new Date().toISOString().slice(0, 10)): string {
  const slug = chart
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-|-$/g, "");
  return `tearline-${slug}-${stamp}.${ext}`;
}
