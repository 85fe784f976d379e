// Money helpers. All money is integer minor units ("cents"); every currency is assumed to have two
// minor digits (a deliberate simplification: JPY-style zero-decimal currencies still print ".00").
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
/** Smallest exchange rate taken as known. Common practice, no published source: 1e-9 is far below any currency in use. */
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

/** Minor units to a major-unit number for CSV (1234 -> 12.34). */
export function centsToMajor(cents: number): number {
  return Math.round(cents) / 100;
}

/**
 * "USD 1,234.56": ISO code, space, comma thousands groups, point decimal, always two decimals.
 * No locale dependence (no Intl), so output is identical on every machine. Negative amounts print as
 * "USD -1,234.56". Non-finite input prints "USD n/a" rather than "NaN".
 */
export function formatMoney(cents: number, currency: string): string {
  if (!Number.isFinite(cents)) return `${currency} n/a`;
  const whole = Math.round(cents);
  const sign = whole < 0 ? '-' : '';
  const abs = Math.abs(whole);
  const major = Math.floor(abs / 100).toString();
  const minor = (abs % 100).toString().padStart(2, '0');
  const grouped = major.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return `${currency} ${sign}${grouped}.${minor}`;
}
