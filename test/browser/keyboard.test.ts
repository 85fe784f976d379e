// The main flow from the keyboard alone, in Chromium: from "New project" a template, a costed plan, a stage opened and
// a field edited, a top-fix link followed to its input, a collapsible section opened, and the pack downloaded. Only
// Tab, Shift+Tab, Enter and Space move and act (text is typed into boxes); every element reached shows a focus ring.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { hasChromium, openSession, artifactPath, CHROMIUM_PATH, type BrowserSession } from '../helpers/browser';
import type { RunningServer } from '../helpers/server';

if (!hasChromium) console.warn(`Browser tests skipped: ${CHROMIUM_PATH} is missing (apt-get install chromium).`);

/** Most Tab presses a page may need to reach an element (the parts-heavy pages have a few hundred stops). */
const MAX_STOPS = 400;

/** Tab (or Shift+Tab) until the focused element matches the selector (and holds the text); fails when it never does. */
async function tabTo(page: Page, selector: string, opts: { text?: string; back?: boolean } = {}): Promise<void> {
  for (let i = 0; i < MAX_STOPS; i++) {
    await page.keyboard.press(opts.back ? 'Shift+Tab' : 'Tab');
    const hit = await page.evaluate(
      ([sel, text]) => {
        const el = document.activeElement;
        return (
          !!el &&
          el.matches(sel) &&
          (!text || (el.textContent ?? '').includes(text) || (el.getAttribute('aria-label') ?? '').includes(text))
        );
      },
      [selector, opts.text ?? ''] as const,
    );
    if (hit) return;
  }
  throw new Error(`Tab never reached ${selector}${opts.text ? ` "${opts.text}"` : ''}`);
}

/** The focused element draws a focus ring: an outline at least 2 px wide that is not "none". */
const focusRing = (page: Page) =>
  page.evaluate(() => {
    const el = document.activeElement as HTMLElement;
    const s = getComputedStyle(el);
    return {
      tag: el.tagName.toLowerCase(),
      style: s.outlineStyle,
      widthPx: parseFloat(s.outlineWidth),
      visible: el.matches(':focus-visible'),
    };
  });

async function expectFocusRing(page: Page) {
  const ring = await focusRing(page);
  expect(ring.visible, ring.tag).toBe(true);
  expect(ring.style, ring.tag).not.toBe('none');
  expect(ring.widthPx, ring.tag).toBeGreaterThanOrEqual(2);
}

describe.skipIf(!hasChromium)('keyboard only: template to pack', () => {
  let session: BrowserSession;
  let server: RunningServer;
  let page: Page;
  let projectUrl = '';

  beforeAll(async () => {
    session = await openSession();
    ({ server, page } = session);
  }, 120_000);

  afterAll(() => session?.close());

  it('chooses a template under "New project" and creates the project with Tab, Space and Enter', async () => {
    await page.goto(server.url + '/');
    // Tab enters the template group at the chosen radio button; Space chooses it
    await tabTo(page, 'form[action="/projects"] input[name="template"]');
    await expectFocusRing(page);
    await page.keyboard.press('Space');
    const chosen = await page.evaluate(() => (document.activeElement as HTMLInputElement).value);
    expect(await page.locator(`input[name="template"][value="${chosen}"]`).isChecked()).toBe(true);
    expect(chosen).toBe('mains-two-rail');
    await tabTo(page, 'form[action="/projects"] input[name="name"]');
    await expectFocusRing(page);
    await page.keyboard.type('Keyboard-built rig');
    await tabTo(page, 'form[action="/projects"] button[type="submit"]');
    await expectFocusRing(page);
    await Promise.all([page.waitForURL(/\/projects\/prj[^/]*$/), page.keyboard.press('Enter')]);
    projectUrl = page.url();
    expect(await page.title()).toContain('Keyboard-built rig');
  });

  it('reaches a costed plan: a verdict and a cost per kit on the first screen', async () => {
    expect(await page.locator('[data-verdict]').getAttribute('data-verdict')).toMatch(/^(ok|caution|fail)$/);
    expect(await page.locator('#cost-glance').innerText()).toMatch(/\d[\d,.]* per kit/);
  });

  it('opens a stage and edits a field, saving with Enter', async () => {
    await tabTo(page, 'li.stage a.stage-name', { text: 'low-pass filter' });
    await expectFocusRing(page);
    await Promise.all([page.waitForURL(/\/stages\/[^/]+$/), page.keyboard.press('Enter')]);
    await page.waitForFunction(() => 'htmx' in window);
    // the filter's capacitor voltage rating: Tab selects the box's text, typing replaces it
    await tabTo(page, 'form[action$="/lpf"] input[name="capRatedV"]');
    await expectFocusRing(page);
    await page.keyboard.type('300');
    await tabTo(page, 'form[action$="/lpf"] button[type="submit"]');
    await expectFocusRing(page);
    await page.keyboard.press('Enter');
    await page.locator('#stage .notice').waitFor();
    expect(await page.locator('form[action$="/lpf"] ' +
      'input[name="capRatedV"]').inputValue()).toBe('300 V'); // shown back with its unit
  });

  it('follows a top-fix link: the target page opens with its input focused and in view', async () => {
    // back to the overview through the section tabs
    await tabTo(page, 'nav.tabs a.tab', { text: 'Stages & budget', back: true });
    await expectFocusRing(page);
    await Promise.all([page.waitForURL(/\/projects\/prj[^/]*$/), page.keyboard.press('Enter')]);
    const fixes = await page.locator('#top-fixes a.fix-link').count();
    expect(fixes).toBeGreaterThan(0); // the template's typical values leave at least one caution to fix
    await tabTo(page, '#top-fixes a.fix-link');
    await expectFocusRing(page);
    const href = (await page.evaluate(() => (document.activeElement as HTMLAnchorElement).getAttribute('href')))!;
    const anchor = href.split('#')[1];
    expect(anchor).toBeTruthy();
    await Promise.all([page.waitForURL((u) => u.hash === `#${anchor}`), page.keyboard.press('Enter')]);
    await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe(anchor);
    expect(await page.evaluate(() => document.activeElement!.tagName.toLowerCase())).toMatch(
      /^(input|select|textarea)$/,
    );
    const box = (await page.locator(`[id="${anchor}"]`).boundingBox())!;
    expect(box.y).toBeGreaterThanOrEqual(0);
    expect(box.y + box.height).toBeLessThanOrEqual(page.viewportSize()!.height);
    await page.screenshot({ path: artifactPath('keyboard-fix-target.png') });
  });

  it('opens and closes a collapsible section with Enter and Space; its header shows the state', async () => {
    await page.goto(projectUrl);
    const marker = () =>
      page.evaluate(() => getComputedStyle(document.querySelector('details#settings > summary')!, '::before').content);
    expect(await page.locator('details#settings').evaluate((d) => (d as HTMLDetailsElement).open)).toBe(false);
    expect(await marker()).toBe('"▸"');
    await tabTo(page, 'details#settings > summary');
    await expectFocusRing(page);
    await page.keyboard.press('Enter');
    await expect
      .poll(() => page.locator('details#settings').evaluate((d) => (d as HTMLDetailsElement).open))
      .toBe(true);
    expect(await marker()).toBe('"▾"');
    // the section's first box is next on Tab
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => (document.activeElement as HTMLInputElement).name)).toBe('name');
    await page.keyboard.press('Shift+Tab');
    await page.keyboard.press('Space');
    await expect
      .poll(() => page.locator('details#settings').evaluate((d) => (d as HTMLDetailsElement).open))
      .toBe(false);
  });

  it("downloads the builder's pack from the pack page", async () => {
    await tabTo(page, 'nav.tabs a.tab', { text: 'Builder pack', back: true });
    await expectFocusRing(page);
    await Promise.all([page.waitForURL(/\/pack$/), page.keyboard.press('Enter')]);
    await tabTo(page, 'a[download]', { text: 'Builder’s pack, A4' });
    await expectFocusRing(page);
    const [download] = await Promise.all([
      page.waitForEvent('download', { timeout: 60_000 }),
      page.keyboard.press('Enter'),
    ]);
    const file = join(session.downloads, download.suggestedFilename() || 'pack.pdf');
    await download.saveAs(file);
    expect(readFileSync(file).subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(download.suggestedFilename()).toMatch(/builder-a4\.pdf$/);
  });

  it('raised no script errors or policy violations on the way', () => {
    expect(session.problems).toEqual([]);
  });
});
