// Short constructors for spec fields, so a spec reads as a table.
import type { BoolField, ChoiceField, DisplayUnit, NumberField, RefField, TextField } from './field';

type NumOpts = Partial<Omit<NumberField, 'type' | 'label' | 'unit' | 'display' | 'min' | 'max' | 'default'>>;

/** A number: label, SI unit, display unit, range (SI), default (SI; null = empty). */
export const num = (
  label: string,
  unit: string,
  display: DisplayUnit,
  min: number,
  max: number,
  def: number | null,
  o: NumOpts = {},
): NumberField => ({
  type: 'number',
  label,
  unit,
  display,
  min,
  max,
  default: def,
  ...o,
});

/** A number that may be left empty (stored as null). */
export const optNum = (
  label: string,
  unit: string,
  display: DisplayUnit,
  min: number,
  max: number,
  def: number | null,
  o: NumOpts = {},
) => num(label, unit, display, min, max, def, { ...o, optional: true });

export const choice = (
  label: string,
  options: readonly (readonly [string, string])[],
  def: string,
  o: Partial<ChoiceField> = {},
): ChoiceField => ({
  type: 'choice',
  label,
  options,
  default: def,
  ...o,
});

export const text = (
  label: string,
  max: number,
  required: boolean,
  def = '',
  o: Partial<TextField> = {},
): TextField => ({
  type: 'text',
  label,
  max,
  required,
  default: def,
  ...o,
});

export const bool = (label: string, def: boolean, o: Partial<BoolField> = {}): BoolField => ({
  type: 'bool',
  label,
  default: def,
  ...o,
});

export const ref = (label: string, to: RefField['to'], optional: boolean, o: Partial<RefField> = {}): RefField => ({
  type: 'ref',
  label,
  to,
  optional,
  default: null,
  ...o,
});
