// Transformer, fuse and reservoir recommendations against the reference values §4.1-§4.3.
import { describe, expect, it } from 'vitest';
import { evaluateSupply } from '../../../src/core/power/evaluate-supply';
import { resistanceFromRegulation } from '../../../src/core/power/winding';
import { primaryFuse, railFuse, fittedFuseFindings } from '../../../src/core/power/fuses';
import { IEC_60127_FUSES_A } from '../../../src/core/power/standard-values';
import { textbookCapacitanceF, recommendedCapacitorV, minimumCapacitanceF } from '../../../src/core/power/reservoir';
import type { RectifiedRailReport } from '../../../src/core/power/report-types';
import { flat, refProject, refRail } from './fixture';
import { near, nearRel } from './helpers';

describe('winding model (ref §4.1, §4.2)', () => {
  it('R_s = Reg x V_FL^2 / VA = 0.06 x 18^2 / 100 = 0.194 Ω', () => {
    near(resistanceFromRegulation(18, 100 / 18, 0.06), 0.194, 0.0005, 'R_s (Ω)');
  });
});

describe('IEC 60127 series and fuse sizing (ref §4.3 [M]: primary T fuse 1.5-2 x primary current, T630mA-T1A)', () => {
  it('series holds the R10 steps across decades', () => {
    const r10 = [0.1, 0.125, 0.16, 0.2, 0.25, 0.315, 0.4, 0.5, 0.63, 0.8, 1, 1.25, 1.6, 2, 2.5, 3.15, 4, 5, 6.3, 8, 10];
    for (const a of r10) {
      expect(IEC_60127_FUSES_A.some((x) => Math.abs(x - a) < 1e-9), `${a} A`).toBe(true);
    }
  });
  it('ref example ~0.45 A primary: laminated T800mA, toroid T1A, both inside T630mA-T1A', () => {
    expect(primaryFuse(0.45, 'laminated').ratedA).toBe(0.8);
    expect(primaryFuse(0.45, 'toroidal').ratedA).toBe(1);
  });
  it('rail fuse 1.25-1.5 x I_dc: 3 A -> T5A', () => {
    expect(railFuse(3, 'x').ratedA).toBe(5);
  });
  it('fitted fuse findings: too small fails, small cautions, right ok, far too big cautions', () => {
    const rec = railFuse(3, 'x');
    expect(fittedFuseFindings('F', 2, rec)[0].severity).toBe('fail');
    expect(fittedFuseFindings('F', 4, rec)[0].severity).toBe('caution');
    expect(fittedFuseFindings('F', 5, rec)[0].severity).toBe('ok');
    expect(fittedFuseFindings('F', 10, rec)[0].severity).toBe('caution');
  });
});

describe('reservoir (ref §4.1, §4.2)', () => {
  it('textbook C = I/(2 f Vpp): 3 A, 50 Hz, 3.0 V -> 10,000 µF', () => {
    nearRel(textbookCapacitanceF('bridge', 3, 50, 3) ?? NaN, 0.01, 1e-12, 'C');
  });
  it('no textbook C for a subnormal load (it gave 0 F) or ripple target (C = I/(2 f Vpp) would overflow)', () => {
    expect(textbookCapacitanceF('bridge', 3, 50, 5e-324)).toBeNull();
    expect(textbookCapacitanceF('bridge', 5e-324, 50, 3)).toBeNull();
  });
  it('voltage rating: no-load peak ~28.5 V at +10 % -> 35 V part', () => {
    expect(recommendedCapacitorV(28.5)).toBe(35);
  });
  it('simulated minimum C for 2.09 V p-p at nominal mains is ~10,000 µF (inverse of the §4.2 table)', () => {
    const base = {
      topology: 'bridge' as const, secondaryVrms: 19.08, windingResistanceOhm: 0.194, frequencyHz: 50, diodeDropV: 0.75,
      diodeResistanceOhm: 0.02, capacitanceF: 1, esrOhm: 0, load: { kind: 'current' as const, currentA: 3 },
    };
    nearRel(minimumCapacitanceF(base, 2.09, 3) ?? NaN, 0.01, 0.02, 'C min');
  });
});

describe('evaluateSupply on the §4.2 example (3 A in every mode)', () => {
  // the §4.2 trough stated as the rail's lowest voltage, so a winding voltage is derived from it
  const report = evaluateSupply(refProject({ rails: [{ ...refRail, minimumV: 18.42 }] }), { raw: flat(3) });
  const rail = report.rails[0] as RectifiedRailReport;
  const base = refProject().supply.transformers[0];
  it('low-mains key-down corner reproduces the §4.2 -10 % row', () => {
    // The §4.2 table models the winding behind its resistance alone (no leakage). The corner's volts now come from
    // the transformer simulated as one (half the copper in the primary, leakage split from the regulation figure),
    // so the table is checked against the rail's own simulation, kept beside it (aloneTroughV); the joint volts are
    // checked against ngspice in shared-primary.test.ts. With one winding the two differ only by the leakage, which
    // moves the trough by tenths of a volt (it lowers the peak current; the reservoir can charge a little higher).
    const c = rail.corners.find((x) => x.id === rail.worstVoltageCornerId)!;
    near(c.aloneTroughV ?? NaN, 18.42, 0.03, 'trough');
    near(c.troughV, c.aloneTroughV!, 0.3, 'trough simulated as one transformer');
  });
  it('lowest secondary for a 18.42 V trough is ~18 V (the §4.2 design, no leakage), standard 18 V', () => {
    // §4.2 models the winding behind its resistance alone: its leakage entered as 0 H here. The recommendation
    // rates the winding at the simulated RMS current (not 100 VA), so R_s differs slightly
    const noLeak = refProject({
      rails: [{ ...refRail, minimumV: 18.42 }],
      transformers: [{ ...base, windings: [{ ...base.windings[0], leakageH: 0 }] }],
    });
    const r = evaluateSupply(noLeak, { raw: flat(3) }).rails[0] as RectifiedRailReport;
    near(r.winding!.minimumRatedV ?? NaN, 18, 0.15, 'minimum V');
    expect(r.winding!.standardRatedV).toBe(18);
    expect(r.winding!.reasoning).toContain('no leakage');
  });
  it('with the leakage split from the regulation, the recommended winding holds the trough when re-simulated', () => {
    // The search includes the leakage (X/R 0.25 of the winding's resistance for laminated cores, common practice,
    // no published source) at the same per-unit reactance: L' = L (V'/I') / (V/I). The minimum winding, built with
    // that leakage entered, evaluated again (the transformer simulated as one) must keep the 18.42 V trough.
    const w = rail.winding!;
    expect(w.reasoning).toContain('split from its regulation');
    const fitted = base.windings[0];
    const regEff = 0.06; // no resistance entered: the regulation figure gives it
    const lFitted = (0.25 * resistanceFromRegulation(18, fitted.ratedA, regEff)) / (2 * Math.PI * 50);
    const v = w.minimumRatedV!;
    const lNew = (lFitted * (v / w.ratedA)) / (18 / fitted.ratedA);
    const again = refProject({
      rails: [{ ...refRail, minimumV: 18.42 }],
      transformers: [{ ...base, windings: [{ ...fitted, ratedVrms: v, ratedA: w.ratedA, leakageH: lNew }] }],
    });
    const r = evaluateSupply(again, { raw: flat(3) }).rails[0] as RectifiedRailReport;
    const worst = r.corners.find((c) => c.id === 'low-keyDown')!;
    // within the search's 0.02 V bracket on the winding (about 0.03 V on the rail)
    expect(worst.troughV).toBeGreaterThanOrEqual(18.42 - 0.03);
    near(worst.troughV, 18.42, 0.05, 're-simulated trough');
    // and the resistive search (no leakage) would have asked for a different winding
    expect(Math.abs(v - 18)).toBeGreaterThan(0.05);
  });
  it('VA ~ 18 x (1.8-2.0) x 3 A -> the 100-120 VA class (ref §4.2 "choose a ~100-120 VA transformer")', () => {
    expect([100, 120]).toContain(report.transformers[0].standardVA);
  });
  it('primary current ~0.45 A (ref §4.2: 5.8 x 18 / 230); here referred by V_NL at high mains, within 10 %', () => {
    nearRel(report.primary!.loadA, 0.45, 0.1, 'primary A');
    expect([0.63, 0.8, 1]).toContain(report.primary!.fuse.ratedA);
  });
  it('capacitor rated 35 V covers the no-load peak; 5.5 A ripple rating covers ~5 A', () => {
    const sev = Object.fromEntries(rail.findings.map((f) => [f.rule, f.severity]));
    expect(sev['reservoir.voltage']).toBe('ok');
    expect(sev['reservoir.ripple-current']).toBe('ok');
  });
});

describe('tune-up VA of a winding with no standard voltage (apparent power S = V x I, definition)', () => {
  it('counts the fitted volts, so the continuous-carrier caution can still fire', async () => {
    const { transformerReport } = await import('../../../src/core/power/transformer');
    const w = {
      windingId: 'w', windingName: 'W', minimumRatedV: null, standardRatedV: null, thermalRmsA: 1, tuneUpRmsA: 3,
      peakA: 6, ratedA: 1, va: 30, vaRatedV: 30, checkTroughV: null, primaryReferredA: 0.4, halves: 1, reasoning: '',
    };
    const t = { id: 't', name: 'T', construction: 'laminated' as const, windings: [] };
    const r = transformerReport(t as never, [w]);
    const toleranceVA = 1e-9;
    // 30 V x 3 A = 90 VA with a continuous carrier, against 30 VA at the thermal load
    near(r.report.tuneUpVA, 90, toleranceVA, 'tune-up VA');
    expect(r.findings.some((f) => f.rule === 'transformer.tune-up')).toBe(true);
  });
});
