import { createHash } from "node:crypto";
import sharp from "sharp";
import exifReader from "exif-reader";
import { describe, expect, it } from "vitest";
import { processPhoto, sha256Hex, SCREEN_EDGE, THUMB_EDGE } from "@/lib/photos/process";
import { PhotoRefusal } from "@/lib/photos/refusal";
import { DEFAULT_MAX_BYTES, DEFAULT_MAX_PIXELS } from "@/lib/photos/limits";
import {
  avifPhoto,
  heicHeaderOnly,
  noisyJpeg,
  pixelAt,
  pixelBombPng,
  smallPng,
  svgDrawing,
  textAsJpeg,
  truncatedJpeg,
  twoToneJpeg,
} from "../../support/photo-files";

const limits = { maxBytes: DEFAULT_MAX_BYTES, maxPixels: DEFAULT_MAX_PIXELS };

async function refusal(p: Promise<unknown>): Promise<PhotoRefusal> {
  try {
    await p;
  } catch (err) {
    if (err instanceof PhotoRefusal) return err;
    throw err;
  }
  throw new Error("expected the file to be refused");
}

const isRed = ([r, g, b]: number[]) => r > 180 && g < 70 && b < 70;
const isBlue = ([r, g, b]: number[]) => b > 180 && r < 70 && g < 90;

describe("processPhoto", () => {
  it("turns the derivatives upright by the EXIF orientation", async () => {
    // EXIF Orientation 6 (CIPA DC-008 / EXIF 2.32): the stored image must be turned 90° clockwise
    // to display, so the stored left half (red) ends up on top of a portrait picture.
    const file = await twoToneJpeg({ width: 400, height: 200, orientation: 6 });
    const p = await processPhoto(file, "sideways.jpg", limits);
    expect([p.width, p.height]).toEqual([200, 400]);
    expect([p.screen.width, p.screen.height]).toEqual([200, 400]);
    expect(isRed(await pixelAt(p.screen.data, 100, 20))).toBe(true);
    expect(isBlue(await pixelAt(p.screen.data, 100, 380))).toBe(true);
    expect(isRed(await pixelAt(p.thumb.data, 80, 10))).toBe(true);
  });

  it("leaves GPS and all other metadata out of the derivatives but keeps the original byte for byte", async () => {
    const file = await twoToneJpeg({ gps: true, takenAt: "2026:03:14 09:26:53" });
    const original = exifReader((await sharp(file).metadata()).exif!);
    expect(original.GPSInfo?.GPSLatitude).toEqual([45, 30, 12]);
    const p = await processPhoto(file, "gps.jpg", limits);
    for (const d of [p.screen.data, p.thumb.data]) {
      const m = await sharp(d).metadata();
      expect(m.format).toBe("webp");
      expect(m.exif).toBeUndefined();
      expect(m.icc).toBeUndefined();
      expect(m.xmp).toBeUndefined();
    }
    expect(p.bytes).toBe(file.length);
    expect(p.sha256).toBe(createHash("sha256").update(file).digest("hex"));
  });

  it("reads the time taken from EXIF DateTimeOriginal as the camera's wall-clock time", async () => {
    const p = await processPhoto(await twoToneJpeg({ takenAt: "2026:03:14 09:26:53" }), "t.jpg", limits);
    expect(p.takenAt?.toISOString()).toBe("2026-03-14T09:26:53.000Z");
    const none = await processPhoto(await twoToneJpeg(), "n.jpg", limits);
    expect(none.takenAt).toBeNull();
  });

  it("gives a stable SHA-256 (FIPS 180-2 test vector and repeat runs)", async () => {
    // SHA-256("abc"), FIPS 180-2 appendix B.1.
    expect(sha256Hex(Buffer.from("abc"))).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    const file = await twoToneJpeg({ seed: 7 });
    const [a, b] = [await processPhoto(file, "a.jpg", limits), await processPhoto(Buffer.from(file), "b.jpg", limits)];
    expect(a.sha256).toBe(b.sha256);
  });

  it("scales large photos to the screen and thumbnail edges without enlarging small ones", async () => {
    const big = await processPhoto(await noisyJpeg(2400, 1800), "big.jpg", limits);
    expect([big.screen.width, big.screen.height]).toEqual([SCREEN_EDGE, 1200]);
    expect([big.thumb.width, big.thumb.height]).toEqual([THUMB_EDGE, 240]);
    const small = await processPhoto(await smallPng(), "small.png", limits);
    expect([small.screen.width, small.screen.height]).toEqual([64, 48]);
    expect(small.contentType).toBe("image/png");
  });

  it("decodes AVIF-coded HEIF where the installed sharp can", async () => {
    const p = await processPhoto(await avifPhoto(), "phone.avif", limits);
    expect([p.kind, p.contentType, p.width]).toEqual(["heif", "image/avif", 96]);
  });

  it("refuses each bad file with its own status", async () => {
    expect((await refusal(processPhoto(Buffer.alloc(0), "zero.jpg", limits))).status).toBe(400);
    expect((await refusal(processPhoto(textAsJpeg(), "notes.jpg", limits))).code).toBe("not-an-image");
    expect((await refusal(processPhoto(svgDrawing(), "d.svg", limits))).code).toBe("vector-drawing");
    const cut = await refusal(processPhoto(await truncatedJpeg(), "cut.jpg", limits));
    expect([cut.status, cut.code]).toEqual([422, "damaged"]);
    const heic = await refusal(processPhoto(heicHeaderOnly(), "IMG_0420.HEIC", limits));
    expect([heic.status, heic.code]).toEqual([415, "heic-undecodable"]);
    expect(heic.message).toMatch(/Most Compatible/);
  });

  it("refuses a decompression bomb from its header, before decoding it", async () => {
    const bomb = pixelBombPng(20_000); // 400 megapixels in under 100 KB
    expect(bomb.length).toBeLessThan(100_000);
    const started = performance.now();
    const r = await refusal(processPhoto(bomb, "bomb.png", limits));
    expect([r.status, r.code]).toEqual([413, "too-many-pixels"]);
    expect(r.message).toContain("is 400 megapixels; photos may be at most 110 megapixels");
    // Decoding 400 MP would take seconds and over 50 MB; reading the header takes milliseconds.
    expect(performance.now() - started).toBeLessThan(1000);
  });

  it("refuses a file over the byte limit before looking inside it", async () => {
    const r = await refusal(processPhoto(await twoToneJpeg(), "x.jpg", { maxBytes: 1000, maxPixels: DEFAULT_MAX_PIXELS }));
    expect([r.status, r.code]).toEqual([413, "too-large"]);
    expect(r.message).toMatch(/photos may be at most 1000 bytes/);
  });
});
