// All-or-nothing writes: a refused or failing import and a failing clone leave no partial rows.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeApp, postForm, rowCounts, type TestApp } from '../helpers/test-app';
import { DEMO_PROJECTS } from '../../seed-demo/index';
import { toProjectFile } from '../../src/io/project-file';
import { insertProject, loadProject, listProjects } from '../../src/db/projects';
import { cloneProject } from '../../src/core/new-project';

let t: TestApp;
beforeAll(async () => {
  t = await makeApp();
});
afterAll(() => t?.close());

const file = (p: unknown) => toProjectFile(p as (typeof DEMO_PROJECTS)[number], '2026-01-01T00:00:00Z');
let n = 0;
const makeId = (prefix: string) => `${prefix}-atomic-${++n}`;

/** A project with many children, so a failure late in the write comes after many inserted rows. */
function bigProject() {
  const p = structuredClone(DEMO_PROJECTS[0]);
  const base = p.parts.slice();
  for (let k = 0; k < 20; k++)
    for (const part of base)
      p.parts.push({
        ...structuredClone(part),
        id: `${part.id}-x${k}`,
        offers: part.offers.map((o) => ({ ...o, id: `${o.id}-x${k}` })),
      });
  return p;
}

describe('import is all-or-nothing', () => {
  it('a file cut off half-way is refused with a message; row counts unchanged', async () => {
    const before = await rowCounts(t.database);
    const text = file(bigProject());
    const res = await postForm(t.app, '/import', { json: text.slice(0, Math.floor(text.length / 2)) });
    expect(res.status).toBe(422);
    expect(await res.text()).toMatch(/not valid JSON/);
    expect(await rowCounts(t.database)).toEqual(before);
  });

  it('a file whose last part is invalid is refused, naming the place; nothing of the earlier parts is ' +
    'saved', async () => {
    const before = await rowCounts(t.database);
    const p = bigProject();
    const last = p.parts.length - 1;
    p.parts[last].description = '   ';
    const res = await postForm(t.app, '/import', { json: file(p) });
    expect(res.status).toBe(422);
    expect(await res.text()).toContain(`project.parts[${last}].description`);
    expect(await rowCounts(t.database)).toEqual(before);
  });

  it('a file that passes validation but fails while being written (two transformers share an id) leaves no ' +
    'rows', async () => {
    const before = await rowCounts(t.database);
    const projectsBefore = (await listProjects(t.database.db)).length;
    const p = bigProject();
    // the duplicate sits after the project row is written, so a non-transactional insert would leave rows
    const tr = p.supply.transformers[0];
    p.supply.transformers.push({
      ...structuredClone(tr),
      windings: tr.windings.map((w) => ({ ...w, id: `${w.id}-second` })),
    });
    const res = await postForm(t.app, '/import', { json: file(p) });
    // (today this answers 500: the file check does not look for duplicate transformer ids; the point here is
    // that the failed write leaves nothing behind)
    expect(res.status).not.toBe(303);
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(await rowCounts(t.database)).toEqual(before);
    expect((await listProjects(t.database.db)).length).toBe(projectsBefore);
  });
});

describe('parts-list CSV import is all-or-nothing unless asked for the good rows', () => {
  const csv = [
    'Refs,Description,Quantity,Supplier,Price,Currency',
    'R81,Resistor 1k 0.25 W,2,Plain Parts Co,0.05,USD',
    'R82,Resistor 2k2 0.25 W,lots,Plain Parts Co,0.05,USD',
    'R83,Resistor 4k7 0.25 W,1,Plain Parts Co,0.05,USD',
  ].join('\r\n');
  const importCsv = async (extra: Record<string, string>) => {
    const version = (await loadProject(t.database.db, 'demo-portable-20m'))!.version;
    return postForm(t.app, '/projects/demo-portable-20m/bom/import', {
      csv,
      action: 'import',
      version: String(version),
      stageId: '',
      ...extra,
    });
  };

  it('a file with a bad row in the middle imports nothing and says so', async () => {
    const before = await rowCounts(t.database);
    const res = await importCsv({});
    expect(res.status).toBe(422);
    expect(await res.text()).toMatch(/Nothing was imported/);
    expect(await rowCounts(t.database)).toEqual(before);
  });

  it('control: asked for the good rows only, it imports exactly those two lines', async () => {
    const before = await rowCounts(t.database);
    const res = await importCsv({ takeGoodRows: 'true' });
    expect(res.status).toBe(303);
    const after = await rowCounts(t.database);
    expect(after.bom_lines - before.bom_lines).toBe(2);
    const refs = (await loadProject(t.database.db, 'demo-portable-20m'))!.bom.map((b) => b.refs);
    expect(refs).toEqual(expect.arrayContaining(['R81', 'R83']));
    expect(refs).not.toContain('R82');
  });
});

describe('clone is all-or-nothing', () => {
  it('insertProject rolls back every row when the last insert fails (duplicate parts-list line id)', async () => {
    const before = await rowCounts(t.database);
    const source = (await loadProject(t.database.db, 'demo-club-30m'))!;
    const copy = cloneProject(source, 'prj-atomic-clone', 'Clone that fails at the end', makeId);
    expect(copy.bom.length).toBeGreaterThan(0);
    // the very last row collides with a line the demo already has
    copy.bom[copy.bom.length - 1].id = source.bom[0].id;
    await expect(insertProject(t.database, copy, '2026-01-01T00:00:00Z')).rejects.toThrow();
    expect(await loadProject(t.database.db, 'prj-atomic-clone')).toBeNull();
    expect(await rowCounts(t.database)).toEqual(before);
    // and nothing of the copy's other children was left behind under their new ids
    const stray = await t.database.client.execute({
      sql: 'SELECT count(*) AS n FROM stages WHERE id = ?',
      args: [copy.stages[0].id],
    });
    expect(Number(stray.rows[0].n)).toBe(0);
  });

  it('a failed write does not block the next one (the write queue recovers)', async () => {
    const source = (await loadProject(t.database.db, 'demo-club-30m'))!;
    const bad = cloneProject(source, 'demo-club-30m', 'Duplicate project id', makeId);
    const good = cloneProject(source, 'prj-atomic-good', 'Clone that works', makeId);
    const [r1, r2] = await Promise.allSettled([
      insertProject(t.database, bad, '2026-01-01T00:00:00Z'),
      insertProject(t.database, good, '2026-01-01T00:00:00Z'),
    ]);
    expect(r1.status).toBe('rejected');
    expect(r2.status).toBe('fulfilled');
    const stored = (await loadProject(t.database.db, 'prj-atomic-good'))!;
    expect(stored.stages.length).toBe(source.stages.length);
    expect(stored.parts.length).toBe(source.parts.length);
    expect(stored.bom.length).toBe(source.bom.length);
  });

  it('control: the clone route copies every row of the project', async () => {
    const before = await rowCounts(t.database);
    const res = await postForm(t.app, '/projects/demo-portable-20m/clone', {});
    expect(res.status).toBe(303);
    const after = await rowCounts(t.database);
    const src = (await loadProject(t.database.db, 'demo-portable-20m'))!;
    expect(after.projects).toBe(before.projects + 1);
    expect(after.stages - before.stages).toBe(src.stages.length);
    expect(after.parts - before.parts).toBe(src.parts.length);
  });
});
