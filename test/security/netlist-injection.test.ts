// SPICE netlist downloads must not let a project's text become simulator commands. A name with line
// breaks would otherwise start a new netlist line: ".control" + "shell <command>" runs a shell command
// when the builder runs the downloaded file with `ngspice -b` (on a shared club server, one member's
// project text reaches another member's machine this way).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { existsSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { NGSPICE, requireTool } from '../helpers/tools';
import { spawnSync } from 'node:child_process';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { makeApp, postForm, type TestApp } from '../helpers/test-app';
import { appRoutes } from '../helpers/routes';
import { DEMO_PROJECTS } from '../../seed-demo/index';
import { toProjectFile } from '../../src/io/project-file';
import { loadProject, insertProject } from '../../src/db/projects';
import { cloneProject } from '../../src/core/new-project';
import { newId } from '../../src/web/ids';

const MARKER = 'rigwright-injected-marker';
const INJECTION = `\n.control\nshell touch ${MARKER}\n.endc\n`;

let t: TestApp;
let id = '';
beforeAll(async () => {
  t = await makeApp();
  const p = structuredClone(DEMO_PROJECTS[0]);
  for (const r of p.supply.rails) r.name = `${r.name}${INJECTION}`;
  for (const s of p.stages) s.name = `${s.name}${INJECTION}`;
  for (const tr of p.supply.transformers) for (const w of tr.windings) w.name = `${w.name}${INJECTION}`;
  // The import refuses multi-line names outright (checked below); to test the netlist layer on its own,
  // the hostile project goes straight into the database, as an older file or another client might have left it.
  const res = await postForm(t.app, '/import', { json: toProjectFile(p, '2026-01-01T00:00:00Z') });
  expect(res.status).toBe(422);
  expect(await res.text()).toContain('must be one line of text');
  const copy = cloneProject(p, 'hostile-project', p.name, newId);
  await insertProject(t.database, copy, '2026-01-01T00:00:00Z');
  id = copy.id;
});
afterAll(() => t?.close());

async function netlists(): Promise<[string, string][]> {
  const p = (await loadProject(t.database.db, id))!;
  const out: [string, string][] = [];
  for (const r of appRoutes(t.app).filter((x) => x.method === 'GET' && /\.cir$/.test(x.pattern))) {
    const fills = r.pattern.includes(':railId')
      ? p.supply.rails.filter((x) => x.kind === 'rectified').map((x) => ({ id, railId: x.id }))
      : p.stages.filter((s) => s.lpf).map((s) => ({ id, sid: s.id }));
    for (const f of fills) {
      const path = r.pattern.replace(/:(\w+)/g, (_m, k: string) => (f as Record<string, string>)[k]);
      const res = await t.app.request(path);
      expect(res.status, path).toBe(200);
      out.push([path, await res.text()]);
    }
  }
  return out;
}

describe('SPICE netlist downloads', () => {
  it('a stored multi-line core name is refused by the filter input spec: no netlist, a message naming the ' +
    'field', async () => {
    const p = (await loadProject(t.database.db, id))!;
    const lpf = p.stages.find((s) => s.lpf)!;
    const bad = cloneProject(
      {
        ...p,
        stages: p.stages.map((s) => (s.id === lpf.id ? { ...s, lpf: { ...s.lpf!, coreName: `core${INJECTION}` } } : s)),
      },
      'hostile-core',
      p.name,
      newId,
    );
    await insertProject(t.database, bad, '2026-01-01T00:00:00Z');
    const sid = bad.stages.find((s) => s.lpf)!.id;
    const res = await t.app.request(`/projects/hostile-core/stages/${sid}/lpf.cir`);
    expect(res.status).toBe(422);
    const body = await res.text();
    expect(body).toContain('Core must be one line of text');
    expect(body.split(/\r?\n/).filter((l) => /^\s*(\.control|shell\b)/i.test(l))).toEqual([]);
  });

  it('keep every piece of project text inside comment lines (no injected .control / shell line)', async (ctx) => {
    const files = await netlists();
    if (!files.length) ctx.skip('no netlist download route yet');
    for (const [path, text] of files) {
      // the payload's lines all carry the marker or sit between it: any non-comment line with it, or any
      // shell line at all, is project text turned into a command
      const injected = text
        .split(/\r?\n/)
        .filter((l) => (l.includes(MARKER) && !l.trimStart().startsWith('*')) || /^\s*shell\b/i.test(l));
      expect(injected, `${path} has command lines from project text`).toEqual([]);
    }
  });

  it.skipIf(!requireTool(NGSPICE, 'Running a downloaded netlist in ngspice', 'apt-get install ngspice'))(
    'running a downloaded netlist with ngspice -b runs no command from project text',
    async () => {
      for (const [path, text] of await netlists()) {
        const dir = mkdtempSync(join(tmpdir(), 'rigwright-inject-'));
        try {
          writeFileSync(join(dir, 'download.cir'), text);
          spawnSync(NGSPICE as string, ['-b', 'download.cir'], { cwd: dir, encoding: 'utf8', timeout: 60_000 });
          expect(readdirSync(dir), `${path}: ngspice ran the injected shell command`).not.toContain(MARKER);
        } finally {
          rmSync(dir, { recursive: true, force: true });
        }
      }
    },
  );
});
