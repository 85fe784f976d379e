// Rectifier diode dissipation and the enclosure heat budget against hand-worked examples.
// Enclosure: ΔT = P / (U A); reference values part 2 §8 worked example [D on P]: aluminium box 200 x 150 x 80 mm,
// all six faces A = 2 (0.030 + 0.016 + 0.012) = 0.116 m², 15 W -> 15 / (6.5 x 0.116) = 19.9 K (U = 6.5 W/(m² K),
// sealed aluminium, an enclosure vendor's sizing page); 15 / (5.5 x 0.116) = 23.5 K (steel).
import { describe, expect, it } from 'vitest';
import { rectifierDissipationW, rectifierLoss } from '../../../src/core/power/rectifier-loss';
import { heatBudget } from '../../../src/core/power/heat-budget';
import type { RectifiedCorner } from '../../../src/core/power/report-types';
import { near } from './helpers';

const toleranceW = 0.001;
const toleranceK = 0.05; // ref prints one decimal

describe('rectifier dissipation (P = Vf I_avg + r_d I_rms² per diode; textbook conduction-loss model, ' +
  'from memory)', () => {
  it('bridge, 0.9 V and 0.03 Ω diodes, 1.31 A DC, 2.79 A RMS winding: 2 (0.9 x 1.31 + 0.03 x ' +
    '2.79²) = 2.825 W', () => {
    // 0.9 x 1.31 = 1.179; 0.03 x 7.7841 = 0.233523; sum 1.412523; x 2 = 2.825046
    near(rectifierDissipationW('bridge', 0.9, 0.03, 1.31, 2.79), 2.825046, toleranceW, 'bridge');
  });
  it('centre-tap, 0.9 V, 0.03 Ω, 1 A DC, 1.2 A RMS per half: 0.9 + 0.03 x 2 x 1.44 = 0.9864 W', () => {
    near(rectifierDissipationW('centre-tap', 0.9, 0.03, 1, 1.2), 0.9864, toleranceW, 'centre-tap');
  });
  it('half-wave, 0.7 V, 0.1 Ω, 0.5 A DC, 1 A RMS: 0.35 + 0.1 = 0.45 W', () => {
    near(rectifierDissipationW('half-wave', 0.7, 0.1, 0.5, 1), 0.45, toleranceW, 'half-wave');
  });
  it('duty-averaged over 40 % key-down: 0.4 P_kd + 0.6 P_ku', () => {
    const corners = [
      { id: 'high-keyDown', loadA: 1, secondaryRmsA: 2 },
      { id: 'high-keyUp', loadA: 0.1, secondaryRmsA: 0.3 },
    ] as RectifiedCorner[];
    // kd: 2 (0.9 + 0.03 x 4) = 2.04 W; ku: 2 (0.09 + 0.03 x 0.09) = 0.1854 W; 0.4 x 2.04 + 0.6 x 0.1854 = 0.92724 W
    const l = rectifierLoss('bridge', 0.9, 0.03, corners, 0.4);
    near(l.keyDownW, 2.04, toleranceW, 'kd');
    near(l.thermalW, 0.92724, toleranceW, 'thermal');
  });
});

describe('enclosure rise', () => {
  const pa = (w: number) => [{ name: 'PA', averageW: w }];
  it('15 W in 0.116 m² aluminium (U 6.5): 19.9 K', () => {
    const h = heatBudget(null, pa(15), 0.116, 6.5, 25);
    near(h.totalW, 15, toleranceW, 'total');
    near(h.riseK ?? NaN, 19.9, toleranceK, 'rise');
    near(h.insideC ?? NaN, 44.9, toleranceK, 'inside');
    expect(h.findings[0].severity).toBe('caution'); // above the 10 K caution level (common practice)
  });
  it('the same in steel (U 5.5): 23.5 K', () => {
    near(heatBudget(null, pa(15), 0.116, 5.5, 25).riseK ?? NaN, 23.5, toleranceK, 'rise');
  });
  it('3 W in the same steel box: 3 / (5.5 x 0.116) = 4.70 K, ok', () => {
    const h = heatBudget(null, pa(3), 0.116, 5.5, 25);
    near(h.riseK ?? NaN, 4.70, toleranceK, 'rise');
    expect(h.findings[0].severity).toBe('ok');
  });
  it('no enclosure entered: no rise, and a caution asking for it', () => {
    const h = heatBudget(null, pa(5), null, 5.5, 25);
    expect(h.riseK).toBeNull();
    expect(h.findings[0].severity).toBe('caution');
  });
});
