/**
 * A small page writer over jsPDF for the report: a cursor that moves down the page, headings,
 * wrapped paragraphs, and tables that keep their legend on their page, never leave a lone
 * fragment, and repeat their header when they continue; at the end every page gets the running
 * head (title, revision, date) and the foot (caution line, "Page i of n"). Millimetres
 * throughout; text through ReportFonts (embedded Noto fonts), so any language prints.
 */
import type { jsPDF } from 'jspdf';
import { type FontStyle, type ReportFonts, wrapText } from './pdfFonts.ts';
import type { Table } from './reportContent.ts';

export type Colour = readonly [number, number, number];
export const INK: Colour = [28, 33, 40];
export const MUTED: Colour = [96, 104, 114];
export const RULE: Colour = [205, 210, 216];
export const ACCENT: Colour = [22, 78, 122];
export const GROUP_FILL: Colour = [238, 241, 245];

/** Line height in mm for a font size in pt (1.2 × the size; 1 pt = 0.3528 mm). */
export const lineHeight = (sizePt: number) => sizePt * 0.42;

/** Text as the report draws it: numbers kept with their units. */
export function pdfText(text: string): string {
  return glueUnits(text);
}

/** A number and its unit never part at a line end: the space between them becomes a no-break space. */
export function glueUnits(text: string): string {
  return text.replace(
    /(\d) (?=(?:kN|N|mm|m\/s|m|lbf|lb\/ft|lb|ft|in|kg\/m|kg|mph|%|s|kip)(?![\p{L}]))/gu,
    '$1\u00a0',
  );
}

export interface ColumnSpec {
  /** Share of the table width. */
  weight: number;
  align?: 'left' | 'right';
}

export interface TableStyle {
  /** Text colour (drawn bold) of a body cell, e.g. PASS and FAIL. */
  cellColour?: (row: number, col: number) => Colour | undefined;
  /** Background of a whole body row (its text bold), e.g. the installation temperature. */
  rowFill?: (row: number) => Colour | undefined;
  /** Lines under the table that must stay on its page (a legend, notes). */
  legend?: string[];
  bodySize?: number;
}

interface RowLayout {
  cells: string[][];
  height: number;
  group: boolean;
}

const CELL_PAD = 1.1;
const MIN_ROWS_PER_PAGE = 3;

export class PdfWriter {
  y: number;
  readonly left: number;
  readonly width: number;
  readonly top: number;
  readonly bottom: number;

  constructor(
    readonly doc: jsPDF,
    readonly fonts: ReportFonts,
    readonly margin = 12,
  ) {
    const size = doc.internal.pageSize;
    this.left = margin;
    this.width = size.getWidth() - 2 * margin;
    this.top = margin + 5;
    this.bottom = size.getHeight() - margin - 8;
    this.y = this.top;
  }

  colour(c: Colour): void {
    this.doc.setTextColor(c[0], c[1], c[2]);
  }

  text(
    text: string,
    x: number,
    y: number,
    size: number,
    style: FontStyle = 'normal',
    colour: Colour = INK,
    align: 'left' | 'right' = 'left',
  ): void {
    this.colour(colour);
    this.fonts.draw(pdfText(text), x, y, size, style, align);
  }

  lines(text: string, width: number, size: number, style: FontStyle = 'normal'): string[] {
    return wrapText(pdfText(text), width, (piece) => this.fonts.width(piece, size, style));
  }

  get remaining(): number {
    return this.bottom - this.y;
  }

  newPage(): void {
    this.doc.addPage();
    this.y = this.top;
  }

  /** Starts a new page when less than `height` mm is left. */
  ensure(height: number): void {
    if (this.y + height > this.bottom) this.newPage();
  }

  /** A section heading; `keepWith` mm of what follows must fit under it on the same page. */
  heading(text: string, keepWith = 14): void {
    this.ensure(8 + keepWith);
    this.y += 1.6;
    this.text(text, this.left, this.y + 3.2, 10.5, 'bold', ACCENT);
    this.y += 4.4;
    this.doc.setDrawColor(...ACCENT);
    this.doc.setLineWidth(0.3);
    this.doc.line(this.left, this.y, this.left + this.width, this.y);
    this.y += 2.4;
  }

  paragraphHeight(text: string, size = 8.5, width = this.width): number {
    return this.lines(text, width, size).length * lineHeight(size) + 1.2;
  }

  paragraph(text: string, size = 8.5, style: FontStyle = 'normal', colour: Colour = INK): void {
    for (const line of this.lines(text, this.width, size, style)) {
      this.ensure(lineHeight(size));
      this.text(line, this.left, this.y + size * 0.32, size, style, colour);
      this.y += lineHeight(size);
    }
    this.y += 1.2;
  }

  private layoutRows(table: Table, widths: number[], size: number, style: TableStyle): RowLayout[] {
    const bodyLine = lineHeight(size) * 0.9;
    return table.rows.map((row, i) => {
      const group = table.groupRows?.includes(i) ?? false;
      const strong = (table.strongRows?.includes(i) ?? false) || style.rowFill?.(i) !== undefined;
      // Measured in the weight it is drawn in: bold text is wider.
      const weight = (c: number) => (strong || style.cellColour?.(i, c) ? 'bold' : 'normal');
      const cells = group
        ? [this.lines(row[0], this.width - 2 * CELL_PAD, size, 'bold')]
        : row.map((cell, c) => this.lines(cell, widths[c] - 2 * CELL_PAD, size, weight(c)));
      const height = Math.max(...cells.map((lines) => lines.length)) * bodyLine + 1.3;
      return { cells, height, group };
    });
  }

  /** Height the table and its legend take when drawn whole. */
  tableHeight(table: Table, columns: ColumnSpec[], style: TableStyle = {}): number {
    const { headHeight, rows, legendHeight } = this.measureTable(table, columns, style);
    return headHeight + rows.reduce((sum, r) => sum + r.height, 0) + legendHeight + 2.7;
  }

  private measureTable(table: Table, columns: ColumnSpec[], style: TableStyle) {
    const size = style.bodySize ?? 7.6;
    const total = columns.reduce((sum, c) => sum + c.weight, 0);
    const widths = columns.map((c) => (c.weight / total) * this.width);
    const head = table.head.map((cell, c) => this.lines(cell, widths[c] - 2 * CELL_PAD, 7, 'bold'));
    const headHeight = Math.max(...head.map((l) => l.length)) * lineHeight(7) * 0.92 + 1.8;
    const rows = this.layoutRows(table, widths, size, style);
    const legend = style.legend ?? [];
    const legendHeight = legend.reduce((sum, text) => sum + this.paragraphHeight(text, 7), 1.5);
    return { size, widths, head, headHeight, rows, legend, legendHeight };
  }

  /**
   * A table with its legend. Kept whole on this page or the next when it fits a page; a longer
   * one continues with its header repeated, at least three rows on each page, and the legend
   * under its last rows.
   */
  table(table: Table, columns: ColumnSpec[], style: TableStyle = {}): void {
    const m = this.measureTable(table, columns, style);
    const { size, widths, head, headHeight, rows, legend, legendHeight } = m;
    const bodyHeight = rows.reduce((sum, r) => sum + r.height, 0);
    const whole = headHeight + bodyHeight + legendHeight;
    if (whole > this.remaining && whole <= this.bottom - this.top) this.newPage();
    let start = 0;
    if (rows.length === 0) this.headRow(head, columns, widths, headHeight);
    while (start < rows.length) {
      let end = this.fitRows(rows, start, headHeight, legendHeight);
      if (end === start && this.y > this.top) {
        this.newPage();
        continue;
      }
      // On a fresh page a row taller than the page still goes down: progress is guaranteed.
      if (end === start) end = start + 1;
      this.headRow(head, columns, widths, headHeight);
      for (let i = start; i < end; i++)
        this.bodyRow(table, rows[i], i, columns, widths, size, style);
      start = end;
      if (start < rows.length) this.newPage();
    }
    this.y += 1.2;
    for (const text of legend) this.paragraph(text, 7, 'normal', MUTED);
    this.y += 1.5;
  }

  /** Last row index (exclusive) that fits on this page from `start`, keeping orphans away. */
  private fitRows(rows: RowLayout[], start: number, headHeight: number, legendHeight: number) {
    let end = start;
    let used = headHeight;
    while (end < rows.length && used + rows[end].height <= this.remaining)
      used += rows[end++].height;
    if (end === rows.length) {
      // The legend stays with the last rows: give some rows to the next page if it does not fit.
      while (end > start && used + legendHeight > this.remaining) used -= rows[--end].height;
      if (end < rows.length && rows.length - end < MIN_ROWS_PER_PAGE)
        end = Math.max(start, rows.length - MIN_ROWS_PER_PAGE);
    } else if (rows.length - end < MIN_ROWS_PER_PAGE) {
      end = Math.max(start, rows.length - MIN_ROWS_PER_PAGE);
    }
    if (end - start < Math.min(MIN_ROWS_PER_PAGE, rows.length - start)) return start;
    if (end > start && rows[end - 1].group && end < rows.length) end--;
    return end;
  }

  private headRow(head: string[][], columns: ColumnSpec[], widths: number[], height: number) {
    let x = this.left;
    head.forEach((lines, c) => {
      const right = columns[c].align === 'right';
      lines.forEach((line, k) => {
        const tx = right ? x + widths[c] - CELL_PAD : x + CELL_PAD;
        this.text(line, tx, this.y + 2.9 + k * 2.7, 7, 'bold', MUTED, right ? 'right' : 'left');
      });
      x += widths[c];
    });
    this.y += height;
    this.rule(INK, 0.3);
  }

  private bodyRow(
    table: Table,
    row: RowLayout,
    index: number,
    columns: ColumnSpec[],
    widths: number[],
    size: number,
    style: TableStyle,
  ): void {
    const fill = row.group ? GROUP_FILL : style.rowFill?.(index);
    if (fill) {
      this.doc.setFillColor(fill[0], fill[1], fill[2]);
      this.doc.rect(this.left, this.y, this.width, row.height, 'F');
    }
    const step = lineHeight(size) * 0.9;
    const strong = row.group || fill !== undefined || (table.strongRows?.includes(index) ?? false);
    let x = this.left;
    row.cells.forEach((lines, c) => {
      const colour = row.group ? undefined : style.cellColour?.(index, c);
      const right = !row.group && columns[c].align === 'right';
      const tx = right ? x + widths[c] - CELL_PAD : x + CELL_PAD;
      lines.forEach((line, k) => {
        const y = this.y + 0.65 + size * 0.33 + k * step;
        const weight = strong || colour ? 'bold' : 'normal';
        this.text(line, tx, y, size, weight, colour ?? INK, right ? 'right' : 'left');
      });
      x += widths[c];
    });
    this.y += row.height;
    this.rule(RULE, 0.15);
  }

  private rule(colour: Colour, width: number): void {
    this.doc.setDrawColor(colour[0], colour[1], colour[2]);
    this.doc.setLineWidth(width);
    this.doc.line(this.left, this.y, this.left + this.width, this.y);
  }

  /** Running head and foot on every page: title, revision and date; caution; "Page i of n". */
  frame(head: { title: string; revision: string; date: string }, caution: string): void {
    const pages = this.doc.getNumberOfPages();
    const height = this.doc.internal.pageSize.getHeight();
    const right = this.left + this.width;
    for (let page = 1; page <= pages; page++) {
      this.doc.setPage(page);
      const meta = `${head.revision}  ·  ${head.date}`;
      const metaWidth = this.fonts.width(meta, 7, 'normal') + 4;
      const titleLines = this.lines(head.title, this.width - metaWidth - 48, 7, 'bold');
      const title = titleLines.length > 1 ? `${titleLines[0]} …` : (titleLines[0] ?? '');
      this.text('SAGWRIGHT · WIRE SPAN REPORT', this.left, this.margin, 7, 'bold', ACCENT);
      this.text(title, this.left + 44, this.margin, 7, 'bold', INK);
      this.text(meta, right, this.margin, 7, 'normal', MUTED, 'right');
      this.doc.setDrawColor(...RULE);
      this.doc.setLineWidth(0.2);
      this.doc.line(this.left, this.margin + 1.6, right, this.margin + 1.6);
      const foot = height - this.margin - 5.5;
      this.doc.line(this.left, foot, right, foot);
      const cautionLines = this.lines(caution, this.width - 22, 6.8);
      cautionLines.forEach((line, k) => {
        this.text(line, this.left, foot + 3.4 + k * 2.9, 6.8, 'normal', MUTED);
      });
      this.text(`Page ${page} of ${pages}`, right, foot + 3.4, 6.8, 'bold', MUTED, 'right');
    }
  }
}
