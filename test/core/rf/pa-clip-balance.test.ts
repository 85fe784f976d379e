// Harmonic balance of the class B/C stage at the rail limit (src/core/rf/pa-clip-balance.ts) against limits worked by
// hand from Fourier series: below the limit the textbook load line; with every harmonic shorted the drain voltage is a
// sinusoid and the devices give way in a notch about its peak; with every harmonic open a push-pull class-B pair
// holds the drain at the limit over each half period, the square wave (textbook Fourier series, 4/(nπ)).
import { describe, expect, it } from 'vitest';
import { clipBalance } from '../../../src/core/rf/pa-clip-balance';
import { near } from './helpers';

const B = Math.PI / 2;
const short = () => ({ re: 0, im: 0 });

describe('clipBalance', () => {
  it('below the limit (z = 0.5 + j0.3, harmonics capacitive): class B push-pull, a sinusoid, the load line', () => {
    // a − b of alternate half-sine pulses is a pure sinusoid: no harmonic current, swing |z| = √(0.34) (load line)
    const zAt = () => ({ re: 0, im: -0.3 });
    const b = clipBalance({ topology: 'push-pull', thetaRad: B, z: { re: 0.5, im: 0.3 }, zAt });
    expect(b.converged).toBe(true);
    near(b.currentRatio, 1, 1e-9, 'I1');
    near(b.dcRatio, 1, 1e-9, 'DC');
    near(b.peakCurrentRatio, 1, 1e-9, 'Ipk');
    // the peak read from 128 samples a period: at most 1 − cos(π/128) = 3e-4 low
    near(b.swingPeak, Math.sqrt(0.34), 3.1e-4 * Math.sqrt(0.34), 'swing');
    // the limit is never reached: it takes nothing from the drive
    expect(b.cutRatio).toBe(0);
  });
  it('harmonics shorted, z = 2: V1 = 1/cos τ = |z| (1 − (2/π)(τ + sin τ cos τ)) (notch of width 2τ)', () => {
    // Source: the drain voltage is V1 cos ωt (no harmonic voltage); the devices carry no current where it exceeds the
    // limit, |ωt| < τ with cos τ = 1/V1; the notch removes (2/π)(τ + sin τ cos τ) of the unit fundamental
    // (Fourier coefficient of cos ωt over |ωt| < τ, both half periods; derivation,
    // no published source). Solved by bisection.
    const f = (tau: number) => 1 / Math.cos(tau) - 2 * (1 - (2 / Math.PI) * (tau + Math.sin(tau) * Math.cos(tau)));
    let lo = 0, hi = 1;
    for (let i = 0; i < 60; i++) {
      const mid = (lo + hi) / 2;
      if (f(mid) > 0) hi = mid;
      else lo = mid;
    }
    const v1 = 1 / Math.cos(lo);
    for (const topology of ['push-pull', 'single-ended'] as const) {
      const b = clipBalance({ topology, thetaRad: B, z: { re: 2, im: 0 }, zAt: short });
      expect(b.converged).toBe(true);
      // 1.5 % for the sampled period (128 points) and the device's knee (1 % of the swing at the peak current)
      near(b.currentRatio, v1 / 2, 0.015 * v1, `${topology}: I1 = V1/|z|`);
      near(b.swingPeak, v1, 0.015 * v1, `${topology}: the drain beyond the limit, V1`);
      expect(b.harmonicRatios[2]).toBeLessThan(1e-6);
      expect(b.peakCurrentRatio).toBeLessThan(1);
      // the notch is centred on the drive's peak (ωt = 0) where the device carries nothing: the limit takes the whole
      // drive there, cutRatio 1 (same derivation; 1e-6 for the knee's 1 % rounding of the notch's edge)
      near(b.cutRatio, 1, 1e-6, `${topology}: the whole drive taken at its peak`);
    }
  });
  it('harmonics open (100 x the design load), class B push-pull, z = 2: square wave, I1 = ' +
    '(4/π)/2, V3/V1 = 1/3', () => {
    // Source: Fourier series of the square wave, 4/(nπ) (textbook): the drive's sinusoid exceeds the limit over the
    // whole half period, so the drain is held there; 1 %, 0.2 dB (3rd) and 0.5 dB (5th) for the finite harmonic
    // impedance, the knee and the 31 harmonics carried
    const b = clipBalance({ topology: 'push-pull', thetaRad: B, z: { re: 2, im: 0 }, zAt: () => ({ re: 100, im: 0 }) });
    expect(b.converged).toBe(true);
    near(b.currentRatio, 2 / Math.PI, 0.01 * (2 / Math.PI), 'I1');
    near(20 * Math.log10(b.harmonicRatios[2]), 20 * Math.log10(1 / 3), 0.2, '3rd, dBc');
    near(20 * Math.log10(b.harmonicRatios[4]), 20 * Math.log10(1 / 5), 0.5, '5th, dBc');
  });
  it('a start from a nearby load reaches the same solution', () => {
    const zAt = (n: number) => ({ re: 0, im: -0.4 / n });
    const base = { topology: 'push-pull' as const, thetaRad: (75 * Math.PI) / 180, zAt };
    const a = clipBalance({ ...base, z: { re: 1.9, im: 0.2 } });
    const b = clipBalance({ ...base, z: { re: 2, im: 0 }, start: a.samples });
    const c = clipBalance({ ...base, z: { re: 2, im: 0 } });
    expect(b.converged && c.converged).toBe(true);
    near(b.currentRatio, c.currentRatio, 1e-6, 'I1');
    near(b.swingPeak, c.swingPeak, 1e-6, 'swing');
  });
});
