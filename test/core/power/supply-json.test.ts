// `evaluate --json` carries, per winding, the fuse and its fault check; per rectified rail the bleeder's time and
// wattage; per regulated rail the ripple at its output; and the enclosure heat budget. Values are checked by hand
// from the demo's entered data where they follow directly from it (the 16 V 1 A winding with 10 % regulation).
import { describe, expect, it } from 'vitest';
import { club30m } from '../../../seed-demo/club-30m';
import { evaluate } from '../../../src/core/evaluate';
import { evaluationJson } from '../../../src/io/evaluation-output';

describe('supply results in the evaluation JSON', () => {
  const json = JSON.parse(JSON.stringify(evaluationJson(club30m, evaluate(club30m))));
  const raw = json.supply.rails.find((r: { railId: string }) => r.railId === 'rail-raw');
  const reg = json.supply.rails.find((r: { railId: string }) => r.railId === 'rail-13v8');
  it('per winding: fuse, fault currents and the clearing check', () => {
    // R = 0.1 x 16 / 1 = 1.6 Ω; E = 17.6 V; at 108 V of 120 V (low mains, -10 %): 17.6 x 0.9 / 1.6 = 9.9 A
    expect(raw.windingFuse.sourceOhm).toBeCloseTo(1.6, 9);
    expect(raw.windingFuse.inputShortLowA).toBeCloseTo(9.9, 9);
    expect(raw.windingFuse.check).toMatchObject({ sheet: 'T3', allowedS: 5 });
    expect(typeof raw.windingFuse.check.clears).toBe('boolean');
    expect(json.supply.primary.faultChecks.length).toBe(2);
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
