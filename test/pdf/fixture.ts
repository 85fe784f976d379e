// The evaluation report of a project, made by the lead's evaluate() (budget, supply, RF, cost in their
// fixed order), typed as what the pack reads.
import type { Project } from '../../src/core/model';
import { evaluate } from '../../src/core/evaluate';
import type { PackReport } from '../../src/pdf';

export function evaluationFor(project: Project): PackReport {
  return evaluate(project);
}
