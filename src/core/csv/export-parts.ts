// The costed parts list as CSV, one row per BOM line in report order, optional total rows at the end.
// The headers are ones guessMapping() recognises, so the file imports back as a parts list.

import { formatMoney, minorDigits } from '../cost/money';
import type { CostLine, CostReport } from '../cost/report-types';
import { fixedCell, writeCsv, type CsvCell } from './write';

export interface PartsCsvOptions {
  /** Start with a UTF-8 BOM (default true: spreadsheets then show Ω, µ, ü correctly). */
  bom?: boolean;
  /** "," (default, numbers with a decimal point) or ";" (numbers with a decimal comma, for spreadsheets so set). */
  delimiter?: ',' | ';';
  /** Append total rows (parts, shipping, build, per kit). Default true. Import recognises and skips them. */
  includeTotals?: boolean;
}

export function partsCsvHeaders(currency: string): string[] {
  return [
    'Stage', 'Section', 'Refs', 'Value', 'Description', 'Category', 'Qty per rig', 'Needed qty', 'Order qty',
    'Supplier', 'SKU', 'Currency', 'Unit price', 'Offer line cost', 'Exchange rate', `Line cost ${currency}`,
    'Break used', 'Flags', 'Role',
  ];
}

/** Minor units as a major-unit number with the currency's own decimals (ISO 4217). */
function money(cents: number | null, currency: string | null): CsvCell {
  return cents === null || currency === null ? null : fixedCell(cents, minorDigits(currency));
}

function row(l: CostLine, currency: string): CsvCell[] {
  const from = l.breakMinQty === null ? '' : `from ${l.breakMinQty}`;
  const breakUsed =
    l.raised === null
      ? from
      : `${from}; ${l.raised.extraQty} over the plain ${l.raised.plainQty} saves ` +
        `${formatMoney(l.raised.savingCents, currency)}`;
  return [
    l.stageName,
    l.section,
    l.refs,
    l.value,
    l.description,
    l.category,
    l.qtyPerRig,
    l.neededQty,
    l.orderQty,
    l.supplier,
    l.sku,
    l.offerCurrency,
    money(l.unitPriceCents, l.offerCurrency),
    money(l.offerCostCents, l.offerCurrency),
    l.exchangeRate,
    money(l.lineCostCents, currency),
    breakUsed,
    l.flags.join(' '),
    l.roleId ?? '',
  ];
}

export function costReportToCsv(report: CostReport, options: PartsCsvOptions = {}): string {
  const headers = partsCsvHeaders(report.currency);
  const width = headers.length;
  const total = (label: string, cents: number | null): CsvCell[] => {
    const r: CsvCell[] = Array(width).fill(null);
    r[0] = label;
    r[headers.indexOf(`Line cost ${report.currency}`)] = money(cents, report.currency);
    return r;
  };
  const rows: CsvCell[][] = [headers, ...report.lines.map((l) => row(l, report.currency))];
  if (options.includeTotals ?? true) {
    const t = report.totals;
    rows.push(
      Array(width).fill(null),
      total('Total parts', t.partsCents),
      total('Total shipping', t.shippingCents),
      total(`Total build (${report.kits} kits)`, t.buildCents),
      total('Per kit', t.perKitCents),
    );
  }
  return writeCsv(rows, {
    bom: options.bom ?? true,
    delimiter: options.delimiter ?? ',',
    decimalComma: options.delimiter === ';',
  });
}
