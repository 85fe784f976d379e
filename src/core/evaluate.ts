// evaluate(project) -> report: the one place the core's pieces are put together, in a fixed order:
// PA key-down current and relay coils -> current budget -> supply design -> (PA rail voltage settles) -> RF -> cost.
import type { Project, PerMode } from './model';
import { computeBudget, type BudgetReport, type ComputedLoad } from './budget';
import { sortFindings, type Finding } from './findings';
import { evaluateSupply } from './power/evaluate-supply';
import type { SupplyReport } from './power/report-types';
import { evaluateRf, paKeyDownCurrentA, relayCoilLoads, type RfReport } from './rf';
import { costProject, type CostReport } from './cost';
import { catalogFindings } from './catalog-checks';

export interface EvaluationReport {
  budget: BudgetReport;
  /** null when the project has no rails */
  supply: SupplyReport | null;
  rf: RfReport;
  cost: CostReport;
  /** parts on the parts list checked against the computed design (reservoir capacitors) */
  catalog: Finding[];
  /** PA rail voltage used for the PA model, per rail id (V): nominal-mains key-down trough when simulated */
  paRailV: Record<string, number>;
  /** every finding of every section, most severe first */
  findings: Finding[];
}

export interface EvaluateOptions {
  onMonteCarloProgress?: (done: number, total: number) => void;
}

/** Voltage a PA sees per rail: the supply's nominal-mains key-down trough when simulated, else the budget's nominal. */
function paRailVoltages(project: Project, budget: BudgetReport, supply: SupplyReport | null): Record<string, number> {
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
    if (simulated?.kind === 'battery') {
      out[id] = budget.rails.find((r) => r.railId === id)?.nominalV ?? 0;
      continue;
    }
    out[id] = budget.rails.find((r) => r.railId === id)?.nominalV ?? 0;
  }
  return out;
}

/**
 * Highest and hottest voltage per PA rail: a rectified rail's high-mains no-load peak (the reservoir is charged to it
 * while the PA is unkeyed, and the first key-down cycles see it) and its high-mains key-down mean; a battery's
 * full-charge voltage for both. Common practice, no published source (worst-case corners of the supply).
 */
function paRailCorners(project: Project, supply: SupplyReport | null): { maxV: Record<string, number>; hotV: Record<string, number>; lowV: Record<string, number>; battery: Record<string, boolean> } {
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
      if (Number.isFinite(r.reservoir.noLoadPeakHighV) && r.reservoir.noLoadPeakHighV > 0) maxV[id] = r.reservoir.noLoadPeakHighV;
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

function computedLoads(project: Project, paRailV: Record<string, number>): ComputedLoad[] {
  const loads: ComputedLoad[] = [];
  for (const s of project.stages) {
    if (s.pa && paRailV[s.pa.railId] !== undefined) {
      const keyDown = paKeyDownCurrentA(s.pa, paRailV[s.pa.railId], project);
      loads.push({ stageId: s.id, railId: s.pa.railId, currentA: { receive: 0, keyUp: 0, keyDown }, replaces: ['keyDown'] });
    }
    const coil = relayCoilLoads(s);
    if (coil) loads.push({ stageId: s.id, railId: coil.railId, currentA: coil.currentA, replaces: [] });
  }
  return loads;
}

/** PA rail voltages closer than this between passes count as settled (V). */
const SETTLED_V = 0.005;
const MAX_PASSES = 6;

/** Every voltage in `next` within SETTLED_V of the one before. */
const close = (next: Record<string, number>, prev: Record<string, number>) => Object.keys(next).every((id) => Math.abs(next[id] - (prev[id] ?? 0)) < SETTLED_V);

const railOutputs = (b: BudgetReport): Record<string, PerMode> => Object.fromEntries(b.rails.map((r) => [r.railId, r.outputA]));

/**
 * Lowest simulated voltage of each source rail (low mains / battery end, key-down trough), V. A switching regulator
 * draws I_in = V_out I_out / (eta V_in), most at the lowest V_in; the budget otherwise assumes nominal x (1 - low
 * fraction), which ignores ripple and winding regulation. Source: energy balance (see power/regulator.ts).
 */
function lowestInputV(project: Project, supply: SupplyReport | null): Record<string, number> {
  const out: Record<string, number> = {};
  const feedsSwitching = new Set(project.supply.rails.flatMap((r) => (r.kind === 'regulated' && r.regulator === 'switching' ? [r.parentId] : [])));
  for (const r of supply?.rails ?? []) {
    if ((r.kind !== 'rectified' && r.kind !== 'battery') || !feedsSwitching.has(r.railId)) continue;
    const low = r.kind === 'rectified' ? r.corners.find((c) => c.id === 'low-keyDown')?.troughV : r.loadedEndV;
    if (low !== undefined && Number.isFinite(low) && low > 0) out[r.railId] = low;
  }
  return out;
}

export function evaluate(project: Project, options: EvaluateOptions = {}): EvaluationReport {
  // The PA current depends on its rail voltage and the rail voltage on the PA current: iterate to a fixed point,
  // starting from the budget's nominal voltage. Each pass runs the supply design once, with the PA at its
  // nominal key-down trough (headroom, budget) and, for the high-mains heating corners, at its high-mains rail:
  // a PA of fixed load draws more current there (I ~ V; load line P = k V^2 / R, REFERENCE-VALUES §8.1).
  // The map is a strong contraction (a volt more on the rail moves the current by tens of mA, which moves the
  // trough by tens of mV), so it settles in 2-4 passes.
  let paRailV = paRailVoltages(project, computeBudget(project), null);
  let hotV: Record<string, number> = {};
  let lowV: Record<string, number> = {};
  let budget = computeBudget(project, computedLoads(project, paRailV));
  let supply: SupplyReport | null = null;
  let corners = paRailCorners(project, null);
  for (let pass = 0; project.supply.rails.length && pass < MAX_PASSES; pass++) {
    budget = computeBudget(project, computedLoads(project, paRailV), lowV);
    const budgetHigh = computeBudget(project, computedLoads(project, { ...paRailV, ...hotV }), lowV);
    supply = evaluateSupply(project, railOutputs(budget), { highMainsOutputA: railOutputs(budgetHigh) });
    const next = paRailVoltages(project, budget, supply);
    const nextLow = lowestInputV(project, supply);
    corners = paRailCorners(project, supply);
    const settled = close(next, paRailV) && close(nextLow, lowV) && close(corners.hotV, hotV);
    paRailV = next;
    lowV = nextLow;
    hotV = corners.hotV;
    if (settled) break;
  }
  const rf = evaluateRf(project, { paRailV, paRailMaxV: corners.maxV, paRailHotV: corners.hotV, paRailLowV: corners.lowV, paRailBattery: corners.battery, onMonteCarloProgress: options.onMonteCarloProgress });
  const cost = costProject(project);
  const catalog = catalogFindings(project, supply);
  const findings = sortFindings([...budget.findings, ...(supply?.findings ?? []), ...catalog, ...rf.findings, ...cost.findings]);
  return { budget, supply, rf, cost, catalog, paRailV, findings };
}
