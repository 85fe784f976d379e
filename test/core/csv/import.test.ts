// Import: mapping guesses, per-row errors, all-or-nothing plans, and the export -> import round trip.
// Expected values are written out by hand from the input text.
import { describe, expect, it } from 'vitest';
import { costProject } from '../../../src/core/cost/cost-project';
import { costReportToCsv } from '../../../src/core/csv/export-parts';
import { guessMapping, overrideMapping } from '../../../src/core/csv/import-mapping';
import { planImport, rowsToProjectData } from '../../../src/core/csv/import-plan';
import { previewImport } from '../../../src/core/csv/import-preview';
import { parseCsv } from '../../../src/core/csv/parse';
import { line, offer, part, project, stage } from '../cost/fixture';

describe('guessMapping', () => {
  it('recognises common headers, exact synonyms before word matches, each column once', () => {
    const m = guessMapping([
      'Designator',
      'Qty',
      'Value',
      'Part description',
      'Vendor',
      'Order code',
      'Price each',
      'Needed qty',
    ]);
    expect(m).toMatchObject({
      refs: 0,
      quantity: 1,
      value: 2,
      description: 3,
      supplier: 4,
      sku: 5,
      price: 6,
      currency: null,
      category: null,
    });
    expect(guessMapping(['Ref.', 'Menge', 'Beschreibung']).refs).toBe(0);
    expect(guessMapping(['Line qty', 'Notes']).quantity).toBe(0); // word match
  });
  it('the user can override; out-of-range columns become null', () => {
    const m = overrideMapping(guessMapping(['A', 'B']), { description: 1, quantity: 0, price: 9 }, 2);
    expect(m).toMatchObject({ description: 1, quantity: 0, price: null });
  });
});

const LIST = [
  'Refs,Value,Qty,Description,Supplier,SKU,Price',
  'R1-R4,10 kΩ,4,Resistor 0.25 W,Alpha,AL-10K,"0,02"',
  'C1,100 nF,,Capacitor 50 V,Alpha,AL-100N,0.05',
  ',,,,,,', // blank row: skipped
  'Q1,,1,N-channel MOSFET 60 V 12 A TO-220,,,1.20',
  'L1,,two,Toroid inductor,Bravo,BR-T50,abc',
  'D1 D2,,3,Signal diode,,,',
].join('\r\n');

describe('previewImport and planImport (parts list)', () => {
  const preview = previewImport(LIST, { kind: 'parts-list', defaultCurrency: 'USD' });
  it('parses values row by row with spreadsheet row numbers', () => {
    expect(preview.fileErrors).toEqual([]);
    expect(preview.rows.map((r) => r.row)).toEqual([2, 3, 5, 6, 7]);
    // Row 2: "0,02" -> 2 cents (one comma, two digits: decimal). Row 3: qty from 1 designator.
    expect(preview.rows[0].values).toMatchObject({
      refs: 'R1-R4',
      value: '10 kΩ',
      quantity: 4,
      priceCents: 2,
      currency: 'USD',
    });
    expect(preview.rows[1].values).toMatchObject({ quantity: 1, priceCents: 5 });
  });
  it('per-row errors name the row, the column and the problem; warnings do not block', () => {
    const errs = preview.rows.flatMap((r) => r.errors).map((e) => [e.row, e.column]);
    // Row 5: price without supplier. Row 6: bad quantity and bad price. Row 7 only warns (2 refs, qty 3).
    expect(errs).toEqual([[5, 'Supplier'], [6, 'Qty'], [6, 'Price']]);
    expect(preview.rows[4].warnings.map((w) => w.column)).toEqual(['Refs']);
    expect(preview).toMatchObject({ validRows: 3, invalidRows: 2 });
  });
  it('all or nothing by default; good rows only on request', () => {
    const all = planImport(preview);
    expect(all.ok).toBe(false);
    if (!all.ok) expect(all.errors).toHaveLength(3);
    const good = planImport(preview, { takeGoodRows: true });
    expect(good.ok).toBe(true);
    if (good.ok) {
      expect(good.rows.map((r) => r.row)).toEqual([2, 3, 7]);
      expect(good.skipped.map((e) => e.row)).toEqual([5, 6, 6]);
      const data = rowsToProjectData(good.rows, { makeId: (k, n) => `${k}-${n}`, stageId: null, asBomLines: true });
      expect(data.parts.map((p) => p.offers.length)).toEqual([1, 1, 0]);
      expect(data.bom.map((b) => [b.partId, b.qtyPerRig])).toEqual([['part-0', 4], ['part-1', 1], ['part-2', 3]]);
    }
  });
  it('missing required columns block the whole file', () => {
    const p = previewImport('Supplier,Price\r\nAlpha,1.00', { kind: 'parts-list', defaultCurrency: 'USD' });
    expect(p.fileErrors.map((e) => e.column)).toEqual([
      'Description / Value',
      'Quantity per rig / Reference designators',
    ]);
    expect(planImport(p, { takeGoodRows: true }).ok).toBe(false);
  });
});

describe('catalog import with ";" and decimal comma', () => {
  it('reads "1,250" as 1.25 in a ";" file and checks currency agreement', () => {
    const text =
      'Description;Supplier;SKU;Price;Currency\r\nRelay 12 V DPDT;Echo;E-1;1,250;EUR\r\nTrimmer 5–60 ' +
        'pF;Echo;E-2;EUR 0,80;USD\r\n';
    const p = previewImport(text, { kind: 'catalog', defaultCurrency: 'USD' });
    expect(p.delimiter).toBe(';');
    expect(p.rows[0].values).toMatchObject({ priceCents: 125, currency: 'EUR', quantity: null });
    expect(p.rows[1].errors.map((e) => e.column)).toEqual(['Currency']);
  });
});

describe('costed parts list: export then import round trip', () => {
  const names = [
    'Resistor 1,5 kΩ "metal film"',
    '=cmd|calc!A1',
    'Capacitor 4,7 µF Lötfahne',
    '+5 V regulator, 1 A',
    '@risk',
    '-x',
  ];
  const p = project({
    kits: 2,
    stages: [stage('s1', 'final', 'PA, push-pull')],
    parts: names.map((d, i) =>
      part(
        `p${i}`,
        [
          offer({
            id: `o${i}`,
            supplier: i % 2 ? 'Bravo, Ltd' : 'Alpha',
            sku: i === 1 ? '-5' : `SKU "${i}"`,
            currency: i % 2 ? 'EUR' : 'USD',
            breaks: [{ minQty: 1, unitPriceCents: 123 + i }],
          }),
        ],
        { description: d, ratings: { value: i === 2 ? '4,7 µF' : `${i}` } },
      ),
    ),
    bom: names.map((_, i) =>
      line(`L${i}`, `p${i}`, i + 1, { refs: i === 0 ? 'R1, R2' : `X${i}`, stageId: i < 3 ? 's1' : null }),
    ),
    suppliers: [
      { name: 'Alpha', shippingCents: 100, currency: 'USD' },
      { name: 'Bravo, Ltd', shippingCents: 200, currency: 'EUR' },
    ],
    exchangeRates: { EUR: 1.1 },
  });
  const report = costProject(p);
  const csv = costReportToCsv(report, { includeTotals: false });

  it('the file starts with a BOM, uses CRLF and neutralises formula text', () => {
    expect(csv.startsWith('\uFEFFStage,Section,Refs,')).toBe(true);
    expect(csv.split('\r\n')).toHaveLength(names.length + 2);
    expect(parseCsv(csv).records.flat().some((c) => /^[=+\-@]/.test(c))).toBe(false);
  });

  it('import gives back descriptions, values, refs, quantities, suppliers, SKUs, prices, currencies and stages', () => {
    const preview = previewImport(csv, { kind: 'parts-list', defaultCurrency: 'USD', stages: p.stages });
    const plan = planImport(preview);
    expect(plan.ok).toBe(true);
    if (!plan.ok) return;
    expect(plan.rows.map((r) => r.description)).toEqual(names);
    expect(plan.rows.map((r) => [r.refs, r.quantity, r.value])).toEqual(
      names.map((_, i) => [i === 0 ? 'R1, R2' : `X${i}`, i + 1, i === 2 ? '4,7 µF' : `${i}`]),
    );
    expect(plan.rows.map((r) => [r.supplier, r.sku, r.priceCents, r.currency])).toEqual(
      names.map((_, i) => [
        i % 2 ? 'Bravo, Ltd' : 'Alpha',
        i === 1 ? '-5' : `SKU "${i}"`,
        123 + i,
        i % 2 ? 'EUR' : 'USD',
      ]),
    );
    // Lines 0-2 were on stage "PA, push-pull" (s1), the rest on General (no stage).
    expect(plan.rows.map((r) => [r.stage, r.stageId])).toEqual(
      names.map((_, i) => (i < 3 ? ['PA, push-pull', 's1'] : ['General', null])),
    );
  });

  it('a stage name the project does not have is refused with its row and the stages named', () => {
    const preview = previewImport(csv, { kind: 'parts-list', defaultCurrency: 'USD', stages: [] });
    expect(preview.rows[0].errors).toEqual([
      {
        row: 2,
        column: 'Stage',
        message: '"PA, push-pull" is not a stage of this project (stages: none; "General" = no stage).',
      },
    ]);
    expect(preview.rows[3].errors).toEqual([]);
  });

  it('with totals rows and ";" the totals parse as numbers with a decimal comma', () => {
    const semi = costReportToCsv(report, { delimiter: ';' });
    const recs = parseCsv(semi, ';').records;
    const build = recs.find((r) => r[0].startsWith('Total build'))!;
    // Hand-worked (need = 2 kits x (i + 1); price 123 + i cents; odd lines EUR x 1.1, half-up):
    // 2x123 = 246; 4x124 = 496 EUR -> 545.6 -> 546; 6x125 = 750; 8x126 = 1008 EUR -> 1108.8 -> 1109;
    // 10x127 = 1270; 12x128 = 1536 EUR -> 1689.6 -> 1690. Parts 5611. Shipping 100 + 200 EUR -> 220.
    // Build 5931 cents -> "59,31".
    expect(build[15]).toBe('59,31');
    expect(recs.find((r) => r[0] === 'Total parts')![15]).toBe('56,11');
  });
});
