// The forms that store nothing (FORM_ONLY_SPECS: the new-project form and the sweep's GET forms), swept like the
// stored objects' forms (spec-form-sweep.test.ts): every bad value of every field, derived from its spec, typed into
// the real form on its page and sent. The answer is 422 with a message naming the field, the typed text shown back,
// and nothing stored. Expected behaviour is the brief's rule; no numbers here come from running the program.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeApp, postForm, rowCounts, type TestApp } from '../helpers/test-app';
import { forms, unescapeHtml, type HtmlForm } from '../helpers/html';
import { badTexts } from '../helpers/spec-bad-values';
import { loadProject } from '../../src/db/projects';
import { FORM_ONLY_SPECS } from '../../src/core/spec/form-only';
import { SWEEP_PARAMETERS, SWEEP_SPECS } from '../../src/core/spec/sweep';
import { newProjectSpec } from '../../src/core/spec/settings';
import { formName, type Spec } from '../../src/core/spec/field';

const IDS = ['demo-club-30m', 'demo-portable-20m'];
let t: TestApp;
beforeAll(async () => {
  t = await makeApp();
});
afterAll(() => t?.close());

/** The names a spec's fields carry in its form (the stored shape's view may differ: mains → mainsPreset). */
const names = (spec: Spec) => Object.entries(spec.fields).map(([k, f]) => [k, formName(k, f), f] as const);

describe('the forms that store nothing, swept field by field', () => {
  it('every FORM_ONLY_SPECS spec is one of the swept forms below', () => {
    expect(FORM_ONLY_SPECS.map((s) => s.name).sort()).toEqual(
      [newProjectSpec, ...SWEEP_PARAMETERS.map((p) => SWEEP_SPECS[p])].map((s) => s.name).sort(),
    );
  });

  it.each(SWEEP_PARAMETERS.map((p) => [p]))(
    'sweep of %s: each bad value is refused on the sweep page, naming the field',
    async (param) => {
      const spec = SWEEP_SPECS[param];
      let sent = 0;
      for (const id of IDS) {
        const page = await (await t.app.request(`/projects/${id}/sweep`)).text();
        const form = forms(page).find((f) => f.method === 'get' && f.fields.param === param);
        // a project without the item (no mains, no winding) says so in place of the boxes; the other demo has them
        if (!form || !('from' in form.types)) continue;
        for (const [, name] of names(spec)) expect(name in form.types, `${param}: ${name} on the page`).toBe(true);
        for (const [key, name, f] of names(spec)) {
          for (const [bad, why] of badTexts(f)) {
            const before = await loadProject(t.database.db, id);
            const counts = await rowCounts(t.database);
            const query = new URLSearchParams({ ...form.fields, [name]: bad }).toString();
            const res = await t.app.request(`${form.action}?${query}`);
            sent++;
            const where = `${spec.name}.${key} = ${JSON.stringify(bad).slice(0, 40)} (${why}) at ${id}`;
            expect(res.status, where).toBe(422);
            const body = unescapeHtml(await res.text());
            expect(body, where).toContain(f.label);
            if (bad.trim() && bad.length < 100)
              expect(body, `${where}: typed text shown back`).toContain(`value="${bad}"`);
            expect(await loadProject(t.database.db, id), `${where}: nothing stored`).toEqual(before);
            expect(await rowCounts(t.database)).toEqual(counts);
          }
        }
      }
      expect(sent, 'at least one demo offers this sweep').toBeGreaterThan(0);
    },
  );

  it('new project: each bad value is refused on the project list, naming the field, and no project is ' +
    'made', async () => {
    const page = await (await t.app.request('/')).text();
    const form = forms(page).find((f: HtmlForm) => f.action === '/projects' && f.method === 'post')!;
    expect(form).toBeTruthy();
    const valid = { ...form.fields, name: 'Swept project' };
    let sent = 0;
    for (const [key, f] of Object.entries(newProjectSpec.fields)) {
      const name = formName(key, f);
      expect(name in form.types, `${name} on the page`).toBe(true);
      for (const [bad, why] of badTexts(f)) {
        const counts = await rowCounts(t.database);
        const res = await postForm(t.app, '/projects', { ...valid, [name]: bad });
        sent++;
        const where = `new-project.${key} = ${JSON.stringify(bad).slice(0, 40)} (${why})`;
        expect(res.status, where).toBe(422);
        const body = unescapeHtml(await res.text());
        expect(body, where).toContain(f.label);
        // a radio group (the template) cannot show an unknown choice back; its message names it
        if (bad.trim() && bad.length < 100 && form.types[name] !== 'radio')
          expect(body, `${where}: typed text shown back`).toContain(`value="${bad}"`);
        expect(await rowCounts(t.database), `${where}: nothing stored`).toEqual(counts);
      }
    }
    expect(sent).toBeGreaterThan(5);
  });
});
