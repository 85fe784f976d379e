// The club demo's costed parts list exported as CSV and imported into a copy of the project: the same lines,
// stages, quantities, role bindings and totals come back; the totals rows are recognised and skipped; importing into a
// list that
// already holds the lines never doubles them (merge or skip). The reference is the original project itself.
import { describe, expect, it } from 'vitest';
import { costProject } from '../../../src/core/cost/cost-project';
import { costReportToCsv } from '../../../src/core/csv/export-parts';
import { planImport, rowsToProjectData, type IdKind } from '../../../src/core/csv/import-plan';
import { previewImport } from '../../../src/core/csv/import-preview';
import { mergeImport } from '../../../src/core/edits/parts-list';
import type { Project } from '../../../src/core/model';
import { club30m } from '../../../seed-demo/club-30m';

const ids = () => {
  let n = 0;
  return (kind: IdKind) => `imp-${kind}-${n++}`;
};

/**
 * The lines as the comparison sees them: part, stage, quantity per rig, designators and role binding, in list order.
 */
const lineView = (p: Project) =>
  p.bom.map((l) => ({
    partId: l.partId,
    stageId: l.stageId,
    qtyPerRig: l.qtyPerRig,
    refs: l.refs,
    roleId: l.roleId ?? null,
  }));

function importInto(target: Project, csv: string, mode: 'merge' | 'skip', delimiter?: ';') {
  const preview = previewImport(csv, {
    kind: 'parts-list',
    defaultCurrency: target.currency,
    stages: target.stages,
    delimiter,
  });
  const plan = planImport(preview);
  if (!plan.ok) throw new Error(`import refused: ${JSON.stringify(plan.errors)}`);
  const data = rowsToProjectData(plan.rows, { makeId: ids(), stageId: null, asBomLines: true });
  return { preview, plan, ...mergeImport(target, data, mode) };
}

describe('club demo: export the parts list, import it into a copy', () => {
  const original = structuredClone(club30m);
  const report = costProject(original);
  const csv = costReportToCsv(report);
  const emptyCopy: Project = { ...structuredClone(original), id: 'copy', bom: [] };

  it('the demo has lines on several stages and on General, and the file carries totals rows', () => {
    expect(new Set(original.bom.map((l) => l.stageId)).size).toBeGreaterThan(2);
    expect(original.bom.some((l) => l.stageId === null)).toBe(true);
    expect(csv).toContain('Total parts');
  });

  it('gives the same lines, stages and quantities, with the totals rows recognised, not refused', () => {
    const r = importInto(emptyCopy, csv, 'skip');
    expect(r.preview.invalidRows).toBe(0);
    // Four totals rows are written (parts, shipping, build, per kit); the blank separator row is not a row.
    expect(r.preview.totalsRows).toHaveLength(4);
    expect(r.plan.ok && r.plan.skipped).toEqual([]);
    expect(lineView(r.project)).toEqual(lineView(original));
    // Every imported part is the catalog's own: nothing new in the catalog, no new offers.
    expect(r.newParts).toBe(0);
    expect(r.project.parts).toEqual(original.parts);
  });

  it('gives exactly the same totals, per stage and per line', () => {
    const again = costProject(importInto(emptyCopy, csv, 'skip').project);
    expect(again.totals).toEqual(report.totals);
    expect(again.stages.map((s) => [s.name, s.partsCents])).toEqual(report.stages.map((s) => [s.name, s.partsCents]));
    expect(again.lines.map((l) => [l.supplier, l.orderQty, l.lineCostCents])).toEqual(
      report.lines.map((l) => [l.supplier, l.orderQty, l.lineCostCents]),
    );
  });

  it('with ";" and decimal commas the same lines and totals come back', () => {
    const semi = costReportToCsv(report, { delimiter: ';' });
    const r = importInto(emptyCopy, semi, 'skip', ';');
    expect(lineView(r.project)).toEqual(lineView(original));
    expect(costProject(r.project).totals).toEqual(report.totals);
  });

  it('into the full copy: every line is found already there; skip and merge both leave the list as it was', () => {
    for (const mode of ['skip', 'merge'] as const) {
      const r = importInto(structuredClone(original), csv, mode);
      expect([r.added, r.matched]).toEqual([0, original.bom.length]);
      expect(lineView(r.project)).toEqual(lineView(original));
      expect(costProject(r.project).totals).toEqual(report.totals);
    }
  });

  it('merge takes the file quantity of a line already there; skip keeps the stored one', () => {
    // The copy's first line is changed to 7 per rig; the file still says the original quantity.
    const changed = structuredClone(original);
    changed.bom[0] = { ...changed.bom[0], qtyPerRig: 7 };
    expect(importInto(changed, csv, 'merge').project.bom[0].qtyPerRig).toBe(original.bom[0].qtyPerRig);
    expect(importInto(changed, csv, 'skip').project.bom[0].qtyPerRig).toBe(7);
  });
});
