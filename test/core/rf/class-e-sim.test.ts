// Class-E time-domain simulation against the published nominal design (N. O. Sokal and A. D. Sokal, "Class E — A New
// Class of High-Efficiency Tuned Single-Ended Switching Power Amplifiers", IEEE JSSC SC-10(3), 1975, 50 % duty,
// high loaded Q): peak drain 3.562 Vdd, R = 0.5768 Vdd² / P; peak switch current 2.862 I_dc (from memory).
// Tolerances cover the model's finite loaded Q (30) and choke (100 R), which the published values take as infinite.
import { describe, expect, it } from 'vitest';
import { simulateClassE } from '../../../src/core/rf/class-e-sim';
import { near } from './helpers';

describe('class E at its design load (normalised: R = 1, Vdd = 1)', () => {
  const r = simulateClassE(1, 0, 0.001);
  it('peak drain 3.562 Vdd within 3 %', () => near(r.drainPeakRatio, 3.562, 0.03 * 3.562, 'Vpk'));
  it('DC input 0.5768 Vdd²/R within 3 % (nearly lossless switch, so P ≈ Pdc)', () =>
    near(r.dcInputRatio, 0.5768, 0.03 * 0.5768, 'Pdc'));
  it('peak switch current 2.862 x I_dc within 5 % (from memory)', () =>
    near(r.switchPeakRatio / r.dcInputRatio, 2.862, 0.05 * 2.862, 'Ipk'));
  it('switches at (nearly) zero voltage: under 2 % of Vdd at turn-on', () =>
    expect(Math.abs(r.turnOnRatio)).toBeLessThan(0.02));
});

describe('class E into mismatched loads', () => {
  it('energy balance: DC input = output + switch loss (loss > 0 with Rds(on) = 0.05 R)', () => {
    const r = simulateClassE(0.5, 0.3, 0.05);
    expect(r.dcInputRatio).toBeGreaterThan(r.outputRatio);
    expect(r.outputRatio).toBeGreaterThan(0);
  });
  it('into half the design resistance the drain rises above the matched 3.56 Vdd (no zero-voltage switching)', () => {
    expect(simulateClassE(0.5, 0, 0.001).drainPeakRatio).toBeGreaterThan(3.562 * 1.05);
  });
});

describe('one waveform gives power, DC current and harmonics (Sokal & Sokal, IEEE JSSC SC-10(3), 1975)', () => {
  const r = simulateClassE(1, 0, 0.001);
  it('P = 0.5768 Vdd²/R within 3 %, and I_dc = P/Vdd at (nearly) 100 % efficiency within 1 %', () => {
    near(r.outputRatio, 0.5768, 0.03 * 0.5768, 'P');
    // normalised I_dc = dcInputRatio (Vdd = 1): P / Vdd
    near(r.dcInputRatio, r.outputRatio, 0.01 * r.outputRatio, 'I_dc');
  });
  it('the load current is nearly sinusoidal: every harmonic at least 30 dB down with loaded Q 30', () => {
    expect(r.loadHarmonics[0]).toBe(1);
    for (const h of r.loadHarmonics.slice(1)) expect(20 * Math.log10(h)).toBeLessThan(-30);
  });
  it('a lower loaded Q filters less: every harmonic higher at Q 5 than at Q 30', () => {
    // Source: a series-tuned network's reactance at n f is Q R (n − 1/n) (textbook): harmonics fall with Q
    const low = simulateClassE(1, 0, 0.001, 0.5, 5);
    for (let n = 2; n <= 5; n++) expect(low.loadHarmonics[n - 1]).toBeGreaterThan(r.loadHarmonics[n - 1]);
  });
});
