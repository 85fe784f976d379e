// Guards for divisions. `x > 0` lets a subnormal such as 1.5e-322 through and 85 / 1.5e-322 is Infinity, so a
// denominator must be finite and at least a floor that is physically meaningful for its quantity (named at the call).

/** True when x is finite and at least `floor` (floor > 0, in x's unit): a usable positive denominator. */
export function usablePositive(x: number, floor: number): boolean {
  return Number.isFinite(x) && x >= floor;
}

/** True when x is finite and |x| is at least `floor`: a usable denominator of either sign. */
export function usable(x: number, floor: number): boolean {
  return Number.isFinite(x) && Math.abs(x) >= floor;
}

/**
 * num / den when den is usable (finite, |den| >= floor) and the quotient is finite; otherwise null, which the caller
 * turns into a finding (never into Infinity, NaN or a silent 0).
 */
export function quotient(num: number, den: number, floor: number): number | null {
  if (!usable(den, floor)) return null;
  const q = num / den;
  return Number.isFinite(q) ? q : null;
}
