// Supply page through t.app.request(): add/edit/delete, refused input kept and nothing saved, stale version,
// and deletes refused while something still uses the item.
import { beforeEach, describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { loadProject } from '../../src/db/projects';
import type { Project, RegulatedRail, RectifiedRail } from '../../src/core/model';
import { evaluate } from '../../src/core/evaluate';
import { formatValue } from '../../src/core/units';

const ID = 'demo-club-30m';
let t: Awaited<ReturnType<typeof demoApp>>;
beforeEach(async () => {
  t = await demoApp();
});

const stored = async (): Promise<Project> => (await loadProject(t.database.db, ID))!;

const post = (path: string, fields: Record<string, string>, htmx = false) =>
  t.post(path, fields, htmx ? { 'HX-Request': 'true' } : {});

const base = `/projects/${ID}/supply`;

describe('supply page', () => {
  it('renders the supply tree with every transformer, winding and rail', async () => {
    const res = await t.app.request(`http://localhost${base}`);
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    for (const name of [
      'T1 mains transformer',
      '16 V winding',
      '20 V winding',
      '13.8 V signal rail',
      'PA rail (unregulated, ~24 V)',
    ])
      expect(html).toContain(name);
    expect(html).toContain('id="supply"');
    // the page leads with every rail's deciding corners, then the editors, then the full computed results
    const glance = html.indexOf('id="supply-glance"');
    expect(glance).toBeGreaterThan(0);
    expect(html.indexOf('<form', html.indexOf('id="supply"'))).toBeGreaterThan(glance);
    expect(html.indexOf('class="supply-results"')).toBeGreaterThan(html.indexOf('aria-label="Add a rail"'));
    // the computed results below the editors are the ones evaluate() gives for the stored project
    const supply = evaluate(await stored()).supply!;
    expect(html).toContain('class="supply-results"');
    expect(html).toContain(
      `Mains ${formatValue(supply.mains!.lowV, 'V')} / ${formatValue(supply.mains!.nominalV, 'V')} / ` +
        `${formatValue(supply.mains!.highV, 'V')}`,
    );
  });

  it('adds a transformer and a winding, parsing engineering values', async () => {
    const v = (await stored()).version;
    let res = await post(`${base}/transformers`, {
      version: String(v),
      name: 'T2 auxiliary',
      construction: 'toroidal',
    });
    expect(res.status).toBe(303);
    const t2 = (await stored()).supply.transformers.find((t) => t.name === 'T2 auxiliary')!;
    expect(t2.construction).toBe('toroidal');
    res = await post(
      `${base}/transformers/${t2.id}/windings`,
      { version: String(v + 1), name: '9 V', ratedV: '9 V', ratedA: '350 mA', regulation: '12', resistance: '2R2' },
      true,
    );
    expect(res.status).toBe(200);
    expect(await res.text()).toContain('Saved.');
    const w = (await stored()).supply.transformers.find((t) => t.id === t2.id)!.windings[0];
    expect(w).toMatchObject({ name: '9 V', ratedVrms: 9, ratedA: 0.35, resistanceOhm: 2.2 });
    expect(w.regulationFraction).toBeCloseTo(0.12, 12);
  });

  it('edits a rectified rail (4u7 style values, empty optional = null)', async () => {
    const p = await stored();
    const res = await post(
      `${base}/rails/rail-pa`,
      {
        version: String(p.version),
        name: 'PA rail',
        windingId: 'w-20',
        topology: 'centre-tap',
        diodeDrop: '0.7',
        diodeR: '20m',
        reservoir: '10000u',
        esr: '25 mΩ',
        bleeder: '',
        capV: '63 V',
        capRipple: '4 A',
        rippleTarget: '',
        margin: '0',
        fuse: '3.15 A',
        windingFuseSheet: 'T3',
      },
      true,
    );
    expect(res.status).toBe(200);
    // the edited rail stays open after the swap
    expect(await res.text()).toMatch(/<details class="card supply-item rail" id="rail-rail-pa" open/);
    const r = (await stored()).supply.rails.find((x) => x.id === 'rail-pa') as RectifiedRail;
    expect(r).toMatchObject({
      name: 'PA rail',
      topology: 'centre-tap',
      diodeDropV: 0.7,
      bleederOhm: null,
      capacitorRatedV: 63,
      ripplePpTargetV: null,
      fuseA: 3.15,
    });
    expect(r.reservoirF).toBeCloseTo(0.01, 12);
    expect(r.diodeResistanceOhm).toBeCloseTo(0.02, 12);
  });

  it('states and clears the lowest voltage the PA rail’s loads need (V box, empty = not stated)', async () => {
    const p = await stored();
    const rail = p.supply.rails.find((x) => x.id === 'rail-pa') as RectifiedRail;
    const page = await (await t.app.request(`http://localhost${base}`)).text();
    expect(page).toContain('Lowest voltage its loads need');
    const values = {
      version: String(p.version),
      name: rail.name,
      windingId: rail.windingId,
      topology: rail.topology,
      diodeDrop: '0.9',
      diodeR: '30m',
      reservoir: '6800',
      esr: '30m',
      bleeder: '2k2',
      capV: '50',
      capRipple: '3.6',
      rippleTarget: '2.5',
      margin: '0',
      fuse: '2.5',
      windingFuseSheet: 'T3',
    };
    let res = await post(`${base}/rails/rail-pa`, { ...values, minimumV: '21.5' }, true);
    expect(res.status).toBe(200);
    let r = (await stored()).supply.rails.find((x) => x.id === 'rail-pa') as RectifiedRail;
    expect(r.minimumV).toBe(21.5);
    expect(r.reservoirF).toBeCloseTo(6800e-6, 15); // a bare reservoir is read in µF
    res = await post(`${base}/rails/rail-pa`, { ...values, version: String(p.version + 1), minimumV: '' }, true);
    expect(res.status).toBe(200);
    r = (await stored()).supply.rails.find((x) => x.id === 'rail-pa') as RectifiedRail;
    expect(r.minimumV).toBeNull();
  });

  it('refuses a negative lowest voltage and a 0 µF reservoir by name, keeps the text and saves nothing', async () => {
    const before = await stored();
    const res = await post(
      `${base}/rails/rail-pa`,
      {
        version: String(before.version),
        name: 'PA rail',
        windingId: 'w-20',
        topology: 'bridge',
        diodeDrop: '0.9',
        diodeR: '30m',
        reservoir: '0',
        esr: '30m',
        bleeder: '',
        capV: '',
        capRipple: '',
        rippleTarget: '',
        margin: '0',
        fuse: '',
        minimumV: '-3',
      },
      true,
    );
    expect(res.status).toBe(422);
    const html = await res.text();
    expect(html).toContain('Lowest voltage its loads need must be more than');
    expect(html).toContain('Reservoir must be more than');
    expect(html).toContain('value="-3"');
    expect(await stored()).toEqual(before);
  });

  it('a new battery rail starts from the battery spec’s values with no stated minimum', async () => {
    const v = (await stored()).version;
    const res = await post(`${base}/rails`, { version: String(v), name: 'Backup battery', source: 'battery' });
    expect(res.status).toBe(303);
    const added = (await stored()).supply.rails.at(-1)!;
    expect(added).toMatchObject({
      kind: 'battery',
      name: 'Backup battery',
      chemistry: 'LiFePO4',
      fullV: 14.4,
      endV: 10,
      minimumV: null,
    });
  });

  it('edits a regulated rail to a fixed regulator raised by diodes, with heatsink θsa left to compute', async () => {
    const p = await stored();
    const res = await post(`${base}/rails/rail-13v8`, {
      version: String(p.version),
      name: '13.8 V signal rail',
      parentId: 'rail-raw',
      regulator: 'linear',
      method: 'raised-diodes',
      nominalV: '12',
      diodes: '2',
      raiseDrop: '0.65',
      vref: '',
      iadj: '',
      r1: '',
      r2: '',
      dropout: '2',
      quiescent: '5 mA',
      efficiency: '',
      maxOut: '1.5',
      maxIn: '35',
      thetaJc: '5',
      thetaCs: '1',
      thetaSa: '',
      tjMax: '125',
    });
    expect(res.status).toBe(303);
    const r = (await stored()).supply.rails.find((x) => x.id === 'rail-13v8') as RegulatedRail;
    expect(r.setting).toEqual({ method: 'raised-diodes', nominalV: 12, diodes: 2, diodeDropV: 0.65 });
    expect(r.mount).toEqual({ thetaJcKPerW: 5, thetaCsKPerW: 1, thetaSaKPerW: null, tjMaxC: 125 });
  });

  it('refuses a regulated rail fed from its own child (a loop) and an adjustable setting without R2', async () => {
    const before = await stored();
    const res = await post(`${base}/rails/rail-raw`, { version: String(before.version), name: 'x' }, true);
    expect(res.status).toBe(422); // rail-raw is rectified: the rectified fields are required
    const loop = await post(
      `${base}/rails/rail-13v8`,
      {
        version: String(before.version),
        name: '13.8 V',
        parentId: 'rail-13v8',
        regulator: 'linear',
        method: 'adjustable',
        vref: '1.25',
        r1: '240',
        r2: '',
        dropout: '2',
        quiescent: '5m',
      },
      true,
    );
    expect(loop.status).toBe(422);
    const html = await loop.text();
    expect(html).toContain('R2: needed for this output setting');
    const selfFed = await post(
      `${base}/rails/rail-13v8`,
      {
        version: String(before.version),
        name: '13.8 V',
        parentId: 'rail-13v8',
        regulator: 'linear',
        method: 'fixed',
        nominalV: '12',
        dropout: '2',
        quiescent: '5m',
      },
      true,
    );
    expect(selfFed.status).toBe(422);
    expect(await selfFed.text()).toContain('fed from this one (a loop)');
    expect(await stored()).toEqual(before);
  });

  it('keeps the typed text beside the field and saves nothing when a value is not understood', async () => {
    const before = await stored();
    const res = await post(
      `${base}/windings/w-16`,
      {
        version: String(before.version),
        name: '16 V winding',
        ratedV: '16 volts-ish',
        ratedA: '1 A',
        regulation: '10',
        resistance: '',
      },
      true,
    );
    expect(res.status).toBe(422);
    const html = await res.text();
    expect(html).toContain('value="16 volts-ish"');
    expect(html).toContain('Rated voltage &quot;16 volts-ish&quot; is not understood');
    expect(html).toContain('Nothing was saved');
    expect(await stored()).toEqual(before);
  });

  it('each rail leads with its deciding corners; the full corner table sits behind a native disclosure', async () => {
    const html = await (await t.app.request(`http://localhost${base}`)).text();
    const card = html.slice(html.indexOf('id="supply-rail-pa"'));
    const deciding = card.indexOf('Deciding corners');
    // 16: the 15 mains x load corners and the demo transformer's secondary-tolerance corner (5 %)
    const details = card.indexOf('<details class="all-corners"><summary>All 16 corners');
    expect(deciding).toBeGreaterThan(0);
    expect(details).toBeGreaterThan(deciding); // headroom, heating and tune-up first, then the disclosure
    for (const role of ['Headroom', 'Heating', 'Tune-up']) expect(card.slice(deciding, details)).toContain(role);
  });

  it('saves the enclosure (a bare surface is read in cm²) and refuses a negative one, naming it, saving ' +
    'nothing', async () => {
    const before = await stored();
    const bad = await post(
      `${base}/enclosure`,
      { version: String(before.version), enclosureArea: '-5', enclosureU: '5.5' },
      true,
    );
    expect(bad.status).toBe(422);
    expect(await bad.text()).toContain('Enclosure surface');
    expect(await stored()).toEqual(before);
    const res = await post(
      `${base}/enclosure`,
      { version: String(before.version), enclosureArea: '1160', enclosureU: '6.5' },
      true,
    );
    expect(res.status).toBe(200);
    const s = (await stored()).supply;
    expect(s.enclosureAreaM2).toBeCloseTo(0.116, 12); // 1160 cm² = 0.116 m²
    expect(s.enclosureUWPerM2K).toBe(6.5);
    // 15 W in this box would rise 19.9 K (reference values part 2 §8); the page shows the heat card with a rise
    expect(await res.text()).toMatch(/Heat in the enclosure[\s\S]*rise/);
  });

  it('refuses a stale version with 409 and keeps the entries', async () => {
    const before = await stored();
    const res = await post(`${base}/fuse`, { version: String(before.version - 1 || 99), primaryFuse: '1.6 A' }, true);
    expect(res.status).toBe(409);
    const html = await res.text();
    expect(html).toContain('changed in another tab');
    expect(html).toContain('value="1.6 A"');
    expect(await stored()).toEqual(before);
  });

  it('adds a rail fed from a rail and deletes it after the confirm page', async () => {
    const v = (await stored()).version;
    const res = await post(`${base}/rails`, { version: String(v), name: '9 V VXO rail', source: 'r:rail-13v8' });
    expect(res.status).toBe(303);
    const added = (await stored()).supply.rails.at(-1)!;
    expect(added).toMatchObject({ kind: 'regulated', name: '9 V VXO rail', parentId: 'rail-13v8' });
    expect(res.headers.get('location')).toContain(`open=${added.id}`);
    const confirm = await t.app.request(`http://localhost${base}/rails/${added.id}/delete`);
    expect(confirm.status).toBe(200);
    expect(await confirm.text()).toContain('Yes, delete');
    const del = await post(`${base}/rails/${added.id}/delete`, { version: String(v + 1) });
    expect(del.status).toBe(303);
    expect((await stored()).supply.rails.some((r) => r.id === added.id)).toBe(false);
  });

  it('refuses to delete a rail that stages and another rail use, naming them', async () => {
    const before = await stored();
    const confirm = await (await t.app.request(`http://localhost${base}/rails/rail-raw/delete`)).text();
    expect(confirm).not.toContain('Yes, delete');
    expect(confirm).toContain('rail “13.8 V signal rail” is fed from it');
    const res = await post(`${base}/rails/rail-13v8/delete`, { version: String(before.version) });
    expect(res.status).toBe(422);
    const html = await res.text();
    expect(html).toContain('cannot be deleted while it is in use');
    expect(html).toContain('stage “Direct-conversion receiver” draws current from it');
    expect(html).toContain('the relay coil of “T/R relay and sequencer”');
    expect(await stored()).toEqual(before);
  });

  it('refuses to delete a winding or transformer that a rectified rail uses', async () => {
    const before = await stored();
    const w = await post(`${base}/windings/w-20/delete`, { version: String(before.version) });
    expect(w.status).toBe(422);
    expect(await w.text()).toContain('rail “PA rail (unregulated, ~24 V)” is rectified from it');
    const t = await post(`${base}/transformers/tr-main/delete`, { version: String(before.version) });
    expect(t.status).toBe(422);
    expect(await stored()).toEqual(before);
  });
});
