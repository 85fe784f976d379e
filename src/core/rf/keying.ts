// Keying: the spectrum of the keyed carrier from the envelope's edges, by FFT of a steady dot train at the set speed.
import { fft } from './keying-fft';
import { envelopeAt, type KeyedEdges } from './keying-envelope';
import { dotLengthS } from './tr-relay';

/** Samples per period of the dot train (a power of two). */
export const KEYING_SAMPLES = 1 << 15;
/** Offsets from the carrier at which key-click levels are reported, Hz. */
export const CLICK_OFFSETS_HZ = [100, 200, 500, 1000, 2000] as const;
/** Lines below this are shown as the floor, dBc (the FFT's numerical floor, not a measurement). */
export const SPECTRUM_FLOOR_DBC = -140;

export interface KeyingSpectrum {
  wpm: number;
  dotS: number;
  /** Spacing of the spectral lines of the steady dot train, Hz (1 / (2 dot)). */
  lineSpacingHz: number;
  /** One-sided line offsets from the carrier (0 = carrier), Hz, and their levels relative to the carrier, dBc. */
  offsetsHz: number[];
  levelsDbc: number[];
  /** Per reported offset: the strongest line at or beyond it, dBc. */
  clicks: { offsetHz: number; levelDbc: number }[];
  /** Bandwidth holding 99 % of the mean power (0.5 % outside each edge), Hz. */
  occupiedBandwidthHz: number;
}

/** Line amplitudes |A_k| (k = 0..N/2) of the periodic envelope's Fourier series, from one period of samples. */
export function envelopeLines(dotS: number, edges: KeyedEdges, samples = KEYING_SAMPLES): number[] {
  const periodS = 2 * dotS;
  const x = new Array<number>(samples);
  // sample at mid-intervals so no sample lands exactly on a hard edge
  for (let i = 0; i < samples; i++) x[i] = envelopeAt(((i + 0.5) / samples) * periodS, dotS, edges);
  const X = fft(x);
  // Source: Fourier series of a periodic signal from one period of N samples: A_k = X[k] / N (DFT definition)
  const out: number[] = [];
  for (let k = 0; k <= samples / 2; k++) out.push(Math.hypot(X.re[k], X.im[k]) / samples);
  return out;
}

/** Spectra already computed, by their inputs (a pure function of them; bounded: the oldest goes first). */
const spectra = new Map<string, KeyingSpectrum>();
const SPECTRA_KEPT = 16;

/**
 * Keyed carrier spectrum of a steady dot train at `wpm` with the given edges. The same inputs give the same
 * (shared, frozen) result: an edit elsewhere in the project does not run the 32k-point FFT again.
 */
export function keyingSpectrum(wpm: number, edges: KeyedEdges, maxOffsetHz = 3000): KeyingSpectrum {
  const key = JSON.stringify([wpm, edges, maxOffsetHz]);
  const held = spectra.get(key);
  if (held) return held;
  const computed = computeSpectrum(wpm, edges, maxOffsetHz);
  if (spectra.size >= SPECTRA_KEPT) spectra.delete(spectra.keys().next().value!);
  spectra.set(key, computed);
  return computed;
}

function computeSpectrum(wpm: number, edges: KeyedEdges, maxOffsetHz: number): KeyingSpectrum {
  const dotS = dotLengthS(wpm);
  const lineSpacingHz = 1 / (2 * dotS);
  const a = envelopeLines(dotS, edges);
  const carrier = a[0];
  // Source: definition of dBc for an amplitude-modulated carrier: sideband line k at 20 log10(|A_k| / |A_0|)
  const dbc = (v: number) => Math.max(SPECTRUM_FLOOR_DBC, 20 * Math.log10(v / carrier));
  const offsetsHz: number[] = [];
  const levelsDbc: number[] = [];
  for (let k = 0; k < a.length && k * lineSpacingHz <= maxOffsetHz; k++) {
    offsetsHz.push(k * lineSpacingHz);
    levelsDbc.push(dbc(a[k]));
  }
  // strongest line at or beyond each offset (lines of a real envelope are symmetric about the carrier)
  const beyond = new Array<number>(a.length);
  for (let k = a.length - 1, m = 0; k >= 0; k--) beyond[k] = m = Math.max(m, a[k]);
  const clicks = CLICK_OFFSETS_HZ.map((offsetHz) => {
    const k = Math.ceil(offsetHz / lineSpacingHz - 1e-9);
    return { offsetHz, levelDbc: k < a.length ? dbc(beyond[k]) : SPECTRUM_FLOOR_DBC };
  });
  // Source: ITU Radio Regulations Art. 1, No. 1.153 (occupied bandwidth: β/2 = 0.5 % of the mean power outside each
  // limit). Two-sided power of line k is 2|A_k|² for k > 0 (Parseval, real envelope).
  const total = a.reduce((s, v, k) => s + (k === 0 ? v * v : 2 * v * v), 0);
  let outside = 0;
  let edgeK = a.length - 1;
  for (let k = a.length - 1; k > 0; k--) {
    if (outside + 2 * a[k] * a[k] > 0.01 * total) break;
    outside += 2 * a[k] * a[k];
    edgeK = k - 1;
  }
  const spectrum = {
    wpm,
    dotS,
    lineSpacingHz,
    offsetsHz,
    levelsDbc,
    clicks,
    occupiedBandwidthHz: 2 * edgeK * lineSpacingHz,
  };
  Object.freeze(offsetsHz);
  Object.freeze(levelsDbc);
  clicks.forEach((c) => Object.freeze(c));
  Object.freeze(clicks);
  return Object.freeze(spectrum);
}

/** Modulation rate of Morse telegraphy at `wpm`, baud: one element unit per dot length (PARIS word of 50 units). */
export function telegraphyBaud(wpm: number): number {
  // Source: the PARIS convention of 50 units a word (common practice, no published source): B = 50 WPM / 60 = WPM/1.2
  return 1 / dotLengthS(wpm);
}

/** Necessary bandwidth of Morse telegraphy, Hz: K = 5 for fading circuits, 3 for non-fading. */
export function necessaryBandwidthHz(baud: number, k: 3 | 5): number {
  // Source: ITU Radio Regulations Appendix 1 (and ITU-R SM.1138), Part B, amplitude modulation, continuous-wave
  // telegraphy: Bn = B K
  return baud * k;
}
