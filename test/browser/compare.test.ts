// Variants and the sweep in a real browser: clone as variant from the list, compare three projects side by side
// (differences marked in words), and sweep the PA rail's reservoir, with screenshots. Plain GET forms throughout.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import {
  hasChromium,
  openSession,
  launchBrowser,
  artifactPath,
  CHROMIUM_PATH,
  type BrowserSession,
} from '../helpers/browser';
import { startServer, type RunningServer } from '../helpers/server';

if (!hasChromium) console.warn(`Browser tests skipped: ${CHROMIUM_PATH} is missing (apt-get install chromium).`);

describe.skipIf(!hasChromium)('variants and sweep in the browser', () => {
  let session: BrowserSession;
  let server: RunningServer;
  let page: Page;
  let problems: string[];

  beforeAll(async () => {
    session = await openSession();
    ({ server, page, problems } = session);
  }, 120_000);

  afterAll(() => session?.close());

  it('clones the club demo as a variant from the list and opens the comparison with its original', async () => {
    await page.goto(server.url + '/');
    await page.locator('form[action="/projects/demo-club-30m/variant"] button').click();
    await page.waitForURL(/\/\?notice=/);
    const row = page.locator('tr', { hasText: 'Variant of Club build' }).first();
    expect(await row.innerText()).toContain('(variant of Club build');
    await row.getByRole('link', { name: 'Compare' }).click();
    await page.waitForURL(/\/compare\?p1=demo-club-30m&p2=/);
    expect(await page.locator('#compare-summary').innerText()).toContain('No figure differs.');
  });

  it('compares three projects: rows that differ say so in words, the transformer row says why one has ' +
    'none', async () => {
    const variant = await page.locator('select[name="p2"]').inputValue();
    await page.selectOption('select[name="p2"]', 'demo-portable-20m');
    await page.selectOption('select[name="p3"]', variant);
    await page.getByRole('button', { name: 'Compare' }).click();
    await page.waitForURL(/p3=/);
    const table = page.locator('table.compare-table');
    expect(await table.locator('thead th').count()).toBe(4);
    const differs = page.locator('tr.differs');
    expect(await differs.count()).toBeGreaterThan(3);
    for (const text of await differs.locator('th').allInnerTexts()) expect(text).toContain('≠ differs');
    const va = await page.locator('tr[data-key="transformerVA"]').innerText();
    expect(va).toContain('no mains transformer');
    expect(va).toContain('not in this one');
    await page.screenshot({ path: artifactPath('compare-three.png'), fullPage: true });
    expect(problems).toEqual([]);
  });

  it('sweeps the PA rail reservoir and plots the margins with a table of every point', async () => {
    await page.goto(server.url + '/projects/demo-club-30m');
    await page.getByRole('link', { name: 'Sweep one parameter' }).click();
    const form = page.locator('form#sweep-reservoirF');
    expect(await form.locator('select[name="target"]').inputValue()).toBe('rail-pa');
    await form.locator('input[name="from"]').fill('1000');
    await form.locator('input[name="to"]').fill('12000');
    await form.locator('input[name="points"]').fill('6');
    await form.getByRole('button', { name: 'Sweep' }).click();
    await page.waitForURL(/param=reservoirF/);
    const svg = page.locator('#sweep-result svg.sweep');
    expect(await svg.isVisible()).toBe(true);
    // the chart says pass or fail in words beside each panel, not by colour alone
    expect(await svg.textContent()).toMatch(/passes throughout|fails at some points/);
    expect(await page.locator('table.sweep-table tbody tr').count()).toBe(6);
    await page.screenshot({ path: artifactPath('sweep-reservoir.png'), fullPage: true });
    expect(problems).toEqual([]);
  });

  it('a bad sweep value comes back with its message beside the box and the typed text', async () => {
    const form = page.locator('form#sweep-paLoadOhm');
    await form.locator('input[name="from"]').fill('lots');
    await form.getByRole('button', { name: 'Sweep' }).click();
    await page.waitForURL(/param=paLoadOhm/);
    const again = page.locator('form#sweep-paLoadOhm');
    expect(await again.locator('input[name="from"]').inputValue()).toBe('lots');
    expect(await again.locator('.error').first().innerText()).toContain('From (PA load)');
  });
});

describe.skipIf(!hasChromium)('variants and sweep without JavaScript', () => {
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

  it('clone as variant, compare and sweep all work as plain forms', async () => {
    await page.goto(server.url + '/');
    expect(await page.evaluate(() => 'htmx' in window)).toBe(false);
    await page.locator('form[action="/projects/demo-portable-20m/variant"] button').click();
    await page.waitForURL(/\/\?notice=/);
    await page.locator('tr', { hasText: 'Variant of Portable' }).first().getByRole('link', { name: 'Compare' }).click();
    await page.waitForURL(/\/compare\?p1=demo-portable-20m&p2=/);
    expect(await page.locator('table.compare-table tbody tr').count()).toBeGreaterThan(5);
    await page.goto(server.url + '/projects/demo-portable-20m/sweep');
    const form = page.locator('form#sweep-lpfOrder');
    await form.getByRole('button', { name: 'Sweep' }).click();
    await page.waitForURL(/param=lpfOrder/);
    // 3 to 9: the odd orders 3, 5, 7, 9
    expect(await page.locator('table.sweep-table tbody th').allInnerTexts()).toEqual(['3', '5', '7', '9']);
    await page.screenshot({ path: artifactPath('sweep-no-js.png'), fullPage: true });
  });
});
