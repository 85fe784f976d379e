// The parts catalog's inputs: a part (description, category, ratings), one supplier offer for it, and a supplier
// with its shipping charge. Money is integer cents, typed in the major unit of its currency (see MAJOR).
import { defineSpec, U, type FieldError } from './field';
import { minorDigits } from '../cost/money';
import { num, text } from './make';
import { breaksCodec, CURRENCY, MAJOR, MONEY_MAX_CENTS, ratingsCodec } from './parts-text';

/** A three-letter currency code (typed in any case, stored upper case). */
export const currencyField = (label = 'Currency') =>
  text(label, 3, true, 'USD', { upper: true, pattern: CURRENCY, help: 'e.g. USD, EUR' });

export const partSpec = defineSpec({
  name: 'part',
  label: 'Part',
  fields: {
    description: text('Description', 300, true, 'New part', { help: 'type and ratings, no maker part numbers' }),
    category: text('Category', 60, false, ''),
    // free key=value for now: numbers are read with SI prefixes (4700u), other text is kept as typed
    ratings: text('Ratings', 2000, false, '', {
      codec: ratingsCodec,
      help: 'key=value; … e.g. voltageV=35; rippleA=2.4',
    }),
  },
});

// Money boxes read and show two decimals of the major unit (MAJOR, moneyText). A currency whose ISO 4217 minor unit
// has fewer decimals (JPY: none) is stored in its own minor unit: the view scales between the two, and the refine
// refuses decimals that currency does not have. Three-decimal currencies (KWD, BHD) cannot be typed in these boxes.
const boxScale = (currency: unknown): number => {
  const d = typeof currency === 'string' ? minorDigits(currency) : 2;
  return d < 2 ? 10 ** (2 - d) : 1;
};
const scaleAmount = (v: unknown, k: number, up: boolean): unknown =>
  typeof v === 'number' && k !== 1 ? (up ? v * k : v / k) : v;
const scaleBreaks = (v: unknown, k: number, up: boolean): unknown =>
  Array.isArray(v) && k !== 1
    ? v.map((b) => (b !== null && typeof b === 'object' ? { ...b, unitPriceCents: scaleAmount((b as Record<string, unknown>).unitPriceCents, k, up) } : b))
    : v;

/** Messages for amounts (in box units, hundredths of the major unit) the currency's minor unit cannot hold. */
function minorUnitErrors(currency: unknown, amounts: unknown[], field: string, label: string): FieldError[] {
  if (typeof currency !== 'string' || amounts.length === 0) return [];
  const code = currency.trim().toUpperCase();
  const d = minorDigits(code);
  if (d > 2) {
    return [{ field, label, message: `${label}: ${code} amounts have ${d} decimals (ISO 4217); this program's amount boxes take at most two, so ${code} is not supported yet` }];
  }
  const k = boxScale(code);
  const bad = amounts.find((a) => typeof a === 'number' && a % k !== 0);
  if (bad === undefined) return [];
  const each = d === 0 ? `whole ${code} with no decimals` : `at most ${d} decimal${d === 1 ? '' : 's'}`;
  return [{ field, label, message: `${label}: ${code} amounts are ${each} (ISO 4217 minor unit); ${(bad as number) / 100} is not` }];
}

const pieces = (label: string) => num(label, '', U.none, 1, 1_000_000, 1, { integer: true, example: '10' });

export const offerSpec = defineSpec({
  name: 'offer',
  label: 'Supplier offer',
  fields: {
    supplier: text('Supplier', 120, true, 'New supplier'),
    sku: text('SKU', 120, false, '', { help: 'the supplier’s order code' }),
    currency: currencyField(),
    breaks: text('Price breaks', 2000, false, '', {
      codec: breaksCodec,
      help: 'e.g. 1: 0.95, 10: 0.78 (empty: not priced yet)',
    }),
    minOrder: pieces('Minimum order'),
    orderMultiple: pieces('Order multiple'),
    stockNote: text('Stock note', 200, false),
  },
  refine: (v) => {
    const breaks = Array.isArray(v.breaks) ? v.breaks : [];
    const prices = breaks.map((b) => (b !== null && typeof b === 'object' ? (b as Record<string, unknown>).unitPriceCents : null));
    return minorUnitErrors(v.currency, prices, 'breaks', 'Price breaks');
  },
  view: {
    from: (stored) => ({ ...stored, breaks: scaleBreaks(stored.breaks, boxScale(stored.currency), true) }),
    to: (fields) => ({ ...fields, breaks: scaleBreaks(fields.breaks, boxScale(fields.currency), false) }),
  },
});

export const supplierSpec = defineSpec({
  name: 'supplier',
  label: 'Supplier',
  fields: {
    name: text('Supplier name', 120, true, 'New supplier'),
    shippingCents: num('Shipping per order', '', MAJOR, 0, MONEY_MAX_CENTS, 0, {
      form: 'shipping',
      money: true,
      integer: true,
      example: '8.50',
      help: 'in the supplier’s currency',
    }),
    currency: currencyField(),
  },
  refine: (v) => minorUnitErrors(v.currency, [v.shippingCents], 'shippingCents', 'Shipping per order'),
  view: {
    from: (stored) => ({ ...stored, shippingCents: scaleAmount(stored.shippingCents, boxScale(stored.currency), true) }),
    to: (fields) => ({ ...fields, shippingCents: scaleAmount(fields.shippingCents, boxScale(fields.currency), false) }),
  },
});
