// History lines that name another case ("linked TL-26-00042") show that number only to a reader
// who may read that case; to anyone else the line says a link changed, without number or note.
import type { FieldChange } from "@/db/schema";

export const LINK_ACTIONS = new Set(["linked", "unlinked"]);
export const HIDDEN_CASE = "a case outside your view";

type Event = { action: string; changes: FieldChange[]; reason: string | null };

/** Case numbers that link lines of these events name. */
export function linkedNumbers(events: readonly Event[]): string[] {
  const out = new Set<string>();
  for (const e of events) {
    if (!LINK_ACTIONS.has(e.action)) continue;
    for (const c of e.changes) for (const v of [c.from, c.to]) if (typeof v === "string") out.add(v);
  }
  return [...out];
}

/** The events with every link line the reader may not follow masked, note included. */
export function maskUnreadableLinks<E extends Event>(events: readonly E[], readable: ReadonlySet<string>): E[] {
  return events.map((e) => {
    if (!LINK_ACTIONS.has(e.action)) return e;
    const hidden = e.changes.some((c) => [c.from, c.to].some((v) => typeof v === "string" && !readable.has(v)));
    if (!hidden) return e;
    const mask = (v: unknown) => (typeof v === "string" && !readable.has(v) ? HIDDEN_CASE : v);
    return { ...e, reason: null, changes: e.changes.map((c) => ({ ...c, from: mask(c.from), to: mask(c.to) })) };
  });
}
