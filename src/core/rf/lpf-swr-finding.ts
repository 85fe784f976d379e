// The low-pass filter's own input SWR across the band, judged against what its response allows by design.
import type { Finding } from '../findings';
import { ladderOf, pointAt, type LpfAnalysis } from './lpf-analysis';
import type { LpfDesign } from './lpf-design';
import { rippleReflection, swrOf } from './pa-filter-load';

/** Below this input SWR across the band the filter is ok whatever its design (common practice, no published
 * source). */
export const LPF_SWR_CAUTION = 1.3;
/** Above this the filter is refused as built (common practice, no published source). */
export const LPF_SWR_FAIL = 2;

/** The design's own worst input SWR across the band (ideal values, no loss) and its ripple bound (Chebyshev). */
export function designBandSwr(
  d: LpfDesign, lowHz: number, highHz: number,
): { bandMax: number; rippleMax: number | null } {
  const l = ladderOf(d, 'ideal', true);
  let bandMax = 1;
  // the same 21 points across the band as the analysis of the filter as built (lpf-analysis)
  for (let i = 0; i <= 20; i++) {
    bandMax = Math.max(bandMax, pointAt(l, lowHz + ((highHz - lowHz) * i) / 20).inputSwr);
  }
  return { bandMax, rippleMax: d.response === 'chebyshev' ? swrOf(rippleReflection(d.rippleDb)) : null };
}

/**
 * A caution only when the filter as built exceeds both LPF_SWR_CAUTION and what its design allows (the ripple's
 * |Γ|² = 1 − 10^(−ripple/10) for a Chebyshev response, else the design values' own SWR across the band): then the
 * parts as fitted detune it. A fail above LPF_SWR_FAIL.
 */
export function lpfSwrFinding(d: LpfDesign, a: LpfAnalysis, subject: string): Finding {
  const built = a.bandMaxSwr;
  const des = designBandSwr(d, a.bandLowHz, a.bandHighHz);
  const allowed = Math.max(des.rippleMax ?? 0, des.bandMax);
  const partsWorse = built > allowed * 1.005;
  const byDesign = des.rippleMax !== null
    ? `A ${d.rippleDb} dB-ripple Chebyshev filter reaches ${des.rippleMax.toFixed(2)} at its ripple peaks by design ` +
      `(|Γ|² = 1 − 10^(−ripple/10)); with its design values this one gives ${des.bandMax.toFixed(2)} ` +
      `across the band.`
    : `With its design values the filter gives ${des.bandMax.toFixed(2)} across the band.`;
  const severity = built > LPF_SWR_FAIL ? 'fail' : built > LPF_SWR_CAUTION && partsWorse ? 'caution' : 'ok';
  const message = built <= LPF_SWR_CAUTION
    ? `Input SWR stays below ${built.toFixed(2)} across the band.`
    : partsWorse
      ? `The built filter shows input SWR up to ${built.toFixed(2)} in the band, more than its design allows. ` +
        `${byDesign} The parts as fitted (snapped values, turns) detune it: trim the turns or use a parallel ` +
        'capacitor pair towards the design values.'
      : `Input SWR up to ${built.toFixed(2)} across the band, within what the design allows. ${byDesign} The PA's ` +
        'own finding says what this load does to it.';
  return { severity, rule: 'lpf.swr', subject, value: built, limit: allowed, unit: '', source: 'lpf.swr-design',
    message };
}
