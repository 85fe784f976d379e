// Exchange rates in words, always read into the project's own currency: the table holds "EUR = 1.08" for a USD
// project, meaning 1 EUR costs 1.08 USD. The hint and the shown rate both say so in the project's currency.

/**
 * An example line for the rate table of a project in `projectCurrency`: another common currency and a round
 * illustrative rate (an example of the format only, not a market rate; from memory, not confirmed).
 */
const EXAMPLE: Record<string, [string, string]> = {
  USD: ['EUR', '1.08'],
  EUR: ['USD', '0.92'],
  GBP: ['EUR', '0.85'],
  CAD: ['USD', '1.37'],
  AUD: ['USD', '1.52'],
  JPY: ['USD', '150'],
  CHF: ['EUR', '0.94'],
};

/** "1 EUR = 1.08 USD" */
export const rateInWords = (from: string, rate: number | string, projectCurrency: string): string =>
  `1 ${from} = ${rate} ${projectCurrency}`;

/** The help line under the rate box: one line per offer currency, with an example in the project's currency. */
export function exchangeRateHint(projectCurrency: string): string {
  const cur = projectCurrency.trim().toUpperCase() || 'USD';
  const [other, rate] = EXAMPLE[cur] ?? (cur === 'USD' ? EXAMPLE.USD : ['USD', '1.25']);
  return `one line per offer currency, its price in ${cur}: ${other} = ${rate} means ${rateInWords(other, rate, cur)}`;
}
