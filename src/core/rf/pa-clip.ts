// A class B/C stage driven into a load above its design load: the drain voltage flat-topped at the rail limits.
// Its harmonics, at the most-clipping load of the SWR circle, folded into the worst end of the PA's harmonic bands.
import { clippedSineCoefficient } from './pa-fourier';
import { MIN_DBC, type HarmonicBand } from './pa-spectrum';

/**
 * Harmonic n of the drain voltage of a sinusoid `overdrive` times the rail-limited swing, flat-topped at the rail
 * limits, relative to its fundamental, dBc (MIN_DBC when there is none: even n, or no clipping).
 * Source: Fourier series of the clipped sinusoid (pa-fourier clippedSineCoefficient, from memory); decibel for voltages
 */
export function clippedHarmonicDbc(n: number, overdrive: number): number {
  const r = Math.abs(clippedSineCoefficient(n, overdrive) / clippedSineCoefficient(1, overdrive));
  return r > 10 ** (MIN_DBC / 20) ? 20 * Math.log10(r) : MIN_DBC;
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
