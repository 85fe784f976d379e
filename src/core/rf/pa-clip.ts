// A class B/C stage driven into a load above its design load: the drain voltage flat-topped at the rail limits.
// Its harmonics, at the most-clipping load the stage meets (clipOverdrive), folded into the worst end of the PA's
// harmonic bands.
import { clippedSineCoefficient } from './pa-fourier';
import { MIN_DBC, type HarmonicBand } from './pa-spectrum';
import { CONSTRUCTION_FLOOR_DBC } from './harmonics';
import type { Finding } from '../findings';

/**
 * Harmonic n of the drain voltage of a sinusoid `overdrive` times the rail-limited swing, flat-topped at the rail
 * limits, relative to its fundamental, dBc (MIN_DBC when there is none: even n, or no clipping).
 * Source: Fourier series of the clipped sinusoid (pa-fourier clippedSineCoefficient, from memory); decibel for voltages
 */
export function clippedHarmonicDbc(n: number, overdrive: number): number {
  const r = Math.abs(clippedSineCoefficient(n, overdrive) / clippedSineCoefficient(1, overdrive));
  return r > 10 ** (MIN_DBC / 20) ? 20 * Math.log10(r) : MIN_DBC;
}

/**
 * The overdrive the fold takes: the largest |z| over the design load of the loads the stage meets when the sweep
 * drew the circle at the antenna (through the filter; the portable demo's filter turns SWR 2 into 2.9), else the SWR
 * (the circle at the PA's output, whose largest |z| is the SWR: z = (1 + |Γ|)/(1 − |Γ|) at phase 0).
 */
export function clipOverdrive(
  swr: number, sweep: { circleAt: 'antenna' | 'pa-output'; maxLoadRatio: number } | null | undefined,
): number {
  return sweep && sweep.circleAt === 'antenna' && Number.isFinite(sweep.maxLoadRatio) ? sweep.maxLoadRatio : swr;
}

/** Filter rejection of harmonic n (relative to the fundamental, dB), null when unknown. */
export type RejectionDb = (n: number) => number | null;

/**
 * The bands with each harmonic's worst end raised to the clipped stage's level at the antenna where that is higher.
 * The bands are judged through the filter's rejection from the stage's own source (a current source for B and C):
 * `rejectSourceDb`. While clipped the drain is held at the rail like a stiff voltage source, so its harmonics reach
 * the antenna through the rejection from a voltage source into the clipping load, `rejectClippedDb`; the fold keeps
 * the level at the antenna: worst' = max(worst, clipped − rejectClipped + rejectSource).
 * The stage clips between these two descriptions (the filter shunts part of the flat top), so the fold is an upper
 * end (modelling assumption, no published source). Even harmonics are left: a clipped symmetric swing has none.
 */
export function foldClipping(
  bands: readonly HarmonicBand[], overdrive: number, rejectSourceDb: RejectionDb, rejectClippedDb: RejectionDb,
): HarmonicBand[] {
  if (!(overdrive > 1)) return bands.map((b) => ({ ...b }));
  return bands.map((b) => {
    const rs = rejectSourceDb(b.n);
    const rc = rejectClippedDb(b.n);
    const clip = clippedHarmonicDbc(b.n, overdrive);
    if (rs === null || rc === null || clip <= MIN_DBC) return { ...b };
    const equivalent = clip - rc + rs;
    return equivalent > b.worstDbc ? { ...b, worstDbc: equivalent, basis: 'clipped-at-swr' } : { ...b };
  });
}

/** One harmonic at the antenna at the clipping load: the balanced estimate beside the flat-topped upper end. */
export interface ClipEstimate {
  n: number;
  /** Harmonic balance of the stage against the filter (pa-clip-balance), dBc at the antenna. */
  estimateDbc: number;
  /** The flat-topped drain's level there, the band's worst end, dBc at the antenna. */
  upperDbc: number;
}

/**
 * For each harmonic the flat top raised (basis 'clipped-at-swr'): the balanced drain voltage's harmonic n through the
 * filter from a stiff source into the clipping load, 20 log(|V_n|/|V_1|) − rejectClipped(n), beside the flat-topped
 * level through the same path. Source: the level at the antenna is the drain's harmonic times the filter's transfer
 * from a voltage at its input (two-port chain relations, lpf-analysis); decibel for voltages.
 */
export function clipEstimates(
  folded: readonly HarmonicBand[], drainRatios: readonly number[], overdrive: number, rejectClippedDb: RejectionDb,
): ClipEstimate[] {
  return folded.flatMap((b) => {
    const rc = rejectClippedDb(b.n);
    const ratio = drainRatios[b.n - 1];
    if (b.basis !== 'clipped-at-swr' || rc === null || !(ratio > 0)) return [];
    return [{ n: b.n, estimateDbc: 20 * Math.log10(ratio) - rc, upperDbc: clippedHarmonicDbc(b.n, overdrive) - rc }];
  });
}

const ordinal = (n: number) => `${n}${n === 2 ? 'nd' : n === 3 ? 'rd' : 'th'}`;

/** The builder's note: the best estimate at the clipping load and why the verdict keeps the upper end (harmonics whose
 * upper end is below the construction floor are left out; null when none is left). */
export function clipEstimateFinding(
  all: readonly ClipEstimate[], swr: number, loadOhm: number, subject: string,
): Finding | null {
  const est = all.filter((e) => e.upperDbc >= CONSTRUCTION_FLOOR_DBC);
  if (est.length === 0) return null;
  const level = (x: number) => (x < CONSTRUCTION_FLOOR_DBC ? `is below ${CONSTRUCTION_FLOOR_DBC} dBc`
    : `is about ${x.toFixed(0)} dBc`);
  const list = est.map((e) => `the ${ordinal(e.n)} ${level(e.estimateDbc)}`).join(', ');
  const upper = est.map((e) => `${e.upperDbc.toFixed(0)} dBc (${ordinal(e.n)})`).join(', ');
  return {
    severity: 'ok', rule: 'pa.clip-harmonics', subject, value: est[0].estimateDbc, limit: null, unit: 'dBc',
    source: 'pa.clip-balance',
    message: `Into the SWR ${swr} load where the stage clips most (${(swr * loadOhm).toFixed(0)} Ω, reflection ` +
      `phase 0°) the filter's input takes much of the flat top's harmonic current, so the drain stays nearer a ` +
      `sine: at the antenna ${list} by harmonic balance against the filter (best estimate). The harmonic rows ` +
      `keep the flat-topped drain's ${upper} as their worst end, since the output transformer's leakage inductance ` +
      'is not modelled; a measurement into a mismatched dummy load settles it.',
  };
}
