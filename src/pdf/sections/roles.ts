// The parts the design needs, in the pack: each parts-list line's bound role with its rating check (beside the line
// in the parts lists), and a table of every role with its requirement, what is bound and the check; an unbound role
// is listed as a finding. Reads only the evaluation's role statuses and findings.
import type { Finding } from '../../core/findings';
import type { Project } from '../../core/model';
import type { RoleStatus } from '../../core/roles';
import { CAUTION, FAIL, GREY, type Layout, type Row } from '../layout';

/** What the pack reads of the roles (absent in reports made without them). */
export interface PackRoles {
  roles?: { statuses: RoleStatus[] };
  catalog?: Finding[];
}

const STATE_WORDS: Record<RoleStatus['state'], string> = {
  ok: 'meets the design',
  caution: 'check',
  fail: 'does not meet the design',
  unbound: 'no line bound',
};

/** The role findings short of ok for one role (its rating checks), in report order. */
function problems(report: PackRoles, s: RoleStatus): Finding[] {
  return (report.catalog ?? []).filter(
    (f) =>
      f.rule.startsWith('role.') &&
      f.severity !== 'ok' &&
      (f.subject === s.role.label || f.subject.startsWith(`${s.role.label}:`)),
  );
}

/** Per parts-list line: "Role: Reservoir capacitor, PA rail — meets the design" (or why not), for the line's cell. */
export function lineRoleText(report: PackRoles): Map<string, { text: string; state: RoleStatus['state'] }> {
  const out = new Map<string, { text: string; state: RoleStatus['state'] }>();
  for (const s of report.roles?.statuses ?? []) {
    const why = problems(report, s)
      .map((f) => f.message)
      .join(' ');
    for (const id of s.lineIds)
      out.set(id, { text: `Role: ${s.role.label}` +
        ` — ${STATE_WORDS[s.state]}${why ? `: ${why}` : ''}`, state: s.state });
  }
  return out;
}

export const stateColor = (state: RoleStatus['state'] | undefined) =>
  state === 'fail' ? FAIL : state === 'caution' || state === 'unbound' ? CAUTION : undefined;

/** Every role: requirement, bound line(s), check; unbound roles as findings. */
export function rolesTable(l: Layout, project: Project, report: PackRoles): void {
  const statuses = report.roles?.statuses ?? [];
  if (!statuses.length) return;
  l.heading('Parts the design needs', 2, 80);
  l.text(
    'Each part of the design with what it must be rated for, the parts-list line bound to it, and the check of the ' +
      'bound part’s ratings.',
    { sizePt: 8, color: GREY, afterPt: 4 },
  );
  const parts = new Map(project.parts.map((p) => [p.id, p]));
  const rows: Row[] = statuses.map((s) => {
    const bound = project.bom
      .filter((b) => s.lineIds.includes(b.id))
      .map((b) => `${b.refs ? `${b.refs} ` : ''}${parts.get(b.partId)?.description ?? b.partId}`)
      .join('; ');
    const why = problems(report, s)
      .map((f) => f.message)
      .join(' ');
    const check =
      s.state === 'unbound'
        ? 'Finding: no parts-list line is bound to this part of the design'
        : `${STATE_WORDS[s.state]}${why ? `: ${why}` : ''}`;
    return { cells: [s.role.label, s.role.requirement, bound || '—', check], color: stateColor(s.state) };
  });
  l.table(
    [
      { header: 'Role', width: 0.18 },
      { header: 'Requirement', width: 0.3 },
      { header: 'Bound line', width: 0.22 },
      { header: 'Check', width: 0.3 },
    ],
    rows,
    7.5,
    'Parts the design needs',
  );
  const unbound = statuses.filter((s) => s.state === 'unbound').length;
  const short = statuses.filter((s) => s.state === 'fail' || s.state === 'caution').length;
  l.text(
    `${statuses.length} role(s): ${statuses.length - unbound - short} met, ${short} to check or change, ` +
      `${unbound} unbound.`,
    { sizePt: 8, afterPt: 6 },
  );
}
