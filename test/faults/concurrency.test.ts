// Many clients at once against the real server on a file database. Edits from forms loaded at the same
// version merge per field: of several edits of the same field exactly one wins and the rest get 409 with both
// values and the stored version; clients editing different stages all get through at once, nothing lost.
// (Two server processes on one file: two-instances.test.ts.)
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '../helpers/server';
import { forms, type HtmlForm } from '../helpers/html';
import { readNumber } from '../../src/core/spec/number-text';
import { loadCurrentFields } from '../../src/core/spec/stage';

const DEMO = '/projects/demo-club-30m';
let server: RunningServer;
beforeAll(async () => {
  server = await startServer();
}, 120_000);
afterAll(async () => {
  await server?.stop();
  server?.cleanup();
});

async function loadsForms(): Promise<HtmlForm[]> {
  const html = await (await fetch(server.url + DEMO)).text();
  return forms(html).filter((f) => /\/stages\/[^/]+\/loads$/.test(f.action) && 'l0_keyUp' in f.fields);
}

const post = (f: HtmlForm, version: number, keyUp: string, htmx = false) =>
  fetch(server.url + f.action, {
    method: 'POST',
    redirect: 'manual',
    headers: {
      Origin: server.url,
      'Content-Type': 'application/x-www-form-urlencoded',
      ...(htmx ? { 'HX-Request': 'true' } : {}),
    },
    body: new URLSearchParams({ ...f.fields, version: String(version), l0_keyUp: keyUp }),
  });

describe('concurrent edits', () => {
  it('of several edits of the same field sent at once with the same version, exactly one is saved; the others get ' +
    '409', async () => {
    const [f] = await loadsForms();
    const version = Number(f.fields.version);
    // bare numbers: the current boxes are in mA, and the page shows a stored value back the same way
    const values = Array.from({ length: 8 }, (_, i) => `${300 + i}`);
    const res = await Promise.all(values.map((v) => post(f, version, v)));
    const statuses = res.map((r) => r.status);
    expect(statuses.filter((s) => s === 303)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(values.length - 1);
    const winner = values[statuses.indexOf(303)];
    const after = (await loadsForms()).find((x) => x.action === f.action)!;
    expect(Number(after.fields.version)).toBe(version + 1);
    expect(after.fields.l0_keyUp).toBe(winner);
    // the refused ones were told why (both values), and given the stored version to try again with
    const refused = await res[statuses.indexOf(409)].text();
    expect(refused).toContain('someone else changed the same field');
    expect(refused).toContain(`changed by someone else to “${winner}”`);
    expect(refused).toContain(`name="version" value="${version + 1}"`);
  });

  it('clients editing different stages from forms of the same version all get their edits in, one version step ' +
    'each', async () => {
    const stageForms = await loadsForms();
    const start = Number(stageForms[0].fields.version);
    const clients = 4;
    const editsEach = 6;
    let conflicts = 0;
    const applied: { action: string; value: string }[] = [];
    await Promise.all(
      Array.from({ length: clients }, async (_, c) => {
        const f = stageForms[c % stageForms.length];
        let version = start;
        for (let e = 0; e < editsEach; e++) {
          const value = `${(c + 1) * 100 + e} mA`;
          for (let attempt = 0; ; attempt++) {
            expect(attempt, 'gave up after too many conflicts').toBeLessThan(200);
            const r = await post(f, version, value, true);
            const body = await r.text();
            const m = /name="version" value="(\d+)"/.exec(body);
            if (m) version = Number(m[1]);
            if (r.status === 200) {
              applied.push({ action: f.action, value });
              break;
            }
            expect(r.status).toBe(409);
            conflicts++;
          }
        }
      }),
    );
    const after = await loadsForms();
    expect(Number(after[0].fields.version)).toBe(start + clients * editsEach);
    // each stage holds the last value its client saved
    for (let c = 0; c < clients; c++) {
      const f = stageForms[c % stageForms.length];
      const last = applied.filter((a) => a.action === f.action).at(-1)!;
      const shown = after.find((x) => x.action === f.action)!.fields.l0_keyUp;
      // both in mA as typed and as shown (the load spec's display unit)
      const a = readNumber(shown, loadCurrentFields['currentA.keyUp']);
      const b = readNumber(last.value, loadCurrentFields['currentA.keyUp']);
      expect(a.ok && b.ok && Math.abs(a.value - b.value) < 1e-12, `${f.action}: ${shown} vs ${last.value}`).toBe(true);
    }
    // each client edits its own stage, so no edit conflicts with another: they merge instead of being refused
    expect(stageForms.length).toBeGreaterThanOrEqual(clients);
    expect(conflicts).toBe(0);
  }, 120_000);
});
