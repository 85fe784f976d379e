// Ripple reaching a regulated rail's output: the input ripple attenuated by the regulator's ripple rejection.
import type { Finding } from '../findings';
import type { RegulatedCorner } from './report-types';

/**
 * Output ripple (V p-p) from the input ripple and the rejection: V_out = V_in 10^(-PSRR/20). Source: definition of
 * ripple rejection in three-terminal regulator datasheets (ratio of input to output ripple, in dB, at 120 Hz; taken as
 * valid at 100 Hz, from memory). In dropout (input trough below output + dropout) the regulator no longer regulates and
 * the ripple passes through (the datasheet figure holds only with headroom; common practice, no published source).
 */
export function outputRipplePpV(inputPpV: number, rejectionDb: number, inDropout: boolean): number {
  const vin = Number.isFinite(inputPpV) ? Math.max(0, inputPpV) : 0;
  if (inDropout) return vin;
  return vin * Math.pow(10, -Math.max(0, rejectionDb) / 20);
}

/** The corner with the most ripple at the output (null when the rejection is not stated or there are no corners). */
export function worstRippleCorner(corners: RegulatedCorner[]): RegulatedCorner | null {
  let worst: RegulatedCorner | null = null;
  for (const c of corners) {
    if (c.outputRipplePpV !== null && (worst === null || c.outputRipplePpV > worst.outputRipplePpV!)) worst = c;
  }
  return worst;
}

const mv = (v: number) => `${(v * 1000).toFixed(v < 0.01 ? 2 : 1)} mV`;

/** Output ripple against the builder's target for the rail (e.g. a direct-conversion receiver's rail). */
export function rippleFindings(
  railName: string, rejectionDb: number | null, targetV: number | null, corners: RegulatedCorner[],
): Finding[] {
  const base = { rule: 'regulator.ripple', subject: railName, unit: 'V', source: 'supply.ripple-rejection' as const };
  const maxIn = Math.max(0, ...corners.map((c) => c.inputRipplePpV));
  if (rejectionDb === null) {
    if (targetV === null) return [];
    return [{
      ...base, severity: 'caution', value: null, limit: targetV,
      message: `${railName}: an output ripple target of ${mv(targetV)} p-p is set but the regulator's ripple ` +
        'rejection is not; enter it from the datasheet (dB at 100/120 Hz). Its input carries up to ' +
        `${mv(maxIn)} p-p.`,
    }];
  }
  const w = worstRippleCorner(corners);
  if (!w || w.outputRipplePpV === null) return [];
  const dropout = w.inDropout ? ' (but the regulator is in dropout there, so the ripple passes)' : '';
  const how = `${mv(w.inputRipplePpV)} p-p in, ${rejectionDb} dB rejection${dropout}`;
  const at = `${mv(w.outputRipplePpV)} p-p ripple at the output (${w.label}: ${how})`;
  if (targetV === null) {
    return [{
      ...base, severity: 'ok', value: w.outputRipplePpV, limit: null,
      message: `${railName}: about ${at}. Set a target on the rail if a receiver runs from it.`,
    }];
  }
  if (w.outputRipplePpV > targetV) {
    return [{
      ...base, severity: 'fail', value: w.outputRipplePpV, limit: targetV,
      message: `${railName}: ${at} exceeds the ${mv(targetV)} target; a receiver on it will hum. Use a larger ` +
        'reservoir, an RC filter before the regulator, or a regulator with more rejection (an adjust-pin bypass ' +
        'capacitor adds rejection on adjustable types).',
    }];
  }
  return [{
    ...base, severity: 'ok', value: w.outputRipplePpV, limit: targetV,
    message: `${railName}: ${at} is within the ${mv(targetV)} target.`,
  }];
}

/** True when no corner feeds the regulator any ripple (a battery or other steady source): none reaches the output. */
export function steadyInput(corners: readonly Pick<RegulatedCorner, 'inputRipplePpV'>[]): boolean {
  return corners.length > 0 && corners.every((c) => c.inputRipplePpV === 0);
}

/** Words for a regulated rail fed without ripple (page, pack, CLI). */
export const STEADY_INPUT_WORDS = 'no ripple at the input (a steady source such as a battery), so none at the output';
