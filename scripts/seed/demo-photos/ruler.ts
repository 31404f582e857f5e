// A steel rule laid beside the damage, as lab photos have, so the size can be read.
import type { Rng } from "../prng";
import { pixelTextPath, pixelTextWidth } from "./pixel-font";
import { n } from "./svg-kit";

/** A rule `mm` long at `pxPerMm`, its top-left corner near (x, y), turned a little. */
export function steelRule(rng: Rng, x: number, y: number, pxPerMm: number, mm: number): string {
  const len = mm * pxPerMm,
    h = 15 * pxPerMm * 0.1 + 34;
  let ticks = "",
    labels = "";
  for (let i = 0; i <= mm; i++) {
    const tick = i % 10 === 0 ? 18 : i % 5 === 0 ? 12 : 7;
    ticks += `M${n(10 + i * pxPerMm)} 0v${tick}`;
    if (i % 10 === 0 && i > 0) labels += pixelTextPath(String(i), 10 + i * pxPerMm - pixelTextWidth(String(i), 2) / 2, 21, 2);
  }
  return `<g transform="translate(${n(x)} ${n(y)}) rotate(${n(rng.real(-2.5, 2.5))})">
<rect x="4" y="8" width="${n(len + 34)}" height="${n(h)}" fill="#000" opacity="0.45" filter="url(#blur3)"/>
<rect width="${n(len + 34)}" height="${n(h)}" rx="2" fill="url(#rule)"/>
<path d="${ticks}" stroke="#16181a" stroke-width="1.4"/><path d="${labels}" fill="#16181a"/>
<path d="${pixelTextPath("MM", len - 16, h - 16, 2)}" fill="#16181a"/></g>
<defs><linearGradient id="rule" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#e2e5e8"/><stop offset="0.5" stop-color="#b7bcc0"/><stop offset="1" stop-color="#8d9296"/></linearGradient></defs>`;
}
