// Changing a stage's kind in a real browser: a change that would drop the stage's PA or relay data asks first
// (listing what goes); "Keep the kind" brings the form back with what was typed; the confirmed change saves.
// Once with htmx (swaps into #stage, no reload) and once with JavaScript switched off (plain form posts).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { hasChromium, openSession, launchBrowser, artifactPath, CHROMIUM_PATH } from '../helpers/browser';
import type { BrowserSession } from '../helpers/browser';

if (!hasChromium) console.warn(`Browser tests skipped: ${CHROMIUM_PATH} is missing (apt-get install chromium).`);

const DEMO = '/projects/demo-club-30m';

describe.skipIf(!hasChromium)('changing a stage kind in the browser', () => {
  let session: BrowserSession;
  let page: Page;
  let noJs: Page;
  let noJsBrowser: Awaited<ReturnType<typeof launchBrowser>>;

  beforeAll(async () => {
    session = await openSession();
    page = session.page;
    noJsBrowser = await launchBrowser();
    noJs = await noJsBrowser.context.newPage();
    const cdp = await noJsBrowser.context.newCDPSession(noJs);
    await cdp.send('Emulation.setScriptExecutionDisabled', { value: true });
  }, 120_000);

  afterAll(async () => {
    await noJsBrowser?.close();
    await session?.close();
  });

  const stageForm = (p: Page, sid: string) => p.locator(`form[action="${DEMO}/stages/${sid}"]`).first();
  const question = (p: Page) => p.locator('section.kind-change');

  it('with htmx: asks in place, "Keep the kind" keeps the typed entries, the confirmed change drops', async () => {
    await page.goto(`${session.server.url}${DEMO}/stages/st-pa`);
    await page.waitForFunction(() => 'htmx' in window);
    await session.markPage();
    const form = stageForm(page, 'st-pa');
    await form.locator('input[name="name"]').fill('Final, tried as a driver');
    await form.locator('textarea[name="notes"]').fill('Typed in the browser');
    await form.locator('select[name="kind"]').selectOption('driver');
    await form.getByRole('button', { name: 'Save stage' }).click();

    await question(page).waitFor();
    // demo PA (seed-demo/club-30m.ts): push-pull class C, 2 devices, fed from the PA rail
    expect(await question(page).innerText()).toContain('from Final amplifier (PA) to Driver drops its PA data');
    expect(await question(page).locator('li').allInnerTexts()).toContain('push-pull, class C, 2 devices');
    expect(await session.marker()).toBe('still-here'); // swapped in place
    await page.screenshot({ path: artifactPath('stage-kind-confirm.png'), fullPage: true });

    await question(page).getByRole('button', { name: 'Keep the kind' }).click();
    await page.locator('#stage .notice').waitFor();
    const notice = await page.locator('#stage .notice').innerText();
    expect(notice).toMatch(/Not saved yet: the kind stays Final amplifier \(PA\)/);
    expect(await form.locator('select[name="kind"]').inputValue()).toBe('final');
    expect(await form.locator('input[name="name"]').inputValue()).toBe('Final, tried as a driver');
    expect(await form.locator('textarea[name="notes"]').inputValue()).toBe('Typed in the browser');
    expect(await page.locator(`form[action="${DEMO}/stages/st-pa/pa"]`).count()).toBe(1);
    await page.screenshot({ path: artifactPath('stage-kind-kept.png'), fullPage: true });

    await form.locator('select[name="kind"]').selectOption('driver');
    await form.getByRole('button', { name: 'Save stage' }).click();
    await question(page).getByRole('button', { name: 'Change kind and drop the data' }).click();
    await expect.poll(() => page.locator('#stage .notice').innerText()).toMatch(/Saved/);
    expect(await form.locator('select[name="kind"]').inputValue()).toBe('driver');
    expect(await form.locator('input[name="name"]').inputValue()).toBe('Final, tried as a driver');
    expect(await page.locator(`form[action="${DEMO}/stages/st-pa/pa"]`).count()).toBe(0);
    expect(await session.marker()).toBe('still-here');
    expect(session.problems).toEqual([]);
  });

  it('without JavaScript: the question is a full page, and both answers are plain form posts', async () => {
    await noJs.goto(`${session.server.url}${DEMO}/stages/st-tr`);
    expect(await noJs.evaluate(() => 'htmx' in window).catch(() => false)).toBe(false);
    const form = stageForm(noJs, 'st-tr');
    await form.locator('input[name="name"]').fill('Relay, renamed without JS');
    await form.locator('select[name="kind"]').selectOption('other');
    // a plain form post: wait for the new document, not the one already loaded
    const post = async (button: ReturnType<Page['locator']>) => {
      await Promise.all([noJs.waitForEvent('framenavigated'), button.click()]);
      await noJs.waitForLoadState('load');
    };
    await post(form.getByRole('button', { name: 'Save stage' }));
    await question(noJs).waitFor();
    expect(await question(noJs).innerText()).toContain('from T/R switching to Other drops its relay data');
    await noJs.screenshot({ path: artifactPath('stage-kind-confirm-no-js.png'), fullPage: true });

    await post(question(noJs).getByRole('button', { name: 'Keep the kind' }));
    expect(await form.locator('select[name="kind"]').inputValue()).toBe('tr');
    expect(await form.locator('input[name="name"]').inputValue()).toBe('Relay, renamed without JS');

    await form.locator('select[name="kind"]').selectOption('other');
    await post(form.getByRole('button', { name: 'Save stage' }));
    await Promise.all([
      noJs.waitForURL(`${session.server.url}${DEMO}/stages/st-tr?done=saved`),
      question(noJs).getByRole('button', { name: 'Change kind and drop the data' }).click(),
    ]);
    expect(await noJs.locator('#stage .notice').innerText()).toBe('Saved.');
    expect(await form.locator('select[name="kind"]').inputValue()).toBe('other');
    expect(await form.locator('input[name="name"]').inputValue()).toBe('Relay, renamed without JS');
    expect(await noJs.locator(`form[action="${DEMO}/stages/st-tr/relay"]`).count()).toBe(0);
  });
});
