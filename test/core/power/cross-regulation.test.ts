// One transformer, one simulation: the secondary-tolerance corner, the leakage inputs and the use of the joint troughs.
// Hand-worked from the club demo's entered data (120 V 60 Hz mains, ±10 %; 16 V 1 A winding with 10 % regulation,
// bridge of 0.9 V diodes). The joint simulation itself is checked against ngspice in shared-primary.test.ts.
import { describe, expect, it } from 'vitest';
import { club30m } from '../../../seed-demo/club-30m';
import { evaluate } from '../../../src/core/evaluate';
import { parseForm } from '../../../src/core/spec/derive';
import { windingSpec, transformerSpec } from '../../../src/core/spec/supply';
import { windingLeakage } from '../../../src/core/power/winding';
import type { Project } from '../../../src/core/model';
import type { RectifiedRailReport, RegulatedRailReport } from '../../../src/core/power/report-types';
import { near } from './helpers';

const withTolerance = (p: Project, tol: number | null): Project => ({
  ...p,
  supply: { ...p.supply, transformers: p.supply.transformers.map((t) => ({ ...t, secondaryToleranceFraction: tol })) },
});
const rail = <T>(r: ReturnType<typeof evaluate>, id: string) => r.supply!.rails.find((x) => x.railId === id) as T;

describe('the secondary-tolerance corner', () => {
  const report = evaluate(withTolerance(club30m, 0.05));
  const raw = rail<RectifiedRailReport>(report, 'rail-raw');
  const sig = rail<RegulatedRailReport>(report, 'rail-13v8');
  const tol = raw.corners.find((c) => c.id === 'lowTol-keyDown')!;
  const low = raw.corners.find((c) => c.id === 'low-keyDown')!;

  it('is low mains with the secondary 5 % down: no-load peak √2 x 17.6 x 0.9 x 0.95 - 2 x 0.9 = 19.482 V', () => {
    // V_NL = 16 x 1.1 = 17.6 V; the peak less two diode drops (bridge), definition of the corner
    near(tol.noLoadPeakV, Math.SQRT2 * 17.6 * 0.9 * 0.95 - 1.8, 1e-9, 'no-load peak');
    expect(tol.label).toBe('Low mains, secondary −5 %, TX key-down');
    expect(tol.loadA).toBe(low.loadA);
    expect(tol.troughV).toBeLessThan(low.troughV);
    // joint volts there too, beside the rail's own
    expect(tol.aloneTroughV).toBeDefined();
  });
  it('reaches the regulated rail fed from it, and the cross-regulation table', () => {
    const c = sig.corners.find((x) => x.id === 'lowTol-keyDown')!;
    expect(c.inputTroughV).toBe(tol.troughV);
    const cr = report.supply!.transformers[0].crossRegulation!;
    expect(cr.toleranceFraction).toBe(0.05);
    expect(cr.rails.find((x) => x.railId === 'rail-raw')!.toleranceTroughV).toBe(tol.troughV);
  });
  it('a rail that passes at the nominal secondary but not at its low tolerance gets a caution ' +
    'naming the source', () => {
    // the raw rail needs 13.87 + 2.5 + 0.5 = 16.87 V (demo regulator); it passes at low mains and not 5 % lower
    expect(low.troughV).toBeGreaterThanOrEqual(raw.requiredMinV);
    expect(tol.troughV).toBeLessThan(raw.requiredMinV);
    const f = raw.findings.find((x) => x.rule === 'rail.headroom-tolerance')!;
    expect(f.severity).toBe('caution');
    expect(f.source).toBe('supply.secondary-tolerance');
    expect(f.value).toBe(tol.troughV);
  });
  it('no tolerance stated: no such corner anywhere (15 corners)', () => {
    const r = evaluate(withTolerance(club30m, null));
    const x = rail<RectifiedRailReport>(r, 'rail-raw');
    expect(x.corners).toHaveLength(15);
    expect(x.findings.some((f) => f.rule === 'rail.headroom-tolerance')).toBe(false);
    expect(r.supply!.transformers[0].crossRegulation!.toleranceFraction).toBeNull();
  });
});

describe('the joint troughs are the ones the checks use', () => {
  const report = evaluate(club30m);
  it('headroom findings and margins read the joint trough; the rail\'s own stays beside it', () => {
    for (const id of ['rail-raw', 'rail-pa']) {
      const r = rail<RectifiedRailReport>(report, id);
      const low = r.corners.find((c) => c.id === 'low-keyDown')!;
      const f = r.findings.find((x) => x.rule === 'rail.headroom')!;
      expect(f.value).toBe(low.troughV);
      near(low.headroomMarginV, low.troughV - r.requiredMinV, 1e-12, 'margin');
      expect(low.aloneTroughV).not.toBe(low.troughV);
    }
  });
  it('the PA sees the joint nominal-mains key-down trough as its rail voltage', () => {
    const pa = rail<RectifiedRailReport>(report, 'rail-pa');
    expect(report.paRailV['rail-pa']).toBe(pa.corners.find((c) => c.id === 'nominal-keyDown')!.troughV);
  });
});

describe('leakage inductance: the input and the split from the regulation figure', () => {
  it('reads µH as the box unit and mH as written; refuses a negative value by name', () => {
    const base = { name: 'W', ratedV: '16', ratedA: '1', regulation: '10', resistance: '' };
    const a = parseForm(windingSpec, { ...base, leakage: '250' });
    expect(a.ok && a.value.leakageH).toBeCloseTo(250e-6, 15);
    const b = parseForm(windingSpec, { ...base, leakage: '1.2 mH' });
    expect(b.ok && b.value.leakageH).toBeCloseTo(1.2e-3, 15);
    const c = parseForm(windingSpec, { ...base, leakage: '' });
    expect(c.ok && c.value.leakageH).toBeNull();
    const d = parseForm(windingSpec, { ...base, leakage: '-5' });
    expect(d.ok).toBe(false);
    if (!d.ok) expect(Object.values(d.errors).join(' ')).toContain('Leakage inductance');
  });
  it('secondary tolerance: 5 % by default, empty = none, above 20 % refused by name', () => {
    expect(transformerSpec.fields.secondaryToleranceFraction.default).toBe(0.05);
    const ok = parseForm(transformerSpec, { name: 'T', construction: 'laminated', secondaryTolerance: '3' });
    expect(ok.ok && ok.value.secondaryToleranceFraction).toBeCloseTo(0.03, 12);
    const none = parseForm(transformerSpec, { name: 'T', construction: 'laminated', secondaryTolerance: '' });
    expect(none.ok && none.value.secondaryToleranceFraction).toBeNull();
    const bad = parseForm(transformerSpec, { name: 'T', construction: 'laminated', secondaryTolerance: '30' });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(Object.values(bad.errors).join(' ')).toContain('Secondary voltage tolerance');
  });
  it('not entered: X = 0.25 R (laminated) or 0.1 R (toroid) at the mains frequency, common practice', () => {
    // R = 0.08 x 20 / 2.5 = 0.64 Ω; laminated X = 0.16 Ω at 50 Hz: L = 0.16 / (2π 50) = 509.3 µH; toroid 203.7 µH
    const w = { id: 'w', name: 'W', ratedVrms: 20, ratedA: 2.5, regulationFraction: 0.08, resistanceOhm: null };
    const lam = windingLeakage(w, 'laminated', 50);
    near(lam.henry * 1e6, 509.3, 0.1, 'laminated µH');
    expect(lam.fromRegulation).toBe(true);
    near(windingLeakage(w, 'toroidal', 50).henry * 1e6, 203.7, 0.1, 'toroid µH');
    // entered: used as it is, 0 included
    expect(windingLeakage({ ...w, leakageH: 0 }, 'laminated', 50)).toEqual({ henry: 0, fromRegulation: false });
    expect(windingLeakage({ ...w, leakageH: 3e-4 }, 'laminated', 50)).toEqual({ henry: 3e-4, fromRegulation: false });
  });
});
