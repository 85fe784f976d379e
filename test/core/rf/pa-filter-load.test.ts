// The filter's load on the PA with a matched antenna: the ripple relation of a Chebyshev filter worked by hand, and
// the finding's severity. Sources: power conservation in a lossless two-port, |S11|² + |S21|² = 1, and the
// Chebyshev passband's least transmission 1/(1 + ε²) = 10^(−ripple/10) (textbook relations of filter theory), so
// |Γ|max² = 1 − 10^(−ripple/10); SWR = (1 + |Γ|)/(1 − |Γ|) (definition of the standing-wave ratio).
import { describe, expect, it } from 'vitest';
import { loadsThroughFilter } from '../../../src/core/rf/class-e-loads';
import { analyseLpf, ladderOf, pointAt, type Ladder } from '../../../src/core/rf/lpf-analysis';
import { designLpf } from '../../../src/core/rf/lpf-design';
import { lpfSwrFinding } from '../../../src/core/rf/lpf-swr-finding';
import { designSwr, filterLoadFindings, rippleReflection, swrOf } from '../../../src/core/rf/pa-filter-load';
import { swrStress, type MatchedPoint } from '../../../src/core/rf/pa-swr';
import { lpfParams } from './fixture';
import { near } from './helpers';

const F = 10e6;
const W = 2 * Math.PI * F;
// Invented matched stage: 20 V highest supply, drain peak 40 V, 3 A peak, 10 W out of 14.2857 W DC (70 %)
const m: MatchedPoint = { drainPeakV: 40, maxRailV: 20, peakDeviceA: 3, outputW: 10, dcInputW: 10 / 0.7, biasW: 0 };
const ladder = (kinds: number[], values: number[]): Ladder => ({
  kinds: Uint8Array.from(kinds), values: Float64Array.from(values), inductorQ: Infinity, capacitorQ: Infinity,
  r0Ohm: 50,
});
const through = (l: Ladder) => (phases: number) => loadsThroughFilter(l, F, 2, phases);
const design = () => {
  const d = designLpf(lpfParams(), F);
  if (!d.ok) throw new Error('fixture filter refused');
  return d.value;
};

describe('the ripple relation, by hand', () => {
  it('0.1 dB: 10^(−0.01) = 0.977237, |Γ|² = 0.022763, |Γ| = 0.150873, SWR = 1.150873/0.849127 = 1.35536', () => {
    near(rippleReflection(0.1), 0.150873, 1e-5, '|Γ| at 0.1 dB');
    near(swrOf(rippleReflection(0.1)), 1.35536, 1e-5, 'SWR at 0.1 dB');
  });
  it('0.5 dB: 10^(−0.05) = 0.891251, |Γ|² = 0.108749, |Γ| = 0.329771, SWR = 1.98406', () => {
    near(rippleReflection(0.5), 0.329771, 1e-5, '|Γ| at 0.5 dB');
    near(swrOf(rippleReflection(0.5)), 1.98406, 1e-5, 'SWR at 0.5 dB');
  });
  it('the lossless 0.1 dB design (fixture, order 5) peaks at that SWR in its passband and never above it', () => {
    const d = design();
    const l = ladderOf(d, 'ideal', true);
    let most = 1;
    for (let i = 1; i <= 2000; i++) most = Math.max(most, pointAt(l, (d.cutoffHz * i) / 2000).inputSwr);
    // a ripple peak is met within the 2000-point grid to 0.5 %; the bound itself may not be exceeded beyond rounding
    expect(most).toBeLessThanOrEqual(1.35536 * 1.0001);
    expect(most).toBeGreaterThan(1.35536 * 0.995);
    expect(designSwr(d).passbandMax).toBeCloseTo(1.35536, 4);
  });
});

describe('the finding: a caution only when it matters', () => {
  const ctx = { design: design(), matchedOutputW: 10, deviceVdsMaxV: 100 };
  it('a perfect 50 Ω line (SWR 1): ok, nothing to do', () => {
    const f = filterLoadFindings(swrStress('D', m, 2, 50, 0, through(ladder([], []))), 'PA', ctx);
    expect(f.map((x) => x.severity)).toEqual(['ok']);
    expect(f[0].message).toContain('nothing to do');
    expect(f[0].message).toContain('SWR 1.36 at its ripple peaks');
  });
  // series j25 Ω: Z_in = 50 + j25 Ω, |Γ| = 25/|100 + j25| = 0.242536, SWR
  // 1.6404 (above the 1.355 the design allows);
  // class D: P = 10 × Re(z)/|z|² = 10/1.25 = 8 W, 10 log10(0.8) = −0.97 dB (within the 1 dB power check)
  const series = swrStress('D', m, 2, 50, 0, through(ladder([1], [25 / W])));
  it('SWR 1.64 with a 0.1 dB design: the parts as fitted exceed the design, a caution that says so', () => {
    const f = filterLoadFindings(series, 'PA', ctx)[0];
    expect(f.severity).toBe('caution');
    expect(f.message).toContain('50.0 + j25.0 Ω');
    expect(f.message).toContain('SWR 1.64');
    expect(f.message).toContain('8.0 W against 10.0 W into the design load (-1.0 dB');
    expect(f.message).toMatch(/make it worse than the design/);
    expect(f.message).toMatch(/trim the fitted parts/);
  });
  it('the same load with no design known: −0.97 dB is within the power check and the drain is far ' +
    'from 100 V: ok', () => {
    const f = filterLoadFindings(series, 'PA', { ...ctx, design: null })[0];
    expect(f.severity).toBe('ok');
  });
  it('a 45 V rating against a 40 V drain peak (less than 1.25 × 40 = 50 V): a caution naming the rating', () => {
    const f = filterLoadFindings(series, 'PA', { ...ctx, design: null, deviceVdsMaxV: 45 })[0];
    expect(f.severity).toBe('caution');
    expect(f.message).toContain('45 V rating');
  });
  it('the same load with 20 W into the design load: 10 log10(8/20) = −3.98 dB, beyond 1 dB, a caution', () => {
    const f = filterLoadFindings(series, 'PA', { ...ctx, design: null, matchedOutputW: 20 })[0];
    expect(f.severity).toBe('caution');
    expect(f.message).toContain('-4.0 dB');
  });
});

describe("the filter's own SWR finding against its design (lpf-swr-finding)", () => {
  const exact = () => {
    // the parts exactly at their design values and lossless: the ripple relation bounds its SWR at 1.35536
    const d = design();
    return { ...d, inductorQ: Infinity, capacitorQ: Infinity,
      elements: d.elements.map((e) => ({ ...e, builtValue: e.idealValue, errorFraction: 0 })) };
  };
  it('parts at their design values: never a caution (the passband SWR is within the ripple bound by design)', () => {
    const d = exact();
    const f = lpfSwrFinding(d, analyseLpf(d, 11), 'LPF');
    expect(f.severity).toBe('ok');
    expect(f.value!).toBeLessThanOrEqual(1.35536 * 1.0001);
  });
  it('C1 at five times its value: a shunt of about −j10 Ω at the input swamps 50 Ω, SWR far ' +
    'above 2: a fail', () => {
    // C1 ≈ 300 pF × 5 = 1.5 nF: 1/(2π · 10 MHz · 1.5 nF) ≈ 10.6 Ω. Across the rest of the ladder
    // (about 50 Ω): 50 ∥ −j10.6 = 2.15 − j10.14 Ω, z = 0.043 − j0.203,
    // |Γ| = |z − 1|/|z + 1| = 0.978/1.063 = 0.92, SWR ≈ 24
    const d = exact();
    d.elements[0] = { ...d.elements[0], builtValue: 5 * d.elements[0].idealValue };
    const f = lpfSwrFinding(d, analyseLpf(d, 11), 'LPF');
    expect(f.severity).toBe('fail');
    expect(f.message).toMatch(/more than its design allows/);
  });
});
