// One transformer, one simulation: all its designed rectified rails simulated together (shared-primary.ts) with the
// primary's share of the copper and of the leakage shared, each winding with its own share, at the corners whose
// voltages decide the design (low, nominal and high mains key-down, low mains key-up, the secondary tolerance corner).
// The rails' corners take these voltages (rectified-rail.ts), so headroom, regulator margins and the PA rail voltage
// see a PA key-down sag the other rails (cross-regulation); each rail's own simulation still gives the currents.
import type { Finding } from '../findings';
import type { Mains, RectifiedRail, Transformer } from '../model';
import type { CornerSpec } from './report-types';
import { TOLERANCE_ID, WORST_VOLTAGE_ID } from './corners';
import { PRIMARY_COPPER_SHARE, primaryOhmFromRegulation, nameplateVA } from './inrush';
import { simulateSharedPrimary, type JointWinding } from './shared-primary';
import { noLoadVrms, windingLeakage, windingResistanceOhm } from './winding';

/**
 * Corners simulated jointly (the rest keep each rail's own simulation: they decide currents and heat, not volts). The
 * tune-up corners load every rail as key-down does, so they are the same runs (memo hits).
 */
export const JOINT_CORNER_IDS: readonly string[] = [
  WORST_VOLTAGE_ID, 'nominal-keyDown', 'high-keyDown', 'low-keyUp', TOLERANCE_ID, 'low-tuneUp', 'nominal-tuneUp',
  'high-tuneUp',
];

/**
 * Share of the leakage inductance taken to be on the primary side (shared by all windings). Common practice, no
 * published source: the same half-and-half split as the copper (PRIMARY_COPPER_SHARE), as for a transformer with
 * primary and secondary wound alike.
 */
export const PRIMARY_LEAKAGE_SHARE = PRIMARY_COPPER_SHARE;

/** The voltages of one rail at one corner from the joint simulation (V). */
export interface JointVoltages {
  troughV: number;
  dcMeanV: number;
  peakV: number;
  ripplePpV: number;
}

export interface CrossRegulationRail {
  railId: string;
  railName: string;
  windingName: string;
  /** Leakage inductance referred to the winding (H) and whether it was split from the regulation figure. */
  leakageH: number;
  leakageFromRegulation: boolean;
  /** Lowest voltage its loads need (V), 0 when none is known. */
  requiredMinV: number;
  /** Low-mains key-down trough from the rail's own simulation (whole resistance, no leakage) (V). */
  aloneTroughV: number;
  /** Low-mains troughs simulated together, every rail keyed down / every rail key-up (V, rail terminal). */
  keyDownTroughV: number;
  keyUpTroughV: number;
  /** Key-down trough with the secondaries at the low end of their tolerance (V); null without a tolerance. */
  toleranceTroughV: number | null;
}

export interface CrossRegulation {
  /** Primary resistance and leakage inductance shared by the windings (Ω, H) and the low-mains voltage (V). */
  primaryOhm: number;
  primaryH: number;
  mainsV: number;
  /** The secondary voltage tolerance applied in the tolerance corner (fraction), null when none is stated. */
  toleranceFraction: number | null;
  converged: boolean;
  /** A conduction pulse ran past a mains zero crossing in some corner (the simulation's frame then errs). */
  overlap: boolean;
  rails: CrossRegulationRail[];
}

export interface JointRailInput {
  rail: RectifiedRail;
  /** Output current at a corner (A), the same as the rail's own simulation uses there. */
  loadA: (spec: CornerSpec) => number;
}

export interface TransformerJoint {
  /** Per rail id, per corner id: the voltages simulated together. */
  voltages: Map<string, Map<string, JointVoltages>>;
  /** Per corner id: every run converged / no pulse overlap. */
  converged: boolean;
  overlap: boolean;
  primaryOhm: number;
  primaryH: number;
  toleranceFraction: number | null;
  leakage: Map<string, { henry: number; fromRegulation: boolean }>;
  simulations: number;
}

/** A transformer's usable secondary tolerance (fraction), null when none is stated. */
export function toleranceOf(t: Transformer): number | null {
  const x = t.secondaryToleranceFraction ?? null;
  return x !== null && Number.isFinite(x) && x > 0 ? x : null;
}

/**
 * Primary leakage inductance (H): each winding's leakage (referred to it) times PRIMARY_LEAKAGE_SHARE, referred to
 * the primary by the turns ratio squared (L_p = L_s / k²), VA-weighted over the windings as the primary resistance is.
 * Source: impedance referral through an ideal transformer, Z_p = Z_s / k² (circuit theory).
 */
export function primaryLeakageH(t: Transformer, mains: Mains): number {
  const va = nameplateVA(t);
  if (!(va > 0)) return 0;
  let sum = 0;
  for (const w of t.windings) {
    const k = noLoadVrms(w) / mains.nominalV;
    if (!(k > 0)) continue;
    const l = windingLeakage(w, t.construction, mains.frequencyHz).henry;
    sum += ((PRIMARY_LEAKAGE_SHARE * l) / (k * k)) * Math.max(0, w.ratedVrms * w.ratedA);
  }
  const h = sum / va;
  return Number.isFinite(h) ? h : 0;
}

/** Joint simulations of one transformer's rails at the wanted corners; null when none of its rails is designed. */
export function simulateTransformer(
  t: Transformer, inputs: JointRailInput[], specs: CornerSpec[], mains: Mains, stepsPerCycle = 1000,
): TransformerJoint | null {
  const on = inputs.flatMap((x) => {
    const w = t.windings.find((y) => y.id === x.rail.windingId);
    return w ? [{ ...x, w }] : [];
  });
  if (!on.length) return null;
  const primaryOhm = primaryOhmFromRegulation(t, mains.nominalV);
  const primaryH = primaryLeakageH(t, mains);
  const tol = toleranceOf(t);
  const leakage = new Map(on.map(({ rail, w }) => [rail.id, windingLeakage(w, t.construction, mains.frequencyHz)]));
  const voltages = new Map(on.map(({ rail }) => [rail.id, new Map<string, JointVoltages>()]));
  let converged = true;
  let overlap = false;
  let simulations = 0;
  for (const spec of specs.filter((s) => JOINT_CORNER_IDS.includes(s.id))) {
    // the tolerance is the secondary's (its turns), not the mains': the primary stays at the corner's mains voltage
    const f = spec.mainsFactor * (spec.secondaryTolerance && tol !== null ? 1 - tol : 1);
    const windings: JointWinding[] = on.map(({ rail, w, loadA }) => ({
      topology: rail.topology, secondaryVrms: noLoadVrms(w) * f,
      // each winding keeps its own share of the copper and of the leakage; the primary's shares are shared
      ownOhm: (1 - PRIMARY_COPPER_SHARE) * windingResistanceOhm(w),
      ownH: (1 - PRIMARY_LEAKAGE_SHARE) * leakage.get(rail.id)!.henry,
      diodeDropV: rail.diodeDropV, diodeResistanceOhm: rail.diodeResistanceOhm, capacitanceF: rail.reservoirF,
      esrOhm: rail.esrOhm, loadA: loadA(spec), bleederOhm: rail.bleederOhm,
    }));
    const r = simulateSharedPrimary({
      primaryVrms: mains.nominalV * spec.mainsFactor, primaryOhm, primaryH, frequencyHz: mains.frequencyHz, windings,
      stepsPerCycle,
    });
    simulations++;
    converged &&= r.converged;
    overlap ||= r.overlap;
    on.forEach(({ rail }, i) => {
      const x = r.rails[i];
      voltages.get(rail.id)!.set(spec.id, {
        troughV: x.troughV, dcMeanV: x.dcMeanV, peakV: x.peakV, ripplePpV: x.peakV - x.troughV,
      });
    });
  }
  return { voltages, converged, overlap, primaryOhm, primaryH, toleranceFraction: tol, leakage, simulations };
}

export interface CrossRegulationRailInput {
  rail: RectifiedRail;
  windingName: string;
  requiredMinV: number;
  aloneTroughV: number;
}

/** The transformer's report and its one finding, from the joint simulation already run. */
export function crossRegulation(
  t: Transformer, joint: TransformerJoint, rails: CrossRegulationRailInput[], mains: Mains, lowFactor: number,
): { report: CrossRegulation; findings: Finding[] } {
  const at = (id: string, corner: string) => joint.voltages.get(id)?.get(corner)?.troughV ?? NaN;
  const out: CrossRegulationRail[] = rails.filter((x) => joint.voltages.has(x.rail.id)).map((x) => {
    const l = joint.leakage.get(x.rail.id)!;
    const tolV = joint.voltages.get(x.rail.id)?.get(TOLERANCE_ID)?.troughV;
    return {
      railId: x.rail.id, railName: x.rail.name, windingName: x.windingName, leakageH: l.henry,
      leakageFromRegulation: l.fromRegulation, requiredMinV: x.requiredMinV, aloneTroughV: x.aloneTroughV,
      keyDownTroughV: at(x.rail.id, WORST_VOLTAGE_ID), keyUpTroughV: at(x.rail.id, 'low-keyUp'),
      toleranceTroughV: tolV ?? null,
    };
  });
  const report: CrossRegulation = {
    primaryOhm: joint.primaryOhm, primaryH: joint.primaryH, mainsV: mains.nominalV * lowFactor,
    toleranceFraction: joint.toleranceFraction, converged: joint.converged, overlap: joint.overlap, rails: out,
  };
  const v = (x: number) => `${x.toFixed(2)} V`;
  const uh = (h: number) => (h >= 1e-3 ? `${(h * 1e3).toPrecision(3)} mH` : `${(h * 1e6).toPrecision(3)} µH`);
  const words = out.map((x) => `${x.railName} ${v(x.keyDownTroughV)} (${v(x.aloneTroughV)} alone, ` +
    `${v(x.keyUpTroughV)} key-up${x.toleranceTroughV !== null ? `, ${v(x.toleranceTroughV)} at −tolerance` : ''})`);
  const split = out.some((x) => x.leakageFromRegulation)
    ? ' Leakage not entered is estimated from the regulation figure (common practice, no published source).' : '';
  const findings: Finding[] = [{
    rule: 'transformer.cross-regulation', subject: t.name, unit: 'V', source: 'supply.shared-primary',
    severity: joint.converged && !joint.overlap ? 'ok' : 'caution', value: null, limit: null,
    message: `${t.name}'s windings simulated together, the primary shared (${joint.primaryOhm.toFixed(1)} Ω, ` +
      `${uh(joint.primaryH)} leakage), at low mains with the key down: ${words.join('; ')}. The headroom checks ` +
      `and the PA rail voltage use these troughs.${split}` +
      (joint.converged ? '' : ' The joint simulation did not settle; its troughs may be off.') +
      (joint.overlap ? ' A charging pulse ran past the mains zero crossing: the leakage is too large for this ' +
        'model and the troughs are approximate.' : ''),
  }];
  return { report, findings };
}
