// Short, readable times for the outbox tables ("in 40 s", "3 min ago", or a date).
import { formatMoment } from "@/lib/dates";

export function when(d: Date | string | null | undefined, now = Date.now()): string {
  if (!d) return "—";
  const t = new Date(d).getTime();
  const s = Math.round((t - now) / 1000);
  const a = Math.abs(s);
  const rel = a < 60 ? `${a} s` : a < 3600 ? `${Math.round(a / 60)} min` : a < 86_400 ? `${Math.round(a / 3600)} h` : null;
  if (!rel) return formatMoment(new Date(t));
  return s >= 0 ? `in ${rel}` : `${rel} ago`;
}
