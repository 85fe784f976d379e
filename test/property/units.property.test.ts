// parseValue(formatInput(x, unit)) gives x back: what the page shows in a field reads back as the same
// number when the user saves it unchanged. Seeded fast-check.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { propertyOptions } from '../helpers/property'; // fixed seed per property
import { formatInput, formatValue, parseValue } from '../../src/core/units';

const SEED = 20261201;
// formatInput keeps 6 significant digits: the worst rounding is half a unit in the 6th digit, 5e-6 relative.
const toleranceRelative = 5.0001e-6;

const PREFIXED_UNITS = ['V', 'A', 'W', 'Ω', 'F', 'H', 'Hz', 's', 'Ah'] as const;
const PLAIN_UNITS = ['°C', 'K/W', 'dB', '%', ''] as const;

/** Positive doubles spread over decades: 10^e x mantissa. */
const positive = (minExp: number, maxExp: number) =>
  fc
    .tuple(fc.integer({ min: minExp, max: maxExp }), fc.double({ min: 1, max: 10, noNaN: true, maxExcluded: true }))
    .map(([e, m]) => m * 10 ** e);

function roundTrips(x: number, unit: string) {
  const text = formatInput(x, unit);
  const back = parseValue(text, unit);
  if (!back.ok) throw new Error(`${x} ${unit} -> "${text}" does not parse: ${back.message}`);
  const rel = Math.abs(back.value - x) / x;
  if (!(rel <= toleranceRelative))
    throw new Error(`${x} ${unit} -> "${text}" -> ${back.value} (relative error ${rel})`);
}

describe('units: formatInput then parseValue', () => {
  it('round-trips positive values from 1 p to 999 G in every prefixed unit', () => {
    fc.assert(
      fc.property(positive(-12, 11), fc.constantFrom(...PREFIXED_UNITS), (x, unit) => roundTrips(x, unit)),
      propertyOptions(SEED, 3000), // fixed seed
    );
  });

  it('round-trips positive values from 0.001 to 999 999 in units shown without a prefix', () => {
    fc.assert(
      fc.property(positive(-3, 5), fc.constantFrom(...PLAIN_UNITS), (x, unit) => roundTrips(x, unit)),
      propertyOptions(SEED, 2000), // fixed seed
    );
  });

  it('round-trips the decade edges exactly where the prefix changes (999.9995 m -> 1 k boundaries)', () => {
    for (const unit of PREFIXED_UNITS)
      for (let e = -12; e <= 9; e += 3)
        for (const m of [0.99949, 0.9995, 0.99951, 1, 1.0000049]) roundTrips(m * 10 ** e, unit);
  });

  it('reads back what formatValue shows (3 significant digits) within 3 significant digits', () => {
    const toleranceRelative3 = 5.0001e-3;
    fc.assert(
      fc.property(positive(-12, 11), fc.constantFrom(...PREFIXED_UNITS), (x, unit) => {
        const r = parseValue(formatValue(x, unit), unit);
        expect(r.ok).toBe(true);
        if (r.ok) expect(Math.abs(r.value - x) / x).toBeLessThanOrEqual(toleranceRelative3);
      }),
      propertyOptions(SEED, 1000), // fixed seed
    );
  });
});
