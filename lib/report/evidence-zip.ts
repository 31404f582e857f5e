// The evidence bundle as a streamed ZIP: report.pdf, the original photos, SHA256SUMS and a README.
// Photos are fetched one at a time, each only after the previous one is written, so memory stays small.
import "server-only";
import { createHash } from "node:crypto";
import { PassThrough, Readable } from "node:stream";
import * as archiverModule from "archiver";
import type { PhotoObjectKeys } from "@/db/queries/report";
import { HeadObjectCommand } from "@aws-sdk/client-s3";
import { HttpError } from "@/lib/http/errors";
import { bucket, getObject, s3 } from "@/lib/storage/s3";
import { formatDateTime } from "./format";
import { evidencePhotoPath, evidenceReadme, sha256Sums } from "./evidence-manifest";
import type { CaseReport } from "./types";

// archiver 7 exports one factory function; its installed type package describes the later class API.
type ZipArchiver = archiverModule.Archiver;
type Factory = (format: "zip", options: archiverModule.ZipOptions) => ZipArchiver;
const archiver: Factory = (archiverModule as unknown as { default?: Factory }).default ?? (archiverModule as unknown as Factory);

const sha256 = (b: Buffer) => createHash("sha256").update(b).digest("hex");

/** Refuses up front when an original is missing, rather than starting a download that cannot finish. */
export async function assertOriginalsStored(report: CaseReport, objects: PhotoObjectKeys[]): Promise<void> {
  for (const photo of report.photos) {
    const key = objects.find((o) => o.id === photo.id)?.originalKey;
    const found = key
      ? await s3()
          .send(new HeadObjectCommand({ Bucket: bucket(), Key: key }))
          .then(
            () => true,
            () => false,
          )
      : false;
    if (!found)
      throw new HttpError(
        500,
        "evidence-incomplete",
        `The original of photo ${photo.number} (${photo.fileName || photo.caption}) is missing from storage, so the evidence bundle would be incomplete. Tell your administrator.`,
      );
  }
}

export function evidenceZipStream(report: CaseReport, pdf: Buffer, objects: PhotoObjectKeys[], madeBy: string): ReadableStream<Uint8Array> {
  const zip = archiver("zip", { zlib: { level: 6 } });
  const out = new PassThrough();
  zip.pipe(out);
  const written = () => new Promise<void>((resolve) => zip.once("entry", () => resolve()));

  void (async () => {
    const sums = [{ path: "report.pdf", sha256: sha256(pdf) }];
    const checks: { path: string; stored: string; actual: string }[] = [];
    let next = written();
    zip.append(pdf, { name: "report.pdf" });
    await next;
    for (const photo of report.photos) {
      const keys = objects.find((o) => o.id === photo.id);
      if (!keys) continue;
      const bytes = await getObject(keys.originalKey);
      const path = evidencePhotoPath(photo);
      const actual = sha256(bytes);
      sums.push({ path, sha256: actual });
      checks.push({ path, stored: photo.sha256, actual });
      next = written();
      zip.append(bytes, { name: path });
      await next;
    }
    zip.append(sha256Sums(sums), { name: "SHA256SUMS" });
    zip.append(evidenceReadme(report, checks, madeBy, formatDateTime(new Date())), { name: "README.txt" });
    await zip.finalize();
  })().catch((err) => {
    console.error(`evidence bundle for ${report.number} failed:`, err);
    // Break the download rather than hand over an incomplete bundle that looks whole.
    out.destroy(err instanceof Error ? err : new Error(String(err)));
    zip.abort();
  });

  return Readable.toWeb(out) as ReadableStream<Uint8Array>;
}
