// Transformer sizing: per-winding voltage and current ratings, total VA, primary current and inrush caution.
import type { Finding } from '../findings';
import type { RectifiedRail, Transformer, Winding } from '../model';
import type { RectifiedCorner, Recommendation, TransformerReport, WindingRecommendation } from './report-types';
import { simulateRectifier } from './rectifier-sim';
import { simulateSharedPrimary } from './shared-primary';
import { PRIMARY_COPPER_SHARE, primaryOhmFromRegulation } from './inrush';
import { PRIMARY_LEAKAGE_SHARE, primaryLeakageH } from './cross-regulation';
import { noLoadVrms, windingLeakage, windingResistanceOhm } from './winding';
import { DEFAULT_TRANSFORMER_VA, nextAtLeast } from './standard-values';
import { usablePositive } from '../numeric';

/** Toroid size above which a soft-start is advised. Common practice, no published source (from memory). */
export const TOROID_SOFT_START_VA = 300;

export interface WindingInput {
  rail: RectifiedRail;
  winding: Winding;
  corners: RectifiedCorner[];
  keyingDuty: number;
  requiredMinV: number | null;
  frequencyHz: number;
  mainsNominalV: number;
  lowFactor: number;
  keyDownA: number;
  standardSecondaryV: readonly number[];
  construction: 'laminated' | 'toroidal';
  /** Rate the winding for CW at the keying duty (default) or for a continuous tune-up carrier. */
  sizing?: 'duty' | 'tune-up';
}

const get = (cs: RectifiedCorner[], id: string) => cs.find((c) => c.id === id);

/**
 * Leakage inductance of a candidate winding rated ratedV, ratedA (H): the fitted winding's leakage (entered, or split
 * from its regulation) at the same per-unit reactance, L' = L (V'/I') / (V/I). Source: X = 2 pi f L (circuit theory);
 * a winding's leakage reactance as a fixed share of its impedance base V/I across ratings of one construction is
 * common practice, no published source (the same scaling the regulation figure gives the resistance).
 */
export function candidateLeakageH(inp: WindingInput, ratedV: number, ratedA: number): number {
  const w = inp.winding;
  const fittedH = windingLeakage(w, inp.construction, inp.frequencyHz).henry;
  if (!(fittedH > 0)) return 0;
  if (!usablePositive(w.ratedVrms, 1e-3) || !usablePositive(w.ratedA, 1e-6) || !usablePositive(ratedA, 1e-6)) return 0;
  const l = (fittedH * (ratedV / ratedA)) / (w.ratedVrms / w.ratedA);
  return Number.isFinite(l) ? l : 0;
}

/**
 * Trough at low mains, key-down, for a winding of rated V and A with the fitted winding's regulation and its leakage
 * (candidateLeakageH). With leakage the candidate is simulated as the evaluation simulates a transformer
 * (cross-regulation.ts): a one-winding transformer, the primary's share of its copper and leakage in the primary;
 * without leakage by the resistive rectifier simulation. Other windings' loads on the shared primary are left out.
 */
function troughFor(inp: WindingInput, ratedV: number, ratedA: number): number {
  const w = inp.winding;
  // Effective regulation of the fitted winding (from its entered resistance when there is one):
  // R = Reg V / I (ref §4.1)
  // Usable denominators (1 mV, 1 µA), not merely > 0: a subnormal rating made these quotients infinite
  const ratingUsable = usablePositive(w.ratedVrms, 1e-3) && usablePositive(w.ratedA, 1e-6);
  const regEff = ratingUsable ? (windingResistanceOhm(w) * w.ratedA) / w.ratedVrms : w.regulationFraction;
  const r = usablePositive(ratedA, 1e-6) ? (regEff * ratedV) / ratedA : 0;
  const secondaryVrms = noLoadVrms({ ...w, ratedVrms: ratedV }) * inp.lowFactor;
  const leakageH = candidateLeakageH(inp, ratedV, ratedA);
  const rail = inp.rail;
  if (leakageH > 0 && secondaryVrms > 0 && usablePositive(inp.mainsNominalV, 1)) {
    const candidate: Winding = { ...w, ratedVrms: ratedV, ratedA, resistanceOhm: r, leakageH };
    const t: Transformer = { id: 'candidate', name: w.name, construction: inp.construction, windings: [candidate] };
    const mains = { nominalV: inp.mainsNominalV, frequencyHz: inp.frequencyHz, lowFraction: 0, highFraction: 0 };
    const joint = simulateSharedPrimary({
      primaryVrms: inp.mainsNominalV * inp.lowFactor, primaryOhm: primaryOhmFromRegulation(t, inp.mainsNominalV),
      primaryH: primaryLeakageH(t, mains), frequencyHz: inp.frequencyHz, stepsPerCycle: 500, maxCycles: 80,
      windings: [{
        topology: rail.topology, secondaryVrms, ownOhm: (1 - PRIMARY_COPPER_SHARE) * r,
        ownH: (1 - PRIMARY_LEAKAGE_SHARE) * leakageH, diodeDropV: rail.diodeDropV,
        diodeResistanceOhm: rail.diodeResistanceOhm, capacitanceF: rail.reservoirF, esrOhm: rail.esrOhm,
        loadA: inp.keyDownA, bleederOhm: rail.bleederOhm,
      }],
    }, { searchKey: `winding:${rail.id}:${inp.lowFactor}:${inp.keyDownA}` });
    const trough = joint.rails[0]?.troughV;
    return joint.converged && trough !== undefined && Number.isFinite(trough) ? Math.max(0, trough) : 0;
  }
  const sim = simulateRectifier({
    topology: rail.topology, secondaryVrms, windingResistanceOhm: r,
    frequencyHz: inp.frequencyHz, diodeDropV: rail.diodeDropV, diodeResistanceOhm: rail.diodeResistanceOhm,
    capacitanceF: rail.reservoirF, esrOhm: rail.esrOhm, load: { kind: 'current', currentA: inp.keyDownA },
    bleederOhm: rail.bleederOhm, stepsPerCycle: 500, waveformPoints: 0, maxCycles: 80,
  });
  return sim.collapsed ? 0 : sim.troughV;
}

/** What the candidate windings share with the fitted one, in words: regulation, and leakage when there is any. */
function sameAsFitted(inp: WindingInput): string {
  const l = windingLeakage(inp.winding, inp.construction, inp.frequencyHz);
  if (!(l.henry > 0)) return 'same regulation as the fitted winding, no leakage';
  const mH = l.henry * 1e3;
  const how = l.fromRegulation ? 'split from its regulation' : 'entered';
  return `same regulation and per-unit leakage as the fitted winding, whose ${mH.toPrecision(3)} mH is ${how}`;
}

export function recommendWinding(inp: WindingInput): {
  result: WindingRecommendation; findings: Finding[]; recommendation: Recommendation; simulations: number;
} {
  const d = inp.keyingDuty;
  const kd = get(inp.corners, 'high-keyDown');
  const ku = get(inp.corners, 'high-keyUp');
  // Heating follows I^2: the heating-equivalent RMS over a keying cycle is sqrt(d I_kd^2 + (1-d) I_ku^2)
  // (Joule heating, I^2 R)
  const thermalRmsA = Math.sqrt(d * (kd?.secondaryRmsA ?? 0) ** 2 + (1 - d) * (ku?.secondaryRmsA ?? 0) ** 2);
  const tuneUpRmsA = kd?.secondaryRmsA ?? 0;
  const peakA = Math.max(0, ...inp.corners.map((c) => c.diodePeakA));
  const halves = inp.rail.topology === 'centre-tap' ? 2 : 1;
  // Sized for the choice: the heating-equivalent current of CW keying, or the continuous carrier of tune-up
  const tuneUpSized = inp.sizing === 'tune-up';
  const ratedA = tuneUpSized ? Math.max(thermalRmsA, tuneUpRmsA) : thermalRmsA;
  let simulations = 0;
  let minimumRatedV: number | null = null;
  let reasoningV: string;
  if (inp.requiredMinV !== null && inp.requiredMinV > 0 && inp.keyDownA >= 0) {
    const req = inp.requiredMinV;
    let lo = 0;
    let hi = Math.max(1, req);
    let n = 0;
    while (troughFor(inp, hi, ratedA) < req && n++ < 10) {
      lo = hi;
      hi *= 2;
    }
    simulations += n + 1;
    if (troughFor(inp, hi, ratedA) >= req) {
      for (let i = 0; i < 16 && hi - lo > 0.02; i++) {
        const mid = 0.5 * (lo + hi);
        simulations++;
        if (troughFor(inp, mid, ratedA) >= req) hi = mid;
        else lo = mid;
      }
      minimumRatedV = hi;
    }
    reasoningV = minimumRatedV !== null
      ? `The lowest rated secondary that keeps the trough at low mains, key-down above ${req.toFixed(2)} V is ` +
        `${minimumRatedV.toFixed(2)} V${halves === 2 ? ' per half' : ''} (${sameAsFitted(inp)}).`
      : `No secondary voltage up to ${hi.toFixed(0)} V keeps the trough above ${req.toFixed(2)} V with this ` +
        'reservoir and load; the reservoir or load must change.';
  } else {
    reasoningV = 'This rail states no minimum voltage (no regulator fed), so the fitted secondary voltage is kept.';
  }
  const target = minimumRatedV ?? (inp.requiredMinV === null ? inp.winding.ratedVrms : null);
  const standardRatedV = target !== null ? nextAtLeast(inp.standardSecondaryV, target) : null;
  let checkTroughV: number | null = null;
  if (standardRatedV !== null) {
    checkTroughV = troughFor(inp, standardRatedV, ratedA);
    simulations++;
  }
  const fittedV = Number.isFinite(inp.winding.ratedVrms) ? Math.max(0, inp.winding.ratedVrms) : 0;
  const vaRatedV = standardRatedV ?? fittedV;
  const va = vaRatedV * ratedA * halves;
  const maxKeyDownRms = Math.max(0, ...inp.corners.filter((c) => c.load === 'keyDown').map((c) => c.secondaryRmsA));
  // Ampere-turn balance: primary current = secondary current x turns ratio (V_NL / V_mains); magnetising current
  // neglected
  // 0 only without usable mains, which evaluateSupply already reports as a fail (mains.values)
  const primaryReferredA = usablePositive(inp.mainsNominalV, 1)
    ? (noLoadVrms(inp.winding) / inp.mainsNominalV) * maxKeyDownRms * Math.sqrt(halves) : 0;
  const half = halves === 2 ? ' per half (centre-tapped)' : '';
  const result: WindingRecommendation = {
    windingId: inp.winding.id, windingName: inp.winding.name, minimumRatedV, standardRatedV, thermalRmsA, tuneUpRmsA,
    peakA, ratedA, va, vaRatedV, checkTroughV,
    primaryReferredA, halves,
    reasoning: tuneUpSized
      ? `${reasoningV} Current rating, sized for tune-up: a continuous carrier at high mains draws ` +
        `${tuneUpRmsA.toFixed(2)} A RMS${half} (CW at duty ${d} would need ${thermalRmsA.toFixed(2)} A; repetitive ` +
        `peak ${peakA.toFixed(1)} A).`
      : `${reasoningV} Current rating: heating-equivalent RMS at high mains with CW duty ${d} is ` +
        `${thermalRmsA.toFixed(2)} A${half} (continuous carrier ${tuneUpRmsA.toFixed(2)} A; repetitive peak ` +
        `${peakA.toFixed(1)} A).`,
  };
  const findings: Finding[] = [];
  const src = 'supply.transformer-current' as const;
  if (inp.winding.ratedA > 0 && Number.isFinite(inp.winding.ratedA)) {
    const rated = inp.winding.ratedA;
    const base = { rule: 'transformer.current', subject: inp.winding.name, unit: 'A', source: src, limit: rated };
    const cw = `${thermalRmsA.toFixed(2)} A RMS in CW operation`;
    if (thermalRmsA > rated) {
      findings.push({
        ...base, value: thermalRmsA, severity: 'fail',
        message: `${cw} exceeds its ${rated} A rating; the transformer will overheat. Choose at least ` +
          `${ratedA.toFixed(2)} A${half}.`,
      });
    } else if (tuneUpRmsA > rated) {
      findings.push({
        ...base, value: tuneUpRmsA, severity: 'caution',
        message: `A continuous carrier draws ${tuneUpRmsA.toFixed(2)} A RMS, above its ${rated} A rating; ` +
          'keep tune-up short.',
      });
    } else {
      findings.push({ ...base, value: thermalRmsA, severity: 'ok', message: `${cw} is within its ${rated} A rating.` });
    }
  } else {
    findings.push({
      severity: 'fail', rule: 'transformer.current', subject: inp.winding.name, value: null, limit: null, unit: 'A',
      source: 'design.input',
      message: 'Enter the winding\'s rated current; without it the winding resistance and heating cannot be judged.',
    });
  }
  const recommendation: Recommendation = {
    topic: 'transformer',
    text: `${inp.winding.name}: ${standardRatedV !== null ? `${standardRatedV} V` : 'voltage: see reasoning'}` +
      `${halves === 2 ? '-0-' + (standardRatedV ?? '') + ' V' : ''}, ${ratedA.toFixed(2)} A RMS${half} ` +
      `(${va.toFixed(0)} VA)`,
    reasoning: result.reasoning +
      (checkTroughV !== null ? ` With ${standardRatedV} V the trough is ${checkTroughV.toFixed(2)} V.` : ''),
    source: 'supply.standard-values',
  };
  return { result, findings, recommendation, simulations };
}

export function transformerReport(
  t: Transformer, windings: WindingRecommendation[], vaList: readonly number[] = DEFAULT_TRANSFORMER_VA,
): { report: TransformerReport; findings: Finding[] } {
  const thermalVA = windings.reduce((s, w) => s + w.va, 0);
  // Same volts as the thermal VA (standard, else fitted): a winding with no standard voltage still counts
  const tuneUpVA = windings.reduce((s, w) => s + (w.vaRatedV ?? w.standardRatedV ?? 0) * w.tuneUpRmsA * w.halves, 0);
  const standardVA = thermalVA > 0 ? nextAtLeast(vaList, thermalVA) : null;
  const primaryA = windings.reduce((s, w) => s + w.primaryReferredA, 0);
  const findings: Finding[] = [];
  if (t.construction === 'toroidal' && (standardVA ?? thermalVA) >= TOROID_SOFT_START_VA) {
    findings.push({
      severity: 'caution', rule: 'transformer.inrush', subject: t.name, value: standardVA ?? thermalVA,
      limit: TOROID_SOFT_START_VA, unit: 'VA', source: 'supply.inrush',
      message: 'A toroidal transformer of this size can draw a large inrush at switch-on and blow fuses or trip ' +
        'breakers; fit a soft-start (series NTC thermistor or a resistor shorted by a relay after a moment). Mains ' +
        'wiring must follow your local electrical code.',
    });
  }
  if (standardVA !== null && tuneUpVA > standardVA * 1.2) {
    findings.push({
      severity: 'caution', rule: 'transformer.tune-up', subject: t.name, value: tuneUpVA, limit: standardVA, unit: 'VA',
      source: 'supply.tune-up-duty',
      message: `A continuous carrier loads it to ${tuneUpVA.toFixed(0)} VA, well above the ${standardVA} VA ` +
        'sized for CW; keep tune-up carriers short.',
    });
  }
  return {
    report: {
      transformerId: t.id, name: t.name, construction: t.construction, windings, thermalVA, tuneUpVA, standardVA,
      primaryA,
    },
    findings,
  };
}
