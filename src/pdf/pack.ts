// The pack a club hands out: the builder's pages, the organiser's pages, or both in one file. Reads only computed
// results (the evaluation report and the checklists made from it); no engineering maths here.
import type { Project } from '../core/model';
import { buildChecklist, safetyChecklist, SAFETY_PREAMBLE, type ChecklistSection } from '../core/checklists';
import { Layout } from './layout';
import { PACK_PART_TITLES, type PackOptions, type PackReport } from './report';
import { cover } from './sections/cover';
import { partsList, packingSheets } from './sections/parts';
import { rigPartsList } from './sections/rig-parts';
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

/** The safety checklist without its preamble: the cover carries the pack's one disclaimer. */
const withoutPreamble = (sections: ChecklistSection[]): ChecklistSection[] =>
  sections.map((s) => ({ ...s, items: s.items.filter((i) => i.text !== SAFETY_PREAMBLE) }));

export async function buildPackWithInfo(project: Project, report: PackReport, opts: PackOptions): Promise<PackResult> {
  const part = opts.part ?? 'both';
  const l = await Layout.create(opts.paper, `${project.name} — ${PACK_PART_TITLES[part].toLowerCase()}`);
  cover(l, project, report, opts);
  let sheets = 0;
  l.newPage();
  if (part === 'builder') rigPartsList(l, project, report);
  else {
    partsList(l, project, report.cost, report);
    sheets = packingSheets(l, project, report.cost);
  }
  if (part !== 'organiser') {
    l.newPage();
    budgetSection(l, report.budget);
    supplySection(l, report.supply, report.heat ?? null);
    rfSection(l, report.rf);
    checklistPages(
      l,
      'Build checklist',
      'Stages in build order. Tick each line as you go; the numbers come from this pack’s computed results.',
      buildChecklist(project, report),
    );
    checklistPages(l, 'Safety checklist', '', withoutPreamble(safetyChecklist(project, report)));
    l.newPage();
    sourcesSection(l, project, report);
  }
  l.footers(() => `${project.name} · ${PACK_PART_TITLES[part]} · data of ${opts.dataDate}`);
  const bytes = await l.doc.save({ useObjectStreams: true });
  return { bytes, pageCount: l.pages.length, packingSheets: sheets };
}

export async function buildPack(project: Project, report: PackReport, opts: PackOptions): Promise<Uint8Array> {
  return (await buildPackWithInfo(project, report, opts)).bytes;
}
