// Cross-site form posts are refused on every state-changing route the app registers (hono csrf()),
// and the refusal writes nothing. Routes are read from app.routes, so new pages are covered too.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeApp, postForm, rowCounts, type TestApp } from '../helpers/test-app';
import { appRoutes, STATE_CHANGING, DEMO_ID } from '../helpers/routes';
import { loadProject } from '../../src/db/projects';

let t: TestApp;
beforeAll(async () => {
  t = await makeApp();
});
afterAll(() => t?.close());

const EVIL = 'http://evil.example';
const bodies: [string, () => { body: BodyInit; type?: string }][] = [
  [
    'urlencoded',
    () => ({ body: 'name=pwned&version=1&direction=up&kind=receiver', type: 'application/x-www-form-urlencoded' }),
  ],
  [
    'multipart',
    () => {
      const fd = new FormData();
      fd.set('name', 'pwned');
      fd.set('version', '1');
      fd.set('json', '{}');
      return { body: fd };
    },
  ],
  ['text/plain', () => ({ body: 'name=pwned', type: 'text/plain' })],
];

async function fingerprint() {
  const p = await loadProject(t.database.db, DEMO_ID);
  return { counts: await rowCounts(t.database), version: p?.version, name: p?.name };
}

describe('CSRF: cross-site form posts', () => {
  it('finds the state-changing routes it is about to check', () => {
    const routes = appRoutes(t.app).filter((r) => STATE_CHANGING.has(r.method));
    // the project list and overview actions exist today; more are added as pages land
    expect(routes.map((r) => r.pattern)).toEqual(
      expect.arrayContaining(['/projects', '/import', '/projects/:id/settings', '/projects/:id/stages/:sid/loads']),
    );
  });

  it('answers 403 for Origin: http://evil.example on every state-changing route, with every form encoding, and saves ' +
    'nothing', async () => {
    const before = await fingerprint();
    const routes = appRoutes(t.app).filter((r) => STATE_CHANGING.has(r.method));
    const refused: string[] = [];
    for (const r of routes) {
      for (const [label, make] of bodies) {
        const { body, type } = make();
        const headers: Record<string, string> = { Origin: EVIL };
        if (type) headers['Content-Type'] = type;
        const res = await t.app.request(r.path, { method: r.method, headers, body });
        expect(res.status, `${r.method} ${r.path} (${label})`).toBe(403);
        refused.push(`${r.method} ${r.path}`);
      }
    }
    expect(refused.length).toBe(routes.length * bodies.length);
    expect(await fingerprint()).toEqual(before);
  });

  it('answers 403 for a cross-site post that carries only Sec-Fetch-Site: cross-site, or no origin information at ' +
    'all', async () => {
    const before = await fingerprint();
    for (const r of appRoutes(t.app).filter((x) => STATE_CHANGING.has(x.method))) {
      for (const headers of [{ 'Sec-Fetch-Site': 'cross-site' }, {}] as Record<string, string>[]) {
        const res = await t.app.request(r.path, {
          method: r.method,
          headers: { ...headers, 'Content-Type': 'application/x-www-form-urlencoded' },
          body: 'name=pwned&version=1',
        });
        expect(res.status, `${r.method} ${r.path} ${JSON.stringify(headers)}`).toBe(403);
      }
    }
    expect(await fingerprint()).toEqual(before);
  });

  it('control: the same post from the page origin is not refused by the CSRF check (so the 403s above mean ' +
    'something)', async () => {
    const p = await loadProject(t.database.db, DEMO_ID);
    const res = await postForm(t.app, `/projects/${DEMO_ID}/rename`, {
      name: 'Renamed by a same-origin post',
      version: String(p!.version),
    });
    expect(res.status).toBe(303);
    expect((await loadProject(t.database.db, DEMO_ID))!.name).toBe('Renamed by a same-origin post');
  });

  it('GET requests change nothing (safe methods): every GET route leaves rows and versions as they were', async () => {
    const before = await fingerprint();
    for (const r of appRoutes(t.app).filter((x) => x.method === 'GET')) {
      const res = await t.app.request(r.path);
      expect(res.status, `GET ${r.path}`).toBeLessThan(500);
    }
    expect(await fingerprint()).toEqual(before);
  });
});
