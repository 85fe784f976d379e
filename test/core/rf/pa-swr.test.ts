// PA stress round the SWR circle. Expected values are hand arithmetic from published definitions:
// |Γ| = (S - 1)/(S + 1) and z = (1 + Γ)/(1 - Γ) (definition of the reflection coefficient, any Smith-chart text),
// and the textbook load line at a complex load (P = |I1|^2 Re Z / 2 = |V1|^2 Re Y / 2).
import { describe, expect, it } from 'vitest';
import { leakageRing, loadOnCircle, stressAt, swrStress, type MatchedPoint } from '../../../src/core/rf/pa-swr';
import { evaluatePa } from '../../../src/core/rf/pa';
import { paParams } from './fixture';
import { near } from './helpers';

// Invented matched stage: 20 V highest supply, drain peak 2 x 20 V, 3 A peak, 10 W out of 14.2857 W DC (70 %)
const m: MatchedPoint = { drainPeakV: 40, maxRailV: 20, peakDeviceA: 3, outputW: 10, dcInputW: 10 / 0.7, biasW: 0 };

describe('loads on the SWR 2 circle (definition of Γ and SWR)', () => {
  it('phase 0: Γ = +1/3, z = (4/3)/(2/3) = 2', () => {
    const z = loadOnCircle(2, 0);
    near(z.re, 2, 1e-12, 're');
    near(z.im, 0, 1e-12, 'im');
  });
  it('phase 180°: Γ = -1/3, z = 1/2', () => near(loadOnCircle(2, 180).re, 0.5, 1e-12, 're'));
  it('phase 90°: Γ = j/3, z = (1 + j/3)/(1 - j/3) = 0.8 + j0.6', () => {
    const z = loadOnCircle(2, 90);
    near(z.re, 0.8, 1e-12, 're');
    near(z.im, 0.6, 1e-12, 'im');
  });
});

describe('class D (voltage switching) at a complex load: V1 fixed, I1 = V1/|Z|', () => {
  it('z = 1/2: twice the current, P = P0 Re(z)/|z|^2 = 2 P0, conduction loss x 4', () => {
    const s = stressAt('D', m, { re: 0.5, im: 0 });
    near(s.peakDeviceA, 6, 1e-12, 'Ipk');
    near(s.outputW, 20, 1e-12, 'P');
    near(s.dissipationW, 4 * (10 / 0.7 - 10), 1e-9, 'loss');
    near(s.drainPeakV, 40, 1e-12, 'Vpk');
  });
  it('z = 0.8 + j0.6 (|z| = 1): same current, P = 0.8 P0', () => {
    near(stressAt('D', m, { re: 0.8, im: 0.6 }).outputW, 8, 1e-12, 'P');
  });
  it('the sweep puts the worst current and the most power at phase 180° (z = 1/S)', () => {
    const s = swrStress('D', m, 2, 50);
    near(s.worstPeakCurrent.value, 6, 1e-9, 'Ipk');
    expect(s.worstPeakCurrent.phaseDeg).toBe(180);
    near(s.worstPeakCurrent.loadReOhm, 25, 1e-9, 'R');
    near(s.maxOutput.value, 20, 1e-9, 'Pmax');
    near(s.minOutput.value, 5, 1e-9, 'Pmin at z = 2: P0 x 2/4');
  });
});

describe('class B/C at a complex load: I1 held until the swing reaches the supply, then clipped', () => {
  it('z = 2: the swing 2 V is flat-topped at ±V; fundamental V b1(2), b1(2) = 2/3 + √3/π worked by hand', () => {
    // Source: clipped-sinusoid Fourier series (saturation describing function, Gelb & Vander Velde 1968, from
    // memory): clip at half the amplitude, β = 30°, b1 = (4/π)(π/6 + √3/4) = 1.21800; the load current
    // V1/|Z| is b1/2 = 0.60900 of the matched one, P = P0 (b1/2)^2 x 2 = 7.4176 W, DC 0.609 of the matched
    const i1 = (2 / 3 + Math.sqrt(3) / Math.PI) / 2;
    const s = stressAt('C', m, { re: 2, im: 0 });
    near(s.peakDeviceA, 3 * i1, 1e-12, 'Ipk');
    near(s.outputW, 10 * i1 * i1 * 2, 1e-12, 'P');
    near(s.outputW, 7.4176, 1e-4, 'P, by hand');
    near(s.dissipationW, (10 / 0.7) * i1 - 10 * i1 * i1 * 2, 1e-9, 'Pd');
    // flat-topped at the rail limit (40 V) plus the ring margin where the limit cuts the current (12 %, common
    // practice, no published source: CLIP_RING_MARGIN, evidence in ngspice-pushpull-c-chain)
    near(s.drainPeakV, 40 * 1.12, 1e-9, 'Vpk: rail limit and ring margin');
  });
  it('a hard-limited swing (|z| → ∞, resistive): power P0 (4/π)^2/|z|, the square-wave ' +
    'fundamental (textbook)', () => {
    const s = stressAt('B', m, { re: 1e6, im: 0 });
    near((s.outputW * 1e6) / 10, (4 / Math.PI) ** 2, 1e-5, 'P |z| / P0');
  });
  it('ideal class B (η = π/4) into a clipping load: efficiency b1 π/4 (clipped-sine fundamental), below 1', () => {
    // Source: definition of drain efficiency with DC ∝ I1 and P ∝ V1 I1: η = η0 x V1/V (textbook load line)
    const mb = { ...m, dcInputW: 10 / (Math.PI / 4) };
    const s = stressAt('B', mb, { re: 3, im: 0 });
    const dc = s.dissipationW + s.outputW;
    expect(s.outputW / dc).toBeGreaterThan(Math.PI / 4);
    expect(s.outputW / dc).toBeLessThan(1);
  });
  it('z = 1/2: current held, swing halves: drain peak Vdd (1 + 1/2) = 30 V, P = P0/2', () => {
    const s = stressAt('B', m, { re: 0.5, im: 0 });
    near(s.drainPeakV, 30, 1e-12, 'Vpk');
    near(s.outputW, 5, 1e-12, 'P');
    near(s.dissipationW, 10 / 0.7 - 5, 1e-9, 'Pd');
  });
  it('the worst dissipation on the SWR 2 circle is Pdc0 - P0/S at phase 180° (Re z and Re y are both >= 1/S)', () => {
    const s = swrStress('B', m, 2, 50);
    near(s.worstDissipation.value, 10 / 0.7 - 5, 1e-9, 'Pd');
    expect(s.worstDissipation.phaseDeg).toBe(180);
    // the rail-limited 40 V plus the 12 % ring margin at the clipping loads (CLIP_RING_MARGIN)
    near(s.worstDrainPeak.value, 40 * 1.12, 1e-9, 'Vpk: 2 Vdd and the ring margin');
  });
  it('SWR 1 gives the matched figures at every phase', () => {
    const s = swrStress('C', m, 1, 50);
    near(s.maxOutput.value, 10, 1e-12, 'P');
    near(s.minOutput.value, 10, 1e-12, 'P');
  });
});

describe('evaluatePa judges the ratings at the worst load phase', () => {
  const proj = { targetPowerW: 10, ambientC: 25, keyingDuty: 0.4 };
  it('class D push-pull: the current finding is S x the matched peak and names the phase', () => {
    const pa = paParams({ amplifierClass: 'D', turnsRatio: 1.5, saturationV: 1, deviceIdMaxA: 100 });
    const matched = evaluatePa(pa, 13.8, proj);
    const r = evaluatePa(pa, 13.8, proj, 'PA', { worstSwr: 2 });
    const f = r.findings.find((x) => x.rule === 'pa.id');
    near(f?.value as number, 2 * matched.peakDeviceA, 1e-9, 'Ipk');
    expect(f?.message).toContain('reflection phase 180°');
    expect(r.swr?.worstPeakCurrent.phaseDeg).toBe(180);
  });
  it('a rating below the worst drain peak fails and suggests a clamp or a higher-rated device', () => {
    const r = evaluatePa(paParams({ amplifierClass: 'B', deviceVdsMaxV: 20 }), 13.8, proj, 'PA', { worstSwr: 2 });
    const f = r.findings.find((x) => x.rule === 'pa.vds');
    expect(f?.severity).toBe('fail');
    expect(f?.message).toMatch(/drain clamp/);
    // 27.6 V x 1.12 (ring margin at the clipping load, CLIP_RING_MARGIN) = 30.91 V; 1.25 x 30.91 = 38.6 V, rounded up
    expect(f?.message).toMatch(/rated 39 V or more/);
  });
  it('class E is simulated round the circle: its worst drain peak exceeds the matched 3.56 x supply', () => {
    const r = evaluatePa(
      paParams({ amplifierClass: 'E', topology: 'single-ended', devices: 1, rdsOnOhm: 0.1, saturationV: null }),
      13.8,
      proj,
      'PA',
      { worstSwr: 2 },
    );
    expect(r.swr?.model).toBe('class-e-simulated');
    expect(r.swr!.worstDrainPeak.value).toBeGreaterThan(r.peakDrainV);
    expect(r.findings.find((x) => x.rule === 'pa.vds')?.message).toMatch(/reflection phase \d+°/);
  });
});

describe('push-pull class D: the leakage ring at each hard edge (undamped series LC, circuit theory)', () => {
  // Invented: step = the 40 V load-line peak; L = 25 nH, C = 100 pF, Z0 = √(L/C) = √250 = 15.811 Ω
  it('no turn-off current: overshoot = the step, ring current = step / Z0', () => {
    const r = leakageRing(40, 0, 25e-9, 100e-12);
    near(r.overshootV, 40, 1e-12, 'ΔV');
    near(r.currentA!, 40 / Math.sqrt(250), 1e-12, 'I');
  });
  it('with 2 A in the leakage: overshoot √(40² + (2 Z0)²) = √(1600 + 1000) = 50.990 V; current ' +
    '√(6.4 + 4) A', () => {
    const r = leakageRing(40, 2, 25e-9, 100e-12);
    near(r.overshootV, Math.sqrt(2600), 1e-9, 'ΔV');
    near(r.currentA!, Math.sqrt(1600 / 250 + 4), 1e-9, 'I');
  });
  it('without leakage or Coss: bounded by the step alone, current unknown', () => {
    const r = leakageRing(40, 2, null, 100e-12);
    expect(r.overshootV).toBe(40);
    expect(r.currentA).toBeNull();
  });
  it('stressAt: a resistive load has no turn-off current, the drain peaks at twice the load-line peak', () => {
    const s = stressAt('D', { ...m, ring: { leakageH: 25e-9, cossF: 100e-12 } }, { re: 1, im: 0 });
    near(s.drainPeakV, 80, 1e-9, 'Vpk');
    near(s.peakDeviceA, 3 + 40 / Math.sqrt(250), 1e-9, 'Ipk');
  });
  it('stressAt: z = 0.8 + j0.6 (current lags 36.87°), I_off = 3 x 0.6 = 1.8 A adds to the ring', () => {
    const s = stressAt('D', { ...m, ring: { leakageH: 25e-9, cossF: 100e-12 } }, { re: 0.8, im: 0.6 });
    near(s.drainPeakV, 40 + Math.hypot(40, 1.8 * Math.sqrt(250)), 1e-9, 'Vpk');
  });
});

describe('push-pull class D in evaluatePa: the ring in the drain rating check', () => {
  const run = (over: Parameters<typeof paParams>[0]) =>
    evaluatePa(paParams({ amplifierClass: 'D', rdsOnOhm: 0.1, saturationV: null, turnsRatio: 1, ...over }), 13.8,
      { targetPowerW: 10, ambientC: 25, keyingDuty: 0.4 });
  it('without leakage and Coss: twice the 2 × 13.8 V load-line peak (the step alone), and a caution ' +
    'to enter them', () => {
    const r = run({});
    near(r.swr!.worstDrainPeak.value, 4 * 13.8, 1e-9, 'Vpk');
    const f = r.findings.find((x) => x.rule === 'pa.leakage-ring')!;
    expect(f.severity).toBe('caution');
    expect(f.message).toMatch(/enter both/);
  });
  it('with 20 nH and 200 pF entered: an ok line naming √(L/C) = 10 Ω', () => {
    const r = run({ outputLeakageH: 20e-9, deviceCossF: 200e-12 });
    const f = r.findings.find((x) => x.rule === 'pa.leakage-ring')!;
    expect(f.severity).toBe('ok');
    expect(f.message).toContain('10.0 Ω');
    // and the report says what the drain peak includes: √(20 nH / 200 pF) = 10 Ω
    near(r.swr!.ring!.z0Ohm!, 10, 1e-9, 'Z0');
  });
  it('class C has no hard edge: no ring finding and the load-line peak', () => {
    const r = run({ amplifierClass: 'C', saturationV: 1, rdsOnOhm: null });
    expect(r.findings.some((x) => x.rule === 'pa.leakage-ring')).toBe(false);
    expect(r.swr!.ring).toBeNull();
    near(r.swr!.worstDrainPeak.value, 2 * 13.8, 1e-9, 'Vpk');
  });
});

describe('class B/C drain-rating finding names the ring margin it carries', () => {
  const proj = { targetPowerW: 10, ambientC: 25, keyingDuty: 0.4 };
  it('at SWR 2 the finding says the peak includes the 12 % ring margin (common practice, CLIP_RING_MARGIN)', () => {
    const r = evaluatePa(paParams({ amplifierClass: 'C' }), 13.8, proj, 'PA', { worstSwr: 2 });
    expect(r.swr!.worstDrainPeak.ringMargin).toBe(true);
    const msg = r.findings.find((x) => x.rule === 'pa.vds')?.message;
    expect(msg).toMatch(/peak includes a 12 % margin for the drain's ring/);
  });
  it('at SWR 1 no load clips: no margin, no sentence', () => {
    const r = evaluatePa(paParams({ amplifierClass: 'C' }), 13.8, proj, 'PA', { worstSwr: 1 });
    expect(r.swr!.worstDrainPeak.ringMargin).toBeUndefined();
    expect(r.findings.find((x) => x.rule === 'pa.vds')?.message).not.toMatch(/ring/);
  });
});
