// The core catalog travels with the project: database rows, the project file (export and import) and a clone, with
// the filter's and the PA's references to it following the cores' new ids.
import { describe, expect, it } from 'vitest';
import { openDatabase } from '../../src/db/client';
import { insertProject, loadProject, changeProject } from '../../src/db/projects';
import { parseProjectFile, toProjectFile } from '../../src/io/project-file';
import { cloneProject } from '../../src/core/new-project';
import { DEMO_PROJECTS } from '../../seed-demo';

const club = DEMO_PROJECTS[0];
let n = 0;
const makeId = (prefix: string) => `${prefix}-new-${++n}`;

describe('core catalog round trips', () => {
  it('the club demo has cores and its filter and PA refer to them', () => {
    expect(club.cores?.length).toBeGreaterThanOrEqual(2);
    const ids = new Set(club.cores!.map((c) => c.id));
    expect(ids.has(club.stages.find((s) => s.lpf)!.lpf!.coreId!)).toBe(true);
    expect(ids.has(club.stages.find((s) => s.pa)!.pa!.outputCoreId!)).toBe(true);
  });
  it('database: stored and loaded unchanged; a deleted core row goes', async () => {
    const d = await openDatabase('file::memory:');
    await insertProject(d, club, '2026-01-01T00:00:00Z');
    const back = await loadProject(d.db, club.id);
    expect(back!.cores).toEqual(club.cores);
    const after = await changeProject(d, club.id, (p) => ({ ...p, cores: p.cores!.slice(1) }), '2026-01-01T00:00:01Z');
    expect(after.cores!.map((c) => c.id)).toEqual(club.cores!.slice(1).map((c) => c.id));
  });
  it('project file: exported and imported unchanged; a bad core value is refused with its place and field', () => {
    // the battery demo (no mains transformer) with its filter on its first catalog core
    const base = DEMO_PROJECTS[1];
    const p = {
      ...base,
      stages: base.stages.map((s) => (s.lpf ? { ...s, lpf: { ...s.lpf, coreId: base.cores![0].id } } : s)),
    };
    const text = toProjectFile(p, '2026-01-01T00:00:00Z');
    const r = parseProjectFile(text);
    expect(r.ok, JSON.stringify(r)).toBe(true);
    if (r.ok) expect(r.project.cores).toEqual(p.cores);
    const json = JSON.parse(text);
    json.project.cores[0].fluxLimitT = -1;
    const bad = parseProjectFile(JSON.stringify(json));
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.errors.join('\n')).toMatch(/project\.cores\[0\]\.fluxLimitT: .*Flux density limit/);
    const dangling = JSON.parse(text);
    dangling.project.cores = [];
    const r2 = parseProjectFile(JSON.stringify(dangling));
    expect(r2.ok).toBe(false);
    if (!r2.ok) expect(r2.errors.join('\n')).toContain('lpf.coreId: no core');
  });
  it('clone: fresh core ids, and the filter and PA point to the copies', () => {
    const c = cloneProject(club, 'prj-copy', 'Copy', makeId);
    const ids = c.cores!.map((x) => x.id);
    expect(ids.some((id) => club.cores!.some((o) => o.id === id))).toBe(false);
    const oldLpf = club.stages.find((s) => s.lpf)!.lpf!.coreId!;
    const newLpf = c.stages.find((s) => s.lpf)!.lpf!.coreId!;
    expect(c.cores![ids.indexOf(newLpf)].name).toBe(club.cores!.find((x) => x.id === oldLpf)!.name);
    const newPa = c.stages.find((s) => s.pa)!.pa!.outputCoreId!;
    expect(ids).toContain(newPa);
  });
});
