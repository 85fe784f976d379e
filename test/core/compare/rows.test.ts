// Comparison rows: the verdict words against the first column (hand-made figures, hand reasoning), and the rows of
// the demos (their own inputs: which rows exist, which must be equal, which way a change must go).
import { describe, expect, it } from 'vitest';
import { compareRows, SAME_WITHIN } from '../../../src/core/compare/rows';
import { projectMetrics, type Metric } from '../../../src/core/compare/metrics';
import { evaluate } from '../../../src/core/evaluate';
import { club30m } from '../../../seed-demo/club-30m';
import { portable20m } from '../../../seed-demo/portable-20m';
import type { Project } from '../../../src/core/model';

const m = (
  key: string,
  value: number | null,
  better: Metric['better'] = 'higher',
  unit = 'V',
  currency?: string,
): Metric => ({
  key,
  label: key,
  unit,
  better,
  value,
  why: value === null ? 'none' : '',
  currency,
});

describe('compareRows (hand-made figures)', () => {
  it('says better or worse by the direction that is good for the row, against the first column', () => {
    const rows = compareRows([
      [m('a', 10), m('b', 10, 'lower')],
      [m('a', 12), m('b', 12, 'lower')],
      [m('a', 8), m('b', 8, 'lower')],
    ]);
    expect(rows.map((r) => r.cells.map((c) => c.verdict))).toEqual([
      ['same', 'better', 'worse'],
      ['same', 'worse', 'better'],
    ]);
    // 12 - 10 = 2, 8 - 10 = -2
    expect(rows[0].cells.map((c) => c.delta)).toEqual([null, 2, -2]);
    expect(rows.every((r) => r.differs)).toBe(true);
  });

  it('treats a change below half the shown digit as the same, and a missing value as a difference', () => {
    const tiny = SAME_WITHIN.V / 2;
    const rows = compareRows([[m('a', 10), m('b', 5)], [m('a', 10 + tiny), m('b', null)], [m('a', 10), m('c', 1)]]);
    expect(rows[0].differs).toBe(false);
    expect(rows[1].cells.map((c) => c.verdict)).toEqual(['same', 'missing-here', 'missing-here']);
    // a key only the third column has: the first has no such item
    expect(rows[2].key).toBe('c');
    expect(rows[2].cells[0].why).toContain('no such item');
    expect(rows[2].cells[2].verdict).toBe('only-here');
  });

  it('does not set money in two currencies against each other', () => {
    const rows = compareRows([[m('cost', 1000, 'lower', 'cents', 'USD')], [m('cost', 900, 'lower', 'cents', 'EUR')]]);
    expect(rows[0].cells[1].verdict).toBe('not-comparable');
  });
});

const club = evaluate(club30m);
const clubMetrics = projectMetrics(club30m, club);

describe('rows of the demos', () => {
  it('the club has one trough row per rail, then transformer, PA, harmonic, exposure and cost rows', () => {
    // the club demo's three rails by name (seed-demo/club-30m.ts)
    expect(clubMetrics.map((x) => x.key)).toEqual([
      'trough:Raw DC for the 13.8 V regulator',
      'trough:13.8 V signal rail',
      'trough:PA rail (unregulated, ~24 V)',
      'transformerVA',
      'paLowOutputW',
      'drainPeakV',
      'harmonicMarginDb',
      'exposureDistanceM',
      'perKitCents',
    ]);
    expect(
      clubMetrics.every((x) => x.value !== null && Number.isFinite(x.value)),
      JSON.stringify(clubMetrics),
    ).toBe(true);
    // a 20 W PA on a ~24 V rail delivers some watts at low mains but not more than a few times its target
    const low = clubMetrics.find((x) => x.key === 'paLowOutputW')!.value!;
    expect(low).toBeGreaterThan(5);
    expect(low).toBeLessThan(40);
    // a push-pull drain swings to at least twice the supply: peak above 2 × the 20 V minimum of the PA rail
    expect(clubMetrics.find((x) => x.key === 'drainPeakV')!.value!).toBeGreaterThan(40);
  });

  it('a project against itself differs in no row', () => {
    expect(compareRows([clubMetrics, clubMetrics]).filter((r) => r.differs)).toEqual([]);
  });

  it('the club against the battery portable: the portable has no transformer, and its own rails', () => {
    const rows = compareRows([clubMetrics, projectMetrics(portable20m, evaluate(portable20m))]);
    const va = rows.find((r) => r.key === 'transformerVA')!;
    expect(va.cells[1]).toMatchObject({ value: null, verdict: 'missing-here', why: 'no mains transformer' });
    const battery = rows.find((r) => r.key === 'trough:12.8 V battery (4-cell LiFePO4, 6 Ah)')!;
    expect(battery.cells[0].why).toContain('no such item');
    expect(rows.find((r) => r.key === 'trough:PA rail (unregulated, ~24 V)')!.cells[1].verdict).toBe('missing-here');
  });

  it('a variant with twice the PA reservoir: PA rail margin better, cost per kit the same, transformer VA not ' +
    'lower', () => {
    const variant: Project = structuredClone(club30m);
    const pa = variant.supply.rails.find((r) => r.id === 'rail-pa')!;
    if (pa.kind !== 'rectified') throw new Error('demo changed');
    pa.reservoirF = 2 * 0.0068;
    const rows = compareRows([clubMetrics, projectMetrics(variant, evaluate(variant))]);
    const cell = (key: string) => rows.find((r) => r.key === key)!.cells[1];
    // less ripple at the same load raises the trough: ΔV_pp ≈ I / (k f C) halves (capacitor-input filter,
    // a textbook relation; from memory)
    expect(cell('trough:PA rail (unregulated, ~24 V)').verdict).toBe('better');
    // the parts list and prices did not change
    expect(cell('perKitCents').verdict).toBe('same');
    // a larger reservoir shortens the diodes' conduction, raising the winding's RMS current for the same DC
    // (Schade, Proc. IRE 1943, rectifier curves; from memory): the PA winding's VA cannot fall. The two windings
    // share the primary (simulated together), so the 16 V winding's current may move a little the other way:
    // the total may fall by no more than toleranceVA (common practice, no source for the figure)
    const toleranceVA = 0.5;
    expect(cell('transformerVA').delta!).toBeGreaterThanOrEqual(-toleranceVA);
    // the 16 V winding's rail moves only through the shared primary (cross-regulation): less than the PA rail
    const paDelta = Math.abs(cell('trough:PA rail (unregulated, ~24 V)').delta!);
    expect(Math.abs(cell('trough:Raw DC for the 13.8 V regulator').delta ?? 0)).toBeLessThan(paDelta);
  });
});
