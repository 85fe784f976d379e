// Battery discharge curves by chemistry: cell figures against common practice, the plateau, the runtime to the
// point where the loads stop (charge balance Q = I t, hand-worked), the PA's output on the plateau, and the
// chemistry as a choice (an unknown stored chemistry is refused by name).
import { describe, expect, it } from 'vitest';
import {
  batteryCurve,
  batteryCurveFindings,
  CELL_CURVES,
  depthAtCellV,
  meanCellV,
} from '../../../src/core/power/battery-curve';
import { batterySpec } from '../../../src/core/spec/supply-rails';
import { validate } from '../../../src/core/spec/derive';
import { evaluate } from '../../../src/core/evaluate';
import { DEMO_PROJECTS } from '../../../seed-demo/index';
import type { BatteryRail } from '../../../src/core/model';
import { near } from './helpers';

const toleranceV = 1e-9;
const lead: BatteryRail = {
  kind: 'battery',
  id: 'b',
  name: '12 V SLA 7 Ah',
  chemistry: 'lead-acid',
  nominalV: 12,
  fullV: 13.8,
  endV: 10.5,
  capacityAh: 7,
  usableFraction: 0.95,
  internalOhm: 0.05,
  minimumV: null,
};

describe('cell figures per chemistry', () => {
  it('nominal and end voltages are the usual makers figures', () => {
    // Common practice, no published source (makers' datasheets, from memory): LiFePO4 3.2 V nominal, 2.5 V cut-off;
    // lead-acid 2.0 V, 1.75 V a cell at the 20-hour rate (10.5 V for a 12 V battery); Li-ion 3.6 V, 3.0 V;
    // NiMH 1.2 V, 1.0 V
    expect([CELL_CURVES.LiFePO4.nominalV, CELL_CURVES.LiFePO4.endV]).toEqual([3.2, 2.5]);
    expect([CELL_CURVES['lead-acid'].nominalV, CELL_CURVES['lead-acid'].endV]).toEqual([2.0, 1.75]);
    expect([CELL_CURVES['Li-ion'].nominalV, CELL_CURVES['Li-ion'].endV]).toEqual([3.6, 3.0]);
    expect([CELL_CURVES.NiMH.nominalV, CELL_CURVES.NiMH.endV]).toEqual([1.2, 1.0]);
  });

  it('plateaus: LiFePO4 flat near 3.3 V, NiMH near 1.2 V; every curve falls and ends at its cut-off', () => {
    // Common practice, no published source: a LiFePO4 cell spends most of its discharge at 3.2-3.35 V, NiMH at
    // 1.15-1.25 V
    const lfp = meanCellV(CELL_CURVES.LiFePO4, 0.1, 0.9);
    expect(lfp).toBeGreaterThan(3.2);
    expect(lfp).toBeLessThan(3.35);
    const nimh = meanCellV(CELL_CURVES.NiMH, 0.1, 0.9);
    expect(nimh).toBeGreaterThan(1.15);
    expect(nimh).toBeLessThan(1.25);
    for (const c of Object.values(CELL_CURVES)) {
      for (let i = 1; i < c.points.length; i++) expect(c.points[i][1]).toBeLessThan(c.points[i - 1][1]);
      expect(c.points[c.points.length - 1]).toEqual([1, c.endV]);
    }
  });

  it('mean of a straight segment is its midpoint: lead-acid 0.3-0.5 (2.04 -> 2.00 V) = 2.02 V', () => {
    // trapezoid rule, exact for a straight line: (2.04 + 2.00) / 2 = 2.02
    near(meanCellV(CELL_CURVES['lead-acid'], 0.3, 0.5), 2.02, toleranceV, 'V');
  });
});

describe('runtime over the curve (charge balance Q = I t)', () => {
  it('12 V lead-acid, loads needing 11.4 V, no key-down: stops at 1.9 V a cell = 90 % depth; 7 Ah x 0.9 / ' +
    '0.5 A = 12.6 h', () => {
    const c = batteryCurve(lead, 0, 0.5, 11.4)!;
    expect(c.cells).toBe(6); // 12 / 2.0
    near(depthAtCellV(CELL_CURVES['lead-acid'], 1.9), 0.9, toleranceV, 'depth');
    near(c.usedFraction, 0.9, toleranceV, 'used');
    near(c.runtimeS, (7 * 0.9 * 3600) / 0.5, 1e-6, 's'); // 45 360 s
  });

  it('2 A key-down through 0.05 ohm: stops where the open-circuit curve is 11.5 V (1.9167 V a cell), ' +
    'depth 0.8444', () => {
    // Thevenin: 11.4 + 2 x 0.05 = 11.5 V; / 6 = 1.91667 V; between (0.7, 1.96) and (0.9, 1.90):
    // 0.7 + 0.2 x (1.96 - 1.91667) / 0.06 = 0.84444
    const c = batteryCurve(lead, 2, 0.5, 11.4)!;
    near(c.usedFraction, 0.7 + (0.2 * (1.96 - 11.5 / 6)) / 0.06, 1e-9, 'used');
    near(c.loadedPlateauV, c.plateauV - 0.1, toleranceV, 'loaded plateau');
    const f = batteryCurveFindings(lead, c, (7 * 0.95 * 3600) / 0.5);
    const rt = f.find((x) => x.rule === 'battery.curve-runtime')!;
    expect(rt.severity).toBe('caution'); // 84 % used against 95 % entered: the loads stop before the battery is flat
    expect(rt.message).toMatch(/loads stop before the battery is flat/);
  });

  it('no curve for an external supply; a nominal voltage that is no whole number of cells gets a caution', () => {
    expect(batteryCurve({ ...lead, chemistry: 'external' }, 1, 0.5, 0)).toBeNull();
    expect(batteryCurveFindings({ ...lead, chemistry: 'external' }, null, 1)).toEqual([]);
    // 12 V of LiFePO4: 12 / 3.2 = 3.75 cells; 4 cells are 12.8 V, 6.7 % off (more than 5 %)
    const lfp12 = { ...lead, chemistry: 'LiFePO4' };
    expect(batteryCurve(lfp12, 1, 0.5, 0)).toBeNull();
    expect(batteryCurveFindings(lfp12, null, 1)[0]).toMatchObject({ severity: 'caution', rule: 'battery.curve' });
  });

  it('an end voltage below the chemistry cut-off is a deep-discharge caution (LiFePO4 4 cells at 8 V = 2.0 V a ' +
    'cell < 2.5 V)', () => {
    const b = { ...lead, chemistry: 'LiFePO4', nominalV: 12.8, fullV: 14.4, endV: 8 };
    const f = batteryCurveFindings(b, batteryCurve(b, 0, 0.5, 0), 1);
    expect(f.find((x) => x.rule === 'battery.deep-discharge')).toMatchObject({ severity: 'caution', limit: 10 });
  });
});

describe('the portable demo on its LiFePO4 curve', () => {
  it('the PA reports about 4.0-4.3 W for most of the charge and the end-voltage output beside it', () => {
    const r = evaluate(DEMO_PROJECTS[1]);
    const bat = r.supply!.rails.find((x) => x.kind === 'battery');
    if (bat?.kind !== 'battery') throw new Error('no battery rail');
    // 4 cells x mean 3.28 V (10-90 %) = 13.12 V, less 0.487 A x 0.04 ohm under key-down
    expect(bat.curve!.cells).toBe(4);
    near(bat.curve!.loadedPlateauV, 13.12 - bat.outputA.keyDown * 0.04, 1e-6, 'plateau');
    // The independent estimate: about 4.0-4.3 W for most of the charge; the end output is the PA's low-supply
    // one
    expect(bat.pa!.plateauOutputW).toBeGreaterThan(4.0);
    expect(bat.pa!.plateauOutputW).toBeLessThan(4.3);
    const pa = r.rf.stages.find((s) => s.pa)!.pa!;
    expect(bat.pa!.endOutputW).toBe(pa.lowOutputW);
    expect(r.findings.some((f) => f.rule === 'battery.pa-output' && /most of the charge/.test(f.message))).toBe(true);
  });
});

describe('chemistry is a choice', () => {
  const stored = DEMO_PROJECTS[1].supply.rails.find((x) => x.kind === 'battery')!;
  it('the demo battery loads; an unknown stored chemistry is refused by name', () => {
    expect(validate(batterySpec, stored)).toEqual([]);
    const bad = validate(batterySpec, { ...stored, chemistry: 'lithium' });
    expect(bad).toHaveLength(1);
    expect(bad[0].field).toBe('chemistry');
    expect(bad[0].message).toMatch(/Chemistry.*LiFePO4, lead-acid, Li-ion, NiMH, external/);
  });
});
