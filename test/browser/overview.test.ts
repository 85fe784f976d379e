// The overview in a real browser: in-place budget updates (no full reload), adding, refusing and
// reordering stages, all through htmx against the real server on its own database.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { hasChromium, openSession, artifactPath, CHROMIUM_PATH, type BrowserSession } from '../helpers/browser';
import type { RunningServer } from '../helpers/server';
import { formByAction } from '../helpers/html';

if (!hasChromium) console.warn(`Browser tests skipped: ${CHROMIUM_PATH} is missing (apt-get install chromium).`);

const DEMO = '/projects/demo-club-30m';

describe.skipIf(!hasChromium)('overview in the browser', () => {
  let session: BrowserSession;
  let server: RunningServer;
  let page: Page;
  let problems: string[];

  beforeAll(async () => {
    session = await openSession();
    ({ server, page, problems } = session);
    await page.goto(server.url + DEMO);
    await page.waitForFunction(() => 'htmx' in window);
  }, 120_000);

  afterAll(() => session?.close());

  const markPage = () => page.evaluate(() => ((window as unknown as { __rigwrightMarker: string }).__rigwrightMarker = 'still-here'));
  const marker = () => page.evaluate(() => (window as unknown as { __rigwrightMarker?: string }).__rigwrightMarker);
  const total = (mode: string) => page.locator(`#budget [data-total-mode="${mode}"]`).innerText();
  const loadsForm = () => page.locator('form.loads').first();
  const stageNames = () => page.locator('li.stage .stage-name').allInnerTexts();

  it('shows the demo overview with its stages and budget', async () => {
    expect(await page.title()).toMatch(/Club build/);
    expect((await stageNames()).length).toBeGreaterThanOrEqual(5);
    expect(await total('receive')).toMatch(/W$/);
    await page.screenshot({ path: artifactPath('overview.png'), fullPage: true });
  });

  it('saving a stage current updates the budget total in place, without a full reload', async () => {
    await markPage();
    const before = await total('receive');
    const field = loadsForm().locator('input[name="l0_receive"]');
    const typed = '2.5 A';
    expect(await field.inputValue()).not.toBe(typed);
    await field.fill(typed);
    await loadsForm().getByRole('button', { name: 'Save currents' }).click();
    await page.waitForFunction((prev) => document.querySelector('#budget [data-total-mode="receive"]')?.textContent !== prev, before);
    expect(await total('receive')).not.toBe(before);
    expect(await marker()).toBe('still-here'); // the window survived: the swap was in place
    await expect.poll(() => page.locator('#overview .notice').innerText()).toMatch(/Saved/);
    // and it was stored: the page as served now carries the new value
    const html = await (await fetch(server.url + DEMO)).text();
    const sid = (await loadsForm().getAttribute('action'))!;
    // stored as 2.5 A and shown back in the box's own unit (mA)
    expect(formByAction(html, sid).fields.l0_receive).toBe('2500');
  });

  it('adds a stage in place', async () => {
    await markPage();
    const count = (await stageNames()).length;
    const form = page.locator('form.add-stage');
    await form.locator('select[name="kind"]').selectOption('driver');
    await form.locator('input[name="name"]').fill('Buffer amplifier (browser)');
    await form.getByRole('button', { name: 'Add stage' }).click();
    await expect.poll(() => stageNames()).toHaveLength(count + 1);
    expect((await stageNames()).at(-1)).toBe('Buffer amplifier (browser)');
    expect(await marker()).toBe('still-here');
  });

  it('refuses "abc" as a current: the message stands beside the field, the typed text is kept, nothing is saved', async () => {
    await markPage();
    const before = await total('receive');
    const field = loadsForm().locator('input[name="l0_receive"]');
    await field.fill('abc');
    await loadsForm().getByRole('button', { name: 'Save currents' }).click();
    const message = loadsForm().locator('label.has-error:has(input[name="l0_receive"]) .error');
    await message.waitFor();
    expect(await message.innerText()).toMatch(/"abc" is not understood/);
    expect(await loadsForm().locator('input[name="l0_receive"]').inputValue()).toBe('abc');
    expect(await loadsForm().locator('input[name="l0_receive"]').getAttribute('aria-invalid')).toBe('true');
    expect(await total('receive')).toBe(before);
    expect(await marker()).toBe('still-here');
    await page.screenshot({ path: artifactPath('overview-refused.png'), fullPage: true });
  });

  it('reorders stages with the move buttons, and the order is stored', async () => {
    await page.goto(server.url + DEMO);
    await page.waitForFunction(() => 'htmx' in window);
    await markPage();
    const before = await stageNames();
    await page.getByRole('button', { name: `Move ${before[0]} down` }).click();
    await expect.poll(() => stageNames()).toEqual([before[1], before[0], ...before.slice(2)]);
    await page.getByRole('button', { name: `Move ${before.at(-1)} up` }).click();
    const expected = [before[1], before[0], ...before.slice(2, -2), before.at(-1)!, before.at(-2)!];
    await expect.poll(() => stageNames()).toEqual(expected);
    expect(await marker()).toBe('still-here');
    await page.reload();
    expect(await stageNames()).toEqual(expected);
  });

  it('raised no script errors or policy violations on the way', () => {
    expect(problems).toEqual([]);
  });
});
