// The cells only a supplier's price list has: ratings, price breaks, minimum order and order multiple. Each cell is
// held to the field it becomes (src/core/spec: the offer's minimum order and multiple, a break's quantity and price,
// the category's rating fields), and every problem comes back as a message for the cell's column.
import type { PriceBreak } from '../model';
import { minorDigits } from '../cost/money';
import { storedProblem } from '../spec/derive';
import { offerSpec } from '../spec/parts';
import { categoryOf, readRatings } from '../spec/parts-categories';
import { breakQtyField, MAX_BREAKS, unitPriceField } from '../spec/parts-text';
import { parseRatingsReadable, ratingLabel, ratingsReadable } from '../spec/ratings-readable';

/** A rating written key=value ("voltageV=35"), the form before names and units. */
const OLD_FORM = /(?:^|[;\n,])\s*[A-Za-z][\w.-]*\s*=/;
import { parsePrice, parseQuantity } from './parse-price';

export interface CatalogCells {
  ratings: Record<string, number | string>;
  /** Sorted by quantity; empty when the row has neither a price nor breaks (the row is then refused). */
  breaks: PriceBreak[];
  minOrder: number;
  orderMultiple: number;
}

/** Where a cell's problems go: the import field the message belongs to. */
export type CellField = 'ratings' | 'breaks' | 'minOrder' | 'multiple' | 'price' | 'category';

export interface CellInput {
  category: string;
  ratings: string;
  breaks: string;
  minOrder: string;
  multiple: string;
  /** The unit price cell already read (minor units), or null when empty. */
  priceCents: number | null;
  currency: string;
  decimal: '.' | ',';
}

/**
 * Price breaks as a supplier list writes them: "1: 0.95, 10: 0.78, 100: 0.52" ("qty: price", also "qty=price",
 * "qty+ price" or "qty @ price"). Items are separated by ";", "|" or a line break, and by "," when the decimal mark is
 * the point. A cell with one plain price is the price from one piece. Each price is read with the currency's minor unit
 * (ISO 4217 via minorDigits).
 */
export function parseBreakCell(
  text: string,
  currency: string,
  decimal: '.' | ',',
): { ok: true; breaks: PriceBreak[] } | { ok: false; message: string } {
  const sep = decimal === '.' ? /[;|\n]|,(?=\s*\d+\s*(?:\+|pcs)?\s*[:=@+])/ : /[;|\n]/;
  const breaks: PriceBreak[] = [];
  const items = text.split(sep).map((x) => x.trim()).filter(Boolean);
  // one plain price is the price from one piece
  if (items.length === 1 && !/[:=@+]|\d\s+\S/.test(items[0])) items[0] = `1: ${items[0]}`;
  for (const item of items) {
    const m = /^(\d+)\s*(?:pcs|\+)?\s*(?:[:=@]\s*|\s+)(\S.*)$/.exec(item);
    if (!m) return { ok: false, message: `"${item}" is not "quantity: unit price" (e.g. 10: 0.78).` };
    const qtyText = m[1];
    const priceText = m[2];
    const qty = Number(qtyText);
    const qProblem = storedProblem(breakQtyField, qty);
    if (qProblem) return { ok: false, message: `The break quantity ${qtyText} ${qProblem}.` };
    const p = parsePrice(priceText, decimal, (c) => minorDigits(c ?? currency));
    if (!p.ok) return { ok: false, message: `From ${qty}: ${p.message}` };
    if (p.currency !== null && p.currency !== currency)
      return { ok: false, message: `From ${qty}: the price says ${p.currency} but the row's currency is ${currency}.` };
    if (p.roundedFrom !== null)
      return {
        ok: false,
        message: `From ${qty}: "${priceText.trim()}" has more decimals than ${currency} has (ISO 4217).`,
      };
    const range = storedProblem(unitPriceField, p.cents);
    if (range) return { ok: false, message: `From ${qty}: the unit price ${range}.` };
    if (breaks.some((b) => b.minQty === qty)) return { ok: false, message: `Quantity ${qty} is given twice.` };
    breaks.push({ minQty: qty, unitPriceCents: p.cents });
  }
  if (breaks.length > MAX_BREAKS) return { ok: false, message: `More than ${MAX_BREAKS} price breaks.` };
  return { ok: true, breaks: breaks.sort((a, b) => a.minQty - b.minQty) };
}

function pieces(
  text: string,
  field: typeof offerSpec.fields.minOrder,
): { ok: true; n: number } | { ok: false; message: string } {
  if (text === '') return { ok: true, n: 1 };
  const n = parseQuantity(text);
  if (n === null) return { ok: false, message: `"${text}" is not a number of pieces.` };
  const problem = storedProblem(field, n);
  return problem ? { ok: false, message: `${field.label} ${problem}; the file says "${text}".` } : { ok: true, n };
}

/** Read a catalog row's own cells; errors are keyed by the import field whose column they name. */
export function readCatalogCells(c: CellInput): {
  cells: CatalogCells;
  errors: [CellField, string][];
  warnings: [CellField, string][];
} {
  const errors: [CellField, string][] = [];
  const warnings: [CellField, string][] = [];
  let ratings: Record<string, number | string> = {};
  if (c.ratings !== '') {
    const r = parseRatingsReadable(c.ratings);
    if (!r.ok) errors.push(['ratings', `${r.message}.`]);
    else {
      ratings = r.value;
      // the ratings the category defines are held to their ranges, as the part's form does
      for (const e of readRatings({ category: c.category, ratings }).errors)
        errors.push(['ratings', `${e.message} (category ${categoryOf(c.category).label}).`]);
      // a name the category does not rate is kept as text but never checked: say so (a typo such as "voltagV")
      const def = categoryOf(c.category);
      const known = new Set([...def.numbers.map((f) => f.key), ...def.choices.map((x) => x.key), 'value']);
      const unknown = Object.keys(ratings).filter((k) => !known.has(k));
      const names = [...known].filter((k) => k !== 'value').map(ratingLabel).join(', ');
      if (def.id !== 'other' && unknown.length)
        warnings.push([
          'ratings',
          `${unknown.map((k) => `"${ratingLabel(k)}"`).join(', ')} ` +
            `${unknown.length > 1 ? 'are not ratings' : 'is not a rating'} of a ${def.label.toLowerCase()} (${names}` +
            `); kept but not checked.`,
        ]);
      // the older key=value form is still read; say how it reads in names and units
      if (OLD_FORM.test(c.ratings))
        warnings.push(['ratings', `written as key=value (the older form), read as "${ratingsReadable(ratings)}".`]);
    }
  }
  let breaks: PriceBreak[] = [];
  if (c.breaks !== '') {
    const b = parseBreakCell(c.breaks, c.currency, c.decimal);
    if (!b.ok) errors.push(['breaks', b.message]);
    else breaks = b.breaks;
  }
  // a unit price column is the price from one piece; beside breaks it must agree with a break at 1 if there is one
  if (c.priceCents !== null) {
    const at1 = breaks.find((b) => b.minQty === 1);
    if (at1 && at1.unitPriceCents !== c.priceCents)
      errors.push(['price', `The unit price differs from the price break at 1 piece in the same row.`]);
    else if (!at1) breaks = [{ minQty: 1, unitPriceCents: c.priceCents }, ...breaks];
  }
  const min = pieces(c.minOrder, offerSpec.fields.minOrder);
  if (!min.ok) errors.push(['minOrder', min.message]);
  const mult = pieces(c.multiple, offerSpec.fields.orderMultiple);
  if (!mult.ok) errors.push(['multiple', mult.message]);
  if (breaks.length === 0 && c.breaks === '' && c.priceCents === null)
    errors.push(['price', 'Needs a unit price or price breaks.']);
  return {
    cells: { ratings, breaks, minOrder: min.ok ? min.n : 1, orderMultiple: mult.ok ? mult.n : 1 },
    errors,
    warnings,
  };
}
