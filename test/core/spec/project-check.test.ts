// Stored values are checked against the same field specs as the forms: a bad one is a fail finding naming the item
// and the field, and the overall verdict is fail. Limits are the specs' own (one place): this tests the wiring.
import { describe, expect, it } from 'vitest';
import { ALL_SPECS } from '../../../src/core/spec';
import { LOCATIONS, checkProjectInputs } from '../../../src/core/spec/project-check';
import { evaluate } from '../../../src/core/evaluate';
import { worstSeverity } from '../../../src/core/findings';
import { club30m } from '../../../seed-demo/club-30m';
import { portable20m } from '../../../seed-demo/portable-20m';

const clubProject = () => structuredClone(club30m);
const portableProject = () => structuredClone(portable20m);

describe('stored values against the specs', () => {
  it('every spec says where its objects live in a project (so a new spec is checked on load)', () => {
    const located = new Set(LOCATIONS.map((l) => l.spec.name));
    expect(ALL_SPECS.map((s) => s.name).filter((n) => !located.has(n))).toEqual([]);
  });

  it('both demo projects pass every spec', () => {
    expect(checkProjectInputs(clubProject())).toEqual([]);
    expect(checkProjectInputs(portableProject())).toEqual([]);
  });

  it('a stored PA efficiency of 2 % (core needs at least 5 %) is a fail finding naming stage and field', () => {
    const p = clubProject();
    const pa = p.stages.find((s) => s.pa)!;
    pa.pa!.efficiency = 0.02;
    const report = evaluate(p);
    const f = report.findings.find((x) => x.rule === 'input.stored');
    expect(f?.severity).toBe('fail');
    expect(f?.subject).toContain(pa.name);
    expect(f?.message).toContain('Drain efficiency');
    expect(worstSeverity(report.findings)).toBe('fail');
  });

  it('a load current stored as text is refused by name, not read as 0', () => {
    const p = portableProject();
    const s = p.stages[0];
    (s.loads[0].currentA as Record<string, unknown>).keyDown = 'lots';
    const f = checkProjectInputs(p);
    expect(f.map((x) => x.subject)).toEqual([`Stage "${s.name}", load row 1: TX key-down current`]);
    expect(f[0].message).toContain('is not a number');
  });
});
