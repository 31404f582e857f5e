import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/card";
import { RemovalForm } from "@/components/removal/removal-form";
import { siteFormOptions } from "@/lib/sites/site-service";
import { requirePageUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "New removal" };

export default async function NewRemovalPage() {
  const user = await requirePageUser("case:create");
  const sites = await siteFormOptions();
  const home = sites.find((s) => s.id === user.siteId && s.kind !== "lab")?.id ?? null;
  return (
    <div className="mx-auto max-w-3xl">
      <PageHeader title="New removal" subtitle="Log a bearing taken out of service. The field call updates as you fill in the checks." />
      <RemovalForm mode="new" sites={sites} defaultSiteId={home} />
    </div>
  );
}
