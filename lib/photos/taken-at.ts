// When the photo was taken, from EXIF DateTimeOriginal (else DateTimeDigitized).
// EXIF keeps the camera's wall-clock time without a zone; we store that wall-clock reading as
// if it were UTC, so every screen shows the time the camera showed (format it with timeZone "UTC").
import exifReader from "exif-reader";

const EARLIEST = Date.UTC(1990, 0, 1);

function plausible(value: unknown, now: Date): Date | null {
  if (!(value instanceof Date) || Number.isNaN(value.getTime())) return null;
  const t = value.getTime();
  // A camera with an unset clock says 1970 or 2000-01-01; a future date is a wrong clock too.
  if (t < EARLIEST || t > now.getTime() + 36 * 3600_000) return null;
  return value;
}

/** The camera time in an EXIF block (as sharp's metadata().exif returns it), or null. */
export function takenAtFromExif(exif: Buffer | undefined, now = new Date()): Date | null {
  if (!exif || exif.length < 8) return null;
  try {
    const tags = exifReader(exif);
    return plausible(tags.Photo?.DateTimeOriginal, now) ?? plausible(tags.Photo?.DateTimeDigitized, now);
  } catch {
    return null; // a malformed EXIF block is no reason to refuse the photo
  }
}
