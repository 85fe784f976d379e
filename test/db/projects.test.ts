import { describe, it, expect } from 'vitest';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { openDatabase } from '../../src/db/client';
import {
  insertProject,
  loadProject,
  updateProject,
  listProjects,
  deleteProject,
  VersionConflict,
} from '../../src/db/projects';
import { DEMO_PROJECTS, seedDemo } from '../../seed-demo/index';

describe('migrations', () => {
  it('create every table on an empty file database, and re-running them changes nothing', async () => {
    const url = `file:${join(mkdtempSync(join(tmpdir(), 'rw-')), 'empty.db')}`;
    const first = await openDatabase(url);
    const tables = (
      await first.client.execute("select name from sqlite_master where type='table' order by name")
    ).rows.map((r) => r.name);
    expect(tables).toEqual(
      expect.arrayContaining([
        'projects',
        'transformers',
        'windings',
        'rails',
        'stages',
        'stage_loads',
        'parts',
        'offers',
        'bom_lines',
      ]),
    );
    first.close();
    const again = await openDatabase(url);
    expect((await listProjects(again.db)).length).toBe(0);
    again.close();
  });
});

describe('project repository', () => {
  it('saves and loads every demo project unchanged', async () => {
    const d = await openDatabase('file::memory:');
    for (const p of DEMO_PROJECTS) {
      await insertProject(d, structuredClone(p), '2026-12-01T00:00:00Z');
      expect(await loadProject(d.db, p.id)).toEqual({ ...p, version: 1 });
    }
  });

  it('seeding is idempotent', async () => {
    const d = await openDatabase('file::memory:');
    expect((await seedDemo(d, 'x')).length).toBe(2);
    expect((await seedDemo(d, 'x')).length).toBe(0);
    expect((await listProjects(d.db)).length).toBe(2);
  });

  it('refuses a stale update and leaves the stored project as it was', async () => {
    const d = await openDatabase('file::memory:');
    await seedDemo(d, 'x');
    const id = DEMO_PROJECTS[0].id;
    const saved = await updateProject(d, id, 1, (p) => ({ ...p, name: 'First tab' }), 'y');
    expect(saved.version).toBe(2);
    await expect(updateProject(d, id, 1, (p) => ({ ...p, name: 'Second tab' }), 'z')).rejects.toBeInstanceOf(
      VersionConflict,
    );
    expect((await loadProject(d.db, id))!.name).toBe('First tab');
  });

  it('serialises concurrent writers without losing either edit', async () => {
    const d = await openDatabase('file::memory:');
    await seedDemo(d, 'x');
    const id = DEMO_PROJECTS[0].id;
    const results = await Promise.allSettled([
      updateProject(d, id, 1, (p) => ({ ...p, notes: 'a' }), 't'),
      updateProject(d, id, 1, (p) => ({ ...p, notes: 'b' }), 't'),
    ]);
    expect(results.filter((r) => r.status === 'fulfilled').length).toBe(1);
    expect(results.filter((r) => r.status === 'rejected' && r.reason instanceof VersionConflict).length).toBe(1);
  });

  it('deletes a project with all its rows', async () => {
    const d = await openDatabase('file::memory:');
    await seedDemo(d, 'x');
    expect(await deleteProject(d, DEMO_PROJECTS[0].id)).toBe(true);
    const left = await d.client.execute("select count(*) as n from stages where project_id = 'demo-club-30m'");
    expect(Number(left.rows[0].n)).toBe(0);
    expect(await loadProject(d.db, DEMO_PROJECTS[0].id)).toBeNull();
  });
});
