// Which section of the build a BOM line's money belongs to: the mains/battery supply, the RF chain
// (driver, final, low-pass filter, T/R switching) or everything else (receiver, VXO, other, general).
// No stage kind is "supply" (the supply tree is separate from the stage list), so supply lines are
// recognised by their part category.

import type { StageKind } from '../model';

export type CostSection = 'supply' | 'rf' | 'other';

export const COST_SECTION_LABELS: Record<CostSection, string> = {
  supply: 'Power supply',
  rf: 'RF chain (driver, PA, low-pass filter, T/R)',
  other: 'Receiver, oscillator and other',
};

/** Stage kinds counted as the RF chain. */
export const RF_STAGE_KINDS: readonly StageKind[] = ['driver', 'final', 'lpf', 'tr'];

/**
 * Part categories (compared lower-case, trimmed) that put a line with no stage into the supply section.
 * A line that belongs to a stage keeps that stage's section unless its category is exactly "supply".
 */
export const SUPPLY_CATEGORIES: readonly string[] = [
  'supply',
  'transformer',
  'rectifier',
  'bridge-rectifier',
  'diode-rectifier',
  'capacitor-reservoir',
  'reservoir-capacitor',
  'regulator',
  'fuse',
  'fuse-holder',
  'heatsink',
  'mains-connector',
  'mains-switch',
  'bleeder',
];

/**
 * The rule, in order:
 * 1. category "supply" -> supply (whatever the stage);
 * 2. no stage (General) and category in SUPPLY_CATEGORIES -> supply;
 * 3. stage kind driver / final / lpf / tr -> rf;
 * 4. anything else -> other.
 */
export function sectionOf(category: string, stageKind: StageKind | null): CostSection {
  const cat = category.trim().toLowerCase();
  if (cat === 'supply') return 'supply';
  if (stageKind === null && SUPPLY_CATEGORIES.includes(cat)) return 'supply';
  if (stageKind !== null && RF_STAGE_KINDS.includes(stageKind)) return 'rf';
  return 'other';
}

export const SECTION_RULE =
  'Supply: part category "supply", or no stage and category one of ' +
  `${SUPPLY_CATEGORIES.join(', ')}. RF chain: stages of kind driver, final, lpf, tr. Other: the rest.`;
