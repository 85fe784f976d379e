// The parts catalog and the parts list on a 390 px wide phone screen: nothing wider than the screen (no sideways
// scrolling), the line boxes keep their labels, and the cost table shows each line as a card with labelled cells.
// The design roles' candidates, the supplier price-list import preview and the order sheets per supplier are checked
// the same way. Screenshots go to test-artifacts/ for a person to look at.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { hasChromium, openSession, artifactPath, CHROMIUM_PATH, type BrowserSession } from '../helpers/browser';

if (!hasChromium) console.warn(`Browser tests skipped: ${CHROMIUM_PATH} is missing (apt-get install chromium).`);

const DEMO = '/projects/demo-club-30m';
const PHONE_WIDTH_PX = 390;

describe.skipIf(!hasChromium)('parts pages on a 390 px screen', () => {
  let session: BrowserSession;
  let page: Page;

  beforeAll(async () => {
    session = await openSession();
    page = session.page;
    await page.setViewportSize({ width: PHONE_WIDTH_PX, height: 844 });
  }, 120_000);

  afterAll(() => session?.close());

  for (const [name, path] of [['parts-list', `${DEMO}/bom`], ['parts-catalog', `${DEMO}/parts`]] as const) {
    it(`${name}: the page is no wider than the screen`, async () => {
      await page.goto(session.server.url + path);
      const widths = await page.evaluate(() => [
        document.documentElement.scrollWidth,
        document.documentElement.clientWidth,
      ]);
      await page.screenshot({ path: artifactPath(`${name}-390.png`), fullPage: true });
      expect(widths).toEqual([PHONE_WIDTH_PX, PHONE_WIDTH_PX]);
    });
  }

  it('parts list: line boxes show their labels and cost cells say what they are', async () => {
    await page.goto(session.server.url + `${DEMO}/bom`);
    const label = page.locator('form.bom-row .bom-qty .label').first();
    expect(await label.isVisible()).toBe(true);
    expect(await label.innerText()).toContain('Qty per rig');
    const cell = page.locator('#cost-results tr.cost-line td[data-label="Line cost"]').first();
    const before = await cell.evaluate((e) => getComputedStyle(e, '::before').content);
    expect(before).toBe('"Line cost: "');
  });

  /** The page's width, and every element matched whose right edge lies beyond the screen (with its text). */
  const overflow = (selector: string) =>
    page.evaluate((sel) => {
      const wide = [...document.querySelectorAll(sel)]
        .filter((e) => e.getBoundingClientRect().right > document.documentElement.clientWidth + 0.5)
        .map((e) => (e as HTMLElement).innerText.slice(0, 60));
      return { page: document.documentElement.scrollWidth, wide, count: document.querySelectorAll(sel).length };
    }, selector);

  /** A screen-sized shot (390 x 844) from the top of `selector`, for a person to look at. */
  const shot = async (selector: string, name: string) => {
    const top = await page
      .locator(selector)
      .first()
      .evaluate((e) => e.getBoundingClientRect().top + window.scrollY);
    await page.screenshot({
      path: artifactPath(name),
      fullPage: true,
      clip: { x: 0, y: top, width: PHONE_WIDTH_PX, height: 844 },
    });
  };

  it('parts list: the candidates of every role fit the screen, with their Use buttons', async () => {
    await page.goto(session.server.url + `${DEMO}/bom`);
    const o = await overflow('#design-roles li, #design-roles li button');
    expect(o.count).toBeGreaterThan(13);
    expect(o).toMatchObject({ page: PHONE_WIDTH_PX, wide: [] });
    await shot('#design-roles', 'parts-roles-390.png');
    await shot('[data-role="bleeders"]', 'parts-roles-bleeders-390.png');
  });

  it('parts list: the order sheets per supplier fit the screen, each line a card', async () => {
    await page.goto(session.server.url + `${DEMO}/bom`);
    await page.locator('#order-sheets > summary').click();
    const o = await overflow('#order-sheets table.order-sheet, #order-sheets tr, #order-sheets td');
    expect(o.count).toBeGreaterThan(20);
    expect(o).toMatchObject({ page: PHONE_WIDTH_PX, wide: [] });
    const sku = page.locator('#order-sheets tr.cost-line td[data-label="SKU"]').first();
    expect(await sku.evaluate((e) => getComputedStyle(e, '::before').content)).toBe('"SKU: "');
    await shot('#order-sheets', 'parts-order-sheets-390.png');
  });

  it('parts catalog: the price-list import preview fits the screen, each row of the file a card with its refusal in ' +
    'view', async () => {
    await page.goto(session.server.url + `${DEMO}/parts`);
    const list = ['Description,Category,SKU,Price breaks,Min order,Multiple',
      'Electrolytic capacitor 4700 µF 35 V,capacitor,NC-E4735,"1: 2.25, 10: 1.82, 50: 1.49",1,1',
      'Relay 12 V DPDT,relay,NC-RL-NEW,"1: 2.00",lots,1'].join('\n');
    const form = page.locator('form#catalog-import');
    await form.evaluate((f) => f.closest('details')?.setAttribute('open', ''));
    await form
      .locator('input[type="file"]')
      .setInputFiles({ name: 'northfield.csv', mimeType: 'text/csv', buffer: Buffer.from(list) });
    await form.locator('input[name="supplier"]').fill('Northfield Components');
    await form.locator('button[type="submit"]').click();
    await page.waitForSelector('#catalog-import-preview');
    const o = await overflow(
      '#catalog-import-preview, #catalog-import-preview form, #catalog-import-preview p, #catalog-import-preview td',
    );
    expect(o.count).toBeGreaterThan(10);
    const refused = page.locator('#catalog-import-preview tr.refused td[data-label="Problems"]');
    expect(await refused.innerText()).toContain('Min order: "lots" is not a number of pieces');
    expect(await refused.evaluate((e) => getComputedStyle(e, '::before').content)).toBe('"Problems: "');
    expect(o).toMatchObject({ page: PHONE_WIDTH_PX, wide: [] });
    await shot('#catalog-import-preview', 'catalog-import-preview-390.png');
    await shot('#catalog-import-preview table', 'catalog-import-preview-rows-390.png');
  });
});
