// The club demo in a real browser: with the PA's turns ratio designed for the target, raising the target power moves
// the transformer requirement on the parts list, flags the bound 100 VA transformer (its 20 V winding is rated 3.5 A),
// and binding the candidate it offers changes the cost. No expected number comes from this program: the test checks
// that the requirement text changes, the state goes from ok to fail and back, and the total differs.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { hasChromium, openSession, artifactPath, CHROMIUM_PATH, type BrowserSession } from '../helpers/browser';
import type { RunningServer } from '../helpers/server';

if (!hasChromium) console.warn(`Browser tests skipped: ${CHROMIUM_PATH} is missing (apt-get install chromium).`);

const DEMO = '/projects/demo-club-30m';
const ROLE = '[data-role="transformer:tr-main"]';

describe.skipIf(!hasChromium)('design roles follow the design in the browser', () => {
  let session: BrowserSession;
  let server: RunningServer;
  let page: Page;

  beforeAll(async () => {
    session = await openSession();
    ({ server, page } = session);
  }, 120_000);
  afterAll(() => session?.close());

  const total = () => page.locator('#cost-results .summary-line strong').first().innerText();
  const state = () => page.locator(ROLE).getAttribute('data-state');
  const requirement = () => page.locator(`${ROLE} .role-requirement`).innerText();

  /** Submit the form holding `field` on `path` with the value typed, and wait until the save is answered. */
  async function saveField(path: string, field: string, value: string) {
    await page.goto(server.url + DEMO + path);
    await page.waitForFunction(() => 'htmx' in window);
    const form = page.locator(`form:has(input[name="${field}"])`).first();
    // a form folded in a <details> (the project settings) is opened first, as a user would
    await form.evaluate((f) => f.closest('details')?.setAttribute('open', ''));
    await form.locator(`input[name="${field}"]`).fill(value);
    await Promise.all([
      page.waitForResponse((r) => r.request().method() === 'POST'),
      form.locator('button[type="submit"]').first().click(),
    ]);
  }

  it('raising the target power flags the bound transformer; binding the candidate changes the cost', async () => {
    await page.goto(server.url + DEMO + '/bom');
    expect(await state()).toBe('ok');
    const totalBefore = await total();
    // the PA's turns ratio designed for the target (empty box), then 40 W instead of 20 W
    await saveField('/stages/st-pa', 'turnsRatio', '');
    await page.goto(server.url + DEMO + '/bom');
    const reqAt20 = await requirement();
    await saveField('', 'power', '40 W');
    await page.goto(server.url + DEMO + '/bom');
    expect(await state()).toBe('fail');
    expect(await requirement()).not.toBe(reqAt20);
    await page.screenshot({ path: artifactPath('bom-roles-flagged.png'), fullPage: true });
    // the larger transformer is offered; using it clears the flag and the cost follows
    const use = page.locator(`${ROLE} [data-candidate="p-trafo-160"] button`);
    await Promise.all([page.waitForResponse((r) => r.url().endsWith('/bom/roles/bind')), use.click()]);
    await expect.poll(state).toBe('ok');
    expect(await total()).not.toBe(totalBefore);
    expect(session.problems).toEqual([]);
  }, 120_000);
});
