import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { Card } from "@/components/ui/card";
import { FieldSummary } from "@/components/case/field-summary";
import { FindingsSection } from "@/components/case/findings-section";
import { HistoryList } from "@/components/case/history-list";
import { TeardownForm } from "@/components/case/teardown-form";
import { VerdictForm } from "@/components/case/verdict-form";
import { WorkflowBar } from "@/components/case/workflow-bar";
import { RemovalFormLazy as RemovalForm } from "@/components/removal/removal-form-lazy";
import { caseDetail, readableHistory } from "@/lib/cases/service";
import { codeEntries } from "@/lib/codes/code-service";
import { siteFormOptions } from "@/lib/sites/site-service";
import { requirePageUser } from "@/lib/auth/session";
import { ACTIONS, WORKFLOW, canEditSection, verdictProblems } from "@/lib/cases/workflow";
import { can } from "@/lib/auth/permissions";
import { DEFAULT_END_PLAY_POLICY } from "@/lib/field";
import { checkSignature } from "@/lib/cases/signature-service";
import { CaseHeader } from "./_components/case-header";
import { SignatureCheckLine } from "./_components/signature-check";
import { CaseExtras } from "./_components/case-extras";
import { toDraft } from "./_components/to-draft";
import { SafetyFlagNote } from "./_components/safety-flag-note";
import { safetyFlagOf } from "@/lib/cases/safety-flag";
import { formatDay } from "@/lib/dates";

export const dynamic = "force-dynamic";

export async function generateMetadata({ params }: { params: Promise<{ number: string }> }): Promise<Metadata> {
  return { title: (await params).number };
}

export default async function CasePage({
  params,
  searchParams,
}: {
  params: Promise<{ number: string }>;
  searchParams: Promise<{ edit?: string }>;
}) {
  const user = await requirePageUser("case:read");
  const { number } = await params;
  const c = await caseDetail(number, user);
  if (!c) notFound();
  const [events, damage, causes, sites] = await Promise.all([
    readableHistory(c.id, user),
    codeEntries("damage"),
    codeEntries("cause"),
    siteFormOptions(),
  ]);
  const policy = c.sitePolicy?.endPlayMaxIn
    ? {
        maxIn: c.sitePolicy.endPlayMaxIn,
        dialSpreadIn: c.sitePolicy.dialSpreadIn!,
        tapeSpreadIn: c.sitePolicy.tapeSpreadIn!,
        plausibleMaxIn: c.sitePolicy.plausibleMaxIn ?? undefined,
      }
    : DEFAULT_END_PLAY_POLICY;
  const editField = canEditSection("field", c.status, user.role);
  const editTeardown = canEditSection("teardown", c.status, user.role);
  const editVerdict = canEditSection("verdict", c.status, user.role);
  const actions = ACTIONS.filter((a) => WORKFLOW[a].from.includes(c.status) && can(user.role, WORKFLOW[a].permission));
  const problems = verdictProblems({
    primaryCause: c.primaryCause,
    confidence: c.confidence,
    removalConfirmed: c.removalConfirmed,
    findingCount: c.findings.length,
  });
  const editing = (await searchParams).edit === "field" && editField;
  const signature = c.status === "signed" ? await checkSignature(c) : null;
  const codes = damage.map((d) => ({
    code: d.code,
    label: d.label,
    description: d.description,
    synonyms: d.synonyms,
    retired: d.retiredAt !== null,
    family: d.family,
  }));

  return (
    <div className="mx-auto max-w-5xl">
      <CaseHeader c={c} />
      {signature ? (
        <div className="-mt-2 mb-5">
          <SignatureCheckLine check={signature} />
        </div>
      ) : null}
      {actions.length ? (
        <Card className="mb-5" title="Next step">
          {actions.includes("sign") ? (
            <div className="mb-3">
              <SafetyFlagNote flag={safetyFlagOf(c.fieldChecks, c.trigger)} signing />
            </div>
          ) : null}
          <WorkflowBar caseId={c.id} version={c.version} actions={actions} verdictProblems={problems} />
        </Card>
      ) : null}
      <nav className="no-print mb-5 flex gap-2 overflow-x-auto text-sm [scrollbar-width:none]" aria-label="Sections">
        {[
          ["field", "Field report"],
          ["teardown", "Teardown"],
          ["verdict", "Verdict"],
          ["photos", "Photos"],
          ["similar", "Similar"],
          ["history", "History"],
        ].map(([id, label]) => (
          <a
            key={id}
            href={`#${id}`}
            className="inline-flex min-h-11 shrink-0 items-center rounded-full border border-line bg-surface px-3 text-ink-2 hover:border-accent lg:min-h-0 lg:py-1.5"
          >
            {label}
          </a>
        ))}
      </nav>
      <div className="flex flex-col gap-5">
        <section id="field" className="scroll-mt-24">
          <Card
            title="Field report"
            action={
              editField && !editing ? (
                <a
                  href="?edit=field#field"
                  className="inline-flex min-h-11 min-w-11 items-center justify-center text-sm font-medium text-accent hover:underline lg:min-h-0 lg:min-w-0"
                >
                  Edit
                </a>
              ) : editing ? (
                <a
                  href="?#field"
                  className="inline-flex min-h-11 min-w-11 items-center justify-center text-sm text-muted hover:underline lg:min-h-0 lg:min-w-0"
                >
                  Done
                </a>
              ) : null
            }
          >
            {editing ? (
              <RemovalForm mode="edit" sites={sites} initial={toDraft(c)} caseId={c.id} version={c.version} defaultSiteId={c.siteId} />
            ) : (
              <FieldSummary c={c} policy={policy} />
            )}
          </Card>
        </section>
        <section id="teardown" className="scroll-mt-24">
          <Card title="Teardown findings">
            {c.status === "field" ? (
              <p className="text-sm text-muted">The teardown opens once the lab marks the bearing received.</p>
            ) : (
              <div className="flex flex-col gap-6">
                <FindingsSection caseId={c.id} version={c.version} findings={c.findings} codes={codes} editable={editTeardown} />
                <TeardownForm
                  caseId={c.id}
                  version={c.version}
                  editable={editTeardown}
                  value={{ lubricant: c.lubricant, dispositions: c.dispositions, teardownNotes: c.teardownNotes }}
                />
              </div>
            )}
          </Card>
        </section>
        <section id="verdict" className="scroll-mt-24">
          <Card title="Verdict">
            {c.status === "field" ? (
              <p className="text-sm text-muted">The verdict follows the teardown.</p>
            ) : (
              <VerdictForm
                caseId={c.id}
                version={c.version}
                editable={editVerdict}
                causes={causes.filter((x) => !x.retiredAt).map((x) => ({ code: x.code, label: x.label }))}
                value={{
                  primaryCause: c.primaryCause,
                  contributingCauses: c.contributingCauses,
                  confidence: c.confidence,
                  removalConfirmed: c.removalConfirmed,
                  correctiveAction: c.correctiveAction,
                  verdictNotes: c.verdictNotes,
                }}
              />
            )}
            {c.proposedByName ? (
              <p className="mt-4 text-xs text-muted">
                Proposed by {c.proposedByName} on {formatDay(c.proposedAt)}
                {c.signedByName ? ` · signed by ${c.signedByName} on ${formatDay(c.signedAt)}` : ""}
              </p>
            ) : null}
          </Card>
        </section>
        <CaseExtras c={c} user={user} />
        <section id="history" className="scroll-mt-24">
          <Card title="History">
            <HistoryList events={events} />
          </Card>
        </section>
      </div>
    </div>
  );
}
