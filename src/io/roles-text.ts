// The design roles as the CLI's plain text prints them: each role with its requirement, the parts-list lines bound to
// it and its verdict with the reasons, then the roles no line is bound to.
import type { EvaluationReport } from '../core/evaluate';
import type { RoleStatus } from '../core/roles';

const VERDICT: Record<RoleStatus['state'], string> = { ok: 'OK', caution: 'CAUTION', fail: 'FAIL', unbound: 'UNBOUND' };

function roleBlock(s: RoleStatus): string[] {
  const out = [`  ${s.role.label} [${VERDICT[s.state]}]`, `    needs: ${s.role.requirement}`];
  for (const b of s.bound ?? []) {
    const refs = b.refs.trim() ? `${b.refs}: ` : '';
    out.push(
      `    bound: ${refs}${b.part || `part ${b.partId} (not in the catalog)`}, ${b.qtyPerRig} per rig (line ` +
        `${b.lineId})`,
    );
  }
  for (const p of s.problems ?? []) out.push(`    why: ${p}`);
  return out;
}

export function roleLines(report: Pick<EvaluationReport, 'roles'>): string[] {
  const statuses = report.roles.statuses;
  if (!statuses.length) return ['', 'Design roles: none (no supply or RF stage designed yet)'];
  const bound = statuses.filter((s) => s.state !== 'unbound');
  const unbound = statuses.filter((s) => s.state === 'unbound');
  const out = [
    '',
    `Design roles (${statuses.length}: parts the design needs, each with the parts-list lines bound to it)`,
  ];
  for (const s of bound) out.push(...roleBlock(s));
  out.push(
    '',
    unbound.length ? `Unbound roles (${unbound.length}: no parts-list line is bound to them)` : 'Unbound roles: none',
  );
  for (const s of unbound) out.push(`  ${s.role.label}: needs ${s.role.requirement}`);
  return out;
}
