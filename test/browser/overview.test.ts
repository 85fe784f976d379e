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

  const markPage = () =>
    page.evaluate(() => ((window as unknown as { __rigwrightMarker: string }).__rigwrightMarker = 'still-here'));
  const marker = () => page.evaluate(() => (window as unknown as { __rigwrightMarker?: string }).__rigwrightMarker);
  const total = (mode: string) => page.locator(`#budget [data-total-mode="${mode}"]`).innerText();
  const loadsForm = () => page.locator('form.loads').first();
  const stageNames = () => page.locator('li.stage .stage-name').allInnerTexts();

  it('at 1280x900 the first screen shows the verdict, the power-flow diagram and the top fixes without ' +
    'scrolling', async () => {
    expect(page.viewportSize()).toEqual({ width: 1280, height: 900 });
    await page.evaluate(() => window.scrollTo(0, 0));
    for (const sel of ['#verdict', '#top-fixes', '#power-flow svg.power-flow']) {
      const box = (await page.locator(sel).boundingBox())!;
      expect(box, sel).not.toBeNull();
      expect(box.y, sel).toBeGreaterThanOrEqual(0);
      expect(box.y + box.height, `${sel} ends inside the first screen`).toBeLessThanOrEqual(900);
      expect(await page.locator(sel).isVisible(), sel).toBe(true);
    }
    // the diagram draws each rail with its headroom verdict in words, not only by colour
    const rails = page.locator('#power-flow g.rail');
    expect(await rails.count()).toBeGreaterThanOrEqual(2);
    for (const text of await rails.allTextContents()) expect(text).toMatch(/headroom (OK|low|fails)|no headroom check/);
    await page.screenshot({ path: artifactPath('overview-first-screen.png') });
  });

  it('at 1280 px the current budget fits its card: every column shown, nothing scrolled out of view', async () => {
    const fit = await page.locator('#budget .scroll-x').evaluate((box) => ({
      scrollW: box.scrollWidth,
      clientW: box.clientWidth,
    }));
    expect(fit.scrollW).toBeLessThanOrEqual(fit.clientW);
    // the shortened voltage header still says in full what it shows
    expect(await page.locator('#budget thead th[title]').getAttribute('title')).toContain('nominal mains');
  });

  it('data-verdict matches the actionable findings listed under "Checks at a glance", and the top fixes are the ' +
    'first three', async () => {
    const verdict = await page.locator('[data-verdict]').getAttribute('data-verdict');
    expect(await page.locator('[data-verdict]').count()).toBe(1);
    // the actionable findings that need attention, as the page lists them (standing cautions are in their own block)
    const listed = page.locator('#checks ul.findings > li.finding');
    const severities = await listed.evaluateAll((els) =>
      els.map((e) => (e.classList.contains('sev-fail') ? 'fail' : 'caution')),
    );
    const expected = severities.includes('fail') ? 'fail' : severities.includes('caution') ? 'caution' : 'ok';
    expect(verdict).toBe(expected);
    expect(expected).not.toBe('ok'); // the club demo carries cautions, so the check above compares something
    const fixes = page.locator('#top-fixes li.fix');
    expect(await fixes.count()).toBe(Math.min(3, severities.length));
    const firstRules = await listed.evaluateAll((els) => els.map((e) => e.getAttribute('data-rule')));
    const fixRules = await fixes.evaluateAll((els) => els.map((e) => e.getAttribute('data-rule')));
    // fails first, then cautions, as in the list below (which keeps the same order within a severity)
    const sorted = [...firstRules.keys()].sort((a, b) =>
      severities[a] === severities[b] ? a - b : severities[a] === 'fail' ? -1 : 1,
    );
    expect(fixRules).toEqual(sorted.slice(0, 3).map((i) => firstRules[i]));
    // each fix links to a page that exists, and an anchor it names is on that page
    for (const href of await page
      .locator('#top-fixes a.fix-link')
      .evaluateAll((els) => els.map((e) => e.getAttribute('href')!))) {
      const res = await fetch(server.url + href);
      expect(res.status, href).toBe(200);
      const anchor = href.split('#')[1];
      if (anchor) expect(await res.text(), href).toContain(`id="${anchor}"`);
    }
  });

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
    await page.waitForFunction(
      (prev) => document.querySelector('#budget [data-total-mode="receive"]')?.textContent !== prev,
      before,
    );
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

  it('refuses "abc" as a current: the message stands beside the field, the typed text is kept, nothing is ' +
    'saved', async () => {
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
