// Small builders for checklist lines and lookups into the report. Pure.
import type { ChecklistItem, ChecklistReport } from './types';
import type { Mode, PerMode, Project } from '../model';
import type { RailReport, RectifiedRailReport } from '../power/report-types';
import { formatValue } from '../units';

export function step(text: string): ChecklistItem {
  return { text, value: null, unit: '', basis: '', emphasis: 'normal' };
}

export function caution(text: string, value: number | null = null, unit = '', basis = ''): ChecklistItem {
  return { text, value: finiteOrNull(value), unit, basis, emphasis: 'caution' };
}

/** A line with a number: `{v}` in the text is replaced by the formatted value. */
export function measured(
  text: string,
  value: number | null,
  unit: string,
  basis: string,
  emphasis: ChecklistItem['emphasis'] = 'normal',
): ChecklistItem {
  const v = finiteOrNull(value);
  return { text: text.replace('{v}', formatValue(v, unit)), value: v, unit, basis, emphasis };
}

export function finiteOrNull(v: number | null | undefined): number | null {
  return v === null || v === undefined || !Number.isFinite(v) ? null : v;
}

export function fmt(value: number | null | undefined, unit: string): string {
  return formatValue(value, unit);
}

/** Current a stage draws from each rail in one mode, from the budget (entered and computed loads). */
export function stageCurrents(
  report: ChecklistReport,
  stageId: string,
  mode: Mode,
): { railId: string; railName: string; currentA: number }[] {
  const out: { railId: string; railName: string; currentA: number }[] = [];
  for (const rail of report.budget.rails) {
    const sum = rail.loads.filter((l) => l.stageId === stageId).reduce((a, l) => a + l.currentA[mode], 0);
    if (rail.loads.some((l) => l.stageId === stageId))
      out.push({ railId: rail.railId, railName: rail.name, currentA: sum });
  }
  return out;
}

export function stagePerMode(report: ChecklistReport, stageId: string, railId: string): PerMode | null {
  const rail = report.budget.rails.find((r) => r.railId === railId);
  if (!rail) return null;
  const loads = rail.loads.filter((l) => l.stageId === stageId);
  if (loads.length === 0) return null;
  return loads.reduce<PerMode>(
    (a, l) => ({
      receive: a.receive + l.currentA.receive,
      keyUp: a.keyUp + l.currentA.keyUp,
      keyDown: a.keyDown + l.currentA.keyDown,
    }),
    { receive: 0, keyUp: 0, keyDown: 0 },
  );
}

export function railReport(report: ChecklistReport, railId: string): RailReport | null {
  return report.supply?.rails.find((r) => r.railId === railId) ?? null;
}

export function rectifiedCorner(rail: RectifiedRailReport, id: string) {
  return rail.corners.find((c) => c.id === id) ?? null;
}

export function railName(project: Project, railId: string): string {
  return project.supply.rails.find((r) => r.id === railId)?.name ?? railId;
}
