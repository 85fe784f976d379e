// The computed results shown under a stage's own forms (filled in as the RF checks land).
import type { Project, Stage } from '../../core/model';

export function stageResults(_p: Project, _s: Stage) {
  return null;
}
