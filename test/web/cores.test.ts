// Core catalog pages: list, add, edit, delete; bad input refused with the field named and the typed text kept;
// a core in use cannot be deleted; the filter and PA forms offer the catalog's cores.
import { describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { loadProject } from '../../src/db/projects';

const ID = 'demo-club-30m';
const good = {
  name: 'Iron-powder toroid 17.5 mm, 1–20 MHz mix',
  al: '49 µH/100t',
  ae: '12.2 mm²',
  le: '42.1',
  innerDiameter: '9.4',
  window: '',
  fmin: '1',
  fmax: '20',
  bmax: '12',
};

describe('core catalog pages', () => {
  it('lists the demo cores, each with its own form, and links from the RF page', async () => {
    const t = await demoApp();
    const html = await (await t.get(`/projects/${ID}/cores`)).text();
    const p = (await loadProject(t.database.db, ID))!;
    for (const c of p.cores!) expect(html).toContain(`action="/projects/${ID}/cores/${c.id}"`);
    expect(await (await t.get(`/projects/${ID}/rf`)).text()).toContain(`href="/projects/${ID}/cores"`);
  });
  it('adds a core (AL in µH per 100 turns, Ae in mm²) and the filter form offers it', async () => {
    const t = await demoApp();
    const before = (await loadProject(t.database.db, ID))!;
    const res = await t.post(`/projects/${ID}/cores`, { ...good, version: String(before.version) });
    expect(res.status).toBe(303);
    const after = (await loadProject(t.database.db, ID))!;
    const added = after.cores!.at(-1)!;
    expect(added.name).toBe(good.name);
    expect(added.alHPerTurn2).toBeCloseTo(4.9e-9, 20); // 49 µH/100 t² = 4.9 nH/t² (1 µH/100 t² = 0.1 nH/t²)
    expect(added.aeM2).toBeCloseTo(12.2e-6, 15);
    expect(added.leM).toBeCloseTo(42.1e-3, 12);
    const stage = await (await t.get(`/projects/${ID}/stages/st-lpf`)).text();
    expect(stage).toContain(`value="${added.id}"`);
  });
  it('refuses bad input naming the field, keeps the typed text, stores nothing', async () => {
    const t = await demoApp();
    const before = (await loadProject(t.database.db, ID))!;
    for (const [k, bad, label] of [
      ['ae', 'abc', 'Effective area Ae'],
      ['fmax', '0.5', 'Material up to'],
      ['innerDiameter', '', 'Inner diameter'],
      ['name', '', 'Core (size and material)'],
    ]) {
      const res = await t.post(
        `/projects/${ID}/cores`,
        { ...good, [k]: bad, version: String(before.version) },
        { 'HX-Request': 'true' },
      );
      expect(res.status, k).toBe(422);
      const body = await res.text();
      expect(body, k).toContain(label);
      expect(body, k).toContain(`value="${good.al}"`);
    }
    expect(await loadProject(t.database.db, ID)).toEqual(before);
  });
  it('edits a core; a core in use cannot be deleted; a free one can', async () => {
    const t = await demoApp();
    const p = (await loadProject(t.database.db, ID))!;
    const used = p.stages.find((s) => s.lpf)!.lpf!.coreId!;
    const edit = await t.post(`/projects/${ID}/cores/${used}`, { ...good, bmax: '20', version: String(p.version) });
    expect(edit.status).toBe(303);
    const p2 = (await loadProject(t.database.db, ID))!;
    expect(p2.cores!.find((c) => c.id === used)!.fluxLimitT).toBeCloseTo(0.02, 12);
    const confirm = await (await t.get(`/projects/${ID}/cores/${used}/delete`)).text();
    expect(confirm).toContain('cannot be deleted while it is in use');
    const refused = await t.post(
      `/projects/${ID}/cores/${used}/delete`,
      { version: String(p2.version) },
      { 'HX-Request': 'true' },
    );
    expect(refused.status).toBe(422);
    const free = p2.cores!.find((c) => !p2.stages.some((s) => s.lpf?.coreId === c.id || s.pa?.outputCoreId === c.id))!;
    const del = await t.post(`/projects/${ID}/cores/${free.id}/delete`, { version: String(p2.version) });
    expect(del.status).toBe(303);
    expect((await loadProject(t.database.db, ID))!.cores!.map((c) => c.id)).not.toContain(free.id);
  });
});
