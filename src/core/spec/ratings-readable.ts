// A part's ratings as a builder reads and types them: "Rated voltage 35 V; ripple current (RMS) 2.4 A; dielectric
// electrolytic". Each rating a category defines is written with its label and display unit (parts-categories.ts);
// a key no category defines is kept in the older form key=value. Reading accepts both forms, so a file or a box
// written before this form existed still reads the same; the text written reads back to exactly the same record.
import type { NumberField, TextCodec } from './field';
import { numberText, readNumber } from './number-text';
import { PART_CATEGORIES, type RatingChoice, type RatingField } from './parts-categories';
import { MAX_RATINGS, parseRatings, ratingsCodec, ratingsText } from './parts-text';

type Parsed<T> = { ok: true; value: T } | { ok: false; message: string };
export type Known = { kind: 'number'; f: RatingField } | { kind: 'choice'; c: RatingChoice };

// one definition per key (θjc is the same field for a MOSFET and a regulator)
const BY_KEY = new Map<string, Known>();
for (const d of PART_CATEGORIES) {
  for (const f of d.numbers) if (!BY_KEY.has(f.key)) BY_KEY.set(f.key, { kind: 'number', f });
  for (const c of d.choices) if (!BY_KEY.has(c.key)) BY_KEY.set(c.key, { kind: 'choice', c });
}
const labelOf = (k: Known) => (k.kind === 'number' ? k.f.label : k.c.label);
/** The names a rating is typed by: its label, and its label without a "(…)" note ("Ripple current"). */
const NAMES: { name: string; key: string; k: Known }[] = [...BY_KEY.entries()]
  .flatMap(([key, k]) => {
    const full = labelOf(k).toLowerCase();
    const bare = full.replace(/\s*\([^)]*\)\s*$/, '');
    // "voltage 35 V" for "Rated voltage", "ripple current" for "Ripple current (RMS)"
    const names = new Set([full, bare, bare.replace(/^rated /, '')]);
    return [...names].map((name) => ({ name, key, k }));
  })
  .sort((a, b) => b.name.length - a.name.length);

/** The field or list a rating key is defined by in some category, if any. */
export const ratingDef = (key: string): Known | undefined => BY_KEY.get(key);

/** The label of a rating key ("Rated voltage"), or the key itself when no category defines it. */
export const ratingLabel = (key: string): string => {
  const k = BY_KEY.get(key);
  return k ? labelOf(k) : key;
};

/** A value in the field's display unit with its symbol: "35 V", "4700 µF", "1.5 °C/W". */
export function ratingValueText(value: number, f: NumberField): string {
  const t = numberText(value, f);
  const sym = f.display.symbol;
  return sym && /^[+-]?[\d.]+(?:e[+-]?\d+)?$/i.test(t) ? `${t} ${sym}` : t;
}

/** One rating as read: "Rated voltage 35 V". */
function itemText(key: string, v: number | string, first: boolean): string {
  const k = BY_KEY.get(key);
  // "rated voltage" inside the line, but "AL", "θsa" and "V(BR)DSS" as written
  const name = (s: string) => (first || !/^[A-Z][a-z ]/.test(s) ? s : s.charAt(0).toLowerCase() + s.slice(1));
  if (k?.kind === 'number' && typeof v === 'number') return `${name(k.f.label)} ${ratingValueText(v, k.f)}`;
  if (k?.kind === 'choice' && typeof v === 'string' && k.c.options.includes(v)) return `${name(k.c.label)} ${v}`;
  return ratingsText({ [key]: v });
}

/** The ratings as one line a builder reads: "Rated voltage 35 V; ripple current (RMS) 2.4 A". */
export const ratingsReadable = (r: Record<string, number | string>): string =>
  Object.entries(r)
    .map(([k, v], i) => itemText(k, v, i === 0))
    .join('; ');

/** A typed value for a rating field: as written, or a bare number followed by the display symbol ("1.5 °C/W"). */
function readRatingNumber(text: string, f: NumberField) {
  const first = readNumber(text, f);
  const sym = f.display.symbol;
  if (first.ok || !sym || !text.endsWith(sym)) return first;
  const bare = readNumber(text.slice(0, -sym.length), f);
  return bare.ok ? bare : first;
}

/** Items split at ";" and new lines outside "quoted text" (the older form quotes text holding a separator). */
function splitItems(s: string): string[] {
  return (s.match(/(?:"(?:[^"\\\n]|\\.)*"|[^;\n"])+|"/g) ?? []).map((x) => x.trim()).filter((x) => x !== '');
}

/**
 * Ratings typed as "Rated voltage 35 V; ripple current 2.4 A" (names in any case, a "(…)" note optional, numbers in
 * the rating's unit or with a prefix), or as the older "voltageV=35; rippleA=2.4", or both mixed. Items are split at
 * ";" and new lines. A value out of its rating's range is refused with the rating's name.
 */
export function parseRatingsReadable(s: string): Parsed<Record<string, number | string>> {
  const out: Record<string, number | string> = {};
  const put = (key: string, v: number | string): string => {
    if (key in out) return `"${ratingLabel(key)}" is given twice`;
    out[key] = v;
    return '';
  };
  for (const item of splitItems(s)) {
    const low = item.toLowerCase();
    const hit = NAMES.find((n) => low.startsWith(n.name) && /^(?:\s|:|$)/.test(item.slice(n.name.length)));
    if (!hit) {
      // the older form, one key=value (or several joined by ", key=")
      const old = parseRatings(item);
      if (!old.ok && item.includes('=')) return old;
      if (!old.ok)
        return {
          ok: false,
          message: `"${item.slice(0, 60)}" is not a rating: write its name and value (e.g. Rated voltage 35 V)`,
        };
      for (const [k, v] of Object.entries(old.value)) {
        const twice = put(k, v);
        if (twice) return { ok: false, message: twice };
      }
      continue;
    }
    const valueText = item.slice(hit.name.length).replace(/^\s*:?\s*/, '');
    const label = labelOf(hit.k);
    if (valueText === '') return { ok: false, message: `${label} has no value` };
    let v: number | string;
    if (hit.k.kind === 'number') {
      const n = readRatingNumber(valueText, hit.k.f);
      if (!n.ok) return { ok: false, message: `${label} ${n.message}` };
      v = n.value;
    } else {
      const o = hit.k.c.options.find((x) => x.toLowerCase() === valueText.toLowerCase());
      if (o === undefined)
        return {
          ok: false,
          message: `${label} must be one of ${hit.k.c.options.join(', ')}; you entered "${valueText}"`,
        };
      v = o;
    }
    const twice = put(hit.key, v);
    if (twice) return { ok: false, message: twice };
  }
  if (Object.keys(out).length > MAX_RATINGS) return { ok: false, message: `more than ${MAX_RATINGS} ratings` };
  return { ok: true, value: out };
}

/** The ratings box's codec: written readable, read in either form, the stored record checked as before. */
export const readableRatingsCodec: TextCodec = {
  toText: (v) =>
    v !== null && typeof v === 'object' && !Array.isArray(v)
      ? ratingsReadable(v as Record<string, number | string>)
      : '',
  fromText: parseRatingsReadable,
  check: ratingsCodec.check,
};
