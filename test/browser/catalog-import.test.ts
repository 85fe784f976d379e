// The supplier price-list import in a real browser: choose a file on the parts catalog page, see the preview with a
// refused cell named by row and column and the changes, import only the good rows, and find the new price on the
// page. Prices are read by hand from the CSV below and the club demo's catalog (seed-demo/club-30m.ts).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { hasChromium, openSession, artifactPath, CHROMIUM_PATH, type BrowserSession } from '../helpers/browser';
import type { RunningServer } from '../helpers/server';

if (!hasChromium) console.warn(`Browser tests skipped: ${CHROMIUM_PATH} is missing (apt-get install chromium).`);

const DEMO = '/projects/demo-club-30m';
// Row 2: the 4700 µF capacitor dearer from 1 piece (USD 2.15 -> 2.25), same from 10 and 50 -> "price up".
// Row 3: a relay with a minimum order of "lots": refused, Min order named.
const LIST = [
  'Description,Category,SKU,Price breaks,Min order,Multiple',
  'Electrolytic capacitor 4700 µF 35 V,capacitor,NC-E4735,"1: 2.25, 10: 1.82, 50: 1.49",1,1',
  'Relay 12 V DPDT,relay,NC-RL-NEW,"1: 2.00",lots,1',
].join('\n');

describe.skipIf(!hasChromium)('supplier price-list import in the browser', () => {
  let session: BrowserSession;
  let server: RunningServer;
  let page: Page;

  beforeAll(async () => {
    session = await openSession();
    ({ server, page } = session);
  }, 120_000);
  afterAll(() => session?.close());

  it('preview shows the refused cell and the price rise; good rows only imports the rise', async () => {
    await page.goto(server.url + DEMO + '/parts');
    const form = page.locator('form#catalog-import');
    await form
      .locator('input[type="file"]')
      .setInputFiles({ name: 'northfield.csv', mimeType: 'text/csv', buffer: Buffer.from(LIST) });
    await form.locator('input[name="supplier"]').fill('Northfield Components');
    await form.locator('button[type="submit"]').click();
    await page.waitForSelector('#catalog-import-preview');
    const refused = page.locator('tr.refused');
    expect(await refused.count()).toBe(1);
    expect(await refused.locator('td').first().innerText()).toBe('3');
    expect(await refused.innerText()).toContain('Min order: "lots" is not a number of pieces');
    // the whole file is refused until good rows only is chosen
    expect(await page.locator('[data-change="up"][data-sku="NC-E4735"]').count()).toBe(0);
    await page.locator('#cat-good').check();
    await page.locator('button[value="preview"]').click();
    await page.waitForSelector('[data-change="up"][data-sku="NC-E4735"]');
    expect(await page.locator('[data-change="up"][data-sku="NC-E4735"]').innerText()).toContain('USD 2.25');
    await page.screenshot({ path: artifactPath('catalog-import-preview.png'), fullPage: true });
    await page.locator('button[value="import"]').click();
    await page.waitForSelector('p.notice');
    expect(await page.locator('p.notice').innerText()).toContain(
      'Price list imported: 1 offer(s) changed, 0 new part(s)',
    );
    expect(await page.locator('p.notice').innerText()).toContain('1 refused row(s) skipped');
    expect(await page.content()).toContain('1: 2.25');
    expect(session.problems).toEqual([]);
  }, 120_000);
});
