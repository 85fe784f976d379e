// Where a finding is fixed: the page (and the part of it) that holds the field a builder changes to clear it.
// Found from what the finding names (a stage, rail, winding or transformer by its name) and otherwise from the
// family of its rule.
import type { Project } from '../../src/core/model';
import type { Finding } from '../../src/core/findings';

export interface FixLink {
  href: string;
  /** what the link opens, e.g. "stage 30 m low-pass filter" */
  label: string;
}

/** The subject is about this named thing: "16 V winding", "16 V winding: …", "16 V winding (…)", "16 V winding fuse". */
const names = (subject: string, name: string) => subject === name || [':', ' '].some((sep) => subject.startsWith(`${name}${sep}`));

const RF_RULES = /^(lpf|pa|relay|spurious|exposure|rf)\./;
const SUPPLY_RULES = /^(rail|regulator|reservoir|rectifier|bleeder|fuse|transformer|supply|battery|catalog|thermal|input\.supply)/;

export function fixLink(project: Project, f: Finding): FixLink {
  const base = `/projects/${project.id}`;
  const stage = project.stages.find((s) => names(f.subject, s.name));
  if (stage && !f.rule.startsWith('cost.')) return { href: `${base}/stages/${stage.id}`, label: `stage ${stage.name}` };
  const rail = project.supply.rails.find((r) => names(f.subject, r.name));
  if (rail) return { href: `${base}/supply#rail-${rail.id}`, label: `rail ${rail.name}` };
  for (const t of project.supply.transformers) {
    const w = t.windings.find((x) => names(f.subject, x.name));
    if (w) return { href: `${base}/supply#winding-${w.id}`, label: `${w.name} of ${t.name}` };
    if (names(f.subject, t.name)) return { href: `${base}/supply#transformer-${t.id}`, label: t.name };
  }
  if (f.rule.startsWith('cost.')) return { href: `${base}/bom`, label: 'parts list and cost' };
  if (f.rule.startsWith('mains.') || f.rule === 'rf.settings') return { href: `${base}#settings`, label: 'project settings' };
  if (f.rule.startsWith('budget.')) return { href: `${base}#stages`, label: 'stage currents' };
  if (RF_RULES.test(f.rule)) return { href: `${base}/rf`, label: 'RF checks' };
  if (SUPPLY_RULES.test(f.rule)) return { href: `${base}/supply`, label: 'supply' };
  return { href: `${base}#checks`, label: 'all checks' };
}
