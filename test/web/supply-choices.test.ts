// The supply choices form (primary fuse type, transformer sizing) and the rail boxes for the rectifier's thermal data
// and a regulated rail's output bleeder, through t.app.request(): saved when good, refused by field with nothing
// saved when bad, and shown in the computed results.
import { beforeEach, describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { loadProject } from '../../src/db/projects';
import type { Project, RectifiedRail, RegulatedRail } from '../../src/core/model';
import { formValues } from '../../src/core/spec/derive';
import { RAIL_SPECS } from '../../src/core/spec/supply-rails';

const ID = 'demo-club-30m';
let t: Awaited<ReturnType<typeof demoApp>>;
beforeEach(async () => {
  t = await demoApp();
});
const stored = async (): Promise<Project> => (await loadProject(t.database.db, ID))!;
const post = (path: string, fields: Record<string, string>) => t.post(path, fields, { 'HX-Request': 'true' });
const base = `/projects/${ID}/supply`;
const railForm = (p: Project, id: string) => {
  const r = p.supply.rails.find((x) => x.id === id)!;
  return { ...formValues(RAIL_SPECS[r.kind], r), version: String(p.version) };
};

describe('supply choices', () => {
  it('saves a T5 primary fuse and tune-up sizing, and the results name both', async () => {
    const p = await stored();
    expect(p.supply.primaryFuseSheet ?? 'T3').toBe('T3');
    const res = await post(`${base}/choices`, {
      version: String(p.version),
      primaryFuseSheet: 'T5',
      transformerSizing: 'tune-up',
    });
    expect(res.status).toBe(200);
    const s = (await stored()).supply;
    expect([s.primaryFuseSheet, s.transformerSizing]).toEqual(['T5', 'tune-up']);
    const html = await res.text();
    expect(html).toContain('IEC 60127-2 sheet 5');
    expect(html).toContain('Sized for tune-up');
  });
  it('refuses a fuse type outside the IEC 60127-2 sheets offered, naming the field, saving nothing', async () => {
    const before = await stored();
    const res = await post(`${base}/choices`, {
      version: String(before.version),
      primaryFuseSheet: 'X9',
      transformerSizing: 'duty',
    });
    expect(res.status).toBe(422);
    expect(await res.text()).toContain('Primary fuse type');
    expect(await stored()).toEqual(before);
  });
});

describe('rectifier thermal data and regulated output bleeder', () => {
  it('a rectifier heatsink θsa alone is refused, naming θjc, θcs and Tj max; all four are saved and the heat line ' +
    'shows them', async () => {
    const p = await stored();
    const bad = await post(`${base}/rails/rail-pa`, { ...railForm(p, 'rail-pa'), bridgeThetaSa: '5' });
    expect(bad.status).toBe(422);
    const text = await bad.text();
    for (const label of ['Rectifier θjc', 'Rectifier θcs', 'Rectifier Tj max']) expect(text).toContain(label);
    expect(await stored()).toEqual(p);
    const res = await post(`${base}/rails/rail-pa`, {
      ...railForm(p, 'rail-pa'),
      bridgeThetaJc: '2.2',
      bridgeThetaCs: '0.5',
      bridgeThetaSa: '5',
      bridgeTjMax: '150',
    });
    expect(res.status).toBe(200);
    const r = (await stored()).supply.rails.find((x) => x.id === 'rail-pa') as RectifiedRail;
    expect(r.bridgeMount).toEqual({ thetaJcKPerW: 2.2, thetaCsKPerW: 0.5, thetaSaKPerW: 5, tjMaxC: 150 });
    expect(await res.text()).toMatch(/Rectifier heat:[\s\S]*On the 5 K\/W heatsink/);
  });
  it('a regulated rail’s output capacitance (µF) and bleeder are saved and its discharge shown', async () => {
    const p = await stored();
    const res = await post(`${base}/rails/rail-13v8`, {
      ...railForm(p, 'rail-13v8'),
      outputC: '100',
      outBleeder: '1000',
      outBleederW: '0.25',
    });
    expect(res.status).toBe(200);
    const r = (await stored()).supply.rails.find((x) => x.id === 'rail-13v8') as RegulatedRail;
    expect(r.outputF).toBeCloseTo(100e-6, 15); // a bare number in the µF box
    expect([r.bleederOhm, r.bleederRatedW]).toEqual([1000, 0.25]);
    expect(await res.text()).toMatch(/Output bleeder:[\s\S]*below 5 V within about/);
  });
});
