// PA heating at the edges: subnormal and negligible dissipation give findings and finite values, never Infinity.
// The normal-range worked example (REFERENCE-VALUES §7) is in pa.test.ts.
import { describe, expect, it } from 'vitest';
import { NEGLIGIBLE_DISSIPATION_W, NO_HEATSINK_NEEDED_K_PER_W, paThermal } from '../../../src/core/rf/pa-thermal';
import { paParams } from './fixture';
import { near, nonFinitePaths } from './helpers';

// Tjmax 125 °C -> target 0.8 x 125 = 100 °C (REFERENCE-VALUES §7); θjc 5 + θcs 1 = 6 K/W
const mount = { thetaJcKPerW: 5, thetaCsKPerW: 1, thetaSaKPerW: null, tjMaxC: 125 };
const pa = paParams({ devices: 1, mount });

describe('paThermal with (nearly) nothing to dissipate', () => {
  it('a bias power from a 1.5e-322 V rail (subnormal) needs no heatsink and stays finite (regression)', () => {
    // 0.05 A x 1.5e-322 V is a subnormal power: (100 - 40) / p used to be Infinity
    const t = paThermal(pa, 0, 0, 0.05 * 1.5e-322, 40, 0.4);
    expect(nonFinitePaths(t)).toEqual([]);
    expect(t.thetaSaNeededAverageKPerW).toBe(NO_HEATSINK_NEEDED_K_PER_W);
    expect(t.thetaSaNeededContinuousKPerW).toBe(NO_HEATSINK_NEEDED_K_PER_W);
    const f = t.findings.find((x) => x.rule === 'pa.heatsink');
    expect(f?.severity).toBe('ok');
    expect(f?.message).toContain('no heatsink is needed');
  });
  it('Number.MIN_VALUE of dissipation is treated the same way', () => {
    const t = paThermal(pa, 0, Number.MIN_VALUE, 0, 40, 1);
    expect(nonFinitePaths(t)).toEqual([]);
    expect(t.thetaSaNeededContinuousKPerW).toBe(NO_HEATSINK_NEEDED_K_PER_W);
  });
  it('at the floor itself the formula applies: (100 - 40) / 1 mW - 6 = 59 994 K/W (REFERENCE-VALUES §7 formula)', () => {
    const t = paThermal(pa, 0, NEGLIGIBLE_DISSIPATION_W, 0, 40, 1);
    near(t.thetaSaNeededContinuousKPerW as number, 60 / 1e-3 - 6, 1e-6, 'θsa');
  });
  it('an ambient above the junction target fails even with negligible heat: no heatsink cools below ambient', () => {
    const t = paThermal(pa, 0, 0, 0, 110, 1);
    expect(t.thetaSaNeededAverageKPerW).toBeNull();
    expect(t.findings.find((x) => x.rule === 'pa.heatsink')?.severity).toBe('fail');
  });
});
