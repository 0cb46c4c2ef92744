/**
 * Fonts for the PDF report. The PDF base font has Western European letters only, so the report
 * embeds Noto Sans (SIL Open Font License 1.1; Latin with Polish and the rest of Central Europe,
 * Greek, Cyrillic, Vietnamese), regular and bold, and adds Noto Sans JP (same licence; Japanese
 * kana and kanji) only when some text needs a character Noto Sans lacks. jsPDF embeds only the
 * glyphs used (Identity-H with a ToUnicode map, so the text can be searched and copied). Text is
 * split into runs, each drawn in the first font that has its characters.
 */
import type { jsPDF } from 'jspdf';

export type FontStyle = 'normal' | 'bold';
export type FontFile = 'latin-regular' | 'latin-bold' | 'cjk-regular';
/** Where the font files come from: fetched in the browser, read from disk in tests. */
export type FontSource = (file: FontFile) => Promise<ArrayBuffer>;

export const LATIN_FAMILY = 'NotoSans';
export const CJK_FAMILY = 'NotoSansJP';

export interface TextRun {
  family: string;
  style: FontStyle;
  text: string;
}

interface GlyphLookup {
  metadata?: { characterToGlyph(code: number): number };
}

function binaryString(buffer: ArrayBuffer): string {
  const bytes = new Uint8Array(buffer);
  let out = '';
  for (let i = 0; i < bytes.length; i += 0x8000)
    out += String.fromCharCode(...bytes.subarray(i, i + 0x8000));
  return out;
}

async function register(
  doc: jsPDF,
  source: FontSource,
  file: FontFile,
  family: string,
  style: FontStyle,
): Promise<void> {
  const name = `${family}-${style}.ttf`;
  doc.addFileToVFS(name, binaryString(await source(file)));
  doc.addFont(name, family, style, undefined, 'Identity-H');
}

function hasGlyph(doc: jsPDF, family: string, style: FontStyle, code: number): boolean {
  const internal = doc.internal as unknown as { getFont(name: string, style: string): GlyphLookup };
  const font = internal.getFont(family, style);
  return (font.metadata?.characterToGlyph(code) ?? 0) > 0;
}

/** Characters that need no glyph of their own (line breaks, tabs). */
const isControl = (code: number) => code < 0x20;

/**
 * The report's fonts in one jsPDF document. `texts` is every piece of user text the report may
 * print (title, names, labels, record); the Japanese font is loaded only when one needs it.
 */
export class ReportFonts {
  private constructor(
    private readonly doc: jsPDF,
    readonly cjk: boolean,
  ) {}

  static async load(doc: jsPDF, source: FontSource, texts: string[]): Promise<ReportFonts> {
    await Promise.all([
      register(doc, source, 'latin-regular', LATIN_FAMILY, 'normal'),
      register(doc, source, 'latin-bold', LATIN_FAMILY, 'bold'),
    ]);
    const needsCjk = texts.some((text) =>
      Array.from(text).some((ch) => {
        const code = ch.charCodeAt(0);
        return !isControl(code) && !hasGlyph(doc, LATIN_FAMILY, 'normal', code);
      }),
    );
    if (needsCjk) {
      await register(doc, source, 'cjk-regular', CJK_FAMILY, 'normal');
      // Japanese prints in its regular weight where the report asks for bold.
      doc.addFont(`${CJK_FAMILY}-normal.ttf`, CJK_FAMILY, 'bold', undefined, 'Identity-H');
    }
    return new ReportFonts(doc, needsCjk);
  }

  /** The family that draws this character: Noto Sans when it can, else Noto Sans JP. */
  private familyOf(code: number, style: FontStyle): string {
    if (!this.cjk || isControl(code) || hasGlyph(this.doc, LATIN_FAMILY, style, code))
      return LATIN_FAMILY;
    return CJK_FAMILY;
  }

  /** The text cut into runs of one font each. */
  runs(text: string, style: FontStyle): TextRun[] {
    const runs: TextRun[] = [];
    for (const ch of text) {
      const family = this.familyOf(ch.charCodeAt(0), style);
      const last = runs[runs.length - 1];
      if (last && last.family === family) last.text += ch;
      else runs.push({ family, style, text: ch });
    }
    return runs;
  }

  /** Width of the text in the document's unit at the given size. */
  width(text: string, size: number, style: FontStyle): number {
    let total = 0;
    for (const ch of text) total += this.charWidth(ch, style);
    return (total * size) / this.doc.internal.scaleFactor;
  }

  private readonly widths = new Map<string, number>();

  /** A character's advance in font units per point (cached; the report draws without kerning). */
  private charWidth(ch: string, style: FontStyle): number {
    const key = style + ch;
    let width = this.widths.get(key);
    if (width === undefined) {
      this.doc.setFont(this.familyOf(ch.charCodeAt(0), style), style);
      width = this.doc.getStringUnitWidth(ch);
      this.widths.set(key, width);
    }
    return width;
  }

  /** Draws the text from x (left, or right edge when align is 'right'), baseline y. */
  draw(text: string, x: number, y: number, size: number, style: FontStyle, align = 'left'): void {
    let cursor = align === 'right' ? x - this.width(text, size, style) : x;
    this.doc.setFontSize(size);
    for (const run of this.runs(text, style)) {
      this.doc.setFont(run.family, style);
      this.doc.text(run.text, cursor, y);
      cursor += (this.doc.getStringUnitWidth(run.text) * size) / this.doc.internal.scaleFactor;
    }
  }

  /**
   * The one family a piece of the plot's text is drawn in (svg2pdf draws a text element in one
   * font): Noto Sans when it has every character, else Noto Sans JP.
   */
  familyFor(text: string): string {
    for (const ch of text)
      if (this.familyOf(ch.charCodeAt(0), 'normal') === CJK_FAMILY) return CJK_FAMILY;
    return LATIN_FAMILY;
  }
}

/** Breaks text into lines no wider than `width`: at spaces, and between CJK characters. */
export function wrapText(
  text: string,
  width: number,
  measure: (piece: string) => number,
): string[] {
  const lines: string[] = [];
  for (const paragraph of text.split('\n')) {
    const tokens = paragraph.match(
      /[\u3000-\u9fff\uf900-\ufaff\uff00-\uffef]|[^ \t\u3000-\u9fff\uf900-\ufaff\uff00-\uffef]+|[ \t]+/g,
    ) ?? [''];
    let line = '';
    for (const token of tokens) {
      if (line.trim() !== '' && measure((line + token).trimEnd()) > width) {
        lines.push(line.trimEnd());
        line = /^[ \t]+$/.test(token) ? '' : token;
      } else line += token;
      // A single word wider than the line is cut where it must be cut.
      while (measure(line.trimEnd()) > width && Array.from(line.trimEnd()).length > 1) {
        const chars = Array.from(line);
        let cut = chars.length - 1;
        while (cut > 1 && measure(chars.slice(0, cut).join('')) > width) cut--;
        lines.push(chars.slice(0, cut).join(''));
        line = chars.slice(cut).join('');
      }
    }
    lines.push(line.trimEnd());
  }
  return lines;
}
