// A spec as the zod schema of its object in the project file (SI values): the same limits as the forms and core.
import { z } from 'zod';
import type { Spec } from '../core/spec/field';
import { pick, validate } from '../core/spec/derive';

export function specFileSchema<T>(spec: Spec) {
  return z
    .record(z.string(), z.unknown(), { message: `${spec.label}: expected an object` })
    .superRefine((o, ctx) => {
      for (const e of validate(spec, o)) ctx.addIssue({ code: 'custom', path: e.field ? e.field.split('.') : [], message: e.message });
    })
    .transform((o) => pick(spec, o) as T);
}
