// What a file really is, judged from its first bytes (magic numbers), never from its name or
// the browser's claimed type. Only JPEG, PNG, WebP and the HEIF family go on to be decoded.
import { refuse } from "./refusal";

export type SniffedKind =
  | "jpeg"
  | "png"
  | "webp"
  | "heif"
  | "svg"
  | "gif"
  | "tiff"
  | "bmp"
  | "pdf"
  | "zip"
  | "html"
  | "text"
  | "empty"
  | "unknown";

export type Sniffed = { kind: SniffedKind; brand?: string };
export type AcceptedKind = "jpeg" | "png" | "webp" | "heif";

export const MIME_OF: Record<AcceptedKind, string> = {
  jpeg: "image/jpeg",
  png: "image/png",
  webp: "image/webp",
  heif: "image/heif",
};

// ISO BMFF brands of HEIF still images: HEVC-coded (heic…), generic (mif1/msf1) and AV1-coded (avif).
const HEIF_BRANDS = new Set(["heic", "heix", "hevc", "hevx", "heim", "heis", "hevm", "hevs", "mif1", "msf1", "avif", "avis"]);

const ascii = (buf: Uint8Array, start: number, end: number) => String.fromCharCode(...buf.subarray(start, end));
const startsWith = (buf: Uint8Array, bytes: number[]) => bytes.every((b, i) => buf[i] === b);

function looksLikeText(head: Uint8Array): boolean {
  if (head.length === 0) return false;
  let printable = 0;
  for (const b of head) {
    if (b === 0) return false;
    if (b === 9 || b === 10 || b === 13 || (b >= 32 && b < 127) || b >= 128) printable++;
  }
  return printable / head.length > 0.95 && new TextDecoder("utf-8").decode(head, { stream: true }).includes("\uFFFD") === false;
}

export function sniffImage(buf: Uint8Array): Sniffed {
  if (buf.length === 0) return { kind: "empty" };
  if (startsWith(buf, [0xff, 0xd8, 0xff])) return { kind: "jpeg" };
  if (startsWith(buf, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return { kind: "png" };
  if (buf.length >= 12 && ascii(buf, 0, 4) === "RIFF" && ascii(buf, 8, 12) === "WEBP") return { kind: "webp" };
  if (buf.length >= 12 && ascii(buf, 4, 8) === "ftyp") {
    const brand = ascii(buf, 8, 12);
    if (HEIF_BRANDS.has(brand)) return { kind: "heif", brand };
    return { kind: "unknown", brand };
  }
  if (ascii(buf, 0, 6) === "GIF87a" || ascii(buf, 0, 6) === "GIF89a") return { kind: "gif" };
  if (startsWith(buf, [0x49, 0x49, 0x2a, 0x00]) || startsWith(buf, [0x4d, 0x4d, 0x00, 0x2a])) return { kind: "tiff" };
  if (ascii(buf, 0, 2) === "BM" && buf.length > 14) return { kind: "bmp" };
  if (ascii(buf, 0, 5) === "%PDF-") return { kind: "pdf" };
  if (startsWith(buf, [0x50, 0x4b, 0x03, 0x04])) return { kind: "zip" };

  const head = buf.subarray(0, 4096);
  if (looksLikeText(head)) {
    const text = new TextDecoder()
      .decode(head)
      .replace(/^\uFEFF/, "")
      .trimStart()
      .toLowerCase();
    if (text.startsWith("<") && text.includes("<svg")) return { kind: "svg" };
    if (text.startsWith("<!doctype html") || text.startsWith("<html")) return { kind: "html" };
    return { kind: "text" };
  }
  return { kind: "unknown" };
}

const OTHER_FORMATS: Partial<Record<SniffedKind, string>> = { gif: "GIF", tiff: "TIFF", bmp: "BMP" };
const NOT_IMAGES: Partial<Record<SniffedKind, string>> = {
  pdf: "a PDF document",
  zip: "a ZIP archive (or an Office document)",
  html: "a web page (HTML)",
  text: "plain text",
  unknown: "not any image format Tearline recognises",
};

/** The content type a HEIF-family file is stored under, from its brand. */
export function heifMime(brand: string | undefined): string {
  if (brand === "avif" || brand === "avis") return "image/avif";
  if (brand && brand.startsWith("he")) return "image/heic";
  return "image/heif";
}

/** The accepted kind of a file, or the refusal that names what it is and what to do instead. */
export function acceptedKind(buf: Uint8Array, fileName: string): AcceptedKind {
  const { kind } = sniffImage(buf);
  if (kind === "jpeg" || kind === "png" || kind === "webp" || kind === "heif") return kind;
  if (kind === "empty") throw refuse.empty(fileName);
  if (kind === "svg") throw refuse.vector(fileName);
  const other = OTHER_FORMATS[kind];
  if (other) throw refuse.unsupported(fileName, other);
  throw refuse.notAnImage(fileName, NOT_IMAGES[kind] ?? "not an image");
}
