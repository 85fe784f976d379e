// Reading a number in a field's display unit. The IEC 60062:2016 letter code examples (4k7 = 4.7 kΩ, 2R2 = 2.2 Ω,
// R47 = 0.47 Ω, 4u7 = 4.7 µF, 100n = 100 nF) are the standard's own; SI prefixes per the SI Brochure (BIPM, 9th
// edition, 2019), Table 7. The display-unit rule (a bare number is read in the unit shown beside the box) is this
// program's input convention, stated in the field specs.
import { describe, expect, it } from 'vitest';
import { numberText, readNumber } from '../../../src/core/spec/number-text';
import { U } from '../../../src/core/spec/field';
import { num, optNum } from '../../../src/core/spec/make';
import { ALL_SPECS, type NumberField } from '../../../src/core/spec';
import fc from 'fast-check';
import { propertyOptions } from '../../helpers/property';

const current = num('Key-down current', 'A', U.mA, 0, 100, 0);
const reservoir = num('Reservoir capacitance', 'F', U.uF, 0, 10, 0.0047, { exclusiveMin: true });
const reservoirInFarads = num('Reservoir capacitance', 'F', { symbol: 'F', scale: 1 }, 0, 10, 0.0047, {
  exclusiveMin: true,
});
const resistor = optNum('Bleeder', 'Ω', U.ohm, 0, 1e9, null, { exclusiveMin: true });
const efficiency = optNum('Drain efficiency', '%', U.pct, 0.05, 1, null);
const devices = num('Devices', '', U.none, 1, 16, 2, { integer: true });

const value = (text: string, f = current) => {
  const r = readNumber(text, f);
  if (!r.ok) throw new Error(r.message);
  return r.value;
};

describe('a bare number is read in the display unit', () => {
  it('"12" in a mA box is 12 mA, not 12 A', () => expect(value('12')).toBe(0.012));
  it('"350" mA is exactly 0.35 A (no binary rounding from 350 x 1e-3)', () => expect(value('350')).toBe(0.35));
  it('"4700" in a µF box is 4700 µF', () => expect(value('4700', reservoir)).toBeCloseTo(4.7e-3, 15));
  it('"85" in a % box is 0.85', () => expect(value('85', efficiency)).toBe(0.85));
  it('a decimal comma is a decimal point: "1,5" mA', () => expect(value('1,5')).toBe(0.0015));
});

describe('a number with a prefix, letter code or unit is read as written', () => {
  it.each([
    ['1.2 A', 1.2],
    ['350 mA', 0.35],
    ['350m', 0.35],
    ['1A2', NaN], // not a letter code for amps: refused below
  ])('%s', (text, expected) => {
    if (Number.isNaN(expected)) expect(readNumber(text, current).ok).toBe(false);
    else expect(value(text)).toBeCloseTo(expected, 12);
  });
  it.each([
    ['4k7', 4700],
    ['2R2', 2.2],
    ['R47', 0.47],
    ['470 Ω', 470],
  ])('IEC 60062 letter code %s = %d Ω', (text, ohms) => expect(value(text, resistor)).toBeCloseTo(ohms, 9));
  it.each([
    ['4u7', 4.7e-6],
    ['100n', 100e-9],
    ['2200 µF', 2200e-6],
  ])('IEC 60062 letter code %s in a µF box is read as written', (text, farads) =>
    expect(value(text, reservoir)).toBeCloseTo(farads, 15),
  );
});

describe('refusals say why and suggest the likely unit slip', () => {
  it('"4700" in a farad box: did you mean 4700 µF?', () => {
    const r = readNumber('4700', reservoirInFarads);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain('did you mean 4700 µF?');
  });
  it('a grouping comma is refused as ambiguous', () => {
    const r = readNumber('1,500', current);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain('ambiguous');
  });
  it('a whole-number field refuses 2.5', () =>
    expect(readNumber('2.5', devices)).toEqual({ ok: false, message: expect.stringContaining('whole number') }));
  it('a limit is shown in readable units', () => {
    const r = readNumber('200 A', current);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain('at most 100 A');
  });
});

describe('stored value -> box text -> the same value', () => {
  it.each([0.012, 0.35, 1.2, 12, 1.23e-5, 0.0123456789, 0.1 + 0.2])('current %d A', (v) =>
    expect(value(numberText(v, current))).toBe(v),
  );
  it.each([4.7e-3, 2.2e-3, 1e-7, 3.3e-9])('capacitance %d F', (v) =>
    expect(value(numberText(v, reservoir), reservoir)).toBe(v),
  );
  it.each([0.05, 0.85, 0.123456])('fraction %d', (v) => expect(value(numberText(v, efficiency), efficiency)).toBe(v));
  it('the box text of a mA field reads as a builder writes it', () => {
    expect(numberText(0.35, current)).toBe('350');
    expect(numberText(4.7e-3, reservoir)).toBe('4700');
  });
});

describe('property: every spec number field round-trips its stored values through the box text', () => {
  it('for values across each field range (seeded)', () => {
    const fields = ALL_SPECS.flatMap((s) => Object.values(s.fields)).filter(
      (f): f is NumberField => f.type === 'number',
    );
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: fields.length - 1 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (i, u) => {
          const f = fields[i];
          const lo = f.exclusiveMin ? f.min + (f.max - f.min) * 1e-12 : f.min;
          let v = lo + (f.max - lo) * u;
          if (f.integer) v = Math.round(v);
          if (v > f.max || v < f.min || (f.exclusiveMin && v <= f.min)) return;
          const back = readNumber(numberText(v, f), f);
          expect(back.ok).toBe(true);
          // a fraction need not be n/100 of any decimal n (0.000159 is not): percent boxes hold it to 1e-12 relative
          if (back.ok && f.unit === '%') expect(Math.abs(back.value - v)).toBeLessThanOrEqual(Math.abs(v) * 1e-12);
          else expect(back).toEqual({ ok: true, value: v });
        },
      ),
      propertyOptions(),
    );
  });
});
