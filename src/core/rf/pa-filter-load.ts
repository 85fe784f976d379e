// What the low-pass filter as built presents to the PA with a matched antenna, and where the SWR circle was drawn.
import type { Finding } from '../findings';
import { describeLoad, type PaSwrStress } from './pa-swr';

/**
 * Filter input SWR (against the PA's design load, at the operating frequency) above which the PA is told it does not
 * meet its design load even into a perfect antenna. Common practice, no published source: a load 1.3 times off (or
 * 1/1.3) moves a load-line stage's power by about 1.1 dB (P ∝ 1/R at a fixed swing), more than the 1 dB the power
 * check allows, and moves a class-E stage off its zero-voltage switching; the filter's own SWR check uses 1.3 as well.
 */
export const FILTER_INPUT_SWR_CAUTION = 1.3;

/**
 * The filter's input at the fundamental with the antenna at its design load: a caution when its SWR exceeds
 * FILTER_INPUT_SWR_CAUTION, naming the load the PA meets and the stage's figures there; with the circle at the PA's
 * output (no filter known) a note that says so.
 */
export function filterLoadFindings(s: PaSwrStress, subject: string): Finding[] {
  const base = { rule: 'pa.filter-input-swr', subject, source: 'pa.filter-input-swr' as const };
  if (s.circleAt === 'pa-output' || !s.designLoad) {
    if (s.swr <= 1) return [];
    return [{ ...base, severity: 'ok', value: null, limit: null, unit: '',
      message: `The SWR ${s.swr} circle is placed at the PA's output: no low-pass filter is known (or its data is ` +
        'refused), so the loads the PA meets through it are not computed; a filter that is not a clean 50 Ω line ' +
        'moves them.' }];
  }
  const d = s.designLoad;
  const sees = describeLoad({ ...d, phaseDeg: null });
  if (d.inputSwr <= FILTER_INPUT_SWR_CAUTION) {
    return [{ ...base, severity: 'ok', value: d.inputSwr, limit: FILTER_INPUT_SWR_CAUTION, unit: '',
      message: `With a matched antenna the filter presents ${sees} to the PA (input SWR ${d.inputSwr.toFixed(2)}); ` +
        `the SWR ${s.swr} circle is taken at the antenna, through the filter.` }];
  }
  return [{ ...base, severity: 'caution', value: d.inputSwr, limit: FILTER_INPUT_SWR_CAUTION, unit: '',
    message: `Even into a perfect antenna the PA does not see its design load: the filter as built presents ${sees} ` +
      `(input SWR ${d.inputSwr.toFixed(2)} at the operating frequency); there the stage gives ` +
      `${d.outputW.toFixed(1)} W with drain peaks of ${d.drainPeakV.toFixed(1)} V and ${d.peakDeviceA.toFixed(2)} A ` +
      'per device. Retune the filter (turns or a parallel capacitor) towards its design values; the SWR circle is ' +
      'taken through it as built.' }];
}
