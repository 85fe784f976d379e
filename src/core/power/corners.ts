// Operating corners: mains low/nominal/high x load (each mode, duty-weighted thermal load, tune-up carrier).
import type { Mains, Mode, PerMode } from '../model';
import { MODE_LABELS } from '../model';
import type { CornerLoad, CornerSpec, MainsCorner } from './report-types';

/** CW conversational duty factor. Source: FCC OET Bulletin 65 Supplement B (1997), Table 2 (via ref §2.3 [C2]). */
export const CW_DUTY_FACTOR = 0.4;

/** Default operating split for battery runtime: 80 % receive, 20 % transmit. Common practice, no published source. */
export const DEFAULT_TRANSMIT_FRACTION = 0.2;

export const CORNER_LOADS: readonly CornerLoad[] = ['receive', 'keyUp', 'keyDown', 'thermal', 'tuneUp'];
export const MAINS_CORNERS: readonly MainsCorner[] = ['low', 'nominal', 'high'];

export const LOAD_LABEL: Record<CornerLoad, string> = {
  ...MODE_LABELS,
  thermal: 'thermal (CW duty)',
  tuneUp: 'tune-up carrier',
};
export const MAINS_LABEL: Record<MainsCorner, string> = {
  low: 'Low mains',
  nominal: 'Nominal mains',
  high: 'High mains',
};
/** Labels when the source is a battery or external DC supply: low = end of discharge, high = full charge. */
export const BATTERY_LABEL: Record<MainsCorner, string> = {
  low: 'Battery at end voltage',
  nominal: 'Battery nominal',
  high: 'Battery full',
};

/** Keying duty clamped to 0..1 (a bad value falls back to the CW duty factor). */
export function safeDuty(duty: number): number {
  return Number.isFinite(duty) && duty >= 0 && duty <= 1 ? duty : CW_DUTY_FACTOR;
}

/** Mains voltage over nominal at a corner (dimensionless); bad fractions count as 0. */
export function mainsFactor(mains: Mains | null, corner: MainsCorner): number {
  if (!mains) return 1;
  const low = Number.isFinite(mains.lowFraction) ? Math.min(Math.max(mains.lowFraction, 0), 0.9) : 0;
  const high = Number.isFinite(mains.highFraction) ? Math.min(Math.max(mains.highFraction, 0), 1) : 0;
  return corner === 'low' ? 1 - low : corner === 'high' ? 1 + high : 1;
}

export function dutyOf(load: CornerLoad, keyingDuty: number): number {
  if (load === 'keyDown' || load === 'tuneUp') return 1;
  if (load === 'thermal') return safeDuty(keyingDuty);
  return 0;
}

/**
 * Current for a corner load. Thermal load = keyDown x duty + keyUp x (1 - duty): the mean over a keying cycle.
 * Source: duty-factor averaging of OET Bulletin 65 Supplement B (1997), Table 2 and its averaging recipe (ref §2.3
 * [C2]).
 */
export function cornerCurrent(perMode: PerMode, load: CornerLoad, keyingDuty: number): number {
  const clean = (x: number) => (Number.isFinite(x) && x > 0 ? x : 0);
  if (load === 'thermal') {
    const d = safeDuty(keyingDuty);
    return clean(perMode.keyDown) * d + clean(perMode.keyUp) * (1 - d);
  }
  if (load === 'tuneUp') return clean(perMode.keyDown);
  return clean(perMode[load as Mode]);
}

/**
 * All corners: every mains corner x every load (without mains the three corners are battery end/nominal/full); with
 * `secondaryTolerance` (a transformer states one) one more, low mains with each secondary at the low end of its
 * tolerance, key-down (TOLERANCE_ID).
 */
export function cornerSpecs(mains: Mains | null, keyingDuty: number, secondaryTolerance = false): CornerSpec[] {
  const out: CornerSpec[] = [];
  for (const m of MAINS_CORNERS) {
    for (const load of CORNER_LOADS) {
      const f = mainsFactor(mains, m);
      out.push({
        id: `${m}-${load}`,
        label: `${(mains ? MAINS_LABEL : BATTERY_LABEL)[m]}, ${LOAD_LABEL[load]}`,
        mains: m,
        mainsFactor: f,
        mainsV: mains && Number.isFinite(mains.nominalV) ? mains.nominalV * f : 0,
        load,
        duty: dutyOf(load, keyingDuty),
      });
    }
  }
  if (mains && secondaryTolerance) {
    const low = out.find((s) => s.id === WORST_VOLTAGE_ID)!;
    out.push({
      ...low,
      id: TOLERANCE_ID,
      label: `${MAINS_LABEL.low}, secondary at its low tolerance, ${LOAD_LABEL.keyDown}`,
      secondaryTolerance: true,
    });
  }
  return out;
}

/** Corner that sets headroom (lowest voltage, heaviest load) and the one that sets heating. */
export const WORST_VOLTAGE_ID = 'low-keyDown';
export const WORST_THERMAL_ID = 'high-thermal';
export const TUNE_UP_ID = 'high-tuneUp';
/** Low mains, every secondary at the low end of its stated tolerance, key-down. */
export const TOLERANCE_ID = 'lowTol-keyDown';

export function worstIds(_hasMains = true): { voltage: string; thermal: string; tuneUp: string } {
  return { voltage: WORST_VOLTAGE_ID, thermal: WORST_THERMAL_ID, tuneUp: TUNE_UP_ID };
}
