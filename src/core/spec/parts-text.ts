// The catalog's list fields as one line of text and back: ratings "voltageV=35; type=T", price breaks
// "1: 0.95, 10: 0.78" and exchange rates "EUR = 1.08". Each codec also checks a stored value with the same limits
// the typed text gets, so a project file or database row is held to what the form accepts.
import type { PriceBreak } from '../model';
import { parseValue } from '../units';
import { MIN_EXCHANGE_RATE } from '../cost/money';
import type { NumberField, TextCodec } from './field';
import { U } from './field';
import { num } from './make';
import { moneyCents, moneyText, rangeProblem, readNumber } from './number-text';

/** The largest amount kept (cents): 10 000 000 000.00 in the major unit. */
export const MONEY_MAX_CENTS = 1e12;
/** An amount in the major unit of its currency (typed 0.95, stored 95 cents). */
export const MAJOR = { symbol: '', scale: 100 } as const;

// one price break: from this many pieces, this unit price
export const breakQtyField: NumberField = num('Quantity', '', U.none, 1, 1_000_000, 1, { integer: true });
export const unitPriceField: NumberField = num('Unit price', '', MAJOR, 0, MONEY_MAX_CENTS, 0, {
  money: true,
  integer: true,
});
export const MAX_BREAKS = 50;

// one exchange rate: project-currency units per 1 unit of another currency
// the smallest rate is the one costing takes as known (one limit, in cost/money.ts)
export const rateField: NumberField = num('Rate', '', U.none, MIN_EXCHANGE_RATE, 1e6, 1);
export const MAX_RATES = 50;
export const CURRENCY = { re: /^[A-Z]{3}$/, says: 'must be a three-letter code such as USD or EUR' };

export const RATING_KEY = /^[A-Za-z][\w.-]*$/;
export const RATING_KEY_MAX = 80;
export const RATING_TEXT_MAX = 200;
export const MAX_RATINGS = 50;

type Parsed<T> = { ok: true; value: T } | { ok: false; message: string };
const isObject = (v: unknown): v is Record<string, unknown> => v !== null && typeof v === 'object' && !Array.isArray(v);

/** Split a list on newlines and ";", and on "," only where `next` starts the following item. */
function splitList(s: string, next: RegExp): string[] {
  return s
    .split(new RegExp(`[;\\n]|,(?=${next.source})`))
    .map((x) => x.trim())
    .filter((x) => x !== '');
}

// ------------------------------------------------------------ ratings: "va=70; ratedA=10; type=T"

// One rating: key = "quoted text" (JSON string, may hold ; , or look like a number) or plain text up to the next
// ";", newline or ", key=".
const RATING = /([A-Za-z][\w.-]*)\s*=\s*("(?:[^"\\\n]|\\.)*"|(?:(?!,\s*[A-Za-z][\w.-]*\s*=)[^;\n])*)/y;

/** Text that would not come back as the same text unquoted: it reads as a number, or holds a separator. */
const needsQuotes = (v: string) => v === '' || v !== v.trim() || /[;\n",]/.test(v) || parseValue(v, '').ok;

export const ratingsText = (r: Record<string, number | string>): string =>
  Object.entries(r)
    .map(([k, v]) => `${k}=${typeof v === 'string' && needsQuotes(v) ? JSON.stringify(v) : v}`)
    .join('; ');

export function parseRatings(s: string): Parsed<Record<string, number | string>> {
  const ratings: Record<string, number | string> = {};
  const text = s.trim();
  let i = 0;
  while (i < text.length) {
    i += /^[\s;,]*/.exec(text.slice(i))![0].length;
    if (i >= text.length) break;
    RATING.lastIndex = i;
    const m = RATING.exec(text);
    const what = text.slice(i).split(/[;\n]/)[0].trim();
    if (!m) return { ok: false, message: `"${what}" is not key=value (e.g. voltageV=35)` };
    i = RATING.lastIndex;
    const key = m[1];
    const raw = m[2].trim();
    if (key in ratings) return { ok: false, message: `"${key}" is given twice` };
    if (raw === '') return { ok: false, message: `"${key}" has no value` };
    const n = raw.startsWith('"') ? null : parseValue(raw, '');
    ratings[key] = n === null ? (JSON.parse(raw) as string) : n.ok ? n.value : raw;
    const problem = ratingProblem(key, ratings[key]);
    if (problem) return { ok: false, message: problem };
  }
  if (Object.keys(ratings).length > MAX_RATINGS) return { ok: false, message: `more than ${MAX_RATINGS} ratings` };
  return { ok: true, value: ratings };
}

function ratingProblem(key: string, v: unknown): string {
  if (!RATING_KEY.test(key)) return `"${key.slice(0, 40)}" is not a rating name (a letter, then letters, digits, _.-)`;
  if (key.length > RATING_KEY_MAX) return `the name "${key.slice(0, 20)}…" is over ${RATING_KEY_MAX} characters`;
  if (typeof v === 'number') return Number.isFinite(v) ? '' : `"${key}" is not a usable number`;
  if (typeof v !== 'string') return `"${key}" is neither a number nor text`;
  return v.length > RATING_TEXT_MAX ? `the text of "${key}" is longer than ${RATING_TEXT_MAX} characters` : '';
}

export const ratingsCodec: TextCodec = {
  toText: (v) => (isObject(v) ? ratingsText(v as Record<string, number | string>) : ''),
  fromText: parseRatings,
  check: (v) => {
    if (!isObject(v)) return 'must be a list of key=value ratings';
    const entries = Object.entries(v);
    if (entries.length > MAX_RATINGS) return `has more than ${MAX_RATINGS} ratings`;
    for (const [k, x] of entries) {
      const problem = ratingProblem(k, x);
      if (problem) return problem;
    }
    return '';
  },
};

// ------------------------------------------------------------ price breaks: "1: 0.95, 10: 0.78, 100: 0.52"

/** Price breaks as text, each price with `digits` decimals (the offer currency's ISO 4217 minor unit; default 2). */
export const breaksText = (b: readonly PriceBreak[], digits = 2): string =>
  b.map((x) => `${x.minQty}: ${moneyText(x.unitPriceCents, digits)}`).join(', ');

/**
 * Price breaks as typed, each price in the major unit with at most `digits` decimals (default 2); empty text is no
 * prices yet (the offer is listed but unpriced). Sorted by quantity.
 */
export function parseBreaks(s: string, digits = 2): Parsed<PriceBreak[]> {
  const breaks: PriceBreak[] = [];
  for (const item of splitList(s, /[^,:;=@\n]+[:=@]/)) {
    const m = /^(\d+)\s*(?:\+|pcs)?\s*[:=@]\s*(.+)$/.exec(item);
    if (!m) return { ok: false, message: `"${item}" is not "quantity: unit price" (e.g. 10: 0.78)` };
    const qty = readNumber(m[1], breakQtyField);
    if (!qty.ok) return { ok: false, message: `quantity "${m[1]}" ${qty.message.replace(/; you entered .*$/, '')}` };
    const price = moneyCents(m[2], digits);
    if (!price.ok) return { ok: false, message: `${qty.value}: ${price.message}` };
    const problem = rangeProblem(price.value, { ...unitPriceField, moneyDigits: digits });
    if (problem) return { ok: false, message: `${qty.value}: the unit price ${problem}` };
    const twice = breaks.some((b) => b.minQty === qty.value);
    if (twice) return { ok: false, message: `quantity ${qty.value} is given twice` };
    breaks.push({ minQty: qty.value, unitPriceCents: price.value });
  }
  if (breaks.length > MAX_BREAKS) return { ok: false, message: `more than ${MAX_BREAKS} price breaks` };
  return { ok: true, value: breaks.sort((a, b) => a.minQty - b.minQty) };
}

export const breaksCodec: TextCodec = {
  toText: (v, ctx) => (Array.isArray(v) ? breaksText(v as PriceBreak[], ctx?.moneyDigits) : ''),
  fromText: (s, ctx) => parseBreaks(s, ctx?.moneyDigits),
  check: (v) => {
    if (!Array.isArray(v)) return 'must be a list of price breaks';
    if (v.length > MAX_BREAKS) return `has more than ${MAX_BREAKS} price breaks`;
    const seen = new Set<unknown>();
    for (const [i, b] of v.entries()) {
      if (!isObject(b)) return `break ${i + 1} is not a quantity and a price`;
      const q = typeof b.minQty === 'number' ? rangeProblem(b.minQty, breakQtyField) : 'is missing';
      if (q) return `break ${i + 1}: the quantity ${q}`;
      const p = typeof b.unitPriceCents === 'number' ? rangeProblem(b.unitPriceCents, unitPriceField) : 'is missing';
      if (p) return `break ${i + 1} (from ${b.minQty}): the unit price ${p}`;
      if (seen.has(b.minQty)) return `quantity ${b.minQty} is given twice`;
      seen.add(b.minQty);
    }
    return '';
  },
};

// ------------------------------------------------------------ exchange rates: "EUR = 1.08"

export const ratesText = (r: Record<string, number>): string =>
  Object.entries(r)
    .map(([k, v]) => `${k} = ${v}`)
    .join('\n');

export function parseRates(s: string): Parsed<Record<string, number>> {
  const rates: Record<string, number> = {};
  for (const item of splitList(s, /\s*[A-Za-z]{3}\s*=/)) {
    const m = /^([A-Za-z]{3})\s*=\s*(.+)$/.exec(item);
    if (!m) return { ok: false, message: `"${item}" is not CODE = rate (e.g. EUR = 1.08)` };
    const code = m[1].toUpperCase();
    if (code in rates) return { ok: false, message: `${code} is given twice` };
    const rate = readNumber(m[2], rateField);
    if (!rate.ok) return { ok: false, message: `${code}: the rate ${rate.message}` };
    rates[code] = rate.value;
  }
  if (Object.keys(rates).length > MAX_RATES) return { ok: false, message: `more than ${MAX_RATES} rates` };
  return { ok: true, value: rates };
}

export const ratesCodec: TextCodec = {
  toText: (v) => (isObject(v) ? ratesText(v as Record<string, number>) : ''),
  fromText: parseRates,
  check: (v) => {
    if (!isObject(v)) return 'must be a list of CODE = rate';
    const entries = Object.entries(v);
    if (entries.length > MAX_RATES) return `has more than ${MAX_RATES} rates`;
    for (const [k, x] of entries) {
      if (!CURRENCY.re.test(k)) return `"${k.slice(0, 20)}" ${CURRENCY.says}`;
      const problem = typeof x === 'number' ? rangeProblem(x, rateField) : 'is not a number';
      if (problem) return `the rate for ${k} ${problem}`;
    }
    return '';
  },
};

