// A spec as a zod schema for a submitted form (display text -> SI object), so every form edit goes through
// projectEdit's one path with messages keyed by the form field names.
import { z } from 'zod';
import { formName, type Spec } from '../../core/spec/field';
import { parseForm } from '../../core/spec/derive';

export function specFormSchema<T>(spec: Spec) {
  const schema = z.record(z.string(), z.string()).transform((values, ctx): T => {
    const r = parseForm(spec, values);
    if (r.ok) return r.value as T;
    for (const [path, message] of Object.entries(r.errors)) ctx.addIssue({ code: 'custom', path: [path], message });
    return z.NEVER;
  });
  FORM_SPECS.set(schema, spec);
  return schema;
}

/** The spec behind a form schema made here, so messages about its fields can use their labels. */
const FORM_SPECS = new WeakMap<object, Spec>();

/** Name the spec whose labels a hand-made form schema's fields have (a form drawn from several specs). */
export function labelFormSchema<S extends object>(schema: S, spec: Spec): S {
  FORM_SPECS.set(schema, spec);
  return schema;
}

/** A form field's label in words (the field name itself when the schema has no spec). */
export function fieldLabel(schema: object, name: string): string {
  const spec = FORM_SPECS.get(schema);
  const entry = spec && Object.entries(spec.fields).find(([k, f]) => formName(k, f) === name);
  return entry ? entry[1].label : name;
}
