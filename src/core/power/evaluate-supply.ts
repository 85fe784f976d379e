// Entry point of the mains-supply design engine: evaluateSupply(project, railOutputA, options) -> SupplyReport.
// Pure: no I/O, no clock. The caller (the current budget) supplies the output current of every rail per mode.
import type { Finding } from '../findings';
import { sortFindings } from '../findings';
import type {
  BatteryRail,
  Mains,
  PerMode,
  Project,
  RectifiedRail,
  RegulatedRail,
  Transformer,
  Winding,
} from '../model';
import { MODES, MODE_LABELS } from '../model';
import type {
  BatteryRailReport, CornerSpec, PrimaryReport, RailReport, RectifiedRailReport, ReservoirReport, SupplyReport,
  TransformerReport, WindingRecommendation,
} from './report-types';
import {
  DEFAULT_TRANSMIT_FRACTION,
  WORST_VOLTAGE_ID,
  cornerCurrent,
  cornerSpecs,
  mainsFactor,
  safeDuty,
} from './corners';
import { evaluateRectifiedRail, railCorners, type RectifiedContext } from './rectified-rail';
import { resultScope } from './rectifier-sim';
import type { RailVoltage } from './regulated-rail';
import { evaluateRegulatedRail } from './regulated-rail';
import { regulatorOutputV } from './regulator';
import { batteryFindings, batteryRuntime, loadedEndV } from './battery';
import { batteryCurve, batteryCurveFindings } from './battery-curve';
import { inrushFindings, inrushReport } from './inrush';
import { crossRegulation, simulateTransformer, toleranceOf, type TransformerJoint } from './cross-regulation';
import { fittedFuseFindings, fuseMarking, primaryFuse, railFuse } from './fuses';
import { transformerReport } from './transformer';
import { primaryFaultChecks, primaryFaultFindings, railsReported } from './primary-fault';
import { treeRoots, checkSupplyInputs } from './supply-inputs';
import { usablePositive } from '../numeric';
import { supplyChoices } from '../spec/supply-choices';
import { bridgeThermal, bridgeThermalFindings } from '../thermal/bridge';
import { insideNote } from '../thermal/inside';
import { reservoirFall, withRegulatedBleeder, type FallTime } from './regulated-bleeder';

export interface SupplyOptions {
  /** Standard secondary voltages to choose from (V RMS); default DEFAULT_SECONDARY_V. */
  standardSecondaryV?: readonly number[];
  /** Standard transformer ratings (VA); default DEFAULT_TRANSFORMER_VA. */
  standardVA?: readonly number[];
  /** Capacitor voltage ratings (V); default DEFAULT_CAPACITOR_V. */
  capacitorRatingsV?: readonly number[];
  /** Transmit share of operating time for battery runtime (0..1); default 0.2 (80 % receive / 20 % transmit). */
  transmitFraction?: number;
  /** Integration steps per mains cycle (default 1000). */
  stepsPerCycle?: number;
  /** Output current per rectified rail id and mode at high mains (PA current rises with its rail), A. */
  highMainsOutputA?: Record<string, PerMode>;
  /** False: no reservoir or winding searches on rectified rails (see RectifiedContext.searches). Default true. */
  searches?: boolean;
  /** Only these corners (CornerSpec ids), for a caller that reads no others; default all. */
  cornerIds?: readonly string[];
  /** Air inside the enclosure (°C) when its rise is known: the ambient of the rectifier and regulator checks. */
  insideC?: number;
  /** designSupply only (designPass): rectified rails get their corners and no more, in `passRails`. */
  cornersOnly?: boolean;
}

/**
 * What evaluate()'s fixed-point passes read of a source rail: a rectified rail's corners and high-mains no-load peak,
 * a battery rail's report.
 */
export type PassRail =
  | (Pick<RectifiedRailReport, 'kind' | 'railId' | 'corners'> & { reservoir: Pick<ReservoirReport, 'noLoadPeakHighV'> })
  | BatteryRailReport;

const ZERO: PerMode = { receive: 0, keyUp: 0, keyDown: 0 };
const FALLBACK_MAINS: Mains = { nominalV: 230, frequencyHz: 50, lowFraction: 0.1, highFraction: 0.1 };

/** What a rail must give at its lowest: its regulators' input needs (plus margin) or the minimum stated for its direct
 *  loads, whichever is higher; `has` is false when neither is known. */
function requirement(
  marginV: number,
  children: RegulatedRail[],
  stated: number | null,
): { v: number; note: string; has: boolean } {
  const margin = Number.isFinite(marginV) ? Math.max(0, marginV) : 0;
  // Source: three-terminal regulator datasheets, input >= output + dropout at the ripple low point (ref §6.1, §6.2)
  const regNeed = children.map((c) => ({ c, v: regulatorOutputV(c.setting, c.quiescentA) + Math.max(0, c.dropoutV) }));
  const top = regNeed.reduce<{ c: RegulatedRail; v: number } | null>((a, b) => (a === null || b.v > a.v ? b : a), null);
  const st = stated;
  if (top) {
    const v = top.v + margin;
    if (st !== null && st > v) return { v: st, note: 'the lowest voltage stated for its loads', has: true };
    return { v, note: `${top.c.name}: output + dropout${margin > 0 ? ` + ${margin} V margin` : ''}`, has: true };
  }
  if (st !== null) return { v: st, note: 'the lowest voltage stated for its loads', has: true };
  return {
    v: margin,
    note: `no regulator fed: only the rail's ${margin} V margin above 0 V is required; state a minimum for its ` +
      `direct loads`,
    has: false,
  };
}

export function evaluateSupply(
  projectIn: Project,
  railOutputA: Record<string, PerMode>,
  options: SupplyOptions = {},
): SupplyReport {
  return supplyInAir(designSupply(projectIn, railOutputA, options), options.insideC);
}

/**
 * The supply designed up to the checks that depend on the air around its parts (the rectifiers' and regulators'
 * thermal checks, from the regulated rails on): supplyInAir finishes it for an ambient, as often as asked, without
 * simulating again. evaluateSupply(p, a, o) is supplyInAir(designSupply(p, a, o), o.insideC).
 */
export interface DesignedSupply {
  project: Project;
  railOutputA: Record<string, PerMode>;
  options: SupplyOptions;
  choices: ReturnType<typeof supplyChoices>;
  inputs: ReturnType<typeof checkSupplyInputs>;
  duty: number;
  txFraction: number;
  mainsOk: boolean;
  specs: CornerSpec[];
  globalFindings: readonly Finding[];
  noBudget: ReadonlySet<string>;
  undesigned: ReadonlyMap<string, string>;
  reports: ReadonlyMap<string, RailReport>;
  voltageAt: ReadonlyMap<string, Record<string, RailVoltage>>;
  maxV: ReadonlyMap<string, number>;
  rootBattery: ReadonlyMap<string, boolean>;
  falls: ReadonlyMap<string, FallTime | null>;
  windingRecs: ReadonlyMap<string, WindingRecommendation[]>;
  usedWindings: ReadonlyMap<string, string[]>;
  joints: ReadonlyMap<string, TransformerJoint>;
  /** With `cornersOnly`: each designed rectified rail's corners and no-load peak (its report is not made). */
  passRails: ReadonlyMap<string, PassRail>;
  simulations: number;
  allConverged: boolean;
}

/** A rail's output budget, cleaned; a rail with none is unloaded, said once per rail in `findings`. */
function budgetLookup(railOutputA: Record<string, PerMode>, noBudget: Set<string>, findings: Finding[]) {
  return (id: string): PerMode => {
    const b = railOutputA[id];
    if (!b) {
      // said once per rail however often its budget is asked for
      if (!noBudget.has(id) && noBudget.add(id))
        findings.push({
          severity: 'caution',
          rule: 'supply.budget',
          subject: id,
          value: null,
          limit: null,
          unit: 'A',
          source: 'design.consistency',
          message: `No current budget for rail "${id}": it is treated as unloaded.`,
        });
      return ZERO;
    }
    const clean = (x: number) => (Number.isFinite(x) && x > 0 ? x : 0);
    return { receive: clean(b.receive), keyUp: clean(b.keyUp), keyDown: clean(b.keyDown) };
  };
}

export function designSupply(
  projectIn: Project, railOutputA: Record<string, PerMode>, options: SupplyOptions = {},
): DesignedSupply {
  const project = projectIn;
  const choices = supplyChoices(project.supply);
  // how each rail falls after switch-off (null: a battery holds it up), for the bleeders of the rails it feeds
  const falls = new Map<string, FallTime | null>();
  // inputs outside their field definitions: a fail finding each, and the item (with its dependants) is left out
  const inputs = supplyInputs(project.supply);
  const duty = safeDuty(project.keyingDuty);
  const txFraction =
    options.transmitFraction !== undefined && Number.isFinite(options.transmitFraction)
      ? Math.min(1, Math.max(0, options.transmitFraction))
      : DEFAULT_TRANSMIT_FRACTION;
  // Usable, not merely > 0: the primary current divides by the mains voltage (5e-324 V made it Infinity)
  const m0 = project.mains;
  const mainsOk = m0 !== null && usablePositive(m0.nominalV, 1) && usablePositive(m0.frequencyHz, 1);
  const wanted = options.cornerIds;
  const tolerance = project.supply.transformers.some((t) => toleranceOf(t) !== null);
  const specs = cornerSpecs(project.mains, duty, tolerance).filter((s) => !wanted || wanted.includes(s.id));
  const rails = project.supply.rails;
  const globalFindings: Finding[] = [...inputs.findings];
  if (project.mains && !mainsOk) {
    globalFindings.push({
      severity: 'fail',
      rule: 'mains.values',
      subject: 'Mains',
      value: project.mains.nominalV,
      limit: null,
      unit: 'V',
      source: 'design.consistency',
      message: 'The mains voltage must be at least 1 V and its frequency at least 1 Hz.',
    });
  }
  const windings = new Map<string, { w: Winding; t: Transformer }>();
  for (const t of project.supply.transformers) for (const w of t.windings) windings.set(w.id, { w, t });
  const childrenOf = (id: string) =>
    rails.filter((r): r is RegulatedRail => r.kind === 'regulated' && r.parentId === id);
  const undesigned = unknownLoadRails(rails, railOutputA, options.highMainsOutputA ?? {});
  for (const [id, why] of undesigned) {
    if (inputs.leftOut.has(id)) continue;
    const name = rails.find((r) => r.id === id)?.name ?? id;
    globalFindings.push({
      severity: 'fail',
      rule: 'supply.unknown-load',
      subject: name,
      value: null,
      limit: null,
      unit: 'A',
      source: 'design.consistency',
      message: `${name} is not designed: ${why}`,
    });
  }
  for (const [id, why] of inputs.leftOut) {
    const name = rails.find((r) => r.id === id)?.name ?? id;
    undesigned.set(id, why);
    globalFindings.push({
      severity: 'fail',
      rule: 'supply.refused-input',
      subject: name,
      value: null,
      limit: null,
      unit: '',
      source: 'design.input',
      message: `${name} is not designed: ${why}`,
    });
  }
  const noBudget = new Set<string>();
  const budget = budgetLookup(railOutputA, noBudget, globalFindings);

  const highBudget = (id: string): PerMode | undefined => {
    const b = options.highMainsOutputA?.[id];
    if (!b) return undefined;
    const base = budget(id);
    const clean = (x: number, floor: number) => (Number.isFinite(x) && x > floor ? x : floor);
    // never below the nominal budget: the high-mains corner is the heating one
    return {
      receive: clean(b.receive, base.receive),
      keyUp: clean(b.keyUp, base.keyUp),
      keyDown: clean(b.keyDown, base.keyDown),
    };
  };

  const reports = new Map<string, RailReport>();
  const voltageAt = new Map<string, Record<string, RailVoltage>>();
  const maxV = new Map<string, number>();
  const rootBattery = new Map<string, boolean>();
  const windingRecs = new Map<string, WindingRecommendation[]>();
  const usedWindings = new Map<string, string[]>();
  const passRails = new Map<string, PassRail>();
  let simulations = 0;
  let allConverged = true;

  const designable = (r: { id: string }) => !undesigned.has(r.id);
  // one transformer, one simulation: the deciding corners of its rails simulated together (cross-regulation.ts)
  const joints = new Map<string, TransformerJoint>();
  for (const t of mainsOk ? project.supply.transformers : []) {
    if (inputs.unsized.has(t.id)) continue;
    const on = rails.filter(
      (r): r is RectifiedRail =>
        r.kind === 'rectified' && designable(r) && t.windings.some((w) => w.id === r.windingId),
    );
    const load = (rail: RectifiedRail) => (s: CornerSpec) =>
      cornerCurrent(s.mains === 'high' ? (highBudget(rail.id) ?? budget(rail.id)) : budget(rail.id), s.load, duty);
    const j = simulateTransformer(
      t,
      on.map((rail) => ({ rail, loadA: load(rail) })),
      specs,
      project.mains!,
      options.stepsPerCycle,
    );
    if (!j) continue;
    joints.set(t.id, j);
    simulations += j.simulations;
    allConverged = allConverged && j.converged;
  }
  for (const rail of rails.filter((r): r is RectifiedRail => r.kind === 'rectified' && designable(r))) {
    const wt = windings.get(rail.windingId) ?? null;
    usedWindings.set(rail.windingId, [...(usedWindings.get(rail.windingId) ?? []), rail.name]);
    const req = requirement(rail.marginV, childrenOf(rail.id), rail.minimumV ?? null);
    const ctx: RectifiedContext = {
      mains: mainsOk ? project.mains! : FALLBACK_MAINS,
      keyingDuty: duty,
      specs,
      requiredMinV: req.v,
      requirementNote: req.note,
      hasRequirement: req.has,
      standardSecondaryV: options.standardSecondaryV,
      capacitorRatingsV: options.capacitorRatingsV,
      stepsPerCycle: options.stepsPerCycle,
      highMainsOutputA: highBudget(rail.id),
      searches: options.searches,
      sizing: choices.transformerSizing,
      joint: wt ? joints.get(wt.t.id)?.voltages.get(rail.id) : undefined,
    };
    if (options.cornersOnly) {
      // the same simulations in the same order; the rest of the rail's design is left out (designPass)
      const c = railCorners(rail, mainsOk ? (wt?.w ?? null) : null, wt?.t ?? null, budget(rail.id), ctx);
      simulations += c.simulations;
      allConverged = allConverged && c.allConverged;
      const reservoir = { noLoadPeakHighV: c.highNoLoad };
      passRails.set(rail.id, { kind: 'rectified', railId: rail.id, corners: c.corners, reservoir });
      continue;
    }
    const ev = evaluateRectifiedRail(rail, mainsOk ? (wt?.w ?? null) : null, wt?.t ?? null, budget(rail.id), ctx);
    if (!mainsOk)
      ev.report.findings.unshift({
        severity: 'fail',
        rule: 'rail.mains',
        subject: rail.name,
        value: null,
        limit: null,
        unit: '',
        source: 'design.consistency',
        message: `${rail.name} is a mains-rectified rail but the project has no valid mains supply.`,
      });
    simulations += ev.simulations;
    allConverged = allConverged && ev.allConverged;
    reports.set(rail.id, ev.report);
    voltageAt.set(
      rail.id,
      Object.fromEntries(
        ev.report.corners.map((c) => [c.id, { troughV: c.troughV, meanV: c.dcMeanV, ripplePpV: c.ripplePpV }]),
      ),
    );
    maxV.set(rail.id, Math.max(0, ...ev.report.corners.map((c) => c.noLoadPeakV)));
    falls.set(rail.id, reservoirFall(maxV.get(rail.id)!, rail.reservoirF, rail.bleederOhm));
    rootBattery.set(rail.id, false);
    if (ev.report.winding && wt) windingRecs.set(wt.t.id, [...(windingRecs.get(wt.t.id) ?? []), ev.report.winding]);
  }

  for (const b of rails.filter((r): r is BatteryRail => r.kind === 'battery' && designable(r))) {
    const out = budget(b.id);
    const children = childrenOf(b.id);
    const req = requirement(0, children, b.minimumV ?? null);
    const loadedEnd = loadedEndV(b, out.keyDown);
    const runtime = batteryRuntime(b, out, duty, txFraction);
    const curve = batteryCurve(b, out.keyDown, runtime.averageA, req.has ? req.v : 0);
    const fuse = railFuse(out.keyDown, 'as close to the battery terminal as possible');
    const r = Number.isFinite(b.internalOhm) && b.internalOhm > 0 ? b.internalOhm : 0;
    const at: Record<string, RailVoltage> = {};
    for (const s of specs) {
      const base = s.mains === 'low' ? b.endV : s.mains === 'high' ? b.fullV : b.nominalV;
      // Thevenin source model, V = E - I R
      const v = Math.max(0, (Number.isFinite(base) ? base : 0) - cornerCurrent(out, s.load, duty) * r);
      at[s.id] = { troughV: v, meanV: v, ripplePpV: 0 };
    }
    voltageAt.set(b.id, at);
    maxV.set(b.id, Number.isFinite(b.fullV) ? b.fullV : 0);
    rootBattery.set(b.id, true);
    falls.set(b.id, null);
    const report: BatteryRailReport = {
      kind: 'battery',
      railId: b.id,
      railName: b.name,
      fullV: b.fullV,
      endV: b.endV,
      loadedEndV: loadedEnd,
      requiredMinV: req.v,
      receiveFraction: 1 - txFraction,
      averageA: runtime.averageA,
      runtimeS: runtime.runtimeS,
      outputA: out,
      fuse,
      curve,
      pa: null,
      findings: sortFindings([
        ...batteryFindings(
          b,
          req.has ? req.v : 0,
          loadedEnd,
          runtime,
          b.minimumV !== null && req.v === b.minimumV ? 'its loads' : 'the regulators',
        ),
        ...batteryCurveFindings(b, curve, runtime.runtimeS),
        ...fittedFuseFindings(`${b.name} fuse`, null, fuse),
      ]),
      recommendations: [
        {
          topic: 'fuse',
          text:
            fuse.ratedA !== null ? `${fuseMarking(fuse.ratedA)} fuse at the battery` : 'Battery fuse: see reasoning',
          reasoning: `${fuse.reasoning} A battery can deliver hundreds of amperes into a short; the fuse protects ` +
            `the wiring.`,
          source: 'supply.fuse',
        },
        {
          topic: 'battery',
          text: `About ${(runtime.runtimeS / 3600).toFixed(1)} h at ${Math.round((1 - txFraction) * 100)} % receive ` +
            `/ ${Math.round(txFraction * 100)} % transmit`,
          reasoning: `Transmit current = key-down x ${duty} + key-up x ${(1 - duty).toFixed(2)} = ` +
            `${runtime.transmitA.toFixed(3)} A; average ${runtime.averageA.toFixed(3)} A from ` +
            `${(b.capacityAh * b.usableFraction).toFixed(1)} Ah usable.`,
          source: 'supply.battery-runtime',
        },
      ],
    };
    reports.set(b.id, report);
  }
  return {
    project, railOutputA, options, choices, inputs, duty, txFraction, mainsOk, specs, globalFindings, noBudget,
    undesigned, reports, voltageAt, maxV, rootBattery, falls, windingRecs, usedWindings, joints, simulations,
    allConverged, passRails,
  };
}

/** checkSupplyInputs once per supply within one evaluation (every fixed-point pass checks the same inputs). */
function supplyInputs(supply: Project['supply']): ReturnType<typeof checkSupplyInputs> {
  const memo = resultScope<{ of: Project['supply']; inputs: ReturnType<typeof checkSupplyInputs> }>('supply-inputs');
  const held = memo?.get('last');
  if (held && held.of === supply) return held.inputs;
  const inputs = checkSupplyInputs(supply);
  memo?.set('last', { of: supply, inputs });
  return inputs;
}

/**
 * The source rails as a fixed-point pass reads them (PassRail): the design's simulations, in the same order and with
 * the same inputs as designSupply's, without the rest of each rectified rail's design (reservoir, bleeder, fuses,
 * findings: about a third of a pass). Null when a number in them is not finite: the caller then designs the pass in
 * full (designSupply, its simulations memo hits) and reads it as before, so what a pass reads is the same either way.
 */
export function designPass(
  project: Project, railOutputA: Record<string, PerMode>, options: SupplyOptions = {},
): PassRail[] | null {
  const d = designSupply(project, railOutputA, { ...options, cornersOnly: true });
  const out = project.supply.rails.flatMap((r): PassRail[] => {
    const lite = d.passRails.get(r.id);
    if (lite) return [lite];
    const rep = d.reports.get(r.id);
    return rep?.kind === 'battery' ? [rep] : [];
  });
  return allFinite(out) ? out : null;
}

/**
 * The design's rectified and battery rail reports as the finished report carries them, for a caller that reads only
 * their corners and voltages (evaluate()'s fixed-point passes); null when a number in them is not finite (the finished
 * report's safety net would change it to 0): finish the design with supplyInAir then.
 */
export function designedSourceRails(d: DesignedSupply): RailReport[] | null {
  const out = d.project.supply.rails.flatMap((r) => {
    const rep = d.reports.get(r.id);
    return rep && (rep.kind === 'rectified' || rep.kind === 'battery') ? [rep] : [];
  });
  return allFinite(out) ? out : null;
}

/**
 * The designed supply finished with its parts in air at insideC (°C) when the enclosure's rise is known, else the
 * room: the rectifiers' thermal checks, the regulated rails, transformers and primary. The design is left as it was.
 */
export function supplyInAir(d: DesignedSupply, insideC?: number): SupplyReport {
  const { project, options, choices, inputs, duty, txFraction, mainsOk, specs, undesigned } = d;
  const { windingRecs, usedWindings, joints, simulations, allConverged } = d;
  const rails = project.supply.rails;
  // the thermal checks of parts in the box use the air inside it when the enclosure's rise is known
  const inside = insideC !== undefined && Number.isFinite(insideC);
  const airC = inside ? insideC! : project.ambientC;
  // copies: each ambient's finish starts from the same design
  const globalFindings = [...d.globalFindings];
  const budget = budgetLookup(d.railOutputA, new Set(d.noBudget), globalFindings);
  const reports = new Map(d.reports);
  const voltageAt = new Map(d.voltageAt);
  const maxV = new Map(d.maxV);
  const rootBattery = new Map(d.rootBattery);
  const falls = new Map(d.falls);
  const designable = (r: { id: string }) => !undesigned.has(r.id);
  const childrenOf = (id: string) =>
    rails.filter((r): r is RegulatedRail => r.kind === 'regulated' && r.parentId === id);
  for (const rail of rails.filter((r): r is RectifiedRail => r.kind === 'rectified' && designable(r))) {
    const report = reports.get(rail.id);
    if (report?.kind !== 'rectified') continue;
    const loss = report.rectifierLoss;
    const bt = bridgeThermal({
      railName: rail.name,
      thermalW: loss.thermalW,
      tuneUpW: loss.tuneUpW,
      basis: choices.transformerSizing,
      mount: rail.bridgeMount,
      freeAirKPerW: rail.bridgeFreeAirKPerW,
      ambientC: airC,
      inside,
    });
    const findings = sortFindings([...report.findings, ...bridgeThermalFindings(rail.name, bt)]);
    reports.set(rail.id, { ...report, bridgeThermal: bt, findings });
  }

  // Regulated rails in dependency order (a rail whose parent is missing or in a loop gets 0 V input).
  const pending = rails.filter((r): r is RegulatedRail => r.kind === 'regulated' && designable(r));
  for (let guard = 0; pending.length > 0 && guard <= rails.length; guard++) {
    for (let i = 0; i < pending.length; ) {
      const rr = pending[i];
      if (!voltageAt.has(rr.parentId)) {
        i++;
        continue;
      }
      const ev = evaluateRegulatedRail(
        rr,
        budget(rr.id),
        specs,
        voltageAt.get(rr.parentId)!,
        maxV.get(rr.parentId) ?? 0,
        rootBattery.get(rr.parentId) ?? false,
        duty,
        airC,
      );
      const parentName = rails.find((x) => x.id === rr.parentId)?.name ?? rr.parentId;
      const bl = withRegulatedBleeder(ev.report, rr, parentName, falls.get(rr.parentId) ?? null);
      falls.set(rr.id, bl.fall);
      reports.set(rr.id, {
        ...bl.report,
        findings: sortFindings(insideNote(bl.report.findings, inside ? airC : null, project.ambientC)),
      });
      voltageAt.set(rr.id, ev.outputAt);
      maxV.set(rr.id, ev.report.outputV);
      rootBattery.set(rr.id, rootBattery.get(rr.parentId) ?? false);
      pending.splice(i, 1);
    }
  }
  for (const rr of pending) {
    const ev = evaluateRegulatedRail(rr, budget(rr.id), specs, {}, 0, false, duty, airC);
    ev.report.findings.unshift({
      severity: 'fail',
      rule: 'supply.parent',
      subject: rr.name,
      value: null,
      limit: null,
      unit: '',
      source: 'design.consistency',
      message: `${rr.name} has no valid source rail (missing or fed by itself).`,
    });
    reports.set(rr.id, ev.report);
  }

  for (const [wid, names] of usedWindings) {
    if (names.length > 1)
      globalFindings.push({
        severity: 'caution',
        rule: 'transformer.shared-winding',
        subject: names.join(', '),
        value: names.length,
        limit: 1,
        unit: '',
        source: 'design.shared-winding',
        message: `${names.join(' and ')} share one winding (${wid}); each is simulated as if it had the winding to ` +
          `itself, so headroom and ratings are optimistic.`,
      });
  }

  const transformers: TransformerReport[] = [];
  // a transformer with a winding feeding an undesigned rail would be sized for part of its load: leave it unsized
  const feedsUndesigned = (t: Transformer) =>
    rails.some((r) => r.kind === 'rectified' && undesigned.has(r.id) && t.windings.some((w) => w.id === r.windingId));
  const unsized = project.supply.transformers.filter((t) => inputs.unsized.has(t.id) || feedsUndesigned(t));
  for (const t of unsized) {
    const refused =
      inputs.unsized.get(t.id) ??
      (rails.some(
        (r) => inputs.leftOut.has(r.id) && r.kind === 'rectified' && t.windings.some((w) => w.id === r.windingId),
      )
        ? 'a rail it feeds depends on a refused input'
        : null);
    const why = refused ?? 'a rail it feeds has an unknown load';
    globalFindings.push({
      severity: 'fail',
      rule: refused ? 'supply.refused-input' : 'supply.unknown-load',
      subject: t.name,
      value: null,
      limit: null,
      unit: 'VA',
      source: refused ? 'design.input' : 'design.consistency',
      message: `${t.name} is not sized, and no primary fuse is recommended: ${why}.`,
    });
  }
  for (const t of project.supply.transformers) {
    if (unsized.includes(t)) continue;
    const tr = transformerReport(t, windingRecs.get(t.id) ?? [], options.standardVA);
    // its windings simulated together (reported on the last pass: evaluate()'s earlier passes skip the searches)
    const joint = joints.get(t.id);
    const together = rails.flatMap((r) => {
      const rep = reports.get(r.id);
      const w = t.windings.find((x) => r.kind === 'rectified' && x.id === r.windingId);
      if (r.kind !== 'rectified' || !w || rep?.kind !== 'rectified') return [];
      const low = rep.corners.find((c) => c.id === WORST_VOLTAGE_ID);
      return [
        {
          rail: r,
          windingName: w.name,
          requiredMinV: rep.requiredMinV,
          aloneTroughV: low?.aloneTroughV ?? low?.troughV ?? NaN,
        },
      ];
    });
    const cr =
      joint && options.searches !== false
        ? crossRegulation(t, joint, together, project.mains!, mainsFactor(project.mains, 'low'))
        : null;
    transformers.push({ ...tr.report, crossRegulation: cr?.report ?? null });
    globalFindings.push(...tr.findings, ...(cr?.findings ?? []));
  }

  let primary: PrimaryReport | null = null;
  if (mainsOk && unsized.length === 0 && transformers.some((t) => t.primaryA > 0)) {
    const loadA = transformers.reduce((s, t) => s + t.primaryA, 0);
    const construction = transformers.some((t) => t.construction === 'toroidal' && t.primaryA > 0)
      ? 'toroidal'
      : 'laminated';
    const fuse = primaryFuse(loadA, construction, undefined, choices.primaryFuseSheet);
    // a refused fitted value is not checked (its own finding says so)
    const fittedA = inputs.primaryFuseOk ? project.supply.primaryFuseA : null;
    const inUseA = fittedA ?? fuse.ratedA;
    const faultChecks =
      inUseA !== null ? primaryFaultChecks(railsReported(reports), inUseA, choices.primaryFuseSheet) : [];
    const used = project.supply.transformers.filter((t) =>
      transformers.some((r) => r.transformerId === t.id && r.primaryA > 0),
    );
    const rectified = rails.filter((r): r is RectifiedRail => r.kind === 'rectified');
    const duty = { loadA, reflectedFaultA: faultChecks.map((f) => f.reflectedA) };
    const inrush =
      inUseA !== null ? inrushReport(used, rectified, project.mains!, inUseA, choices.primaryFuseSheet, duty) : null;
    const findings = sortFindings([
      ...fittedFuseFindings('Primary fuse', fittedA, fuse),
      ...primaryFaultFindings(faultChecks, reports),
      ...(inrush ? inrushFindings(inrush) : []),
    ]);
    primary = { loadA, fuse, fittedA, faultChecks, inrush, findings };
  }

  const railReports = rails.map((r) => reports.get(r.id)!).filter(Boolean);
  const all = [...globalFindings, ...railReports.flatMap((r) => r.findings), ...(primary?.findings ?? [])];
  const m = project.mains;
  return sanitize({
    mains:
      mainsOk && m
        ? {
            nominalV: m.nominalV,
            lowV: m.nominalV * mainsFactor(m, 'low'),
            highV: m.nominalV * mainsFactor(m, 'high'),
            frequencyHz: m.frequencyHz,
          }
        : null,
    keyingDuty: duty,
    transmitFraction: txFraction,
    rails: railReports,
    transformers,
    primary,
    findings: sortFindings(all),
    simulations,
    allConverged,
    choices,
    thermalAmbient: { ambientC: airC, inside },
  });
}

/**
 * Rails that cannot be designed because a load in their supply tree is unknown (NaN in the budget: a computed current
 * core refused). An unknown load makes its source's load unknown, and every rail of that tree depends on the source's
 * voltage, so the whole tree from the root is left undesigned, each rail with the reason. Designing them for a
 * load of 0 would show a supply that looks fine for an unloaded rail.
 */
function unknownLoadRails(
  rails: Project['supply']['rails'],
  outputA: Record<string, PerMode>,
  highA: Record<string, PerMode>,
): Map<string, string> {
  const byId = new Map(rails.map((r) => [r.id, r]));
  const rootOf = treeRoots(rails);
  const unknown = (a: PerMode | undefined) => (a ? MODES.filter((m) => Number.isNaN(a[m])) : []);
  const own = new Map<string, string>();
  for (const r of rails) {
    const modes = [...new Set([...unknown(outputA[r.id]), ...unknown(highA[r.id])])];
    if (modes.length) own.set(r.id, modes.map((m) => MODE_LABELS[m]).join(', '));
  }
  const out = new Map<string, string>();
  const badRoots = new Map<string, string>();
  for (const [id] of own) badRoots.set(rootOf(id), id);
  for (const r of rails) {
    if (own.has(r.id)) {
      out.set(
        r.id,
        `its ${own.get(r.id)} current is unknown (a computed load could not be computed; see the failed inputs); a ` +
          `design for no load there would hide that.`,
      );
    } else if (badRoots.has(rootOf(r.id))) {
      const cause = byId.get(badRoots.get(rootOf(r.id))!)?.name ?? badRoots.get(rootOf(r.id))!;
      out.set(r.id, `it shares its source with ${cause}, whose load is unknown, so its input voltage is unknown too.`);
    }
  }
  return out;
}

/**
 * Safety net: a non-finite number anywhere in the report becomes 0 and adds a 'fail' finding naming the field,
 * so a missed edge case shows up as a visible defect instead of NaN in a page. Tests assert it never fires.
 */
/** True when every number reachable from `v` is finite (no copies, no paths: the common case is cheap). */
function allFinite(v: unknown): boolean {
  if (typeof v === 'number') return Number.isFinite(v);
  if (Array.isArray(v)) {
    for (const x of v) if (!allFinite(x)) return false;
    return true;
  }
  if (v && typeof v === 'object') {
    for (const k in v) if (!allFinite((v as Record<string, unknown>)[k])) return false;
  }
  return true;
}

function sanitize(report: SupplyReport): SupplyReport {
  if (allFinite(report)) return report;
  const bad: string[] = [];
  const walk = (v: unknown, path: string): unknown => {
    if (typeof v === 'number') {
      if (Number.isFinite(v)) return v;
      bad.push(path);
      return 0;
    }
    if (Array.isArray(v)) return v.map((x, i) => walk(x, `${path}[${i}]`));
    if (v && typeof v === 'object')
      return Object.fromEntries(Object.entries(v).map(([k, x]) => [k, walk(x, `${path}.${k}`)]));
    return v;
  };
  const clean = walk(report, 'report') as SupplyReport;
  if (bad.length === 0) return report;
  const f: Finding = {
    severity: 'fail',
    rule: 'internal.non-finite',
    subject: 'Supply report',
    value: bad.length,
    limit: 0,
    unit: '',
    source: 'design.computation',
    message: `Some supply values could not be computed from the inputs (${bad.slice(0, 3).join(', ')}` +
      `${bad.length > 3 ? ', ...' : ''}); check the entered values.`,
  };
  return { ...clean, findings: sortFindings([f, ...clean.findings]) };
}
