// Benchmark hook for `npm run bench`: workloads only (the core has no clock); the caller times run().
import type { PerMode, Project } from '../model';
import { evaluateSupply } from './evaluate-supply';
import { simulateRectifier, type RectifierSimInput } from './rectifier-sim';
import { rectifierNetlist } from './spice-netlist';

export interface BenchCase {
  name: string;
  /** Runs the workload once; the return value is only there so it cannot be optimised away. */
  run: () => unknown;
}

/** Reference values §4.2 worked example: 19.08 V rms open circuit, 0.194 Ω, bridge, 10,000 µF, 3 A. */
export const REF_42_INPUT: RectifierSimInput = {
  topology: 'bridge', secondaryVrms: 19.08, windingResistanceOhm: 0.194, frequencyHz: 50, diodeDropV: 0.75,
  diodeResistanceOhm: 0.02, capacitanceF: 0.01, esrOhm: 0, load: { kind: 'current', currentA: 3 },
};

/**
 * Supply workloads. With a project and its budget (rail id -> output current per mode) the list includes the
 * whole evaluateSupply (all corners, searches and recommendations); target well under ~50 ms per run.
 */
export function supplyBenchCases(project?: Project, railOutputA?: Record<string, PerMode>): BenchCase[] {
  const cases: BenchCase[] = [
    {
      name: 'rectifier simulation, 18 V / 3 A / 10,000 µF bridge (one corner)',
      run: () => simulateRectifier(REF_42_INPUT).dcMeanV,
    },
    { name: 'SPICE netlist text, 18 V / 3 A / 10,000 µF bridge', run: () => rectifierNetlist(REF_42_INPUT).length },
  ];
  if (project && railOutputA)
    cases.push({
      name: `evaluateSupply: ${project.name}`,
      run: () => evaluateSupply(project, railOutputA).simulations,
    });
  return cases;
}
