// Budget powers at consistent voltages: each mode's current times the rail's mean voltage in that mode (P = I V for a
// constant current at a mean voltage; arithmetic written out, no program output used).
import { describe, expect, it } from 'vitest';
import { withSupplyVoltages } from '../../src/core/budget-voltages';
import type { BudgetReport, RailBudget } from '../../src/core/budget';
import type { SupplyReport } from '../../src/core/power/report-types';

const pm = (receive: number, keyUp: number, keyDown: number) => ({ receive, keyUp, keyDown });
const rail = {
  railId: 'pa',
  name: 'PA rail',
  kind: 'rectified',
  parentId: null,
  depth: 0,
  nominalV: 26.5,
  ownA: pm(0, 0.05, 1.31),
  regulatorsA: pm(0, 0, 0),
  outputA: pm(0, 0.05, 1.31),
  inputA: null,
  outputW: pm(0, 0.05 * 26.5, 1.31 * 26.5),
  loads: [],
} as RailBudget;
const budget: BudgetReport = {
  rails: [rail],
  sources: [{ railId: 'pa', name: 'PA rail', outputA: rail.outputA, outputW: rail.outputW }],
  totalW: rail.outputW,
  findings: [],
};
const corner = (id: string, dcMeanV: number, troughV: number) => ({ id, dcMeanV, troughV });
const supply = {
  rails: [
    {
      kind: 'rectified',
      railId: 'pa',
      corners: [
        corner('nominal-receive', 28.5, 28.4),
        corner('nominal-keyUp', 28.2, 28),
        corner('nominal-keyDown', 24.5, 23.9),
      ],
    },
  ],
} as unknown as SupplyReport;

describe('withSupplyVoltages', () => {
  const b = withSupplyVoltages(budget, supply);
  it('key-down power 1.31 A x 24.5 V = 32.095 W, not 1.31 x 26.5 = 34.715 W', () => {
    expect(b.rails[0].outputW.keyDown).toBeCloseTo(32.095, 9);
    expect(b.totalW.keyDown).toBeCloseTo(32.095, 9);
  });
  it('key-up 0.05 A x 28.2 V = 1.41 W; the voltages per mode and the key-down trough are reported with their ' +
    'condition', () => {
    expect(b.totalW.keyUp).toBeCloseTo(1.41, 9);
    expect(b.rails[0].modeV).toEqual(pm(28.5, 28.2, 24.5));
    expect(b.rails[0].keyDownTroughV).toBe(23.9);
    expect(b.rails[0].voltageCondition).toContain('nominal mains');
  });
  it('without a supply design the nominal estimate stays and says so', () => {
    expect(withSupplyVoltages(budget, null)).toBe(budget);
    const none = withSupplyVoltages(budget, { rails: [] } as unknown as SupplyReport);
    expect(none.rails[0].outputW.keyDown).toBeCloseTo(34.715, 9);
    expect(none.rails[0].voltageCondition).toContain('estimate');
  });
});
