// Parts, offers, suppliers, parts-list lines and costing settings: one spec each. Round trips of both demo
// projects' objects (form text -> parse gives back the same object), and the limits every path now shares.
// Expected values are hand-worked (the arithmetic is in the comments); no value comes from running the program.
import { describe, expect, it } from 'vitest';
import { club30m } from '../../../seed-demo/club-30m';
import { portable20m } from '../../../seed-demo/portable-20m';
import type { Spec } from '../../../src/core/spec/field';
import { formValues, parseForm, pick, validate } from '../../../src/core/spec/derive';
import { offerSpec, partSpec, supplierSpec } from '../../../src/core/spec/parts';
import { bomLineSpec } from '../../../src/core/spec/parts-list';
import { costingSpec } from '../../../src/core/spec/costing';
import { parseBreaks, parseRates, parseRatings, ratingsText } from '../../../src/core/spec/parts-text';
import { parseProjectFile, toProjectFile } from '../../../src/io/project-file';
import type { Project } from '../../../src/core/model';
import { previewImport } from '../../../src/core/csv';

const DEMOS = [club30m, portable20m];

function roundTrip(spec: Spec, stored: unknown) {
  const values = formValues(spec, stored);
  const back = parseForm(spec, values);
  expect(back, JSON.stringify(values)).toEqual({ ok: true, value: pick(spec, stored) });
  expect(validate(spec, stored)).toEqual([]);
}

describe('round trips of the demo projects', () => {
  for (const p of DEMOS) {
    it(`${p.id}: parts, offers, suppliers, lines and costing come back unchanged`, () => {
      expect(p.parts.length).toBeGreaterThan(0);
      for (const part of p.parts) {
        roundTrip(partSpec, part);
        for (const o of part.offers) roundTrip(offerSpec, o);
      }
      for (const s of p.costing.suppliers) roundTrip(supplierSpec, s);
      for (const l of p.bom) roundTrip(bomLineSpec, l);
      roundTrip(costingSpec, p.costing);
    });
  }
});

describe('money: typed in the major unit, stored in whole cents', () => {
  const ship = (shipping: string) =>
    parseForm(supplierSpec, { name: 'Harbor Radio Surplus', shipping, currency: 'usd' });

  it('reads amounts exactly (no binary rounding) and refuses sub-cent amounts', () => {
    // hand-worked: 0.29 major units = 29 cents (0.29 * 100 in binary floating point is 28.999999999999996)
    expect(ship('0.29')).toEqual({
      ok: true,
      value: { name: 'Harbor Radio Surplus', shippingCents: 29, currency: 'USD' },
    });
    expect(ship('8,5')).toMatchObject({ ok: true, value: { shippingCents: 850 } }); // decimal comma: 8.50
    const sub = ship('0.125');
    expect(sub.ok).toBe(false);
    if (!sub.ok)
      expect(sub.errors.shipping).toBe(
        'Shipping per order "0.125" has more than two decimals; amounts are kept in whole cents',
      );
    const neg = ship('-1');
    expect(neg.ok).toBe(false);
    if (!neg.ok) expect(neg.errors.shipping).toContain('Shipping per order');
  });

  it('puts whole cents back as two decimals', () => {
    expect(formValues(supplierSpec, { name: 'X', shippingCents: 5, currency: 'EUR' }).shipping).toBe('0.05');
    expect(formValues(supplierSpec, { name: 'X', shippingCents: 1200, currency: 'EUR' }).shipping).toBe('12.00');
  });

  it('refuses a stored amount that is not whole cents, or a currency in lower case, naming the field', () => {
    expect(validate(supplierSpec, { name: 'X', shippingCents: 8.5, currency: 'USD' })).toEqual([
      {
        field: 'shippingCents',
        label: 'Shipping per order',
        message: 'Shipping per order must be a whole number of cents',
      },
    ]);
    expect(validate(supplierSpec, { name: 'X', shippingCents: 0, currency: 'usd' })[0].field).toBe('currency');
  });
});

describe('price breaks', () => {
  it('reads minimum quantity -> whole cents, sorted', () => {
    // hand-worked: 0.95 -> 95 cents, 0.78 -> 78, 0.52 -> 52; sorted by quantity 1, 10, 100
    expect(parseBreaks('10: 0.78, 1: 0.95, 100: 0.52')).toEqual({
      ok: true,
      value: [
        { minQty: 1, unitPriceCents: 95 },
        { minQty: 10, unitPriceCents: 78 },
        { minQty: 100, unitPriceCents: 52 },
      ],
    });
    expect(parseBreaks('1: 0,95; 10: 0,78')).toEqual({
      ok: true,
      value: [{ minQty: 1, unitPriceCents: 95 }, { minQty: 10, unitPriceCents: 78 }],
    });
    expect(parseBreaks('')).toEqual({ ok: true, value: [] }); // not priced yet
  });

  it('refuses what it cannot read exactly, saying where', () => {
    expect(parseBreaks('1: 0.125')).toEqual({
      ok: false,
      message: '1: "0.125" has more than two decimals; amounts are kept in whole cents',
    });
    expect(parseBreaks('0: 1.00')).toMatchObject({
      ok: false,
      message: expect.stringContaining('quantity "0" must be at least 1'),
    });
    expect(parseBreaks('1: 1, 1: 2')).toEqual({ ok: false, message: 'quantity 1 is given twice' });
    expect(parseBreaks('1: 2.15, ten: 1.82')).toEqual({
      ok: false,
      message: '"ten: 1.82" is not "quantity: unit price" (e.g. 10: 0.78)',
    });
  });

  it('holds a stored offer to the same limits (file and database)', () => {
    const offer = { ...club30m.parts[0].offers[0] };
    const bad = validate(offerSpec, { ...offer, breaks: [{ minQty: 1, unitPriceCents: 9.5 }] });
    expect(bad).toEqual([
      {
        field: 'breaks',
        label: 'Price breaks',
        message: 'Price breaks: break 1 (from 1): the unit price must be a whole number of cents',
      },
    ]);
    expect(validate(offerSpec, { ...offer, breaks: [{ minQty: 0, unitPriceCents: 5 }] })[0].message).toContain(
      'the quantity must be at least 1',
    );
    expect(validate(offerSpec, { ...offer, breaks: [] })).toEqual([]);
  });
});

describe('ratings (free key=value)', () => {
  it('reads numbers with SI prefixes and keeps text', () => {
    // 4700u = 4700e-6 = 0.0047 (SI prefix micro)
    expect(parseRatings('voltageV=35, rippleA=2.4; capacitanceF=4700u; type=T; note=5 × 20 mm, glass')).toEqual({
      ok: true,
      value: { voltageV: 35, rippleA: 2.4, capacitanceF: 0.0047, type: 'T', note: '5 × 20 mm, glass' },
    });
    expect(parseRatings('va 70').ok).toBe(false);
    expect(parseRatings('a=1; a=2').ok).toBe(false);
  });

  it('quotes text that would not come back unchanged', () => {
    const ratings = { va: 70, code: '100n', note: 'a; b, c', quote: 'say "hi"', alHPerTurn2: 4.9e-9 };
    expect(parseRatings(ratingsText(ratings))).toEqual({ ok: true, value: ratings });
  });

  it('has its limits in the spec: text length, name, value length', () => {
    const long = parseForm(partSpec, { description: 'Knob', category: '', ratings: `note="${'x'.repeat(2100)}"` });
    expect(long).toEqual({ ok: false, errors: { ratings: 'Ratings is longer than 2000 characters' } });
    const value = parseForm(partSpec, { description: 'Knob', category: '', ratings: `note="${'x'.repeat(201)}"` });
    expect(value).toEqual({
      ok: false,
      errors: { ratings: 'Ratings: the text of "note" is longer than 200 characters' },
    });
    expect(validate(partSpec, { description: 'Knob', category: '', ratings: { 'bad key': 1 } })[0].message).toContain(
      'is not a rating name',
    );
    expect(validate(partSpec, { description: 'Knob', category: '', ratings: { v: Infinity } })[0].message).toBe(
      'Ratings: "v" is not a usable number',
    );
  });
});

describe('parts-list line and costing limits', () => {
  const line = (qty: string) => parseForm(bomLineSpec, { stageId: '', partId: 'p-fuse', qty, refs: 'F1', notes: '' });

  it('reads the quantity and an empty stage as General (null)', () => {
    expect(line('0.5')).toEqual({
      ok: true,
      value: { stageId: null, partId: 'p-fuse', qtyPerRig: 0.5, refs: 'F1', notes: '', roleId: null },
    });
    const zero = line('0');
    expect(zero.ok).toBe(false);
    if (!zero.ok) expect(zero.errors.qty).toMatch(/^Quantity per rig must be more than 0 and at most 100000/);
    const none = parseForm(bomLineSpec, { stageId: '', partId: '', qty: '1', refs: '', notes: '' });
    expect(none).toEqual({ ok: false, errors: { partId: 'Part: choose one' } });
  });

  it('reads costing settings: percent, whole spares, rates', () => {
    // 10 % = 0.10; EUR 1.10 and GBP 1.27 project-currency units per unit
    expect(parseForm(costingSpec, { attrition: '10', spares: '1', rates: 'EUR = 1.10\ngbp=1.27' })).toEqual({
      ok: true,
      value: { attritionFraction: 0.1, sparesPerLine: 1, exchangeRates: { EUR: 1.1, GBP: 1.27 } },
    });
    expect(parseRates('EUR = 0')).toMatchObject({
      ok: false,
      message: expect.stringContaining('EUR: the rate must be at least'),
    });
    const spares = parseForm(costingSpec, { attrition: '5', spares: '1.5', rates: '' });
    expect(spares.ok).toBe(false);
    if (!spares.ok) expect(spares.errors.spares).toContain('must be a whole number');
    // the one limit for spares is 1000 (the form allowed 10 000, the project file 1000)
    expect(validate(costingSpec, { attritionFraction: 0, sparesPerLine: 1001, exchangeRates: {} })[0].field).toBe(
      'sparesPerLine',
    );
  });
});

describe('the project file holds the catalog to the same specs', () => {
  const file = (edit: (p: Project) => void) => {
    const p = structuredClone(club30m);
    edit(p);
    return parseProjectFile(toProjectFile(p, '2026-01-01T00:00:00Z'));
  };

  it('both demo projects come back with the same parts, lines and costing', () => {
    for (const p of DEMOS) {
      const r = parseProjectFile(toProjectFile(p, '2026-01-01T00:00:00Z'));
      expect(r.ok, r.ok ? '' : r.errors.join('\n')).toBe(true);
      if (r.ok) expect([r.project.parts, r.project.bom, r.project.costing]).toEqual([p.parts, p.bom, p.costing]);
    }
  });

  it('refuses a unit price that is not whole cents, saying where', () => {
    const r = file((p) => (p.parts[0].offers[0].breaks = [{ minQty: 1, unitPriceCents: 9.5 }]));
    expect(r).toEqual({
      ok: false,
      errors: [
        'project.parts[0].offers[0].breaks: Price breaks: break 1 (from 1): the unit price must be a whole number of ' +
          'cents',
      ],
    });
  });

  it('takes what a CSV import makes: an offer without prices and a part without a category', () => {
    const r = file((p) => {
      p.parts[0].offers[0].breaks = [];
      p.parts[0].category = '';
    });
    expect(r.ok, r.ok ? '' : r.errors.join('\n')).toBe(true);
  });

  it('uses one limit for a description (300 characters) and for spares (1000)', () => {
    expect(file((p) => (p.parts[0].description = 'd'.repeat(300))).ok).toBe(true);
    expect(file((p) => (p.parts[0].description = 'd'.repeat(301)))).toMatchObject({
      ok: false,
      errors: [expect.stringContaining('project.parts[0].description')],
    });
    expect(file((p) => (p.costing.sparesPerLine = 1001))).toMatchObject({
      ok: false,
      errors: [expect.stringContaining('project.costing.sparesPerLine')],
    });
  });
});

describe('the CSV import holds each cell to the spec of the field it becomes', () => {
  const preview = (row: string) =>
    previewImport(`Refs,Description,Category,Qty,Supplier,SKU,Unit price\n${row}`, {
      kind: 'parts-list',
      defaultCurrency: 'USD',
    });
  const errors = (row: string) => preview(row).rows[0].errors.map((e) => `${e.column}: ${e.message}`);

  it('takes a good row', () =>
    expect(errors('R1,Resistor 10 kΩ 0.25 W,resistor,2,Northfield Components,NC-R-10K,0.05')).toEqual([]));

  it('refuses a quantity above the line limit (100 000 per rig), a description over 300 and a long SKU', () => {
    expect(errors('R1,Resistor,resistor,200000,N,S,0.05')).toEqual([
      'Qty: Quantity per rig must be more than 0 and at most 100000; the file says "200000".',
    ]);
    expect(errors(`R1,${'d'.repeat(301)},resistor,1,N,S,0.05`)).toEqual([
      'Description: Description is longer than 300 characters.',
    ]);
    expect(errors(`R1,Resistor,resistor,1,N,${'s'.repeat(121)},0.05`)).toEqual([
      'SKU: SKU is longer than 120 characters.',
    ]);
  });

  it('refuses a unit price above the money limit (10 000 000 000.00)', () => {
    expect(errors('R1,Resistor,resistor,1,N,S,20000000000')).toEqual([
      'Unit price: Unit price must be at least 0.00 and at most 10000000000.00.',
    ]);
  });
});
