// Catalog and parts-list edits as pure functions: what each changes, and what each refuses (with the field named).
// Expected projects are written out by hand from the demo data; nothing here comes from running the program.
import { describe, expect, it } from 'vitest';
import { club30m } from '../../../seed-demo/club-30m';
import type { Project } from '../../../src/core/model';
import { saveCosting, saveOffer, saveSupplier } from '../../../src/core/edits/catalog';
import { mergeImport, saveLine } from '../../../src/core/edits/parts-list';

const demo = (): Project => structuredClone(club30m);
const asProject = (r: ReturnType<typeof saveSupplier>): Project => {
  if ('errors' in r) throw new Error(JSON.stringify(r.errors));
  return r;
};

describe('suppliers', () => {
  it('a rename is carried into every offer that named the old supplier (any case), and only those', () => {
    const p = demo();
    const old = p.costing.suppliers[1].name;
    const using = p.parts.flatMap((x) => x.offers).filter((o) => o.supplier.toLowerCase() === old.toLowerCase()).length;
    expect(using).toBeGreaterThan(0);
    const after = asProject(saveSupplier(p, 1, { name: 'Harbour Radio Surplus', shippingCents: 650, currency: 'USD' }));
    expect(after.costing.suppliers[1]).toEqual({ name: 'Harbour Radio Surplus', shippingCents: 650, currency: 'USD' });
    expect(after.parts.flatMap((x) => x.offers).filter((o) => o.supplier === 'Harbour Radio Surplus')).toHaveLength(
      using,
    );
    expect(after.parts.flatMap((x) => x.offers).some((o) => o.supplier === old)).toBe(false);
    expect(p.costing.suppliers[1].name).toBe(old); // the input project is not changed
  });

  it('a second supplier of the same name (ignoring case and spaces) is refused on the name field', () => {
    const p = demo();
    const r = saveSupplier(p, null, {
      name: ` ${p.costing.suppliers[0].name.toUpperCase()} `,
      shippingCents: 0,
      currency: 'USD',
    });
    expect(r).toEqual({ errors: { name: expect.stringContaining('is already in the list') } });
  });
});

describe('costing and offers', () => {
  it('a rate for the project currency is refused on the rates field', () => {
    const r = saveCosting(demo(), { attritionFraction: 0.1, sparesPerLine: 1, exchangeRates: { USD: 1 } });
    expect(r).toEqual({ errors: { rates: 'USD is the project currency; it needs no exchange rate' } });
  });

  it('an offer saved into a deleted part says the part is gone', () => {
    const r = saveOffer(demo(), 'p-none', 'o-new', { ...club30m.parts[0].offers[0] }, true);
    expect(r).toEqual({ errors: { _form: expect.stringContaining('That part no longer exists') } });
  });
});

describe('parts list', () => {
  it('a line for a missing part or stage is refused on those fields', () => {
    const r = saveLine(
      demo(),
      'b-new',
      { stageId: 'st-none', partId: 'p-none', qtyPerRig: 1, refs: '', notes: '' },
      true,
    );
    expect(r).toEqual({
      errors: {
        partId: expect.stringContaining('not in the catalog'),
        stageId: expect.stringContaining('no longer exists'),
      },
    });
  });

  it('an imported part equal to a catalog part (case aside) joins it: its new offer is added, its line points at ' +
    'it', () => {
    const p = demo();
    const cat = p.parts.find((x) => x.id === 'p-bleed')!;
    const imported = {
      id: 'imp1',
      description: cat.description.toUpperCase(),
      category: cat.category,
      ratings: structuredClone(cat.ratings),
      offers: [
        {
          id: 'io1',
          supplier: 'Coastline Parts',
          sku: 'CP-1',
          currency: 'EUR',
          breaks: [],
          minOrder: 1,
          orderMultiple: 1,
          stockNote: '',
        },
      ],
    };
    const line = { id: 'ib1', stageId: null, partId: 'imp1', qtyPerRig: 2, refs: 'R9', notes: '' };
    const r = mergeImport(p, { parts: [imported], bom: [line] }, 'skip'); // R9 is a new line: added in either mode
    expect([r.newParts, r.reusedParts]).toEqual([0, 1]);
    expect(r.project.parts).toHaveLength(p.parts.length);
    expect(r.project.parts.find((x) => x.id === 'p-bleed')!.offers.at(-1)).toMatchObject({
      supplier: 'Coastline Parts',
      sku: 'CP-1',
    });
    expect(r.project.bom.at(-1)).toEqual({ ...line, partId: 'p-bleed' });
  });
});
