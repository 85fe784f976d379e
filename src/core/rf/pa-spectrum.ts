// Harmonic source spectrum of the PA by class: each harmonic as a band (best to worst), relative to the fundamental.
import type { PaParams } from '../model';

export type SpectrumBasis =
  | 'cosine-pulse' // class B/C drain current pulse (Fourier coefficients of a cosine pulse)
  | 'push-pull-imbalance' // even harmonics left by the halves' mismatch
  | 'saturation-bound' // odd harmonics of a class-B stage between a clean sine and a hard-clipped square wave
  | 'rectangular-wave' // switching stage: rectangular wave of duty D
  | 'class-e-estimate'; // class E: the switching-stage estimate (pessimistic, not simulated)

export interface HarmonicBand {
  n: number;
  /** Least and most harmonic n relative to the fundamental, dBc (MIN_DBC when the ideal waveform has none). */
  bestDbc: number;
  worstDbc: number;
  basis: SpectrumBasis;
}

/** Stands for "none in the ideal waveform", dBc (kept finite for JSON). */
export const MIN_DBC = -200;
/** Assumed inputs when left empty. Common practice, no published source. */
export const ASSUMED = { conductionAngleDeg: 150, imbalanceTypical: 0.05, imbalanceWorst: 0.2 } as const;
/** Spread of the class-C conduction angle with drive and supply, degrees each way. */
// Common practice, no published source
export const CONDUCTION_SPREAD_DEG = 15;

const toDbc = (ratio: number) => (ratio > 10 ** (MIN_DBC / 20) ? 20 * Math.log10(ratio) : MIN_DBC);

/**
 * Fourier coefficient n (n = 0, 1, 2, ...) of a cosine pulse of unit peak and half conduction angle theta (rad).
 * Source: cosine-pulse coefficients as tabulated in Krauss, Bostian & Raab, Solid State Radio Engineering (1980)
 * (equations from memory): α0 = (sin θ − θ cos θ)/(π(1 − cos θ)),
 * α1 = (θ − sin θ cos θ)/(π(1 − cos θ)),
 * αn = 2 (sin nθ cos θ − n cos nθ sin θ)/(π n (n² − 1)(1 − cos θ)).
 */
export function cosinePulseCoefficient(n: number, thetaRad: number): number {
  const c = Math.cos(thetaRad);
  const s = Math.sin(thetaRad);
  const k = Math.PI * (1 - c);
  if (n === 0) return (s - thetaRad * c) / k;
  if (n === 1) return (thetaRad - s * c) / k;
  return (2 * (Math.sin(n * thetaRad) * c - n * Math.cos(n * thetaRad) * s)) / (k * n * (n * n - 1));
}

/** Harmonic n of a rectangular wave of duty D relative to its fundamental. */
// Source: Fourier series of a pulse train, |sin nπD| / (n |sin πD|)
export function rectangularHarmonic(n: number, duty: number): number {
  return Math.abs(Math.sin(n * Math.PI * duty)) / (n * Math.abs(Math.sin(Math.PI * duty)));
}

const range = (lo: number, hi: number, steps = 60) =>
  Array.from({ length: steps + 1 }, (_, i) => lo + ((hi - lo) * i) / steps);
const minMax = (xs: number[]) => ({ min: Math.min(...xs), max: Math.max(...xs) });

export interface PaSpectrum {
  bands: HarmonicBand[];
  /** Inputs taken as assumed because they were left empty (field key -> value used). */
  assumed: Partial<Record<keyof typeof ASSUMED, number>>;
  conductionAngleDeg: number | null;
  imbalanceTypical: number;
  imbalanceWorst: number;
}

type SpectrumInput = Pick<
  PaParams, 'topology' | 'amplifierClass' | 'conductionAngleDeg' | 'imbalanceTypical' | 'imbalanceWorst'
>;

export function paSpectrum(pa: SpectrumInput, harmonics: readonly number[] = [2, 3, 4, 5]): PaSpectrum {
  const assumed: PaSpectrum['assumed'] = {};
  const take = (k: keyof typeof ASSUMED, v: number | null | undefined): number => {
    if (v !== null && v !== undefined && Number.isFinite(v)) return v;
    assumed[k] = ASSUMED[k];
    return ASSUMED[k];
  };
  const pp = pa.topology === 'push-pull';
  // the imbalance matters to push-pull stages and to switching stages' duty; a single-ended B or C stage has none
  const usesImbalance = pp || pa.amplifierClass === 'D' || pa.amplifierClass === 'E';
  const epsT = usesImbalance ? take('imbalanceTypical', pa.imbalanceTypical) : 0;
  const epsW = usesImbalance ? Math.max(epsT, take('imbalanceWorst', pa.imbalanceWorst)) : 0;
  let conductionAngleDeg: number | null = null;
  const bands = harmonics.map((n): HarmonicBand => {
    const even = n % 2 === 0;
    if (pa.amplifierClass === 'B' || pa.amplifierClass === 'C') {
      const deg = pa.amplifierClass === 'B' ? [180] : (() => {
        conductionAngleDeg = take('conductionAngleDeg', pa.conductionAngleDeg);
        const c = conductionAngleDeg;
        return range(Math.max(60, c - CONDUCTION_SPREAD_DEG), Math.min(180, c + CONDUCTION_SPREAD_DEG));
      })();
      // harmonic n of one device's current pulse relative to its fundamental, over the conduction-angle spread
      const ratio = (theta: number) => Math.abs(cosinePulseCoefficient(n, theta) / cosinePulseCoefficient(1, theta));
      const r = minMax(deg.map((d) => ratio((d * Math.PI) / 360)));
      if (even && pp) {
        // halves (1 + ε/2) and (1 − ε/2): even harmonics ε a_n against a fundamental 2 a_1 (Fourier series,
        // linear superposition)
        const basis = 'push-pull-imbalance';
        return { n, bestDbc: toDbc((epsT * r.min) / 2), worstDbc: toDbc((epsW * r.max) / 2), basis };
      }
      if (pa.amplifierClass === 'B' && !even) {
        // a clean half-sine pair has no odd harmonics; hard clipping at saturation approaches a square wave's 1/n
        return { n, bestDbc: MIN_DBC, worstDbc: toDbc(1 / n), basis: 'saturation-bound' };
      }
      return { n, bestDbc: toDbc(r.min), worstDbc: toDbc(r.max), basis: 'cosine-pulse' };
    }
    // Switching stages: the drain (or drain-to-drain) voltage is a rectangular wave; its duty moves from 50 % by
    // the timing imbalance (push-pull halves, or the half bridge's dead time and drive)
    const basis: SpectrumBasis = pa.amplifierClass === 'E' ? 'class-e-estimate' : 'rectangular-wave';
    const dutyT = 0.5 + epsT / 2;
    const dutyW = 0.5 + epsW / 2;
    const r = minMax(range(even ? dutyT : 0.5, dutyW).map((d) => rectangularHarmonic(n, d)));
    return { n, bestDbc: toDbc(r.min), worstDbc: toDbc(r.max), basis };
  });
  return { bands, assumed, conductionAngleDeg, imbalanceTypical: epsT, imbalanceWorst: epsW };
}
