// The main flow with JavaScript switched off, in Chromium: a project from a template, a costed plan, a stage edit
// (Post/Redirect/Get), a top-fix link to its focused input, a collapsible section, the settings saved, the variant
// comparison and the sweep (GET forms), and the pack download. Plain HTML forms and links only.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { hasChromium, launchBrowser, artifactPath, CHROMIUM_PATH } from '../helpers/browser';
import { startServer, type RunningServer } from '../helpers/server';

if (!hasChromium) console.warn(`Browser tests skipped: ${CHROMIUM_PATH} is missing (apt-get install chromium).`);

describe.skipIf(!hasChromium)('main flow without JavaScript', () => {
  let server: RunningServer;
  let browser: Awaited<ReturnType<typeof launchBrowser>>;
  let page: Page;
  let projectUrl = '';
  const problems: string[] = [];

  beforeAll(async () => {
    server = await startServer();
    browser = await launchBrowser();
    page = await browser.context.newPage();
    const cdp = await browser.context.newCDPSession(page);
    await cdp.send('Emulation.setScriptExecutionDisabled', { value: true });
    page.on('console', (m) => m.type() === 'error' && !/status of 4(09|22)/.test(m.text()) && problems.push(m.text()));
  }, 120_000);

  afterAll(async () => {
    await browser?.close();
    await server?.stop();
    server?.cleanup();
  });

  it('creates a project from a template with a plain form post', async () => {
    await page.goto(server.url + '/');
    expect(await page.evaluate(() => 'htmx' in window).catch(() => false)).toBe(false);
    const form = page.locator('form[action="/projects"]');
    await form.locator('#tpl-single-rail').check();
    await form.locator('input[name="name"]').fill('No-script rig');
    await Promise.all([
      page.waitForURL(/\/projects\/prj[^/]*$/),
      form.getByRole('button', { name: 'Create project' }).click(),
    ]);
    projectUrl = page.url();
    expect(await page.title()).toContain('No-script rig');
  });

  it('shows a costed plan on the first screen', async () => {
    expect(await page.locator('[data-verdict]').getAttribute('data-verdict')).toMatch(/^(ok|caution|fail)$/);
    expect(await page.locator('#cost-glance').innerText()).toMatch(/\d[\d,.]* per kit/);
    expect(await page.locator('li.stage').count()).toBeGreaterThan(2);
  });

  it('edits a stage: the form posts, redirects back and the value is saved', async () => {
    await page.locator('li.stage a.stage-name').first().click();
    await page.waitForURL(/\/stages\/[^/]+$/);
    const stageUrl = page.url();
    const form = page.locator(`form[action="${new URL(stageUrl).pathname}"]`);
    await form.locator('input[name="name"]').fill('Receiver (edited without script)');
    await Promise.all([
      page.waitForURL((u) => u.pathname === new URL(stageUrl).pathname),
      form.getByRole('button', { name: 'Save stage' }).click(),
    ]);
    await page.waitForLoadState('load');
    expect(await page.locator(`form[action="${new URL(stageUrl).pathname}"] input[name="name"]`).inputValue()).toBe(
      'Receiver (edited without script)',
    );
  });

  it('a top-fix link opens its page with the input focused (an anchor, no script)', async () => {
    await page.goto(projectUrl);
    const link = page.locator('#top-fixes a.fix-link').first();
    expect(await link.count()).toBe(1); // the template's typical values leave a caution to fix
    const href = (await link.getAttribute('href'))!;
    const anchor = href.split('#')[1];
    expect(anchor).toBeTruthy();
    await Promise.all([page.waitForURL((u) => u.hash === `#${anchor}`), link.click()]);
    await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe(anchor);
    expect(await page.evaluate(() => document.activeElement!.tagName.toLowerCase())).toMatch(
      /^(input|select|textarea)$/,
    );
  });

  it('opens the settings section and saves the number of kits', async () => {
    await page.goto(projectUrl);
    await page.locator('details#settings > summary').click();
    const form = page.locator('form[action$="/settings"]');
    await form.locator('input[name="kits"]').fill('5');
    await Promise.all([page.waitForURL(projectUrl), form.getByRole('button', { name: 'Save settings' }).click()]);
    await page.waitForLoadState('load');
    expect(await page.locator('details#settings .summary-line').innerText()).toContain('5 kits');
  });

  it('compares with a demo and sweeps a parameter through GET forms', async () => {
    await page.goto(`${projectUrl}/compare`);
    await page.selectOption('select[name="p2"]', 'demo-portable-20m');
    await Promise.all([page.waitForURL(/p2=demo-portable-20m/), page.getByRole('button', { name: 'Compare' }).click()]);
    expect(await page.locator('table.compare-table thead th').count()).toBeGreaterThanOrEqual(3);
    await page.goto(`${projectUrl}/sweep`);
    const form = page.locator('form.sweep-form').first();
    await Promise.all([page.waitForURL(/param=/), form.getByRole('button', { name: 'Sweep' }).click()]);
    expect(await page.locator('#sweep-result svg.sweep').isVisible()).toBe(true);
    await page.screenshot({ path: artifactPath('no-js-sweep.png'), fullPage: true });
  });

  it('downloads the pack with a plain link', async () => {
    await page.goto(`${projectUrl}/pack`);
    const [download] = await Promise.all([
      page.waitForEvent('download', { timeout: 60_000 }),
      page.getByRole('link', { name: 'Builder’s pack, A4' }).click(),
    ]);
    const file = join(mkdtempSync(join(tmpdir(), 'rw-nojs-')), download.suggestedFilename() || 'pack.pdf');
    await download.saveAs(file);
    expect(readFileSync(file).subarray(0, 5).toString('latin1')).toBe('%PDF-');
  });

  it('logged no errors on the way', () => {
    expect(problems).toEqual([]);
  });
});
