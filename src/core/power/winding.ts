// Secondary winding model: no-load voltage and series resistance from the maker's regulation figure.
import type { Winding } from '../model';

/**
 * Open-circuit secondary RMS at nominal mains: V_NL = V_rated (1 + regulation).
 * Source: transformer makers' technical notes, Reg = (V_NL - V_FL) / V_FL (ref §4.1 [C]).
 */
export function noLoadVrms(w: Winding): number {
  const reg = Number.isFinite(w.regulationFraction) && w.regulationFraction > 0 ? w.regulationFraction : 0;
  return Number.isFinite(w.ratedVrms) && w.ratedVrms > 0 ? w.ratedVrms * (1 + reg) : 0;
}

/**
 * Series resistance referred to the secondary: R_s = Reg x V_FL / I_FL (resistive model, leakage neglected),
 * unless a measured value is entered. Source: ref §4.1 [D] from the regulation definition.
 */
export function windingResistanceOhm(w: Winding): number {
  if (w.resistanceOhm !== null && Number.isFinite(w.resistanceOhm) && w.resistanceOhm >= 0) return w.resistanceOhm;
  return resistanceFromRegulation(w.ratedVrms, w.ratedA, w.regulationFraction);
}

/** Same formula for a hypothetical winding (Ω); 0 when the rating is missing. */
export function resistanceFromRegulation(ratedVrms: number, ratedA: number, regulationFraction: number): number {
  if (!(ratedA > 0) || !(ratedVrms > 0) || !(regulationFraction > 0)) return 0;
  const r = (regulationFraction * ratedVrms) / ratedA;
  return Number.isFinite(r) ? r : 0;
}

/**
 * Leakage reactance over winding resistance (X/R at mains frequency) when no leakage inductance is entered: the
 * regulation figure a maker prints (measured into a resistive load) is almost all copper loss, the reactance adding
 * only in quadrature, so the resistance comes from it as above and the leakage is taken as a share of that resistance.
 * Common practice, no published source: small laminated (EI) transformers about 0.25, toroids (windings spread over
 * the whole core) about 0.1.
 */
export const LEAKAGE_X_OVER_R = { laminated: 0.25, toroidal: 0.1 } as const;

export interface Leakage {
  /** Leakage inductance referred to this winding (H), primary and secondary leakage together. */
  henry: number;
  /** True when split from the regulation figure (LEAKAGE_X_OVER_R), false when entered. */
  fromRegulation: boolean;
}

/**
 * Leakage inductance of a winding (H): the entered value, else X = (X/R) R_s at the mains frequency,
 * L = X / (2 pi f). Source: inductive reactance X = 2 pi f L (circuit theory); X/R from LEAKAGE_X_OVER_R.
 */
export function windingLeakage(w: Winding, construction: 'laminated' | 'toroidal', frequencyHz: number): Leakage {
  const entered = w.leakageH ?? null;
  if (entered !== null && Number.isFinite(entered) && entered >= 0) return { henry: entered, fromRegulation: false };
  const r = resistanceFromRegulation(w.ratedVrms, w.ratedA, w.regulationFraction);
  const l = frequencyHz > 0 ? (LEAKAGE_X_OVER_R[construction] * r) / (2 * Math.PI * frequencyHz) : 0;
  return { henry: Number.isFinite(l) ? l : 0, fromRegulation: true };
}
