import { headers } from "next/headers";
import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ReportDocument } from "@/components/report/report-document";
import { buttonClass } from "@/components/ui/button";
import { can } from "@/lib/auth/permissions";
import { requirePageUser } from "@/lib/auth/session";
import { HttpError } from "@/lib/http/errors";
import { buildCaseReport } from "@/lib/report/build-report";
import { readableCaseReport } from "@/lib/report/report-service";
import { PrintButton } from "./_components/print-button";

export const dynamic = "force-dynamic";

export async function generateMetadata({ params }: { params: Promise<{ number: string }> }): Promise<Metadata> {
  return { title: `Report ${(await params).number}` };
}

async function load(number: string, user: Awaited<ReturnType<typeof requirePageUser>>) {
  try {
    return await readableCaseReport({ number }, user);
  } catch (err) {
    if (err instanceof HttpError && err.status === 404) notFound();
    throw err;
  }
}

export default async function CaseReportPage({ params }: { params: Promise<{ number: string }> }) {
  const user = await requirePageUser("case:read");
  const { number } = await params;
  const loaded = await load(decodeURIComponent(number), user);
  const report = buildCaseReport(loaded.source);
  const id = loaded.source.case.id;
  // Page numbers and the revision in the paper margins (browsers without margin boxes skip this).
  const margins = `@page { @bottom-left { content: ${JSON.stringify(report.revision.kind === "signed" ? "Signed revision" : "Draft — not signed")}; font: 8pt Inter, sans-serif; color: #64748b; } @bottom-right { content: ${JSON.stringify(`${report.number} · page `)} counter(page) " of " counter(pages); font: 8pt Inter, sans-serif; color: #0f172a; } }`;

  return (
    <>
      <style nonce={(await headers()).get("x-nonce") ?? undefined} dangerouslySetInnerHTML={{ __html: margins }} />
      <div className="no-print mx-auto mb-4 flex max-w-[8.5in] flex-col gap-3 sm:flex-row sm:items-center sm:justify-between">
        <Link href={`/cases/${report.number}`} className="text-sm text-muted hover:text-ink">
          ← Back to {report.number}
        </Link>
        <div className="flex flex-wrap gap-2">
          <PrintButton />
          <a href={`/api/cases/${id}/report.pdf?download=1`} className={buttonClass({ variant: "primary" })}>
            Download PDF
          </a>
          {can(user.role, "case:export") ? (
            <a
              href={`/api/cases/${id}/evidence.zip`}
              className={buttonClass({ variant: "secondary" })}
              title="Report, original photos and their SHA-256 list"
            >
              Evidence ZIP
            </a>
          ) : null}
        </div>
      </div>
      <ReportDocument r={report} />
    </>
  );
}
