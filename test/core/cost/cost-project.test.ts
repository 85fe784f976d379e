// costProject against hand-worked examples. Each comment shows the arithmetic; that arithmetic
// (not the code) is the reference. Money in cents of the project currency (USD) unless noted.
import { describe, expect, it } from 'vitest';
import { costProject } from '../../../src/core/cost/cost-project';
import { line, offer, part, project, stage } from './fixture';

const ship = (name: string, shippingCents: number, currency = 'USD') => ({ name, shippingCents, currency });
const flat = (cents: number) => [{ minQty: 1, unitPriceCents: cents }];

describe('supplier choice with shipping (hand-worked)', () => {
  it('two suppliers beat one: split saves more than the second shipping charge', () => {
    // Need 10 of each line. Alpha: L1 10 x 100 = 1000, L2 10 x 300 = 3000. Bravo: L1 3000, L2 1000.
    // Shipping 500 each. Alpha only: 4000 + 500 = 4500. Bravo only: 4500.
    // Split (L1 Alpha, L2 Bravo): 1000 + 1000 + 500 + 500 = 3000. Split is cheaper by 1500.
    const r = costProject(
      project({
        parts: [
          part('p1', [
            offer({ id: 'a1', supplier: 'Alpha', breaks: flat(100) }),
            offer({ id: 'b1', supplier: 'Bravo', breaks: flat(300) }),
          ]),
          part('p2', [
            offer({ id: 'a2', supplier: 'Alpha', breaks: flat(300) }),
            offer({ id: 'b2', supplier: 'Bravo', breaks: flat(100) }),
          ]),
        ],
        bom: [line('L1', 'p1', 10), line('L2', 'p2', 10)],
        suppliers: [ship('Alpha', 500), ship('Bravo', 500)],
      }),
    );
    expect(r.method).toBe('exact');
    expect(r.lines.map((l) => l.supplier)).toEqual(['Alpha', 'Bravo']);
    expect(r.totals).toMatchObject({ partsCents: 2000, shippingCents: 1000, buildCents: 3000, perKitCents: 3000 });
    expect(r.singleSupplier).toMatchObject({ available: true, supplier: 'Alpha', totalCents: 4500, extraCents: 1500 });
  });

  it('one supplier beats the per-line cheapest split once shipping is counted', () => {
    // Alpha: L1 1000, L2 1300. Bravo: L1 1200, L2 1000 (10 pieces each). Shipping 800 each.
    // Per-line cheapest split: 1000 + 1000 + 800 + 800 = 3600.
    // Alpha only: 2300 + 800 = 3100. Bravo only: 2200 + 800 = 3000 <- cheapest.
    const p = project({
      parts: [
        part('p1', [
          offer({ id: 'a1', supplier: 'Alpha', breaks: flat(100) }),
          offer({ id: 'b1', supplier: 'Bravo', breaks: flat(120) }),
        ]),
        part('p2', [
          offer({ id: 'a2', supplier: 'Alpha', breaks: flat(130) }),
          offer({ id: 'b2', supplier: 'Bravo', breaks: flat(100) }),
        ]),
      ],
      bom: [line('L1', 'p1', 10), line('L2', 'p2', 10)],
      suppliers: [ship('Alpha', 800), ship('Bravo', 800)],
    });
    const r = costProject(p);
    expect(r.lines.map((l) => l.supplier)).toEqual(['Bravo', 'Bravo']);
    expect(r.totals.buildCents).toBe(3000);
    expect(r.suppliers).toEqual([{ supplier: 'Bravo', lineCount: 2, partsCents: 2200, shippingCents: 800 }]);
    expect(r.singleSupplier).toMatchObject({ available: true, supplier: 'Bravo', totalCents: 3000, extraCents: 0 });
    // Above the exhaustive limit, branch and bound proves the same plan.
    const b = costProject(p, { exactLimit: 0 });
    expect(b).toMatchObject({ method: 'branch-and-bound', proven: true, lowerBoundCents: 3000 });
    expect(b.methodNote).toMatch(/proved the plan the cheapest possible/);
    expect(b.totals.buildCents).toBe(3000);
    // With no search budget the start plan is kept, not called cheapest, and a lower bound is stated:
    // the root bound is each line at its cheapest (1000 + 1000) plus no shipping = 2000 (USD 20.00).
    const h = costProject(p, { exactLimit: 0, nodeLimit: 0 });
    expect(h).toMatchObject({ method: 'local-search', proven: false, lowerBoundCents: 2000 });
    expect(h.methodNote).not.toMatch(/cheapest possible/);
    expect(h.methodNote).toMatch(/no plan can cost less than USD 20\.00/);
    expect(h.totals.buildCents).toBe(3000);
  });

  it('issue case: 92 needed; A 0.50, 0.25 from 100; B 0.35 -> 100 from A for 25.00', () => {
    // Hand working (USD, shipping 0 at both):
    //   A plain: 92 x 50c = 4600c.  A up to the 100 break: 100 x 25c = 2500c.  B: 92 x 35c = 3220c.
    //   Least: 100 from A, 2500c = 25.00, which is 720c below the 32.20 of 92 from B.
    const mk = (shipA: number) =>
      project({
        parts: [
          part('p1', [
            offer({
              id: 'a1',
              supplier: 'A',
              breaks: [{ minQty: 1, unitPriceCents: 50 }, { minQty: 100, unitPriceCents: 25 }],
            }),
            offer({ id: 'b1', supplier: 'B', breaks: flat(35) }),
          ]),
        ],
        bom: [line('L1', 'p1', 92)],
        suppliers: [ship('A', shipA), ship('B', 0)],
      });
    const r = costProject(mk(0));
    expect(r.lines[0]).toMatchObject({
      supplier: 'A',
      neededQty: 92,
      orderQty: 100,
      breakMinQty: 100,
      unitPriceCents: 25,
      lineCostCents: 2500,
    });
    expect(r.lines[0].raised).toEqual({ plainQty: 92, extraQty: 8, plainCostCents: 4600, savingCents: 2100 });
    expect(r.totals.buildCents).toBe(2500);
    expect(r).toMatchObject({ method: 'exact', proven: true });
    expect(r.methodNote).toMatch(/cheapest possible/);
    // Shipping is chosen jointly: A's shipping 800c makes A 2500 + 800 = 3300c > B 3220c, so B wins.
    const s = costProject(mk(800));
    expect(s.lines[0]).toMatchObject({ supplier: 'B', orderQty: 92, lineCostCents: 3220, raised: null });
    expect(s.totals.buildCents).toBe(3220);
  });

  it('exchange rates: offer and shipping converted once, half-up', () => {
    // Project USD; EUR = 1.15 USD. Charlie (EUR): 10 x 5 EUR c = 50 EUR c -> 57.5 -> 58 USD c.
    // Charlie shipping 400 EUR c -> 460 USD c. Delta (USD): 10 x 6 = 60, shipping 450.
    // Charlie 58 + 460 = 518; Delta 60 + 450 = 510 <- Delta.
    // With Delta shipping 470: Delta 530 > Charlie 518 <- Charlie.
    const mk = (deltaShip: number) =>
      project({
        parts: [
          part('p1', [
            offer({ id: 'c1', supplier: 'Charlie', currency: 'EUR', breaks: flat(5) }),
            offer({ id: 'd1', supplier: 'Delta', breaks: flat(6) }),
          ]),
        ],
        bom: [line('L1', 'p1', 10)],
        suppliers: [ship('Charlie', 400, 'EUR'), ship('Delta', deltaShip)],
        exchangeRates: { EUR: 1.15 },
      });
    expect(costProject(mk(450)).totals.buildCents).toBe(510);
    const r = costProject(mk(470));
    expect(r.lines[0]).toMatchObject({
      supplier: 'Charlie',
      offerCurrency: 'EUR',
      offerCostCents: 50,
      exchangeRate: 1.15,
      lineCostCents: 58,
    });
    expect(r.totals).toMatchObject({ partsCents: 58, shippingCents: 460, buildCents: 518 });
  });

  it('no single supplier covers every line', () => {
    const r = costProject(
      project({
        parts: [
          part('p1', [offer({ id: 'a1', supplier: 'Alpha', breaks: flat(10) })]),
          part('p2', [offer({ id: 'b2', supplier: 'Bravo', breaks: flat(10) })]),
        ],
        bom: [line('L1', 'p1', 1), line('L2', 'p2', 1)],
        suppliers: [ship('Alpha', 100), ship('Bravo', 100)],
      }),
    );
    expect(r.singleSupplier.available).toBe(false);
    // 10 + 10 + 100 + 100 = 220.
    expect(r.totals.buildCents).toBe(220);
  });
});

describe('quantities, raised orders and totals through costProject (hand-worked)', () => {
  it('kits, attrition, spares, minimum order, multiple, buying up to a break, per-kit rounding', () => {
    // 3 per rig x 4 kits x 1.10 = 13.2 -> 14 + 2 spares = 16; min order 10, multiple 5 -> plain order 20.
    // 20 x 12c = 240c. Up to the 25 break: 25 x 9c = 225c (cheaper by 15c); 100 x 6c = 600c is dearer.
    // The plan buys 25 at 9c = 225c.
    // Second line: 1 per rig x 4 x 1.1 = 4.4 -> 5 + 2 = 7 at 33c = 231c. Parts 456c; shipping 350c -> 806c.
    // Per kit 806 / 4 = 201.5 -> 202 (half-up). Parts per kit 456 / 4 = 114.
    const breaks = [
      { minQty: 1, unitPriceCents: 12 },
      { minQty: 25, unitPriceCents: 9 },
      { minQty: 100, unitPriceCents: 6 },
    ];
    const r = costProject(
      project({
        kits: 4,
        attritionFraction: 0.1,
        sparesPerLine: 2,
        parts: [
          part('p1', [offer({ id: 'a1', supplier: 'Alpha', breaks, minOrder: 10, orderMultiple: 5 })]),
          part('p2', [offer({ id: 'a2', supplier: 'Alpha', breaks: flat(33) })]),
        ],
        bom: [line('L1', 'p1', 3), line('L2', 'p2', 1)],
        suppliers: [ship('Alpha', 350)],
      }),
    );
    expect(r.lines[0]).toMatchObject({
      neededQty: 16,
      orderQty: 25,
      breakMinQty: 25,
      unitPriceCents: 9,
      lineCostCents: 225,
    });
    expect(r.lines[0].raised).toEqual({ plainQty: 20, extraQty: 5, plainCostCents: 240, savingCents: 15 });
    expect(r.lines[1]).toMatchObject({ neededQty: 7, orderQty: 7, breakMinQty: 1, lineCostCents: 231, raised: null });
    expect(r.totals).toEqual({
      partsCents: 456,
      shippingCents: 350,
      buildCents: 806,
      perKitCents: 202,
      perKitPartsCents: 114,
      unpricedLines: 0,
    });
    expect(r.raisedSavingsCents).toBe(15);
  });

  it('stages, General and the supply / RF / other sections', () => {
    // Lines (1 piece each at the cents shown): PA device 200 (final) -> rf; LPF toroid 50 (lpf) -> rf;
    // mixer 80 (receiver) -> other; transformer 900 (no stage) -> supply; fuse 10 (no stage) -> supply;
    // reservoir "supply" category in the PA stage 120 -> supply; knob 30 (no stage, category hardware) -> other.
    // Supply 900 + 10 + 120 = 1030; RF 200 + 50 = 250; other 80 + 30 = 110.
    // Stage subtotals: PA 200 + 120 = 320; LPF 50; RX 80; General 900 + 10 + 30 = 940.
    const items: [string, string | null, string, number][] = [
      ['pa', 'st-pa', 'mosfet', 200],
      ['tor', 'st-lpf', 'inductor', 50],
      ['mix', 'st-rx', 'ic', 80],
      ['xfmr', null, 'transformer', 900],
      ['fuse', null, 'Fuse', 10],
      ['cap', 'st-pa', 'supply', 120],
      ['knob', null, 'hardware', 30],
    ];
    const r = costProject(
      project({
        stages: [stage('st-rx', 'receiver', 'Receiver'), stage('st-pa', 'final', 'PA'), stage('st-lpf', 'lpf', 'LPF')],
        parts: items.map(([id, , cat, c]) =>
          part(id, [offer({ id: `o-${id}`, supplier: 'Alpha', breaks: flat(c) })], { category: cat }),
        ),
        bom: items.map(([id, st]) => line(`L-${id}`, id, 1, { stageId: st })),
        suppliers: [ship('Alpha', 0)],
      }),
    );
    expect(r.sections.map((s) => [s.section, s.partsCents])).toEqual([['supply', 1030], ['rf', 250], ['other', 110]]);
    expect(r.stages.map((s) => [s.name, s.partsCents])).toEqual([
      ['Receiver', 80],
      ['PA', 320],
      ['LPF', 50],
      ['General', 940],
    ]);
  });
});

describe('flags: unpriced lines stay in the list at zero cost', () => {
  it('no offer, no price, no exchange rate, unknown part, unknown stage', () => {
    const r = costProject(
      project({
        parts: [
          part('none', []),
          part('noprice', [offer({ id: 'x', supplier: 'Alpha', breaks: [] })]),
          part('yen', [offer({ id: 'y', supplier: 'Kilo', currency: 'JPY', breaks: flat(100) })]),
          part('ok', [offer({ id: 'z', supplier: 'Alpha', breaks: flat(25) })]),
        ],
        bom: [
          line('L1', 'none', 1),
          line('L2', 'noprice', 1),
          line('L3', 'yen', 1),
          line('L4', 'ghost', 1),
          line('L5', 'ok', 2, { stageId: 'gone' }),
        ],
        suppliers: [ship('Alpha', 100)],
      }),
    );
    expect(r.lines.map((l) => l.flags)).toEqual([
      ['no-offer'],
      ['no-price'],
      ['no-rate'],
      ['unknown-part'],
      ['unknown-stage'],
    ]);
    expect(r.lines.slice(0, 4).every((l) => l.lineCostCents === 0 && l.supplier === null)).toBe(true);
    // Only L5 priced: 2 x 25 = 50 + 100 shipping = 150.
    expect(r.totals).toMatchObject({ buildCents: 150, unpricedLines: 4 });
    expect(r.stages.map((s) => s.name)).toEqual(['General']);
    const rules = r.findings.map((f) => f.rule);
    expect(rules).toEqual(
      expect.arrayContaining([
        'cost.no-offer',
        'cost.no-price',
        'cost.no-rate',
        'cost.unknown-part',
        'cost.unknown-stage',
        'cost.incomplete',
      ]),
    );
    expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
  });

  it('zero or absurd kits: a fail finding, no NaN, per-kit null', () => {
    for (const kits of [0, -3, Number.NaN, Infinity]) {
      const r = costProject(
        project({
          kits,
          parts: [part('p', [offer({ id: 'o', supplier: 'A', breaks: flat(5) })])],
          bom: [line('L', 'p', 2)],
        }),
      );
      expect(r.findings.some((f) => f.rule === 'cost.kits' && f.severity === 'fail')).toBe(true);
      expect(r.totals.perKitCents).toBeNull();
      expect(r.totals.buildCents).toBe(0);
      expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
    }
  });

  it('absurd quantities, prices and rates give flags and findings, never NaN or Infinity', () => {
    const r = costProject(
      project({
        parts: [
          part('huge', [offer({ id: 'h', supplier: 'A', breaks: flat(5) })]),
          part('dear', [offer({ id: 'd', supplier: 'A', breaks: flat(Number.MAX_SAFE_INTEGER) })]),
          part('rate', [offer({ id: 'r', supplier: 'A', currency: 'XXX', breaks: flat(5) })]),
        ],
        bom: [line('L1', 'huge', 1e300), line('L2', 'dear', 3), line('L3', 'rate', 1)],
        exchangeRates: { XXX: 1e300 },
        suppliers: [ship('A', 0)],
      }),
    );
    expect(r.lines.map((l) => l.flags)).toEqual([['bad-qty'], ['too-large'], ['too-large']]);
    expect(r.totals.buildCents).toBe(0);
    expect(r.findings.map((f) => f.rule)).toEqual(expect.arrayContaining(['cost.bad-qty', 'cost.too-large']));
    expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
  });

  it('a supplier with no shipping entry is counted at 0 shipping with a caution', () => {
    const r = costProject(
      project({
        parts: [part('p', [offer({ id: 'o', supplier: 'Nowhere', breaks: flat(5) })])],
        bom: [line('L', 'p', 2)],
      }),
    );
    expect(r.totals.buildCents).toBe(10);
    expect(r.findings.find((f) => f.rule === 'cost.shipping')?.severity).toBe('caution');
  });
});

describe('method selection', () => {
  it('more than 12 candidate suppliers switches to branch and bound, which proves the optimum and says so', () => {
    // 13 suppliers each offering the one line; supplier k charges 100 + k cents, shipping 50.
    // Cheapest: S00 at 100 + 50 = 150 (any method finds it; the point is which method is reported).
    const names = Array.from({ length: 13 }, (_, k) => `S${String(k).padStart(2, '0')}`);
    const r = costProject(
      project({
        parts: [part('p', names.map((n, k) => offer({ id: `o${k}`, supplier: n, breaks: flat(100 + k) })))],
        bom: [line('L', 'p', 1)],
        suppliers: names.map((n) => ship(n, 50)),
      }),
    );
    expect(r.candidateSuppliers).toBe(13);
    expect(r).toMatchObject({ method: 'branch-and-bound', proven: true, lowerBoundCents: 150 });
    expect(r.methodNote).toMatch(/13 suppliers is more than 12.*proved the plan the cheapest possible/);
    expect(r.totals.buildCents).toBe(150);
    expect(r.lines[0].supplier).toBe('S00');
  });
});
