// Sources: every source this pack's checks rest on, as a reader would look it up, with the checks it backs.
import type { Project } from '../../core/model';
import { RULE_SETS } from '../../core/rules/rule-set';
import { sourcesUsed, STATUS_WORDS } from '../../core/sources/used';
import type { PackReport } from '../report';
import { GREY, type Layout } from '../layout';

export function sourcesSection(l: Layout, project: Project, report: PackReport): void {
  l.heading('Sources');
  // the disclaimer that local rules govern is on the cover, once
  l.text(`Rule set: ${RULE_SETS[project.rf.spuriousRule].label}.`, { sizePt: 9, afterPt: 6 });
  for (const u of sourcesUsed(project, report)) {
    l.text(`${STATUS_WORDS[u.status]}: ${u.text}`, { sizePt: 8.5, afterPt: 1 });
    l.text(`Backs: ${u.checks.join('; ')}`, { sizePt: 7.5, color: GREY, indentPt: 10, afterPt: 5 });
  }
}
