// The case list's columns: their ids (also the sort keys the server accepts), headings, which show
// by default, and how each value reads on screen and in the CSV. No framework code: the table,
// the phone cards and the CSV export all format through here.
import type { Stage } from "./stages";
import { formatDay as formatDayEverywhere } from "@/lib/dates";

export type FieldCall = "keep" | "remove" | "undecided";
export type RemovalOutcome = "confirmed" | "no-defect";

/** One case as the list and the export carry it (plain JSON: dates are strings). */
export type CaseListRow = {
  id: string;
  number: string;
  status: Stage;
  carMark: string;
  carNumber: string;
  axle: number | null;
  side: "L" | "R" | null;
  serial: string;
  bearingClass: string;
  bearingClassOther: string | null;
  trigger: string;
  triggerLabel: string;
  fieldCall: FieldCall | null;
  endPlayMeanIn: number | null;
  removedOn: string | null;
  siteCode: string | null;
  siteName: string | null;
  primaryCause: string | null;
  causeLabel: string | null;
  removalConfirmed: RemovalOutcome | null;
  serviceMonths: number | null;
  updatedAt: string;
};

export const CASE_COLUMNS = [
  { id: "number", label: "Case", shown: true, hideable: false, firstDir: "desc" },
  { id: "status", label: "Stage", shown: true, hideable: true, firstDir: "asc" },
  { id: "car", label: "Car", shown: true, hideable: true, firstDir: "asc" },
  { id: "position", label: "Position", shown: false, hideable: true, firstDir: "asc" },
  { id: "serial", label: "Serial", shown: false, hideable: true, firstDir: "asc" },
  { id: "class", label: "Class", shown: false, hideable: true, firstDir: "asc" },
  { id: "trigger", label: "Trigger", shown: true, hideable: true, firstDir: "asc" },
  { id: "fieldCall", label: "Field call", shown: true, hideable: true, firstDir: "asc" },
  { id: "endPlay", label: "End play (in)", shown: false, hideable: true, firstDir: "desc" },
  { id: "removedOn", label: "Removed on", shown: true, hideable: true, firstDir: "desc" },
  { id: "site", label: "Site", shown: true, hideable: true, firstDir: "asc" },
  { id: "cause", label: "Primary cause", shown: true, hideable: true, firstDir: "asc" },
  { id: "outcome", label: "Teardown outcome", shown: false, hideable: true, firstDir: "asc" },
  { id: "serviceMonths", label: "Service (months)", shown: false, hideable: true, firstDir: "desc" },
  { id: "updatedAt", label: "Updated", shown: true, hideable: true, firstDir: "desc" },
] as const;

export type CaseColumnId = (typeof CASE_COLUMNS)[number]["id"];
export const CASE_COLUMN_IDS = CASE_COLUMNS.map((c) => c.id) as [CaseColumnId, ...CaseColumnId[]];

export function columnInfo(id: CaseColumnId) {
  return CASE_COLUMNS.find((c) => c.id === id)!;
}

/** Which columns show when nobody has chosen: the case number always, the rest as listed. */
export function defaultColumnVisibility(): Record<CaseColumnId, boolean> {
  return Object.fromEntries(CASE_COLUMNS.map((c) => [c.id, c.shown])) as Record<CaseColumnId, boolean>;
}

const FIELD_CALL_LABELS: Record<FieldCall, string> = { keep: "Keep", remove: "Remove", undecided: "Undecided" };
const OUTCOME_LABELS: Record<RemovalOutcome, string> = { confirmed: "Removal confirmed", "no-defect": "No defect found" };

export const fieldCallLabel = (c: FieldCall | null) => (c ? FIELD_CALL_LABELS[c] : "");
export const outcomeLabel = (o: RemovalOutcome | null) => (o ? OUTCOME_LABELS[o] : "");
export const formatCar = (r: Pick<CaseListRow, "carMark" | "carNumber">) => [r.carMark, r.carNumber].filter(Boolean).join(" ");

export function formatPosition(axle: number | null, side: "L" | "R" | null): string {
  if (axle === null && side === null) return "";
  return `Axle ${axle ?? "?"} ${side ?? "?"}`;
}

export function formatClass(r: Pick<CaseListRow, "bearingClass" | "bearingClassOther">): string {
  if (r.bearingClass === "other") return r.bearingClassOther?.trim() || "Other";
  return r.bearingClass;
}

/** End play in inches to four decimals, the resolution a dial indicator reads to. */
export const formatEndPlay = (inches: number | null) => (inches === null ? "" : inches.toFixed(4));

/** Months of service, without trailing zeros ("18", "18.5"). */
export const formatMonths = (m: number | null) => (m === null ? "" : String(Number(m.toFixed(2))));

/** "2026-06-15" → "15 Jun 2026": one spelling everywhere, whatever the reader's locale. */
export function formatDay(iso: string | null): string {
  return formatDayEverywhere(iso);
}

/** How long ago, in the short words a list uses: "just now", "12 min ago", "5 h ago", "3 d ago", "6 wk ago", "4 mo ago", "2 yr ago". */
export function formatAgo(iso: string, now: number): string {
  const minutes = Math.floor((now - Date.parse(iso)) / 60_000);
  if (Number.isNaN(minutes)) return "";
  if (minutes < 1) return "just now";
  if (minutes < 60) return `${minutes} min ago`;
  const hours = Math.floor(minutes / 60);
  if (hours < 24) return `${hours} h ago`;
  const days = Math.floor(hours / 24);
  if (days < 14) return `${days} d ago`;
  if (days < 61) return `${Math.floor(days / 7)} wk ago`;
  if (days < 365) return `${Math.floor(days / 30.4375)} mo ago`;
  return `${Math.floor(days / 365.25)} yr ago`;
}
