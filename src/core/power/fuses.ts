// Fuse choice from the IEC 60127 rated-current series, and checks of a fitted fuse.
import type { Finding } from '../findings';
import type { FuseRecommendation, FuseSheet } from './report-types';
import { IEC_60127_FUSES_A, nextAtLeast } from './standard-values';

/** Primary fuse factor over the full-load primary current: 1.5 (laminated) to 2 (toroidal, inrush). */
// Common practice, no published source: ref §4.3 [M] "time-lag fuse roughly 1.5-2 x full-load primary rms"
export const PRIMARY_FACTOR = { laminated: 1.5, toroidal: 2 } as const;

/**
 * DC-side rail fuse factor over the key-down DC current. Common practice, no
 * published source (ref §4.3 [M]: 1.25-1.5).
 */
export const RAIL_FACTOR = 1.5;

const SOURCE = 'supply.fuse' as const;

/** Marking as printed on a time-lag fuse: "T400mA", "T2A", "T3.15A". */
export function fuseMarking(ratedA: number, characteristic: 'T' | 'F' = 'T'): string {
  return ratedA < 1
    ? `${characteristic}${Math.round(ratedA * 1000)}mA`
    : `${characteristic}${Number(ratedA.toPrecision(3))}A`;
}

function fmtA(a: number): string {
  return a < 1 ? `${Math.round(a * 1000)} mA` : `${Number(a.toPrecision(3))} A`;
}

/** The characteristic letter of an IEC 60127-2 standard sheet: T3, T5 time-lag; F2 quick-acting. */
export const sheetLetter = (sheet: FuseSheet): 'T' | 'F' => (sheet.startsWith('F') ? 'F' : 'T');

/**
 * Primary fuse for a transformer primary current (A), of the type the builder chose (sheet; T3 when not chosen).
 * The size is the same for every type; a quick-acting type is judged against the inrush separately (inrush.ts).
 */
export function primaryFuse(
  loadA: number, construction: 'laminated' | 'toroidal', series: readonly number[] = IEC_60127_FUSES_A,
  sheet: FuseSheet = 'T3',
): FuseRecommendation {
  const load = Number.isFinite(loadA) && loadA > 0 ? loadA : 0;
  const factor = PRIMARY_FACTOR[construction];
  const ratedA = load > 0 ? nextAtLeast(series, load * factor) : null;
  const c = sheetLetter(sheet);
  const inrush = construction === 'toroidal'
    ? ' A toroidal core draws a large switch-on inrush, so the higher factor of 2 is used.' : '';
  const why = c === 'T'
    ? ' Time-lag so that switch-on inrush does not blow it.'
    : ' Quick-acting as chosen: the inrush check below says whether it survives switch-on.';
  return {
    ratedA,
    characteristic: c,
    loadA: load,
    factor,
    reasoning: load > 0
      ? `Worst continuous primary current ${fmtA(load)} x ${factor} = ${fmtA(load * factor)}, rounded up to the ` +
        `IEC 60127 series: ${c}${ratedA !== null ? fmtA(ratedA) : ' (beyond the series)'}.${why}${inrush}`
      : 'No primary load: no fuse size can be computed.',
  };
}

/** Rail fuse on the DC side after the reservoir, carrying the key-down DC current (A). */
export function railFuse(
  keyDownA: number, where: string, series: readonly number[] = IEC_60127_FUSES_A,
): FuseRecommendation {
  const load = Number.isFinite(keyDownA) && keyDownA > 0 ? keyDownA : 0;
  const ratedA = load > 0 ? nextAtLeast(series, load * RAIL_FACTOR) : null;
  return {
    ratedA,
    characteristic: 'T',
    loadA: load,
    factor: RAIL_FACTOR,
    reasoning: load > 0
      ? `Key-down DC current ${fmtA(load)} x ${RAIL_FACTOR} = ${fmtA(load * RAIL_FACTOR)}, rounded up to the ` +
        `IEC 60127 series: T${ratedA !== null ? fmtA(ratedA) : ' (beyond the series)'}, ${where}.`
      : `No load on this rail: no fuse size can be computed (${where}).`,
  };
}

/**
 * Fitted fuse check. fail: below the continuous load (it will blow in use); caution: below the recommendation
 * (nuisance blowing at switch-on) or more than two series steps above it (may not protect the wiring/winding).
 */
export function fittedFuseFindings(
  subject: string, fittedA: number | null, rec: FuseRecommendation, series: readonly number[] = IEC_60127_FUSES_A,
): Finding[] {
  if (fittedA === null) return [];
  const base = { rule: 'fuse.rating', subject, value: fittedA, unit: 'A', source: SOURCE };
  if (!(fittedA > 0) || !Number.isFinite(fittedA)) {
    return [{
      ...base, value: null, limit: rec.ratedA, severity: 'fail',
      message: 'The fitted fuse rating is not a valid current.',
    }];
  }
  if (fittedA < rec.loadA) {
    const fit = `${rec.characteristic}${rec.ratedA !== null ? fmtA(rec.ratedA) : '?'}`;
    return [{
      ...base, limit: rec.loadA, severity: 'fail',
      message: `A ${fmtA(fittedA)} fuse is below the ${fmtA(rec.loadA)} it must carry and will blow in use; ` +
        `fit ${fit}.`,
    }];
  }
  if (rec.ratedA === null) return [];
  if (fittedA < rec.ratedA * (1 - 1e-9)) {
    return [{
      ...base, limit: rec.ratedA, severity: 'caution',
      message: `A ${fmtA(fittedA)} fuse is smaller than the recommended ${rec.characteristic}${fmtA(rec.ratedA)}; it ` +
        'may blow at switch-on or during long key-down.',
    }];
  }
  const sorted = [...series].sort((a, b) => a - b);
  const idx = sorted.findIndex((v) => v >= rec.ratedA! * (1 - 1e-9));
  const ceiling = sorted[Math.min(sorted.length - 1, idx + 2)];
  if (fittedA > ceiling * (1 + 1e-9)) {
    return [{
      ...base, limit: ceiling, severity: 'caution',
      message: `A ${fmtA(fittedA)} fuse is much larger than the recommended ` +
        `${rec.characteristic}${fmtA(rec.ratedA)}; a fault could overheat the winding or wiring before it blows.`,
    }];
  }
  return [{
    ...base, limit: rec.ratedA, severity: 'ok',
    message: `The fitted ${fmtA(fittedA)} fuse suits the load (recommended ${rec.characteristic}${fmtA(rec.ratedA)}).`,
  }];
}
