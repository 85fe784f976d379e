// The supplier price-list import through the routes: preview saves nothing, a refused cell names its row and column
// and blocks the import, and an updated list changes the matched offers in place. Expected prices are read by hand
// from the CSV text below and the club demo's catalog (seed-demo/club-30m.ts: o9 NC-E4735 at 2.15 / 1.82 / 1.49 USD).
import { beforeEach, describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { loadProject } from '../../src/db/projects';
import type { Project } from '../../src/core/model';

const ID = 'demo-club-30m';
const base = `/projects/${ID}/parts`;
let t: Awaited<ReturnType<typeof demoApp>>;
beforeEach(async () => {
  t = await demoApp();
});
const stored = async (): Promise<Project> => (await loadProject(t.database.db, ID))!;

// Northfield's updated list: the 4700 µF capacitor dearer from 1 piece (2.15 -> 2.25), cheaper from 50 (1.49 -> 1.39)
// -> "up and down"; the bleeder resistor cheaper from 100 (0.09 -> 0.08); a new 1 A fuse. Every other Northfield
// offer is missing from this file, so those are "gone from the list".
const UPDATED = [
  'Description,Category,Ratings,SKU,Price breaks,Min order,Multiple',
  'Electrolytic capacitor 4700 µF 35 V,capacitor,capacitanceF=4700u; voltageV=35,NC-E4735,"1: 2.25, 10: 1.82, 50: ' +
    '1.39",1,1',
  'Resistor 2.2 kΩ 1 W metal film (bleeder),resistor,,NC-R1W-2K2,"1: 0.18, 100: 0.08",1,1',
  'Fuse 5 × 20 mm 1 A T,fuse,ratedA=1; type=T,NC-F520-T1,"1: 0.40",10,10',
].join('\r\n');

function upload(fields: Record<string, string>, csv: string) {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  form.set('file', new File([csv], 'northfield.csv', { type: 'text/csv' }));
  return t.app.request(`http://localhost${base}/import`, {
    method: 'POST',
    headers: { Origin: 'http://localhost' },
    body: form,
  });
}

describe('supplier price-list import', () => {
  it('the parts catalog page offers the import', async () => {
    const html = await (await t.get(base)).text();
    expect(html).toContain(`action="${base}/import"`);
  });

  it('the preview lists the changes and saves nothing', async () => {
    const before = await stored();
    const res = await upload({ version: String(before.version), supplier: 'Northfield Components' }, UPDATED);
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toMatch(/data-change="mixed" data-sku="NC-E4735"/);
    expect(html).toMatch(/data-change="down" data-sku="NC-R1W-2K2"/);
    expect(html).toMatch(/data-change="new-part" data-sku="NC-F520-T1"/);
    expect(html).toMatch(/data-change="gone" data-sku="NC-TR-7016"/);
    // ratings shown by name and unit (4700u = 4700 µF, SI Brochure Table 7), with a note on the older key=value form
    expect(html).toContain('<td data-label="Ratings">Capacitance 4700 µF; rated voltage 35 V</td>');
    expect(html).toContain('<td data-label="Ratings">Rated current 1 A; characteristic T</td>');
    expect(html).toContain(
      'written as key=value (the older form), read as &quot;Rated current 1 A; characteristic T&quot;',
    );
    expect((await stored()).version).toBe(before.version);
  });

  it('a bad cell is named by row and column and nothing is saved', async () => {
    const before = await stored();
    const bad = UPDATED.replace('"1: 0.40",10,10', '"1: 0.40",10,ten');
    const res = await t.post(`${base}/import`, {
      version: String(before.version),
      supplier: 'Northfield Components',
      csv: bad,
      action: 'import',
    });
    expect(res.status).toBe(422);
    const html = await res.text();
    expect(html).toContain('Nothing was imported: 1 row(s) are refused');
    expect(html).toContain('<td data-label="Row">4</td>');
    expect(html).toContain('Multiple: &quot;ten&quot; is not a number of pieces');
    // a rating in names and units out of its range is named with its row, and nothing is saved
    const badRating = UPDATED.replace('ratedA=1; type=T', 'rated current 0 A; characteristic T');
    const r2 = await t.post(`${base}/import`, {
      version: String(before.version),
      supplier: 'Northfield Components',
      csv: badRating,
      action: 'import',
    });
    expect(r2.status).toBe(422);
    expect(await r2.text()).toContain('Rated current must be more than 0 A');
    expect(await stored()).toEqual(before);
  });

  it('importing the updated list changes the matched offers in place, adds the new part, keeps gone offers unless ' +
    'asked', async () => {
    const before = await stored();
    const fields = {
      version: String(before.version),
      supplier: 'Northfield Components',
      csv: UPDATED,
      action: 'import',
    };
    const res = await t.post(`${base}/import`, fields);
    expect(res.status).toBe(303);
    const after = await stored();
    const o9 = after.parts.find((p) => p.id === 'p-c4700')!.offers.find((o) => o.id === 'o9')!;
    expect(o9.breaks).toEqual([
      { minQty: 1, unitPriceCents: 225 },
      { minQty: 10, unitPriceCents: 182 },
      { minQty: 50, unitPriceCents: 139 },
    ]);
    const fuse = after.parts.find((p) => p.description === 'Fuse 5 × 20 mm 1 A T')!;
    expect(fuse).toMatchObject({ category: 'fuse', ratings: { ratedA: 1, type: 'T' } });
    expect(fuse.offers[0]).toMatchObject({
      supplier: 'Northfield Components',
      minOrder: 10,
      orderMultiple: 10,
      currency: 'USD',
    });
    // gone offers kept (the box was not ticked): the transformer's Northfield offer is still there
    expect(after.parts.find((p) => p.id === 'p-trafo')!.offers.map((o) => o.id)).toEqual(['o1', 'o2']);
    const page = await (await t.get(res.headers.get('location')!)).text();
    expect(page).toContain('Price list imported: 2 offer(s) changed, 1 new part(s)');

    // the same list again with "remove the offers gone": the Northfield transformer offer goes, Copperleaf's stays
    const again = await t.post(`${base}/import`, { ...fields, version: String(after.version), removeGone: 'true' });
    expect(again.status).toBe(303);
    const last = await stored();
    expect(last.parts.find((p) => p.id === 'p-trafo')!.offers.map((o) => o.id)).toEqual(['o2']);
    expect(
      last.parts.find((p) => p.id === 'p-c4700')!.offers.find((o) => o.id === 'o9')!.breaks[0].unitPriceCents,
    ).toBe(225);
  });

  it('a stale version is refused with the preview redone against the stored catalog', async () => {
    const first = await stored();
    const fields = {
      version: String(first.version),
      supplier: 'Northfield Components',
      csv: UPDATED,
      action: 'import',
    };
    expect((await t.post(`${base}/import`, fields)).status).toBe(303);
    const before = await stored();
    // the same form again, made from the version before the import: refused, nothing saved
    const res = await t.post(`${base}/import`, { ...fields, removeGone: 'true' });
    expect(res.status).toBe(409);
    expect(await res.text()).toContain('Not imported: this project was changed');
    expect(await stored()).toEqual(before);
  });
});
