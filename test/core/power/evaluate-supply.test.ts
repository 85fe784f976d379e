// evaluateSupply on the demo projects and on random inputs: shape, JSON-safety, ordering, duty-weighted thermal load.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { propertyOptions } from '../../helpers/property';
import { evaluateSupply } from '../../../src/core/power/evaluate-supply';
import { computeBudget } from '../../../src/core/budget';
import { DEMO_PROJECTS } from '../../../seed-demo/index';
import type { Project, RectifiedRail } from '../../../src/core/model';
import type { RectifiedRailReport, RegulatedRailReport } from '../../../src/core/power/report-types';
import { flat, refProject, regulator13v8 } from './fixture';
import { nonFinitePaths } from './helpers';

const RANK = { fail: 0, caution: 1, ok: 2 } as const;
const budgetOf = (p: Project) => Object.fromEntries(computeBudget(p).rails.map((r) => [r.railId, r.outputA]));

describe.each(DEMO_PROJECTS.map((p) => [p.id, p] as const))('demo %s', (_id, project) => {
  const report = evaluateSupply(project, budgetOf(project));
  it('is plain JSON: no NaN/Infinity, survives a JSON round trip unchanged', () => {
    expect(nonFinitePaths(report)).toEqual([]);
    expect(report.findings.filter((f) => f.rule === 'internal.non-finite')).toEqual([]);
    expect(JSON.parse(JSON.stringify(report))).toEqual(report);
  });
  it('findings are sorted most severe first', () => {
    const ranks = report.findings.map((f) => RANK[f.severity]);
    expect(ranks).toEqual([...ranks].sort((a, b) => a - b));
  });
  it('has a report for every rail and every simulation converged', () => {
    expect(report.rails.map((r) => r.railId)).toEqual(project.supply.rails.map((r) => r.id));
    expect(report.allConverged).toBe(true);
  });
});

describe('corners (duty factor: OET Bulletin 65 Supplement B Table 2, CW 40 %, carrier 100 %)', () => {
  const report = evaluateSupply(refProject(), { raw: { receive: 0.5, keyUp: 1, keyDown: 3 } });
  const rail = report.rails[0] as RectifiedRailReport;
  it('15 corners: 3 mains x (receive, key-up, key-down, thermal, tune-up)', () => {
    expect(rail.corners).toHaveLength(15);
    expect(rail.worstVoltageCornerId).toBe('low-keyDown');
    expect(rail.worstThermalCornerId).toBe('high-thermal');
  });
  it('thermal load = 3 x 0.4 + 1 x 0.6 = 1.8 A; tune-up = key-down', () => {
    expect(rail.corners.find((c) => c.id === 'high-thermal')!.loadA).toBeCloseTo(1.8, 12);
    expect(rail.corners.find((c) => c.id === 'high-tuneUp')!.loadA).toBe(3);
  });
  it('mains corners scale the secondary: no-load peak ratio high/low = 1.1/0.9 after adding back diode drops', () => {
    const lo = rail.corners.find((c) => c.id === 'low-receive')!.noLoadPeakV + 1.5;
    const hi = rail.corners.find((c) => c.id === 'high-receive')!.noLoadPeakV + 1.5;
    expect(hi / lo).toBeCloseTo(1.1 / 0.9, 9);
  });
});

describe('regulated rail fed by the §4.2 rail', () => {
  it('13.8 V + 2.5 V dropout = 16.3 V needed; trough 18.42 V at low mains: headroom ok; dissipation ' +
    'at high mains', () => {
    const p = refProject({ rails: [refProject().supply.rails[0], regulator13v8] });
    const report = evaluateSupply(p, { raw: flat(3), reg: flat(3) });
    const reg = report.rails.find((r) => r.railId === 'reg') as RegulatedRailReport;
    expect(reg.findings.find((f) => f.rule === 'regulator.headroom')!.severity).toBe('ok');
    const thermal = reg.corners.find((c) => c.id === reg.worstThermalCornerId)!;
    // Linear dissipation (Vin,mean - Vout) I, ref §7; §4.2 +10 % row gives V_avg = 24.64 V
    expect(thermal.dissipationW).toBeCloseTo((24.64 - 13.8) * 3, 0);
  });
  it('a 12 V winding cannot feed it: headroom fails and is listed first', () => {
    const p = refProject({ rails: [refProject().supply.rails[0], regulator13v8] });
    p.supply.transformers[0].windings[0].ratedVrms = 12;
    const report = evaluateSupply(p, { raw: flat(3), reg: flat(3) });
    expect(report.findings[0].severity).toBe('fail');
    expect(report.findings.some((f) => f.rule === 'regulator.headroom' && f.severity === 'fail')).toBe(true);
  });
});

describe('random and absurd inputs never throw and never give NaN', () => {
  it('property: any numbers in the supply give a finite, JSON-safe report', () => {
    // Subnormals pass `x > 0` and overflow a quotient: listed so every seed tries them
    const num = fc.oneof(fc.double({ min: -10, max: 1e4, noNaN: false }),
      fc.constantFrom(0, -1, NaN, Infinity, -Infinity, 1e-12, 1e9, 5e-324, 1.5e-322));
    const topo = fc.constantFrom('bridge' as const, 'centre-tap' as const, 'half-wave' as const);
    fc.assert(
      fc.property(fc.array(num, { minLength: 16, maxLength: 16 }), topo, (n, topology) => {
        const [v, a, c, esr, load, duty, reg, vf, rd, capV, capA, fuse, bleed, thetaSa, tjMax, drop] = n;
        const p = refProject({
          rails: [
            {
              ...(refProject().supply.rails[0] as RectifiedRail),
              topology,
              reservoirF: c,
              esrOhm: esr,
              diodeDropV: vf,
              diodeResistanceOhm: rd,
              capacitorRatedV: capV,
              capacitorRippleA: capA,
              fuseA: fuse,
              bleederOhm: bleed,
              ripplePpTargetV: reg,
            },
            {
              ...regulator13v8,
              dropoutV: drop,
              mount: { thetaJcKPerW: 5, thetaCsKPerW: 1, thetaSaKPerW: thetaSa, tjMaxC: tjMax },
            },
          ],
          primaryFuseA: fuse,
        });
        p.supply.transformers[0].windings[0].ratedVrms = v;
        p.supply.transformers[0].windings[0].ratedA = a;
        p.supply.transformers[0].windings[0].regulationFraction = reg;
        p.keyingDuty = duty;
        const report = evaluateSupply(p, { raw: flat(load), reg: flat(load) });
        expect(nonFinitePaths(report)).toEqual([]);
        // the safety net in evaluateSupply must not have been needed
        expect(report.findings.filter((f) => f.rule === 'internal.non-finite')).toEqual([]);
      }),
      propertyOptions(42, 80),
    );
  });
  it('a project without mains reports its rectified rail as a fail', () => {
    const p = refProject();
    p.mains = null;
    const report = evaluateSupply(p, { raw: flat(1) });
    expect(report.findings[0].severity).toBe('fail');
    expect(report.mains).toBeNull();
  });
  it('mains of 5e-324 V (subnormal) is refused with a finding (regression: the primary current was Infinity)', () => {
    const p = refProject();
    p.mains = { ...p.mains!, nominalV: 5e-324 };
    const report = evaluateSupply(p, { raw: flat(1) });
    expect(nonFinitePaths(report)).toEqual([]);
    expect(report.findings.filter((f) => f.rule === 'internal.non-finite')).toEqual([]);
    expect(report.findings.some((f) => f.rule === 'mains.values' && f.severity === 'fail')).toBe(true);
  });
});
