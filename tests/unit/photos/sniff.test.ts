import { describe, expect, it } from "vitest";
import { acceptedKind, heifMime, sniffImage } from "@/lib/photos/sniff";
import { PhotoRefusal } from "@/lib/photos/refusal";
import {
  avifPhoto,
  heicHeaderOnly,
  pixelBombPng,
  smallPng,
  smallWebp,
  svgDrawing,
  textAsJpeg,
  twoToneJpeg,
} from "../../support/photo-files";

function refusalOf(fn: () => unknown): PhotoRefusal {
  try {
    fn();
  } catch (err) {
    if (err instanceof PhotoRefusal) return err;
    throw err;
  }
  throw new Error("expected a refusal");
}

describe("sniffImage judges by content", () => {
  // Magic numbers: JPEG SOI FF D8 FF (ITU T.81), PNG 8-byte signature (ISO/IEC 15948),
  // WebP "RIFF....WEBP" (RFC 9649), HEIF "ftyp" box with brand (ISO/IEC 23008-12).
  it("recognises JPEG, PNG, WebP and HEIF made by an encoder", async () => {
    expect(sniffImage(await twoToneJpeg()).kind).toBe("jpeg");
    expect(sniffImage(await smallPng()).kind).toBe("png");
    expect(sniffImage(await smallWebp()).kind).toBe("webp");
    expect(sniffImage(await avifPhoto())).toEqual({ kind: "heif", brand: "avif" });
    expect(sniffImage(heicHeaderOnly())).toEqual({ kind: "heif", brand: "heic" });
  });

  it("sees text, SVG, PDF and GIF for what they are whatever the file is called", () => {
    expect(sniffImage(textAsJpeg()).kind).toBe("text");
    expect(sniffImage(svgDrawing()).kind).toBe("svg");
    expect(sniffImage(Buffer.from("<svg xmlns='http://www.w3.org/2000/svg'/>")).kind).toBe("svg");
    expect(sniffImage(Buffer.from("%PDF-1.7\n%âãÏÓ\n")).kind).toBe("pdf");
    expect(sniffImage(Buffer.from("GIF89a\x01\x00\x01\x00", "latin1")).kind).toBe("gif");
    expect(sniffImage(Buffer.alloc(0)).kind).toBe("empty");
    expect(sniffImage(Buffer.from([0x00, 0x01, 0x02, 0xfe, 0x00, 0x10])).kind).toBe("unknown");
  });

  it("keeps a PNG a PNG even when it is a decompression bomb (the size is judged later)", () => {
    expect(sniffImage(pixelBombPng(1000)).kind).toBe("png");
  });

  it("names the HEIF content type by brand", () => {
    expect(heifMime("heic")).toBe("image/heic");
    expect(heifMime("avif")).toBe("image/avif");
    expect(heifMime("mif1")).toBe("image/heif");
  });
});

describe("acceptedKind refuses with a status and a message that says what to do", () => {
  it("refuses an empty file with 400", () => {
    const r = refusalOf(() => acceptedKind(Buffer.alloc(0), "IMG_0001.jpg"));
    expect([r.status, r.code]).toEqual([400, "empty"]);
    expect(r.message).toContain("“IMG_0001.jpg” is empty");
  });

  it("refuses renamed text with 415 and says it is text", () => {
    const r = refusalOf(() => acceptedKind(textAsJpeg(), "cup.jpg"));
    expect([r.status, r.code]).toEqual([415, "not-an-image"]);
    expect(r.message).toMatch(/plain text, whatever its name says/);
  });

  it("refuses SVG with 415 and asks for PNG or JPEG", () => {
    const r = refusalOf(() => acceptedKind(svgDrawing(), "sketch.svg"));
    expect([r.status, r.code]).toEqual([415, "vector-drawing"]);
    expect(r.message).toMatch(/export it as PNG or JPEG/);
  });

  it("refuses GIF as a format Tearline does not keep", () => {
    const r = refusalOf(() => acceptedKind(Buffer.from("GIF89a\x01\x00\x01\x00\x00\x00\x00", "latin1"), "a.gif"));
    expect([r.status, r.code]).toEqual([415, "unsupported-format"]);
  });

  it("accepts the four photo kinds", async () => {
    expect(acceptedKind(await twoToneJpeg(), "renamed.png")).toBe("jpeg");
    expect(acceptedKind(await smallPng(), "x")).toBe("png");
    expect(acceptedKind(await smallWebp(), "x")).toBe("webp");
    expect(acceptedKind(heicHeaderOnly(), "IMG_1234.HEIC")).toBe("heif");
  });
});
