// Inputs as a builder meets them in a real browser (htmx on): a bare number is read in the unit shown beside the
// box, a unit slip is answered with "did you mean", currents typed in the add-a-load row without a rail are refused
// on that row, and two tabs editing different fields of one project both land while the same field conflicts.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { hasChromium, openSession, artifactPath, CHROMIUM_PATH } from '../helpers/browser';
import type { BrowserSession } from '../helpers/browser';

if (!hasChromium) console.warn(`Browser tests skipped: ${CHROMIUM_PATH} is missing (apt-get install chromium).`);

const DEMO = '/projects/demo-club-30m';

describe.skipIf(!hasChromium)('typing inputs in the browser', () => {
  let session: BrowserSession;
  let page: Page;

  beforeAll(async () => {
    session = await openSession();
    page = session.page;
  }, 120_000);
  afterAll(async () => session?.close());

  const open = async (path: string, p = page) => {
    await p.goto(`${session.server.url}${DEMO}${path}`);
    await p.waitForFunction(() => 'htmx' in window);
  };
  const relayForm = (p = page) => p.locator(`form[action="${DEMO}/stages/st-tr/relay"]`);

  it('"45" in the coil current box (mA) is saved as 45 mA and shown back as 45', async () => {
    await open('/stages/st-tr');
    await expect(relayForm().locator('label[for="relay--s-st-tr--coilA"] .unit').innerText()).resolves.toBe(' (mA)');
    await relayForm().locator('input[name="coil"]').fill('45');
    await relayForm().getByRole('button', { name: 'Save relay data' }).click();
    await page.locator('#stage .notice').waitFor();
    expect(await relayForm().locator('input[name="coil"]').inputValue()).toBe('45');
    // the budget counts the computed coil load in mA: 45 mA on the 13.8 V rail in key-up
    await open('');
    expect(await page.locator('#budget').innerText()).toContain('45 mA');
  });

  it('a value in the wrong unit is refused with "did you mean", the typed text kept and nothing saved', async () => {
    await open('/stages/st-tr');
    // 45000 mA = 45 A is above the 10 A most a relay coil is allowed
    await relayForm().locator('input[name="coil"]').fill('45000');
    await relayForm().getByRole('button', { name: 'Save relay data' }).click();
    const error = relayForm().locator('label[for="relay--s-st-tr--coilA"] .error');
    await error.waitFor();
    expect(await error.innerText()).toContain('Coil current must be at least 0 A and at most 10 A');
    expect(await error.innerText()).toContain('did you mean 45000 µA?');
    expect(await relayForm().locator('input[name="coil"]').inputValue()).toBe('45000');
    await page.screenshot({ path: artifactPath('input-did-you-mean.png'), fullPage: true });
    await open('/stages/st-tr');
    expect(await relayForm().locator('input[name="coil"]').inputValue()).toBe('45');
  });

  it('currents typed in the add-a-load row without a rail are refused on that row', async () => {
    await open('/stages/st-rx');
    const form = page.locator(`form[action="${DEMO}/stages/st-rx"]`);
    await form.locator('input[name="l1_keyDown"]').fill('120');
    await form.getByRole('button', { name: 'Save stage' }).click();
    const error = form.locator('label[for="f-rail1"] .error');
    await error.waitFor();
    expect(await error.innerText()).toContain('choose the rail');
    expect(await form.locator('input[name="l1_keyDown"]').inputValue()).toBe('120');
  });

  it('two tabs: different fields both land; the same field is a conflict showing both values', async () => {
    const second = await page.context().newPage();
    await open('/stages/st-tr');
    await open('/stages/st-tr', second);
    // tab 1 changes the isolation, tab 2 (opened on the same version) the operate time: both apply
    await relayForm().locator('input[name="isolation"]').fill('40');
    await relayForm().getByRole('button', { name: 'Save relay data' }).click();
    await page.locator('#stage .notice').waitFor();
    await relayForm(second).locator('input[name="operate"]').fill('7');
    await relayForm(second).getByRole('button', { name: 'Save relay data' }).click();
    await second.locator('#stage .notice').waitFor();
    await open('/stages/st-tr', second);
    expect(await relayForm(second).locator('input[name="isolation"]').inputValue()).toBe('40');
    expect(await relayForm(second).locator('input[name="operate"]').inputValue()).toBe('7');

    // now both change the isolation from 40 dB: the later save is refused with both values, its text kept
    await open('/stages/st-tr');
    await relayForm().locator('input[name="isolation"]').fill('45');
    await relayForm(second).locator('input[name="isolation"]').fill('50');
    await relayForm().getByRole('button', { name: 'Save relay data' }).click();
    await page.locator('#stage .notice').waitFor();
    await relayForm(second).getByRole('button', { name: 'Save relay data' }).click();
    await relayForm(second).locator('.form-errors').waitFor();
    const body = await relayForm(second).innerText();
    expect(body).toContain('45');
    expect(await relayForm(second).locator('input[name="isolation"]').inputValue()).toBe('50');
    await second.screenshot({ path: artifactPath('input-conflict.png'), fullPage: true });
    await second.close();
    expect(session.problems).toEqual([]);
  });
});
