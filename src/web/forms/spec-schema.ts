// A spec as a zod schema for a submitted form (display text -> SI object), so every form edit goes through
// projectEdit's one path with messages keyed by the form field names.
import { z } from 'zod';
import type { Spec } from '../../core/spec/field';
import { parseForm } from '../../core/spec/derive';

export function specFormSchema<T>(spec: Spec) {
  return z.record(z.string(), z.string()).transform((values, ctx): T => {
    const r = parseForm(spec, values);
    if (r.ok) return r.value as T;
    for (const [path, message] of Object.entries(r.errors)) ctx.addIssue({ code: 'custom', path: [path], message });
    return z.NEVER;
  });
}
