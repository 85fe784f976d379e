// The rectifier simulation: consistency with the §4.2 worked example's table, which came from a time-domain script
// with the same element model (ideal source behind R_s, diodes 0.75 V + 0.02 Ω, 10,000 µF, 3 A constant current).
// Those numbers are not an independent reference: the independent check of the same cases is ngspice, read from the
// committed fixture in rectifier-golden.test.ts. The hand-calculated surge and the textbook bounds below are published.
import { describe, expect, it } from 'vitest';
import { simulateRectifier, switchOnSurgeA, type RectifierSimInput } from '../../../src/core/power/rectifier-sim';
import type { RectifierTopology } from '../../../src/core/model';
import { near, nearRel } from './helpers';

const toleranceV = 0.03; // table is printed to 0.01 V; allow integration error
const toleranceRatio = 0.02; // currents: 2 % of the printed value (printed to 3 significant digits)
const toleranceConduction = 0.015; // conduction fraction, absolute (printed as whole percent)

// Ref §4.2: 18 V rated, 6 % regulation -> V_NL = 19.08 V, R_s = 0.06 x 18^2 / 100 = 0.194 Ω
const refCase = (mainsFactor: number): RectifierSimInput => ({
  topology: 'bridge', secondaryVrms: 19.08 * mainsFactor, windingResistanceOhm: 0.194, frequencyHz: 50,
  diodeDropV: 0.75, diodeResistanceOhm: 0.02, capacitanceF: 0.01, esrOhm: 0, load: { kind: 'current', currentA: 3 },
});

describe('consistency check (same element model, not a reference): bridge rectifier against the ' +
  '§4.2 script table', () => {
  // Source: reference values §4.2 table (mains, V_max, V_min, V_pp, V_avg, I_sec,rms, I_pk, Ic,rms, conduction)
  const rows = [
    { f: 0.9, max: 20.48, min: 18.42, pp: 2.06, avg: 19.46, rms: 5.7, pk: 13.6, ic: 4.84, cond: 0.33 },
    { f: 1.0, max: 23.07, min: 20.99, pp: 2.09, avg: 22.05, rms: 5.8, pk: 14.1, ic: 4.97, cond: 0.32 },
    { f: 1.1, max: 25.68, min: 23.56, pp: 2.12, avg: 24.64, rms: 5.9, pk: 14.5, ic: 5.08, cond: 0.31 },
  ];
  for (const row of rows) {
    it(`mains x${row.f}`, () => {
      const r = simulateRectifier(refCase(row.f));
      expect(r.converged).toBe(true);
      near(r.peakV, row.max, toleranceV, 'V_max');
      near(r.troughV, row.min, toleranceV, 'V_min');
      near(r.ripplePpV, row.pp, toleranceV, 'V_pp');
      near(r.dcMeanV, row.avg, toleranceV, 'V_avg');
      nearRel(r.secondaryRmsA, row.rms, toleranceRatio, 'I_sec,rms');
      nearRel(r.diodePeakA, row.pk, toleranceRatio, 'I_pk');
      nearRel(r.capacitorRippleRmsA, row.ic, toleranceRatio, 'Ic,rms');
      near(r.conductionFraction, row.cond, toleranceConduction, 'conduction');
    });
  }

  it('RMS/DC ratio against source resistance (ref §4.2 sensitivity list)', () => {
    // Source: ref §4.2: regulation 0 % -> 2.49; 3 %/100 VA (0.097 Ω) -> 2.10; 6 % -> 1.93; 10 %/100 VA (0.324 Ω) ->
    // 1.81;
    // 10 %/80 VA (0.405 Ω) -> 1.75, each with the 18 V winding's V_NL = 18 (1 + reg).
    const toleranceRatioAbs = 0.03;
    const cases = [
      { reg: 0, r: 0, ratio: 2.49 },
      { reg: 0.03, r: 0.097, ratio: 2.1 },
      { reg: 0.06, r: 0.194, ratio: 1.93 },
      { reg: 0.1, r: 0.324, ratio: 1.81 },
      { reg: 0.1, r: 0.405, ratio: 1.75 },
    ];
    for (const c of cases) {
      const r = simulateRectifier({ ...refCase(1), secondaryVrms: 18 * (1 + c.reg), windingResistanceOhm: c.r });
      near(r.secondaryRmsA / 3, c.ratio, toleranceRatioAbs, `ratio at ${c.r} Ω`);
    }
    // Ref §4.2: "regulation 0 % (R_s = 0): ... (peak 7.9x)"
    const ideal = simulateRectifier({ ...refCase(1), secondaryVrms: 18, windingResistanceOhm: 0 });
    near(ideal.diodePeakA / 3, 7.9, 0.25, 'peak ratio at R_s = 0');
  });

  it('switch-on surge: ref §4.2 (19.08 x 1.414 - 1.5)/(0.194 + 0.04) = 109 A', () => {
    const toleranceA = 1;
    near(switchOnSurgeA(19.08 * Math.SQRT2, 'bridge', 0.75, 0.194 + 0.04), 109, toleranceA, 'surge');
    near(simulateRectifier(refCase(1)).surgeA, 109, toleranceA, 'surge from the simulation input');
  });
});

// Contract suite: every topology obeys the same textbook bounds (ref §4.1).
const topologies: RectifierTopology[] = ['bridge', 'centre-tap', 'half-wave'];
describe.each(topologies)('%s contract', (topology) => {
  const base: RectifierSimInput = {
    ...refCase(1),
    topology,
    secondaryVrms: 19.08,
    capacitanceF: 0.0047,
    load: { kind: 'current', currentA: 1 },
  };
  const diodes = topology === 'bridge' ? 2 : 1;
  const r = simulateRectifier(base);

  it('converges and the no-load peak is sqrt(2) V - n Vf (ref §4.1)', () => {
    expect(r.converged).toBe(true);
    near(r.noLoadPeakV, 19.08 * Math.SQRT2 - diodes * 0.75, 1e-9, 'no-load peak');
    expect(r.peakV).toBeLessThanOrEqual(r.noLoadPeakV);
    expect(r.troughV).toBeLessThan(r.dcMeanV);
    expect(r.dcMeanV).toBeLessThan(r.peakV);
  });

  it('ripple is below the conservative textbook Vpp = I/(k f C) (ref §4.1: "conservative")', () => {
    const k = topology === 'half-wave' ? 1 : 2;
    const textbook = 1 / (k * 50 * 0.0047);
    expect(r.ripplePpV).toBeLessThan(textbook);
    expect(r.ripplePpV).toBeGreaterThan(0.5 * textbook);
  });

  it('charge balance: the capacitor ripple current equals sqrt(I_rect,rms^2 - I_dc^2) (ref §4.1)', () => {
    // rectified current RMS: bridge/half-wave = winding RMS; centre-tap = sqrt(2) x per-half RMS
    const rectRms = topology === 'centre-tap' ? Math.SQRT2 * r.secondaryRmsA : r.secondaryRmsA;
    nearRel(r.capacitorRippleRmsA, Math.sqrt(rectRms ** 2 - 1), 0.01, 'Ic,rms');
  });

  it('resistive load: mean current = mean voltage / R', () => {
    const rl = simulateRectifier({ ...base, load: { kind: 'resistance', resistanceOhm: 22 } });
    expect(rl.converged).toBe(true);
    nearRel(rl.loadMeanA, rl.dcMeanV / 22, 1e-6, 'Ohm');
  });
});

describe('bad and extreme inputs never hang and never give NaN', () => {
  const bad: Partial<RectifierSimInput>[] = [
    { capacitanceF: 0 },
    { capacitanceF: -1 },
    { frequencyHz: 0 },
    { secondaryVrms: 0 },
    { secondaryVrms: NaN },
    { windingResistanceOhm: -1 },
    { load: { kind: 'resistance', resistanceOhm: 0 } },
    { load: { kind: 'current', currentA: -2 } },
    // Subnormals above 0 (regression): they passed `x <= 0` and gave 0 V results with no note, or an infinite
    // conductance
    { capacitanceF: 5e-324 }, { frequencyHz: 5e-324 }, { secondaryVrms: 1.5e-322 }, { bleederOhm: 5e-324 },
    { load: { kind: 'resistance', resistanceOhm: 5e-324 } }, { capacitanceF: 1e-300 }, { frequencyHz: 1e-300 },
  ];
  for (const b of bad) {
    it(`refuses ${JSON.stringify(b)}`, () => {
      const r = simulateRectifier({ ...refCase(1), ...b });
      expect(r.note).toMatch(/not run/);
      expect(r.converged).toBe(false);
      expect(Object.values(r).filter((v) => typeof v === 'number').every(Number.isFinite)).toBe(true);
    });
  }
  it('a load the winding cannot supply collapses with a note', () => {
    const r = simulateRectifier({ ...refCase(1), load: { kind: 'current', currentA: 500 } });
    expect(r.collapsed).toBe(true);
    expect(r.note).toMatch(/cannot deliver/);
  });
  it('extreme values stay finite and bounded by the cycle cap', () => {
    const r = simulateRectifier({
      ...refCase(1),
      capacitanceF: 1e-9,
      windingResistanceOhm: 0,
      diodeResistanceOhm: 0,
      esrOhm: 0,
      maxCycles: 50,
    });
    expect(r.cycles).toBeLessThanOrEqual(52);
    expect([r.dcMeanV, r.ripplePpV, r.diodePeakA, r.secondaryRmsA].every(Number.isFinite)).toBe(true);
  });
});

describe('rules of thumb as loose cross-checks (ref §4.1; maker design note [C], "use as a cross-check only")', () => {
  // 18 V, 100 VA winding at 6 % and 10 % regulation: R_s = Reg x 18^2 / 100 (ref §4.1)
  const at = (topology: RectifierTopology, reg: number, currentA: number) =>
    simulateRectifier({
      ...refCase(1),
      topology,
      secondaryVrms: 18 * (1 + reg),
      windingResistanceOhm: (reg * 18 * 18) / 100,
      load: { kind: 'current', currentA },
    });
  for (const reg of [0.06, 0.1]) {
    it(`bridge, ${reg * 100} % regulation: I_AC/I_DC inside the 1.6-2.2 band, peak 4-8 x I_DC`, () => {
      const r = at('bridge', reg, 3);
      expect(r.secondaryRmsA / 3).toBeGreaterThanOrEqual(1.6);
      expect(r.secondaryRmsA / 3).toBeLessThanOrEqual(2.2);
      expect(r.diodePeakA / 3).toBeGreaterThanOrEqual(4);
      expect(r.diodePeakA / 3).toBeLessThanOrEqual(8);
    });
    it(`half-wave, ${reg * 100} % regulation: I_AC/I_DC near the maker's 2.6 (within 0.3)`, () => {
      const toleranceRatio = 0.3;
      expect(Math.abs(at('half-wave', reg, 1.5).secondaryRmsA / 1.5 - 2.6)).toBeLessThanOrEqual(toleranceRatio);
    });
    it(`centre-tap, ${reg * 100} % regulation: each half carries the bridge RMS / sqrt(2) (same ` +
      `rectified current)`, () => {
      const toleranceFraction = 0.03;
      const b = at('bridge', reg, 3).secondaryRmsA;
      const ct = at('centre-tap', reg, 3).secondaryRmsA;
      expect(Math.abs((ct * Math.SQRT2) / b - 1)).toBeLessThanOrEqual(toleranceFraction);
    });
  }
});
