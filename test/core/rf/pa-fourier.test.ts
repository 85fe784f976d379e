// Fourier coefficients of the PA waveforms (src/core/rf/pa-fourier.ts) against published relations, each named
// beside its check, and against a numerical Fourier integral written out here (not the code under test).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  clippedSineCoefficient,
  cosinePulseCoefficient, flattenedPulseCoefficient, rectangularHarmonic, rectangularPulseCoefficient,
  trapezoidCoefficient, trapezoidHarmonic,
} from '../../../src/core/rf/pa-fourier';
import { near } from './helpers';
import { propertyOptions } from '../../helpers/property';

const rad = (deg: number) => (deg * Math.PI) / 180;

/** Amplitude of cos nωt of a waveform f over one period by the midpoint rule (written here, independent). */
function fourierCos(f: (phi: number) => number, n: number, samples = 20000): number {
  let s = 0;
  for (let k = 0; k < samples; k++) {
    const phi = -Math.PI + ((k + 0.5) * 2 * Math.PI) / samples;
    s += f(phi) * Math.cos(n * phi);
  }
  return ((n === 0 ? 1 : 2) * s) / samples;
}
/** |harmonic n| of a waveform (cos and sin parts), same rule. */
function fourierMag(f: (phi: number) => number, n: number, samples = 20000): number {
  let a = 0, b = 0;
  for (let k = 0; k < samples; k++) {
    const phi = ((k + 0.5) * 2 * Math.PI) / samples;
    a += f(phi) * Math.cos(n * phi);
    b += f(phi) * Math.sin(n * phi);
  }
  return (2 * Math.hypot(a, b)) / samples;
}

describe('cosine pulse at a tabulated angle (Krauss, Bostian & Raab 1980, coefficients from memory)', () => {
  // θ = 90° half angle is class B: the half-wave rectified sine, α0 = 1/π, α1 = 1/2 (any signals text)
  it('θ = 90°: α0 = 1/π, α1 = 1/2', () => {
    near(cosinePulseCoefficient(0, rad(90)), 1 / Math.PI, 1e-12, 'α0');
    near(cosinePulseCoefficient(1, rad(90)), 0.5, 1e-12, 'α1');
  });
});

describe('flat-topped (saturated) pulse', () => {
  it('drive 1 is the plain cosine pulse; an infinite drive the rectangular pulse 2 sin(nθ)/(nπ), θ/π ' +
    '(pulse train)', () => {
    for (const n of [0, 1, 2, 3]) {
      near(flattenedPulseCoefficient(n, rad(75), 1), cosinePulseCoefficient(n, rad(75)), 1e-15, `n=${n} drive 1`);
      near(
        rectangularPulseCoefficient(n, rad(75)),
        n === 0 ? rad(75) / Math.PI : (2 * Math.sin(n * rad(75))) / (n * Math.PI),
        1e-15,
        `n=${n} rect`,
      );
    }
    // a very large drive approaches the rectangular limit
    near(flattenedPulseCoefficient(1, rad(75), 1e6), rectangularPulseCoefficient(1, rad(75)), 1e-5, 'drive 1e6');
  });
  it('push-pull class B overdriven by A: fundamental 2 c1 = A (2/π)(asin(1/A) + (1/A)√(1 − 1/A²))', () => {
    // Source: describing function of a saturation nonlinearity (e.g. J.-J. E. Slotine and W. Li, Applied Nonlinear
    // Control, Prentice Hall 1991, §5.2; from memory): the fundamental of a sine of amplitude A clipped at ±1
    for (const a of [1, 1.2, 2, 5, 30]) {
      const df = a * (2 / Math.PI) * (Math.asin(1 / a) + (1 / a) * Math.sqrt(1 - 1 / a ** 2));
      near(2 * flattenedPulseCoefficient(1, rad(90), a), df, 1e-12, `A=${a}`);
    }
  });
  it('matches a numerical Fourier integral of min(A p(ωt), 1) (seeded property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 40, max: 180, noNaN: true }),
        fc.double({ min: 1, max: 50, noNaN: true }),
        fc.integer({ min: 0, max: 5 }),
        (deg, drive, n) => {
          const th = rad(deg);
          const pulse = (phi: number) =>
            Math.abs(phi) < th ? Math.min(1, (drive * (Math.cos(phi) - Math.cos(th))) / (1 - Math.cos(th))) : 0;
          // midpoint rule on a pulse with corners: error well under 1e-4 at 20 000 samples
          expect(Math.abs(flattenedPulseCoefficient(n, th, drive) - fourierCos(pulse, n))).toBeLessThan(1e-4);
        },
      ),
      propertyOptions(1107, 60),
    ); // seed 1107
  });
});

describe('trapezoidal wave (C. R. Paul, Introduction to Electromagnetic Compatibility, 2nd ed. 2006, §3.2, ' +
  'from memory)', () => {
  it('zero transition time reduces to the rectangular wave |sin nπD| / (n sin πD) (seeded property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 0.95, noNaN: true }), fc.integer({ min: 2, max: 7 }), (d, n) => {
        near(
          trapezoidHarmonic(n, d, 0),
          Math.abs(Math.sin(n * Math.PI * d)) / (n * Math.sin(Math.PI * d)),
          1e-12,
          `D=${d} n=${n}`,
        );
        near(trapezoidHarmonic(n, d, 0), rectangularHarmonic(n, d), 1e-12, 'same as rectangularHarmonic');
      }),
      propertyOptions(2006, 100),
    ); // seed 2006
  });
  it('square wave of unit height: fundamental 2/π (Fourier series of a square wave, textbook)', () => {
    near(trapezoidCoefficient(1, 0.5, 0), 2 / Math.PI, 1e-15, 'c1');
  });
  it('rise = fall = half the period at 50 % duty is the triangle wave: odd harmonics 1/n², even ' +
    'none (textbook)', () => {
    near(trapezoidHarmonic(3, 0.5, 0.5), 1 / 9, 1e-12, '3rd');
    near(trapezoidHarmonic(5, 0.5, 0.5), 1 / 25, 1e-12, '5th');
    near(trapezoidHarmonic(2, 0.5, 0.5), 0, 1e-12, '2nd');
  });
  it('matches a numerical Fourier integral of the sampled trapezoid (seeded property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.3, max: 0.7, noNaN: true }),
        fc.double({ min: 0, max: 0.25, noNaN: true }),
        fc.integer({ min: 1, max: 5 }),
        (d, tau, n) => {
          const T = 2 * Math.PI;
          // rises from 0 to 1 centred on t = 0, falls centred on t = D T (50 % points), edges tau T long
          const wave = (phi: number) => {
            const t = phi / T;
            const rise = Math.min(1, Math.max(0, t / tau + 0.5));
            const fall = Math.min(1, Math.max(0, (t - d) / tau + 0.5));
            return tau === 0 ? (t < d ? 1 : 0) : rise - fall;
          };
          expect(
            Math.abs(
              trapezoidCoefficient(n, d, tau) - fourierMag((phi) => wave(phi < T - (tau * T) / 2 ? phi : phi - T), n),
            ),
          ).toBeLessThan(2e-4);
        },
      ),
      propertyOptions(3201, 60),
    ); // seed 3201
  });
});

describe('clipped sinusoid (drain voltage flat-topped at the rail limits)', () => {
  it('x = 2 (clip at half the amplitude, β = 30°), worked by hand: b1 = 2/3 + √3/π, b3 = √3/(2π)', () => {
    // Source: clipped-sinusoid Fourier series / saturation describing function (Gelb & Vander Velde 1968, from memory),
    // worked by hand at β = π/6: b1 = (4/π)(π/6 + √3/4) = 1.21800; b3 =
    // (4/π)(sin 60°/2 − sin 120°/4) = 0.27566
    near(clippedSineCoefficient(1, 2), 2 / 3 + Math.sqrt(3) / Math.PI, 1e-12, 'b1');
    near(clippedSineCoefficient(3, 2), Math.sqrt(3) / (2 * Math.PI), 1e-12, 'b3');
    expect(clippedSineCoefficient(2, 2)).toBe(0);
  });
  it('hard-limited: tends to the square wave, 4/π and 4/(3π) (Fourier series of a square wave, textbook)', () => {
    near(clippedSineCoefficient(1, 1e6), 4 / Math.PI, 1e-5, 'b1 at x = 1e6');
    near(clippedSineCoefficient(3, 1e6), 4 / (3 * Math.PI), 1e-5, 'b3 at x = 1e6');
    near(clippedSineCoefficient(5, Infinity), 4 / (5 * Math.PI), 1e-15, 'b5 at the limit');
  });
  it('unclipped (x ≤ 1): the sinusoid itself, no harmonics (definition)', () => {
    near(clippedSineCoefficient(1, 0.7), 0.7, 1e-15, 'b1');
    expect(clippedSineCoefficient(3, 1)).toBe(0);
  });
  it('matches a numerical Fourier integral of the sampled clipped sinusoid (seeded property)', () => {
    fc.assert(fc.property(fc.double({ min: 1, max: 20, noNaN: true }), fc.constantFrom(1, 3, 5, 7), (x, n) => {
      // clipped cosine (the same waveform shifted a quarter period): amplitudes of cos nωt
      const wave = (phi: number) => Math.min(1, Math.max(-1, x * Math.cos(phi)));
      const numeric = Math.abs(fourierCos(wave, n, 200000));
      expect(Math.abs(numeric - Math.abs(clippedSineCoefficient(n, x)))).toBeLessThan(1e-4);
    }), propertyOptions(4711, 60)); // seed 4711
  });
});
