// GET /api/cases/:id/report.pdf - the case report as a PDF (signed revision, or a draft marked as such)
import { withCase } from "@/lib/http/with-case";
import { audit } from "@/lib/security/audit";
import { caseReportPdf, readableCaseReport, reportFileName } from "@/lib/report/report-service";

export const GET = withCase("case:read", async ({ case: c, user, req }) => {
  const loaded = await readableCaseReport({ id: c.id }, user);
  const { report, pdf } = await caseReportPdf(loaded);
  const download = req.nextUrl.searchParams.get("download") === "1";
  await audit("export", user, { subject: report.number, headers: req.headers, detail: { format: "pdf" } });
  return new Response(new Uint8Array(pdf), {
    status: 200,
    headers: {
      "Content-Type": "application/pdf",
      "Content-Length": String(pdf.length),
      "Content-Disposition": `${download ? "attachment" : "inline"}; filename="${reportFileName(report, "pdf")}"`,
      // A report changes with its case; never serve a stale one from a cache.
      "Cache-Control": "private, no-store",
      "X-Content-Type-Options": "nosniff",
    },
  });
});
