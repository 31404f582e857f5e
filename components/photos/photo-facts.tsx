// What a photo is and shows, in words: used beside the lightbox and under each compared photo.
import { clockWords } from "@/lib/damage-map/geometry";
import { componentLabel } from "@/lib/photos/grouping";
import { formatBytes } from "@/lib/photos/limits";
import type { PhotoView } from "@/lib/photos/view";
import type { FindingOption } from "./tag-values";
import { formatDay, formatMoment } from "@/lib/dates";

// EXIF time is the camera's wall clock stored as UTC; showing it in UTC shows what the camera showed.

export function photoTitle(p: PhotoView): string {
  const part = p.component ? componentLabel(p.component) : "Photo";
  const row = p.row && !part.toLowerCase().includes(p.row) ? `, ${p.row} row` : "";
  return `${part}${row}`;
}

/** Words for a thumbnail's alt text: the part, row, clock position and caption. */
export function photoAlt(p: PhotoView): string {
  const at = p.clockDeg !== null ? ` at ${clockWords(p.clockDeg)}` : "";
  return `${photoTitle(p)}${at}${p.caption ? `: ${p.caption}` : ""}`;
}

export function PhotoTagLine({ photo, findings }: { photo: PhotoView; findings: FindingOption[] }) {
  const finding = photo.findingId ? findings.find((f) => f.id === photo.findingId) : undefined;
  return (
    <div className="flex flex-col gap-1">
      <p className="font-semibold text-ink">{photoTitle(photo)}</p>
      {photo.clockDeg !== null ? <p className="text-sm text-ink-2">At {clockWords(photo.clockDeg)}</p> : null}
      {finding ? (
        <p className="text-sm text-ink-2">
          <span className="text-muted">Finding: </span>
          {finding.label}
        </p>
      ) : photo.findingId ? (
        <p className="text-sm text-muted">Linked to a finding</p>
      ) : null}
      {photo.caption ? <p className="text-sm leading-relaxed text-ink">{photo.caption}</p> : null}
    </div>
  );
}

export function PhotoFactList({ photo }: { photo: PhotoView }) {
  const rows: [string, string][] = [
    ["Taken", photo.takenAt ? `${formatMoment(photo.takenAt)} (camera clock)` : "Not recorded by the camera"],
    ["Uploaded", formatDay(photo.createdAt)],
    [
      "Original",
      `${photo.width} × ${photo.height} px · ${formatBytes(photo.bytes)} · ${photo.contentType.replace("image/", "").toUpperCase()}`,
    ],
    ["File", photo.fileName || "—"],
  ];
  return (
    <dl className="grid grid-cols-[5.5rem_1fr] gap-x-3 gap-y-1.5 text-sm">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-muted">{k}</dt>
          <dd className="min-w-0 break-words text-ink-2">{v}</dd>
        </div>
      ))}
      <dt className="text-muted">SHA-256</dt>
      <dd className="min-w-0 truncate font-mono text-xs leading-5 text-ink-2" title={photo.sha256}>
        {photo.sha256}
      </dd>
    </dl>
  );
}
