// The part form's rating boxes: one box per rating of the part's category (drawn with SpecField from the spec made
// here, so each has its label, display unit and range), named "r.<key>". Ratings the category does not define stay in
// the "Other ratings" text box (names and units, ratings-readable.ts). A box of another category posted after the
// category was switched is still read (by its own field), so nothing typed is lost.
import type { Part } from '../model';
import type { ChoiceField, FieldError, NumberField, Spec } from './field';
import { defineSpec } from './field';
import { choice } from './make';
import { numberText, readNumber } from './number-text';
import { categoryOf, PART_CATEGORIES, type PartCategory } from './parts-categories';
import { ratingDef, ratingsReadable } from './ratings-readable';

export const BOX_PREFIX = 'r.';

const specs = new Map<PartCategory, Spec>();
/** The spec of one category's rating boxes (fields "r.<key>"; a list rating offers "(not given)" first). */
export function ratingBoxSpec(category: string): Spec {
  const def = categoryOf(category);
  const known = specs.get(def.id);
  if (known) return known;
  const fields: Record<string, NumberField | ChoiceField> = {};
  for (const f of def.numbers) fields[BOX_PREFIX + f.key] = f;
  for (const c of def.choices)
    fields[BOX_PREFIX + c.key] = choice(c.label, [['', '(not given)'], ...c.options.map((o) => [o, o] as const)], '');
  const spec = defineSpec({ name: `ratings-${def.id}`, label: `${def.label} ratings`, fields });
  specs.set(def.id, spec);
  return spec;
}

/** Every rating box of every category, for the form's field labels. */
export const allRatingBoxSpecs = (): Spec[] => PART_CATEGORIES.map((d) => ratingBoxSpec(d.id));

/**
 * A value in its box: bare in the display unit shown beside the box ("35", not "35 V") when that reads back exactly.
 */
function boxText(v: number, f: NumberField): string {
  const t = numberText(v, f);
  const sym = ` ${f.display.symbol}`;
  if (!f.display.symbol || !t.endsWith(sym)) return t;
  const bare = t.slice(0, -sym.length);
  const back = readNumber(bare, f);
  return back.ok && back.value === v ? bare : t;
}

/** Form text of a part's ratings: its category's ratings in their boxes, the rest in the "Other ratings" text. */
export function ratingBoxValues(part: Pick<Part, 'category' | 'ratings'>): Record<string, string> {
  const def = categoryOf(part.category);
  const out: Record<string, string> = {};
  const rest: Record<string, number | string> = {};
  const own = new Set([...def.numbers.map((f) => f.key), ...def.choices.map((c) => c.key)]);
  for (const [k, v] of Object.entries(part.ratings)) {
    const d = ratingDef(k);
    if (!own.has(k) || !d) rest[k] = v;
    else if (d.kind === 'number' && typeof v === 'number') out[BOX_PREFIX + k] = boxText(v, d.f);
    else if (d.kind === 'choice' && typeof v === 'string' && d.c.options.includes(v)) out[BOX_PREFIX + k] = v;
    else rest[k] = v;
  }
  for (const f of def.numbers) out[BOX_PREFIX + f.key] ??= '';
  for (const c of def.choices) out[BOX_PREFIX + c.key] ??= '';
  out.ratings = ratingsReadable(rest);
  return out;
}

/** The ratings typed in the boxes ("r.<key>"), each read with its own field; an empty box is no rating. */
export function readRatingBoxes(values: Record<string, string>): {
  ratings: Record<string, number | string>;
  errors: FieldError[];
} {
  const ratings: Record<string, number | string> = {};
  const errors: FieldError[] = [];
  for (const [name, raw] of Object.entries(values)) {
    if (!name.startsWith(BOX_PREFIX)) continue;
    const key = name.slice(BOX_PREFIX.length);
    const d = ratingDef(key);
    const text = String(raw ?? '').trim();
    if (!d || text === '') continue;
    if (d.kind === 'number') {
      const n = readNumber(text, d.f);
      if (n.ok) ratings[key] = n.value;
      else errors.push({ field: name, label: d.f.label, message: `${d.f.label} ${n.message}` });
    } else {
      const o = d.c.options.find((x) => x.toLowerCase() === text.toLowerCase());
      if (o !== undefined) ratings[key] = o;
      else
        errors.push({
          field: name,
          label: d.c.label,
          message: `${d.c.label} must be one of ${d.c.options.join(', ')}`,
        });
    }
  }
  return { ratings, errors };
}
