// Role defaults: a new final amplifier feeds from the highest-voltage rail that is not a regulator's raw input, a
// relay coil from the signal rail; with no such rail the evaluation fails instead of leaving the current out.
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/core/evaluate';
import type { Project, Rail, Stage } from '../../src/core/model';
import { newProject, withKindDefaults } from '../../src/core/new-project';
import {
  paDefaultRailId,
  railEstimateV,
  rectifiedEstimateV,
  relayCoilDefaultRailId,
} from '../../src/core/role-defaults';
import { DEMO_PROJECTS } from '../../seed-demo/index';

const club = () => structuredClone(DEMO_PROJECTS[0]);
const portable = () => structuredClone(DEMO_PROJECTS[1]);
const stage = (kind: Stage['kind'], loads: Stage['loads'] = []): Stage => ({
  id: 'new',
  kind,
  name: 'New',
  notes: '',
  loads,
  dissipationW: null,
});

describe('rectified rail estimate', () => {
  it('18 V RMS bridge with 0.9 V diodes: 25.46 - 1.8 = about 23.7 V at the capacitor (REFERENCE-VALUES §4.2)', () => {
    const toleranceV = 0.05;
    expect(Math.abs(rectifiedEstimateV(18, 'bridge', 0.9) - 23.7)).toBeLessThan(toleranceV);
  });
  it('centre-tap and half-wave lose one diode drop (REFERENCE-VALUES §4.1: only the conducting diodes count)', () => {
    expect(rectifiedEstimateV(18, 'centre-tap', 0.9)).toBeCloseTo(18 * Math.SQRT2 - 0.9, 12);
    expect(rectifiedEstimateV(18, 'half-wave', 0.9)).toBeCloseTo(18 * Math.SQRT2 - 0.9, 12);
  });
  it('a rail with no winding has no estimate (NaN), not 0 V', () => {
    const p = club();
    const raw = p.supply.rails.find((r) => r.id === 'rail-raw')!;
    expect(Number.isNaN(railEstimateV({ ...raw, windingId: 'gone' } as Rail, p))).toBe(true);
  });
});

describe('role defaults on the demo projects', () => {
  it('club (mains): PA on the ~24 V PA rail, not the raw rail first in the list; relay coil on the 13.8 V signal ' +
    'rail', () => {
    const p = club();
    expect(p.supply.rails[0].id).toBe('rail-raw'); // the old default took the first rail
    expect(paDefaultRailId(p)).toBe('rail-pa');
    expect(relayCoilDefaultRailId(p)).toBe('rail-13v8');
    expect(withKindDefaults(p, stage('final')).pa!.railId).toBe('rail-pa');
    expect(withKindDefaults(p, stage('tr')).relay!.coilRailId).toBe('rail-13v8');
  });
  it('portable (battery): PA on the battery (a battery counts though it feeds the 9 V regulator); coil on the 9 V ' +
    'rail', () => {
    const p = portable();
    expect(withKindDefaults(p, stage('final')).pa!.railId).toBe('rail-bat');
    expect(withKindDefaults(p, stage('tr')).relay!.coilRailId).toBe('rail-9v');
  });
});

describe('role defaults with a raw rail feeding a regulator', () => {
  /** Club supply with the raw rail on a 24 V winding: 24 x 1.414 - 1.8 = 32.1 V, above the PA rail's 26.5 V. */
  const highRaw = (): Project => {
    const p = club();
    p.supply.transformers[0].windings.find((w) => w.id === 'w-16')!.ratedVrms = 24;
    return p;
  };
  it('the PA skips the higher raw rail that feeds the regulator', () => {
    const p = highRaw();
    const raw = p.supply.rails.find((r) => r.id === 'rail-raw')!;
    const pa = p.supply.rails.find((r) => r.id === 'rail-pa')!;
    expect(railEstimateV(raw, p)).toBeGreaterThan(railEstimateV(pa, p));
    expect(paDefaultRailId(p)).toBe('rail-pa');
  });
  it('with only the raw rail and its regulator, the PA feeds from the regulated rail', () => {
    const p = highRaw();
    p.supply.rails = p.supply.rails.filter((r) => r.id !== 'rail-pa');
    expect(paDefaultRailId(p)).toBe('rail-13v8');
  });
  it("a stage's own load rail wins when it qualifies; a raw rail among its loads does not", () => {
    const p = highRaw();
    const load = (railId: string) => ({ railId, currentA: { receive: 0, keyUp: 0.05, keyDown: 1 } });
    expect(withKindDefaults(p, stage('final', [load('rail-13v8')])).pa!.railId).toBe('rail-13v8');
    expect(withKindDefaults(p, stage('final', [load('rail-raw')])).pa!.railId).toBe('rail-pa');
  });
});

describe('signal rail choice', () => {
  const reg = (id: string, v: number, parentId = 'bat'): Rail => ({
    kind: 'regulated',
    id,
    name: `${v} V`,
    parentId,
    regulator: 'linear',
    setting: { method: 'fixed', nominalV: v },
    dropoutV: 2,
    quiescentA: 0.005,
    efficiency: null,
    maxOutputA: null,
    maxInputV: null,
    mount: null,
    rippleRejectionDb: null,
    rippleTargetV: null,
  });
  const bat: Rail = {
    kind: 'battery',
    id: 'bat',
    name: '12 V',
    chemistry: 'LiFePO4',
    nominalV: 12.8,
    fullV: 14.4,
    endV: 10,
    capacityAh: 7,
    usableFraction: 0.8,
    internalOhm: 0.05,
    minimumV: null,
  };
  const withRails = (rails: Rail[]): Project => ({
    ...newProject('p', 'P', 7.03e6, 5, null),
    supply: { transformers: [], rails, primaryFuseA: null },
  });
  it('the regulated rail with the lowest voltage of at least 5 V (a 3.3 V logic rail is too low for a relay ' +
    'coil)', () => {
    expect(relayCoilDefaultRailId(withRails([bat, reg('r12', 12), reg('r33', 3.3), reg('r5', 5)]))).toBe('r5');
  });
  it('with no regulated rail, the battery', () => {
    expect(relayCoilDefaultRailId(withRails([bat]))).toBe('bat');
  });
});

describe('no rail to choose: a failure, not a silent omission', () => {
  it('a new project with no rails: the PA and the relay coil get no rail and the evaluation fails naming them', () => {
    const p = newProject('p', 'P', 7.03e6, 5, null);
    p.stages = [
      withKindDefaults(p, { ...stage('final'), id: 'pa', name: 'Final' }),
      withKindDefaults(p, { ...stage('tr'), id: 'tr', name: 'Relay' }),
    ];
    expect(p.stages[0].pa!.railId).toBe('');
    expect(p.stages[1].relay!.coilRailId).toBeNull();
    const r = evaluate(p);
    const fails = r.findings.filter((f) => f.severity === 'fail').map((f) => f.subject);
    expect(fails).toContain('Final: PA key-down current');
    expect(fails).toContain('Relay: relay coil rail');
  });
});
