// Bleeder discharge against the reference values §10 worked examples [D] (formula t = RC ln(V0/Vsafe), [C]).
import { describe, expect, it } from 'vitest';
import {
  bleederFindings, bleederRecommendation, bleederReport, dischargeTimeS, maxBleederOhm, bleederRatingW, ratingWords,
} from '../../../src/core/power/bleeder';
import { near } from './helpers';

const toleranceS = 0.1; // ref prints 0.1 s
describe('ref §10', () => {
  it('220 µF at 350 V, 100 kΩ: to 60 V in 38.8 s', () => {
    near(dischargeTimeS(100e3, 220e-6, 350, 60), 38.8, toleranceS, 't');
  });
  it('for 5 s the bleeder must be <= 12.9 kΩ and dissipates 9.5 W', () => {
    const r = maxBleederOhm(220e-6, 350, 60, 5) ?? NaN;
    near(r, 12.9e3, 50, 'R max (Ω)'); // ref prints 12.9 kΩ
    near((350 * 350) / r, 9.5, 0.05, 'P (W)');
  });
  it('report suggests an E12 value at or below the limit and fails a 100 kΩ bleeder', () => {
    const b = bleederReport(220e-6, 350, 0.1, 100e3);
    expect(b.suggestedOhm).toBe(12e3); // E12 below 12.9 kΩ
    near(b.fittedTimeS ?? NaN, 38.8, toleranceS, 'fitted');
    expect(bleederFindings('HV', b)[0].severity).toBe('fail');
  });
  it('low-voltage example: 10,000 µF at 25.5 V, 2.2 kΩ: to 5 V in 35.8 s; 3.2 J stored; below 60 V', () => {
    near(dischargeTimeS(2200, 0.01, 25.5, 5), 35.8, toleranceS, 't to 5 V');
    const b = bleederReport(0.01, 25.5, 0.02, 2200);
    near(b.storedJ, 3.2, 0.06, 'energy (J)'); // 0.5 x 0.01 x 25.5^2 = 3.25 J, printed "3.2 J" in ref §10
    const f = bleederFindings('LV', b)[0];
    expect(f.severity).toBe('ok');
    expect(f.message).toMatch(/below the 60 V/);
  });
  it('a subnormal reservoir (5e-324 F) gets no bleeder, none sized from an infinite quotient (regression)', () => {
    expect(maxBleederOhm(5e-324, 350, 60, 5)).toBeNull();
    const b = bleederReport(5e-324, 25.5, 0.02, null);
    expect(b.suggestedOhm).toBeNull();
    expect(b.suggestedW).toBeNull();
  });
  it('no bleeder on a high-voltage rail is a fail', () => {
    expect(bleederFindings('HV', bleederReport(220e-6, 350, 0.1, null))[0].severity).toBe('fail');
  });
});

// Bleeder time on every rail and the fitted bleeder's wattage, against reference values §10 worked examples [D]:
// P = V0² / R; the 50 % derating of its rating is common practice, no published source.
describe('bleeder on every rail: time to the safe voltage and wattage', () => {
  const toleranceW = 0.005; // ref prints 2 decimals
  it('low-voltage rail (25.5 V, 10,000 µF, 2.2 kΩ): timed to 5 V (35.8 s), 25.5² / 2200 = 0.30 W', () => {
    const b = bleederReport(0.01, 25.5, 0.02, 2200, 1);
    expect(b.safeV).toBe(5);
    near(b.fittedTimeS ?? NaN, 35.8, toleranceS, 't to 5 V');
    near(b.fittedW ?? NaN, 0.2956, toleranceW, 'P');
    const p = bleederFindings('LV', b).find((f) => f.rule === 'bleeder.power');
    expect(p?.severity).toBe('ok'); // 0.30 W <= 0.5 x 1 W
  });
  it('the same bleeder rated 0.5 W runs above half its rating: caution', () => {
    const p = bleederFindings('LV', bleederReport(0.01, 25.5, 0.02, 2200, 0.5)).find((f) => f.rule === 'bleeder.power');
    expect(p?.severity).toBe('caution'); // 0.30 W > 0.25 W
  });
  it('350 V rail, 100 kΩ: 350² / 100k = 1.23 W, over a 1 W rating: fail; timed to 60 V (38.8 s)', () => {
    const b = bleederReport(220e-6, 350, 0.1, 100e3, 1);
    expect(b.safeV).toBe(60);
    near(b.fittedW ?? NaN, 1.225, toleranceW, 'P');
    expect(bleederFindings('HV', b).find((f) => f.rule === 'bleeder.power')?.severity).toBe('fail');
  });
  it('no rating stated: a caution asking for a rating of at least twice the dissipation', () => {
    const p = bleederFindings('LV', bleederReport(0.01, 25.5, 0.02, 2200, null))
      .find((f) => f.rule === 'bleeder.power');
    expect(p?.severity).toBe('caution');
    // 25.5² / 2200 = 0.2956 W, twice that 0.59 W: the next common rating is 1 W (common practice, no source)
    expect(p?.message).toContain('use one rated 1 W or more');
  });
});

describe('the bleeder recommendation keeps a fitted bleeder that meets its target', () => {
  it('4700 µF at 25.6 V with 2.2 kΩ fitted: kept (to 5 V in RC ln(25.6/5) = 16.9 s); 3.9 kΩ for a new build', () => {
    // t = R C ln(V0/Vsafe) (ref §10 [C]); 5 V and the 22 s time constant (22 / 4700 µF = 4.68 kΩ -> E12 3.9 kΩ) are
    // common practice, no published source; P = V²/R = 25.6² / 3900 = 0.168 W, rated at least twice that (derating
    // 50 %): the next common resistor rating above 0.336 W is 0.5 W (common practice, no source)
    const b = bleederReport(4700e-6, 25.6, 0.04, 2200, 1);
    const r = bleederRecommendation(b)!;
    const t = (2200 * 4700e-6 * Math.log(25.6 / 5)).toFixed(1);
    expect(r.text).toBe(`Keep the fitted 2.2 kΩ bleeder (below 5 V in ${t} s)`);
    expect(r.reasoning).toMatch(/for a new build: 3\.9 kΩ bleeder, 0\.5 W rating or more/);
  });
  it('none fitted, or too slow above 60 V: the suggested value (220 µF at 350 V: at most 12.9 kΩ ' +
    '-> E12 12 kΩ)', () => {
    // ref §10: for 5 s the bleeder must be <= 12.9 kΩ; 350² / 12 k = 10.2 W, so at least 20.4 W rated: 25 W is the
    // next common rating (common practice, no source)
    const none = bleederRecommendation(bleederReport(4700e-6, 25.6, 0.04, null))!;
    expect(none.text).toBe('3.9 kΩ bleeder, 0.5 W rating or more');
    const slow = bleederRecommendation(bleederReport(220e-6, 350, 0.1, 100e3, 2))!;
    expect(slow.text).toBe('12 kΩ bleeder, 25 W rating or more');
  });
});

describe('a suggested rating is one a builder can order', () => {
  it('the smallest common rating carrying the dissipation at 50 % (common practice, no source)', () => {
    // 13.9² / 220 kΩ = 0.88 mW -> 0.125 W; 0.125 W exactly -> 0.25 W at 50 %;
    // 0.126 W -> 0.5 W; 30 W -> 0.5 × 50 W < 30
    expect(bleederRatingW((13.9 * 13.9) / 220e3)).toBe(0.125);
    expect(bleederRatingW(0.125)).toBe(0.25);
    expect(bleederRatingW(0.126)).toBe(0.5);
    expect(bleederRatingW(30)).toBeNull();
    expect(ratingWords(30)).toBe('more than 50 W');
  });
});
