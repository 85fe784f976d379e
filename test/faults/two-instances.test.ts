// Two app processes on one database file (two people each starting the app on a shared folder, or a restart
// overlapping the old process). Eight edits sent at once from forms loaded at the same version, through both
// processes: some change different fields of the same project (even of the same form), two change the same
// field. None may answer 500; every acknowledged edit must be stored; every non-conflicting one applied; of the
// two on the same field exactly one lands and the other is answered 409 with both values.
// A read on one process right after a write landed through the other shows the new version.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '../helpers/server';
import { forms, formByAction, unescapeHtml } from '../helpers/html';

const ID = 'demo-club-30m';
const P = `/projects/${ID}`;
let a: RunningServer;
let b: RunningServer;

beforeAll(async () => {
  a = await startServer();
  // the second process opens the same file after the first has created it and loaded the demo
  b = await startServer({ dbPath: a.dbPath });
}, 120_000);
afterAll(async () => {
  await b?.stop();
  await a?.stop();
  a?.cleanup();
});

async function page(server: RunningServer, path: string): Promise<string> {
  const res = await fetch(server.url + path);
  expect(res.status).toBe(200);
  return res.text();
}

const post = (server: RunningServer, action: string, fields: Record<string, string>) =>
  fetch(server.url + action, {
    method: 'POST',
    redirect: 'manual',
    headers: { Origin: server.url, 'Content-Type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams(fields),
  });

interface Edit {
  label: string;
  action: string;
  /** the page the saved value shows on, and the field to read there */
  page: string;
  field: string;
  value: string;
  conflictGroup?: string;
}

describe('two app instances on one database file', () => {
  it('8 concurrent edits: no 500, nothing acknowledged lost, every non-conflicting edit applied', async () => {
    for (let round = 0; round < 3; round++) {
      const tag = `r${round}`;
      const overview = await page(a, P);
      const stagePage = (sid: string) => page(b, `${P}/stages/${sid}`);
      const settings = formByAction(overview, `${P}/settings`).fields;
      const vxoLoads = formByAction(overview, `${P}/stages/st-vxo/loads`).fields;
      const rf = formByAction(await page(b, `${P}/rf`), `${P}/rf/settings`).fields;
      const rx = formByAction(await stagePage('st-rx'), `${P}/stages/st-rx`).fields;
      const drv = formByAction(await stagePage('st-drv'), `${P}/stages/st-drv`).fields;
      const tr = formByAction(await stagePage('st-tr'), `${P}/stages/st-tr`).fields;
      // every form was loaded at the same version
      expect(new Set([settings, vxoLoads, rf, rx, drv, tr].map((f) => f.version)).size).toBe(1);

      const edits: (Edit & { fields: Record<string, string> })[] = [
        {
          label: 'project name',
          action: `${P}/settings`,
          page: P,
          field: 'name',
          value: `Club 30 m ${tag}`,
          fields: settings,
        },
        {
          label: 'kits (same form, other field)',
          action: `${P}/settings`,
          page: P,
          field: 'kits',
          value: String(10 + round),
          fields: settings,
        },
        {
          label: 'VXO receive current',
          action: `${P}/stages/st-vxo/loads`,
          page: P,
          field: 'l0_receive',
          value: `${21 + round}`,
          fields: vxoLoads,
        },
        {
          label: 'worst-case SWR',
          action: `${P}/rf/settings`,
          page: `${P}/rf`,
          field: 'worstSwr',
          value: String(2 + round / 10),
          fields: rf,
        },
        {
          label: 'receiver notes',
          action: `${P}/stages/st-rx`,
          page: `${P}/stages/st-rx`,
          field: 'notes',
          value: `Notes ${tag}`,
          fields: rx,
        },
        {
          label: 'driver name',
          action: `${P}/stages/st-drv`,
          page: `${P}/stages/st-drv`,
          field: 'name',
          value: `Driver ${tag}`,
          fields: drv,
        },
        {
          label: 'T/R notes, first',
          action: `${P}/stages/st-tr`,
          page: `${P}/stages/st-tr`,
          field: 'notes',
          value: `Relay A ${tag}`,
          fields: tr,
          conflictGroup: 'tr-notes',
        },
        {
          label: 'T/R notes, second',
          action: `${P}/stages/st-tr`,
          page: `${P}/stages/st-tr`,
          field: 'notes',
          value: `Relay B ${tag}`,
          fields: tr,
          conflictGroup: 'tr-notes',
        },
      ];
      const responses = await Promise.all(
        edits.map((e, i) => post(i % 2 ? b : a, e.action, { ...e.fields, [e.field]: e.value })),
      );
      const bodies = await Promise.all(responses.map((r) => r.text()));
      const statuses = responses.map((r) => r.status);
      const outputs = () => `statuses ${statuses.join(', ')}\n--- A:\n${a.output()}\n--- B:\n${b.output()}`;
      expect(statuses.filter((s) => s >= 500), outputs()).toEqual([]);

      // read the result through the other process than the one that wrote last: both must agree
      for (const [i, e] of edits.entries()) {
        const shown = formByAction(await page(i % 2 ? a : b, e.page), e.action).fields[e.field];
        if (!e.conflictGroup) {
          expect(statuses[i], `${e.label}: ${bodies[i].slice(0, 400)}`).toBe(303);
          expect(shown, e.label).toBe(e.value);
        }
      }
      const pair = edits.map((e, i) => ({ e, i })).filter((x) => x.e.conflictGroup === 'tr-notes');
      const won = pair.filter((x) => statuses[x.i] === 303);
      const lost = pair.filter((x) => statuses[x.i] === 409);
      expect(won, outputs()).toHaveLength(1);
      expect(lost, outputs()).toHaveLength(1);
      const stored = formByAction(await page(a, `${P}/stages/st-tr`), `${P}/stages/st-tr`).fields.notes;
      expect(stored).toBe(won[0].e.value);
      const refused = unescapeHtml(bodies[lost[0].i]);
      expect(refused).toContain(
        `notes: changed by someone else to “${won[0].e.value}”, you typed “${lost[0].e.value}”`,
      );
    }
  }, 180_000);

  it('a read on one instance right after a write landed through the other shows the new version', async () => {
    for (let i = 0; i < 6; i++) {
      const [writer, reader] = i % 2 ? [b, a] : [a, b];
      const form = formByAction(await page(writer, `${P}/rf`), `${P}/rf/settings`).fields;
      const value = String(1.5 + i / 10);
      const res = await post(writer, `${P}/rf/settings`, { ...form, worstSwr: value });
      expect(res.status).toBe(303);
      const seen = forms(await page(reader, `${P}/rf`)).find((f) => f.action === `${P}/rf/settings`)!.fields;
      expect(seen.worstSwr).toBe(value);
      expect(Number(seen.version)).toBe(Number(form.version) + 1);
    }
  }, 60_000);
});
