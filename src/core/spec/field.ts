// One definition per input: a field says its SI unit, the unit shown beside the box, its range, whether it may be
// empty, its label, help text and default. Forms, the project file, the database load and core's own checks are all
// derived from these definitions (see derive-*.ts), so a limit is written once.

/** The unit a builder reads and types: a bare number typed in the box is read in this unit. */
export interface DisplayUnit {
  symbol: string; // shown beside the box: 'mA', 'µF', '%', 'V'
  scale: number; // SI value of one display unit: mA -> 1e-3, µF -> 1e-6, % -> 0.01
}

interface Base {
  label: string; // the field's name in words, used in every message about it
  help?: string; // one line shown under the box
  /** form field name when it differs from the model key (kept stable for existing pages and saved links) */
  form?: string;
}

export interface NumberField extends Base {
  type: 'number';
  unit: string; // SI unit symbol the parser understands after a number ('A', 'F', 'V', 'Ω', 'Hz', '%', '')
  display: DisplayUnit;
  min: number; // SI
  max: number; // SI
  exclusiveMin?: boolean; // the value must be greater than min
  integer?: boolean;
  /** money: stored as integer minor units (cents, unit ''), typed in the major unit with at most two decimals */
  money?: boolean;
  /** money only: the decimals of the box, the currency's ISO 4217 minor unit (JPY 0, KWD 3); absent = 2 */
  moneyDigits?: number;
  optional?: boolean; // an empty box is stored as null (meaning "not chosen yet" / "compute it")
  /** an empty box means this value (said in the help line: "empty = none drawn"); the stored value is a number */
  emptyAs?: number;
  default: number | null;
  example?: string; // an example in the display unit, e.g. '350' or '4700'
}

export interface ChoiceField extends Base {
  type: 'choice';
  options: readonly (readonly [string, string])[]; // [stored value, text shown]
  default: string;
}

/** A text box whose stored value is not the text itself (a list, a table): both directions and the stored check. */
/** What a codec may need of the object it is part of: the decimals of its money amounts (absent = 2). */
export interface CodecContext {
  moneyDigits?: number;
}

export interface TextCodec {
  toText: (stored: unknown, ctx?: CodecContext) => string;
  /** the stored value of typed text, or a message (without the label) saying what is wrong and where */
  fromText: (text: string, ctx?: CodecContext) => { ok: true; value: unknown } | { ok: false; message: string };
  /** what is wrong with a stored value ('' when fine), without the label */
  check: (stored: unknown) => string;
}

export interface TextField extends Base {
  type: 'text';
  max: number;
  required: boolean;
  multiline?: boolean;
  /** typed text is upper-cased ('usd' -> 'USD'); stored text must already be upper case */
  upper?: boolean;
  /** what the whole text must match, and the rest of the sentence saying so ('must be a three-letter code …') */
  pattern?: { re: RegExp; says: string };
  /** the stored value is structured (max then counts the characters of it written out) */
  codec?: TextCodec;
  default: string;
}

export interface BoolField extends Base {
  type: 'bool';
  default: boolean;
}

/** An id of another item of the project (a rail, a stage); existence is checked against the project. */
export interface RefField extends Base {
  type: 'ref';
  to: 'rail' | 'winding' | 'stage' | 'part' | 'role' | 'core';
  optional?: boolean;
  default: string | null;
}

export type Field = NumberField | ChoiceField | TextField | BoolField | RefField;

export interface FieldError {
  field: string; // model key path, e.g. 'mount.thetaSaKPerW'
  label: string;
  message: string; // a sentence naming the field
}

export interface Spec {
  name: string; // stable id, e.g. 'relay'
  label: string; // what the object is, in words: 'T/R relay data'
  fields: Record<string, Field>; // model key path -> field
  /** rules across fields (odd filter order, one of two values given); messages name the field */
  refine?: (value: Record<string, unknown>) => FieldError[];
  /** for a spec drawn once per row of a table: the form name of field `key` in row `row` */
  rowName?: (row: number, key: string) => string;
  /** where the stored shape differs from the fields (three checkboxes for a list of modes): stored <-> fields */
  view?: {
    from: (stored: Record<string, unknown>) => Record<string, unknown>;
    to: (fields: Record<string, unknown>) => Record<string, unknown>;
  };
  /**
   * Decimals of the object's money boxes (its currency's ISO 4217 minor unit), read from the stored object or from the
   * submitted form text; absent = 2. Money fields and codecs of the spec are written and read with these decimals.
   */
  moneyDigits?: (obj: Record<string, unknown>) => number;
}

export const defineSpec = <S extends Spec>(spec: S): S => spec;

/** The form name of a field (the model key unless the spec names another). */
export const formName = (key: string, f: Field): string => f.form ?? key;

// Display units used across the specs.
export const U = {
  V: { symbol: 'V', scale: 1 },
  mV: { symbol: 'mV', scale: 1e-3 },
  A: { symbol: 'A', scale: 1 },
  mA: { symbol: 'mA', scale: 1e-3 },
  W: { symbol: 'W', scale: 1 },
  ohm: { symbol: 'Ω', scale: 1 },
  uF: { symbol: 'µF', scale: 1e-6 },
  pF: { symbol: 'pF', scale: 1e-12 },
  nHt2: { symbol: 'nH/t²', scale: 1e-9 },
  Hz: { symbol: 'Hz', scale: 1 },
  MHz: { symbol: 'MHz', scale: 1e6 },
  ms: { symbol: 'ms', scale: 1e-3 },
  ns: { symbol: 'ns', scale: 1e-9 },
  s: { symbol: 's', scale: 1 },
  pct: { symbol: '%', scale: 0.01 },
  KW: { symbol: '°C/W', scale: 1 },
  C: { symbol: '°C', scale: 1 },
  dB: { symbol: 'dB', scale: 1 },
  dBi: { symbol: 'dBi', scale: 1 },
  dBc: { symbol: 'dBc', scale: 1 },
  Ah: { symbol: 'Ah', scale: 1 },
  none: { symbol: '', scale: 1 },
  wpm: { symbol: 'WPM', scale: 1 },
  deg: { symbol: '°', scale: 1 },
} as const satisfies Record<string, DisplayUnit>;
