// Seeded Monte Carlo over component tolerances: harmonic attenuation spread of the as-built filter.
import type { LpfDesign } from './lpf-design';
import { evalLadder, ladderOf } from './lpf-analysis';

/** Source: T. Ettinger, "mulberry32" public-domain 32-bit PRNG (2017, widely reproduced; from memory). */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export interface MonteCarloOptions {
  trials: number;
  seed: number;
  /** Percentile reported besides the worst case (5 = 5th percentile of attenuation). */
  percentile?: number;
  /** Called every `progressEvery` trials and at the end with (done, total). */
  onProgress?: (done: number, total: number) => void;
  progressEvery?: number;
}

export interface MonteCarloHarmonic {
  n: number;
  frequencyHz: number;
  /** Lowest attenuation seen over all trials, dB. */
  worstAttenuationDb: number;
  /** Attenuation at the chosen percentile (low tail), dB. */
  percentileAttenuationDb: number;
  /** Median attenuation, dB. */
  medianAttenuationDb: number;
}

export interface MonteCarloResult {
  trials: number;
  seed: number;
  /** Percentile used for percentileAttenuationDb / percentileOperatingLossDb. */
  percentile: number;
  /** Distribution: each value uniform within +/- its tolerance, independent. */
  distribution: 'uniform';
  harmonics: MonteCarloHarmonic[];
  /** Highest insertion loss at the operating frequency over all trials, dB. */
  worstOperatingLossDb: number;
}

function quantile(sorted: Float64Array, p: number): number {
  const idx = Math.min(sorted.length - 1, Math.max(0, Math.floor((p / 100) * (sorted.length - 1))));
  return sorted[idx];
}

/** Run the trials. Returns null for zero trials. */
export function monteCarloLpf(design: LpfDesign, opts: MonteCarloOptions): MonteCarloResult | null {
  const trials = Math.floor(opts.trials);
  if (!(trials > 0)) return null;
  const percentile = opts.percentile ?? 5;
  const every = opts.progressEvery ?? 1000;
  const l = ladderOf(design);
  const n = l.values.length;
  const tol = new Float64Array(n);
  for (let k = 0; k < n; k++) tol[k] = l.kinds[k] === 0 ? design.capacitorTolerance : design.inductorTolerance;
  const f0 = design.operatingFrequencyHz;
  const harmonicsN = [2, 3, 4, 5];
  const att = harmonicsN.map(() => new Float64Array(trials));
  const vals = new Float64Array(n);
  const out = new Float64Array(2);
  const rand = mulberry32(opts.seed);
  let worstOp = 0;
  for (let t = 0; t < trials; t++) {
    for (let k = 0; k < n; k++) vals[k] = l.values[k] * (1 + tol[k] * (2 * rand() - 1));
    evalLadder(l, vals, f0, out);
    worstOp = Math.max(worstOp, -10 * Math.log10(out[0]));
    for (let h = 0; h < harmonicsN.length; h++) {
      evalLadder(l, vals, harmonicsN[h] * f0, out);
      att[h][t] = -10 * Math.log10(out[0]);
    }
    if (opts.onProgress && ((t + 1) % every === 0 || t + 1 === trials)) opts.onProgress(t + 1, trials);
  }
  const harmonics = harmonicsN.map((hn, h) => {
    const s = att[h].sort();
    return {
      n: hn,
      frequencyHz: hn * f0,
      worstAttenuationDb: s[0],
      percentileAttenuationDb: quantile(s, percentile),
      medianAttenuationDb: quantile(s, 50),
    };
  });
  return { trials, seed: opts.seed, percentile, distribution: 'uniform', harmonics, worstOperatingLossDb: worstOp };
}
