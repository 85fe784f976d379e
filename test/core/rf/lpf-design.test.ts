import { describe, expect, it } from 'vitest';
import { defaultCutoffHz } from '../../../src/core/rf/bands';
import { ladderOf, pointAt } from '../../../src/core/rf/lpf-analysis';
import { designLpf, type LpfDesign } from '../../../src/core/rf/lpf-design';
import { validateLpfParams } from '../../../src/core/rf/lpf-validate';
import { prototypeLossDb } from '../../../src/core/rf/prototype';
import { lpfParams } from './fixture';
import { near } from './helpers';

function design(over: Parameters<typeof lpfParams>[0], f0 = 7.0e6): LpfDesign {
  const d = designLpf(lpfParams(over), f0);
  if (!d.ok) throw new Error(JSON.stringify(d.errors));
  return d.value;
}

// Source: REFERENCE-VALUES §1.5 worked example [D] (values printed to 4 significant figures)
const toleranceF = 0.1e-12;
const toleranceH = 0.0001e-6;
const toleranceDb = 0.006;

describe('7.5 MHz worked example (REFERENCE-VALUES §1.5)', () => {
  it('5th-order 0.1 dB Chebyshev component values', () => {
    const d = design({ cutoffHz: 7.5e6 });
    const v = d.elements.map((e) => e.idealValue);
    near(v[0], 486.7e-12, toleranceF, 'C1');
    near(v[1], 1.4549e-6, toleranceH, 'L2');
    near(v[2], 838.2e-12, toleranceF, 'C3');
    near(v[3], 1.4549e-6, toleranceH, 'L4');
    near(v[4], 486.7e-12, toleranceF, 'C5');
    expect(d.elements.map((e) => e.kind)).toEqual([
      'shunt-capacitor',
      'series-inductor',
      'shunt-capacitor',
      'series-inductor',
      'shunt-capacitor',
    ]);
  });
  it('lossless ideal ladder reproduces the ABCD script check', () => {
    const l = ladderOf(design({ cutoffHz: 7.5e6 }), 'ideal', true);
    const cases: [number, number][] = [
      [7.0e6, 0.01],
      [7.5e6, 0.1],
      [14e6, 31.35],
      [15e6, 34.85],
      [21e6, 51.01],
      [22.5e6, 54.21],
    ];
    for (const [f, db] of cases) near(pointAt(l, f).lossDb, db, toleranceDb, `${f} Hz`);
  });
  it('7th-order 0.1 dB values and losses', () => {
    const d = design({ cutoffHz: 7.5e6, order: 7 });
    const v = d.elements.map((e) => e.idealValue);
    near(v[0], 501.3e-12, toleranceF, 'C1');
    near(v[1], 1.5096e-6, toleranceH, 'L2');
    near(v[2], 889.9e-12, toleranceF, 'C3');
    near(v[3], 1.6694e-6, toleranceH, 'L4');
    const l = ladderOf(d, 'ideal', true);
    near(pointAt(l, 14e6).lossDb, 52.82, toleranceDb, '14 MHz');
    near(pointAt(l, 21e6).lossDb, 80.36, toleranceDb, '21 MHz');
  });
  it('5th-order Butterworth values and losses', () => {
    const d = design({ cutoffHz: 7.5e6, response: 'butterworth' });
    const v = d.elements.map((e) => e.idealValue);
    near(v[0], 262.3e-12, toleranceF, 'C1');
    near(v[1], 1.7168e-6, toleranceH, 'L2');
    near(v[2], 848.8e-12, toleranceF, 'C3');
    const l = ladderOf(d, 'ideal', true);
    near(pointAt(l, 7e6).lossDb, 1.77, toleranceDb, '7 MHz');
    near(pointAt(l, 14e6).lossDb, 27.12, toleranceDb, '14 MHz');
  });
});

describe('denormalised ladders against the closed form (REFERENCE-VALUES §1.4)', () => {
  // Source: |S21|^2 = 1/(1 + eps^2 T_n^2(f/fc)) and Butterworth 1/(1 + (f/fc)^2n), Bretchko & Ludwig
  const tolDb = 0.001;
  for (const response of ['butterworth', 'chebyshev'] as const) {
    for (const order of [3, 5, 7, 9]) {
      for (const form of ['capacitor-input', 'inductor-input'] as const) {
        it(`${response} n=${order} ${form}`, () => {
          const d = design({ cutoffHz: 10e6, response, order, form, rippleDb: 0.2 });
          const l = ladderOf(d, 'ideal', true);
          for (const w of [0.3, 0.8, 1, 1.5, 2, 3, 5]) {
            near(
              pointAt(l, w * 10e6).lossDb,
              prototypeLossDb(response, order, d.rippleDb, w),
              tolDb + 1e-4 * prototypeLossDb(response, order, d.rippleDb, w),
              `Ω=${w}`,
            );
          }
        });
      }
    }
  }
});

describe('as built', () => {
  it('capacitors are sums of IEC 60063 E24 values and inductors follow L = AL N^2', () => {
    // Source: IEC 60063 E24 list (REFERENCE-VALUES §5.1)
    const e24 = [10, 11, 12, 13, 15, 16, 18, 20, 22, 24, 27, 30, 33, 36, 39, 43, 47, 51, 56, 62, 68, 75, 82, 91];
    const d = design({});
    for (const e of d.elements) {
      if (e.kind === 'shunt-capacitor') {
        for (const part of e.capacitorPartsF) {
          const mant = Math.round(part / 10 ** Math.floor(Math.log10(part)) * 10);
          expect(e24).toContain(mant);
        }
        near(e.builtValue, e.capacitorPartsF.reduce((a, b) => a + b, 0), 1e-18, 'sum');
        expect(Math.abs(e.errorFraction)).toBeLessThan(0.02);
      } else {
        near(e.builtValue, 4.9e-9 * (e.turns as number) ** 2, 1e-15, 'AL N^2');
        const nExact = Math.sqrt(e.idealValue / 4.9e-9);
        expect(Math.abs((e.turns as number) - nExact)).toBeLessThanOrEqual(0.5);
      }
    }
  });
  it('default cutoff follows the stated band rule', () => {
    expect(design({}).cutoffHz).toBeCloseTo(defaultCutoffHz(7.0e6, 'chebyshev'), 6);
    expect(defaultCutoffHz(7.0e6, 'chebyshev')).toBeCloseTo(8.4e6, 0); // 1.2 x 7.0 MHz > 1.05 x 7.3 MHz
    expect(defaultCutoffHz(14.0e6, 'butterworth')).toBeCloseTo(19.6e6, 0); // 1.4 x 14 MHz
    expect(defaultCutoffHz(10.12e6, 'chebyshev')).toBeCloseTo(12.144e6, 0);
  });
});

describe('validation as values', () => {
  const fields = (over: Parameters<typeof lpfParams>[0]) => validateLpfParams(lpfParams(over)).map((e) => e.field);
  it('rejects even order, out-of-range order, ripple, AL, trials', () => {
    expect(fields({ order: 4 })).toContain('order');
    expect(fields({ order: 11 })).toContain('order');
    expect(fields({ order: 1 })).toContain('order');
    expect(fields({ rippleDb: 0.6 })).toContain('rippleDb');
    expect(fields({ rippleDb: 0.005 })).toContain('rippleDb');
    expect(fields({ coreAlHPerTurn2: 0 })).toContain('coreAlHPerTurn2');
    expect(fields({ coreAlHPerTurn2: -1e-9 })).toContain('coreAlHPerTurn2');
    expect(fields({ monteCarloTrials: -3 })).toContain('monteCarloTrials');
    expect(fields({})).toEqual([]);
  });
  it('designLpf returns errors, never throws', () => {
    const bad = designLpf(lpfParams({ order: 6, coreAlHPerTurn2: 0 }), 7e6);
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.errors.map((e) => e.field).sort()).toEqual(['coreAlHPerTurn2', 'order']);
    const noF = designLpf(lpfParams(), 0);
    expect(noF.ok).toBe(false);
    const lowCut = designLpf(lpfParams({ cutoffHz: 5e6 }), 7e6);
    expect(lowCut.ok).toBe(false);
  });
});
