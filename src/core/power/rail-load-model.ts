// Load model of a rail: how the current its loads draw follows the rail voltage, per mode. The corners simulate
// every rail as a constant current (the budget's figure at one voltage); a keying transient needs the current at
// every instant, so each load keeps its own law here:
// - entered stage currents and relay coils: constant current (as entered);
// - linear regulators fed by the rail: constant current, I_in = I_out + I_q whatever the input voltage;
// - switching regulators fed by the rail: constant power, I_in = V_out I_out / (eta V_in) + I_q;
// - the PA on the rail: its load line, P_out ∝ (V - Vsat)², at the efficiency of its operating point.
import type { Mode, Project, RegulatedRail } from '../model';
import type { BudgetReport } from '../budget';
import { regulatorOutputV, switchingEfficiency } from './regulator';

/** The PA's draw: I(V) = idleA + P0 ((V - Vsat) / (V0 - Vsat))² / (eta V) for V > Vsat, idleA below. */
export interface PaLoadLaw {
  stageId: string;
  stageName: string;
  /** Rail voltage of the operating point the RF model computed (V). */
  referenceV: number;
  /** Output at referenceV (W). */
  referenceOutputW: number;
  /** Saturation drop (V), held at its operating-point value. */
  saturationV: number;
  /** Efficiency output / (DC input less idle) at the operating point, held constant (fraction). */
  efficiency: number;
  /** Bias idle current, drawn whatever the drive (A). */
  idleA: number;
}

/** A switching regulator's input: constant power above its lowest input voltage. */
export interface ConstantPowerLoad {
  name: string;
  /** Input power V_out I_out / eta (W). */
  powerW: number;
  /** Below this input the module is out of regulation; its draw is taken at this voltage (V). */
  minimumV: number;
}

/** One mode's loads on a rail. */
export interface ModeLoads {
  /** Sum of the constant-current loads (entered loads, coils, linear regulators, quiescent currents) (A). */
  constantA: number;
  constantPower: ConstantPowerLoad[];
  /** The PA's own law; null in modes where the PA is not keyed, or when no PA is on the rail. */
  pa: PaLoadLaw | null;
}

export interface RailLoadModel {
  railId: string;
  railName: string;
  keyUp: ModeLoads;
  keyDown: ModeLoads;
  /** The loads in words, for the page and the JSON. */
  parts: {
    name: string;
    law: 'constant current' | 'constant power' | 'PA load line';
    keyUpA: number;
    keyDownA: number;
  }[];
}

/** The PA's output at rail voltage v on its load line (W). */
export function paOutputW(pa: PaLoadLaw, v: number): number {
  const swing0 = pa.referenceV - pa.saturationV;
  if (!(swing0 > 0) || !(v > pa.saturationV)) return 0;
  // Source: PA load line P = k (Vdd - Vsat)² / R (textbook; the RF model's own
  // relation), R fixed by the output network
  return pa.referenceOutputW * ((v - pa.saturationV) / swing0) ** 2;
}

/** Current and its slope dI/dV of a mode's loads at rail voltage v (A, A/V); written into `into` when given (the
 * simulation's inner loop, without an allocation per step). */
export function loadAt(
  m: ModeLoads,
  v: number,
  into?: { currentA: number; slopeAPerV: number },
): { currentA: number; slopeAPerV: number } {
  let currentA = m.constantA;
  let slopeAPerV = 0;
  for (const p of m.constantPower) {
    // Source: energy balance P_in = P_out / eta (conservation of energy): I = P / V, dI/dV = -P / V²
    const vv = Math.max(v, p.minimumV);
    currentA += p.powerW / vv;
    if (v > p.minimumV) slopeAPerV -= p.powerW / (vv * vv);
  }
  const pa = m.pa;
  if (pa) {
    currentA += pa.idleA;
    const swing0 = pa.referenceV - pa.saturationV;
    if (swing0 > 0 && v > pa.saturationV && v > 0) {
      // P_dc = P_out / eta at the operating point's efficiency (common practice, no published source: the RF model's
      // own assumption); I = P_dc / V = K (V - Vs)² / V, dI/dV = K (1 - Vs² / V²). With Vs = 0 this is I ∝ V.
      const k = pa.referenceOutputW / (pa.efficiency * swing0 * swing0);
      const s = v - pa.saturationV;
      currentA += (k * s * s) / v;
      slopeAPerV += k * (1 - (pa.saturationV * pa.saturationV) / (v * v));
    }
  }
  if (into) {
    into.currentA = currentA;
    into.slopeAPerV = slopeAPerV;
    return into;
  }
  return { currentA, slopeAPerV };
}

/** What the RF model computed for a PA, as far as its load law needs it. */
export interface PaOperatingPoint {
  stageId: string;
  railV: number;
  outputW: number;
  saturationV: number;
  efficiency: number;
  keyDownCurrentA: number;
  refused: boolean;
}

/**
 * The load model of a rail from the current budget (which holds every load and regulator input at its voltage) and
 * the PA operating points. null when the budget has no such rail or a load is unknown (NaN), so nothing is guessed.
 */
export function railLoadModel(
  project: Project,
  budget: BudgetReport,
  railId: string,
  pas: PaOperatingPoint[],
): RailLoadModel | null {
  const rb = budget.rails.find((r) => r.railId === railId);
  if (!rb) return null;
  const modes: Mode[] = ['keyUp', 'keyDown'];
  const out: Record<'keyUp' | 'keyDown', ModeLoads> = {
    keyUp: { constantA: 0, constantPower: [], pa: null },
    keyDown: { constantA: 0, constantPower: [], pa: null },
  };
  const parts: RailLoadModel['parts'] = [];
  for (const l of rb.loads) {
    const stage = project.stages.find((s) => s.id === l.stageId);
    const isPa = l.computed && stage?.pa?.railId === railId;
    if (isPa) {
      const op = pas.find((p) => p.stageId === l.stageId);
      if (!op || op.refused || !(op.railV > op.saturationV) || !(op.efficiency > 0) || !(op.outputW >= 0)) return null;
      const idleA = stage!.pa!.biasIdleMaxA;
      // the efficiency the budget's current implies, so that I(V0) is the key-down current the supply was designed for
      const implied = op.outputW / ((op.keyDownCurrentA - idleA) * op.railV);
      const law: PaLoadLaw = {
        stageId: l.stageId,
        stageName: l.stageName,
        referenceV: op.railV,
        referenceOutputW: op.outputW,
        saturationV: op.saturationV,
        efficiency: Number.isFinite(implied) && implied > 0 && implied <= 1 ? implied : op.efficiency,
        idleA,
      };
      out.keyDown.pa = law;
      // the computed load carries the PA in key-down only (its key-up rows are entered loads, below)
      out.keyUp.constantA += l.currentA.keyUp;
      parts.push({ name: l.stageName, law: 'PA load line', keyUpA: l.currentA.keyUp, keyDownA: l.currentA.keyDown });
      continue;
    }
    if (modes.some((m) => !Number.isFinite(l.currentA[m]))) return null;
    out.keyUp.constantA += l.currentA.keyUp;
    out.keyDown.constantA += l.currentA.keyDown;
    // a computed load that is not the PA is a relay coil (evaluate()'s computed loads are those two)
    parts.push({
      name: l.computed ? `${l.stageName} (relay coil)` : l.stageName,
      law: 'constant current',
      keyUpA: l.currentA.keyUp,
      keyDownA: l.currentA.keyDown,
    });
  }
  const children = project.supply.rails.filter(
    (r): r is RegulatedRail => r.kind === 'regulated' && r.parentId === railId,
  );
  for (const c of children) {
    const cb = budget.rails.find((r) => r.railId === c.id);
    if (!cb || !cb.inputA || modes.some((m) => !Number.isFinite(cb.outputA[m]) || !Number.isFinite(cb.inputA![m])))
      return null;
    const iq = Number.isFinite(c.quiescentA) && c.quiescentA > 0 ? c.quiescentA : 0;
    if (c.regulator !== 'switching') {
      for (const m of ['keyUp', 'keyDown'] as const) out[m].constantA += cb.inputA[m];
      parts.push({ name: c.name, law: 'constant current', keyUpA: cb.inputA.keyUp, keyDownA: cb.inputA.keyDown });
      continue;
    }
    const vOut = regulatorOutputV(c.setting, c.quiescentA);
    const eta = switchingEfficiency(c);
    if (!(vOut > 0) || !(eta > 0)) return null;
    const minimumV = vOut + Math.max(0, c.dropoutV);
    for (const m of ['keyUp', 'keyDown'] as const) {
      out[m].constantA += iq;
      // Source: energy balance P_in = P_out / eta (as power/regulator.ts)
      out[m].constantPower.push({ name: c.name, powerW: (vOut * Math.max(0, cb.outputA[m])) / eta, minimumV });
    }
    parts.push({ name: c.name, law: 'constant power', keyUpA: cb.inputA.keyUp, keyDownA: cb.inputA.keyDown });
  }
  return { railId, railName: rb.name, keyUp: out.keyUp, keyDown: out.keyDown, parts };
}
