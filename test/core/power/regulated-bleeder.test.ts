// Bleeders on regulated rails against hand-worked RC discharges, V(t) = V0 e^(-t/RC) (textbook), with the regulator
// holding its output until its source falls to output + dropout (datasheet dropout; the hold model is common practice,
// no published source). Expected values are worked by hand in the comments.
import { describe, expect, it } from 'vitest';
import { regulatedBleeder, regulatedBleederFindings, reservoirFall } from '../../../src/core/power/regulated-bleeder';
import { near } from './helpers';

const toleranceS = 0.001;
const toleranceW = 1e-6;
// source: 4700 µF reservoir from 24 V through 2.2 kΩ, RC = 10.34 s
const source = reservoirFall(24, 4700e-6, 2200);
const rail = {
  railName: '13.8 V rail',
  sourceName: 'Raw DC',
  outputV: 13.8,
  dropoutV: 2,
  capacitanceF: 100e-6,
  fittedOhm: 1000,
  ratedW: 0.5,
  sourceFall: source,
};

describe('regulated rail bleeder', () => {
  it('source to 7 V (5 V + 2 V dropout): 10.34 ln(24/7) = 12.740 s, longer than hold 10.34 ln(24/15.8) + ' +
    '0.1 ln(13.8/5) = 4.424 s', () => {
    // 10.34 x 1.232144 = 12.74037; hold 10.34 x 0.418043 = 4.32256 plus own 0.1 x 1.015231 = 0.101523 -> 4.42408
    const b = regulatedBleeder(rail);
    expect(b.safeV).toBe(5);
    near(b.fittedTimeS!, 12.74037, toleranceS, 'time');
    // P = 13.8² / 1000 = 0.19044 W
    near(b.fittedW!, 0.19044, toleranceW, 'W');
    const f = regulatedBleederFindings('13.8 V rail', b);
    expect(f.map((x) => [x.rule, x.severity])).toEqual([['bleeder.regulated', 'ok'], ['bleeder.power', 'ok']]);
  });
  it('a fast source leaves the output RC to decide: source RC 0.1 s, own 1 kΩ x 1000 µF = 1 s', () => {
    // follow: 0.1 ln(24/7) = 0.123214; hold 0.1 ln(24/15.8) = 0.041804 plus own 1 x ln(2.76) = 1.015231 -> 1.057035 s
    const b = regulatedBleeder({ ...rail, capacitanceF: 1000e-6, sourceFall: reservoirFall(24, 100e-6, 1000) });
    near(b.fittedTimeS!, 1.057035, toleranceS, 'time');
  });
  it('no bleeder: stays charged, suggests 22 s / 100 µF = 220 kΩ (E12), 13.8² / 220 k = 0.866 mW', () => {
    const b = regulatedBleeder({ ...rail, fittedOhm: null });
    expect(b.fittedTimeS).toBeNull();
    expect(b.why).toContain('no bleeder');
    near(b.suggestedOhm!, 220_000, 1e-6, 'R');
    near(b.suggestedW!, 13.8 ** 2 / 220_000, toleranceW, 'W');
    expect(regulatedBleederFindings('13.8 V rail', b)[0].message).toContain('220 kΩ');
  });
  it('a source without a bleeder holds the rail up; a battery too; an unknown capacitance is said', () => {
    expect(regulatedBleeder({ ...rail, sourceFall: reservoirFall(24, 4700e-6, null) }).why).toContain(
      'Raw DC has no bleeder',
    );
    expect(regulatedBleeder({ ...rail, sourceFall: null }).why).toContain('battery');
    expect(regulatedBleeder({ ...rail, capacitanceF: null }).why).toContain('capacitance is not entered');
  });
  it('above 60 V the 60 V / 5 s target applies and a slow discharge fails', () => {
    // 100 V output, 2 V dropout, source 150 V through 10 kΩ x 100 µF (RC 1 s): to 62 V 1 x ln(150/62) = 0.883 s;
    // hold to 102 V: ln(150/102) = 0.385662, own 100 kΩ x 100 µF = 10 s x ln(100/60) = 5.108256 -> 5.4939 s > 5 s
    const b = regulatedBleeder({
      ...rail,
      outputV: 100,
      capacitanceF: 100e-6,
      fittedOhm: 100_000,
      sourceFall: reservoirFall(150, 100e-6, 10_000),
    });
    expect(b.safeV).toBe(60);
    near(b.fittedTimeS!, 5.493918, toleranceS, 'time');
    expect(regulatedBleederFindings('HV rail', b)[0].severity).toBe('fail');
  });
});

describe('the output bleeder is a heat source inside the box', () => {
  it('P = V² / R at the set output joins the heat budget', async () => {
    const { heatBudget } = await import('../../../src/core/power/heat-budget');
    const b = regulatedBleeder(rail);
    const reg = {
      kind: 'regulated',
      railName: '13.8 V rail',
      thermalDissipationW: 1,
      bleeder: b,
    } as unknown as import('../../../src/core/power/report-types').RailReport;
    const h = heatBudget(
      { rails: [reg] } as unknown as import('../../../src/core/power/report-types').SupplyReport,
      [],
      null,
      null,
      25,
    );
    const src = h.sources.find((s) => s.name === '13.8 V rail output bleeder')!;
    // 13.8² / 1000 = 0.19044 W; total 1 + 0.19044
    near(src.watts, 0.19044, toleranceW, 'bleeder W');
    near(h.totalW, 1.19044, toleranceW, 'total');
  });
});
