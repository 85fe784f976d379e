// evaluate(project) -> report: the one place the core's pieces are put together, in a fixed order:
// PA key-down current and relay coils -> current budget -> supply design -> (PA rail voltage settles) -> RF -> cost.
import { MODES, type Project, type PerMode } from './model';
import { computeBudget, type BudgetReport, type ComputedLoad } from './budget';
import { sortFindings, type Finding } from './findings';
import {
  designPass, designSupply, designedSourceRails, evaluateSupply, supplyInAir, type PassRail,
} from './power/evaluate-supply';
import { resultScope, withSimulationMemo } from './power/rectifier-sim';
import type { RailReport, SupplyReport } from './power/report-types';
import { heatBudget, type HeatBudget } from './power/heat-budget';
import { paHeatAhead } from './thermal/pa-heat';
import { withSupplyVoltages } from './budget-voltages';
import { withRecommendedPa } from './power/recommended-pa';
import { withBatteryPa } from './power/battery-pa';
import { withKeyingTransient } from './power/keying-transient';
import { evaluateRf, paKeyDownCurrentA, relayCoilLoads, type RfReport } from './rf';
import { costProject, type CostReport } from './cost';
import { catalogFindings } from './catalog-checks';
import { checkRoles, designRoles, type DesignRole, type RoleStatus } from './roles';
import { checkProjectInputs } from './spec/project-check';
import { mainsCornerFindings } from './rules/rule-set';

export interface EvaluationReport {
  budget: BudgetReport;
  /** null when the project has no rails */
  supply: SupplyReport | null;
  /** Heat dissipated inside the enclosure and its internal rise; null when the project has no rails */
  heat: HeatBudget | null;
  rf: RfReport;
  cost: CostReport;
  /** parts on the parts list checked against the computed design: the roles' rating checks, unbound roles, and
   * reservoir capacitors matched by capacitance on rails whose reservoir role has no bound line */
  catalog: Finding[];
  /** the parts the design needs, each with its requirement, and the state of the line bound to it */
  roles: { list: DesignRole[]; statuses: RoleStatus[] };
  /** PA rail voltage used for the PA model, per rail id (V): nominal-mains key-down trough when simulated */
  paRailV: Record<string, number>;
  /** every finding of every section, most severe first */
  findings: Finding[];
}

export interface EvaluateOptions {
  onMonteCarloProgress?: (done: number, total: number) => void;
  /** The plain path without this evaluation's shortcuts (the supply designed again in full for the inside air, no
   *  memos of pure results): the same report, slower; for the equivalence tests. */
  reference?: boolean;
}

/** What the fixed-point passes read of a supply report: its rails (a rectified rail's corners and no-load peak, a
 *  battery's voltages), from a finished report or from designPass. */
type PassSupply = { rails: readonly (RailReport | PassRail)[] };

/** Voltage a PA sees per rail: the supply's nominal-mains key-down trough when simulated, else the budget's nominal. */
function paRailVoltages(project: Project, budget: BudgetReport, supply: PassSupply | null): Record<string, number> {
  const out: Record<string, number> = {};
  for (const s of project.stages) {
    if (!s.pa) continue;
    const id = s.pa.railId;
    const simulated = supply?.rails.find((r) => r.railId === id);
    if (simulated?.kind === 'rectified') {
      const corner = simulated.corners.find((c) => c.mains === 'nominal' && c.load === 'keyDown');
      if (corner && Number.isFinite(corner.troughV)) {
        out[id] = corner.troughV;
        continue;
      }
    }
    // a PA on a rail the project does not have gets no voltage: its current is refused (a fail finding), not 0
    const nominalV = budget.rails.find((r) => r.railId === id)?.nominalV;
    if (nominalV !== undefined && Number.isFinite(nominalV)) out[id] = nominalV;
  }
  return out;
}

/**
 * Highest and hottest voltage per PA rail: a rectified rail's high-mains no-load peak (the reservoir is charged to it
 * while the PA is unkeyed, and the first key-down cycles see it) and its high-mains key-down mean; a battery's
 * full-charge voltage for both. Common practice, no published source (worst-case corners of the supply).
 */
function paRailCorners(project: Project, supply: PassSupply | null): {
  maxV: Record<string, number>;
  hotV: Record<string, number>;
  lowV: Record<string, number>;
  battery: Record<string, boolean>;
} {
  const maxV: Record<string, number> = {};
  const hotV: Record<string, number> = {};
  const lowV: Record<string, number> = {};
  const battery: Record<string, boolean> = {};
  for (const s of project.stages) {
    if (!s.pa) continue;
    const id = s.pa.railId;
    const r = supply?.rails.find((x) => x.railId === id);
    if (r?.kind === 'rectified') {
      const hot = r.corners.find((c) => c.id === 'high-keyDown');
      const low = r.corners.find((c) => c.id === 'low-keyDown');
      if (low && Number.isFinite(low.troughV) && low.troughV > 0) lowV[id] = low.troughV;
      if (Number.isFinite(r.reservoir.noLoadPeakHighV) && r.reservoir.noLoadPeakHighV > 0)
        maxV[id] = r.reservoir.noLoadPeakHighV;
      if (hot && Number.isFinite(hot.dcMeanV) && hot.dcMeanV > 0) hotV[id] = hot.dcMeanV;
    } else if (r?.kind === 'battery' && Number.isFinite(r.fullV) && r.fullV > 0) {
      battery[id] = true;
      maxV[id] = r.fullV;
      hotV[id] = r.fullV;
      if (Number.isFinite(r.loadedEndV) && r.loadedEndV > 0) lowV[id] = r.loadedEndV;
    }
  }
  return { maxV, hotV, lowV, battery };
}

/**
 * PA key-down currents and relay coil currents for the budget. A current core cannot compute is unknown (NaN) in the
 * modes it covers, with a fail finding naming the stage and the refused field; it never falls back to 0.
 */
function computedLoads(project: Project, paRailV: Record<string, number>): ComputedLoad[] {
  const loads: ComputedLoad[] = [];
  const railIds = new Set(project.supply.rails.map((r) => r.id));
  // the first pass asks twice at the same voltages (no high-mains voltage yet): the PA model once (this evaluation)
  const memo = resultScope<ReturnType<typeof paKeyDownCurrentA>>('pa-key-down');
  for (const [index, s] of project.stages.entries()) {
    if (s.pa) {
      const railV = paRailV[s.pa.railId] ?? NaN;
      const key = `${index}\u0000${railV}`;
      const kd = memo?.get(key) ?? paKeyDownCurrentA(s.pa, railV, project, s.name);
      memo?.set(key, kd);
      const findings = kd.ok ? [] : [paUnknownFinding(s.name, kd.findings)];
      loads.push({
        stageId: s.id,
        railId: s.pa.railId,
        currentA: { receive: 0, keyUp: 0, keyDown: kd.ok ? kd.currentA : NaN },
        replaces: ['keyDown'],
        findings,
      });
    }
    const coil = relayCoilLoads(s, railIds);
    if (!coil.ok) {
      // the coil's rail is unknown or refused: no rail can carry it; the finding keeps it from leaving silently
      const unknown = Object.fromEntries(MODES.map((m) => [m, s.relay?.coilModes.includes(m) ? NaN : 0])) as PerMode;
      loads.push({
        stageId: s.id,
        railId: s.relay?.coilRailId ?? '',
        currentA: unknown,
        replaces: [],
        findings: coil.findings,
      });
    } else if (coil.load) {
      loads.push({ stageId: s.id, railId: coil.load.railId, currentA: coil.load.currentA, replaces: [] });
    }
  }
  return loads;
}

/** The PA's key-down current is unknown: say which stage and which inputs core refused. */
function paUnknownFinding(stageName: string, refused: Finding[]): Finding {
  const fields = refused
    .map((f) => f.subject.replace(`${stageName}: `, ''))
    .filter((x, i, a) => x !== stageName && a.indexOf(x) === i);
  const reasons = refused.map((f) => f.message).join(' ');
  return {
    severity: 'fail',
    rule: 'budget.pa-current',
    subject: `${stageName}: PA key-down current`,
    value: null,
    limit: null,
    unit: 'A',
    source: 'design.input',
    message: `The PA key-down current cannot be computed${fields.length ? ` (refused: ${fields.join(', ')})` : ''}` +
      `, so the key-down budget of its rail is unknown and its supply is not designed. ${reasons}`,
  };
}

/**
 * The corners the fixed-point passes read: the PA's nominal key-down trough (paRailVoltages), the low-mains
 * key-down trough (lowestInputV, paRailCorners) and the high-mains key-down mean and no-load peak (paRailCorners).
 */
const LOOP_CORNERS = ['nominal-keyDown', 'low-keyDown', 'high-keyDown'] as const;

/** PA rail voltages closer than this between passes count as settled (V). */
const SETTLED_V = 0.005;
const MAX_PASSES = 6;

/** Every voltage in `next` within SETTLED_V of the one before. */
const close = (next: Record<string, number>, prev: Record<string, number>) =>
  Object.keys(next).every((id) => Math.abs(next[id] - (prev[id] ?? 0)) < SETTLED_V);

const railOutputs = (b: BudgetReport): Record<string, PerMode> =>
  Object.fromEntries(b.rails.map((r) => [r.railId, r.outputA]));

/**
 * Lowest simulated voltage of each source rail (low mains / battery end, key-down trough), V. A switching regulator
 * draws I_in = V_out I_out / (eta V_in), most at the lowest V_in; the budget otherwise assumes nominal x (1 - low
 * fraction), which ignores ripple and winding regulation. Source: energy balance (see power/regulator.ts).
 */
function lowestInputV(project: Project, supply: PassSupply | null): Record<string, number> {
  const out: Record<string, number> = {};
  const feedsSwitching = new Set(
    project.supply.rails.flatMap((r) => (r.kind === 'regulated' && r.regulator === 'switching' ? [r.parentId] : [])),
  );
  for (const r of supply?.rails ?? []) {
    if ((r.kind !== 'rectified' && r.kind !== 'battery') || !feedsSwitching.has(r.railId)) continue;
    const low = r.kind === 'rectified' ? r.corners.find((c) => c.id === 'low-keyDown')?.troughV : r.loadedEndV;
    if (low !== undefined && Number.isFinite(low) && low > 0) out[r.railId] = low;
  }
  return out;
}

export function evaluate(project: Project, options: EvaluateOptions = {}): EvaluationReport {
  // a rail whose load is the same as in the pass before is not simulated again (exact-input memo, this call only)
  return withSimulationMemo(() => evaluateOnce(project, options), { caches: !options.reference });
}

function evaluateOnce(project: Project, options: EvaluateOptions): EvaluationReport {
  // The PA current depends on its rail voltage and the rail voltage on the PA current: iterate to a fixed point,
  // starting from the budget's nominal voltage. Each pass runs the supply design once, with the PA at its
  // nominal key-down trough (headroom, budget) and, for the high-mains heating corners, at its high-mains rail:
  // a PA of fixed load draws more current there (I ~ V; load line P = k V^2 / R, REFERENCE-VALUES §8.1).
  // The map is a strong contraction (a volt more on the rail moves the current by tens of mA, which moves the
  // trough by tens of mV), so it settles in 2-4 passes.
  const bare = computeBudget(project);
  let paRailV = paRailVoltages(project, bare, null);
  let hotV: Record<string, number> = {};
  let lowV: Record<string, number> = {};
  // with rails the first pass computes it with the same voltages: not here (but on the reference path)
  let budget = project.supply.rails.length && !options.reference
    ? bare : computeBudget(project, computedLoads(project, paRailV));
  let supply: SupplyReport | null = null;
  let corners = paRailCorners(project, null);
  let last: { outputA: Record<string, PerMode>; highMainsOutputA: Record<string, PerMode> } | null = null;
  for (let pass = 0; project.supply.rails.length && pass < MAX_PASSES; pass++) {
    budget = computeBudget(project, computedLoads(project, paRailV), lowV);
    const budgetHigh = computeBudget(project, computedLoads(project, { ...paRailV, ...hotV }), lowV);
    // the passes read only these corners: the others, and the reservoir and winding searches, run once, below
    last = { outputA: railOutputs(budget), highMainsOutputA: railOutputs(budgetHigh) };
    const passOptions = { highMainsOutputA: last.highMainsOutputA, searches: false, cornerIds: LOOP_CORNERS };
    // the passes read only the source rails' corners and voltages: the design's simulations alone (designPass),
    // unless a number there is not finite; then the design's rail reports, unless a number there is not finite; then
    // the finished report, whose safety net zeroes it. The reference path finishes every pass.
    const lite = options.reference ? null : designPass(project, last.outputA, passOptions);
    const designedPass = options.reference || lite ? null : designSupply(project, last.outputA, passOptions);
    const sourceRails = designedPass && designedSourceRails(designedPass);
    const passSupply: PassSupply = lite ? { rails: lite } : sourceRails ? { rails: sourceRails }
      : designedPass ? supplyInAir(designedPass) : evaluateSupply(project, last.outputA, passOptions);
    const next = paRailVoltages(project, budget, passSupply);
    const nextLow = lowestInputV(project, passSupply);
    corners = paRailCorners(project, passSupply);
    const settled = close(next, paRailV) && close(nextLow, lowV) && close(corners.hotV, hotV);
    paRailV = next;
    lowV = nextLow;
    hotV = corners.hotV;
    if (settled) break;
  }
  // the last pass again with the searches: its corners are the memo's (same inputs), so the report is the one a
  // loop with the searches in every pass would have ended with
  const designed = last && designSupply(project, last.outputA, { highMainsOutputA: last.highMainsOutputA });
  if (designed) supply = supplyInAir(designed);
  budget = withSupplyVoltages(budget, supply);
  const rfCtx = {
    paRailV,
    paRailMaxV: corners.maxV,
    paRailHotV: corners.hotV,
    paRailLowV: corners.lowV,
    paRailBattery: corners.battery,
  };
  // The air inside the enclosure is the ambient of every thermal check of a part in it (rectifiers, regulators, PA).
  // Its rise needs every heat source, none of which depends on the air, so it is found first (the PA's heat from the
  // same PA model) and the supply's checks in air finished again with it (the design does not depend on the air; the
  // reference path designs it again in full, its simulations memoised, for the equivalence tests).
  const s = project.supply;
  const insideC =
    project.supply.rails.length && s.enclosureAreaM2 && s.enclosureUWPerM2K
      ? heatBudget(supply, paHeatAhead(project, rfCtx), s.enclosureAreaM2, s.enclosureUWPerM2K, project.ambientC)
          .insideC
      : null;
  if (last && designed && insideC !== null) {
    supply = options.reference
      ? evaluateSupply(project, last.outputA, { highMainsOutputA: last.highMainsOutputA, insideC })
      : supplyInAir(designed, insideC);
  }
  const rf = evaluateRf(project, {
    ...rfCtx,
    insideC: insideC ?? undefined,
    onMonteCarloProgress: options.onMonteCarloProgress,
  });
  const cost = costProject(project);
  const roleList = designRoles(project, supply, rf);
  const roleCheck = checkRoles(project, roleList);
  // the capacitance match only where no line is bound to the rail's reservoir role (the binding decides there)
  const bound = new Set(project.bom.map((b) => b.roleId).filter(Boolean));
  const unboundSupply = supply && { ...supply, rails: supply.rails.filter((r) => !bound.has(`reservoir:${r.railId}`)) };
  const catalog = [...catalogFindings(project, unboundSupply), ...roleCheck.findings];
  const mains = mainsCornerFindings(project.mains, project.rf.spuriousRule);
  const recPa = withRecommendedPa(supply, project, rf);
  // the PA rail keyed from rest, with every load by its own law (the PA on its load line): after the RF model
  supply = withKeyingTransient(withBatteryPa(recPa.supply, project, rf), project, budget, rf);
  const heat = project.supply.rails.length
    ? heatBudget(supply, paHeat(rf), project.supply.enclosureAreaM2, project.supply.enclosureUWPerM2K, project.ambientC)
    : null;
  const findings = sortFindings([
    ...checkProjectInputs(project),
    ...mains,
    ...budget.findings,
    ...(supply?.findings ?? []),
    ...(heat?.findings ?? []),
    ...catalog,
    ...rf.findings,
    ...cost.findings,
  ]);
  return {
    budget,
    supply,
    heat,
    rf,
    cost,
    catalog,
    roles: { list: roleList, statuses: roleCheck.statuses },
    paRailV,
    findings,
  };
}

/** Each PA's duty-averaged dissipation, all devices (W): the per-device average times the device count. */
function paHeat(rf: RfReport): { name: string; averageW: number }[] {
  return rf.stages.flatMap((st) => {
    const t = st.pa?.thermal;
    if (!t || !(t.dissipationPerDeviceW > 0)) return [];
    return [{ name: st.stageName, averageW: t.averagePerDeviceW * (t.dissipationTotalW / t.dissipationPerDeviceW) }];
  });
}
