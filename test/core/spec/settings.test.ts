// Project settings, mains, the new-project form and the RF settings: one spec each. Round trips of both demo
// projects (form text -> parse gives back the same object), and the one limit per field that the forms, the project
// file and core's checks now share. Expected values are hand-worked; no value comes from running the program.
import { describe, expect, it } from 'vitest';
import { club30m } from '../../../seed-demo/club-30m';
import { portable20m } from '../../../seed-demo/portable-20m';
import type { Project } from '../../../src/core/model';
import type { Spec } from '../../../src/core/spec/field';
import { defaults, formValues, parseForm, pick, validate } from '../../../src/core/spec/derive';
import {
  mainsSpec,
  newProjectSpec,
  settingsSpec,
  NEW_PROJECT_BANDS,
  MAINS_PRESETS,
} from '../../../src/core/spec/settings';
import { rfSettingsSpec } from '../../../src/core/spec/rf-settings';
import { applySettings, applyRfSettings } from '../../../src/core/edits/settings';
import { validateRfInputs, validateRfSettings, validateThermalInputs } from '../../../src/core/rf/lpf-validate';
import { parseProjectFile, toProjectFile } from '../../../src/io/project-file';
import { newProject } from '../../../src/core/new-project';
import { designLpf } from '../../../src/core/rf/lpf-design';

const DEMOS: Project[] = [club30m, portable20m];

function roundTrip(spec: Spec, stored: unknown) {
  const values = formValues(spec, stored);
  const back = parseForm(spec, values);
  expect(back, JSON.stringify(values)).toEqual({ ok: true, value: pick(spec, stored) });
  expect(validate(spec, stored)).toEqual([]);
  return values;
}

describe('round trips of the demo projects', () => {
  for (const p of DEMOS) {
    it(`${p.id}: settings, mains and RF settings come back unchanged`, () => {
      roundTrip(settingsSpec, p);
      if (p.mains) roundTrip(mainsSpec, p.mains);
      roundTrip(rfSettingsSpec, p.rf);
      // the settings form saved unchanged leaves the project as it was (name through currency, mains included)
      const parsed = parseForm(settingsSpec, formValues(settingsSpec, p));
      if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
      expect(applySettings(p, parsed.value as never)).toEqual(p);
      const rf = parseForm(rfSettingsSpec, formValues(rfSettingsSpec, p.rf));
      if (!rf.ok) throw new Error(JSON.stringify(rf.errors));
      expect(applyRfSettings(p, rf.value as never)).toEqual(p);
    });
  }

  it('the battery demo has no mains: the form says "dc", shows empty mains boxes, and saving keeps mains null', () => {
    const values = formValues(settingsSpec, portable20m);
    expect(values.supplyKind).toBe('dc');
    // empty boxes: figures there would read as a mains supply the station does not have
    expect([values.mainsV, values.mainsHz, values.mainsLow, values.mainsHigh]).toEqual(['', '', '', '']);
    expect(parseForm(settingsSpec, values)).toMatchObject({ ok: true, value: { mains: null } });
  });
});

describe('settings form: display units and messages', () => {
  const form = formValues(settingsSpec, club30m);

  it('shows the frequency in MHz and reads a bare number there', () => {
    // club demo: 10.11 MHz (seed-demo/club-30m.ts)
    expect(form.frequency).toBe('10.11');
    expect(parseForm(settingsSpec, { ...form, frequency: '7.03' })).toMatchObject({
      ok: true,
      value: { frequencyHz: 7.03e6 },
    });
    expect(parseForm(settingsSpec, { ...form, frequency: '7030 kHz' })).toMatchObject({
      ok: true,
      value: { frequencyHz: 7.03e6 },
    });
    const hz = parseForm(settingsSpec, { ...form, frequency: '7030000' });
    expect(hz.ok).toBe(false);
    if (!hz.ok) expect(hz.errors.frequency).toContain('did you mean 7030000 Hz?');
  });

  it('refuses a mains tolerance over 50 % naming the field', () => {
    const r = parseForm(settingsSpec, { ...form, mainsLow: '80' });
    expect(r).toEqual({
      ok: false,
      errors: { mainsLow: 'Low mains tolerance must be at least 0 % and at most 50 %; you entered "80"' },
    });
  });

  it('a battery / DC station may leave the mains boxes empty; a mains station may not', () => {
    const empty = { ...form, mainsV: '', mainsHz: '', mainsLow: '', mainsHigh: '' };
    expect(parseForm(settingsSpec, { ...empty, supplyKind: 'dc' })).toMatchObject({ ok: true, value: { mains: null } });
    const r = parseForm(settingsSpec, { ...empty, supplyKind: 'mains' });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.mainsV).toContain('Mains nominal voltage is empty');
  });

  it('upper-cases a currency code and refuses anything but three letters', () => {
    expect(parseForm(settingsSpec, { ...form, currency: ' eur ' })).toMatchObject({
      ok: true,
      value: { currency: 'EUR' },
    });
    const r = parseForm(settingsSpec, { ...form, currency: 'dollars' });
    expect(r).toEqual({
      ok: false,
      errors: { currency: 'Project currency must be a three-letter code such as USD or EUR; you entered "dollars"' },
    });
  });
});

describe('one limit per field: forms, project file and core agree', () => {
  const fileWith = (edit: (p: Project) => void) => {
    const p = structuredClone(club30m);
    edit(p);
    return parseProjectFile(toProjectFile(p, '2026-12-01T00:00:00.000Z'));
  };

  it('feedline loss: 30 dB is the limit everywhere (form and file allowed 100 dB, core 30 dB)', () => {
    const form = formValues(rfSettingsSpec, club30m.rf);
    expect(parseForm(rfSettingsSpec, { ...form, feedlineLoss: '30' }).ok).toBe(true);
    expect(parseForm(rfSettingsSpec, { ...form, feedlineLoss: '31' })).toEqual({
      ok: false,
      errors: { feedlineLoss: 'Feedline loss must be at least 0 dB and at most 30 dB; you entered "31"' },
    });
    expect(validateRfSettings({ ...club30m.rf, feedlineLossDb: 31 }).map((e) => e.field)).toEqual(['feedlineLossDb']);
    expect(validateRfSettings({ ...club30m.rf, feedlineLossDb: 30 })).toEqual([]);
    const file = fileWith((p) => (p.rf.feedlineLossDb = 50));
    expect(file).toEqual({
      ok: false,
      errors: ['project.rf.feedlineLossDb: Feedline loss must be at least 0 dB and at most 30 dB'],
    });
  });

  it('frequency 100 kHz–60 MHz and target power 1 mW–2 kW in core as in the forms and file', () => {
    // core allowed 10 kHz–1 GHz and up to 10 kW before; the forms and file never did
    expect(validateRfInputs(1e9, 10)).toMatchObject([{ field: 'frequencyHz', label: 'Operating frequency' }]);
    expect(validateRfInputs(60e6, 2000)).toEqual([]);
    expect(validateRfInputs(10.11e6, 5000)).toMatchObject([{ field: 'targetPowerW' }]);
    // 5e-324 W is below the 1 mW floor (it printed "Infinity dB" once)
    expect(validateRfInputs(10.11e6, 5e-324)).toMatchObject([
      { field: 'targetPowerW', message: 'Target RF output must be at least 1 mW and at most 2 kW' },
    ]);
    expect(fileWith((p) => (p.targetPowerW = 5e-324))).toMatchObject({
      ok: false,
      errors: ['project.targetPowerW: Target RF output must be at least 1 mW and at most 2 kW'],
    });
    expect(fileWith((p) => (p.frequencyHz = 100e6))).toMatchObject({
      ok: false,
      errors: [expect.stringMatching(/^project\.frequencyHz: Operating frequency must be at least 100 kHz/)],
    });
    // the filter design checks the operating frequency with the same field (it allowed 10 kHz–1 GHz before)
    const filter = club30m.stages.find((s) => s.lpf)!.lpf!;
    expect(designLpf(filter, 100e6)).toMatchObject({
      ok: false,
      errors: [
        {
          field: 'frequencyHz',
          message: expect.stringMatching(/^Operating frequency must be at least 100 kHz and at most 60 MHz/),
        },
      ],
    });
    expect(designLpf(filter, 10.11e6).ok).toBe(true);
  });

  it('ambient −40–70 °C and keying duty 0–100 % in core as in the forms and file', () => {
    expect(validateThermalInputs(70, 1)).toEqual([]);
    expect(validateThermalInputs(100, 0.4)).toMatchObject([
      { field: 'ambientC', message: 'Ambient temperature must be at least -40 °C and at most 70 °C' },
    ]);
    expect(validateThermalInputs(25, 1.5)).toMatchObject([{ field: 'keyingDuty' }]);
    expect(fileWith((p) => (p.ambientC = 100))).toMatchObject({
      ok: false,
      errors: [expect.stringMatching(/^project\.ambientC: Ambient temperature/)],
    });
  });

  it('the file refuses mains outside the form limits and a lower-case currency, naming the place', () => {
    expect(fileWith((p) => (p.mains = { ...p.mains!, lowFraction: 0.8 }))).toMatchObject({
      ok: false,
      errors: ['project.mains.lowFraction: Low mains tolerance must be at least 0 % and at most 50 %'],
    });
    expect(fileWith((p) => (p.currency = 'usd'))).toMatchObject({
      ok: false,
      errors: ['project.currency: Project currency must be a three-letter code such as USD or EUR'],
    });
    expect(fileWith((p) => (p.mains = null)).ok).toBe(true);
  });
});

describe('new project', () => {
  it('starts from the spec defaults and creates what the form says', () => {
    const values = formValues(newProjectSpec, defaults(newProjectSpec));
    // the default band must be one of the choices, so the select shows it
    expect(NEW_PROJECT_BANDS.map(([v]) => v)).toContain(values.band);
    const r = parseForm(newProjectSpec, {
      ...values,
      name: '40 m QRP',
      band: '7.03',
      power: '5 W',
      mains: 'battery',
      template: '',
    });
    expect(r).toEqual({
      ok: true,
      value: { name: '40 m QRP', frequencyHz: 7.03e6, targetPowerW: 5, mains: null, template: '' },
    });
    const mains = parseForm(newProjectSpec, { ...values, name: 'x', mains: '120-60' });
    expect(mains).toMatchObject({ ok: true, value: { mains: MAINS_PRESETS['120-60'] } });
  });

  it('a template that runs from the mains refuses a battery supply, and the battery template a mains one, by ' +
    'field', () => {
    const base = { name: 'x', band: '7.03', power: '5' };
    const mainsTpl = parseForm(newProjectSpec, { ...base, mains: 'battery', template: 'mains-two-rail' });
    expect(mainsTpl).toMatchObject({ ok: false, errors: { mains: expect.stringContaining('runs from the mains') } });
    const batteryTpl = parseForm(newProjectSpec, { ...base, mains: '230-50', template: 'battery-portable' });
    expect(batteryTpl).toMatchObject({
      ok: false,
      errors: { mains: expect.stringContaining('runs from its battery') },
    });
    expect(parseForm(newProjectSpec, { ...base, mains: 'battery', template: 'battery-portable' })).toMatchObject({
      ok: true,
      value: { mains: null },
    });
    // a form without the template box (older pages, scripts) starts an empty project
    expect(parseForm(newProjectSpec, { ...base, mains: '230-50' })).toMatchObject({
      ok: true,
      value: { template: '' },
    });
  });

  it('every band choice parses to its frequency', () => {
    for (const [text] of NEW_PROJECT_BANDS)
      expect(parseForm(newProjectSpec, { name: 'x', band: text, power: '5', mains: '230-50' }).ok).toBe(true);
  });

  it("a new project's settings and RF settings pass their specs", () => {
    const p = newProject('p1', 'Fresh', 14.06e6, 5, MAINS_PRESETS['230-50']);
    expect(validate(settingsSpec, p)).toEqual([]);
    expect(validate(rfSettingsSpec, p.rf)).toEqual([]);
    // Source: FCC OET Bulletin 65 Supplement B (1997), Table 2: conversational CW duty factor 40 %
    expect(p.keyingDuty).toBe(0.4);
    expect(p.rf.exposureDutyFactor).toBe(0.4);
  });
});
