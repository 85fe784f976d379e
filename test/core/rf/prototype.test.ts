import { describe, expect, it } from 'vitest';
import { prototypeG, prototypeLossDb } from '../../../src/core/rf/prototype';
import { near } from './helpers';

// Published 4-decimal tables need ±0.0002 (REFERENCE-VALUES.md §1.3 note on 0.7970 vs 0.79694).
const toleranceG = 0.0002;

describe('Butterworth prototype g-values', () => {
  // Source: Matthaei, Young & Jones (1964) Table 4.05-1 as reproduced on rfcafe.com (REFERENCE-VALUES §1.2, [C])
  const table: Record<number, number[]> = {
    3: [1.0, 2.0, 1.0],
    5: [0.618, 1.618, 2.0, 1.618, 0.618],
    7: [0.445, 1.247, 1.8019, 2.0, 1.8019, 1.247, 0.445],
  };
  for (const [n, g] of Object.entries(table)) {
    it(`n=${n} matches the published table`, () => {
      const got = prototypeG('butterworth', Number(n), 0);
      expect(got).toHaveLength(g.length);
      got.forEach((x, i) => near(x, g[i], toleranceG, `g${i + 1}`));
    });
  }
});

describe('Chebyshev prototype g-values', () => {
  // Source: rfcafe.com reproduction of the Matthaei/Young/Jones Chebyshev tables,
  // 4 decimals (REFERENCE-VALUES §1.3, [C])
  const table: [number, number, number[]][] = [
    [0.01, 3, [0.6292, 0.9703, 0.6292]],
    [0.01, 5, [0.7563, 1.3049, 1.5773, 1.3049, 0.7563]],
    [0.01, 7, [0.797, 1.3924, 1.7481, 1.6331, 1.7481, 1.3924, 0.797]],
    [0.1, 3, [1.0316, 1.1474, 1.0316]],
    [0.1, 5, [1.1468, 1.3712, 1.975, 1.3712, 1.1468]],
    [0.1, 7, [1.1812, 1.4228, 2.0967, 1.5734, 2.0967, 1.4228, 1.1812]],
    [0.5, 3, [1.5963, 1.0967, 1.5963]],
    [0.5, 5, [1.7058, 1.2296, 2.5408, 1.2296, 1.7058]],
    [0.5, 7, [1.7373, 1.2582, 2.6383, 1.3443, 2.6383, 1.2582, 1.7373]],
  ];
  for (const [ripple, n, g] of table) {
    it(`${ripple} dB n=${n} matches the published table`, () => {
      prototypeG('chebyshev', n, ripple).forEach((x, i) => near(x, g[i], toleranceG, `g${i + 1}`));
    });
  }
  it('odd orders are symmetric (g_k = g_{n+1-k})', () => {
    for (const n of [3, 5, 7, 9]) {
      const g = prototypeG('chebyshev', n, 0.2);
      g.forEach((x, i) => near(x, g[n - 1 - i], 1e-9, `n=${n} g${i + 1}`));
    }
  });
});

describe('closed-form attenuation', () => {
  // Source: REFERENCE-VALUES §1.4 table [D] from the Bretchko & Ludwig equal-ripple form; printed to 0.01 dB
  const toleranceDb = 0.006;
  const rows: [number, number, number, number, number, number][] = [
    [3, 2, 18.13, 4.08, 12.24, 19.22],
    [3, 3, 28.63, 13.73, 23.6, 30.78],
    [5, 2, 30.11, 24.82, 34.85, 42.04],
    [5, 3, 47.71, 44.16, 54.21, 61.4],
    [7, 2, 42.14, 47.68, 57.72, 64.92],
    [7, 3, 66.8, 74.78, 84.83, 92.02],
  ];
  for (const [n, w, bw, c001, c01, c05] of rows) {
    it(`n=${n}, Ω=${w}`, () => {
      near(prototypeLossDb('butterworth', n, 0, w), bw, toleranceDb, 'Butterworth');
      near(prototypeLossDb('chebyshev', n, 0.01, w), c001, toleranceDb, '0.01 dB');
      near(prototypeLossDb('chebyshev', n, 0.1, w), c01, toleranceDb, '0.1 dB');
      near(prototypeLossDb('chebyshev', n, 0.5, w), c05, toleranceDb, '0.5 dB');
    });
  }
  it('Chebyshev loss equals the ripple at the cutoff (ripple-edge definition, REFERENCE-VALUES §1.1)', () => {
    near(prototypeLossDb('chebyshev', 5, 0.1, 1), 0.1, 1e-9, '0.1 dB n=5');
    near(prototypeLossDb('butterworth', 5, 0, 1), 3.0103, 1e-4, 'Butterworth 3 dB');
  });
});
