import { PDFDocument, StandardFonts, rgb, type PDFFont, type PDFPage } from "pdf-lib";
import type { FieldReport, ReportTable } from "./field-report";

// The field report as an A4 PDF with the standard Helvetica faces (no font files to ship or fetch).
// Those faces encode WinAnsi only: the few characters outside it are written the plain way.

const A4 = { width: 595.28, height: 841.89 };
const MARGIN = 48;
const INK = rgb(0.078, 0.125, 0.18);
const MUTED = rgb(0.37, 0.4, 0.44);
const LEVEL_COLOUR = { ok: rgb(0.18, 0.49, 0.31), caution: rgb(0.56, 0.36, 0.04), stop: rgb(0.72, 0.2, 0.2) } as const;
const PLAIN: Record<string, string> = { "−": "-", "→": "->", "≤": "<=", "≥": ">=", "‑": "-", "\u00a0": " ", "\u2009": " ", "\u202f": " " };

function winAnsi(text: string, font: PDFFont): string {
  let out = "";
  for (const ch of text) {
    const plain = PLAIN[ch] ?? ch;
    try {
      font.encodeText(plain);
      out += plain;
    } catch {
      out += "?";
    }
  }
  return out;
}

class Writer {
  page: PDFPage;
  y: number;
  constructor(
    private readonly doc: PDFDocument,
    readonly regular: PDFFont,
    readonly bold: PDFFont,
  ) {
    this.page = doc.addPage([A4.width, A4.height]);
    this.y = A4.height - MARGIN;
  }

  private room(height: number): void {
    if (this.y - height >= MARGIN) return;
    this.page = this.doc.addPage([A4.width, A4.height]);
    this.y = A4.height - MARGIN;
  }

  /** Wrapped text at x, returning nothing; moves down by its height. */
  text(value: string, { size = 10, font = this.regular, colour = INK, x = MARGIN, width = A4.width - 2 * MARGIN, gap = 3 } = {}): void {
    const words = winAnsi(value, font).split(/\s+/);
    const lines: string[] = [];
    let line = "";
    for (const word of words) {
      const next = line ? `${line} ${word}` : word;
      if (font.widthOfTextAtSize(next, size) > width && line) {
        lines.push(line);
        line = word;
      } else line = next;
    }
    if (line) lines.push(line);
    for (const l of lines) {
      this.room(size + gap);
      this.y -= size;
      this.page.drawText(l, { x, y: this.y, size, font, color: colour });
      this.y -= gap;
    }
  }

  space(height: number): void {
    this.y -= height;
  }

  heading(value: string): void {
    this.room(40);
    this.space(8);
    this.text(value, { size: 13, font: this.bold });
    this.space(2);
  }

  /** Label–value rows in two columns. */
  rows(rows: { label: string; value: string }[]): void {
    for (const row of rows) {
      const startY = this.y;
      const page = this.page;
      this.text(row.label, { colour: MUTED, width: 170 });
      const afterLabel = this.y;
      if (this.page === page) this.y = startY;
      this.text(row.value, { x: MARGIN + 180, width: A4.width - 2 * MARGIN - 180 });
      this.y = Math.min(this.y, afterLabel);
    }
  }

  table(table: ReportTable): void {
    const columns = table.header.length;
    const width = (A4.width - 2 * MARGIN) / columns;
    for (const [i, cells] of [table.header, ...table.rows].entries()) {
      this.room(28);
      const startY = this.y;
      let lowest = this.y;
      cells.forEach((cell, c) => {
        this.y = startY;
        this.text(cell, { x: MARGIN + c * width, width: width - 6, font: i === 0 ? this.bold : this.regular, size: 9 });
        lowest = Math.min(lowest, this.y);
      });
      this.y = lowest - 2;
    }
  }
}

export async function renderFieldReportPdf(report: FieldReport): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.setTitle(report.title);
  doc.setCreator("Trimrail");
  doc.setProducer("Trimrail");
  const w = new Writer(doc, await doc.embedFont(StandardFonts.Helvetica), await doc.embedFont(StandardFonts.HelveticaBold));

  w.text(report.title, { size: 18, font: w.bold });
  w.text(report.subtitle, { colour: MUTED, size: 9 });
  w.space(10);
  w.text(report.review.headline, {
    size: report.review.state === "approved" ? 20 : 26,
    font: w.bold,
    colour: report.review.state === "approved" ? LEVEL_COLOUR.ok : LEVEL_COLOUR.stop,
  });
  if (report.review.detail) w.text(report.review.detail);

  for (const section of report.sections) {
    w.heading(section.title);
    w.rows(section.rows);
  }
  w.heading("Payloads");
  if (report.payloads.rows.length) w.table(report.payloads);
  else w.text("No payloads.");
  w.heading("Flags");
  for (const flag of report.flags)
    w.text(`${flag.level.toUpperCase()}  ${flag.text}`, { colour: flag.level === "ok" ? INK : LEVEL_COLOUR[flag.level] });
  if (report.envelope) {
    w.heading("Operating envelope");
    w.table(report.envelope);
  }
  w.heading("Cautions");
  for (const caution of report.cautions) w.text(`- ${caution}`);
  return doc.save();
}
