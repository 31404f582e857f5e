// Why a file was refused, with the HTTP status the upload route answers and words a person can act on.
import { formatBytes, formatMegapixels } from "./limits";

export type RefusalCode =
  | "empty"
  | "too-large"
  | "too-many-pixels"
  | "not-an-image"
  | "vector-drawing"
  | "unsupported-format"
  | "heic-undecodable"
  | "damaged";

export class PhotoRefusal extends Error {
  constructor(
    public readonly status: 400 | 413 | 415 | 422,
    public readonly code: RefusalCode,
    message: string,
  ) {
    super(message);
    this.name = "PhotoRefusal";
  }
}

const named = (fileName: string) => (fileName ? `“${fileName}”` : "This file");

export const refuse = {
  empty: (f: string) =>
    new PhotoRefusal(
      400,
      "empty",
      `${named(f)} is empty (0 bytes). Pick the photo again; if it came from a phone, wait until it has finished saving.`,
    ),
  tooLarge: (f: string, bytes: number, max: number) =>
    new PhotoRefusal(
      413,
      "too-large",
      `${named(f)} is ${formatBytes(bytes)}; photos may be at most ${formatBytes(max)}. Export it at a smaller size or lower JPEG quality and upload that.`,
    ),
  tooManyPixels: (f: string, pixels: number | null, max: number) =>
    new PhotoRefusal(
      413,
      "too-many-pixels",
      `${named(f)} ${pixels ? `is ${formatMegapixels(pixels)}` : "claims more pixels than the limit"}; photos may be at most ${formatMegapixels(max)}. Resize it and upload again.`,
    ),
  notAnImage: (f: string, whatItIs: string) =>
    new PhotoRefusal(
      415,
      "not-an-image",
      `${named(f)} is not a photo: its content is ${whatItIs}, whatever its name says. Upload a JPEG, PNG or WebP image.`,
    ),
  vector: (f: string) =>
    new PhotoRefusal(
      415,
      "vector-drawing",
      `${named(f)} is an SVG drawing. Only photos are kept as evidence: export it as PNG or JPEG and upload that.`,
    ),
  unsupported: (f: string, format: string) =>
    new PhotoRefusal(
      415,
      "unsupported-format",
      `${named(f)} is a ${format} image, which Tearline does not keep. Save it as JPEG, PNG or WebP and upload that.`,
    ),
  heic: (f: string) =>
    new PhotoRefusal(
      415,
      "heic-undecodable",
      `${named(f)} is an HEIC photo that this server cannot decode. On an iPhone set Settings › Camera › Formats › Most Compatible (photos are then saved as JPEG), or share the photo as JPEG and upload that.`,
    ),
  damaged: (f: string) =>
    new PhotoRefusal(
      422,
      "damaged",
      `${named(f)} is damaged or cut short and cannot be read to the end. Copy it again from the camera or phone and upload the complete file.`,
    ),
};
