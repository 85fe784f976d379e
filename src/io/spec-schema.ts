// A spec as the zod schema of its object in the project file (SI values): the same limits as the forms and core.
import { z } from 'zod';
import type { Field, Spec } from '../core/spec/field';
import { pick, storedProblem, validate } from '../core/spec/derive';

export function specFileSchema<T>(spec: Spec) {
  return z
    .record(z.string(), z.unknown(), { message: `${spec.label}: expected an object` })
    .superRefine((o, ctx) => {
      for (const e of validate(spec, o))
        ctx.addIssue({ code: 'custom', path: e.field ? e.field.split('.') : [], message: e.message });
    })
    .transform((o) => pick(spec, o) as T);
}

/** One field of a spec as a zod schema of its stored (SI) value, for objects only partly described by a spec. */
export function specValueSchema(f: Field) {
  return z.unknown().superRefine((v, ctx) => {
    const problem = storedProblem(f, v);
    if (problem) ctx.addIssue({ code: 'custom', message: `${f.label}${problem.startsWith(':') ? '' : ' '}${problem}` });
  });
}

/** The fields of a spec as a zod object shape (top-level keys only), to spread into a larger z.object. */
export function specShape(spec: Spec): Record<string, z.ZodType> {
  return Object.fromEntries(Object.entries(spec.fields).map(([k, f]) => [k, specValueSchema(f)]));
}
