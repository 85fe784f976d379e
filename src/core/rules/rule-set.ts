// The project's rule set: which published rules the spurious, RF-exposure and mains-corner checks use.
// Stored in RfSettings.spuriousRule (the key predates the rule set and is kept so saved projects and files still load):
// 'us-97-307' selects the US rules, 'itu-app3' the ITU / CEPT rules.
import type { Finding } from '../findings';
import type { Mains, RfSettings } from '../model';
import type { SourceKey } from '../sources/registry';

export type RuleSet = RfSettings['spuriousRule'];

export interface RuleSetInfo {
  label: string;
  spurious: SourceKey;
  exposure: SourceKey;
  mains: SourceKey;
  /** Every source the rule set names, for the Sources page and the pack. */
  sources: SourceKey[];
  /** Mains nominal voltage the corner standard is written for (V), and its range as fractions of nominal. */
  mainsNominalV: number;
  mainsLowFraction: number;
  mainsHighFraction: number;
  mainsRangeText: string;
}

export const GOVERNS = 'Local rules and your licence conditions govern; these are planning checks, not an approval.';

export const RULE_SETS: Record<RuleSet, RuleSetInfo> = {
  'us-97-307': {
    label: 'US (FCC)',
    spurious: 'spurious.us-97-307d',
    exposure: 'exposure.fcc-distance',
    mains: 'mains.ansi-c84-1',
    sources: [
      'spurious.us-97-307d',
      'exposure.fcc-distance',
      'exposure.fcc-exemption',
      'exposure.near-field',
      'mains.ansi-c84-1',
      'exposure.local-rules',
    ],
    // ANSI C84.1 Range B utilization voltage (at the equipment's outlet, where the rig plugs in), 106-127 V on 120 V
    // nominal: -11.7 % / +5.8 % (from memory, not confirmed; see the registry). Range B, not the tighter Range A:
    // the standard allows Range B to occur, so a supply must work over it.
    mainsNominalV: 120,
    mainsLowFraction: (120 - 106) / 120,
    mainsHighFraction: (127 - 120) / 120,
    mainsRangeText: 'ANSI C84.1 Range B utilization voltage, 106–127 V on 120 V nominal',
  },
  'itu-app3': {
    label: 'ITU / CEPT',
    spurious: 'spurious.itu-app3',
    exposure: 'exposure.icnirp-distance',
    mains: 'mains.iec-60038',
    sources: [
      'spurious.itu-app3',
      'exposure.icnirp-distance',
      'exposure.near-field',
      'mains.iec-60038',
      'exposure.local-rules',
    ],
    // Source: IEC 60038, 230 V +/- 10 % at the supply terminals
    mainsNominalV: 230,
    mainsLowFraction: 0.1,
    mainsHighFraction: 0.1,
    mainsRangeText: 'IEC 60038, 230 V ± 10 % (207–253 V)',
  },
};

/**
 * Rule set a new project starts with, from its mains preset (editable afterwards in the RF settings): 120 V / 60 Hz
 * mains is a North American station (US rules); any other mains is taken as ITU / CEPT. A battery station gives no
 * hint: null, and the RF settings' own default applies.
 */
export function defaultRuleSet(mains: Mains | null): RuleSet | null {
  if (!mains) return null;
  return mains.nominalV === 120 && mains.frequencyHz === 60 ? 'us-97-307' : 'itu-app3';
}

/**
 * A mains supply of nominal voltage and frequency with the corners of the standard its default rule set names
 * (defaultRuleSet): 120 V / 60 Hz gets ANSI C84.1 Range B, any other mains the IEC 60038 ±10 %. What a new project
 * and the mains presets start from; editable afterwards in the settings.
 */
export function mainsWithStandardCorners(nominalV: number, frequencyHz: number): Mains {
  const base = { nominalV, frequencyHz, lowFraction: 0, highFraction: 0 };
  const info = RULE_SETS[defaultRuleSet(base)!];
  return { ...base, lowFraction: info.mainsLowFraction, highFraction: info.mainsHighFraction };
}

/**
 * The project's mains corners against the rule set's standard range: corners narrower than the standard miss voltages
 * the supply may legally deliver (a design change, widening them, clears it). Only for the nominal voltage the
 * standard is written for; other nominals get no check here.
 */
export function mainsCornerFindings(mains: Mains | null, ruleSet: RuleSet): Finding[] {
  const info = RULE_SETS[ruleSet];
  if (!mains || mains.nominalV !== info.mainsNominalV) return [];
  const pct = (x: number) => `${(x * 100).toFixed(1)} %`;
  const lowOk = mains.lowFraction >= info.mainsLowFraction - 1e-9;
  const highOk = mains.highFraction >= info.mainsHighFraction - 1e-9;
  const base = {
    rule: 'mains.corners',
    subject: 'Mains corners',
    value: mains.lowFraction,
    limit: info.mainsLowFraction,
    unit: '',
    source: info.mains,
  };
  if (lowOk && highOk) {
    return [
      {
        ...base,
        severity: 'ok',
        message: `The mains corners (−${pct(mains.lowFraction)} / +${pct(mains.highFraction)}) cover ` +
          `${info.mainsRangeText}.`,
      },
    ];
  }
  return [
    {
      ...base,
      severity: 'caution',
      message: `The mains corners (−${pct(mains.lowFraction)} / +${pct(mains.highFraction)}) are narrower than ` +
        `${info.mainsRangeText} (−${pct(info.mainsLowFraction)} / +${pct(info.mainsHighFraction)}); widen them so ` +
        `the supply is checked over the whole range.`,
    },
  ];
}
