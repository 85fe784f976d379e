// From a preview to data the project can take: all rows or nothing, unless the caller asks for the
// good rows only. Turning rows into Part / BomLine values needs ids; the caller injects the generator.

import type { BomLine, Offer, Part } from '../model';
import type { ImportPreview, ImportValues, RowError } from './import-preview';

export interface ImportedRow extends ImportValues {
  /** Spreadsheet row number of the source (header = 1). */
  row: number;
}

export type ImportPlan =
  | {
      ok: true;
      rows: ImportedRow[];
      /** Rows left out (takeGoodRows), with their errors. */ skipped: RowError[];
      warnings: RowError[];
    }
  | { ok: false; errors: RowError[] };

export interface PlanOptions {
  /** Import the valid rows and skip the rest (default false: any row error blocks the import). */
  takeGoodRows?: boolean;
}

export function planImport(preview: ImportPreview, options: PlanOptions = {}): ImportPlan {
  if (preview.fileErrors.length > 0) return { ok: false, errors: preview.fileErrors };
  const rowErrors = preview.rows.flatMap((r) => r.errors);
  const good = preview.rows.filter((r) => r.errors.length === 0);
  if (rowErrors.length > 0 && !options.takeGoodRows) return { ok: false, errors: rowErrors };
  if (good.length === 0) {
    return {
      ok: false,
      errors: rowErrors.length > 0 ? rowErrors : [{ row: 0, column: null, message: 'The file has no data rows.' }],
    };
  }
  return {
    ok: true,
    rows: good.map((r) => ({ row: r.row, ...r.values })),
    skipped: rowErrors,
    warnings: good.flatMap((r) => r.warnings),
  };
}

export type IdKind = 'part' | 'offer' | 'line';

/**
 * Rows to parts (with offers) and, for a parts list, BOM lines. Rows describing the same part
 * (same description, value and category, case-insensitive) share one Part; each supplier + SKU pair
 * becomes one Offer with a single price break at 1 piece (minimum order 1, multiple 1). A line takes the stage
 * of its row's stage column when one is given, otherwise `opts.stageId`.
 */
export function rowsToProjectData(
  rows: readonly ImportedRow[],
  opts: { makeId: (kind: IdKind, n: number) => string; stageId: string | null; asBomLines: boolean },
): { parts: Part[]; bom: BomLine[] } {
  const parts: Part[] = [];
  const byKey = new Map<string, Part>();
  const bom: BomLine[] = [];
  let offers = 0;
  rows.forEach((r, n) => {
    const key = [r.description, r.value, r.category].map((x) => x.toLowerCase()).join('\u0000');
    let p = byKey.get(key);
    if (p === undefined) {
      p = {
        id: opts.makeId('part', parts.length),
        description: r.description || r.value,
        category: r.category,
        ratings: r.value === '' ? {} : { value: r.value },
        offers: [],
      };
      parts.push(p);
      byKey.set(key, p);
    }
    if (r.supplier !== '' && !p.offers.some((o) => o.supplier === r.supplier && o.sku === r.sku)) {
      const offer: Offer = {
        id: opts.makeId('offer', offers++),
        supplier: r.supplier,
        sku: r.sku,
        currency: r.currency ?? '',
        breaks: r.priceCents === null ? [] : [{ minQty: 1, unitPriceCents: r.priceCents }],
        minOrder: 1,
        orderMultiple: 1,
        stockNote: '',
      };
      p.offers.push(offer);
    }
    if (opts.asBomLines && r.quantity !== null) {
      const stageId = r.stage !== '' ? r.stageId : opts.stageId;
      bom.push({
        id: opts.makeId('line', n),
        stageId,
        partId: p.id,
        qtyPerRig: r.quantity,
        refs: r.refs,
        notes: '',
        roleId: r.role || null,
      });
    }
  });
  return { parts, bom };
}
