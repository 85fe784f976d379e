// Axis ticks shared by the hand-written SVG plots: "nice" steps (1, 2, 5 x 10^k) over a value range.

/** A value rounded to one decimal, as SVG coordinate text. */
export const r1 = (x: number) => (Math.round(x * 10) / 10).toString();

/** A "nice" tick step (1, 2, 5 x 10^k) giving about `count` intervals over span. */
function niceStep(span: number, count: number): number {
  const raw = span / Math.max(1, count);
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const p = 10 ** Math.floor(Math.log10(raw));
  const m = raw / p;
  return (m <= 1 ? 1 : m <= 2 ? 2 : m <= 5 ? 5 : 10) * p;
}

/** Tick values on nice steps from lo to hi (at most 30). */
export function ticks(lo: number, hi: number, count: number): number[] {
  const step = niceStep(hi - lo, count);
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9 && out.length < 30; v += step) {
    out.push(Number(v.toPrecision(10)));
  }
  return out;
}
