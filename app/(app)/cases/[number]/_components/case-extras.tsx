// Photos, the damage map, similar failures, related cases and the report links.
import Link from "next/link";
import { Card } from "@/components/ui/card";
import { buttonClass } from "@/components/ui/button";
import { DamageMap } from "@/components/damage-map/damage-map";
import { CasePhotos } from "@/components/photos/case-photos";
import { RelatedCases } from "@/components/similar/related-cases";
import { SimilarCases } from "@/components/similar/similar-cases";
import { componentLabel, damageLabel } from "@/lib/classification/labels";
import type { CaseDetail } from "@/lib/cases/types";
import { can } from "@/lib/auth/permissions";
import type { CurrentUser } from "@/lib/auth/session";
import { photoLimits } from "@/lib/photos/limits";

export function CaseExtras({ c, user }: { c: CaseDetail; user: CurrentUser }) {
  const signed = c.status === "signed";
  const findingOptions = c.findings.map((f) => ({
    id: f.id,
    label: `${damageLabel(f.damageCode)} — ${componentLabel(f.component).toLowerCase()}`,
  }));
  const mapped = c.findings.filter((f) => f.clockDeg !== null);
  return (
    <>
      {mapped.length ? (
        <Card title="Damage map">
          <DamageMap title={`Where the damage sits on ${c.number}`} findings={c.findings} />
        </Card>
      ) : null}
      <section id="photos" className="scroll-mt-24">
        <Card
          title="Photos"
          action={
            <Link
              href={`/cases/${c.number}/photos`}
              className="inline-flex min-h-11 items-center text-sm text-accent hover:underline lg:min-h-0"
            >
              All photos
            </Link>
          }
        >
          <CasePhotos
            caseId={c.id}
            canUpload={can(user.role, "photo:upload") && !signed}
            canDelete={can(user.role, "photo:delete") && !signed}
            readOnly={signed}
            findings={findingOptions}
            maxBytes={photoLimits().maxBytes}
          />
        </Card>
      </section>
      <section id="similar" className="scroll-mt-24 flex flex-col gap-5">
        <Card title="Similar earlier failures">
          <SimilarCases caseId={c.id} canLink={can(user.role, "case:link")} />
        </Card>
        <Card title="Related cases">
          <RelatedCases caseId={c.id} canLink={can(user.role, "case:link")} />
        </Card>
      </section>
      <section className="no-print">
        <Card title="Report and evidence">
          <div className="flex flex-wrap gap-2">
            <Link href={`/cases/${c.number}/report`} className={buttonClass({ variant: "secondary" })}>
              Printable report
            </Link>
            <a href={`/api/cases/${c.id}/report.pdf?download=1`} className={buttonClass({ variant: "secondary" })}>
              Download PDF
            </a>
            {can(user.role, "case:export") ? (
              <a href={`/api/cases/${c.id}/evidence.zip`} className={buttonClass({ variant: "secondary" })}>
                Evidence ZIP (report, original photos, SHA-256 list)
              </a>
            ) : null}
          </div>
          {!signed ? <p className="mt-2 text-xs text-muted">Until the verdict is signed, the report carries a DRAFT mark.</p> : null}
        </Card>
      </section>
    </>
  );
}
