// What the low-pass filter as built presents to the PA with a matched antenna, and where the SWR circle was drawn.
import type { Finding } from '../findings';
import { ladderOf, pointAt } from './lpf-analysis';
import type { LpfDesign } from './lpf-design';
import { ohmText, type PaSwrStress } from './pa-swr';

/**
 * How far the stage's output may move from its design-load figure before the filter's load is a caution, dB: the
 * 1 dB the power check allows (common practice, no published source). A load 1.3 times off (or 1/1.3) moves a
 * load-line stage's power by about 1.1 dB (P ∝ 1/R at a fixed swing).
 */
export const FILTER_LOAD_POWER_DB = 1;
/** The drain-peak check's margin on the device rating (pa.vds: caution below 1.25 × the peak; common practice). */
export const FILTER_LOAD_DRAIN_MARGIN = 1.25;

/**
 * Largest input reflection of a lossless equal-ripple (Chebyshev) filter in its passband: at a ripple peak
 * |S21|² = 10^(−ripple/10), and with no loss |Γ|² + |S21|² = 1.
 */
export function rippleReflection(rippleDb: number): number {
  // Source: power conservation in a lossless two-port, |S11|² + |S21|² = 1, with the Chebyshev passband's least
  // transmission 1/(1 + ε²) = 10^(−ripple/10) (textbook relations of filter theory)
  return Math.sqrt(1 - 10 ** (-rippleDb / 10));
}

/** SWR from a reflection magnitude. */
export function swrOf(gamma: number): number {
  // Source: definition of standing-wave ratio, SWR = (1 + |Γ|) / (1 − |Γ|)
  return (1 + gamma) / (1 - gamma);
}

/** What the check knows besides the sweep: the filter's design and the stage's own design-load figures. */
export interface FilterLoadContext {
  /** The filter's design (ideal values, response, ripple); null when it is not known. */
  design: LpfDesign | null;
  /** The stage's output into its design load at the supply the sweep used (the highest key-down), W. */
  matchedOutputW: number;
  /** The device's drain-source rating, V. */
  deviceVdsMaxV: number;
}

/** The filter's design SWR at the operating frequency (ideal values, no loss) and its passband bound by design. */
export function designSwr(d: LpfDesign): { atOperating: number; passbandMax: number | null } {
  const atOperating = pointAt(ladderOf(d, 'ideal', true), d.operatingFrequencyHz).inputSwr;
  return { atOperating, passbandMax: d.response === 'chebyshev' ? swrOf(rippleReflection(d.rippleDb)) : null };
}

/**
 * The filter's input at the fundamental with the antenna at its design load: what the PA sees there, the output and
 * drain peak it gives against the design load, and whether the design's ripple or the parts as fitted cause it. A
 * caution only when the output moves by more than FILTER_LOAD_POWER_DB, the drain peak comes within the drain
 * check's margin of the rating, or the parts as fitted exceed what the design allows in its passband; else ok.
 * Without a context (the sweep alone) the figures are stated as ok. With the circle at the PA's output (no filter
 * known) a note that says so.
 */
export function filterLoadFindings(s: PaSwrStress, subject: string, ctx?: FilterLoadContext): Finding[] {
  const base = { rule: 'pa.filter-input-swr', subject, source: 'pa.filter-input-swr' as const };
  if (s.circleAt === 'pa-output' || !s.designLoad) {
    if (s.swr <= 1) return [];
    return [{ ...base, severity: 'ok', value: null, limit: null, unit: '',
      message: `The SWR ${s.swr} circle is placed at the PA's output: no low-pass filter is known (or its data is ` +
        'refused), so the loads the PA meets through it are not computed; a filter that is not a clean 50 Ω line ' +
        'moves them.' }];
  }
  const d = s.designLoad;
  const antenna = d.antennaReOhm !== null && d.antennaImOhm !== null ? ` (${ohmText(d.antennaReOhm, d.antennaImOhm)})`
    : '';
  const head = `With a matched antenna${antenna} the PA sees ${ohmText(d.loadReOhm, d.loadImOhm)} through the ` +
    `filter as built (SWR ${d.inputSwr.toFixed(2)} against its design load, at the operating frequency)`;
  const des = ctx?.design ? designSwr(ctx.design) : null;
  // the output against the design load at the same supply, dB (definition of the decibel for power)
  const shiftDb = ctx && ctx.matchedOutputW > 0 ? 10 * Math.log10(d.outputW / ctx.matchedOutputW) : null;
  const stage = `the stage gives ${d.outputW.toFixed(1)} W` +
    (ctx && shiftDb !== null ? ` against ${ctx.matchedOutputW.toFixed(1)} W into the design load ` +
      `(${shiftDb >= 0 ? '+' : ''}${shiftDb.toFixed(1)} dB, both at the highest key-down supply)` : '') +
    `, with drain peaks of ${d.drainPeakV.toFixed(1)} V (at the highest supply) and ${d.peakDeviceA.toFixed(2)} A ` +
    'peak per device';
  const bound = des?.passbandMax ?? null;
  const partsWorse = des !== null && d.inputSwr > Math.max(bound ?? 0, des.atOperating) * 1.005;
  const cause = des === null ? ''
    : bound !== null && ctx?.design
      ? ` A ${ctx.design.rippleDb} dB-ripple Chebyshev filter reaches SWR ${bound.toFixed(2)} at its ripple peaks ` +
        'by design (|Γ|² = 1 − 10^(−ripple/10)); with its design values it gives ' +
        `${des.atOperating.toFixed(2)} ` +
        'here, ' + (partsWorse ? 'so the parts as fitted (snapped values, turns) make it worse than the design.'
          : `so the ${d.inputSwr.toFixed(2)} is within what the design allows` +
            `${d.inputSwr > des.atOperating * 1.005 ? ', the rest from the parts as fitted' : ''}.`)
      : ` With its design values the filter gives ${des.atOperating.toFixed(2)} here` +
        (partsWorse ? '; the parts as fitted (snapped values, turns) make it worse.' : '.');
  const powerOut = shiftDb !== null && Math.abs(shiftDb) > FILTER_LOAD_POWER_DB;
  const drainNear = ctx !== undefined && ctx.deviceVdsMaxV < FILTER_LOAD_DRAIN_MARGIN * d.drainPeakV;
  const caution = powerOut || drainNear || partsWorse;
  const trim = 'trim the fitted parts (turns, a parallel capacitor) towards their design values';
  const move = 'move the cutoff so the operating frequency sits away from a ripple peak, or choose a lower-ripple ' +
    'response';
  const fix = ` To bring it nearer the design load: ${partsWorse ? `${trim}; or ${move}` : `${move}; or ${trim}`}.`;
  const nearPeak = bound !== null && des !== null && des.atOperating > 1 + 0.8 * (bound - 1)
    ? ' (the operating frequency sits near a ripple peak)' : '';
  const verdict = caution
    ? (powerOut ? ` The output moves by more than the ${FILTER_LOAD_POWER_DB} dB the power check allows.` : '') +
      (drainNear ? ` The drain peak comes within ${FILTER_LOAD_DRAIN_MARGIN} × of the ${ctx!.deviceVdsMaxV} V ` +
        'rating.' : '') + fix
    : ` Within the power and drain checks: nothing to do${nearPeak}.`;
  return [{ ...base, severity: caution ? 'caution' : 'ok', value: d.inputSwr, limit: bound, unit: '',
    message: `${head}: ${stage}.${cause}${verdict} The SWR ${s.swr} circle is taken at the antenna, through ` +
      'the filter as built.' }];
}
