// Refused supply inputs and the stated lowest voltage of a rail's loads, on the §4.2 reference project
// (../shared/reference/REFERENCE-VALUES.md §4.2: 18 V 6 % winding, bridge, 10,000 µF, 3 A: trough 18.42 V at -10 %
// mains).
// A refused item is a fail finding naming item and field and is left out of the design, never computed from 0.
import { describe, expect, it } from 'vitest';
import { evaluateSupply } from '../../../src/core/power/evaluate-supply';
import type { RectifiedRailReport } from '../../../src/core/power/report-types';
import { flat, refProject, refRail, regulator13v8 } from './fixture';

// the §4.2 trough is 18.42 V (tolerance of the reproduction 0.03 V, transformer.test.ts); these sit well either side
const ABOVE_TROUGH_V = 19;
const BELOW_TROUGH_V = 18;

describe('stated lowest voltage of the loads on an unregulated rail', () => {
  it('a trough below it at low mains, key-down is a fail naming the rail', () => {
    const report = evaluateSupply(refProject({ rails: [{ ...refRail, minimumV: ABOVE_TROUGH_V }] }), { raw: flat(3) });
    const rail = report.rails[0] as RectifiedRailReport;
    const f = rail.findings.find((x) => x.rule === 'rail.headroom')!;
    expect(f.severity).toBe('fail');
    expect(f.subject).toBe('Raw rail');
    expect(f.message).toContain('Raw rail dips to');
    expect(f.limit).toBe(ABOVE_TROUGH_V);
    expect(rail.requiredMinV).toBe(ABOVE_TROUGH_V);
  });
  it('a trough above it is ok; not stated, only the margin is checked and the finding says none is stated', () => {
    const ok = evaluateSupply(refProject({ rails: [{ ...refRail, minimumV: BELOW_TROUGH_V }] }), { raw: flat(3) });
    expect(ok.rails[0].findings.find((x) => x.rule === 'rail.headroom')!.severity).toBe('ok');
    const none = evaluateSupply(refProject(), { raw: flat(3) });
    expect(none.rails[0].findings.find((x) => x.rule === 'rail.headroom')!.message).toContain(
      'no lowest voltage is stated',
    );
  });
  it('with a regulator fed, the higher of the two needs counts (13.8 V + 2.5 V dropout = 16.3 V < 19 V stated)', () => {
    const p = refProject({ rails: [{ ...refRail, minimumV: ABOVE_TROUGH_V }, regulator13v8] });
    const rail = evaluateSupply(p, { raw: flat(3), reg: flat(3) }).rails[0] as RectifiedRailReport;
    expect(rail.requiredMinV).toBe(ABOVE_TROUGH_V);
  });
});

describe('refused inputs', () => {
  it('a NaN reservoir: fail naming rail and field; the rail and the regulator it feeds are left ' +
    'out and say why', () => {
    const p = refProject({ rails: [{ ...refRail, reservoirF: NaN }, regulator13v8] });
    const report = evaluateSupply(p, { raw: flat(3), reg: flat(3) });
    const refused = report.findings.find((f) => f.rule === 'input.supply')!;
    expect(refused.severity).toBe('fail');
    expect(refused.subject).toBe('Rail “Raw rail”: Reservoir');
    expect(refused.message).toContain('Reservoir is not a usable number');
    expect(report.rails).toEqual([]);
    const reg = report.findings.find((f) => f.rule === 'supply.refused-input' && f.subject === '13.8 V regulator')!;
    expect(reg.message).toContain('shares its supply tree with rail “Raw rail”');
    // the transformer feeding it is not sized from part of its load
    expect(report.transformers).toEqual([]);
    expect(report.findings.some((f) => f.subject === 'T1' && f.rule === 'supply.refused-input')).toBe(true);
  });
  it('a negative winding rating: the winding is named, its rail says it depends on it, nothing is ' +
    'computed from 0', () => {
    const p = refProject();
    p.supply.transformers[0].windings[0].ratedA = -1;
    const report = evaluateSupply(p, { raw: flat(3) });
    expect(report.findings.find((f) => f.rule === 'input.supply')!.subject).toBe(
      'Winding “18 V winding” (“T1”): Rated current',
    );
    expect(report.rails).toEqual([]);
    expect(report.findings.find((f) => f.subject === 'Raw rail')!.message).toContain(
      'rectified from the winding “18 V winding”',
    );
    expect(report.primary).toBeNull();
  });
  it('a refused fitted primary fuse is named and not checked; the recommendation stays', () => {
    const report = evaluateSupply(refProject({ primaryFuseA: Infinity }), { raw: flat(3) });
    expect(report.findings.find((f) => f.rule === 'input.supply')!.subject).toBe(
      'Primary fuse: Fitted primary (mains) fuse',
    );
    expect(report.primary?.fittedA).toBeNull();
    expect(report.primary?.fuse.ratedA).not.toBeNull();
  });
});
