// Fault currents of a winding and whether a fuse clears them in time (IEC 60127-2 pre-arcing limits).
// A fuse sits in the winding lead ahead of the rectifier; the faults checked are a dead short at the rectifier's
// input (failed bridge) and a shorted reservoir (the current then still passes the diodes).
import type { RectifierTopology } from '../model';
import type { FaultCheck, FuseSheet } from './report-types';
import { resultScope, sinTable } from './rectifier-sim';

/** One row of a pre-arcing table: at `multiple` x In the fuse melts no sooner than minS and no later than maxS. */
interface PreArcRow {
  multiple: number;
  minS: number | null;
  maxS: number | null;
}

/**
 * Pre-arcing time limits of 5 x 20 mm fuse-links, IEC 60127-2 standard sheets 3 (T, low breaking capacity),
 * 5 (T, high breaking capacity) and 2 (F, low breaking capacity). Source: IEC 60127-2 (2003 + A1 + A2:2010) sheets 3
 * and 5 as quoted in makers' datasheets for fuse-links stated to meet them (the standard itself not read); the sheet 2
 * rows are from memory, not confirmed. 1.5 In: must not melt within 60 min (not a clearing row).
 */
export const IEC_60127_2_PRE_ARC: Record<FuseSheet, readonly PreArcRow[]> = {
  T3: [
    { multiple: 2.1, minS: null, maxS: 120 },
    { multiple: 2.75, minS: 0.6, maxS: 10 },
    { multiple: 4, minS: 0.15, maxS: 3 },
    { multiple: 10, minS: 0.02, maxS: 0.3 },
  ],
  T5: [
    { multiple: 2.1, minS: null, maxS: 1800 },
    { multiple: 2.75, minS: 0.75, maxS: 80 },
    { multiple: 4, minS: 0.15, maxS: 5 },
    { multiple: 10, minS: 0.02, maxS: 0.15 },
  ],
  F2: [
    { multiple: 2.1, minS: null, maxS: 1800 },
    { multiple: 2.75, minS: 0.01, maxS: 2 },
    { multiple: 4, minS: 0.003, maxS: 0.3 },
    { multiple: 10, minS: null, maxS: 0.02 },
  ],
};

export const FUSE_SHEET_LABEL: Record<FuseSheet, string> = {
  T3: 'T, time-lag, low breaking capacity (IEC 60127-2 sheet 3)',
  T5: 'T, time-lag, high breaking capacity (IEC 60127-2 sheet 5)',
  F2: 'F, quick-acting, low breaking capacity (IEC 60127-2 sheet 2)',
};

/** Time within which a winding fault must be cleared (s). Common practice, no published source. */
export const FAULT_CLEAR_S = 5;

/** Secondary (winding) fuse factor over the continuous key-down winding RMS current. Common practice, no source. */
export const WINDING_FUSE_FACTOR = 1.25;

/**
 * Guaranteed latest pre-arcing time at a current of `multiple` x In (s): the maximum of the highest tabulated
 * multiple at or below it (a larger current melts the element no later), null below the lowest clearing row.
 */
export function latestPreArcS(sheet: FuseSheet, multiple: number): number | null {
  if (!(multiple > 0) || !Number.isFinite(multiple)) return null;
  let best: number | null = null;
  for (const row of IEC_60127_2_PRE_ARC[sheet]) if (multiple >= row.multiple && row.maxS !== null) best = row.maxS;
  return best;
}

/** Check a fuse of ratedA and sheet against an RMS fault current (A). */
export function faultCheck(faultA: number, ratedA: number, sheet: FuseSheet, allowedS = FAULT_CLEAR_S): FaultCheck {
  const multiple = ratedA > 0 && Number.isFinite(faultA) ? Math.max(0, faultA) / ratedA : 0;
  const latestS = latestPreArcS(sheet, multiple);
  return {
    faultA: Math.max(0, faultA),
    fuseA: ratedA,
    sheet,
    multiple,
    latestS,
    allowedS,
    clears: latestS !== null && latestS <= allowedS,
  };
}

/**
 * RMS current through the fuse in the winding lead with the rectifier's output shorted: the EMF (peak peakV) behind
 * the winding's resistance and leakage inductance, less the diode drops in the path while it conducts.
 * Without leakage: Ohm's law per instant on the piecewise-linear diode model (the simulation's element model),
 * i = max(0, |v| - n Vf) / (R + n r_d), RMS by quadrature. With leakage L: L di/dt = v - (R + n r_d) i - n Vf sgn(i)
 * (Kirchhoff's voltage law), backward Euler over mains cycles to the periodic state; the diodes block when the current
 * would reverse. Bridge: two diodes per half-cycle, both half-cycles through the winding. Centre-tap: the fuse in the
 * centre-tap lead carries both halves, one diode each (each half with the leakage). Half-wave: one diode, positive
 * half only.
 */
export function shortedOutputRmsA(
  topology: RectifierTopology, peakV: number, windingOhm: number, diodeDropV: number, diodeOhm: number,
  leakageH = 0, frequencyHz = 50,
): number {
  // inside one evaluation the same winding is asked again in every supply pass: a look-up on the exact inputs
  const memo = resultScope<number>('shorted-output');
  const key = memo ? JSON.stringify([topology, peakV, windingOhm, diodeDropV, diodeOhm, leakageH, frequencyHz]) : '';
  const held = memo?.get(key);
  if (held !== undefined) return held;
  const a = shortedOutputUncached(topology, peakV, windingOhm, diodeDropV, diodeOhm, leakageH, frequencyHz);
  memo?.set(key, a);
  return a;
}

function shortedOutputUncached(
  topology: RectifierTopology, peakV: number, windingOhm: number, diodeDropV: number, diodeOhm: number,
  leakageH: number, frequencyHz: number,
): number {
  const n = topology === 'bridge' ? 2 : 1;
  const r = windingOhm + n * diodeOhm;
  if (!(r > 0) || !(peakV > 0)) return 0;
  const drop = n * Math.max(0, diodeDropV);
  if (!(leakageH > 0) || !(frequencyHz > 0)) {
    const steps = 400;
    let sum = 0;
    for (let k = 0; k < steps; k++) {
      const s = Math.sin((2 * Math.PI * (k + 0.5)) / steps) * peakV;
      const v = topology === 'half-wave' ? Math.max(0, s) : Math.abs(s);
      const i = Math.max(0, v - drop) / r;
      sum += i * i;
    }
    const a = Math.sqrt(sum / steps);
    return Number.isFinite(a) ? a : 0;
  }
  const steps = 2000;
  // sin(2 pi k / steps), the same values computed once (the cycles repeat them)
  const sines = sinTable(steps);
  const h = 1 / frequencyHz / steps;
  const g = leakageH / h;
  // a: the bridge's signed winding current, or the first half's (centre-tap, half-wave); b: the second half's
  let a = 0;
  let b = 0;
  // one-way path (one diode direction): the current decays or grows by backward Euler, and stops at 0
  const oneWay = (i: number, v: number) => Math.max(0, (g * i + v - drop) / (g + r));
  let sum = 0;
  const cycles = Math.min(200, 10 + Math.ceil((5 * leakageH) / r / (1 / frequencyHz)));
  for (let c = 0; c < cycles; c++) {
    sum = 0;
    for (let k = 1; k <= steps; k++) {
      const v = sines[k] * peakV;
      let lead: number;
      if (topology === 'bridge') {
        const dir = a !== 0 ? Math.sign(a) : Math.abs(v) > drop ? Math.sign(v) : 0;
        const next = dir === 0 ? 0 : (g * a + v - dir * drop) / (g + r);
        a = dir !== 0 && Math.sign(next) === dir ? next : 0;
        lead = a;
      } else {
        a = oneWay(a, v);
        b = topology === 'centre-tap' ? oneWay(b, -v) : 0;
        lead = a + b;
      }
      sum += lead * lead;
    }
  }
  const rms = Math.sqrt(sum / steps);
  return Number.isFinite(rms) ? rms : 0;
}

/**
 * Dead short at the rectifier's input (failed bridge): I = E / |Z|, |Z| = sqrt(R² + X²), X = 2 pi f L (A rms).
 * Source: Ohm's law for sinusoidal steady state (circuit theory).
 */
export function shortedWindingRmsA(emfRmsV: number, windingOhm: number, reactanceOhm = 0): number {
  const z = Math.hypot(Math.max(0, windingOhm), Math.max(0, reactanceOhm));
  if (!(z > 0) || !(emfRmsV > 0)) return 0;
  const a = emfRmsV / z;
  return Number.isFinite(a) ? a : 0;
}
