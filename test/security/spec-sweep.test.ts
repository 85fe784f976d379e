// Every field of every input spec (src/core/spec, ALL_SPECS and FORM_ONLY_SPECS) against bad input: each refused form
// text names the
// field, each refused stored value names it too. Generated from the specs: a spec added later is swept unchanged.
// Expected behaviour is the brief's rule (every bad input gets a message saying what and where); no numbers here
// come from running the program.
import { describe, expect, it } from 'vitest';
import { ALL_SPECS, defaults, formValues, parseForm, relaySpec, validate } from '../../src/core/spec';
import { formName, type Spec } from '../../src/core/spec/field';
import { badStored, badTexts } from '../helpers/spec-bad-values';
import { getPath, setPath } from '../../src/core/spec/derive';
import { FORM_ONLY_SPECS } from '../../src/core/spec/form-only';

/** A valid stored object: the spec's defaults with references pointing somewhere. */
function validObject(spec: Spec): Record<string, unknown> {
  const v = defaults(spec);
  const fields = spec.view ? spec.view.from(v) : v;
  for (const [k, f] of Object.entries(spec.fields)) if (f.type === 'ref' && !f.optional) setPath(fields, k, 'some-id');
  // a required text whose default is empty (the new project's name) gets a name
  for (const [k, f] of Object.entries(spec.fields))
    if (f.type === 'text' && f.required && getPath(fields, k) === '') setPath(fields, k, 'A name');
  return spec.view ? spec.view.to(fields) : fields;
}

describe('relay coil modes (stored as a list, edited as three checkboxes)', () => {
  it.each([['x'], [['receive', 'sleep']], [null]])('a stored list %j is refused, naming the coil fields', (bad) => {
    const relay = { ...validObject(relaySpec), coilModes: bad };
    const errors = validate(relaySpec, relay);
    expect(errors.length).toBeGreaterThan(0);
    expect(errors[0].message).toContain('Coil energised');
  });
});

// the forms that store nothing (new project, sweeps) are swept with the stored objects' specs
describe.each([...ALL_SPECS, ...FORM_ONLY_SPECS].map((s) => [s.name, s] as const))('spec %s', (_name, spec) => {
  it('its defaults are valid and survive form text and back unchanged', () => {
    const obj = validObject(spec);
    expect(validate(spec, obj)).toEqual([]);
    const back = parseForm(spec, formValues(spec, obj));
    expect(back).toEqual({ ok: true, value: obj });
  });

  for (const [key, f] of Object.entries(spec.fields)) {
    const texts = badTexts(f);
    if (texts.length)
      it.each(texts)(`form field ${key} refuses %j (%s) with a message naming it`, (bad) => {
        const values = { ...formValues(spec, validObject(spec)), [formName(key, f)]: bad };
        const r = parseForm(spec, values);
        expect(r.ok).toBe(false);
        if (!r.ok) expect(r.errors[formName(key, f)]).toContain(f.label);
      });

    // a field the stored shape does not hold (relay checkboxes drawn from its list of modes) is swept below
    if (getPath(validObject(spec), key) === undefined) continue;
    it.each(badStored(f))(`stored ${key} = %j (%s) is refused by name`, (bad) => {
      const obj = structuredClone(validObject(spec));
      setPath(obj, key, bad);
      const errors = validate(spec, obj);
      expect(errors.map((e) => e.field)).toContain(key);
      expect(errors.find((e) => e.field === key)?.message).toContain(f.label);
    });
  }
});
