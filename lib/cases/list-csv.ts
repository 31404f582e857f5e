// What the case export writes: one line per case, every list column, in words a spreadsheet reader
// understands (labels rather than codes, ISO dates so they sort, numbers left as numbers).
import type { CsvValue } from "@/lib/csv";
import { formatClass, formatEndPlay, fieldCallLabel, outcomeLabel, type CaseListRow } from "./list-columns";
import { STAGE_LABELS } from "./stages";

export const EXPORT_CAP = 50_000;

const COLUMNS: readonly { header: string; value: (r: CaseListRow) => CsvValue }[] = [
  { header: "Case number", value: (r) => r.number },
  { header: "Stage", value: (r) => STAGE_LABELS[r.status] ?? r.status },
  { header: "Car mark", value: (r) => r.carMark },
  { header: "Car number", value: (r) => r.carNumber },
  { header: "Axle", value: (r) => r.axle },
  { header: "Side", value: (r) => r.side },
  { header: "Serial", value: (r) => r.serial },
  { header: "Bearing class", value: (r) => formatClass(r) },
  { header: "Trigger", value: (r) => r.triggerLabel },
  { header: "Field call", value: (r) => fieldCallLabel(r.fieldCall) },
  { header: "End play (in)", value: (r) => formatEndPlay(r.endPlayMeanIn) },
  { header: "Removed on", value: (r) => r.removedOn },
  { header: "Site", value: (r) => r.siteName },
  { header: "Primary cause", value: (r) => r.causeLabel },
  { header: "Teardown outcome", value: (r) => outcomeLabel(r.removalConfirmed) },
  { header: "Service (months)", value: (r) => r.serviceMonths },
  { header: "Updated at (UTC)", value: (r) => r.updatedAt },
];

export const CSV_HEADER = COLUMNS.map((c) => c.header);

export function csvValues(row: CaseListRow): CsvValue[] {
  return COLUMNS.map((c) => c.value(row));
}

/** tearline-cases-2026-06-15.csv, dated in UTC like the timestamps inside. */
export function exportFileName(now: Date): string {
  return `tearline-cases-${now.toISOString().slice(0, 10)}.csv`;
}

/** The note sent with a capped export, so whoever opens it knows rows are missing. */
export function cappedNote(total: number, cap: number): string {
  return `Only the first ${cap} of ${total} matching cases are in this file; narrow the filters to export the rest.`;
}
