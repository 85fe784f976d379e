// The organiser's pack prints money in each currency's own minor unit (ISO 4217:2015 list one: JPY 0, USD 2, KWD 3;
// KWD from memory, not confirmed): the club demo costed in KWD shows three decimals everywhere, in JPY none.
import { describe, expect, it } from 'vitest';
import { club30m } from '../../seed-demo/club-30m';
import { buildPack } from '../../src/pdf';
import type { Project } from '../../src/core/model';
import { evaluationFor } from './fixture';
import { hasPoppler, POPPLER_MISSING, pagesText, writeTemp } from './pdf-text';

if (!hasPoppler) console.warn(POPPLER_MISSING);

async function packText(currency: string, rates: Record<string, number>): Promise<string> {
  // rates: units of the project currency per unit of the offer's currency (invented, round numbers)
  const p: Project = {
    ...club30m,
    currency,
    costing: {
      ...club30m.costing,
      exchangeRates: rates,
      suppliers: club30m.costing.suppliers.map((s) => ({ ...s, currency: 'USD' })),
    },
  };
  const bytes = await buildPack(p, evaluationFor(p), { paper: 'a4', dataDate: '2026-12-02', part: 'organiser' });
  return pagesText(writeTemp(bytes, `${currency}.pdf`)).join('\n');
}

describe.skipIf(!hasPoppler)('pack money in the currency’s minor unit', () => {
  it('KWD with three decimals, JPY with none', async () => {
    const kwd = await packText('KWD', { USD: 0.3, EUR: 0.33 });
    const amounts = [...kwd.matchAll(/KWD (-?[\d,]+(?:\.\d+)?)/g)].map((m) => m[1]);
    expect(amounts.length).toBeGreaterThan(20);
    expect(amounts.every((a) => /^-?[\d,]+\.\d{3}$/.test(a))).toBe(true);
    const jpy = await packText('JPY', { USD: 150, EUR: 160 });
    const yen = [...jpy.matchAll(/JPY (-?[\d,]+(?:\.\d+)?)/g)].map((m) => m[1]);
    expect(yen.length).toBeGreaterThan(20);
    expect(yen.every((a) => /^-?[\d,]+$/.test(a))).toBe(true);
  }, 120_000);
});
