// Warm starts inside one evaluation: a rail simulated again at a nearby load starts the periodic-steady-state search
// from the last converged state. Consistency check (no published value involved): the result equals a cold
// simulation of the same inputs within the search's own stopping tolerance, and it takes no more mains cycles.
import { describe, expect, it } from 'vitest';
import { simulateRectifier, withSimulationMemo, type RectifierSimInput } from '../../../src/core/power/rectifier-sim';

const base: RectifierSimInput = {
  topology: 'bridge', secondaryVrms: 18, windingResistanceOhm: 0.4, frequencyHz: 60, diodeDropV: 0.7, diodeResistanceOhm: 0.05,
  capacitanceF: 4700e-6, esrOhm: 0.03, load: { kind: 'current', currentA: 1.2 }, waveformPoints: 0,
};
const at = (currentA: number): RectifierSimInput => ({ ...base, load: { kind: 'current', currentA } });

describe('warm-started rectifier simulation', () => {
  it('matches a cold start within the stopping tolerance and needs no more cycles', () => {
    const cold = simulateRectifier(at(1.25));
    const warm = withSimulationMemo(() => {
      simulateRectifier(at(1.2)); // the previous pass, at a nearby load
      return simulateRectifier(at(1.25));
    });
    // the search stops when |P(v0) - v0| < 1e-5 x no-load peak (rectifier-sim.ts); allow that on each side
    const toleranceV = 2 * 1e-5 * cold.noLoadPeakV;
    expect(warm.converged && cold.converged).toBe(true);
    expect(Math.abs(warm.dcMeanV - cold.dcMeanV)).toBeLessThan(toleranceV);
    expect(Math.abs(warm.troughV - cold.troughV)).toBeLessThan(toleranceV);
    expect(warm.cycles).toBeLessThanOrEqual(cold.cycles);
  });
});
