// The evidence bundle's file names, its SHA256SUMS list (the format `sha256sum -c` checks) and README.
import type { CaseReport, ReportPhoto } from "./types";

const EXT: Record<string, string> = {
  "image/jpeg": "jpg",
  "image/png": "png",
  "image/heic": "heic",
  "image/heif": "heif",
  "image/webp": "webp",
  "image/tiff": "tif",
};

/** "photos/03-seal-lip.jpg": numbered like the report, the original name made safe for any file system. */
export function evidencePhotoPath(p: Pick<ReportPhoto, "number" | "fileName" | "contentType" | "sha256">): string {
  const ext = EXT[p.contentType] ?? "bin";
  const base = p.fileName
    .replace(/\.[A-Za-z0-9]{1,5}$/, "")
    .normalize("NFKD")
    .replace(/[^A-Za-z0-9._-]+/g, "-")
    .replace(/^[-.]+|[-.]+$/g, "")
    .slice(0, 60);
  return `photos/${String(p.number).padStart(2, "0")}-${base || p.sha256.slice(0, 12)}.${ext}`;
}

/** One line per file: 64 hex digits, two spaces, the path (GNU coreutils sha256sum text format). */
export function sha256Sums(entries: { path: string; sha256: string }[]): string {
  return entries.map((e) => `${e.sha256}  ${e.path}\n`).join("");
}

export function evidenceReadme(
  r: CaseReport,
  files: { path: string; stored: string; actual: string }[],
  madeBy: string,
  madeAt: string,
): string {
  const mismatches = files.filter((f) => f.stored !== f.actual);
  return [
    `Tearline evidence bundle for case ${r.number}`,
    "",
    `Made ${madeAt} by ${madeBy}.`,
    `Report revision: ${r.revision.title}.`,
    "",
    "Contents",
    "  report.pdf      the case report as it stood when this bundle was made",
    `  photos/         ${files.length} original photo file${files.length === 1 ? "" : "s"}, byte for byte as uploaded, numbered as in the report`,
    "  SHA256SUMS      the SHA-256 digest of every file above",
    "  README.txt      this note",
    "",
    "To check the files, run in this folder:  sha256sum -c SHA256SUMS",
    "(on Windows PowerShell: Get-FileHash -Algorithm SHA256 <file>, and compare by eye).",
    "",
    mismatches.length === 0
      ? "Every photo's digest matches the digest Tearline recorded when the photo was uploaded."
      : `WARNING: ${mismatches.length} photo${mismatches.length === 1 ? "" : "s"} no longer match${mismatches.length === 1 ? "es" : ""} the digest recorded at upload: ${mismatches.map((m) => m.path).join(", ")}. Report this to your Tearline administrator.`,
    "",
  ].join("\n");
}
