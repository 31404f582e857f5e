// Turns an uploaded file into evidence: the original untouched (with its SHA-256), plus an upright
// screen image and thumbnail with every piece of metadata (EXIF, GPS, ICC) left behind.
import { createHash } from "node:crypto";
import sharp, { type Metadata, type OutputInfo } from "sharp";
import type { PhotoLimits } from "./limits";
import { refuse, PhotoRefusal } from "./refusal";
import { acceptedKind, heifMime, MIME_OF, sniffImage, type AcceptedKind } from "./sniff";
import { takenAtFromExif } from "./taken-at";

/** Long edge of the lightbox image and of the grid thumbnail, in pixels. */
export const SCREEN_EDGE = 1600;
export const THUMB_EDGE = 320;
const SCREEN_QUALITY = 80;
const THUMB_QUALITY = 72;

export type Derivative = { data: Buffer; width: number; height: number };

export type ProcessedPhoto = {
  kind: AcceptedKind;
  contentType: string;
  sha256: string;
  bytes: number;
  /** Upright size of the original, after its EXIF orientation. */
  width: number;
  height: number;
  takenAt: Date | null;
  screen: Derivative;
  thumb: Derivative;
};

export function sha256Hex(data: Uint8Array): string {
  return createHash("sha256").update(data).digest("hex");
}

/** Checks the file, decodes it completely and makes the derivatives; throws PhotoRefusal for bad files. */
export async function processPhoto(original: Buffer, fileName: string, limits: PhotoLimits): Promise<ProcessedPhoto> {
  if (original.length === 0) throw refuse.empty(fileName);
  if (original.length > limits.maxBytes) throw refuse.tooLarge(fileName, original.length, limits.maxBytes);
  const kind = acceptedKind(original, fileName);
  const unreadable = () => (kind === "heif" ? refuse.heic(fileName) : refuse.damaged(fileName));

  // Header only: no pixels are decoded here, so a forged size costs nothing.
  let meta: Metadata;
  try {
    meta = await sharp(original, { limitInputPixels: false }).metadata();
  } catch {
    throw unreadable();
  }
  if (!meta.width || !meta.height) throw unreadable();
  const pixels = meta.width * meta.height;
  if (pixels > limits.maxPixels) throw refuse.tooManyPixels(fileName, pixels, limits.maxPixels);
  if (meta.format !== kind) throw unreadable();

  let resized: { data: Buffer; info: OutputInfo };
  try {
    // failOn "warning" makes a cut-short file an error instead of a grey lower half.
    resized = await sharp(original, { limitInputPixels: limits.maxPixels, failOn: "warning" })
      .autoOrient()
      .resize({ width: SCREEN_EDGE, height: SCREEN_EDGE, fit: "inside", withoutEnlargement: true })
      .toColourspace("srgb")
      .raw({ depth: "uchar" })
      .toBuffer({ resolveWithObject: true });
  } catch (err) {
    if (err instanceof PhotoRefusal) throw err;
    if (err instanceof Error && /pixel limit/i.test(err.message)) throw refuse.tooManyPixels(fileName, pixels, limits.maxPixels);
    throw unreadable();
  }

  const { width: w, height: h, channels } = resized.info;
  const raw = { raw: { width: w, height: h, channels: channels as 1 | 2 | 3 | 4 } };
  const [screen, thumb] = await Promise.all([
    sharp(resized.data, raw).webp({ quality: SCREEN_QUALITY }).toBuffer({ resolveWithObject: true }),
    sharp(resized.data, raw)
      .resize({ width: THUMB_EDGE, height: THUMB_EDGE, fit: "inside", withoutEnlargement: true })
      .webp({ quality: THUMB_QUALITY })
      .toBuffer({ resolveWithObject: true }),
  ]);

  const upright = meta.autoOrient ?? { width: meta.width, height: meta.height };
  return {
    kind,
    contentType: kind === "heif" ? heifMime(sniffImage(original).brand) : MIME_OF[kind],
    sha256: sha256Hex(original),
    bytes: original.length,
    width: upright.width,
    height: upright.height,
    takenAt: takenAtFromExif(meta.exif),
    screen: { data: screen.data, width: screen.info.width, height: screen.info.height },
    thumb: { data: thumb.data, width: thumb.info.width, height: thumb.info.height },
  };
}
