// All rectified windings of one transformer simulated together, the primary resistance shared: a PA keying down on
// one winding pulls the primary current up, drops the EMF of every winding, and sags the other rails too
// (cross-regulation). Circuit: mains sine behind R_p, an ideal multi-winding transformer (secondary EMF
// e_i = k_i (V_s - R_p i_p), i_p = Σ k_i i_i), each winding behind its own resistance and diodes (Vf + r_d, the same
// element model as rectifier-sim.ts) into its reservoir (ESR, constant-current load, optional bleeder). Leakage
// inductance is not modelled. Integration: Heun's method at a fixed step, whole cycles from the no-load peak until
// the reservoir voltages repeat; the last cycle is reported. Checked against ngspice (test/core/power).
import type { RectifierTopology } from '../model';
import { diodesInPath } from './rectifier-sim';

export interface JointWinding {
  topology: RectifierTopology;
  /** Open-circuit secondary RMS at the applied mains (V), per half for centre-tap: sets the turns ratio. */
  secondaryVrms: number;
  /** The winding's own resistance (Ω), per half for centre-tap; the primary's share is in primaryOhm. */
  ownOhm: number;
  diodeDropV: number;
  diodeResistanceOhm: number;
  capacitanceF: number;
  esrOhm: number;
  /** Constant load current (A). */
  loadA: number;
  bleederOhm?: number | null;
}

export interface JointInput {
  /** Applied mains RMS (V) and the primary resistance (Ω). */
  primaryVrms: number;
  primaryOhm: number;
  frequencyHz: number;
  windings: JointWinding[];
  /** Steps per mains cycle (default 2000) and the cap on simulated cycles (default 400). */
  stepsPerCycle?: number;
  maxCycles?: number;
}

export interface JointRail {
  troughV: number;
  dcMeanV: number;
  peakV: number;
}

export interface JointResult {
  converged: boolean;
  cycles: number;
  rails: JointRail[];
}

interface W {
  k: number;
  n: number;
  vf: number;
  r: number;
  esr: number;
  c: number;
  i0: number;
  g: number;
  halfWave: boolean;
}

/**
 * Winding currents (A, magnitudes) at one instant: with the conducting set S fixed the circuit is linear,
 * i_i R_i = k_i (|V_s| - R_p X) - b_i with X = Σ_S k_j i_j, so X = (|V_s| A - B) / (1 + R_p A),
 * A = Σ k_i² / R_i, B = Σ k_i b_i / R_i (Kirchhoff's laws on the ideal transformer); a winding whose current
 * comes out negative is dropped from S and the rest solved again.
 */
function currents(ws: W[], v: Float64Array, vs: number, rp: number, out: Float64Array, on: Uint8Array): void {
  const mag = Math.abs(vs);
  const m = ws.length;
  for (let i = 0; i < m; i++) {
    const w = ws[i];
    on[i] = (vs > 0 || !w.halfWave) && w.k * mag - (w.n * w.vf + v[i] - w.esr * w.i0) > 0 ? 1 : 0;
  }
  for (let pass = 0; pass <= m; pass++) {
    let a = 0;
    let b = 0;
    for (let i = 0; i < m; i++) {
      if (!on[i]) continue;
      const w = ws[i];
      a += (w.k * w.k) / w.r;
      b += (w.k * (w.n * w.vf + v[i] - w.esr * w.i0)) / w.r;
    }
    const x = (mag * a - b) / (1 + rp * a);
    let worst = -1;
    let worstI = 0;
    for (let i = 0; i < m; i++) {
      const w = ws[i];
      out[i] = on[i] ? (w.k * (mag - rp * x) - (w.n * w.vf + v[i] - w.esr * w.i0)) / w.r : 0;
      if (on[i] && out[i] < worstI) {
        worst = i;
        worstI = out[i];
      }
    }
    if (worst < 0) return;
    on[worst] = 0;
  }
}

/** Reservoir voltages' rate of change (V/s) at one instant. */
function slope(
  ws: W[], v: Float64Array, vs: number, rp: number, buf: Float64Array, on: Uint8Array, dv: Float64Array,
): void {
  currents(ws, v, vs, rp, buf, on);
  for (let i = 0; i < ws.length; i++) {
    const w = ws[i];
    // capacitor current = diode current - load - bleeder (the bleeder taken across the capacitor)
    dv[i] = (buf[i] - w.i0 - v[i] * w.g) / w.c;
  }
}

export function simulateSharedPrimary(input: JointInput): JointResult {
  const steps = input.stepsPerCycle ?? 2000;
  const maxCycles = input.maxCycles ?? 400;
  const period = 1 / input.frequencyHz;
  const h = period / steps;
  const vpk = Math.SQRT2 * input.primaryVrms;
  const rp = Math.max(0, input.primaryOhm);
  const ws: W[] = input.windings.map((w) => {
    const n = diodesInPath(w.topology);
    return {
      k: w.secondaryVrms / input.primaryVrms, n, vf: w.diodeDropV, esr: Math.max(0, w.esrOhm), c: w.capacitanceF,
      r: Math.max(1e-6, w.ownOhm + n * w.diodeResistanceOhm + Math.max(0, w.esrOhm)), i0: Math.max(0, w.loadA),
      g: w.bleederOhm && w.bleederOhm > 0 ? 1 / w.bleederOhm : 0, halfWave: w.topology === 'half-wave',
    };
  });
  const m = ws.length;
  const v = Float64Array.from(ws.map((w) => Math.max(0, w.k * vpk - w.n * w.vf)));
  const buf = new Float64Array(m);
  const on = new Uint8Array(m);
  const sinT = Float64Array.from({ length: steps + 1 }, (_, n) => vpk * Math.sin((2 * Math.PI * n) / steps));
  const d1 = new Float64Array(m);
  const d2 = new Float64Array(m);
  const pred = new Float64Array(m);
  const tol = 1e-5 * Math.max(1, ...v);
  let cycles = 0;
  let converged = false;
  let stats = ws.map(() => ({ min: Infinity, max: -Infinity, sum: 0 }));
  while (cycles < maxCycles) {
    const start = Float64Array.from(v);
    const lo = new Float64Array(m).fill(Infinity);
    const hi = new Float64Array(m).fill(-Infinity);
    const sum = new Float64Array(m);
    for (let n = 0; n < steps; n++) {
      // Heun's method (explicit trapezoid): predictor with the slope at the start, corrector with the mean slope
      slope(ws, v, sinT[n], rp, buf, on, d1);
      for (let i = 0; i < m; i++) pred[i] = Math.max(0, v[i] + h * d1[i]);
      slope(ws, pred, sinT[n + 1], rp, buf, on, d2);
      for (let i = 0; i < m; i++) {
        v[i] = Math.max(0, v[i] + (h / 2) * (d1[i] + d2[i]));
        // rail terminal = reservoir + ESR x capacitor current; the trough and mean are read on the reservoir node
        if (v[i] < lo[i]) lo[i] = v[i];
        if (v[i] > hi[i]) hi[i] = v[i];
        sum[i] += v[i];
      }
    }
    stats = ws.map((_, i) => ({ min: lo[i], max: hi[i], sum: sum[i] }));
    cycles++;
    if (v.every((x, i) => Math.abs(x - start[i]) < tol)) {
      converged = true;
      break;
    }
  }
  return { converged, cycles, rails: stats.map((s) => ({ troughV: s.min, peakV: s.max, dcMeanV: s.sum / steps })) };
}
