// Harmonic source spectra by class. Expected values come from published Fourier series, computed by hand.
import { describe, expect, it } from 'vitest';
import { cosinePulseCoefficient, MIN_DBC, paSpectrum, rectangularHarmonic } from '../../../src/core/rf/pa-spectrum';
import { harmonicCompliance } from '../../../src/core/rf/harmonics';
import { near } from './helpers';

const rad = (deg: number) => (deg * Math.PI) / 180;

describe('cosine-pulse coefficients', () => {
  // Fourier series of a half-wave rectified sine (class B, 180° conduction; any signals text):
  // 1/π + (1/2) cos ωt + Σ 2/(π (4k² − 1)) cos 2kωt, no odd harmonics above the fundamental
  it('180° conduction (θ = 90°) is the half-wave rectified sine: 1/π, 1/2, 2/(3π), 0, 2/(15π)', () => {
    near(cosinePulseCoefficient(0, rad(90)), 1 / Math.PI, 1e-12, 'α0');
    near(cosinePulseCoefficient(1, rad(90)), 0.5, 1e-12, 'α1');
    near(cosinePulseCoefficient(2, rad(90)), 2 / (3 * Math.PI), 1e-12, 'α2');
    near(cosinePulseCoefficient(3, rad(90)), 0, 1e-12, 'α3');
    near(Math.abs(cosinePulseCoefficient(4, rad(90))), 2 / (15 * Math.PI), 1e-12, 'α4');
  });
  it('360° conduction (θ = 180°) is a raised cosine (1 + cos ωt)/2: α0 = α1 = 1/2, no harmonics', () => {
    near(cosinePulseCoefficient(0, Math.PI), 0.5, 1e-12, 'α0');
    near(cosinePulseCoefficient(1, Math.PI), 0.5, 1e-12, 'α1');
    near(cosinePulseCoefficient(2, Math.PI), 0, 1e-12, 'α2');
  });
  // From memory, not confirmed: the tabulated values at 120° conduction (Krauss, Bostian & Raab 1980 style table)
  it('120° conduction: α0 0.218, α1 0.391, α2 0.276, α3 0.138 (table values from memory)', () => {
    near(cosinePulseCoefficient(0, rad(60)), 0.218, 0.001, 'α0');
    near(cosinePulseCoefficient(1, rad(60)), 0.391, 0.001, 'α1');
    near(cosinePulseCoefficient(2, rad(60)), 0.276, 0.001, 'α2');
    near(cosinePulseCoefficient(3, rad(60)), 0.138, 0.001, 'α3');
  });
});

describe('rectangular wave |sin nπD| / (n |sin πD|) (Fourier series of a pulse train)', () => {
  it('50 % duty: odd 1/n, even 0', () => {
    near(rectangularHarmonic(3, 0.5), 1 / 3, 1e-12, '3rd');
    near(rectangularHarmonic(2, 0.5), 0, 1e-12, '2nd');
  });
  it('25 % duty: 2nd = 1/(2 sin 45°) = 0.7071 (above 1/n: 1/n is no bound), 4th = 0', () => {
    near(rectangularHarmonic(2, 0.25), 1 / (2 * Math.SQRT1_2), 1e-12, '2nd');
    near(rectangularHarmonic(4, 0.25), 0, 1e-12, '4th');
  });
});

describe('paSpectrum bands', () => {
  it('push-pull class B: 2nd up to ε α2/(2 α1) = 0.2122 ε at 20 % -> -27.4 dBc; none in the ' +
    'saturated square wave', () => {
    const s = paSpectrum({ topology: 'push-pull', amplifierClass: 'B', imbalanceTypical: 0.05, imbalanceWorst: 0.2 });
    const h2 = s.bands.find((b) => b.n === 2)!;
    // a rectangular pulse of 50 % duty has no even harmonics (Fourier series of a pulse train, sin(2 · π/2) = 0)
    expect(h2.bestDbc).toBe(MIN_DBC);
    near(h2.worstDbc, 20 * Math.log10(0.2 * (2 / (3 * Math.PI))), 1e-9, 'worst');
    expect(h2.basis).toBe('push-pull-imbalance');
    const h3 = s.bands.find((b) => b.n === 3)!;
    expect(h3.bestDbc).toBe(MIN_DBC);
    near(h3.worstDbc, 20 * Math.log10(1 / 3), 1e-9, 'saturated 3rd');
  });
  it('single-ended class C at 120° ± 15°: the 120° value lies inside the band', () => {
    const s = paSpectrum({ topology: 'single-ended', amplifierClass: 'C', conductionAngleDeg: 120 });
    const h3 = s.bands.find((b) => b.n === 3)!;
    const at120 = 20 * Math.log10(0.138 / 0.391); // table values above, from memory
    expect(h3.bestDbc).toBeLessThanOrEqual(at120 + 0.05);
    expect(h3.worstDbc).toBeGreaterThanOrEqual(at120 - 0.05);
    expect(s.assumed).toEqual({});
  });
  it('an empty conduction angle and imbalance are assumed and reported, never silent', () => {
    const s = paSpectrum({
      topology: 'push-pull',
      amplifierClass: 'C',
      conductionAngleDeg: null,
      imbalanceTypical: null,
      imbalanceWorst: null,
    });
    expect(s.assumed).toEqual({ conductionAngleDeg: 150, imbalanceTypical: 0.05, imbalanceWorst: 0.2 });
  });
  it('class D push-pull, duty 50 % to 60 % (20 % worst): 2nd up to |sin 1.2π|/(2 sin 0.6π) = 0.309', () => {
    const s = paSpectrum({ topology: 'push-pull', amplifierClass: 'D', imbalanceTypical: 0, imbalanceWorst: 0.2 });
    const h2 = s.bands.find((b) => b.n === 2)!;
    near(h2.worstDbc, 20 * Math.log10(Math.abs(Math.sin(1.2 * Math.PI)) / (2 * Math.sin(0.6 * Math.PI))), 1e-9, '2nd');
    expect(h2.bestDbc).toBe(MIN_DBC);
  });
});

describe('compliance on the worst end, and the construction floor (-70 dBc, common practice)', () => {
  const base = {
    rule: 'us-97-307' as const,
    topology: 'push-pull' as const,
    evenHarmonicDbc: -30,
    fundamentalW: 10,
    frequencyHz: 7e6,
    passbandLossDb: 0,
    monteCarlo: null,
  };
  it('a band whose worst end misses 43 dB fails even though its best end passes', () => {
    const r = harmonicCompliance({
      ...base,
      filter: [2, 3, 4, 5].map((n) => ({ n, attenuationDb: 20 })),
      spectrum: [2, 3, 4, 5].map((n) => ({ n, bestDbc: -40, worstDbc: -20, basis: 'push-pull-imbalance' as const })),
    });
    const h2 = r.rows[0];
    near(h2.predictedBestDbc, -60, 1e-12, 'best');
    near(h2.predictedDbc, -40, 1e-12, 'worst');
    expect(h2.severity).toBe('fail');
  });
  it('a level below -70 dBc is limited by construction: margin taken from the floor, said in words', () => {
    const r = harmonicCompliance({
      ...base,
      filter: [2, 3, 4, 5].map((n) => ({ n, attenuationDb: 80 })),
      spectrum: [2, 3, 4, 5].map((n) => ({ n, bestDbc: -30, worstDbc: -10, basis: 'cosine-pulse' as const })),
    });
    const h = r.rows[0];
    expect(h.limitedByConstruction).toBe(true);
    near(h.marginDb, 70 - 43, 1e-12, 'margin from the floor');
    expect(r.findings.find((f) => f.subject === 'Harmonic 2')?.message).toContain('limited by construction');
    expect(r.findings.some((f) => f.rule === 'spurious.construction-floor')).toBe(true);
  });
});
