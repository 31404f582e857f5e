import "server-only";
import { and, desc, eq, gte, ilike, lt, or, type SQL } from "drizzle-orm";
import { db, type Tx } from "@/db";
import { auditLog } from "@/db/schema";

export type AuditEntry = {
  kind: string;
  actorId?: string | null;
  actorEmail?: string | null;
  subject?: string | null;
  address?: string | null;
  detail?: Record<string, unknown>;
};

export async function insertAudit(entry: AuditEntry, tx: Tx | typeof db = db) {
  await tx.insert(auditLog).values({ ...entry, detail: entry.detail ?? {} });
}

export type AuditFilter = { kind?: string; person?: string; from?: Date; to?: Date; limit: number };

export async function listAudit(f: AuditFilter) {
  const where: SQL[] = [];
  if (f.kind) where.push(eq(auditLog.kind, f.kind));
  if (f.person) {
    const like = `%${f.person.replace(/[%_\\]/g, "\\$&")}%`;
    where.push(or(ilike(auditLog.actorEmail, like), ilike(auditLog.subject, like))!);
  }
  if (f.from) where.push(gte(auditLog.at, f.from));
  if (f.to) where.push(lt(auditLog.at, f.to));
  return db
    .select()
    .from(auditLog)
    .where(where.length ? and(...where) : undefined)
    .orderBy(desc(auditLog.at))
    .limit(f.limit);
}
