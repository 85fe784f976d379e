// Part categories and their rating fields. A part's ratings are stored as today's key=value record (so existing
// projects, files and rows keep working); each category says which keys it uses, with unit, display unit and range
// (one definition per rating), and the role checks read ratings through these fields only.
import type { Part } from '../model';
import type { FieldError, NumberField } from './field';
import { U } from './field';
import { num } from './make';
import { rangeProblem } from './number-text';

export type PartCategory =
  | 'capacitor'
  | 'resistor'
  | 'transformer'
  | 'relay'
  | 'fuse'
  | 'mosfet'
  | 'heatsink'
  | 'regulator'
  | 'core'
  | 'wire'
  | 'other';

/** A numeric rating: the field (unit, range) plus whether role checks need it (missing -> caution). */
export interface RatingField extends NumberField {
  key: string;
}

/** A text rating offered from a short list (fuse characteristic). */
export interface RatingChoice {
  key: string;
  label: string;
  options: readonly string[];
}

export interface CategoryDef {
  id: PartCategory;
  label: string;
  numbers: readonly RatingField[];
  choices: readonly RatingChoice[];
  /** Older category names typed before the list existed, read as this category. */
  aliases: readonly string[];
}

const r = (key: string, f: NumberField): RatingField => ({ ...f, key, optional: true });
const A = (key: string, label: string, max = 1000) =>
  r(key, num(label, 'A', U.A, 0, max, null, { exclusiveMin: true }));
const V = (key: string, label: string, max = 100_000) =>
  r(key, num(label, 'V', U.V, 0, max, null, { exclusiveMin: true }));
const KW = (key: string, label: string) => r(key, num(label, 'K/W', U.KW, 0, 1000, null, { exclusiveMin: true }));
const MM = { symbol: 'mm', scale: 1e-3 } as const;
// Common practice, no published source: toroids for HF from 2 mm to 100 mm across (the filter form's own range)
const coreMm = (key: string, label: string) => r(key, num(label, 'm', MM, 0.002, 0.1, null, { exclusiveMin: true }));

export const PART_CATEGORIES: readonly CategoryDef[] = [
  {
    id: 'capacitor', label: 'Capacitor', aliases: ['capacitor-reservoir', 'capacitor-rf', 'cap'],
    numbers: [
      r('capacitanceF', num('Capacitance', 'F', U.uF, 0, 10, null, { exclusiveMin: true })),
      V('voltageV', 'Rated voltage'),
      A('rippleA', 'Ripple current (RMS)'),
      A('rfCurrentA', 'RF current (RMS)'),
      r('toleranceFraction', num('Tolerance', '%', U.pct, 0, 0.5, null)),
    ],
    choices: [{ key: 'dielectric', label: 'Dielectric', options: ['electrolytic', 'C0G', 'mica', 'film', 'X7R'] }],
  },
  {
    id: 'resistor', label: 'Resistor', aliases: [],
    numbers: [
      r('resistanceOhm', num('Resistance', 'Ω', U.ohm, 0, 1e9, null, { exclusiveMin: true })),
      r('powerW', num('Power rating', 'W', U.W, 0, 10_000, null, { exclusiveMin: true })),
    ],
    choices: [],
  },
  {
    id: 'transformer', label: 'Transformer', aliases: ['mains-transformer'],
    numbers: [
      r('va', num('VA rating', 'VA', { symbol: 'VA', scale: 1 }, 0, 100_000, null, { exclusiveMin: true })),
      V('sec1V', 'Secondary 1 voltage (RMS)'), A('sec1A', 'Secondary 1 current'),
      V('sec2V', 'Secondary 2 voltage (RMS)'), A('sec2A', 'Secondary 2 current'),
      V('sec3V', 'Secondary 3 voltage (RMS)'), A('sec3A', 'Secondary 3 current'),
    ],
    choices: [],
  },
  {
    id: 'relay', label: 'Relay', aliases: [],
    numbers: [
      A('contactCarryA', 'Contact carry current'), A('contactSwitchA', 'Contact switching current'),
      V('contactV', 'Contact voltage'), V('coilV', 'Coil voltage'), A('coilA', 'Coil current', 10),
    ],
    choices: [],
  },
  {
    id: 'fuse', label: 'Fuse', aliases: [],
    numbers: [A('ratedA', 'Rated current')],
    choices: [{ key: 'type', label: 'Characteristic', options: ['T', 'F'] }],
  },
  {
    id: 'mosfet', label: 'MOSFET', aliases: ['transistor'],
    numbers: [
      V('vdsMaxV', 'V(BR)DSS'), A('idMaxA', 'Drain current'),
      r('rdsOnOhm', num('Rds(on)', 'Ω', U.ohm, 0, 1000, null, { exclusiveMin: true })), KW('thetaJcKPerW', 'θjc'),
      r('tjMaxC', num('Tj max', '°C', U.C, 0, 300, null, { exclusiveMin: true })),
    ],
    choices: [],
  },
  { id: 'heatsink', label: 'Heatsink', aliases: [], numbers: [KW('thetaSaKPerW', 'θsa')], choices: [] },
  {
    id: 'regulator', label: 'Regulator', aliases: [],
    numbers: [V('dropoutV', 'Dropout', 100), A('maxCurrentA', 'Output current'), KW('thetaJcKPerW', 'θjc')],
    choices: [],
  },
  {
    id: 'core', label: 'Core', aliases: ['toroid'],
    numbers: [
      r('alHPerTurn2', num('AL', 'H', U.nHt2, 0, 1e-3, null, { exclusiveMin: true })),
      coreMm('outerDiameterM', 'Outer diameter'), coreMm('innerDiameterM', 'Inner diameter'),
      coreMm('heightM', 'Height'),
    ],
    choices: [],
  },
  {
    id: 'wire', label: 'Wire', aliases: ['enamelled wire', 'magnet wire'],
    // the filter form's wire range (0.05-5 mm over the enamel); a reel of at most 10 km
    numbers: [
      r('diameterM', num('Diameter over enamel', 'm', MM, 5e-5, 0.005, null, { exclusiveMin: true })),
      r('lengthM', num('Length', 'm', { symbol: 'm', scale: 1 }, 0, 10_000, null, { exclusiveMin: true })),
    ],
    choices: [],
  },
  { id: 'other', label: 'Other', aliases: [], numbers: [], choices: [] },
];

/** The category a stored category text stands for (its id, label or an older alias, any case); 'other' otherwise. */
export function categoryOf(category: string): CategoryDef {
  const c = category.trim().toLowerCase();
  return (
    PART_CATEGORIES.find((d) => d.id === c || d.label.toLowerCase() === c || d.aliases.includes(c)) ??
    PART_CATEGORIES[PART_CATEGORIES.length - 1]
  );
}

export interface ReadRatings {
  numbers: Record<string, number>;
  choices: Record<string, string>;
  /** Ratings of the category that are out of range or of the wrong kind, by key. */
  errors: FieldError[];
}

/** A part's ratings read through its category's fields: only known keys, each checked against its range. */
export function readRatings(part: Pick<Part, 'category' | 'ratings'>): ReadRatings {
  const def = categoryOf(part.category);
  const out: ReadRatings = { numbers: {}, choices: {}, errors: [] };
  for (const f of def.numbers) {
    const v = part.ratings[f.key];
    if (v === undefined) continue;
    const problem = typeof v === 'number' ? rangeProblem(v, f) : 'is not a number';
    if (problem) out.errors.push({ field: `ratings.${f.key}`, label: f.label, message: `${f.label} ${problem}` });
    else out.numbers[f.key] = v as number;
  }
  for (const c of def.choices) {
    const v = part.ratings[c.key];
    if (v === undefined) continue;
    const hit = typeof v === 'string' ? c.options.find((o) => o.toLowerCase() === v.trim().toLowerCase()) : undefined;
    if (hit === undefined) {
      out.errors.push({
        field: `ratings.${c.key}`,
        label: c.label,
        message: `${c.label} must be one of ${c.options.join(', ')}`,
      });
    } else out.choices[c.key] = hit;
  }
  return out;
}

/**
 * The ratings a category offers by name and unit, as a help line ("Capacitor: Capacitance (µF), Rated voltage (V),
 * …").
 */
export function ratingKeysHelp(category: string): string {
  const def = categoryOf(category);
  const names = [
    ...def.numbers.map((f) => `${f.label}${f.display.symbol ? ` (${f.display.symbol})` : ''}`),
    ...def.choices.map((c) => `${c.label} (${c.options.join('/')})`),
  ];
  return names.length ? `${def.label}: ${names.join(', ')}` : 'no rated fields for this category';
}
