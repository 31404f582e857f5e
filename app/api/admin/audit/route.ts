// GET /api/admin/audit - the audit log, newest first, filtered by kind, person and dates
import { NextResponse } from "next/server";
import { listAudit } from "@/db/queries/audit";
import { parseQuery, withRole } from "@/lib/http/handler";
import { auditQuerySchema, auditFilterOf } from "@/lib/security/audit-query";

export const GET = withRole("admin:audit", async ({ req }) => {
  const q = parseQuery(req, auditQuerySchema);
  const rows = await listAudit(auditFilterOf(q));
  return NextResponse.json({ entries: rows });
});
