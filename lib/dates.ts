// One way to write dates on every screen, export and the report, whatever the reader's locale:
// a day is "20 Nov 2026", a moment "20 Nov 2026, 14:05 UTC". Times are shown in UTC so that a
// shop and a lab in different zones read the same line the same way.

const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

const pad = (n: number) => String(n).padStart(2, "0");

/** A calendar day ("2026-06-15", or a timestamp's UTC day) as "15 Jun 2026"; "" for nothing. */
export function formatDay(value: Date | string | null | undefined): string {
  if (value === null || value === undefined || value === "") return "";
  if (typeof value === "string" && /^\d{4}-\d{2}-\d{2}$/.test(value.slice(0, 10)) && value.length === 10) {
    const [y, m, d] = value.split("-").map(Number);
    return m >= 1 && m <= 12 && d >= 1 ? `${d} ${MONTHS[m - 1]} ${y}` : value;
  }
  const t = new Date(value);
  if (Number.isNaN(t.getTime())) return String(value);
  return `${t.getUTCDate()} ${MONTHS[t.getUTCMonth()]} ${t.getUTCFullYear()}`;
}

/** A moment as "20 Nov 2026, 14:05 UTC"; "" for nothing. */
export function formatMoment(value: Date | string | null | undefined): string {
  if (value === null || value === undefined || value === "") return "";
  const t = new Date(value);
  if (Number.isNaN(t.getTime())) return String(value);
  return `${formatDay(t)}, ${pad(t.getUTCHours())}:${pad(t.getUTCMinutes())} UTC`;
}
