// Hand-worked examples: the arithmetic in each comment is the outside reference.
import { describe, expect, it } from 'vitest';
import {
  bestQuote,
  breakMinQtyAt,
  neededQty,
  orderQty,
  quoteOffer,
  unitPriceAt,
} from '../../../src/core/cost/quantities';
import { offer } from './fixture';

describe('neededQty', () => {
  it('hand-worked: 3 per rig x 4 kits x 1.10 = 13.2 -> 14, + 2 spares = 16', () => {
    expect(neededQty(3, 4, 0.1, 2)).toBe(16);
  });
  it('hand-worked: 10 x 1 x 1.1 = 11 exactly -> 11 (binary 11.000000000000002 must not become 12)', () => {
    expect(neededQty(10, 1, 0.1, 0)).toBe(11);
  });
  it('no spares for an unused line; bad inputs give 0', () => {
    expect(neededQty(0, 4, 0.1, 2)).toBe(0);
    expect(neededQty(2, 0, 0, 1)).toBe(0);
    expect(neededQty(-1, 4, 0, 1)).toBe(0);
    expect(neededQty(Number.NaN, 4, 0, 1)).toBe(0);
    // Negative attrition treated as 0: 2 x 3 = 6.
    expect(neededQty(2, 3, -0.5, 0)).toBe(6);
  });
});

const breaks = [
  { minQty: 1, unitPriceCents: 12 },
  { minQty: 25, unitPriceCents: 9 },
  { minQty: 100, unitPriceCents: 6 },
];

describe('orderQty and price breaks', () => {
  it('hand-worked: need 16, min order 10, multiple 5 -> max(16, 10) = 16 -> 20', () => {
    expect(orderQty(16, offer({ id: 'a', supplier: 'S', breaks, minOrder: 10, orderMultiple: 5 }))).toBe(20);
  });
  it('hand-worked: need 3, min order 12, multiple 5 -> 12 -> 15 (multiple and >= minimum)', () => {
    expect(orderQty(3, offer({ id: 'a', supplier: 'S', breaks, minOrder: 12, orderMultiple: 5 }))).toBe(15);
  });
  it('hand-worked: breaks start at 50 -> need 16 orders 50', () => {
    const o = offer({ id: 'a', supplier: 'S', breaks: [{ minQty: 50, unitPriceCents: 2 }] });
    expect(orderQty(16, o)).toBe(50);
    expect(quoteOffer(16, o)).toEqual({ qty: 50, unitPriceCents: 2, costCents: 100 });
  });
  it('unit price = break with the highest minQty <= qty (hand-written table lookups)', () => {
    expect(unitPriceAt(breaks, 1)).toBe(12);
    expect(unitPriceAt(breaks, 24)).toBe(12);
    expect(unitPriceAt(breaks, 25)).toBe(9);
    expect(unitPriceAt(breaks, 99)).toBe(9);
    expect(unitPriceAt(breaks, 100)).toBe(6);
    expect(unitPriceAt([...breaks].reverse(), 30)).toBe(9); // order of entry does not matter
    expect(unitPriceAt([{ minQty: 10, unitPriceCents: 5 }], 3)).toBeNull();
  });
  it('hand-worked best quote: plain 20 x 12c = 240c; 25 x 9c = 225c is least; 100 x 6c = 600c is not', () => {
    const o = offer({ id: 'a', supplier: 'S', breaks, minOrder: 10, orderMultiple: 5 });
    expect(quoteOffer(16, o)).toEqual({ qty: 20, unitPriceCents: 12, costCents: 240 });
    expect(bestQuote(16, o)).toEqual({ qty: 25, unitPriceCents: 9, costCents: 225 });
    expect(breakMinQtyAt(o.breaks, 25)).toBe(25);
  });
  it('hand-worked: need 90 -> 90 x 9c = 810c; 100 x 6c = 600c is cheaper (saves 210c)', () => {
    expect(bestQuote(90, offer({ id: 'a', supplier: 'S', breaks }))).toEqual({
      qty: 100,
      unitPriceCents: 6,
      costCents: 600,
    });
  });
  it('hand-worked: need 5 -> 5 x 12c = 60c; 25 x 9c = 225c is dearer: the plain order stays', () => {
    expect(bestQuote(5, offer({ id: 'a', supplier: 'S', breaks }))).toEqual({
      qty: 5,
      unitPriceCents: 12,
      costCents: 60,
    });
  });
  it('hand-worked: a multiple carries the order past a break: need 26, multiple 25 -> 50 x 8c = 400c', () => {
    // 1-29 at 10c, from 30 at 8c; multiple 25: allowed 50, 75, ... 50 is past 30, so 50 x 8c = 400c.
    const o = offer({
      id: 'a',
      supplier: 'S',
      breaks: [{ minQty: 1, unitPriceCents: 10 }, { minQty: 30, unitPriceCents: 8 }],
      orderMultiple: 25,
    });
    expect(bestQuote(26, o)).toEqual({ qty: 50, unitPriceCents: 8, costCents: 400 });
  });
  it('an offer with no usable break has no quote', () => {
    expect(quoteOffer(5, offer({ id: 'a', supplier: 'S', breaks: [] }))).toBeNull();
    expect(quoteOffer(5, offer({ id: 'a', supplier: 'S', breaks: [{ minQty: 1, unitPriceCents: -3 }] }))).toBeNull();
  });
});
