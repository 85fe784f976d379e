// The current budget's voltages and powers from the supply design: each rail's mean voltage in each mode at nominal
// mains (the simulation), and its key-down trough, so the DC power total multiplies every current by the voltage of
// the same mode instead of a nominal estimate that is neither the keyed nor the unkeyed value.
import type { BudgetReport, RailBudget } from './budget';
import type { PerMode } from './model';
import { MODES } from './model';
import type { SupplyReport } from './power/report-types';

const per = (f: (m: (typeof MODES)[number]) => number): PerMode => ({
  receive: f('receive'),
  keyUp: f('keyUp'),
  keyDown: f('keyDown'),
});

/** Rail voltages per mode at nominal mains from the supply report; null when the supply did not design the rail. */
function railVolts(
  r: RailBudget,
  supply: SupplyReport,
): { modeV: PerMode; troughV: number | null; condition: string } | null {
  const s = supply.rails.find((x) => x.railId === r.railId);
  if (!s) return null;
  if (s.kind === 'rectified') {
    const at = (id: string) => s.corners.find((c) => c.id === id);
    const kd = at('nominal-keyDown');
    if (!kd || !at('nominal-receive') || !at('nominal-keyUp')) return null;
    return {
      modeV: per((m) => at(`nominal-${m}`)!.dcMeanV),
      troughV: kd.troughV,
      condition:
        'mean rail voltage in each mode at nominal mains (supply simulation); trough = lowest point of the ripple, ' +
          'key-down',
    };
  }
  if (s.kind === 'regulated') {
    const kd = s.corners.find((c) => c.id === 'nominal-keyDown');
    // a regulator in dropout passes its input less the dropout (common practice, no published source)
    const troughV = kd ? Math.min(s.outputV, kd.inputTroughV - s.dropoutV) : null;
    return {
      modeV: per(() => s.outputV),
      troughV,
      condition: 'regulator output; trough = key-down at nominal mains (lower only in dropout)',
    };
  }
  return null;
}

/**
 * The budget with every rail's power as current x the mean voltage of the same mode (P = I V for a constant current
 * drawn at a mean voltage; the PA's key-down current is found at the nominal-mains key-down trough, a ripple's half
 * below the mean, so its power reads high by at most half the ripple over the rail voltage).
 */
export function withSupplyVoltages(budget: BudgetReport, supply: SupplyReport | null): BudgetReport {
  if (!supply) return budget;
  const rails = budget.rails.map((r): RailBudget => {
    const v = railVolts(r, supply);
    if (!v)
      return {
        ...r,
        voltageCondition: 'estimate: rated secondary peak less the diode drops (or the battery or regulator nominal)',
      };
    return {
      ...r,
      modeV: v.modeV,
      keyDownTroughV: v.troughV,
      voltageCondition: v.condition,
      outputW: per((m) => r.outputA[m] * v.modeV[m]),
    };
  });
  const byId = new Map(rails.map((r) => [r.railId, r]));
  const sources = budget.sources.map((s) => ({ ...s, outputW: byId.get(s.railId)?.outputW ?? s.outputW }));
  const totalW = sources.reduce((acc, s) => per((m) => acc[m] + s.outputW[m]), per(() => 0));
  return { ...budget, rails, sources, totalW };
}
