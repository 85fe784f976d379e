// The PA inputs added for the SWR-circle, heatsink, harmonic and class-E checks: drawn on the stage page, refused by
// name when out of range or in conflict, nothing saved and nothing typed lost.
import { describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { loadProject } from '../../src/db/projects';
import { formValues, paSpec } from '../../src/core/spec';
import { DEMO_PROJECTS } from '../../seed-demo/index';
import { parseProjectFile, toProjectFile } from '../../src/io/project-file';

const ID = 'demo-club-30m';
const club = DEMO_PROJECTS[0];
const paForm = () => ({ version: '1', ...formValues(paSpec, club.stages.find((s) => s.id === 'st-pa')!.pa!) });

describe('new PA inputs on the stage page', () => {
  it('are drawn on the PA form', async () => {
    const { get } = await demoApp();
    const html = await (await get(`/projects/${ID}/stages/st-pa`)).text();
    for (const label of [
      'Devices on one heatsink',
      'Conduction angle (class C)',
      'Push-pull imbalance, worst',
      'Device output capacitance Coss',
      'Drain load set by a matching network',
      'Output transformer leakage, half to half',
      'Drain clamp voltage',
    ]) {
      expect(html).toContain(label);
    }
  });
  it.each([
    [
      'a conduction angle below 60°',
      { conductionAngle: '30' },
      'conductionAngle',
      'Conduction angle (class C) must be at least 60',
    ],
    [
      'more devices on one heatsink than the stage has',
      { heatsinkSharedBy: '3' },
      'heatsinkSharedBy',
      'Devices on one heatsink: at most the number of devices',
    ],
    [
      'a worst imbalance below the typical',
      { imbalanceTypical: '10', imbalanceWorst: '5' },
      'imbalanceWorst',
      'at least the typical imbalance',
    ],
    [
      'both a turns ratio and a network drain load',
      { networkLoad: '12.5' },
      'networkLoad',
      'give it or a turns ratio, not both',
    ],
    [
      'a transformer leakage of zero',
      { leakage: '0' },
      'leakage',
      'Output transformer leakage, half to half must be more than 0',
    ],
    [
      'a transformer leakage above 10 µH',
      { leakage: '20000' },
      'leakage',
      'and at most 10 µH; you entered &quot;20000&quot;',
    ],
    ['a drain clamp of zero', { drainClamp: '0' }, 'drainClamp', 'Drain clamp voltage must be more than 0'],
    ['a drain clamp above 10 kV', { drainClamp: '20000' }, 'drainClamp', 'Drain clamp voltage'],
    ['a drain clamp that is not a number', { drainClamp: 'ninety' }, 'drainClamp', 'Drain clamp voltage'],
  ])('refuses %s by name and saves nothing', async (_label, change, field, message) => {
    const { post, database } = await demoApp();
    const before = await loadProject(database.db, ID);
    const res = await post(`/projects/${ID}/stages/st-pa/pa`, { ...paForm(), ...change }, { 'HX-Request': 'true' });
    expect(res.status).toBe(422);
    const html = await res.text();
    expect(html).toContain(message);
    expect(html).toContain(`name="${field}" type="text" value="${(change as Record<string, string>)[field]}"`);
    expect(await loadProject(database.db, ID)).toEqual(before);
  });
});

describe('the drain clamp is stored with the PA data', () => {
  it('a valid clamp is saved in the stage params, read back, and carried by the project file', async () => {
    const { post, database } = await demoApp();
    const res = await post(
      `/projects/${ID}/stages/st-pa/pa`,
      { ...paForm(), drainClamp: '150' },
      { 'HX-Request': 'true' },
    );
    expect(res.status).toBeLessThan(400);
    const after = await loadProject(database.db, ID);
    expect(after!.stages.find((s) => s.id === 'st-pa')!.pa!.drainClampV).toBe(150);
    const back = parseProjectFile(toProjectFile(after!, '2026-12-02T06:00:00Z'));
    if (!back.ok) throw new Error(back.errors.join('; '));
    expect(back.project.stages.find((s) => s.id === 'st-pa')!.pa!.drainClampV).toBe(150);
  });
  it('the project file refuses a negative clamp by name', () => {
    const bad = {
      ...club,
      stages: club.stages.map((s) => (s.id === 'st-pa' ? { ...s, pa: { ...s.pa!, drainClampV: -5 } } : s)),
    };
    const r = parseProjectFile(toProjectFile(bad, '2026-12-02T06:00:00Z'));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.join(' ')).toMatch(/drainClampV[^]*Drain clamp voltage|Drain clamp voltage/);
  });
});
