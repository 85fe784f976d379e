// `evaluate --json` carries, per winding, the fuse and its fault check; per rectified rail the bleeder's time and
// wattage; per regulated rail the ripple at its output; and the enclosure heat budget. Values are checked by hand
// from the demo's entered data where they follow directly from it (the 16 V 1.5 A winding with 10 % regulation).
import { describe, expect, it } from 'vitest';
import { club30m } from '../../../seed-demo/club-30m';
import { evaluate } from '../../../src/core/evaluate';
import { evaluationJson } from '../../../src/io/evaluation-output';

describe('supply results in the evaluation JSON', () => {
  const json = JSON.parse(JSON.stringify(evaluationJson(club30m, evaluate(club30m))));
  const raw = json.supply.rails.find((r: { railId: string }) => r.railId === 'rail-raw');
  const reg = json.supply.rails.find((r: { railId: string }) => r.railId === 'rail-13v8');
  it('per winding: fuse, fault currents and the clearing check', () => {
    // R = 0.1 x 16 / 1.5 = 1.06667 Ω; E = 17.6 V; leakage reactance (not entered: 0.25 R for a laminated core,
    // common practice) X = 0.26667 Ω, L = 0.26667 / (2π 60) = 707.36 µH. At 108 V of 120 V (low mains, -10 %), Ohm's
    // law for AC: 17.6 x 0.9 / sqrt(1.06667² + 0.26667²) = 15.84 / 1.09950 = 14.4066 A (14.85 A without the leakage)
    expect(raw.windingFuse.sourceOhm).toBeCloseTo(1.6 / 1.5, 9);
    expect(raw.windingFuse.reactanceOhm).toBeCloseTo(0.4 / 1.5, 9);
    expect(raw.windingFuse.leakageH * 1e6).toBeCloseTo(707.36, 1);
    expect(raw.windingFuse.inputShortLowA).toBeCloseTo(14.4066, 3);
    // the shorted reservoir (through the diodes) is smaller still and is the one the fuse is checked against
    expect(raw.windingFuse.outputShortLowA).toBeLessThan(raw.windingFuse.inputShortLowA);
    expect(raw.windingFuse.check.faultA).toBe(raw.windingFuse.outputShortLowA);
    expect(raw.windingFuse.check).toMatchObject({ sheet: 'T3', allowedS: 5 });
    expect(typeof raw.windingFuse.check.clears).toBe('boolean');
    expect(json.supply.primary.faultChecks.length).toBe(2);
  });
  it('per transformer: the cross-regulated troughs, the shared primary and each winding\'s leakage', () => {
    const cr = json.supply.transformers[0].crossRegulation;
    expect(cr.rails.map((x: { railId: string }) => x.railId)).toEqual(['rail-raw', 'rail-pa']);
    // the same values the rails' low-mains key-down corners carry (the headroom checks read those)
    for (const x of cr.rails) {
      const rail = json.supply.rails.find((r: { railId: string }) => r.railId === x.railId);
      const low = rail.corners.find((c: { id: string }) => c.id === 'low-keyDown');
      expect(low.troughV).toBe(x.keyDownTroughV);
      expect(low.aloneTroughV).toBe(x.aloneTroughV);
      expect(x.keyDownTroughV).toBeLessThan(x.keyUpTroughV);
    }
    // R_p = 0.5 x (8 / 94) x 120² / 94 = 6.5188 Ω (half the VA-weighted copper loss in the primary; VA = 16 x 1.5 +
    // 20 x 3.5 = 94, VA-weighted regulation (0.1 x 24 + 0.08 x 70) / 94 = 8 / 94)
    expect(cr.primaryOhm).toBeCloseTo(6.5188, 3);
    expect(cr.primaryH).toBeGreaterThan(0);
    expect(cr.rails[0].leakageFromRegulation).toBe(true);
  });
  it('per rail: bleeder time to its safe voltage and wattage V²/R', () => {
    const b = raw.bleeder;
    expect(b.safeV).toBe(5); // the raw rail stays below 60 V
    expect(b.fittedW).toBeCloseTo((b.startV * b.startV) / 2200, 9);
    expect(b.fittedTimeS).toBeGreaterThan(0);
    expect(b.ratedW).toBe(1);
  });
  it('per regulated rail: ripple in and out with the rejection entered (65 dB)', () => {
    const c = reg.corners.find((x: { id: string }) => x.id === reg.worstRippleCornerId);
    expect(reg.rippleRejectionDb).toBe(65);
    expect(c.outputRipplePpV).toBeCloseTo(c.inputRipplePpV * 10 ** (-65 / 20), 12);
  });
  it('the heat budget lists the sources and their sum', () => {
    const sum = json.heat.sources.reduce((a: number, s: { watts: number }) => a + s.watts, 0);
    expect(json.heat.totalW).toBeCloseTo(sum, 9);
    expect(json.heat.riseK).toBeNull(); // the demo has no enclosure entered
  });
});
