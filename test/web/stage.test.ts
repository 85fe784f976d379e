import { describe, it, expect } from 'vitest';
import { demoApp } from '../helpers/app';
import { loadProject } from '../../src/db/projects';
import { formValues, lpfSpec, paSpec, relaySpec } from '../../src/core/spec';
import type { LpfParams, PaParams, RelayParams } from '../../src/core/model';

const lpfValues = (v: LpfParams) => formValues(lpfSpec, v);
const paValues = (v: PaParams) => formValues(paSpec, v);
const relayValues = (v: RelayParams) => formValues(relaySpec, v);
import { DEMO_PROJECTS } from '../../seed-demo/index';
import { forms, formByAction } from '../helpers/html';

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
    ['a 5 dB Chebyshev ripple', { ripple: '5' }, 'ripple', 'Passband ripple must be at least 0 dB and at most 0.5 dB'],
    ['a negative core AL', { coreAl: '-4.9n' }, 'coreAl', 'Core AL must be more than 1 pH/t²'],
  ])('refuses %s beside the field and saves nothing', async (_label, change, field, message) => {
    const { post, database } = await demoApp();
    const before = await loadProject(database.db, ID);
    const res = await post(`/projects/${ID}/stages/st-lpf/lpf`, { ...lpfForm(), ...change }, { 'HX-Request': 'true' });
    expect(res.status).toBe(422);
    const html = await res.text();
    expect(html).toContain(message);
    // the box's id names the spec, the stage and the field (views/components/field-id.ts)
    expect(html).toMatch(
      new RegExp(`id="lpf--s-st-lpf--[A-Za-z0-9]+" name="${field}" type="text" value="${Object.values(change)[0]}"`),
    );
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
      version: '1',
      name: 'x',
      notes: '',
      frequency: '10.11 MHz',
      power: '0',
      supplyKind: 'mains',
      mainsV: '120',
      mainsHz: '60',
      mainsLow: '10',
      mainsHigh: '10',
      ambient: '35',
      duty: '40',
      kits: '8',
      currency: 'USD',
    });
    expect(res.status).toBe(422);
    expect(await res.text()).toContain('Target RF output must be at least 1 mW');
  });

  it('PA and relay forms round-trip their stored values', async () => {
    const { post, database } = await demoApp();
    const pa = club.stages.find((s) => s.id === 'st-pa')!.pa!;
    expect((await post(`/projects/${ID}/stages/st-pa/pa`, { version: '1', ...paValues(pa) })).status).toBe(303);
    const relay = club.stages.find((s) => s.id === 'st-tr')!.relay!;
    expect((await post(`/projects/${ID}/stages/st-tr/relay`, { version: '2', ...relayValues(relay) })).status).toBe(
      303,
    );
    const p = (await loadProject(database.db, ID))!;
    expect(p.stages.find((s) => s.id === 'st-pa')!.pa).toEqual(pa);
    expect(p.stages.find((s) => s.id === 'st-tr')!.relay).toEqual(relay);
  });

  it('editing the loads adds a new rail load and removes one', async () => {
    const { post, database } = await demoApp();
    const res = await post(`/projects/${ID}/stages/st-keyer`, {
      version: '1',
      name: 'Keyer',
      kind: 'other',
      notes: '',
      dissipation: '',
      rail0: 'remove',
      l0_receive: '8 mA',
      l0_keyUp: '12 mA',
      l0_keyDown: '12 mA',
      rail1: 'rail-pa',
      l1_receive: '0',
      l1_keyUp: '1m',
      l1_keyDown: '2m',
    });
    expect(res.status).toBe(303);
    const stage = (await loadProject(database.db, ID))!.stages.find((s) => s.id === 'st-keyer')!;
    expect(stage.loads).toEqual([{ railId: 'rail-pa', currentA: { receive: 0, keyUp: 0.001, keyDown: 0.002 } }]);
  });

  it("the add-a-load row: currents typed without a rail are refused on that row's rail field, kept, and nothing is " +
    "saved", async () => {
    const { post, database } = await demoApp();
    const before = await loadProject(database.db, ID);
    const form = {
      version: '1',
      name: 'Keyer and sidetone',
      kind: 'other',
      notes: '',
      dissipation: '',
      rail0: 'rail-13v8',
      l0_receive: '8 mA',
      l0_keyUp: '12 mA',
      l0_keyDown: '12 mA',
      rail1: '',
      l1_receive: '',
      l1_keyUp: '35 mA',
      l1_keyDown: '40 mA',
    };
    for (const headers of [{}, { 'HX-Request': 'true' }] as Record<string, string>[]) {
      const res = await post(`/projects/${ID}/stages/st-keyer`, form, headers);
      expect(res.status).toBe(422);
      const html = await res.text();
      expect(html).not.toContain('Saved.');
      // the message sits on the new row's rail field, and what was typed in the row is kept
      const railField = html.match(/<label class="field has-error" for="[^"]*rail1"[\s\S]*?<\/label>/)?.[0] ?? '';
      expect(railField).toContain('choose the rail this row');
      expect(html).toContain('value="35 mA"');
      expect(html).toContain('value="40 mA"');
      expect(await loadProject(database.db, ID)).toEqual(before);
    }
    // the same row with its currents cleared adds nothing and saves
    expect((await post(`/projects/${ID}/stages/st-keyer`, { ...form, l1_keyUp: '', l1_keyDown: '' })).status).toBe(303);
  });
});

describe('a stage deleted in another window', () => {
  it('an edit of it says so, as a page and as the htmx swap, and saves nothing', async () => {
    const { post, database } = await demoApp();
    const id = 'demo-club-30m';
    const before = (await loadProject(database.db, id))!;
    const fields = { version: String(before.version), name: 'Ghost', kind: 'receiver', notes: '', dissipation: '' };
    const page = await post(`/projects/${id}/stages/st-gone`, fields);
    expect(page.status).toBe(409);
    const html = await page.text();
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html).toContain('this stage no longer exists');
    expect(html).toContain(`href="/projects/${id}"`);
    expect(html).toContain('>Ghost</textarea>'); // what was typed is shown, to copy
    const partial = await post(`/projects/${id}/stages/st-gone`, fields, {
      'HX-Request': 'true',
      'HX-Target': 'div#stage',
    });
    expect(partial.status).toBe(409);
    const swap = await partial.text();
    expect(swap.startsWith('<section class="card" id="stage">')).toBe(true);
    expect(swap).toContain('this stage no longer exists');
    expect(swap).toContain('>Ghost</textarea>');
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
    expect(withDone('/projects/x/supply?open=r1#rail-r1', 'saved')).toBe(
      '/projects/x/supply?open=r1&done=saved#rail-r1',
    );
    expect(withDone('/projects/x/bom?done=deleted', 'saved')).toBe('/projects/x/bom?done=deleted');
    expect(withDone('/projects/x', 'saved')).toBe('/projects/x?done=saved');
  });
});

describe('filter ripple with a Butterworth response', () => {
  it('is kept as typed (the design ignores it), so switching back to Chebyshev keeps it; above 0.5 dB it is ' +
    'refused', async () => {
    const { post, database } = await demoApp();
    const save = (change: Record<string, string>, version: number) =>
      post(`/projects/${ID}/stages/st-lpf/lpf`, { ...lpfForm(), ...change, version: String(version) });
    expect((await save({ response: 'butterworth', ripple: '0.2' }, 1)).status).toBe(303);
    const lpf = (await loadProject(database.db, ID))!.stages.find((s) => s.id === 'st-lpf')!.lpf!;
    expect(lpf.response).toBe('butterworth');
    expect(lpf.rippleDb).toBe(0.2);
    expect(lpfValues(lpf).ripple).toBe('0.2');
    const refused = await save({ response: 'butterworth', ripple: '3' }, 2);
    expect(refused.status).toBe(422);
    expect(await refused.text()).toContain('Passband ripple must be at least 0 dB and at most 0.5 dB');
  });
});

describe('changing a stage kind', () => {
  const PA = 'st-pa';
  const action = `/projects/${ID}/stages/${PA}`;
  // the stage form as the page fills it, then as a builder edits it: kind changed to driver, a new name, notes
  // and a key-down current typed in the first load row
  const typed = async ({ get, database }: Awaited<ReturnType<typeof demoApp>>) => {
    const p = (await loadProject(database.db, ID))!;
    const shown = formByAction(await (await get(action)).text(), action).fields;
    const current = Object.keys(shown).find((k) => /keyDown/.test(k))!;
    const fields = {
      ...shown,
      kind: 'driver',
      name: 'Final <renamed>',
      notes: 'Try a driver here',
      [current]: '1.5 A',
    };
    return { p, fields, current };
  };

  it.each([['as a page', {}], ['as the htmx swap', { 'HX-Request': 'true' }]])(
    'first asks, %s, listing the PA data it would drop, and changes nothing',
    async (_how, headers: Record<string, string>) => {
      const app = await demoApp();
      const { post, database } = app;
      const { p, fields } = await typed(app);
      const res = await post(action, fields, headers);
      expect(res.status).toBe(200);
      const html = await res.text();
      expect(html.startsWith('<!DOCTYPE html>')).toBe(!headers['HX-Request']);
      if (headers['HX-Request']) expect(html.startsWith('<div id="stage">')).toBe(true);
      // demo PA (seed-demo/club-30m.ts): push-pull class C, 2 devices on "PA rail (unregulated, ~24 V)", θsa 2.5
      expect(html).toContain(
        'Changing “Push-pull MOSFET final” from Final amplifier (PA) to Driver drops its PA data:',
      );
      expect(html).toContain('<li>push-pull, class C, 2 devices</li>');
      expect(html).toContain('<li>fed from rail “PA rail (unregulated, ~24 V)”</li>');
      expect(html).toContain('θsa 2.5 °C/W');
      expect(html).toContain('Nothing has been saved yet.');
      // both answers post back every typed value; the drop answer carries the confirmation
      const answers = forms(html).filter((f) => f.action === action);
      expect(answers).toHaveLength(2);
      const [drop, keep] = answers;
      expect(drop.fields).toEqual({ ...fields, confirmDrop: '1' });
      expect(keep.fields).toEqual({ ...fields, keepKind: '1' });
      expect(html).toContain('hx-post="/projects/demo-club-30m/stages/st-pa" hx-target="#stage" hx-swap="outerHTML"');
      expect(await loadProject(database.db, ID)).toEqual(p);
    },
  );

  it.each([['without JavaScript', {}], ['with htmx', { 'HX-Request': 'true' }]])(
    'the confirmed change (%s) saves the kind and the typed values and drops the PA data',
    async (_how, headers: Record<string, string>) => {
      const app = await demoApp();
      const { get, post, database } = app;
      const { evaluate } = await import('../../src/core/evaluate');
      const { p, fields } = await typed(app);
      const computed = (q: typeof p) =>
        evaluate(q)
          .budget.rails.flatMap((r) => r.loads)
          .filter((l) => l.stageId === PA && l.computed);
      expect(computed(p).length).toBeGreaterThan(0); // the PA key-down current is computed while it is a final
      const question = forms(await (await post(action, fields, headers)).text()).filter((f) => f.action === action)[0];
      const res = await post(action, question.fields, headers);
      expect(res.status).toBe(headers['HX-Request'] ? 200 : 303);
      const after = (await loadProject(database.db, ID))!;
      const stage = after.stages.find((s) => s.id === PA)!;
      expect(stage.kind).toBe('driver');
      expect(stage.pa).toBeUndefined();
      expect(stage.name).toBe('Final <renamed>');
      expect(stage.notes).toBe('Try a driver here');
      expect(stage.loads[0].currentA.keyDown).toBe(1.5);
      expect(computed(after)).toEqual([]);
      expect(await (await get(action)).text()).not.toContain('/pa"');
    },
  );

  it.each([['without JavaScript', {}], ['with htmx', { 'HX-Request': 'true' }]])(
    '"Keep the kind" (%s) shows the stage form with the old kind and the typed values, and saves nothing',
    async (_how, headers: Record<string, string>) => {
      const app = await demoApp();
      const { post, database } = app;
      const { p, fields, current } = await typed(app);
      const keep = forms(await (await post(action, fields, headers)).text()).filter((f) => f.action === action)[1];
      const res = await post(action, keep.fields, headers);
      expect(res.status).toBe(200);
      const html = await res.text();
      expect(html).toContain('Not saved yet: the kind stays Final amplifier (PA).');
      const form = formByAction(html, action);
      expect(form.fields).toMatchObject({
        kind: 'final',
        name: 'Final <renamed>',
        notes: 'Try a driver here',
        [current]: '1.5 A',
      });
      expect(form.fields.version).toBe(String(p.version));
      expect(html).toContain(`${action}/pa"`); // the PA form is still there
      expect(await loadProject(database.db, ID)).toEqual(p);
      // saving that form now keeps the PA data and applies the other entries
      expect((await post(action, form.fields)).status).toBe(303);
      const stage = (await loadProject(database.db, ID))!.stages.find((s) => s.id === PA)!;
      expect(stage).toMatchObject({
        kind: 'final',
        name: 'Final <renamed>',
        notes: 'Try a driver here',
        pa: p.stages.find((s) => s.id === PA)!.pa,
      });
    },
  );

  it('asks nothing when the stage has no data to drop, or the form is refused', async () => {
    const app = await demoApp();
    const { get, post, database } = app;
    const p = (await loadProject(database.db, ID))!;
    const driver = p.stages.find((s) => s.kind === 'driver')!;
    const driverAction = `/projects/${ID}/stages/${driver.id}`;
    const shown = formByAction(await (await get(driverAction)).text(), driverAction).fields;
    expect((await post(driverAction, { ...shown, kind: 'final' })).status).toBe(303);
    expect((await loadProject(database.db, ID))!.stages.find((s) => s.id === driver.id)!.kind).toBe('final');
    const { fields } = await typed(app);
    const refused = await post(action, { ...fields, name: '' });
    expect(refused.status).toBe(422);
    expect(await refused.text()).not.toContain('Nothing has been saved yet.');
  });

  it('a form from an older version never drops data unasked: it is refused beside Kind, and its next save ' +
    'asks', async () => {
    // The question is asked for a form of the current version; an older form goes through projectEdit (merged
    // with what changed meanwhile, or refused as stale), and the change itself refuses a drop without confirmDrop.
    const app = await demoApp();
    const { get, post, database } = app;
    const { p, fields } = await typed(app);
    const relay = formByAction(
      await (await get(`/projects/${ID}/stages/st-tr`)).text(),
      `/projects/${ID}/stages/st-tr/relay`,
    );
    expect((await post(`/projects/${ID}/stages/st-tr/relay`, { ...relay.fields, wpm: '25' })).status).toBe(303);
    const between = (await loadProject(database.db, ID))!;
    expect(between.version).toBe(p.version + 1);
    const res = await post(action, fields); // still carries the older version
    expect([409, 422]).toContain(res.status);
    const html = await res.text();
    // merged (422): the change refuses the unconfirmed drop beside Kind; without merging it is refused as stale (409)
    if (res.status === 422)
      expect(html).toContain('Not saved: changing the kind to Driver drops this stage’s PA data.');
    expect(html).not.toContain('Nothing has been saved yet.');
    expect(await loadProject(database.db, ID)).toEqual(between);
    // the form as re-rendered carries the current version and what was typed; saving it asks
    const again = formByAction(html, action).fields;
    expect(again).toMatchObject({ kind: 'driver', name: 'Final <renamed>', version: String(between.version) });
    const question = await post(action, again);
    expect(question.status).toBe(200);
    expect(await question.text()).toContain('drops its PA data:');
  });
});
