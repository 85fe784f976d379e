// The club demo's order sheet for one supplier, Copperleaf Elektronik, worked by hand from the demo's catalog
// (seed-demo/club-30m.ts) and checked in the plan's sheets, the orders CSV and the organiser's pack (pdftotext).
//
// Hand working (8 kits, attrition 5 %, no spares; 1 EUR = 1.08 USD; conversion half-up to the cent, once per line):
//   need for 1 per rig = ceil(1 x 8 x 1.05) = ceil(8.4) = 9.
//   PCB1 (only offer: Copperleaf CL-PCB-RVRS-B, EUR, min 5, multiple 5, 11.50 from 5, 8.90 from 10): 9 -> 10 pieces
//     (the next multiple of 5), 10 x 8.90 = EUR 89.00 -> x 1.08 = USD 96.12. So Copperleaf's shipping is paid anyway.
//   C2 6800 µF: Northfield NC-E6850 USD 3.89 / 3.36 from 10 -> 9 x 3.89 = 35.01 or 10 x 3.36 = 33.60;
//     Copperleaf CL-40968 EUR 2.95 / 2.62 from 10 -> 9 x 2.95 = 26.55 EUR = 28.674 -> 28.67 USD, or
//     10 x 2.62 = 26.20 EUR = 28.296 -> USD 28.30 (the least): 10 from Copperleaf, break from 10.
//   U2 mixer: Northfield NC-DBM8 USD 2.45 / 2.15 from 10 -> 9 x 2.45 = 22.05 or 10 x 2.15 = 21.50;
//     Copperleaf CL-11602 EUR 1.99 -> 9 x 1.99 = 17.91 EUR = 19.3428 -> USD 19.34 (the least): 9 from Copperleaf.
//   Parts 96.12 + 28.30 + 19.34 = USD 143.76; shipping EUR 12.00 x 1.08 = USD 12.96; order total USD 156.72.
import { describe, expect, it } from 'vitest';
import { club30m } from '../../../seed-demo/club-30m';
import { costProject } from '../../../src/core/cost/cost-project';
import { orderSheets } from '../../../src/core/cost/order-sheet';
import { orderSheetsToCsv } from '../../../src/core/csv/export-orders';
import { parseCsv } from '../../../src/core/csv/parse';
import { buildPack } from '../../../src/pdf';
import { evaluate } from '../../../src/core/evaluate';
import { hasPoppler, POPPLER_MISSING, pagesText, writeTemp } from '../../pdf/pdf-text';

if (!hasPoppler) console.warn(POPPLER_MISSING);

const S3 = 'Copperleaf Elektronik';
// [refs, sku, order qty, needed, break from, offer currency, unit, offer line, line USD] in cents
const HAND: [string, string, number, number, number, string, number, number, number][] = [
  ['C2', 'CL-40968', 10, 9, 10, 'EUR', 262, 2620, 2830],
  ['U2', 'CL-11602', 9, 9, 1, 'EUR', 199, 1791, 1934],
  ['PCB1', 'CL-PCB-RVRS-B', 10, 9, 10, 'EUR', 890, 8900, 9612],
];
const byRefs = <T extends { refs: string }>(xs: T[]) => [...xs].sort((a, b) => a.refs.localeCompare(b.refs));

describe('club demo: the Copperleaf order sheet, worked by hand', () => {
  const report = costProject(club30m);
  const sheet = orderSheets(report).find((s) => s.supplier === S3)!;

  it('the plan sheet: SKU, quantities, break used, unit and line totals, shipping and order total', () => {
    expect(sheet).toBeDefined();
    const got = byRefs(sheet.lines).map((l) => [
      l.refs,
      l.sku,
      l.qty,
      l.neededQty,
      l.breakMinQty,
      l.offerCurrency,
      l.unitPriceCents,
      l.offerCostCents,
      l.lineCostCents,
    ]);
    expect(got).toEqual(byRefs(HAND.map((h) => ({ refs: h[0], h }))).map((x) => x.h));
    expect(sheet.partsCents).toBe(14376);
    expect(sheet.shippingCents).toBe(1296);
    expect(sheet.totalCents).toBe(15672);
  });

  it('the orders CSV carries the same rows and the supplier totals', () => {
    const recs = parseCsv(orderSheetsToCsv(report).replace(/^\uFEFF/, '')).records.filter((r) => r[0] === S3);
    const lines = recs.filter((r) => r[1] !== '');
    const want = HAND.map((h) => [
      S3,
      h[1],
      h[0],
      String(h[2]),
      String(h[3]),
      String(h[4]),
      h[5],
      (h[6] / 100).toFixed(2),
      (h[7] / 100).toFixed(2),
      (h[8] / 100).toFixed(2),
    ]);
    const cells = lines.map((r) => [r[0], r[1], r[3], r[4], r[5], r[6], r[7], r[8], r[9], r[10]]);
    expect([...cells].sort((a, b) => a[2].localeCompare(b[2]))).toEqual(
      [...want].sort((a, b) => a[2].localeCompare(b[2])),
    );
    expect(recs.filter((r) => r[1] === '').map((r) => [r[2], r[10]])).toEqual([
      ['Total parts', '143.76'],
      ['Shipping', '12.96'],
      ['Total order', '156.72'],
    ]);
  });

  it.skipIf(!hasPoppler)(
    "the organiser's pack prints the sheet with the same figures",
    async () => {
      const bytes = await buildPack(club30m, evaluate(club30m), {
        paper: 'a4',
        dataDate: '2026-12-02',
        part: 'organiser',
      });
      const text = pagesText(writeTemp(bytes, 'club-orders.pdf')).join('\n').replace(/\s+/g, ' ');
      const at =
        text.indexOf(`Order sheet — ${S3}`) >= 0
          ? text.indexOf(`Order sheet — ${S3}`)
          : text.indexOf(S3, text.indexOf('Order sheets per supplier'));
      expect(at).toBeGreaterThan(0);
      const part = text.slice(at, text.indexOf(`Order total ${S3}`, at) + 200);
      for (const [, sku, qty, , brk, , unit, offer, usd] of HAND) {
        expect(part).toMatch(
          new RegExp(
            `${sku} .*? ${qty} ${brk} EUR ${(unit / 100).toFixed(2)} EUR ${(offer / 100).toFixed(2)} USD ` +
              `${(usd / 100).toFixed(2)}`,
          ),
        );
      }
      // pdftotext reads the bold total row's amount after the next table's header, so the two are matched apart
      expect(part).toMatch(/Parts USD 143\.76 Shipping USD 12\.96 Order total Copperleaf Elektronik /);
      expect(part.slice(0, part.indexOf('Harbor Radio Surplus'))).toContain('USD 156.72');
    },
    120_000,
  );
});
