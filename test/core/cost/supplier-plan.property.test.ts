// Exact supplier choice vs brute force over every per-line offer choice and every allowed order quantity, on
// small random projects (fast-check, fixed seed). The brute force shares only unitPriceAt (the break rule,
// checked against hand-worked examples in quantities.test.ts) and the conversion; it walks every quantity
// itself, so buying up to a price break or multiple is found without the code under test.
import fc from 'fast-check';
import { propertyOptions } from '../../helpers/property';
import { describe, expect, it } from 'vitest';
import { costProject } from '../../../src/core/cost/cost-project';
import { convertCents, rateFor } from '../../../src/core/cost/money';
import { neededQty, unitPriceAt, validBreaks } from '../../../src/core/cost/quantities';
import { choosePlan, planExact, type PlanInput } from '../../../src/core/cost/supplier-plan';
import type { Offer, Project } from '../../../src/core/model';
import { line, offer, part, project } from './fixture';

const SEED = 20261201;
const SUPPLIERS = ['Alpha', 'Bravo', 'Charlie', 'Delta', 'Echo'];
const RATES: Record<string, number> = { EUR: 1.15, GBP: 1.27 };

const offerArb = fc.record({
  supplier: fc.constantFrom(...SUPPLIERS),
  currency: fc.constantFrom('USD', 'EUR', 'GBP'),
  breaks: fc.array(
    fc.record({ minQty: fc.integer({ min: 1, max: 60 }), unitPriceCents: fc.integer({ min: 0, max: 500 }) }),
    { minLength: 0, maxLength: 3 },
  ),
  minOrder: fc.integer({ min: 0, max: 30 }),
  orderMultiple: fc.integer({ min: 1, max: 10 }),
});
const caseArb = fc.record({
  lines: fc.array(fc.record({ qty: fc.integer({ min: 0, max: 12 }), offers: fc.array(offerArb, { maxLength: 3 }) }), {
    minLength: 1,
    maxLength: 4,
  }),
  shipping: fc.array(fc.integer({ min: 0, max: 2000 }), { minLength: SUPPLIERS.length, maxLength: SUPPLIERS.length }),
  shipCurrency: fc.constantFrom('USD', 'EUR'),
  kits: fc.integer({ min: 1, max: 5 }),
  attrition: fc.constantFrom(0, 0.05, 0.1),
  spares: fc.integer({ min: 0, max: 3 }),
});

type Case = typeof caseArb extends fc.Arbitrary<infer T> ? T : never;

function build(c: Case): Project {
  return project({
    kits: c.kits,
    attritionFraction: c.attrition,
    sparesPerLine: c.spares,
    exchangeRates: RATES,
    parts: c.lines.map((l, i) => part(`p${i}`, l.offers.map((o, j) => offer({ id: `o${i}-${j}`, ...o })))),
    bom: c.lines.map((l, i) => line(`L${i}`, `p${i}`, l.qty)),
    suppliers: SUPPLIERS.map((name, s) => ({ name, shippingCents: c.shipping[s], currency: c.shipCurrency })),
  });
}

/**
 * Cheapest cost in the offer's currency of at least `need` pieces, by walking every quantity q from need up.
 * Allowed: q >= minimum order, q >= the lowest break, q a whole multiple. Past the highest break threshold
 * (and the need and minimum order) the unit price no longer falls, so cost only grows: walking to that point
 * plus one multiple covers every candidate.
 */
function bruteOfferCost(need: number, o: Offer): number | null {
  const breaks = validBreaks(o.breaks);
  if (breaks.length === 0) return null;
  const multiple = Math.max(1, Math.floor(o.orderMultiple));
  const minOrder = Math.max(0, Math.ceil(o.minOrder));
  const top = Math.max(need, minOrder, breaks[breaks.length - 1].minQty) + multiple;
  let best: number | null = null;
  for (let q = need; q <= top; q++) {
    if (q < minOrder || q < breaks[0].minQty || q % multiple !== 0) continue;
    const unit = unitPriceAt(o.breaks, q);
    if (unit !== null && (best === null || q * unit < best)) best = q * unit;
  }
  return best;
}

/** Cheapest total over every combination of one offer (at its cheapest quantity) per purchasable line. */
function bruteForce(p: Project): number {
  const choices: { supplier: string; cost: number }[][] = p.bom
    .map((l) => {
      const need = neededQty(l.qtyPerRig, p.kits, p.costing.attritionFraction, p.costing.sparesPerLine);
      const offers: Offer[] = p.parts.find((x) => x.id === l.partId)!.offers;
      return need === 0
        ? []
        : offers.flatMap((o) => {
            const c = bruteOfferCost(need, o);
            const r = rateFor(o.currency, p.currency, p.costing.exchangeRates);
            return c !== null && r ? [{ supplier: o.supplier, cost: convertCents(c, r) }] : [];
          });
    })
    .filter((c) => c.length > 0);
  const ship = (name: string) => {
    const s = p.costing.suppliers.find((x) => x.name === name)!;
    return convertCents(s.shippingCents, rateFor(s.currency, p.currency, p.costing.exchangeRates)!);
  };
  let best = Infinity;
  const walk = (i: number, parts: number, used: Set<string>) => {
    if (i === choices.length) {
      best = Math.min(best, parts + [...used].reduce((t, n) => t + ship(n), 0));
      return;
    }
    for (const c of choices[i]) walk(i + 1, parts + c.cost, new Set([...used, c.supplier]));
  };
  walk(0, 0, new Set());
  return best;
}

describe('supplier choice: exact equals brute force (fast-check, seeded)', () => {
  it('exact method matches the brute-force optimum', () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const p = build(c);
        const r = costProject(p);
        expect(r.method).toBe('exact');
        expect(r.totals.buildCents).toBe(bruteForce(p));
      }),
      propertyOptions(SEED, 300),
    );
  });

  it('local search is never below the optimum, its totals add up, and single supplier is never cheaper', () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const p = build(c);
        const exact = costProject(p);
        const heur = costProject(p, { exactLimit: 0, nodeLimit: 0 });
        expect(heur.totals.buildCents).toBeGreaterThanOrEqual(exact.totals.buildCents);
        const parts = heur.lines.reduce((t, l) => t + l.lineCostCents, 0);
        const shipping = heur.suppliers.reduce((t, s) => t + s.shippingCents, 0);
        expect(heur.totals.buildCents).toBe(parts + shipping);
        // The stated lower bound is never above the optimum.
        if (heur.lowerBoundCents !== null) expect(heur.lowerBoundCents).toBeLessThanOrEqual(exact.totals.buildCents);
        // Branch and bound with its default budget proves the same optimum.
        const bb = costProject(p, { exactLimit: 0 });
        expect(bb.proven).toBe(true);
        expect(bb.totals.buildCents).toBe(exact.totals.buildCents);
        if (exact.singleSupplier.available) {
          expect(exact.singleSupplier.totalCents).toBeGreaterThanOrEqual(exact.totals.buildCents);
          expect(exact.singleSupplier.extraCents).toBe(exact.singleSupplier.totalCents - exact.totals.buildCents);
        }
      }),
      propertyOptions(SEED + 1, 300),
    );
  });
});

// Plan inputs directly, with up to 9 suppliers: branch and bound (any budget) against subset enumeration.
const planArb = fc.integer({ min: 1, max: 9 }).chain((n) =>
  fc.record({
    shippingCents: fc.array(fc.integer({ min: 0, max: 3000 }), { minLength: n, maxLength: n }),
    lineCosts: fc.array(
      fc.array(fc.oneof(fc.integer({ min: 0, max: 5000 }), fc.constant(Infinity)), { minLength: n, maxLength: n }),
      { minLength: 1, maxLength: 6 },
    ),
    nodeLimit: fc.integer({ min: 0, max: 40 }),
  }).map((r) => ({ ...r, suppliers: Array.from({ length: n }, (_, s) => `S${s}`) })),
);

describe('branch and bound against subset enumeration (fast-check, seeded)', () => {
  it('proven plans equal the enumerated optimum; unproven ones bracket it with a valid lower bound', () => {
    fc.assert(
      fc.property(planArb, (c) => {
        const input: PlanInput = { suppliers: c.suppliers, shippingCents: c.shippingCents, lineCosts: c.lineCosts };
        const exact = planExact(input);
        const full = choosePlan(input, 0);
        expect(full.plan?.totalCents ?? null).toBe(exact?.totalCents ?? null);
        if (exact !== null) expect(full.proven).toBe(true);
        const small = choosePlan(input, 0, c.nodeLimit);
        if (exact === null) {
          expect(small.plan).toBeNull();
          return;
        }
        expect(small.plan!.totalCents).toBeGreaterThanOrEqual(exact.totalCents);
        expect(small.lowerBoundCents!).toBeLessThanOrEqual(exact.totalCents);
        if (small.proven) expect(small.plan!.totalCents).toBe(exact.totalCents);
      }),
      propertyOptions(SEED + 2, 300),
    );
  });
});
