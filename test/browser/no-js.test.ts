// The same flows with JavaScript switched off: every form posts normally, the server answers with
// Post/Redirect/Get or a full page carrying the message beside the field.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { hasChromium, launchBrowser, artifactPath, CHROMIUM_PATH } from '../helpers/browser';
import { startServer, type RunningServer } from '../helpers/server';

if (!hasChromium) console.warn(`Browser tests skipped: ${CHROMIUM_PATH} is missing (apt-get install chromium).`);

const DEMO = '/projects/demo-club-30m';

describe.skipIf(!hasChromium)('without JavaScript', () => {
  let server: RunningServer;
  let browser: Awaited<ReturnType<typeof launchBrowser>>;
  let page: Page;

  beforeAll(async () => {
    server = await startServer();
    browser = await launchBrowser();
    page = await browser.context.newPage();
    const cdp = await browser.context.newCDPSession(page);
    await cdp.send('Emulation.setScriptExecutionDisabled', { value: true });
  }, 120_000);

  afterAll(async () => {
    await browser?.close();
    await server?.stop();
    server?.cleanup();
  });

  const total = (mode: string) => page.locator(`#budget [data-total-mode="${mode}"]`).innerText();
  const loadsForm = () => page.locator('form.loads').first();

  it('scripts really are off (htmx did not load)', async () => {
    await page.goto(server.url + DEMO);
    expect(await page.evaluate(() => 'htmx' in window).catch(() => false)).toBe(false);
  });

  it('saving a current posts the form, redirects back to the overview and shows the new total', async () => {
    await page.goto(server.url + DEMO);
    const before = await total('receive');
    await loadsForm().locator('input[name="l0_receive"]').fill('1.75 A');
    await Promise.all([
      page.waitForURL(server.url + DEMO),
      loadsForm().getByRole('button', { name: 'Save currents' }).click(),
    ]);
    await page.waitForLoadState('load');
    // 1.75 A shown back in the box's unit, mA;
    expect(await loadsForm().locator('input[name="l0_receive"]').inputValue()).toBe('1750');
    expect(await total('receive')).not.toBe(before);
  });

  it('a refused current comes back as a full page with the message beside the field and the text kept', async () => {
    await page.goto(server.url + DEMO);
    await loadsForm().locator('input[name="l0_receive"]').fill('abc');
    await Promise.all([
      page.waitForLoadState('load'),
      loadsForm().getByRole('button', { name: 'Save currents' }).click(),
    ]);
    await page.locator('form.loads label.has-error .error').first().waitFor();
    expect(await page.locator('form.loads label.has-error .error').first().innerText()).toMatch(
      /"abc" is not understood/,
    );
    expect(await page.locator('form.loads input[aria-invalid="true"]').first().inputValue()).toBe('abc');
    await page.screenshot({ path: artifactPath('overview-no-js-refused.png'), fullPage: true });
  });

  it('adding and reordering stages work as plain form posts', async () => {
    await page.goto(server.url + DEMO);
    const names = () => page.locator('li.stage .stage-name').allInnerTexts();
    const before = await names();
    const form = page.locator('form.add-stage');
    await form.locator('input[name="name"]').fill('Audio filter (no JS)');
    await Promise.all([page.waitForLoadState('load'), form.getByRole('button', { name: 'Add stage' }).click()]);
    await expect.poll(() => names()).toHaveLength(before.length + 1);
    const now = await names();
    await Promise.all([
      page.waitForLoadState('load'),
      page.getByRole('button', { name: `Move ${now[0]} down` }).click(),
    ]);
    await expect.poll(() => names()).toEqual([now[1], now[0], ...now.slice(2)]);
  });
});
