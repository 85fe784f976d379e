// Steady-state time-domain simulation of a capacitor-input rectifier (bridge, full-wave centre-tap,
// half-wave). Pure and bounded: the only state is the reservoir voltage, so the periodic steady state
// is the fixed point of the one-cycle map P(v0) -> v(T); it is found by shooting: Newton's method on
// F(v0) = P(v0) - v0, with P'(v0) carried exactly through the cycle beside v (each step's solution is affine in its
// start voltage), safeguarded by the bracket [0, no-load peak] (never more than maxCycles). It converges in 2-4 cycles.
// Inside one evaluation (withSimulationMemo) results are memoised on the exact inputs, so a fixed-point pass that
// asks again for a rail whose load did not change costs a look-up; the memo only returns what the same inputs give.
//
// Circuit (per conducting path): sinusoidal EMF behind the winding resistance Rw, n diodes in series
// (each Vf + r_d, piecewise linear), reservoir C with series ESR, load = constant current I0 (regulated
// loads) or a resistance, plus an optional bleeder. Leakage inductance is not modelled (it lowers peak
// currents; ref §4.2 says the same). Integration: fixed step, exact exponential solution of each linear
// piece with the EMF linear across the step. Element model as in the reference values §4.2 script check;
// verified against its table and against ngspice (test/core/power).

import type { RectifierTopology } from '../model';
import { quotient, usablePositive } from '../numeric';

export type SimLoad = { kind: 'current'; currentA: number } | { kind: 'resistance'; resistanceOhm: number };

export interface RectifierSimInput {
  topology: RectifierTopology;
  /** Open-circuit secondary RMS voltage actually applied (V): V_NL x mains factor; per half for centre-tap. */
  secondaryVrms: number;
  /** Winding resistance referred to the secondary (Ω), per half for centre-tap. */
  windingResistanceOhm: number;
  /** Mains frequency (Hz). */
  frequencyHz: number;
  /** Forward drop of one diode (V). */
  diodeDropV: number;
  /** Incremental resistance of one diode (Ω). */
  diodeResistanceOhm: number;
  /** Reservoir capacitance (F). */
  capacitanceF: number;
  /** Reservoir equivalent series resistance (Ω). */
  esrOhm: number;
  load: SimLoad;
  /** Bleeder across the reservoir (Ω), null/undefined = none. */
  bleederOhm?: number | null;
  /** Integration steps per mains cycle (default 1000). */
  stepsPerCycle?: number;
  /** Convergence: cycle-to-cycle change of the reservoir voltage (V); default 1e-5 of the peak. */
  toleranceV?: number;
  /** Hard cap on simulated cycles (default 200). */
  maxCycles?: number;
  /** Waveform points over the two recorded cycles (default 160; 0 = no waveform, one cycle fewer). */
  waveformPoints?: number;
}

export interface RectifierWaveform {
  /** Time from the start of the recorded window (s). */
  timeS: number[];
  /** Rail (reservoir terminal) voltage (V). */
  outputV: number[];
  /** Winding current (A), signed: positive in the first half-cycle (half A for centre-tap). */
  windingA: number[];
}

export interface RectifierSimResult {
  /** True when the cycle-to-cycle change fell below the tolerance within maxCycles. */
  converged: boolean;
  /** Mains cycles simulated (s/s, count). */
  cycles: number;
  /** Mean rail voltage over a steady-state cycle (V). */
  dcMeanV: number;
  /** Ripple peak-to-peak (V). */
  ripplePpV: number;
  /** Lowest rail voltage in the cycle (V). */
  troughV: number;
  /** Highest rail voltage in the cycle (V). */
  peakV: number;
  /** Peak rail voltage with no load (V): EMF peak minus diode drops. */
  noLoadPeakV: number;
  /** Mean load current actually drawn (A). */
  loadMeanA: number;
  /** RMS current in the secondary winding (A); per half for centre-tap. */
  secondaryRmsA: number;
  /** Repetitive peak current of one diode (A). */
  diodePeakA: number;
  /** RMS ripple current in the reservoir capacitor (A). */
  capacitorRippleRmsA: number;
  /** Fraction of the mains cycle in which any diode conducts (0..1). */
  conductionFraction: number;
  /** Switch-on surge estimate, first peak into a discharged reservoir (A). */
  surgeA: number;
  /** True when a constant-current load pulled the reservoir to 0 V (supply collapses). */
  collapsed: boolean;
  waveform: RectifierWaveform;
  /** Plain-words note on convergence or invalid input, null when fine. */
  note: string | null;
}

interface Circuit {
  diodes: number;
  /** Total diode drop in the conducting path (V). */
  dropV: number;
  peakEmfV: number;
  rt: number;
  esr: number;
  c: number;
  g: number;
  i0: number;
  omega: number;
  topology: RectifierTopology;
}

interface CycleStats {
  sumV: number;
  minV: number;
  maxV: number;
  sumId2A: number;
  sumIdB2: number;
  maxId: number;
  sumIc2: number;
  sumIc: number;
  sumLoad: number;
  conducting: number;
  collapsed: boolean;
}

const finite = (x: number, fallback = 0): number => (Number.isFinite(x) ? x : fallback);

/**
 * Exact solution of C dv/dt = A(s) - B v over one step of length h, with A linear in s (slope a1):
 * v(h) = p0 + (a1/B) h + (v - p0) e^(-B h / C), p0 = (a0 - C a1/B)/B. `decay` = e^(-B h / C), precomputed; `small`
 * (B h < 1e-9 C, fixed per circuit) takes the first-order step instead. Both are computed and one is chosen, with no
 * branch: a branch one circuit never takes left the optimised loop boxing every step's voltage (about 17 bytes of
 * garbage a step, measured), and the result is the same either way.
 */
function advance(
  v: number, a0: number, a1: number, b: number, c: number, h: number, decay: number, small: boolean,
): number {
  const firstOrder = v + (a0 * h + 0.5 * a1 * h * h - b * v * h) / c;
  const slope = a1 / b;
  const p0 = (a0 - c * slope) / b;
  const exact = p0 + slope * h + (v - p0) * decay;
  return small ? firstOrder : exact;
}

const SIN_TABLES = new Map<number, Float64Array>();
/** sin(2 pi n / steps) for n = 0..steps, computed once per step count (bounded); read-only for callers. */
export function sinTable(steps: number): Float64Array {
  let t = SIN_TABLES.get(steps);
  if (!t) {
    t = new Float64Array(steps + 1);
    for (let n = 0; n <= steps; n++) t[n] = Math.sin((2 * Math.PI * n) / steps);
    if (SIN_TABLES.size > 16) SIN_TABLES.clear();
    SIN_TABLES.set(steps, t);
  }
  return t;
}

function emptyStats(): CycleStats {
  return {
    sumV: 0,
    minV: Infinity,
    maxV: -Infinity,
    sumId2A: 0,
    sumIdB2: 0,
    maxId: 0,
    sumIc2: 0,
    sumIc: 0,
    sumLoad: 0,
    conducting: 0,
    collapsed: false,
  };
}

/**
 * One mains cycle from reservoir voltage v0; returns the end voltage and statistics.
 * Capacitor current is piecewise linear in v_c: i_c = A - B v_c, one branch with the diodes
 * conducting and one blocking; the branch is chosen so that the diode current is >= 0 at the step end.
 */
/**
 * The rail voltage and signed winding current at each step of the last cycle run (index n = 1..steps), written on
 * every step of every cycle; the waveform is read from here. Written unconditionally: a recorder called only when
 * asked was a call in the loop that boxed three doubles a step. Simulations run one at a time, so one pair serves.
 */
let WAVE_V = new Float64Array(0);
let WAVE_I = new Float64Array(0);

function runCycle(cir: Circuit, v0: number, steps: number): { v: number; dvdv0: number; st: CycleStats } {
  const h = (2 * Math.PI) / cir.omega / steps;
  // the statistics in locals, not in an object's fields (a double stored in a field is boxed on every write)
  let { sumV, minV, maxV, sumId2A, sumIdB2, maxId, sumIc2, sumIc, sumLoad, conducting, collapsed } = emptyStats();
  const k = 1 + cir.esr * cir.g;
  const d = Math.max(cir.esr + cir.rt * k, 1e-9);
  const m = 1 + cir.g * cir.rt;
  const bCond = m / d;
  const bBlock = cir.g / k;
  const halfWave = cir.topology === 'half-wave';
  const sines = sinTable(steps);
  if (WAVE_V.length < steps + 1) {
    WAVE_V = new Float64Array(steps + 1);
    WAVE_I = new Float64Array(steps + 1);
  }
  const waveV = WAVE_V;
  const waveI = WAVE_I;
  const decayCond = Math.exp((-bCond * h) / cir.c);
  const decayBlock = Math.exp((-bBlock * h) / cir.c);
  const smallCond = bCond * h < 1e-9 * cir.c;
  const smallBlock = bBlock * h < 1e-9 * cir.c;
  // a constant-current load can pull the reservoir to 0 V (the clamp below); decided once, not in the rare branch
  const canCollapse = cir.i0 > 0;
  let v = v0;
  // d v / d v0 along the cycle: each step maps v affinely (slope = the branch's decay), a clamp at 0 has slope 0
  let dv = 1;
  const slopeCond = cir.c > 0 && bCond * h < 1e-9 * cir.c ? 1 - (bCond * h) / cir.c : decayCond;
  const slopeBlock = cir.c > 0 && bBlock * h < 1e-9 * cir.c ? 1 - (bBlock * h) / cir.c : decayBlock;
  let sPrev = 0;
  let ePrev = -cir.dropV;
  for (let n = 1; n <= steps; n++) {
    const s = cir.peakEmfV * sines[n];
    const e = (halfWave ? s : Math.abs(s)) - cir.dropV;
    const i0 = v > 0 ? cir.i0 : 0;
    // conducting branch
    const a0 = (m * (ePrev * k + cir.esr * i0)) / d - cir.g * ePrev - i0;
    const a1 = (m * (e * k + cir.esr * i0)) / d - cir.g * e - i0;
    let vNew = advance(v, a0, (a1 - a0) / h, bCond, cir.c, h, decayCond, smallCond);
    let id = (e * k - vNew + cir.esr * i0) / d;
    let slope = slopeCond;
    if (!(id >= 0)) {
      const aBlock = (cir.g * cir.esr * i0) / k - i0;
      vNew = advance(v, aBlock, 0, bBlock, cir.c, h, decayBlock, smallBlock);
      id = 0;
      slope = slopeBlock;
    }
    dv *= slope;
    if (vNew < 0) {
      vNew = 0;
      dv = 0;
      if (canCollapse) collapsed = true;
    }
    const vt = id > 0 ? e - cir.rt * id : (vNew - cir.esr * i0) / k;
    const iLoad = cir.g * vt + (vNew > 0 ? i0 : 0);
    const ic = id - iLoad;
    sumV += vt;
    if (vt < minV) minV = vt;
    if (vt > maxV) maxV = vt;
    // compared on every step: a comparison only reached at an exact zero of the sine (never, in practice) had no type
    // feedback, and the optimised loop then kept sPrev boxed, allocating on every step
    const prevNonNegative = sPrev >= 0;
    const firstHalf = s > 0 || (s === 0 && prevNonNegative);
    if (firstHalf) sumId2A += id * id;
    else sumIdB2 += id * id;
    if (id > maxId) maxId = id;
    sumIc2 += ic * ic;
    sumIc += ic;
    sumLoad += iLoad;
    if (id > 0) conducting++;
    waveV[n] = vt;
    waveI[n] = (firstHalf ? id : -id) + 0; // + 0 turns -0 into 0 for JSON
    v = vNew;
    sPrev = s;
    ePrev = e;
  }
  const st: CycleStats = { sumV, minV, maxV, sumId2A, sumIdB2, maxId, sumIc2, sumIc, sumLoad, conducting, collapsed };
  return { v, dvdv0: dv, st };
}

function invalid(note: string): RectifierSimResult {
  return {
    converged: false, cycles: 0, dcMeanV: 0, ripplePpV: 0, troughV: 0, peakV: 0, noLoadPeakV: 0, loadMeanA: 0,
    secondaryRmsA: 0, diodePeakA: 0, capacitorRippleRmsA: 0, conductionFraction: 0, surgeA: 0, collapsed: true,
    waveform: { timeS: [], outputV: [], windingA: [] }, note,
  };
}

export function diodesInPath(topology: RectifierTopology): number {
  return topology === 'bridge' ? 2 : 1;
}

/**
 * Switch-on surge into a discharged reservoir: EMF peak less diode drops over the total series resistance.
 * Source: Reference values §4.2 "switch-on surge" derivation (this project, [D]).
 */
export function switchOnSurgeA(
  peakEmfV: number,
  topology: RectifierTopology,
  diodeDropV: number,
  seriesOhm: number,
): number {
  const n = diodesInPath(topology);
  const r = Math.max(seriesOhm, 1e-3);
  return Math.max(0, finite((peakEmfV - n * diodeDropV) / r));
}

/**
 * Smallest usable inputs: the step solution divides by C and the loads by R, and a subnormal above 0 (5e-324 F) made
 * every result 0 with no note. Common practice, no published source: below these the circuit is not a mains rectifier.
 */
export const SIM_FLOORS = { frequencyHz: 1, capacitanceF: 1e-9, secondaryVrms: 1e-3, resistanceOhm: 1e-3 } as const;

/** Memo of results by exact input, live only inside withSimulationMemo (one evaluation); bounded. */
let MEMO: Map<string, RectifierSimResult> | null = null;
const MEMO_MAX = 4096;
/**
 * Warm starts, live with the memo: the converged cycle-start voltages of the same circuit (every input but the load)
 * at the loads simulated so far. The fixed-point passes ask again for a rail whose load moved a little, and the final
 * design for the same circuit at its other loads (receive, key-up, key-down); starting the Newton search from the
 * voltage of the nearest load, or on the line through the two nearest, takes one or two cycles instead of three or
 * four. A search over candidates (the reservoir bisection, `searchKey`) starts a candidate with no state of its own
 * from the last converged one. The search still stops on the same tolerance, so a result moves by less than
 * `toleranceV` at most.
 */
let WARM: Map<string, WarmPoint[]> | null = null;

/** A converged cycle-start voltage (V) and the load it was found at (current A, or conductance S). */
interface WarmPoint {
  load: number;
  v0: number;
}

/** At most this many loads are kept per circuit (a rail has five corners per mains voltage). */
const WARM_POINTS = 8;

const loadValue = (load: SimLoad): number => (load.kind === 'current' ? load.currentA : 1 / load.resistanceOhm);

/**
 * Start voltage for `load` from converged points of the same circuit: the point at that load, else the line through
 * the two nearest loads (v0 is close to linear in the load: the reservoir's droop), else the nearest point. Undefined
 * without points; the caller bounds it to (0, no-load peak).
 */
function warmStart(points: readonly WarmPoint[] | undefined, load: number): number | undefined {
  if (!points?.length || !Number.isFinite(load)) return undefined;
  const byDistance = [...points].sort((a, b) => Math.abs(a.load - load) - Math.abs(b.load - load));
  const [p, q] = byDistance;
  if (p.load === load || !q || q.load === p.load) return p.v0;
  // Linear interpolation (or extrapolation) in the load; a start only, the Newton search decides the result
  const v = p.v0 + ((q.v0 - p.v0) * (load - p.load)) / (q.load - p.load);
  return Number.isFinite(v) ? v : p.v0;
}

function keepWarm(key: string, point: WarmPoint): void {
  if (!WARM) return;
  const points = WARM.get(key)?.filter((x) => x.load !== point.load) ?? [];
  points.push(point);
  if (points.length > WARM_POINTS) points.shift();
  WARM.set(key, points);
}
/** Other simulations' memos (the joint transformer simulation), by name, live with the memo. */
let SCOPES: Map<string, Map<string, unknown>> | null = null;

/**
 * A named memo that lives as long as the current withSimulationMemo call (null outside one), bounded like the
 * rectifier memo: for other simulations (shared-primary.ts) to memoise and warm-start within one evaluation.
 */
export function simulationScope<T>(name: string): Map<string, T> | null {
  if (!SCOPES) return null;
  let m = SCOPES.get(name);
  if (!m) SCOPES.set(name, (m = new Map()));
  if (m.size >= MEMO_MAX) m.clear();
  return m as Map<string, T>;
}

/** False inside withSimulationMemo(fn, { caches: false }): resultScope gives no memo (the plain path). */
let CACHES = true;

/**
 * A memo of a pure computation's results by exact input (no warm start, so a hit is what the computation gives),
 * live with the simulation memo; null outside one and in a run without caches (the equivalence tests' plain path).
 */
export function resultScope<T>(name: string): Map<string, T> | null {
  return CACHES ? simulationScope<T>(`result:${name}`) : null;
}

/**
 * Run `fn` with simulations memoised on their exact inputs; the memo is dropped when `fn` returns, so results never
 * depend on what was evaluated before and no memory outlives the call. Nested calls share the outer memo.
 * `caches: false` leaves out the memos of pure results (resultScope) only; the simulations' memo and warm starts stay.
 */
export function withSimulationMemo<T>(fn: () => T, options: { caches?: boolean } = {}): T {
  if (MEMO) return fn();
  MEMO = new Map();
  WARM = new Map();
  SCOPES = new Map();
  CACHES = options.caches !== false;
  try {
    return fn();
  } finally {
    MEMO = null;
    WARM = null;
    SCOPES = null;
    CACHES = true;
  }
}

/**
 * The steady state of one rectifier. Inside withSimulationMemo a repeated input is a look-up and a circuit seen
 * before at other loads starts from those states; `searchKey` names a search over candidate circuits (the reservoir
 * bisection), whose candidates start from the last converged one of the same search.
 */
export function simulateRectifier(input: RectifierSimInput, options: { searchKey?: string } = {}): RectifierSimResult {
  if (!MEMO) return simulateUncached(input);
  // the circuit without its load names the warm starts; with the load it names the memo
  const circuit = [
    input.topology,
    input.secondaryVrms,
    input.windingResistanceOhm,
    input.frequencyHz,
    input.diodeDropV,
    input.diodeResistanceOhm,
    input.capacitanceF,
    input.esrOhm,
    input.bleederOhm ?? null,
    input.stepsPerCycle ?? null,
    input.toleranceV ?? null,
  ];
  const key = JSON.stringify([...circuit, input.load, input.maxCycles ?? null, input.waveformPoints ?? null]);
  const held = MEMO.get(key);
  if (held) return held;
  const circuitKey = JSON.stringify([...circuit, input.load.kind]);
  const load = loadValue(input.load);
  const searchKey = options.searchKey !== undefined ? `search\u0000${options.searchKey}` : null;
  const start = warmStart(WARM?.get(circuitKey), load)
    ?? (searchKey !== null ? WARM?.get(searchKey)?.at(-1)?.v0 : undefined);
  const result = simulateUncached(input, start, (v0) => {
    keepWarm(circuitKey, { load, v0 });
    if (searchKey !== null) keepWarm(searchKey, { load, v0 });
  });
  if (MEMO.size >= MEMO_MAX) MEMO.clear();
  if (WARM && WARM.size >= MEMO_MAX) WARM.clear();
  MEMO.set(key, result);
  return result;
}

function simulateUncached(
  input: RectifierSimInput,
  startV?: number,
  onSteady?: (v0: number) => void,
): RectifierSimResult {
  const nums = [
    input.secondaryVrms,
    input.windingResistanceOhm,
    input.frequencyHz,
    input.diodeDropV,
    input.diodeResistanceOhm,
    input.capacitanceF,
    input.esrOhm,
  ];
  if (!nums.every((x) => Number.isFinite(x)))
    return invalid('Simulation not run: an input is missing or not a number.');
  const f = SIM_FLOORS;
  const notRun = 'Simulation not run:';
  if (!usablePositive(input.frequencyHz, f.frequencyHz)) {
    return invalid(`${notRun} the mains frequency must be at least 1 Hz.`);
  }
  if (!usablePositive(input.capacitanceF, f.capacitanceF)) {
    return invalid(`${notRun} the reservoir capacitance must be at least 1 nF.`);
  }
  if (!usablePositive(input.secondaryVrms, f.secondaryVrms)) {
    return invalid(`${notRun} the secondary voltage must be at least 1 mV.`);
  }
  if (input.windingResistanceOhm < 0 || input.diodeResistanceOhm < 0 || input.esrOhm < 0 || input.diodeDropV < 0) {
    return invalid('Simulation not run: resistances and diode drop must not be negative.');
  }
  const n = diodesInPath(input.topology);
  const peakEmfV = Math.SQRT2 * input.secondaryVrms;
  const loadG = input.load.kind === 'resistance' ? (quotient(1, input.load.resistanceOhm, f.resistanceOhm) ?? NaN) : 0;
  const i0 = input.load.kind === 'current' ? input.load.currentA : 0;
  if (!(loadG >= 0) || !(i0 >= 0) || !Number.isFinite(i0)) {
    return invalid(`${notRun} the load must be a current of 0 A or more, or a resistance of at least 1 mΩ.`);
  }
  // null, undefined or 0: no bleeder fitted
  const bleedG = input.bleederOhm ? quotient(1, input.bleederOhm, f.resistanceOhm) : 0;
  if (bleedG === null || bleedG < 0) {
    return invalid(`${notRun} the bleeder resistance must be at least 1 mΩ (or none).`);
  }
  const cir: Circuit = {
    diodes: n,
    dropV: n * input.diodeDropV,
    peakEmfV,
    rt: input.windingResistanceOhm + n * input.diodeResistanceOhm,
    esr: input.esrOhm,
    c: input.capacitanceF,
    g: loadG + bleedG,
    i0,
    omega: 2 * Math.PI * input.frequencyHz,
    topology: input.topology,
  };
  const steps = Math.max(100, Math.min(20000, Math.round(input.stepsPerCycle ?? 1000)));
  const maxCycles = Math.max(2, Math.min(2000, Math.round(input.maxCycles ?? 200)));
  const noLoadPeakV = Math.max(0, peakEmfV - n * input.diodeDropV);
  const tol = input.toleranceV ?? Math.max(1e-7, 1e-5 * noLoadPeakV);
  const surgeA = switchOnSurgeA(peakEmfV, input.topology, input.diodeDropV, cir.rt + cir.esr);

  // Safeguarded Newton on F(v) = P(v) - v within the bracket [0, no-load peak]; F' = P' - 1 < 0 (P' is a product of
  // decays in [0, 1)). Source: shooting method for periodic steady states, e.g. Aprille & Trick, Proc. IEEE 60(1),
  // 1972 (from memory); the secant fallback is kept for a flat cycle map.
  let lo = 0;
  let hi = noLoadPeakV;
  // a warm start from the same circuit at a nearby load, else just below the no-load peak
  let x = startV !== undefined && startV > 0 && startV < noLoadPeakV ? startV : noLoadPeakV * 0.95;
  let xPrev = NaN;
  let fPrev = NaN;
  let cycles = 0;
  let converged = false;
  let last: { v: number; dvdv0: number; st: CycleStats } = { v: x, dvdv0: 0, st: emptyStats() };
  while (cycles < maxCycles) {
    last = runCycle(cir, x, steps);
    cycles++;
    const f = last.v - x;
    if (Math.abs(f) < tol) {
      converged = true;
      break;
    }
    if (f > 0) lo = Math.max(lo, x);
    else hi = Math.min(hi, x);
    const fPrime = last.dvdv0 - 1;
    let next =
      Number.isFinite(fPrime) && fPrime < -1e-12
        ? x - f / fPrime
        : Number.isFinite(fPrev) && f !== fPrev
          ? x - (f * (x - xPrev)) / (f - fPrev)
          : last.v;
    if (!(next > lo && next < hi)) next = last.v > lo && last.v < hi ? last.v : 0.5 * (lo + hi);
    if (hi - lo < tol) {
      next = 0.5 * (lo + hi);
    }
    xPrev = x;
    fPrev = f;
    x = next;
  }
  if (converged) onSteady?.(x);
  // Record two cycles from the steady state for the plot (also the statistics of the first of them).
  const wantWave = (input.waveformPoints ?? 160) > 0;
  const pts = Math.max(20, Math.min(2000, Math.round(input.waveformPoints ?? 160)));
  const every = Math.max(1, Math.floor((2 * steps) / pts));
  const wf: RectifierWaveform = { timeS: [], outputV: [], windingA: [] };
  let counter = 0;
  let offsetT = 0;
  // the step as runCycle computes it, for the sample times
  const h = (2 * Math.PI) / cir.omega / steps;
  const take = () => {
    for (let n = 1; n <= steps; n++) {
      if (counter++ % every === 0) {
        wf.timeS.push(finite(offsetT + n * h));
        wf.outputV.push(finite(WAVE_V[n]));
        wf.windingA.push(finite(WAVE_I[n]));
      }
    }
  };
  let st = last.st;
  if (wantWave) {
    // converged: the last cycle of the search ran from x, so its steps (still in WAVE_V/WAVE_I) are the first cycle
    const first = converged ? last : runCycle(cir, x, steps);
    take();
    offsetT = 1 / input.frequencyHz;
    runCycle(cir, first.v, steps);
    take();
    st = first.st;
  }
  const perHalf = input.topology === 'centre-tap';
  const secondaryRmsA = perHalf
    ? Math.sqrt(Math.max(st.sumId2A, st.sumIdB2) / steps)
    : Math.sqrt((st.sumId2A + st.sumIdB2) / steps);
  const meanIc = st.sumIc / steps;
  const result: RectifierSimResult = {
    converged,
    cycles: cycles + (wantWave ? 2 : 0),
    dcMeanV: finite(st.sumV / steps),
    ripplePpV: finite(st.maxV - st.minV),
    troughV: finite(st.minV),
    peakV: finite(st.maxV),
    noLoadPeakV,
    loadMeanA: finite(st.sumLoad / steps),
    secondaryRmsA: finite(secondaryRmsA),
    diodePeakA: finite(st.maxId),
    capacitorRippleRmsA: finite(Math.sqrt(Math.max(0, st.sumIc2 / steps - meanIc * meanIc))),
    conductionFraction: finite(st.conducting / steps),
    surgeA,
    collapsed: st.collapsed,
    waveform: wf,
    note: null,
  };
  if (!converged)
    result.note = `Steady state not reached within ${maxCycles} mains cycles; values are from the last cycle and may ` +
      `be off.`;
  if (st.collapsed) result.note = 'The load pulls the reservoir down to 0 V: this supply cannot deliver this current.';
  return result;
}
