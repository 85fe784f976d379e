// Parts catalog through t.app.request(): parts, offers (price-break text), suppliers, costing settings;
// refused input kept and nothing saved, stale version, deletion of a part on the parts list refused. The text formats
// themselves (ratings, price breaks, rates, money) are tested with their specs in test/core/spec/parts.test.ts.
import { beforeEach, describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { loadProject } from '../../src/db/projects';
import type { Project } from '../../src/core/model';

const ID = 'demo-club-30m';
let t: Awaited<ReturnType<typeof demoApp>>;
beforeEach(async () => {
  t = await demoApp();
});

const stored = async (): Promise<Project> => (await loadProject(t.database.db, ID))!;

const post = (path: string, fields: Record<string, string>, htmx = false) =>
  t.post(path, fields, htmx ? { 'HX-Request': 'true' } : {});

describe('parts catalog page', () => {
  it('renders every part and supplier', async () => {
    const res = await t.app.request(`http://localhost/projects/${ID}/parts`);
    expect(res.status).toBe(200);
    const html = await res.text();
    const p = await stored();
    for (const part of p.parts) expect(html).toContain(part.description.replace(/&/g, '&amp;'));
    expect(html).toContain('Northfield Components');
    expect(html).toContain('1: 2.15, 10: 1.82, 50: 1.49');
  });

  it('takes a part’s ratings one box per rating of its category, and shows them back in their boxes', async () => {
    const v = (await stored()).version;
    // SI prefixes (BIPM SI Brochure 9th ed., Table 7): 4700 µF = 4.7e-3 F; the capacitor box is in µF
    const res = await post(`/projects/${ID}/parts`, {
      version: String(v),
      description: 'Electrolytic 4700 µF 50 V',
      category: 'capacitor',
      'r.capacitanceF': '4700',
      'r.voltageV': '50',
      'r.rippleA': '2400 mA',
      'r.dielectric': 'electrolytic',
      ratings: 'note=105 °C',
    });
    expect(res.status).toBe(303);
    const part = (await stored()).parts.at(-1)!;
    expect(part.ratings).toEqual({
      note: '105 °C',
      capacitanceF: 4.7e-3,
      voltageV: 50,
      rippleA: 2.4,
      dielectric: 'electrolytic',
    });
    const html = await (await t.app.request(`http://localhost/projects/${ID}/parts`)).text();
    expect(html).toContain(`name="r.capacitanceF" type="text" value="4700"`);
    expect(html).toContain('Rated voltage<span class="unit"> (V)</span>');
    // the category switch redraws the boxes of the new category, keeping a value typed in a box it shares
    const boxes = await (
      await t.app.request(`http://localhost/projects/${ID}/parts/rating-boxes?idp=ap&category=fuse&r.ratedA=1.6`)
    ).text();
    expect(boxes).toContain('Rated current<span class="unit"> (A)</span>');
    expect(boxes).toContain('value="1.6"');
    expect(boxes).not.toContain('r.capacitanceF');
  });

  it('a rating box both people changed is a conflict named by the rating, not its key', async () => {
    const v = (await stored()).version;
    const form = (voltage: string, version: number) => ({
      version: String(version),
      description: 'Electrolytic capacitor 4700 µF 35 V',
      category: 'capacitor',
      'r.capacitanceF': '4700',
      'r.voltageV': voltage,
      'r.rippleA': '',
      ratings: '',
    });
    const part = (await stored()).parts.find((p) => p.id === 'p-c4700')!;
    const start = {
      ...form('35', v),
      'r.rippleA': part.ratings.rippleA === undefined ? '' : String(part.ratings.rippleA),
    };
    expect((await post(`/projects/${ID}/parts/p-c4700`, { ...start, 'r.voltageV': '50' })).status).toBe(303);
    const res = await post(`/projects/${ID}/parts/p-c4700`, { ...start, 'r.voltageV': '63' }, true);
    expect(res.status).toBe(409);
    expect(await res.text()).toContain('Rated voltage: ');
  });

  it('adds a part, then an offer with price breaks', async () => {
    const v = (await stored()).version;
    const res = await post(`/projects/${ID}/parts`, {
      version: String(v),
      description: 'Zener diode 5.1 V 0.5 W',
      category: 'diode',
      ratings: 'voltageV=5.1, powerW=500m',
    });
    expect(res.status).toBe(303);
    const part = (await stored()).parts.at(-1)!;
    expect(part).toMatchObject({
      description: 'Zener diode 5.1 V 0.5 W',
      category: 'diode',
      ratings: { voltageV: 5.1, powerW: 0.5 },
      offers: [],
    });
    const o = await post(
      `/projects/${ID}/parts/${part.id}/offers`,
      {
        version: String(v + 1),
        supplier: 'Harbor Radio Surplus',
        sku: 'HR-Z51',
        currency: 'usd',
        breaks: '1: 0.12, 100: 0.04',
        minOrder: '10',
        orderMultiple: '10',
        stockNote: '',
      },
      true,
    );
    expect(o.status).toBe(200);
    const offer = (await stored()).parts.find((x) => x.id === part.id)!.offers[0];
    expect(offer).toMatchObject({
      supplier: 'Harbor Radio Surplus',
      sku: 'HR-Z51',
      currency: 'USD',
      breaks: [{ minQty: 1, unitPriceCents: 12 }, { minQty: 100, unitPriceCents: 4 }],
      minOrder: 10,
      orderMultiple: 10,
    });
  });

  it('keeps the typed price breaks beside the field and saves nothing when they are wrong', async () => {
    const before = await stored();
    const res = await post(
      `/projects/${ID}/parts/p-c4700/offers/o9`,
      {
        version: String(before.version),
        supplier: 'Northfield Components',
        sku: 'NC-E4735',
        currency: 'USD',
        breaks: '1: 2.15, ten: 1.82',
        minOrder: '1',
        orderMultiple: '1',
        stockNote: '',
      },
      true,
    );
    expect(res.status).toBe(422);
    const html = await res.text();
    expect(html).toContain('value="1: 2.15, ten: 1.82"');
    expect(html).toContain('is not &quot;quantity: unit price&quot;');
    expect(await stored()).toEqual(before);
  });

  it('saves costing settings and refuses a rate for the project currency', async () => {
    const p = await stored();
    const ok = await post(
      `/projects/${ID}/costing`,
      { version: String(p.version), attrition: '10', spares: '1', rates: 'EUR = 1.10\nGBP = 1.27' },
      true,
    );
    expect(ok.status).toBe(200);
    const after = await stored();
    expect(after.costing).toMatchObject({
      attritionFraction: 0.1,
      sparesPerLine: 1,
      exchangeRates: { EUR: 1.1, GBP: 1.27 },
    });
    const bad = await post(
      `/projects/${ID}/costing`,
      { version: String(after.version), attrition: '10', spares: '1', rates: 'USD = 1' },
      true,
    );
    expect(bad.status).toBe(422);
    expect(await bad.text()).toContain('USD is the project currency');
    expect(await stored()).toEqual(after);
  });

  it('renames a supplier and its offers together', async () => {
    const p = await stored();
    const res = await post(`/projects/${ID}/suppliers/1`, {
      version: String(p.version),
      was: 'Harbor Radio Surplus',
      name: 'Harbour Radio Surplus',
      shipping: '6.50',
      currency: 'USD',
    });
    expect(res.status).toBe(303);
    const after = await stored();
    expect(after.costing.suppliers[1]).toEqual({ name: 'Harbour Radio Surplus', shippingCents: 650, currency: 'USD' });
    expect(after.parts.flatMap((x) => x.offers).filter((o) => o.supplier === 'Harbor Radio Surplus')).toHaveLength(0);
    expect(
      after.parts.flatMap((x) => x.offers).filter((o) => o.supplier === 'Harbour Radio Surplus').length,
    ).toBeGreaterThan(0);
  });

  it('refuses a stale version with 409', async () => {
    const before = await stored();
    await post(`/projects/${ID}/parts/p-pcb`, {
      version: String(before.version),
      description: 'PCB rev C',
      category: 'pcb',
      ratings: '',
    });
    const res = await post(
      `/projects/${ID}/parts/p-pcb`,
      { version: String(before.version), description: 'PCB rev D', category: 'pcb', ratings: '' },
      true,
    );
    expect(res.status).toBe(409);
    expect(await res.text()).toContain('value="PCB rev D"');
    expect((await stored()).parts.find((x) => x.id === 'p-pcb')!.description).toBe('PCB rev C');
  });

  it('refuses to delete a part on the parts list, naming the lines', async () => {
    const before = await stored();
    const confirm = await (await t.app.request(`http://localhost/projects/${ID}/parts/p-fuse/delete`)).text();
    expect(confirm).toContain('parts-list line “F1–F4” in General, 4 per rig');
    expect(confirm).not.toContain('Yes, delete');
    const res = await post(`/projects/${ID}/parts/p-fuse/delete`, { version: String(before.version) });
    expect(res.status).toBe(422);
    expect(await res.text()).toContain('cannot be deleted while it is in use');
    expect(await stored()).toEqual(before);
  });

  it('deletes an offer and an unused part after the confirm page', async () => {
    const p = await stored();
    expect(
      await (await t.app.request(`http://localhost/projects/${ID}/parts/p-trafo/offers/o2/delete`)).text(),
    ).toContain('Yes, delete');
    let res = await post(`/projects/${ID}/parts/p-trafo/offers/o2/delete`, { version: String(p.version) });
    expect(res.status).toBe(303);
    expect((await stored()).parts.find((x) => x.id === 'p-trafo')!.offers.map((o) => o.id)).toEqual(['o1']);
    res = await post(`/projects/${ID}/parts`, {
      version: String(p.version + 1),
      description: 'Spare knob',
      category: 'hardware',
      ratings: '',
    });
    const added = (await stored()).parts.at(-1)!;
    res = await post(`/projects/${ID}/parts/${added.id}/delete`, { version: String(p.version + 2) });
    expect(res.status).toBe(303);
    expect((await stored()).parts.some((x) => x.id === added.id)).toBe(false);
  });
});

describe('bad values are refused with the field named, kept as typed, nothing saved', () => {
  const refused = async (path: string, fields: Record<string, string>, says: string, kept: string) => {
    const before = await stored();
    for (const htmx of [false, true]) {
      const res = await post(path, { version: String(before.version), ...fields }, htmx);
      expect(res.status).toBe(422);
      const html = await res.text();
      expect(html).toContain(says);
      expect(html).toContain(`value="${kept}"`);
    }
    expect(await stored()).toEqual(before);
  };

  it('a shipping charge with a part of a cent', () =>
    refused(
      `/projects/${ID}/suppliers/0`,
      { name: 'Northfield Components', shipping: '8.505', currency: 'USD' },
      'Shipping per order &quot;8.505&quot; has more than two decimals',
      '8.505',
    ));

  it('a currency that is not a three-letter code', () =>
    refused(
      `/projects/${ID}/parts/p-c4700/offers/o9`,
      {
        supplier: 'Northfield Components',
        sku: 'NC-E4735',
        currency: 'US1',
        breaks: '1: 2.15',
        minOrder: '1',
        orderMultiple: '1',
        stockNote: '',
      },
      'Currency must be a three-letter code',
      'US1',
    ));

  it('ratings that are neither a rating name with its value nor key=value', () =>
    refused(
      `/projects/${ID}/parts/p-pcb`,
      { description: 'PCB', category: 'pcb', ratings: 'layers 2' },
      'Ratings: &quot;layers 2&quot; is not a rating',
      'layers 2',
    ));

  it('a rating box out of its range names the rating and keeps every box as typed', async () => {
    // a capacitor's rated voltage must be above 0 V (parts-categories.ts; common practice, no source)
    const fields = {
      description: 'Electrolytic 4700 µF',
      category: 'capacitor',
      'r.capacitanceF': '4700',
      'r.voltageV': '-35',
      'r.rippleA': '2.4',
      ratings: '',
    };
    await refused(`/projects/${ID}/parts/p-c4700`, fields, 'Rated voltage must be more than 0 V', '-35');
    const res = await post(
      `/projects/${ID}/parts/p-c4700`,
      { version: String((await stored()).version), ...fields },
      true,
    );
    expect(await res.text()).toContain('value="4700"');
  });

  it('spares above the one limit (1000)', async () => {
    const p = await stored();
    await refused(
      `/projects/${ID}/costing`,
      { attrition: '5', spares: '1001', rates: 'EUR = 1.08' },
      'Spares per line must be at least 0 and at most 1000',
      '1001',
    );
    expect(p.costing.sparesPerLine).toBe(0);
  });
});

describe('an offer without price breaks', () => {
  it('is saved as not priced yet (as a CSV import makes it)', async () => {
    const p = await stored();
    const res = await post(`/projects/${ID}/parts/p-pcb/offers`, {
      version: String(p.version),
      supplier: 'Harbor Radio Surplus',
      sku: '',
      currency: 'USD',
      breaks: '',
      minOrder: '1',
      orderMultiple: '1',
      stockNote: 'ask',
    });
    expect(res.status).toBe(303);
    expect((await stored()).parts.find((x) => x.id === 'p-pcb')!.offers.at(-1)).toMatchObject({
      supplier: 'Harbor Radio Surplus',
      breaks: [],
      stockNote: 'ask',
    });
    expect(await (await t.app.request(`http://localhost/projects/${ID}/parts`)).text()).toContain('without prices');
  });
});
