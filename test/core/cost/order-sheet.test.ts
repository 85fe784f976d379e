// Order sheets per supplier, the empty-stage finding and the single-supplier comparison's completeness.
// Hand-worked in the comments (USD; cents).
import { describe, expect, it } from 'vitest';
import { costProject } from '../../../src/core/cost/cost-project';
import { orderSheets } from '../../../src/core/cost/order-sheet';
import { orderSheetsToCsv } from '../../../src/core/csv/export-orders';
import { parseCsv } from '../../../src/core/csv/parse';
import { line, offer, part, project, stage } from './fixture';

const flat = (cents: number) => [{ minQty: 1, unitPriceCents: cents }];

// L1: 92 needed; A 50c, 25c from 100; B 35c -> 100 from A at 25c = 2500 (92 from B = 3220).
// L2: 3 needed; only B at 40c -> 120. L3: no offer (unpriced). Stage "VXO" has no lines.
// Shipping A 300, B 200: plan A(2500) + B(120) + 500 = 3120. Alternatives: L1 from B too: 3220 + 120 + 200 = 3540.
// Single supplier: only B offers L1 and L2: 3220 + 120 + 200 = 3540, 420 more; L3 is unpriced, so incomplete.
const p = project({
  stages: [stage('st-pa', 'final', 'PA'), stage('st-vxo', 'vxo', 'VXO')],
  parts: [
    part('p1', [
      offer({
        id: 'a1',
        supplier: 'A',
        sku: 'A-100N',
        breaks: [{ minQty: 1, unitPriceCents: 50 }, { minQty: 100, unitPriceCents: 25 }],
      }),
      offer({ id: 'b1', supplier: 'B', sku: 'B-100N', breaks: flat(35) }),
    ]),
    part('p2', [offer({ id: 'b2', supplier: 'B', sku: 'B-FET', breaks: flat(40) })]),
    part('p3', []),
  ],
  bom: [
    line('L1', 'p1', 92, { stageId: 'st-pa', refs: 'C1' }),
    line('L2', 'p2', 3, { stageId: 'st-pa' }),
    line('L3', 'p3', 1),
  ],
  suppliers: [{ name: 'A', shippingCents: 300, currency: 'USD' }, { name: 'B', shippingCents: 200, currency: 'USD' }],
});
const r = costProject(p);

describe('order sheets', () => {
  it('one sheet per supplier used: SKU, quantity, break, line totals, shipping', () => {
    expect(r.totals.buildCents).toBe(3120);
    expect(orderSheets(r)).toEqual([
      {
        supplier: 'A',
        lines: [
          {
            lineId: 'L1',
            sku: 'A-100N',
            description: 'Part p1',
            refs: 'C1',
            qty: 100,
            neededQty: 92,
            breakMinQty: 100,
            unitPriceCents: 25,
            offerCurrency: 'USD',
            offerCostCents: 2500,
            lineCostCents: 2500,
          },
        ],
        partsCents: 2500,
        shippingCents: 300,
        totalCents: 2800,
      },
      {
        supplier: 'B',
        lines: [
          {
            lineId: 'L2',
            sku: 'B-FET',
            description: 'Part p2',
            refs: '',
            qty: 3,
            neededQty: 3,
            breakMinQty: 1,
            unitPriceCents: 40,
            offerCurrency: 'USD',
            offerCostCents: 120,
            lineCostCents: 120,
          },
        ],
        partsCents: 120,
        shippingCents: 200,
        totalCents: 320,
      },
    ]);
  });

  it('as CSV: the lines, each supplier total and the build total (2800 + 320 = 3120)', () => {
    const recs = parseCsv(orderSheetsToCsv(r)).records;
    expect(recs[0]).toEqual([
      'Supplier',
      'SKU',
      'Description',
      'Refs',
      'Order qty',
      'Needed qty',
      'Break from',
      'Currency',
      'Unit price',
      'Offer line cost',
      'Line cost USD',
    ]);
    // money with USD's two decimals (ISO 4217)
    expect(recs[1]).toEqual(['A', 'A-100N', 'Part p1', 'C1', '100', '92', '100', 'USD', '0.25', '25.00', '25.00']);
    expect(recs.filter((x) => x[2] === 'Total order').map((x) => [x[0], x[10]])).toEqual([
      ['A', '28.00'],
      ['B', '3.20'],
    ]);
    expect(recs.at(-1)![2]).toBe('Total build (1 kits)');
    expect(recs.at(-1)![10]).toBe('31.20');
  });
});

describe('findings and the single-supplier comparison', () => {
  it('a stage with no parts is a caution naming it', () => {
    const f = r.findings.filter((x) => x.rule === 'cost.empty-stage');
    expect(f.map((x) => [x.subject, x.severity, x.source])).toEqual([['VXO', 'caution', 'cost.stage-coverage']]);
  });
  it('the one-supplier figure says it leaves out the unpriced line', () => {
    expect(r.singleSupplier).toEqual({
      available: true,
      supplier: 'B',
      partsCents: 3340,
      shippingCents: 200,
      totalCents: 3540,
      extraCents: 420,
      unpricedLines: 1,
    });
  });
});
