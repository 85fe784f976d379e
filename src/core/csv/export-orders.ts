// The order sheets as CSV: one block per supplier (its lines, then its parts, shipping and total rows), then the
// grand total. Amounts in each currency's own minor unit (ISO 4217), written in the major unit.

import { minorDigits } from '../cost/money';
import { orderSheets } from '../cost/order-sheet';
import type { CostReport } from '../cost/report-types';
import { fixedCell, writeCsv, type CsvCell } from './write';
import type { PartsCsvOptions } from './export-parts';

/** Minor units written with the currency's own decimals (ISO 4217): "26.20" USD, "150" JPY, "1.250" KWD. */
const moneyCell = (cents: number, currency: string): CsvCell => fixedCell(cents, minorDigits(currency));

export function orderCsvHeaders(currency: string): string[] {
  return ['Supplier', 'SKU', 'Description', 'Refs', 'Order qty', 'Needed qty', 'Break from', 'Currency', 'Unit price',
    'Offer line cost', `Line cost ${currency}`];
}

export function orderSheetsToCsv(report: CostReport, options: Omit<PartsCsvOptions, 'includeTotals'> = {}): string {
  const cur = report.currency;
  const headers = orderCsvHeaders(cur);
  const rows: CsvCell[][] = [headers];
  const total = (supplier: string, label: string, cents: number): CsvCell[] => {
    const r: CsvCell[] = Array(headers.length).fill(null);
    r[0] = supplier;
    r[2] = label;
    r[headers.length - 1] = moneyCell(cents, cur);
    return r;
  };
  for (const sheet of orderSheets(report)) {
    for (const l of sheet.lines) {
      rows.push([sheet.supplier, l.sku, l.description, l.refs, l.qty, l.neededQty, l.breakMinQty, l.offerCurrency,
        moneyCell(l.unitPriceCents, l.offerCurrency), moneyCell(l.offerCostCents, l.offerCurrency),
        moneyCell(l.lineCostCents, cur)]);
    }
    rows.push(total(sheet.supplier, 'Total parts', sheet.partsCents));
    rows.push(total(sheet.supplier, 'Shipping', sheet.shippingCents));
    rows.push(total(sheet.supplier, 'Total order', sheet.totalCents));
  }
  rows.push(total('', `Total build (${report.kits} kits)`, report.totals.buildCents));
  return writeCsv(rows, {
    bom: options.bom ?? true,
    delimiter: options.delimiter ?? ',',
    decimalComma: options.delimiter === ';',
  });
}
