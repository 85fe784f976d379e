// Class-E shunt capacitance against the device's output capacitance. Expected values are hand arithmetic from the
// nominal design equation C1 = 0.1836 / (ωR) (N. O. Sokal and A. D. Sokal, IEEE JSSC SC-10(3), 1975; constant from
// memory, not confirmed).
import { describe, expect, it } from 'vitest';
import { evaluatePa } from '../../../src/core/rf/pa';
import { paParams } from './fixture';
import { near } from './helpers';

const proj = { targetPowerW: 5, ambientC: 25, keyingDuty: 0.4 };
const pa = (cossF: number) =>
  paParams({ amplifierClass: 'E', topology: 'single-ended', devices: 1, networkLoadOhm: 10, deviceCossF: cossF });

describe('class-E shunt capacitance at 7.03 MHz into 10 Ω: C1 = 0.1836 / (2π 7.03 MHz 10 Ω) = 415.6 pF', () => {
  it('a 500 pF device fails and is usable up to 0.1836 / (2π 10 Ω 500 pF) = 5.84 MHz', () => {
    const f = evaluatePa(pa(500e-12), 13.8, proj, 'PA', { frequencyHz: 7.03e6 }).findings.find(
      (x) => x.rule === 'pa.class-e-shunt',
    )!;
    expect(f.severity).toBe('fail');
    near(f.limit as number, 0.1836 / (2 * Math.PI * 7.03e6 * 10), 1e-15, 'C1');
    expect(f.message).toContain('5.84 MHz');
  });
  it('a 150 pF device passes: add about 266 pF', () => {
    const f = evaluatePa(pa(150e-12), 13.8, proj, 'PA', { frequencyHz: 7.03e6 }).findings.find(
      (x) => x.rule === 'pa.class-e-shunt',
    )!;
    expect(f.severity).toBe('ok');
    expect(f.message).toContain('add about 266 pF');
  });
  it('no check without the device capacitance', () => {
    const r = evaluatePa(paParams({ amplifierClass: 'E', topology: 'single-ended', devices: 1 }), 13.8, proj, 'PA', {
      frequencyHz: 7.03e6,
    });
    expect(r.findings.some((x) => x.rule === 'pa.class-e-shunt')).toBe(false);
  });
});
