// Form handling at the edge: display text -> SI numbers with zod, messages keyed by field name.
import { z } from 'zod';
import { parseValue, example } from '../core/units';

export type FieldErrors = Record<string, string>;
export type FormValues = Record<string, string>;

export interface NumOpts {
  label: string;
  min?: number;
  max?: number;
  /** lower bound is exclusive (value must be greater than min) */
  exclusiveMin?: boolean;
  integer?: boolean;
}

/** Required engineering value in `unit` (SI result), e.g. num('A', { label: 'Key-down current', min: 0, max: 100 }). */
export function num(unit: string, o: NumOpts) {
  return z.string({ message: `${o.label}: missing` }).transform((text, ctx) => {
    const r = parseValue(text, unit);
    if (!r.ok) {
      ctx.addIssue({ code: 'custom', message: `${o.label} ${r.message}` });
      return z.NEVER;
    }
    const v = r.value;
    const shown = (x: number) => `${x}${unit ? ' ' + unit : ''}`;
    if (o.integer && !Number.isInteger(v))
      ctx.addIssue({ code: 'custom', message: `${o.label} must be a whole number` });
    else if (o.min !== undefined && (o.exclusiveMin ? v <= o.min : v < o.min))
      ctx.addIssue({
        code: 'custom',
        message: `${o.label} must be ` +
          `${o.exclusiveMin ? 'more than' : 'at least'} ${shown(o.min)}${
            o.max !== undefined ? ` and at most ${shown(o.max)}` : ''
          }; you entered "${text.trim()}"`,
      });
    else if (o.max !== undefined && v > o.max)
      ctx.addIssue({
        code: 'custom',
        message: `${o.label} must be at most ${shown(o.max)}; you entered "${text.trim()}"`,
      });
    return v;
  });
}

/** Optional engineering value: an empty field means null ("not chosen yet" / "compute it"). */
export function optNum(unit: string, o: NumOpts) {
  return z
    .string()
    .optional()
    .transform((text, ctx) => {
      if (text === undefined || text.trim() === '') return null;
      const r = num(unit, o).safeParse(text);
      if (!r.success) {
        for (const i of r.error.issues) ctx.addIssue({ code: 'custom', message: i.message });
        return z.NEVER;
      }
      return r.data;
    });
}

/** Percent typed as "10" or "10 %" -> fraction 0.10. */
export function pct(o: NumOpts) {
  return num('%', o).transform((v) => v / 100);
}

/**
 * Single-line text (names): line breaks and control characters become spaces, ends trimmed. Multi-line fields
 * (notes, max > 1000) keep line breaks and the indentation of their first line: only blank lines before the
 * text and white space after it go.
 */
export const text = (label: string, max = 200, required = true) =>
  z
    .string({ message: `${label}: missing` })
    .transform((s) =>
      max > 1000
        ? s.replace(/^(?:[ \t]*\r?\n)+/, '').trimEnd()
        : s.replace(/[\u0000-\u001f\u007f\u2028\u2029]+/g, ' ').trim(),
    )
    .pipe(
      required
        ? z.string().min(1, `${label} must not be empty`).max(max, `${label} is longer than ${max} characters`)
        : z.string().max(max, `${label} is longer than ${max} characters`),
    );

export const choice = <const T extends readonly [string, ...string[]]>(label: string, options: T) =>
  z.enum(options, { message: `${label}: choose one of ${options.join(', ')}` });

/** A checkbox: unchecked sends nothing (or an empty value): false. */
export const checkbox = z.preprocess((v) => (v === '' ? undefined : v), z.stringbool().optional().default(false));

export const versionField = z.coerce.number({ message: 'version: missing; reload the page' }).int().min(1);

export type Parsed<T> = { ok: true; data: T } | { ok: false; errors: FieldErrors };

/** Run a zod object schema on form values; collect one message per field. */
export function parseForm<S extends z.ZodType>(schema: S, values: FormValues): Parsed<z.output<S>> {
  const r = schema.safeParse(values);
  if (r.success) return { ok: true, data: r.data };
  const errors: FieldErrors = {};
  for (const issue of r.error.issues) {
    const key = issue.path.map(String).join('.') || '_form';
    errors[key] ??= issue.message;
  }
  return { ok: false, errors };
}

export { example };
