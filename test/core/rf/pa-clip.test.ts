// The clipped class B/C stage's harmonics (src/core/rf/pa-clip.ts), worked by hand from the clipped-sinusoid Fourier
// series (saturation describing function, Gelb & Vander Velde 1968, from memory) and the square-wave series (textbook).
import { describe, expect, it } from 'vitest';
import {
  clipEstimateFinding, clipEstimates, clippedHarmonicDbc, clipOverdrive, foldClipping,
} from '../../../src/core/rf/pa-clip';
import { swrStress } from '../../../src/core/rf/pa-swr';
import type { FilterLoad } from '../../../src/core/rf/class-e-loads';
import { ladderInputOhm } from '../../helpers/ngspice';
import { MIN_DBC, type HarmonicBand } from '../../../src/core/rf/pa-spectrum';
import { evaluateRf } from '../../../src/core/rf/evaluate-rf';
import { harmonicsFromSource, ladderOf } from '../../../src/core/rf/lpf-analysis';
import { lpfParams, project, rfSettings } from './fixture';
import { near } from './helpers';

describe('clippedHarmonicDbc', () => {
  it('swing twice the rail limit (β = 30°): b3/b1 = (√3/(2π)) / (2/3 + √3/π) = 0.22633, ' +
    '−12.905 dBc (by hand)', () => {
    near(clippedHarmonicDbc(3, 2), 20 * Math.log10(0.226326), 1e-3, '3rd');
    near(clippedHarmonicDbc(3, 2), -12.905, 1e-3, '3rd, dBc by hand');
  });
  it('hard-limited: the square wave, harmonic n at 1/n (20 log10(1/3) = −9.54 dBc)', () => {
    near(clippedHarmonicDbc(3, Infinity), 20 * Math.log10(1 / 3), 1e-12, '3rd');
    near(clippedHarmonicDbc(5, Infinity), 20 * Math.log10(1 / 5), 1e-12, '5th');
  });
  it('no clipping, or an even harmonic of the symmetric swing: none', () => {
    expect(clippedHarmonicDbc(3, 1)).toBe(MIN_DBC);
    expect(clippedHarmonicDbc(2, 3)).toBe(MIN_DBC);
  });
});

describe('foldClipping keeps the level at the antenna: worst = max(worst, clipped − rejClipped + rejSource)', () => {
  const bands: HarmonicBand[] = [
    { n: 2, bestDbc: -60, worstDbc: -30, basis: 'push-pull-imbalance' },
    { n: 3, bestDbc: -50, worstDbc: -40, basis: 'cosine-pulse' },
  ];
  it('clipped 3rd (−12.91 dBc) through 40 dB from a voltage source vs 50 dB from the current ' +
    'source: −2.91 dBc', () => {
    const f = foldClipping(bands, 2, () => 50, () => 40);
    near(f[1].worstDbc, -12.906 - 40 + 50, 2e-3, '3rd worst');
    expect(f[1].basis).toBe('clipped-at-swr');
    expect(f[1].bestDbc).toBe(-50);
    expect(f[0]).toEqual(bands[0]);
  });
  it('a clipped level below the band leaves it: −12.91 − 80 + 50 = −42.9 < −40', () => {
    const f = foldClipping(bands, 2, () => 50, () => 80);
    expect(f[1]).toEqual(bands[1]);
  });
  it('no clipping (|z| ≤ 1) or an unknown rejection leaves the bands', () => {
    expect(foldClipping(bands, 1, () => 50, () => 0)).toEqual(bands);
    expect(foldClipping(bands, 2, () => null, () => 0)).toEqual(bands);
  });
});

describe('clipOverdrive: the largest load the stage meets through the filter, not the SWR', () => {
  // hand case: a "filter" whose input is 50 Ω for the antenna at its design load, 100 Ω at phase 0 and 145 Ω at one
  // phase (|z| = 2.9 over the 50 Ω design load: above the SWR of 2), 50 + j20 Ω elsewhere
  const loads = (phases: number): FilterLoad[] => [
    { phaseDeg: null, antenna: { re: 50, im: 0 }, input: { re: 50, im: 0 } },
    ...Array.from({ length: phases }, (_, i): FilterLoad => ({
      phaseDeg: (360 * i) / phases, antenna: { re: 50, im: 0 },
      input: i === 0 ? { re: 100, im: 0 } : i === 7 ? { re: 145, im: 0 } : { re: 50, im: 20 },
    })),
  ];
  const m = { drainPeakV: 27.3, maxRailV: 13.8, peakDeviceA: 1, outputW: 5, dcInputW: 7, biasW: 0 };
  const through = swrStress('D', m, 2, 50, 0, loads);
  it('the sweep keeps the largest |z| it meets: 145 / 50 = 2.9', () => {
    expect(through.circleAt).toBe('antenna');
    near(through.maxLoadRatio, 2.9, 1e-12, '|z| max');
    near(clipOverdrive(2, through), 2.9, 1e-12, 'overdrive through the filter');
  });
  it('with the circle at the PA\'s output (or no sweep) the SWR itself: |z| = S at phase 0', () => {
    const own = swrStress('D', m, 2, 50);
    near(own.maxLoadRatio, 2, 1e-12, '|z| max on the circle');
    expect(clipOverdrive(2, own)).toBe(2);
    expect(clipOverdrive(2, null)).toBe(2);
  });
  it('the fold at 2.9: b3/b1 = 0.28136, −11.015 dBc (β = asin(1/2.9) = 20.171°, by hand)', () => {
    // Source: clipped-sinusoid series (Gelb & Vander Velde 1968, from memory): b1 = (2A/π)(β + sin β cos β) =
    // 1.24754, b3 = (4/π)((A/2)(sin 2β/2 − sin 4β/4) + cos 3β/3) = 0.35101 at A = 2.9 (worked on a calculator)
    const band: HarmonicBand = { n: 3, bestDbc: -50, worstDbc: -40, basis: 'cosine-pulse' };
    const f = foldClipping([band], clipOverdrive(2, through), () => 50, () => 40)[0];
    near(f.worstDbc, -11.015 - 40 + 50, 2e-3, '3rd worst');
  });
});

describe('evaluateRf folds the clipped class-C push-pull stage into the harmonic rows at the worst SWR', () => {
  const at = (worstSwr: number) => evaluateRf(project({ rf: rfSettings({ worstSwr }) }), { paRailV: { pa: 13.8 } });
  it('SWR 1: no load above the design load, no clipped basis', () => {
    expect(at(1).harmonics!.rows.some((x) => x.paLevelBasis === 'clipped-at-swr')).toBe(false);
  });
  it('SWR 2: the 3rd at the antenna, the clipped swing at the largest load through the filter, less the filter', () => {
    // the filter nearly lossless (Q 10⁴ and 10⁵), so that its input impedance is the lossless chain's below
    const p = project({ rf: rfSettings({ worstSwr: 2 }) });
    const stages = p.stages.map((st) => (st.kind === 'lpf'
      ? { ...st, lpf: lpfParams({ inductorQ: 10000, capacitorQ: 100000 }) } : st));
    const r = evaluateRf({ ...p, stages }, { paRailV: { pa: 13.8 } });
    const row = r.harmonics!.rows.find((x) => x.n === 3)!;
    expect(row.paLevelBasis).toBe('clipped-at-swr');
    const lpf = r.stages.find((x) => x.kind === 'lpf')!.lpf!;
    const l = ladderOf(lpf.design!);
    // the largest |z| the PA meets: the filter's (lossless) input impedance for the antenna round the SWR 2 circle,
    // every degree, over the 50 Ω design load (chain of the ladder's elements, circuit theory; test/helpers/ngspice)
    const w = 2 * Math.PI * r.frequencyHz;
    let hand = 1;
    for (let ph = 0; ph < 360; ph++) {
      const g = { re: (1 / 3) * Math.cos((ph * Math.PI) / 180), im: (1 / 3) * Math.sin((ph * Math.PI) / 180) };
      // z = (1 + Γ)/(1 − Γ), |Γ| = (2 − 1)/(2 + 1) (definitions of SWR and the reflection coefficient)
      const d = (1 - g.re) ** 2 + g.im ** 2;
      const zl = { re: (50 * (1 - g.re ** 2 - g.im ** 2)) / d, im: (50 * 2 * g.im) / d };
      const zin = ladderInputOhm(lpf.design!, zl, w);
      hand = Math.max(hand, Math.hypot(zin.re, zin.im) / 50);
    }
    const paSwr = r.stages.find((x) => x.kind === 'final')!.pa!.swr!;
    near(paSwr.maxLoadRatio, hand, 1e-3 * hand, 'largest |z| through the filter');
    // the flat top's 3rd there (clipped-sinusoid series, Gelb & Vander Velde 1968, from memory; β = asin(1/A))
    const a = paSwr.maxLoadRatio;
    const beta = Math.asin(1 / a);
    const b1 = ((2 * a) / Math.PI) * (beta + Math.sin(beta) * Math.cos(beta));
    const b3 = (4 / Math.PI) * ((a / 2) * (Math.sin(2 * beta) / 2 - Math.sin(4 * beta) / 4) + Math.cos(3 * beta) / 3);
    // the filter's own rejection from a zero-impedance source into 2 x 50 Ω (lpf-analysis, checked in its own tests)
    const stiff = () => ({ re: 0, im: 0 });
    const rej = harmonicsFromSource(l, r.frequencyHz, 'thevenin', stiff, [3], () => ({ re: 100, im: 0 }));
    near(row.predictedDbc, 20 * Math.log10(Math.abs(b3 / b1)) - rej[0].relativeAttenuationDb, 1e-3, '3rd at antenna');
    expect(row.predictedDbc).toBeGreaterThan(at(1).harmonics!.rows.find((x) => x.n === 3)!.predictedDbc);
  });
});

describe('clipEstimates: the balanced drain harmonic through the filter from a stiff source, by the flat top', () => {
  const folded: HarmonicBand[] = [
    { n: 2, bestDbc: -60, worstDbc: -30, basis: 'push-pull-imbalance' },
    { n: 3, bestDbc: -50, worstDbc: -2.905, basis: 'clipped-at-swr' },
  ];
  // drain 3rd at 0.1 of the fundamental (−20 dBc), 40 dB rejection from a stiff source: −60 dBc at the antenna;
  // the flat top at overdrive 2 (−12.905 dBc, worked by hand above) through the same 40 dB: −52.905 dBc
  const est = clipEstimates(folded, [1, 0, 0.1, 0, 0.02], 2, () => 40);
  it('only the harmonics the flat top raised', () => {
    expect(est.map((e) => e.n)).toEqual([3]);
    near(est[0].estimateDbc, -60, 1e-9, 'estimate');
    near(est[0].upperDbc, -52.905, 1e-3, 'upper end');
  });
  it('the builder reads both levels and why the worst end stays', () => {
    const f = clipEstimateFinding(est, 2, 50, 'PA')!;
    expect(f.severity).toBe('ok');
    expect(f.message).toContain('100 Ω');
    expect(f.message).toContain('the 3rd is about -60 dBc');
    expect(f.message).toContain('-53 dBc (3rd)');
    expect(f.message).toMatch(/leakage inductance is not modelled/);
  });
  it('nothing to say when the upper end is below the construction floor (−70 dBc)', () => {
    expect(clipEstimateFinding(clipEstimates(folded, [1, 0, 0.1, 0, 0], 2, () => 80), 2, 50, 'PA')).toBeNull();
  });
  it('evaluateRf at SWR 2: the balanced estimate lies below the flat-topped worst end of the 3rd row', () => {
    const r = evaluateRf(project({ rf: rfSettings({ worstSwr: 2 }) }), { paRailV: { pa: 13.8 } });
    const f = r.findings.find((x) => x.rule === 'pa.clip-harmonics')!;
    const row = r.harmonics!.rows.find((x) => x.n === 3)!;
    expect(f.value as number).toBeLessThan(row.predictedDbc);
    expect(r.stages.find((x) => x.kind === 'final')!.pa!.swr!.clip!.model).toBe('harmonic-balance');
  });
});
