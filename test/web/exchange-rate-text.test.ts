// Exchange rates read in the project's own currency wherever they are entered (the rate box's hint on the parts
// catalog page) or shown (beside a converted unit price on the parts list): a USD project reads "1 EUR = 1.08 USD",
// a EUR project "1 USD = 0.92 EUR". The table's meaning (a rate is the price of 1 unit of the offer currency in the
// project currency) is rateFor's in src/core/cost/money.ts; the rates here are the demo's and the ones posted.
import { describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { formByAction, unescapeHtml } from '../helpers/html';
import { exchangeRateHint, rateInWords } from '../../src/core/cost/rate-text';
import { loadProject } from '../../src/db/projects';

const ID = 'demo-club-30m';

describe('exchange rates in the project currency', () => {
  it('the hint gives its example in the project currency', () => {
    expect(exchangeRateHint('USD')).toContain('EUR = 1.08 means 1 EUR = 1.08 USD');
    expect(exchangeRateHint('EUR')).toContain('USD = 0.92 means 1 USD = 0.92 EUR');
    // a currency without a prepared example still reads into itself
    expect(exchangeRateHint('NZD')).toMatch(/means 1 USD = [\d.]+ NZD$/);
    expect(rateInWords('EUR', 1.08, 'USD')).toBe('1 EUR = 1.08 USD');
  });

  it('a USD project: the rate box and the converted prices read in USD', async () => {
    const { get } = await demoApp();
    const parts = unescapeHtml(await (await get(`/projects/${ID}/parts`)).text());
    expect(parts).toContain('Exchange rates into USD');
    expect(parts).toContain('EUR = 1.08 means 1 EUR = 1.08 USD');
    const bom = unescapeHtml(await (await get(`/projects/${ID}/bom`)).text());
    // the club demo buys some parts in EUR at its table's EUR = 1.08 (seed-demo/club-30m.ts)
    expect(bom).toContain('at 1 EUR = 1.08 USD');
    expect(bom).not.toMatch(/× 1\.08/);
  });

  it('after switching the project to EUR with a USD rate, both read in EUR', async () => {
    const { get, post, database } = await demoApp();
    const overview = await (await get(`/projects/${ID}`)).text();
    const settings = formByAction(overview, `/projects/${ID}/settings`);
    expect((await post(`/projects/${ID}/settings`, { ...settings.fields, currency: 'EUR' })).status).toBe(303);
    const parts1 = await (await get(`/projects/${ID}/parts`)).text();
    const costing = formByAction(parts1, `/projects/${ID}/costing`);
    const version = String((await loadProject(database.db, ID))!.version);
    expect((await post(`/projects/${ID}/costing`, { ...costing.fields, version, rates: 'USD = 0.92' })).status).toBe(
      303,
    );
    const parts = unescapeHtml(await (await get(`/projects/${ID}/parts`)).text());
    expect(parts).toContain('Exchange rates into EUR');
    expect(parts).toContain('USD = 0.92 means 1 USD = 0.92 EUR');
    const bom = unescapeHtml(await (await get(`/projects/${ID}/bom`)).text());
    expect(bom).toContain('at 1 USD = 0.92 EUR');
  });
});
