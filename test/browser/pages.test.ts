// The section pages in a real browser: stage (filter), RF checks, parts catalog and parts list edit in
// place (no full reload), refuse bad input beside the field, and the parts list exports CSV.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { hasChromium, openSession, artifactPath, CHROMIUM_PATH, type BrowserSession } from '../helpers/browser';
import type { RunningServer } from '../helpers/server';
import { parseCsv } from '../../src/core/csv/parse';

if (!hasChromium) console.warn(`Browser tests skipped: ${CHROMIUM_PATH} is missing (apt-get install chromium).`);

const DEMO = '/projects/demo-club-30m';

describe.skipIf(!hasChromium)('section pages in the browser', () => {
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

  /** Open a page (skipping the test when the route has not landed) and mark the window. */
  async function open(path: string, ctx: { skip: (m: string) => void }) {
    const probe = await fetch(server.url + path);
    if (probe.status === 404) ctx.skip(`${path} not landed yet`);
    await page.goto(server.url + path);
    await page.waitForFunction(() => 'htmx' in window);
    await page.evaluate(() => ((window as unknown as { __m: string }).__m = 'kept'));
  }
  const marker = () => page.evaluate(() => (window as unknown as { __m?: string }).__m);
  const text = (sel: string) => page.locator(sel).first().innerText();

  // A control named "form" makes formElement.form return that control, and htmx 4 then fails with
  // "Failed to construct 'FormData'". ("method" shadows too but is harmless here: see the supply rail test.)
  it('no form control shadows a form property that scripts call (form, elements, submit, ...)', async () => {
    const clobbered: string[] = [];
    const stageIds = ['st-rx', 'st-pa', 'st-lpf', 'st-tr'];
    for (const path of ['', '/supply', '/rf', '/parts', '/bom', '/pack', ...stageIds.map((s) => `/stages/${s}`)]) {
      const probe = await fetch(`${server.url}${DEMO}${path}`);
      if (probe.status === 404) continue;
      await page.goto(`${server.url}${DEMO}${path}`);
      const found = await page.evaluate(() => {
        const props = ['form', 'elements', 'submit', 'requestSubmit', 'reset', 'checkValidity', 'reportValidity'];
        const out: string[] = [];
        document.querySelectorAll('form').forEach((f) => {
          for (const p of props)
            if ((f as unknown as Record<string, unknown>)[p] instanceof Element)
              out.push(`${f.getAttribute('action')}: a control named "${p}"`);
        });
        return out;
      });
      clobbered.push(...found.map((x) => `${DEMO}${path} ${x}`));
    }
    expect(clobbered).toEqual([]);
  });

  it('stage page: redesigning the filter at a higher order updates the checks in place; an even order is refused ' +
    'beside the field', async (ctx) => {
    await open(`${DEMO}/stages/st-lpf`, ctx);
    await page.screenshot({ path: artifactPath('stage-lpf.png'), fullPage: true });
    const form = () => page.locator(`form[action="${DEMO}/stages/st-lpf/lpf"]`);
    await form().locator('input[name="order"]').fill('4');
    await form().getByRole('button', { name: 'Save and redesign' }).click();
    await form().locator('label.has-error:has(input[name="order"]) .error').waitFor();
    expect(await form().locator('label.has-error:has(input[name="order"]) .error').innerText()).toMatch(/odd/i);
    expect(await form().locator('input[name="order"]').inputValue()).toBe('4');
    const before = await text('#stage');
    await form().locator('input[name="order"]').fill('7');
    await form().getByRole('button', { name: 'Save and redesign' }).click();
    await expect.poll(() => form().locator('.error').count()).toBe(0);
    await expect.poll(() => text('#stage')).not.toBe(before);
    expect(await form().locator('input[name="order"]').inputValue()).toBe('7');
    expect(await marker()).toBe('kept');
  });

  it('RF checks: saving a setting recomputes the results in place', async (ctx) => {
    await open(`${DEMO}/rf`, ctx);
    await page.screenshot({ path: artifactPath('rf.png'), fullPage: true });
    const form = page.locator(`form[action="${DEMO}/rf/settings"]`);
    const before = await text('#rf-results');
    await form.locator('input[name="antennaGain"]').fill('12');
    await form.getByRole('button', { name: 'Save and recompute' }).click();
    await expect.poll(() => text('#rf-results')).not.toBe(before);
    expect(await page.locator(`form[action="${DEMO}/rf/settings"] input[name="antennaGain"]`).inputValue()).toMatch(
      /^12/,
    );
    expect(await marker()).toBe('kept');
  });

  it('parts catalog: a malformed price list is refused beside the field with the text kept; a good one is saved in ' +
    'place', async (ctx) => {
    await open(`${DEMO}/parts`, ctx);
    await page.screenshot({ path: artifactPath('parts.png'), fullPage: true });
    const offer = () => page.locator('form[aria-label="Offer Northfield Components NC-TR-7016"]');
    // each part is a collapsed <details>: open it as a user would
    await page.locator('details#part-p-trafo > summary').click();
    await offer().locator('input[name="breaks"]').fill('one: lots');
    await offer().getByRole('button', { name: 'Save' }).click();
    await offer().locator('.error').first().waitFor();
    expect(await offer().locator('input[name="breaks"]').inputValue()).toBe('one: lots');
    await offer().locator('input[name="breaks"]').fill('1: 99.00');
    await offer().getByRole('button', { name: 'Save' }).click();
    await expect.poll(() => offer().locator('.error').count()).toBe(0);
    expect(await offer().locator('input[name="breaks"]').inputValue()).toMatch(/^1: 99(\.00)?$/);
    expect(await marker()).toBe('kept');
  });

  it('parts list: changing a quantity updates the cost in place; a bad quantity is refused; the CSV download carries ' +
    'the new quantity', async (ctx) => {
    await open(`${DEMO}/bom`, ctx);
    await page.screenshot({ path: artifactPath('bom.png'), fullPage: true });
    const line = () => page.locator('form#line-b1');
    const cost = () => text('#cost-results .summary-line strong');
    await line().locator('input[name="qty"]').fill('lots');
    await line().getByRole('button', { name: 'Save' }).click();
    // in the grid the messages stand in a full-width box right above the row; the field is marked invalid
    await line().locator('.form-errors').waitFor();
    expect(await line().locator('.form-errors').innerText()).toMatch(/"lots" is not understood/);
    expect(await line().locator('input[name="qty"]').getAttribute('aria-invalid')).toBe('true');
    expect(await line().locator('input[name="qty"]').inputValue()).toBe('lots');
    const before = await cost();
    await line().locator('input[name="qty"]').fill('3');
    await line().getByRole('button', { name: 'Save' }).click();
    await expect.poll(() => cost()).not.toBe(before);
    expect(await marker()).toBe('kept');

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: 'CSV (comma separated)' }).click(),
    ]);
    const file = join(dl, download.suggestedFilename() || 'parts.csv');
    await download.saveAs(file);
    const csv = parseCsv(readFileSync(file, 'utf8'));
    expect(csv.errors).toEqual([]);
    const header = csv.records[0].map((h) => h.toLowerCase());
    const refsCol = header.findIndex((h) => /ref|designator/.test(h));
    expect(refsCol, `header: ${header.join(' | ')}`).toBeGreaterThanOrEqual(0);
    const row = csv.records.find((r) => r[refsCol] === 'J1');
    expect(row, 'the J1 line is in the CSV').toBeDefined();
    expect(row!.some((cell) => cell === '3')).toBe(true);
  });

  it('parts list: a CSV file is previewed first, then imported as new lines', async (ctx) => {
    await open(`${DEMO}/bom`, ctx);
    const file = join(dl, 'lines.csv');
    writeFileSync(
      file,
      'Refs,Description,Quantity,Supplier,Price,Currency\r\nR81,Resistor 1k 0.25 W,2,Plain Parts ' +
        'Co,0.05,USD\r\nR83,Resistor 4k7 0.25 W,1,Plain Parts Co,0.05,USD\r\n',
    );
    const form = page.locator('form[aria-label="Import a parts list from CSV"]');
    await form.locator('input[type="file"]').setInputFiles(file);
    await Promise.all([page.waitForURL(/\/bom\/import$/), form.getByRole('button', { name: /Preview/ }).click()]);
    expect(await page.locator('main').innerText()).toContain('Resistor 4k7 0.25 W');
    // nothing is saved by the preview
    expect(await (await fetch(`${server.url}${DEMO}/bom`)).text()).not.toContain('R81');
    await Promise.all([page.waitForURL(/\/bom\?/), page.getByRole('button', { name: 'Import', exact: true }).click()]);
    expect(await page.locator('.notice').first().innerText()).toMatch(/Imported 2 line/);
    expect(await page.locator('form#line-b1').count()).toBe(1);
    expect(await page.locator('input[name="refs"][value="R81"]').count()).toBe(1);
  });

  it('raised no script errors or policy violations on the way', () => {
    expect(problems).toEqual([]);
  });
});
