// Writes to the append-only audit log. A failed write is reported, never allowed to undo the action itself.
import "server-only";
import { insertAudit } from "@/db/queries/audit";
import type { Tx } from "@/db";
import type { AuditKind } from "./audit-kinds";
import { clientAddress } from "./client-address";

type Who = { id: string; email: string } | null;

export async function audit(kind: AuditKind, who: Who, opts: { subject?: string | null; headers?: Headers; detail?: Record<string, unknown>; tx?: Tx } = {}) {
  const entry = {
    kind,
    actorId: who?.id ?? null,
    actorEmail: who?.email ?? null,
    subject: opts.subject ?? null,
    address: opts.headers ? clientAddress(opts.headers) : null,
    detail: opts.detail ?? {},
  };
  if (opts.tx) return insertAudit(entry, opts.tx);
  try {
    await insertAudit(entry);
  } catch (err) {
    console.error("audit log write failed", kind, err);
  }
}
