// The organiser's order sheets: one per supplier in the chosen plan, with what to type into that supplier's order
// form (SKU, quantity), the price break the quantity reaches, the line totals and the shipping. Read from the cost
// report only, so the sheets always agree with the plan and its totals.

import type { CostLine, CostReport } from './report-types';

export interface OrderSheetLine {
  lineId: string;
  sku: string;
  description: string;
  refs: string;
  /** Pieces to order (the plan's order quantity). */
  qty: number;
  /** Pieces the build needs (qty may be more: minimum order, multiple, or up to a cheaper break). */
  neededQty: number;
  /** Minimum quantity of the price break the order reaches. */
  breakMinQty: number | null;
  /** Unit price at qty, minor units of the offer currency. */
  unitPriceCents: number;
  offerCurrency: string;
  /** qty x unit price, minor units of the offer currency. */
  offerCostCents: number;
  /** The line in the project currency (converted half-up once). */
  lineCostCents: number;
}

export interface OrderSheet {
  supplier: string;
  lines: OrderSheetLine[];
  /** Sum of lineCostCents, project-currency minor units. */
  partsCents: number;
  /** The supplier's shipping, project-currency minor units. */
  shippingCents: number;
  /** partsCents + shippingCents. */
  totalCents: number;
}

function sheetLine(l: CostLine): OrderSheetLine {
  return {
    lineId: l.lineId,
    sku: l.sku ?? '',
    description: l.description,
    refs: l.refs,
    qty: l.orderQty,
    neededQty: l.neededQty,
    breakMinQty: l.breakMinQty,
    unitPriceCents: l.unitPriceCents ?? 0,
    offerCurrency: l.offerCurrency ?? '',
    offerCostCents: l.offerCostCents ?? 0,
    lineCostCents: l.lineCostCents,
  };
}

/** One sheet per supplier used, in the report's supplier order; lines in parts-list order. */
export function orderSheets(report: CostReport): OrderSheet[] {
  return report.suppliers.map((s) => {
    const lines = report.lines.filter((l) => l.supplier === s.supplier && l.orderQty > 0).map(sheetLine);
    const partsCents = lines.reduce((t, l) => t + l.lineCostCents, 0);
    return {
      supplier: s.supplier,
      lines,
      partsCents,
      shippingCents: s.shippingCents,
      totalCents: partsCents + s.shippingCents,
    };
  });
}
