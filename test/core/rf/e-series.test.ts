import { describe, expect, it } from 'vitest';
import { E12, E24, nearestStandard, snapCapacitance } from '../../../src/core/rf/e-series';
import { near } from './helpers';

describe('IEC 60063 series', () => {
  // Source: IEC 60063:2015 value lists (REFERENCE-VALUES §5.1, [C], several sources agree)
  it('E12 and E24 equal the published tables', () => {
    expect([...E12]).toEqual([1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2]);
    expect([...E24]).toEqual([
      1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2,
      9.1,
    ]);
    expect(E24.filter((_, i) => i % 2 === 0)).toEqual([...E12]);
  });
  it('irregular values are not the formula (REFERENCE-VALUES §5.1: 2.7 not 2.6, 8.2 not 8.3)', () => {
    expect(nearestStandard(2.65e-10, 'E24')).toBeCloseTo(2.7e-10, 20);
    expect(nearestStandard(8.3e-10, 'E24')).toBeCloseTo(8.2e-10, 20);
    expect(nearestStandard(4.6e-9, 'E12')).toBeCloseTo(4.7e-9, 20);
  });
  it('snaps across decades and to parallel pairs when closer', () => {
    // 486.7 pF (REFERENCE-VALUES §1.5 C1): nearest E12 is 470 pF (-3.4 %); a pair does better
    const single = snapCapacitance(486.7e-12, 'E12', false);
    near(single.total, 470e-12, 1e-18, 'single');
    const pair = snapCapacitance(486.7e-12, 'E12', true);
    expect(pair.parts).toHaveLength(2);
    expect(Math.abs(pair.errorFraction)).toBeLessThan(Math.abs(single.errorFraction));
    for (const p of pair.parts) {
      const m = Number((p / 10 ** Math.floor(Math.log10(p))).toPrecision(2));
      expect(E12 as readonly number[]).toContain(m);
    }
  });
});
