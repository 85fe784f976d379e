// Amateur HF band edges used to pick a default filter cutoff and to shade plots.

export interface Band {
  name: string;
  lowHz: number;
  /** Widest upper edge of any ITU region (outer limit; national rules may be narrower). */
  highHz: number;
  /** true where the edges are from memory, not a source read. */
  fromMemory: boolean;
}

// Source: ITU Radio Regulations Art. 5 (allocation table), widest region per band; 20/15/12/10 m from memory
export const HF_BANDS: readonly Band[] = [
  { name: '160 m', lowHz: 1.8e6, highHz: 2.0e6, fromMemory: false },
  { name: '80 m', lowHz: 3.5e6, highHz: 4.0e6, fromMemory: false },
  { name: '40 m', lowHz: 7.0e6, highHz: 7.3e6, fromMemory: false },
  { name: '30 m', lowHz: 10.1e6, highHz: 10.15e6, fromMemory: false },
  { name: '20 m', lowHz: 14.0e6, highHz: 14.35e6, fromMemory: true },
  { name: '17 m', lowHz: 18.068e6, highHz: 18.168e6, fromMemory: false },
  { name: '15 m', lowHz: 21.0e6, highHz: 21.45e6, fromMemory: true },
  { name: '12 m', lowHz: 24.89e6, highHz: 24.99e6, fromMemory: true },
  { name: '10 m', lowHz: 28.0e6, highHz: 29.7e6, fromMemory: true },
];

export function bandOf(frequencyHz: number): Band | null {
  return HF_BANDS.find((b) => frequencyHz >= b.lowHz && frequencyHz <= b.highHz) ?? null;
}

/**
 * Default cutoff. Chebyshev (cutoff = ripple edge): 1.2 x operating frequency; Butterworth (cutoff =
 * 3 dB point): 1.4 x operating frequency; in both cases at least 1.05 x the band's upper edge so the
 * whole band lies in the passband.
 */
export function defaultCutoffHz(frequencyHz: number, response: 'butterworth' | 'chebyshev'): number {
  // Common practice, no published source: fc = 1.2 f (Chebyshev ripple edge) or 1.4 f (Butterworth 3 dB)
  const factor = response === 'chebyshev' ? 1.2 : 1.4;
  const band = bandOf(frequencyHz);
  const fromBand = band ? 1.05 * band.highHz : 0;
  return Math.max(factor * frequencyHz, fromBand);
}
