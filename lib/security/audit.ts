// Writes to the append-only audit log (a failed write is reported, never allowed to undo the
// action itself) and reads it back for the admins' audit page.
import "server-only";
import { insertAudit, listAudit } from "@/db/queries/audit";
import type { Tx } from "@/db";
import type { AuditKind } from "./audit-kinds";
import { auditFilterOf, type AuditQuery } from "./audit-query";
import { clientAddress } from "./client-address";

type Who = { id: string; email: string } | null;

export async function audit(
  kind: AuditKind,
  who: Who,
  opts: { subject?: string | null; headers?: Headers; detail?: Record<string, unknown>; tx?: Tx } = {},
) {
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

/** Entries matching the filters, newest first, at most the query's limit. */
export async function auditEntries(q: AuditQuery) {
  return listAudit(auditFilterOf(q));
}
