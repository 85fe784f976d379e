// Part categories and their rating fields: older category names still read, ratings read through the fields with
// their ranges, unknown keys ignored (kept in the stored text, not used by the checks).
import { describe, expect, it } from 'vitest';
import { categoryOf, PART_CATEGORIES, ratingKeysHelp, readRatings } from '../../../src/core/spec/parts-categories';
import { parseRatings, ratingsText } from '../../../src/core/spec/parts-text';
import { DEMO_PROJECTS } from '../../../seed-demo/index';

describe('part categories', () => {
  it('offers the ten categories, and reads older names and labels in any case', () => {
    expect(PART_CATEGORIES.map((c) => c.id)).toEqual([
      'capacitor',
      'resistor',
      'transformer',
      'relay',
      'fuse',
      'mosfet',
      'heatsink',
      'regulator',
      'core',
      'wire',
      'other',
    ]);
    expect(categoryOf('capacitor-reservoir').id).toBe('capacitor');
    expect(categoryOf('Transistor').id).toBe('mosfet');
    expect(categoryOf('MOSFET').id).toBe('mosfet');
    expect(categoryOf('crystal').id).toBe('other');
  });

  it('reads the key=value text through the fields: "4700u" is 4.7 mF; out-of-range and wrong kinds are named', () => {
    const typed = parseRatings('capacitanceF=4700u; voltageV=35; rippleA=2.4; dielectric=electrolytic; lot=7');
    if (!typed.ok) throw new Error(typed.message);
    const r = readRatings({ category: 'capacitor', ratings: typed.value });
    expect(r.numbers).toEqual({ capacitanceF: 4.7e-3, voltageV: 35, rippleA: 2.4 });
    expect(r.choices).toEqual({ dielectric: 'electrolytic' });
    expect(r.errors).toEqual([]);
    // the text comes back as typed in meaning (the unknown key "lot" is kept)
    expect(parseRatings(ratingsText(typed.value))).toEqual(typed);
    const bad = readRatings({ category: 'fuse', ratings: { ratedA: -1, type: 'X' } });
    expect(bad.errors.map((e) => e.field)).toEqual(['ratings.ratedA', 'ratings.type']);
    expect(bad.errors[1].message).toMatch(/must be one of T, F/);
  });

  it('every demo part with a category of the list reads without a range error', () => {
    for (const p of DEMO_PROJECTS.flatMap((x) => x.parts)) expect(readRatings(p).errors, p.id).toEqual([]);
  });

  it('says which keys a category takes, for the ratings box', () => {
    expect(ratingKeysHelp('heatsink')).toBe('Heatsink: θsa (°C/W)');
    expect(ratingKeysHelp('crystal')).toBe('no rated fields for this category');
  });
});
