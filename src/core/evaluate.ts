// evaluate(project) -> report: the one place the core's pieces are put together, in a fixed order.
import type { Project } from './model';
import { computeBudget, type BudgetReport, type ComputedLoad } from './budget';
import { sortFindings, type Finding } from './findings';

export interface EvaluationReport {
  budget: BudgetReport;
  findings: Finding[];
}

export function evaluate(project: Project): EvaluationReport {
  const computed: ComputedLoad[] = [];
  const budget = computeBudget(project, computed);
  return { budget, findings: sortFindings([...budget.findings]) };
}
