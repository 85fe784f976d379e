import { describe, it, expect } from 'vitest';
import { demoApp } from '../helpers/app';
import { loadProject } from '../../src/db/projects';
import { lpfValues, paValues, relayValues } from '../../src/web/stage-forms';
import { DEMO_PROJECTS } from '../../seed-demo/index';

const ID = 'demo-club-30m';
const club = DEMO_PROJECTS[0];
const lpfForm = () => ({ version: '1', ...lpfValues(club.stages.find((s) => s.id === 'st-lpf')!.lpf!) });

describe('stage page', () => {
  it('renders the filter form and the stage checks', async () => {
    const { get } = await demoApp();
    const html = await (await get(`/projects/${ID}/stages/st-lpf`)).text();
    expect(html).toContain('Low-pass filter design');
    expect(html).toContain('Checks for this stage');
  });

  it.each([
    ['an even-order filter between equal terminations', { order: '6' }, 'order', 'Order must be odd'],
    ['a 5 dB Chebyshev ripple', { ripple: '5' }, 'ripple', 'Chebyshev ripple must be between 0.01 and 0.5 dB'],
    ['a negative core AL', { coreAl: '-4.9n' }, 'coreAl', 'Core AL must be a positive inductance'],
  ])('refuses %s beside the field and saves nothing', async (_label, change, field, message) => {
    const { post, database } = await demoApp();
    const before = await loadProject(database.db, ID);
    const res = await post(`/projects/${ID}/stages/st-lpf/lpf`, { ...lpfForm(), ...change }, { 'HX-Request': 'true' });
    expect(res.status).toBe(422);
    const html = await res.text();
    expect(html).toContain(message);
    expect(html).toContain(`id="f-${field}" name="${field}" type="text" value="${Object.values(change)[0]}"`);
    expect(await loadProject(database.db, ID)).toEqual(before);
  });

  it('a valid filter change is saved and the design follows it', async () => {
    const { post, database } = await demoApp();
    const res = await post(`/projects/${ID}/stages/st-lpf/lpf`, { ...lpfForm(), order: '7', layout: 'inductor-input' });
    expect(res.status).toBe(303);
    const lpf = (await loadProject(database.db, ID))!.stages.find((s) => s.id === 'st-lpf')!.lpf!;
    expect(lpf.order).toBe(7);
    expect(lpf.form).toBe('inductor-input');
  });

  it('refuses a zero target power on the settings form', async () => {
    const { post } = await demoApp();
    const res = await post(`/projects/${ID}/settings`, {
      version: '1', name: 'x', notes: '', frequency: '10.11 MHz', power: '0', supplyKind: 'mains', mainsV: '120', mainsHz: '60', mainsLow: '10', mainsHigh: '10', ambient: '35', duty: '40', kits: '8', currency: 'USD',
    });
    expect(res.status).toBe(422);
    expect(await res.text()).toContain('Target output must be more than 0 W');
  });

  it('PA and relay forms round-trip their stored values', async () => {
    const { post, database } = await demoApp();
    const pa = club.stages.find((s) => s.id === 'st-pa')!.pa!;
    expect((await post(`/projects/${ID}/stages/st-pa/pa`, { version: '1', ...paValues(pa) })).status).toBe(303);
    const relay = club.stages.find((s) => s.id === 'st-tr')!.relay!;
    expect((await post(`/projects/${ID}/stages/st-tr/relay`, { version: '2', ...relayValues(relay) })).status).toBe(303);
    const p = (await loadProject(database.db, ID))!;
    expect(p.stages.find((s) => s.id === 'st-pa')!.pa).toEqual(pa);
    expect(p.stages.find((s) => s.id === 'st-tr')!.relay).toEqual(relay);
  });

  it('editing the loads adds a new rail load and removes one', async () => {
    const { post, database } = await demoApp();
    const res = await post(`/projects/${ID}/stages/st-keyer`, {
      version: '1', name: 'Keyer', kind: 'other', notes: '', dissipation: '', rail0: '', l0_receive: '8 mA', l0_keyUp: '12 mA', l0_keyDown: '12 mA', rail1: 'rail-pa', l1_receive: '0', l1_keyUp: '1m', l1_keyDown: '2m',
    });
    expect(res.status).toBe(303);
    const stage = (await loadProject(database.db, ID))!.stages.find((s) => s.id === 'st-keyer')!;
    expect(stage.loads).toEqual([{ railId: 'rail-pa', currentA: { receive: 0, keyUp: 0.001, keyDown: 0.002 } }]);
  });
});

describe('a stage deleted in another window', () => {
  it('an edit of it says so, as a page and as the htmx swap, and saves nothing', async () => {
    const { post, database } = await demoApp();
    const id = 'demo-club-30m';
    const before = (await loadProject(database.db, id))!;
    const fields = { version: String(before.version), name: 'Ghost', kind: 'receiver', notes: '', dissipation: '' };
    const page = await post(`/projects/${id}/stages/st-gone`, fields);
    expect(page.status).toBe(422);
    const html = await page.text();
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html).toContain('this stage no longer exists');
    expect(html).toContain(`href="/projects/${id}"`);
    const partial = await post(`/projects/${id}/stages/st-gone`, fields, { 'HX-Request': 'true' });
    const swap = await partial.text();
    expect(swap.startsWith('<div id="stage">')).toBe(true);
    expect(swap).toContain('this stage no longer exists');
    expect((await loadProject(database.db, id))!.version).toBe(before.version);
  });
});

describe('saving without JavaScript', () => {
  it('the stage page reached by the redirect says "Saved.", like the htmx swap', async () => {
    const { get, post, database } = await demoApp();
    const id = 'demo-club-30m';
    const p = (await loadProject(database.db, id))!;
    const pa = p.stages.find((s) => s.pa)!;
    const res = await post(`/projects/${id}/stages/${pa.id}/pa`, { ...paValues(pa.pa!), version: String(p.version) });
    expect(res.status).toBe(303);
    const location = res.headers.get('location')!;
    expect(location).toBe(`/projects/${id}/stages/${pa.id}?done=saved`);
    expect(await (await get(location)).text()).toContain('<p class="notice" role="status">Saved.</p>');
    // a plain visit says nothing
    expect(await (await get(`/projects/${id}/stages/${pa.id}`)).text()).not.toContain('Saved.');
  });

  it('the done marker goes before a fragment and never twice', async () => {
    const { withDone } = await import('../../src/web/edit');
    expect(withDone('/projects/x/supply?open=r1#rail-r1', 'saved')).toBe('/projects/x/supply?open=r1&done=saved#rail-r1');
    expect(withDone('/projects/x/bom?done=deleted', 'saved')).toBe('/projects/x/bom?done=deleted');
    expect(withDone('/projects/x', 'saved')).toBe('/projects/x?done=saved');
  });
});

describe('filter ripple with a Butterworth response', () => {
  it('is kept as typed (the design ignores it), so switching back to Chebyshev keeps it; above 0.5 dB it is refused', async () => {
    const { post, database } = await demoApp();
    const save = (change: Record<string, string>, version: number) => post(`/projects/${ID}/stages/st-lpf/lpf`, { ...lpfForm(), ...change, version: String(version) });
    expect((await save({ response: 'butterworth', ripple: '0.2' }, 1)).status).toBe(303);
    const lpf = (await loadProject(database.db, ID))!.stages.find((s) => s.id === 'st-lpf')!.lpf!;
    expect(lpf.response).toBe('butterworth');
    expect(lpf.rippleDb).toBe(0.2);
    expect(lpfValues(lpf).ripple).toBe('0.2');
    const refused = await save({ response: 'butterworth', ripple: '3' }, 2);
    expect(refused.status).toBe(422);
    expect(await refused.text()).toContain('Ripple must be at most 0.5 dB');
  });
});

describe('changing a stage kind', () => {
  it('a final changed to a driver drops its PA data, so no hidden PA current stays in the budget', async () => {
    const { get, post, database } = await demoApp();
    const { stageValues } = await import('../../src/web/stage-forms');
    const { evaluate } = await import('../../src/core/evaluate');
    const p = (await loadProject(database.db, ID))!;
    const pa = p.stages.find((s) => s.kind === 'final' && s.pa)!;
    const computed = (q: typeof p) => evaluate(q).budget.rails.flatMap((r) => r.loads).filter((l) => l.stageId === pa.id && l.computed);
    expect(computed(p).length).toBeGreaterThan(0); // the PA key-down current is computed while it is a final
    const res = await post(`/projects/${ID}/stages/${pa.id}`, { ...stageValues(pa), kind: 'driver', version: String(p.version) });
    expect(res.status).toBe(303);
    const after = (await loadProject(database.db, ID))!;
    const stage = after.stages.find((s) => s.id === pa.id)!;
    expect(stage.kind).toBe('driver');
    expect(stage.pa).toBeUndefined();
    expect(computed(after)).toEqual([]);
    expect(await (await get(`/projects/${ID}/stages/${pa.id}`)).text()).not.toContain('/pa"');
  });
});
