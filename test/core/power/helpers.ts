// Shared test helpers for the power engine tests.
import { expect } from 'vitest';

/** |actual - expected| <= tolerance, with a readable failure. */
export function near(actual: number, expected: number, tolerance: number, what = ''): void {
  expect(Math.abs(actual - expected), `${what}: ${actual} vs ${expected} ± ${tolerance}`).toBeLessThanOrEqual(
    tolerance,
  );
}

/** Relative closeness: |actual/expected - 1| <= fraction. */
export function nearRel(actual: number, expected: number, fraction: number, what = ''): void {
  expect(
    Math.abs(actual / expected - 1),
    `${what}: ${actual} vs ${expected} ± ${fraction * 100} %`,
  ).toBeLessThanOrEqual(fraction);
}

/** Walk a value and collect paths of numbers that are not finite (NaN/Infinity). */
export function nonFinitePaths(value: unknown, path = '$'): string[] {
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [path];
  if (Array.isArray(value)) return value.flatMap((v, i) => nonFinitePaths(v, `${path}[${i}]`));
  if (value && typeof value === 'object')
    return Object.entries(value).flatMap(([k, v]) => nonFinitePaths(v, `${path}.${k}`));
  return [];
}
