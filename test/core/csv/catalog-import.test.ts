// A supplier's price list as a catalog import: column guesses, cell messages by row and column, and the round trip of
// an updated list (prices up and down, a new part, a part gone). Every expected value is read by hand from the CSV
// text written in this file; none comes from running the program.
import { describe, expect, it } from 'vitest';
import { planImport } from '../../../src/core/csv/import-plan';
import { previewImport } from '../../../src/core/csv/import-preview';
import { guessMapping } from '../../../src/core/csv/import-mapping';
import { parseBreakCell } from '../../../src/core/csv/catalog-cells';
import { applyCatalogUpdate, planCatalogUpdate, priceMove } from '../../../src/core/csv/catalog-update';
import { offer, part, project } from '../cost/fixture';

const opts = { kind: 'catalog' as const, defaultCurrency: 'USD', defaultSupplier: 'Delta Parts' };
const makeId = (k: 'part' | 'offer', n: number) => `${k}-new-${n}`;

const LIST_V1 = [
  'Description,Category,Ratings,SKU,Price breaks,Min order,Multiple,Currency',
  'Electrolytic 4700 µF 35 V,capacitor,capacitanceF=4700u; voltageV=35; rippleA=2.4,D-4700,"1: 1.20, 10: ' +
    '0.95",1,1,USD',
  'Resistor 10 kΩ 0.25 W,resistor,resistanceOhm=10k; powerW=0.25,D-10K,"1: 0.05, 100: 0.02",100,100,USD',
  'Fuse 1 A T 5x20,fuse,ratedA=1; type=T,D-F1T,0.30,10,10,USD',
].join('\r\n');

// The same supplier's list a month later: the capacitor dearer at 1 (1.20 -> 1.30) and unchanged at 10, the resistor
// cheaper at 100 (0.02 -> 0.015 is not a USD amount: 0.01 is written), the fuse no longer listed, a relay new.
const LIST_V2 = [
  'Description,Category,Ratings,SKU,Price breaks,Min order,Multiple,Currency',
  'Electrolytic 4700 µF 35 V,capacitor,capacitanceF=4700u; voltageV=35; rippleA=2.4,D-4700,"1: 1.30, 10: ' +
    '0.95",1,1,USD',
  'Resistor 10 kΩ 0.25 W,resistor,resistanceOhm=10k; powerW=0.25,D-10K,"1: 0.05, 100: 0.01",100,100,USD',
  'Relay 12 V DPDT,relay,coilV=12; contactCarryA=2,D-RL12,"1: 2.10; 10: 1.80",1,1,USD',
].join('\r\n');

function importList(p: ReturnType<typeof project>, csv: string) {
  const preview = previewImport(csv, opts);
  const plan = planImport(preview);
  if (!plan.ok) throw new Error(JSON.stringify(plan.errors));
  const update = planCatalogUpdate(p, plan.rows);
  return { preview, update, after: applyCatalogUpdate(p, update, { removeGone: true, makeId, rows: plan.rows }) };
}

describe('catalog import: columns and cells', () => {
  it('guesses a supplier list’s columns (a catalog reads breaks, minimum order and multiple)', () => {
    const m = guessMapping(
      ['Description', 'Category', 'Ratings', 'SKU', 'Price breaks', 'MOQ', 'Pack size', 'Currency'],
      'catalog',
    );
    expect(m).toMatchObject({
      description: 0,
      category: 1,
      ratings: 2,
      sku: 3,
      breaks: 4,
      minOrder: 5,
      multiple: 6,
      currency: 7,
      supplier: null,
      quantity: null,
    });
    // a parts list does not read those columns
    expect(guessMapping(['Description', 'MOQ'], 'parts-list').minOrder).toBeNull();
  });

  it('reads breaks in each currency’s minor unit (ISO 4217: JPY 0, USD 2, KWD 3 decimals)', () => {
    expect(parseBreakCell('1: 150, 100: 120', 'JPY', '.')).toEqual({
      ok: true,
      breaks: [{ minQty: 1, unitPriceCents: 150 }, { minQty: 100, unitPriceCents: 120 }],
    });
    expect(parseBreakCell('1: 0.125; 10: 0.1', 'KWD', '.')).toEqual({
      ok: true,
      breaks: [{ minQty: 1, unitPriceCents: 125 }, { minQty: 10, unitPriceCents: 100 }],
    });
    expect(parseBreakCell('1: 1,25; 10: 0,95', 'EUR', ',')).toEqual({
      ok: true,
      breaks: [{ minQty: 1, unitPriceCents: 125 }, { minQty: 10, unitPriceCents: 95 }],
    });
    expect(parseBreakCell('1: 150.5', 'JPY', '.').ok).toBe(false);
  });

  it('every bad cell gets a message naming its row and column; nothing is planned', () => {
    const csv = [
      'Description,Category,Ratings,SKU,Price breaks,Min order,Multiple,Currency',
      'Capacitor,capacitor,voltageV=-5,X1,"1: 0.10",1,1,USD', // row 2: a rating out of its range
      'Resistor,resistor,,X2,"1: 0.10, 1: 0.20",1,1,USD', // row 3: quantity 1 twice
      'Fuse,fuse,type=Q,X3,"1: 0.30",0,1,USD', // row 4: fuse type not T/F, minimum order 0
      'Relay,relay,,X4,"ten: 1.00",1,2.5,US', // row 5: break text, multiple not whole, currency code
      'Toroid,core,,X5,,1,1,USD', // row 6: no price at all
    ].join('\n');
    const preview = previewImport(csv, opts);
    const cells = preview.rows.flatMap((r) => r.errors.map((e) => `${e.row}/${e.column}`));
    expect(cells).toEqual([
      '2/Ratings',
      '3/Price breaks',
      '4/Ratings',
      '4/Min order',
      '5/Currency',
      '5/Price breaks',
      '5/Multiple',
      '6/Unit price',
    ]);
    expect(preview.rows.every((r) => r.errors.every((e) => e.message.length > 10))).toBe(true);
    expect(planImport(preview).ok).toBe(false);
  });

  it('a rating name the category does not have is a warning naming row and column (kept, not checked)', () => {
    const csv = 'Description,Category,Ratings,SKU,Price\nCapacitor,capacitor,voltagV=35,X1,0.10';
    const row = previewImport(csv, opts).rows[0];
    expect(row.errors).toEqual([]);
    expect(row.warnings.map((w) => [w.row, w.column])).toEqual([[2, 'Ratings'], [2, 'Ratings']]);
    // the category's ratings by name (parts-categories.ts), and a note that key=value is the older form
    expect(row.warnings[0].message).toMatch(/^"voltagV" is not a rating of a capacitor \(Capacitance, Rated voltage,/);
    expect(row.warnings[1].message).toBe('written as key=value (the older form), read as "voltagV=35".');
  });

  it('a list with neither a supplier column nor a supplier name is refused as a whole', () => {
    const preview = previewImport('Description,SKU,Price\nRelay,R1,1.00', { kind: 'catalog', defaultCurrency: 'USD' });
    expect(preview.fileErrors.map((e) => e.column)).toEqual(['Supplier']);
  });
});

describe('catalog import: an updated list round trip', () => {
  const start = project({
    parts: [
      part('p-old', [offer({ id: 'o-other', supplier: 'Echo', breaks: [{ minQty: 1, unitPriceCents: 99 }] })], {
        description: 'Fuse 1 A T 5x20',
        category: 'fuse',
      }),
    ],
    bom: [],
  });

  it('the first import adds new parts, and an offer on the part it already has', () => {
    const { update, after } = importList(start, LIST_V1);
    expect(update.counts).toMatchObject({ 'new-part': 2, 'new-offer': 1, gone: 0 });
    expect(update.newSuppliers).toEqual(['Delta Parts']);
    expect(after.parts).toHaveLength(3);
    const cap = after.parts.find((p) => p.description.startsWith('Electrolytic'))!;
    // "capacitanceF=4700u" is 4.7e-3 F; breaks as written, in cents
    expect(cap.ratings).toMatchObject({ capacitanceF: 4700e-6, voltageV: 35, rippleA: 2.4 });
    expect(cap.offers[0]).toMatchObject({
      supplier: 'Delta Parts',
      sku: 'D-4700',
      breaks: [{ minQty: 1, unitPriceCents: 120 }, { minQty: 10, unitPriceCents: 95 }],
    });
    const res = after.parts.find((p) => p.description.startsWith('Resistor'))!;
    expect(res.offers[0]).toMatchObject({ minOrder: 100, orderMultiple: 100 });
    // the fuse row joins the existing fuse part (same description and category) as a second offer
    expect(after.parts[0].offers.map((o) => o.supplier)).toEqual(['Echo', 'Delta Parts']);
  });

  it('re-importing the same list changes nothing', () => {
    const once = importList(start, LIST_V1).after;
    const again = importList(once, LIST_V1);
    expect(again.update.counts).toMatchObject({ same: 3, up: 0, down: 0, 'new-part': 0, 'new-offer': 0, gone: 0 });
    expect(again.after.parts).toEqual(once.parts);
  });

  it('the updated list: capacitor up, resistor down, relay new, fuse gone; offers keep their ids', () => {
    const once = importList(start, LIST_V1).after;
    const { update, after } = importList(once, LIST_V2);
    const moves = update.changes.map((c) => `${c.kind === 'changed' ? c.move : c.kind}:${c.sku}`);
    expect(moves).toEqual(['up:D-4700', 'down:D-10K', 'new-part:D-RL12', 'gone:D-F1T']);
    const capBefore = once.parts.find((p) => p.description.startsWith('Electrolytic'))!.offers[0];
    const capAfter = after.parts.find((p) => p.description.startsWith('Electrolytic'))!.offers[0];
    expect(capAfter.id).toBe(capBefore.id);
    expect(capAfter.breaks).toEqual([{ minQty: 1, unitPriceCents: 130 }, { minQty: 10, unitPriceCents: 95 }]);
    // the gone offer is removed; the other supplier's offer for the fuse stays
    expect(after.parts[0].offers.map((o) => o.supplier)).toEqual(['Echo']);
    expect(after.parts.map((p) => p.description)).toContain('Relay 12 V DPDT');
  });

  it('a refused row’s offer is still listed: never counted as gone', () => {
    const once = importList(start, LIST_V1).after;
    const csv = LIST_V1.replace('D-F1T,0.30,10,10', 'D-F1T,0.30,ten,10');
    const preview = previewImport(csv, opts);
    const plan = planImport(preview, { takeGoodRows: true });
    if (!plan.ok) throw new Error('expected a plan');
    const refused = preview.rows.filter((r) => r.errors.length).map((r) => r.values);
    expect(refused.map((r) => r.sku)).toEqual(['D-F1T']);
    expect(planCatalogUpdate(once, plan.rows, refused).counts.gone).toBe(0);
    expect(planCatalogUpdate(once, plan.rows).counts.gone).toBe(1);
  });

  it('an offer named twice in one file is refused by row', () => {
    const csv = `${LIST_V1}\r\nElectrolytic 4700 µF 35 V,capacitor,,d-4700 ,"1: 1.00",1,1,USD`;
    const plan = planImport(previewImport(csv, opts));
    if (!plan.ok) throw new Error('expected a plan');
    expect(planCatalogUpdate(start, plan.rows).errors).toEqual([expect.objectContaining({ row: 5 })]);
  });

  it('price moves: up, down, mixed, terms', () => {
    const o = (breaks: [number, number][], extra = {}) =>
      offer({
        id: 'x',
        supplier: 'S',
        breaks: breaks.map(([minQty, unitPriceCents]) => ({ minQty, unitPriceCents })),
        ...extra,
      });
    expect(priceMove(o([[1, 10], [10, 8]]), o([[1, 11], [10, 8]]))).toBe('up');
    expect(priceMove(o([[1, 10]]), o([[1, 10], [10, 8]]))).toBe('down'); // from 10 pieces 8 instead of 10
    expect(priceMove(o([[1, 10], [10, 8]]), o([[1, 9], [10, 9]]))).toBe('mixed');
    expect(priceMove(o([[1, 10]]), o([[1, 10]], { minOrder: 5 }))).toBe('terms');
  });
});
