// The parts catalog and the parts list on a 390 px wide phone screen: nothing wider than the screen (no sideways
// scrolling), the line boxes keep their labels, and the cost table shows each line as a card with labelled cells.
// Screenshots go to test-artifacts/ for a person to look at.
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
      const widths = await page.evaluate(() => [document.documentElement.scrollWidth, document.documentElement.clientWidth]);
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
});
