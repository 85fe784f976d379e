// Steady-state time-domain simulation of a single-ended class-E stage, normalised (ω = 1 rad/s, R = 1 Ω, Vdd = 1 V).
// Circuit: supply through an RF choke to the drain; switch with Rds(on) (and its body diode when the drain goes
// negative) across the shunt capacitance C1 (device output capacitance included); series L0–C0 tuned network with
// the design's excess reactance; load R + jX (the point on the SWR circle referred to the drain). The circuit is
// linear between switch events, so each step is advanced exactly with the matrix exponential of its piece (as the
// rectifier simulation advances its linear pieces exactly); the run stops when one cycle repeats the last.
// The design follows the nominal class-E values for 50 % duty and a high loaded Q (Sokal and Sokal, IEEE JSSC
// SC-10(3), 1975): C1 = 0.1836/(ωR), excess series reactance 1.1525 R (from memory, not confirmed).
// The run starts from the cycle's periodic state (class-e-shooting.ts) and runs cycles from there to its stopping
// rule.
import { periodicStateFor, piecesOf } from './class-e-shooting';

/** Loaded Q of the series network; RF choke reactance / R. Common practice, no published source. */
export const CLASS_E_QL = 30;
/** Lowest loaded Q of a series network built for class E at HF: the worst end of the harmonic band (common practice,
 * no published source). */
export const CLASS_E_QL_LOW = 5;
export const CHOKE_REACTANCE_RATIO = 100;
/** Nominal class-E shunt susceptance ωC1R and excess reactance X/R at 50 % duty (Sokal 1975, from memory). */
export const CLASS_E_SHUNT = 0.1836;
export const CLASS_E_EXCESS = 1.1525;

const STEPS = 500;
const MAX_CYCLES = 1500;

export interface ClassEResult {
  /** Peak drain voltage / Vdd. */
  drainPeakRatio: number;
  /** Peak switch current / (Vdd / R). */
  switchPeakRatio: number;
  /** Output power / (Vdd² / R). */
  outputRatio: number;
  /** DC input power / (Vdd² / R). */
  dcInputRatio: number;
  /** Drain voltage / Vdd at the instant the switch turns on (0 = zero-voltage switching). */
  turnOnRatio: number;
  /** Cycles run until the waveform repeated, with those of the periodic start's tries. */
  cycles: number;
  /**
   * Load current's harmonics relative to its fundamental, |I_n| / |I_1| for n = 1..HARMONICS (index n − 1; the load
   * is resistive, so these are also the output voltage's): the stage's harmonic spectrum at its load.
   */
  loadHarmonics: number[];
}

/** Harmonics of the load current computed (1 = fundamental). */
export const HARMONICS = 5;

/** 5 × 5 matrices, flat and row-major. */
const N = 5;

/** c = a · b (c apart from a and b); each entry summed over k in order from 0, as a row-by-row product. */
function mulInto(c: Float64Array, a: Float64Array, b: Float64Array): void {
  for (let i = 0; i < N; i++) {
    for (let j = 0; j < N; j++) {
      let s = 0;
      for (let k = 0; k < N; k++) s += a[i * N + k] * b[k * N + j];
      c[i * N + j] = s;
    }
  }
}

/** Matrix exponential by scaling and squaring with a Taylor series (Moler, Van Loan, SIAM Review 1978, method 3). */
function expm(a: Float64Array): Float64Array {
  let norm = -Infinity;
  for (let i = 0; i < N; i++) {
    let r = 0;
    for (let j = 0; j < N; j++) r += Math.abs(a[i * N + j]);
    norm = Math.max(norm, r);
  }
  const s = Math.max(0, Math.ceil(Math.log2(norm / 0.25)));
  const scale = 2 ** s;
  const scaled = a.map((x) => x / scale);
  let term = new Float64Array(N * N);
  let next = new Float64Array(N * N);
  for (let i = 0; i < N; i++) term[i * N + i] = 1;
  let sum = Float64Array.from(term);
  for (let k = 1; k <= 14; k++) {
    mulInto(next, term, scaled);
    [term, next] = [next, term];
    for (let i = 0; i < N * N; i++) {
      term[i] = term[i] / k;
      sum[i] = sum[i] + term[i];
    }
  }
  for (let i = 0; i < s; i++) {
    mulInto(next, sum, sum);
    [sum, next] = [next, sum];
  }
  return sum;
}

/**
 * One class-E stage into the normalised load zRe + j zIm (1 + j0 = design load). rdsOnRatio = Rds(on) / R
 * (at least 1e-3: an ideal switch has no finite step).
 */
export function simulateClassE(
  zRe: number,
  zIm: number,
  rdsOnRatio: number,
  duty = 0.5,
  loadedQ = CLASS_E_QL,
): ClassEResult {
  // The same inputs give the same result: remembered (bounded) so repeated evaluations of a project cost a look-up
  const key = `${zRe}|${zIm}|${rdsOnRatio}|${duty}|${loadedQ}`;
  const hit = memo.get(key);
  if (hit) return hit;
  const r = run(zRe, zIm, rdsOnRatio, duty, loadedQ, 'periodic', STOP_RATIO);
  if (memo.size >= MEMO_MAX) memo.delete(memo.keys().next().value as string);
  memo.set(key, r);
  return r;
}

const MEMO_MAX = 2000;

// Source: Fourier series by the rectangle rule over one period (a_n = (2/N) Σ x cos nωt, b_n likewise); the tables
// once for all runs, flat (harmonic h at h * STEPS + k), sample k at the end of step k
const trig = (fn: (x: number) => number) => Float64Array.from({ length: HARMONICS * STEPS },
  (_, i) => fn((Math.floor(i / STEPS) + 1) * ((i % STEPS) + 1) * ((2 * Math.PI) / STEPS)));
const COS_T = trig(Math.cos);
const SIN_T = trig(Math.sin);
const memo = new Map<string, ClassEResult>();

/**
 * How the simulation starts: 'cold' from the supply switched on into an empty circuit (drain at Vdd), 'periodic'
 * from the cycle's fixed point (class-e-shooting.ts); both then run to the same stopping rule, the peak drain voltage
 * moving by less than STOP_RATIO of itself from one cycle to the next, after at least MIN_COLD_CYCLES from a cold
 * start (its switch-on transient) or from a periodic start whose pattern did not settle.
 */
export type ClassEStart = 'cold' | 'periodic';

/** Rounds of the periodic start before it gives up and starts from where it got. */
const SHOOTING_TRIES = 8;
export const STOP_RATIO = 1e-6;
const MIN_COLD_CYCLES = 20;

/** One simulation without the memo (for tests comparing starts); simulateClassE starts 'periodic'. */
export function runClassE(
  zRe: number, zIm: number, rdsOnRatio: number, duty: number, ql: number, start: ClassEStart, stopRatio = STOP_RATIO,
): ClassEResult {
  return run(zRe, zIm, rdsOnRatio, duty, ql, start, stopRatio);
}

function run(
  zRe: number, zIm: number, rdsOnRatio: number, duty: number, ql: number, start: ClassEStart, stopRatio: number,
): ClassEResult {
  const rds = Math.max(1e-3, rdsOnRatio);
  const c1 = CLASS_E_SHUNT;
  const lCh = CHOKE_REACTANCE_RATIO;
  // Series network: L0 = QL R/ω, C0 from 1/(ωC0) = (QL − X_excess) R; the load's reactance joins it
  const l = ql + Math.max(zIm, 0);
  const invC = ql - CLASS_E_EXCESS + Math.max(-zIm, 0);
  const rl = zRe;
  const dt = (2 * Math.PI) / STEPS;
  // state x = [v_drain, i_series, v_C0, i_choke, 1] (the constant 1 carries the supply)
  const piece = (g: number): Float64Array => expm(Float64Array.from([
    -g / c1, -1 / c1, 0, 1 / c1, 0,
    1 / l, -rl / l, -1 / l, 0, 0,
    0, invC, 0, 0, 0,
    -1 / lCh, 0, 0, 0, 1 / lCh,
    0, 0, 0, 0, 0,
  ], (x) => x * dt));
  // the two pieces as flat row-major arrays. The last state (the constant 1) stays 1 exactly: the pieces' last row is
  // [0 0 0 0 1] (the Taylor terms of a zero row are zero), so only the first four rows are stepped, in the order of a
  // row-by-row dot product (p[o + 4] * 1 is p[o + 4] exactly): the results are those of the plain matrix product
  const on = piece(1 / rds);
  const off = piece(0);
  const x = Float64Array.from([1, 0, 0, 0, 1]);
  const onSteps = duty * STEPS;
  // one cycle from x (advanced in place), returning its peak drain voltage; with `stats` also the cycle's figures
  const cycle = (stats: ClassEResult | null, pattern: Uint8Array | null = null): number => {
    let x0 = x[0], x1 = x[1], x2 = x[2], x3 = x[3];
    let vPk = -Infinity, iPk = 0, pOut = 0, iDc = 0;
    const a = new Array<number>(HARMONICS).fill(0);
    const b = new Array<number>(HARMONICS).fill(0);
    for (let k = 0; k < STEPS; k++) {
      // switch on for the first `duty` of the cycle; the body diode conducts whenever the drain goes below 0
      const conducting = k < onSteps || x0 < 0;
      if (pattern) pattern[k] = conducting ? 1 : 0;
      // the shunt capacitor's discharge at a hard turn-on (5 Rds C1) is left out of the peak: wiring inductance,
      // not Rds(on) alone, limits that spike; its energy stays in the dissipation
      if (stats && conducting && k * dt > 5 * rds * c1) iPk = Math.max(iPk, Math.abs(x0 / rds));
      const p = conducting ? on : off;
      const n0 = 0 + p[0] * x0 + p[1] * x1 + p[2] * x2 + p[3] * x3 + p[4];
      const n1 = 0 + p[5] * x0 + p[6] * x1 + p[7] * x2 + p[8] * x3 + p[9];
      const n2 = 0 + p[10] * x0 + p[11] * x1 + p[12] * x2 + p[13] * x3 + p[14];
      const n3 = 0 + p[15] * x0 + p[16] * x1 + p[17] * x2 + p[18] * x3 + p[19];
      x0 = n0; x1 = n1; x2 = n2; x3 = n3;
      vPk = Math.max(vPk, x0);
      if (stats) {
        pOut += rl * x1 * x1;
        iDc += x3;
        for (let h = 0; h < HARMONICS; h++) {
          a[h] += x1 * COS_T[h * STEPS + k];
          b[h] += x1 * SIN_T[h * STEPS + k];
        }
      }
    }
    if (stats) {
      const mag = a.map((ah, h) => Math.hypot(ah, b[h]));
      Object.assign(stats, {
        drainPeakRatio: vPk, switchPeakRatio: iPk, outputRatio: pOut / STEPS, dcInputRatio: iDc / STEPS,
        loadHarmonics: mag.map((m) => m / mag[0]),
      });
    }
    x[0] = x0; x[1] = x1; x[2] = x2; x[3] = x3;
    return vPk;
  };
  const res: ClassEResult = {
    drainPeakRatio: 0,
    switchPeakRatio: 0,
    outputRatio: 0,
    dcInputRatio: 0,
    turnOnRatio: 0,
    cycles: 0,
    loadHarmonics: [],
  };
  // Start at the periodic state: the cycle's fixed point for a switching pattern (class-e-shooting.ts), first the
  // nominal one (on for the duty, no body diode), then the one seen in a cycle from that fixed point, until the
  // pattern repeats (the body diode's steps depend on the state). The cycle that confirms it is the run's first;
  // its peak is returned (null: no settled pattern, x left at the last fixed point tried or at the cold start).
  let tries = 0;
  const periodicStart = (): number | null => {
    const seen = Uint8Array.from({ length: STEPS }, (_, k) => (k < onSteps ? 1 : 0));
    const next = new Uint8Array(STEPS);
    const last = Float64Array.from(x);
    const pieces = piecesOf(on, off);
    for (; tries < SHOOTING_TRIES; tries++) {
      const y = periodicStateFor(pieces, seen);
      if (!y) break;
      x.set(y);
      last.set(y);
      const peak = cycle(null, next);
      let same = true;
      for (let k = 0; k < STEPS && same; k++) same = next[k] === seen[k];
      if (same) return peak;
      seen.set(next);
    }
    x.set(last);
    return null;
  };
  const startPeak = start === 'periodic' ? periodicStart() : null;
  // from a settled periodic start any cycle may be the last, so each runs with its figures; otherwise each cycle runs
  // for its peak alone and the last one again from its saved start with its figures (the same arithmetic from the
  // same state, so the same numbers)
  const inline = startPeak !== null;
  const minCycles = inline ? 1 : MIN_COLD_CYCLES;
  const saved = new Float64Array(5);
  let prevPeak = startPeak ?? Number.NaN;
  for (let cyc = inline ? 2 : 1; cyc <= MAX_CYCLES; cyc++) {
    saved.set(x);
    const vPk = cycle(inline ? res : null);
    if ((cyc > minCycles && Math.abs(vPk - prevPeak) < stopRatio * Math.abs(vPk)) || cyc === MAX_CYCLES) {
      res.turnOnRatio = saved[0];
      // every cycle run counts: the periodic start's unsettled tries, and the rest (the confirming one first)
      res.cycles = cyc + tries;
      if (!inline) {
        x.set(saved);
        cycle(res);
      }
      break;
    }
    prevPeak = vPk;
  }
  return res;
}
