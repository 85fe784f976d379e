// One parameter swept over a range: each point is a copy of the project with that one value changed, evaluated
// whole, and reduced to the comparison figures (metrics.ts). Pure: the evaluation is passed in, so the web layer
// can use its report cache; core's evaluate() is the default.
import type { Project } from '../model';
import { evaluate, type EvaluationReport } from '../evaluate';
import { projectMetrics, type Metric } from './metrics';
import { SWEEP_LABELS, oddBetween, type SweepParameter } from '../spec/sweep';

export interface SweepRequest {
  parameter: SweepParameter;
  /** id of the item to vary; '' = the default item (sweepTargets' first) */
  target: string;
  /** SI, in the parameter's unit (V, F, Ω; the filter order is a count) */
  from: number;
  to: number;
  points: number;
}

export interface SweepTarget {
  id: string;
  name: string;
  /** the item's value now (SI) */
  currentValue: number;
}

export interface SweepPoint {
  value: number;
  metrics: Metric[];
}

export interface SweepResult {
  parameter: SweepParameter;
  label: string;
  target: SweepTarget;
  points: SweepPoint[];
}

export type SweepOutcome = { ok: true; result: SweepResult } | { ok: false; errors: Record<string, string> };

/** The items a parameter can vary in this project, the one the PA depends on first. */
export function sweepTargets(p: Project, parameter: SweepParameter): SweepTarget[] {
  const pa = p.stages.find((s) => s.kind === 'final' && s.pa)?.pa;
  const paRail = p.supply.rails.find((r) => r.id === pa?.railId);
  const first = <T extends { id: string }>(xs: T[], id: string | undefined) => [
    ...xs.filter((x) => x.id === id),
    ...xs.filter((x) => x.id !== id),
  ];
  switch (parameter) {
    case 'mainsV':
      return p.mains ? [{ id: 'mains', name: 'Mains', currentValue: p.mains.nominalV }] : [];
    case 'windingV': {
      const ws = p.supply.transformers.flatMap((t) =>
        t.windings.map((w) => ({ id: w.id, name: `${t.name}: ${w.name}`, currentValue: w.ratedVrms })),
      );
      return first(ws, paRail?.kind === 'rectified' ? paRail.windingId : undefined);
    }
    case 'reservoirF': {
      const rs = p.supply.rails.flatMap((r) =>
        r.kind === 'rectified' ? [{ id: r.id, name: r.name, currentValue: r.reservoirF }] : [],
      );
      return first(rs, paRail?.id);
    }
    case 'paLoadOhm':
      return p.stages.flatMap((s) =>
        s.kind === 'final' && s.pa ? [{ id: s.id, name: s.name, currentValue: s.pa.loadOhm }] : [],
      );
    case 'lpfOrder':
      return p.stages.flatMap((s) =>
        s.kind === 'lpf' && s.lpf ? [{ id: s.id, name: s.name, currentValue: s.lpf.order }] : [],
      );
  }
}

const NONE: Record<SweepParameter, string> = {
  mainsV: 'this project has no mains supply (battery or DC only)',
  windingV: 'this project has no transformer winding',
  reservoirF: 'this project has no rectified rail with a reservoir',
  paLoadOhm: 'this project has no final amplifier stage with PA data',
  lpfOrder: 'this project has no low-pass filter stage',
};

/** The values the sweep evaluates: evenly spaced from..to; for the filter order, each odd order in the range. */
export function sweepValues(req: Pick<SweepRequest, 'parameter' | 'from' | 'to' | 'points'>): number[] {
  if (req.parameter === 'lpfOrder') return oddBetween(req.from, req.to);
  const n = Math.max(2, Math.round(req.points));
  return Array.from({ length: n }, (_, i) => req.from + ((req.to - req.from) * i) / (n - 1));
}

/** A copy of the project with the parameter of one item set to value. */
export function withSweepValue(p: Project, parameter: SweepParameter, targetId: string, value: number): Project {
  const copy = structuredClone(p);
  switch (parameter) {
    case 'mainsV': {
      // The station plugged into other mains: the transformer stays wound for the project's nominal mains, so each
      // secondary follows the primary by the turns ratio (ideal transformer, V_s = V_p N_s / N_p). Changing only
      // the nominal would change nothing: the windings are rated at nominal mains and the corners are relative.
      if (!copy.mains) break;
      const ratio = value / copy.mains.nominalV;
      for (const t of copy.supply.transformers) for (const w of t.windings) w.ratedVrms *= ratio;
      copy.mains.nominalV = value;
      break;
    }
    case 'windingV':
      for (const t of copy.supply.transformers) for (const w of t.windings) if (w.id === targetId) w.ratedVrms = value;
      break;
    case 'reservoirF':
      for (const r of copy.supply.rails) if (r.id === targetId && r.kind === 'rectified') r.reservoirF = value;
      break;
    case 'paLoadOhm':
      for (const s of copy.stages) if (s.id === targetId && s.pa) s.pa.loadOhm = value;
      break;
    case 'lpfOrder':
      for (const s of copy.stages) if (s.id === targetId && s.lpf) s.lpf.order = value;
      break;
  }
  // its own id, so a per-version report cache keeps the points apart from the stored project and from each other
  copy.id = `${p.id}~sweep~${parameter}~${targetId}~${value}`;
  return copy;
}

/** Check the request against the project (the form's spec has checked the numbers) and evaluate each point. */
export function runSweep(
  p: Project,
  req: SweepRequest,
  evaluateFn: (p: Project) => EvaluationReport = evaluate,
): SweepOutcome {
  const targets = sweepTargets(p, req.parameter);
  if (!targets.length) return { ok: false, errors: { target: `Item to vary: ${NONE[req.parameter]}` } };
  const target = req.target === '' ? targets[0] : targets.find((t) => t.id === req.target);
  if (!target) {
    const names = targets.map((t) => `"${t.name}"`).join(', ');
    return {
      ok: false,
      errors: {
        target: `Item to vary: there is no such item ("${req.target.slice(0, 80)}") for a ` +
          `${SWEEP_LABELS[req.parameter].toLowerCase()} sweep; choose one of ${names}`,
      },
    };
  }
  const points = sweepValues(req).map((value) => {
    const copy = withSweepValue(p, req.parameter, target.id, value);
    return { value, metrics: projectMetrics(copy, evaluateFn(copy)) };
  });
  return { ok: true, result: { parameter: req.parameter, label: SWEEP_LABELS[req.parameter], target, points } };
}

/** A starting range around the item's value for the sweep form (the builder edits it); inside the field's range. */
export function sweepStart(
  parameter: SweepParameter,
  currentValue: number,
  field: { min: number; max: number },
): { from: number; to: number; points: number } {
  if (parameter === 'lpfOrder') return { from: 3, to: 9, points: 4 };
  // Common practice, no published source: ±15 % covers mains tolerance; a factor of 2 either way shows a part's trend
  const [lo, hi] = parameter === 'mainsV' || parameter === 'windingV' ? [0.85, 1.15] : [0.5, 2];
  const clamp = (v: number) => Math.min(field.max, Math.max(field.min, v));
  const round = (v: number) => Number(v.toPrecision(2));
  return { from: clamp(round(currentValue * lo)), to: clamp(round(currentValue * hi)), points: 7 };
}
