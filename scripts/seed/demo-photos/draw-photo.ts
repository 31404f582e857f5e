// Draws one invented teardown photo: the part, the finding's damage, camera grain and the demo
// strip, as a 1200×900 JPEG with a few EXIF fields. The same spec always gives the same bytes.
import sharp from "sharp";
import { createRng } from "../prng";
import { applyFinish, drawFinish } from "./camera-finish";
import { captionStripSvg, STRIP_HEIGHT } from "./caption-strip";
import { sceneFor } from "./scene-for";
import { blurDefs, PHOTO_HEIGHT as H, PHOTO_WIDTH as W } from "./svg-kit";
import { surfaceDamage } from "./surface-damage";

export type PhotoView = "close" | "overview";

export type DemoPhotoSpec = {
  seed: number;
  caseNumber: string;
  component: string;
  row: "inboard" | "outboard" | null;
  damageCode: string;
  zone: string | null;
  severity: number;
  view: PhotoView;
  /** Words for the strip, e.g. "cup, outboard". */
  partWords: string;
  /** Camera time written to EXIF DateTimeOriginal (wall clock, read back as UTC). */
  takenAt?: Date | null;
};

/** The picture as SVG, before the camera finish: useful to look at and to test. */
export function demoPhotoSvg(spec: DemoPhotoSpec): string {
  const rng = createRng(spec.seed);
  const scene = sceneFor(rng, spec);
  // Heat tints everything near the source; other damage sits on the one surface the finding names.
  const targets = spec.damageCode === "heat.discoloration" ? scene.surfaces : scene.surfaces.slice(0, 1);
  const marks = targets.map((s) => surfaceDamage(spec.damageCode, rng, s, spec.severity)).join("");
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}">
<defs>${blurDefs([2, 3, 6])}${scene.defs}</defs>${scene.body}${marks}${scene.over ?? ""}</svg>`;
}

const exifTime = (d: Date) => d.toISOString().slice(0, 19).replace("T", " ").replace(/-/g, ":");

export async function drawDemoPhoto(spec: DemoPhotoSpec): Promise<Buffer> {
  const svg = demoPhotoSvg(spec);
  const { data, info } = await sharp(Buffer.from(svg)).flatten({ background: "#000" }).raw().toBuffer({ resolveWithObject: true });
  const rng = createRng(spec.seed ^ 0x5eed);
  applyFinish(data, info.width, info.height, info.channels, drawFinish(rng), rng);
  const strip = Buffer.from(captionStripSvg(W, spec.caseNumber, spec.partWords));
  const exif: Record<string, Record<string, string>> = {
    IFD0: {
      Orientation: "1",
      Make: "Tearline",
      Model: "Demo photo generator",
      Software: "tearline seed-demo",
      ImageDescription: `TEARLINE DEMO ${spec.caseNumber} - invented image, not evidence`,
    },
  };
  if (spec.takenAt) exif.IFD2 = { DateTimeOriginal: exifTime(spec.takenAt) };
  return sharp(data, { raw: { width: info.width, height: info.height, channels: info.channels } })
    .composite([{ input: strip, top: H - STRIP_HEIGHT, left: 0 }])
    .jpeg({ quality: 86 })
    .withExif(exif)
    .toBuffer();
}
