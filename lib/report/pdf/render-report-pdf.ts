// The case report as a PDF, in Tearline's own layout. Images are JPEG or PNG bytes keyed by photo id.
import PDFDocument from "pdfkit";
import type { CaseReport, ComponentSection, ReportPhoto } from "../types";
import { drawDamageMap } from "./pdf-damage-map";
import { drawRunningHead, drawTitleBand, finishPages } from "./pdf-frame";
import { pdfText } from "./pdf-text";
import { DANGER, DANGER_SOFT, FONT, INK, LINE_STRONG, MUTED, OK, OK_SOFT, PAGE, SIZE, SURFACE_2, WARN, WARN_SOFT } from "./pdf-style";
import { PdfWriter } from "./pdf-writer";
import { bytesWords } from "../format";
import { SAFETY_FLAG_DEFERRAL, SAFETY_FLAG_TITLE } from "@/lib/cases/safety-flag";

export type PhotoImages = Map<string, Buffer>;

function thumbnails(w: PdfWriter, photos: ReportPhoto[], images: PhotoImages) {
  const { doc } = w;
  const perRow = 4;
  const gap = 10;
  const cell = (w.width - (perRow - 1) * gap) / perRow;
  const imgH = cell * 0.75;
  for (let i = 0; i < photos.length; i += perRow) {
    w.ensure(imgH + 30);
    const y = doc.y;
    photos.slice(i, i + perRow).forEach((p, j) => {
      const x = w.left + j * (cell + gap);
      doc.rect(x, y, cell, imgH).fill(SURFACE_2);
      const img = images.get(p.id);
      if (img) {
        try {
          doc.image(img, x, y, { fit: [cell, imgH], align: "center", valign: "center" });
        } catch {
          doc
            .font(FONT.italic)
            .fontSize(SIZE.small)
            .fillColor(MUTED)
            .text("Image could not be drawn", x, y + imgH / 2 - 4, { width: cell, align: "center" });
        }
      } else {
        doc
          .font(FONT.italic)
          .fontSize(SIZE.small)
          .fillColor(MUTED)
          .text("Image not available", x, y + imgH / 2 - 4, { width: cell, align: "center" });
      }
      doc.rect(x, y, cell, imgH).lineWidth(0.5).strokeColor(LINE_STRONG).stroke();
      doc
        .font(FONT.bold)
        .fontSize(SIZE.small)
        .fillColor(INK)
        .text(`Photo ${p.number}`, x, y + imgH + 4, { width: cell, lineBreak: false });
      doc
        .font(FONT.regular)
        .fontSize(SIZE.small)
        .fillColor(MUTED)
        .text(pdfText(p.caption), x, y + imgH + 13, { width: cell, height: 18, ellipsis: true });
    });
    doc.x = w.left;
    doc.y = y + imgH + 34;
  }
}

function componentBlock(w: PdfWriter, c: ComponentSection, images: PhotoImages) {
  // Keep a part's heading, findings and first row of photos on one page when they fit on one.
  const tableHeight = c.findings.length ? 15 + c.findings.length * 34 : 14;
  const photoRow = c.photos.length ? (w.width / 4) * 0.75 + 34 : 0;
  const together = 18 + tableHeight + photoRow;
  w.subheading(`${c.label}${c.disposition ? `  ·  disposition: ${c.disposition}` : ""}`, together < 320 ? together : 60);
  if (c.findings.length) {
    w.table(
      [
        { title: "Damage", width: 128 },
        { title: "Severity", width: 78 },
        { title: "Where", width: 118 },
        { title: "Size", width: 58 },
        { title: "Notes", width: w.width - 382 },
      ],
      c.findings.map((f) => [
        `${f.damage}${f.isoMode ? `\nISO 15243: ${f.isoMode}` : ""}`,
        f.severityLabel,
        f.where,
        f.size,
        [f.notes, f.photoNumbers.length ? `Photo ${f.photoNumbers.join(", ")}` : ""].filter(Boolean).join("\n") || "—",
      ]),
      { size: 8 },
    );
  } else {
    w.muted("No damage recorded on this part.");
    w.gap(4);
  }
  if (c.photos.length) thumbnails(w, c.photos, images);
}

function fieldChecks(w: PdfWriter, r: CaseReport) {
  const f = r.field;
  if (f.handRoll) {
    w.subheading("Hand roll");
    w.table(
      [
        { title: "Axle position", width: 120 },
        { title: "Cup pulled outboard", width: 198 },
        { title: "Cup pushed inboard", width: w.width - 318 },
      ],
      f.handRoll.grid,
    );
    w.facts([...f.handRoll.procedure, ["Result", f.handRoll.result]], 4);
  } else w.muted("No hand roll recorded.");
  w.gap(4);
  if (f.endPlay) {
    const ep = f.endPlay;
    w.subheading("Mounted end play", 90);
    w.muted(`${ep.method}. ${ep.unitNote}.`);
    w.gap(3);
    w.table(
      [
        { title: "Trial", width: 50, align: "center" },
        { title: "Zero", width: 100, align: "right" },
        { title: "Reading", width: 100, align: "right" },
        { title: "End play (in)", width: 133, align: "right" },
        { title: "End play (mm)", width: w.width - 383, align: "right" },
      ],
      ep.trials.map((t) => [String(t.trial), t.zero, t.reading, t.endPlayIn, t.endPlayMm]),
    );
    if (ep.arithmetic.length)
      w.table(
        [
          { title: "Arithmetic", width: 150 },
          { title: "Value", width: w.width - 150 },
        ],
        ep.arithmetic.map(([k, v]) => [k, v]),
      );
    w.paragraph(`End-play call: ${ep.call}`, { font: FONT.bold, colour: ep.removes ? DANGER : INK });
    w.gap(3);
  } else w.muted("End play was not measured.");
  w.gap(4);
  if (f.visual.length) {
    w.subheading("Visual findings");
    w.table(
      [
        { title: "Finding", width: 180 },
        { title: "Note", width: w.width - 180 },
      ],
      f.visual,
    );
  }
  w.subheading("Before the checks");
  w.facts(f.confirmations, 4);
  if (f.safetyFlag.length) {
    w.gap(2);
    w.callout(SAFETY_FLAG_TITLE, `${f.safetyFlag.map((t) => `Not confirmed: ${t}`).join(" ")} ${SAFETY_FLAG_DEFERRAL}`, {
      fill: WARN_SOFT,
      ink: WARN,
    });
  }
  const tone =
    f.call.call === "remove"
      ? { fill: DANGER_SOFT, ink: DANGER }
      : f.call.call === "keep"
        ? { fill: OK_SOFT, ink: OK }
        : { fill: WARN_SOFT, ink: WARN };
  w.gap(2);
  w.callout(
    `Field call: ${f.call.label}`,
    f.storedCallDiffers
      ? `The call stored with the case was "${f.storedCallDiffers}"; the checks as recorded now give the call above.`
      : "Recomputed from the readings above.",
    tone,
  );
  w.notes(f.call.reasons);
  if (f.notes) {
    w.gap(4);
    w.paragraph(`Shop notes: ${f.notes}`, { colour: INK });
  }
}

export function renderReportPdf(r: CaseReport, images: PhotoImages = new Map()): Promise<Buffer> {
  const doc = new PDFDocument({
    size: PAGE.size,
    margins: PAGE.margin,
    bufferPages: true,
    autoFirstPage: false,
    info: { Title: `Tearline case report ${r.number}`, Author: "Tearline", Subject: r.revision.title },
  });
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
  let first = true;
  doc.on("pageAdded", () => (first ? drawTitleBand(doc, r) : drawRunningHead(doc, r)));
  doc.addPage();
  first = false;
  const w = new PdfWriter(doc);

  w.facts(r.headline, 4);
  w.gap(2);
  if (r.revision.kind === "signed")
    w.callout(r.revision.title, "This revision is final. Any later change reopens the case and is recorded in its history.", {
      fill: OK_SOFT,
      ink: OK,
    });
  else
    w.callout(
      `${r.revision.title} · ${r.revision.stage}`,
      "This report shows the case as it stands now; findings and the verdict may still change before an engineer signs it.",
      { fill: WARN_SOFT, ink: WARN },
    );

  w.section("Bearing and removal");
  w.subheading("Bearing");
  w.facts(r.bearing, 4);
  w.subheading("Removal");
  w.facts(r.removal, 3);
  w.subheading(`Trigger: ${r.trigger.label}`);
  if (r.trigger.details.length) w.facts(r.trigger.details, 3);
  w.facts(r.service, 3);

  w.section("Field checks", 120);
  fieldChecks(w, r);

  w.section("Teardown");
  w.facts(r.teardown.rows, 2);
  if (r.teardown.notes) w.paragraph(r.teardown.notes);

  w.section("Findings by part", 120);
  if (r.components.length === 0) w.muted("No teardown findings yet.");
  for (const c of r.components) componentBlock(w, c, images);

  const anyFindings = r.components.some((c) => c.findings.length > 0);
  w.section("Damage map", anyFindings ? 200 : 30);
  if (anyFindings) drawDamageMap(w, r);
  else w.muted("No teardown findings yet; the map fills in as findings with a clock position are recorded.");

  w.section("Verdict", 120);
  w.facts(r.verdict.rows, 2);
  if (r.verdict.returnReason) w.callout("Returned to the bench", r.verdict.returnReason, { fill: WARN_SOFT, ink: WARN });
  if (r.verdict.correctiveAction) {
    w.subheading("Corrective action");
    w.paragraph(r.verdict.correctiveAction);
  }
  if (r.verdict.notes) {
    w.subheading("Notes");
    w.paragraph(r.verdict.notes);
  }

  w.section("Related cases", r.related.length ? 60 : 24);
  if (r.related.length)
    w.table(
      [
        { title: "Case", width: 90 },
        { title: "Stage", width: 100 },
        { title: "Root cause", width: 130 },
        { title: "Removed", width: 70 },
        { title: "Link note", width: w.width - 390 },
      ],
      r.related.map((x) => [x.number, x.status, x.cause, x.removedOn, x.note || "—"]),
    );
  else w.muted("No related cases are linked.");

  w.section("Photo register", r.photos.length ? 60 : 24);
  if (r.photos.length) {
    w.muted(
      "Originals are kept byte for byte; the SHA-256 of each lets anyone check a copy. The evidence ZIP holds the files and the same list.",
    );
    w.gap(3);
    w.table(
      [
        { title: "No.", width: 30, align: "center" },
        { title: "Part", width: 78 },
        { title: "Caption / file", width: 150 },
        { title: "Size", width: 44, align: "right" },
        { title: "SHA-256", width: w.width - 302, mono: true },
      ],
      r.photos.map((p) => [
        String(p.number),
        p.component,
        `${p.caption}${p.fileName && p.fileName !== p.caption ? `\n${p.fileName}` : ""}`,
        bytesWords(p.bytes),
        `${p.sha256.slice(0, 32)}\n${p.sha256.slice(32)}`,
      ]),
      { size: 7.5 },
    );
  } else w.muted("No photos in this case.");

  w.gap(10);
  w.paragraph(`End of report ${r.number}.`, { colour: MUTED, size: SIZE.small, font: FONT.italic });
  doc.fillColor(INK);
  finishPages(doc, r);
  doc.end();
  return done;
}
