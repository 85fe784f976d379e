// IEC 60063 preferred-number series and snapping of component values to them.

/** Source: IEC 60063:2015 E12 list (the published table, not 10^(k/12) rounded). */
export const E12 = [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2] as const;
/** Source: IEC 60063:2015 E24 list (the published table; several values differ from 10^(k/24) rounded). */
export const E24 = [
  1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2,
  9.1,
] as const;

export type ESeries = 'E12' | 'E24';

/** Standard values of a series across decades [lo, hi] (both in the same unit as the result). */
export function seriesValues(series: ESeries, lo: number, hi: number): number[] {
  const base = series === 'E12' ? E12 : E24;
  const out: number[] = [];
  const d0 = Math.floor(Math.log10(lo)) - 1;
  const d1 = Math.ceil(Math.log10(hi)) + 1;
  for (let d = d0; d <= d1; d++) {
    for (const m of base) {
      // round to 2 significant digits to remove floating-point dust (1.2 * 1e-10 etc.)
      const v = Number((m * 10 ** d).toPrecision(2));
      if (v >= lo && v <= hi) out.push(v);
    }
  }
  return out;
}

/** Nearest standard value (smallest relative error). */
export function nearestStandard(value: number, series: ESeries): number {
  if (!(value > 0) || !Number.isFinite(value)) throw new Error(`nearestStandard: bad value ${value}`);
  const cands = seriesValues(series, value / 20, value * 20);
  let best = cands[0];
  for (const c of cands) if (Math.abs(c / value - 1) < Math.abs(best / value - 1)) best = c;
  return best;
}

export interface SnappedValue {
  /** Parts fitted in parallel (one or two standard values), same unit as the input. */
  parts: number[];
  /** Sum of the parts (the as-built value). */
  total: number;
  /** (total - ideal) / ideal. */
  errorFraction: number;
}

/**
 * Snap a capacitance to one standard value, or to a parallel pair of standard values when the pair
 * comes closer. Works for any unit; the series repeats per decade.
 */
export function snapCapacitance(ideal: number, series: ESeries, allowPairs: boolean): SnappedValue {
  const single = nearestStandard(ideal, series);
  let best: SnappedValue = { parts: [single], total: single, errorFraction: single / ideal - 1 };
  if (!allowPairs) return best;
  // Both parts at least 1/30 of the target, so a pair is never "big part + a trimmer-sized crumb".
  const cands = seriesValues(series, ideal / 30, ideal);
  for (let i = 0; i < cands.length; i++) {
    for (let j = i; j < cands.length; j++) {
      const total = cands[i] + cands[j];
      const err = total / ideal - 1;
      // a pair must beat the single part by a clear margin (0.5 %) to be worth a second part
      if (Math.abs(err) < Math.abs(best.errorFraction) - 0.005) {
        best = { parts: [cands[j], cands[i]], total, errorFraction: err };
      }
    }
  }
  return best;
}
