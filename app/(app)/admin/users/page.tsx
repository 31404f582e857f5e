import type { Metadata } from "next";
import { ButtonLink } from "@/components/ui/button";
import { Card, PageHeader } from "@/components/ui/card";
import { pendingInvitations } from "@/lib/accounts/invite";
import { listPeople } from "@/lib/accounts/people-service";
import { siteChoices } from "@/lib/sites/site-service";
import { requirePageUser } from "@/lib/auth/session";
import { InviteForm } from "./_components/invite-form";
import { PendingInvitations } from "./_components/pending-invitations";
import { PeopleList } from "./_components/people-list";

export const metadata: Metadata = { title: "People" };
export const dynamic = "force-dynamic";

export default async function PeoplePage() {
  const me = await requirePageUser("admin:users");
  const [people, invitations, sites] = await Promise.all([listPeople(), pendingInvitations(), siteChoices()]);
  const active = people.filter((p) => !p.banned).length;
  const now = Date.now();

  return (
    <>
      <PageHeader
        title="People"
        subtitle={`${active} active ${active === 1 ? "account" : "accounts"}${people.length > active ? `, ${people.length - active} suspended` : ""}. A role or home site is saved as soon as you change it.`}
        actions={<ButtonLink href="#invite">Invite someone</ButtonLink>}
      />
      <div className="flex flex-col gap-5">
        <Card title="Everyone with an account">
          <PeopleList
            people={people.map((p) => ({
              id: p.id,
              name: p.name,
              email: p.email,
              role: p.role,
              banned: p.banned,
              siteId: p.siteId,
              locked: p.locked,
            }))}
            sites={sites}
            meId={me.id}
          />
        </Card>
        <div className="grid items-start gap-5 lg:grid-cols-2">
          <div id="invite" className="scroll-mt-24">
            <Card title="Invite someone">
              <p className="-mt-1 mb-4 text-sm text-muted">
                They get an e-mail with a link to choose a password. Nobody can sign up without one.
              </p>
              <InviteForm sites={sites} />
            </Card>
          </div>
          <Card title={`Waiting to join${invitations.length ? ` (${invitations.length})` : ""}`}>
            <PendingInvitations
              invitations={invitations.map((i) => ({ ...i, expiresAt: i.expiresAt.toISOString(), createdAt: i.createdAt.toISOString() }))}
              sites={sites}
              now={now}
            />
          </Card>
        </div>
      </div>
    </>
  );
}
