import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { ComparePhotos, type ComparedPhoto } from "@/components/photos/compare-photos";
import { EmptyState, PageHeader } from "@/components/ui/card";
import type { CurrentUser } from "@/lib/auth/session";
import { requirePageUser } from "@/lib/auth/session";
import { findCase } from "@/lib/cases/service";
import { displayOrder } from "@/lib/photos/grouping";
import { findingChoices, findReadablePhoto, photosOfCase } from "@/lib/photos/service";
import { toPhotoView } from "@/lib/photos/view";
import { SecondPhotoPicker } from "./_components/second-photo-picker";

export const metadata: Metadata = { title: "Compare photos" };
export const dynamic = "force-dynamic";

type Search = { a?: string; b?: string; case?: string };

async function compared(id: string | undefined, user: CurrentUser): Promise<ComparedPhoto | null> {
  if (!id) return null;
  const hit = await findReadablePhoto(id, user);
  // A photo of a case the viewer may not see answers like one that does not exist.
  if (!hit) notFound();
  return { photo: toPhotoView(hit.photo), caseNumber: hit.caseRow.number, findings: await findingChoices(hit.caseRow) };
}

async function otherCase(query: string, user: CurrentUser, aCaseId: string) {
  const empty = { query, number: null, photos: [], problem: null };
  if (!query.trim()) return empty;
  const c = await findCase(query.trim(), user);
  if (!c) return { ...empty, problem: `No case ${query.trim().toUpperCase()} that you can see.` };
  if (c.id === aCaseId) return { ...empty, problem: "That is photo A's own case; its photos are listed below." };
  return { query, number: c.number, photos: displayOrder((await photosOfCase(c)).map(toPhotoView)), problem: null };
}

export default async function ComparePage({ searchParams }: { searchParams: Promise<Search> }) {
  const user = await requirePageUser("case:read");
  const q = await searchParams;
  const a = await compared(q.a ?? q.b, user);
  const b = q.a ? await compared(q.b, user) : null;

  if (!a) {
    return (
      <div className="mx-auto max-w-6xl">
        <PageHeader title="Compare photos" />
        <EmptyState title="Open a photo first">In a case&apos;s photos, open one and choose Compare to put another beside it.</EmptyState>
      </div>
    );
  }

  const picker = b ? null : (
    <SecondPhotoPicker
      aId={a.photo.id}
      sameCase={{
        number: a.caseNumber,
        photos: displayOrder((await photosOfCase({ id: a.photo.caseId })).map(toPhotoView)).filter((p) => p.id !== a.photo.id),
      }}
      other={await otherCase(q.case ?? "", user, a.photo.caseId)}
    />
  );
  const subtitle = b
    ? b.caseNumber === a.caseNumber
      ? `Two photos of ${a.caseNumber}`
      : `${a.caseNumber} beside ${b.caseNumber}`
    : `Photo A from ${a.caseNumber}; choose photo B`;

  return (
    <div className="mx-auto max-w-7xl">
      <PageHeader title="Compare photos" subtitle={subtitle} />
      <ComparePhotos
        a={a}
        b={b}
        changeA={b ? `/photos/compare?a=${b.photo.id}` : `/cases/${a.caseNumber}/photos`}
        changeB={`/photos/compare?a=${a.photo.id}`}
        picker={picker}
      />
    </div>
  );
}
