// The PA's source impedance at each harmonic, referred to the filter's input, and what its harmonic level describes.
import type { Finding } from '../findings';
import type { PaParams } from '../model';
import type { Cx, SourceKind } from './lpf-analysis';
import { CLASS_E_EXCESS, CLASS_E_QL } from './class-e-sim';

export interface PaSource {
  kind: SourceKind;
  /** Source impedance at harmonic n (1 = fundamental) at the filter's input, Ω; null = infinite. */
  zsAt: (n: number) => Cx | null;
  /** In words, for findings and pages. */
  label: string;
}

export interface PaSourceInput {
  pa: Pick<PaParams, 'topology' | 'amplifierClass' | 'loadOhm' | 'rdsOnOhm' | 'saturationV'>;
  /** Drain load referred to the full primary (drain to drain for push-pull), Ω. */
  primaryOhm: number;
  /** Matched peak current of one device, A (for Rds(on) from a saturation drop). */
  peakDeviceA: number;
  /** The harmonic levels are the class-E simulation's load current (true) or a drain-voltage estimate (false). */
  classESimulated: boolean;
}

/**
 * Class B / C: the drive sets the drain current, a current source through an ideal transformer (Norton, infinite
 * impedance; magnetising and device capacitance left out). Class D: the switch holds the drain voltage, a voltage
 * source behind Rds(on) referred through the transformer. Class E: the series-tuned network between the drain and
 * the load, high reactance at harmonics.
 */
export function paSource(inp: PaSourceInput): PaSource {
  const { pa, primaryOhm } = inp;
  // Source: impedance transformation by the turns ratio squared, Z_load side = Z_drain side x R_L / R_drain (ideal
  // transformer or matching network taken as one at every harmonic)
  const toLoad = pa.loadOhm / primaryOhm;
  if (pa.amplifierClass === 'B' || pa.amplifierClass === 'C') {
    return { kind: 'norton', zsAt: () => null, label: 'current source through its transformer (ideal)' };
  }
  if (pa.amplifierClass === 'D') {
    // Rds(on) entered, else the saturation drop over the matched peak current (Ohm's law)
    const rds = pa.rdsOnOhm ?? (inp.peakDeviceA > 0 ? (pa.saturationV ?? 0) / inp.peakDeviceA : 0);
    // push-pull: the conducting half has half the primary's turns, so it reflects 4 Rds(on) onto the full primary
    const r = (pa.topology === 'push-pull' ? 4 : 1) * rds * toLoad;
    return {
      kind: 'thevenin', zsAt: () => ({ re: r, im: 0 }),
      label: `stiff voltage source, Rds(on) through the transformer ≈ ${r.toFixed(2)} Ω`,
    };
  }
  // Class E: series L0–C0 with the excess reactance, L0 = QL R/ω and 1/(ωC0)
  // = (QL − X_excess) R (class-e-sim.ts);
  // referred to the load side R becomes the load resistance (push-pull: two halves of half the load in series)
  const rl = pa.loadOhm;
  const zsAt = (n: number): Cx => ({ re: 0, im: rl * (CLASS_E_QL * n - (CLASS_E_QL - CLASS_E_EXCESS) / n) });
  return {
    kind: inp.classESimulated ? 'design-load' : 'thevenin', zsAt,
    label: `series-tuned network (loaded Q ${CLASS_E_QL}), j${zsAt(2).im.toFixed(0)} Ω at 2f`,
  };
}

/** Harmonic current into the filter above which a voltage-switching stage's devices carry it (fraction of the
 * fundamental's). Common practice, no published source. */
export const HARMONIC_CURRENT_LIMIT = 0.3;

/**
 * A voltage-switching stage (Thevenin source) drives harmonic n's current E_n / (Z_s + Z_in(n f)) into the filter;
 * relative to the fundamental's: (E_n/E_1) |Z_s + Z_in(f)| / |Z_s + Z_in(n f)| (Ohm's law with the chain relation
 * Z_in = (A Z_L + B)/(C Z_L + D)). A shunt capacitor first in the filter makes Z_in small at harmonics.
 */
export function harmonicCurrentRatio(
  zsAt: (n: number) => Cx | null, zinAt: (n: number) => Cx, n: number, sourceLevelRatio: number,
): number {
  const z1 = zsAt(1);
  const zn = zsAt(n);
  if (!z1 || !zn) throw new Error('a harmonic current ratio needs a finite source impedance');
  const sum = (a: Cx, b: Cx) => Math.hypot(a.re + b.re, a.im + b.im);
  return (sourceLevelRatio * sum(z1, zinAt(1))) / sum(zn, zinAt(n));
}

/** The finding for a class-D stage whose filter takes the switched wave's harmonic currents (null when it does not). */
export function harmonicCurrentFinding(ratio: number, n: number, subject: string): Finding | null {
  if (!(ratio > HARMONIC_CURRENT_LIMIT)) return null;
  return {
    severity: 'caution', rule: 'pa.harmonic-current', subject, value: ratio, limit: HARMONIC_CURRENT_LIMIT, unit: '',
    source: 'lpf.pa-source',
    message: `The switched drain voltage drives a ${n}${n === 3 ? 'rd' : 'th'} harmonic current of about ` +
      `${Math.round(ratio * 100)} % of the fundamental's into the filter (its input is a low impedance there): the ` +
      'devices carry it on top of the load-line current and heat more. Use an inductor-input filter or a ' +
      'series-tuned output for a voltage-switching stage.',
  };
}
