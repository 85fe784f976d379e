// The parts catalog's inputs: a part (description, category, ratings), one supplier offer for it, and a supplier
// with its shipping charge. Money is integer cents, typed in the major unit of its currency (see MAJOR).
import { defineSpec, U } from './field';
import { minorDigits } from '../cost/money';
import { num, text } from './make';
import { breaksCodec, CURRENCY, MAJOR, MONEY_MAX_CENTS } from './parts-text';
import { readableRatingsCodec } from './ratings-readable';

/** A three-letter currency code (typed in any case, stored upper case). */
export const currencyField = (label = 'Currency') =>
  text(label, 3, true, 'USD', { upper: true, pattern: CURRENCY, help: 'e.g. USD, EUR' });

export const partSpec = defineSpec({
  name: 'part',
  label: 'Part',
  fields: {
    description: text('Description', 300, true, 'New part', { help: 'type and ratings, no maker part numbers' }),
    category: text('Category', 60, false, ''),
    // each rating by its name and unit (ratings-readable.ts); the older key=value is still read
    ratings: text('Ratings', 2000, false, '', {
      codec: readableRatingsCodec,
      help: 'name and value, separated by ";" e.g. Rated voltage 35 V; ripple current 2.4 A',
    }),
  },
});

// Money boxes show and read amounts with the decimals of their currency's ISO 4217 minor unit (JPY "150", USD "0.95",
// KWD "0.125"): the spec's moneyDigits reads the currency of the object (stored) or of the form (typed). Amounts are
// stored in whole minor units of that currency, so any whole number is a valid amount.
const digitsOf = (o: Record<string, unknown>): number =>
  typeof o.currency === 'string' && CURRENCY.re.test(o.currency.trim().toUpperCase()) ? minorDigits(o.currency) : 2;

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
  moneyDigits: digitsOf,
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
  moneyDigits: digitsOf,
});
