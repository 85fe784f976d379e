// A harmonic's margin below the spurious limit, in words, for every page that shows it (RF table, overview bars).
// Below the construction floor the level is not predicted, only bounded: the margin is counted from the floor,
// so it is a lower bound and reads "at least".
import { CONSTRUCTION_FLOOR_DBC, type HarmonicRow } from '../../src/core/rf/harmonics';
import { formatValue } from '../../src/core/units';

type MarginRow = Pick<HarmonicRow, 'marginDb' | 'limitedByConstruction' | 'worstMarginDb' | 'worstPredictedDbc'>;

/** Nominal margin (judged on the worst end of the PA's band, nominal filter), e.g. "at least 27 dB". */
export function marginText(r: MarginRow): string {
  return `${r.limitedByConstruction ? 'at least ' : ''}${formatValue(r.marginDb, 'dB')}`;
}

/** Margin with the Monte Carlo worst-case filter; null without Monte Carlo. */
export function worstMarginText(r: MarginRow): string | null {
  if (r.worstMarginDb === null) return null;
  const limited = r.worstPredictedDbc !== null && r.worstPredictedDbc < CONSTRUCTION_FLOOR_DBC;
  return `${limited ? 'at least ' : ''}${formatValue(r.worstMarginDb, 'dB')}`;
}
