// Money in each currency's own minor unit (ISO 4217:2015, list one, "minor unit" column: JPY 0, USD 2, EUR 2).
// Expected values are worked by hand in the comments; the only outside fact is those three minor units.
import { describe, expect, it } from 'vitest';
import { costProject } from '../../../src/core/cost/cost-project';
import { centsToMajor, convertCents, formatMoney, minorDigits, minorRate } from '../../../src/core/cost/money';
import { costReportToCsv } from '../../../src/core/csv/export-parts';
import { parsePrice } from '../../../src/core/csv/parse-price';
import { previewImport } from '../../../src/core/csv/import-preview';
import { parseCsv } from '../../../src/core/csv/parse';
import { formValues, parseForm, validate } from '../../../src/core/spec/derive';
import { offerSpec, supplierSpec } from '../../../src/core/spec/parts';
import { line, offer, part, project } from './fixture';

describe('minor units (ISO 4217: JPY 0, USD 2, EUR 2)', () => {
  it('formats JPY with no decimals and USD / EUR with two', () => {
    expect([minorDigits('JPY'), minorDigits('usd'), minorDigits('EUR')]).toEqual([0, 2, 2]);
    expect(formatMoney(1234567, 'JPY')).toBe('JPY 1,234,567');
    expect(formatMoney(-5, 'JPY')).toBe('JPY -5');
    expect(formatMoney(1234567, 'USD')).toBe('USD 12,345.67');
    expect(formatMoney(5, 'EUR')).toBe('EUR 0.05');
    expect(centsToMajor(1234, 'JPY')).toBe(1234);
    expect(centsToMajor(1234, 'USD')).toBe(12.34);
  });

  it('converts between minor units of different size', () => {
    // 1000 JPY at 0.0067 USD per JPY = 6.70 USD = 670 cents (0.67 cents per yen).
    expect(convertCents(1000, minorRate(0.0067, 'JPY', 'USD'))).toBe(670);
    // 1.25 USD = 125 cents at 150 JPY per USD = 187.5 JPY -> 188 yen (half-up; 1.5 yen per cent).
    expect(convertCents(125, minorRate(150, 'USD', 'JPY'))).toBe(188);
    // Same-size minor units: the rate itself. 50 EUR cents at 1.15 = 57.5 -> 58 USD cents.
    expect(convertCents(50, minorRate(1.15, 'EUR', 'USD'))).toBe(58);
  });

  it('costs a USD project buying in JPY, with JPY shipping', () => {
    // 10 pieces at 30 JPY = 300 JPY x 0.0067 = 2.01 USD = 201 cents. Shipping 800 JPY x 0.0067 = 5.36 USD = 536.
    // Build 737 cents = USD 7.37. (Read with two-decimal JPY, the old code made it 300 x 0.0067 = 2 cents.)
    const r = costProject(
      project({
        parts: [
          part('p1', [
            offer({ id: 'j1', supplier: 'Kappa', currency: 'JPY', breaks: [{ minQty: 1, unitPriceCents: 30 }] }),
          ]),
        ],
        bom: [line('L1', 'p1', 10)],
        suppliers: [{ name: 'Kappa', shippingCents: 800, currency: 'JPY' }],
        exchangeRates: { JPY: 0.0067 },
      }),
    );
    expect(r.lines[0]).toMatchObject({ offerCostCents: 300, lineCostCents: 201 });
    expect(r.totals).toMatchObject({ partsCents: 201, shippingCents: 536, buildCents: 737 });
  });

  it('a JPY project: totals in whole yen in the CSV, which imports back to the same yen', () => {
    // USD offer 1.25 (125 cents) x 4 = 500 cents x 150 = 750 yen; shipping 5.00 USD = 500 cents x 150 = 750 yen.
    const r = costProject(
      project({
        currency: 'JPY',
        parts: [
          part('p1', [
            offer({ id: 'u1', supplier: 'Alpha', currency: 'USD', breaks: [{ minQty: 1, unitPriceCents: 125 }] }),
          ]),
        ],
        bom: [line('L1', 'p1', 4)],
        suppliers: [{ name: 'Alpha', shippingCents: 500, currency: 'USD' }],
        exchangeRates: { USD: 150 },
      }),
    );
    expect(r.totals).toMatchObject({ partsCents: 750, shippingCents: 750, buildCents: 1500 });
    const recs = parseCsv(costReportToCsv(r)).records;
    const header = recs[0];
    const row = recs[1];
    expect(row[header.indexOf('Unit price')]).toBe('1.25');
    expect(row[header.indexOf('Line cost JPY')]).toBe('750');
    expect(recs.find((x) => x[0].startsWith('Total build'))![header.indexOf('Line cost JPY')]).toBe('1500');
  });

  it('CSV prices are read in the minor unit of their currency', () => {
    expect(parsePrice('150', '.', () => 0)).toMatchObject({ ok: true, cents: 150 });
    // 12.5 JPY has a decimal JPY does not have: half-up to 13 yen, with the rounding reported.
    expect(parsePrice('12.5', '.', () => 0)).toMatchObject({ ok: true, cents: 13, roundedFrom: '12.5' });
    const preview = previewImport(
      'Description,Qty,Supplier,Price,Currency\nCrystal,1,Kappa,150,JPY\nDiode,1,Alpha,0.04,USD',
      {
        kind: 'parts-list',
        defaultCurrency: 'USD',
      },
    );
    expect(preview.rows.map((x) => [x.values.priceCents, x.values.currency])).toEqual([[150, 'JPY'], [4, 'USD']]);
  });

  it('offer and shipping boxes: whole yen are stored as yen; a yen fraction is refused naming the field', () => {
    const typed = {
      supplier: 'Kappa',
      sku: 'K-1',
      currency: 'JPY',
      breaks: '1: 150, 100: 95',
      minOrder: '1',
      orderMultiple: '1',
      stockNote: '',
    };
    const ok = parseForm(offerSpec, typed);
    expect(ok.ok && ok.value.breaks).toEqual([{ minQty: 1, unitPriceCents: 150 }, { minQty: 100, unitPriceCents: 95 }]);
    const stored = { ...typed, minOrder: 1, orderMultiple: 1, breaks: [{ minQty: 1, unitPriceCents: 150 }] };
    expect(validate(offerSpec, stored)).toEqual([]);
    const again = parseForm(offerSpec, { ...typed, ...formValues(offerSpec, stored) });
    expect(again.ok && again.value.breaks).toEqual(stored.breaks);
    const bad = parseForm(offerSpec, { ...typed, breaks: '1: 150.50' });
    expect(bad.ok).toBe(false);
    expect(!bad.ok && bad.errors.breaks).toBe(
      'Price breaks: 1: "150.50" has decimals; this currency has none (ISO 4217 minor unit)',
    );
    // the box shows whole yen: "150", never "150.00"
    expect(formValues(offerSpec, stored).breaks).toBe('1: 150');
    expect(formValues(supplierSpec, { name: 'Kappa', shippingCents: 800, currency: 'JPY' }).shipping).toBe('800');
    const ship = parseForm(supplierSpec, { name: 'Kappa', shipping: '800', currency: 'jpy' });
    expect(ship.ok && ship.value).toEqual({ name: 'Kappa', shippingCents: 800, currency: 'JPY' });
    // USD is unchanged: 8.50 is 850 cents.
    const usd = parseForm(supplierSpec, { name: 'Alpha', shipping: '8.50', currency: 'USD' });
    expect(usd.ok && usd.value.shippingCents).toBe(850);
  });
});

// Three-decimal currencies. Source: ISO 4217:2015, list one, "minor unit" column: KWD, BHD and OMR 3 (from memory,
// not confirmed against the table). 1.250 KWD is 1250 fils; 0.125 BHD is 125 fils; 2.005 OMR is 2005 baisa.
describe('three-decimal currencies (KWD, BHD, OMR)', () => {
  it('money boxes show and read three decimals; a fourth is refused naming the field', () => {
    for (const [currency, typed, minor] of [
      ['KWD', '1.250', 1250],
      ['BHD', '0.125', 125],
      ['OMR', '2.005', 2005],
    ] as const) {
      const offerTyped = {
        supplier: 'Lambda',
        sku: 'L-1',
        currency,
        breaks: `1: ${typed}`,
        minOrder: '1',
        orderMultiple: '1',
        stockNote: '',
      };
      const ok = parseForm(offerSpec, offerTyped);
      expect(ok.ok && ok.value.breaks).toEqual([{ minQty: 1, unitPriceCents: minor }]);
      const stored = { ...offerTyped, minOrder: 1, orderMultiple: 1, breaks: [{ minQty: 1, unitPriceCents: minor }] };
      expect(validate(offerSpec, stored)).toEqual([]);
      expect(formValues(offerSpec, stored).breaks).toBe(`1: ${typed}`);
      const ship = parseForm(supplierSpec, { name: 'Lambda', shipping: typed, currency: currency.toLowerCase() });
      expect(ship.ok && ship.value).toEqual({ name: 'Lambda', shippingCents: minor, currency });
      expect(formValues(supplierSpec, { name: 'Lambda', shippingCents: minor, currency }).shipping).toBe(typed);
    }
    const bad = parseForm(supplierSpec, { name: 'Lambda', shipping: '1.2505', currency: 'KWD' });
    expect(!bad.ok && bad.errors.shipping).toBe(
      'Shipping per order "1.2505" has more than three decimals; amounts are kept in whole minor units (ISO 4217)',
    );
    // USD keeps two: "0.125" is refused as before
    expect(parseForm(supplierSpec, { name: 'Alpha', shipping: '0.125', currency: 'USD' }).ok).toBe(false);
  });

  it('formats, exports and imports three decimals', () => {
    expect(formatMoney(1250, 'KWD')).toBe('KWD 1.250');
    expect(formatMoney(1234567, 'BHD')).toBe('BHD 1,234.567');
    expect(centsToMajor(2005, 'OMR')).toBe(2.005);
    // 4 pieces at 1.250 KWD = 5.000 KWD; shipping 0.750 KWD; build 5.750 KWD
    const p = project({
      currency: 'KWD',
      parts: [
        part('p1', [
          offer({ id: 'o1', supplier: 'Lambda', currency: 'KWD', breaks: [{ minQty: 1, unitPriceCents: 1250 }] }),
        ]),
      ],
      bom: [line('b1', 'p1', 4)],
      suppliers: [{ name: 'Lambda', shippingCents: 750, currency: 'KWD' }],
    });
    const r = costProject(p);
    expect(r.totals).toMatchObject({ partsCents: 5000, shippingCents: 750, buildCents: 5750 });
    const recs = parseCsv(costReportToCsv(r)).records;
    // written with KWD's three decimals (ISO 4217), as the pages print them
    expect(recs[1][recs[0].indexOf('Unit price')]).toBe('1.250');
    expect(recs[1][recs[0].indexOf('Line cost KWD')]).toBe('5.000');
    expect(recs.find((x) => x[0].startsWith('Total build'))![recs[0].indexOf('Line cost KWD')]).toBe('5.750');
    // CSV prices are read with three decimals: 0.125 KWD is 125 fils, no rounding
    expect(parsePrice('0.125', '.', () => minorDigits('KWD'))).toMatchObject({
      ok: true,
      cents: 125,
      roundedFrom: null,
    });
    const preview = previewImport('Description,Qty,Supplier,Price,Currency\nRelay,1,Lambda,1.250,KWD', {
      kind: 'parts-list',
      defaultCurrency: 'USD',
    });
    expect(preview.rows[0].values).toMatchObject({ priceCents: 1250, currency: 'KWD' });
  });
});
