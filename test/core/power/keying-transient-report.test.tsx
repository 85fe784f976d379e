// The keying transient in the evaluation: the club demo's PA rail in `evaluate --json`, its finding, the load model
// read from the budget, and the supply page's plot. Expected values follow from the demo's entered data by hand
// where they can (the 20 WPM relay, 50 mA PA idle row, 20 V 3.5 A winding with 8 % regulation).
import { describe, expect, it } from 'vitest';
import { club30m } from '../../../seed-demo/club-30m';
import { evaluate } from '../../../src/core/evaluate';
import { evaluationJson, renderEvaluationText } from '../../../src/io/evaluation-output';
import { keyingTransientSvg } from '../../../views/plots/keying-transient-plot';
import { KeyingTransientBlock } from '../../../views/components/supply-keying';
import type { RectifiedRailReport } from '../../../src/core/power/report-types';

const report = evaluate(club30m);
const json = JSON.parse(JSON.stringify(evaluationJson(club30m, report)));
const paRail = json.supply.rails.find((r: { railId: string }) => r.railId === 'rail-pa');
const rawRail = json.supply.rails.find((r: { railId: string }) => r.railId === 'rail-raw');

describe('keying transient in the evaluation JSON', () => {
  it('per PA rail, at the T/R stage speed with PARIS dots', () => {
    const k = paRail.keyingTransient;
    expect(k.wpm).toBe(20);
    // Source: PARIS word of 50 units (common practice): 1.2 / 20 WPM = 60 ms
    expect(k.dotS).toBeCloseTo(0.06, 12);
    // Source: winding model R = reg x V / I (transformer makers' notes): 0.08 x 20 / 3.5 = 0.457143 Ω; 120 V nominal
    expect(k.windingOhm).toBeCloseTo(0.08 * 20 / 3.5, 12);
    expect(k.windingOhm).toBeCloseTo(0.457143, 6);
    expect(k.mainsV).toBe(120);
    // leakage split from the regulation figure (laminated, X = 0.25 R, common practice, no published source):
    // L = 0.25 x 0.457143 / (2 pi 60) = 0.114286 / 376.99 = 3.0315e-4 H
    expect(k.leakageH).toBeCloseTo(3.0315e-4, 7);
    // one ripple period of a bridge on 60 Hz: 1 / 120 s
    expect(k.leadS).toBeCloseTo(1 / 120, 12);
    expect(k.elements.length).toBeGreaterThanOrEqual(3);
    expect(k.waveform.timeS.length).toBe(k.waveform.railV.length);
    expect(k.keyUpMeanV).toBeGreaterThan(k.keyDownMeanV);
    // the leading edge (the rail still near its key-up level) is hotter than the dot's mean
    expect(k.firstLeadDb).toBeGreaterThan(k.firstElementDb);
  });
  it('its load model: the entered 50 mA idle row as constant current key-up, the PA on its load line key-down', () => {
    const m = paRail.keyingTransient.loadModel;
    expect(m.keyUp.constantA).toBeCloseTo(0.05, 12);
    expect(m.keyUp.pa).toBeNull();
    expect(m.keyDown.pa.stageId).toBe('st-pa');
    expect(m.keyDown.pa.saturationV).toBe(1);
    expect(m.parts.map((p: { law: string }) => p.law).sort()).toEqual(['PA load line', 'constant current']);
  });
  it('every rail carries its load model: a linear regulator reflects its loads as a constant current on ' +
    'its raw rail', () => {
    // Source: series-pass regulator, I_in = I_out + I_q (regulator datasheets). The 13.8 V rail's entered loads from
    // the
    // demo data, key-up: 12 + 18 + 60 + 4 + 12 mA and the 36 mA relay coil = 142 mA; key-down with the driver at
    // 160 mA: 242 mA. Its regulator's 5.2 mA quiescent current added: 147.2 mA and 247.2 mA on the raw rail.
    const sig = json.supply.rails.find((r: { railId: string }) => r.railId === 'rail-13v8').loadModel;
    expect(sig.keyUp.constantA).toBeCloseTo(0.142, 12);
    expect(sig.keyDown.constantA).toBeCloseTo(0.242, 12);
    expect(sig.parts.some((p: { name: string }) => p.name === 'T/R relay and sequencer (relay coil)')).toBe(true);
    expect(rawRail.loadModel.keyUp.constantA).toBeCloseTo(0.1472, 12);
    expect(rawRail.loadModel.keyDown.constantA).toBeCloseTo(0.2472, 12);
    expect(rawRail.loadModel.parts).toEqual([
      {
        name: '13.8 V signal rail',
        law: 'constant current',
        keyUpA: expect.closeTo(0.1472, 12),
        keyDownA: expect.closeTo(0.2472, 12),
      },
    ]);
  });
  it('a finding per PA rail, with the registry source; no transient on a rail without a PA', () => {
    const f = paRail.findings.find((x: { rule: string }) => x.rule === 'supply.keying-transient');
    expect(f.sourceKey).toBe('supply.keying-transient');
    expect(f.limit).toBe(1);
    expect(f.severity).toBe(paRail.keyingTransient.firstLeadDb > 1 ? 'caution' : 'ok');
    expect(rawRail.keyingTransient).toBeUndefined();
  });
  it('the CLI text names the speed and the first dot against a held key', () => {
    const line = renderEvaluationText(club30m, report).split('\n').find((l) => l.includes('keyed from rest'));
    expect(line).toContain('20 WPM');
    expect(line).toContain(
      `${paRail.keyingTransient.firstLeadDb >= 0 ? '+' : ''}${paRail.keyingTransient.firstLeadDb.toFixed(1)} dB`,
    );
  });
  it('without a keying speed (no T/R stage) the transient is not simulated and a finding says why', () => {
    const noRelay = { ...club30m, stages: club30m.stages.filter((s) => !s.relay) };
    const r = evaluate(noRelay).supply!.rails.find((x) => x.railId === 'rail-pa') as RectifiedRailReport;
    expect(r.keyingTransient).toBeNull();
    expect(r.findings.find((x) => x.rule === 'supply.keying-transient')?.message).toMatch(/no keying speed/);
  });
});

describe('keying transient plot and block', () => {
  const rail = report.supply!.rails.find((r) => r.railId === 'rail-pa') as RectifiedRailReport;
  const k = rail.keyingTransient!;
  it('an SVG with one shaded key-down band and one dB label per dot, both levels dashed', () => {
    const svg = keyingTransientSvg(rail.railName, k);
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg.match(/class="key-down"/g)).toHaveLength(k.elements.length);
    expect(svg.match(/<polyline /g)).toHaveLength(1);
    expect(svg.match(/stroke-dasharray="6 4"/g)!.length).toBeGreaterThanOrEqual(2);
    expect(svg).toContain(
      `${k.elements[0].leadVsSteadyDb >= 0 ? '+' : ''}${k.elements[0].leadVsSteadyDb.toFixed(1)} dB`,
    );
  });
  it('the page block names the stage, the speed and the loads', () => {
    const html = String(KeyingTransientBlock({ rail }));
    expect(html).toContain('Keying transient');
    expect(html).toContain('20 WPM');
    expect(html).toContain('PA load line');
  });
});
