// GET /api/cases/export - the filtered case list as a CSV download (every matching case, up to the cap)
import { caseListCsv } from "@/lib/cases/list-service";
import { cappedNote, exportFileName } from "@/lib/cases/list-csv";
import { parseListParams } from "@/lib/cases/list-params";
import { withRole } from "@/lib/http/handler";
import { audit } from "@/lib/security/audit";

// Same reach as the list: an inspector's file holds only the cases the inspector may read.
export const GET = withRole("case:read", async ({ req, user }) => {
  const { filters, sort } = parseListParams(req.nextUrl.searchParams);
  const csv = await caseListCsv(filters, sort, user);
  const name = exportFileName(new Date());
  const headers: Record<string, string> = {
    "content-type": "text/csv; charset=utf-8; header=present",
    "content-disposition": `attachment; filename="${name}"`,
    "cache-control": "private, no-store",
    "x-total-count": String(csv.total),
    "x-export-rows": String(Math.min(csv.total, csv.cap)),
  };
  if (csv.capped) {
    headers["x-export-capped"] = String(csv.cap);
    headers["x-export-note"] = cappedNote(csv.total, csv.cap);
  }
  await audit("export", user, {
    subject: "case list CSV",
    headers: req.headers,
    detail: { format: "csv", rows: Math.min(csv.total, csv.cap) },
  });
  return new Response(csv.stream, { status: 200, headers });
});
