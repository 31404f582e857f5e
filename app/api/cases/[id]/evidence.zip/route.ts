// GET /api/cases/:id/evidence.zip - report, original photos and their SHA-256 list, for handing evidence over
import { withCase } from "@/lib/http/with-case";
import { audit } from "@/lib/security/audit";
import { assertOriginalsStored, evidenceZipStream } from "@/lib/report/evidence-zip";
import { caseReportPdf, readableCaseReport, reportFileName } from "@/lib/report/report-service";

export const GET = withCase("case:export", async ({ case: c, user, req }) => {
  const loaded = await readableCaseReport({ id: c.id }, user);
  const { report, pdf } = await caseReportPdf(loaded);
  await assertOriginalsStored(report, loaded.objects);
  const name = reportFileName(report, "zip").replace(/-(draft-)?report\.zip$/, (_m, d: string | undefined) => `-${d ?? ""}evidence.zip`);
  await audit("export", user, { subject: report.number, headers: req.headers, detail: { format: "zip" } });
  return new Response(evidenceZipStream(report, pdf, loaded.objects, `${user.name} <${user.email}>`), {
    status: 200,
    headers: {
      "Content-Type": "application/zip",
      "Content-Disposition": `attachment; filename="${name}"`,
      "Cache-Control": "private, no-store",
      "X-Content-Type-Options": "nosniff",
    },
  });
});
