// The PA's output on its load line at another rail voltage: P2 = P1 ((V2 - Vsat)/(V1 - Vsat))² (load line
// P = (V - Vsat)² / 2R, textbook). Arithmetic written out; no program output used.
import { describe, expect, it } from 'vitest';
import { outputAtRailW } from '../../../src/core/power/recommended-pa';
import { near } from './helpers';

describe('outputAtRailW', () => {
  it('16.05 W at 21.03 V (Vsat 1 V) -> at 20.15 V: 16.05 x (19.15 / 20.03)² = 14.671 W', () => {
    // 19.15 / 20.03 = 0.956066; squared 0.914062; x 16.05 = 14.671
    near(outputAtRailW(16.05, 21.03, 1, 20.15), 14.671, 0.001, 'W');
  });
  it('the same rail gives the same output; a rail at Vsat gives none; no swing is unknown, not 0', () => {
    expect(outputAtRailW(5, 12, 1, 12)).toBe(5);
    expect(outputAtRailW(5, 12, 1, 1)).toBe(0);
    expect(outputAtRailW(5, 1, 1, 12)).toBeNaN();
  });
});
