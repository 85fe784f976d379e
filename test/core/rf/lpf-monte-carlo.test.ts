import { describe, expect, it } from 'vitest';
import { ladderOf, pointAt } from '../../../src/core/rf/lpf-analysis';
import { designLpf, type LpfDesign } from '../../../src/core/rf/lpf-design';
import { monteCarloLpf, mulberry32 } from '../../../src/core/rf/lpf-monte-carlo';
import { lpfParams } from './fixture';
import { near } from './helpers';

function design(over: Parameters<typeof lpfParams>[0] = {}): LpfDesign {
  const d = designLpf(lpfParams(over), 7.0e6);
  if (!d.ok) throw new Error('design');
  return d.value;
}

describe('mulberry32', () => {
  it('is deterministic per seed and roughly uniform', () => {
    const a = mulberry32(42), b = mulberry32(42), c = mulberry32(43);
    const xa = Array.from({ length: 5 }, a), xb = Array.from({ length: 5 }, b), xc = Array.from({ length: 5 }, c);
    expect(xa).toEqual(xb);
    expect(xa).not.toEqual(xc);
    const r = mulberry32(7);
    let sum = 0;
    const n = 100_000;
    for (let i = 0; i < n; i++) sum += r();
    // mean of U(0,1) is 0.5 with standard error 1/sqrt(12 n) ~ 0.0009: 5 sigma band
    near(sum / n, 0.5, 0.0046, 'mean');
  });
});

describe('Monte Carlo over tolerances', () => {
  it('same seed gives the same result; progress is reported', () => {
    const d = design();
    const calls: number[] = [];
    const a = monteCarloLpf(d, { trials: 2500, seed: 9, onProgress: (done) => calls.push(done) })!;
    const b = monteCarloLpf(d, { trials: 2500, seed: 9 })!;
    expect(a).toEqual(b);
    expect(calls).toEqual([1000, 2000, 2500]);
  });
  it('zero tolerance collapses to the nominal as-built attenuation', () => {
    const d = design({ capacitorTolerance: 0, inductorTolerance: 0 });
    const mc = monteCarloLpf(d, { trials: 50, seed: 1 })!;
    const l = ladderOf(d);
    for (const h of mc.harmonics) near(h.worstAttenuationDb, pointAt(l, h.frequencyHz).lossDb, 1e-9, `h${h.n}`);
  });
  it('worst <= percentile <= median, and the worst case is bounded by corner cases', () => {
    const d = design({ capacitorTolerance: 0.1, inductorTolerance: 0.1 });
    const mc = monteCarloLpf(d, { trials: 4000, seed: 3 })!;
    for (const h of mc.harmonics) {
      expect(h.worstAttenuationDb).toBeLessThanOrEqual(h.percentileAttenuationDb);
      expect(h.percentileAttenuationDb).toBeLessThanOrEqual(h.medianAttenuationDb);
    }
    // Far in the stopband the loss grows with the product of all L and C (asymptote ~ w^n prod(g)), so the
    // all-parts -10 % corner (exactly the nominal response shifted up by 1/0.9 in frequency) is the
    // least-attenuation corner; sampling inside the tolerance box should not fall below it (0.05 dB slack).
    const corner = structuredClone(d);
    corner.elements.forEach((e) => (e.builtValue *= 0.9));
    const lc = ladderOf(corner);
    for (const h of mc.harmonics.filter((x) => x.n >= 3)) {
      expect(h.worstAttenuationDb).toBeGreaterThanOrEqual(pointAt(lc, h.frequencyHz).lossDb - 0.05);
    }
  });
  it('zero trials returns null', () => {
    expect(monteCarloLpf(design(), { trials: 0, seed: 1 })).toBeNull();
  });
});
