// Every example a message offers fits its field; the inductance factor is also read per 100 turns; the labels a
// builder asked about say what they mean.
import { describe, expect, it } from 'vitest';
import {
  ALL_SPECS,
  lpfSpec,
  mainsSpec,
  paSpec,
  settingsSpec,
  rfSettingsSpec,
  type NumberField,
} from '../../../src/core/spec';
import { exampleText, readNumber } from '../../../src/core/spec/number-text';
import { FORM_ONLY_SPECS } from '../../../src/core/spec/form-only';
import { windingSpec } from '../../../src/core/spec/supply';

// the forms that store nothing (new project, sweeps) offer examples too; the mains boxes are drawn from mainsSpec's
// own fields (the settings spec holds optional copies of them)
const numberFields = [...ALL_SPECS, ...FORM_ONLY_SPECS, mainsSpec].flatMap((s) =>
  Object.entries(s.fields)
    .filter(([, f]) => f.type === 'number')
    .map(([k, f]) => [`${s.name}.${k}`, f as NumberField] as const),
);

describe('examples in messages', () => {
  it.each(numberFields)('%s: the example is a bare number in the box’s unit that the box accepts', (_key, f) => {
    const text = exampleText(f);
    const m = /such as (-?[\d.]+)/.exec(text);
    expect(m, text).not.toBeNull();
    // a bare number: no second unit after it ("a number in V such as 500 mV" read as a contradiction)
    expect(text.split(',')[0], text).toMatch(/such as -?[\d.]+$/);
    const r = readNumber(m![1], f);
    expect(r.ok, `${text}: ${r.ok ? '' : r.message}`).toBe(true);
  });

  it('kits and mains voltage offer examples of their own kind', () => {
    expect(exampleText(settingsSpec.fields.kits as NumberField)).toBe('a number such as 8');
    expect(exampleText(mainsSpec.fields.nominalV as NumberField)).toMatch(/^a number in V such as \d{3}$/);
  });
});

describe('core AL per 100 turns', () => {
  const al = lpfSpec.fields.coreAlHPerTurn2 as NumberField;
  // Source: iron-powder toroid data sheets state AL in µH per 100 turns, L = AL × (N / 100)²; so 49 µH/100 t is
  // 49e-6 H / 100² = 4.9e-9 H per turn² (unit arithmetic; 49 µH/100 t is a common mix-2 size-50 figure, from memory)
  it.each([
    ['49 µH/100t', 4.9e-9],
    ['49uH/100 turns', 4.9e-9],
    ['4.9', 4.9e-9],
    ['20 µH/100t', 2e-9],
  ])('"%s" is %s H/t²', (typed, henry) => {
    const r = readNumber(typed, al);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.value).toBeCloseTo(henry, 20);
  });

  // every AL box (the filter's and the core catalog's; any field in H/t²) reads the data-sheet form the same way
  const alFields = numberFields.filter(([, f]) => f.unit === 'H/t²');
  it.each(alFields)('%s reads 49 µH/100t as 4.9 nH/t²', (_key, f) => {
    const r = readNumber('49 µH/100t', f);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.value).toBeCloseTo(4.9e-9, 20);
  });
  it('the AL boxes include the core catalog and the filter', () => {
    expect(alFields.map(([k]) => k)).toEqual(expect.arrayContaining(['core.alHPerTurn2', 'lpf.coreAlHPerTurn2']));
  });

  it('a value per 100 turns outside the range is refused with the range, and the message offers both forms', () => {
    const r = readNumber('-3 µH/100t', al);
    expect(r.ok).toBe(false);
    expect(r.ok ? '' : r.message).toMatch(/must be more than/);
    const bad = readNumber('49 µH', al);
    expect(bad.ok ? '' : bad.message).toContain('or in µH per 100 turns such as 49 µH/100t');
  });
});

describe('labels', () => {
  it('the PA reference power says what it is for', () => {
    expect(paSpec.fields.referencePowerW.label).toBe('Reference power for dB and S-units');
  });

  it('labels a builder asked about name the trade quantity: RF output, kits to build, the PA output load, ' +
    'regulation', () => {
    expect(settingsSpec.fields.targetPowerW.label).toBe('Target RF output');
    expect(settingsSpec.fields.kits.label).toBe('Kits to build');
    expect(paSpec.fields.loadOhm.label).toBe('Output load (antenna side)');
    // Source: transformer data sheets state regulation as the rise from full load to no load (common practice)
    expect(windingSpec.fields.regulationFraction.help).toMatch(/full load to no load/);
  });

  it('the two duty settings each say what they are for and point to the other', () => {
    const heating = settingsSpec.fields.keyingDuty.help ?? '';
    const exposure = rfSettingsSpec.fields.exposureDutyFactor.help ?? '';
    expect(heating).toMatch(/heating/);
    expect(heating).toMatch(/mode duty factor \(RF page\)/);
    expect(exposure).toMatch(/RF exposure distance only/);
    expect(exposure).toMatch(/keying duty in the project settings/);
  });
});
