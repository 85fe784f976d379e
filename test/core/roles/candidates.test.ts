// Candidates for a role ranked by cost at the group quantity, and binding one. Hand-worked beside each check.
import { describe, expect, it } from 'vitest';
import { candidatesFor, type DesignRole } from '../../../src/core/roles';
import { bindCandidate } from '../../../src/core/edits/bind-role';
import type { Part, Project } from '../../../src/core/model';
import { club30m } from '../../../seed-demo/club-30m';
import { offer } from '../../../seed-demo/common';

const role: DesignRole = {
  id: 'bleeders', label: 'Bleeder resistors', category: 'resistor', stageId: null, qtyPerRig: 2, requirement: '',
  rules: [
    {
      key: 'resistanceOhm',
      label: 'Resistance',
      unit: 'Ω',
      op: 'near',
      limit: 2200,
      tolerance: 0.05,
      required: true,
      source: 'supply.bleeder',
      why: '',
    },
    {
      key: 'powerW',
      label: 'Power',
      unit: 'W',
      op: 'min',
      limit: 0.92,
      required: true,
      source: 'supply.bleeder-power',
      why: '',
    },
  ],
};
const res = (id: string, powerW: number, offers: Part['offers']): Part => ({
  id,
  description: `2.2 kΩ ${powerW} W ${id}`,
  category: 'resistor',
  ratings: { resistanceOhm: 2200, powerW },
  offers,
});

function project(): Project {
  const p = structuredClone(club30m);
  // 46 kits, no attrition, no spares: 2 per rig -> 92 pieces
  p.kits = 46;
  p.costing = { ...p.costing, attritionFraction: 0, sparesPerLine: 0 };
  p.parts = [
    res('a', 1, [
      offer('oa', 'Supplier A', 'A-1', 'USD', [[1, 50], [100, 25]]),
    ]), // 92 x 0.50 = 46.00, 100 x 0.25 = 25.00
    res('b', 1, [offer('ob', 'Supplier B', 'B-1', 'USD', [[1, 35]])]), // 92 x 0.35 = 32.20
    res('c', 0.5, [offer('oc', 'Supplier B', 'B-2', 'USD', [[1, 10]])]), // cheapest but under-rated: not a candidate
    res('d', 2, []), // meets the role, no price: last
  ];
  p.bom = [{ id: 'l1', stageId: null, partId: 'c', qtyPerRig: 2, refs: 'R1, R2', notes: '', roleId: 'bleeders' }];
  return p;
}

describe('candidatesFor', () => {
  it('keeps only parts meeting every rule and ranks them by the least-cost order at the group quantity', () => {
    const c = candidatesFor(project(), role);
    // a: buying up to the 100-piece break costs 25.00 < b's 32.20; c is under-rated; d has no price
    expect(c.map((x) => [x.partId, x.neededQty, x.costCents, x.orderQty])).toEqual([
      ['a', 92, 2500, 100],
      ['b', 92, 3220, 92],
      ['d', 92, null, null],
    ]);
    expect(c.some((x) => x.bound)).toBe(false); // the bound part c is not a candidate
  });
  it('binding a candidate replaces the part of the bound line, keeping its quantity and designators', () => {
    const p = project();
    const r = bindCandidate(p, role, 'a', 'new');
    if ('errors' in r) throw new Error('refused');
    expect(r.bom).toEqual([{ ...p.bom[0], partId: 'a' }]);
    expect(candidatesFor(r, role)[0]).toMatchObject({ partId: 'a', bound: true });
  });
  it('with no bound line a new line is added for the role; a gone role or part is refused with a message', () => {
    const p = { ...project(), bom: [] };
    const r = bindCandidate(p, role, 'b', 'new');
    if ('errors' in r) throw new Error('refused');
    expect(r.bom).toEqual([
      { id: 'new', stageId: null, partId: 'b', qtyPerRig: 2, refs: '', notes: '', roleId: 'bleeders' },
    ]);
    expect(bindCandidate(p, undefined, 'b', 'new')).toHaveProperty('errors._form');
    expect(bindCandidate(p, role, 'zz', 'new')).toHaveProperty('errors.partId');
  });
});

describe('candidatesFor with shipping (the cost plan held as it is)', () => {
  // Rule under test (stated on the page): a supplier the plan uses for another line adds no shipping; a supplier not
  // otherwise used adds its full charge. Supplier A ships for 10.00, Supplier B for 8.00 (USD, the project currency).
  function withShipping(): Project {
    const p = project();
    p.parts.push({
      id: 'other',
      description: 'Crystal, only from B',
      category: 'crystal',
      ratings: {},
      offers: [offer('ox', 'Supplier B', 'B-X', 'USD', [[1, 100]])],
    });
    p.parts.push(
      res('e', 1, [
        offer('oe1', 'Supplier A', 'A-2', 'USD', [[1, 30]]),
        offer('oe2', 'Supplier B', 'B-3', 'USD', [[1, 34]]),
      ]),
    );
    p.bom.push({ id: 'l-other', stageId: null, partId: 'other', qtyPerRig: 1, refs: 'Y1', notes: '', roleId: null });
    p.costing = {
      ...p.costing,
      suppliers: [
        { name: 'Supplier A', shippingCents: 1000, currency: 'USD' },
        { name: 'Supplier B', shippingCents: 800, currency: 'USD' },
      ],
    };
    return p;
  }

  it('ranks by parts plus the shipping each candidate adds (hand-worked)', () => {
    // The bound line l1 buys from A in this plan, but it is the role's own line: A is not otherwise used.
    const plan = new Map<string, string | null>([['l1', 'Supplier A'], ['l-other', 'Supplier B']]);
    const c = candidatesFor(withShipping(), role, plan);
    // b: 92 x 0.35 = 32.20 from B (used by Y1) + 0           = 32.20
    // e: from B 92 x 0.34 = 31.28 + 0 = 31.28; from A 92 x 0.30 = 27.60 + 10.00 = 37.60 -> B, 31.28
    // a: 100 x 0.25 = 25.00 from A (not otherwise used) + 10.00 = 35.00
    expect(c.map((x) => [x.partId, x.supplier, x.costCents, x.shippingCents, x.totalCents])).toEqual([
      ['e', 'Supplier B', 3128, 0, 3128],
      ['b', 'Supplier B', 3220, 0, 3220],
      ['a', 'Supplier A', 2500, 1000, 3500],
      ['d', null, null, null, null],
    ]);
  });

  it('the plan of costProject gives the same ranking; without a plan shipping is left out', async () => {
    const { costProject } = await import('../../../src/core/cost');
    const p = withShipping();
    const plan = new Map(costProject(p).lines.map((l): [string, string | null] => [l.lineId, l.supplier]));
    expect(plan.get('l-other')).toBe('Supplier B'); // the crystal is only offered by B
    expect(candidatesFor(p, role, plan).map((x) => x.partId)).toEqual(['e', 'b', 'a', 'd']);
    // no plan: parts cost only (a 25.00 < e 27.60 from A < b 32.20)
    expect(candidatesFor(p, role).map((x) => [x.partId, x.totalCents])).toEqual([
      ['a', 2500],
      ['e', 2760],
      ['b', 3220],
      ['d', null],
    ]);
  });

  it('a supplier with no shipping entry counts 0 and says so', () => {
    const p = withShipping();
    p.costing = { ...p.costing, suppliers: [] };
    const c = candidatesFor(p, role, new Map([['l-other', 'Supplier B']]));
    expect(c.find((x) => x.partId === 'a')).toMatchObject({
      shippingCents: 0,
      shippingNote: 'Supplier "Supplier A" has no shipping entry; shipping counted as 0.',
    });
  });
});
