// The strip along the bottom of every demo photo that says it is invented, whose case it belongs to
// and which part it shows, so nobody takes it for evidence.
import { pixelTextPath, pixelTextWidth, GLYPH_HEIGHT } from "./pixel-font";
import { n } from "./svg-kit";

export const STRIP_HEIGHT = 38;
const SCALE = 3;
const NOTICE = "NOT EVIDENCE";

/** The words of the strip: "TEARLINE DEMO · TL-25-00033 · CUP, OUTBOARD". */
export function captionText(caseNumber: string, partWords: string): string {
  return `TEARLINE DEMO · ${caseNumber} · ${partWords}`.toUpperCase();
}

/** An SVG image of the strip, `width` wide, to lay over the bottom of the photo. */
export function captionStripSvg(width: number, caseNumber: string, partWords: string): string {
  const text = captionText(caseNumber, partWords);
  const top = Math.round((STRIP_HEIGHT - GLYPH_HEIGHT * SCALE) / 2);
  const hatch = 30;
  const noticeX = width - 14 - pixelTextWidth(NOTICE, SCALE);
  // The notice is left out when the caption is long enough to run into it.
  const roomForNotice = hatch + 14 + pixelTextWidth(text, SCALE) + 40 < noticeX;
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${STRIP_HEIGHT}">
<defs><pattern id="hatch" width="12" height="12" patternUnits="userSpaceOnUse" patternTransform="rotate(45)"><rect width="6" height="12" fill="#f2a516"/></pattern></defs>
<rect width="${width}" height="${STRIP_HEIGHT}" fill="#141414"/>
<rect width="${hatch}" height="${STRIP_HEIGHT}" fill="url(#hatch)"/>
<rect y="0" width="${width}" height="2" fill="#f2a516"/>
<path d="${pixelTextPath(text, hatch + 14, top, SCALE)}" fill="#f2a516"/>
${roomForNotice ? `<path d="${pixelTextPath(NOTICE, noticeX, top, SCALE)}" fill="#d9d9d9"/>` : ""}
<rect x="${n(width - 4)}" width="4" height="${STRIP_HEIGHT}" fill="#f2a516"/>
</svg>`;
}
