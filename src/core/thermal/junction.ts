// Junction temperature of a device on a heatsink, and the heatsink needed to meet a derating target.
import type { Finding } from '../findings';
import type { HeatsinkMount } from '../model';
import { quotient } from '../numeric';

/** Derating target as a fraction of the rated maximum junction temperature. */
// Source: thermal design practice quoted in the reference values §7: target Tj <= 0.8 x Tj,max ([C] reference page)
export const TJ_DERATING_FRACTION = 0.8;

/**
 * Assumed TO-220 mount when none is entered: θjc 5 K/W (78xx datasheet max, ref §6.1), θcs 1 K/W (greased,
 * no insulator, ref §7), Tj,max 125 °C (common rating of three-terminal regulators, from memory).
 */
export const DEFAULT_TO220_MOUNT: HeatsinkMount = { thetaJcKPerW: 5, thetaCsKPerW: 1, thetaSaKPerW: null, tjMaxC: 125 };

/**
 * Dissipation below which a device needs no heatsink, W; also the floor of the θsa quotient (a subnormal P would make
 * (Tj,target - Ta) / P infinite). Common practice, no published source: 1 mW warms even a free-air small-signal package
 * (about 200 K/W, from memory) by 0.2 K.
 */
export const NEGLIGIBLE_DISSIPATION_W = 1e-3;

/**
 * Free-air junction-to-ambient of a TO-220 without heatsink (K/W). Source: ref §6.1, RθJA 50 °C/W (one datasheet).
 */
export const TO220_FREE_AIR_K_PER_W = 50;

export interface ThermalResult {
  /** Heat dissipated (W). */
  powerW: number;
  /** Ambient around the heatsink (°C). */
  ambientC: number;
  /** Junction temperature with the fitted heatsink (°C); null when no heatsink is chosen. */
  junctionC: number | null;
  /** Derated junction target 0.8 x Tj,max (°C). */
  targetC: number;
  /** Rated maximum junction temperature (°C). */
  tjMaxC: number;
  /**
   * Largest heatsink-to-air resistance that meets the target (K/W); null when no heatsink can (or none needed: see
   * needsHeatsink).
   */
  requiredThetaSaKPerW: number | null;
  /** False when the device stays below target in free air (no heatsink needed). */
  needsHeatsink: boolean;
  /** Junction temperature in free air without heatsink (°C). */
  freeAirJunctionC: number;
}

/**
 * Tj = Ta + P (θjc + θcs + θsa); θsa,max = (Tj,target - Ta)/P - θjc - θcs.
 * Source: reference values §7 (series thermal path, [C] thermal-resistance reference page and heatsink lecture).
 */
export function junctionTemperature(
  powerW: number,
  ambientC: number,
  mount: HeatsinkMount,
  freeAirKPerW = TO220_FREE_AIR_K_PER_W,
): ThermalResult {
  const p = Number.isFinite(powerW) ? Math.max(0, powerW) : 0;
  const ta = Number.isFinite(ambientC) ? ambientC : 25;
  const ok = (x: number, f: number) => (Number.isFinite(x) && x >= 0 ? x : f);
  const tjMaxC = Number.isFinite(mount.tjMaxC) ? mount.tjMaxC : DEFAULT_TO220_MOUNT.tjMaxC;
  const targetC = TJ_DERATING_FRACTION * tjMaxC;
  const path =
    ok(mount.thetaJcKPerW, DEFAULT_TO220_MOUNT.thetaJcKPerW) + ok(mount.thetaCsKPerW, DEFAULT_TO220_MOUNT.thetaCsKPerW);
  const sa =
    mount.thetaSaKPerW === null || !Number.isFinite(mount.thetaSaKPerW) ? null : Math.max(0, mount.thetaSaKPerW);
  const junctionC = sa === null ? null : ta + p * (path + sa);
  const freeAirJunctionC = ta + p * freeAirKPerW;
  let required: number | null = null;
  const perW = quotient(targetC - ta, p, NEGLIGIBLE_DISSIPATION_W);
  if (perW !== null) {
    const r = perW - path;
    required = r > 0 ? r : null;
  }
  return {
    powerW: p,
    ambientC: ta,
    junctionC,
    targetC,
    tjMaxC,
    requiredThetaSaKPerW: required,
    needsHeatsink: freeAirJunctionC > targetC,
    freeAirJunctionC,
  };
}

const SOURCE_7 = 'thermal.series-path' as const;

/** Findings for a thermal result: fail above Tj,max, caution above the derated target, ok otherwise. */
export function thermalFindings(subject: string, t: ThermalResult, context: string): Finding[] {
  const base = { rule: 'thermal.junction', subject, unit: '°C', source: SOURCE_7 };
  if (t.junctionC === null) {
    if (!t.needsHeatsink) {
      return [
        {
          ...base,
          severity: 'ok',
          value: t.freeAirJunctionC,
          limit: t.targetC,
          message: `${context}: about ${t.freeAirJunctionC.toFixed(0)} °C at the junction in free air, below the ` +
            `${t.targetC.toFixed(0)} °C target; no heatsink needed.`,
        },
      ];
    }
    if (t.requiredThetaSaKPerW === null) {
      return [
        {
          ...base,
          rule: 'thermal.heatsink',
          severity: 'fail',
          value: t.powerW,
          limit: null,
          unit: 'W',
          message: `${context}: ${t.powerW.toFixed(1)} W is too much for one device even on an ideal heatsink; lower ` +
            `the input voltage or share the heat (series resistor, pre-regulator).`,
        },
      ];
    }
    return [
      {
        ...base,
        rule: 'thermal.heatsink',
        severity: 'caution',
        value: t.requiredThetaSaKPerW,
        limit: null,
        unit: 'K/W',
        message: `${context}: choose a heatsink of ${t.requiredThetaSaKPerW.toFixed(1)} K/W or better (lower) to ` +
          `keep the junction at or below ${t.targetC.toFixed(0)} °C.`,
      },
    ];
  }
  const tj = t.junctionC;
  if (tj > t.tjMaxC) {
    return [
      {
        ...base,
        severity: 'fail',
        value: tj,
        limit: t.tjMaxC,
        message: `${context}: junction about ${tj.toFixed(0)} °C, above the ${t.tjMaxC.toFixed(0)} °C maximum; the ` +
          `regulator will shut down or fail. Use a larger ` +
          `heatsink${t.requiredThetaSaKPerW !== null ? ` (${t.requiredThetaSaKPerW.toFixed(1)} K/W or lower)` : ''}` +
          ` or lower the input voltage.`,
      },
    ];
  }
  if (tj > t.targetC) {
    return [
      {
        ...base,
        severity: 'caution',
        value: tj,
        limit: t.targetC,
        message: `${context}: junction about ${tj.toFixed(0)} °C, above the derated target of ` +
          `${t.targetC.toFixed(0)} °C (80 % of the maximum); a larger heatsink gives longer life.`,
      },
    ];
  }
  return [
    {
      ...base,
      severity: 'ok',
      value: tj,
      limit: t.targetC,
      message: `${context}: junction about ${tj.toFixed(0)} °C, within the ${t.targetC.toFixed(0)} °C target.`,
    },
  ];
}
