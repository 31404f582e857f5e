// Photos, similar failures, related cases and the report links: the parts that load on their own.
import Link from "next/link";
import { Card } from "@/components/ui/card";
import type { CaseDetail } from "@/db/queries/case-read";
import type { CurrentUser } from "@/lib/auth/session";

export function CaseExtras({ c }: { c: CaseDetail; user: CurrentUser }) {
  return (
    <>
      <section id="photos" className="scroll-mt-24">
        <Card title="Photos" action={<Link href={`/cases/${c.number}/photos`} className="text-sm text-accent hover:underline">All photos</Link>}>
          <p className="text-sm text-muted">Photos load here.</p>
        </Card>
      </section>
      <section id="similar" className="scroll-mt-24">
        <Card title="Similar earlier failures">
          <p className="text-sm text-muted">Similar cases load here.</p>
        </Card>
      </section>
    </>
  );
}
