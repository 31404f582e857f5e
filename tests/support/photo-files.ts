// Image files made on the spot for the photo tests: real encodings from sharp, plus the bad files
// people actually send (empty, cut short, renamed text, SVG, a decompression bomb).
import { deflateSync } from "node:zlib";
import sharp from "sharp";

export const GPS_EXIF = { GPSLatitudeRef: "N", GPSLatitude: "45/1 30/1 12/1", GPSLongitudeRef: "W", GPSLongitude: "73/1 34/1 5/1" };
export const TAKEN_AT_EXIF = "2026:03:14 09:26:53";

/** Left half red, right half blue, so a rotation shows in which half ends up on top. */
export async function twoToneJpeg(
  opts: { width?: number; height?: number; orientation?: number; gps?: boolean; takenAt?: string; seed?: number } = {},
) {
  const width = opts.width ?? 400;
  const height = opts.height ?? 200;
  const half = Math.floor(width / 2);
  const left = await sharp({ create: { width: half, height, channels: 3, background: { r: 220, g: 20, b: 20 } } })
    .png()
    .toBuffer();
  // A seed colours a corner block so each seed makes a file with its own digest.
  const seed = opts.seed ?? 0;
  const dot = await sharp({
    create: { width: 8, height: 8, channels: 3, background: { r: (seed * 53) % 256, g: (seed * 101) % 256, b: (seed * 29) % 256 } },
  })
    .png()
    .toBuffer();
  let img = sharp({ create: { width, height, channels: 3, background: { r: 20, g: 40, b: 220 } } })
    .composite([
      { input: left, left: 0, top: 0 },
      { input: dot, left: width - 8, top: height - 8 },
    ])
    .jpeg({ quality: 92 });
  const exif: Record<string, Record<string, string>> = { IFD0: { Make: "TestCam", Model: "Bench 1" } };
  if (opts.takenAt) exif.IFD2 = { DateTimeOriginal: opts.takenAt };
  if (opts.gps) exif.IFD3 = GPS_EXIF;
  img = img.withExif(exif);
  if (opts.orientation) img = img.withMetadata({ orientation: opts.orientation });
  return img.toBuffer();
}

/** A photo-like JPEG: noise so it compresses like a real photograph (12 MP ≈ 6–9 MB). */
export async function noisyJpeg(width = 4000, height = 3000, quality = 88): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: "#000", noise: { type: "gaussian", mean: 120, sigma: 45 } } })
    .jpeg({ quality })
    .toBuffer();
}

export async function smallPng(seed = 1): Promise<Buffer> {
  return sharp({ create: { width: 64, height: 48, channels: 4, background: { r: seed % 256, g: 90, b: 160, alpha: 1 } } })
    .png()
    .toBuffer();
}

export async function smallWebp(seed = 1): Promise<Buffer> {
  return sharp({ create: { width: 64, height: 48, channels: 3, background: { r: 30, g: seed % 256, b: 60 } } })
    .webp()
    .toBuffer();
}

/** A JPEG with its second half missing, as a broken transfer leaves it. */
export async function truncatedJpeg(): Promise<Buffer> {
  const whole = await noisyJpeg(800, 600);
  return whole.subarray(0, Math.floor(whole.length / 2));
}

export const textAsJpeg = () => Buffer.from("Cup raceway looked fine, see notes.\nThis is a text file renamed to .jpg\n");

export const svgDrawing = () =>
  Buffer.from(
    '<?xml version="1.0"?>\n<svg xmlns="http://www.w3.org/2000/svg" width="200" height="100"><circle cx="50" cy="50" r="40"/></svg>',
  );

function pngChunk(type: string, data: Buffer): Buffer {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, "latin1"), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([len, body, crc]);
}

function crc32(buf: Buffer): number {
  let c = ~0;
  for (const b of buf) {
    c ^= b;
    for (let k = 0; k < 8; k++) c = (c >>> 1) ^ (0xedb88320 & -(c & 1));
  }
  return ~c >>> 0;
}

/** A valid 1-bit greyscale PNG of side×side pixels that is tiny on disk: a decompression bomb. */
export function pixelBombPng(side = 20_000): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(side, 0);
  ihdr.writeUInt32BE(side, 4);
  ihdr[8] = 1; // bit depth
  ihdr[9] = 0; // greyscale
  const rowBytes = 1 + Math.ceil(side / 8); // filter byte + packed pixels
  const idat = deflateSync(Buffer.alloc(rowBytes * side), { level: 9 });
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([signature, pngChunk("IHDR", ihdr), pngChunk("IDAT", idat), pngChunk("IEND", Buffer.alloc(0))]);
}

/** The start of an HEVC-coded HEIC file (as iPhones write) with no decodable image in it. */
export function heicHeaderOnly(): Buffer {
  const ftyp = Buffer.concat([
    Buffer.from([0, 0, 0, 24]),
    Buffer.from("ftypheic", "latin1"),
    Buffer.alloc(4),
    Buffer.from("mif1heic", "latin1"),
  ]);
  return Buffer.concat([ftyp, Buffer.alloc(2048, 0x11)]);
}

/** A one-colour AVIF (an AV1-coded HEIF), which the bundled libvips can decode. */
export async function avifPhoto(): Promise<Buffer> {
  return sharp({ create: { width: 96, height: 64, channels: 3, background: { r: 90, g: 120, b: 40 } } })
    .heif({ compression: "av1" })
    .toBuffer();
}

/** The colour of the pixel at (x, y) of an image, as [r, g, b]. */
export async function pixelAt(image: Buffer, x: number, y: number): Promise<[number, number, number]> {
  const { data, info } = await sharp(image).raw().toBuffer({ resolveWithObject: true });
  const i = (y * info.width + x) * info.channels;
  return [data[i], data[i + 1], data[i + 2]];
}

/** A photo-like picture of a ring raceway with a dark pit on it, for screenshots (drawn, then JPEG). */
export async function racewayJpeg(seed: number, opts: { width?: number; height?: number; takenAt?: string } = {}): Promise<Buffer> {
  const w = opts.width ?? 1600;
  const h = opts.height ?? 1200;
  const hue = 200 + ((seed * 17) % 40);
  const pitX = 0.3 + ((seed * 37) % 40) / 100;
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${h}">
    <defs>
      <linearGradient id="bg" x1="0" y1="0" x2="1" y2="1"><stop offset="0" stop-color="hsl(${hue},8%,18%)"/><stop offset="1" stop-color="hsl(${hue},10%,8%)"/></linearGradient>
      <linearGradient id="steel" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#d9dde2"/><stop offset="0.45" stop-color="#8e959d"/><stop offset="0.55" stop-color="#b8bec5"/><stop offset="1" stop-color="#5d646c"/></linearGradient>
      <radialGradient id="pit"><stop offset="0" stop-color="#1d1a17"/><stop offset="0.7" stop-color="#4a3f35"/><stop offset="1" stop-color="#7b7168" stop-opacity="0"/></radialGradient>
    </defs>
    <rect width="100%" height="100%" fill="url(#bg)"/>
    <ellipse cx="${w / 2}" cy="${h * 0.55}" rx="${w * 0.44}" ry="${h * 0.3}" fill="url(#steel)"/>
    <ellipse cx="${w / 2}" cy="${h * 0.55}" rx="${w * 0.3}" ry="${h * 0.18}" fill="url(#bg)"/>
    <ellipse cx="${w * pitX}" cy="${h * 0.32}" rx="${w * 0.05}" ry="${h * 0.035}" fill="url(#pit)"/>
    <ellipse cx="${w * (pitX + 0.04)}" cy="${h * 0.34}" rx="${w * 0.025}" ry="${h * 0.02}" fill="url(#pit)"/>
  </svg>`;
  const base = await sharp(Buffer.from(svg)).jpeg({ quality: 85 }).toBuffer();
  // Fine grain, like a real sensor, so files are photo-sized.
  const grain = await sharp({
    create: { width: w, height: h, channels: 3, background: "#000", noise: { type: "gaussian", mean: 128, sigma: 10 } },
  })
    .png()
    .toBuffer();
  return sharp(base)
    .composite([{ input: grain, blend: "overlay" }])
    .jpeg({ quality: 88 })
    .withExif({
      IFD0: { Make: "TestCam" },
      IFD2: {
        DateTimeOriginal:
          opts.takenAt ?? `2026:05:${String(10 + (seed % 18)).padStart(2, "0")} 10:${String(seed % 60).padStart(2, "0")}:00`,
      },
    })
    .toBuffer();
}
