"use client";
// A case's photos: the uploader (for those who may add), the grid grouped by part, and the lightbox.
// Mount it on any page that already checked the viewer may read the case.
import dynamic from "next/dynamic";
import { useRouter } from "next/navigation";
import { useCallback, useMemo, useState } from "react";
import useSWR from "swr";
import { Button } from "@/components/ui/button";
import { getOrThrow } from "@/lib/client/api";
import { EmptyState } from "@/components/ui/card";
import { displayOrder, groupByComponent } from "@/lib/photos/grouping";
import { DEFAULT_MAX_BYTES } from "@/lib/photos/limits";
import type { PhotoView } from "@/lib/photos/view";
import { PhotoGrid } from "./photo-grid";
import { PhotoLightbox } from "./photo-lightbox";
import type { FindingOption } from "./tag-values";

// The uploader and its dropzone load when it is opened ("Add photos"), or with the photos page that opens it.
const PhotoUploader = dynamic(() => import("./photo-uploader").then((m) => m.PhotoUploader), {
  loading: () => <div className="h-40 w-full animate-pulse rounded-xl border border-dashed border-line bg-surface-2" aria-hidden="true" />,
});

export type CasePhotosProps = {
  caseId: string;
  /** The viewer's role may add photos (photo:upload). */
  canUpload: boolean;
  /** The viewer's role may delete photos (photo:delete); each photo still says whether this viewer may. */
  canDelete: boolean;
  /** A signed case: view only. */
  readOnly: boolean;
  findings: FindingOption[];
  /** Open the uploader straight away (the full photos page); otherwise behind "Add photos". */
  uploaderOpen?: boolean;
  /** The server's per-file limit in bytes (photoLimits().maxBytes), so oversize files are refused at once. */
  maxBytes?: number;
  /** Photos already loaded on the server, shown before the first fetch. */
  initialPhotos?: PhotoView[];
};

type ListAnswer = { photos: PhotoView[] };
const fetchList = (url: string) => getOrThrow<ListAnswer>(url, { fallback: "Photos could not be loaded." });

export function CasePhotos({
  caseId,
  canUpload,
  canDelete,
  readOnly,
  findings,
  uploaderOpen = false,
  maxBytes = DEFAULT_MAX_BYTES,
  initialPhotos,
}: CasePhotosProps) {
  const url = `/api/cases/${caseId}/photos`;
  const { data, error, mutate, isLoading } = useSWR<ListAnswer>(url, fetchList, {
    fallbackData: initialPhotos ? { photos: initialPhotos } : undefined,
    revalidateOnFocus: false,
  });
  const [openId, setOpenId] = useState<string | null>(null);
  const [showUploader, setShowUploader] = useState(uploaderOpen);
  const photos = useMemo(() => data?.photos ?? [], [data]);
  const ordered = useMemo(() => displayOrder(photos), [photos]);
  const groups = useMemo(() => groupByComponent(photos), [photos]);
  const mayAdd = canUpload && !readOnly;
  const openIndex = openId ? ordered.findIndex((p) => p.id === openId) : -1;
  // A photo change moves the case version; the page re-reads it so the next save or sign-off is current.
  const router = useRouter();

  const upsert = useCallback(
    (p: PhotoView) => {
      void mutate((cur) => ({ photos: [...(cur?.photos ?? []).filter((x) => x.id !== p.id), p] }), { revalidate: false });
      router.refresh();
    },
    [mutate, router],
  );
  const removeLocal = (id: string) => {
    const i = ordered.findIndex((p) => p.id === id);
    const next = ordered[i + 1] ?? ordered[i - 1];
    setOpenId(next && next.id !== id ? next.id : null);
    void mutate((cur) => ({ photos: (cur?.photos ?? []).filter((x) => x.id !== id) }), { revalidate: false });
    router.refresh();
  };

  return (
    <div className="flex flex-col gap-5" data-testid="case-photos">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-sm text-muted" aria-live="polite">
          {isLoading && !data
            ? "Loading photos…"
            : `${photos.length} photo${photos.length === 1 ? "" : "s"}${groups.length > 1 ? ` of ${groups.length} parts` : ""}`}
          {readOnly ? " · signed case, photos are read-only" : ""}
        </p>
        {mayAdd && !showUploader ? <Button onClick={() => setShowUploader(true)}>Add photos</Button> : null}
      </div>

      {mayAdd && showUploader ? <PhotoUploader caseId={caseId} findings={findings} maxBytes={maxBytes} onStored={upsert} /> : null}

      {error ? (
        <p className="rounded-lg border border-danger/30 bg-danger-soft px-3 py-2 text-sm text-danger" role="alert">
          {(error as Error).message}{" "}
          <button type="button" className="underline" onClick={() => mutate()}>
            Try again
          </button>
        </p>
      ) : null}

      {photos.length ? (
        <PhotoGrid groups={groups} onOpen={(p) => setOpenId(p.id)} />
      ) : !isLoading && !error ? (
        <EmptyState title="No photos yet">
          {mayAdd
            ? "Photos of raceways, rollers, cages, seals and the grease go here, each tagged to its part."
            : "Nobody has added photos to this case."}
        </EmptyState>
      ) : null}

      {openIndex >= 0 ? (
        <PhotoLightbox
          photos={ordered}
          index={openIndex}
          findings={findings}
          canTag={mayAdd}
          canDelete={canDelete && !readOnly}
          onIndex={(i) => setOpenId(ordered[i]?.id ?? null)}
          onClose={() => setOpenId(null)}
          onChanged={upsert}
          onDeleted={removeLocal}
        />
      ) : null}
    </div>
  );
}
