// Markup typed into any text field comes back escaped on every page; formulas are neutralised in CSV.
// Payloads reach fields two ways: through the forms (create, rename, settings, add stage, a refused
// current) and through an imported project file whose every free-text field carries one.
import { PDFTOTEXT } from '../helpers/tools';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { makeApp, postForm, type TestApp } from '../helpers/test-app';
import { appRoutes, idsFor } from '../helpers/routes';
import { formByAction, stageIds } from '../helpers/html';
import { withPayloads, MARKUP_PAYLOADS, RAW_MARKERS, ESCAPED_SCRIPT, FORMULA_PAYLOAD } from '../helpers/payloads';
import { DEMO_PROJECTS } from '../../seed-demo/index';
import { toProjectFile } from '../../src/io/project-file';
import { loadProject } from '../../src/db/projects';
import { parseCsv } from '../../src/core/csv/parse';
import { FORMULA_TRIGGERS } from '../../src/core/csv/write';

let t: TestApp;
let importedId = '';
beforeAll(async () => {
  t = await makeApp();
  const hostile = withPayloads(DEMO_PROJECTS[0]);
  const res = await postForm(t.app, '/import', { json: toProjectFile(hostile, '2026-01-01T00:00:00Z') });
  expect(res.status, await res.clone().text()).toBe(303);
  importedId = res.headers.get('Location')!.split('/').pop()!;
});
afterAll(() => t?.close());

function expectNoRawMarkup(html: string, where: string) {
  for (const m of RAW_MARKERS) expect(html.includes(m), `${where} contains raw ${m}`).toBe(false);
}

async function idsOf(id: string): Promise<Record<string, string>> {
  return idsFor((await loadProject(t.database.db, id))!);
}

/** Every GET page of a project (overview, supply, parts, ... as they exist), HTML only. */
async function projectPages(id: string): Promise<[string, string][]> {
  const out: [string, string][] = [['/', await (await t.app.request('/')).text()]];
  for (const r of appRoutes(t.app, await idsOf(id))) {
    if (r.method !== 'GET' || !r.pattern.includes(':id')) continue;
    const res = await t.app.request(r.path);
    if ((res.headers.get('Content-Type') ?? '').startsWith('text/html')) out.push([r.path, await res.text()]);
  }
  return out;
}

describe('markup payloads come back escaped', () => {
  it('the imported file really carried payloads in its text fields (import kept them)', async () => {
    const p = (await loadProject(t.database.db, importedId))!;
    expect(p.name).toMatch(/^(<script>|"><img|'><svg)/);
    expect(p.stages.every((s) => s.notes.includes('#'))).toBe(true);
    expect(p.parts[0].offers[0].supplier).toContain('#');
  });

  it('on every HTML page of the hostile project: no raw markup, and the escaped text is shown', async () => {
    const pages = await projectPages(importedId);
    // overview, stage, supply, RF, parts, parts list, pack, delete confirmations ... (more as pages land)
    expect(pages.length).toBeGreaterThanOrEqual(8);
    let shown = 0;
    for (const [path, html] of pages) {
      expectNoRawMarkup(html, path);
      if (html.includes(ESCAPED_SCRIPT)) shown++;
    }
    expect(shown, 'pages that show the escaped payload').toBeGreaterThanOrEqual(2);
  });

  it('through the forms: create, rename, settings notes and a new stage name', async () => {
    const [p1, p2, p3] = MARKUP_PAYLOADS;
    const created = await postForm(t.app, '/projects', { name: p1, band: '7.03 MHz', power: '5 W', mains: '230-50' });
    expect(created.status).toBe(303);
    const id = created.headers.get('Location')!.split('/').pop()!;
    const overview = await (await t.app.request(`/projects/${id}`)).text();
    const settings = formByAction(overview, `/projects/${id}/settings`);
    const saved = await postForm(t.app, `/projects/${id}/settings`, { ...settings.fields, notes: `${p2}\n${p3}` });
    expect(saved.status).toBe(303);
    const added = await postForm(t.app, `/projects/${id}/stages`, { version: '2', kind: 'receiver', name: p2 });
    expect(added.status).toBe(303);
    const renamed = await postForm(t.app, `/projects/${id}/rename`, { version: '3', name: `${p3} renamed` });
    expect(renamed.status).toBe(303);
    const stored = (await loadProject(t.database.db, id))!;
    expect(stored.notes).toBe(`${p2}\n${p3}`);
    expect(stored.stages.at(-1)!.name).toBe(p2);
    for (const [path, html] of await projectPages(id)) expectNoRawMarkup(html, path);
  });

  it('in a refused form: the typed text echoed beside the field and in the message is escaped', async () => {
    const html = await (await t.app.request('/projects/demo-club-30m')).text();
    const sid = stageIds(html).find((s) => html.includes(`/stages/${s}/loads`))!;
    const form = formByAction(html, `/projects/demo-club-30m/stages/${sid}/loads`);
    const res = await postForm(t.app, form.action, { ...form.fields, l0_receive: `abc${MARKUP_PAYLOADS[0]}` });
    expect(res.status).toBe(422);
    const body = await res.text();
    expectNoRawMarkup(body, 'refused loads form');
    expect(body).toContain(`abc${ESCAPED_SCRIPT}`);
  });

  it('the JSON export is served as JSON with nosniff (never rendered as a page) and keeps the text ' +
    'exactly', async () => {
    const res = await t.app.request(`/projects/${importedId}/export.json`);
    expect(res.headers.get('Content-Type')).toMatch(/^application\/json/);
    expect(res.headers.get('X-Content-Type-Options')).toBe('nosniff');
    // the file name is reduced to safe characters
    expect(res.headers.get('Content-Disposition')).toMatch(/^attachment; filename="[A-Za-z0-9._-]+"$/);
    const file = JSON.parse(await res.text());
    expect(file.project.name).toBe((await loadProject(t.database.db, importedId))!.name);
  });
});

describe('downloads of the hostile project', () => {
  it('the PDF pack still renders (payload text is only text in a PDF)', async (ctx) => {
    if (!appRoutes(t.app).some((r) => r.pattern === '/projects/:id/pack.pdf')) ctx.skip('no PDF pack route yet');
    const res = await t.app.request(`/projects/${importedId}/pack.pdf`);
    expect(res.status).toBe(200);
    expect(res.headers.get('Content-Type')).toMatch(/^application\/pdf/);
    const bytes = Buffer.from(await res.arrayBuffer());
    expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    // the payloads are printed as the literal text they are (poppler's pdftotext, when installed)
    if (!PDFTOTEXT)
      console.warn(
        '[skip] PDF text check of the escaped payloads skipped: pdftotext not found on PATH (apt-get install ' +
          'poppler-utils).',
      );
    else {
      const dir = mkdtempSync(join(tmpdir(), 'rigwright-pdf-'));
      try {
        writeFileSync(join(dir, 'pack.pdf'), bytes);
        const text = spawnSync(PDFTOTEXT, ['-raw', join(dir, 'pack.pdf'), '-'], { encoding: 'utf8' }).stdout;
        expect(text).toContain('<script>alert(1)</script>');
      } finally {
        rmSync(dir, { recursive: true, force: true });
      }
    }
  });
});

describe('CSV exports neutralise formulas', () => {
  it('every CSV route (when present) has no cell that a spreadsheet would run as a formula', async (ctx) => {
    const csvRoutes = appRoutes(t.app, await idsOf(importedId)).filter(
      (r) => r.method === 'GET' && /csv/i.test(r.pattern),
    );
    if (!csvRoutes.length) ctx.skip('no CSV download route is registered yet (parts list CSV not landed)');
    let sawPayload = false;
    for (const r of csvRoutes) {
      const res = await t.app.request(r.path);
      expect(res.status, r.path).toBe(200);
      const parsed = parseCsv(await res.text());
      for (const row of parsed.records)
        for (const cell of row) {
          if (cell.includes('HYPERLINK')) sawPayload = true;
          if (cell.length && (FORMULA_TRIGGERS as readonly string[]).includes(cell[0]) && !/^[+-]?\d/.test(cell))
            throw new Error(`${r.path}: live formula cell ${JSON.stringify(cell)}`);
        }
    }
    expect(sawPayload, `the formula payload ${FORMULA_PAYLOAD} reached a CSV`).toBe(true);
  });
});
