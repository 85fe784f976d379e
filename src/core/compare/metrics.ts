// The figures a builder weighs when choosing between variants of one station, read from an evaluation report:
// trough margin per rail, transformer VA, PA output at low mains, worst drain peak, worst harmonic margin, exposure
// distance and cost per kit. Pure; nothing is recomputed here, every figure is the report's own.
import type { Project } from '../model';
import type { EvaluationReport } from '../evaluate';
import type { RailReport } from '../power/report-types';

export type Better = 'higher' | 'lower';

export interface Metric {
  /** stable key: rows of different projects with the same key are compared ('trough:<rail name>', 'transformerVA') */
  key: string;
  label: string;
  /** SI unit of value ('V', 'VA', 'W', 'dB', 'm'); money is in integer minor units with unit 'cents' */
  unit: string;
  better: Better;
  /** null: not applicable to this project (no transformer, no PA) or not computable (the inputs were refused) */
  value: number | null;
  /** why value is null, in words; '' when there is a value */
  why: string;
  /** the project currency, for unit 'cents' */
  currency?: string;
  /** a margin (positive = passes, negative = fails): the sweep plots these against the limit line at 0 */
  margin?: boolean;
}

const finiteOrNull = (x: number | undefined | null): number | null =>
  typeof x === 'number' && Number.isFinite(x) ? x : null;
const minOf = (xs: number[]): number | null => (xs.length ? Math.min(...xs) : null);

/** Lowest key-down margin of a rail above the least voltage it must keep (V), or null with the reason. */
export function railTroughMargin(r: RailReport): { value: number | null; why: string } {
  if (r.kind === 'rectified') {
    // a rail with no stated minimum has nothing to keep above: a margin would be meaningless
    if (!(r.requiredMinV > 0)) return { value: null, why: 'no minimum stated for this rail' };
    const m = minOf(
      r.corners
        .filter((c) => c.load === 'keyDown')
        .map((c) => c.headroomMarginV)
        .filter(Number.isFinite),
    );
    return m === null ? { value: null, why: 'not simulated' } : { value: m, why: '' };
  }
  if (r.kind === 'regulated') {
    // a regulator's input trough against its output plus its dropout (the datasheet's definition of dropout)
    const m = minOf(
      r.corners
        .filter((c) => c.load === 'keyDown')
        .map((c) => c.inputTroughV - r.outputV - r.dropoutV)
        .filter(Number.isFinite),
    );
    return m === null ? { value: null, why: 'not computed' } : { value: m, why: '' };
  }
  if (!(r.requiredMinV > 0)) return { value: null, why: 'no minimum stated for this rail' };
  const m = finiteOrNull(r.loadedEndV - r.requiredMinV);
  return m === null ? { value: null, why: 'not computed' } : { value: m, why: '' };
}

/** The figures of one evaluated project, in a fixed order (rails in the project's order). */
export function projectMetrics(project: Project, report: EvaluationReport): Metric[] {
  const out: Metric[] = [];
  for (const rail of project.supply.rails) {
    const r = report.supply?.rails.find((x) => x.railId === rail.id);
    const m = r ? railTroughMargin(r) : { value: null, why: 'left out of the supply design (see its findings)' };
    const what = r?.kind === 'regulated' ? 'regulator headroom above dropout' : 'trough margin above its minimum';
    const worst = project.mains ? 'worst mains' : 'battery at its end voltage';
    out.push({
      key: `trough:${rail.name}`,
      label: `${rail.name}: ${what}, key-down, ${worst}`,
      unit: 'V',
      better: 'higher',
      margin: true,
      ...m,
    });
  }

  const trafos = report.supply?.transformers ?? [];
  out.push({
    key: 'transformerVA',
    label: 'Transformer VA needed (CW at the keying duty, all transformers)',
    unit: 'VA',
    better: 'lower',
    value: trafos.length ? trafos.reduce((s, t) => s + t.thermalVA, 0) : null,
    why: trafos.length ? '' : 'no mains transformer',
  });

  const pas = report.rf.stages.filter((s) => s.kind === 'final');
  const paMain = pas.find((s) => s.stageId === report.rf.paStageId) ?? pas[0];
  const lowOut = paMain?.pa && !paMain.pa.refused ? finiteOrNull(paMain.pa.lowOutputW) : null;
  out.push({
    key: 'paLowOutputW',
    label: 'PA output at low mains (or a flat battery), key-down',
    unit: 'W',
    better: 'higher',
    value: lowOut,
    why: lowOut !== null ? '' : paMain ? 'the PA inputs were refused (see its findings)' : 'no final amplifier stage',
  });

  // the worst SWR circle's drain peak where the report has it, else the matched peak at the highest supply
  const peaks = pas
    .flatMap((s) => (s.pa && !s.pa.refused ? [s.pa.swr?.worstDrainPeak.value ?? s.pa.peakDrainV] : []))
    .filter(Number.isFinite);
  const peak = peaks.length ? Math.max(...peaks) : null;
  out.push({
    key: 'drainPeakV',
    label: 'Worst drain peak (round the worst-SWR circle, at the highest supply)',
    unit: 'V',
    better: 'lower',
    value: peak,
    why: peak !== null ? '' : pas.length ? 'the PA inputs were refused (see its findings)' : 'no final amplifier stage',
  });

  const rows = report.rf.harmonics?.rows ?? [];
  const hm = minOf(rows.map((r) => r.marginDb).filter(Number.isFinite));
  out.push({
    key: 'harmonicMarginDb',
    label: 'Worst harmonic margin below the spurious limit (nominal filter)',
    unit: 'dB',
    better: 'higher',
    margin: true,
    value: hm,
    why: hm !== null ? '' : 'no harmonic prediction (needs a final amplifier stage)',
  });

  const ex = report.rf.exposure;
  const dist = finiteOrNull(ex?.generalDistanceM);
  out.push({
    key: 'exposureDistanceM',
    label: `Exposure: least distance from the antenna for the ${ex?.generalLabel ?? 'general public'}`,
    unit: 'm',
    better: 'lower',
    value: dist,
    why: dist !== null ? '' : 'not computed (frequency outside the limit tables or inputs refused)',
  });

  const t = report.cost.totals;
  out.push({
    key: 'perKitCents',
    label: `Cost per kit${t.unpricedLines ? ` (${t.unpricedLines} line(s) without a price left out)` : ''}`,
    unit: 'cents',
    better: 'lower',
    currency: report.cost.currency,
    value: t.perKitCents,
    why: t.perKitCents !== null ? '' : 'not costed (no kits or no priced lines)',
  });
  return out;
}
