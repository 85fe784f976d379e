// ABCD (chain-matrix) analysis of the as-built ladder between equal terminations, with finite Q, and from the PA's
// own source impedance at each harmonic.
import { bandOf } from './bands';
import type { LpfDesign } from './lpf-design';

/** Ladder in flat arrays for the inner loops: kind 0 = shunt capacitor (F), 1 = series inductor (H). */
export interface Ladder {
  kinds: Uint8Array;
  values: Float64Array;
  inductorQ: number;
  capacitorQ: number;
  r0Ohm: number;
}

export function ladderOf(design: LpfDesign, which: 'built' | 'ideal' = 'built', lossless = false): Ladder {
  const n = design.elements.length;
  const kinds = new Uint8Array(n);
  const values = new Float64Array(n);
  design.elements.forEach((e, i) => {
    kinds[i] = e.kind === 'shunt-capacitor' ? 0 : 1;
    values[i] = which === 'built' ? e.builtValue : e.idealValue;
  });
  return {
    kinds,
    values,
    inductorQ: lossless ? Infinity : design.inductorQ,
    capacitorQ: lossless ? Infinity : design.capacitorQ,
    r0Ohm: design.r0Ohm,
  };
}

/**
 * Evaluate the ladder at one frequency. Writes out[0] = |S21|^2 and out[1] = |input reflection|.
 * Loss model: inductor series R = wL/Q_L, capacitor shunt G = wC/Q_C (constant Q).
 */
export function evalLadder(l: Ladder, values: Float64Array, frequencyHz: number, out: Float64Array): void {
  const w = 2 * Math.PI * frequencyHz;
  // chain matrix [[A, B], [C, D]], complex parts
  let ar = 1, ai = 0, br = 0, bi = 0, cr = 0, ci = 0, dr = 1, di = 0;
  for (let k = 0; k < values.length; k++) {
    const x = values[k];
    if (l.kinds[k] === 1) {
      // Source: Pozar, Microwave Engineering, 4th ed. (2012), Table 4.1 (table number from
      // memory): series impedance Z -> [[1, Z], [0, 1]]
      const zr = (w * x) / l.inductorQ;
      const zi = w * x;
      const nbr = ar * zr - ai * zi + br, nbi = ar * zi + ai * zr + bi;
      const ndr = cr * zr - ci * zi + dr, ndi = cr * zi + ci * zr + di;
      br = nbr; bi = nbi; dr = ndr; di = ndi;
    } else {
      // Source: Pozar, Microwave Engineering, 4th ed. (2012), Table 4.1 (table number from
      // memory): shunt admittance Y -> [[1, 0], [Y, 1]]
      const yr = (w * x) / l.capacitorQ;
      const yi = w * x;
      const nar = ar + br * yr - bi * yi, nai = ai + br * yi + bi * yr;
      const ncr = cr + dr * yr - di * yi, nci = ci + dr * yi + di * yr;
      ar = nar; ai = nai; cr = ncr; ci = nci;
    }
  }
  const z0 = l.r0Ohm;
  // Source: Pozar, Microwave Engineering, 4th ed. (2012), Table 4.2 (from memory): S21
  // = 2 / (A + B/Z0 + C Z0 + D) for equal Z0
  const sr = ar + br / z0 + cr * z0 + dr;
  const si = ai + bi / z0 + ci * z0 + di;
  out[0] = 4 / (sr * sr + si * si);
  // Zin = (A Z0 + B) / (C Z0 + D); Gamma = (Zin - Z0)/(Zin + Z0)
  const nr = ar * z0 + br, ni = ai * z0 + bi;
  const mr = cr * z0 + dr, mi = ci * z0 + di;
  const den = mr * mr + mi * mi;
  const zr = (nr * mr + ni * mi) / den, zi = (ni * mr - nr * mi) / den;
  const gr = zr - z0, gi = zi, hr = zr + z0, hi = zi;
  out[1] = Math.sqrt((gr * gr + gi * gi) / (hr * hr + hi * hi));
}

export interface LadderPoint {
  frequencyHz: number;
  /** Insertion loss, dB (positive = loss). */
  lossDb: number;
  /** 20 log10 |S21|, dB (negative = loss). */
  s21Db: number;
  /** Input SWR with a 50 ohm load (capped at 999). */
  inputSwr: number;
}

export function pointAt(l: Ladder, frequencyHz: number): LadderPoint {
  const out = new Float64Array(2);
  evalLadder(l, l.values, frequencyHz, out);
  // Source: definition of insertion loss between equal terminations: IL = -10 log10 |S21|^2
  const lossDb = -10 * Math.log10(out[0]);
  const g = Math.min(out[1], 0.998);
  // Source: definition of standing-wave ratio: SWR = (1 + |Gamma|) / (1 - |Gamma|)
  return { frequencyHz, lossDb, s21Db: -lossDb, inputSwr: Math.min(999, (1 + g) / (1 - g)) };
}

export interface LpfAnalysis {
  /** At the operating frequency. */
  atOperating: LadderPoint;
  /** Band edges used for the passband check, Hz (operating +/- 1 % when the band is unknown). */
  bandLowHz: number;
  bandHighHz: number;
  /** Worst insertion loss across the band, dB. */
  bandMaxLossDb: number;
  /** Worst input SWR across the band. */
  bandMaxSwr: number;
  /** Attenuation at harmonics 2..5 of the operating frequency (as built, with losses). */
  harmonics: { n: number; frequencyHz: number; attenuationDb: number }[];
  /** Log-spaced sweep 0.5..6 x operating frequency for plots. */
  sweep: LadderPoint[];
}

export function analyseLpf(design: LpfDesign, sweepPoints = 161): LpfAnalysis {
  const l = ladderOf(design);
  const f0 = design.operatingFrequencyHz;
  const band = bandOf(f0);
  const lo = band ? band.lowHz : f0 * 0.99;
  const hi = band ? band.highHz : f0 * 1.01;
  let bandMaxLossDb = 0;
  let bandMaxSwr = 1;
  for (let i = 0; i <= 20; i++) {
    const p = pointAt(l, lo + ((hi - lo) * i) / 20);
    bandMaxLossDb = Math.max(bandMaxLossDb, p.lossDb);
    bandMaxSwr = Math.max(bandMaxSwr, p.inputSwr);
  }
  const harmonics = [2, 3, 4, 5].map((n) => ({ n, frequencyHz: n * f0, attenuationDb: pointAt(l, n * f0).lossDb }));
  const sweep: LadderPoint[] = [];
  const a = Math.log(0.5 * f0), b = Math.log(6 * f0);
  for (let i = 0; i < sweepPoints; i++) sweep.push(pointAt(l, Math.exp(a + ((b - a) * i) / (sweepPoints - 1))));
  return { atOperating: pointAt(l, f0), bandLowHz: lo, bandHighHz: hi, bandMaxLossDb, bandMaxSwr, harmonics, sweep };
}

/** Complex number as a pair. */
export interface Cx { re: number; im: number }
const cmul = (a: Cx, b: Cx): Cx => ({ re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re });
const cadd = (a: Cx, b: Cx): Cx => ({ re: a.re + b.re, im: a.im + b.im });
const cdiv = (a: Cx, b: Cx): Cx => {
  const d = b.re * b.re + b.im * b.im;
  return { re: (a.re * b.re + a.im * b.im) / d, im: (a.im * b.re - a.re * b.im) / d };
};

/** Chain matrix [A, B, C, D] of the ladder at f (same element and loss model as evalLadder). */
export function chainMatrix(l: Ladder, frequencyHz: number): [Cx, Cx, Cx, Cx] {
  const w = 2 * Math.PI * frequencyHz;
  let a: Cx = { re: 1, im: 0 }, b: Cx = { re: 0, im: 0 }, c: Cx = { re: 0, im: 0 }, d: Cx = { re: 1, im: 0 };
  for (let k = 0; k < l.values.length; k++) {
    const x = l.values[k];
    if (l.kinds[k] === 1) {
      // Source: Pozar, Microwave Engineering, 4th ed. (2012), Table 4.1 (from memory): series Z -> [[1, Z], [0, 1]]
      const z: Cx = { re: (w * x) / l.inductorQ, im: w * x };
      b = cadd(cmul(a, z), b);
      d = cadd(cmul(c, z), d);
    } else {
      // Source: Pozar (2012), Table 4.1 (from memory): shunt Y -> [[1, 0], [Y, 1]]
      const y: Cx = { re: (w * x) / l.capacitorQ, im: w * x };
      a = cadd(a, cmul(b, y));
      c = cadd(c, cmul(d, y));
    }
  }
  return [a, b, c, d];
}

/**
 * What the PA's harmonic level describes: 'thevenin' the open-circuit voltage behind the source impedance (a
 * voltage-switching stage), 'norton' the short-circuit current beside it (a current-source stage; null impedance =
 * ideal), 'design-load' the current the stage drives into its design load r0 (a simulated stage).
 */
export type SourceKind = 'thevenin' | 'norton' | 'design-load';

/**
 * Load voltage per unit of the source quantity through the ladder into the load zl (Ω, or complex), with source
 * impedance zs (null = infinite, Norton only). Source: two-port chain relations (circuit theory, textbook; e.g. Pozar
 * 2012, section 4.4, from memory): V_L / E_s = Z_L / (A Z_L + B + Z_s (C Z_L + D)); Norton I_s = E_s / Z_s.
 */
export function sourceTransfer(
  l: Ladder, frequencyHz: number, kind: SourceKind, zs: Cx | null, zlOhm: number | Cx = l.r0Ohm,
): Cx {
  const [a, b, c, d] = chainMatrix(l, frequencyHz);
  const zl: Cx = typeof zlOhm === 'number' ? { re: zlOhm, im: 0 } : zlOhm;
  const cz = cadd(cmul(c, zl), d);
  const az = cadd(cmul(a, zl), b);
  if (zs === null) {
    if (kind !== 'norton') throw new Error('an infinite source impedance needs a Norton source');
    // limit Z_s -> infinity of Z_s Z_L / (A Z_L + B + Z_s (C Z_L + D)) = Z_L / (C Z_L + D)
    return cdiv(zl, cz);
  }
  const h = cdiv(zl, cadd(az, cmul(zs, cz)));
  if (kind === 'thevenin') return h;
  if (kind === 'norton') return cmul(zs, h);
  // current I into r0 from E_s behind Z_s: E_s = I (Z_s + r0)
  return cmul(cadd(zs, { re: l.r0Ohm, im: 0 }), h);
}

/** Input impedance of the ladder loaded by the resistance zlOhm: Zin = (A Z_L + B) / (C Z_L + D) (chain relations). */
export function inputImpedance(l: Ladder, frequencyHz: number, zlOhm = l.r0Ohm): Cx {
  const [a, b, c, d] = chainMatrix(l, frequencyHz);
  const zl: Cx = { re: zlOhm, im: 0 };
  return cdiv(cadd(cmul(a, zl), b), cadd(cmul(c, zl), d));
}

export interface SourcedHarmonic {
  n: number;
  /** Harmonic n at the load relative to the fundamental, against the same ratio at the source, dB (positive = less). */
  relativeAttenuationDb: number;
  /** The same between 50 Ω terminations (loss at n f minus loss at f), dB, for comparison. */
  relative50Db: number;
  /** Source impedance at n f referred to the filter's input, Ω (null = infinite). */
  zsReOhm: number | null;
  zsImOhm: number | null;
}

/**
 * Filter rejection of harmonics 2..5 relative to the fundamental with the PA's source impedance zsAt(n) (n = 1 the
 * fundamental): 20 log |H(f) / H(n f)|, H from sourceTransfer, as the current in the load zlAt(n) (50 Ω unless given;
 * compliance is judged into the design load).
 */
export function harmonicsFromSource(
  l: Ladder, f0Hz: number, kind: SourceKind, zsAt: (n: number) => Cx | null, ns: readonly number[] = [2, 3, 4, 5],
  zlAt: (n: number) => Cx = () => ({ re: l.r0Ohm, im: 0 }),
): SourcedHarmonic[] {
  const mag = (x: Cx) => Math.hypot(x.re, x.im);
  // voltage across the load's resistive part would differ from the load voltage for a complex load; the ratio of
  // powers in the resistance is |I_L(n)| / |I_L(1)| = |V_L(n)/Z_L(n)| / |V_L(1)/Z_L(1)|
  const inR = (n: number, v: Cx) => mag(v) / mag(zlAt(n));
  const h1 = inR(1, sourceTransfer(l, f0Hz, kind, zsAt(1), zlAt(1)));
  const p1 = pointAt(l, f0Hz).lossDb;
  return ns.map((n) => {
    const zs = zsAt(n);
    const hn = inR(n, sourceTransfer(l, n * f0Hz, kind, zs, zlAt(n)));
    // Source: definition of the decibel for voltage ratios, 20 log10
    return {
      n, relativeAttenuationDb: 20 * Math.log10(h1 / hn), relative50Db: pointAt(l, n * f0Hz).lossDb - p1,
      zsReOhm: zs ? zs.re : null, zsImOhm: zs ? zs.im : null,
    };
  });
}
