// The class-E simulation starts at the cycle's periodic state (class-e-shooting.ts) instead of switching the supply on
// into an empty circuit. Consistency check (no published value involved): a periodic start gives the steady state a
// cold start reaches when run on and on (its stopping rule tightened to 1e-12), within 1e-6 of each figure, and takes
// no more cycles than a cold start to the simulation's own rule (STOP_RATIO, at least 20 cycles).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CLASS_E_QL, CLASS_E_QL_LOW, runClassE, STOP_RATIO } from '../../../src/core/rf/class-e-sim';

const FIGURES = ['drainPeakRatio', 'switchPeakRatio', 'outputRatio', 'dcInputRatio'] as const;
/** Relative tolerance on each figure against the long cold run (consistency, common practice, no source). */
const TOL_REL = 1e-6;
/** Each harmonic against the long cold run, dB (consistency, common practice, no source). */
const TOL_HARMONIC_DB = 1e-4;

function compare(zRe: number, zIm: number, rds: number, ql: number): void {
  const where = `${zRe} + j${zIm}, Rds/R ${rds}, QL ${ql}`;
  const periodic = runClassE(zRe, zIm, rds, 0.5, ql, 'periodic');
  const settled = runClassE(zRe, zIm, rds, 0.5, ql, 'cold', 1e-12);
  const cold = runClassE(zRe, zIm, rds, 0.5, ql, 'cold');
  for (const k of FIGURES) {
    expect(Math.abs(periodic[k] / settled[k] - 1), `${k} at ${where}`).toBeLessThan(TOL_REL);
  }
  for (let n = 2; n <= periodic.loadHarmonics.length; n++) {
    const db = 20 * Math.log10(periodic.loadHarmonics[n - 1] / settled.loadHarmonics[n - 1]);
    expect(Math.abs(db), `H${n} at ${where}`).toBeLessThan(TOL_HARMONIC_DB);
  }
  expect(periodic.cycles, where).toBeLessThanOrEqual(cold.cycles);
}

describe('class-E simulation from the periodic start', () => {
  it('the stopping rule is the one both starts use', () => expect(STOP_RATIO).toBe(1e-6));

  it('at the design load and round an SWR 2 circle at the drain: the settled cold result in fewer cycles', () => {
    // Source: definitions of the reflection coefficient, z = (1 + Γ)/(1 − Γ), |Γ| = (S − 1)/(S + 1) = 1/3
    compare(1, 0, 0.02, CLASS_E_QL);
    for (const deg of [0, 90, 180, 270]) {
      const g = { re: Math.cos((deg * Math.PI) / 180) / 3, im: Math.sin((deg * Math.PI) / 180) / 3 };
      const d = (1 - g.re) ** 2 + g.im ** 2;
      const z = { re: (1 - g.re * g.re - g.im * g.im) / d, im: (2 * g.im) / d };
      compare(z.re, z.im, 0.02, CLASS_E_QL_LOW);
    }
  });

  it('a load where the cold start\'s peak stalls before the waveform settles: the periodic start does not', () => {
    // 0.2 + j0.5 with Rds/R 0.02: the cold run's peak moves by under 1e-6 a cycle while its output is still 10 % off
    compare(0.2, 0.5, 0.02, CLASS_E_QL);
    const cold = runClassE(0.2, 0.5, 0.02, 0.5, CLASS_E_QL, 'cold');
    const settled = runClassE(0.2, 0.5, 0.02, 0.5, CLASS_E_QL, 'cold', 1e-12);
    expect(Math.abs(cold.outputRatio / settled.outputRatio - 1)).toBeGreaterThan(0.01);
  });

  it('seeded random loads, switch resistances and loaded Q', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.3, max: 3, noNaN: true }),
        fc.double({ min: -1.5, max: 1.5, noNaN: true }),
        fc.double({ min: 0.005, max: 0.1, noNaN: true }),
        fc.constantFrom(CLASS_E_QL_LOW, 10, CLASS_E_QL),
        (zRe, zIm, rds, ql) => compare(zRe, zIm, rds, ql),
      ),
      { seed: 20261202, numRuns: 25 },
    );
  });
});
