// Warm starts inside one evaluation: a rail simulated again at a nearby load starts the periodic-steady-state search
// from the last converged state. Consistency check (no published value involved): the result equals a cold
// simulation of the same inputs within the search's own stopping tolerance, and it takes no more mains cycles.
import { describe, expect, it } from 'vitest';
import { simulateRectifier, withSimulationMemo, type RectifierSimInput } from '../../../src/core/power/rectifier-sim';
import { simulateSharedPrimary, type JointInput } from '../../../src/core/power/shared-primary';
import { minimumCapacitanceF } from '../../../src/core/power/reservoir';

const base: RectifierSimInput = {
  topology: 'bridge',
  secondaryVrms: 18,
  windingResistanceOhm: 0.4,
  frequencyHz: 60,
  diodeDropV: 0.7,
  diodeResistanceOhm: 0.05,
  capacitanceF: 4700e-6,
  esrOhm: 0.03,
  load: { kind: 'current', currentA: 1.2 },
  waveformPoints: 0,
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

  it('a load between two simulated ones starts on the line through them: same result, no more cycles', () => {
    // the final design asks for the same circuit at its other loads (receive, key-up, key-down)
    for (const [a, b, x] of [[0.2, 2.0, 1.1], [0.2, 1.0, 2.0], [0, 1.5, 0.4]] as const) {
      const cold = simulateRectifier(at(x));
      const warm = withSimulationMemo(() => {
        simulateRectifier(at(a));
        simulateRectifier(at(b));
        return simulateRectifier(at(x));
      });
      const toleranceV = 2 * 1e-5 * cold.noLoadPeakV;
      expect(warm.converged && cold.converged).toBe(true);
      expect(Math.abs(warm.dcMeanV - cold.dcMeanV), `${x} A after ${a} and ${b} A`).toBeLessThan(toleranceV);
      expect(Math.abs(warm.troughV - cold.troughV), `${x} A after ${a} and ${b} A`).toBeLessThan(toleranceV);
      expect(warm.cycles).toBeLessThanOrEqual(cold.cycles);
    }
  });

  it('the reservoir search, its candidates warm-started from each other, finds the cold search\'s capacitance', () => {
    const rippleTargetV = 0.8;
    const cold = minimumCapacitanceF(at(1.5), rippleTargetV, 1.5);
    const warm = withSimulationMemo(() => minimumCapacitanceF(at(1.5), rippleTargetV, 1.5));
    expect(cold).not.toBeNull();
    // the bisection stops when hi / lo <= 1.005 (reservoir.ts): the two searches may part by one such step
    expect(Math.abs(warm! / cold! - 1)).toBeLessThanOrEqual(0.005);
    // and the capacitance found meets the target in a cold simulation (the ripple check itself)
    const check = simulateRectifier({ ...at(1.5), capacitanceF: warm!, stepsPerCycle: 500 });
    expect(check.ripplePpV).toBeLessThanOrEqual(rippleTargetV * 1.001);
  });
});

describe('warm-started joint transformer simulation', () => {
  const diode = { diodeDropV: 0.9, diodeResistanceOhm: 0.03, esrOhm: 0.03 };
  // a winding-voltage search: candidates at other rated voltages, resistance and leakage scaling with them
  const candidate = (ratedV: number): JointInput => ({
    primaryVrms: 207, primaryOhm: 6, primaryH: 0.02, frequencyHz: 50, stepsPerCycle: 500, maxCycles: 80,
    windings: [{ ...diode, topology: 'bridge', secondaryVrms: ratedV * 1.08 * 0.9, ownOhm: 0.02 * ratedV,
      ownH: 1e-5 * ratedV, capacitanceF: 10000e-6, loadA: 2.5 }],
  });

  it('a candidate started from the last one of its search matches a cold start and needs no more cycles', () => {
    for (const [prevV, nextV] of [[18, 20], [24, 15], [16, 16.5]] as const) {
      const cold = simulateSharedPrimary(candidate(nextV));
      const warm = withSimulationMemo(() => {
        simulateSharedPrimary(candidate(prevV), { searchKey: 'w' });
        return simulateSharedPrimary(candidate(nextV), { searchKey: 'w' });
      });
      // the search stops when every |P(x) - x| < 1e-5 x the largest no-load peak (shared-primary.ts)
      const toleranceV = 2 * 1e-5 * (nextV * 1.08 * 0.9 * Math.SQRT2);
      expect(warm.converged && cold.converged).toBe(true);
      const what = `${nextV} V after ${prevV} V`;
      expect(Math.abs(warm.rails[0].troughV - cold.rails[0].troughV), what).toBeLessThan(toleranceV);
      expect(Math.abs(warm.rails[0].dcMeanV - cold.rails[0].dcMeanV), what).toBeLessThan(toleranceV);
      expect(warm.cycles, what).toBeLessThanOrEqual(cold.cycles);
    }
  });
});

describe('warm-started joint transformer simulation across fixed-point passes', () => {
  const diode = { diodeDropV: 0.9, diodeResistanceOhm: 0.03, esrOhm: 0.03 };
  // a signal winding and a PA winding whose load moves a little each pass (the PA's current follows its rail)
  const pass = (paA: number): JointInput => ({
    primaryVrms: 207, primaryOhm: 6, primaryH: 0.02, frequencyHz: 50,
    windings: [
      { ...diode, topology: 'bridge', secondaryVrms: 15.5, ownOhm: 0.6, ownH: 1e-4, capacitanceF: 4700e-6, loadA: 0.5 },
      {
        ...diode, topology: 'bridge', secondaryVrms: 19.5, ownOhm: 0.3, ownH: 1e-4, capacitanceF: 10000e-6,
        loadA: paA,
      },
    ],
  });

  it('a third load started on the line through the last two states matches a cold start, in no more cycles', () => {
    for (const [a, b, x] of [[2.2, 2.1, 2.05], [2.0, 2.1, 2.3], [2.5, 2.4, 0.3]] as const) {
      const cold = simulateSharedPrimary(pass(x));
      const warm = withSimulationMemo(() => {
        simulateSharedPrimary(pass(a));
        simulateSharedPrimary(pass(b));
        return simulateSharedPrimary(pass(x));
      });
      // the search stops when every |P(x) - x| < 1e-5 x the largest no-load peak (shared-primary.ts)
      const toleranceV = 2 * 1e-5 * 19.5 * Math.SQRT2;
      const what = `${x} A after ${a} and ${b} A`;
      expect(warm.converged && cold.converged).toBe(true);
      for (const r of [0, 1]) {
        expect(Math.abs(warm.rails[r].troughV - cold.rails[r].troughV), what).toBeLessThan(toleranceV);
        expect(Math.abs(warm.rails[r].dcMeanV - cold.rails[r].dcMeanV), what).toBeLessThan(toleranceV);
      }
      expect(warm.cycles, what).toBeLessThanOrEqual(cold.cycles);
    }
  });
});

describe('the plotted corner\'s first recorded cycle is the search\'s converged cycle', () => {
  // the waveform's first cycle is taken from the last cycle of the steady-state search (same start voltage), not
  // simulated again: its statistics must be exactly those of the same corner simulated without a waveform
  it.each([
    ['bridge, current load', at(1.2)],
    ['bridge with a bleeder', { ...at(0.4), bleederOhm: 2200 }],
    ['half-wave', { ...at(0.2), topology: 'half-wave' as const }],
    ['centre-tap, resistive load',
      { ...base, topology: 'centre-tap' as const, load: { kind: 'resistance' as const, resistanceOhm: 22 } }],
  ])('%s', (_name, input) => {
    const plain = simulateRectifier({ ...input, waveformPoints: 0 });
    const plotted = simulateRectifier({ ...input, waveformPoints: 200 });
    expect(plain.converged).toBe(true);
    const keys = ['dcMeanV', 'troughV', 'peakV', 'ripplePpV', 'secondaryRmsA', 'diodePeakA', 'capacitorRippleRmsA',
      'conductionFraction'] as const;
    for (const k of keys) {
      expect(plotted[k], k).toBe(plain[k]);
    }
    // two cycles plotted, the first the converged one: its samples lie between that cycle's trough and peak
    const first = plotted.waveform.outputV.filter((_, i) => plotted.waveform.timeS[i] <= 1 / base.frequencyHz);
    expect(plotted.waveform.timeS.length).toBeGreaterThanOrEqual(190);
    expect(first.length).toBeGreaterThanOrEqual(95);
    for (const v of first) {
      expect(v).toBeGreaterThanOrEqual(plain.troughV - 1e-9);
      expect(v).toBeLessThanOrEqual(plain.peakV + 1e-9);
    }
  });
});
