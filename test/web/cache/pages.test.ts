// ETags and the per-version page cache: 304 for a current ETag, a new ETag for each version, query and htmx
// variant, and never a stale page or report after another app instance on the same database file wrote.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openDatabase, type Database } from '../../../src/db/client';
import { buildApp } from '../../../src/app';
import { loadProject } from '../../../src/db/projects';
import { evaluate } from '../../../src/core/evaluate';
import { evaluateCached } from '../../../src/web/cache/reports';
import { seedDemo } from '../../../seed-demo/index';
import { forms } from '../../helpers/html';
import { matchesIfNoneMatch } from '../../../src/web/cache/pages';

const ORIGIN = 'http://localhost';
const P = '/projects/demo-club-30m';
const NOW = new Date('2026-03-04T05:06:07Z');
let dir: string;
let dbA: Database;
let dbB: Database;
let a: ReturnType<typeof buildApp>;
let b: ReturnType<typeof buildApp>;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'rigwright-cache-'));
  const url = `file:${join(dir, 'shared.db')}`;
  dbA = await openDatabase(url);
  await seedDemo(dbA, NOW.toISOString());
  // a second app instance with its own connection (and its own page cache) on the same file
  dbB = await openDatabase(url);
  a = buildApp({ database: dbA, now: () => NOW });
  b = buildApp({ database: dbB, now: () => NOW });
}, 60_000);
afterAll(() => {
  dbA?.close();
  dbB?.close();
  if (dir) rmSync(dir, { recursive: true, force: true });
});

const get = (app: typeof a, path: string, headers: Record<string, string> = {}) =>
  app.request(`${ORIGIN}${path}`, { headers });

describe('ETag and 304', () => {
  it('a page carries an ETag; sending it back gives 304 with no body; another query or htmx gives another ' +
    'ETag', async () => {
    const first = await get(a, P);
    expect(first.status).toBe(200);
    const etag = first.headers.get('ETag')!;
    expect(etag).toMatch(/^W\/"\d+-[\w-]+"$/);
    expect(first.headers.get('Cache-Control')).toContain('no-cache');
    await first.text();
    const again = await get(a, P, { 'If-None-Match': etag });
    expect(again.status).toBe(304);
    expect(await again.text()).toBe('');
    const saved = await get(a, `${P}?done=saved`);
    expect(saved.headers.get('ETag')).not.toBe(etag);
    expect(await saved.text()).toContain('Saved.');
    const partial = await get(a, P, { 'HX-Request': 'true' });
    expect(partial.headers.get('ETag')).not.toBe(etag);
    await partial.text();
  });

  it('the page sent again from the cache is the page rendered first, byte for byte', async () => {
    const one = await (await get(a, `${P}/supply`)).text();
    const two = await (await get(a, `${P}/supply`)).text();
    expect(two).toBe(one);
  });

  it('downloads carry ETags too (PDF per paper size, parts list CSV, netlist)', async () => {
    const a4 = await get(a, `${P}/pack.pdf`);
    const letter = await get(a, `${P}/pack.pdf?paper=letter`);
    expect(a4.status).toBe(200);
    expect(a4.headers.get('Content-Type')).toBe('application/pdf');
    expect(a4.headers.get('ETag')).toBeTruthy();
    expect(letter.headers.get('ETag')).not.toBe(a4.headers.get('ETag'));
    const bytes = new Uint8Array(await a4.arrayBuffer());
    await letter.arrayBuffer();
    const cached = await get(a, `${P}/pack.pdf`);
    expect(new Uint8Array(await cached.arrayBuffer())).toEqual(bytes);
    expect(cached.headers.get('Content-Disposition')).toBe(a4.headers.get('Content-Disposition'));
    expect((await get(a, `${P}/pack.pdf`, { 'If-None-Match': a4.headers.get('ETag')! })).status).toBe(304);
    const csv = await get(a, `${P}/bom.csv`);
    expect(csv.headers.get('ETag')).toBeTruthy();
    await csv.text();
    const netlist = await get(a, `${P}/supply/rail-pa/netlist.cir`);
    expect(netlist.status).toBe(200);
    expect(netlist.headers.get('ETag')).toBeTruthy();
    await netlist.text();
  });

  it('a missing project is a 404 without an ETag', async () => {
    const res = await get(a, '/projects/no-such-project');
    expect(res.status).toBe(404);
    expect(res.headers.get('ETag')).toBeNull();
  });

  it('If-None-Match is compared weakly and accepts a list and "*" (RFC 9110 §13.1.2)', () => {
    expect(matchesIfNoneMatch('"1-abc"', 'W/"1-abc"')).toBe(true);
    expect(matchesIfNoneMatch('W/"0-x", W/"1-abc"', 'W/"1-abc"')).toBe(true);
    expect(matchesIfNoneMatch('*', 'W/"1-abc"')).toBe(true);
    expect(matchesIfNoneMatch('W/"1-abd"', 'W/"1-abc"')).toBe(false);
    expect(matchesIfNoneMatch(undefined, 'W/"1-abc"')).toBe(false);
  });
});

describe('never stale across app instances on one database file', () => {
  it('an edit through instance B is seen at once by instance A (page, ETag, report)', async () => {
    const before = await get(a, P);
    const etagBefore = before.headers.get('ETag')!;
    const htmlBefore = await before.text();
    const stored = (await loadProject(dbA.db, 'demo-club-30m'))!;
    const reportBefore = evaluateCached(stored); // A's cache now holds this version's report

    const form = forms(htmlBefore).find((f) => /\/stages\/[^/]+\/loads$/.test(f.action))!;
    const typed = `${Number.parseFloat(form.fields.l0_receive) + 7} mA`;
    const res = await b.request(`${ORIGIN}${form.action}`, {
      method: 'POST',
      body: new URLSearchParams({ ...form.fields, l0_receive: typed }),
      headers: { Origin: ORIGIN, 'Content-Type': 'application/x-www-form-urlencoded' },
      redirect: 'manual',
    });
    expect(res.status).toBe(303);

    // A, asked with its old ETag, answers the new page (200), not 304
    const after = await get(a, P, { 'If-None-Match': etagBefore });
    expect(after.status).toBe(200);
    expect(after.headers.get('ETag')).not.toBe(etagBefore);
    const htmlAfter = await after.text();
    const formAfter = forms(htmlAfter).find((f) => f.action === form.action)!;
    expect(formAfter.fields.version).toBe(String(stored.version + 1));
    expect(Number.parseFloat(formAfter.fields.l0_receive)).toBeCloseTo(Number.parseFloat(typed), 9);
    // the same page B renders for the same version
    expect(htmlAfter).toBe(await (await get(b, P)).text());

    // the report A now uses is that of the stored project, not the one cached before
    const latest = (await loadProject(dbA.db, 'demo-club-30m'))!;
    const reportAfter = evaluateCached(latest);
    expect(reportAfter).not.toBe(reportBefore);
    expect(reportAfter).toEqual(evaluate(latest));
    expect(reportAfter.budget).not.toEqual(reportBefore.budget);
  });
});
