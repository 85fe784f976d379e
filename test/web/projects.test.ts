import { describe, it, expect } from 'vitest';
import { demoApp, ORIGIN } from '../helpers/app';
import { listProjects, loadProject } from '../../src/db/projects';

const ID = 'demo-club-30m';

function upload(app: Awaited<ReturnType<typeof demoApp>>['app'], text: string) {
  const form = new FormData();
  form.set('file', new File([text], 'p.json', { type: 'application/json' }));
  return app.request(`${ORIGIN}/import`, { method: 'POST', body: form, headers: { Origin: ORIGIN } });
}

describe('project list', () => {
  it('creates a project and refuses a nameless one', async () => {
    const { post, database } = await demoApp();
    const bad = await post('/projects', { name: '  ', band: '7.03 MHz', power: '5 W', mains: '230-50' });
    expect(bad.status).toBe(422);
    expect(await bad.text()).toContain('Name must not be empty');
    expect((await listProjects(database.db)).length).toBe(2);
    const ok = await post('/projects', { name: '40 m QRP', band: '7.03 MHz', power: '5 W', mains: 'battery' });
    expect(ok.status).toBe(303);
    expect((await listProjects(database.db)).map((p) => p.name)).toContain('40 m QRP');
  });

  it('clones with fresh ids and renames with a version check', async () => {
    const { post, database } = await demoApp();
    expect((await post(`/projects/${ID}/clone`, {})).status).toBe(303);
    const all = await listProjects(database.db);
    const copy = all.find((p) => p.name.startsWith('Copy of'))!;
    const loaded = (await loadProject(database.db, copy.id))!;
    expect(loaded.stages.length).toBe(7);
    const originalIds = new Set((await loadProject(database.db, ID))!.stages.map((s) => s.id));
    expect(loaded.stages.every((s) => !originalIds.has(s.id))).toBe(true);
    expect((await post(`/projects/${copy.id}/rename`, { version: '1', name: 'Second batch' })).status).toBe(303);
    const stale = await post(`/projects/${copy.id}/rename`, { version: '1', name: 'Third' });
    expect(stale.status).toBe(409);
    expect((await loadProject(database.db, copy.id))!.name).toBe('Second batch');
  });

  it('asks before deleting, then deletes', async () => {
    const { get, post, database } = await demoApp();
    const confirm = await get(`/projects/${ID}/delete`);
    expect(await confirm.text()).toContain('cannot be undone');
    expect((await listProjects(database.db)).length).toBe(2);
    const version = /name="version" value="(\d+)"/.exec(await (await get(`/projects/${ID}/delete`)).text())![1];
    expect((await post(`/projects/${ID}/delete`, { version })).status).toBe(303);
    expect((await listProjects(database.db)).length).toBe(1);
  });

  it('a delete confirmed before another edit is asked again, not carried out', async () => {
    const { get, post, database } = await demoApp();
    const shownVersion = /name="version" value="(\d+)"/.exec(await (await get(`/projects/${ID}/delete`)).text())![1];
    // another window renames the project after the confirmation page was shown
    expect((await post(`/projects/${ID}/rename`, { version: shownVersion, name: 'Renamed elsewhere' })).status).toBe(
      303,
    );
    const stale = await post(`/projects/${ID}/delete`, { version: shownVersion });
    expect(stale.status).toBe(409);
    const html = await stale.text();
    expect(html).toContain('Not deleted: this project was changed');
    expect(html).toContain(`name="version" value="${Number(shownVersion) + 1}"`);
    // a delete with no version at all is not carried out either
    expect((await post(`/projects/${ID}/delete`, {})).status).toBe(409);
    expect((await listProjects(database.db)).length).toBe(2);
  });

  it('renaming a project deleted meanwhile says so instead of failing', async () => {
    const { post, database } = await demoApp();
    expect((await post(`/projects/${ID}/delete`, { version: '1' })).status).toBe(303);
    const res = await post(`/projects/${ID}/rename`, { version: '1', name: 'Too late' });
    expect(res.status).toBe(404);
    expect(await res.text()).toContain('Not renamed: that project no longer exists');
    expect((await listProjects(database.db)).map((p) => p.name)).not.toContain('Too late');
  });

  it('exports JSON and imports it back as a new project', async () => {
    const { app, get, database } = await demoApp();
    const exported = await (await get(`/projects/${ID}/export.json`)).text();
    const res = await upload(app, exported);
    expect(res.status).toBe(303);
    const all = await listProjects(database.db);
    expect(all.length).toBe(3);
    const imported = all.find((p) => p.id !== ID && p.name === (JSON.parse(exported).project.name as string))!;
    const a = (await loadProject(database.db, ID))!;
    const b = (await loadProject(database.db, imported.id))!;
    expect(b.stages.map((s) => s.name)).toEqual(a.stages.map((s) => s.name));
    expect(b.bom.length).toBe(a.bom.length);
  });

  it.each([
    ['not JSON', '{"format": ', /not valid JSON/],
    [
      'another format',
      JSON.stringify({ format: 'something-else', formatVersion: 1, project: {} }),
      /format: is not &quot;rigwright-project&quot;/,
    ],
  ])('a bad import (%s) is refused with a message and nothing is saved', async (_label, text, message) => {
    const { app, database } = await demoApp();
    const res = await upload(app, text);
    expect(res.status).toBe(422);
    expect(await res.text()).toMatch(message);
    expect((await listProjects(database.db)).length).toBe(2);
  });

  it('a bad value deep inside an import names its place', async () => {
    const { app, get, database } = await demoApp();
    const file = JSON.parse(await (await get(`/projects/${ID}/export.json`)).text());
    file.project.stages[2].loads[0].currentA.keyDown = -1;
    file.project.bom[0].partId = 'missing-part';
    const res = await upload(app, JSON.stringify(file));
    expect(res.status).toBe(422);
    expect(await res.text()).toContain('project.stages[2].loads[0].currentA.keyDown');
    file.project.stages[2].loads[0].currentA.keyDown = 0.2;
    const res2 = await upload(app, JSON.stringify(file));
    expect(await res2.text()).toContain('project.bom[0].partId: no part');
    expect((await listProjects(database.db)).length).toBe(2);
  });
});

describe('import cross-references', () => {
  it('two transformers with one id are refused with a message, not a server error', async () => {
    const { app, get, database } = await demoApp();
    const file = JSON.parse(await (await get(`/projects/${ID}/export.json`)).text());
    file.project.supply.transformers.push({ ...file.project.supply.transformers[0], windings: [] });
    const res = await upload(app, JSON.stringify(file));
    expect(res.status).toBe(422);
    expect(await res.text()).toContain('transformer id &quot;tr-main&quot; is used twice');
    expect((await listProjects(database.db)).length).toBe(2);
  });
});

describe('import file encodings', () => {
  it('a file saved with a byte-order mark imports like one without', async () => {
    const { app, get, database } = await demoApp();
    const exported = await (await get(`/projects/${ID}/export.json`)).text();
    const res = await upload(app, `\uFEFF${exported}`);
    expect(res.status).toBe(303);
    expect((await listProjects(database.db)).length).toBe(3);
    // the CLI reads files with readFileSync(..., 'utf8'), which keeps the mark: the parser must skip it
    const { parseProjectFile } = await import('../../src/io/project-file');
    expect(parseProjectFile(`\uFEFF${exported}`).ok).toBe(true);
  });
});
