// Fix links go to the exact input: every finding that needs attention on both demos links to the anchor of a form
// control (input, select or textarea) on its target page; the overview's top fixes are such links. Inputs drawn from
// specs carry ids derived from spec, item and field (views/components/field-id.ts), unique on each page.
import { describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { loadProject } from '../../src/db/projects';
import { evaluate } from '../../src/core/evaluate';
import { actionable } from '../../src/core/findings';
import { fixLink } from '../../views/components/fix-link';
import { fieldId } from '../../views/components/field-id';
import { TEMPLATE_INFO, TEMPLATE_KEYS } from '../../src/core/templates/choices';

const DEMOS = ['demo-club-30m', 'demo-portable-20m'];

/** The tag name of the element carrying this id, or null. */
const tagWithId = (html: string, id: string) =>
  new RegExp(`<(\\w+)\\b[^>]*\\sid="${id.replace(/[-/\\^$*+?.()|[\]{}]/g, '\\$&')}"`).exec(html)?.[1] ?? null;

describe('fix links go to the field', () => {
  it('ids are spec--item--field, a field path with dots kept apart by dashes', () => {
    expect(fieldId('primary-fuse', 'pf', 'primaryFuseA')).toBe('primary-fuse--pf--primaryFuseA');
    expect(fieldId('settings', 'project', 'mains.lowFraction')).toBe('settings--project--mains-lowFraction');
  });

  it.each(DEMOS)('%s: every top-fix link resolves to a form control on its target page', async (id) => {
    const { get } = await demoApp();
    const html = await (await get(`/projects/${id}`)).text();
    const top = html.slice(html.indexOf('id="top-fixes"'), html.indexOf('id="cost-glance"'));
    const hrefs = [...top.matchAll(/class="fix-link" href="([^"]+)"/g)].map((m) => m[1]);
    expect(hrefs.length).toBe(3); // both demos have at least three findings to fix, so every link below is checked
    for (const href of hrefs) {
      const [path, anchor] = href.split('#');
      expect(anchor, href).toBeTruthy();
      const res = await get(path);
      expect(res.status, href).toBe(200);
      expect(tagWithId(await res.text(), anchor), href).toMatch(/^(input|select|textarea)$/);
    }
  });

  it.each(DEMOS)('%s: every finding under "Needs attention" on the overview carries its fix link', async (id) => {
    const { get } = await demoApp();
    const html = await (await get(`/projects/${id}`)).text();
    const items = [...html.matchAll(/<li class="finding sev-(?:fail|caution)"[\s\S]*?<\/li>/g)].map((m) => m[0]);
    expect(items.length).toBeGreaterThan(3);
    for (const li of items) expect(li, li.slice(0, 120)).toMatch(/class="fix-link" href="\/projects\/[^"#]+#[^"]+"/);
  });

  it.each(DEMOS)('%s: every actionable finding that is not ok links to a form control', async (id) => {
    const { get, database } = await demoApp();
    const project = (await loadProject(database.db, id))!;
    const findings = actionable(evaluate(project).findings).filter((f) => f.severity !== 'ok');
    expect(findings.length).toBeGreaterThan(3);
    const pages = new Map<string, string>();
    const wrong: string[] = [];
    for (const f of findings) {
      const { href } = fixLink(project, f);
      const [path, anchor] = href.split('#');
      if (!pages.has(path)) pages.set(path, await (await get(path)).text());
      const tag = anchor ? tagWithId(pages.get(path)!, anchor) : null;
      if (!tag || !/^(input|select|textarea)$/.test(tag))
        wrong.push(`${f.rule} (${f.subject}) → ${href}: ${tag ?? 'no such id'}`);
    }
    expect(wrong).toEqual([]);
  });

  it.each(TEMPLATE_KEYS.map((k) => [k]))(
    'a project from the %s template: every finding to fix links to a form control',
    async (template) => {
      const { get, post, database } = await demoApp();
      const res = await post('/projects', {
        name: `From ${template}`,
        band: '7.03',
        power: '5',
        mains: TEMPLATE_INFO[template].mains ? '230-50' : 'battery',
        template,
      });
      expect(res.status).toBe(303);
      const path = res.headers.get('Location')!;
      const project = (await loadProject(database.db, path.split('/').pop()!))!;
      const pages = new Map<string, string>();
      const wrong: string[] = [];
      for (const f of actionable(evaluate(project).findings).filter((x) => x.severity !== 'ok')) {
        const { href } = fixLink(project, f);
        const [page, anchor] = href.split('#');
        if (!pages.has(page)) pages.set(page, await (await get(page)).text());
        const tag = anchor ? tagWithId(pages.get(page)!, anchor) : null;
        if (!tag || !/^(input|select|textarea)$/.test(tag))
          wrong.push(`${f.rule} (${f.subject}) → ${href}: ${tag ?? 'no such id'}`);
      }
      expect(wrong).toEqual([]);
    },
  );

  it.each(DEMOS)('%s: no id is used twice on a project page', async (id) => {
    const { get } = await demoApp();
    for (const sub of [
      '',
      '/supply',
      '/rf',
      '/bom',
      '/parts',
      '/sweep',
      '/stages/' + (id === 'demo-club-30m' ? 'st-pa' : 'st-lpf'),
    ]) {
      const html = await (await get(`/projects/${id}${sub}`)).text();
      const ids = [...html.matchAll(/\sid="([^"]+)"/g)].map((m) => m[1]);
      const twice = ids.filter((x, i) => ids.indexOf(x) !== i);
      expect(twice, `${id}${sub}`).toEqual([]);
    }
  });
});
