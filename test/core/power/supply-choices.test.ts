// The supply-wide choices on the club demo: the primary fuse's IEC 60127-2 sheet reaches its recommendation, the
// inrush check and the reflected-fault checks; sizing for tune-up rates the windings at the continuous carrier; an
// enclosure's inside temperature is the ambient of the rectifier, regulator and PA checks. Expected relations are
// stated beside each check (standard tables and textbook relations), not values from running the program.
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../../src/core/evaluate';
import { meltI2tFloor } from '../../../src/core/power/inrush';
import type { RectifiedRailReport, RegulatedRailReport } from '../../../src/core/power/report-types';
import { club30m } from '../../../seed-demo/club-30m';
import { nearRel, near } from './helpers';

const rel = 1e-9;

describe('primary fuse type F2 (quick-acting, IEC 60127-2 sheet 2)', () => {
  const r = evaluate({ ...club30m, supply: { ...club30m.supply, primaryFuseSheet: 'F2' } });
  const p = r.supply!.primary!;
  it('the recommendation is marked F, the inrush is judged against the sheet 2 melting floor 0.048 In² A²s', () => {
    expect(p.fuse.characteristic).toBe('F');
    expect(p.inrush!.sheet).toBe('F2');
    // Source: IEC 60127-2 sheet 2 minimum pre-arcing times (from memory): min(2.75² x 0.01, 4² x 0.003) = 0.048 In²
    nearRel(p.inrush!.fuseMeltI2t, 0.048 * p.inrush!.fuseA ** 2, rel, 'melt I²t');
    nearRel(p.inrush!.fuseMeltI2t, meltI2tFloor('F2', p.inrush!.fuseA), rel, 'same as the table');
  });
  it('the reflected winding faults use the sheet 2 limits', () => {
    expect(p.faultChecks.length).toBeGreaterThan(0);
    for (const c of p.faultChecks) expect(c.check.sheet).toBe('F2');
  });
  it('the default (no choice stored) stays T3', () => {
    const d = evaluate(club30m).supply!.primary!;
    expect(d.fuse.characteristic).toBe('T');
    expect(d.inrush!.sheet).toBe('T3');
  });
});

describe('transformer sized for tune-up', () => {
  const duty = evaluate(club30m).supply!;
  const tune = evaluate({ ...club30m, supply: { ...club30m.supply, transformerSizing: 'tune-up' } }).supply!;
  it('each winding is rated at its continuous key-down RMS current (Joule heating of a carrier held down), not the ' +
    'duty average', () => {
    for (const t of tune.transformers)
      for (const w of t.windings) nearRel(w.ratedA, Math.max(w.thermalRmsA, w.tuneUpRmsA), rel, w.windingName);
    const pa = (s: typeof duty) => s.transformers.flatMap((t) => t.windings).find((w) => w.windingName.includes('20'))!;
    expect(pa(tune).ratedA).toBeGreaterThan(pa(duty).ratedA);
  });
  it('the VA is the sum of volts x amps at that rating, so a carrier no longer exceeds the size chosen', () => {
    for (const t of tune.transformers) {
      near(t.thermalVA, t.windings.reduce((s, w) => s + w.va, 0), 1e-9, 'VA sum');
      expect(t.standardVA!).toBeGreaterThanOrEqual(t.thermalVA);
    }
    expect(tune.findings.some((f) => f.rule === 'transformer.tune-up')).toBe(false);
  });
  it('the recommended winding is re-simulated and its PA output at low mains reported', () => {
    const w = tune.transformers.flatMap((t) => t.windings).find((x) => x.paAtCheck);
    expect(w?.paAtCheck?.outputW).toBeGreaterThan(0);
    expect(tune.findings.find((f) => f.rule === 'transformer.recommended-pa')?.message).toContain('sized for tune-up');
  });
});

describe('an enclosure: the air inside is the ambient of the thermal checks inside', () => {
  // 0.1 m² at 5.5 W/(m² K): rise = P / 0.55 K (enclosure relation ΔT = P / (U A))
  const r = evaluate({ ...club30m, supply: { ...club30m.supply, enclosureAreaM2: 0.1, enclosureUWPerM2K: 5.5 } });
  const inside = r.heat!.insideC!;
  it('inside = room + total / (U A)', () => {
    near(inside, club30m.ambientC + r.heat!.totalW / 0.55, 1e-9, 'inside °C');
  });
  it('the rectifier, the regulator and the PA heatsink are judged at that air, and their findings say so', () => {
    const rect = r.supply!.rails.find((x) => x.kind === 'rectified') as RectifiedRailReport;
    near(rect.bridgeThermal!.ambientC, inside, 1e-9, 'rectifier ambient');
    const reg = r.supply!.rails.find((x) => x.kind === 'regulated') as RegulatedRailReport;
    near(reg.thermal!.ambientC, inside, 1e-9, 'regulator ambient');
    const words = `inside the box at ${inside.toFixed(0)} °C`;
    expect(r.findings.filter((f) => f.rule === 'thermal.bridge').every((f) => f.message.includes(words))).toBe(true);
    expect(
      r.findings.some((f) => f.rule.startsWith('thermal.') && f.subject === reg.railName && f.message.includes(words)),
    ).toBe(true);
    expect(r.findings.some((f) => /^pa\.(heatsink|tj-)/.test(f.rule) && f.message.includes(words))).toBe(true);
    expect(r.supply!.thermalAmbient).toEqual({ ambientC: inside, inside: true });
  });
  it('the transformer in air above its commonly rated 40 °C ambient gets a caution; a roomy box (10 m², rise ' +
    'under 1 K) none', () => {
    // rated ambient ta 40 °C: the common marking of small mains transformers (from memory, not confirmed)
    const f = r.findings.filter((x) => x.rule === 'transformer.ambient');
    expect(inside).toBeGreaterThan(40);
    expect(f.map((x) => [x.subject, x.severity])).toEqual([['T1 mains transformer', 'caution']]);
    near(f[0].value!, inside, 1e-9, 'value');
    const roomy = evaluate({ ...club30m, supply: { ...club30m.supply, enclosureAreaM2: 10, enclosureUWPerM2K: 5.5 } });
    expect(roomy.heat!.insideC!).toBeLessThan(40);
    expect(roomy.findings.some((x) => x.rule === 'transformer.ambient')).toBe(false);
  });
  it('without an enclosure the room is used', () => {
    expect(evaluate(club30m).supply!.thermalAmbient).toEqual({ ambientC: club30m.ambientC, inside: false });
  });
});
