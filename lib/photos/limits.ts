// How large a photo may be. Bytes bound the upload; pixels bound the decode, so a small file
// that claims a gigantic image (a decompression bomb) is refused from its header alone.

/** 25 MiB: a full-resolution phone or DSLR JPEG is 3–15 MB (common practice). */
export const DEFAULT_MAX_BYTES = 25 * 1024 * 1024;
/** 110 megapixels: room for 108 MP phone sensors; one decoded RGB frame stays near 330 MB. */
export const DEFAULT_MAX_PIXELS = 110_000_000;
/** Room for the multipart boundaries and tag fields around the file itself. */
export const FORM_OVERHEAD_BYTES = 64 * 1024;

export type PhotoLimits = { maxBytes: number; maxPixels: number };

function positiveInt(raw: string | undefined, fallback: number, name: string): number {
  if (raw === undefined || raw.trim() === "") return fallback;
  const n = Number(raw);
  if (!Number.isSafeInteger(n) || n <= 0) throw new Error(`${name} must be a positive whole number, not "${raw}".`);
  return n;
}

/** Limits from the environment (PHOTO_MAX_BYTES, PHOTO_MAX_PIXELS), else the defaults. */
export function photoLimits(source: Record<string, string | undefined> = process.env): PhotoLimits {
  return {
    maxBytes: positiveInt(source.PHOTO_MAX_BYTES, DEFAULT_MAX_BYTES, "PHOTO_MAX_BYTES"),
    maxPixels: positiveInt(source.PHOTO_MAX_PIXELS, DEFAULT_MAX_PIXELS, "PHOTO_MAX_PIXELS"),
  };
}

/** "25 MB", "1.4 MB", "820 KB": sizes in the words the refusal messages use (1 MB = 1024² bytes). */
export function formatBytes(bytes: number): string {
  if (bytes >= 1024 * 1024) {
    const mb = bytes / (1024 * 1024);
    return `${mb >= 10 || Number.isInteger(mb) ? Math.round(mb) : mb.toFixed(1)} MB`;
  }
  if (bytes >= 1024) return `${Math.round(bytes / 1024)} KB`;
  return `${bytes} bytes`;
}

/** "110 megapixels", "12.2 megapixels". */
export function formatMegapixels(pixels: number): string {
  const mp = pixels / 1_000_000;
  return `${mp >= 100 || Number.isInteger(mp) ? Math.round(mp) : mp.toFixed(1)} megapixels`;
}
