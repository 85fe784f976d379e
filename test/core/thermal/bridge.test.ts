// The rectifier package's heatsink check against hand-worked examples of the series thermal path
// Tj = Ta + P (θjc + θcs + θsa), free air Tj = Ta + P θja, θsa,max = (Tj,target - Ta)/P - θjc - θcs
// (heat-transfer textbook relations); target 0.8 Tj,max (common practice, no published source). Every expected
// value is worked by hand in the comments from the inputs written here.
import { describe, expect, it } from 'vitest';
import { bridgeThermal, bridgeThermalFindings } from '../../../src/core/thermal/bridge';
import { near } from '../power/helpers';

const toleranceC = 0.01;
const toleranceKPerW = 0.001;
const mount = { thetaJcKPerW: 2.2, thetaCsKPerW: 0.5, thetaSaKPerW: null, tjMaxC: 150 };
const base = {
  railName: 'PA rail',
  thermalW: 1.31,
  tuneUpW: 3.14,
  basis: 'duty' as const,
  mount: null,
  freeAirKPerW: null,
  ambientC: 35,
  inside: false,
};

describe('rectifier junction and heatsink (series thermal path, textbook)', () => {
  it('no data entered: the assumed part in free air, 1.31 W duty-averaged at 35 °C: 35 + 1.31 x 22 = 63.82 °C, ' +
    'ok', () => {
    const b = bridgeThermal(base);
    expect(b.assumed).toBe(true);
    near(b.result.freeAirJunctionC, 63.82, toleranceC, 'Tj');
    const f = bridgeThermalFindings('PA rail', b);
    expect(f.map((x) => [x.rule, x.severity])).toEqual([
      ['thermal.bridge-assumed', 'caution'],
      ['thermal.bridge', 'ok'],
    ]);
    expect(f[1].message).toContain('in the 35 °C room');
  });
  it('sized for tune-up the continuous 3.14 W is used: 35 + 3.14 x 22 = 104.08 °C', () => {
    const b = bridgeThermal({ ...base, basis: 'tune-up' });
    near(b.result.freeAirJunctionC, 104.08, toleranceC, 'Tj');
    expect(b.otherW).toBe(1.31);
  });
  it('5 W with no heatsink: 35 + 5 x 22 = 145 °C, above the 120 °C target: caution, θsa (120 - 35)/5 - 2.7 = 14.3 ' +
    'K/W', () => {
    const b = bridgeThermal({ ...base, thermalW: 5, mount, freeAirKPerW: 22 });
    near(b.result.requiredThetaSaKPerW!, 14.3, toleranceKPerW, 'θsa');
    const [f] = bridgeThermalFindings('PA rail', b);
    expect(f.severity).toBe('caution');
    expect(f.message).toContain('14.3 K/W');
  });
  it('6 W with no heatsink: 35 + 132 = 167 °C, above the 150 °C maximum: fail', () => {
    const [f] = bridgeThermalFindings('PA rail', bridgeThermal({ ...base, thermalW: 6, mount, freeAirKPerW: 22 }));
    expect(f.severity).toBe('fail');
    near(f.value!, 167, toleranceC, 'Tj');
  });
  it('5 W on a 20 K/W heatsink: 35 + 5 x 22.7 = 148.5 °C (too small, caution); on 10 K/W: 35 + 5 x 12.7 = 98.5 °C ' +
    '(ok)', () => {
    const small = bridgeThermalFindings(
      'PA rail',
      bridgeThermal({ ...base, thermalW: 5, mount: { ...mount, thetaSaKPerW: 20 }, freeAirKPerW: 22 }),
    );
    expect(small[0].severity).toBe('caution');
    near(small[0].value!, 148.5, toleranceC, 'Tj on 20 K/W');
    const big = bridgeThermalFindings(
      'PA rail',
      bridgeThermal({ ...base, thermalW: 5, mount: { ...mount, thetaSaKPerW: 10 }, freeAirKPerW: 22 }),
    );
    expect(big[0].severity).toBe('ok');
    near(big[0].value!, 98.5, toleranceC, 'Tj on 10 K/W');
  });
  it('inside the box the air inside is the ambient and the finding says so', () => {
    const [, f] = bridgeThermalFindings('PA rail', bridgeThermal({ ...base, ambientC: 52.4, inside: true }));
    // 52.4 + 1.31 x 22 = 81.22 °C
    near(f.value!, 81.22, toleranceC, 'Tj');
    expect(f.message).toContain('inside the box at 52 °C');
  });
});
