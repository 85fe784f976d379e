// One waveform per class gives the PA's output, its key-down DC current (what the supply budget carries) and its
// harmonics (src/core/rf/pa.ts with pa-spectrum.ts). Expected values from published relations named beside each check.
import { describe, expect, it } from 'vitest';
import { evaluatePa, paKeyDownCurrentA } from '../../../src/core/rf/pa';
import { evaluate } from '../../../src/core/evaluate';
import { club30m } from '../../../seed-demo/club-30m';
import { portable20m } from '../../../seed-demo/portable-20m';
import { paParams } from './fixture';
import { near } from './helpers';

const proj = { targetPowerW: 10, ambientC: 25, keyingDuty: 0.4 };
const dbc = (x: number) => 20 * Math.log10(x);
const sinc = (x: number) => Math.sin(x) / x;

describe('class B and C: the cosine pulse, edge of saturation to flat-topped', () => {
  it('class B push-pull: the band reaches the square wave, (4/π)² the power and π/2 the current ' +
    '(Fourier series)', () => {
    const r = evaluatePa(
      paParams({ amplifierClass: 'B', efficiency: 0.6, biasIdleMaxA: 0, turnsRatio: 1.25 }),
      13.8,
      proj,
    );
    // Source: square wave fundamental 4/π of its height against the sine's 1 (textbook Fourier series)
    near(r.waveform!.bandMaxOutputW, r.outputW * 16 / Math.PI ** 2, 1e-6, 'P saturated');
    // Source: mean of a half-period rectangular pulse 1/2 against the half-sine's 1/π (textbook Fourier series)
    near(r.waveform!.bandMaxCurrentA, (r.outputW / (0.6 * 13.8)) * (Math.PI / 2), 1e-6, 'saturated key-down current');
    // the budget carries the saturated end (no bias here): the square wave's π/2 × the design point's P/(η Vdd); the
    // caution names both, the design drive's P/(η Vdd) beside it
    near(r.keyDownCurrentA, (r.outputW / (0.6 * 13.8)) * (Math.PI / 2), 1e-9, 'budgeted key-down current');
    const sat = r.findings.find((f) => f.rule === 'pa.saturation-current')?.message;
    expect(sat).toContain(`${((r.outputW / (0.6 * 13.8)) * (Math.PI / 2)).toFixed(2)} A`);
    expect(sat).toMatch(new RegExp(`design drive [\\d.]+ W for ${(r.outputW / (0.6 * 13.8)).toFixed(2)} A`));
    // the square wave's fundamental is 4/π of the sine's: (4/π)² = 1.621 in power, 10 log10 1.621 = 2.1 dB, more
    // than the power check's 1 dB, so a caution that says how far the checks' output lies below it
    expect(r.findings.find((f) => f.rule === 'pa.saturation-current')?.severity).toBe('caution');
    expect(sat).toContain("take the design drive's output, 2.1 dB below this");
    // and its odd harmonics reach the square wave's 1/n (3rd: −9.54 dBc)
    near(r.spectrum!.bands.find((b) => b.n === 3)!.worstDbc, dbc(1 / 3), 1e-9, '3rd');
  });
  it('class C at 120° conduction: the ideal efficiency α1/(2 α0) (Vdd − Vsat)/Vdd caps an ' +
    'entered efficiency', () => {
    // Table values at 120° conduction (θ = 60°): α0 = 0.218, α1 = 0.391 (Krauss, Bostian & Raab 1980, from memory)
    const ideal = (0.391 / (2 * 0.218)) * (12.8 / 13.8);
    const r = evaluatePa(paParams({ conductionAngleDeg: 120, efficiency: 0.99, turnsRatio: 1.25 }), 13.8, proj);
    near(r.waveform!.idealEfficiency, ideal, 0.003, 'ideal η (table rounding)');
    near(r.efficiency, r.waveform!.idealEfficiency, 1e-12, 'η used');
    expect(r.findings.find((f) => f.rule === 'pa.efficiency')?.severity).toBe('caution');
  });
});

describe('class D: trapezoidal drain voltage (C. R. Paul, Introduction to EMC, 2nd ed. 2006, §3.2, ' +
  'from memory)', () => {
  const f = 7.03e6;
  const tr = 10e-9;
  const tau = tr * f;
  it('10 ns edges at 7.03 MHz: P = (32/π²)(Vdd − Vsat)²/R sinc²(π t_r f); 3rd harmonic (1/3) sinc(3π t_r ' +
    'f)/sinc(π t_r f)', () => {
    const pa = paParams({
      amplifierClass: 'D',
      turnsRatio: 1.25,
      transitionTimeS: tr,
      imbalanceTypical: 0,
      imbalanceWorst: 0.2,
    });
    const r = evaluatePa(pa, 13.8, proj, 'PA', { frequencyHz: f });
    // push-pull square wave ±2(Vdd − Vsat) drain to drain into R_dd = 50/1.25² = 32 Ω (Fourier series, textbook)
    near(r.outputW, ((32 / Math.PI ** 2) * 12.8 ** 2 / 32) * sinc(Math.PI * tau) ** 2, 1e-6, 'P');
    // the worst 3rd is at 50 % duty (|sin 3πD|/(3 sin πD) falls from 1/3 towards 60 %)
    near(
      r.spectrum!.bands.find((b) => b.n === 3)!.worstDbc,
      dbc((1 / 3) * (sinc(3 * Math.PI * tau) / sinc(Math.PI * tau))),
      1e-9,
      '3rd',
    );
    // an ideal voltage switch turns its DC input into output: DC = P/η, every
    // waveform of the band at most the 50 % one
    near(r.keyDownCurrentA - pa.biasIdleMaxA, r.outputW / (0.7 * 13.8), 1e-9, 'I');
    expect(r.waveform!.transitionAssumed).toBe(false);
  });
  it('an empty transition time is assumed (10 ns) and said so', () => {
    const r = evaluatePa(paParams({ amplifierClass: 'D', turnsRatio: 1.25 }), 13.8, proj, 'PA', { frequencyHz: f });
    expect(r.waveform!.transitionTimeS).toBe(10e-9);
    expect(r.findings.some((x) => x.rule === 'pa.waveform' && /10 ns/.test(x.message))).toBe(true);
  });
  it('edges longer than the short part of the period are a fail naming the transition time', () => {
    // 80 ns at 7.03 MHz is 56 % of the period: more than the 40 % off-time at the 20 % worst imbalance
    const r = evaluatePa(
      paParams({ amplifierClass: 'D', turnsRatio: 1.25, transitionTimeS: 80e-9 }),
      13.8,
      proj,
      'PA',
      { frequencyHz: f },
    );
    const fail = r.findings.find((x) => x.rule === 'pa.transition-time');
    expect(fail?.severity).toBe('fail');
    expect(fail?.message).toMatch(/transition time/);
  });
});

describe('class E: the simulated waveform (Sokal & Sokal, IEEE JSSC SC-10(3), 1975)', () => {
  const e = paParams({
    topology: 'single-ended',
    devices: 1,
    amplifierClass: 'E',
    saturationV: null,
    rdsOnOhm: 0.01,
    efficiency: null,
    turnsRatio: Math.sqrt(50 / 9.45),
  });
  const r = evaluatePa(e, 13.8, proj, 'PA', { frequencyHz: 14.06e6 });
  it('output from Sokal’s load line P = 0.5768 Vdd²/R (Rds(on) 0.01 Ω leaves Vdd − I Rds ≈ Vdd)', () => {
    near(r.outputW, (0.5768 * 13.8 ** 2) / 9.45, 0.02 * r.outputW, 'P');
  });
  it('the ideal efficiency is the simulation’s (about 100 % with a small Rds(on)): I_dc ≈ P/Vdd at the ' +
    'design point', () => {
    expect(r.waveform!.idealEfficiency).toBeGreaterThan(0.95);
  });
  it('harmonics come from the simulation: 2nd far below a rectangular wave’s, loaded Q 30 to 5', () => {
    const h2 = r.spectrum!.bands.find((b) => b.n === 2)!;
    expect(h2.basis).toBe('class-e-simulated');
    expect(h2.bestDbc).toBeLessThan(h2.worstDbc);
    // a series-tuned network of loaded Q 5 still has reactance 5 (2 − 1/2) R = 7.5 R at 2f (textbook), so even the
    // worst end is well below a 25 %-duty rectangular wave's 2nd (1/(2 sin 45°) = −3 dBc)
    expect(h2.worstDbc).toBeLessThan(-10);
  });
});

describe('the supply budget carries the PA waveform’s current (the band’s most)', () => {
  it('paKeyDownCurrentA (the budget) gives evaluatePa’s key-down current at the project frequency', () => {
    const pa = paParams({ amplifierClass: 'D', turnsRatio: 1.25, transitionTimeS: 20e-9 });
    const kd = paKeyDownCurrentA(pa, 13.8, { ...proj, frequencyHz: 14e6 });
    const r = evaluatePa(pa, 13.8, proj, 'PA', { frequencyHz: 14e6 });
    expect(kd.ok).toBe(true);
    near(kd.ok ? kd.currentA : NaN, r.keyDownCurrentA, 1e-12, 'same current');
    // and the edges matter: without the frequency the ideal square wave would draw more
    const ideal = evaluatePa(pa, 13.8, proj);
    expect(ideal.keyDownCurrentA).toBeGreaterThan(r.keyDownCurrentA);
  });
  for (const demo of [club30m, portable20m]) {
    it(`${demo.name}: the budget's computed PA load equals the RF report's key-down current (within the ` +
      `loop's settling)`, () => {
      const rep = evaluate(demo);
      const st = rep.rf.stages.find((s) => s.kind === 'final')!;
      const load = rep.budget.rails.flatMap((x) => x.loads).find((l) => l.stageId === st.stageId && l.computed)!;
      // the fixed-point loop stops when the PA rail moves less than 5 mV between passes
      near(load.currentA.keyDown, st.pa!.keyDownCurrentA, 0.002 * st.pa!.keyDownCurrentA, 'key-down A');
    });
  }
});

describe('worst-SWR key-down current', () => {
  it('class E into the SWR 2 circle: shown, and a caution when above the matched one the budget carries', () => {
    const e = paParams({
      topology: 'single-ended',
      devices: 1,
      amplifierClass: 'E',
      saturationV: 0.4,
      turnsRatio: null,
      biasIdleMaxA: 0,
      referencePowerW: 1,
    });
    const r = evaluatePa(e, 12, { ...proj, targetPowerW: 5 }, 'PA', { worstSwr: 2, frequencyHz: 14.06e6 });
    expect(r.swrKeyDownCurrentA).not.toBeNull();
    // Sokal's P = 0.5768 Vdd²/R rises as the load resistance falls: the circle's 25 Ω side draws more than 50 Ω
    expect(r.swrKeyDownCurrentA!).toBeGreaterThan(r.keyDownCurrentA);
    const f = r.findings.find((x) => x.rule === 'pa.swr-current');
    expect(f?.severity).toBe('caution');
    expect(f?.message).toMatch(/reflection phase/);
    // plain sentences: the PA's load stated once, no bracket opened inside another
    const load = /\d+\.\d [+−] j\d+\.\d Ω \(reflection phase \d+°\)/.source;
    expect(f?.message).toMatch(new RegExp(`rises to \\d+\\.\\d\\d A at SWR 2 into ${load}\\. That is above `));
    expect(f?.message.match(/ Ω/g)).toHaveLength(1);
    expect(f?.message).not.toMatch(/\([^)]*\(/);
    // a class-E budget is taken at the worst end of its harmonic bands (loaded Q), not at an overdriven stage
    expect(f?.message).toContain('(matched load, the worst end of the harmonic bands)');
    // at SWR 1 there is no circle and nothing to show
    expect(evaluatePa(e, 12, { ...proj, targetPowerW: 5 }, 'PA', { worstSwr: 1 }).swrKeyDownCurrentA).toBeNull();
  });
});
