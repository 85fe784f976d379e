// Layout toolkit: word wrap stays inside the width and loses no text; characters the embedded DejaVu fonts
// cannot draw are dropped while the symbols the pack needs (Ω µ ° ± ≤ ≥ ×) are kept; page sizes follow
// ISO 216 (A4 = 210 × 297 mm) and US Letter (8.5 × 11 in) at 72 pt per inch.
import { describe, expect, it, beforeAll } from 'vitest';
import fc from 'fast-check';
import { propertyOptions } from '../helpers/property'; // fixed seed per property
import { Layout, PAPER_SIZES_PT } from '../../src/pdf/layout';

const mmToPt = (mm: number) => (mm / 25.4) * 72;
const tolerancePt = 0.01;

describe('paper sizes', () => {
  it('A4 and Letter in points', () => {
    expect(Math.abs(PAPER_SIZES_PT.a4[0] - mmToPt(210))).toBeLessThan(tolerancePt);
    expect(Math.abs(PAPER_SIZES_PT.a4[1] - mmToPt(297))).toBeLessThan(tolerancePt);
    expect(PAPER_SIZES_PT.letter).toEqual([8.5 * 72, 11 * 72]);
  });
});

describe('layout toolkit', () => {
  let l: Layout;
  beforeAll(async () => {
    l = await Layout.create('a4', 'test');
  });

  it('keeps the symbols the pack uses and strips what the font lacks', () => {
    expect(l.clean('2.2 kΩ ± 5 %, 4700 µF, 85 °C, ≤ 1 dB, ≥ 2, 3 × 4')).toBe(
      '2.2 kΩ ± 5 %, 4700 µF, 85 °C, ≤ 1 dB, ≥ 2, 3 × 4',
    );
    expect(l.clean('a\u{E000}b\u{10FFFD}c')).toBe('abc');
    expect(l.clean('line one\nline\ttwo')).toBe('line one line two');
  });

  it('wraps every line inside the width and keeps every character (property)', () => {
    const word = fc.stringMatching(/^[A-Za-z0-9Ωµ°±×.,()-]{1,40}$/);
    fc.assert(
      fc.property(
        fc.array(word, { minLength: 0, maxLength: 30 }),
        fc.integer({ min: 30, max: 500 }),
        fc.constantFrom(7, 8.5, 11),
        (words, widthPt, sizePt) => {
          const text = words.join(' ');
          const lines = l.wrap(text, widthPt, sizePt);
          // measured by pdf-lib's own font metrics
          for (const line of lines)
            if (line.length > 1) expect(l.font().widthOfTextAtSize(line, sizePt)).toBeLessThanOrEqual(widthPt + 1e-6);
          expect(lines.join('').replace(/ /g, '')).toBe(text.replace(/ /g, ''));
        },
      ),
      propertyOptions(42, 200), // fixed seed
    );
  });

  it('repeats the table header on each page a long table runs onto', () => {
    const before = l.pages.length;
    const rows = Array.from({ length: 200 }, (_, i) => ({ cells: [`row ${i}`, 'value'] }));
    let headers = 0;
    const original = l.drawAt.bind(l);
    l.drawAt = (text, x, y, size, bold, color) => {
      if (text === 'Name' && bold) headers++;
      original(text, x, y, size, bold, color);
    };
    l.table([{ header: 'Name', width: 0.7 }, { header: 'Value', width: 0.3, align: 'right' }], rows);
    l.drawAt = original;
    const pagesUsed = l.pages.length - before + 1;
    expect(pagesUsed).toBeGreaterThan(1);
    expect(headers).toBe(pagesUsed);
  });
});

describe('table columns hold their longest word', () => {
  let l: Layout;
  beforeAll(async () => {
    l = await Layout.create('a4', 'test');
  });
  const sizePt = 8.5;
  const padPt = 3;
  const toleranceWidthPt = 1e-6;

  it('widens a references column for "C10–C14" from the column with room, and the word stays on one line', () => {
    const columns = [{ header: 'Refs', width: 0.05 }, { header: 'Description', width: 0.95 }];
    const rows = [{ cells: ['C10–C14', 'Capacitor C0G 500 V'] }, { cells: ['R1', 'Resistor 2.2 kΩ 1 W'] }];
    const w = l.columnWidthsPt(columns, rows, sizePt, padPt);
    expect(Math.abs(w[0] + w[1] - l.contentWidthPt)).toBeLessThan(toleranceWidthPt);
    expect(w[0]).toBeGreaterThanOrEqual(l.textWidth('C10–C14', sizePt) + 2 * padPt - toleranceWidthPt);
    expect(l.wrap('C10–C14', w[0] - 2 * padPt, sizePt)).toEqual(['C10–C14']);
    // with the given 5 % the range would have been broken inside the word
    expect(l.wrap('C10–C14', 0.05 * l.contentWidthPt - 2 * padPt, sizePt).length).toBeGreaterThan(1);
  });

  it('keeps the given widths when every word fits, and when no widening can make one fit', () => {
    const columns = [{ header: 'A', width: 0.5 }, { header: 'B', width: 0.5 }];
    expect(l.columnWidthsPt(columns, [{ cells: ['x', 'y'] }], sizePt, padPt)).toEqual([
      0.5 * l.contentWidthPt,
      0.5 * l.contentWidthPt,
    ]);
    const huge = 'W'.repeat(400);
    expect(l.columnWidthsPt(columns, [{ cells: [huge, huge] }], sizePt, padPt)).toEqual([
      0.5 * l.contentWidthPt,
      0.5 * l.contentWidthPt,
    ]);
  });
});
