// Junction temperature and heatsink sizing against the reference values §7 worked example [D]
// (series thermal path Tj = Ta + P(θjc + θcs + θsa), [C] thermal-resistance reference page).
import { describe, expect, it } from 'vitest';
import { junctionTemperature, thermalFindings, TJ_DERATING_FRACTION } from '../../../src/core/thermal/junction';

const toleranceKPerW = 0.01; // ref prints 2 decimals
const toleranceC = 1e-9;

describe('ref §7: LM317-type in TO-220, Vin,avg 22.0 V, Vout 13.8 V, 1.0 A -> 8.2 W, θjc 5, θcs 1, Ta 40 ' +
  '°C', () => {
  const p = (22.0 - 13.8) * 1.0;
  it('θsa <= 1.32 K/W for Tj <= 100 °C (0.8 x 125 °C)', () => {
    const t = junctionTemperature(p, 40, { thetaJcKPerW: 5, thetaCsKPerW: 1, thetaSaKPerW: null, tjMaxC: 125 });
    expect(t.targetC).toBe(100); // ref §7: "target Tj <= 0.8 x Tj,max (e.g. < 100 °C for a 125 °C part)"
    expect(Math.abs((t.requiredThetaSaKPerW ?? NaN) - 1.32)).toBeLessThanOrEqual(toleranceKPerW);
  });
  it('θsa <= 4.37 K/W for Tj <= 125 °C', () => {
    const t = junctionTemperature(p, 40, {
      thetaJcKPerW: 5,
      thetaCsKPerW: 1,
      thetaSaKPerW: null,
      tjMaxC: 125 / TJ_DERATING_FRACTION,
    });
    expect(Math.abs((t.requiredThetaSaKPerW ?? NaN) - 4.37)).toBeLessThanOrEqual(toleranceKPerW);
  });
  it('without heatsink (RθJA ~ 50 K/W) Tj exceeds 400 °C (ref §7)', () => {
    const t = junctionTemperature(p, 40, { thetaJcKPerW: 5, thetaCsKPerW: 1, thetaSaKPerW: null, tjMaxC: 125 });
    expect(t.freeAirJunctionC).toBeGreaterThan(400);
    expect(t.needsHeatsink).toBe(true);
  });
  it('with a fitted 1.32 K/W heatsink Tj = 40 + 8.2 x 7.32 = 100.0 °C', () => {
    const t = junctionTemperature(p, 40, { thetaJcKPerW: 5, thetaCsKPerW: 1, thetaSaKPerW: 1.32, tjMaxC: 125 });
    expect(Math.abs((t.junctionC ?? NaN) - (40 + 8.2 * 7.32))).toBeLessThanOrEqual(toleranceC + 1e-9);
  });
});

describe('thermal findings', () => {
  const mount = { thetaJcKPerW: 5, thetaCsKPerW: 1, thetaSaKPerW: 4.5, tjMaxC: 125 };
  it('ok below target, caution between target and maximum, fail above maximum', () => {
    expect(thermalFindings('x', junctionTemperature(2, 40, mount), 'c')[0].severity).toBe('ok'); // 61 °C
    expect(thermalFindings('x', junctionTemperature(7, 40, mount), 'c')[0].severity).toBe('caution'); // 116.5 °C
    expect(thermalFindings('x', junctionTemperature(9, 40, mount), 'c')[0].severity).toBe('fail'); // 138.5 °C
  });
  it('no heatsink possible when the path alone exceeds the target', () => {
    const t = junctionTemperature(20, 40, { ...mount, thetaSaKPerW: null });
    expect(t.requiredThetaSaKPerW).toBeNull();
    expect(thermalFindings('x', t, 'c')[0].severity).toBe('fail');
  });
  it('bad power gives finite results', () => {
    const t = junctionTemperature(NaN, NaN, mount);
    expect([t.powerW, t.ambientC, t.junctionC ?? 0, t.freeAirJunctionC].every(Number.isFinite)).toBe(true);
  });
});

describe('negligible and subnormal dissipation (the θsa quotient must not overflow)', () => {
  const mount = { thetaJcKPerW: 5, thetaCsKPerW: 1, thetaSaKPerW: null, tjMaxC: 125 };
  it('5e-324 W (subnormal) needs no heatsink and gives no infinite θsa', () => {
    const t = junctionTemperature(5e-324, 40, mount);
    expect(t.requiredThetaSaKPerW).toBeNull();
    expect(t.needsHeatsink).toBe(false);
    expect(Object.values(t).every((v) => v === null || typeof v === 'boolean' || Number.isFinite(v))).toBe(true);
    expect(thermalFindings('x', t, 'c')[0].message).toContain('no heatsink needed');
  });
  it('at the 1 mW floor the series-path formula applies: (100 - 40) / 0.001 - 6 = 59 994 K/W (ref §7 formula)', () => {
    const t = junctionTemperature(1e-3, 40, mount);
    expect(Math.abs((t.requiredThetaSaKPerW ?? NaN) - 59994)).toBeLessThanOrEqual(toleranceKPerW);
  });
});
