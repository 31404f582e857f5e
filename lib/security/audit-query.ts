// The audit page's filters, shared by the page and its API route.
import { z } from "@/lib/validation/zod";
import { AUDIT_KIND_VALUES } from "./audit-kinds";

const day = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Use a date like 2026-03-31.")
  .optional()
  .or(z.literal("").transform(() => undefined));

export const auditQuerySchema = z.object({
  kind: z
    .enum(AUDIT_KIND_VALUES, "Choose a kind from the list.")
    .optional()
    .or(z.literal("").transform(() => undefined)),
  person: z.string().trim().max(200, "Keep the name or e-mail under 200 characters.").optional(),
  from: day,
  to: day,
  limit: z.coerce.number().int().min(1).max(500).default(200),
});

export type AuditQuery = z.infer<typeof auditQuerySchema>;

export function auditFilterOf(q: AuditQuery) {
  const to = q.to ? new Date(`${q.to}T00:00:00Z`) : undefined;
  if (to) to.setUTCDate(to.getUTCDate() + 1);
  return { kind: q.kind, person: q.person || undefined, from: q.from ? new Date(`${q.from}T00:00:00Z`) : undefined, to, limit: q.limit };
}
