import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { CasePhotos } from "@/components/photos/case-photos";
import { StageBadge } from "@/components/ui/badge";
import { ButtonLink } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { can } from "@/lib/auth/permissions";
import { requirePageUser } from "@/lib/auth/session";
import { findCase } from "@/lib/cases/service";
import { photoLimits } from "@/lib/photos/limits";
import { mayDeletePhoto } from "@/lib/photos/rules";
import { findingChoices, photosOfCase } from "@/lib/photos/service";
import { toPhotoView } from "@/lib/photos/view";

export const dynamic = "force-dynamic";

export async function generateMetadata({ params }: { params: Promise<{ number: string }> }): Promise<Metadata> {
  return { title: `Photos · ${(await params).number}` };
}

export default async function CasePhotosPage({ params }: { params: Promise<{ number: string }> }) {
  const user = await requirePageUser("case:read");
  const { number } = await params;
  const c = await findCase(number, user);
  if (!c) notFound();
  const [rows, findings] = await Promise.all([photosOfCase(c), findingChoices(c)]);
  const photos = rows.map((p) => ({ ...toPhotoView(p), canDelete: mayDeletePhoto(user, p, c.status) }));
  const where = [
    c.carMark && `${c.carMark} ${c.carNumber}`,
    c.axle && c.side ? `position ${c.axle}${c.side}` : null,
    c.serial && `serial ${c.serial}`,
  ]
    .filter(Boolean)
    .join(" · ");

  return (
    <div className="mx-auto max-w-6xl">
      <nav className="no-print mb-3 text-sm text-muted">
        <Link href="/cases" className="hover:text-ink">
          Cases
        </Link>{" "}
        <span aria-hidden>/</span>{" "}
        <Link href={`/cases/${c.number}`} className="hover:text-ink">
          {c.number}
        </Link>{" "}
        <span aria-hidden>/</span> <span className="text-ink-2">Photos</span>
      </nav>
      <div className="mb-5 flex flex-col gap-3 sm:flex-row sm:items-end sm:justify-between">
        <div>
          <div className="flex flex-wrap items-center gap-3">
            <h1 className="text-xl font-semibold tracking-tight text-ink sm:text-2xl">
              All photos of <span className="tabular">{c.number}</span>
            </h1>
            <StageBadge stage={c.status} />
          </div>
          {where ? <p className="mt-1 text-sm text-muted">{where}</p> : null}
        </div>
        <ButtonLink href={`/cases/${c.number}#photos`} variant="secondary">
          Back to the case
        </ButtonLink>
      </div>
      <Card>
        <CasePhotos
          caseId={c.id}
          canUpload={can(user.role, "photo:upload")}
          canDelete={can(user.role, "photo:delete")}
          readOnly={c.status === "signed"}
          findings={findings}
          uploaderOpen
          maxBytes={photoLimits().maxBytes}
          initialPhotos={photos}
        />
      </Card>
    </div>
  );
}
