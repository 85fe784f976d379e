// An imported project must be editable: the import accepts only what the forms accept, so saving any
// form of an imported project unchanged succeeds, and a value the forms would refuse is refused at import
// with its place in the file.
import { describe, it, expect } from 'vitest';
import { demoApp, ORIGIN } from '../helpers/app';
import { forms } from '../helpers/html';
import { listProjects, loadProject } from '../../src/db/projects';

const ID = 'demo-club-30m';
type App = Awaited<ReturnType<typeof demoApp>>;

function upload(app: App['app'], json: unknown) {
  const form = new FormData();
  form.set('file', new File([JSON.stringify(json)], 'p.json', { type: 'application/json' }));
  return app.request(`${ORIGIN}/import`, { method: 'POST', body: form, headers: { Origin: ORIGIN } });
}

describe('import accepts only what the forms accept', () => {
  it.each([
    [
      'an even filter order',
      (p: any) => (p.stages.find((s: any) => s.lpf).lpf.order = 4),
      /stages\[\d\]\.lpf\.order: Order must be odd \(3, 5, 7 or 9\)/,
    ],
    [
      'a Chebyshev filter without ripple',
      (p: any) => Object.assign(p.stages.find((s: any) => s.lpf).lpf, { response: 'chebyshev', rippleDb: 0 }),
      /lpf\.rippleDb: Passband ripple of a Chebyshev filter must be from 0\.01 to 0\.5 dB/,
    ],
    [
      'a negative core AL',
      (p: any) => (p.stages.find((s: any) => s.lpf).lpf.coreAlHPerTurn2 = -1e-9),
      /lpf\.coreAlHPerTurn2/,
    ],
    [
      '500 A on a stage',
      (p: any) => (p.stages[0].loads[0].currentA.keyDown = 500),
      /stages\[0\]\.loads\[0\]\.currentA\.keyDown/,
    ],
    [
      'a final with neither saturation voltage nor Rds(on)',
      (p: any) => Object.assign(p.stages.find((s: any) => s.pa).pa, { saturationV: null, rdsOnOhm: null }),
      /pa\.saturationV: Saturation voltage: give it or Rds\(on\)/,
    ],
    // an empty category and an offer without price breaks are accepted by the forms too (CSV imports make them)
    ['a part without a description', (p: any) => (p.parts[0].description = ''), /parts\[0\]\.description/],
    [
      'a unit price with a part of a cent',
      (p: any) => (p.parts.find((x: any) => x.offers.length).offers[0].breaks = [{ minQty: 1, unitPriceCents: 9.5 }]),
      /offers\[0\]\.breaks/,
    ],
    [
      'PA data on a driver stage',
      (p: any) => (p.stages.find((s: any) => s.pa).kind = 'driver'),
      /stages\[\d\]\.pa: only a stage of kind &quot;final&quot; has pa data/,
    ],
    ['a parts-list line of quantity 0', (p: any) => (p.bom[0].qtyPerRig = 0), /bom\[0\]\.qtyPerRig/],
  ])('%s is refused with its place, nothing saved', async (_label, spoil, message) => {
    const { app, get, database } = await demoApp();
    const file = JSON.parse(await (await get(`/projects/${ID}/export.json`)).text());
    spoil(file.project);
    const res = await upload(app, file);
    expect(res.status).toBe(422);
    expect(await res.text()).toMatch(message);
    expect((await listProjects(database.db)).length).toBe(2);
  });

  it('every form of an imported demo project saves unchanged', async () => {
    const { app, get, post, database } = await demoApp();
    for (const demo of ['demo-club-30m', 'demo-portable-20m']) {
      const before = new Set((await listProjects(database.db)).map((p) => p.id));
      expect((await upload(app, JSON.parse(await (await get(`/projects/${demo}/export.json`)).text()))).status).toBe(
        303,
      );
      const id = (await listProjects(database.db)).find((p) => !before.has(p.id))!.id;
      const p = (await loadProject(database.db, id))!;
      const pages = ['', '/supply', '/rf', '/parts', '/bom', ...p.stages.map((s) => `/stages/${s.id}`)].map(
        (x) => `/projects/${id}${x}`,
      );
      let saved = 0;
      for (const page of pages) {
        for (const f of forms(await (await get(page)).text())) {
          // edit forms of existing things only (no add, delete, move, clone or import)
          if (
            f.method !== 'post' ||
            !('version' in f.fields) ||
            /\/(delete|move|import|clone)$|\/(stages|transformers|windings|rails|parts|offers|lines|suppliers)$/.test(
              f.action,
            )
          )
            continue;
          const version = String((await loadProject(database.db, id))!.version);
          const res = await post(f.action, { ...f.fields, version });
          expect([f.action, res.status]).toEqual([f.action, 303]);
          saved++;
        }
      }
      expect(saved).toBeGreaterThan(10);
    }
  });
});
