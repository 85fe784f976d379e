// Every field of every input spec, typed badly into the real form on its page and posted: the answer is 422 with a
// message naming the field, the typed text is shown back, and nothing is stored. Forms are found on the rendered
// pages and matched to the specs by their field names, so a spec (or a form) added later is swept unchanged.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeApp, postForm, rowCounts, type TestApp } from '../helpers/test-app';
import { appRoutes, idsFor } from '../helpers/routes';
import { forms, unescapeHtml, type HtmlForm } from '../helpers/html';
import { badTexts } from '../helpers/spec-bad-values';
import { loadProject } from '../../src/db/projects';
import { ALL_SPECS } from '../../src/core/spec';
import { formName, type Spec } from '../../src/core/spec/field';

const IDS = ['demo-club-30m', 'demo-portable-20m'];
let t: TestApp;
beforeAll(async () => {
  t = await makeApp();
});
afterAll(() => t?.close());

const nameOf = (spec: Spec, key: string) => (spec.rowName ? spec.rowName(0, key) : formName(key, spec.fields[key]));

/** Every POST form on every page of the demo projects (each stage's page too). */
async function allForms(): Promise<HtmlForm[]> {
  const out: HtmlForm[] = [];
  for (const id of IDS) {
    const p = (await loadProject(t.database.db, id))!;
    const paths = new Set(
      appRoutes(t.app, idsFor(p))
        .filter((r) => r.method === 'GET' && r.pattern.includes(':id'))
        .map((r) => r.path),
    );
    for (const s of p.stages) paths.add(`/projects/${id}/stages/${s.id}`);
    for (const path of paths) {
      const res = await t.app.request(path);
      if (!(res.headers.get('Content-Type') ?? '').startsWith('text/html')) continue;
      for (const f of forms(await res.text())) if (f.method === 'post' && !/\/delete$/.test(f.action)) out.push(f);
    }
  }
  return out;
}

/** Forms that carry every field of the spec (by form name). */
const formsFor = (spec: Spec, all: HtmlForm[]) =>
  all.filter((f) => Object.keys(spec.fields).every((k) => nameOf(spec, k) in f.types));

describe('bad input in every spec field of every form', () => {
  it('is refused with the field named, shown back, and nothing stored', async () => {
    const all = await allForms();
    const unswept = ALL_SPECS.filter((s) => formsFor(s, all).length === 0).map((s) => s.name);
    expect(unswept, 'specs with no form on any page').toEqual([]);
    let posts = 0;
    for (const spec of ALL_SPECS) {
      // one form per spec and project is enough (the same component draws each); the fullest one, so a table row is
      // an existing row (an empty new row may rightly leave its rail unchosen)
      const filled = (f: HtmlForm) =>
        Object.keys(spec.fields).filter((k) => (f.fields[nameOf(spec, k)] ?? '') !== '').length;
      const seen = new Set<string>();
      for (const form of formsFor(spec, all).sort((a, b) => filled(b) - filled(a))) {
        const project = form.action.split('/')[2];
        if (seen.has(project)) continue;
        seen.add(project);
        for (const [key, f] of Object.entries(spec.fields)) {
          for (const [bad, why] of badTexts(f)) {
            const before = await loadProject(t.database.db, project);
            const counts = await rowCounts(t.database);
            const name = nameOf(spec, key);
            const res = await postForm(
              t.app,
              form.action,
              { ...form.fields, version: String(before!.version), [name]: bad },
              { 'HX-Request': 'true' },
            );
            posts++;
            const where = `${spec.name}.${key} = ${JSON.stringify(bad).slice(0, 40)} (${why}) at ${form.action}`;
            expect(res.status, where).toBe(422);
            const body = unescapeHtml(await res.text());
            expect(body, where).toContain(f.label);
            if (bad.trim() && bad.length < 100)
              expect(body, `${where}: typed text shown back`).toContain(`value="${bad}"`);
            expect(await loadProject(t.database.db, project), `${where}: nothing stored`).toEqual(before);
            expect(await rowCounts(t.database)).toEqual(counts);
          }
        }
      }
    }
    console.log(`spec form sweep: ${ALL_SPECS.length} specs, ${posts} refused posts`);
    expect(posts).toBeGreaterThan(100);
  }, 300_000);
});
