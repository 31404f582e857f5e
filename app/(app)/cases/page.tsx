import type { Metadata } from "next";
import { Suspense } from "react";
import { can } from "@/lib/auth/permissions";
import { requirePageUser } from "@/lib/auth/session";
import { caseFilterChoices } from "@/lib/cases/list-service";
import { CaseListView } from "./_components/case-list-view";
import { TableSkeleton } from "./_components/skeletons";

export const metadata: Metadata = { title: "Cases" };
export const dynamic = "force-dynamic";

// The list itself loads in the browser (filters, sort and page live in the URL); the server
// checks the role and supplies the filter choices.
export default async function CasesPage() {
  const user = await requirePageUser("case:read");
  const options = await caseFilterChoices();
  return (
    <Suspense fallback={<TableSkeleton columns={8} rows={10} />}>
      <CaseListView
        options={options}
        canCreate={can(user.role, "case:create")}
        scopeNote={can(user.role, "case:read-all") ? "All sites" : "Your shop's cases and the ones you filed"}
      />
    </Suspense>
  );
}
