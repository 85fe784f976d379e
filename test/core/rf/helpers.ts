// Shared test helpers for the RF engine tests.
import { expect } from 'vitest';

/** |actual - expected| <= tolerance, with a readable failure message. */
export function near(actual: number, expected: number, tolerance: number, what = ''): void {
  expect(Number.isFinite(actual), `${what} finite`).toBe(true);
  expect(Math.abs(actual - expected), `${what}: ${actual} vs ${expected} ± ${tolerance}`).toBeLessThanOrEqual(
    tolerance,
  );
}

/** Walk a JSON-like value and return the paths of numbers that are NaN or infinite. */
export function nonFinitePaths(v: unknown, path = '$'): string[] {
  if (typeof v === 'number') return Number.isFinite(v) ? [] : [path];
  if (Array.isArray(v)) return v.flatMap((x, i) => nonFinitePaths(x, `${path}[${i}]`));
  if (v && typeof v === 'object') {
    if (v instanceof Map || v instanceof Set) return [`${path} (Map/Set)`];
    return Object.entries(v).flatMap(([k, x]) => nonFinitePaths(x, `${path}.${k}`));
  }
  return [];
}
