// A thin layer over pdfkit that lays out the report's building blocks and breaks pages cleanly.
import type PDFKit from "pdfkit";
import type { Note, Row } from "../types";
import { pdfText } from "./pdf-text";
import {
  CONTENT_WIDTH,
  FONT,
  INK,
  INK_2,
  LEVEL_COLOUR,
  LEVEL_WORD,
  LINE,
  LINE_STRONG,
  MUTED,
  PAGE,
  SIZE,
  SURFACE_2,
  ACCENT,
} from "./pdf-style";

export type Column = { title: string; width: number; align?: "left" | "right" | "center"; mono?: boolean };

export class PdfWriter {
  readonly left = PAGE.margin.left;
  readonly width = CONTENT_WIDTH;
  private sectionNo = 0;

  constructor(readonly doc: PDFKit.PDFDocument) {}

  get y() {
    return this.doc.y;
  }

  /** The lowest y that content may reach on this page. */
  get bottom() {
    return PAGE.height - PAGE.margin.bottom;
  }

  ensure(height: number) {
    if (this.doc.y + height > this.bottom) this.doc.addPage();
  }

  gap(points = 8) {
    this.doc.y += points;
  }

  textHeight(s: string, width: number, font: string = FONT.regular, size: number = SIZE.body) {
    return this.doc.font(font).fontSize(size).heightOfString(pdfText(s), { width, lineGap: 1.5 });
  }

  /** Section heading: a number in amber, a title, a rule; kept with the next 60 pt of content. */
  section(title: string, keepWith = 60) {
    this.ensure(28 + keepWith);
    this.gap(this.doc.y > PAGE.margin.top + 40 ? 10 : 0);
    this.sectionNo++;
    const y = this.doc.y;
    const { doc } = this;
    doc.rect(this.left, y + 1, 3, 13).fill(ACCENT);
    doc
      .font(FONT.bold)
      .fontSize(SIZE.h2)
      .fillColor(INK)
      .text(pdfText(`${this.sectionNo}  ${title}`), this.left + 10, y + 2, { lineBreak: false });
    doc
      .moveTo(this.left, y + 20)
      .lineTo(this.left + this.width, y + 20)
      .lineWidth(0.6)
      .strokeColor(LINE_STRONG)
      .stroke();
    doc.x = this.left;
    doc.y = y + 28;
  }

  subheading(title: string, keepWith = 40) {
    this.ensure(16 + keepWith);
    this.doc.font(FONT.bold).fontSize(SIZE.h3).fillColor(INK_2).text(pdfText(title), this.left, this.doc.y, { width: this.width });
    this.gap(3);
  }

  paragraph(s: string, opts: { colour?: string; size?: number; font?: string; x?: number; width?: number } = {}) {
    const x = opts.x ?? this.left;
    const width = opts.width ?? this.width;
    const size = opts.size ?? SIZE.body;
    const font = opts.font ?? FONT.regular;
    this.ensure(Math.min(this.textHeight(s, width, font, size), 60));
    this.doc
      .font(font)
      .fontSize(size)
      .fillColor(opts.colour ?? INK)
      .text(pdfText(s), x, this.doc.y, { width, lineGap: 1.5 });
    this.doc.x = this.left;
  }

  /** Label/value pairs in `columns` columns, each label above its value. */
  facts(rows: Row[], columns = 2, x = this.left, width = this.width) {
    const colWidth = (width - (columns - 1) * 14) / columns;
    for (let i = 0; i < rows.length; i += columns) {
      const line = rows.slice(i, i + columns);
      const labelHeight = (label: string) =>
        this.doc
          .font(FONT.regular)
          .fontSize(SIZE.label)
          .heightOfString(pdfText(label.toUpperCase()), { width: colWidth, characterSpacing: 0.4 });
      const labelH = Math.max(...line.map(([l]) => labelHeight(l))) + 1.5;
      const h = labelH + Math.max(...line.map(([, v]) => this.textHeight(v, colWidth))) + 3;
      this.ensure(h + 4);
      const y = this.doc.y;
      line.forEach(([label, value], j) => {
        const cx = x + j * (colWidth + 14);
        this.doc
          .font(FONT.regular)
          .fontSize(SIZE.label)
          .fillColor(MUTED)
          .text(pdfText(label.toUpperCase()), cx, y, { width: colWidth, characterSpacing: 0.4 });
        this.doc
          .font(FONT.regular)
          .fontSize(SIZE.body)
          .fillColor(INK)
          .text(pdfText(value), cx, y + labelH, { width: colWidth, lineGap: 1.5 });
      });
      this.doc.x = this.left;
      this.doc.y = y + h + 3;
    }
  }

  /** A ruled table with a shaded header row that repeats after a page break. */
  table(columns: Column[], rows: string[][], opts: { size?: number } = {}) {
    const size = opts.size ?? SIZE.body;
    const { doc } = this;
    const pad = 4;
    const header = () => {
      const y = doc.y;
      doc.rect(this.left, y, this.width, 15).fill(SURFACE_2);
      let x = this.left;
      for (const c of columns) {
        doc
          .font(FONT.bold)
          .fontSize(SIZE.label)
          .fillColor(MUTED)
          .text(pdfText(c.title.toUpperCase()), x + pad, y + 4.5, {
            width: c.width - 2 * pad,
            align: c.align ?? "left",
            lineBreak: false,
            characterSpacing: 0.3,
          });
        x += c.width;
      }
      doc.y = y + 15;
    };
    this.ensure(15 + 18);
    header();
    for (const row of rows) {
      const heights = row.map((cell, i) =>
        this.textHeight(cell, columns[i].width - 2 * pad, columns[i].mono ? FONT.mono : FONT.regular, size),
      );
      const h = Math.max(...heights) + 2 * pad;
      if (doc.y + h > this.bottom) {
        doc.addPage();
        header();
      }
      const y = doc.y;
      let x = this.left;
      row.forEach((cell, i) => {
        const c = columns[i];
        doc
          .font(c.mono ? FONT.mono : FONT.regular)
          .fontSize(size)
          .fillColor(INK)
          .text(pdfText(cell), x + pad, y + pad, { width: c.width - 2 * pad, align: c.align ?? "left", lineGap: 1.5 });
        x += c.width;
      });
      doc
        .moveTo(this.left, y + h)
        .lineTo(this.left + this.width, y + h)
        .lineWidth(0.5)
        .strokeColor(LINE)
        .stroke();
      doc.x = this.left;
      doc.y = y + h;
    }
    this.gap(6);
  }

  /** Field messages as a list with a coloured level word, the way the shop saw them. */
  notes(items: Note[]) {
    const { doc } = this;
    for (const n of items) {
      const textWidth = this.width - 52;
      const h = this.textHeight(n.text, textWidth) + 4;
      this.ensure(h);
      const y = doc.y;
      doc
        .font(FONT.bold)
        .fontSize(SIZE.label)
        .fillColor(LEVEL_COLOUR[n.level])
        .text(LEVEL_WORD[n.level].toUpperCase(), this.left, y + 1.2, { width: 46, lineBreak: false, characterSpacing: 0.3 });
      doc
        .font(FONT.regular)
        .fontSize(SIZE.body)
        .fillColor(INK_2)
        .text(pdfText(n.text), this.left + 52, y, { width: textWidth, lineGap: 1.5 });
      doc.x = this.left;
      doc.y = y + h;
    }
  }

  /** A shaded call-out box with a bold title line and body text. */
  callout(title: string, body: string, colours: { fill: string; ink: string }) {
    const { doc } = this;
    const inner = this.width - 24;
    const h = 12 + this.textHeight(title, inner, FONT.bold, SIZE.h3) + (body ? 4 + this.textHeight(body, inner) : 0) + 10;
    this.ensure(h + 6);
    const y = doc.y;
    doc.roundedRect(this.left, y, this.width, h, 4).fill(colours.fill);
    doc.rect(this.left, y, 3, h).fill(colours.ink);
    doc
      .font(FONT.bold)
      .fontSize(SIZE.h3)
      .fillColor(colours.ink)
      .text(pdfText(title), this.left + 14, y + 10, { width: inner });
    if (body)
      doc
        .font(FONT.regular)
        .fontSize(SIZE.body)
        .fillColor(INK)
        .text(pdfText(body), this.left + 14, doc.y + 3, { width: inner, lineGap: 1.5 });
    doc.x = this.left;
    doc.y = y + h + 6;
  }

  muted(s: string) {
    this.paragraph(s, { colour: MUTED, size: SIZE.small });
  }
}
