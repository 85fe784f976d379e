// The builder's pack read back as text: totals, kit count, packing sheets, checklist lines, page numbers
// and the data date on every page; page sizes from ISO 216 (A4 210 × 297 mm) and US Letter (8.5 × 11 in).
import { describe, expect, it, beforeAll } from 'vitest';
import { PDFDocument } from 'pdf-lib';
import { club30m } from '../../seed-demo/club-30m';
import { portable20m } from '../../seed-demo/portable-20m';
import { buildPack, buildPackWithInfo, type PackReport } from '../../src/pdf';
import { formatMoney } from '../../src/core/cost/money';
import { computeBudget } from '../../src/core/budget';
import { formatValue } from '../../src/core/units';
import { evaluationFor } from './fixture';
import { hasPoppler, POPPLER_MISSING, pagesText, writeTemp, imageCount } from './pdf-text';

if (!hasPoppler) console.warn(POPPLER_MISSING);
const DATE = '2026-11-28';
// 1 in = 72 pt; A4 = 210 mm x 297 mm = 595.28 x 841.89 pt (ISO 216)
const toleranceVPt = 0.01;

const count = (pages: string[], re: RegExp) => pages.filter((p) => re.test(p)).length;

describe('club pack (8 kits, mains)', () => {
  let report: PackReport;
  let bytes: Uint8Array;
  let pages: string[] = [];
  let pageCount = 0;
  beforeAll(async () => {
    report = evaluationFor(club30m);
    bytes = await buildPack(club30m, report, { paper: 'a4', dataDate: DATE });
    pageCount = (await PDFDocument.load(bytes)).getPageCount();
    if (hasPoppler) pages = pagesText(writeTemp(bytes, 'club.pdf'));
  });

  it('is A4 on every page', async () => {
    const doc = await PDFDocument.load(bytes);
    for (const p of doc.getPages()) {
      expect(Math.abs(p.getWidth() - 595.28)).toBeLessThan(toleranceVPt);
      expect(Math.abs(p.getHeight() - 841.89)).toBeLessThan(toleranceVPt);
    }
  });

  it.skipIf(!hasPoppler)('numbers every page "page X of Y" and prints the data date on each', () => {
    expect(pages.length).toBe(pageCount);
    pages.forEach((text, i) => {
      expect(text).toContain(`page ${i + 1} of ${pageCount}`);
      expect(text).toContain(`data of ${DATE}`);
    });
  });

  it.skipIf(!hasPoppler)('shows the build total, per-kit cost and stage subtotals of the cost report', () => {
    const all = pages.join('\n');
    const c = report.cost!;
    expect(all).toContain(formatMoney(c.totals.buildCents, c.currency));
    expect(all).toContain(formatMoney(c.totals.perKitCents!, c.currency));
    for (const st of c.stages) expect(all).toContain(formatMoney(st.partsCents, c.currency));
    expect(all).toMatch(/Kits in this build\s+8/);
  });

  it.skipIf(!hasPoppler)('has one packing sheet per kit', () => {
    expect(count(pages, /Packing sheet — kit \d+ of 8/)).toBe(8);
    for (let k = 1; k <= 8; k++) expect(pages.join('\n')).toContain(`Packing sheet — kit ${k} of 8`);
  });

  it.skipIf(!hasPoppler)('carries the key checklist lines, with Ω and µ rendered', () => {
    const all = pages.join('\n').replace(/\s+/g, ' ');
    expect(all).toContain('Build checklist');
    expect(all).toContain('Safety checklist');
    expect(all).toContain('Set the bias preset to minimum (no gate bias) before the first key-down.');
    expect(all).toMatch(/series lamp/);
    expect(all).toMatch(/Bond the protective earth to the chassis/);
    expect(all).toMatch(/Primary fuse: time-lag \(T\)/);
    expect(all).toMatch(/licence/);
    expect(all).toContain('kΩ');
    expect(all).toContain('µF');
    expect(all).toContain('°C');
    expect(all).not.toMatch(/NaN|Infinity|undefined|\[object/);
  });

  it.skipIf(!hasPoppler)('prints the budget per rail and mode, the supply fuses and the harmonics table', () => {
    const all = pages.join('\n').replace(/\s+/g, ' ');
    for (const r of report.budget.rails) {
      for (const m of ['receive', 'keyUp', 'keyDown'] as const) expect(all).toContain(formatValue(r.outputA[m], 'A'));
    }
    const pf = report.supply!.primary!.fuse;
    expect(all).toContain(`${formatValue(pf.ratedA, 'A')} ${pf.characteristic} (load ${formatValue(pf.loadA, 'A')}`);
    // a level below the -70 dBc construction floor is printed as "by construction", never as a number
    for (const h of report.rf!.harmonics!.rows)
      expect(all).toContain(h.predictedDbc < -70 ? 'by construction' : formatValue(h.predictedDbc, 'dBc'));
    const lpf = report.rf!.stages.find((s) => s.lpf)!.lpf!.design!;
    for (const e of lpf.elements.filter((x) => x.turns !== null)) expect(all).toContain(`${e.turns} turns`);
  });

  it.skipIf(!hasPoppler)('draws the plots as vector paths: no raster images in the file', () => {
    const n = imageCount(writeTemp(bytes, 'club-img.pdf'));
    if (n === null) return;
    expect(n).toBe(0);
    const all = pages.join('\n');
    expect(all).toContain('|S21| as built');
    expect(all).toContain('two mains cycles');
  });
});

describe('portable pack (1 kit, battery)', () => {
  it.skipIf(!hasPoppler)('is Letter, has no packing sheets and battery items instead of mains items', async () => {
    const r = await buildPackWithInfo(portable20m, evaluationFor(portable20m), { paper: 'letter', dataDate: DATE });
    const doc = await PDFDocument.load(r.bytes);
    for (const p of doc.getPages()) {
      expect(p.getWidth()).toBeCloseTo(612, 2);
      expect(p.getHeight()).toBeCloseTo(792, 2);
    }
    expect(r.packingSheets).toBe(0);
    const all = pagesText(writeTemp(r.bytes, 'portable.pdf')).join('\n').replace(/\s+/g, ' ');
    expect(all).not.toContain('Packing sheet');
    expect(all).toMatch(/Kits in this build 1/);
    expect(all).toContain('Fuse the positive lead at the battery terminal');
    expect(all).toMatch(/reverse-polarity protection/);
    expect(all).not.toMatch(/series lamp/);
  });
});

describe('pack with nothing but the budget', () => {
  it.skipIf(!hasPoppler)(
    'prints "not computed" for supply, RF and cost and strips characters the font lacks',
    async () => {
      // U+E000 is a private-use code point: no font has a glyph for it, so it must be dropped, not crash
      const project = { ...structuredClone(club30m), name: 'Odd\u{E000} name' };
      const report = { budget: computeBudget(project), supply: null, rf: null, cost: null, findings: [] };
      const bytes = await buildPack(project, report, { paper: 'a4', dataDate: DATE });
      const all = pagesText(writeTemp(bytes, 'bare.pdf')).join('\n');
      expect(all).toContain('Supply design: not computed.');
      expect(all).toContain('RF design: not computed.');
      expect(all).toContain('Costing: not computed.');
      expect(all).toContain('Odd name');
    },
  );
});

describe('pack for a brand-new, empty project', () => {
  it.skipIf(!hasPoppler)('renders without crashing and without NaN in the text', async () => {
    const { newProject } = await import('../../src/core/new-project');
    const { evaluate } = await import('../../src/core/evaluate');
    for (const mains of [null, { nominalV: 230, frequencyHz: 50, lowFraction: 0.1, highFraction: 0.1 }]) {
      const p = newProject('p-empty', 'Empty', 7.03e6, 5, mains);
      const bytes = await buildPack(p, evaluate(p), { paper: 'a4', dataDate: DATE });
      const text = pagesText(writeTemp(bytes, 'empty.pdf')).join('\n');
      expect(text).toContain('Safety checklist');
      expect(text).not.toMatch(/NaN|Infinity|undefined/);
    }
  });
});
