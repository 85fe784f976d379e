// The project's RF settings: spurious-emission rule, push-pull balance, worst SWR, antenna and feedline, exposure.
import type { Project } from '../model';
import { defineSpec, U } from './field';
import { formValues } from './derive';
import { bool, choice, num } from './make';

// The rule set (the stored key predates it; see src/core/rules/rule-set.ts). A new project's default comes from its
// mains preset (defaultRuleSet); this spec default applies to a battery station.
export const SPURIOUS_RULES = [
  ['us-97-307', 'US: 47 CFR 97.307(d) spurious, 47 CFR 1.1310 exposure, ANSI C84.1 mains'],
  ['itu-app3', 'ITU / CEPT: RR Appendix 3 spurious, ICNIRP 1998 exposure, IEC 60038 mains'],
] as const;

// Limits: the RF form, the project file and core agreed on all but the feedline loss: the form and file allowed
// 100 dB, core 30 dB. 30 dB is kept: the loss is subtracted before the exposure estimate, so an over-large value (a
// slip such as 50 for 0.5) shrinks the safety distances; 30 dB is already more than any HF feedline a station uses
// (common practice, no published source), and core refused evaluating above it anyway.
export const rfSettingsSpec = defineSpec({
  name: 'rf-settings',
  label: 'RF settings',
  fields: {
    spuriousRule: choice('Rule set', SPURIOUS_RULES, 'us-97-307', { help: 'local rules and your licence govern' }),
    // Common practice, no published source: a balanced push-pull stage suppresses its 2nd harmonic by about 30 dB
    evenHarmonicDbc: num('2nd-harmonic balance residual', 'dB', U.dBc, -120, 0, -30, {
      form: 'evenHarmonic',
      help: 'used only without a computed PA stage (a PA\'s own imbalance inputs set its even harmonics), e.g. −30',
      example: '-30',
    }),
    worstSwr: num('Worst-case SWR', '', U.none, 1, 100, 2, { example: '2' }),
    // a half-wave dipole in free space has 2.15 dBi (the textbook value; from memory, section not checked)
    antennaGainDbi: num('Antenna gain', 'dB', U.dBi, -30, 30, 2.15, { form: 'antennaGain', example: '2.15' }),
    feedlineLossDb: num('Feedline loss', 'dB', U.dB, 0, 30, 0.5, { form: 'feedlineLoss', example: '0.5' }),
    // Source: OET Bulletin 65 (1997): k = 2.56 with ground reflection (EPA model), as in exposure.ts
    groundReflection: bool('Include ground reflection (×2.56)', true),
    // Source: FCC OET Bulletin 65 Supplement B (1997), Table 2: conversational CW duty factor 40 %
    exposureDutyFactor: num('Mode duty factor', '%', U.pct, 0, 1, 0.4, {
      form: 'dutyFactor',
      help: 'for the RF exposure distance only: average over the exposure averaging time by mode, CW 40 %. ' +
        'Heating uses the keying duty in the project settings',
      example: '40',
    }),
    exposureOnFraction: num('Worst share of the averaging time on the air', '%', U.pct, 0, 1, 1, {
      form: 'onFraction',
    }),
  },
});

/** The RF settings form's text for a project. */
export const rfSettingsFormValues = (p: Pick<Project, 'rf'>): Record<string, string> =>
  formValues(rfSettingsSpec, p.rf);
