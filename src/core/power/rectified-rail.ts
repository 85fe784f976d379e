// One rectified rail: simulate every corner, check headroom, reservoir, bleeder and fuse, recommend a winding.
import type { Finding } from '../findings';
import { sortFindings } from '../findings';
import type { Mains, PerMode, RectifiedRail, Transformer, Winding } from '../model';
import type { CornerSpec, RectifiedCorner, RectifiedRailReport, Recommendation } from './report-types';
import type { RectifierSimInput, RectifierSimResult } from './rectifier-sim';
import { simulateRectifier } from './rectifier-sim';
import { TOLERANCE_ID, cornerCurrent, worstIds } from './corners';
import type { JointVoltages } from './cross-regulation';
import { noLoadVrms, windingLeakage, windingResistanceOhm } from './winding';
import {
  minimumCapacitanceF,
  recommendedCapacitorV,
  reservoirFindings,
  standardCapacitanceF,
  textbookCapacitanceF,
} from './reservoir';
import { bleederFindings, bleederReport, bleederRecommendation } from './bleeder';
import { fittedFuseFindings, fuseMarking, railFuse } from './fuses';
import { recommendWinding } from './transformer';
import { windingFuseReport } from './winding-fuse';
import { rectifierLoss } from './rectifier-loss';
import { DEFAULT_SECONDARY_V } from './standard-values';

export interface RectifiedContext {
  mains: Mains;
  keyingDuty: number;
  specs: CornerSpec[];
  requiredMinV: number;
  requirementNote: string;
  /** True when the requirement comes from regulators or a stated value (so a winding voltage can be derived). */
  hasRequirement: boolean;
  standardSecondaryV?: readonly number[];
  capacitorRatingsV?: readonly number[];
  stepsPerCycle?: number;
  /** Voltages per corner id from all windings of its transformer simulated together (cross-regulation.ts); they
   *  replace this rail's own at those corners, so the checks use them. */
  joint?: Map<string, JointVoltages>;
  /** Output current per mode at high mains (a PA draws more from a higher rail), A; default: the nominal outputA. */
  highMainsOutputA?: PerMode;
  /**
   * False: leave out the reservoir and winding searches (minimum capacitance, recommended winding; about 40
   * simulations). evaluate()'s fixed-point passes before the last read only the corners. Default true.
   */
  searches?: boolean;
  /** What the winding recommendation is sized for: CW at the keying duty (default) or a continuous tune-up carrier. */
  sizing?: 'duty' | 'tune-up';
}

export interface RectifiedEvaluation {
  report: RectifiedRailReport;
  simulations: number;
  allConverged: boolean;
}

const fmt = (x: number, d = 2) => x.toFixed(d);

function zeroCorner(spec: CornerSpec, loadA: number, note: string): RectifiedCorner {
  return {
    ...spec,
    loadA,
    dcMeanV: 0,
    ripplePpV: 0,
    troughV: 0,
    peakV: 0,
    noLoadPeakV: 0,
    secondaryRmsA: 0,
    diodePeakA: 0,
    capacitorRippleRmsA: 0,
    conductionFraction: 0,
    surgeA: 0,
    headroomMarginV: 0,
    converged: false,
    cycles: 0,
    note,
  };
}

/** Simulation input for a rail at a mains factor and load current. */
export function simInputFor(
  rail: RectifiedRail,
  winding: Winding,
  frequencyHz: number,
  mainsFactor: number,
  loadA: number,
  steps?: number,
): RectifierSimInput {
  return {
    topology: rail.topology,
    secondaryVrms: noLoadVrms(winding) * mainsFactor,
    windingResistanceOhm: windingResistanceOhm(winding),
    frequencyHz,
    diodeDropV: rail.diodeDropV,
    diodeResistanceOhm: rail.diodeResistanceOhm,
    capacitanceF: rail.reservoirF,
    esrOhm: rail.esrOhm,
    load: { kind: 'current', currentA: loadA },
    bleederOhm: rail.bleederOhm,
    stepsPerCycle: steps,
  };
}

/** A rail's corners as simulated (the part of its design evaluate()'s fixed-point passes read). */
export interface RailCorners {
  corners: RectifiedCorner[];
  sims: Map<string, RectifierSimResult>;
  simulations: number;
  allConverged: boolean;
  /** Highest no-load peak of the high-mains corners (V). */
  highNoLoad: number;
}

/** Simulate every corner of `ctx.specs` (each rail's own simulation; volts from the joint one where it ran). */
export function railCorners(
  rail: RectifiedRail, winding: Winding | null, transformer: Transformer | null, outputA: PerMode,
  ctx: RectifiedContext,
): RailCorners {
  const ids = worstIds(true);
  let simulations = 0;
  let allConverged = true;
  const sims = new Map<string, RectifierSimResult>();
  const corners: RectifiedCorner[] = ctx.specs.map((spec) => {
    // A fixed-load PA draws current in proportion to its rail, so high-mains corners (heating) use their own budget
    const loadA = cornerCurrent(
      spec.mains === 'high' && ctx.highMainsOutputA ? ctx.highMainsOutputA : outputA,
      spec.load,
      ctx.keyingDuty,
    );
    if (!winding) return zeroCorner(spec, loadA, 'No winding selected for this rail.');
    // the tolerance corner: this transformer's secondary at the low end of its stated tolerance (none: nominal)
    const tol = spec.secondaryTolerance ? (transformer?.secondaryToleranceFraction ?? null) : null;
    const factor = spec.mainsFactor * (tol !== null && tol > 0 ? 1 - tol : 1);
    const label = spec.secondaryTolerance
      ? `Low mains, secondary ` +
        `${tol !== null && tol > 0 ? `−${fmt(tol * 100, 1).replace(/\.0$/, '')} %` : 'with no tolerance stated'}` +
        `, TX key-down`
      : spec.label;
    const input = simInputFor(rail, winding, ctx.mains.frequencyHz, factor, loadA, ctx.stepsPerCycle);
    const r = simulateRectifier({ ...input, waveformPoints: spec.id === ids.voltage ? 200 : 0 });
    simulations++;
    if (!r.converged) allConverged = false;
    sims.set(spec.id, r);
    const { waveform: _w, collapsed: _c, loadMeanA: _l, ...summary } = r;
    // volts from the transformer's joint simulation where it ran (currents stay this rail's own)
    const j = ctx.joint?.get(spec.id);
    const volts = j ? { ...j, aloneTroughV: r.troughV } : {};
    return {
      ...spec,
      label,
      loadA,
      ...summary,
      ...volts,
      headroomMarginV: (j?.troughV ?? r.troughV) - ctx.requiredMinV,
    };
  });
  const highNoLoad = Math.max(0, ...corners.filter((c) => c.mains === 'high').map((c) => c.noLoadPeakV));
  return { corners, sims, simulations, allConverged, highNoLoad };
}

export function evaluateRectifiedRail(
  rail: RectifiedRail,
  winding: Winding | null,
  transformer: Transformer | null,
  outputA: PerMode,
  ctx: RectifiedContext,
): RectifiedEvaluation {
  const findings: Finding[] = [];
  const recommendations: Recommendation[] = [];
  const ids = worstIds(true);
  const simulated = railCorners(rail, winding, transformer, outputA, ctx);
  const { corners, sims, allConverged, highNoLoad } = simulated;
  let simulations = simulated.simulations;
  const worst = corners.find((c) => c.id === ids.voltage) ?? corners[0];
  const thermal = corners.find((c) => c.id === ids.thermal) ?? corners[0];
  const tuneUp = corners.find((c) => c.id === ids.tuneUp) ?? corners[0];
  const source = 'design.simulation' as const;

  if (!winding) {
    findings.push({
      severity: 'fail',
      rule: 'rail.winding',
      subject: rail.name,
      value: null,
      limit: null,
      unit: '',
      source: 'design.consistency',
      message: `${rail.name} has no transformer winding; choose one.`,
    });
  }
  for (const c of corners) {
    if (c.note && winding)
      findings.push({
        severity: c.note.startsWith('The load pulls') || c.note.startsWith('Simulation not run') ? 'fail' : 'caution',
        rule: 'rectifier.simulation',
        subject: rail.name,
        value: null,
        limit: null,
        unit: '',
        source,
        message: `${c.label}: ${c.note}`,
      });
  }
  if (winding) {
    const base = {
      rule: 'rail.headroom',
      subject: rail.name,
      value: worst.troughV,
      limit: ctx.requiredMinV,
      unit: 'V',
      source,
    };
    if (!ctx.hasRequirement)
      findings.push({
        ...base,
        severity: worst.troughV < ctx.requiredMinV ? 'caution' : 'ok',
        message: `${worst.label}: the ripple trough of ${rail.name} is ${fmt(worst.troughV)} V; no regulator is fed ` +
          `and no lowest voltage is stated for its loads, so only the ${fmt(ctx.requiredMinV)} V margin is ` +
          `checked${worst.troughV < ctx.requiredMinV ? ' (and it is not met)' : ''}. State the lowest voltage its ` +
          `loads need on the supply page.`,
      });
    else if (worst.troughV < ctx.requiredMinV)
      findings.push({
        ...base,
        severity: 'fail',
        message: `${worst.label}: ${rail.name} dips to ${fmt(worst.troughV)} V at the ripple trough, below the ` +
          `${fmt(ctx.requiredMinV)} V it needs (${ctx.requirementNote}).`,
      });
    else
      findings.push({
        ...base,
        severity: 'ok',
        message: `${worst.label}: the ripple trough of ${rail.name}, ${fmt(worst.troughV)} V, stays above the ` +
          `${fmt(ctx.requiredMinV)} V needed (${ctx.requirementNote}).`,
      });
    const tolC = corners.find((c) => c.id === TOLERANCE_ID);
    if (tolC && ctx.hasRequirement && worst.troughV >= ctx.requiredMinV && tolC.troughV < ctx.requiredMinV) {
      findings.push({
        ...base,
        rule: 'rail.headroom-tolerance',
        value: tolC.troughV,
        source: 'supply.secondary-tolerance',
        severity: 'caution',
        message: `${tolC.label}: ${rail.name} dips to ${fmt(tolC.troughV)} V, below the ${fmt(ctx.requiredMinV)}` +
          ` V it needs (${ctx.requirementNote}); a transformer at the low end of its tolerance would not do. Measure ` +
          `the fitted one's no-load voltage, or choose the next winding voltage up.`,
      });
    }
    if (rail.topology === 'half-wave')
      findings.push({
        severity: 'caution',
        rule: 'rectifier.half-wave',
        subject: rail.name,
        value: null,
        limit: null,
        unit: '',
        source: 'supply.half-wave',
        message: `${rail.name}: a half-wave rectifier puts direct current through the winding, which can saturate a ` +
          `small transformer's core and doubles the ripple; prefer a bridge or centre-tap.`,
      });
  }

  // Reservoir
  const ripTarget = rail.ripplePpTargetV !== null && rail.ripplePpTargetV > 0 ? rail.ripplePpTargetV : null;
  const minF =
    winding && ripTarget !== null && ctx.searches !== false
      ? minimumCapacitanceF(
          simInputFor(rail, winding, ctx.mains.frequencyHz, worst.mainsFactor, worst.loadA),
          ripTarget,
          worst.loadA,
        )
      : null;
  const thermalRippleA = Math.sqrt(
    ctx.keyingDuty * sq(cornerVal(corners, 'high-keyDown', 'capacitorRippleRmsA')) +
      (1 - ctx.keyingDuty) * sq(cornerVal(corners, 'high-keyUp', 'capacitorRippleRmsA')),
  );
  const reservoir = {
    fittedF: Number.isFinite(rail.reservoirF) ? rail.reservoirF : 0,
    ripplePpTargetV: ripTarget,
    minimumF: minF,
    textbookF:
      ripTarget !== null ? textbookCapacitanceF(rail.topology, worst.loadA, ctx.mains.frequencyHz, ripTarget) : null,
    standardF: standardCapacitanceF(minF),
    noLoadPeakHighV: highNoLoad,
    recommendedRatedV: recommendedCapacitorV(highNoLoad, ctx.capacitorRatingsV),
    thermalRippleA,
    tuneUpRippleA: tuneUp.capacitorRippleRmsA,
  };
  const fin = (x: number | null) => (x !== null && Number.isFinite(x) ? x : null);
  if (winding)
    findings.push(
      ...reservoirFindings(
        rail.name,
        fin(rail.capacitorRatedV),
        highNoLoad,
        fin(rail.capacitorRippleA),
        thermalRippleA,
        tuneUp.capacitorRippleRmsA,
        ripTarget,
        worst.ripplePpV,
      ),
    );
  recommendations.push({
    topic: 'reservoir',
    text: `${reservoir.standardF !== null ? fmtF(reservoir.standardF) + ', ' : ''}rated ` +
      `${reservoir.recommendedRatedV ?? '?'} V or more, ripple current ` +
      `${fmt(Math.max(thermalRippleA, tuneUp.capacitorRippleRmsA))} A RMS or more at ${2 * ctx.mains.frequencyHz} Hz`,
    reasoning:
      `${
        ripTarget !== null
          ? minF !== null
            ? `The simulation needs at least ${fmtF(minF)} for ${ripTarget} V p-p at low mains, key-down (the ` +
              `textbook I/(2fC) estimate, ${fmtF(reservoir.textbookF ?? 0)}, is conservative). `
            : `The ${ripTarget} V p-p target cannot be met with this winding and load. `
          : 'No ripple target set. '
      }The no-load peak at high mains is ${fmt(highNoLoad, 1)} V; a 20 % margin gives the voltage rating. ` +
      `Ripple current is from the simulation (thermal load; continuous carrier ${fmt(tuneUp.capacitorRippleRmsA)} A).`,
    source: 'supply.reservoir-plan',
  });

  // Bleeder
  const bleeder = bleederReport(rail.reservoirF, highNoLoad, rail.esrOhm, rail.bleederOhm, rail.bleederRatedW ?? null);
  if (winding) findings.push(...bleederFindings(rail.name, bleeder));
  // a fitted bleeder that meets the target is kept; the suggested value is then what a new build would fit
  const bleederPlan = bleederRecommendation(bleeder);
  if (bleederPlan) recommendations.push(bleederPlan);

  // Rail fuse
  const fuse = railFuse(
    Math.max(outputA.keyDown, ctx.highMainsOutputA?.keyDown ?? 0),
    'on the DC side after the reservoir',
  );
  findings.push(...fittedFuseFindings(`${rail.name} fuse`, rail.fuseA, fuse));
  recommendations.push({
    topic: 'fuse',
    text: fuse.ratedA !== null ? `${fuseMarking(fuse.ratedA)} rail fuse` : 'Rail fuse: see reasoning',
    reasoning: fuse.reasoning,
    source: 'supply.fuse',
  });
  if (winding) {
    const loss = rectifierLoss(rail.topology, rail.diodeDropV, rail.diodeResistanceOhm, corners, ctx.keyingDuty);
    recommendations.push({
      topic: 'rectifier',
      text: `Diodes rated ${fmt(Math.max(...corners.map((c) => c.diodePeakA)), 1)} A repetitive peak and ` +
        `${fmt(Math.max(...corners.map((c) => c.surgeA)), 0)} A surge or more; they dissipate ${fmt(loss.thermalW)}` +
        ` W in CW use (${fmt(loss.keyDownW)} W key-down or tune-up)`,
      reasoning: `Dissipation from the simulated currents at high mains, Vf x I_avg + r_d x I_rms² per diode. The ` +
        `simulated repetitive peak current and the switch-on surge into a discharged ${fmtF(rail.reservoirF)}` +
        ` reservoir (EMF peak over winding, diode and ESR resistance) at high mains. The bridge's non-repetitive ` +
        `surge rating (IFSM) must exceed the surge.`,
      source: 'supply.surge',
    });
  }

  // Fuse in the winding lead, ahead of the rectifier, and the winding's fault currents
  const lowF = ctx.specs.find((s) => s.mains === 'low')?.mainsFactor ?? 1;
  const highF = ctx.specs.find((s) => s.mains === 'high')?.mainsFactor ?? 1;
  const leakageH = winding
    ? windingLeakage(winding, transformer?.construction ?? 'laminated', ctx.mains.frequencyHz).henry
    : 0;
  const wf = winding
    ? windingFuseReport({
        rail,
        winding,
        corners,
        mainsNominalV: ctx.mains.nominalV,
        lowFactor: lowF,
        highFactor: highF,
        leakageH,
        frequencyHz: ctx.mains.frequencyHz,
      })
    : null;
  if (wf) {
    findings.push(...wf.findings);
    const r = wf.report;
    recommendations.push({
      topic: 'fuse',
      text:
        r.fuse.ratedA !== null
          ? `${fuseMarking(r.fuse.ratedA)} fuse in the ${winding!.name} lead, before the rectifier`
          : 'Winding fuse: see reasoning',
      reasoning: `${r.fuse.reasoning} ${r.reasoning}`,
      source: 'supply.fuse-clearing',
    });
  }

  // Winding recommendation
  const winding_ =
    winding && ctx.searches !== false
      ? recommendWinding({
          rail,
          winding,
          corners,
          keyingDuty: ctx.keyingDuty,
          requiredMinV: ctx.hasRequirement ? ctx.requiredMinV : null,
          frequencyHz: ctx.mains.frequencyHz,
          mainsNominalV: ctx.mains.nominalV,
          lowFactor: worst.mainsFactor,
          keyDownA: worst.loadA,
          standardSecondaryV: ctx.standardSecondaryV ?? DEFAULT_SECONDARY_V,
          construction: transformer?.construction ?? 'laminated',
          sizing: ctx.sizing,
        })
      : null;
  if (winding_) {
    simulations += winding_.simulations;
    findings.push(...winding_.findings);
    recommendations.push(winding_.recommendation);
  }

  const waveform = sims.get(ids.voltage)?.waveform ?? { timeS: [], outputV: [], windingA: [] };
  return {
    report: {
      kind: 'rectified',
      railId: rail.id,
      railName: rail.name,
      topology: rail.topology,
      requiredMinV: ctx.requiredMinV,
      requirementNote: ctx.requirementNote,
      outputA,
      corners,
      worstVoltageCornerId: worst.id,
      worstThermalCornerId: thermal.id,
      waveform,
      winding: winding_?.result ?? null,
      reservoir,
      bleeder,
      fuse,
      windingFuse: wf?.report ?? null,
      rectifierLoss: rectifierLoss(rail.topology, rail.diodeDropV, rail.diodeResistanceOhm, corners, ctx.keyingDuty),
      findings: sortFindings(findings),
      recommendations,
    },
    simulations,
    allConverged,
  };
}

const sq = (x: number) => x * x;
function cornerVal(corners: RectifiedCorner[], id: string, key: 'capacitorRippleRmsA' | 'secondaryRmsA'): number {
  return corners.find((c) => c.id === id)?.[key] ?? 0;
}
function fmtF(f: number): string {
  return f >= 1e-6 ? `${Number((f * 1e6).toPrecision(3))} µF` : `${Number((f * 1e9).toPrecision(3))} nF`;
}
function fmtOhm(r: number): string {
  return r >= 1000 ? `${Number((r / 1000).toPrecision(3))} kΩ` : `${Number(r.toPrecision(3))} Ω`;
}
