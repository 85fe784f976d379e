// Reservoir capacitor: capacitance for a ripple target, voltage rating and ripple-current rating checks.
import type { Finding } from '../findings';
import type { RectifierTopology } from '../model';
import type { RectifierSimInput } from './rectifier-sim';
import { simulateRectifier } from './rectifier-sim';
import { DEFAULT_CAPACITOR_V, DEFAULT_CAPACITANCE_STEPS, nextAtLeast, nextInSeries } from './standard-values';
import { usablePositive } from '../numeric';

/**
 * Voltage-rating margin over the highest (no-load, high-mains) peak. Common practice, no published source (ref §4.2
 * [D]: 28.5 V -> 35 V).
 */
export const CAP_VOLTAGE_MARGIN = 1.2;

/**
 * Conservative textbook capacitance C = I / (k f Vpp), k = 2 for full-wave, 1 for half-wave: the capacitor
 * supplies the load for the whole ripple period. Source: textbook ripple formula Vpp = I/(2 f C) (ref §4.1 [C]).
 */
export function textbookCapacitanceF(
  topology: RectifierTopology,
  loadA: number,
  frequencyHz: number,
  ripplePpV: number,
): number | null {
  const k = topology === 'half-wave' ? 1 : 2;
  // Usable, not merely > 0: a subnormal ripple target made C infinite. Floors: common practice, no published source.
  if (!usablePositive(loadA, 1e-6) || !usablePositive(frequencyHz, 1) || !usablePositive(ripplePpV, 1e-6)) return null;
  const c = loadA / (k * frequencyHz * ripplePpV);
  return Number.isFinite(c) ? c : null;
}

/**
 * Smallest capacitance whose simulated ripple p-p meets the target (bisection in log C, bounded iterations).
 * Returns null when even 100x the textbook value cannot meet it (the supply collapses or the target is absurd).
 */
export function minimumCapacitanceF(base: RectifierSimInput, ripplePpTargetV: number, loadA: number): number | null {
  const textbook = textbookCapacitanceF(base.topology, loadA, base.frequencyHz, ripplePpTargetV);
  if (textbook === null) return null;
  // the candidates start from the last one's steady state (a start only: each still stops on the same tolerance)
  const searchKey = `reservoir:${JSON.stringify([base.topology, base.secondaryVrms, base.windingResistanceOhm,
    base.frequencyHz, base.load])}`;
  const ripple = (c: number) => {
    const candidate = { ...base, capacitanceF: c, stepsPerCycle: 500, waveformPoints: 0, maxCycles: 80 };
    const r = simulateRectifier(candidate, { searchKey });
    return r.collapsed || r.note?.startsWith('Simulation not run') ? Infinity : r.ripplePpV;
  };
  let hi = textbook;
  let tries = 0;
  while (ripple(hi) > ripplePpTargetV && tries++ < 4) hi *= 3;
  if (ripple(hi) > ripplePpTargetV) return null;
  let lo = hi / 20;
  if (ripple(lo) <= ripplePpTargetV) return lo;
  for (let i = 0; i < 14 && hi / lo > 1.005; i++) {
    const mid = Math.sqrt(lo * hi);
    if (ripple(mid) <= ripplePpTargetV) hi = mid;
    else lo = mid;
  }
  return hi;
}

export function standardCapacitanceF(minF: number | null): number | null {
  return minF === null ? null : nextInSeries(DEFAULT_CAPACITANCE_STEPS, minF);
}

export function recommendedCapacitorV(
  noLoadPeakHighV: number,
  ratings: readonly number[] = DEFAULT_CAPACITOR_V,
): number | null {
  return nextAtLeast(ratings, noLoadPeakHighV * CAP_VOLTAGE_MARGIN);
}

/** Fitted reservoir checks: voltage rating, ripple-current rating, ripple target. */
export function reservoirFindings(
  railName: string,
  fittedRatedV: number | null,
  noLoadPeakHighV: number,
  fittedRippleA: number | null,
  thermalRippleA: number,
  tuneUpRippleA: number,
  ripplePpTargetV: number | null,
  worstRipplePpV: number,
): Finding[] {
  const out: Finding[] = [];
  const subject = `${railName} reservoir`;
  const srcV = 'supply.capacitor-voltage' as const;
  if (fittedRatedV !== null) {
    const need = noLoadPeakHighV * CAP_VOLTAGE_MARGIN;
    const base = { rule: 'reservoir.voltage', subject, value: fittedRatedV, unit: 'V', source: srcV };
    if (fittedRatedV < noLoadPeakHighV)
      out.push({
        ...base,
        limit: noLoadPeakHighV,
        severity: 'fail',
        message: `Rated ${fittedRatedV} V but it sees ${noLoadPeakHighV.toFixed(1)} V with no load at high mains; it ` +
          `can vent or explode. Fit a higher-voltage part.`,
      });
    else if (fittedRatedV < need)
      out.push({
        ...base,
        limit: need,
        severity: 'caution',
        message: `Rated ${fittedRatedV} V against a ${noLoadPeakHighV.toFixed(1)} V no-load peak leaves under 20 % ` +
          `margin; mains surges can exceed it.`,
      });
    else
      out.push({
        ...base,
        limit: need,
        severity: 'ok',
        message: `The ${fittedRatedV} V rating covers the ${noLoadPeakHighV.toFixed(1)} V no-load peak with margin.`,
      });
  }
  if (fittedRippleA !== null) {
    const base = {
      rule: 'reservoir.ripple-current',
      subject,
      value: thermalRippleA,
      limit: fittedRippleA,
      unit: 'A',
      source: 'supply.capacitor-ripple' as const,
    };
    if (thermalRippleA > fittedRippleA)
      out.push({
        ...base,
        severity: 'fail',
        message: `Ripple current ${thermalRippleA.toFixed(2)} A RMS in normal operation exceeds the ${fittedRippleA}` +
          ` A rating; the capacitor runs hot and its life is short. Use a larger part or two in parallel.`,
      });
    else if (tuneUpRippleA > fittedRippleA)
      out.push({
        ...base,
        value: tuneUpRippleA,
        severity: 'caution',
        message: `With a continuous carrier the ripple current (${tuneUpRippleA.toFixed(2)} A) exceeds the ` +
          `${fittedRippleA} A rating; keep tune-up short.`,
      });
    else
      out.push({
        ...base,
        severity: 'ok',
        message: `Ripple current ${thermalRippleA.toFixed(2)} A RMS is within its ${fittedRippleA} A rating.`,
      });
  }
  if (ripplePpTargetV !== null && ripplePpTargetV > 0) {
    const base = {
      rule: 'reservoir.ripple',
      subject,
      value: worstRipplePpV,
      limit: ripplePpTargetV,
      unit: 'V',
      source: 'design.simulation' as const,
    };
    out.push(
      worstRipplePpV > ripplePpTargetV
        ? {
            ...base,
            severity: 'caution',
            message: `Ripple ${worstRipplePpV.toFixed(2)} V p-p at key-down exceeds the ${ripplePpTargetV} V target; ` +
              `more capacitance is needed.`,
          }
        : {
            ...base,
            severity: 'ok',
            message: `Ripple ${worstRipplePpV.toFixed(2)} V p-p meets the ${ripplePpTargetV} V target.`,
          },
    );
  }
  return out;
}
