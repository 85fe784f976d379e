import { describe, expect, it } from 'vitest';
import { evaluatePa, paKeyDownCurrentA } from '../../../src/core/rf/pa';
import { operatingPoint, powerCoefficient } from '../../../src/core/rf/pa-load-line';
import { paThermal } from '../../../src/core/rf/pa-thermal';
import { paParams } from './fixture';
import { near } from './helpers';

const proj = { targetPowerW: 10, ambientC: 25, keyingDuty: 0.4 };
const toleranceOhm = 0.01;
const toleranceW = 0.01;

describe('PA worked example, push-pull 13.8 V 10 W 50 Ω (REFERENCE-VALUES §8.3)', () => {
  const pa = paParams({ saturationV: 1.0, amplifierClass: 'B', efficiency: 0.7, biasIdleMaxA: 0 });
  const r = evaluatePa(pa, 13.8, proj);
  it('ideal turns ratio 1.235 (R_dd 32.77 Ω)', () => {
    near(r.idealTurnsRatio as number, 1.235, 0.0005, 'ratio');
    near(50 / (r.idealTurnsRatio as number) ** 2, 32.77, toleranceOhm, 'R_dd');
  });
  it('practical ratios: 1:1 -> 6.55 W, 4:5 -> 10.24 W, 2:3 -> 14.75 W, and 4:5 chosen', () => {
    const by = (l: string) => r.ratioOptions.find((o) => o.label === l)!;
    near(by('1:1').outputW, 6.55, toleranceW, '1:1');
    near(by('4:5').primaryOhm, 32.0, toleranceOhm, '4:5 R');
    near(by('4:5').outputW, 10.24, toleranceW, '4:5');
    near(by('2:3').outputW, 14.75, toleranceW, '2:3');
    expect(r.turnsRatio).toBe(1.25);
  });
  it('DC input 14.3 W and about 1.04 A at 70 %', () => {
    const t = evaluatePa({ ...pa, turnsRatio: 1.235 }, 13.8, proj);
    near(t.outputW, 10.0, 0.02, 'P');
    near(t.dcInputW, 14.3, 0.05, 'DC W');
    // printed 1.04 A from rounded 14.3 W / 13.8 V (= 1.036 A): tolerance 0.01 A;
    // at the design point (edge of saturation)
    near(t.waveform!.designCurrentA, 1.04, 0.01, 'I');
    // the band's most: the hard-saturated square wave, whose mean current is 1/2 of its peak against the
    // half-sine's 1/π (Fourier series, textbook): π/2 × the design current, 1.036 × π/2 = 1.63 A, said in a
    // caution
    near(t.waveform!.bandMaxCurrentA, t.waveform!.designCurrentA * (Math.PI / 2), 1e-6, 'I saturated');
    near(t.waveform!.bandMaxCurrentA, 1.627, 0.016, 'I saturated, by hand');
    // the budget carries the saturated end (no bias in this example)
    near(t.keyDownCurrentA, t.waveform!.bandMaxCurrentA, 1e-12, 'the budget carries the band’s most');
    expect(t.findings.find((f) => f.rule === 'pa.saturation-current')?.severity).toBe('caution');
    const kd = paKeyDownCurrentA({ ...pa, turnsRatio: 1.235 }, 13.8, proj);
    expect(kd.ok).toBe(true);
    near(kd.ok ? kd.currentA : NaN, t.keyDownCurrentA, 1e-12, 'export');
  });
  it('class D square-wave model with 1.25 ratio gives 16.6 W', () => {
    const d = evaluatePa({ ...pa, amplifierClass: 'D', turnsRatio: 1.25 }, 13.8, proj);
    near(d.outputW, 16.6, 0.05, 'class D');
  });
  it('class E single-ended: R = 9.45 Ω for 10 W, peak drain 49.1 V', () => {
    const e = paParams({ topology: 'single-ended', devices: 1, amplifierClass: 'E', saturationV: 1.0 });
    // R = 0.5768 x 12.8^2 / 10 (Sokal & Sokal 1975 via REFERENCE-VALUES §8.1)
    near((powerCoefficient('single-ended', 'E') * 12.8 ** 2) / 10, 9.45, toleranceOhm, 'R');
    near(operatingPoint(e, 13.8, 9.45).outputW, 10.0, 0.01, 'P at 9.45 Ω');
    near(evaluatePa({ ...e, turnsRatio: Math.sqrt(50 / 9.45) }, 13.8, proj).peakDrainV, 49.1, 0.05, 'peak');
  });
  it('Rds(on) drop is iterated to a self-consistent point', () => {
    const p = paParams({ saturationV: null, rdsOnOhm: 0.1, amplifierClass: 'B', turnsRatio: 1.25 });
    const op = operatingPoint(p, 13.8, 32);
    // self-consistency: Vsat = Ipk x Rds, with Ipk = 4(Vdd - Vsat)/R_dd for a push-pull sinusoidal swing
    near(op.saturationV, 0.1 * ((4 * (13.8 - op.saturationV)) / 32), 1e-6, 'Vsat');
    near(op.saturationV, (13.8 * 0.0125) / 1.0125, 1e-6, 'closed form');
  });
});

describe('PA thermal (REFERENCE-VALUES §7 worked example numbers)', () => {
  it('θsa for 8.2 W, θjc 5, θcs 1, Ta 40 °C, target 100 °C is 1.32 K/W', () => {
    // Tjmax 125 °C -> 0.8 x 125 = 100 °C target; REFERENCE-VALUES §7 gives 60/8.2 - 6 = 1.32 K/W
    const p = paParams({ devices: 1, mount: { thetaJcKPerW: 5, thetaCsKPerW: 1, thetaSaKPerW: null, tjMaxC: 125 } });
    const t = paThermal(p, 0, 8.2, 0, 40, 1);
    near(t.thetaSaNeededContinuousKPerW as number, 1.32, 0.005, 'θsa');
    near(t.thetaSaNeededAverageKPerW as number, 1.32, 0.005, 'duty 1');
    const k = paThermal(p, 0, 8.2, 0, 40, 0.4);
    near(k.averagePerDeviceW, 8.2 * 0.4, 1e-9, 'duty-averaged');
  });
  it('bias idle power is added to dissipation', () => {
    const p = paParams({ devices: 2 });
    const t = paThermal(p, 10, 14, 0.05 * 13.8, 25, 0.4);
    near(t.dissipationTotalW, 4 + 0.69, 1e-9, 'total');
  });
});

describe('PA findings and bad inputs', () => {
  it('flags a device rating below the drain peak', () => {
    const r = evaluatePa(paParams({ deviceVdsMaxV: 20, turnsRatio: 1.25 }), 13.8, proj);
    expect(r.findings.find((f) => f.rule === 'pa.vds')?.severity).toBe('fail');
  });
  it('zero or missing rail voltage gives a fail finding, not NaN', () => {
    for (const v of [0, -5, NaN]) {
      const r = evaluatePa(paParams(), v, proj);
      expect(r.findings.some((f) => f.severity === 'fail')).toBe(true);
      expect(Number.isFinite(r.outputW) && Number.isFinite(r.railV)).toBe(true);
    }
    // the budget's current is refused with the rail named, not 0 (a 0 would design the supply for an unloaded PA)
    const kd = paKeyDownCurrentA(paParams(), 0, proj, 'PA');
    expect(kd.ok).toBe(false);
    if (!kd.ok) expect(kd.findings.map((f) => [f.severity, f.subject])).toEqual([['fail', 'PA: supply rail']]);
  });
});

describe('PA judged at its worst supply corners (common practice, no published source: worst-case design)', () => {
  const toleranceV = 0.05;
  it('drain peak uses the highest rail voltage: class E 3.56 x 15.18 V = 54.0 V (Sokal & Sokal 1975 via ' +
    'REFERENCE-VALUES §8.1)', () => {
    const e = paParams({
      topology: 'single-ended',
      devices: 1,
      amplifierClass: 'E',
      saturationV: 1.0,
      deviceVdsMaxV: 50,
      turnsRatio: Math.sqrt(50 / 9.45),
    });
    const nominal = evaluatePa(e, 13.8, proj);
    // REFERENCE-VALUES §8.3: 3.56 x 13.8 = 49.1 V at the operating point
    near(nominal.peakDrainV, 49.1, toleranceV, 'nominal');
    expect(nominal.findings.find((f) => f.rule === 'pa.vds')?.severity).toBe('caution');
    // +10 % mains: the reservoir sits at 15.18 V before key-down; 3.56 x 15.18 = 54.04 V exceeds a 50 V part
    const high = evaluatePa(e, 13.8, proj, 'PA', { maxRailV: 15.18 });
    near(high.peakDrainV, 3.56 * 15.18, toleranceV, 'high');
    expect(high.findings.find((f) => f.rule === 'pa.vds')?.severity).toBe('fail');
    // the output power stays at the operating point
    near(high.outputW, nominal.outputW, 1e-9, 'output unchanged');
  });
  it('heating uses the hot rail voltage: 4:5 push-pull at 15.18 V gives 2 x 14.18^2 / 32 = 12.57 W, heat of its ' +
    'saturated square wave at 70 % (REFERENCE-VALUES §8.1, §8.3)', () => {
    const pa = paParams({ saturationV: 1.0, amplifierClass: 'B', efficiency: 0.7, biasIdleMaxA: 0, turnsRatio: 1.25 });
    const r = evaluatePa(pa, 13.8, proj, 'PA', { hotRailV: 15.18 });
    const toleranceW = 0.01;
    // P = 2 (Vdd - Vsat)^2 / R_dd (§8.1). The hottest waveform of the band is the hard-saturated square wave: output
    // (4/π)² P (fundamental 4/π), DC input (π/2) P/η (mean 1/2 against the
    // half-sine's 1/π): Fourier series, textbook
    const pHot = (2 * 14.18 ** 2) / 32;
    const heat = (p: number) => p * (Math.PI / (2 * 0.7) - 16 / Math.PI ** 2);
    near(r.thermal.dissipationTotalW, heat(pHot), toleranceW, 'hot dissipation');
    near(r.outputW, 10.24, toleranceW, 'output at the operating point (§8.3)');
    // absurd corner values fall back to the operating point instead of producing NaN
    const bad = evaluatePa(pa, 13.8, proj, 'PA', { hotRailV: NaN, maxRailV: -3 });
    near(bad.peakDrainV, 2 * 13.8, 1e-9, 'fallback peak');
    near(bad.thermal.dissipationTotalW, heat(10.24), toleranceW, 'fallback heat');
  });
});

describe('PA output at the lowest key-down supply (load line P = (Vdd - Vsat)^2 / (0.5768... R): ' +
  'REFERENCE-VALUES §8.1, §8.3)', () => {
  const e = paParams({
    topology: 'single-ended',
    devices: 1,
    amplifierClass: 'E',
    saturationV: 1.0,
    turnsRatio: Math.sqrt(50 / 9.45),
  });
  const toleranceW = 0.02;
  it('10 W at 13.8 V falls to 10 x (10.8/12.8)^2 = 7.12 W at 11.8 V: caution (more than 1 dB down)', () => {
    const r = evaluatePa(e, 13.8, proj, 'PA', { lowRailV: 11.8 });
    near(r.lowOutputW, 10 * (10.8 / 12.8) ** 2, toleranceW, 'low output');
    expect(r.findings.find((f) => f.rule === 'pa.power-low-supply')?.severity).toBe('caution');
  });
  it('at 13.0 V it is 10 x (12/12.8)^2 = 8.79 W, within 1 dB: ok; no lower corner known: no finding', () => {
    const r = evaluatePa(e, 13.8, proj, 'PA', { lowRailV: 13.0 });
    near(r.lowOutputW, 10 * (12 / 12.8) ** 2, toleranceW, 'low output');
    expect(r.findings.find((f) => f.rule === 'pa.power-low-supply')?.severity).toBe('ok');
    expect(evaluatePa(e, 13.8, proj).findings.some((f) => f.rule === 'pa.power-low-supply')).toBe(false);
  });
});
