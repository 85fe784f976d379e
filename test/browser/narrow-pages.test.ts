// The first-screen pages at a phone's width (390 px) and at 1280×900 in Chromium: nothing is wider than the window
// (a wide chart or table scrolls inside its own box), with screenshots of each for a person to look at.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { hasChromium, openSession, artifactPath, CHROMIUM_PATH, type BrowserSession } from '../helpers/browser';

if (!hasChromium) console.warn(`Browser tests skipped: ${CHROMIUM_PATH} is missing (apt-get install chromium).`);

const PAGES: [string, string][] = [
  ['new-project', '/'],
  ['overview-club', '/projects/demo-club-30m'],
  ['overview-portable', '/projects/demo-portable-20m'],
  ['stage-pa', '/projects/demo-club-30m/stages/st-pa'],
  ['compare', '/compare?p1=demo-club-30m&p2=demo-portable-20m'],
  ['sweep', '/projects/demo-club-30m/sweep?param=reservoirF&target=rail-pa&from=3400&to=14000&points=6'],
];

/** Elements reaching past the window's right edge that are not inside a box meant to scroll sideways. */
const overflowing = (page: Page) =>
  page.evaluate(() =>
    [...document.querySelectorAll('body *')]
      .filter((e) => e.getBoundingClientRect().right > window.innerWidth + 1 && !e.closest('.scroll-x'))
      .filter((e) => ![...e.children].some((c) => c.getBoundingClientRect().right > window.innerWidth + 1))
      .slice(0, 5)
      .map(
        (e) =>
          `${e.tagName.toLowerCase()}${e.id ? '#' + e.id : ''}` +
            `${typeof e.className === 'string' && e.className ? '.' + e.className : ''}`,
      ),
  );

describe.skipIf(!hasChromium)('pages at phone and desktop width', () => {
  let session: BrowserSession;
  beforeAll(async () => {
    session = await openSession();
  }, 120_000);
  afterAll(() => session?.close());

  it.each(PAGES)('%s fits 390 px and 1280 px without sideways scrolling of the page', async (name, path) => {
    const { page, server } = session;
    for (const [w, h] of [[390, 844], [1280, 900]]) {
      await page.setViewportSize({ width: w, height: h });
      await page.goto(server.url + path);
      expect(await page.evaluate(() => document.documentElement.scrollWidth), `${name} at ${w} px`).toBeLessThanOrEqual(
        w,
      );
      expect(await overflowing(page), `${name} at ${w} px`).toEqual([]);
      await page.screenshot({ path: artifactPath(`${name}-${w}.png`), fullPage: w === 390 });
    }
    expect(session.problems).toEqual([]);
  });
});
