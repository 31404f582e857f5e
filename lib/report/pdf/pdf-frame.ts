// What every page carries: the title band (first page), a running head, the footer with the case
// number and page numbers, and on a draft the diagonal DRAFT mark.
import type PDFKit from "pdfkit";
import type { CaseReport } from "../types";
import { pdfText } from "./pdf-text";
import { AMBER, DANGER, FONT, INK, LINE, MUTED, OK, PAGE, SIZE, WARN } from "./pdf-style";

export const BAND_HEIGHT = 92;
const DRAFT_MARK = "DRAFT — NOT SIGNED";

export function drawTitleBand(doc: PDFKit.PDFDocument, r: CaseReport) {
  const { left, right } = PAGE.margin;
  doc.rect(0, 0, PAGE.width, BAND_HEIGHT).fill(INK);
  doc.rect(0, BAND_HEIGHT, PAGE.width, 3).fill(AMBER);
  doc.font(FONT.bold).fontSize(8).fillColor(AMBER).text("TEARLINE CASE REPORT", left, 24, { characterSpacing: 2.2, lineBreak: false });
  doc.font(FONT.bold).fontSize(24).fillColor("#ffffff").text(r.number, left, 38, { lineBreak: false });
  doc
    .font(FONT.regular)
    .fontSize(SIZE.small)
    .fillColor("#cbd5e1")
    .text(pdfText(`Generated ${r.generatedAt}`), left, 70, { lineBreak: false });

  // Revision pill on the right: green when signed, amber when a draft.
  const signed = r.revision.kind === "signed";
  const pill = signed ? "SIGNED REVISION" : "DRAFT";
  doc.font(FONT.bold).fontSize(8);
  const pillWidth = doc.widthOfString(pill, { characterSpacing: 1.2 }) + 20;
  const px = PAGE.width - right - pillWidth;
  doc.roundedRect(px, 26, pillWidth, 18, 9).fill(signed ? OK : AMBER);
  doc.fillColor(signed ? "#ffffff" : INK).text(pill, px + 10, 31.5, { characterSpacing: 1.2, lineBreak: false });
  const detail =
    signed && r.revision.kind === "signed"
      ? `Signed by ${r.revision.signedBy}\n${r.revision.signedAt}`
      : `Not signed · ${r.revision.kind === "draft" ? r.revision.stage : ""}`;
  doc
    .font(FONT.regular)
    .fontSize(SIZE.small)
    .fillColor("#e2e8f0")
    .text(pdfText(detail), PAGE.width - right - 220, 52, { width: 220, align: "right" });
  doc.x = left;
  doc.y = BAND_HEIGHT + 18;
}

export function drawRunningHead(doc: PDFKit.PDFDocument, r: CaseReport) {
  const { left, right, top } = PAGE.margin;
  const y = top - 22;
  doc
    .font(FONT.bold)
    .fontSize(SIZE.label)
    .fillColor(MUTED)
    .text(pdfText(`TEARLINE CASE REPORT · ${r.number}`), left, y, { characterSpacing: 1, lineBreak: false });
  const word = r.revision.kind === "signed" ? "Signed revision" : "Draft — not signed";
  doc
    .font(FONT.regular)
    .fontSize(SIZE.label)
    .fillColor(r.revision.kind === "signed" ? OK : WARN);
  doc.text(pdfText(word), PAGE.width - right - 200, y, { width: 200, align: "right", lineBreak: false });
  doc
    .moveTo(left, y + 11)
    .lineTo(PAGE.width - right, y + 11)
    .lineWidth(0.5)
    .strokeColor(LINE)
    .stroke();
  doc.x = left;
  doc.y = top;
}

/** Footers and the draft mark go on last, over every buffered page, once the page count is known. */
export function finishPages(doc: PDFKit.PDFDocument, r: CaseReport) {
  const { start, count } = doc.bufferedPageRange();
  const { left, right } = PAGE.margin;
  for (let i = start; i < start + count; i++) {
    doc.switchToPage(i);
    // Writing below the bottom margin would make pdfkit start a new page; lift the margin meanwhile.
    const savedBottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    const y = PAGE.height - 34;
    doc
      .moveTo(left, y - 8)
      .lineTo(PAGE.width - right, y - 8)
      .lineWidth(0.5)
      .strokeColor(LINE)
      .stroke();
    const revision = r.revision.kind === "signed" ? `Signed ${r.revision.signedAt}` : "Draft — not signed";
    doc.font(FONT.regular).fontSize(SIZE.small).fillColor(MUTED).text(pdfText(revision), left, y, { lineBreak: false });
    doc
      .font(FONT.bold)
      .fontSize(SIZE.small)
      .fillColor(INK)
      .text(pdfText(`${r.number} · page ${i - start + 1} of ${count}`), PAGE.width - right - 200, y, {
        width: 200,
        align: "right",
        lineBreak: false,
      });
    if (r.revision.kind === "draft") drawDraftMark(doc);
    doc.page.margins.bottom = savedBottom;
  }
}

function drawDraftMark(doc: PDFKit.PDFDocument) {
  const cx = PAGE.width / 2;
  const cy = PAGE.height / 2;
  doc.save();
  doc.rotate(-38, { origin: [cx, cy] });
  doc.font(FONT.bold).fontSize(60).fillColor(DANGER).fillOpacity(0.13);
  const w = doc.widthOfString(DRAFT_MARK);
  doc.text(pdfText(DRAFT_MARK), cx - w / 2, cy - 30, { lineBreak: false });
  doc.restore();
}
