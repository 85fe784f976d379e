// Current budget per rail and mode, as computed (what each rail delivers, and which stages draw it).
import type { BudgetReport } from '../../core/budget';
import { MODES, MODE_LABELS } from '../../core/model';
import { GREY, type Layout, type Row } from '../layout';
import { findingsList, fv } from './common';

export function budgetSection(l: Layout, budget: BudgetReport): void {
  l.heading('Current budget per rail and mode');
  l.text(
    "Current each rail must deliver (its own stages plus the regulators it feeds). Computed loads (PA key-down, " +
      "relay coil) are marked *. Voltage: mean with the key down at nominal mains, and in brackets the ripple trough " +
      "(supply design); powers are each mode's current times that mode's mean voltage.",
    { sizePt: 8.5, color: GREY, afterPt: 6 },
  );
  if (budget.rails.length === 0) {
    l.text('No rails entered yet: add a supply to see the budget.', { color: GREY });
    return;
  }
  const rows: Row[] = [];
  for (const r of budget.rails) {
    const indent = r.depth > 0 ? `${'›'.repeat(r.depth)} ` : '';
    const volts = r.modeV
      ? `${fv(r.modeV.keyDown, 'V')} (${fv(r.keyDownTroughV ?? NaN, 'V')})`
      : `${fv(r.nominalV, 'V')} est.`;
    rows.push({
      cells: [`${indent}${r.name}`, volts, ...MODES.map((m) => fv(r.outputA[m], 'A'))],
      bold: true,
      shade: true,
    });
    for (const ld of r.loads)
      rows.push({
        cells: [`– ${ld.stageName}${ld.computed ? ' *' : ''}`, '', ...MODES.map((m) => fv(ld.currentA[m], 'A'))],
      });
    if (r.inputA)
      rows.push({
        cells: ['– drawn from its source rail (regulator input)', '', ...MODES.map((m) => fv(r.inputA![m], 'A'))],
        color: GREY,
      });
  }
  l.table(
    [
      { header: 'Rail / load', width: 0.43 },
      { header: 'Key-down (trough)', width: 0.12, align: 'right' },
      ...MODES.map((m) => ({ header: MODE_LABELS[m], width: 0.15, align: 'right' as const })),
    ],
    rows,
  );
  const src: Row[] = budget.sources.map((s) => ({ cells: [s.name, ...MODES.map((m) => fv(s.outputW[m], 'W'))] }));
  src.push({ cells: ['All sources', ...MODES.map((m) => fv(budget.totalW[m], 'W'))], bold: true, shade: true });
  l.table(
    [
      { header: 'DC power delivered by each source', width: 0.55 },
      ...MODES.map((m) => ({ header: MODE_LABELS[m], width: 0.15, align: 'right' as const })),
    ],
    src,
  );
  if (budget.findings.length > 0) findingsList(l, budget.findings);
}
