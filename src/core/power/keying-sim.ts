// Time-domain simulation of a rectified rail while the key goes down: sinusoidal EMF behind the winding resistance
// (and, when given, its leakage inductance), the rectifier's diodes (Vf + r_d each), the reservoir with its ESR and
// bleeder, and the rail's loads by their own laws (rail-load-model.ts), switched between key-up and key-down by a
// keying schedule. The rail starts from its key-up periodic steady state.
//
// Integration: trapezoidal rule with a fixed step, the loads linearised at the start of each step (I ≈ a + g v),
// each diode state chosen so that the diode current is >= 0 at the step end (as in rectifier-sim.ts). Source:
// trapezoidal integration as used by SPICE's transient analysis (L. W. Nagel, SPICE2, UCB ERL-M520, 1975; from
// memory); checked against ngspice in test/core/power/keying-transient.test.ts.
import type { RectifierTopology } from '../model';
import { diodesInPath } from './rectifier-sim';
import { loadAt, paOutputW, type ModeLoads } from './rail-load-model';

export interface KeyingCircuit {
  topology: RectifierTopology;
  /** Open-circuit secondary RMS actually applied (V); per half for centre-tap. */
  secondaryVrms: number;
  /** Winding resistance referred to the secondary (Ω). */
  windingOhm: number;
  /** Leakage inductance referred to the secondary (H); 0 = none. */
  leakageH: number;
  frequencyHz: number;
  diodeDropV: number;
  diodeResistanceOhm: number;
  capacitanceF: number;
  esrOhm: number;
  /** Bleeder across the reservoir (Ω), null = none. */
  bleederOhm: number | null;
}

/** Key-down intervals [startS, endS) after the key-up steady state (time 0 = a zero crossing of the EMF). */
export interface KeyingSchedule {
  intervals: { startS: number; endS: number }[];
  /** Simulated time after time 0 (s). */
  durationS: number;
}

export interface KeyingRun {
  /** Rail (reservoir terminal) voltage, sampled every `sampleEvery` steps, with its time (s). */
  timeS: number[];
  railV: number[];
  keyed: boolean[];
  /** Per interval of the schedule: mean, lowest and highest rail voltage while keyed (V), the mean PA output (W), and
   * the mean PA output over the interval's first `leadS` (W). */
  intervals: {
    startS: number;
    endS: number;
    meanV: number;
    minV: number;
    maxV: number;
    meanOutputW: number;
    leadOutputW: number;
  }[];
  /** Reservoir voltage at time 0 (key-up steady state) (V). */
  startV: number;
  steps: number;
}

interface State {
  vc: number;
  il: number;
}

/** The rail simulator: one step of the circuit with the given loads. */
export class KeyingSimulator {
  private readonly n: number;
  private readonly dropV: number;
  private readonly rt: number;
  private readonly peakV: number;
  private readonly gBleed: number;
  readonly h: number;
  /** Leakage used (H): 0 when it is too small for the step to resolve (L/R below 4 steps), so treated as absent. */
  readonly leakageH: number;

  constructor(private readonly c: KeyingCircuit, readonly stepsPerCycle: number) {
    this.n = diodesInPath(c.topology);
    this.dropV = this.n * c.diodeDropV;
    this.rt = Math.max(c.windingOhm + this.n * c.diodeResistanceOhm, 1e-6);
    this.peakV = Math.SQRT2 * c.secondaryVrms;
    this.gBleed = c.bleederOhm ? 1 / c.bleederOhm : 0;
    this.h = 1 / c.frequencyHz / stepsPerCycle;
    this.leakageH = c.leakageH > 0 && c.leakageH / this.rt >= 4 * this.h ? c.leakageH : 0;
    this.table = new Float64Array(stepsPerCycle);
    for (let i = 0; i < stepsPerCycle; i++) {
      const s = this.peakV * Math.sin((2 * Math.PI * i) / stepsPerCycle);
      this.table[i] = (c.topology === 'half-wave' ? s : Math.abs(s)) - this.dropV;
    }
  }

  /** Rectified EMF less the diode drops at step i from a zero crossing (V), from a table of one cycle. */
  private readonly table: Float64Array;
  emf(i: number): number {
    return this.table[i % this.stepsPerCycle];
  }

  /** Linearised load at v into la (A) and lg (S, bleeder included): I ≈ la + lg v. No allocation: the hot loop. */
  private la = 0;
  private lg = 0;
  private linearise(loads: ModeLoads, v: number): void {
    loadAt(loads, v, this.scratch);
    this.lg = this.scratch.slopeAPerV + this.gBleed;
    this.la = this.scratch.currentA - this.scratch.slopeAPerV * v;
  }
  private readonly scratch = { currentA: 0, slopeAPerV: 0 };

  /** Terminal voltage from the state and the linearised load a + g v (V). */
  private terminal(st: State, e: number, a: number, g: number): number {
    const esr = this.c.esrOhm;
    if (this.leakageH > 0) return (st.vc + esr * (st.il - a)) / (1 + esr * g);
    const vt = (st.vc + esr * (e / this.rt - a)) / (1 + esr / this.rt + esr * g);
    if (e - vt > 0) return vt;
    return (st.vc - esr * a) / (1 + esr * g);
  }

  /** Rail terminal voltage at step i (V). */
  railV(st: State, i: number, loads: ModeLoads): number {
    this.linearise(loads, st.vc);
    return this.terminal(st, this.emf(i), this.la, this.lg);
  }

  /** Advance the state by one step from step i (trapezoidal, loads linearised at the step start). */
  step(st: State, i: number, loads: ModeLoads): void {
    const h = this.h;
    const C = this.c.capacitanceF;
    const esr = this.c.esrOhm;
    const e0 = this.emf(i);
    const e1 = this.emf(i + 1);
    // linearised about the reservoir voltage (the terminal differs by ESR x capacitor current, tenths of a volt)
    this.linearise(loads, st.vc);
    const g = this.lg;
    const a = this.la;
    const k = 1 + esr * g;
    if (this.leakageH > 0) {
      const L = this.leakageH;
      // conducting: x' = A x + b(t), x = (vc, il); vt = (vc + esr (il - a)) / k
      // C vc' = il - a - g vt ; L il' = e - rt il - vt
      const a11 = -g / k / C;
      const a12 = (1 - (g * esr) / k) / C;
      const a21 = -1 / k / L;
      const a22 = -(this.rt + esr / k) / L;
      const b1 = (-a + (g * esr * a) / k) / C;
      const b2 = (esr * a) / k / L;
      if (st.il > 0 || e0 > this.terminal(st, e0, a, g)) {
        // trapezoidal: (I - h/2 A) x1 = (I + h/2 A) x0 + h/2 (b0 + b1)
        const r1 = st.vc + (h / 2) * (a11 * st.vc + a12 * st.il) + h * b1;
        const r2 = st.il + (h / 2) * (a21 * st.vc + a22 * st.il) + h * b2 + (h / 2) * ((e0 + e1) / L);
        const m11 = 1 - (h / 2) * a11;
        const m12 = -(h / 2) * a12;
        const m21 = -(h / 2) * a21;
        const m22 = 1 - (h / 2) * a22;
        const det = m11 * m22 - m12 * m21;
        const vc = (r1 * m22 - m12 * r2) / det;
        const il = (m11 * r2 - m21 * r1) / det;
        if (il >= 0) {
          st.vc = vc;
          st.il = il;
          return;
        }
      }
      st.il = 0;
      this.blocking(st, a, g);
      return;
    }
    // no leakage: i_c = alpha vc + beta(t) on the conducting branch
    const k1 = 1 + esr / this.rt + esr * g;
    const alpha = (-1 / this.rt - g) / k1;
    // beta(e) = e / rt - a - (1 / rt + g) esr (e / rt - a) / k1, affine in e: summed over both ends at once
    const eSum = e0 + e1;
    const betaSum = (eSum / this.rt - 2 * a) * (1 - ((1 / this.rt + g) * esr) / k1);
    const q = (h / 2) * (alpha / C);
    const vc = (st.vc * (1 + q) + ((h / 2) * betaSum) / C) / (1 - q);
    const vt = (vc + esr * (e1 / this.rt - a)) / k1;
    if (e1 - vt >= 0) {
      st.vc = vc;
      return;
    }
    this.blocking(st, a, g);
  }

  /** Diodes off: C vc' = -(a + g vt), vt = (vc - esr a) / k. */
  private blocking(st: State, a: number, g: number): void {
    const h = this.h;
    const C = this.c.capacitanceF;
    const k = 1 + this.c.esrOhm * g;
    const alpha = -g / k;
    const beta = -a + (g * this.c.esrOhm * a) / k;
    const q = (h / 2) * (alpha / C);
    st.vc = Math.max(0, (st.vc * (1 + q) + (h * beta) / C) / (1 - q));
  }

  /** One mains cycle from reservoir voltage v (diodes off at the zero crossing); returns the end voltage. */
  cycle(v: number, loads: ModeLoads, each?: (i: number, st: State) => void): number {
    const st: State = { vc: v, il: 0 };
    for (let i = 0; i < this.stepsPerCycle; i++) {
      this.step(st, i, loads);
      each?.(i + 1, st);
    }
    return st.vc;
  }

  /**
   * Periodic steady state with fixed loads: the reservoir voltage at the zero crossing that repeats after one cycle,
   * by the secant method on F(v) = P(v) - v (shooting), bracketed by [0, no-load peak]. Returns NaN when not found.
   */
  steadyStartV(loads: ModeLoads, guessV: number, toleranceV: number, maxCycles = 40): { v: number; cycles: number } {
    const top = Math.max(0, this.peakV - this.dropV);
    let x0 = guessV > 0 && guessV < top ? guessV : 0.9 * top;
    let f0 = this.cycle(x0, loads) - x0;
    let cycles = 1;
    let x1 = x0 + f0;
    while (cycles < maxCycles) {
      const f1 = this.cycle(x1, loads) - x1;
      cycles++;
      if (Math.abs(f1) < toleranceV) return { v: x1, cycles };
      const next = f1 !== f0 ? x1 - (f1 * (x1 - x0)) / (f1 - f0) : x1 + f1;
      x0 = x1;
      f0 = f1;
      x1 = Math.min(top, Math.max(0, next));
    }
    return { v: NaN, cycles };
  }
}

/**
 * Run the schedule from the key-up steady state. `sampleEvery` steps make one plot sample. The key-up and key-down
 * loads are switched at the step nearest each interval edge.
 */
export function runKeying(
  sim: KeyingSimulator,
  keyUp: ModeLoads,
  keyDown: ModeLoads,
  schedule: KeyingSchedule,
  startV: number,
  sampleEvery: number,
  leadS: number,
): KeyingRun {
  const h = sim.h;
  const leadSteps = Math.max(1, Math.round(leadS / h));
  const total = Math.round(schedule.durationS / h);
  const edges = schedule.intervals.map((iv) => ({ from: Math.round(iv.startS / h), to: Math.round(iv.endS / h) }));
  const stats = schedule.intervals.map((iv) => ({
    ...iv,
    sum: 0,
    sumW: 0,
    leadW: 0,
    leadCount: 0,
    count: 0,
    minV: Infinity,
    maxV: -Infinity,
  }));
  const out: KeyingRun = { timeS: [], railV: [], keyed: [], intervals: [], startV, steps: total };
  const st = { vc: startV, il: 0 };
  let k = 0;
  for (let i = 0; i < total; i++) {
    while (k < edges.length && i >= edges[k].to) k++;
    const keyed = k < edges.length && i >= edges[k].from;
    const loads = keyed ? keyDown : keyUp;
    if (i % sampleEvery === 0) {
      out.timeS.push(i * h);
      out.railV.push(sim.railV(st, i, loads));
      out.keyed.push(keyed);
    }
    sim.step(st, i, loads);
    if (keyed) {
      const v = sim.railV(st, i + 1, loads);
      const s = stats[k];
      s.sum += v;
      s.count++;
      if (v < s.minV) s.minV = v;
      if (v > s.maxV) s.maxV = v;
      const w = keyDown.pa ? paOutputW(keyDown.pa, v) : 0;
      s.sumW += w;
      if (s.count <= leadSteps) {
        s.leadW += w;
        s.leadCount++;
      }
    }
  }
  out.intervals = stats.map((s) => ({
    startS: s.startS,
    endS: s.endS,
    meanV: s.count ? s.sum / s.count : NaN,
    minV: s.minV,
    maxV: s.maxV,
    meanOutputW: s.count ? s.sumW / s.count : NaN,
    leadOutputW: s.leadCount ? s.leadW / s.leadCount : NaN,
  }));
  return out;
}

/** One cycle at the periodic steady state: mean, lowest rail voltage and mean PA output (V, V, W). */
export function steadyCycle(
  sim: KeyingSimulator,
  loads: ModeLoads,
  startV: number,
): { meanV: number; troughV: number; meanOutputW: number } {
  let sum = 0;
  let sumW = 0;
  let min = Infinity;
  let n = 0;
  sim.cycle(startV, loads, (i, st) => {
    const v = sim.railV(st, i, loads);
    sum += v;
    sumW += loads.pa ? paOutputW(loads.pa, v) : 0;
    if (v < min) min = v;
    n++;
  });
  return { meanV: sum / n, troughV: min, meanOutputW: sumW / n };
}
