// All rectified windings of one transformer simulated together: the primary resistance and leakage inductance
// shared, each winding behind its own resistance and leakage inductance. A PA keying down on one winding pulls the
// primary current up, drops the EMF of every winding, and sags the other rails too (cross-regulation).
// Circuit: mains sine behind R_p + L_p, an ideal multi-winding transformer (secondary EMF
// e_i = k_i (V_s - R_p i_p - L_p di_p/dt), i_p = Σ k_i i_i), each winding behind R_i + L_i and its diodes (Vf + r_d,
// the element model of rectifier-sim.ts) into its reservoir (ESR, constant-current load, optional bleeder).
// Integration: backward Euler at a fixed step (stable for any leakage, 0 included); with the conducting set fixed a
// step is linear and the shared primary is a rank-one term, so each step is solved in closed form (currents()).
// Steady state: Newton shooting on the cycle-start reservoir voltages (Jacobian by finite differences), started
// from the last converged state of the same circuit inside one evaluation (warm start). Checked against ngspice
// (test/core/power/shared-primary.test.ts).
// Frame: each winding's current is taken rectified (|e| drives every full-wave winding). That holds while every
// conduction pulse ends before the mains zero crossing, true of a capacitor-input rectifier; a pulse still running
// there is cut and reported (`overlap`).
import type { RectifierTopology } from '../model';
import { diodesInPath, simulationScope } from './rectifier-sim';

export interface JointWinding {
  topology: RectifierTopology;
  /** Open-circuit secondary RMS at the applied mains (V), per half for centre-tap: sets the turns ratio. */
  secondaryVrms: number;
  /** The winding's own resistance (Ω), per half for centre-tap; the primary's share is in primaryOhm. */
  ownOhm: number;
  /** The winding's own leakage inductance (H), per half for centre-tap; the primary's share is in primaryH. */
  ownH?: number;
  diodeDropV: number;
  diodeResistanceOhm: number;
  capacitanceF: number;
  esrOhm: number;
  /** Constant load current (A). */
  loadA: number;
  bleederOhm?: number | null;
}

export interface JointInput {
  /** Applied mains RMS (V), the primary resistance (Ω) and primary leakage inductance (H, default 0). */
  primaryVrms: number;
  primaryOhm: number;
  primaryH?: number;
  frequencyHz: number;
  windings: JointWinding[];
  /** Steps per mains cycle (default 1000) and the cap on simulated cycles (default 200). */
  stepsPerCycle?: number;
  maxCycles?: number;
}

export interface JointRail {
  /** Rail terminal (reservoir plus ESR) over the steady-state cycle: lowest, mean, highest (V). */
  troughV: number;
  dcMeanV: number;
  peakV: number;
  /** Highest winding current (A) and its RMS (A) over the cycle, rectified frame. */
  peakA: number;
  rmsA: number;
}

export interface JointResult {
  converged: boolean;
  cycles: number;
  /** True when a conduction pulse was still running at a mains zero crossing (the rectified frame then errs). */
  overlap: boolean;
  rails: JointRail[];
}

interface W {
  k: number;
  n: number;
  vf: number;
  r: number;
  l: number;
  esr: number;
  c: number;
  i0: number;
  g: number;
  halfWave: boolean;
  noLoadV: number;
}

interface Circuit {
  ws: W[];
  rp: number;
  lp: number;
  h: number;
  steps: number;
  vpk: number;
  /** sin(2 pi n / steps), n = 0..steps */
  sin: Float64Array;
  /** Per winding, fixed for the circuit (step()'s terms, each computed as step() wrote it): k, q, h/C/q,
   *  (h/C) I0, L/h, D = L/h + R + h/C/q, k²/D, n Vf - ESR I0, k ρ; whether it is half-wave; ESR, I0 and g. */
  k: Float64Array;
  q: Float64Array;
  beta: Float64Array;
  hcI0: Float64Array;
  lh: Float64Array;
  d: Float64Array;
  k2d: Float64Array;
  drop: Float64Array;
  krho: Float64Array;
  half: Uint8Array;
  esr: Float64Array;
  i0: Float64Array;
  g: Float64Array;
  rho: number;
  lph: number;
}

interface Work {
  v: Float64Array;
  j: Float64Array;
  a: Float64Array;
  c: Float64Array;
  on: Uint8Array;
  /** each conducting winding's new current in the last pass of a step (A) */
  jn: Float64Array;
}

interface Stats {
  lo: Float64Array;
  hi: Float64Array;
  sum: Float64Array;
  pk: Float64Array;
  sq: Float64Array;
  overlap: boolean;
}

/**
 * One mains cycle from reservoir voltages v0 (currents start at 0: the cycle starts at a zero crossing).
 * Each step n is one backward-Euler step to the source's emf at the step end, vs = V_pk sin(2π n / steps). Per
 * winding in the conducting set S:
 * L_i (j' - j)/h = k_i (|V_s| - R_p X' - L_p (X' - X)/h) - R_i j' - n Vf + ESR I0 - v', X = Σ_S k_i j_i, and
 * C (v' - v)/h = j' - I0 - g v', so v' = a_i + β_i j'. Then j_i' = (c_i - k_i ρ X')/D_i with ρ = R_p + L_p/h,
 * D_i = L_i/h + R_i + β_i, and X' = B / (1 + ρ A), A = Σ k_i²/D_i, B = Σ k_i c_i / D_i (Kirchhoff on the ideal
 * transformer); a winding whose current comes out negative is dropped from S (its diodes block) and the rest solved
 * again. The terms fixed by the circuit are precomputed in circuitOf (same operations, same order); the step is
 * written inside the cycle's loop (as a function it was not inlined, and its call cost more than its arithmetic).
 */
function cycle(cir: Circuit, v0: Float64Array, wk: Work, st?: Stats): Float64Array {
  const m = cir.ws.length;
  const { k, q, hcI0, lh, d, k2d, drop, krho, half, beta, esr, i0, g, sin } = cir;
  const { v, j, a, c, on, jn } = wk;
  const rho = cir.rho;
  const lph = cir.lph;
  const vpk = cir.vpk;
  const steps = cir.steps;
  v.set(v0);
  j.fill(0);
  let x = 0;
  const halfCycle = steps / 2;
  for (let n = 1; n <= steps; n++) {
    const vs = vpk * sin[n];
    const mag = Math.abs(vs);
    const emf = mag + lph * x;
    const positive = vs > 0;
    for (let i = 0; i < m; i++) {
      a[i] = (v[i] - hcI0[i]) / q[i];
      c[i] = k[i] * emf - drop[i] - a[i] + lh[i] * j[i];
      on[i] = (positive || !half[i]) && c[i] > 0 ? 1 : 0;
    }
    let xNew = 0;
    for (let pass = 0; pass <= m; pass++) {
      let sa = 0;
      let sb = 0;
      for (let i = 0; i < m; i++) {
        if (!on[i]) continue;
        sa += k2d[i];
        sb += (k[i] * c[i]) / d[i];
      }
      xNew = sb / (1 + rho * sa);
      let worst = -1;
      let worstJ = 0;
      for (let i = 0; i < m; i++) {
        if (!on[i]) continue;
        jn[i] = (c[i] - krho[i] * xNew) / d[i];
        if (jn[i] < worstJ) {
          worst = i;
          worstJ = jn[i];
        }
      }
      if (worst < 0) break;
      on[worst] = 0;
    }
    // a winding still conducting was conducting in the last pass, whose X' this is: its current is that pass's
    for (let i = 0; i < m; i++) {
      const ji = on[i] ? jn[i] : 0;
      j[i] = ji;
      v[i] = Math.max(0, a[i] + beta[i] * ji);
    }
    x = xNew;
    if (n === halfCycle || n === steps) {
      // a pulse still running at the zero crossing: cut (the frame is rectified), and said
      for (let i = 0; i < m; i++) if (j[i] > 1e-9 && st) st.overlap = true;
      j.fill(0);
      x = 0;
    }
    if (st) {
      for (let i = 0; i < m; i++) {
        // the rail terminal: reservoir plus ESR x capacitor current
        const u = v[i] + esr[i] * (j[i] - i0[i] - g[i] * v[i]);
        if (u < st.lo[i]) st.lo[i] = u;
        if (u > st.hi[i]) st.hi[i] = u;
        st.sum[i] += u;
        if (j[i] > st.pk[i]) st.pk[i] = j[i];
        st.sq[i] += j[i] * j[i];
      }
    }
  }
  return v.slice();
}

/** Solve M y = r in place (Gaussian elimination with partial pivoting, m small); false when singular. */
function solve(mat: number[][], r: number[]): boolean {
  const m = r.length;
  for (let col = 0; col < m; col++) {
    let p = col;
    for (let row = col + 1; row < m; row++) if (Math.abs(mat[row][col]) > Math.abs(mat[p][col])) p = row;
    if (!(Math.abs(mat[p][col]) > 1e-14)) return false;
    [mat[col], mat[p]] = [mat[p], mat[col]];
    [r[col], r[p]] = [r[p], r[col]];
    for (let row = col + 1; row < m; row++) {
      const f = mat[row][col] / mat[col][col];
      for (let k = col; k < m; k++) mat[row][k] -= f * mat[col][k];
      r[row] -= f * r[col];
    }
  }
  for (let row = m - 1; row >= 0; row--) {
    let s = r[row];
    for (let k = row + 1; k < m; k++) s -= mat[row][k] * r[k];
    r[row] = s / mat[row][row];
  }
  return true;
}

const SINES = new Map<number, Float64Array>();
function sineTable(steps: number): Float64Array {
  let t = SINES.get(steps);
  if (!t) {
    t = Float64Array.from({ length: steps + 1 }, (_, n) => Math.sin((2 * Math.PI * n) / steps));
    if (SINES.size > 8) SINES.clear();
    SINES.set(steps, t);
  }
  return t;
}

function circuitOf(input: JointInput): Circuit {
  const steps = Math.max(100, Math.min(20000, 2 * Math.round((input.stepsPerCycle ?? 1000) / 2)));
  const vpk = Math.SQRT2 * input.primaryVrms;
  const ws: W[] = input.windings.map((w) => {
    const n = diodesInPath(w.topology);
    const k = w.secondaryVrms / input.primaryVrms;
    return {
      k, n, vf: w.diodeDropV, esr: Math.max(0, w.esrOhm), c: w.capacitanceF, l: Math.max(0, w.ownH ?? 0),
      r: Math.max(1e-6, w.ownOhm + n * w.diodeResistanceOhm + Math.max(0, w.esrOhm)), i0: Math.max(0, w.loadA),
      g: w.bleederOhm && w.bleederOhm > 0 ? 1 / w.bleederOhm : 0, halfWave: w.topology === 'half-wave',
      noLoadV: Math.max(0, k * vpk - n * w.diodeDropV),
    };
  });
  const h = 1 / input.frequencyHz / steps;
  const rp = Math.max(0, input.primaryOhm);
  const lp = Math.max(0, input.primaryH ?? 0);
  const rho = rp + lp / h;
  const of = (f: (w: W) => number) => Float64Array.from(ws, f);
  const q = of((w) => 1 + (h * w.g) / w.c);
  const beta = of((w) => h / w.c / (1 + (h * w.g) / w.c));
  const d = of((w) => w.l / h + w.r + h / w.c / (1 + (h * w.g) / w.c));
  return {
    ws, rp, lp, h, steps, vpk, sin: sineTable(steps),
    k: of((w) => w.k), q, beta, hcI0: of((w) => (h / w.c) * w.i0), lh: of((w) => w.l / h), d,
    k2d: Float64Array.from(ws, (w, i) => (w.k * w.k) / d[i]), drop: of((w) => w.n * w.vf - w.esr * w.i0),
    krho: of((w) => w.k * rho), half: Uint8Array.from(ws, (w) => (w.halfWave ? 1 : 0)), esr: of((w) => w.esr),
    i0: of((w) => w.i0), g: of((w) => w.g), rho, lph: lp / h,
  };
}

const key = (input: JointInput, withLoads: boolean) => JSON.stringify([
  input.primaryVrms, input.primaryOhm, input.primaryH ?? 0, input.frequencyHz, input.stepsPerCycle ?? null,
  input.maxCycles ?? null, input.windings.map((w) => [w.topology, w.secondaryVrms, w.ownOhm, w.ownH ?? 0, w.diodeDropV,
    w.diodeResistanceOhm, w.capacitanceF, w.esrOhm, w.bleederOhm ?? null, withLoads ? w.loadA : null]),
]);

/**
 * The steady state of the joint circuit. Inside withSimulationMemo a repeated input is a look-up, and a circuit
 * seen before at other loads starts its search from that converged state. `searchKey` names a search over
 * candidate circuits (a winding voltage bisection): a candidate with no state of its own starts from the last
 * converged candidate of the same search, scaled to its no-load peaks; the search still stops on the same tolerance.
 */
export function simulateSharedPrimary(input: JointInput, options: { searchKey?: string } = {}): JointResult {
  const memo = simulationScope<JointResult>('joint');
  const warm = simulationScope<Warm>('joint-warm');
  const exact = memo ? key(input, true) : '';
  const held = memo?.get(exact);
  if (held) return held;
  const circuitKey = warm ? key(input, false) : '';
  // the same transformer at another mains voltage (another corner): its state scaled to this one's no-load peaks
  const family = { ...input, primaryVrms: 0, windings: input.windings.map((w) => ({ ...w, secondaryVrms: 0 })) };
  const familyKey = warm ? key(family, false) : '';
  const searchKey = warm && options.searchKey !== undefined ? `search\u0000${options.searchKey}` : null;
  const loads = Float64Array.from(input.windings, (w) => w.loadA);
  const own = warm?.get(circuitKey);
  const start = (own && alongLoads(own, loads)) ?? warm?.get(familyKey)
    ?? (searchKey !== null ? warm?.get(searchKey) : undefined);
  const result = simulateUncached(input, start, (w) => {
    // the state before, kept one deep: two states of one circuit give the line a third load starts on
    const kept: Warm = { ...w, loads, prev: own ? { ...own, prev: undefined } : undefined };
    warm?.set(circuitKey, kept);
    warm?.set(familyKey, kept);
    if (searchKey !== null) warm?.set(searchKey, kept);
  });
  memo?.set(exact, result);
  return result;
}

/** A converged cycle-start state and the Jacobian of F there (its rows), for a warm start of the same circuit. */
interface Warm {
  x: Float64Array;
  jac: number[][];
  /** The no-load peaks it was found at (V), to scale it to another mains voltage. */
  top: Float64Array;
  /** The winding loads it was found at (A) and the same circuit's state before it, if any. */
  loads?: Float64Array;
  prev?: Warm;
}

/**
 * A start for `loads` from the circuit's last two states: the line through them, at the projection of the new loads
 * on the step between theirs (the fixed-point passes move the PA's load a little each time; the reservoirs' voltages
 * follow it almost linearly). The last state when there is no line. A start only: the search stops on its tolerance.
 */
function alongLoads(last: Warm, loads: Float64Array): Warm {
  const before = last.prev;
  if (!before?.loads || !last.loads || before.x.length !== last.x.length) return last;
  if (last.loads.length !== loads.length || before.loads.length !== loads.length) return last;
  let dd = 0;
  let dn = 0;
  for (let i = 0; i < loads.length; i++) {
    const step = last.loads[i] - before.loads[i];
    dd += step * step;
    dn += (loads[i] - last.loads[i]) * step;
  }
  const t = dn / dd;
  if (!(dd > 0) || !Number.isFinite(t)) return last;
  const x = Float64Array.from(last.x, (v, i) => Math.min(last.top[i], Math.max(0, v + t * (v - before.x[i]))));
  return { ...last, x };
}

const freshStats = (m: number): Stats => ({
  lo: new Float64Array(m).fill(Infinity), hi: new Float64Array(m).fill(-Infinity), sum: new Float64Array(m),
  pk: new Float64Array(m), sq: new Float64Array(m), overlap: false,
});

function simulateUncached(input: JointInput, start?: Warm, onSteady?: (w: Warm) => void): JointResult {
  const cir = circuitOf(input);
  const m = cir.ws.length;
  const maxCycles = input.maxCycles ?? 200;
  const wk: Work = {
    v: new Float64Array(m), j: new Float64Array(m), a: new Float64Array(m), c: new Float64Array(m),
    on: new Uint8Array(m), jn: new Float64Array(m),
  };
  const top = Float64Array.from(cir.ws.map((w) => w.noLoadV));
  const tol = 1e-5 * Math.max(1, ...top);
  const warmOk = start && start.x.length === m;
  let x: Float64Array = warmOk
    ? Float64Array.from(start.x, (v, i) => (start.top[i] > 0 ? Math.min(top[i], (v * top[i]) / start.top[i]) : v))
    : Float64Array.from(top, (v) => 0.95 * v);
  // the Jacobian carried from the warm start, updated by Broyden's rank-one rule and recomputed by finite differences
  // when a step with it fails to shrink the residual
  let jac: number[][] | null = warmOk ? start.jac.map((r) => [...r]) : null;
  let cycles = 0;
  let converged = false;
  let st = freshStats(m);
  let prev: { x: Float64Array; f: number[]; norm: number } | null = null;
  // Source: shooting method for periodic steady states (Aprille & Trick, Proc. IEEE 60(1), 1972; from memory):
  // Newton on F(x) = P(x) - x, P the one-cycle map; Jacobian by finite differences, kept between steps with
  // Broyden's update (Broyden, Math. Comp. 19, 1965; from memory). The statistics are those of the last cycle, run
  // from the converged start.
  while (cycles < maxCycles) {
    st = freshStats(m);
    const p = cycle(cir, x, wk, st);
    cycles++;
    const f = Array.from(p, (v, i) => v - x[i]);
    const norm = Math.max(...f.map(Math.abs));
    if (norm < tol) {
      converged = true;
      break;
    }
    if (jac && prev) {
      if (norm < prev.norm) {
        // Broyden: J += (ΔF - J Δx) Δxᵀ / (Δxᵀ Δx)
        const dx = Array.from(x, (v, i) => v - prev!.x[i]);
        const dd = dx.reduce((a, v) => a + v * v, 0);
        if (dd > 0) {
          for (let r = 0; r < m; r++) {
            const jdx = jac[r].reduce((a, v, c) => a + v * dx[c], 0);
            const k = (f[r] - prev.f[r] - jdx) / dd;
            for (let c = 0; c < m; c++) jac[r][c] += k * dx[c];
          }
        }
      } else {
        jac = null;
      }
    }
    if (!jac) {
      jac = [];
      for (let i = 0; i < m; i++) jac.push(new Array<number>(m).fill(0));
      const delta = 1e-4 * Math.max(1, ...top);
      for (let col = 0; col < m && cycles < maxCycles; col++) {
        const xp = Float64Array.from(x);
        xp[col] += delta;
        const pp = cycle(cir, xp, wk);
        cycles++;
        for (let row = 0; row < m; row++) jac[row][col] = (pp[row] - p[row]) / delta - (row === col ? 1 : 0);
      }
    }
    prev = { x, f, norm };
    const rhs = f.map((v) => -v);
    const next = solve(jac.map((r) => [...r]), rhs)
      ? Float64Array.from(x, (v, i) => Math.min(top[i], Math.max(0, v + rhs[i]))) : p;
    x = next.every((v) => Number.isFinite(v)) ? next : p;
  }
  if (converged && jac) onSteady?.({ x, jac, top });
  return {
    converged, cycles, overlap: st.overlap,
    rails: cir.ws.map((_, i) => ({
      troughV: st.lo[i], peakV: st.hi[i], dcMeanV: st.sum[i] / cir.steps, peakA: st.pk[i],
      rmsA: Math.sqrt(st.sq[i] / cir.steps),
    })),
  };
}
