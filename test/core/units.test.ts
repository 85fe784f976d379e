import { describe, it, expect } from 'vitest';
import { parseValue, formatValue, formatInput } from '../../src/core/units';

const relTolerance = 1e-12;
const close = (a: number, b: number) => Math.abs(a - b) <= relTolerance * Math.max(Math.abs(a), Math.abs(b), 1e-30);

function value(text: string, unit: string): number {
  const r = parseValue(text, unit);
  if (!r.ok) throw new Error(`${text}: ${r.message}`);
  return r.value;
}

describe('IEC 60062 letter-and-digit (RKM) code', () => {
  // Source: IEC 60062:2016 examples as reproduced in shared/reference/REFERENCE-VALUES.md §5.2 [C]
  it.each([
    ['R47', 'Ω', 0.47],
    ['4R7', 'Ω', 4.7],
    ['470R', 'Ω', 470],
    ['4K7', 'Ω', 4700],
    ['47K3', 'Ω', 47300],
    ['4M7', 'Ω', 4.7e6],
    ['4n7', 'F', 4.7e-9],
    ['10p', 'F', 10e-12],
  ])('%s = %d (%s)', (text, unit, expected) => {
    expect(close(value(text, unit), expected)).toBe(true);
  });
  // Derived by the same rule (reference §5.2 [D]): 2R2, 100n, 4u7, M47, 6p8
  it.each([
    ['2R2', 'Ω', 2.2],
    ['100n', 'F', 100e-9],
    ['4u7', 'F', 4.7e-6],
    ['M47', 'Ω', 470e3],
    ['6p8', 'F', 6.8e-12],
    ['4k7', 'Ω', 4700],
  ])('%s = %d (%s)', (text, unit, expected) => {
    expect(close(value(text, unit), expected)).toBe(true);
  });
});

describe('SI prefixes with unit symbols', () => {
  it.each([
    ['350m', 'A', 0.35],
    ['1.5A', 'A', 1.5],
    ['350 mA', 'A', 0.35],
    ['13.8V', 'V', 13.8],
    ['10.1 MHz', 'Hz', 10.1e6],
    ['2200 µF', 'F', 2200e-6],
    ['4.7kΩ', 'Ω', 4700],
    ['1e-6', 'F', 1e-6],
    ['1,5 A', 'A', 1.5],
  ])('%s', (text, unit, expected) => {
    expect(close(value(text, unit), expected)).toBe(true);
  });

  it('refuses a grouping comma as ambiguous but keeps a decimal comma', () => {
    const r = parseValue('1,500 W', 'W');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain('write 1500 or 1.5');
    expect(value('4,7 V', 'V')).toBeCloseTo(4.7, 12);
  });

  it('refuses nonsense with a message naming the expected form', () => {
    for (const bad of ['abc', '', '1.2.3', '4k7k', 'MHz', '--1']) {
      const r = parseValue(bad, 'A');
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.message).toMatch(/mA|empty/);
    }
  });
});

describe('formatting', () => {
  it('uses engineering prefixes and proper symbols', () => {
    expect(formatValue(0.35, 'A')).toBe('350 mA');
    expect(formatValue(4700, 'Ω')).toBe('4.7 kΩ');
    expect(formatValue(4.867e-10, 'F')).toBe('487 pF');
    expect(formatValue(0.0022, 'F')).toBe('2200 µF');
    expect(formatValue(40, '°C')).toBe('40 °C');
    expect(formatValue(NaN, 'V')).toBe('—');
  });
  it('formatInput round-trips through parseValue', () => {
    for (const [v, u] of [
      [0.35, 'A'],
      [13.87, 'V'],
      [10.11e6, 'Hz'],
      [4.7e-6, 'F'],
      [2200, 'Ω'],
      [1.45e-6, 'H'],
    ] as const) {
      expect(close(value(formatInput(v, u), u), v)).toBe(true);
    }
  });
});
