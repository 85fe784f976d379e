// Load-line relations of the final amplifier: output power vs drain load, and peak device current.
import type { PaParams } from '../model';

type Topology = PaParams['topology'];
type AmpClass = PaParams['amplifierClass'];

/**
 * k in P = k (Vdd - Vsat)^2 / R, where R is the drain load referred to the full primary
 * (drain to drain for push-pull).
 */
export function powerCoefficient(topology: Topology, cls: AmpClass): number {
  if (cls === 'E') {
    // Source: Sokal & Sokal, "Class E ..." IEEE JSSC SC-10(3) (1975): R = 0.5768 (Vdd - Vsat)^2 / P
    // Push-pull: two class-E halves each into half the drain-to-drain load (assumption, no published source)
    return topology === 'single-ended' ? 0.5768 : 4 * 0.5768;
  }
  if (cls === 'D') {
    // Source: Fourier series of a square wave, fundamental = 4/pi x amplitude (textbook, REFERENCE-VALUES §8.1):
    // push-pull +/-2Vdd drain to drain -> 32/pi^2; single-ended half bridge 0..Vdd -> 2/pi^2
    return topology === 'push-pull' ? 32 / Math.PI ** 2 : 2 / Math.PI ** 2;
  }
  // Source: textbook load line (REFERENCE-VALUES §8.1): push-pull P = 2 V^2/R_dd, single-ended P = V^2/(2R)
  return topology === 'push-pull' ? 2 : 0.5;
}

/** Peak drain voltage as a multiple of the supply voltage. */
export function peakDrainFactor(cls: AmpClass): number {
  // Source: Sokal & Sokal (1975), class E peak 3.56 Vdd; 2 Vdd for
  // transformer/choke-fed B, C, D (REFERENCE-VALUES §8.1)
  return cls === 'E' ? 3.56 : 2;
}

/** Peak current of one conducting device, A. */
export function peakDeviceCurrentA(
  topology: Topology,
  cls: AmpClass,
  vEffV: number,
  primaryOhm: number,
  outputW: number,
): number {
  if (cls === 'E') {
    // Source: Sokal & Sokal (1975): peak switch current about 2.86 x DC input current (from memory)
    const idc = outputW / Math.max(vEffV, 1e-9);
    return 2.862 * (topology === 'push-pull' ? idc / 2 : idc);
  }
  // Each half of a push-pull primary reflects R_dd/4 (half the turns).
  const rHalf = topology === 'push-pull' ? primaryOhm / 4 : primaryOhm;
  // Source: Fourier fundamental of a square wave 4/pi (class D, push-pull half: amplitude Vdd; half bridge: Vdd/2)
  if (cls === 'D') return topology === 'push-pull' ? (4 * vEffV) / (Math.PI * rHalf) : (2 * vEffV) / (Math.PI * rHalf);
  // Source: textbook sinusoidal load line: peak current = voltage swing / load
  return vEffV / rHalf;
}

export interface Operating {
  /** Effective saturation drop, V. */
  saturationV: number;
  /** Output power, W. */
  outputW: number;
  /** Peak current of one conducting device, A. */
  peakDeviceA: number;
}

/**
 * Output power for a drain load; with Rds(on) the drop I_pk Rds(on) is found by damped iteration. `powerShape`
 * scales the ideal waveform's fundamental power (class D: the finite switching edges, pa-spectrum), and the device
 * current with its square root (the fundamental current).
 */
export function operatingPoint(pa: PaParams, railV: number, primaryOhm: number, powerShape = 1): Operating {
  const k = powerCoefficient(pa.topology, pa.amplifierClass) * powerShape;
  let vsat = pa.saturationV ?? 0;
  const rds = pa.saturationV === null ? (pa.rdsOnOhm ?? 0) : 0;
  let out = 0;
  let ipk = 0;
  for (let it = 0; it < 200; it++) {
    const veff = Math.max(0, railV - vsat);
    out = (k * veff * veff) / primaryOhm;
    ipk =
      peakDeviceCurrentA(pa.topology, pa.amplifierClass, veff, primaryOhm, out) *
      (pa.amplifierClass === 'E' ? 1 : Math.sqrt(powerShape));
    if (rds === 0) break;
    const next = Math.min(ipk * rds, railV);
    if (Math.abs(next - vsat) < 1e-9) break;
    vsat = 0.5 * (vsat + next);
  }
  return { saturationV: vsat, outputW: out, peakDeviceA: ipk };
}

/** Drain load (full primary) that gives the target power, with the Rds(on) drop iterated. */
export function primaryOhmForPower(pa: PaParams, railV: number, targetW: number, powerShape = 1): number {
  const k = powerCoefficient(pa.topology, pa.amplifierClass) * powerShape;
  let vsat = pa.saturationV ?? 0;
  let r = 1;
  for (let it = 0; it < 200; it++) {
    const veff = Math.max(0, railV - vsat);
    r = Math.max((k * veff * veff) / targetW, 1e-6);
    if (pa.saturationV !== null || !pa.rdsOnOhm) break;
    const ipk =
      peakDeviceCurrentA(pa.topology, pa.amplifierClass, veff, r, targetW) *
      (pa.amplifierClass === 'E' ? 1 : Math.sqrt(powerShape));
    const next = Math.min(ipk * pa.rdsOnOhm, railV);
    if (Math.abs(next - vsat) < 1e-9) break;
    vsat = 0.5 * (vsat + next);
  }
  return r;
}

export interface PracticalRatio {
  /** "primary:secondary" turns, e.g. "4:5" (secondary / full primary = 1.25). */
  label: string;
  /** Secondary turns / full primary turns. */
  turnsRatio: number;
}

/**
 * Small-integer ratios easy to wind as bifilar/trifilar transmission-line or conventional broadband
 * transformers on one core. Common practice, no published source.
 */
export const PRACTICAL_RATIOS: readonly PracticalRatio[] = [
  [2, 1], [3, 2], [4, 3], [5, 4], [1, 1], [4, 5], [3, 4], [2, 3], [1, 2], [2, 5], [1, 3], [1, 4],
].map(([p, s]) => ({ label: `${p}:${s}`, turnsRatio: s / p }));
