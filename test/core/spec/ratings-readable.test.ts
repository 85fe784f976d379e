// Ratings written with their names and units and read back (src/core/spec/ratings-readable.ts). Expected SI values
// come from the SI prefix definitions (BIPM SI Brochure, 9th ed. 2019, Table 7: µ = 1e-6, m = 1e-3, n = 1e-9).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseRatingsReadable, ratingsReadable } from '../../../src/core/spec/ratings-readable';
import { parseForm } from '../../../src/core/spec';
import { partSpec } from '../../../src/core/spec/parts';

describe('ratings in names and units', () => {
  it('writes a capacitor as a builder reads it, and reads the same text back to the same record', () => {
    const cap = { capacitanceF: 4.7e-3, voltageV: 35, rippleA: 2.4, dielectric: 'electrolytic' };
    const text = ratingsReadable(cap);
    expect(text).toBe('Capacitance 4700 µF; rated voltage 35 V; ripple current (RMS) 2.4 A; dielectric electrolytic');
    expect(parseRatingsReadable(text)).toEqual({ ok: true, value: cap });
  });

  it('reads the short names a builder types ("voltage", "ripple current") and the units with prefixes', () => {
    // SI Brochure Table 7: 2400 mA = 2.4 A; 100 nH/t² is read in the field's display unit nH/t²
    expect(parseRatingsReadable('voltage 35 V; ripple current 2400 mA')).toEqual({
      ok: true,
      value: { voltageV: 35, rippleA: 2.4 },
    });
    expect(parseRatingsReadable('θsa: 1.5 °C/W')).toEqual({ ok: true, value: { thetaSaKPerW: 1.5 } });
    expect(parseRatingsReadable('VA rating 70 VA; secondary 1 voltage 18 V')).toEqual({
      ok: true,
      value: { va: 70, sec1V: 18 },
    });
  });

  it('still reads the older key=value form, alone or mixed', () => {
    expect(parseRatingsReadable('capacitanceF=4700u; voltageV=35')).toEqual({
      ok: true,
      value: { capacitanceF: 4.7e-3, voltageV: 35 },
    });
    expect(parseRatingsReadable('Rated current 1 A; type=T')).toEqual({ ok: true, value: { ratedA: 1, type: 'T' } });
  });

  it('refuses a bad value naming the rating, and a rating given twice', () => {
    const neg = parseRatingsReadable('Rated voltage -5 V');
    expect(neg.ok).toBe(false);
    expect(!neg.ok && neg.message).toMatch(/^Rated voltage must be more than 0 V/);
    const kind = parseRatingsReadable('characteristic Q');
    expect(!kind.ok && kind.message).toBe('Characteristic must be one of T, F; you entered "Q"');
    expect(parseRatingsReadable('voltage 35 V; voltageV=50')).toEqual({
      ok: false,
      message: '"Rated voltage" is given twice',
    });
    // the part form names the box and keeps the typed text (the form test in test/web/parts.test.ts)
    const form = parseForm(partSpec, { description: 'Cap', category: 'capacitor', ratings: 'ripple current 2.4 Q' });
    expect(form.ok).toBe(false);
    expect(!form.ok && form.errors.ratings).toMatch(/^Ratings: Ripple current \(RMS\) /);
  });

  it('round-trips any capacitor and transformer record exactly (property, seeded)', () => {
    const pos = (max: number) => fc.double({ min: 1e-6, max, noNaN: true, noDefaultInfinity: true });
    fc.assert(
      fc.property(
        fc.record(
          {
            capacitanceF: fc.double({ min: 1e-12, max: 10, noNaN: true }),
            voltageV: pos(1e5),
            rippleA: pos(1000),
            va: pos(1e5),
          },
          { requiredKeys: [] },
        ),
        (r) => {
          const back = parseRatingsReadable(ratingsReadable(r));
          expect(back).toEqual({ ok: true, value: r });
        },
      ),
      { seed: 1302, numRuns: 300 },
    );
  });
});
