// The core catalog in a real browser (htmx on): a core added with AL in µH per 100 turns and Ae in mm² appears with
// the values as the boxes read them; a bad area is refused at its box with the typed text kept; the filter form then
// offers the new core.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { hasChromium, openSession, artifactPath, CHROMIUM_PATH } from '../helpers/browser';
import type { BrowserSession } from '../helpers/browser';

if (!hasChromium) console.warn(`Browser tests skipped: ${CHROMIUM_PATH} is missing (apt-get install chromium).`);

const DEMO = '/projects/demo-club-30m';

describe.skipIf(!hasChromium)('core catalog in the browser', () => {
  let session: BrowserSession;
  let page: Page;
  beforeAll(async () => {
    session = await openSession();
    page = session.page;
  }, 120_000);
  afterAll(async () => session?.close());

  const open = async (path: string) => {
    await page.goto(`${session.server.url}${DEMO}${path}`);
    await page.waitForFunction(() => 'htmx' in window);
  };
  const addForm = () => page.locator(`form[action="${DEMO}/cores"]`);

  it('a bad area is refused at its box, the typed text kept; a good core is added and offered on the filter ' +
    'form', async () => {
    await open('/cores');
    const f = addForm();
    await f.locator('input[name="name"]').fill('Ferrite toroid 25 mm, 1–10 MHz material');
    await f.locator('input[name="al"]').fill('49 µH/100t');
    await f.locator('input[name="ae"]').fill('lots');
    await f.locator('input[name="le"]').fill('60');
    await f.locator('input[name="innerDiameter"]').fill('14');
    await f.locator('input[name="fmin"]').fill('1');
    await f.locator('input[name="fmax"]').fill('10');
    await f.locator('input[name="bmax"]').fill('20');
    await f.getByRole('button', { name: 'Add core' }).click();
    const error = addForm().locator('label[for="core--nc--aeM2"] .error');
    await error.waitFor();
    expect(await error.innerText()).toContain('Effective area Ae');
    expect(await addForm().locator('input[name="ae"]').inputValue()).toBe('lots');
    await page.screenshot({ path: artifactPath('cores-refused.png'), fullPage: true });

    await addForm().locator('input[name="ae"]').fill('24.7 mm²');
    await addForm().getByRole('button', { name: 'Add core' }).click();
    const card = page.locator('section[aria-label="Ferrite toroid 25 mm, 1–10 MHz material"]');
    await card.waitFor();
    // 49 µH/100t = 4.9 nH/t² (1 µH per 100 turns² = 0.1 nH/t²); 24.7 mm² shown in the mm² box as 24.7
    expect(await card.locator('input[name="al"]').inputValue()).toBe('4.9');
    expect(await card.locator('input[name="ae"]').inputValue()).toBe('24.7');
    await page.screenshot({ path: artifactPath('cores-added.png'), fullPage: true });

    await open('/stages/st-lpf');
    const options = await page.locator('select[name="catalogCore"] option').allInnerTexts();
    expect(options).toContain('Ferrite toroid 25 mm, 1–10 MHz material');
  });
});
