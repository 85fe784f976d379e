// The builder's pack: one PDF a club hands every builder. Reads only computed results (the evaluation
// report and the checklists made from it); no engineering maths here.
import type { Project } from '../core/model';
import { buildChecklist, safetyChecklist, SAFETY_PREAMBLE } from '../core/checklists';
import { Layout } from './layout';
import type { PackOptions, PackReport } from './report';
import { cover } from './sections/cover';
import { partsList, packingSheets } from './sections/parts';
import { budgetSection } from './sections/budget';
import { supplySection } from './sections/supply';
import { rfSection } from './sections/rf';
import { checklistPages } from './sections/checklists';
import { sourcesSection } from './sections/sources';

export interface PackResult {
  bytes: Uint8Array;
  pageCount: number;
  packingSheets: number;
}

export async function buildPackWithInfo(project: Project, report: PackReport, opts: PackOptions): Promise<PackResult> {
  const l = await Layout.create(opts.paper, `${project.name} — builder’s pack`);
  cover(l, project, report, opts);
  l.newPage();
  partsList(l, project, report.cost);
  const sheets = packingSheets(l, project, report.cost);
  l.newPage();
  budgetSection(l, report.budget);
  supplySection(l, report.supply, report.heat ?? null);
  rfSection(l, report.rf);
  checklistPages(l, 'Build checklist', 'Stages in build order. Tick each line as you go; the numbers come from this pack’s computed results.', buildChecklist(project, report));
  checklistPages(l, 'Safety checklist', '', safetyChecklist(project, report));
  l.newPage();
  sourcesSection(l, project, report);
  l.footers(() => `${project.name} · data of ${opts.dataDate}`);
  const bytes = await l.doc.save({ useObjectStreams: true });
  return { bytes, pageCount: l.pages.length, packingSheets: sheets };
}

export async function buildPack(project: Project, report: PackReport, opts: PackOptions): Promise<Uint8Array> {
  return (await buildPackWithInfo(project, report, opts)).bytes;
}
