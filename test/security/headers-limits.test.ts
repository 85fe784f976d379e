// Secure headers, the body limit, refused imports and basic auth, through app.request().
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeApp, postForm, rowCounts, ORIGIN, type TestApp } from '../helpers/test-app';
import { BODY_LIMIT_BYTES } from '../../src/app';
import { IMPORT_LIMIT_BYTES } from '../../src/web/routes/projects';
import { DEMO_PROJECTS } from '../../seed-demo/index';
import { toProjectFile } from '../../src/io/project-file';

let t: TestApp;
beforeAll(async () => {
  t = await makeApp();
});
afterAll(() => t?.close());

describe('secure headers', () => {
  for (const path of ['/', '/projects/demo-club-30m', '/no-such-page', '/projects/demo-club-30m/export.json']) {
    it(`are present on ${path}`, async () => {
      const res = await t.app.request(path);
      const csp = res.headers.get('Content-Security-Policy') ?? '';
      expect(csp).toMatch(/default-src 'self'/);
      expect(csp).toMatch(/script-src 'self'(;|$)/); // no inline scripts, no eval
      expect(res.headers.get('X-Content-Type-Options')).toBe('nosniff');
      const frameBlocked =
        /frame-ancestors 'none'/.test(csp) || ['DENY', 'SAMEORIGIN'].includes(res.headers.get('X-Frame-Options') ?? '');
      expect(frameBlocked).toBe(true);
      expect(res.headers.get('Referrer-Policy')).toBe('no-referrer');
    });
  }
});

describe('body limit', () => {
  it(`refuses a body over ${BODY_LIMIT_BYTES} bytes with 413 and a clear message, saving nothing`, async () => {
    const before = await rowCounts(t.database);
    const big = 'notes=' + 'x'.repeat(BODY_LIMIT_BYTES + 1024);
    const res = await t.app.request('/projects/demo-club-30m/settings', {
      method: 'POST',
      headers: { Origin: ORIGIN, 'Content-Type': 'application/x-www-form-urlencoded' },
      body: big,
    });
    expect(res.status).toBe(413);
    expect(await res.text()).toMatch(/larger than 6 MiB/);
    expect(await rowCounts(t.database)).toEqual(before);
  });

  it('also when the body is streamed without a Content-Length', async () => {
    const chunk = new Uint8Array(1024 * 1024).fill(120);
    let sent = 0;
    const stream = new ReadableStream<Uint8Array>({
      pull(ctrl) {
        if (sent > BODY_LIMIT_BYTES + chunk.length) return ctrl.close();
        sent += chunk.length;
        ctrl.enqueue(chunk);
      },
    });
    const res = await t.app.request('/import', {
      method: 'POST',
      headers: { Origin: ORIGIN, 'Content-Type': 'application/x-www-form-urlencoded' },
      body: stream,
      // @ts-expect-error Node's fetch needs duplex for a stream body
      duplex: 'half',
    });
    expect(res.status).toBe(413);
  });
});

describe('import refusals', () => {
  const importFile = (content: string | Uint8Array<ArrayBuffer>, name = 'project.json') => {
    const fd = new FormData();
    fd.set('file', new File([content], name, { type: 'application/json' }));
    return t.app.request('/import', { method: 'POST', headers: { Origin: ORIGIN }, body: fd });
  };

  it(`refuses a file over ${IMPORT_LIMIT_BYTES} bytes (but under the body limit) with 413, a message, and nothing ` +
    `saved`, async () => {
    const before = await rowCounts(t.database);
    const res = await importFile(new Uint8Array(IMPORT_LIMIT_BYTES + 10_000).fill(32));
    expect(res.status).toBe(413);
    const html = await res.text();
    expect(html).toMatch(/nothing was saved/);
    expect(html).toMatch(/larger than the 5 MiB limit/);
    expect(await rowCounts(t.database)).toEqual(before);
  });

  const malformed: [string, string, RegExp][] = [
    ['not JSON', '{"format": "rigwright-project", ', /not valid JSON/],
    [
      'another format',
      JSON.stringify({ format: 'something-else', formatVersion: 1, project: {} }),
      /not a project file exported by this program/,
    ],
    ['a current out of range deep inside', badCurrentFile(), /stages\[\d+\]\.loads\[0\]\.currentA\.keyDown/],
    ['a dangling rail reference', danglingRailFile(), /no rail (&quot;|")rail-missing/],
    ['an empty file', '', /no file was chosen|not valid JSON/],
  ];
  for (const [label, content, message] of malformed) {
    it(`refuses ${label} with 4xx, says why, and saves nothing`, async () => {
      const before = await rowCounts(t.database);
      const res = await importFile(content);
      expect(res.status).toBeGreaterThanOrEqual(400);
      expect(res.status).toBeLessThan(500);
      const html = await res.text();
      expect(html).toMatch(/nothing was saved/);
      expect(html).toMatch(message);
      expect(await rowCounts(t.database)).toEqual(before);
    });
  }

  it('control: the unmodified file is accepted (so the refusals above are about the damage)', async () => {
    const before = await rowCounts(t.database);
    const res = await importFile(toProjectFile(DEMO_PROJECTS[0], '2026-01-01T00:00:00Z'));
    expect(res.status).toBe(303);
    expect((await rowCounts(t.database)).projects).toBe(before.projects + 1);
  });
});

function badCurrentFile(): string {
  const p = structuredClone(DEMO_PROJECTS[0]);
  const s = [...p.stages].reverse().find((x) => x.loads.length > 0)!;
  s.loads[0].currentA.keyDown = 5000;
  return toProjectFile(p, '2026-01-01T00:00:00Z');
}

function danglingRailFile(): string {
  const p = structuredClone(DEMO_PROJECTS[0]);
  [...p.stages].reverse().find((x) => x.loads.length > 0)!.loads[0].railId = 'rail-missing';
  return toProjectFile(p, '2026-01-01T00:00:00Z');
}

describe('basic auth when a secret is set', () => {
  let a: TestApp;
  beforeAll(async () => {
    a = await makeApp({ accessSecret: 'correct horse' });
  });
  afterAll(() => a?.close());
  const auth = (user: string, pass: string) => `Basic ${Buffer.from(`${user}:${pass}`).toString('base64')}`;

  it('asks for credentials (401 with a WWW-Authenticate challenge) without them', async () => {
    for (const path of ['/', '/projects/demo-club-30m', '/projects/demo-club-30m/export.json']) {
      const res = await a.app.request(path);
      expect(res.status, path).toBe(401);
      expect(res.headers.get('WWW-Authenticate') ?? '').toMatch(/^Basic realm="Rigwright"/);
    }
  });

  it('refuses a wrong password and lets the right one in (any user name)', async () => {
    expect((await a.app.request('/', { headers: { Authorization: auth('op', 'wrong') } })).status).toBe(401);
    expect((await a.app.request('/', { headers: { Authorization: auth('anyone', 'correct horse') } })).status).toBe(
      200,
    );
  });

  it('refuses an unauthenticated state-changing post and saves nothing', async () => {
    const before = await rowCounts(a.database);
    const res = await postForm(a.app, '/projects', { name: 'x', band: '7.03 MHz', power: '5 W', mains: '230-50' });
    expect(res.status).toBe(401);
    expect(await rowCounts(a.database)).toEqual(before);
  });
});
