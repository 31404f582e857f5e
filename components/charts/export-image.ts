// Turns a chart's SVG into a PNG in the browser: styles are copied inline (so theme colours and
// fonts survive outside the page), then the SVG is drawn on a canvas with a title and legend.
const STYLE_PROPS = [
  "fill",
  "fill-opacity",
  "stroke",
  "stroke-width",
  "stroke-opacity",
  "stroke-dasharray",
  "opacity",
  "font-family",
  "font-size",
  "font-weight",
  "letter-spacing",
  "text-anchor",
  "dominant-baseline",
  "visibility",
  "display",
];

function inlineStyles(source: Element, target: Element): void {
  const computed = getComputedStyle(source);
  const style = (target as SVGElement).style;
  for (const prop of STYLE_PROPS) style.setProperty(prop, computed.getPropertyValue(prop));
  const from = source.children;
  const to = target.children;
  for (let i = 0; i < from.length && i < to.length; i++) inlineStyles(from[i], to[i]);
}

function loadImage(src: string): Promise<HTMLImageElement> {
  return new Promise((resolve, reject) => {
    const img = new Image();
    img.onload = () => resolve(img);
    img.onerror = () => reject(new Error("The chart could not be drawn as an image."));
    img.src = src;
  });
}

export type ImageLegend = { label: string; colour: string }[];

export async function svgToPngBlob(
  svg: SVGSVGElement,
  opts: { title: string; subtitle?: string; legend?: ImageLegend; scale?: number },
): Promise<Blob> {
  const box = svg.getBoundingClientRect();
  const width = Math.max(1, Math.round(box.width));
  const height = Math.max(1, Math.round(box.height));
  const clone = svg.cloneNode(true) as SVGSVGElement;
  inlineStyles(svg, clone);
  clone.setAttribute("xmlns", "http://www.w3.org/2000/svg");
  clone.setAttribute("width", String(width));
  clone.setAttribute("height", String(height));
  const xml = new XMLSerializer().serializeToString(clone);
  const img = await loadImage(`data:image/svg+xml;charset=utf-8,${encodeURIComponent(xml)}`);

  const page = getComputedStyle(document.documentElement);
  const colour = (name: string, fallback: string) => page.getPropertyValue(name).trim() || fallback;
  const pad = 24;
  const header = opts.subtitle ? 64 : 44;
  const measure = document.createElement("canvas").getContext("2d");
  if (measure) measure.font = "12px Inter, system-ui, sans-serif";
  const legend = layoutLegend(
    (opts.legend ?? []).map((l) => 18 + (measure?.measureText(l.label).width ?? l.label.length * 7)),
    width,
  );
  const legendRows = legend.length ? legend[legend.length - 1].row + 1 : 0;
  const footer = legendRows * 22 + 28;
  const scale = opts.scale ?? 2;
  const canvas = document.createElement("canvas");
  canvas.width = (width + pad * 2) * scale;
  canvas.height = (height + header + footer) * scale;
  const ctx = canvas.getContext("2d");
  if (!ctx) throw new Error("This browser cannot draw images.");
  ctx.scale(scale, scale);
  ctx.fillStyle = colour("--surface", "#ffffff");
  ctx.fillRect(0, 0, width + pad * 2, height + header + footer);
  ctx.fillStyle = colour("--ink", "#0f172a");
  ctx.font = "600 16px Inter, system-ui, sans-serif";
  ctx.fillText(opts.title, pad, 30);
  if (opts.subtitle) {
    ctx.fillStyle = colour("--muted", "#64748b");
    ctx.font = "12px Inter, system-ui, sans-serif";
    ctx.fillText(opts.subtitle, pad, 50);
  }
  ctx.drawImage(img, pad, header, width, height);
  ctx.font = "12px Inter, system-ui, sans-serif";
  opts.legend?.forEach((item, i) => {
    const x = pad + legend[i].x;
    const y = header + height + 16 + legend[i].row * 22;
    ctx.fillStyle = item.colour;
    ctx.fillRect(x, y - 9, 12, 10);
    ctx.fillStyle = colour("--ink-2", "#334155");
    ctx.fillText(item.label, x + 18, y);
  });
  ctx.fillStyle = colour("--muted", "#64748b");
  ctx.font = "11px Inter, system-ui, sans-serif";
  ctx.fillText(`Tearline · ${new Date().toISOString().slice(0, 10)}`, pad, height + header + footer - 10);
  return new Promise((resolve, reject) => canvas.toBlob((b) => (b ? resolve(b) : reject(new Error("PNG encoding failed."))), "image/png"));
}

/**
 * Legend entries laid out left to right, each as wide as its words, wrapping before an entry
 * would pass the image's width, so no two entries ever print on top of each other.
 */
export function layoutLegend(widths: readonly number[], maxWidth: number, gap = 16): { x: number; row: number }[] {
  const out: { x: number; row: number }[] = [];
  let x = 0;
  let row = 0;
  for (const w of widths) {
    if (x > 0 && x + w > maxWidth) {
      x = 0;
      row++;
    }
    out.push({ x, row });
    x += w + gap;
  }
  return out;
}

export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = url;
  a.download = fileName;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
