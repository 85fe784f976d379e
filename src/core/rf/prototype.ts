// Low-pass prototype element values (g0 = 1, cutoff 1 rad/s) and the closed-form response of the
// lossless doubly terminated prototype. Pure; SI not applicable (normalised).

export type LpfResponse = 'butterworth' | 'chebyshev';

/**
 * Prototype g-values g1..gn (returned array index 0 = g1) for an odd-order, equal-termination filter.
 * Butterworth cutoff is the 3.01 dB point; Chebyshev cutoff is the ripple-band edge.
 */
export function prototypeG(response: LpfResponse, order: number, rippleDb: number): number[] {
  if (!Number.isInteger(order) || order < 1) throw new Error(`prototypeG: bad order ${order}`);
  const g: number[] = [];
  if (response === 'butterworth') {
    // Source: Matthaei, Young & Jones, Microwave Filters... (1964), §4.05 (from memory); g_k = 2 sin[(2k-1)pi/2n]
    for (let k = 1; k <= order; k++) g.push(2 * Math.sin(((2 * k - 1) * Math.PI) / (2 * order)));
    return g;
  }
  if (!(rippleDb > 0)) throw new Error(`prototypeG: bad ripple ${rippleDb}`);
  // Source: Matthaei, Young & Jones, Microwave Filters... (1964), §4.05 Chebyshev
  // recurrence (equation number from memory)
  const beta = Math.log(1 / Math.tanh(rippleDb / (40 / Math.LN10)));
  const gamma = Math.sinh(beta / (2 * order));
  const a = (k: number) => Math.sin(((2 * k - 1) * Math.PI) / (2 * order));
  const b = (k: number) => gamma * gamma + Math.sin((k * Math.PI) / order) ** 2;
  g.push((2 * a(1)) / gamma);
  for (let k = 2; k <= order; k++) g.push((4 * a(k - 1) * a(k)) / (b(k - 1) * g[k - 2]));
  return g;
}

/** Chebyshev polynomial of the first kind T_n(x), valid for all real x. */
export function chebyshevT(n: number, x: number): number {
  if (Math.abs(x) <= 1) return Math.cos(n * Math.acos(x));
  const t = Math.cosh(n * Math.acosh(Math.abs(x)));
  return x < 0 && n % 2 === 1 ? -t : t;
}

/**
 * Insertion loss (dB) of the lossless prototype at normalised frequency omega = f / fc.
 */
export function prototypeLossDb(response: LpfResponse, order: number, rippleDb: number, omega: number): number {
  if (response === 'butterworth') {
    // Source: Ludwig & Bretchko, RF Circuit Design: Theory and Practice (2000, year from
    // memory), §5 Butterworth |H|^2 = 1/(1 + w^2N)
    return 10 * Math.log10(1 + omega ** (2 * order));
  }
  // Source: Ludwig & Bretchko, RF Circuit Design: Theory and Practice (2000, year from memory),
  // fig. 5-22 listing: LF = 1 + eps^2 T_n^2(w)
  const eps2 = 10 ** (rippleDb / 10) - 1;
  return 10 * Math.log10(1 + eps2 * chebyshevT(order, omega) ** 2);
}
