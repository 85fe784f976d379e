// The bounded LRU behind the report and page caches: it never holds more than its entry count or its byte budget,
// and it drops the least recently used entry first. (A unit test of the limits, not of timing.)
import { describe, expect, it } from 'vitest';
import { Lru } from '../../../src/web/cache/lru';

describe('Lru', () => {
  it('keeps at most maxEntries, dropping the least recently used', () => {
    const lru = new Lru<number>({ maxEntries: 3, maxBytes: 1_000_000 });
    for (const k of ['a', 'b', 'c']) lru.set(k, k.charCodeAt(0), 10);
    expect(lru.get('a')).toBe(97); // a is now the most recently used
    lru.set('d', 100, 10);
    expect(lru.size).toBe(3);
    expect(lru.get('b')).toBeUndefined();
    expect([lru.get('a'), lru.get('c'), lru.get('d')]).toEqual([97, 99, 100]);
    expect(lru.bytes).toBe(30);
  });

  it('keeps at most maxBytes, and an entry larger than the budget is not kept at all', () => {
    const lru = new Lru<string>({ maxEntries: 100, maxBytes: 100 });
    lru.set('x', 'x', 60);
    lru.set('y', 'y', 30);
    lru.set('z', 'z', 30); // 120 > 100: x (least recently used) goes
    expect(lru.get('x')).toBeUndefined();
    expect(lru.bytes).toBe(60);
    lru.set('huge', 'h', 101);
    expect(lru.get('huge')).toBeUndefined();
    expect(lru.size).toBe(2);
    expect(lru.bytes).toBe(60);
  });

  it('replacing a key counts its size once', () => {
    const lru = new Lru<number>({ maxEntries: 10, maxBytes: 100 });
    lru.set('k', 1, 40);
    lru.set('k', 2, 50);
    expect(lru.size).toBe(1);
    expect(lru.bytes).toBe(50);
    expect(lru.get('k')).toBe(2);
  });

  it('stays within both limits over many insertions of mixed sizes (seeded sequence)', () => {
    const lru = new Lru<number>({ maxEntries: 50, maxBytes: 5_000 });
    let seed = 12345;
    // linear congruential sequence (Numerical Recipes constants), so the test is repeatable
    const next = () => (seed = (seed * 1664525 + 1013904223) % 2 ** 32);
    for (let i = 0; i < 10_000; i++) {
      lru.set(`k${next() % 400}`, i, 1 + (next() % 300));
      expect(lru.size).toBeLessThanOrEqual(50);
      expect(lru.bytes).toBeLessThanOrEqual(5_000);
    }
  });

  it('refuses limits below 1', () => {
    expect(() => new Lru({ maxEntries: 0, maxBytes: 10 })).toThrow(/at least 1/);
  });
});
