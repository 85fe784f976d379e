// A small layout toolkit on pdf-lib: a cursor running down the page, wrapped text, tables with the header
// repeated after each page break, tick boxes, and page footers. All geometry in points (1/72 in).
// pdf-lib puts the origin bottom-left; the cursor `yPt` is measured from the bottom too.
import { PDFDocument, type PDFFont, type PDFPage, rgb, type RGB } from 'pdf-lib';
import { clean, embedFonts, type Fonts } from './fonts';

export type Paper = 'a4' | 'letter';
// ISO 216 A4 is 210 x 297 mm; US Letter 8.5 x 11 in
export const PAPER_SIZES_PT: Record<Paper, [number, number]> = { a4: [595.28, 841.89], letter: [612, 792] };

export const INK = rgb(0.1, 0.1, 0.12);
export const GREY = rgb(0.42, 0.42, 0.45);
export const RULE = rgb(0.78, 0.78, 0.8);
export const SHADE = rgb(0.93, 0.94, 0.96);
export const CAUTION = rgb(0.62, 0.22, 0.0);
export const FAIL = rgb(0.7, 0.05, 0.05);

export interface TextStyle {
  sizePt?: number;
  bold?: boolean;
  color?: RGB;
  indentPt?: number;
  /** extra space after the block */
  afterPt?: number;
}

export interface Column {
  header: string;
  /** fraction of the content width; fractions of a table sum to 1 */
  width: number;
  align?: 'left' | 'right';
  /** draw an empty tick box in this column instead of text */
  tick?: boolean;
}

export interface Row {
  cells: string[];
  bold?: boolean;
  shade?: boolean;
  color?: RGB;
  /** draw cells[0] across the whole table width (a group heading) */
  span?: boolean;
}

/** Glyph advances per character (1000-unit em), regular and bold: the same font files in every document. */
const ADVANCE = [new Map<string, number>(), new Map<string, number>()];

export class Layout {
  readonly marginTopPt = 46;
  readonly marginBottomPt = 52;
  readonly marginSidePt = 44;
  readonly pages: PDFPage[] = [];
  page!: PDFPage;
  yPt = 0;

  private constructor(readonly doc: PDFDocument, readonly fonts: Fonts, readonly paper: Paper) {}

  static async create(paper: Paper, title: string): Promise<Layout> {
    const doc = await PDFDocument.create();
    doc.setTitle(title);
    doc.setCreator('Rigwright');
    doc.setProducer('Rigwright (pdf-lib)');
    // a fixed date keeps the bytes reproducible for the same inputs
    doc.setCreationDate(new Date(0));
    doc.setModificationDate(new Date(0));
    const l = new Layout(doc, await embedFonts(doc), paper);
    l.newPage();
    return l;
  }

  get widthPt(): number {
    return PAPER_SIZES_PT[this.paper][0];
  }
  get heightPt(): number {
    return PAPER_SIZES_PT[this.paper][1];
  }
  get leftPt(): number {
    return this.marginSidePt;
  }
  get contentWidthPt(): number {
    return this.widthPt - 2 * this.marginSidePt;
  }
  get topPt(): number {
    return this.heightPt - this.marginTopPt;
  }

  newPage(): void {
    this.page = this.doc.addPage(PAPER_SIZES_PT[this.paper]);
    this.pageFont = null;
    this.pages.push(this.page);
    this.yPt = this.topPt;
  }

  /** Start a new page unless `heightPt` still fits above the bottom margin. */
  ensure(heightPt: number): void {
    if (this.yPt - heightPt < this.marginBottomPt) this.newPage();
  }

  gap(pt: number): void {
    this.yPt -= pt;
  }

  font(bold = false): PDFFont {
    return bold ? this.fonts.bold : this.fonts.regular;
  }

  clean(text: string): string {
    return clean(text, this.fonts.charset);
  }

  /**
   * Width of clean text: the sum of glyph advances, cached per character (per process: the fonts are the same
   * files) and per whole string within this document (parts lists repeat their cells). pdf-lib draws glyphs at
   * their advances without kerning, so this matches what is drawn, and avoids a fontkit layout per call.
   */
  width(text: string, sizePt: number, bold = false): number {
    const strings = this.stringUnits[bold ? 1 : 0];
    let units = strings.get(text);
    if (units === undefined) {
      const cache = ADVANCE[bold ? 1 : 0];
      const font = this.font(bold);
      units = 0;
      for (const ch of text) {
        let w = cache.get(ch);
        if (w === undefined) {
          w = font.widthOfTextAtSize(ch, 1000);
          cache.set(ch, w);
        }
        units += w;
      }
      strings.set(text, units);
    }
    return (units * sizePt) / 1000;
  }

  private readonly stringUnits = [new Map<string, number>(), new Map<string, number>()];

  textWidth(text: string, sizePt: number, bold = false): number {
    return this.width(this.clean(text), sizePt, bold);
  }

  /** Greedy word wrap; a word longer than the width is broken by characters. */
  wrap(text: string, widthPt: number, sizePt: number, bold = false): string[] {
    const fits = (s: string) => this.width(s, sizePt, bold) <= widthPt;
    const lines: string[] = [];
    let line = '';
    // widths add up (no kerning): the line's width grows by a space and the word, with no re-measuring of the line
    const spaceW = this.width(' ', sizePt, bold);
    let lineW = 0;
    for (const word of this.clean(text).split(' ').filter((w) => w.length > 0)) {
      const wordW = this.width(word, sizePt, bold);
      const candidateW = line ? lineW + spaceW + wordW : wordW;
      if (candidateW <= widthPt) {
        line = line ? `${line} ${word}` : word;
        lineW = candidateW;
        continue;
      }
      if (line) lines.push(line);
      line = '';
      let rest = word;
      while (!fits(rest)) {
        let n = rest.length - 1;
        while (n > 1 && !fits(rest.slice(0, n))) n--;
        lines.push(rest.slice(0, n));
        rest = rest.slice(n);
      }
      line = rest;
      lineW = this.width(rest, sizePt, bold);
    }
    if (line || lines.length === 0) lines.push(line);
    return lines;
  }

  /** Draw one line of already-clean text with its baseline at `baselinePt`. */
  drawAt(text: string, xPt: number, baselinePt: number, sizePt: number, bold = false, color: RGB = INK): void {
    const t = this.clean(text);
    if (t.length === 0) return;
    // drawText with a `font` option adds two entries to the page's font dictionary on every call (it sets the
    // font and sets the old one back); setting the page's font only when it changes adds one per switch
    const font = this.font(bold);
    if (this.pageFont !== font) {
      this.page.setFont(font);
      this.pageFont = font;
    }
    this.page.drawText(t, { x: xPt, y: baselinePt, size: sizePt, color });
  }

  private pageFont: PDFFont | null = null;

  /** A wrapped paragraph at the cursor; breaks pages between lines. */
  text(text: string, style: TextStyle = {}): void {
    const size = style.sizePt ?? 9.5;
    const indent = style.indentPt ?? 0;
    const lineH = size * 1.3;
    for (const line of this.wrap(text, this.contentWidthPt - indent, size, style.bold)) {
      this.ensure(lineH);
      this.yPt -= lineH;
      this.drawAt(line, this.leftPt + indent, this.yPt + size * 0.28, size, style.bold, style.color ?? INK);
    }
    this.yPt -= style.afterPt ?? 3;
  }

  /** Section heading; keeps at least `keepPt` of following content on the same page. */
  heading(text: string, level: 1 | 2 = 1, keepPt = 60): void {
    const size = level === 1 ? 15 : 11.5;
    this.ensure(size * 1.6 + keepPt);
    if (this.yPt < this.topPt - 1) this.yPt -= level === 1 ? 10 : 6;
    this.yPt -= size * 1.25;
    this.drawAt(text, this.leftPt, this.yPt + size * 0.25, size, true);
    if (level === 1)
      this.page.drawLine({
        start: { x: this.leftPt, y: this.yPt - 3 },
        end: { x: this.leftPt + this.contentWidthPt, y: this.yPt - 3 },
        thickness: 0.8,
        color: GREY,
      });
    this.yPt -= level === 1 ? 9 : 4;
  }

  tickBox(xPt: number, baselinePt: number, sizePt: number): void {
    this.page.drawRectangle({
      x: xPt,
      y: baselinePt - 1,
      width: sizePt,
      height: sizePt,
      borderColor: INK,
      borderWidth: 0.7,
    });
  }

  /**
   * Column widths in points. A column too narrow for its longest unbreakable word (a reference range such as
   * "C10–C14", an SKU) is widened to hold it, and the difference is taken from the columns with room to spare, in
   * proportion to that room, so a word is never broken when the table can hold it. When it cannot, the widths stay
   * as given and the wrap breaks the word by characters (nothing is lost).
   */
  columnWidthsPt(columns: Column[], rows: Row[], sizePt: number, padPt: number): number[] {
    const given = columns.map((c) => c.width * this.contentWidthPt);
    const longest = (text: string, bold: boolean) =>
      this.clean(text).split(' ').reduce((m, w) => (w ? Math.max(m, this.width(w, sizePt, bold)) : m), 0);
    const need = columns.map((c, i) => {
      if (c.tick) return 0;
      let m = longest(c.header, true);
      for (const r of rows) if (!r.span) m = Math.max(m, longest(r.cells[i] ?? '', !!r.bold));
      return m + 2 * padPt;
    });
    const shortPt = given.reduce((a, g, i) => a + Math.max(0, need[i] - g), 0);
    if (shortPt === 0) return given;
    const spare = given.map((g, i) => Math.max(0, g - need[i]));
    const sparePt = spare.reduce((a, b) => a + b, 0);
    if (sparePt < shortPt) return given;
    return given.map((g, i) => (need[i] > g ? need[i] : g - (spare[i] * shortPt) / sparePt));
  }

  /** A table: wrapped cells, the header row repeated at the top of every page it runs onto. */
  table(columns: Column[], rows: Row[], sizePt = 8.5, continuedLabel = ''): void {
    const pad = 3;
    const lineH = sizePt * 1.25;
    const colW = this.columnWidthsPt(columns, rows, sizePt, pad);
    const xs: number[] = [];
    let x = this.leftPt;
    for (const w of colW) {
      xs.push(x);
      x += w;
    }
    const widthOf = (i: number) => colW[i] - 2 * pad;
    const spanW = this.contentWidthPt - 2 * pad;
    const wrapRow = (row: Row): string[][] =>
      row.span
        ? [this.wrap(row.cells[0] ?? '', spanW, sizePt, row.bold)]
        : row.cells.map((c, i) => (columns[i]?.tick ? [''] : this.wrap(c ?? '', widthOf(i), sizePt, row.bold)));
    const drawRow = (
      wrapped: string[][],
      bold: boolean,
      fill: RGB | null,
      color: RGB,
      isHeader: boolean,
      span = false,
    ) => {
      const h = Math.max(...wrapped.map((w) => w.length)) * lineH + 2 * pad;
      const top = this.yPt;
      if (fill)
        this.page.drawRectangle({ x: this.leftPt, y: top - h, width: this.contentWidthPt, height: h, color: fill });
      wrapped.forEach((lines, i) => {
        const col = columns[i];
        if (!col) return;
        if (col.tick && !isHeader && !span) {
          this.tickBox(xs[i] + pad, top - pad - sizePt, sizePt);
          return;
        }
        lines.forEach((line, k) => {
          const w = this.width(line, sizePt, bold);
          const lx = col.align === 'right' ? xs[i] + colW[i] - pad - w : xs[i] + pad;
          this.drawAt(line, lx, top - pad - (k + 1) * lineH + sizePt * 0.3, sizePt, bold, color);
        });
      });
      this.page.drawLine({
        start: { x: this.leftPt, y: top - h },
        end: { x: this.leftPt + this.contentWidthPt, y: top - h },
        thickness: isHeader ? 0.8 : 0.3,
        color: isHeader ? GREY : RULE,
      });
      this.yPt = top - h;
      return h;
    };
    const headerLines = columns.map((c, i) => this.wrap(c.header, widthOf(i), sizePt, true));
    const header = () => drawRow(headerLines, true, SHADE, INK, true);
    this.ensure(Math.max(...headerLines.map((w) => w.length)) * lineH + lineH + 4 * pad);
    header();
    let group: Row | null = null;
    for (const row of rows) {
      const wrapped = wrapRow(row);
      const h = Math.max(...wrapped.map((w) => w.length)) * lineH + 2 * pad;
      if (this.yPt - h < this.marginBottomPt) {
        this.newPage();
        if (continuedLabel) this.text(`${continuedLabel} (continued)`, { sizePt: 8, color: GREY, afterPt: 3 });
        header();
        // a group heading (span row) is repeated above the rest of its rows
        if (group && !row.span)
          drawRow(
            wrapRow({ ...group, cells: [`${group.cells[0]} (continued)`] }),
            !!group.bold,
            group.shade ? SHADE : null,
            group.color ?? INK,
            false,
            true,
          );
      }
      if (row.span) group = row;
      drawRow(wrapped, !!row.bold, row.shade ? SHADE : null, row.color ?? INK, false, row.span);
    }
    this.yPt -= 8;
  }

  /** Footer on every page: left text and "page X of Y" on the right. Call once, after all content. */
  footers(leftText: (pageIndex: number) => string): void {
    const n = this.pages.length;
    const size = 7.5;
    this.pages.forEach((p, i) => {
      const right = `page ${i + 1} of ${n}`;
      const y = this.marginBottomPt / 2 - 4;
      p.drawLine({
        start: { x: this.leftPt, y: y + 11 },
        end: { x: this.leftPt + this.contentWidthPt, y: y + 11 },
        thickness: 0.4,
        color: RULE,
      });
      const left = this.clean(leftText(i));
      p.drawText(left, { x: this.leftPt, y, size, font: this.fonts.regular, color: GREY });
      const w = this.width(right, size);
      p.drawText(right, { x: this.leftPt + this.contentWidthPt - w, y, size, font: this.fonts.regular, color: GREY });
    });
  }
}
