// Prices typed by people and spreadsheets: "1.25", "1,25", "USD 1,234.50", "1.234,50 EUR", "€0.125".
//
// The decimal-separator rule (our own; no standard covers it):
// 1. Both "." and "," present: the one that comes last is the decimal separator, the other groups
//    thousands ("1,234.50" and "1.234,50" are both 1234.50).
// 2. Only one kind, appearing more than once: it groups thousands ("1,234,567").
// 3. Only one kind, once, NOT followed by exactly three digits: decimal ("1,25" = 1.25, "0.125" = 0.125).
// 4. Only one kind, once, followed by exactly three digits, with a whole part other than 0 ("1,250",
//    "1.250"): ambiguous; the import's decimal setting decides (default ".": "1.250" = 1.25, "1,250" = 1250).
// Thousands groups must be three digits. Spaces, no-break spaces and apostrophes are ignored.
// Prices are whole minor units of their currency (ISO 4217: two decimals for USD and EUR, none for JPY): more
// decimals than the minor unit has round half-up with a warning (0.125 USD -> 13 cents; 12.5 JPY -> 13 yen).
// Currency: a three-letter code before or after the number, or € (EUR), £ (GBP), $ (read as USD;
// write "CAD 1.25" or "AUD 1.25" for other dollars).

export interface ParsedPrice {
  ok: true;
  cents: number;
  /** Currency written with the price, upper case; null when none. */
  currency: string | null;
  /** Set when the price had more decimals than its currency's minor unit and was rounded. */
  roundedFrom: string | null;
}

export type PriceParse = ParsedPrice | { ok: false; message: string };

const SYMBOLS: Record<string, string> = { '€': 'EUR', '£': 'GBP', $: 'USD' };

function splitCurrency(s: string): { num: string; currency: string | null } {
  let t = s.trim();
  let currency: string | null = null;
  const pre = /^([A-Za-z]{3})\s*(?=[0-9.,\s€£$])/.exec(t);
  const post = /(?<=[0-9.,\s€£$])\s*([A-Za-z]{3})$/.exec(t);
  if (pre) {
    currency = pre[1].toUpperCase();
    t = t.slice(pre[0].length);
  } else if (post) {
    currency = post[1].toUpperCase();
    t = t.slice(0, t.length - post[0].length);
  }
  t = t.trim();
  const first = t[0];
  const last = t[t.length - 1];
  if (first in SYMBOLS || last in SYMBOLS) {
    const sym = first in SYMBOLS ? first : last;
    if (currency !== null && currency !== SYMBOLS[sym]) return { num: '', currency: '?' };
    currency = SYMBOLS[sym];
    t = first in SYMBOLS ? t.slice(1) : t.slice(0, -1);
  }
  return { num: t.replace(/[\s\u00A0\u202F']/g, ''), currency };
}

/**
 * Parse a price to whole minor units. `decimal` settles rule 4 (see the file comment). `digitsOf` gives the minor
 * unit's decimals of the currency written with the price (null when none is written); default 2.
 */
export function parsePrice(
  text: string,
  decimal: '.' | ',' = '.',
  digitsOf: (currency: string | null) => number = () => 2,
): PriceParse {
  if (text.trim() === '') return { ok: false, message: 'The price is empty.' };
  const { num, currency } = splitCurrency(text);
  if (currency === '?') return { ok: false, message: `"${text}" names two different currencies.` };
  if (num.startsWith('-')) return { ok: false, message: `"${text}" is negative; a price must be 0 or more.` };
  if (!/^[0-9.,]+$/.test(num) || !/[0-9]/.test(num))
    return { ok: false, message: `"${text}" is not a price (expected e.g. 1.25 or EUR 1,25).` };

  const dots = (num.match(/\./g) ?? []).length;
  const commas = (num.match(/,/g) ?? []).length;
  let decSep: string | null = null;
  let groupSep: string | null = null;
  if (dots > 0 && commas > 0) {
    decSep = num.lastIndexOf('.') > num.lastIndexOf(',') ? '.' : ',';
    groupSep = decSep === '.' ? ',' : '.';
  } else if (dots + commas > 0) {
    const sep = dots > 0 ? '.' : ',';
    const after = num.slice(num.lastIndexOf(sep) + 1);
    const whole = num.slice(0, num.indexOf(sep));
    if (dots + commas > 1) groupSep = sep;
    else if (after.length === 3 && /^[0-9]+$/.test(whole) && Number(whole) !== 0) {
      if (sep === decimal) decSep = sep;
      else groupSep = sep;
    } else decSep = sep;
  }

  let intPart = num;
  let fracPart = '';
  if (decSep !== null) {
    const k = num.lastIndexOf(decSep);
    intPart = num.slice(0, k);
    fracPart = num.slice(k + 1);
    if (fracPart.includes('.') || fracPart.includes(',') || (groupSep === null && intPart.includes(decSep))) {
      return { ok: false, message: `"${text}" has separators in the wrong places.` };
    }
  }
  if (groupSep !== null) {
    const groups = intPart.split(groupSep);
    if (!/^[0-9]{1,3}$/.test(groups[0]) || groups.slice(1).some((g) => !/^[0-9]{3}$/.test(g))) {
      return { ok: false, message: `"${text}": digits between thousands separators must come in threes.` };
    }
    intPart = groups.join('');
  }
  if (!/^[0-9]*$/.test(intPart) || !/^[0-9]*$/.test(fracPart)) {
    return { ok: false, message: `"${text}" has separators in the wrong places.` };
  }
  const whole = intPart === '' ? 0 : Number(intPart);
  const digits = digitsOf(currency);
  const kept = (fracPart + '0'.repeat(digits)).slice(0, digits);
  const rest = fracPart.slice(digits);
  // Half-up on the digits beyond the minor unit: "5" or more in the first of them rounds up.
  const roundUp = rest.length > 0 && rest[0] >= '5' ? 1 : 0;
  const cents = whole * 10 ** digits + (digits > 0 ? Number(kept) : 0) + roundUp;
  if (!Number.isSafeInteger(cents)) return { ok: false, message: `"${text}" is too large.` };
  const roundedFrom = /[1-9]/.test(rest) ? text.trim() : null;
  return { ok: true, cents, currency, roundedFrom };
}

/** Quantity: a positive number, "." or "," as decimal separator ("2", "0.5", "0,5"). null when unreadable. */
export function parseQuantity(text: string): number | null {
  const t = text.trim().replace(',', '.');
  if (!/^[0-9]+(\.[0-9]+)?$/.test(t)) return null;
  return Number(t);
}
