// The project settings (name, notes, frequency, target power, mains, ambient, duty, kits, currency), the mains
// object on its own (the project file), and the new-project form. One limit per field; see the notes beside each.
import type { Mains, Project } from '../model';
import { formatValue } from '../units';
import { bandOf } from '../rf/bands';
import { defineSpec, U, type FieldError, type NumberField } from './field';
import { defaults, formValues, getPath } from './derive';
import { choice, num, text } from './make';
import { numberText } from './number-text';
import { TEMPLATE_INFO, TEMPLATE_OPTIONS, type TemplateKey } from '../templates/choices';
import { mainsWithStandardCorners } from '../rules/rule-set';

/**
 * Smallest target power, W: the PA divides by it (load line, dB from target), and a subnormal such as 5e-324 W passed
 * `> 0` and gave "Infinity dB". Common practice, no published source: 1 mW (0 dBm) is below any transmitter built here.
 */
export const MIN_TARGET_POWER_W = 1e-3;

/**
 * Mains supplies a new project can start from; 'battery' = a battery / DC-only station (no mains). The corners come
 * from the standard of the rule set the preset starts with (rules/rule-set.ts): 230 V IEC 60038 ±10 %; 120 V / 60 Hz
 * ANSI C84.1 Range B utilization 106–127 V (−11.7 % / +5.8 %, from memory); 100 V takes the ITU / CEPT rule set's
 * ±10 % (no standard for 100 V mains is in the rule sets). Stored projects keep the corners they were saved with.
 */
export const MAINS_PRESETS: Record<string, Mains | null> = {
  '230-50': mainsWithStandardCorners(230, 50),
  '120-60': mainsWithStandardCorners(120, 60),
  '100-50': mainsWithStandardCorners(100, 50),
  battery: null,
};
const PRESET_TEXT: Record<string, string> = {
  '230-50': 'Mains 230 V 50 Hz',
  '120-60': 'Mains 120 V 60 Hz',
  '100-50': 'Mains 100 V 50 Hz',
  battery: 'Battery / external DC',
};

// Limits: the forms and the project file agreed on these; core's own checks were wider (50–300 V and so on here too).
// Common practice, no published source: 50–300 V rms and 40–500 Hz cover every public supply and 400 Hz aircraft
// mains; a tolerance above 50 % is not a mains supply a transformer design can follow.
export const mainsSpec = defineSpec({
  name: 'mains',
  label: 'Mains supply',
  fields: {
    nominalV: num('Mains nominal voltage', 'V', U.V, 50, 300, 230, {
      form: 'mainsV',
      help: 'rms, as on the supply label',
    }),
    frequencyHz: num('Mains frequency', 'Hz', U.Hz, 40, 500, 50, { form: 'mainsHz' }),
    lowFraction: num('Low mains tolerance', '%', U.pct, 0, 0.5, 0.1, { form: 'mainsLow', help: 'how far it may sag' }),
    highFraction: num('High mains tolerance', '%', U.pct, 0, 0.5, 0.1, {
      form: 'mainsHigh',
      help: 'how far it may rise',
    }),
  },
});

// The settings RF and heating use, as their own specs so core can check just them (validateRfInputs and
// validateThermalInputs). Limits chosen (the form, the file and core disagreed):
// - frequency 100 kHz–60 MHz (form and file; core allowed 10 kHz–1 GHz): this plans HF and 6 m rigs, and the band
//   table, filter defaults and exposure limits used here are for that range;
// - target power 1 mW–2 kW (core's 1 mW floor, see MIN_TARGET_POWER_W; the forms' and file's 2 kW ceiling:
//   core's 10 kW was never reachable from a form);
// - ambient −40–70 °C (form and file; core's −60–150 °C admitted air no rig is operated in);
// - keying duty 0–100 % (all three agreed).
export const rfInputsSpec = defineSpec({
  name: 'rf-inputs',
  label: 'Operating frequency and power',
  fields: {
    frequencyHz: num('Operating frequency', 'Hz', U.MHz, 100e3, 60e6, 10.11e6, { form: 'frequency', example: '10.11' }),
    targetPowerW: num('Target RF output', 'W', U.W, MIN_TARGET_POWER_W, 2000, 5, {
      form: 'power',
      example: '5',
      help: 'carrier power into the antenna',
    }),
  },
});

export const thermalInputsSpec = defineSpec({
  name: 'thermal-inputs',
  label: 'Heating inputs',
  fields: {
    ambientC: num('Ambient temperature', '°C', U.C, -40, 70, 30, { form: 'ambient', help: 'air around the rig' }),
    // Source: FCC OET Bulletin 65 Supplement B (1997), Table 2: conversational CW duty factor 40 %
    keyingDuty: num('Keying duty (heating)', '%', U.pct, 0, 1, 0.4, {
      form: 'duty',
      help:
        'share of sending time the key is down, for transformer, regulator and heatsink heating; CW conversational ' +
        '40 %. ' +
        'RF exposure uses its own mode duty factor (RF page)',
      example: '40',
    }),
  },
});

// a stored project always has a name; the new-project form starts empty so the builder types one
const name = text('Name', 200, true, 'New project');
const optional = (f: NumberField): NumberField => ({ ...f, optional: true });
const MAINS_KEYS = Object.keys(mainsSpec.fields) as (keyof Mains)[];
const NO_MAINS = Object.fromEntries(MAINS_KEYS.map((k) => [k, null]));

/** The project's own top-level values as stored (the project file's top level); mains is mainsSpec or null. */
export const projectFieldsSpec = defineSpec({
  name: 'project-fields',
  label: 'Project',
  fields: {
    name,
    notes: text('Notes', 20_000, false, '', { multiline: true }),
    ...rfInputsSpec.fields,
    ...thermalInputsSpec.fields,
    kits: num('Kits to build', '', U.none, 1, 1000, 1, {
      integer: true,
      example: '8',
      help: 'rigs the group builds; the parts are ordered for all of them',
    }),
    currency: text('Project currency', 3, true, 'USD', {
      upper: true,
      help: 'costs are totalled in it; offers in other currencies use the exchange rates on the parts catalog',
      pattern: { re: /^[A-Z]{3}$/, says: 'must be a three-letter code such as USD or EUR' },
    }),
  },
});

/** The overview's settings form: the project's own fields, with "Station supply" choosing mains or none. */
export const settingsSpec = defineSpec({
  name: 'settings',
  label: 'Project settings',
  fields: {
    ...projectFieldsSpec.fields,
    supplyKind: choice('Station supply', [['mains', 'Mains'], ['dc', 'Battery / external DC']], 'mains', {
      help: 'the mains boxes are used only with Mains',
    }),
    // the mains boxes may stay empty for a battery / DC station (checked in refine when mains is chosen)
    ...Object.fromEntries(MAINS_KEYS.map((k) => [`mains.${k}`, optional(mainsSpec.fields[k])])),
  },
  refine: (v) => {
    const errors: FieldError[] = [];
    if (v.supplyKind !== 'mains') return errors;
    for (const k of MAINS_KEYS) {
      const f = mainsSpec.fields[k];
      if (getPath(v, `mains.${k}`) === null)
        errors.push({
          field: `mains.${k}`,
          label: f.label,
          message: `${f.label} is empty: enter a value (or choose a battery / DC supply)`,
        });
    }
    return errors;
  },
  view: {
    // a battery / DC station (mains null) shows empty mains boxes: figures there would read as a mains supply
    from: (p) => ({
      ...p,
      supplyKind: p.mains === null ? 'dc' : 'mains',
      mains: p.mains === null ? NO_MAINS : p.mains,
    }),
    to: (v) => {
      const { supplyKind, ...rest } = v;
      return { ...rest, mains: supplyKind === 'mains' ? v.mains : null };
    },
  },
});

/** What the settings form changes in a project. */
export type ProjectSettings = Pick<
  Project,
  'name' | 'notes' | 'frequencyHz' | 'targetPowerW' | 'mains' | 'ambientC' | 'keyingDuty' | 'kits' | 'currency'
>;

// Common practice, from memory: CW (QRP) activity frequencies, one per band; the band names come from HF_BANDS.
const NEW_PROJECT_BANDS_HZ = [1.83e6, 3.56e6, 7.03e6, 10.11e6, 14.06e6, 18.086e6, 21.06e6];

/** The new-project form: name, band, power, the mains preset and the station template to start from. */
export const newProjectSpec = defineSpec({
  name: 'new-project',
  label: 'New project',
  fields: {
    name: { ...name, default: '' },
    frequencyHz: { ...rfInputsSpec.fields.frequencyHz, label: 'Band', form: 'band' },
    targetPowerW: rfInputsSpec.fields.targetPowerW,
    mainsPreset: choice('Supply', Object.keys(MAINS_PRESETS).map((k) => [k, PRESET_TEXT[k]] as const), '230-50', {
      form: 'mains',
      help: 'the battery portable template needs Battery / external DC; the other templates a mains voltage',
    }),
    // '' (also what a form without this box sends) starts an empty project
    template: choice('Start from', TEMPLATE_OPTIONS, 'mains-two-rail', {
      help: 'a template fills in stages, supply, rails and a starter parts list with typical values and invented ' +
        'prices',
    }),
  },
  refine: (v) => {
    const key = String(v.template ?? '');
    if (key === '') return [];
    const info = TEMPLATE_INFO[key as TemplateKey];
    // an unknown template is the template field's own error (not an option); nothing to compare the supply with
    if (!info) return [];
    const battery = v.mainsPreset === 'battery';
    if (info.mains && battery)
      return [
        {
          field: 'mainsPreset',
          label: 'Supply',
          message: `Supply: the "${info.label}" template runs from the mains; choose a mains voltage (or the battery ` +
            `template)`,
        },
      ];
    if (!info.mains && !battery)
      return [
        {
          field: 'mainsPreset',
          label: 'Supply',
          message: `Supply: the "${info.label}" template runs from its battery; choose Battery / external DC (or a ` +
            `mains template)`,
        },
      ];
    return [];
  },
  view: {
    from: (p) => {
      const preset = Object.keys(MAINS_PRESETS).find(
        (k) => JSON.stringify(MAINS_PRESETS[k]) === JSON.stringify(p.mains ?? null),
      );
      return { ...p, mainsPreset: preset };
    },
    to: (v) => {
      const { mainsPreset, ...rest } = v;
      return { ...rest, mains: MAINS_PRESETS[String(mainsPreset)] ?? null };
    },
  },
});

export type NewProjectInput = Pick<Project, 'name' | 'frequencyHz' | 'targetPowerW' | 'mains'> & {
  template: TemplateKey | '';
};

/** The band choices of the new-project form: [form text, words], the text as the band box reads it. */
export const NEW_PROJECT_BANDS: [string, string][] = NEW_PROJECT_BANDS_HZ.map((hz) => [
  numberText(hz, newProjectSpec.fields.frequencyHz),
  `${bandOf(hz)?.name ?? ''} (${formatValue(hz, 'Hz', 5)})`.trim(),
]);

/** The settings form's text for a project (what the boxes show; saving it unchanged stores the same project). */
export const settingsFormValues = (p: Project): Record<string, string> => formValues(settingsSpec, p);

/** The new-project form's starting text. */
export const newProjectFormValues = (): Record<string, string> => formValues(newProjectSpec, defaults(newProjectSpec));
