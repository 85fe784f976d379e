// Money helpers. All money is integer minor units ("cents") of its own currency: the minor unit is the one
// ISO 4217 gives each currency (JPY none, so 1 = one yen; USD and EUR two decimals, so 1 = one cent).
import { usablePositive } from '../numeric';

/**
 * Round half-up (towards +infinity at exactly .5) to a whole number.
 * Binary floating point turns 0.5-exact products into 0.49999999…; values are first snapped to
 * 1e-6 of a minor unit so that 1005 x 0.5 = 502.5 rounds to 503, not 502.
 */
export function roundHalfUp(x: number): number {
  if (!Number.isFinite(x)) return 0;
  const snapped = Math.round(x * 1e6) / 1e6;
  return Math.floor(snapped + 0.5);
}

/**
 * Convert an amount in minor units of one currency to minor units of the project currency.
 * `rate` = units of project currency per 1 unit of the amount's currency. Result rounded half-up to a
 * whole minor unit; the costing applies this once per line (and once per shipping charge).
 */
export function convertCents(cents: number, rate: number): number {
  return roundHalfUp(cents * rate);
}

/**
 * Exchange rate for `currency` into the project currency, or null when none is known.
 * The project currency itself is 1 unless the table says otherwise; rates must be finite and > 0.
 */
/**
 * Smallest exchange rate taken as known. Common practice, no published source: 1e-9 is far below any currency in use.
 */
export const MIN_EXCHANGE_RATE = 1e-9;

export function rateFor(
  currency: string,
  projectCurrency: string,
  rates: Readonly<Record<string, number>>,
): number | null {
  const key = currency.trim().toUpperCase();
  const table = Object.fromEntries(Object.entries(rates).map(([k, v]) => [k.trim().toUpperCase(), v]));
  const r = table[key];
  // Usable, not merely > 0: a rate of 5e-324 converted every price to 0 cents (a free part, silently)
  if (r !== undefined) return usablePositive(r, MIN_EXCHANGE_RATE) ? r : null;
  return key === projectCurrency.trim().toUpperCase() ? 1 : null;
}

// Source: ISO 4217:2015, Codes for the representation of currencies, list one ("minor unit" column): JPY 0,
// USD and EUR 2 as the check; the other codes below are from memory, not confirmed against the table.
const MINOR_DIGITS_NOT_TWO: Readonly<Record<string, number>> = {
  JPY: 0, KRW: 0, ISK: 0, CLP: 0, VND: 0, PYG: 0, UGX: 0, XAF: 0, XOF: 0, XPF: 0,
  BHD: 3, IQD: 3, JOD: 3, KWD: 3, LYD: 3, OMR: 3, TND: 3,
};

/** Decimals of the currency's minor unit (ISO 4217): 0 for JPY, 3 for KWD, 2 for USD, EUR and other codes. */
export function minorDigits(currency: string): number {
  return MINOR_DIGITS_NOT_TWO[currency.trim().toUpperCase()] ?? 2;
}

/** Minor units per major unit of the currency: 1 for JPY, 100 for USD. */
export function minorPerMajor(currency: string): number {
  return 10 ** minorDigits(currency);
}

/**
 * Rate from minor units of `from` to minor units of `to`, given `rate` = major units of `to` per major unit of
 * `from` (as the exchange-rate table holds it). 1000 JPY (1000 minor) at 0.0067 USD/JPY: 0.67 cents per yen.
 */
export function minorRate(rate: number, from: string, to: string): number {
  // Source: ISO 4217 minor units; amount_to = amount_from x rate x 10^(digits_to - digits_from)
  return rate * 10 ** (minorDigits(to) - minorDigits(from));
}

/** Minor units to a major-unit number for CSV (1234 USD -> 12.34; 1234 JPY -> 1234). */
export function centsToMajor(cents: number, currency: string): number {
  return Math.round(cents) / minorPerMajor(currency);
}

/**
 * "USD 1,234.56", "JPY 1,235": ISO code, space, comma thousands groups, point decimal, as many decimals as the
 * currency's minor unit has (ISO 4217).
 * No locale dependence (no Intl), so output is identical on every machine. Negative amounts print as
 * "USD -1,234.56". Non-finite input prints "USD n/a" rather than "NaN".
 */
export function formatMoney(cents: number, currency: string): string {
  if (!Number.isFinite(cents)) return `${currency} n/a`;
  const whole = Math.round(cents);
  const sign = whole < 0 ? '-' : '';
  const abs = Math.abs(whole);
  const digits = minorDigits(currency);
  const per = 10 ** digits;
  const major = Math.floor(abs / per).toString();
  const grouped = major.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  if (digits === 0) return `${currency} ${sign}${grouped}`;
  const minor = (abs % per).toString().padStart(digits, '0');
  return `${currency} ${sign}${grouped}.${minor}`;
}
