import { describe, it, expect } from 'vitest';
import { demoApp } from '../helpers/app';
import { loadProject } from '../../src/db/projects';

const ID = 'demo-club-30m';

describe('overview page', () => {
  it('shows the stages in build order and the budget per rail and mode', async () => {
    const { get } = await demoApp();
    const res = await get(`/projects/${ID}`);
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html).toContain('Direct-conversion receiver');
    expect(html.indexOf('Direct-conversion receiver')).toBeLessThan(html.indexOf('Push-pull MOSFET final'));
    // 13.8 V rail key-down total, by hand: entered 12 + 18 + 160 + 4 + 12 mA = 206 mA,
    // plus the relay coil 36 mA = 242 mA
    expect(html).toMatch(/data-rail="rail-13v8" data-mode="keyDown"><strong>242 mA/);
  });

  it('an htmx edit of a current returns the partial with the new total', async () => {
    const { post, database } = await demoApp();
    const res = await post(
      `/projects/${ID}/stages/st-drv/loads`,
      { version: '1', l0_receive: '0', l0_keyUp: '60 mA', l0_keyDown: '260m' },
      { 'HX-Request': 'true' },
    );
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html.startsWith('<div id="overview">')).toBe(true);
    // 242 mA + 100 mA more driver current
    expect(html).toMatch(/data-rail="rail-13v8" data-mode="keyDown"><strong>342 mA/);
    const p = await loadProject(database.db, ID);
    expect(p!.stages.find((s) => s.id === 'st-drv')!.loads[0].currentA.keyDown).toBeCloseTo(0.26, 12);
    expect(p!.version).toBe(2);
  });

  it('without JavaScript an edit redirects back to the page (Post/Redirect/Get)', async () => {
    const { post } = await demoApp();
    const res = await post(`/projects/${ID}/stages/st-drv/loads`, {
      version: '1',
      l0_receive: '0',
      l0_keyUp: '60 mA',
      l0_keyDown: '200 mA',
    });
    expect(res.status).toBe(303);
    expect(res.headers.get('location')).toBe(`/projects/${ID}?done=saved`);
    // the page reached by the redirect says what happened, as the htmx swap does
    const { get } = await demoApp();
    expect(await (await get(`/projects/${ID}?done=saved`)).text()).toContain(
      '<p class="notice" role="status">Saved.</p>',
    );
  });

  it('a bad current is refused beside its field, keeps the typed text and saves nothing', async () => {
    const { post, database } = await demoApp();
    const before = await loadProject(database.db, ID);
    const res = await post(
      `/projects/${ID}/stages/st-drv/loads`,
      { version: '1', l0_receive: '0', l0_keyUp: '60 mA', l0_keyDown: 'lots' },
      { 'HX-Request': 'true' },
    );
    expect(res.status).toBe(422);
    const html = await res.text();
    expect(html).toContain('value="lots"');
    expect(html).toMatch(
      /key-down current &quot;lots&quot; is not understood|key-down current "lots" is not understood/,
    );
    expect(await loadProject(database.db, ID)).toEqual(before);
  });

  it('a stale save of the same field is refused with both values shown; the first save stays', async () => {
    const { post, database } = await demoApp();
    expect(
      (
        await post(`/projects/${ID}/stages/st-rx/loads`, {
          version: '1',
          l0_receive: '50 mA',
          l0_keyUp: '12 mA',
          l0_keyDown: '12 mA',
        })
      ).status,
    ).toBe(303);
    const stale = await post(
      `/projects/${ID}/stages/st-rx/loads`,
      { version: '1', l0_receive: '70 mA', l0_keyUp: '12 mA', l0_keyDown: '12 mA' },
      { 'HX-Request': 'true' },
    );
    expect(stale.status).toBe(409);
    const html = await stale.text();
    // the same field changed by both: refused with both values shown and the typed one kept
    expect(html).toContain('someone else changed the same field');
    expect(html).toContain('Changed by someone else to “50”');
    expect(html).toContain('you typed “70 mA”');
    expect(html).toContain('value="70 mA"');
    const p = await loadProject(database.db, ID);
    expect(p!.stages[0].loads[0].currentA.receive).toBeCloseTo(0.05, 12);
  });

  it('settings: mains tolerance out of range is refused', async () => {
    const { post, database } = await demoApp();
    const form = {
      version: '1',
      name: 'X',
      notes: '',
      frequency: '10.11 MHz',
      power: '20 W',
      supplyKind: 'mains',
      mainsV: '120 V',
      mainsHz: '60 Hz',
      mainsLow: '80',
      mainsHigh: '10',
      ambient: '35',
      duty: '40',
      kits: '8',
      currency: 'usd',
    };
    const res = await post(`/projects/${ID}/settings`, form);
    expect(res.status).toBe(422);
    // the message now comes from the settings spec and states both limits in the box's unit (%)
    expect(await res.text()).toContain(
      'Low mains tolerance must be at least 0 % and at most 50 %; you entered &quot;80&quot;',
    );
    expect((await loadProject(database.db, ID))!.name).not.toBe('X');
    const ok = await post(`/projects/${ID}/settings`, {
      ...form,
      mainsLow: '10',
      mains: '230',
      mainsV: '230 V',
      mainsHz: '50 Hz',
    });
    expect(ok.status).toBe(303);
    const p = await loadProject(database.db, ID);
    expect(p!.mains).toEqual({ nominalV: 230, frequencyHz: 50, lowFraction: 0.1, highFraction: 0.1 });
    expect(p!.currency).toBe('USD');
  });

  it('adds, reorders and deletes stages', async () => {
    const { post, database } = await demoApp();
    expect(
      (await post(`/projects/${ID}/stages`, { version: '1', kind: 'other', name: 'Frequency counter' })).status,
    ).toBe(303);
    let p = (await loadProject(database.db, ID))!;
    const added = p.stages[p.stages.length - 1];
    expect(added.name).toBe('Frequency counter');
    expect((await post(`/projects/${ID}/stages/${added.id}/move`, { version: '2', direction: 'up' })).status).toBe(303);
    p = (await loadProject(database.db, ID))!;
    expect(p.stages[p.stages.length - 2].id).toBe(added.id);
    expect((await post(`/projects/${ID}/stages/${added.id}/delete`, { version: '3' })).status).toBe(303);
    p = (await loadProject(database.db, ID))!;
    expect(p.stages.some((s) => s.id === added.id)).toBe(false);
  });

  it('an unknown project is a 404 page', async () => {
    const { get } = await demoApp();
    const res = await get('/projects/nope');
    expect(res.status).toBe(404);
    expect(await res.text()).toContain('Not found');
  });

  it('a new final stage starts with PA data, so its form and checks appear at once', async () => {
    const { post, get, database } = await demoApp();
    expect((await post(`/projects/${ID}/stages`, { version: '1', kind: 'final', name: 'Second final' })).status).toBe(
      303,
    );
    const added = (await loadProject(database.db, ID))!.stages.at(-1)!;
    // the highest-voltage rail that is not a regulator's raw input (role-defaults.ts), not the first rail in the list
    expect(added.pa?.railId).toBe('rail-pa');
    const html = await (await get(`/projects/${ID}/stages/${added.id}`)).text();
    expect(html).toContain('Final amplifier data');
  });
});

describe('numbers with a grouping comma', () => {
  it('"1,500 W" is refused as ambiguous instead of being read as 1.5 W; "4,7" stays a decimal comma', async () => {
    const { get, post, database } = await demoApp();
    const { formByAction } = await import('../helpers/html');
    const action = `/projects/${ID}/settings`;
    const form = formByAction(await (await get(`/projects/${ID}`)).text(), action);
    const before = (await loadProject(database.db, ID))!;
    const res = await post(action, { ...form.fields, power: '1,500 W' }, { 'HX-Request': 'true' });
    expect(res.status).toBe(422);
    const html = await res.text();
    expect(html).toContain('Target RF output &quot;1,500 W&quot; is ambiguous');
    expect(html).toContain('write 1500 or 1.5');
    expect(html).toContain('value="1,500 W"'); // what the user typed is kept
    expect((await loadProject(database.db, ID))!.version).toBe(before.version);
    expect((await post(action, { ...form.fields, power: '4,7 W' })).status).toBe(303);
    expect((await loadProject(database.db, ID))!.targetPowerW).toBe(4.7);
  });
});

describe('renaming through the htmx settings form', () => {
  it('sends the header name out of band, escaped, so header and page agree', async () => {
    const { get, post } = await demoApp();
    const { formByAction } = await import('../helpers/html');
    const action = `/projects/${ID}/settings`;
    const form = formByAction(await (await get(`/projects/${ID}`)).text(), action);
    const res = await post(action, { ...form.fields, name: 'New <b>name</b>' }, { 'HX-Request': 'true' });
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain(
      '<span class="crumb" id="project-crumb" hx-swap-oob="true">New &lt;b&gt;name&lt;/b&gt;</span>',
    );
    // the full page has the same element without the out-of-band marker
    const page = await (await get(`/projects/${ID}`)).text();
    expect(page).toContain('<span class="crumb" id="project-crumb">New &lt;b&gt;name&lt;/b&gt;</span>');
  });
});
