// Cover page: what is being built, with which numbers, and the worst findings.
import type { Project } from '../../core/model';
import { MODE_LABELS } from '../../core/model';
import { bandOf } from '../../core/rf/bands';
import { CONSTRUCTION_FLOOR_DBC } from '../../core/rf/harmonics';
import { formatMoney } from '../../core/cost/money';
import { rfView } from '../../core/checklists';
import { actionable, worstSeverity } from '../../core/findings';
import { RULE_SETS } from '../../core/rules/rule-set';
import { GREY, type Layout } from '../layout';
import { PACK_PART_TITLES, type PackOptions, type PackReport } from '../report';
import { packNotice } from './notice';
import { findingsList, fv, keyValues } from './common';

export function cover(l: Layout, project: Project, report: PackReport, opts: PackOptions): void {
  l.gap(20);
  const part = opts.part ?? 'both';
  l.text(PACK_PART_TITLES[part], { sizePt: 11, color: GREY, afterPt: 4 });
  l.text(project.name, { sizePt: 20, bold: true, afterPt: 6 });
  if (project.notes) l.text(project.notes, { sizePt: 10, color: GREY, afterPt: 12 });
  const band = bandOf(project.frequencyHz);
  const rf = rfView(report.rf);
  const supplyText = project.mains
    ? `Mains ${fv(project.mains.nominalV, 'V')} ${fv(project.mains.frequencyHz, 'Hz')}` +
      ` (−${Math.round(project.mains.lowFraction * 100)} % / +${Math.round(project.mains.highFraction * 100)} %)`
    : `Battery: ${
        project.supply.rails
          .filter((r) => r.kind === 'battery')
          .map((r) => r.name)
          .join(', ') || 'none entered'
      }`;
  const rows: [string, string][] = [
    ['Frequency', `${fv(project.frequencyHz, 'Hz', 5)}${band ? ` (${band.name} band)` : ''}`],
    ['Target output', fv(project.targetPowerW, 'W')],
    ['Computed output', rf?.paOutputW != null ? fv(rf.paOutputW, 'W') : 'not computed'],
    ['Power source', supplyText],
    [
      'Rule set',
      `${RULE_SETS[project.rf.spuriousRule].label}${part === 'organiser' ? '' : '. Sources: see the Sources section'}`,
    ],
    ['Rails', project.supply.rails.map((r) => r.name).join('; ') || 'none'],
    ['Kits in this build', String(project.kits)],
    ['Data date', `${opts.dataDate} (prices and results as computed then)`],
  ];
  if (report.cost && part === 'builder') {
    // the builder sees what a kit costs; the build's totals and orders are on the organiser's pages
    const c = report.cost;
    if (c.totals.perKitCents !== null) rows.push(['Per kit', formatMoney(c.totals.perKitCents, c.currency)]);
  } else if (report.cost) {
    const c = report.cost;
    rows.push([
      'Build total',
      `${formatMoney(c.totals.buildCents, c.currency)} incl. ` +
        `${formatMoney(c.totals.shippingCents, c.currency)} shipping`,
    ]);
    if (c.totals.perKitCents !== null) rows.push(['Per kit', formatMoney(c.totals.perKitCents, c.currency)]);
    if (c.totals.unpricedLines > 0) rows.push(['Unpriced lines', `${c.totals.unpricedLines} (not in the totals)`]);
  } else rows.push(['Build total', 'not computed']);
  keyValues(l, rows);
  packNotice(l);

  l.heading('Key results', 2, 40);
  const key: [string, string][] = [];
  for (const m of ['receive', 'keyDown'] as const)
    key.push([`DC power, ${MODE_LABELS[m]}`, fv(report.budget.totalW[m], 'W')]);
  for (const r of report.supply?.rails ?? []) {
    if (r.kind === 'rectified') {
      const c = r.corners.find((x) => x.id === r.worstVoltageCornerId);
      if (c) key.push([r.railName, `${fv(c.troughV, 'V')} lowest (${c.label}), margin ${fv(c.headroomMarginV, 'V')}`]);
    } else if (r.kind === 'battery') key.push([r.railName, `runtime about ${fv(r.runtimeS / 3600, '', 2)} h`]);
  }
  if (rf) {
    const worst = rf.harmonics.reduce<null | (typeof rf.harmonics)[number]>(
      (w, h) => (w === null || h.marginDb < w.marginDb ? h : w),
      null,
    );
    // below the construction floor the build sets the level: said in words, never as a number
    const level = (x: number) => (x < CONSTRUCTION_FLOOR_DBC ? 'limited by construction' : `${fv(x, 'dBc')} predicted`);
    if (worst)
      key.push(['Worst harmonic', `H${worst.n}: ${level(worst.predictedDbc)}, margin ${fv(worst.marginDb, 'dB')}`]);
    for (const e of rf.exposure) key.push(['Exposure distance', `${fv(e.distanceM, 'm', 2)} (${e.label})`]);
  }
  if (!report.supply) key.push(['Supply design', 'not computed']);
  if (!report.rf) key.push(['RF design', 'not computed']);
  keyValues(l, key);

  // the verdict counts only findings a design change can clear; standing cautions are in the safety checklist
  const counted = actionable(report.findings);
  const sev = worstSeverity(counted);
  l.heading(`Worst findings (overall: ${sev === 'ok' ? 'OK' : sev})`, 2, 40);
  if (part === 'organiser') {
    // the organiser's pages hold the parts and costs; the design's own findings are in the builder's pack
    const buying = counted.filter((f) => f.rule.startsWith('cost.') || f.rule.startsWith('catalog.'));
    l.text(
      `The design's checks are in the builder's pack (overall: ${sev === 'ok' ? 'OK' : sev}). Parts and cost findings:`,
      {
        sizePt: 9,
        afterPt: 4,
      },
    );
    findingsList(l, buying, true, 8);
  } else if (sev === 'ok')
    l.text('OK: no check of this design fails or needs caution. Standing cautions are in the safety checklist.');
  else findingsList(l, counted, true, 8);
}
