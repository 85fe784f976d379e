// What the evaluation JSON (rigwright evaluate --json), the RF page and the pack carry for the PA's worst drain peak
// over the SWR circle and each harmonic's band, verdict and source basis. Consistency checks of the output against
// the report itself (no external reference); the rule's 43 dB is 47 CFR 97.307(d).
import { describe, expect, it } from 'vitest';
import { club30m } from '../../../seed-demo/club-30m';
import { evaluate } from '../../../src/core/evaluate';
import { evaluationJson } from '../../../src/io/evaluation-output';
import { RfResults } from '../../../views/partials/rf-results';

const report = evaluate(club30m);
const json = JSON.parse(JSON.stringify(evaluationJson(club30m, report)));

describe('evaluation JSON (club demo, push-pull class C, worst SWR 2)', () => {
  it('per PA: the worst drain peak round the SWR circle with its load and phase, the highest of ' +
    'the 15° points', () => {
    const pa = json.rf.stages.find((s: { pa: unknown }) => s.pa).pa;
    const w = pa.swr.worstDrainPeak;
    expect(pa.swr.swr).toBe(2);
    for (const k of ['value', 'phaseDeg', 'loadReOhm', 'loadImOhm']) expect(typeof w[k], k).toBe('number');
    for (const p of pa.swr.points) expect(p.drainPeakV).toBeLessThanOrEqual(w.value + 1e-9);
  });
  it('per harmonic: the band (best to worst end), the verdict on the worst end and the source the filter ' +
    'is judged from', () => {
    for (const h of json.rf.harmonics.rows) {
      expect(h.predictedBestDbc).toBeLessThanOrEqual(h.predictedDbc);
      expect(['ok', 'caution', 'fail']).toContain(h.severity);
      expect(typeof h.limitedByConstruction).toBe('boolean');
      // class C: a current source (Norton) through its transformer
      expect(h.sourceBasis).toMatch(/current source/);
      expect(typeof h.filterAttenuation50Db).toBe('number');
      // margin on the worst end against 47 CFR 97.307(d)'s 43 dB, the floor at -70 dBc
      expect(h.marginDb).toBeCloseTo(-Math.max(h.predictedDbc, -70) - 43, 9);
    }
  });
});

describe('RF page', () => {
  it('says which source the filter rejection is from and shows the 50 Ω figure beside it', async () => {
    const html = String(await (<RfResults report={report.rf} />));
    expect(html).toContain('data-source-basis');
    expect(html).toMatch(/from the PA(&#39;|')s own source at each harmonic/);
    expect(html).toMatch(/50 Ω: [\d.]+ dB/);
  });
});
