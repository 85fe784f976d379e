// A harmonic predicted below the construction floor (−70 dBc at the antenna, common practice, no published source)
// is printed in words ("limited by construction"), never as a number: in the build checklist and on the pack cover.
import { beforeAll, describe, expect, it } from 'vitest';
import { club30m } from '../../seed-demo/club-30m';
import { buildChecklist } from '../../src/core/checklists';
import { buildPack, type PackReport } from '../../src/pdf';
import { CONSTRUCTION_FLOOR_DBC } from '../../src/core/rf/harmonics';
import { formatValue } from '../../src/core/units';
import { evaluationFor } from './fixture';
import { hasPoppler, POPPLER_MISSING, pagesText, writeTemp } from './pdf-text';

if (!hasPoppler) console.warn(POPPLER_MISSING);

describe('harmonics below the construction floor', () => {
  let report: PackReport;
  beforeAll(() => {
    report = evaluationFor(club30m);
  });
  it('the club has harmonics on both sides of the floor (so both branches below are exercised)', () => {
    const rows = report.rf!.harmonics!.rows;
    expect(rows.some((h) => h.predictedDbc < CONSTRUCTION_FLOOR_DBC)).toBe(true);
    expect(rows.some((h) => h.predictedDbc >= CONSTRUCTION_FLOOR_DBC)).toBe(true);
  });
  it('build checklist: "limited by construction" with no value below the floor, the predicted number above it', () => {
    const items = buildChecklist(club30m, report).flatMap((s) => s.items).filter((i) => /^Harmonic \d/.test(i.text));
    for (const h of report.rf!.harmonics!.rows) {
      const item = items.find((i) => i.text.startsWith(`Harmonic ${h.n}:`))!;
      if (h.predictedDbc < CONSTRUCTION_FLOOR_DBC) {
        expect(item.text).toContain('limited by construction');
        expect(item.value).toBeNull();
        expect(item.text).not.toContain(formatValue(h.predictedDbc, 'dBc'));
      } else {
        expect(item.value).toBe(h.predictedDbc);
        expect(item.text).toContain(formatValue(h.predictedDbc, 'dBc'));
      }
    }
  });
  it.skipIf(!hasPoppler)('pack cover: the worst harmonic below the floor reads "limited by construction"', async () => {
    // every harmonic pushed 40 dB further down (below the floor): the cover must not print a number for it
    const rf = report.rf!;
    const rows = rf.harmonics!.rows.map((h) => ({
      ...h,
      predictedDbc: h.predictedDbc - 40,
      limitedByConstruction: true,
    }));
    const low = { ...report, rf: { ...rf, harmonics: { ...rf.harmonics!, rows } } } as PackReport;
    const bytes = await buildPack(club30m, low, { paper: 'a4', dataDate: '2026-12-02' });
    const cover = pagesText(writeTemp(bytes, 'floor.pdf'))[0].replace(/\s+/g, ' ');
    expect(cover).toMatch(/Worst harmonic H\d: limited by construction/);
    for (const h of rows) expect(cover).not.toContain(formatValue(h.predictedDbc, 'dBc'));
  });
});
