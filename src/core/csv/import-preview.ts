// Import preview: every data row with its parsed values and its errors, before anything is saved.

import { guessDelimiter, parseCsv } from './parse';
import { parsePrice, parseQuantity } from './parse-price';
import { countRefs } from './refs';
import { minorDigits } from '../cost/money';
import { guessMapping, IMPORT_FIELD_LABELS, type ColumnMapping, type ImportField } from './import-mapping';
import { readCatalogCells, type CatalogCells } from './catalog-cells';
import { unneutraliseText } from './write';
import type { Field } from '../spec/field';
import { storedProblem } from '../spec/derive';
import { offerSpec, partSpec } from '../spec/parts';
import { bomLineSpec } from '../spec/parts-list';
import { CURRENCY, RATING_TEXT_MAX, unitPriceField } from '../spec/parts-text';
import { text } from '../spec/make';

// Each cell is held to the limit of the field it becomes (src/core/spec): the part's description and category, the
// rating "value", the line's quantity and designators, the offer's supplier, SKU and unit price.
const CELL_FIELDS: Partial<Record<ImportField, Field>> = {
  description: partSpec.fields.description,
  value: text('Value', RATING_TEXT_MAX, false),
  category: partSpec.fields.category,
  refs: bomLineSpec.fields.refs,
  supplier: offerSpec.fields.supplier,
  sku: offerSpec.fields.sku,
  role: bomLineSpec.fields.roleId,
};

/** parts-list: BOM lines (quantity needed); catalog: supplier offers (supplier and price needed). */
export type ImportKind = 'parts-list' | 'catalog';

export interface ImportOptions {
  kind: ImportKind;
  /** Currency for prices that name none (ISO code). */
  defaultCurrency: string;
  /** Decides "1,250" / "1.250" (see parse-price.ts); default "." (or "," when the file uses ";"). */
  decimal?: '.' | ',';
  /** Field separator; guessed from the header line when absent. */
  delimiter?: ',' | ';' | '\t';
  /** Column choices; guessed from the headers when absent. */
  mapping?: ColumnMapping;
  /** The project's stages, to read a stage column by name ("General" = no stage). */
  stages?: readonly { id: string; name: string }[];
  /** Catalog: the supplier of rows with no supplier cell (a supplier's own list has no supplier column). */
  defaultSupplier?: string;
}

/** Stage name the parts-list export writes for lines with no stage. */
export const NO_STAGE_NAME = 'General';

/**
 * A totals row of the program's own export (or a spreadsheet's): no description, value, designators, quantity,
 * supplier or SKU, and its first filled cell starts with "Total" or "Per kit". It is skipped, not refused.
 */
const TOTALS_LABEL = /^(total|totals|subtotal|per kit)\b/i;

export interface RowError {
  /** Record number as a spreadsheet shows it: header = 1, first data row = 2. 0 = the whole file. */
  row: number;
  /** Header text of the column (or field label when the column is missing); null = whole row. */
  column: string | null;
  message: string;
}

export interface ImportValues {
  refs: string;
  value: string;
  description: string;
  category: string;
  /** Pieces per rig; null in a catalog or when unreadable. */
  quantity: number | null;
  supplier: string;
  sku: string;
  /** Unit price in minor units of `currency`; null when no price column or empty in a parts list. */
  priceCents: number | null;
  currency: string | null;
  /** Stage name as written in the stage column ('' = none given: the stage chosen on the form is used). */
  stage: string;
  /** The stage that name resolves to (null = General); meaningful only when `stage` is not ''. */
  stageId: string | null;
  /** The design role the line is bound to, as written ('' = none). */
  role: string;
  /** Catalog rows: the offer's ratings, breaks (the unit price as the break at 1), minimum order and multiple. */
  catalog?: CatalogCells;
}

export interface PreviewRow {
  row: number;
  values: ImportValues;
  errors: RowError[];
  warnings: RowError[];
}

export interface ImportPreview {
  kind: ImportKind;
  headers: string[];
  mapping: ColumnMapping;
  delimiter: string;
  rows: PreviewRow[];
  /** Problems with the file or the mapping; they block the import. */
  fileErrors: RowError[];
  /** Row numbers recognised as totals rows and skipped. */
  totalsRows: number[];
  validRows: number;
  invalidRows: number;
}

function requiredFieldErrors(kind: ImportKind, m: ColumnMapping, supplierGiven: boolean): RowError[] {
  const missing = (fields: ImportField[], msg: string): RowError[] =>
    fields.every((f) => m[f] === null)
      ? [{ row: 0, column: fields.map((f) => IMPORT_FIELD_LABELS[f]).join(' / '), message: msg }]
      : [];
  const errs = missing(['description', 'value'], 'Choose a column for the description or the value.');
  if (kind === 'parts-list')
    errs.push(
      ...missing(['quantity', 'refs'], 'Choose a column for the quantity (or the reference designators to count).'),
    );
  else {
    if (!supplierGiven)
      errs.push(...missing(['supplier'], 'A catalog needs a supplier column or the supplier’s name.'));
    errs.push(...missing(['price', 'breaks'], 'A catalog needs a price column or a price-breaks column.'));
  }
  return errs;
}

export function previewImport(text: string, options: ImportOptions): ImportPreview {
  const delimiter = options.delimiter ?? guessDelimiter(text);
  const decimal = options.decimal ?? (delimiter === ';' ? ',' : '.');
  const parsed = parseCsv(text, delimiter);
  const fileErrors: RowError[] = parsed.errors.map((e) => ({
    row: e.record,
    column: null,
    message: `Line ${e.line}: ${e.message}`,
  }));
  const headers = (parsed.records[0] ?? []).map((h) => h.trim());
  const mapping = options.mapping ?? guessMapping(headers, options.kind);
  const supplierGiven = options.kind === 'catalog' && (options.defaultSupplier ?? '').trim() !== '';
  if (parsed.records.length === 0) fileErrors.push({ row: 0, column: null, message: 'The file is empty.' });
  else fileErrors.push(...requiredFieldErrors(options.kind, mapping, supplierGiven));

  const rows: PreviewRow[] = [];
  const totalsRows: number[] = [];
  parsed.records.slice(1).forEach((cells, k) => {
    if (cells.every((c) => c.trim() === '')) return; // blank lines are not rows
    if (isTotalsRow(cells, mapping)) totalsRows.push(k + 2);
    else rows.push(previewRow(k + 2, cells, headers, mapping, options, decimal));
  });
  const invalidRows = rows.filter((r) => r.errors.length > 0).length;
  return {
    kind: options.kind,
    headers,
    mapping,
    delimiter,
    rows,
    fileErrors,
    totalsRows,
    validRows: rows.length - invalidRows,
    invalidRows,
  };
}

function isTotalsRow(cells: readonly string[], m: ColumnMapping): boolean {
  const cell = (f: ImportField) => (m[f] === null ? '' : (cells[m[f]!] ?? '').trim());
  const itemFields: ImportField[] = ['description', 'value', 'refs', 'quantity', 'supplier', 'sku'];
  if (itemFields.some((f) => cell(f) !== '')) return false;
  const first = cells.find((c) => c.trim() !== '');
  return first !== undefined && TOTALS_LABEL.test(unneutraliseText(first).trim());
}

function previewRow(
  row: number,
  cells: string[],
  headers: string[],
  m: ColumnMapping,
  opts: ImportOptions,
  decimal: '.' | ',',
): PreviewRow {
  const errors: RowError[] = [];
  const warnings: RowError[] = [];
  const col = (f: ImportField) => (m[f] === null ? IMPORT_FIELD_LABELS[f] : headers[m[f]!] || IMPORT_FIELD_LABELS[f]);
  const get = (f: ImportField) => (m[f] === null ? '' : unneutraliseText(cells[m[f]!] ?? '').trim());
  const err = (f: ImportField | null, message: string) =>
    errors.push({ row, column: f === null ? null : col(f), message });
  const warn = (f: ImportField | null, message: string) =>
    warnings.push({ row, column: f === null ? null : col(f), message });

  const v: ImportValues = {
    refs: get('refs'), value: get('value'), description: get('description'), category: get('category'),
    quantity: null, supplier: get('supplier'), sku: get('sku'), priceCents: null, currency: null,
    stage: get('stage'), stageId: null, role: get('role'),
  };
  if (v.stage !== '') {
    const key = v.stage.toLowerCase();
    const found = (opts.stages ?? []).find((s) => s.name.trim().toLowerCase() === key);
    if (found !== undefined) v.stageId = found.id;
    else if (key !== NO_STAGE_NAME.toLowerCase()) {
      const names = (opts.stages ?? []).map((s) => `"${s.name}"`).join(', ');
      err(
        'stage',
        `"${v.stage}" is not a stage of this project (stages: ${names || 'none'}; "${NO_STAGE_NAME}" = no stage).`,
      );
    }
  }
  if (v.description === '' && v.value === '')
    err(m.description !== null ? 'description' : 'value', 'Needs a description or a value.');
  for (const [f, field] of Object.entries(CELL_FIELDS) as [ImportField, Field][]) {
    const problem = v[f as keyof ImportValues] === '' ? '' : storedProblem(field, v[f as keyof ImportValues]);
    if (problem) err(f, `${field.label} ${problem}.`);
  }

  if (opts.kind === 'parts-list') {
    const refCount = v.refs === '' ? null : countRefs(v.refs);
    const qtyText = get('quantity');
    if (m.quantity === null || qtyText === '') {
      if (refCount !== null && refCount > 0) v.quantity = refCount;
      else err('quantity', 'Needs a quantity (or reference designators to count).');
    } else {
      const q = parseQuantity(qtyText);
      const problem = q === null ? '' : storedProblem(bomLineSpec.fields.qtyPerRig, q);
      if (q === null) err('quantity', `"${qtyText}" is not a quantity.`);
      else if (problem)
        err('quantity', `${bomLineSpec.fields.qtyPerRig.label} ${problem}; the file says "${qtyText}".`);
      else {
        v.quantity = q;
        if (refCount !== null && refCount !== q)
          warn('refs', `${refCount} designators listed but the quantity is ${q}.`);
      }
    }
  }

  const priceText = get('price');
  if (priceText !== '') {
    // The minor unit follows the currency: the one written with the price, else the column's, else the default.
    const colCurrencyText = get('currency').toUpperCase();
    const p = parsePrice(priceText, decimal, (c) => minorDigits(c ?? (colCurrencyText || opts.defaultCurrency)));
    const range = p.ok ? storedProblem(unitPriceField, p.cents) : '';
    if (!p.ok) err('price', p.message);
    else if (range) err('price', `${unitPriceField.label} ${range}.`);
    else {
      v.priceCents = p.cents;
      if (p.roundedFrom !== null) warn('price', `${p.roundedFrom} rounded half-up to ${p.cents} minor units.`);
      const colCurrency = get('currency').toUpperCase();
      if (colCurrency !== '' && !CURRENCY.re.test(colCurrency))
        err('currency', `"${colCurrency}" is not a three-letter currency code.`);
      else if (colCurrency !== '' && p.currency !== null && colCurrency !== p.currency)
        err('currency', `The price says ${p.currency} but the currency column says ${colCurrency}.`);
      v.currency = p.currency ?? (colCurrency || opts.defaultCurrency.toUpperCase());
    }
  }

  if (opts.kind === 'catalog') catalogRow(v, get, err, warn, opts, decimal);
  if (v.supplier === '') {
    if (opts.kind === 'catalog') err('supplier', 'Needs a supplier (a cell, or the supplier’s name on the form).');
    else if (v.priceCents !== null) err('supplier', 'A price needs a supplier.');
    else if (v.sku !== '') err('supplier', 'An order code (SKU) needs a supplier.');
  }
  return { row, values: v, errors, warnings };
}

/** A catalog row's own cells (ratings, breaks, minimum order, multiple) and the form's supplier for an empty cell. */
function catalogRow(
  v: ImportValues,
  get: (f: ImportField) => string,
  err: (f: ImportField | null, message: string) => void,
  warn: (f: ImportField | null, message: string) => void,
  opts: ImportOptions,
  decimal: '.' | ',',
): void {
  if (v.supplier === '') v.supplier = (opts.defaultSupplier ?? '').trim();
  const colCurrency = get('currency').toUpperCase();
  const currency = v.currency ?? (CURRENCY.re.test(colCurrency) ? colCurrency : opts.defaultCurrency.toUpperCase());
  if (v.currency === null) {
    if (colCurrency !== '' && !CURRENCY.re.test(colCurrency))
      err('currency', `"${colCurrency}" is not a three-letter currency code.`);
    v.currency = currency;
  }
  const priceFailed = get('price') !== '' && v.priceCents === null;
  const read = readCatalogCells({
    category: v.category,
    ratings: get('ratings'),
    breaks: get('breaks'),
    minOrder: get('minOrder'),
    multiple: get('multiple'),
    priceCents: v.priceCents,
    currency,
    decimal,
  });
  for (const [f, message] of read.errors) if (!(priceFailed && f === 'price')) err(f, message);
  for (const [f, message] of read.warnings) warn(f, message);
  v.catalog = read.cells;
}
