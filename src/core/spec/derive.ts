// Everything derived from a spec: the check of a stored (SI) object, the form text of an object, the parse of a
// submitted form back to SI, and the defaults of a new object. Pure; the zod wrappers live at the edges.
import type { CodecContext, Field, FieldError, Spec, TextField } from './field';
import { formName } from './field';
import { numberText, rangeProblem, readNumber } from './number-text';

type Obj = Record<string, unknown>;

export function getPath(obj: unknown, path: string): unknown {
  let v: unknown = obj;
  for (const k of path.split('.')) v = v !== null && typeof v === 'object' ? (v as Obj)[k] : undefined;
  return v;
}

export function setPath(obj: Obj, path: string, value: unknown): void {
  const keys = path.split('.');
  let o = obj;
  for (const k of keys.slice(0, -1)) o = (o[k] ??= {}) as Obj;
  o[keys[keys.length - 1]] = value;
}

// names are one line: line breaks and control characters would break netlists, CSV and PDF lines
const CONTROL = /[\u0000-\u001f\u007f\u2028\u2029]/;

/** What is wrong with a stored value (SI), or '' when it is fine. */
export function storedProblem(f: Field, v: unknown): string {
  if (v === null || v === undefined) {
    if (f.type === 'number' || f.type === 'ref') return f.optional ? '' : 'is missing';
    return 'is missing';
  }
  switch (f.type) {
    case 'number':
      return typeof v !== 'number' ? `is not a number (${JSON.stringify(v).slice(0, 40)})` : rangeProblem(v, f);
    case 'choice':
      return f.options.some(([o]) => o === v) ? '' : `must be one of ${f.options.map(([o]) => o).join(', ')}`;
    case 'text':
      if (f.codec) {
        const problem = f.codec.check(v);
        if (problem) return `: ${problem}`; // validate() writes "Label: problem"
        return f.codec.toText(v).length > f.max ? `is longer than ${f.max} characters when written out` : '';
      }
      if (typeof v !== 'string') return 'is not text';
      if (f.required && v.trim() === '') return 'must not be empty';
      if (f.pattern && v !== '' && !f.pattern.re.test(v)) return f.pattern.says;
      if (v.length > f.max) return `is longer than ${f.max} characters`;
      return !f.multiline && CONTROL.test(v) ? 'must be one line of text without control characters' : '';
    case 'bool':
      return typeof v === 'boolean' ? '' : 'must be true or false';
    case 'ref':
      return typeof v === 'string' && v.length > 0 && v.length <= 80 ? '' : 'is not a valid reference';
  }
}

/** Check a stored object against its spec: one message per bad field, naming it. */
export function validate(spec: Spec, stored: unknown): FieldError[] {
  if (stored === null || typeof stored !== 'object')
    return [{ field: '', label: spec.label, message: `${spec.label} is missing` }];
  const obj = spec.view ? spec.view.from(stored as Obj) : stored;
  const errors: FieldError[] = [];
  for (const [key, f] of Object.entries(spec.fields)) {
    const problem = storedProblem(f, getPath(obj, key));
    if (problem)
      errors.push({ field: key, label: f.label, message: `${f.label}${problem.startsWith(':') ? '' : ' '}${problem}` });
  }
  // rules across fields also run on a partly bad object (they check types themselves): report every problem once
  for (const e of spec.refine?.(obj as Obj) ?? []) if (!errors.some((x) => x.field === e.field)) errors.push(e);
  return errors;
}

/** The form text of a stored object: what the boxes show, parsing back to the same values. */
export function formValues(spec: Spec, stored: unknown): Record<string, string> {
  const obj = spec.view && stored ? spec.view.from(stored as Obj) : stored;
  const out: Record<string, string> = {};
  const ctx = moneyContext(spec, stored);
  for (const [key, f0] of Object.entries(spec.fields)) {
    const f = withMoney(f0, ctx);
    const v = getPath(obj, key);
    const name = formName(key, f);
    if (f.type === 'number') out[name] = typeof v === 'number' ? numberText(v, f) : '';
    else if (f.type === 'bool') out[name] = v === true ? 'true' : '';
    else if (f.type === 'text' && f.codec) out[name] = v === null || v === undefined ? '' : f.codec.toText(v, ctx);
    else out[name] = typeof v === 'string' ? v : '';
  }
  return out;
}

export type FormParse = { ok: true; value: Obj } | { ok: false; errors: Record<string, string> };

/** Read one submitted field; the message names the field. */
/** The decimals of an object's money (spec.moneyDigits), for its money fields and codecs; {} when the spec has none. */
function moneyContext(spec: Spec, obj: unknown): CodecContext {
  return spec.moneyDigits && obj !== null && typeof obj === 'object'
    ? { moneyDigits: spec.moneyDigits(obj as Obj) }
    : {};
}
const withMoney = (f: Field, ctx: CodecContext): Field =>
  f.type === 'number' && f.money && ctx.moneyDigits !== undefined ? { ...f, moneyDigits: ctx.moneyDigits } : f;

export function readField(
  f: Field,
  raw: string | undefined,
  ctx: CodecContext = {},
): { ok: true; value: unknown } | { ok: false; message: string } {
  const text = raw ?? '';
  switch (f.type) {
    case 'number': {
      if (text.trim() === '') {
        if (f.emptyAs !== undefined) return { ok: true, value: f.emptyAs };
        return f.optional ? { ok: true, value: null } : { ok: false, message: `${f.label} is empty: enter a value` };
      }
      const r = readNumber(text, f);
      return r.ok ? r : { ok: false, message: `${f.label} ${r.message}` };
    }
    case 'choice':
      return f.options.some(([o]) => o === text)
        ? { ok: true, value: text }
        : { ok: false, message: `${f.label}: choose one of ${f.options.map(([, t]) => t).join(', ')}` };
    case 'text': {
      const typed = f.multiline
        ? text.replace(/^(?:[ \t]*\r?\n)+/, '').trimEnd()
        : text.replace(/[\u0000-\u001f\u007f\u2028\u2029]+/g, ' ').trim();
      const v = f.upper ? typed.toUpperCase() : typed;
      if (f.required && v === '') return { ok: false, message: `${f.label} must not be empty` };
      // the pattern says what is expected, which is more use than a length
      if (f.pattern && v !== '' && !f.pattern.re.test(v))
        return { ok: false, message: `${f.label} ${f.pattern.says}; you entered "${typed}"` };
      if (v.length > f.max) return { ok: false, message: `${f.label} is longer than ${f.max} characters` };
      if (f.codec) {
        const r = f.codec.fromText(v, ctx);
        return r.ok ? r : { ok: false, message: `${f.label}: ${r.message}` };
      }
      return { ok: true, value: v };
    }
    case 'bool':
      return ['', 'false', 'off', '0'].includes(text.trim()) ? { ok: true, value: false } : { ok: true, value: true };
    case 'ref':
      if (text === '') return f.optional ? { ok: true, value: null } : { ok: false, message: `${f.label}: choose one` };
      return { ok: true, value: text };
  }
}

/** Parse a submitted form into an SI object; errors are keyed by form field name. */
export function parseForm(spec: Spec, values: Record<string, string | undefined>): FormParse {
  const value: Obj = {};
  const errors: Record<string, string> = {};
  const ctx = moneyContext(spec, values);
  for (const [key, f0] of Object.entries(spec.fields)) {
    const f = withMoney(f0, ctx);
    const r = readField(f, values[formName(key, f)], ctx);
    if (r.ok) setPath(value, key, r.value);
    else errors[formName(key, f)] = r.message;
  }
  if (Object.keys(errors).length) return { ok: false, errors };
  for (const e of spec.refine?.(value) ?? [])
    errors[spec.fields[e.field] ? formName(e.field, spec.fields[e.field]) : '_form'] ??= e.message;
  return Object.keys(errors).length
    ? { ok: false, errors }
    : { ok: true, value: spec.view ? spec.view.to(value) : value };
}

/** A structured field's default is written as text in the spec ('' = an empty list): its stored value. */
function codecDefault(f: TextField): unknown {
  const r = f.codec!.fromText(f.default);
  if (!r.ok) throw new Error(`default of ${f.label} does not parse: ${r.message}`);
  return r.value;
}

/** A new object's starting values. */
export function defaults(spec: Spec): Obj {
  const value: Obj = {};
  for (const [key, f] of Object.entries(spec.fields))
    setPath(value, key, f.type === 'text' && f.codec ? codecDefault(f) : f.default);
  return spec.view ? spec.view.to(value) : value;
}

/** Only the spec's fields of a stored object (unknown keys dropped), in its stored shape. */
export function pick(spec: Spec, stored: unknown): Obj {
  const obj = spec.view && stored ? spec.view.from(stored as Obj) : stored;
  const value: Obj = {};
  for (const key of Object.keys(spec.fields)) setPath(value, key, getPath(obj, key) ?? null);
  return spec.view ? spec.view.to(value) : value;
}
