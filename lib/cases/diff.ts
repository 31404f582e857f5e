// What changed between two versions of a record, field by field, for the case history.
import type { FieldChange } from "@/db/schema/history";

function same(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (a == null && b == null) return true;
  if (a instanceof Date || b instanceof Date) return String(a) === String(b);
  return JSON.stringify(a) === JSON.stringify(b);
}

export function diffFields(before: Record<string, unknown>, after: Record<string, unknown>): FieldChange[] {
  const changes: FieldChange[] = [];
  for (const field of Object.keys(after)) {
    if (!same(before[field], after[field])) changes.push({ field, from: before[field] ?? null, to: after[field] ?? null });
  }
  return changes;
}
