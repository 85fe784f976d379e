// The club demo's RF figures come from the class-aware models: its 2nd harmonic is a band, judged on its worst end.
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../../src/core/evaluate';
import { club30m } from '../../../seed-demo/club-30m';

describe('club demo harmonics and heatsink', () => {
  const r = evaluate(club30m);
  it('the 2nd harmonic is shown as a band (imbalance typical to worst) and judged on the worst end', () => {
    const h2 = r.rf.harmonics!.rows.find((h) => h.n === 2)!;
    expect(h2.paLevelBasis).toBe('push-pull-imbalance');
    expect(h2.predictedBestDbc).toBeLessThan(h2.predictedDbc);
    const f = r.rf.findings.find((x) => x.subject === 'Harmonic 2')!;
    // the best end may lie below the construction floor (-70 dBc, common practice): then it reads 'below -70 dBc (the
    // construction floor) to ... dBc', never 'limited by construction to', which
    // read as if construction set the worst end
    expect(f.message).toMatch(/(dBc|construction floor\)) to -?[\d.]+ dBc at the antenna/);
    expect(f.message).not.toMatch(/limited by construction to/);
    expect(f.message).toContain('judged on the worst end');
    // margin from the worst end: -predicted - 43 dB (47 CFR 97.307(d))
    expect(h2.marginDb).toBeCloseTo(-h2.predictedDbc - 43, 9);
  });
  it('its two devices share one heatsink, so both heats pass through the one θsa', () => {
    const pa = r.rf.stages.find((s) => s.pa)!.pa!;
    expect(pa.thermal.sharedBy).toBe(2);
    // Tj = Ta + P (θjc + θcs) + 2 P θsa (series path, REFERENCE-VALUES §7)
    const m = club30m.stages.find((s) => s.pa)!.pa!.mount;
    const expected =
      club30m.ambientC +
      pa.thermal.dissipationPerDeviceW * (m.thetaJcKPerW + m.thetaCsKPerW + 2 * (m.thetaSaKPerW as number));
    expect(pa.thermal.tjContinuousC).toBeCloseTo(expected, 9);
  });
});
