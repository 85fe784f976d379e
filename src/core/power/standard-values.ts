// Editable lists of standard ratings used by the supply recommendations. Callers may pass their own.

/**
 * Off-the-shelf mains transformer secondary voltages (V RMS at full load).
 * Common practice, no published source: the union of the secondary steps listed in small-transformer catalogues
 * (PCB-mount laminated ranges 6-24 V, open-frame laminated and toroidal ranges 6-300 V; several makers' lines merged,
 * none named; from memory, not confirmed). A value here is one a builder can expect to buy off the shelf.
 */
export const DEFAULT_SECONDARY_V: readonly number[] = [
  5, 6, 7.5, 8, 9, 10, 12, 14, 15, 16, 17, 18, 20, 22, 24, 25, 26, 28, 30, 32, 35, 36, 40, 42, 45, 48, 50, 55, 60, 70,
  80, 100, 110, 115, 120, 150, 200, 230, 250, 300,
];

/**
 * Off-the-shelf transformer ratings (VA).
 * Common practice, no published source: typical catalogue steps for laminated and toroidal types (from memory).
 */
export const DEFAULT_TRANSFORMER_VA: readonly number[] = [
  3, 5, 10, 15, 20, 25, 30, 40, 50, 60, 80, 100, 120, 150, 160, 200, 225, 250, 300, 400, 500, 625, 800, 1000, 1500,
  2000,
];

/**
 * Aluminium electrolytic capacitor voltage ratings (V d.c.).
 * Common practice, no published source: rating steps as listed by capacitor makers (from memory; ref §4.2 [M]).
 */
export const DEFAULT_CAPACITOR_V: readonly number[] = [
  6.3, 10, 16, 25, 35, 50, 63, 80, 100, 160, 200, 250, 350, 400, 450, 500,
];

/** Electrolytic capacitance steps per decade (E6 series), source: IEC 60063 E6 (1.0 1.5 2.2 3.3 4.7 6.8). */
export const DEFAULT_CAPACITANCE_STEPS: readonly number[] = [1.0, 1.5, 2.2, 3.3, 4.7, 6.8];

/** E12 resistor steps per decade. Source: IEC 60063:2015 E12 series (ref §5.1). */
export const E12_STEPS: readonly number[] = [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2];

/** Fuse rated currents per decade. Source: IEC 60127 rated-current series (R10 steps: 1, 1.25 ... 8). */
export const IEC_60127_STEPS: readonly number[] = [1, 1.25, 1.6, 2, 2.5, 3.15, 4, 5, 6.3, 8];

/** Smallest list value >= x, or null when x exceeds the whole list (or is not a positive number). */
export function nextAtLeast(list: readonly number[], x: number): number | null {
  if (!Number.isFinite(x)) return null;
  const sorted = [...list].filter((v) => Number.isFinite(v) && v > 0).sort((a, b) => a - b);
  for (const v of sorted) if (v >= x * (1 - 1e-9)) return v;
  return null;
}

/** Expansions made so far, by steps and exponent range (bounded): the same few are asked for on every evaluation. */
const EXPANDED = new Map<string, readonly number[]>();

/** Expand per-decade steps into values from 10^minExp to 10^maxExp (a frozen array, kept by its inputs). */
export function decades(steps: readonly number[], minExp: number, maxExp: number): readonly number[] {
  const key = `${steps.join(',')}|${minExp}|${maxExp}`;
  const held = EXPANDED.get(key);
  if (held) return held;
  const out: number[] = [];
  for (let e = minExp; e <= maxExp; e++) for (const s of steps) out.push(Number((s * 10 ** e).toPrecision(6)));
  if (EXPANDED.size >= 256) EXPANDED.clear();
  EXPANDED.set(key, Object.freeze(out));
  return out;
}

/** Smallest decade-series value >= x (e.g. next E6 capacitance), null for non-positive/absurd x. */
export function nextInSeries(steps: readonly number[], x: number): number | null {
  if (!(x > 0) || !Number.isFinite(x)) return null;
  const e = Math.floor(Math.log10(x));
  return nextAtLeast(decades(steps, e - 1, e + 1), x);
}

/** Largest decade-series value <= x, null for non-positive/absurd x. */
export function prevInSeries(steps: readonly number[], x: number): number | null {
  if (!(x > 0) || !Number.isFinite(x)) return null;
  const e = Math.floor(Math.log10(x));
  const vals = decades(steps, e - 1, e + 1).filter((v) => v <= x * (1 + 1e-9));
  return vals.length ? vals[vals.length - 1] : null;
}

/** IEC 60127 fuse ratings from 32 mA up to 80 A. */
export const IEC_60127_FUSES_A: readonly number[] = decades(IEC_60127_STEPS, -2, 1).filter((a) => a >= 0.032);
