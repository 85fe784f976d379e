// Parts list & cost page through t.app.request(): lines add/edit/delete, refused input kept and nothing saved,
// stale version, CSV export, and the CSV import (preview, all-or-nothing, good rows only).
import { beforeEach, describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { loadProject } from '../../src/db/projects';
import type { Project } from '../../src/core/model';
import { costProject } from '../../src/core/cost';
import { formatMoney } from '../../src/core/cost/money';

const ID = 'demo-club-30m';
let t: Awaited<ReturnType<typeof demoApp>>;
beforeEach(async () => {
  t = await demoApp();
});

const stored = async (): Promise<Project> => (await loadProject(t.database.db, ID))!;
const base = `/projects/${ID}/bom`;

const post = (path: string, fields: Record<string, string>, htmx = false) =>
  t.post(path, fields, htmx ? { 'HX-Request': 'true' } : {});

function upload(fields: Record<string, string>, csv: string, name = 'list.csv') {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  form.set('file', new File([csv], name, { type: 'text/csv' }));
  return t.app.request(`http://localhost${base}/import`, {
    method: 'POST',
    headers: { Origin: 'http://localhost' },
    body: form,
  });
}

describe('parts list lines', () => {
  it('renders the lines and the costing computed by costProject', async () => {
    const res = await t.app.request(`http://localhost${base}`);
    expect(res.status).toBe(200);
    const html = await res.text();
    const p = await stored();
    expect(html).toContain(`Parts list (${p.bom.length} lines)`);
    // the build total shown is the one costProject computes for the stored project
    expect(html).toContain(formatMoney(costProject(p).totals.buildCents, p.currency));
  });

  it('adds a line and edits it; the cost follows', async () => {
    const p = await stored();
    const res = await post(
      `${base}/lines`,
      {
        version: String(p.version),
        stageId: 'st-drv',
        partId: 'p-bleed',
        qty: '3',
        refs: 'R20–R22',
        notes: 'driver bias',
      },
      true,
    );
    expect(res.status).toBe(200);
    const line = (await stored()).bom.at(-1)!;
    expect(line).toMatchObject({
      stageId: 'st-drv',
      partId: 'p-bleed',
      qtyPerRig: 3,
      refs: 'R20–R22',
      notes: 'driver bias',
    });
    const edit = await post(`${base}/lines/${line.id}`, {
      version: String(p.version + 1),
      stageId: '',
      partId: 'p-bleed',
      qty: '4',
      refs: 'R20–R23',
      notes: '',
    });
    expect(edit.status).toBe(303);
    const after = await stored();
    expect(after.bom.find((l) => l.id === line.id)).toMatchObject({ stageId: null, qtyPerRig: 4, refs: 'R20–R23' });
    expect(await (await t.app.request(`http://localhost${base}`)).text()).toContain(
      formatMoney(costProject(after).totals.buildCents, after.currency),
    );
  });

  it('keeps the typed quantity and saves nothing when it is not a number', async () => {
    const before = await stored();
    const res = await post(
      `${base}/lines/b6`,
      { version: String(before.version), stageId: '', partId: 'p-bridge', qty: 'two', refs: 'BR1, BR2', notes: '' },
      true,
    );
    expect(res.status).toBe(422);
    const html = await res.text();
    expect(html).toContain('value="two"');
    expect(html).toContain('Quantity per rig &quot;two&quot; is not understood');
    expect(await stored()).toEqual(before);
  });

  it('refuses a quantity of 0 or above 100 000 per rig, naming the field; nothing saved', async () => {
    const before = await stored();
    for (const qty of ['0', '200000']) {
      const res = await post(
        `${base}/lines/b6`,
        { version: String(before.version), stageId: '', partId: 'p-bridge', qty, refs: 'BR1, BR2', notes: '' },
        true,
      );
      expect(res.status).toBe(422);
      const html = await res.text();
      expect(html).toContain('Quantity per rig must be more than 0 and at most 100000');
      expect(html).toContain(`value="${qty}"`);
    }
    expect(await stored()).toEqual(before);
  });

  it('refuses a line for a part that is not in the catalog', async () => {
    const before = await stored();
    const res = await post(
      `${base}/lines`,
      { version: String(before.version), stageId: '', partId: 'p-nothing', qty: '1', refs: '', notes: '' },
      true,
    );
    expect(res.status).toBe(422);
    expect(await res.text()).toContain('that part is not in the catalog');
    expect(await stored()).toEqual(before);
  });

  it('refuses a stale version with 409', async () => {
    const before = await stored();
    await post(`${base}/lines/b7`, {
      version: String(before.version),
      stageId: '',
      partId: 'p-c4700',
      qty: '2',
      refs: 'C1, C1a',
      notes: '',
    });
    const res = await post(
      `${base}/lines/b7`,
      { version: String(before.version), stageId: '', partId: 'p-c4700', qty: '5', refs: 'C1', notes: '' },
      true,
    );
    expect(res.status).toBe(409);
    expect((await stored()).bom.find((l) => l.id === 'b7')!.qtyPerRig).toBe(2);
  });

  it('deletes a line after the confirm page; the part stays in the catalog', async () => {
    const p = await stored();
    const confirm = await (await t.app.request(`http://localhost${base}/lines/b26/delete`)).text();
    expect(confirm).toContain('Yes, delete');
    const res = await post(`${base}/lines/b26/delete`, { version: String(p.version) });
    expect(res.status).toBe(303);
    const after = await stored();
    expect(after.bom.some((l) => l.id === 'b26')).toBe(false);
    expect(after.parts.some((x) => x.id === 'p-case')).toBe(true);
  });
});

describe('CSV export and import', () => {
  it('exports the costed parts list as CSV with the header the importer recognises', async () => {
    const res = await t.app.request(`http://localhost/projects/${ID}/bom.csv`);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toContain('text/csv');
    const text = await res.text();
    const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/);
    expect(lines[0].startsWith('Stage,Section,Refs,Value,Description')).toBe(true);
    // one BR line, one chosen supplier
    expect(lines.filter((l) => l.includes('NC-BR4-200') || l.includes('HR-1144'))).toHaveLength(1);
  });

  it('downloads the order sheets per supplier as CSV, each supplier closed by its totals, agreeing with the ' +
    'plan', async () => {
    const res = await t.app.request(`http://localhost/projects/${ID}/orders.csv`);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-disposition')).toContain('-orders.csv');
    const text = (await res.text()).replace(/^\uFEFF/, '');
    const report = costProject(await stored());
    expect(text.split(/\r?\n/)[0]).toBe(
      'Supplier,SKU,Description,Refs,Order qty,Needed qty,Break from,Currency,Unit price,Offer line cost,Line cost USD',
    );
    for (const s of report.suppliers) expect(text).toContain(`${s.supplier},,Total order`);
    expect(text).toContain(`Total build (${report.kits} kits),,,,,,,,${report.totals.buildCents / 100}`);
    expect((await t.app.request(`http://localhost/projects/${ID}/orders.csv?sep=tab`)).status).toBe(400);
  });

  const CSV = [
    'Refs,Description,Category,Qty,Supplier,SKU,Unit price',
    'R30,Resistor 10 kΩ 0.25 W,resistor,1,Northfield Components,NC-R-10K,0.05',
    'C30,Capacitor 100 nF 50 V,capacitor,lots,Northfield Components,NC-C-100N,0.08',
    'D30,Signal diode 100 V,diode,2,Harbor Radio Surplus,HR-D100,0.04',
  ].join('\n');

  it('previews the rows with per-row errors and saves nothing', async () => {
    const before = await stored();
    const res = await upload({ version: String(before.version), stageId: 'st-drv' }, CSV);
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain('3 data row(s)');
    expect(html).toContain('<strong>2 good</strong>');
    expect(html).toContain('&quot;lots&quot; is not a quantity');
    expect(await stored()).toEqual(before);
  });

  it('imports nothing while a row is refused, then only the good rows when chosen', async () => {
    const before = await stored();
    const fields = {
      version: String(before.version),
      stageId: 'st-drv',
      csv: CSV,
      fileName: 'list.csv',
      action: 'import',
    };
    const refused = await post(`${base}/import`, fields);
    expect(refused.status).toBe(422);
    expect(await refused.text()).toContain('Nothing was imported: 1 row(s) are refused');
    expect(await stored()).toEqual(before);

    const ok = await post(`${base}/import`, { ...fields, takeGoodRows: 'true' });
    expect(ok.status).toBe(303);
    expect(ok.headers.get('location')).toContain('lines=2');
    const after = await stored();
    const added = after.bom.slice(before.bom.length);
    expect(added.map((l) => [l.refs, l.qtyPerRig, l.stageId])).toEqual([['R30', 1, 'st-drv'], ['D30', 2, 'st-drv']]);
    const diode = after.parts.find((x) => x.id === added[1].partId)!;
    expect(diode.offers[0]).toMatchObject({
      supplier: 'Harbor Radio Surplus',
      sku: 'HR-D100',
      currency: 'USD',
      breaks: [{ minQty: 1, unitPriceCents: 4 }],
    });
  });

  it('uses the column choices of the preview form', async () => {
    const before = await stored();
    const csv = 'Label,Amount,Text\nR40,2,Resistor 47 Ω 0.25 W';
    const res = await post(`${base}/import`, {
      version: String(before.version),
      stageId: '',
      csv,
      action: 'import',
      map_refs: '0',
      map_quantity: '1',
      map_description: '2',
    });
    expect(res.status).toBe(303);
    expect((await stored()).bom.at(-1)).toMatchObject({ refs: 'R40', qtyPerRig: 2, stageId: null });
  });

  it('reuses a catalog part with the same description instead of adding it again', async () => {
    const before = await stored();
    const csv = 'Refs,Description,Category,Qty\nR50,Resistor 2.2 kΩ 1 W metal film (bleeder),resistor,1';
    const res = await post(`${base}/import`, { version: String(before.version), stageId: '', csv, action: 'import' });
    expect(res.status).toBe(303);
    const after = await stored();
    expect(after.parts).toHaveLength(before.parts.length);
    expect(after.bom.at(-1)!.partId).toBe('p-bleed');
  });

  it('importing its own export: totals rows ignored, stages kept, the lines already there merged or skipped, never ' +
    'doubled', async () => {
    const before = await stored();
    const csv = await (await t.app.request(`http://localhost/projects/${ID}/bom.csv`)).text();
    const preview = await upload({ version: String(before.version), stageId: '' }, csv);
    expect(preview.status).toBe(200);
    const html = await preview.text();
    expect(html).toContain('<strong>0 refused</strong>');
    expect(html).toContain('4 totals row(s)');
    expect(html).toContain(`${before.bom.length} line(s) of the file are already in the parts list`);

    const fields = { version: String(before.version), stageId: '', csv, fileName: 'list.csv', action: 'import' };
    const unchosen = await post(`${base}/import`, fields);
    expect(unchosen.status).toBe(422);
    expect(await unchosen.text()).toContain('Choose whether to merge them');
    expect(await stored()).toEqual(before);

    const skip = await post(`${base}/import`, { ...fields, duplicates: 'skip' });
    expect(skip.status).toBe(303);
    expect(skip.headers.get('location')).toContain(`lines=0&parts=0&skipped=0&kept=${before.bom.length}&totals=4`);
    const after = await stored();
    expect(after.bom).toEqual(before.bom);
    expect(costProject(after).totals).toEqual(costProject(before).totals);
  });
});
