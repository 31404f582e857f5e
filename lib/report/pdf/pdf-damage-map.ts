// The damage map drawn in vectors: inboard and outboard rows, cup band outside, cone band inside.
import type { CaseReport } from "../types";
import { bandPath, clockPoint, HOUR_TICKS } from "@/lib/damage-map/geometry";
import {
  offMapWords,
  READING_NOTE,
  RING_BANDS,
  RING_NAMES,
  ROW_NAMES,
  SEVERITY_COLOURS,
  SEVERITY_KEYS,
  severityColour,
} from "@/lib/damage-map/look";
import type { PdfWriter } from "./pdf-writer";
import { pdfText } from "./pdf-text";
import { ACCENT, FONT, INK, INK_2, LINE_STRONG, MUTED, SIZE } from "./pdf-style";

const R = 66;

function ringDiagram(w: PdfWriter, r: CaseReport, row: "inboard" | "outboard", cx: number, cy: number) {
  const { doc } = w;
  for (const ring of ["cup", "cone"] as const) {
    const [a, b] = RING_BANDS[ring];
    doc
      .path(bandPath(cx, cy, a * R, b * R, 0, 360))
      .fillColor("#f1f5f9")
      .fill("even-odd");
    doc
      .circle(cx, cy, a * R)
      .circle(cx, cy, b * R)
      .lineWidth(0.6)
      .strokeColor(LINE_STRONG)
      .stroke();
  }
  for (const arc of r.damageArcs.filter((x) => x.row === row)) {
    const [a, b] = RING_BANDS[arc.ring];
    doc
      .path(bandPath(cx, cy, a * R, b * R, arc.startDeg, arc.endDeg))
      .fillColor(severityColour(arc.severity))
      .fillOpacity(0.92)
      .fill();
    doc.fillOpacity(1);
  }
  // Hour ticks; 12, 3, 6 and 9 labelled.
  for (const t of HOUR_TICKS) {
    const [x0, y0] = clockPoint(cx, cy, R * 0.98, t.deg);
    const [x1, y1] = clockPoint(cx, cy, R * (t.major ? 1.07 : 1.03), t.deg);
    doc.moveTo(x0, y0).lineTo(x1, y1).lineWidth(0.6).strokeColor(MUTED).stroke();
    if (t.major) {
      const [lx, ly] = clockPoint(cx, cy, R * 1.17, t.deg);
      doc
        .font(FONT.bold)
        .fontSize(SIZE.label)
        .fillColor(INK_2)
        .text(t.label, lx - 8, ly - 3.5, { width: 16, align: "center", lineBreak: false });
    }
  }
  // The load zone sits at the top of the cup.
  doc
    .font(FONT.regular)
    .fontSize(6)
    .fillColor(ACCENT)
    .text("load zone", cx + 7, cy - R * 1.2 - 1, { lineBreak: false });
  // Ring names at 6 o'clock, where the unloaded rollers run and damage is least often drawn.
  doc
    .font(FONT.bold)
    .fontSize(6)
    .fillColor(INK_2)
    .text(RING_NAMES.cup, cx - 20, cy + R * 0.85 - 2.5, { width: 40, align: "center", lineBreak: false });
  doc.text(RING_NAMES.cone, cx - 20, cy + R * 0.53 - 2.5, { width: 40, align: "center", lineBreak: false });
  doc
    .font(FONT.regular)
    .fontSize(6.5)
    .fillColor(MUTED)
    .text(row === "inboard" ? "INBOARD" : "OUTBOARD", cx - 30, cy - 3, {
      width: 60,
      align: "center",
      lineBreak: false,
      characterSpacing: 0.6,
    });
  doc
    .font(FONT.bold)
    .fontSize(SIZE.h3)
    .fillColor(INK)
    .text(ROW_NAMES[row], cx - 60, cy + R * 1.28, { width: 120, align: "center", lineBreak: false });
}

export function drawDamageMap(w: PdfWriter, r: CaseReport) {
  const { doc } = w;
  const height = 2 * R * 1.25 + 26;
  w.ensure(height + 10);
  const top = doc.y + 4;
  const cy = top + R * 1.25;
  ringDiagram(w, r, "inboard", w.left + 90, cy);
  ringDiagram(w, r, "outboard", w.left + 270, cy);

  // Legend and reading notes on the right.
  const lx = w.left + 378;
  let ly = top + 6;
  doc.font(FONT.bold).fontSize(SIZE.label).fillColor(MUTED).text("SEVERITY", lx, ly, { characterSpacing: 0.4, lineBreak: false });
  ly += 12;
  SEVERITY_COLOURS.forEach((colour, i) => {
    doc.rect(lx, ly, 14, 7).fill(colour);
    doc
      .font(FONT.regular)
      .fontSize(SIZE.small)
      .fillColor(INK_2)
      .text(SEVERITY_KEYS[i], lx + 20, ly - 0.5, { lineBreak: false });
    ly += 12;
  });
  ly += 6;
  const reading = [
    READING_NOTE,
    "Each arc is centred on the recorded clock position; a finding without an extent shows as a short mark.",
    offMapWords(r.offMap),
  ];
  for (const line of reading) {
    doc
      .font(FONT.regular)
      .fontSize(SIZE.small)
      .fillColor(MUTED)
      .text(pdfText(line), lx, ly, { width: w.left + w.width - lx, lineGap: 1 });
    ly = doc.y + 4;
  }
  if (r.damageArcs.length === 0) {
    doc
      .font(FONT.italic)
      .fontSize(SIZE.body)
      .fillColor(MUTED)
      .text("No raceway damage recorded.", w.left + 120, top + height - 4, { lineBreak: false });
  }
  doc.x = w.left;
  doc.y = Math.max(top + height, ly) + 6;
  doc.fillColor(INK);
}
