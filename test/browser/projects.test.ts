// Project list flows in a real browser: export a project as JSON (a real download) and import it back
// as a new project; the supply page edits in place; PDF and CSV downloads once those pages exist.
import { PDFTOTEXT } from '../helpers/tools';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { hasChromium, openSession, artifactPath, CHROMIUM_PATH, type BrowserSession } from '../helpers/browser';
import type { RunningServer } from '../helpers/server';

if (!hasChromium) console.warn(`Browser tests skipped: ${CHROMIUM_PATH} is missing (apt-get install chromium).`);

const DEMO = 'demo-club-30m';

describe.skipIf(!hasChromium)('project list, downloads and other pages in the browser', () => {
  let session: BrowserSession;
  let server: RunningServer;
  let page: Page;
  let dl: string;
  let problems: string[];

  beforeAll(async () => {
    session = await openSession();
    ({ server, page, problems } = session);
    dl = session.downloads;
  }, 120_000);

  afterAll(() => session?.close());

  const projectRows = () => page.locator('table.projects tbody tr').count();
  const markPage = () => page.evaluate(() => ((window as unknown as { __m: string }).__m = 'kept'));
  const marker = () => page.evaluate(() => (window as unknown as { __m?: string }).__m);

  it('lists the demo projects', async () => {
    await page.goto(server.url + '/');
    expect(await projectRows()).toBe(2);
    await page.screenshot({ path: artifactPath('projects.png'), fullPage: true });
  });

  it('exports the demo as JSON and imports the file back as a new project with the same content', async () => {
    await page.goto(server.url + '/');
    const row = page.locator('table.projects tbody tr', { has: page.locator(`a[href="/projects/${DEMO}"]`) });
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      row.getByRole('link', { name: 'Export JSON' }).click(),
    ]);
    const file = join(dl, download.suggestedFilename());
    await download.saveAs(file);
    expect(download.suggestedFilename()).toMatch(/\.json$/);
    const exported = JSON.parse(readFileSync(file, 'utf8'));
    expect(exported.format).toBe('rigwright-project');
    expect(exported.project.id).toBe(DEMO);

    await page.locator('form[action="/import"] input[type="file"]').setInputFiles(file);
    await Promise.all([
      page.waitForURL(/\/projects\/prj/),
      page.locator('form[action="/import"]').getByRole('button', { name: 'Import' }).click(),
    ]);
    const newId = new URL(page.url()).pathname.split('/').pop()!;
    expect(newId).not.toBe(DEMO);
    expect(await page.locator('header .crumb').innerText()).toBe(exported.project.name);
    const names = await page.locator('li.stage .stage-name').allInnerTexts();
    expect(names).toEqual(exported.project.stages.map((s: { name: string }) => s.name));
    await page.goto(server.url + '/');
    expect(await projectRows()).toBe(3);
  });

  it('deletes a stage and then a project, each after a confirmation page', async () => {
    await page.goto(`${server.url}/projects/${DEMO}`);
    const names = () => page.locator('li.stage .stage-name').allInnerTexts();
    const before = await names();
    const victim = before.at(-1)!;
    await page.locator('li.stage', { hasText: victim }).getByRole('link', { name: /Delete/ }).click();
    await page.waitForURL(/\/delete$/);
    expect(await page.locator('main').innerText()).toContain(victim);
    await Promise.all([
      page.waitForURL(new RegExp(`/projects/${DEMO}(\\?.*)?$`)),
      page.getByRole('button', { name: /delete/i }).click(),
    ]);
    expect(await names()).toEqual(before.slice(0, -1));

    await page.goto(server.url + '/');
    const rows = await projectRows();
    const row = page.locator('table.projects tbody tr', { hasNot: page.locator('a[href^="/projects/demo-"]') }).first();
    await row.getByRole('link', { name: /Delete/ }).click();
    await page.waitForURL(/\/delete$/);
    await Promise.all([page.waitForURL(/\/(\?.*)?$/), page.getByRole('button', { name: /delete/i }).click()]);
    expect(await projectRows()).toBe(rows - 1);
    expect(await page.locator('.notice').innerText()).toMatch(/deleted/i);
  });

  it('shows a refused import with its reason and saves nothing', async () => {
    await page.goto(server.url + '/');
    const before = await projectRows();
    const bad = join(dl, 'broken.json');
    writeFileSync(bad, '{"format":"rigwright-project","formatVersion":1,"project":{"id":"x"');
    await page.locator('form[action="/import"] input[type="file"]').setInputFiles(bad);
    await page.locator('form[action="/import"]').getByRole('button', { name: 'Import' }).click();
    await page.locator('.form-errors').waitFor();
    expect(await page.locator('.form-errors').innerText()).toMatch(/not valid JSON/);
    await page.goto(server.url + '/');
    expect(await projectRows()).toBe(before);
  });

  it('supply page: refuses a bad fuse value beside the field, then saves a good one in place', async () => {
    await page.goto(`${server.url}/projects/${DEMO}/supply`);
    await page.waitForFunction(() => 'htmx' in window);
    await page.screenshot({ path: artifactPath('supply.png'), fullPage: true });
    await markPage();
    const form = page.locator('form[aria-label="Primary fuse"]');
    await form.locator('input[name="primaryFuse"]').fill('lots');
    await form.getByRole('button', { name: 'Save fuse' }).click();
    await page.locator('form[aria-label="Primary fuse"] .error').waitFor();
    expect(await page.locator('form[aria-label="Primary fuse"] input[name="primaryFuse"]').inputValue()).toBe('lots');
    await page.locator('form[aria-label="Primary fuse"] input[name="primaryFuse"]').fill('1.6 A');
    await page.locator('form[aria-label="Primary fuse"]').getByRole('button', { name: 'Save fuse' }).click();
    await expect.poll(() => page.locator('form[aria-label="Primary fuse"] .error').count()).toBe(0);
    expect(await page.locator('form[aria-label="Primary fuse"] input[name="primaryFuse"]').inputValue()).toBe('1.6 A');
    expect(await marker()).toBe('kept');
    const html = await (await fetch(`${server.url}/projects/${DEMO}/supply`)).text();
    expect(html).toMatch(/name="primaryFuse"[^>]*value="1.6 A"|value="1.6 A"[^>]*name="primaryFuse"/);
  });

  it('supply page: editing a regulated rail (its form has a control named "method") saves in place', async () => {
    await page.goto(`${server.url}/projects/${DEMO}/supply`);
    await page.waitForFunction(() => 'htmx' in window);
    await markPage();
    await page.locator('details#rail-rail-13v8 > summary').click();
    const form = () => page.locator(`form[action="/projects/${DEMO}/supply/rails/rail-13v8"]`);
    await form().locator('input[name="r2"]').fill('2.7 kΩ');
    await form().getByRole('button', { name: 'Save rail' }).click();
    await expect
      .poll(
        async () => (await (await fetch(`${server.url}/projects/${DEMO}/supply`)).text()).includes('value="2.7 kΩ"'),
        { timeout: 20_000 },
      )
      .toBe(true);
    expect(await marker()).toBe('kept');
  });

  for (const [label, path, linkPattern, magic] of [
    ['PDF builder pack', 'pack', /pack\.pdf(\?.*)?$/, '%PDF-'],
    ['parts list CSV', 'bom', /\.csv(\?.*)?$/, ''],
  ] as const) {
    it(`downloads the ${label} from its page (when that page exists)`, async (ctx) => {
      const probe = await fetch(`${server.url}/projects/${DEMO}/${path}`);
      if (probe.status === 404) ctx.skip(`/${path} page not landed yet`);
      await page.goto(`${server.url}/projects/${DEMO}/${path}`);
      await page.screenshot({ path: artifactPath(`${path}-download.png`), fullPage: true });
      const hrefs = await page.locator('a[href]').evaluateAll((as) => as.map((a) => a.getAttribute('href')!));
      const href = hrefs.find((h) => linkPattern.test(h));
      if (!href) ctx.skip(`no ${label} link on /${path} yet`);
      const [download] = await Promise.all([
        page.waitForEvent('download', { timeout: 60_000 }),
        page.locator(`a[href="${href}"]`).first().click(),
      ]);
      const file = join(dl, download.suggestedFilename() || `${path}.bin`);
      await download.saveAs(file);
      const bytes = readFileSync(file);
      expect(bytes.length).toBeGreaterThan(100);
      if (magic) expect(bytes.subarray(0, magic.length).toString('latin1')).toBe(magic);
      else expect(bytes.toString('utf8')).toMatch(/,|;/);
      // the PDF carries the project: its text (via poppler's pdftotext, when installed) names it
      if (magic && PDFTOTEXT) {
        const text = spawnSync(PDFTOTEXT, ['-layout', file, '-'], { encoding: 'utf8' }).stdout;
        expect(text).toContain('Club build');
      } else if (magic)
        console.warn(
          '[skip] PDF text check of the downloaded pack skipped: pdftotext not found on PATH (apt-get install ' +
            'poppler-utils).',
        );
    });
  }

  it('raised no script errors or policy violations on the way', () => {
    expect(problems).toEqual([]);
  });
});
