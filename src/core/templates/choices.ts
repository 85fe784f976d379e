// The station templates a new project can start from, as the new-project form lists them (no imports: the settings
// spec reads this list, and the templates themselves import the specs).

export const TEMPLATE_KEYS = ['mains-two-rail', 'battery-portable', 'single-rail', 'amplifier-only'] as const;
export type TemplateKey = (typeof TEMPLATE_KEYS)[number];

/** What each template is for, and whether it needs a mains supply (true) or runs from a battery (false). */
export const TEMPLATE_INFO: Record<TemplateKey, { label: string; summary: string; mains: boolean }> = {
  'mains-two-rail': {
    label: 'Mains two-rail CW transceiver',
    summary: 'Transformer with two windings: a regulated 13.8 V signal rail and an unregulated ~26 V rail for a ' +
      'push-pull final; receiver, VXO, driver, final, low-pass filter, T/R relay, keyer (10–25 W)',
    mains: true,
  },
  'battery-portable': {
    label: 'Battery portable rig',
    summary: '12.8 V LiFePO4 battery with a 9 V low-dropout rail; receiver, VXO, driver, class-E final, ' +
      'low-pass filter, T/R relay (about 5 W)',
    mains: false,
  },
  'single-rail': {
    label: 'Single-rail low-power rig',
    summary: 'One regulated 13.8 V rail from a mains transformer feeds everything; receiver, VXO, driver, ' +
      'push-pull final, low-pass filter, T/R relay (up to about 5 W)',
    mains: true,
  },
  'amplifier-only': {
    label: 'Amplifier only',
    summary: 'A mains-powered final for an existing exciter: unregulated PA rail, 12 V rail for the relay and ' +
      'bias; final, low-pass filter, T/R relay (10–25 W)',
    mains: true,
  },
};

/** The template box's choices: '' (also what an old form without the box sends) is an empty project. */
export const TEMPLATE_OPTIONS: [string, string][] = [
  ...TEMPLATE_KEYS.map((k): [string, string] => [k, TEMPLATE_INFO[k].label]),
  ['', 'Empty project (add everything yourself)'],
];
