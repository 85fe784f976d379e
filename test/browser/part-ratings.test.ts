// The part form in a real browser: the category is chosen from the list, switching it redraws the rating boxes of the
// new category (one box per rating, with its unit), a bad box is refused naming the rating with every box kept, and a
// good save stores the ratings. Values are typed by hand; SI prefixes per the BIPM SI Brochure (9th ed., Table 7).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { hasChromium, openSession, artifactPath, CHROMIUM_PATH, type BrowserSession } from '../helpers/browser';
import type { RunningServer } from '../helpers/server';

if (!hasChromium) console.warn(`Browser tests skipped: ${CHROMIUM_PATH} is missing (apt-get install chromium).`);

const DEMO = '/projects/demo-club-30m';

describe.skipIf(!hasChromium)('part ratings in the browser', () => {
  let session: BrowserSession;
  let server: RunningServer;
  let page: Page;

  beforeAll(async () => {
    session = await openSession();
    ({ server, page } = session);
  }, 120_000);
  afterAll(() => session?.close());

  it('a category switch redraws the rating boxes; a bad value is named and kept; a good one is saved', async () => {
    await page.goto(server.url + DEMO + '/parts');
    const form = page.locator('form[aria-label="Add a part"]');
    await form.locator('input[name="description"]').fill('Electrolytic 2200 µF 35 V');
    await form.locator('select[name="category"]').selectOption('fuse');
    await form.locator('input[name="r.ratedA"]').waitFor();
    expect(await form.locator('input[name="r.capacitanceF"]').count()).toBe(0);
    await form.locator('select[name="category"]').selectOption('capacitor');
    await form.locator('input[name="r.capacitanceF"]').waitFor();
    expect(await form.locator('#ratings-ap').innerText()).toContain('Rated voltage (V)');
    await form.locator('input[name="r.capacitanceF"]').fill('2200');
    await form.locator('input[name="r.voltageV"]').fill('-35');
    await form.screenshot({ path: artifactPath('part-ratings-1280.png') });
    await form.locator('button[type="submit"]').click();
    const error = page.locator('form[aria-label="Add a part"] .error').first();
    await error.waitFor();
    expect(await error.innerText()).toContain('Rated voltage must be more than 0 V');
    expect(await page.locator('form[aria-label="Add a part"] input[name="r.capacitanceF"]').inputValue()).toBe('2200');
    await page.locator('form[aria-label="Add a part"] input[name="r.voltageV"]').fill('35');
    await page.locator('form[aria-label="Add a part"] button[type="submit"]').click();
    await page.waitForSelector('p.notice');
    const card = page.locator('details.part', { hasText: 'Electrolytic 2200 µF 35 V' });
    await card.evaluate((d) => ((d as HTMLDetailsElement).open = true)); // opened after the add; kept open
    // 2200 µF shown back in the µF box, 35 V in the V box
    expect(await card.locator('input[name="r.capacitanceF"]').inputValue()).toBe('2200');
    expect(await card.locator('input[name="r.voltageV"]').inputValue()).toBe('35');
    await page.setViewportSize({ width: 390, height: 844 });
    await card.scrollIntoViewIfNeeded();
    await card.screenshot({ path: artifactPath('part-ratings-390.png') });
    expect(session.problems).toEqual([]);
  }, 120_000);
});
