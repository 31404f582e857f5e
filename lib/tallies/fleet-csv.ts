// Reads an uploaded fleet list (bearings still in service). Every row is checked; any error
// means nothing is stored, and each error names its row as a spreadsheet would number it.
import { z } from "@/lib/validation/zod";
import { monthsBetween } from "@/lib/field/service-life";
import { parseCsv } from "./csv";
import { FLEET_COLUMNS } from "./fleet-columns";

export { FLEET_COLUMNS, FLEET_TEMPLATE } from "./fleet-columns";

const REQUIRED = ["serial", "bearing_class", "as_of"] as const;
export const MAX_FLEET_ROWS = 200_000;

// One message per bad date: the format first, then whether the day exists.
const isoDate = z
  .string()
  .max(10, "write the date as YYYY-MM-DD")
  .superRefine((s, ctx) => {
    if (!/^\d{4}-\d{2}-\d{2}$/.test(s)) ctx.addIssue({ code: "custom", message: "write the date as YYYY-MM-DD" });
    else if (Number.isNaN(Date.parse(`${s}T00:00:00Z`)) || !new Date(`${s}T00:00:00Z`).toISOString().startsWith(s))
      ctx.addIssue({ code: "custom", message: "not a real calendar date" });
  });
const optionalNumber = (max: number, label: string, integer = false) =>
  z.preprocess(
    (v) => (v === "" ? undefined : Number(String(v).replace(/[ _]/g, ""))),
    (integer ? z.number().int(`${label} must be a whole number`) : z.number())
      .refine(Number.isFinite, `${label} must be a number`)
      .min(0, `${label} cannot be negative`)
      .max(max, `${label} above ${max.toLocaleString("en-US")} looks wrong`)
      .optional(),
  );

export const fleetRowSchema = z
  .object({
    serial: z.string().trim().min(1, "serial is empty").max(60, "serial is longer than 60 characters"),
    bearing_class: z.string().trim().min(1, "bearing_class is empty").max(40, "bearing_class is longer than 40 characters"),
    mounted_on: z.preprocess((v) => (v === "" ? undefined : v), isoDate.optional()),
    as_of: isoDate,
    service_months: optionalNumber(1200, "service_months"),
    service_miles: optionalNumber(50_000_000, "service_miles", true),
  })
  .superRefine((r, ctx) => {
    if (r.mounted_on && r.mounted_on > r.as_of)
      ctx.addIssue({ code: "custom", path: ["mounted_on"], message: "mounted_on is after as_of" });
    if (r.service_months === undefined && r.service_miles === undefined && !r.mounted_on) {
      ctx.addIssue({ code: "custom", path: ["service_months"], message: "give service_months, service_miles or mounted_on" });
    }
  });

export type FleetRow = {
  serial: string;
  bearingClass: string;
  mountedOn: string | null;
  asOf: string;
  serviceMonths: number | null;
  serviceMiles: number | null;
};
export type FleetRowError = { row: number; column: string | null; message: string };
export type FleetParseResult = { ok: true; rows: FleetRow[] } | { ok: false; errors: FleetRowError[]; errorCount: number };

const normaliseHeader = (h: string) =>
  h
    .trim()
    .toLowerCase()
    .replace(/[\s-]+/g, "_");

export function parseFleetCsv(text: string, maxErrors = 100): FleetParseResult {
  const table = parseCsv(text).filter((r) => r.some((c) => c.trim() !== ""));
  if (table.length === 0) return { ok: false, errors: [{ row: 1, column: null, message: "The file is empty." }], errorCount: 1 };
  const header = table[0].map(normaliseHeader);
  const missing = REQUIRED.filter((c) => !header.includes(c));
  if (missing.length) {
    return {
      ok: false,
      errors: [
        { row: 1, column: null, message: `The header row lacks ${missing.join(", ")}. Expected columns: ${FLEET_COLUMNS.join(", ")}.` },
      ],
      errorCount: 1,
    };
  }
  if (table.length - 1 > MAX_FLEET_ROWS) {
    return {
      ok: false,
      errors: [
        { row: 1, column: null, message: `The file has ${table.length - 1} rows; at most ${MAX_FLEET_ROWS} can be uploaded at once.` },
      ],
      errorCount: 1,
    };
  }
  const rows: FleetRow[] = [];
  const errors: FleetRowError[] = [];
  let errorCount = 0;
  // Row numbers follow the file's lines as a spreadsheet shows them (header = row 1), blank lines aside.
  const lineOf = lineNumbers(text);
  table.slice(1).forEach((cells, i) => {
    const rowNo = lineOf[i + 1] ?? i + 2;
    const record = Object.fromEntries(FLEET_COLUMNS.map((c) => [c, (cells[header.indexOf(c)] ?? "").trim()]));
    const parsed = fleetRowSchema.safeParse(record);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        errorCount++;
        if (errors.length < maxErrors) errors.push({ row: rowNo, column: issue.path.join(".") || null, message: issue.message });
      }
      return;
    }
    const r = parsed.data;
    const months = r.service_months ?? (r.mounted_on ? Math.round(monthsBetween(r.mounted_on, r.as_of) * 100) / 100 : null);
    rows.push({
      serial: r.serial,
      bearingClass: r.bearing_class,
      mountedOn: r.mounted_on ?? null,
      asOf: r.as_of,
      serviceMonths: months,
      serviceMiles: r.service_miles ?? null,
    });
  });
  if (rows.length === 0 && errorCount === 0)
    return { ok: false, errors: [{ row: 2, column: null, message: "The file has a header but no units." }], errorCount: 1 };
  return errorCount ? { ok: false, errors, errorCount } : { ok: true, rows };
}

/** Line number (1-based) of each non-blank CSV record, so messages match what the user sees. */
function lineNumbers(text: string): number[] {
  const out: number[] = [];
  let line = 1;
  let quoted = false;
  let recordStart = 1;
  let content = false;
  for (let i = 0; i <= text.length; i++) {
    const ch = text[i];
    if (ch === '"') quoted = !quoted;
    const end = i === text.length || (!quoted && (ch === "\n" || (ch === "\r" && text[i + 1] !== "\n")));
    if (end) {
      if (content) out.push(recordStart);
      content = false;
      line++;
      recordStart = line;
      continue;
    }
    if (ch === "\n") line++;
    if (ch !== "\r" && ch !== "\n" && ch !== "," && ch !== " " && ch !== "\uFEFF") content = true;
  }
  return out;
}
