import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/card";
import { sitesWithUsage } from "@/lib/sites/site-service";
import { requirePageUser } from "@/lib/auth/session";
import { PolicyNotes } from "./_components/policy-notes";
import { SitesBoard } from "./_components/sites-board";

export const metadata: Metadata = { title: "Sites & limits" };
export const dynamic = "force-dynamic";

export default async function SitesPage() {
  await requirePageUser("admin:sites");
  const sites = await sitesWithUsage();
  const views = sites.map((s) => ({
    id: s.id,
    code: s.code,
    name: s.name,
    kind: s.kind,
    railway: s.railway,
    location: s.location,
    active: s.active,
    endPlayMaxIn: s.endPlayMaxIn,
    dialSpreadIn: s.dialSpreadIn,
    tapeSpreadIn: s.tapeSpreadIn,
    plausibleMaxIn: s.plausibleMaxIn,
    removalCostUsd: s.removalCostUsd,
    usage: s.usage,
  }));

  return (
    <>
      <PageHeader
        title="Sites & limits"
        subtitle="The shops and labs that remove or tear down bearings, and the end-play limit each one applies."
      />
      <div className="grid items-start gap-5 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <div className="lg:order-2 lg:sticky lg:top-8">
          <PolicyNotes />
        </div>
        <SitesBoard sites={views} />
      </div>
    </>
  );
}
