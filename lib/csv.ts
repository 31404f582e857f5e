// CSV as RFC 4180 writes it: fields joined by commas, records ended by CRLF, a field quoted when it
// holds a comma, a double quote, CR or LF, and a quote inside a quoted field doubled.
// Text cells that a spreadsheet would run as a formula get a leading apostrophe (OWASP's advice
// against CSV injection); real numbers are left alone so negative values stay numbers.

export type CsvValue = string | number | boolean | null | undefined | Date;

/** Characters that make Excel, LibreOffice or Sheets read a cell as a formula when they come first. */
const FORMULA_START = new Set(["=", "+", "-", "@", "\t", "\r", "\0"]);

const NEEDS_QUOTES = /[",\r\n]/;

export const CSV_LINE_END = "\r\n";

/** Prefixes text that would otherwise open as a formula. Only text: numbers never pass through here. */
export function guardFormula(text: string): string {
  return text.length > 0 && FORMULA_START.has(text[0]) ? `'${text}` : text;
}

function cellText(value: CsvValue): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "number") return Number.isFinite(value) ? String(value) : "";
  if (typeof value === "boolean") return value ? "true" : "false";
  if (value instanceof Date) return value.toISOString();
  return guardFormula(value);
}

/** One field, quoted only where RFC 4180 requires it. */
export function csvCell(value: CsvValue): string {
  const text = cellText(value);
  return NEEDS_QUOTES.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

/** One record with its CRLF line end. */
export function csvRow(values: readonly CsvValue[]): string {
  return values.map(csvCell).join(",") + CSV_LINE_END;
}

/** A whole document: the header line, then each record. */
export function toCsv(header: readonly string[], rows: readonly (readonly CsvValue[])[]): string {
  return csvRow(header) + rows.map(csvRow).join("");
}

/**
 * Reads CSV text back into records (RFC 4180 grammar; CRLF, LF or a lone CR end a record; a leading
 * byte-order mark is dropped). A trailing line end does not make an empty record. Unless `lenient`,
 * text that ends inside a quoted field is refused; uploads read it leniently and judge the rows.
 */
export function parseCsv(input: string, { lenient = false }: { lenient?: boolean } = {}): string[][] {
  const text = input.charCodeAt(0) === 0xfeff ? input.slice(1) : input;
  const records: string[][] = [];
  let field = "";
  let record: string[] = [];
  let quoted = false;
  let i = 0;
  const endField = () => {
    record.push(field);
    field = "";
  };
  const endRecord = () => {
    endField();
    records.push(record);
    record = [];
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
      endRecord();
      i++;
    } else if (ch === "\n" || ch === "\r") endRecord();
    else field += ch;
    i++;
  }
  if (quoted && !lenient) throw new Error("CSV ends inside a quoted field.");
  if (field !== "" || record.length > 0) endRecord();
  return records;
}
