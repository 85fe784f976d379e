// Which CSV column feeds which field of an imported parts list or catalog. Guessed from the header
// text; the user can override any field.

export const IMPORT_FIELDS = [
  'refs', 'value', 'quantity', 'description', 'category', 'supplier', 'sku', 'price', 'currency', 'stage', 'role',
  'ratings', 'breaks', 'minOrder', 'multiple',
] as const;
export type ImportField = (typeof IMPORT_FIELDS)[number];

/** The fields each kind of import reads (and offers on its column choices). */
export const IMPORT_FIELDS_FOR: Record<'parts-list' | 'catalog', readonly ImportField[]> = {
  'parts-list': [
    'refs',
    'value',
    'quantity',
    'description',
    'category',
    'supplier',
    'sku',
    'price',
    'currency',
    'stage',
    'role',
  ],
  catalog: [
    'description',
    'value',
    'category',
    'ratings',
    'supplier',
    'sku',
    'price',
    'breaks',
    'minOrder',
    'multiple',
    'currency',
  ],
};

export const IMPORT_FIELD_LABELS: Record<ImportField, string> = {
  refs: 'Reference designators',
  value: 'Value',
  quantity: 'Quantity per rig',
  description: 'Description',
  category: 'Category',
  supplier: 'Supplier',
  sku: 'Supplier order code (SKU)',
  price: 'Unit price',
  currency: 'Currency',
  stage: 'Stage',
  role: 'Design role',
  ratings: 'Ratings (name value unit; …)',
  breaks: 'Price breaks (qty: price, …)',
  minOrder: 'Minimum order',
  multiple: 'Order multiple',
};

/** Column index (0-based) per field, null = not imported. */
export type ColumnMapping = Record<ImportField, number | null>;

// Whole-header synonyms, compared after normalise(). Checked before the word matches below.
const EXACT: Record<ImportField, string[]> = {
  refs: ['ref', 'refs', 'reference', 'references', 'designator', 'designators', 'refdes', 'ref des',
    'reference designator', 'reference designators', 'part refs'],
  value: ['value', 'val', 'part value'],
  quantity: ['qty', 'quantity', 'qty per rig', 'quantity per rig', 'qty per kit', 'count', 'pcs', 'pieces', 'amount'],
  description: ['description', 'desc', 'part description', 'item', 'name', 'part', 'component'],
  category: ['category', 'type', 'kind', 'group'],
  supplier: ['supplier', 'vendor', 'distributor', 'shop', 'source', 'seller'],
  sku: ['sku', 'order code', 'order number', 'supplier part', 'supplier part number', 'part number',
    'catalog number', 'catalogue number', 'cat no', 'article', 'article number', 'stock code', 'pn'],
  price: ['price', 'unit price', 'price each', 'each', 'unit cost', 'cost each', 'price per unit'],
  currency: ['currency', 'cur', 'ccy'],
  stage: ['stage', 'stage name', 'module', 'board'],
  role: ['role', 'design role'],
  ratings: ['ratings', 'rating', 'specs', 'specification', 'specifications', 'parameters'],
  breaks: ['breaks', 'price breaks', 'quantity breaks', 'qty breaks', 'break prices', 'tiered prices'],
  minOrder: [
    'min order',
    'minimum order',
    'moq',
    'min qty',
    'minimum quantity',
    'min order qty',
    'minimum order quantity',
  ],
  multiple: ['multiple', 'order multiple', 'pack', 'pack size', 'multiples', 'order increment', 'increment'],
};

// Single words that identify a field anywhere in a header, for headers no exact synonym took.
const WORDS: Record<ImportField, string[]> = {
  refs: ['designator', 'designators', 'refs', 'ref'],
  value: ['value'],
  quantity: ['qty', 'quantity'],
  description: ['description', 'desc'],
  category: ['category'],
  supplier: ['supplier', 'vendor', 'distributor'],
  sku: ['sku'],
  price: ['price'],
  currency: ['currency'],
  stage: ['stage'],
  role: ['role'],
  ratings: ['ratings'],
  breaks: ['breaks'],
  minOrder: ['moq', 'minimum'],
  multiple: ['multiple', 'multiples'],
};

/** Lower case, accents and punctuation dropped, single spaces: "Qty./Rig" -> "qty rig". */
export function normaliseHeader(h: string): string {
  return h
    .replace(/^\uFEFF/, '')
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, ' ')
    .trim();
}

export function emptyMapping(): ColumnMapping {
  return Object.fromEntries(IMPORT_FIELDS.map((f) => [f, null])) as ColumnMapping;
}

/**
 * Guess the mapping: exact synonyms first, then whole-word matches; each column used at most once. Only the fields
 * the kind of import reads are guessed (default: a parts list).
 */
export function guessMapping(headers: readonly string[], kind: 'parts-list' | 'catalog' = 'parts-list'): ColumnMapping {
  const mapping = emptyMapping();
  const norm = headers.map(normaliseHeader);
  const taken = new Set<number>();
  const fields = IMPORT_FIELDS_FOR[kind];
  for (const f of fields) {
    const i = norm.findIndex((h, k) => !taken.has(k) && EXACT[f].includes(h));
    if (i >= 0) {
      mapping[f] = i;
      taken.add(i);
    }
  }
  for (const f of fields) {
    if (mapping[f] !== null) continue;
    const i = norm.findIndex((h, k) => !taken.has(k) && h.split(' ').some((w) => WORDS[f].includes(w)));
    if (i >= 0) {
      mapping[f] = i;
      taken.add(i);
    }
  }
  return mapping;
}

/** Apply the user's choices over a guess; out-of-range columns become null. */
export function overrideMapping(
  base: ColumnMapping,
  overrides: Partial<Record<ImportField, number | null>>,
  columnCount: number,
): ColumnMapping {
  const out = { ...base };
  for (const f of IMPORT_FIELDS) {
    if (!(f in overrides)) continue;
    const v = overrides[f];
    out[f] = v !== null && v !== undefined && Number.isInteger(v) && v >= 0 && v < columnCount ? v : null;
  }
  return out;
}
