// Ripple at a regulated output against the reference values part 2 §10 worked example [D on P]: a 2.09 V p-p
// rectifier ripple at 100 Hz through a fixed three-terminal regulator of 62 dB minimum rejection (datasheet figure
// at 120 Hz, taken as valid at 100 Hz [M]) -> 2.09 x 10^(-62/20) = 1.66 mV p-p; 73 dB typical -> 0.47 mV p-p;
// an adjustable type with the adjust-pin bypass, 80 dB -> 0.21 mV p-p. Rejection holds only with headroom (datasheet).
import { describe, expect, it } from 'vitest';
import { outputRipplePpV, rippleFindings } from '../../../src/core/power/ripple-rejection';
import { evaluateRegulatedRail } from '../../../src/core/power/regulated-rail';
import { cornerSpecs } from '../../../src/core/power/corners';
import type { RegulatedCorner } from '../../../src/core/power/report-types';
import { regulator13v8 } from './fixture';
import { near } from './helpers';

const toleranceV = 0.005e-3; // ref prints 0.01 mV

describe('output ripple from the rejection', () => {
  it('2.09 V p-p, 62 dB: 1.66 mV p-p', () => near(outputRipplePpV(2.09, 62, false), 1.66e-3, toleranceV, '62 dB'));
  it('2.09 V p-p, 73 dB: 0.47 mV p-p', () => near(outputRipplePpV(2.09, 73, false), 0.47e-3, toleranceV, '73 dB'));
  it('2.09 V p-p, 80 dB: 0.21 mV p-p', () => near(outputRipplePpV(2.09, 80, false), 0.21e-3, toleranceV, '80 dB'));
  it('in dropout the ripple passes through unchanged', () => expect(outputRipplePpV(2.09, 62, true)).toBe(2.09));
});

describe('receiver rail target', () => {
  const corner = (outputRipplePpV: number | null): RegulatedCorner =>
    ({
      id: 'low-keyDown',
      label: 'Low mains, TX key-down',
      inputRipplePpV: 2.09,
      inDropout: false,
      outputRipplePpV,
    }) as RegulatedCorner;
  it('1.66 mV against a 1 mV target: fail', () => {
    expect(rippleFindings('RX rail', 62, 1e-3, [corner(outputRipplePpV(2.09, 62, false))])[0].severity).toBe('fail');
  });
  it('0.21 mV against a 1 mV target: ok', () => {
    expect(rippleFindings('RX rail', 80, 1e-3, [corner(outputRipplePpV(2.09, 80, false))])[0].severity).toBe('ok');
  });
  it('a target without a stated rejection: a caution asking for it', () => {
    const f = rippleFindings('RX rail', null, 1e-3, [corner(null)]);
    expect(f[0].severity).toBe('caution');
    expect(f[0].message).toContain('ripple rejection is not');
  });
});

describe('regulated rail report', () => {
  const specs = cornerSpecs({ nominalV: 230, frequencyHz: 50, lowFraction: 0.1, highFraction: 0.1 }, 0.4);
  // every corner: 19 V trough, 20 V mean, 2.09 V p-p ripple on the input of a 13.8 V regulator with 2.5 V dropout
  const parent = Object.fromEntries(specs.map((s) => [s.id, { troughV: 19, meanV: 20, ripplePpV: 2.09 }]));
  const out = { receive: 0.1, keyUp: 0.1, keyDown: 0.1 };
  it('62 dB entered: 1.66 mV p-p at every corner, passed on to the rail it feeds', () => {
    const ev = evaluateRegulatedRail(
      { ...regulator13v8, rippleRejectionDb: 62, rippleTargetV: 1e-3 },
      out,
      specs,
      parent,
      25,
      false,
      0.4,
      25,
    );
    for (const c of ev.report.corners) near(c.outputRipplePpV ?? NaN, 1.66e-3, toleranceV, c.id);
    near(ev.outputAt['low-keyDown'].ripplePpV ?? NaN, 1.66e-3, toleranceV, 'passed on');
    expect(ev.report.findings.find((f) => f.rule === 'regulator.ripple')?.severity).toBe('fail');
  });
  it('an input trough below output + dropout (16 V < 13.8 + 2.5): in dropout, the ripple passes', () => {
    const low = Object.fromEntries(specs.map((s) => [s.id, { troughV: 16, meanV: 17, ripplePpV: 2.09 }]));
    const ev = evaluateRegulatedRail(
      { ...regulator13v8, rippleRejectionDb: 62, rippleTargetV: null },
      out,
      specs,
      low,
      25,
      false,
      0.4,
      25,
    );
    expect(ev.report.corners[0].inDropout).toBe(true);
    expect(ev.report.corners[0].outputRipplePpV).toBe(2.09);
  });
});
