// The shape of a photo that leaves the server: tags and facts, plus the routes that serve its
// bytes after checking who asks. Object keys stay on the server.
import type { PhotoVariant } from "./keys";

export type PhotoView = {
  id: string;
  caseId: string;
  component: string | null;
  row: string | null;
  clockDeg: number | null;
  findingId: string | null;
  caption: string;
  fileName: string;
  contentType: string;
  bytes: number;
  width: number;
  height: number;
  sha256: string;
  takenAt: string | null;
  createdAt: string;
  uploadedBy: string | null;
  urls: Record<PhotoVariant, string>;
  /** Whether the person asking may delete it (set by the list route). */
  canDelete?: boolean;
};

type PhotoRowLike = Omit<PhotoView, "urls" | "takenAt" | "createdAt" | "canDelete"> & { takenAt: Date | null; createdAt: Date };

export const photoUrl = (id: string, variant: PhotoVariant) => `/api/photos/${id}/${variant}`;

export function toPhotoView(p: PhotoRowLike): PhotoView {
  return {
    id: p.id,
    caseId: p.caseId,
    component: p.component,
    row: p.row,
    clockDeg: p.clockDeg,
    findingId: p.findingId,
    caption: p.caption,
    fileName: p.fileName,
    contentType: p.contentType,
    bytes: p.bytes,
    width: p.width,
    height: p.height,
    sha256: p.sha256,
    takenAt: p.takenAt ? p.takenAt.toISOString() : null,
    createdAt: p.createdAt.toISOString(),
    uploadedBy: p.uploadedBy,
    urls: { thumb: photoUrl(p.id, "thumb"), screen: photoUrl(p.id, "screen"), original: photoUrl(p.id, "original") },
  };
}
