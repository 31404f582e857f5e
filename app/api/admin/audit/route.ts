// GET /api/admin/audit - the audit log, newest first, filtered by kind, person and dates
import { NextResponse } from "next/server";
import { parseQuery, withRole } from "@/lib/http/handler";
import { auditEntries } from "@/lib/security/audit";
import { auditQuerySchema } from "@/lib/security/audit-query";

export const GET = withRole("admin:audit", async ({ req }) => {
  const q = parseQuery(req, auditQuerySchema);
  const rows = await auditEntries(q);
  return NextResponse.json({ entries: rows });
});
