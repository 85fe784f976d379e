// Cross-regulation of a transformer's rectified rails: its windings simulated together (shared-primary.ts) at low
// mains, every rail at its key-down current and again at its key-up current, beside each rail's own simulation
// (which gives each winding the whole transformer's resistance to itself).
import type { Finding } from '../findings';
import type { Mains, PerMode, RectifiedRail, Transformer } from '../model';
import type { RailReport } from './report-types';
import { mainsFactor, WORST_VOLTAGE_ID } from './corners';
import { PRIMARY_COPPER_SHARE, primaryOhmFromRegulation } from './inrush';
import { simulateSharedPrimary, type JointWinding } from './shared-primary';
import { noLoadVrms, windingResistanceOhm } from './winding';

export interface CrossRegulationRail {
  railId: string;
  railName: string;
  windingName: string;
  /** Lowest voltage its loads need (V), 0 when none is known. */
  requiredMinV: number;
  /** Low-mains key-down trough from the rail's own simulation (V). */
  aloneTroughV: number;
  /** Low-mains troughs simulated together, every rail keyed down / every rail key-up (V, reservoir node). */
  keyDownTroughV: number;
  keyUpTroughV: number;
}

export interface CrossRegulation {
  /** Primary resistance shared by the windings (Ω) and the low-mains voltage simulated (V). */
  primaryOhm: number;
  mainsV: number;
  converged: boolean;
  rails: CrossRegulationRail[];
}

/** null when fewer than two designed rectified rails hang on the transformer (nothing is shared). */
export function crossRegulation(
  t: Transformer, rails: RectifiedRail[], reports: Map<string, RailReport>,
  budget: (id: string) => PerMode, mains: Mains,
): { report: CrossRegulation; findings: Finding[] } | null {
  const on = rails.flatMap((r) => {
    const w = t.windings.find((x) => x.id === r.windingId);
    const rep = reports.get(r.id);
    return w && rep?.kind === 'rectified' ? [{ r, w, rep }] : [];
  });
  if (on.length < 2) return null;
  const f = mainsFactor(mains, 'low');
  const primaryOhm = primaryOhmFromRegulation(t, mains.nominalV);
  const windings = (mode: 'keyDown' | 'keyUp'): JointWinding[] => on.map(({ r, w }) => ({
    topology: r.topology, secondaryVrms: noLoadVrms(w) * f,
    // the winding keeps its own share of the copper; the primary's share is the shared primaryOhm
    ownOhm: (1 - PRIMARY_COPPER_SHARE) * windingResistanceOhm(w),
    diodeDropV: r.diodeDropV, diodeResistanceOhm: r.diodeResistanceOhm, capacitanceF: r.reservoirF, esrOhm: r.esrOhm,
    loadA: budget(r.id)[mode], bleederOhm: r.bleederOhm,
  }));
  // 1000 steps a cycle: within 20 mV of ngspice on the club demo (test/core/power/shared-primary.test.ts)
  const run = (mode: 'keyDown' | 'keyUp') => simulateSharedPrimary({
    primaryVrms: mains.nominalV * f, primaryOhm, frequencyHz: mains.frequencyHz, windings: windings(mode),
    stepsPerCycle: 1000,
  });
  const down = run('keyDown');
  const up = run('keyUp');
  const out: CrossRegulationRail[] = on.map(({ r, w, rep }, i) => ({
    railId: r.id, railName: r.name, windingName: w.name, requiredMinV: rep.requiredMinV,
    aloneTroughV: rep.corners.find((c) => c.id === WORST_VOLTAGE_ID)?.troughV ?? NaN,
    keyDownTroughV: down.rails[i].troughV, keyUpTroughV: up.rails[i].troughV,
  }));
  const report = { primaryOhm, mainsV: mains.nominalV * f, converged: down.converged && up.converged, rails: out };
  const base = {
    rule: 'transformer.cross-regulation', subject: t.name, unit: 'V', source: 'supply.shared-primary' as const,
  };
  const v = (x: number) => `${x.toFixed(2)} V`;
  const shared = `${primaryOhm.toFixed(1)} Ω`;
  const findings: Finding[] = out.filter((x) => x.requiredMinV > 0 && x.keyDownTroughV < x.requiredMinV).map((x) => ({
    ...base, severity: 'caution' as const, value: x.keyDownTroughV, limit: x.requiredMinV,
    message: `With ${t.name}'s windings sharing the primary (${shared}), at low mains with the key down the ` +
      `${x.railName} falls to ${v(x.keyDownTroughV)} (${v(x.aloneTroughV)} simulated alone), below the ` +
      `${v(x.requiredMinV)} its loads need: a higher winding voltage or a larger transformer.`,
  }));
  if (!findings.length) {
    const words = out.map((x) =>
      `${x.railName} ${v(x.keyDownTroughV)} (${v(x.aloneTroughV)} alone, ${v(x.keyUpTroughV)} key-up)`);
    findings.push({
      ...base, severity: 'ok', value: null, limit: null,
      message: `Simulated together with the primary shared (${shared}), at low mains with the key down: ` +
        `${words.join('; ')}; every rail still has the voltage its loads need.`,
    });
  }
  return { report, findings };
}
