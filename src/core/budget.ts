// Current budget: what every rail must deliver in each operating mode, propagated up the supply tree.
// A current that cannot be computed (core refuses a PA's data, say) is NaN: "unknown". It stays unknown through
// every sum up the tree and is shown as unknown; it never becomes 0. The findings say why.
import type { Project, PerMode, Rail, RegulatedRail, Mode } from './model';
import { MODES } from './model';
import type { Finding } from './findings';
import { regulatorOutputV, regulatorInputCurrentA } from './power/regulator';
import { rectifiedEstimateV } from './role-defaults';

export interface LoadContribution {
  stageId: string;
  stageName: string;
  currentA: PerMode;
  /** true when the current was computed (PA key-down current, relay coil), not entered */
  computed: boolean;
}

export interface RailBudget {
  railId: string;
  name: string;
  kind: Rail['kind'];
  parentId: string | null;
  /** depth in the supply tree: 0 for a rectified rail or battery */
  depth: number;
  /** the rail's nominal output voltage, V */
  nominalV: number;
  /** sum of the stage loads connected directly to this rail, A */
  ownA: PerMode;
  /** input current of the regulators this rail feeds, A */
  regulatorsA: PerMode;
  /** everything this rail must deliver: ownA + regulatorsA, A */
  outputA: PerMode;
  /** for a regulated rail: the current it draws from its parent, A; null otherwise */
  inputA: PerMode | null;
  /** outputA x the rail's voltage in that mode (modeV when the supply is designed, else nominalV), W */
  outputW: PerMode;
  /** mean rail voltage per mode at nominal mains from the supply design, V; absent before the supply is designed */
  modeV?: PerMode;
  /** lowest point of the ripple with the key down at nominal mains, V; absent/null when not known */
  keyDownTroughV?: number | null;
  /** which voltage the Voltage column and the powers use, in words */
  voltageCondition?: string;
  loads: LoadContribution[];
}

export interface BudgetReport {
  rails: RailBudget[];
  /** root rails (rectified rails and batteries): what each source delivers */
  sources: { railId: string; name: string; outputA: PerMode; outputW: PerMode }[];
  /** sum of the DC power delivered by all sources per mode, W */
  totalW: PerMode;
  findings: Finding[];
}

export interface ComputedLoad {
  stageId: string;
  railId: string;
  /** NaN in a mode = unknown (the findings say why) */
  currentA: PerMode;
  /** why a mode is unknown: fail findings naming the stage and the refused field */
  findings?: Finding[];
  /** replace the stage's entered load on this rail in these modes (PA key-down); otherwise add */
  replaces: Mode[];
}

const zero = (): PerMode => ({ receive: 0, keyUp: 0, keyDown: 0 });
const add = (a: PerMode, b: PerMode): PerMode => ({
  receive: a.receive + b.receive,
  keyUp: a.keyUp + b.keyUp,
  keyDown: a.keyDown + b.keyDown,
});
const map = (a: PerMode, f: (v: number, m: Mode) => number): PerMode => ({
  receive: f(a.receive, 'receive'),
  keyUp: f(a.keyUp, 'keyUp'),
  keyDown: f(a.keyDown, 'keyDown'),
});

/** Modes in which a rail's current is unknown (a computed load could not be computed). */
export function unknownModes(a: PerMode): Mode[] {
  return MODES.filter((m) => Number.isNaN(a[m]));
}

/** Nominal (no-load-ish, nominal mains) voltage of a rail, for budgets and display; NaN (unknown) with no winding. */
export function railNominalV(rail: Rail, project: Project): number {
  if (rail.kind === 'battery') return rail.nominalV;
  if (rail.kind === 'regulated') return regulatorOutputV(rail.setting, rail.quiescentA);
  const winding = project.supply.transformers.flatMap((t) => t.windings).find((w) => w.id === rail.windingId);
  if (!winding) return NaN; // the supply design fails the rail for it; shown as unknown, not 0 V
  // Capacitor-input rectifier: DC ~ peak of the rated secondary minus the
  // conducting diode drops (REFERENCE-VALUES §4.1)
  return Math.max(0, rectifiedEstimateV(winding.ratedVrms, rail.topology, rail.diodeDropV));
}

/** Lowest voltage a rail may present to a switching regulator it feeds (budget estimate). */
function railLowestV(rail: Rail, project: Project): number {
  if (rail.kind === 'battery') return rail.endV;
  if (rail.kind === 'regulated') return regulatorOutputV(rail.setting, rail.quiescentA);
  const low = project.mains ? 1 - project.mains.lowFraction : 1;
  return railNominalV(rail, project) * low;
}

export function computeBudget(
  project: Project,
  computed: ComputedLoad[] = [],
  inputVOverride: Record<string, number> = {},
): BudgetReport {
  const findings: Finding[] = [];
  const rails = project.supply.rails;
  const byId = new Map(rails.map((r) => [r.id, r]));
  const own = new Map<string, PerMode>(rails.map((r) => [r.id, zero()]));
  const loads = new Map<string, LoadContribution[]>(rails.map((r) => [r.id, []]));

  const noRail = (stageName: string, railId: string, what: string): Finding => ({
    severity: 'fail',
    rule: 'budget.no-rail',
    subject: `${stageName}: ${what}`,
    value: null,
    limit: null,
    unit: 'A',
    source: 'design.consistency',
    message:
      railId === ''
        ? `${stageName} draws current (${what}) from no rail, so no rail's budget carries it. Choose its rail.`
        : `${stageName} draws current (${what}) from a rail that is not in this project's supply, so no rail's ` +
          `budget carries it. Choose its rail.`,
  });
  for (const stage of project.stages) {
    for (const load of stage.loads) {
      if (!byId.has(load.railId)) {
        if (MODES.some((m) => load.currentA[m] !== 0)) findings.push(noRail(stage.name, load.railId, 'entered load'));
        continue;
      }
      const replaced = computed
        .filter((c) => c.stageId === stage.id && c.railId === load.railId)
        .flatMap((c) => c.replaces);
      const current = map(load.currentA, (v, m) => (replaced.includes(m) ? 0 : v));
      own.set(load.railId, add(own.get(load.railId)!, current));
      loads.get(load.railId)!.push({ stageId: stage.id, stageName: stage.name, currentA: current, computed: false });
    }
  }
  for (const c of computed) {
    const stage = project.stages.find((s) => s.id === c.stageId);
    findings.push(...(c.findings ?? []));
    if (!byId.has(c.railId)) {
      // a load that already explains itself (a refused coil rail) needs no second finding
      if (!c.findings?.length) findings.push(noRail(stage?.name ?? c.stageId, c.railId, 'computed load'));
      continue;
    }
    own.set(c.railId, add(own.get(c.railId)!, c.currentA));
    loads
      .get(c.railId)!
      .push({ stageId: c.stageId, stageName: stage?.name ?? c.stageId, currentA: c.currentA, computed: true });
  }

  // Children of each rail; detect cycles (a regulator fed, through others, by itself).
  const children = new Map<string, RegulatedRail[]>(rails.map((r) => [r.id, []]));
  for (const r of rails) if (r.kind === 'regulated' && byId.has(r.parentId)) children.get(r.parentId)!.push(r);
  const depth = new Map<string, number>();
  const visiting = new Set<string>();
  const depthOf = (r: Rail): number => {
    if (depth.has(r.id)) return depth.get(r.id)!;
    if (r.kind !== 'regulated' || !byId.has(r.parentId)) return 0;
    if (visiting.has(r.id)) return -1;
    visiting.add(r.id);
    const d = depthOf(byId.get(r.parentId)!);
    visiting.delete(r.id);
    const result = d < 0 ? -1 : d + 1;
    depth.set(r.id, result);
    return result;
  };
  for (const r of rails) depth.set(r.id, depthOf(r));

  const output = new Map<string, PerMode>();
  const input = new Map<string, PerMode>();
  const regs = new Map<string, PerMode>();
  const outputOf = (r: Rail): PerMode => {
    if (output.has(r.id)) return output.get(r.id)!;
    let fromRegs = zero();
    for (const child of children.get(r.id)!) {
      if (depth.get(child.id)! < 0) continue;
      const childOut = outputOf(child);
      const inV = inputVOverride[r.id] ?? railLowestV(r, project);
      // an unknown output current makes the regulator's input current unknown too (never 0)
      const childIn = map(childOut, (v) => (Number.isNaN(v) ? NaN : regulatorInputCurrentA(child, v, inV)));
      input.set(child.id, childIn);
      fromRegs = add(fromRegs, childIn);
    }
    regs.set(r.id, fromRegs);
    const total = add(own.get(r.id)!, fromRegs);
    output.set(r.id, total);
    return total;
  };

  const result: RailBudget[] = [];
  for (const r of rails) {
    const d = depth.get(r.id)!;
    if (d < 0) {
      findings.push({
        severity: 'fail',
        rule: 'supply.loop',
        subject: r.name,
        value: null,
        limit: null,
        unit: '',
        source: 'design.consistency',
        message: `${r.name} is fed, through other regulators, by itself. Choose a different source rail.`,
      });
    }
    if (r.kind === 'regulated' && !byId.has(r.parentId)) {
      findings.push({
        severity: 'fail',
        rule: 'supply.parent',
        subject: r.name,
        value: null,
        limit: null,
        unit: '',
        source: 'design.consistency',
        message: `${r.name} has no source rail.`,
      });
    }
    const out = d < 0 ? zero() : outputOf(r);
    const v = railNominalV(r, project);
    if (Number.isNaN(v)) {
      findings.push({
        severity: 'fail',
        rule: 'budget.rail-voltage',
        subject: r.name,
        value: null,
        limit: null,
        unit: 'V',
        source: 'design.consistency',
        message: `${r.name} has no transformer winding, so its voltage and the power it delivers are unknown; choose ` +
          `its winding.`,
      });
    }
    result.push({
      railId: r.id,
      name: r.name,
      kind: r.kind,
      parentId: r.kind === 'regulated' ? r.parentId : null,
      depth: Math.max(0, d),
      nominalV: v,
      ownA: own.get(r.id)!,
      regulatorsA: regs.get(r.id) ?? zero(),
      outputA: out,
      inputA: r.kind === 'regulated' ? (input.get(r.id) ?? zero()) : null,
      outputW: map(out, (a) => a * v),
      loads: loads.get(r.id)!,
    });
  }
  // regulated rails whose parent is missing still ask for current: fold nothing up, the finding says so
  const sources = result
    .filter((r) => r.kind !== 'regulated')
    .map((r) => ({ railId: r.railId, name: r.name, outputA: r.outputA, outputW: r.outputW }));
  // an unknown (NaN) source power leaves the total unknown: it is shown as such, never as 0
  const totalW = sources.reduce((acc, s) => add(acc, s.outputW), zero());
  return { rails: result, sources, totalW, findings };
}

export { zero as zeroPerMode, add as addPerMode };
