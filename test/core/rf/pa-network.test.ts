// PA matched by an L or pi network: the drain load is entered, no transformer turns ratio is advised.
import { describe, expect, it } from 'vitest';
import { evaluatePa } from '../../../src/core/rf/pa';
import { paParams } from './fixture';
import { near } from './helpers';

const proj = { targetPowerW: 10, ambientC: 25, keyingDuty: 0.4 };

describe('PA with a matching network', () => {
  // Textbook push-pull load line P = 2 (Vdd - Vsat)^2 / R_dd (REFERENCE-VALUES §8.1): 2 x 12.8^2 / 60
  // = 5.461 W (2.6 dB under the 10 W target)
  const r = evaluatePa(paParams({ amplifierClass: 'B', networkLoadOhm: 60, saturationV: 1 }), 13.8, proj);
  it('uses the entered drain load: 5.46 W from 13.8 V into 60 Ω drain to drain', () => {
    expect(r.refused).toBe(false);
    near(r.primaryOhm, 60, 1e-12, 'drain load');
    near(r.outputW, (2 * 12.8 ** 2) / 60, 1e-9, 'output');
  });
  it('offers no practical transformer ratios and never advises a turns ratio', () => {
    expect(r.turnsRatioSource).toBe('network');
    expect(r.ratioOptions).toEqual([]);
    const text = r.findings.map((f) => f.message).join(' ');
    expect(text).not.toMatch(/turns ratio/);
    expect(r.findings.find((f) => f.rule === 'pa.power')?.message).toContain("network's drain load");
  });
});
