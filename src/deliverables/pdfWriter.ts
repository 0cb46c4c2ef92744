/**
 * A small page writer over jsPDF for the client report: a cursor that moves down the page,
 * headings, wrapped paragraphs, tables with a header row and page breaks, and the footer with
 * the caution line and page numbers. Millimetres throughout; Helvetica (the PDF base font).
 */
import type { jsPDF } from 'jspdf';
import type { Table } from './reportContent.ts';

export const INK = [28, 33, 40] as const;
export const MUTED = [96, 104, 114] as const;
export const RULE = [205, 210, 216] as const;
export const ACCENT = [22, 78, 122] as const;

/** Text in the base font's WinAnsi range: typographic marks simplified, anything else '?'. */
export function pdfText(text: string): string {
  return text
    .replace(/[\u2012-\u2015\u2212]/g, '-')
    .replace(/\u2026/g, '...')
    .replace(/[\u2018\u2019]/g, "'")
    .replace(/[\u201c\u201d]/g, '"')
    .replace(/[\u2070-\u209f]/g, '')
    .replace(/[^\t\n\r\u0020-\u007e\u00a0-\u00ff]/g, '?');
}

export interface ColumnSpec {
  /** Share of the table width. */
  weight: number;
  align?: 'left' | 'right';
}

export interface TableStyle {
  /** Text colour (drawn bold) of a body cell, e.g. PASS and FAIL. */
  cellColour?: (row: number, col: number) => readonly number[] | undefined;
  /** Background of a whole body row (its text bold), e.g. the installation temperature. */
  rowFill?: (row: number) => readonly number[] | undefined;
}

export class PdfWriter {
  y: number;
  readonly left: number;
  readonly width: number;
  readonly bottom: number;

  constructor(
    readonly doc: jsPDF,
    readonly margin = 16,
  ) {
    const size = doc.internal.pageSize;
    this.left = margin;
    this.width = size.getWidth() - 2 * margin;
    this.bottom = size.getHeight() - margin - 10;
    this.y = margin;
  }

  font(size: number, style: 'normal' | 'bold' = 'normal', colour: readonly number[] = INK): void {
    this.doc.setFont('helvetica', style);
    this.doc.setFontSize(size);
    this.doc.setTextColor(colour[0], colour[1], colour[2]);
  }

  /** Starts a new page when less than `height` mm is left. */
  ensure(height: number): void {
    if (this.y + height <= this.bottom) return;
    this.doc.addPage();
    this.y = this.margin;
  }

  lines(text: string, width: number): string[] {
    return this.doc.splitTextToSize(pdfText(text), width) as string[];
  }

  heading(text: string): void {
    this.ensure(16);
    this.y += 3;
    this.font(11.5, 'bold', ACCENT);
    this.doc.text(pdfText(text), this.left, this.y);
    this.y += 1.8;
    this.doc.setDrawColor(...ACCENT);
    this.doc.setLineWidth(0.35);
    this.doc.line(this.left, this.y, this.left + this.width, this.y);
    this.y += 5;
  }

  paragraph(text: string, size = 9, style: 'normal' | 'bold' = 'normal'): void {
    this.font(size, style);
    const lineHeight = size * 0.42;
    for (const line of this.lines(text, this.width)) {
      this.ensure(lineHeight);
      this.doc.text(line, this.left, this.y);
      this.y += lineHeight;
    }
    this.y += 1.6;
  }

  table(table: Table, columns: ColumnSpec[], style: TableStyle = {}): void {
    const total = columns.reduce((sum, c) => sum + c.weight, 0);
    const widths = columns.map((c) => (c.weight / total) * this.width);
    this.tableRow(table.head, columns, widths, -1, style);
    for (const [i, row] of table.rows.entries()) this.tableRow(row, columns, widths, i, style);
    this.y += 4;
  }

  /** One table row; rowIndex −1 is the header row. */
  private tableRow(
    cells: string[],
    columns: ColumnSpec[],
    widths: number[],
    rowIndex: number,
    style: TableStyle,
  ): void {
    const header = rowIndex < 0;
    const fill = header ? undefined : style.rowFill?.(rowIndex);
    this.font(header ? 7.5 : 8, header || fill ? 'bold' : 'normal');
    const wrapped = cells.map((cell, i) => this.lines(cell, widths[i] - 2.4));
    const height = Math.max(...wrapped.map((w) => w.length)) * 3.4 + 2.4;
    this.ensure(height + (header ? 8 : 0));
    if (fill) {
      this.doc.setFillColor(fill[0], fill[1], fill[2]);
      this.doc.rect(this.left, this.y, this.width, height, 'F');
    }
    let x = this.left;
    wrapped.forEach((cellLines, i) => {
      const colour = header ? undefined : style.cellColour?.(rowIndex, i);
      this.font(
        header ? 7.5 : 8,
        header || colour || fill ? 'bold' : 'normal',
        colour ?? (header ? MUTED : INK),
      );
      const right = columns[i].align === 'right';
      const tx = right ? x + widths[i] - 1.2 : x + 1.2;
      cellLines.forEach((line, k) => {
        this.doc.text(line, tx, this.y + 3.6 + k * 3.4, { align: right ? 'right' : 'left' });
      });
      x += widths[i];
    });
    this.y += height;
    const rule = header ? INK : RULE;
    this.doc.setDrawColor(rule[0], rule[1], rule[2]);
    this.doc.setLineWidth(header ? 0.3 : 0.15);
    this.doc.line(this.left, this.y, this.left + this.width, this.y);
  }

  /** Footer on every page: the caution line, the report name and "Page i of n". */
  footers(name: string, caution: string): void {
    const pages = this.doc.getNumberOfPages();
    const height = this.doc.internal.pageSize.getHeight();
    for (let page = 1; page <= pages; page++) {
      this.doc.setPage(page);
      this.doc.setDrawColor(...RULE);
      this.doc.setLineWidth(0.2);
      this.doc.line(
        this.left,
        height - this.margin - 6,
        this.left + this.width,
        height - this.margin - 6,
      );
      this.font(7, 'normal', MUTED);
      this.doc.text(pdfText(caution), this.left, height - this.margin - 2.5, {
        maxWidth: this.width,
      });
      this.doc.text(pdfText(name), this.left, height - this.margin + 1.5);
      this.doc.text(
        `Page ${page} of ${pages}`,
        this.left + this.width,
        height - this.margin + 1.5,
        {
          align: 'right',
        },
      );
    }
  }
}
