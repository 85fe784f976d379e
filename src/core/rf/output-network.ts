// Output network of a PA matched by a network instead of a transformer: a low-pass L network from the drain load to
// the antenna load, with standard capacitors and turns on the filter's core; and the drain feed choke.
import type { PaParams } from '../model';
import { snapCapacitance, type ESeries } from './e-series';
import { turnsForInductance } from './lpf-design';

/** Choke reactance as a multiple of the drain load it must not shunt. */
// Common practice, no published source: a feed choke of at least 10 times the load's resistance
export const CHOKE_REACTANCE_FACTOR = 10;

export interface LNetwork {
  /** Low and high resistances it transforms between, Ω (drain side is the low one when the drain load is lower). */
  drainOhm: number;
  loadOhm: number;
  q: number;
  /** Ideal series inductance (on the low side) and shunt capacitance (on the high side). */
  seriesH: number;
  shuntF: number;
  /** Capacitors fitted and the as-built capacitance, F; turns on the core and the as-built inductance, H. */
  capacitorPartsF: number[];
  builtShuntF: number;
  turns: number | null;
  builtSeriesH: number | null;
  /** Drain load the built parts give, Ω (real part and reactance), or null without turns. */
  builtDrainReOhm: number | null;
  builtDrainImOhm: number | null;
  /** Which side the shunt capacitor sits on. */
  shuntAt: 'load' | 'drain';
}

export interface RfChoke {
  /** Inductance needed, H, and the DC current it carries key-down, A. */
  minInductanceH: number;
  currentA: number;
}

/** Ideal low-pass L network between two resistances at f: series L on the low side, shunt C across the high side. */
export function lNetworkIdeal(rLowOhm: number, rHighOhm: number, frequencyHz: number) {
  const w = 2 * Math.PI * frequencyHz;
  // Source: L-network design equations (C. Bowick, RF Circuit Design, 1982, ch. 4; from memory, not confirmed):
  // Q = √(R_high / R_low − 1), X_series = Q R_low, X_shunt = R_high / Q
  const q = Math.sqrt(rHighOhm / rLowOhm - 1);
  return { q, seriesH: (q * rLowOhm) / w, shuntF: q / (rHighOhm * w) };
}

/** Impedance looking into the low side: jX_L + (R_high ∥ 1/(jωC)), as [re, im] Ω. */
export function lNetworkInput(
  seriesH: number,
  shuntF: number,
  rHighOhm: number,
  frequencyHz: number,
): [number, number] {
  const w = 2 * Math.PI * frequencyHz;
  const b = w * shuntF * rHighOhm;
  // Source: circuit theory: R ∥ (−j/(ωC)) = R (1 − j ωCR) / (1 + (ωCR)²)
  const re = rHighOhm / (1 + b * b);
  const im = (-rHighOhm * b) / (1 + b * b) + w * seriesH;
  return [re, im];
}

export function designOutputNetwork(
  pa: PaParams,
  drainOhm: number,
  frequencyHz: number,
  core: { alHPerTurn2: number; series: ESeries; pairs: boolean } | null,
): LNetwork | null {
  const loadOhm = pa.loadOhm;
  if (!(drainOhm > 0) || !(loadOhm > 0) || !(frequencyHz > 0) || Math.abs(drainOhm - loadOhm) < 1e-9) return null;
  const drainLow = drainOhm < loadOhm;
  const lo = Math.min(drainOhm, loadOhm);
  const hi = Math.max(drainOhm, loadOhm);
  const ideal = lNetworkIdeal(lo, hi, frequencyHz);
  const snapped = snapCapacitance(ideal.shuntF, core?.series ?? 'E12', core?.pairs ?? true);
  const turns = core ? turnsForInductance(ideal.seriesH, core.alHPerTurn2) : null;
  // Source: definition of the inductance factor, L = AL N² (IEC 60205)
  const builtSeriesH = core && turns !== null ? core.alHPerTurn2 * turns * turns : null;
  const built = builtSeriesH !== null ? lNetworkInput(builtSeriesH, snapped.total, hi, frequencyHz) : null;
  return {
    drainOhm, loadOhm, q: ideal.q, seriesH: ideal.seriesH, shuntF: ideal.shuntF, capacitorPartsF: snapped.parts,
    builtShuntF: snapped.total, turns, builtSeriesH,
    // the drain sees the low side only when its load is the lower one; otherwise it sees the shunt side
    builtDrainReOhm: built && drainLow ? built[0] : null, builtDrainImOhm: built && drainLow ? built[1] : null,
    shuntAt: drainLow ? 'load' : 'drain',
  };
}

/** Drain feed choke of a single-ended stage: reactance ≥ 10 × the drain load at f, carrying the key-down current. */
export function feedChoke(drainOhm: number, frequencyHz: number, keyDownCurrentA: number): RfChoke {
  // Source: inductive reactance X = ωL (textbook), with the factor of CHOKE_REACTANCE_FACTOR (common practice)
  return {
    minInductanceH: (CHOKE_REACTANCE_FACTOR * drainOhm) / (2 * Math.PI * frequencyHz),
    currentA: keyDownCurrentA,
  };
}
