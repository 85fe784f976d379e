// Bleeders on regulated rails: after switch-off a linear regulator holds its output until its source has fallen to
// output + dropout, then its output capacitor falls through its own bleeder (a regulator sources current but does not
// sink it). The time to a safe voltage, the fitted bleeder's dissipation, and a suggestion when none is fitted.
import type { Finding } from '../findings';
import {
  LOW_SAFE_V, LOW_VOLTAGE_TAU_S, SAFE_DC_V, SAFE_TIME_S, bleederPowerFindings, maxBleederOhm, ratingWords,
} from './bleeder';
import { E12_STEPS, prevInSeries } from './standard-values';

/** Time (s) for a rail to fall to v after switch-off; null = it does not fall there (nothing discharges it). */
export type FallTime = (v: number) => number | null;

const usable = (x: number | null | undefined): x is number => typeof x === 'number' && Number.isFinite(x) && x > 0;

/** A reservoir of c farads from startV through r ohms. Source: RC discharge V(t) = V0 e^(-t/RC) (textbook). */
export function reservoirFall(startV: number, capacitanceF: number, bleederOhm: number | null): FallTime {
  return (v) => {
    if (!(v < startV)) return 0;
    if (!(v > 0) || !usable(capacitanceF) || !usable(bleederOhm)) return null;
    return bleederOhm * capacitanceF * Math.log(startV / v);
  };
}

/**
 * A regulated rail set to outputV fed from a source falling as sourceFall. After switch-off the output is at least
 * min(outputV, V_source - dropout) (the regulator sources current while it can) and otherwise falls through its own
 * bleeder. An upper bound on the time to reach v:
 * max(t_source(v + dropout), t_source(outputV + dropout) + RC ln(outputV / v)).
 * Source: RC discharge (textbook) with the regulator's dropout from its datasheet; loads are neglected (they may
 * switch off first), so the time is an upper bound. Common practice, no published source, for the hold model.
 */
export function regulatedFall(
  outputV: number, dropoutV: number, sourceFall: FallTime, capacitanceF: number | null, bleederOhm: number | null,
): FallTime {
  return (v) => {
    if (!(v < outputV)) return 0;
    if (!(v > 0)) return null;
    const follow = sourceFall(v + dropoutV);
    const hold = sourceFall(outputV + dropoutV);
    if (follow === null || hold === null) return null;
    if (!usable(capacitanceF) || !usable(bleederOhm)) return null;
    return Math.max(follow, hold + bleederOhm * capacitanceF * Math.log(outputV / v));
  };
}

export interface RegulatedBleederReport {
  /** The rail's highest voltage: its set output (V). */
  startV: number;
  /** Voltage the time is measured to, and where it comes from. */
  safeV: number;
  safeSource: string;
  /** Output capacitance entered (F), null = not entered. */
  capacitanceF: number | null;
  fittedOhm: number | null;
  ratedW: number | null;
  /** P = V^2 / R at startV (W), null = none fitted. */
  fittedW: number | null;
  /** Upper bound of the time to safeV (s); null when it cannot fall there (see why). */
  fittedTimeS: number | null;
  /** Why the time is not known, in words; null when it is. */
  why: string | null;
  /** E12 bleeder for a time constant of LOW_VOLTAGE_TAU_S (above 60 V: 60 V within 5 s); null without capacitance. */
  suggestedOhm: number | null;
  suggestedW: number | null;
  /** Energy stored in the output capacitance at startV (J), null = capacitance not entered. */
  storedJ: number | null;
  reasoning: string;
}

export interface RegulatedBleederInput {
  railName: string;
  sourceName: string;
  outputV: number;
  dropoutV: number;
  capacitanceF: number | null;
  fittedOhm: number | null;
  ratedW: number | null;
  /** How the source rail falls; null when it is a battery (it does not). */
  sourceFall: FallTime | null;
}

export function regulatedBleeder(inp: RegulatedBleederInput): RegulatedBleederReport {
  const v0 = Number.isFinite(inp.outputV) ? Math.max(0, inp.outputV) : 0;
  const c = usable(inp.capacitanceF) ? inp.capacitanceF : null;
  const r = usable(inp.fittedOhm) ? inp.fittedOhm : null;
  const high = v0 > SAFE_DC_V;
  const safeV = high ? SAFE_DC_V : LOW_SAFE_V;
  const safeSource = high
    ? `${SAFE_DC_V} V d.c. within ${SAFE_TIME_S} s, by analogy with IEC 60204-1`
    : `${LOW_SAFE_V} V, where a dropped tool no longer sparks (common practice, no published source)`;
  let why: string | null = null;
  let fittedTimeS: number | null = null;
  if (!(v0 > safeV)) fittedTimeS = 0;
  else if (inp.sourceFall === null) {
    why = 'it is fed from a battery, which holds it up until the battery is disconnected';
  }
  else if (c === null) why = 'its output capacitance is not entered';
  else if (r === null) why = 'no bleeder is fitted, so nothing but its loads discharges the output capacitor';
  else {
    fittedTimeS = regulatedFall(v0, Math.max(0, inp.dropoutV), inp.sourceFall, c, r)(safeV);
    if (fittedTimeS === null) {
      why = `${inp.sourceName} has no bleeder, so the regulator keeps the rail up while that reservoir stays charged`;
    }
  }
  // Source: Joule heating P = V^2 / R at the highest voltage (textbook)
  const fittedW = r !== null ? (v0 * v0) / r : null;
  // Source: RC discharge; the largest R reaching 60 V within 5 s (above 60 V), else a time constant of about 22 s
  const rSuggest = c === null ? null : high ? maxBleederOhm(c, v0, SAFE_DC_V, SAFE_TIME_S) : LOW_VOLTAGE_TAU_S / c;
  const suggestedOhm = rSuggest !== null && Number.isFinite(rSuggest) ? prevInSeries(E12_STEPS, rSuggest) : null;
  const suggestedW = suggestedOhm !== null ? (v0 * v0) / suggestedOhm : null;
  // Source: stored energy of a capacitor, E = C V^2 / 2
  const storedJ = c !== null ? 0.5 * c * v0 * v0 : null;
  const reasoning = `After switch-off the regulator holds ${inp.railName} at ${v0.toFixed(1)} V until ` +
    `${inp.sourceName} has fallen to ${(v0 + inp.dropoutV).toFixed(1)} V (output + dropout); then its output ` +
    'capacitor falls through its own ' +
    `bleeder, since a regulator does not sink current. The time to ${safeV} V is an upper bound (loads neglected).`;
  const ratedW = usable(inp.ratedW) ? inp.ratedW : null;
  return {
    startV: v0, safeV, safeSource, capacitanceF: c, fittedOhm: r, ratedW, fittedW, fittedTimeS, why, suggestedOhm,
    suggestedW, storedJ, reasoning,
  };
}

const fmtOhm = (r: number) => (r >= 1000 ? `${Number((r / 1000).toPrecision(2))} kΩ` : `${Number(r.toPrecision(2))}` +
  ` Ω`);

export function regulatedBleederFindings(railName: string, b: RegulatedBleederReport): Finding[] {
  const base = {
    rule: 'bleeder.regulated', subject: `${railName} output`, source: 'supply.bleeder-regulated' as const,
  };
  const suggest = b.suggestedOhm !== null
    ? ` A ${fmtOhm(b.suggestedOhm)} bleeder (${ratingWords(b.suggestedW!)} rating or more) ` +
      'would do it.'
    : '';
  const fitted = { fittedW: b.fittedW, startV: b.startV, ratedW: b.ratedW };
  const power = b.fittedW !== null ? bleederPowerFindings(railName, fitted, 'the set output') : [];
  const high = b.startV > SAFE_DC_V;
  if (b.fittedTimeS !== null) {
    const late = high && b.fittedTimeS > SAFE_TIME_S;
    const tooLong = late
      ? ` ${SAFE_TIME_S} s is the usual limit: use a smaller bleeder here or on the source rail.` : '';
    const message = `${railName} falls below ${b.safeV} V within about ${b.fittedTimeS.toFixed(1)} s after ` +
      'switch-off ' +
      `(an upper bound: its source must fall first).${tooLong}`;
    return [
      {
        ...base, severity: late ? 'fail' : 'ok', value: b.fittedTimeS, limit: high ? SAFE_TIME_S : null, unit: 's',
        message,
      },
      ...power,
    ];
  }
  const e = b.storedJ !== null ? `; it stores ${b.storedJ < 0.1 ? b.storedJ.toFixed(3) : b.storedJ.toFixed(1)} J` : '';
  const message = `${railName} (${b.startV.toFixed(1)} V) may stay charged after switch-off: ${b.why}${e}.${suggest} ` +
    'Check with a meter before working on it.';
  return [{ ...base, severity: high ? 'fail' : 'ok', value: b.startV, limit: SAFE_DC_V, unit: 'V', message }, ...power];
}

/** A regulated rail's report with its bleeder and findings, and how its output falls (for rails it feeds). */
type RegulatedLike = { railName: string; outputV: number; dropoutV: number; findings: Finding[] };
export function withRegulatedBleeder<R extends RegulatedLike>(
  report: R,
  rail: { outputF?: number | null; bleederOhm?: number | null; bleederRatedW?: number | null },
  sourceName: string,
  sourceFall: FallTime | null,
): { report: R & { bleeder: RegulatedBleederReport }; fall: FallTime | null } {
  const bleeder = regulatedBleeder({
    railName: report.railName, sourceName, outputV: report.outputV, dropoutV: report.dropoutV,
    capacitanceF: rail.outputF ?? null, fittedOhm: rail.bleederOhm ?? null, ratedW: rail.bleederRatedW ?? null,
    sourceFall,
  });
  const dropout = Math.max(0, report.dropoutV);
  const fall = sourceFall === null
    ? null : regulatedFall(bleeder.startV, dropout, sourceFall, bleeder.capacitanceF, bleeder.fittedOhm);
  const findings = [...report.findings, ...regulatedBleederFindings(report.railName, bleeder)];
  return { report: { ...report, bleeder, findings }, fall };
}
