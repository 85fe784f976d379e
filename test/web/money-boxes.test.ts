// Money boxes on the parts catalog page take their decimals from the currency's ISO 4217 minor unit (JPY 0, USD 2,
// KWD 3; ISO 4217:2015 list one, KWD from memory, not confirmed): a JPY price reads "150", never "150.00", and a KWD
// price keeps three decimals. Amounts are typed by hand in this file.
import { beforeEach, describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { loadProject } from '../../src/db/projects';

const ID = 'demo-club-30m';
let t: Awaited<ReturnType<typeof demoApp>>;
beforeEach(async () => {
  t = await demoApp();
});
const stored = async () => (await loadProject(t.database.db, ID))!;
const offerPath = `/projects/${ID}/parts/p-c4700/offers/o9`;
const offerFields = (currency: string, breaks: string) => ({
  supplier: 'Northfield Components',
  sku: 'NC-E4735',
  currency,
  breaks,
  minOrder: '1',
  orderMultiple: '1',
  stockNote: '',
});

describe('money boxes in the currency’s minor unit', () => {
  it('a JPY offer and shipping show whole yen', async () => {
    let p = await stored();
    expect(
      (await t.post(offerPath, { version: String(p.version), ...offerFields('JPY', '1: 150, 10: 120') })).status,
    ).toBe(303);
    p = await stored();
    expect(p.parts.find((x) => x.id === 'p-c4700')!.offers.find((o) => o.id === 'o9')!.breaks).toEqual([
      { minQty: 1, unitPriceCents: 150 },
      { minQty: 10, unitPriceCents: 120 },
    ]);
    expect(
      (
        await t.post(`/projects/${ID}/suppliers/0`, {
          version: String(p.version),
          name: p.costing.suppliers[0].name,
          shipping: '800',
          currency: 'JPY',
        })
      ).status,
    ).toBe(303);
    const html = await (await t.get(`/projects/${ID}/parts?open=p-c4700`)).text();
    expect(html).toContain('value="1: 150, 10: 120"');
    expect(html).toContain('value="800"');
    expect(html).not.toContain('value="1: 150.00');
    expect(html).not.toContain('value="800.00"');
  });

  it('a KWD offer keeps three decimals; a yen fraction is refused naming the field, nothing saved', async () => {
    let p = await stored();
    expect(
      (await t.post(offerPath, { version: String(p.version), ...offerFields('KWD', '1: 0.125, 10: 0.100') })).status,
    ).toBe(303);
    p = await stored();
    expect(p.parts.find((x) => x.id === 'p-c4700')!.offers.find((o) => o.id === 'o9')!.breaks).toEqual([
      { minQty: 1, unitPriceCents: 125 },
      { minQty: 10, unitPriceCents: 100 },
    ]);
    expect(await (await t.get(`/projects/${ID}/parts?open=p-c4700`)).text()).toContain('value="1: 0.125, 10: 0.100"');
    const res = await t.post(offerPath, { version: String(p.version), ...offerFields('JPY', '1: 150.5') });
    expect(res.status).toBe(422);
    expect(await res.text()).toContain('Price breaks: 1: &quot;150.5&quot; has decimals; this currency has none');
    expect(await stored()).toEqual(p);
  });
});
