// Costed parts list grouped by stage, with stage subtotals, shipping and totals per build and per kit;
// and one packing sheet per kit for a group build.
import type { Project } from '../../core/model';
import type { CostReport } from '../../core/cost/report-types';
import { formatMoney } from '../../core/cost/money';
import { orderSheets } from '../../core/cost/order-sheet';
import { GREY, FAIL, type Column, type Layout, type Row } from '../layout';
import { notComputed } from './common';
import { lineRoleText, rolesTable, stateColor, type PackRoles } from './roles';

const FLAG_WORDS: Record<string, string> = {
  'unknown-part': 'unknown part',
  'unknown-stage': 'unknown stage',
  'bad-qty': 'bad quantity',
  'zero-qty': 'none needed',
  'no-offer': 'no supplier offer',
  'no-price': 'no usable price',
  'no-rate': 'no exchange rate',
};

export function partsList(l: Layout, project: Project, cost: CostReport | null, report: PackRoles = {}): void {
  l.heading('Costed parts list');
  if (!cost) return notComputed(l, 'Costing');
  const roleOf = lineRoleText(report);
  const money = (c: number) => formatMoney(c, cost.currency);
  l.text(`${cost.kits} kit${cost.kits === 1 ? '' : 's'}; prices in ${cost.currency}. ${cost.methodNote}`, {
    sizePt: 8.5,
    color: GREY,
    afterPt: 6,
  });
  const columns: Column[] = [
    { header: 'Refs', width: 0.085 },
    { header: 'Description', width: 0.34 },
    { header: 'Per rig', width: 0.065, align: 'right' },
    { header: 'Order', width: 0.07, align: 'right' },
    { header: 'Supplier / SKU', width: 0.2 },
    { header: 'Unit', width: 0.11, align: 'right' },
    { header: 'Line', width: 0.13, align: 'right' },
  ];
  const byId = new Map(cost.lines.map((x) => [x.lineId, x]));
  const rows: Row[] = [];
  for (const st of cost.stages) {
    rows.push({ cells: [st.name], bold: true, shade: true, span: true });
    for (const id of st.lineIds) {
      const x = byId.get(id);
      if (!x) continue;
      const flags = x.flags.map((f) => FLAG_WORDS[f] ?? f).join(', ');
      const role = roleOf.get(x.lineId);
      const plain = flags ? `${x.description || x.partId} [${flags}]` : x.description;
      const desc = role ? `${plain}. ${role.text}` : plain;
      const unit =
        x.unitPriceCents !== null && x.offerCurrency ? formatMoney(x.unitPriceCents, x.offerCurrency) : '—';
      rows.push({
        cells: [
          x.refs,
          desc,
          String(x.qtyPerRig),
          String(x.orderQty),
          x.supplier ? `${x.supplier} ${x.sku ?? ''}` : 'unpriced',
          unit,
          x.supplier ? money(x.lineCostCents) : '—',
        ],
        color: x.flags.some((f) => f !== 'zero-qty')
          ? FAIL
          : stateColor(role?.state === 'unbound' ? undefined : role?.state),
      });
    }
    rows.push({ cells: ['', `Subtotal ${st.name}`, '', '', '', '', money(st.partsCents)], bold: true });
  }
  l.table(columns, rows, 8.5, 'Costed parts list');
  rolesTable(l, project, report);

  l.heading('Totals', 2, 80);
  const totals: Row[] = [];
  for (const s of cost.suppliers)
    totals.push({ cells: [`${s.supplier} (${s.lineCount} lines)`, money(s.partsCents), money(s.shippingCents)] });
  totals.push({
    cells: ['Parts and shipping', money(cost.totals.partsCents), money(cost.totals.shippingCents)],
    bold: true,
    shade: true,
  });
  l.table(
    [
      { header: 'Supplier', width: 0.6 },
      { header: 'Parts', width: 0.2, align: 'right' },
      { header: 'Shipping', width: 0.2, align: 'right' },
    ],
    totals,
  );
  const sum: Row[] = [{ cells: ['Build total', money(cost.totals.buildCents)], bold: true }];
  if (cost.totals.perKitCents !== null && cost.kits > 1)
    sum.push({ cells: [`Per kit (${cost.kits} kits, shipping shared)`, money(cost.totals.perKitCents)], bold: true });
  if (cost.totals.perKitPartsCents !== null && cost.kits > 1)
    sum.push({ cells: ['Per kit, parts only', money(cost.totals.perKitPartsCents)] });
  if (cost.raisedSavingsCents > 0)
    sum.push({ cells: ['Saved by buying up to a price break (included above)', money(cost.raisedSavingsCents)] });
  if (cost.totals.unpricedLines > 0)
    sum.push({ cells: [`Unpriced lines left out of the totals`, String(cost.totals.unpricedLines)], color: FAIL });
  const single = cost.singleSupplier;
  if (single.available) {
    const gap = single.unpricedLines > 0 ? `; incomplete: ${single.unpricedLines} unpriced line(s) left out` : '';
    sum.push({
      cells: [
        `Everything from ${single.supplier} (${money(single.extraCents)} more than the plan${gap})`,
        money(single.totalCents),
      ],
      color: single.unpricedLines > 0 ? FAIL : undefined,
    });
  } else sum.push({ cells: [`Everything from one supplier: not possible. ${single.reason}`, '—'] });
  l.table([{ header: 'Total', width: 0.7 }, { header: cost.currency, width: 0.3, align: 'right' }], sum);
  orderSheetTables(l, cost);
  const notesPt = cost.notes.reduce((a, n) => a + l.wrap(`• ${n}`, l.contentWidthPt, 7.5).length * 9.75 + 1, 0);
  l.ensure(Math.min(notesPt, 300));
  for (const n of cost.notes) l.text(`• ${n}`, { sizePt: 7.5, color: GREY, afterPt: 1 });
  void project;
}

/** The organiser's order sheet per supplier: SKU, quantity, the break reached, line totals, shipping. */
function orderSheetTables(l: Layout, cost: CostReport): void {
  const sheets = orderSheets(cost);
  if (sheets.length === 0) return;
  const money = (c: number) => formatMoney(c, cost.currency);
  l.heading('Order sheets per supplier', 2, 80);
  const columns: Column[] = [
    { header: 'SKU', width: 0.16 },
    { header: 'Description', width: 0.33 },
    { header: 'Order', width: 0.08, align: 'right' },
    { header: 'Break from', width: 0.09, align: 'right' },
    { header: 'Unit', width: 0.11, align: 'right' },
    { header: 'Offer line', width: 0.11, align: 'right' },
    { header: cost.currency, width: 0.12, align: 'right' },
  ];
  for (const sheet of sheets) {
    const rows: Row[] = [{ cells: [sheet.supplier], bold: true, shade: true, span: true }];
    for (const x of sheet.lines) {
      const desc = x.refs ? `${x.description} (${x.refs})` : x.description;
      const more = x.qty > x.neededQty ? ` (need ${x.neededQty})` : '';
      rows.push({
        cells: [
          x.sku || '—',
          desc + more,
          String(x.qty),
          x.breakMinQty === null ? '—' : String(x.breakMinQty),
          formatMoney(x.unitPriceCents, x.offerCurrency),
          formatMoney(x.offerCostCents, x.offerCurrency),
          money(x.lineCostCents),
        ],
      });
    }
    rows.push({ cells: ['', 'Parts', '', '', '', '', money(sheet.partsCents)] });
    rows.push({ cells: ['', 'Shipping', '', '', '', '', money(sheet.shippingCents)] });
    rows.push({ cells: ['', `Order total ${sheet.supplier}`, '', '', '', '', money(sheet.totalCents)], bold: true });
    l.table(columns, rows, 8, `Order sheet — ${sheet.supplier}`);
  }
}

/** One page per kit with tick boxes, for a group build (kits > 1). */
export function packingSheets(l: Layout, project: Project, cost: CostReport | null): number {
  if (project.kits <= 1) return 0;
  const partById = new Map(project.parts.map((p) => [p.id, p]));
  const stageName = new Map(project.stages.map((s) => [s.id, s.name]));
  const lines = project.bom.filter((b) => b.qtyPerRig > 0);
  for (let k = 1; k <= project.kits; k++) {
    l.newPage();
    l.heading(`Packing sheet — kit ${k} of ${project.kits}`, 1, 80);
    l.text('Builder: ______________________   Packed by: ____________   Checked by: ____________', {
      sizePt: 9.5,
      afterPt: 8,
    });
    const rows: Row[] = lines.map((b) => ({
      cells: [
        '',
        String(b.qtyPerRig),
        b.refs,
        partById.get(b.partId)?.description ?? b.partId,
        b.stageId ? (stageName.get(b.stageId) ?? '') : 'General',
      ],
    }));
    l.table(
      [
        { header: '✓', width: 0.05, tick: true },
        { header: 'Qty', width: 0.06, align: 'right' },
        { header: 'Refs', width: 0.12 },
        { header: 'Part', width: 0.52 },
        { header: 'Stage', width: 0.25 },
      ],
      rows,
      8.5,
      `Packing sheet — kit ${k} of ${project.kits}`,
    );
    l.text(
      `${lines.length} lines. Spares and attrition stock stay with the ` +
        `organiser` +
        `${cost ? ` (ordered for the whole build: ${cost.lines.reduce((a, x) => a + x.orderQty, 0)} pieces)` : ''}.`,
      { sizePt: 8, color: GREY },
    );
  }
  return project.kits;
}
