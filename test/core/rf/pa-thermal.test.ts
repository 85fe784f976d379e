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
  it('at the floor itself the formula applies: (100 - 40) / 1 mW - 6 = 59 994 K/W ' +
    '(REFERENCE-VALUES §7 formula)', () => {
    const t = paThermal(pa, 0, NEGLIGIBLE_DISSIPATION_W, 0, 40, 1);
    near(t.thetaSaNeededContinuousKPerW as number, 60 / 1e-3 - 6, 1e-6, 'θsa');
  });
  it('an ambient above the junction target fails even with negligible heat: no heatsink cools below ambient', () => {
    const t = paThermal(pa, 0, 0, 0, 110, 1);
    expect(t.thetaSaNeededAverageKPerW).toBeNull();
    expect(t.findings.find((x) => x.rule === 'pa.heatsink')?.severity).toBe('fail');
  });
});

describe('paThermal with devices sharing one heatsink', () => {
  // Thermal network (REFERENCE-VALUES §7 series path, s devices in parallel into one θsa; textbook):
  // Tj = Ta + P (θjc + θcs) + s P θsa. Hand arithmetic: P = 10 W per device (duty 1), θjc + θcs = 6 K/W,
  // θsa = 2 K/W, Ta = 25 °C: one sink each 25 + 10 x 8 = 105 °C; two on one sink 25 + 60 + 40 = 125 °C.
  const two = (shared: number | null, sa: number | null) =>
    paParams({ devices: 2, heatsinkSharedBy: shared, mount: { ...mount, thetaSaKPerW: sa } });
  it('one heatsink per device: 105 °C continuous', () => {
    near(paThermal(two(null, 2), 0, 20, 0, 25, 1).tjContinuousC as number, 105, 1e-9, 'Tj');
  });
  it('two devices on one heatsink: 125 °C continuous (the shared θsa carries 20 W)', () => {
    const t = paThermal(two(2, 2), 0, 20, 0, 25, 1);
    near(t.tjContinuousC as number, 125, 1e-9, 'Tj');
    expect(t.sharedBy).toBe(2);
  });
  it('heatsink needed halves with two devices on it: ((100 - 25)/10 - 6)/2 = 0.75 K/W', () => {
    const t = paThermal(two(2, null), 0, 20, 0, 25, 1);
    near(t.thetaSaNeededContinuousKPerW as number, 0.75, 1e-9, 'θsa');
    expect(t.findings.find((f) => f.rule === 'pa.heatsink')?.message).toContain('shared by 2 devices');
  });
});
