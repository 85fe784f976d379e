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
    { key: 'resistanceOhm', label: 'Resistance', unit: 'Ω', op: 'near', limit: 2200, tolerance: 0.05, required: true, source: 'supply.bleeder', why: '' },
    { key: 'powerW', label: 'Power', unit: 'W', op: 'min', limit: 0.92, required: true, source: 'supply.bleeder-power', why: '' },
  ],
};
const res = (id: string, powerW: number, offers: Part['offers']): Part => ({ id, description: `2.2 kΩ ${powerW} W ${id}`, category: 'resistor', ratings: { resistanceOhm: 2200, powerW }, offers });

function project(): Project {
  const p = structuredClone(club30m);
  // 46 kits, no attrition, no spares: 2 per rig -> 92 pieces
  p.kits = 46;
  p.costing = { ...p.costing, attritionFraction: 0, sparesPerLine: 0 };
  p.parts = [
    res('a', 1, [offer('oa', 'Supplier A', 'A-1', 'USD', [[1, 50], [100, 25]])]), // 92 x 0.50 = 46.00, 100 x 0.25 = 25.00
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
    expect(r.bom).toEqual([{ id: 'new', stageId: null, partId: 'b', qtyPerRig: 2, refs: '', notes: '', roleId: 'bleeders' }]);
    expect(bindCandidate(p, undefined, 'b', 'new')).toHaveProperty('errors._form');
    expect(bindCandidate(p, role, 'zz', 'new')).toHaveProperty('errors.partId');
  });
});
