// The PA's waveform by class, and what follows from it: output power, DC input and each harmonic as a band (best to
// worst), all from the same family of waveforms so they never contradict each other.
// - B, C: the drain-current cosine pulse, from the edge of saturation (plain pulse) to hard saturation (flat-topped);
// - D: the switched drain voltage with finite edges (trapezoid), duty 50 % to the stated worst timing imbalance;
// - E: the simulated stage (class-e-sim.ts), its series network's loaded Q from CLASS_E_QL_LOW to CLASS_E_QL.
import type { PaParams } from '../model';
import { CLASS_E_QL, CLASS_E_QL_LOW, simulateClassE } from './class-e-sim';
import { cosinePulseCoefficient, flattenedPulseCoefficient, trapezoidCoefficient } from './pa-fourier';

export { cosinePulseCoefficient, rectangularHarmonic, trapezoidHarmonic } from './pa-fourier';

export type SpectrumBasis =
  | 'cosine-pulse' // class B/C drain current pulse, plain to flat-topped (Fourier coefficients of the pulse)
  | 'push-pull-imbalance' // even harmonics left by the halves' mismatch
  | 'saturation-bound' // odd harmonics of a class-B stage between a clean sine and a hard-clipped square wave
  | 'trapezoid-wave' // switching stage: trapezoidal wave of duty D and the stated transition time
  | 'class-e-simulated' // class E: the load current of the simulated stage
  | 'clipped-at-swr' // class B/C: the drain voltage flat-topped at the rails into the most-clipping SWR load (pa-clip)
  | 'class-e-over-loads'; // class E over loaded Q and the loads met: design load and SWR circle (class-e-loads)

export interface HarmonicBand {
  n: number;
  /** Least and most harmonic n relative to the fundamental, dBc (MIN_DBC when the ideal waveform has none). */
  bestDbc: number;
  worstDbc: number;
  basis: SpectrumBasis;
  /** Class E over the loads met: where the best and worst ends lie, in words (class-e-loads). */
  bestLoad?: string;
  worstLoad?: string;
}

/** Stands for "none in the ideal waveform", dBc (kept finite for JSON). */
export const MIN_DBC = -200;
/** Assumed inputs when left empty. Common practice, no published source (10 ns: an HF MOSFET with a gate driver). */
export const ASSUMED = {
  conductionAngleDeg: 150,
  imbalanceTypical: 0.05,
  imbalanceWorst: 0.2,
  transitionTimeS: 10e-9,
} as const;
/** Spread of the class-C conduction angle with drive and supply, degrees each way. */
// Common practice, no published source
export const CONDUCTION_SPREAD_DEG = 15;

const toDbc = (ratio: number) => (ratio > 10 ** (MIN_DBC / 20) ? 20 * Math.log10(ratio) : MIN_DBC);

/** One waveform of the band, relative to the design point (edge of saturation, 50 % duty, loaded Q CLASS_E_QL). */
export interface WavePoint {
  /** Output power / the design point's output power. */
  powerRel: number;
  /**
   * DC input of the ideal waveform / the design point's output power, at the voltage the waveform swings
   * (Vdd − Vsat for B, C, D; Vdd for the simulated class E, whose switch loss is in the simulation).
   */
  dcRel: number;
  /** Harmonic n / fundamental, index n (0 and 1 unused), before imbalance. */
  harmonic: number[];
}

export interface PaWaveform {
  model: 'cosine-pulse' | 'trapezoid' | 'class-e-simulated';
  /** The design point, and every waveform of the band (for the highest current, power and dissipation). */
  design: WavePoint;
  points: WavePoint[];
  /** Class D: transition time used (s) and as a fraction of the period (0 when the frequency is unknown). */
  transitionTimeS: number | null;
  transitionFraction: number | null;
  /** Class D: the transition time does not fit in the shorter part of the period (the wave never settles). */
  transitionTooLong: boolean;
  /** Class E at the design point: P / (Vdd² / R_half) and DC input / (Vdd² / R_half) from the simulation. */
  classE: { outputRatio: number; dcInputRatio: number; loadedQ: [number, number] } | null;
}

export interface PaSpectrum {
  bands: HarmonicBand[];
  /** Inputs taken as assumed because they were left empty (field key -> value used). */
  assumed: Partial<Record<keyof typeof ASSUMED, number>>;
  conductionAngleDeg: number | null;
  imbalanceTypical: number;
  imbalanceWorst: number;
  waveform: PaWaveform;
}

type SpectrumInput = Pick<
  PaParams,
  'topology' | 'amplifierClass' | 'conductionAngleDeg' | 'imbalanceTypical' | 'imbalanceWorst' | 'transitionTimeS'
>;

export interface SpectrumOptions {
  /** Operating frequency, Hz: sets the class-D transition as a fraction of the period (absent or unusable = 0). */
  frequencyHz?: number;
  /** Class E: Rds(on) over the drain load of one class-E half. */
  classERdsRatio?: number;
}

const range = (lo: number, hi: number, steps: number) =>
  Array.from({ length: steps + 1 }, (_, i) => lo + ((hi - lo) * i) / steps);
/** Overdrive from the edge of saturation (1) to the hard-saturated limit (Infinity). */
const DRIVES = [...range(0, 2, 24).map((e) => 10 ** e), Infinity];
const NMAX = 5;

function pulsePoint(thetaRad: number, drive: number): WavePoint {
  const c = (n: number) => flattenedPulseCoefficient(n, thetaRad, drive);
  const a1 = cosinePulseCoefficient(1, thetaRad);
  const c1 = c(1);
  // The design point's fundamental reaches the swing V (load line), so P ∝ (c1 / α1)²; the DC input per the
  // design output is 2 c0 / α1 for both topologies (SE: I_pk = V/(α1 R); push-pull: I_pk = 2V/(α1 R), two devices)
  return {
    powerRel: (c1 / a1) ** 2,
    dcRel: (2 * c(0)) / a1,
    harmonic: Array.from({ length: NMAX + 1 }, (_, n) => (n < 2 ? 1 : Math.abs(c(n) / c1))),
  };
}

function trapezoidPoint(duty: number, tau: number): WavePoint {
  const t = Math.min(tau, duty, 1 - duty);
  const f1 = trapezoidCoefficient(1, duty, t) / trapezoidCoefficient(1, 0.5, Math.min(tau, 0.5));
  // An ideal voltage switch delivers its DC input to the load: DC input = output (energy balance)
  return {
    powerRel: f1 ** 2,
    dcRel: f1 ** 2,
    harmonic: Array.from({ length: NMAX + 1 }, (_, n) =>
      n < 2 ? 1 : trapezoidCoefficient(n, duty, t) / trapezoidCoefficient(1, duty, t),
    ),
  };
}

/** The same inputs give the same spectrum: remembered (bounded), since one evaluation asks for it once per pass. */
const memo = new Map<string, PaSpectrum>();
const MEMO_MAX = 256;

export function paSpectrum(
  pa: SpectrumInput,
  harmonics: readonly number[] = [2, 3, 4, 5],
  opts: SpectrumOptions = {},
): PaSpectrum {
  const key = JSON.stringify([
    pa.topology,
    pa.amplifierClass,
    pa.conductionAngleDeg,
    pa.imbalanceTypical,
    pa.imbalanceWorst,
    pa.transitionTimeS,
    harmonics,
    opts.frequencyHz,
    opts.classERdsRatio,
  ]);
  const hit = memo.get(key);
  if (hit) return hit;
  const s = computeSpectrum(pa, harmonics, opts);
  if (memo.size >= MEMO_MAX) memo.delete(memo.keys().next().value as string);
  memo.set(key, s);
  return s;
}

function computeSpectrum(pa: SpectrumInput, harmonics: readonly number[], opts: SpectrumOptions): PaSpectrum {
  const assumed: PaSpectrum['assumed'] = {};
  const take = (k: keyof typeof ASSUMED, v: number | null | undefined): number => {
    if (v !== null && v !== undefined && Number.isFinite(v)) return v;
    assumed[k] = ASSUMED[k];
    return ASSUMED[k];
  };
  const pp = pa.topology === 'push-pull';
  const cls = pa.amplifierClass;
  // the imbalance matters to push-pull stages and to a class-D stage's duty; a single-ended B, C or E stage has none
  const usesImbalance = pp || cls === 'D';
  const epsT = usesImbalance ? take('imbalanceTypical', pa.imbalanceTypical) : 0;
  const epsW = usesImbalance ? Math.max(epsT, take('imbalanceWorst', pa.imbalanceWorst)) : 0;
  let conductionAngleDeg: number | null = null;
  const waveform: PaWaveform = {
    model: cls === 'D' ? 'trapezoid' : cls === 'E' ? 'class-e-simulated' : 'cosine-pulse',
    design: { powerRel: 1, dcRel: 1, harmonic: [] }, points: [], transitionTimeS: null, transitionFraction: null,
    transitionTooLong: false, classE: null,
  };
  // points for the odd harmonics (and power), and for the best end of the even ones where that differs
  let points: WavePoint[];
  let evenPoints: WavePoint[];
  if (cls === 'B' || cls === 'C') {
    const degs = cls === 'B' ? [180] : (() => {
      conductionAngleDeg = take('conductionAngleDeg', pa.conductionAngleDeg);
      const c = conductionAngleDeg;
      return range(Math.max(60, c - CONDUCTION_SPREAD_DEG), Math.min(180, c + CONDUCTION_SPREAD_DEG), 12);
    })();
    const nominal = (cls === 'B' ? 180 : conductionAngleDeg ?? 180) * (Math.PI / 360);
    waveform.design = pulsePoint(nominal, 1);
    points = degs.flatMap((d) => DRIVES.map((a) => pulsePoint((d * Math.PI) / 360, a)));
    evenPoints = points;
  } else if (cls === 'D') {
    const trS = take('transitionTimeS', pa.transitionTimeS);
    const f =
      opts.frequencyHz !== undefined && Number.isFinite(opts.frequencyHz) && opts.frequencyHz > 0
        ? opts.frequencyHz
        : 0;
    const tau = trS * f;
    const dutyT = 0.5 + epsT / 2;
    const dutyW = 0.5 + epsW / 2;
    waveform.transitionTimeS = trS;
    waveform.transitionFraction = tau;
    waveform.transitionTooLong = tau > 1 - dutyW;
    waveform.design = trapezoidPoint(0.5, tau);
    points = range(0.5, dutyW, 20).map((d) => trapezoidPoint(d, tau));
    evenPoints = range(dutyT, dutyW, 20).map((d) => trapezoidPoint(d, tau));
  } else {
    const rds = opts.classERdsRatio ?? 0;
    const hi = simulateClassE(1, 0, rds, 0.5, CLASS_E_QL);
    const lo = simulateClassE(1, 0, rds, 0.5, CLASS_E_QL_LOW);
    const point = (e: typeof hi): WavePoint => ({
      powerRel: e.outputRatio / hi.outputRatio,
      dcRel: e.dcInputRatio / hi.outputRatio,
      harmonic: [1, ...e.loadHarmonics],
    });
    waveform.classE = {
      outputRatio: hi.outputRatio,
      dcInputRatio: hi.dcInputRatio,
      loadedQ: [CLASS_E_QL_LOW, CLASS_E_QL],
    };
    waveform.design = point(hi);
    points = [point(hi), point(lo)];
    evenPoints = points;
  }
  waveform.points = points;
  const minMax = (xs: number[]) => ({ min: Math.min(...xs), max: Math.max(...xs) });
  const bands = harmonics.map((n): HarmonicBand => {
    const even = n % 2 === 0;
    if (cls === 'D' || (cls === 'E' && !pp)) {
      const basis: SpectrumBasis = cls === 'D' ? 'trapezoid-wave' : 'class-e-simulated';
      const r = minMax((even ? evenPoints : points).map((p) => p.harmonic[n]));
      return { n, bestDbc: toDbc(r.min), worstDbc: toDbc(r.max), basis };
    }
    const r = minMax(points.map((p) => p.harmonic[n]));
    if (even && pp) {
      // halves (1 + ε/2) and (1 − ε/2): even harmonics ε a_n against a fundamental 2 a_1 (Fourier series,
      // linear superposition)
      return {
        n,
        bestDbc: toDbc((epsT * r.min) / 2),
        worstDbc: toDbc((epsW * r.max) / 2),
        basis: 'push-pull-imbalance',
      };
    }
    const basis: SpectrumBasis =
      cls === 'E' ? 'class-e-simulated' : cls === 'B' && !even ? 'saturation-bound' : 'cosine-pulse';
    return { n, bestDbc: toDbc(r.min), worstDbc: toDbc(r.max), basis };
  });
  // shared between callers through the memo: frozen so nobody can change another's result
  return Object.freeze({
    bands: Object.freeze(bands.map((b) => Object.freeze(b))) as HarmonicBand[], assumed: Object.freeze(assumed),
    conductionAngleDeg, imbalanceTypical: epsT, imbalanceWorst: epsW, waveform: Object.freeze(waveform),
  });
}

/** Class D transition time used, s: entered, else ASSUMED (the spectrum's findings say so). */
export const transitionTimeOf = (pa: Pick<PaParams, 'transitionTimeS'>): number =>
  pa.transitionTimeS !== null && pa.transitionTimeS !== undefined && Number.isFinite(pa.transitionTimeS)
    ? pa.transitionTimeS : ASSUMED.transitionTimeS;

/**
 * Class D: the fundamental power of the trapezoid at 50 % duty over the ideal square wave's, sinc²(π t_r f)
 * (trapezoid spectrum, Paul 2006 §3.2, from memory); 1 for other classes or an unknown frequency.
 */
export function switchingPowerShape(
  pa: Pick<PaParams, 'amplifierClass' | 'transitionTimeS'>,
  frequencyHz: number | undefined,
): number {
  if (pa.amplifierClass !== 'D' || frequencyHz === undefined || !Number.isFinite(frequencyHz) || frequencyHz <= 0)
    return 1;
  const tau = Math.min(0.5, transitionTimeOf(pa) * frequencyHz);
  return (trapezoidCoefficient(1, 0.5, tau) / trapezoidCoefficient(1, 0.5, 0)) ** 2;
}
