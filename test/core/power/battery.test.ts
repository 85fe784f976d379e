// Battery runtime and end-of-discharge checks: hand calculations with the CW duty factor 0.40
// (FCC OET Bulletin 65 Supplement B, Table 2, via ref §2.3 [C2]) and the charge balance Q = I t.
import { describe, expect, it } from 'vitest';
import { batteryFindings, batteryRuntime, loadedEndV } from '../../../src/core/power/battery';
import type { BatteryRail } from '../../../src/core/model';
import { near } from './helpers';

const bat: BatteryRail = {
  kind: 'battery',
  id: 'b',
  name: 'LiFePO4 6 Ah',
  chemistry: 'LiFePO4',
  nominalV: 12.8,
  fullV: 14.4,
  endV: 10.4,
  capacityAh: 6,
  usableFraction: 0.9,
  internalOhm: 0.04,
  minimumV: null,
};
const load = { receive: 0.05, keyUp: 0.1, keyDown: 1.0 };
const toleranceS = 1;

describe('battery runtime', () => {
  it('80/20 split: tx = 1.0 x 0.4 + 0.1 x 0.6 = 0.46 A; avg = 0.8 x 0.05 + 0.2 x 0.46 = 0.132 A; ' +
    '5.4 Ah -> 40.91 h', () => {
    const r = batteryRuntime(bat, load, 0.4, 0.2);
    near(r.transmitA, 0.46, 1e-12, 'tx');
    near(r.averageA, 0.132, 1e-12, 'avg');
    near(r.runtimeS, (5.4 / 0.132) * 3600, toleranceS, 'runtime');
  });
  it('no load gives runtime 0 (not Infinity)', () => {
    expect(batteryRuntime(bat, { receive: 0, keyUp: 0, keyDown: 0 }, 0.4, 0.2).runtimeS).toBe(0);
  });
  it('a subnormal load (5e-324 A) gives no runtime and a finding that says why (regression: Infinity, ' +
    'then a silent 0)', () => {
    const rt = batteryRuntime(bat, { receive: 5e-324, keyUp: 5e-324, keyDown: 5e-324 }, 0.4, 0.2);
    expect(rt.runtimeS).toBe(0);
    const f = batteryFindings(bat, 0, loadedEndV(bat, 0), rt).filter((x) => x.rule === 'battery.runtime');
    expect(f).toHaveLength(1);
    expect(f[0].message).toMatch(/No runtime given/);
  });
  it('loaded end voltage = 10.4 - 1.0 x 0.04 = 10.36 V', () => {
    near(loadedEndV(bat, 1), 10.36, 1e-12, 'V');
  });
  it('end-of-discharge finding: caution when only the end of discharge is below the need, fail when ' +
    'even full is', () => {
    const rt = batteryRuntime(bat, load, 0.4, 0.2);
    const sev = (need: number) =>
      batteryFindings(bat, need, loadedEndV(bat, 1), rt).find((f) => f.rule === 'battery.end-voltage')!.severity;
    expect(sev(10)).toBe('ok');
    expect(sev(11.8)).toBe('caution'); // 7.8 V regulator + 4 V dropout... reachable only when charged
    expect(sev(15)).toBe('fail');
  });
});
