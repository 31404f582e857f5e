// Server side of the case report: loads a case a person may read, fetches photo images, renders the PDF.
import "server-only";
import sharp from "sharp";
import { loadCaseReport, type LoadedReport, type PhotoObjectKeys } from "@/db/queries/report";
import type { CurrentUser } from "@/lib/auth/session";
import { notFound } from "@/lib/http/errors";
import { getObject } from "@/lib/storage/s3";
import { buildCaseReport } from "./build-report";
import { renderReportPdf, type PhotoImages } from "./pdf/render-report-pdf";
import type { CaseReport } from "./types";

/** The case if it exists and this person may read it; otherwise "not found", so nothing leaks. */
export async function readableCaseReport(key: { id: string } | { number: string }, viewer: CurrentUser): Promise<LoadedReport> {
  const loaded = await loadCaseReport(key, viewer);
  if (!loaded) throw notFound("That case");
  return loaded;
}

/** Print-sized JPEGs of each photo's screen image (pdfkit draws JPEG and PNG only); a missing one is skipped. */
export async function reportPhotoImages(objects: PhotoObjectKeys[]): Promise<PhotoImages> {
  const images: PhotoImages = new Map();
  for (const o of objects) {
    try {
      const screen = await getObject(o.screenKey);
      images.set(
        o.id,
        await sharp(screen).resize({ width: 900, height: 900, fit: "inside", withoutEnlargement: true }).jpeg({ quality: 80 }).toBuffer(),
      );
    } catch (err) {
      console.error(`report: photo ${o.id} image not drawn:`, err instanceof Error ? err.message : err);
    }
  }
  return images;
}

export async function caseReportPdf(loaded: LoadedReport): Promise<{ report: CaseReport; pdf: Buffer }> {
  const report = buildCaseReport(loaded.source);
  const pdf = await renderReportPdf(report, await reportPhotoImages(loaded.objects));
  return { report, pdf };
}

export function reportFileName(report: CaseReport, ext: string): string {
  return `${report.number}-${report.revision.kind === "signed" ? "report" : "draft-report"}.${ext}`;
}
