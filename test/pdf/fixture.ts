// Builds the evaluation report the way the lead's evaluate() does (budget, RF, budget with the PA's
// computed key-down current, supply, cost), from the engines as they exist in the tree.
import type { Project } from '../../src/core/model';
import { computeBudget, railNominalV, type ComputedLoad } from '../../src/core/budget';
import { evaluateRf } from '../../src/core/rf';
import { evaluateSupply } from '../../src/core/power/evaluate-supply';
import { costProject } from '../../src/core/cost';
import type { PackReport } from '../../src/pdf';

export function evaluationFor(project: Project): PackReport {
  const paRailV: Record<string, number> = {};
  for (const r of project.supply.rails) paRailV[r.id] = railNominalV(r, project);
  const rf = evaluateRf(project, { paRailV });
  const computed: ComputedLoad[] = [];
  for (const s of rf.stages) {
    const stage = project.stages.find((x) => x.id === s.stageId);
    if (s.pa && stage?.pa) computed.push({ stageId: stage.id, railId: stage.pa.railId, currentA: { receive: 0, keyUp: 0, keyDown: s.pa.keyDownCurrentA }, replaces: ['keyDown'] });
  }
  const budget = computeBudget(project, computed);
  const supply = evaluateSupply(project, Object.fromEntries(budget.rails.map((r) => [r.railId, r.outputA])));
  const cost = costProject(project);
  return { budget, supply, rf, cost, findings: [...budget.findings, ...supply.findings, ...rf.findings, ...cost.findings] };
}
