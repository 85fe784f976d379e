// Sweeps on the demos: the direction each figure must move is hand reasoning from the demos' own inputs (cited
// beside each check); no expected number comes from running the program. The inputs' spec refuses bad values by name.
import { describe, expect, it } from 'vitest';
import {
  runSweep,
  sweepStart,
  sweepTargets,
  sweepValues,
  withSweepValue,
  type SweepResult,
} from '../../../src/core/compare/sweep';
import { projectMetrics } from '../../../src/core/compare/metrics';
import { evaluate } from '../../../src/core/evaluate';
import { SWEEP_SPECS, SWEEP_PARAMETERS, MAX_SWEEP_POINTS } from '../../../src/core/spec/sweep';
import { defaults, formValues, parseForm, validate } from '../../../src/core/spec';
import { club30m } from '../../../seed-demo/club-30m';
import { portable20m } from '../../../seed-demo/portable-20m';

/**
 * Rounding of the simulation (V, dB, W): a step back smaller than this is not a reversal. Common practice, no source.
 */
const toleranceV = 0.02;
const toleranceDb = 0.05;

const series = (r: SweepResult, key: string) => r.points.map((p) => p.metrics.find((m) => m.key === key)!.value!);
const nonDecreasing = (xs: number[], tol: number) => xs.every((x, i) => i === 0 || x >= xs[i - 1] - tol);
const ok = (o: ReturnType<typeof runSweep>): SweepResult => {
  if (!o.ok) throw new Error(JSON.stringify(o.errors));
  return o.result;
};

describe('sweep values and targets', () => {
  it('spaces points evenly from..to and takes each odd filter order', () => {
    expect(sweepValues({ parameter: 'mainsV', from: 100, to: 140, points: 5 })).toEqual([100, 110, 120, 130, 140]);
    expect(sweepValues({ parameter: 'lpfOrder', from: 3, to: 9, points: 2 })).toEqual([3, 5, 7, 9]);
    expect(sweepValues({ parameter: 'lpfOrder', from: 4, to: 8, points: 12 })).toEqual([5, 7]);
  });

  it('puts the item the PA depends on first (club: the 20 V winding and the PA rail)', () => {
    expect(sweepTargets(club30m, 'windingV')[0].id).toBe('w-20');
    expect(sweepTargets(club30m, 'reservoirF')[0]).toMatchObject({ id: 'rail-pa', currentValue: 0.0068 });
    expect(sweepTargets(club30m, 'lpfOrder')[0]).toMatchObject({ id: 'st-lpf', currentValue: 5 });
    expect(sweepTargets(portable20m, 'mainsV')).toEqual([]);
  });

  it('starts the form round the item’s value, inside its field’s range', () => {
    // two significant digits: 6800 µF × 0.5 = 3400 µF; × 2 = 13600 µF → 14000 µF; 120 V × 0.85 = 102 → 100 V
    // and × 1.15 = 138 → 140 V
    expect(sweepStart('reservoirF', 0.0068, { min: 0, max: 10 })).toEqual({ from: 0.0034, to: 0.014, points: 7 });
    expect(sweepStart('mainsV', 120, { min: 50, max: 300 })).toEqual({ from: 100, to: 140, points: 7 });
    // 280 V × 1.15 = 322 → 320, above the 300 V top of the mains field: held at 300
    expect(sweepStart('mainsV', 280, { min: 50, max: 300 }).to).toBe(300);
  });

  it('edits a copy only, under its own id', () => {
    const before = structuredClone(club30m);
    const copy = withSweepValue(club30m, 'reservoirF', 'rail-pa', 0.01);
    expect(club30m).toEqual(before);
    expect(copy.id).not.toBe(club30m.id);
    expect(copy.supply.rails.find((r) => r.id === 'rail-pa')).toMatchObject({ reservoirF: 0.01 });
  });
});

describe('sweeps of the club demo', () => {
  it('reservoir of the PA rail: the PA rail margin never falls as the capacitance rises', () => {
    // Source: capacitor-input filter, ripple V_pp ≈ I / (2 f C) for a bridge (a textbook relation; from
    // memory): more C, less ripple, a higher trough at the same load
    const r = ok(
      runSweep(club30m, { parameter: 'reservoirF', target: 'rail-pa', from: 2200e-6, to: 15000e-6, points: 5 }),
    );
    const margins = series(r, 'trough:PA rail (unregulated, ~24 V)');
    expect(nonDecreasing(margins, toleranceV), margins.join(', ')).toBe(true);
    expect(margins[4]).toBeGreaterThan(margins[0]);
    // the other rectified rail has its own winding and reservoir; it moves only through the primary the two
    // windings share (simulated together: cross-regulation), by less than the swept rail itself
    const other = series(r, 'trough:Raw DC for the 13.8 V regulator');
    expect(Math.max(...other) - Math.min(...other)).toBeLessThan(Math.max(...margins) - Math.min(...margins));
  });

  it('mains voltage: every rail margin rises with the mains (the windings scale with the primary)', () => {
    // Source: an ideal transformer's secondary voltage is the primary's divided by the turns ratio (any
    // transformer text); the club's rails are all fed from the one mains transformer
    const r = ok(runSweep(club30m, { parameter: 'mainsV', target: '', from: 100, to: 140, points: 5 }));
    for (const key of [
      'trough:Raw DC for the 13.8 V regulator',
      'trough:13.8 V signal rail',
      'trough:PA rail (unregulated, ~24 V)',
    ]) {
      const s = series(r, key);
      expect(nonDecreasing(s, toleranceV), `${key}: ${s.join(', ')}`).toBe(true);
      expect(s[4], key).toBeGreaterThan(s[0]);
    }
  });

  it('the point at the project’s own value gives the project’s own figures', () => {
    const r = ok(
      runSweep(club30m, { parameter: 'reservoirF', target: 'rail-pa', from: 0.0068, to: 0.0136, points: 2 }),
    );
    expect(r.points[0].metrics).toEqual(projectMetrics(club30m, evaluate(club30m)));
  });

  it('20 V winding voltage: the PA rail margin rises with it', () => {
    const r = ok(runSweep(club30m, { parameter: 'windingV', target: 'w-20', from: 18, to: 24, points: 4 }));
    const s = series(r, 'trough:PA rail (unregulated, ~24 V)');
    expect(nonDecreasing(s, toleranceV), s.join(', ')).toBe(true);
    expect(s[3]).toBeGreaterThan(s[0]);
  });

  it('filter order: the harmonic margin never falls as the order rises', () => {
    // Source: Matthaei, Young & Jones (1964) §4.03: a Chebyshev low-pass prototype's stop-band attenuation at a
    // given ω/ω1 grows with the number of elements
    const r = ok(runSweep(club30m, { parameter: 'lpfOrder', target: 'st-lpf', from: 3, to: 9, points: 2 }));
    expect(r.points.map((p) => p.value)).toEqual([3, 5, 7, 9]);
    const s = series(r, 'harmonicMarginDb');
    expect(nonDecreasing(s, toleranceDb), s.join(', ')).toBe(true);
    expect(s[3]).toBeGreaterThan(s[0]);
  });

  it('PA load: the low-mains output falls as the load rises (turns ratio fixed)', () => {
    // Source: load-line output P = (V_dd - V_sat)^2 / (2 R_L') with R_L' = R_L / n^2 (Sokal & Sokal / Krauss,
    // Bostian & Raab, Solid State Radio Engineering (1980), ch. 12; from memory); the club's ratio is entered (1:1)
    const r = ok(runSweep(club30m, { parameter: 'paLoadOhm', target: 'st-pa', from: 25, to: 100, points: 4 }));
    const s = series(r, 'paLowOutputW');
    expect(s.every((x, i) => i === 0 || x < s[i - 1]), s.join(', ')).toBe(true);
  });
});

describe('refusals', () => {
  it('a parameter the project does not have is refused by name', () => {
    const o = runSweep(portable20m, { parameter: 'mainsV', target: '', from: 100, to: 140, points: 3 });
    expect(o).toEqual({
      ok: false,
      errors: { target: expect.stringContaining('Item to vary: this project has no mains supply') },
    });
  });

  it('an item that is not in the project is refused by name, listing the ones there are', () => {
    const o = runSweep(club30m, { parameter: 'reservoirF', target: 'rail-13v8', from: 1e-3, to: 2e-3, points: 3 });
    expect(o.ok).toBe(false);
    if (!o.ok)
      expect(o.errors.target).toMatch(/^Item to vary: there is no such item .*"PA rail \(unregulated, ~24 V\)"/);
  });
});

describe('sweep input specs', () => {
  it.each(SWEEP_PARAMETERS)('%s: defaults valid and round-trip through form text', (p) => {
    const spec = SWEEP_SPECS[p];
    const d = defaults(spec);
    expect(validate(spec, d)).toEqual([]);
    expect(parseForm(spec, formValues(spec, d))).toEqual({ ok: true, value: d });
  });

  it('reads a bare reservoir number in µF, as the box says', () => {
    const r = parseForm(SWEEP_SPECS.reservoirF, { target: '', from: '2200', to: '10000', points: '5' });
    expect(r).toEqual({ ok: true, value: { target: '', from: 2200e-6, to: 10000e-6, points: 5 } });
  });

  it.each([
    ['mainsV', { from: 'abc' }, 'from', 'From (mains nominal voltage)'],
    ['mainsV', { from: '400' }, 'from', 'From (mains nominal voltage)'],
    ['windingV', { from: '20', to: '10' }, 'to', 'To (winding rated voltage) must be above From'],
    ['paLoadOhm', { points: String(MAX_SWEEP_POINTS + 1) }, 'points', 'Points'],
    ['paLoadOhm', { points: '2.5' }, 'points', 'Points'],
    ['lpfOrder', { from: '3', to: '4' }, 'to', 'fewer than two odd orders'],
    ['reservoirF', { to: '' }, 'to', 'To (reservoir capacitance) is empty'],
  ] as const)('%s %j is refused, naming the field', (p, bad, field, says) => {
    const spec = SWEEP_SPECS[p];
    const r = parseForm(spec, { ...formValues(spec, defaults(spec)), ...bad });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[field]).toContain(says);
  });
});
