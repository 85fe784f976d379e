// Absurd numbers in every field of every form (zero, negative, huge, tiny, overflowing): the server
// never answers 500, and whatever it accepts never makes the evaluation produce NaN or Infinity, nor a
// page show them. Forms come from the rendered pages, so new forms are covered without editing this file.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeApp, postForm, type TestApp } from '../helpers/test-app';
import { appRoutes, idsFor } from '../helpers/routes';
import { forms, type HtmlForm } from '../helpers/html';
import { loadProject } from '../../src/db/projects';
import { evaluate } from '../../src/core/evaluate';

const ID = 'demo-club-30m';
const VALUES = ['0', '-1', '1e308', '1e-300', '1e999', '99999999999999999999'];
const TEXT_TYPES = new Set(['text', 'textarea', 'number']);
const STATIC = new Set([
  'projects',
  'stages',
  'supply',
  'transformers',
  'windings',
  'rails',
  'fuse',
  'rf',
  'settings',
  'parts',
  'offers',
  'suppliers',
  'costing',
  'bom',
  'lines',
  'loads',
  'move',
  'pa',
  'lpf',
  'relay',
]);
const NON_FINITE_TEXT = /\bNaN\b|\bInfinity\b/;

let t: TestApp;
beforeAll(async () => {
  t = await makeApp();
});
afterAll(() => t?.close());

const shape = (f: HtmlForm) => f.action.split('/').map((seg, i) => (i < 3 || STATIC.has(seg) ? seg : ':x')).join('/');

/** Paths of numbers that are NaN or ±Infinity anywhere in a value. */
function nonFinite(value: unknown, path = 'report', out: string[] = []): string[] {
  if (typeof value === 'number' && !Number.isFinite(value)) out.push(`${path} = ${value}`);
  else if (Array.isArray(value)) value.forEach((v, i) => nonFinite(v, `${path}[${i}]`, out));
  else if (value && typeof value === 'object')
    for (const [k, v] of Object.entries(value)) nonFinite(v, `${path}.${k}`, out);
  return out;
}

async function pages(): Promise<[string, string][]> {
  const out: [string, string][] = [];
  for (const r of appRoutes(t.app, idsFor((await loadProject(t.database.db, ID))!))) {
    if (r.method !== 'GET' || !r.pattern.includes(':id')) continue;
    const res = await t.app.request(r.path);
    expect(res.status, r.path).toBeLessThan(500);
    if ((res.headers.get('Content-Type') ?? '').startsWith('text/html')) out.push([r.path, await res.text()]);
  }
  return out;
}

describe('absurd numbers in every field', () => {
  it('no 500, and nothing accepted leads to NaN/Infinity in the evaluation or on a page', async () => {
    const seen = new Map<string, HtmlForm>();
    for (const [, html] of await pages())
      for (const f of forms(html))
        if (
          f.method === 'post' &&
          f.action.startsWith(`/projects/${ID}/`) &&
          !/\/(delete|clone|import)$/.test(f.action) &&
          !seen.has(shape(f))
        )
          seen.set(shape(f), f);
    let posts = 0;
    const accepted: string[] = [];
    const problems: string[] = [];
    for (const f of seen.values()) {
      for (const field of Object.keys(f.types).filter((k) => TEXT_TYPES.has(f.types[k]))) {
        for (const value of VALUES) {
          const version = (await loadProject(t.database.db, ID))!.version;
          const res = await postForm(t.app, f.action, {
            ...f.fields,
            ...('version' in f.fields ? { version: String(version) } : {}),
            [field]: value,
          });
          posts++;
          const where = `${shape(f)} ${field}=${value}`;
          if (res.status >= 500) problems.push(`${where}: HTTP ${res.status}`);
          if (res.status !== 303) continue;
          accepted.push(where);
          const bad = nonFinite(evaluate((await loadProject(t.database.db, ID))!));
          if (bad.length)
            problems.push(
              `${where}: evaluation has ${bad.slice(0, 3).join(', ')}${bad.length > 3 ? ` (+${bad.length - 3})` : ''}`,
            );
          const page = await (await t.app.request(res.headers.get('Location')!)).text();
          if (NON_FINITE_TEXT.test(page.replace(/<[^>]+>/g, ' ')))
            problems.push(`${where}: the page shows NaN or Infinity`);
        }
      }
    }
    console.log(
      `absurd input: ${seen.size} form shapes, ${posts} posts, ${accepted.length} accepted, ${problems.length}` +
        ` problems`,
    );
    expect(posts).toBeGreaterThan(100);
    expect(problems).toEqual([]);
    // and every page of the final state still renders
    for (const [path, html] of await pages())
      expect(NON_FINITE_TEXT.test(html.replace(/<[^>]+>/g, ' ')), path).toBe(false);
  }, 300_000);
});
