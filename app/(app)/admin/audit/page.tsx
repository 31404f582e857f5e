import type { Metadata } from "next";
import { Card, EmptyState, PageHeader } from "@/components/ui/card";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Field, Input, Select } from "@/components/ui/field";
import { requirePageUser } from "@/lib/auth/session";
import { AUDIT_KINDS, type AuditKind } from "@/lib/security/audit-kinds";
import { auditEntries } from "@/lib/security/audit";
import { auditQuerySchema } from "@/lib/security/audit-query";
import { formatMoment } from "@/lib/dates";

export const metadata: Metadata = { title: "Audit log" };
export const dynamic = "force-dynamic";

const DANGER: string[] = ["sign-in-failed", "account-locked", "suspension"];

function detailText(detail: Record<string, unknown>): string {
  return Object.entries(detail)
    .map(([k, v]) => `${k}: ${typeof v === "string" ? v : JSON.stringify(v)}`)
    .join(" · ");
}

export default async function AuditPage({ searchParams }: { searchParams: Promise<Record<string, string>> }) {
  await requirePageUser("admin:audit");
  const raw = await searchParams;
  const parsed = auditQuerySchema.safeParse(raw);
  const q = parsed.success ? parsed.data : auditQuerySchema.parse({});
  const rows = await auditEntries(q);

  return (
    <>
      <PageHeader
        title="Audit log"
        subtitle="Sign-ins, account changes, policy and code-list edits and exports, newest first. Entries are kept as written; nobody can change or remove them."
      />
      <div className="flex flex-col gap-5">
        <Card title="Filter">
          <form method="get" className="grid gap-3 sm:grid-cols-2 lg:grid-cols-[1fr_1.4fr_1fr_1fr_auto] lg:items-end">
            <Field label="Kind" htmlFor="audit-kind">
              <Select id="audit-kind" name="kind" defaultValue={q.kind ?? ""}>
                <option value="">Every kind</option>
                {Object.entries(AUDIT_KINDS).map(([k, label]) => (
                  <option key={k} value={k}>
                    {label}
                  </option>
                ))}
              </Select>
            </Field>
            <Field label="Person (name or e-mail)" htmlFor="audit-person">
              <Input id="audit-person" name="person" maxLength={200} defaultValue={q.person ?? ""} placeholder="e.g. dana@" />
            </Field>
            <Field label="From" htmlFor="audit-from">
              <Input id="audit-from" name="from" type="date" defaultValue={q.from ?? ""} />
            </Field>
            <Field label="To" htmlFor="audit-to">
              <Input id="audit-to" name="to" type="date" defaultValue={q.to ?? ""} />
            </Field>
            <Button type="submit">Show</Button>
          </form>
          {!parsed.success ? <p className="mt-3 text-sm text-danger">{parsed.error.issues[0]?.message}</p> : null}
        </Card>
        <Card title={`Entries (${rows.length}${rows.length === q.limit ? ", newest shown" : ""})`}>
          {rows.length === 0 ? (
            <EmptyState title="Nothing matches these filters." />
          ) : (
            <ul className="divide-y divide-line" data-testid="audit-entries">
              {rows.map((r) => (
                <li key={r.id} className="grid gap-1 py-3 text-sm md:grid-cols-[11rem_10rem_1fr_1fr] md:gap-4">
                  <time className="tabular text-muted" dateTime={r.at.toISOString()}>
                    {formatMoment(r.at)}
                  </time>
                  <span>
                    <Badge tone={DANGER.includes(r.kind) ? "danger" : "neutral"}>{AUDIT_KINDS[r.kind as AuditKind] ?? r.kind}</Badge>
                  </span>
                  <span className="min-w-0 break-words text-ink">
                    {r.actorEmail ? (
                      <>
                        {r.actorEmail}
                        {r.subject && r.subject !== r.actorEmail ? <span className="text-muted"> → {r.subject}</span> : null}
                      </>
                    ) : (
                      (r.subject ?? "—")
                    )}
                  </span>
                  <span className="min-w-0 break-words text-muted">
                    {r.address ? <span className="tabular">{r.address}</span> : null}
                    {r.address && Object.keys(r.detail).length ? " · " : null}
                    {detailText(r.detail)}
                  </span>
                </li>
              ))}
            </ul>
          )}
        </Card>
      </div>
    </>
  );
}
