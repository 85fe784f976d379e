// Guards for divisions (src/core/numeric.ts): a denominator must be finite and at least its floor, so subnormals
// (which pass `x > 0`) are refused. IEEE 754: 85 / 5e-324 overflows to Infinity.
import { describe, expect, it } from 'vitest';
import { quotient, usable, usablePositive } from '../../src/core/numeric';

describe('usable denominators', () => {
  it('refuses subnormals, zero, NaN and infinities; accepts values at or above the floor', () => {
    for (const x of [5e-324, 1.5e-322, 0, -0, Number.NaN, Infinity, -Infinity, 1e-4])
      expect(usablePositive(x, 1e-3)).toBe(false);
    for (const x of [1e-3, 1, 13.8, 1e300]) expect(usablePositive(x, 1e-3)).toBe(true);
    expect(usablePositive(-5, 1e-3)).toBe(false);
    expect(usable(-5, 1e-3)).toBe(true);
    expect(usable(-5e-324, 1e-3)).toBe(false);
  });
  it('quotient is null instead of Infinity/NaN and exact otherwise', () => {
    expect(85 / 5e-324).toBe(Infinity); // the failure it guards against
    expect(quotient(85, 5e-324, 1e-3)).toBeNull();
    expect(quotient(0, 0, 1e-3)).toBeNull();
    expect(quotient(1e306, 1e-3, 1e-3)).toBeNull(); // 1e309 overflows (largest double is about 1.8e308)
    expect(quotient(60, 8.2, 1e-3)).toBe(60 / 8.2);
    expect(quotient(-6, -2, 1e-3)).toBe(3);
  });
});
