// CSV in and out (RFC 4180: comma separated, CRLF rows, quotes doubled inside quoted fields).
export type Cell = string | number | boolean | null | undefined;

// A text cell that starts like a formula could run in a spreadsheet; a leading apostrophe keeps it text.
const FORMULA_START = /^[=+\-@\t\r]/;

function cellText(cell: Cell): string {
  if (cell === null || cell === undefined) return "";
  if (typeof cell === "number") return Number.isFinite(cell) ? String(cell) : "";
  if (typeof cell === "boolean") return cell ? "yes" : "no";
  const text = FORMULA_START.test(cell) ? `'${cell}` : cell;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function toCsv(header: readonly string[], rows: readonly (readonly Cell[])[]): string {
  return [header, ...rows].map((row) => row.map(cellText).join(",")).join("\r\n") + "\r\n";
}

/** Parses CSV text into rows of fields; a byte-order mark and a final newline are ignored. */
export function parseCsv(input: string): string[][] {
  const text = input.charCodeAt(0) === 0xfeff ? input.slice(1) : input;
  const rows: string[][] = [];
  let row: string[] = [];
  let field = "";
  let quoted = false;
  let i = 0;
  const endField = () => {
    row.push(field);
    field = "";
  };
  const endRow = () => {
    endField();
    rows.push(row);
    row = [];
  };
  while (i < text.length) {
    const ch = text[i];
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        field += '"';
        i += 2;
        continue;
      }
      if (ch === '"') quoted = false;
      else field += ch;
      i++;
      continue;
    }
    if (ch === '"' && field === "") quoted = true;
    else if (ch === ",") endField();
    else if (ch === "\r" && text[i + 1] === "\n") {
      endRow();
      i++;
    } else if (ch === "\n" || ch === "\r") endRow();
    else field += ch;
    i++;
  }
  if (field !== "" || row.length > 0) endRow();
  return rows;
}

/** A file name safe on every system: "tearline-cause-pareto-2026-03.csv". */
export function downloadName(chart: string, ext: "csv" | "png", stamp = new Date().toISOString().slice(0, 10)): string {
  const slug = chart.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "");
  return `tearline-${slug}-${stamp}.${ext}`;
}
