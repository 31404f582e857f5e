import Link from "next/link";
import { StageBadge } from "@/components/ui/badge";
import { ButtonLink } from "@/components/ui/button";
import { Card, EmptyState, PageHeader } from "@/components/ui/card";
import { ROLE_LABELS, can } from "@/lib/auth/permissions";
import type { CurrentUser } from "@/lib/auth/session";
import { homeCaseCards as caseCards, homeStageCounts as stageCounts } from "@/lib/cases/home-service";
import { STAGES, STAGE_LABELS, type Stage } from "@/lib/cases/stages";
import type { CaseCard } from "@/lib/cases/types";
import { triggerLabel } from "@/lib/classification/labels";

function CaseList({ rows, empty }: { rows: CaseCard[]; empty: string }) {
  if (!rows.length) return <EmptyState title={empty} />;
  return (
    <ul className="-my-2 divide-y divide-line">
      {rows.map((c) => (
        <li key={c.id}>
          <Link href={`/cases/${c.number}`} className="flex items-center justify-between gap-3 py-2.5 hover:text-accent">
            <span className="min-w-0">
              <span className="block font-medium tabular">{c.number}</span>
              <span className="block truncate text-xs text-muted">
                {c.carMark} {c.carNumber} · {triggerLabel(c.trigger)}
                {c.siteName ? ` · ${c.siteName}` : ""}
              </span>
            </span>
            <StageBadge stage={c.status} />
          </Link>
        </li>
      ))}
    </ul>
  );
}

function StageTiles({ counts }: { counts: Record<Stage, number> }) {
  return (
    <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
      {STAGES.map((s) => (
        <Link key={s} href={`/cases?status=${s}`} className="rounded-xl border border-line bg-surface p-4 hover:border-line-strong">
          <p className="text-xs font-medium uppercase tracking-wide text-muted">{STAGE_LABELS[s]}</p>
          <p className="mt-1 text-3xl font-semibold tabular">{counts[s]}</p>
        </Link>
      ))}
    </div>
  );
}

export async function RoleHome({ user }: { user: CurrentUser }) {
  const counts = await stageCounts(user);
  const first = user.name.split(" ")[0];
  const panels: { title: string; rows: CaseCard[]; empty: string; href: string }[] = [];
  if (user.role === "inspector") {
    panels.push({
      title: "My shop's open field reports",
      rows: await caseCards(user, ["field"]),
      empty: "No open field reports.",
      href: "/cases?status=field",
    });
    panels.push({ title: "Recently updated", rows: await caseCards(user), empty: "No cases yet.", href: "/cases" });
  }
  if (user.role === "analyst" || user.role === "admin") {
    panels.push({
      title: "Waiting for the bench",
      rows: await caseCards(user, ["field"]),
      empty: "Nothing waiting to be received.",
      href: "/cases?status=field",
    });
    panels.push({
      title: "On the bench",
      rows: await caseCards(user, ["bench"]),
      empty: "Nothing on the bench.",
      href: "/cases?status=bench",
    });
  }
  if (user.role === "engineer" || user.role === "admin") {
    panels.push({
      title: "Sign-off queue",
      rows: await caseCards(user, ["signoff"]),
      empty: "No verdicts waiting for sign-off.",
      href: "/cases?status=signoff",
    });
  }
  if (user.role === "manager" || user.role === "engineer") {
    panels.push({
      title: "Recently signed",
      rows: await caseCards(user, ["signed"]),
      empty: "No signed verdicts yet.",
      href: "/cases?status=signed",
    });
  }
  return (
    <>
      <PageHeader
        title={`Good to see you, ${first}`}
        subtitle={`${ROLE_LABELS[user.role]} · ${can(user.role, "case:read-all") ? "all sites" : "your shop's cases"}`}
        actions={
          <>
            {can(user.role, "case:create") ? <ButtonLink href="/cases/new">New removal</ButtonLink> : null}
            {can(user.role, "tallies:read") ? (
              <ButtonLink href="/tallies" variant="secondary">
                Tallies
              </ButtonLink>
            ) : null}
          </>
        }
      />
      <StageTiles counts={counts} />
      <div className="mt-6 grid gap-5 lg:grid-cols-2 [&>*]:min-w-0">
        {panels.map((p) => (
          <Card
            key={p.title}
            title={p.title}
            action={
              <Link href={p.href} className="text-sm text-accent hover:underline">
                All
              </Link>
            }
          >
            <CaseList rows={p.rows} empty={p.empty} />
          </Card>
        ))}
      </div>
    </>
  );
}
