// A fitted drain clamp: the drain peak it leaves and the power it takes. The relation is common practice, no
// published source (source registry 'pa.drain-clamp'): the unclamped drain as a cosine swing about the supply,
// v = Vdd + (Vpk − Vdd) cos θ, the clamp conducting while v > Vc (a share θc/π of the cycle, cos θc = (Vc −
// Vdd) / (Vpk − Vdd)) and carrying at most the peak device current: P ≤ Vc Ipk
// θc/π. Expected values are hand arithmetic.
import { describe, expect, it } from 'vitest';
import { clampAt } from '../../../src/core/rf/pa-clamp';
import { evaluatePa } from '../../../src/core/rf/pa';
import { validate } from '../../../src/core/spec/derive';
import { paSpec } from '../../../src/core/spec/pa';
import { paParams } from './fixture';
import { near } from './helpers';

describe('clamp relation (hand arithmetic)', () => {
  it('Vdd 24 V, unclamped peak 96 V, clamp 60 V, 2 A: cos θc = 36/72 = 0.5, θc = π/3, a third of ' +
    'the cycle, 40 W', () => {
    const c = clampAt(60, 24, 96, 2);
    near(c.conductionFraction, 1 / 3, 1e-12, 'share');
    near(c.dissipationW, 60 * 2 / 3, 1e-9, 'P'); // 60 V x 2 A x 1/3 = 40 W
    expect(c.clampedPeakV).toBe(60);
    expect(c.unclampedPeakV).toBe(96);
  });
  it('a clamp just above the supply: cos θc = 0, θc = π/2, half the cycle', () => {
    near(clampAt(24.0001, 24, 96, 2).conductionFraction, 0.5, 1e-5, 'share at Vdd');
  });
  it('energy balance: never more than the DC input at that load (40 W estimate against 10 W drawn: 10 W)', () => {
    near(clampAt(60, 24, 96, 2, 10).dissipationW, 10, 1e-12, 'P capped');
  });
  it('a clamp above the peak never conducts: no power, the peak unchanged', () => {
    const c = clampAt(100, 24, 96, 2);
    expect(c.conductionFraction).toBe(0);
    expect(c.dissipationW).toBe(0);
    expect(c.clampedPeakV).toBe(96);
  });
});

describe('a clamp fitted to a class-E stage at SWR 2', () => {
  const proj = { targetPowerW: 10, ambientC: 25, keyingDuty: 0.4 };
  const base = {
    amplifierClass: 'E' as const,
    topology: 'single-ended' as const,
    devices: 1,
    rdsOnOhm: 0.1,
    saturationV: null,
    deviceVdsMaxV: 55,
  };
  const bare = evaluatePa(paParams(base), 13.8, proj, 'PA', { worstSwr: 2 });
  // Sokal and Sokal (IEEE JSSC 1975): 3.56 x 13.8 V = 49.1 V into the design load; the SWR circle raises it above 55 V
  const worst = bare.swr!.worstDrainPeak.value;
  it('without the clamp the 55 V device fails at the worst load', () => {
    expect(worst).toBeGreaterThan(55);
    expect(bare.findings.find((f) => f.rule === 'pa.vds')!.severity).toBe('fail');
    expect(bare.findings.find((f) => f.rule === 'pa.vds')!.message).toMatch(/drain clamp|higher|rated/);
  });
  it('a 52 V clamp (above the 49.1 V design peak) holds the device at 52 V: a caution (within 25 % of ' +
    '55 V), not a fail', () => {
    const r = evaluatePa(paParams({ ...base, drainClampV: 52 }), 13.8, proj, 'PA', { worstSwr: 2 });
    const vds = r.findings.find((f) => f.rule === 'pa.vds')!;
    expect(vds.value).toBe(52);
    expect(vds.severity).toBe('caution'); // 55 V < 1.25 x 52 V = 65 V
    expect(vds.message).toMatch(/held there by the 52 V drain clamp/);
    expect(r.clamp!.design.conductionFraction).toBe(0); // 49.1 V < 52 V: idle into the design load
    // P = Vc Ipk θc/π with the stage's own worst peak and current (the relation above), at most the DC input there
    const swing = worst - 13.8;
    const share = Math.acos((52 - 13.8) / swing) / Math.PI;
    const at = r.swr!.points.find((p) => p.phaseDeg === r.swr!.worstDrainPeak.phaseDeg)!;
    near(
      r.clamp!.worst.dissipationW,
      Math.min(52 * r.swr!.worstPeakCurrent.value * share, at.outputW + at.dissipationW),
      1e-9,
      'P clamp',
    );
    const f = r.findings.find((x) => x.rule === 'pa.drain-clamp')!;
    expect(f.severity).toBe('caution');
    expect(f.message).toMatch(/steady-state power rating/);
    expect(f.source).toBe('pa.drain-clamp');
  });
  it('a clamp below the design peak conducts every cycle (caution); one at or above the rating does not ' +
    'protect (fail)', () => {
    const low = evaluatePa(paParams({ ...base, drainClampV: 40 }), 13.8, proj, 'PA', { worstSwr: 2 });
    expect(
      low.findings.some(
        (f) => f.rule === 'pa.drain-clamp' && f.severity === 'caution' && /every cycle/.test(f.message),
      ),
    ).toBe(true);
    const high = evaluatePa(paParams({ ...base, drainClampV: 55 }), 13.8, proj, 'PA', { worstSwr: 2 });
    expect(
      high.findings.some(
        (f) => f.rule === 'pa.drain-clamp' && f.severity === 'fail' && /does not protect/.test(f.message),
      ),
    ).toBe(true);
    const under = evaluatePa(paParams({ ...base, drainClampV: 12 }), 13.8, proj, 'PA', { worstSwr: 2 });
    expect(
      under.findings.some(
        (f) => f.rule === 'pa.drain-clamp' && f.severity === 'fail' && /conduct all the time/.test(f.message),
      ),
    ).toBe(true);
  });
  it('no clamp entered: no clamp result and no clamp finding', () => {
    expect(bare.clamp ?? null).toBeNull();
    expect(bare.findings.some((f) => f.rule === 'pa.drain-clamp')).toBe(false);
  });
});

describe('peak current near the rating suggests foldback or a higher-rated device', () => {
  it('class D push-pull at 90 % of the rating at SWR 2: caution naming foldback', () => {
    const proj = { targetPowerW: 10, ambientC: 25, keyingDuty: 0.4 };
    const pa = paParams({ amplifierClass: 'D', turnsRatio: 1.5, saturationV: 1, deviceIdMaxA: 100 });
    const worstA = evaluatePa(pa, 13.8, proj, 'PA', { worstSwr: 2 }).swr!.worstPeakCurrent.value;
    const r = evaluatePa({ ...pa, deviceIdMaxA: worstA / 0.9 }, 13.8, proj, 'PA', { worstSwr: 2 });
    const f = r.findings.find((x) => x.rule === 'pa.id')!;
    expect(f.severity).toBe('caution');
    expect(f.message).toMatch(/foldback/);
  });
});

describe('the clamp field spec', () => {
  it('refuses zero and a negative clamp by name', () => {
    const pa = paParams();
    for (const v of [0, -5]) {
      const e = validate(paSpec, { ...pa, drainClampV: v });
      expect(e.some((x) => x.field === 'drainClampV' && /Drain clamp voltage/.test(x.message))).toBe(true);
    }
    expect(validate(paSpec, { ...pa, drainClampV: 90 }).some((x) => x.field === 'drainClampV')).toBe(false);
  });
});
