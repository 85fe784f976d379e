// Class-E harmonic bands over the loads the stage meets (src/core/rf/class-e-loads.ts). Expected values from the
// definitions of reactance, the decibel and SWR, worked by hand; the whole chain against ngspice is in
// ngspice-class-e-chain.test.ts.
import { describe, expect, it } from 'vitest';
import {
  CLASS_E_LOAD_PHASES, classELoadBands, foldClassELoads, loadsCoveredText, lumpedLoadAt, type ClassELoadBands,
} from '../../../src/core/rf/class-e-loads';
import { CLASS_E_QL, CLASS_E_QL_LOW, simulateClassE } from '../../../src/core/rf/class-e-sim';
import type { Ladder } from '../../../src/core/rf/lpf-analysis';
import type { HarmonicBand } from '../../../src/core/rf/pa-spectrum';
import { loadOnCircle } from '../../../src/core/rf/pa-swr';
import { evaluate } from '../../../src/core/evaluate';
import { portable20m } from '../../../seed-demo/portable-20m';
import { near } from './helpers';

describe('the load at a harmonic (lumped model)', () => {
  // Source: definition of reactance, X_L = ωL grows with frequency, X_C = −1/(ωC) shrinks
  it('10 + j20 Ω is 10 + j60 Ω at the 3rd; 10 − j30 Ω is 10 − j10 Ω at the 3rd', () => {
    const l = lumpedLoadAt({ re: 10, im: 20 })(3);
    const c = lumpedLoadAt({ re: 10, im: -30 })(3);
    expect([l.re, l.im, c.re, c.im]).toEqual([10, 60, 10, -10]);
  });
});

describe('the stage over the loads, with no filter between it and the antenna', () => {
  // An empty ladder (chain matrix the identity): the antenna load is the stage's load, and the current in it is the
  // series network's (Kirchhoff's current law), so each level is the simulation's own load-current harmonic
  const none: Ladder = {
    kinds: new Uint8Array(0), values: new Float64Array(0), inductorQ: Infinity, capacitorQ: Infinity, r0Ohm: 50,
  };
  const rds = 0.01;
  const loads = classELoadBands({
    ladder: none, frequencyHz: 7e6, loadOhm: 50, rdsOnRatio: rds, swr: 2, harmonics: [2, 3],
  });
  it(`the design load and ${CLASS_E_LOAD_PHASES} phases, loaded Q ${CLASS_E_QL} and ${CLASS_E_QL_LOW}`, () => {
    expect(loads.points.length).toBe(2 * (CLASS_E_LOAD_PHASES + 1));
    const design = loads.points.filter((p) => p.phaseDeg === null);
    expect(design.map((p) => p.loadedQ)).toEqual([CLASS_E_QL, CLASS_E_QL_LOW]);
    expect(loadsCoveredText(loads))
      .toBe('the design load and SWR 2 at 12 phases (every 30°) at the antenna, loaded Q 30 to 5');
  });
  it('each antenna load lies on the SWR 2 circle: 180° is 25 Ω, 0° is 100 Ω (|Γ| = 1/3)', () => {
    const at = (ph: number) => loads.points.find((p) => p.phaseDeg === ph)!;
    near(at(180).antennaReOhm, 25, 1e-9, '180°');
    near(at(0).antennaReOhm, 100, 1e-9, '0°');
    for (const p of loads.points.filter((q) => q.phaseDeg !== null)) {
      // Source: definition of SWR, S = (1 + |Γ|)/(1 − |Γ|), Γ = (Z − Z0)/(Z + Z0)
      const g = Math.hypot(p.antennaReOhm - 50, p.antennaImOhm) / Math.hypot(p.antennaReOhm + 50, p.antennaImOhm);
      near((1 + g) / (1 - g), 2, 1e-9, `SWR at ${p.phaseDeg}°`);
    }
  });
  it('with no filter each level is the simulated load current’s harmonic at that load', () => {
    for (const p of loads.points) {
      const z = p.phaseDeg === null ? { re: 1, im: 0 } : loadOnCircle(2, p.phaseDeg);
      near(p.drainLoadRe, z.re, 1e-9, 'drain load re');
      near(p.drainLoadIm, z.im, 1e-9, 'drain load im');
      const sim = simulateClassE(z.re, z.im, rds, 0.5, p.loadedQ).loadHarmonics;
      for (const l of p.levels) {
        near(l.dbc, 20 * Math.log10(sim[l.n - 1]), 1e-6, `n=${l.n} at ${p.phaseDeg}°, Q ${p.loadedQ}`);
      }
    }
  });
});

describe('folding the loads into the bands', () => {
  const design: HarmonicBand[] = [
    { n: 2, bestDbc: -50, worstDbc: -30, basis: 'class-e-simulated' },
    { n: 3, bestDbc: -60, worstDbc: -40, basis: 'class-e-simulated' },
  ];
  const point = (phaseDeg: number, loadedQ: number, l2: number, l3: number) => ({
    phaseDeg, loadedQ, antennaReOhm: 25, antennaImOhm: 0, drainLoadRe: 0.5, drainLoadIm: 0,
    levels: [{ n: 2, dbc: l2 }, { n: 3, dbc: l3 }],
  });
  // antenna levels; the rejection from the source into the design load is 40 dB at 2f and 60 dB at 3f
  const loads: ClassELoadBands = {
    swr: 2, phases: 12, loadedQ: [5, 30], points: [point(90, 30, -95, -130), point(180, 5, -62, -96)],
  };
  const rej = (n: number) => (n === 2 ? 40 : 60);
  it('ends widen to the loads’ levels plus the rejection (the equivalent source level), and say where', () => {
    const [b2, b3] = foldClassELoads(design, loads, rej);
    // 2nd: best min(−50, −95 + 40 = −55) = −55 at 90°, worst max(−30, −62 + 40 = −22) = −22 at 180°
    expect([b2.bestDbc, b2.worstDbc, b2.basis]).toEqual([-55, -22, 'class-e-over-loads']);
    expect(b2.worstLoad).toBe('SWR 2 at the antenna, reflection phase 180° (25.0 + j0.0 Ω), loaded Q 5');
    expect(b2.bestLoad).toBe('SWR 2 at the antenna, reflection phase 90° (25.0 + j0.0 Ω), loaded Q 30');
    // 3rd: best min(−60, −130 + 60 = −70) = −70, worst max(−40, −96 + 60 = −36) = −36
    expect([b3.bestDbc, b3.worstDbc]).toEqual([-70, -36]);
  });
  it('an end the loads do not pass stays the design load’s', () => {
    const quiet: ClassELoadBands = { ...loads, points: [point(90, 30, -85, -110)] };
    const [b2] = foldClassELoads(design, quiet, rej);
    expect([b2.bestDbc, b2.worstDbc, b2.worstLoad]).toEqual([-50, -30, 'the stage into its design load']);
  });
  it('push-pull: even harmonics scaled by ε/2 (ε = 0.2 worst: −20 dB; 0.02 typical: −40 dB), ' +
    'odd ones not', () => {
    // Source: superposition of halves (1 ± ε/2): even harmonic ε a_n against the fundamental 2 a_1
    const [b2, b3] = foldClassELoads(design, loads, rej, { typical: 0.02, worst: 0.2 });
    // worst: max(−30, −62 + 40 − 20 = −42) = −30 (unchanged); best:
    // min(−50, −95 + 40 − 40 = −95) = −95
    expect(b2.worstDbc).toBe(-30);
    near(b2.bestDbc, -95, 1e-9, 'best 2nd');
    expect(b3.worstDbc).toBe(-36);
  });
});

describe('the portable demo (class E, worst SWR 2)', () => {
  it('the harmonic rows cover the design load and the SWR 2 circle, and name the worst end’s load', () => {
    const h = evaluate(portable20m).rf!.harmonics!;
    expect(h.loadsCovered).toBe('the design load and SWR 2 at 12 phases (every 30°) at the antenna, loaded Q 30 to 5');
    for (const x of h.rows) {
      expect(x.paLevelBasis).toBe('class-e-over-loads');
      expect(x.worstLoad).toMatch(/^(SWR 2 at the antenna, reflection phase \d+°|the design load)/);
    }
  });
  it('at SWR 1 the band is the design load’s alone', () => {
    const h = evaluate({ ...portable20m, rf: { ...portable20m.rf, worstSwr: 1 } }).rf!.harmonics!;
    expect(h.loadsCovered).toBeNull();
    expect(h.rows.every((x) => x.paLevelBasis === 'class-e-simulated' && x.worstLoad === null)).toBe(true);
  });
});
