import type PDFDocument from 'pdfkit';
import { fontName, splitRuns, type SheetFonts } from './sheet-fonts';

type Doc = InstanceType<typeof PDFDocument>;

export interface TextStyle {
  size?: number;
  bold?: boolean;
  color?: string;
  width?: number;
  align?: 'left' | 'center' | 'right' | 'justify';
  lineGap?: number;
}

export interface Column {
  header: string;
  width: number;
  align?: 'left' | 'right';
}

export const PAGE_MARGIN = 50;
/** Space kept free at the foot of every page for the footer. */
export const FOOTER_SPACE = 62;

/** Writes text in Noto Sans runs (one font subset per run) and lays out blocks down the page. */
export class SheetWriter {
  readonly left = PAGE_MARGIN;

  constructor(
    readonly doc: Doc,
    readonly fonts: SheetFonts,
  ) {}

  get right(): number {
    return this.doc.page.width - PAGE_MARGIN;
  }

  get width(): number {
    return this.right - this.left;
  }

  get bottom(): number {
    return this.doc.page.height - FOOTER_SPACE;
  }

  /** Starts a new page when fewer than `height` points are left. */
  ensure(height: number): void {
    if (this.doc.y + height > this.bottom) {
      this.doc.addPage();
      this.doc.x = this.left;
      this.doc.y = PAGE_MARGIN;
    }
  }

  /** Writes `text` at (x, y) (or the current position) in mixed font runs; returns the y below it. */
  text(text: string, x: number, y: number, style: TextStyle = {}): number {
    const runs = splitRuns(this.fonts, text);
    const size = style.size ?? 9;
    this.doc.fillColor(style.color ?? '#111827').fontSize(size);
    if (runs.length === 0) runs.push({ subset: 'latin', text: '' });
    runs.forEach((run, i) => {
      this.doc.font(fontName(run.subset, style.bold ? 'bold' : 'regular'));
      const options = { width: style.width, align: style.align, lineGap: style.lineGap ?? 1, continued: i < runs.length - 1 };
      if (i === 0) this.doc.text(run.text, x, y, options);
      else this.doc.text(run.text, options);
    });
    this.doc.fillColor('#111827');
    return this.doc.y;
  }

  /** Height of `text` in a box of `width` (measured in the latin font: close enough for mixed runs). */
  height(text: string, width: number, style: TextStyle = {}): number {
    const plain = splitRuns(this.fonts, text)
      .map((r) => r.text)
      .join('');
    this.doc.font(fontName('latin', style.bold ? 'bold' : 'regular')).fontSize(style.size ?? 9);
    return this.doc.heightOfString(plain || ' ', { width, lineGap: style.lineGap ?? 1 });
  }

  /** A section heading with a rule under it. */
  heading(text: string): void {
    this.ensure(40);
    this.doc.y += 8;
    const y = this.doc.y;
    this.text(text, this.left, y, { size: 11.5, bold: true, color: '#0f3d3a' });
    const below = this.doc.y + 1;
    this.doc.save().lineWidth(0.6).strokeColor('#94a3b8').moveTo(this.left, below).lineTo(this.right, below).stroke().restore();
    this.doc.y = below + 5;
  }

  paragraph(text: string, style: TextStyle = {}): void {
    const width = style.width ?? this.width;
    this.ensure(Math.min(this.height(text, width, style), 80) + 2);
    this.text(text, this.left, this.doc.y, { ...style, width });
    this.doc.y += 3;
  }

  /** Label: value pairs in two columns per row. */
  facts(pairs: [string, string][], labelWidth = 150): void {
    for (const [label, value] of pairs) {
      const valueWidth = this.width - labelWidth;
      const h = Math.max(this.height(label, labelWidth - 8, { bold: true }), this.height(value, valueWidth));
      this.ensure(h + 2);
      const y = this.doc.y;
      this.text(label, this.left, y, { bold: true, width: labelWidth - 8, color: '#374151' });
      this.text(value, this.left + labelWidth, y, { width: valueWidth });
      this.doc.y = y + h + 2;
    }
  }

  /** A table with a header row, repeated on each new page; rows grow with their text. */
  table(columns: Column[], rows: string[][], style: TextStyle = {}): void {
    const size = style.size ?? 8.5;
    const pad = 3;
    const drawHeader = () => {
      const h = Math.max(...columns.map((c) => this.height(c.header, c.width - 2 * pad, { size, bold: true }))) + 2 * pad;
      this.ensure(h + 16);
      const y = this.doc.y;
      this.doc.save().rect(this.left, y, this.width, h).fillColor('#e6f2f0').fill().restore();
      let x = this.left;
      for (const c of columns) {
        this.text(c.header, x + pad, y + pad, { size, bold: true, width: c.width - 2 * pad, align: c.align });
        x += c.width;
      }
      this.doc.y = y + h;
    };
    drawHeader();
    rows.forEach((row, index) => {
      const h = Math.max(...columns.map((c, i) => this.height(row[i] ?? '', c.width - 2 * pad, { size }))) + 2 * pad;
      if (this.doc.y + h > this.bottom) {
        this.doc.addPage();
        this.doc.y = PAGE_MARGIN;
        drawHeader();
      }
      const y = this.doc.y;
      if (index % 2 === 1) this.doc.save().rect(this.left, y, this.width, h).fillColor('#f6f8f9').fill().restore();
      let x = this.left;
      columns.forEach((c, i) => {
        this.text(row[i] ?? '', x + pad, y + pad, { size, width: c.width - 2 * pad, align: c.align });
        x += c.width;
      });
      this.doc.save().lineWidth(0.3).strokeColor('#cbd5e1').moveTo(this.left, y + h).lineTo(this.right, y + h).stroke().restore();
      this.doc.y = y + h;
    });
    this.doc.y += 4;
  }
}
