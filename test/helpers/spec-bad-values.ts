// Bad inputs derived from a field's spec: what a sweep types into every box (as form text) and what a corrupted
// database row may hold (as stored values). Generated from the spec, so a field added later is swept unchanged.
import type { Field } from '../../src/core/spec/field';

/** Form texts the field must refuse, each with why. */
export function badTexts(f: Field): [string, string][] {
  const out: [string, string][] = [];
  if (f.type === 'number') {
    const unit = f.unit === '%' ? '%' : f.unit;
    out.push(['abc', 'not a number'], ['1e999', 'overflows'], ['NaN', 'NaN']);
    if (!f.optional && f.emptyAs === undefined) out.push(['', 'empty but required']);
    // limits typed with the SI unit symbol (read as written, whatever the display unit)
    const si = (v: number) => (f.unit === '%' ? `${v * 100} %` : `${v}${unit ? ' ' + unit : ''}`);
    if (Number.isFinite(f.max)) out.push([si(f.max * 2 + 1), 'above the maximum']);
    if (Number.isFinite(f.min)) out.push([si(f.min - Math.max(1, Math.abs(f.min))), 'below the minimum']);
    if (f.exclusiveMin) out.push([si(f.min), 'at an exclusive minimum']);
    if (f.exclusiveMin && f.min === 0)
      out.push([`5e-324${unit && unit !== '%' ? ' ' + unit : ''}`, 'a subnormal above zero']);
    // money is typed in the major unit (1.5 = 150 cents): a part of a cent is what it cannot hold
    if (f.money) out.push(['0.125', 'part of a cent']);
    else if (f.integer) out.push([String(Math.max(f.min, 0) + 1.5), 'not whole']);
  } else if (f.type === 'choice') out.push(['no-such-choice', 'not an option']);
  else if (f.type === 'text') {
    out.push(['x'.repeat(f.max + 1), 'too long']);
    if (f.required) out.push(['   ', 'blank but required']);
  } else if (f.type === 'ref' && !f.optional) out.push(['', 'nothing chosen']);
  return out;
}

/** Stored values the field must refuse. */
export function badStored(f: Field): [unknown, string][] {
  const out: [unknown, string][] = [['a string', 'text where a value belongs'], [{}, 'an object']];
  if (f.type === 'number') {
    out.push([NaN, 'NaN'], [Infinity, 'Infinity'], [f.max * 2 + 1, 'above the maximum']);
    if (f.exclusiveMin && f.min === 0) out.push([5e-324, 'a subnormal above zero']);
    if (!f.optional) out.push([null, 'null but required']);
    if (f.integer) out.push([Math.max(f.min, 0) + 0.5, 'not whole']);
  }
  if (f.type === 'choice') out.push([42, 'a number']);
  if (f.type === 'text') out.push(['x'.repeat(f.max + 1), 'too long']);
  // a structured text field (ratings, price breaks, rates) may hold an empty object: refuse a number instead
  if (f.type === 'text' && f.codec) return [...out.filter(([v]) => typeof v === 'string'), [42, 'a number']];
  if (f.type === 'bool') out.push([1, 'a number']);
  // any string is a well-formed text or id (whether the id exists is checked against the project, not the spec)
  return out.filter(([v]) => !((f.type === 'text' || f.type === 'ref') && v === 'a string'));
}
