// Helpers for `npm run bench` (and the large-list test): a project with a long parts list, and one pack
// render. Nothing is timed here; the bench script times these calls.
import type { Project, BomLine, Part } from '../core/model';
import { buildPackWithInfo, type PackResult } from './pack';
import type { PackReport } from './report';
import type { Paper } from './layout';

/**
 * A copy of `base` whose parts list has `lines` lines: the base parts are repeated with new ids, spread
 * over the base stages in turn, so costing and layout see realistic, varied rows.
 */
export function largeBomProject(base: Project, lines: number): Project {
  const p = structuredClone(base);
  const parts: Part[] = [];
  const bom: BomLine[] = [];
  const stageIds: (string | null)[] = [null, ...base.stages.map((s) => s.id)];
  const priced = base.parts.filter((x) => x.offers.length > 0);
  for (let i = 0; i < lines; i++) {
    const src = priced[i % priced.length];
    const id = `big-${i + 1}`;
    parts.push({ ...structuredClone(src), id, description: `${src.description} (line ${i + 1})` });
    bom.push({
      id: `bl-${i + 1}`,
      stageId: stageIds[i % stageIds.length],
      partId: id,
      qtyPerRig: 1 + (i % 3),
      refs: `X${i + 1}`,
      notes: '',
    });
  }
  p.parts = parts;
  p.bom = bom;
  p.id = `${base.id}-large`;
  p.name = `${base.name} (${lines}-line parts list)`;
  return p;
}

/** Render one pack; returns the bytes and page count (for a bench to time and report). */
export function benchPack(
  project: Project,
  report: PackReport,
  paper: Paper = 'a4',
  dataDate = '2026-01-01',
): Promise<PackResult> {
  return buildPackWithInfo(project, report, { paper, dataDate });
}
