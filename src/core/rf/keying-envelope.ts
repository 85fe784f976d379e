// The keyed RF envelope of a periodic dot train (one period: a dot key-down, a dot space), sampled for the FFT.
// Two edge shapes: raised-cosine edges (a shaping circuit or a DSP ramp), and the exponential edges of a single RC
// shaping network. Both are centred so that the key-down time is the width at half amplitude.

/**
 * 10–90 % time of a raised-cosine edge as a fraction of its 0–100 % duration: (acos(−0.8) − acos(0.8)) / π.
 */
// Source: edge (1 − cos(πt/T))/2 reaches 10 % at acos(0.8)/π·T and 90 % at acos(−0.8)/π·T (algebra)
export const RAISED_COSINE_10_90 = (Math.acos(-0.8) - Math.acos(0.8)) / Math.PI;

/** 10–90 % time of a first-order RC edge in time constants. */
// Source: step response 1 − e^(−t/τ): 10 % at τ ln(10/9), 90 % at τ ln 10, difference τ ln 9 (algebra)
export const RC_10_90 = Math.log(9);

export type KeyedEdges =
  | { shape: 'raised-cosine'; riseS: number; fallS: number }
  | { shape: 'rc'; timeConstantS: number };

/** Raised-cosine edge from 0 to 1 over duration `durS` centred on t = 0 (a step when durS is 0). */
function riseEdge(tS: number, durS: number): number {
  if (durS <= 0) return tS > 0 ? 1 : tS < 0 ? 0 : 0.5;
  if (tS <= -durS / 2) return 0;
  if (tS >= durS / 2) return 1;
  // Source: raised-cosine (sine-shaped) edge (1 + sin(πt/T))/2 for |t| ≤ T/2 (definition)
  return (1 + Math.sin((Math.PI * tS) / durS)) / 2;
}

/**
 * Envelope at time t (0 ≤ t < 2·dot) of a steady dot train with key-down on [0, dot): amplitude 0..1.
 * Raised-cosine edges overlapping a dot (too slow for the speed) are combined as the lower of the two edges.
 */
export function envelopeAt(tS: number, dotS: number, edges: KeyedEdges): number {
  const periodS = 2 * dotS;
  const t = ((tS % periodS) + periodS) % periodS;
  if (edges.shape === 'rc') {
    const tau = edges.timeConstantS;
    if (tau <= 0) return t < dotS ? 1 : 0;
    // Source: first-order low-pass driven by a 50 % square wave, periodic steady state (solving the two exponential
    // segments for continuity): level at key-down a0 = E/(1 + E), at key-up a1 = 1/(1 + E), E = e^(−dot/τ)
    const e = Math.exp(-dotS / tau);
    const a0 = e / (1 + e);
    const a1 = 1 / (1 + e);
    return t < dotS ? 1 - (1 - a0) * Math.exp(-t / tau) : a1 * Math.exp(-(t - dotS) / tau);
  }
  const riseDur = edges.riseS / RAISED_COSINE_10_90;
  const fallDur = edges.fallS / RAISED_COSINE_10_90;
  // one dot: rising edge centred on its key-down, falling edge centred on its key-up; neighbouring dots overlap
  // only when an edge is longer than a dot
  // (a loop rather than a closure per call: this runs once per FFT sample)
  let level = 0;
  for (let start = -periodS; start <= periodS; start += periodS) {
    level = Math.max(level, Math.min(riseEdge(t - start, riseDur), 1 - riseEdge(t - start - dotS, fallDur)));
  }
  return level;
}
