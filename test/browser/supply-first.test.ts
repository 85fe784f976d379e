// The supply page in a real browser at 1280x900: the deciding corners ("does it hold up?") come before the editors,
// the first rail's table (headroom at plain low mains and at the secondary tolerance, heating, tune-up) is on the
// first screen without scrolling; screenshots at 1280 px and 390 px.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { hasChromium, openSession, artifactPath, CHROMIUM_PATH, type BrowserSession } from '../helpers/browser';

if (!hasChromium) console.warn(`Browser tests skipped: ${CHROMIUM_PATH} is missing (apt-get install chromium).`);

const SUPPLY = '/projects/demo-club-30m/supply';

describe.skipIf(!hasChromium)('supply page leads with its deciding corners', () => {
  let session: BrowserSession;
  let page: Page;

  beforeAll(async () => {
    session = await openSession();
    page = session.page;
    await page.goto(session.server.url + SUPPLY);
    await page.waitForFunction(() => 'htmx' in window);
  }, 120_000);

  afterAll(() => session?.close());

  it('at 1280x900 the first rail’s deciding corners above the first form, on the first screen', async () => {
    expect(page.viewportSize()).toEqual({ width: 1280, height: 900 });
    await page.evaluate(() => window.scrollTo(0, 0));
    const first = page.locator('#supply-glance table.deciding').first();
    const box = (await first.boundingBox())!;
    expect(box).not.toBeNull();
    expect(box.y).toBeGreaterThanOrEqual(0);
    expect(box.y + box.height, 'the whole first table ends inside the first screen').toBeLessThanOrEqual(900);
    // every headroom row of it, the tolerance corner included, and heating and tune-up are in view
    for (const corner of ['low-keyDown', 'lowTol-keyDown', 'high-thermal', 'high-tuneUp']) {
      const r = (await first.locator(`tr[data-corner="${corner}"]`).boundingBox())!;
      expect(r, corner).not.toBeNull();
      expect(r.y + r.height, corner).toBeLessThanOrEqual(900);
    }
    const form = (await page.locator('#supply form').first().boundingBox())!;
    expect(form.y, 'the first editor form starts below the deciding corners').toBeGreaterThan(box.y + box.height);
    // every rail of the demo has its table in the glance, ahead of every form
    expect(await page.locator('#supply-glance table.deciding').count()).toBe(3);
    const lastGlance = (await page.locator('#supply-glance').boundingBox())!;
    expect(form.y).toBeGreaterThan(lastGlance.y + lastGlance.height - 1);
    await page.screenshot({ path: artifactPath('supply-first-screen-1280.png') });
  });

  it('a rail name in the glance leads to its results; the corner disclosure opens from the keyboard', async () => {
    await page.locator('#supply-glance caption a', { hasText: 'PA rail' }).click();
    await expect.poll(() => page.evaluate(() => location.hash)).toBe('#supply-rail-pa');
    const summary = page.locator('#supply-rail-pa details.all-corners > summary');
    await summary.focus();
    await page.keyboard.press('Enter');
    const opened = page.locator('#supply-rail-pa details.all-corners').evaluate((d) => (d as HTMLDetailsElement).open);
    expect(await opened).toBe(true);
    expect(session.problems).toEqual([]);
  });

  it('at 390 px the glance still comes first; screenshot', async () => {
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(session.server.url + SUPPLY);
    const glance = (await page.locator('#supply-glance').boundingBox())!;
    const form = (await page.locator('#supply form').first().boundingBox())!;
    expect(glance.y).toBeLessThan(form.y);
    // the glance fits the window (its wide tables scroll inside their own box)
    expect(glance.x).toBeGreaterThanOrEqual(0);
    expect(glance.x + glance.width).toBeLessThanOrEqual(390);
    await page.screenshot({ path: artifactPath('supply-first-screen-390.png') });
    await page.setViewportSize({ width: 1280, height: 900 });
  });

  it('without JavaScript the transformer form saves (Post/Redirect/Get) and the glance follows', async () => {
    const plain = session.server.url;
    const noJs = await page.context().newPage();
    const cdp = await page.context().newCDPSession(noJs);
    await cdp.send('Emulation.setScriptExecutionDisabled', { value: true });
    await noJs.goto(plain + SUPPLY);
    expect(await noJs.evaluate(() => 'htmx' in window).catch(() => false)).toBe(false);
    expect(await noJs.locator('#supply-glance tr[data-corner="lowTol-keyDown"]').count()).toBe(3);
    // empty = no tolerance corner (the field's help says so); the field keeps the id fix links use
    const box = noJs.locator('#transformer--t-tr-main--secondaryToleranceFraction');
    await box.fill('');
    const form = noJs.locator('form', { has: box });
    await Promise.all([noJs.waitForURL(plain + SUPPLY), form.getByRole('button', { name: 'Save' }).click()]);
    await noJs.waitForLoadState('load');
    expect(await noJs.locator('#transformer--t-tr-main--secondaryToleranceFraction').inputValue()).toBe('');
    expect(await noJs.locator('#supply-glance tr[data-corner="lowTol-keyDown"]').count()).toBe(0);
    const glance = (await noJs.locator('#supply-glance').boundingBox())!;
    const firstForm = (await noJs.locator('#supply form').first().boundingBox())!;
    expect(glance.y).toBeLessThan(firstForm.y);
    await noJs.close();
  });
});
