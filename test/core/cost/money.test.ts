import { describe, expect, it } from 'vitest';
import { convertCents, formatMoney, rateFor, roundHalfUp } from '../../../src/core/cost/money';

describe('formatMoney (hand-written expected strings)', () => {
  it('groups thousands with commas and always shows two decimals', () => {
    expect(formatMoney(123456, 'USD')).toBe('USD 1,234.56');
    expect(formatMoney(5, 'EUR')).toBe('EUR 0.05');
    expect(formatMoney(0, 'GBP')).toBe('GBP 0.00');
    expect(formatMoney(100000000, 'USD')).toBe('USD 1,000,000.00');
    expect(formatMoney(-123456789, 'USD')).toBe('USD -1,234,567.89');
  });
  it('never prints NaN', () => {
    expect(formatMoney(Number.NaN, 'USD')).toBe('USD n/a');
    expect(formatMoney(Infinity, 'USD')).toBe('USD n/a');
  });
});

describe('half-up rounding of conversions (hand-worked)', () => {
  it('rounds exact halves up even when binary floating point lands just below', () => {
    // Hand-worked: 50 x 1.15 = 57.5 exactly; in binary floating point 57.49999999999999.
    expect(50 * 1.15).toBeLessThan(57.5);
    expect(convertCents(50, 1.15)).toBe(58);
    // Hand-worked: 1005 x 0.5 = 502.5 -> 503; 105 x 1.1 = 115.5 -> 116; 3 x 0.85 = 2.55 -> 3.
    expect(convertCents(1005, 0.5)).toBe(503);
    expect(convertCents(105, 1.1)).toBe(116);
    expect(convertCents(3, 0.85)).toBe(3);
    // Hand-worked: 2.49 -> 2, 2.5 -> 3.
    expect(roundHalfUp(2.49)).toBe(2);
    expect(roundHalfUp(2.5)).toBe(3);
  });
  it('finds rates case-insensitively; the project currency is 1; bad rates are unknown', () => {
    expect(rateFor('eur', 'USD', { EUR: 1.1 })).toBe(1.1);
    expect(rateFor('USD', 'USD', {})).toBe(1);
    expect(rateFor('GBP', 'USD', {})).toBeNull();
    expect(rateFor('GBP', 'USD', { GBP: 0 })).toBeNull();
    expect(rateFor('GBP', 'USD', { GBP: Number.NaN })).toBeNull();
    // regression: a subnormal rate passed `> 0` and converted every price to 0 cents
    expect(rateFor('GBP', 'USD', { GBP: 5e-324 })).toBeNull();
  });
});
