import type { Metadata } from "next";
import { Card, EmptyState, PageHeader } from "@/components/ui/card";
import { NoticeSwitches } from "@/components/notify/notice-switches";
import { noticePrefsOf } from "@/lib/notify/notice-service";
import { siteName as siteNameOf } from "@/lib/sites/site-service";
import { ROLE_LABELS } from "@/lib/auth/permissions";
import { requirePageUser } from "@/lib/auth/session";
import { noticeKindsFor } from "@/lib/notify/notice-kinds";

export const metadata: Metadata = { title: "Notices" };
export const dynamic = "force-dynamic";

export default async function ProfilePage() {
  const user = await requirePageUser();
  const prefs = await noticePrefsOf(user.id);
  const siteName = await siteNameOf(user.siteId);
  const switches = noticeKindsFor(user.role).map((k) => ({
    kind: k.kind,
    label: k.label,
    description: k.description,
    on: prefs[k.kind] !== false,
  }));

  return (
    <div className="mx-auto max-w-2xl">
      <PageHeader title="Notices" subtitle="Choose which e-mails Tearline sends you. Changes are saved as you switch." />
      <div className="flex flex-col gap-5">
        <Card title="E-mail notices">
          {switches.length ? (
            <NoticeSwitches initial={switches} />
          ) : (
            <EmptyState title="No notices for your role">Tearline sends you e-mail only about your account.</EmptyState>
          )}
        </Card>
        <Card title="Your account">
          <dl className="grid grid-cols-[7rem_1fr] gap-y-2 text-sm">
            <dt className="text-muted">Name</dt>
            <dd className="font-medium">{user.name}</dd>
            <dt className="text-muted">E-mail</dt>
            <dd className="break-all">{user.email}</dd>
            <dt className="text-muted">Role</dt>
            <dd>{ROLE_LABELS[user.role]}</dd>
            <dt className="text-muted">Home site</dt>
            <dd>{siteName ?? "None (all sites)"}</dd>
          </dl>
          <p className="mt-4 text-xs text-muted">
            Mail about your account itself (invitations, password resets) is always sent. Your administrator changes names, roles and sites.
          </p>
        </Card>
      </div>
    </div>
  );
}
