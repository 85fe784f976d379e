// A clone (and so an imported file, which gets fresh ids the same way) keeps its parts-list lines bound to the same
// design roles: a role's id names its item (transformer, rail, stage), and the item's new id must follow.
import { describe, expect, it } from 'vitest';
import { club30m } from '../../seed-demo/club-30m';
import { cloneProject } from '../../src/core/new-project';
import { evaluate } from '../../src/core/evaluate';

let n = 0;
const makeId = (prefix: string) => `${prefix}-c${++n}`;

describe('cloning a project with parts bound to design roles', () => {
  it('binds every line to the role of the cloned item, so no binding is orphaned', () => {
    const original = structuredClone(club30m);
    const bound = original.bom.filter((b) => b.roleId).length;
    expect(bound).toBeGreaterThan(0);
    const copy = cloneProject(original, 'copy', 'Copy', makeId);
    const roleIds = new Set(evaluate(copy).roles.list.map((r) => r.id));
    const lines = copy.bom.filter((b) => b.roleId);
    expect(lines).toHaveLength(bound);
    for (const b of lines) expect(roleIds.has(b.roleId!), `${b.refs}: ${b.roleId}`).toBe(true);
    // the same roles are bound as in the original, item for item
    const before = evaluate(original).roles.statuses.filter((s) => s.lineIds.length).length;
    const after = evaluate(copy).roles.statuses.filter((s) => s.lineIds.length).length;
    expect(after).toBe(before);
  });
});
