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
