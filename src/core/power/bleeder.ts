// Bleeder resistor: time for the reservoir to fall to a safe voltage after switch-off.
import type { Finding } from '../findings';
import type { BleederReport, Recommendation } from './report-types';
import { E12_STEPS, prevInSeries } from './standard-values';
import { quotient, usablePositive } from '../numeric';
import { formatValue } from '../units';

/**
 * Residual-voltage threshold (V d.c.). Source: IEC 60204-1 residual voltage <= 60 V within 5 s (ref §10 [C2]); ES1 60
 * V d.c. in IEC 62368-1 (ref §10 [M]).
 */
export const SAFE_DC_V = 60;
/** Time allowed to fall to the threshold (s). Source: IEC 60204-1, 5 s after disconnection (ref §10 [C2]). */
export const SAFE_TIME_S = 5;
/**
 * For rails already below 60 V: time constant we suggest so the rail is low within a minute. Common practice, no
 * published source.
 */
export const LOW_VOLTAGE_TAU_S = 22;
/** For rails already below 60 V: the voltage their discharge time is measured to (V), low enough that a dropped
 *  tool no longer sparks. Common practice, no published source (the reference values' low-voltage example uses it). */
export const LOW_SAFE_V = 5;
/** A bleeder should dissipate at most this fraction of its power rating. Common practice, no published source. */
export const BLEEDER_DERATING = 0.5;
/** Power ratings resistors are commonly sold in, W. Common practice, no published source. */
export const RESISTOR_RATINGS_W = [0.125, 0.25, 0.5, 1, 2, 3, 5, 7, 10, 15, 20, 25, 50] as const;

/** The smallest common resistor rating that carries `dissipationW` at BLEEDER_DERATING, or null when none does. */
export function bleederRatingW(dissipationW: number): number | null {
  // the part runs at no more than BLEEDER_DERATING of its rating
  return RESISTOR_RATINGS_W.find((r) => r * BLEEDER_DERATING >= dissipationW) ?? null;
}

/** A rating as a builder orders it: "0.25 W", or "more than 50 W" beyond the common list. */
export function ratingWords(dissipationW: number): string {
  const r = bleederRatingW(dissipationW);
  return r === null ? `more than ${RESISTOR_RATINGS_W[RESISTOR_RATINGS_W.length - 1]} W` : `${r} W`;
}

/**
 * Smallest capacitance a bleeder is sized for, F. Common practice, no published source: below 1 nF nothing to bleed.
 */
const MIN_RESERVOIR_F = 1e-9;

const SOURCE = 'supply.bleeder' as const;

/** Source: residual-voltage guidance page quoted in ref §10 [C]: t = R C ln(V0 / V_safe). */
export function dischargeTimeS(resistanceOhm: number, capacitanceF: number, startV: number, safeV: number): number {
  if (!(resistanceOhm > 0) || !(capacitanceF > 0) || !(startV > safeV) || !(safeV > 0)) return 0;
  const t = resistanceOhm * capacitanceF * Math.log(startV / safeV);
  return Number.isFinite(t) ? t : 0;
}

/** Largest resistance that reaches safeV within timeS (Ω): R = t / (C ln(V0/Vsafe)). Same source as above. */
export function maxBleederOhm(capacitanceF: number, startV: number, safeV: number, timeS: number): number | null {
  // Usable capacitance (1 nF), not merely > 0: a subnormal C made R = t / (C ln) infinite
  if (!usablePositive(capacitanceF, MIN_RESERVOIR_F) || !(startV > safeV) || !(safeV > 0) || !(timeS > 0)) return null;
  const r = timeS / (capacitanceF * Math.log(startV / safeV));
  return Number.isFinite(r) ? r : null;
}

export function bleederReport(
  capacitanceF: number, startV: number, esrOhm: number, fittedOhm: number | null, ratedW: number | null = null,
): BleederReport {
  const v0 = Number.isFinite(startV) ? Math.max(0, startV) : 0;
  const c = Number.isFinite(capacitanceF) ? Math.max(0, capacitanceF) : 0;
  // Source: stored energy of a capacitor, E = C V^2 / 2 (ref §10 low-voltage example)
  const storedJ = 0.5 * c * v0 * v0;
  const shortCircuitA = v0 / (Number.isFinite(esrOhm) ? Math.max(esrOhm, 1e-3) : 1e-3);
  const high = v0 > SAFE_DC_V;
  let suggestedOhm: number | null;
  let reasoning: string;
  if (high) {
    const rMax = maxBleederOhm(c, v0, SAFE_DC_V, SAFE_TIME_S);
    suggestedOhm = rMax ? prevInSeries(E12_STEPS, rMax) : null;
    const most = rMax ? (rMax / 1000).toFixed(2) + ' kΩ' : '?';
    reasoning = `The reservoir charges to ${v0.toFixed(1)} V (no load, high mains). To fall below ${SAFE_DC_V} V ` +
      `within ${SAFE_TIME_S} s the bleeder must be at most ${most}; the next lower E12 value is suggested.`;
  } else {
    // Common practice, no published source: a time constant of ~22 s leaves a low-voltage rail near zero within a
    // couple of minutes
    const r = quotient(LOW_VOLTAGE_TAU_S, c, MIN_RESERVOIR_F);
    suggestedOhm = r ? prevInSeries(E12_STEPS, r) : null;
    reasoning = `At ${v0.toFixed(1)} V the rail is already below the ${SAFE_DC_V} V d.c. threshold, but it stores ` +
      `${storedJ.toFixed(1)} J and can drive about ${shortCircuitA.toFixed(0)} A into a short (a dropped tool sparks ` +
      `and burns). A bleeder with a time constant of about ${LOW_VOLTAGE_TAU_S} s is suggested.`;
  }
  // Source: Joule heating P = V^2 / R at the highest voltage (reference values §10, P = V0^2 / R)
  const suggestedW = suggestedOhm ? (v0 * v0) / suggestedOhm : null;
  const fitted = fittedOhm !== null && fittedOhm > 0 && Number.isFinite(fittedOhm) ? fittedOhm : null;
  const safeV = high ? SAFE_DC_V : LOW_SAFE_V;
  const safeSource = high
    ? `${SAFE_DC_V} V d.c. within ${SAFE_TIME_S} s, by analogy with IEC 60204-1`
    : `${LOW_SAFE_V} V, where a dropped tool no longer sparks (common practice, no published source)`;
  const fittedTimeS = fitted !== null ? (v0 > safeV ? dischargeTimeS(fitted, c, v0, safeV) : 0) : null;
  const fittedW = fitted !== null ? (v0 * v0) / fitted : null;
  const rated = ratedW !== null && ratedW > 0 && Number.isFinite(ratedW) ? ratedW : null;
  return {
    startV: v0, thresholdV: SAFE_DC_V, allowedS: SAFE_TIME_S, safeV, safeSource, fittedOhm, fittedTimeS, fittedW,
    ratedW: rated, suggestedOhm, suggestedW, storedJ, shortCircuitA, reasoning,
  };
}

export function bleederFindings(railName: string, b: BleederReport): Finding[] {
  return [...dischargeFindings(railName, b), ...bleederPowerFindings(railName, b)];
}

/** The fitted bleeder's dissipation at the highest voltage against its rating derated to BLEEDER_DERATING. */
export function bleederPowerFindings(
  railName: string, b: Pick<BleederReport, 'fittedW' | 'startV' | 'ratedW'>, where = 'no load, high mains',
): Finding[] {
  if (b.fittedW === null) return [];
  const base = {
    rule: 'bleeder.power', subject: `${railName} bleeder`, value: b.fittedW, unit: 'W',
    source: 'supply.bleeder-power' as const,
  };
  const use = `Use one rated ${ratingWords(b.fittedW)} or more.`;
  const share = `${Math.round(BLEEDER_DERATING * 100)} %`;
  const p = `${b.fittedW.toFixed(2)} W at ${b.startV.toFixed(1)} V (${where})`;
  if (b.ratedW === null) {
    return [{
      ...base, limit: null, severity: 'caution',
      message: `The bleeder dissipates ${p}; its power rating is not stated: ${use.replace('Use', 'use')}`,
    }];
  }
  const limit = b.ratedW * BLEEDER_DERATING;
  if (b.fittedW > b.ratedW) {
    return [{
      ...base, limit, severity: 'fail',
      message: `The bleeder dissipates ${p}, more than its ${b.ratedW} W rating: it will overheat. ${use}`,
    }];
  }
  if (b.fittedW > limit) {
    return [{
      ...base, limit, severity: 'caution',
      message: `The bleeder dissipates ${p}, over ${share} of its ${b.ratedW} W rating: it runs hot. ${use}`,
    }];
  }
  return [{
    ...base, limit, severity: 'ok',
    message: `The bleeder dissipates ${p}, within ${share} of its ${b.ratedW} W rating.`,
  }];
}

function dischargeFindings(railName: string, b: BleederReport): Finding[] {
  const base = { rule: 'bleeder.discharge', subject: `${railName} reservoir`, source: SOURCE };
  if (b.startV <= b.thresholdV) {
    const t = b.fittedTimeS !== null
      ? ` The fitted bleeder brings it below ${b.safeV} V in ${b.fittedTimeS.toFixed(1)} s.`
      : ` No bleeder is fitted: it stays charged after switch-off.`;
    return [{
      ...base, severity: 'ok', value: b.startV, limit: b.thresholdV, unit: 'V',
      message: `At most ${b.startV.toFixed(1)} V, below the ${b.thresholdV} V d.c. shock threshold; the ` +
        `${b.storedJ.toFixed(1)} J stored can still spark and burn, so discharge before working on it.${t}`,
    }];
  }
  if (b.fittedOhm === null || b.fittedTimeS === null) {
    const suggested = b.suggestedOhm ? (b.suggestedOhm / 1000).toPrecision(2) + ' kΩ' : 'see recommendation';
    return [{
      ...base, severity: 'fail', value: b.startV, limit: b.thresholdV, unit: 'V',
      message: `The reservoir holds ${b.startV.toFixed(0)} V after switch-off and has no bleeder; fit one ` +
        `(suggested ${suggested}) and always check with a meter. Follow your local electrical code.`,
    }];
  }
  if (b.fittedTimeS > b.allowedS) {
    return [{
      ...base, severity: 'fail', value: b.fittedTimeS, limit: b.allowedS, unit: 's',
      message: `The fitted bleeder takes ${b.fittedTimeS.toFixed(1)} s to bring the reservoir below ` +
        `${b.thresholdV} V; ${b.allowedS} s is the usual limit. Use a smaller resistor.`,
    }];
  }
  return [{
    ...base, severity: 'ok', value: b.fittedTimeS, limit: b.allowedS, unit: 's',
    message: `The bleeder brings the reservoir below ${b.thresholdV} V in ${b.fittedTimeS.toFixed(1)} s. Still check ` +
      'with a meter before touching.',
  }];
}

function ohmWords(r: number): string {
  return r >= 1000 ? `${Number((r / 1000).toPrecision(3))} kΩ` : `${Number(r.toPrecision(3))} Ω`;
}

/**
 * A rail's bleeder recommendation: a fitted bleeder that meets the discharge target is kept (the suggested value is
 * then only what a new build would fit); otherwise the suggested value with a rating of its dissipation over
 * BLEEDER_DERATING. Null when nothing can be suggested.
 */
export function bleederRecommendation(b: BleederReport): Recommendation | null {
  if (b.suggestedOhm === null || b.suggestedW === null) return null;
  const w = b.suggestedW;
  const suggested = `${ohmWords(b.suggestedOhm)} bleeder, ${ratingWords(w)} rating or more`;
  const heat = `${ohmWords(b.suggestedOhm)} dissipates ${formatValue(w, 'W')} at ${b.startV.toFixed(1)} V; a part ` +
    `rated for ${Math.round(1 / BLEEDER_DERATING)} x that runs cool.`;
  const meets = b.fittedOhm !== null && b.fittedTimeS !== null
    && (b.startV <= b.thresholdV || b.fittedTimeS <= b.allowedS);
  if (meets) {
    return {
      topic: 'bleeder',
      text: `Keep the fitted ${ohmWords(b.fittedOhm!)} bleeder (below ${b.safeV} V in ${b.fittedTimeS!.toFixed(1)} s)`,
      reasoning: `It meets the discharge target; for a new build: ${suggested}. ${b.reasoning} ${heat}`,
      source: SOURCE,
    };
  }
  return { topic: 'bleeder', text: suggested, reasoning: `${b.reasoning} ${heat}`, source: SOURCE };
}
