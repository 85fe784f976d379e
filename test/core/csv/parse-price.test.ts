// The expected values apply the decimal-separator rule written in src/core/csv/parse-price.ts by hand.
import { describe, expect, it } from 'vitest';
import { parsePrice, parseQuantity } from '../../../src/core/csv/parse-price';

const cents = (t: string, d: '.' | ',' = '.') => {
  const r = parsePrice(t, d);
  return r.ok ? [r.cents, r.currency] : r.message;
};

describe('parsePrice', () => {
  it('point and comma decimals, with and without currency', () => {
    expect(cents('1.25')).toEqual([125, null]);
    expect(cents('1,25')).toEqual([125, null]); // rule 3: one comma, two digits after
    expect(cents('USD 1,234.50')).toEqual([123450, 'USD']); // rule 1
    expect(cents('1.234,50 EUR')).toEqual([123450, 'EUR']); // rule 1
    expect(cents('€0,99')).toEqual([99, 'EUR']);
    expect(cents('£ 12')).toEqual([1200, 'GBP']);
    expect(cents('$3.5')).toEqual([350, 'USD']);
    expect(cents('1 234,5 eur')).toEqual([123450, 'EUR']);
    expect(cents('1,234,567')).toEqual([123456700, null]); // rule 2
    expect(cents('.5')).toEqual([50, null]);
  });
  it('three digits after one separator: decided by the decimal setting (rule 4), except 0.xxx', () => {
    expect(cents('1.250')).toEqual([125, null]);
    expect(cents('1,250')).toEqual([125000, null]);
    expect(cents('1.250', ',')).toEqual([125000, null]);
    expect(cents('1,250', ',')).toEqual([125, null]);
    expect(cents('0,125')).toEqual([13, null]); // 12.5 cents rounds half-up to 13
  });
  it('rounds sub-cent prices half-up and says so', () => {
    const r = parsePrice('0.0149');
    expect(r).toEqual({ ok: true, cents: 1, currency: null, roundedFrom: '0.0149' });
    const r2 = parsePrice('0.015');
    expect(r2.ok && r2.cents).toBe(2);
    const r3 = parsePrice('2.500');
    expect(r3).toEqual({ ok: true, cents: 250, currency: null, roundedFrom: null });
  });
  it('rejects what is not a price', () => {
    for (const bad of ['', 'abc', '-1.00', '1.2.3,4', '12,34,5', 'EUR 1 USD', '€1 USD', '1,2345,678']) {
      expect(parsePrice(bad).ok, bad).toBe(false);
    }
  });
});

describe('parseQuantity', () => {
  it('reads whole and decimal quantities, rejects the rest', () => {
    expect(parseQuantity('4')).toBe(4);
    expect(parseQuantity(' 0,5 ')).toBe(0.5);
    expect(parseQuantity('-2')).toBeNull();
    expect(parseQuantity('two')).toBeNull();
  });
});
