// Design roles on the parts-list page through t.app.request(): the club demo's roles shown with their state, the
// deliberate mismatch (0.5 W bleeders where 0.92 W is needed) fixed by binding a candidate, a line's role kept
// when the line is saved, and a bind for a role the design does not have refused with nothing saved.
import { beforeEach, describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { loadProject } from '../../src/db/projects';
import type { Project } from '../../src/core/model';
import { evaluate } from '../../src/core/evaluate';

const ID = 'demo-club-30m';
let t: Awaited<ReturnType<typeof demoApp>>;
beforeEach(async () => {
  t = await demoApp();
});
const stored = async (): Promise<Project> => (await loadProject(t.database.db, ID))!;
const base = `/projects/${ID}/bom`;
const page = async () => (await t.app.request(`http://localhost${base}`)).text();

describe('parts the design needs', () => {
  it('lists every role of the stored demo, bound, with the bleeders flagged and the 1 W part offered', async () => {
    const html = await page();
    const p = await stored();
    const roles = evaluate(p).roles.statuses;
    expect(roles.length).toBeGreaterThan(10);
    for (const s of roles) expect(html).toContain(`data-role="${s.role.id}" data-state="${s.state}"`);
    // The one mismatch is the bleeders; the fuse and filter-capacitor lines are generic ("rating per supply page",
    // "values per RF page"): cautions that they cannot be checked, naming the line, not silent passes.
    expect(roles.filter((s) => s.state !== 'ok').map((s) => [s.role.id, s.state])).toEqual([
      ['fuses', 'caution'],
      ['bleeders', 'caution'],
      ['lpf-capacitors:st-lpf', 'caution'],
    ]);
    expect(roles.find((s) => s.role.id === 'fuses')!.problems).toEqual([
      expect.stringMatching(/^The line F1–F4 \(Fuse .*\) does not state rating, so it cannot be checked/),
    ]);
    expect(html).toContain('does not state capacitance, so it cannot be checked');
    expect(html).toMatch(/data-role="bleeders"[\s\S]*?data-candidate="p-bleed"/);
    // each candidate with its ratings by name and unit, never the stored keys
    expect(html).toMatch(
      /data-candidate="p-trafo-160"[^>]*>[^<]*<span class="sub"> \(VA rating 160 VA; secondary 1 voltage \(RMS\) 16 V;/,
    );
    expect(html).not.toMatch(/role-candidates[\s\S]*?sec1V/);
  });

  it('binding the candidate fixes the mismatch and the cost follows', async () => {
    const before = await stored();
    const res = await t.post(`${base}/roles/bind`, {
      version: String(before.version),
      roleId: 'bleeders',
      partId: 'p-bleed',
    });
    expect(res.status).toBe(303);
    const after = await stored();
    expect(after.bom.find((l) => l.id === 'b9')).toMatchObject({
      partId: 'p-bleed',
      qtyPerRig: 2,
      refs: 'R1, R2',
      roleId: 'bleeders',
    });
    const r = evaluate(after);
    // bleeders now ok; only the two generic lines' "cannot be checked" cautions are left
    expect(r.roles.statuses.filter((s) => s.state !== 'ok').map((s) => s.role.id)).toEqual([
      'fuses',
      'lpf-capacitors:st-lpf',
    ]);
    expect(r.cost.totals.buildCents).not.toBe(evaluate(before).cost.totals.buildCents);
  });

  it('saving a line keeps its role from the form; a bind for a role the design lacks is refused, nothing ' +
    'saved', async () => {
    const p = await stored();
    const line = p.bom.find((l) => l.id === 'b5')!;
    const save = await t.post(`${base}/lines/b5`, {
      version: String(p.version),
      stageId: '',
      partId: line.partId,
      qty: '1',
      refs: 'T1',
      notes: 'x',
      role: 'transformer:tr-main',
    });
    expect(save.status).toBe(303);
    expect((await stored()).bom.find((l) => l.id === 'b5')).toMatchObject({
      notes: 'x',
      roleId: 'transformer:tr-main',
    });
    const now = await stored();
    const bad = await t.post(`${base}/roles/bind`, {
      version: String(now.version),
      roleId: 'reservoir:no-such-rail',
      partId: 'p-c6800',
    });
    expect(bad.status).toBe(422);
    expect(await bad.text()).toMatch(/no longer exists/);
    expect((await stored()).version).toBe(now.version);
  });

  it('the parts-list line form names a part’s category as the list does', async () => {
    const html = await (await t.app.request(`http://localhost/projects/${ID}/bom`)).text();
    // the club's reservoir capacitor is stored under the older name "capacitor-reservoir" (seed-demo/club-30m.ts)
    expect(html).toContain('Electrolytic capacitor 4700 µF 35 V, 105 °C, ripple 2.4 A (capacitor)</option>');
    expect(html).not.toContain('(capacitor-reservoir)</option>');
  });

  it('the catalog offers the category list and says which ratings a part’s category is checked with', async () => {
    const html = await (await t.app.request(`http://localhost/projects/${ID}/parts`)).text();
    // the category is a choice from the list; a heatsink part gets its one rating box, θsa in °C/W
    const list = /<select id="part--ap--category"[\s\S]*?<\/select>/.exec(html)![0];
    for (const c of [
      'capacitor',
      'resistor',
      'transformer',
      'relay',
      'fuse',
      'mosfet',
      'heatsink',
      'regulator',
      'core',
      'other',
    ])
      expect(list).toContain(`value="${c}"`);
    expect(html).toMatch(
      /<span class="label">θsa<span class="unit"> \(°C\/W\)<\/span><\/span><input id="ratings-heatsink--p-[^"]+--r-thetaSaKPerW" name="r.thetaSaKPerW"/,
    );
  });
});
