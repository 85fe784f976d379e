// Exact supplier choice vs brute force over every per-line offer choice, on small random projects
// (fast-check, fixed seed). The brute force shares only the per-offer quote and conversion
// (checked separately against hand-worked examples) and enumerates plans independently.
import fc from 'fast-check';
import { propertyOptions } from '../../helpers/property';
import { describe, expect, it } from 'vitest';
import { costProject } from '../../../src/core/cost/cost-project';
import { convertCents, rateFor } from '../../../src/core/cost/money';
import { neededQty, quoteOffer } from '../../../src/core/cost/quantities';
import type { Offer, Project } from '../../../src/core/model';
import { line, offer, part, project } from './fixture';

const SEED = 20261201;
const SUPPLIERS = ['Alpha', 'Bravo', 'Charlie', 'Delta', 'Echo'];
const RATES: Record<string, number> = { EUR: 1.15, GBP: 1.27 };

const offerArb = fc.record({
  supplier: fc.constantFrom(...SUPPLIERS),
  currency: fc.constantFrom('USD', 'EUR', 'GBP'),
  breaks: fc.array(fc.record({ minQty: fc.integer({ min: 1, max: 60 }), unitPriceCents: fc.integer({ min: 0, max: 500 }) }), { minLength: 0, maxLength: 3 }),
  minOrder: fc.integer({ min: 0, max: 30 }),
  orderMultiple: fc.integer({ min: 1, max: 10 }),
});
const caseArb = fc.record({
  lines: fc.array(fc.record({ qty: fc.integer({ min: 0, max: 12 }), offers: fc.array(offerArb, { maxLength: 3 }) }), { minLength: 1, maxLength: 4 }),
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

/** Cheapest total over every combination of one offer per purchasable line. */
function bruteForce(p: Project): number {
  const choices: { supplier: string; cost: number }[][] = p.bom
    .map((l) => {
      const need = neededQty(l.qtyPerRig, p.kits, p.costing.attritionFraction, p.costing.sparesPerLine);
      const offers: Offer[] = p.parts.find((x) => x.id === l.partId)!.offers;
      return need === 0
        ? []
        : offers.flatMap((o) => {
            const q = quoteOffer(need, o);
            const r = rateFor(o.currency, p.currency, p.costing.exchangeRates);
            return q && r ? [{ supplier: o.supplier, cost: convertCents(q.costCents, r) }] : [];
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
        const heur = costProject(p, { exactLimit: 0 });
        expect(heur.totals.buildCents).toBeGreaterThanOrEqual(exact.totals.buildCents);
        const parts = heur.lines.reduce((t, l) => t + l.lineCostCents, 0);
        const shipping = heur.suppliers.reduce((t, s) => t + s.shippingCents, 0);
        expect(heur.totals.buildCents).toBe(parts + shipping);
        if (exact.singleSupplier.available) {
          expect(exact.singleSupplier.totalCents).toBeGreaterThanOrEqual(exact.totals.buildCents);
          expect(exact.singleSupplier.extraCents).toBe(exact.singleSupplier.totalCents - exact.totals.buildCents);
        }
      }),
      propertyOptions(SEED + 1, 300),
    );
  });
});
