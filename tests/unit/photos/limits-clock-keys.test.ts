import { describe, expect, it } from "vitest";
import { DEFAULT_MAX_BYTES, DEFAULT_MAX_PIXELS, formatBytes, formatMegapixels, photoLimits } from "@/lib/photos/limits";
import { degToOClock, oClockToDeg } from "@/lib/photos/clock";
import { parsePhotoKey, photoKeys } from "@/lib/photos/keys";

describe("photo limits", () => {
  it("default to 25 MB per file and 110 megapixels per image", () => {
    // 25 MB default per file: the product's stated limit; 1 MB = 1024² bytes (common practice).
    expect(photoLimits({})).toEqual({ maxBytes: 26_214_400, maxPixels: 110_000_000 });
    expect(DEFAULT_MAX_BYTES).toBe(25 * 1024 * 1024);
    expect(DEFAULT_MAX_PIXELS).toBe(110_000_000);
  });

  it("read PHOTO_MAX_BYTES and PHOTO_MAX_PIXELS and refuse nonsense", () => {
    expect(photoLimits({ PHOTO_MAX_BYTES: "1048576", PHOTO_MAX_PIXELS: "4000000" })).toEqual({ maxBytes: 1_048_576, maxPixels: 4_000_000 });
    expect(() => photoLimits({ PHOTO_MAX_BYTES: "25MB" })).toThrow(/PHOTO_MAX_BYTES must be a positive whole number/);
    expect(() => photoLimits({ PHOTO_MAX_PIXELS: "-1" })).toThrow(/PHOTO_MAX_PIXELS/);
  });

  it("print sizes the way the messages use them", () => {
    expect(formatBytes(26_214_400)).toBe("25 MB");
    expect(formatBytes(1_468_006)).toBe("1.4 MB");
    expect(formatBytes(2048)).toBe("2 KB");
    expect(formatMegapixels(12_000_000)).toBe("12 megapixels");
    expect(formatMegapixels(400_000_000)).toBe("400 megapixels");
  });
});

describe("clock positions", () => {
  // A clock face has 12 hours over 360°, 30° per hour, 12 o'clock at 0° (common practice).
  it("converts o'clock to degrees and back", () => {
    expect(oClockToDeg(12)).toBe(0);
    expect(oClockToDeg(3)).toBe(90);
    expect(oClockToDeg(6)).toBe(180);
    expect(oClockToDeg(9)).toBe(270);
    expect(degToOClock(95)).toBe(3);
    expect(degToOClock(350)).toBe(12);
    expect(() => oClockToDeg(13)).toThrow(RangeError);
  });
});

describe("object keys", () => {
  const caseId = "0f8fad5b-d9cb-469f-a165-70867728950e";
  // SHA-256 of "abc", FIPS 180-2 appendix B.1.
  const sha = "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad";

  it("lay out a case folder per digest", () => {
    expect(photoKeys(caseId, sha)).toEqual({
      original: `cases/${caseId}/${sha}/original`,
      screen: `cases/${caseId}/${sha}/screen.webp`,
      thumb: `cases/${caseId}/${sha}/thumb.webp`,
    });
    expect(parsePhotoKey(`cases/${caseId}/${sha}/thumb.webp`)).toEqual({ caseId, sha256: sha, name: "thumb.webp" });
  });

  it("refuse ids that could escape the folder and ignore foreign keys", () => {
    expect(() => photoKeys("../other", sha)).toThrow(/not a case id/);
    expect(() => photoKeys(caseId, "abc")).toThrow(/SHA-256/);
    expect(parsePhotoKey("exports/report.pdf")).toBeNull();
    expect(parsePhotoKey(`cases/${caseId}/${sha}`)).toBeNull();
  });
});
