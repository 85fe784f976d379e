// The rectifier package's heatsink: its dissipation (rectifier-loss.ts) through the series thermal path, the heatsink
// it needs, and whether the fitted one (or none) keeps the junction within the derated target.
import type { Finding } from '../findings';
import type { HeatsinkMount } from '../model';
import { junctionTemperature, type ThermalResult } from './junction';

/**
 * A rectifier whose thermal data is not entered: a 4-8 A single-in-line bridge (the common flat package with a
 * screw hole). θjc 2.2 K/W and θja 22 K/W in free air on a board, Tj,max 150 °C (datasheet values of that package
 * class, from memory, not confirmed); θcs 0.5 K/W greased (a heatsink maker's interface chart for a package of that
 * area, from memory, not confirmed).
 */
export const ASSUMED_BRIDGE_MOUNT: HeatsinkMount = {
  thetaJcKPerW: 2.2, thetaCsKPerW: 0.5, thetaSaKPerW: null, tjMaxC: 150,
};
export const ASSUMED_BRIDGE_FREE_AIR_K_PER_W = 22;

export interface BridgeThermal {
  /** Dissipation the check uses (W): duty-averaged at high mains, or the continuous carrier when sized for tune-up. */
  powerW: number;
  basis: 'duty' | 'tune-up';
  /** The other basis's dissipation, for the words (W). */
  otherW: number;
  /** Air around the rectifier (°C) and whether it is the enclosure's inside temperature (else the room). */
  ambientC: number;
  inside: boolean;
  mount: HeatsinkMount;
  freeAirKPerW: number;
  /** True when no thermal data was entered and ASSUMED_BRIDGE_MOUNT is used. */
  assumed: boolean;
  /** True when a heatsink is fitted (θsa entered). */
  heatsinkFitted: boolean;
  result: ThermalResult;
}

export interface BridgeThermalInput {
  railName: string;
  /** Duty-averaged and continuous-carrier dissipation of the rectifier (W). */
  thermalW: number;
  tuneUpW: number;
  basis: 'duty' | 'tune-up';
  mount: HeatsinkMount | null | undefined;
  freeAirKPerW: number | null | undefined;
  ambientC: number;
  inside: boolean;
}

const finite = (x: number) => (Number.isFinite(x) ? Math.max(0, x) : 0);

export function bridgeThermal(inp: BridgeThermalInput): BridgeThermal {
  const assumed = !inp.mount;
  const mount = inp.mount ?? ASSUMED_BRIDGE_MOUNT;
  const fa = inp.freeAirKPerW;
  const usable = fa !== null && fa !== undefined && Number.isFinite(fa) && fa > 0;
  const freeAirKPerW = usable ? fa : ASSUMED_BRIDGE_FREE_AIR_K_PER_W;
  const powerW = finite(inp.basis === 'tune-up' ? inp.tuneUpW : inp.thermalW);
  const otherW = finite(inp.basis === 'tune-up' ? inp.thermalW : inp.tuneUpW);
  // Source: series thermal path Tj = Ta + P (θjc + θcs + θsa) (textbook)
  const result = junctionTemperature(powerW, inp.ambientC, mount, freeAirKPerW);
  return {
    powerW, basis: inp.basis, otherW, ambientC: result.ambientC, inside: inp.inside, mount, freeAirKPerW, assumed,
    heatsinkFitted: mount.thetaSaKPerW !== null, result,
  };
}

/** "inside the box at 47 °C" or "in the 35 °C room". */
export function airWords(ambientC: number, inside: boolean): string {
  return inside ? `inside the box at ${ambientC.toFixed(0)} °C` : `in the ${ambientC.toFixed(0)} °C room`;
}

export function bridgeThermalFindings(railName: string, b: BridgeThermal): Finding[] {
  const t = b.result;
  const subject = `${railName} rectifier`;
  const base = { rule: 'thermal.bridge', subject, source: 'thermal.bridge' as const, unit: '°C' };
  const load = b.basis === 'tune-up'
    ? 'with a continuous tune-up carrier'
    : 'in CW keying at high mains (duty-averaged)';
  const p = `${subject}: ${t.powerW.toFixed(2)} W ${load}, ${airWords(t.ambientC, b.inside)}`;
  const out: Finding[] = [];
  if (b.assumed) {
    const m = ASSUMED_BRIDGE_MOUNT;
    out.push({
      ...base, rule: 'thermal.bridge-assumed', severity: 'caution', value: null, limit: null, unit: '',
      source: 'thermal.bridge-assumed',
      message: `${subject}: no thermal data entered; a 4-8 A single-in-line bridge is assumed ` +
        `(θjc ${m.thetaJcKPerW} K/W, θja ${ASSUMED_BRIDGE_FREE_AIR_K_PER_W} K/W in free air, Tj max ${m.tjMaxC}` +
        ` °C). ` +
        `Enter your part's values from its datasheet.`,
    });
  }
  const need = t.requiredThetaSaKPerW;
  const needWords = need !== null
    ? `a heatsink of ${need.toFixed(1)} K/W or lower (θsa)`
    : 'more than one heatsink can give: share the current over more diodes';
  const fitted = b.heatsinkFitted;
  const tj = fitted ? t.junctionC! : t.freeAirJunctionC;
  const on = fitted ? `on the ${b.mount.thetaSaKPerW} K/W heatsink` : 'without a heatsink';
  const max = t.tjMaxC.toFixed(0);
  const target = t.targetC.toFixed(0);
  if (tj > t.tjMaxC) {
    const message = `${p}, the junction would reach about ${tj.toFixed(0)} °C ${on}, above its ${max} °C maximum. ` +
      `It needs ${needWords}.`;
    return [...out, { ...base, severity: 'fail', value: tj, limit: t.tjMaxC, message }];
  }
  if (tj > t.targetC) {
    const fix = fitted ? `the heatsink is too small; use ${needWords}` : `fit ${needWords}`;
    const message = `${p}, the junction reaches about ${tj.toFixed(0)} °C ${on}, above the ${target} °C target ` +
      `(80 % of the maximum): ${fix}.`;
    return [...out, { ...base, severity: 'caution', value: tj, limit: t.targetC, message }];
  }
  const message = `${p}, about ${tj.toFixed(0)} °C at the junction ${on}, within the ${target} °C target.`;
  return [...out, { ...base, severity: 'ok', value: tj, limit: t.targetC, message }];
}
