// Quantities and unit prices for one BOM line against one supplier offer. Pure integer arithmetic on
// quantities and minor units; conversion to the project currency happens in offer-cost.ts.

import type { Offer, PriceBreak } from '../model';

// Binary floating point makes 10 x 1.1 = 11.000000000000002; without a tolerance ceil() would buy
// 12. Products within 1e-9 of a whole number are taken as that whole number.
const CEIL_TOLERANCE = 1e-9;

/**
 * Quantity a line needs for the whole build:
 * ceil(qtyPerRig x kits x (1 + attritionFraction)) + sparesPerLine.
 * A line whose base quantity is 0 (qtyPerRig 0 or kits 0) needs nothing: spares are only added to
 * parts that are actually used. Invalid inputs (negative, non-finite) give 0; the caller flags them.
 */
// Common practice, no published source (attrition allowance plus fixed spares per line).
export function neededQty(qtyPerRig: number, kits: number, attritionFraction: number, sparesPerLine: number): number {
  if (!(qtyPerRig > 0) || !Number.isFinite(qtyPerRig) || !(kits > 0) || !Number.isFinite(kits)) return 0;
  const attrition = Number.isFinite(attritionFraction) && attritionFraction > 0 ? attritionFraction : 0;
  const spares = Number.isFinite(sparesPerLine) && sparesPerLine > 0 ? Math.floor(sparesPerLine) : 0;
  const base = qtyPerRig * kits * (1 + attrition);
  return Math.ceil(base - CEIL_TOLERANCE) + spares;
}

/** Price breaks that can be used: finite minQty >= 0 and integer unitPriceCents >= 0, ascending. */
export function validBreaks(breaks: readonly PriceBreak[]): PriceBreak[] {
  return breaks
    .filter(
      (b) =>
        Number.isFinite(b.minQty) && b.minQty >= 0 && Number.isInteger(b.unitPriceCents) && b.unitPriceCents >= 0,
    )
    .map((b) => ({ minQty: Math.ceil(b.minQty), unitPriceCents: b.unitPriceCents }))
    .sort((a, b) => a.minQty - b.minQty || a.unitPriceCents - b.unitPriceCents);
}

/** Order multiple sanitised: a whole number >= 1 (anything else is treated as 1). */
export function orderMultipleOf(offer: Pick<Offer, 'orderMultiple'>): number {
  const m = offer.orderMultiple;
  return Number.isFinite(m) && m >= 1 ? Math.floor(m) : 1;
}

/** Minimum order sanitised: a whole number >= 0. */
export function minOrderOf(offer: Pick<Offer, 'minOrder'>): number {
  const m = offer.minOrder;
  return Number.isFinite(m) && m > 0 ? Math.ceil(m) : 0;
}

/** Round `qty` up to a multiple of `multiple` (>= 1). */
export function roundUpToMultiple(qty: number, multiple: number): number {
  return Math.ceil(qty / multiple) * multiple;
}

/**
 * Quantity actually ordered from an offer: the need raised to the minimum order and to the lowest
 * price break (a supplier quoting from 10 pieces does not sell 3), then rounded up to the order
 * multiple. 0 when nothing is needed. Raising first and rounding last keeps the result both a
 * multiple and >= the minimum.
 */
export function orderQty(needed: number, offer: Offer): number {
  if (needed <= 0) return 0;
  const breaks = validBreaks(offer.breaks);
  const lowestBreak = breaks.length > 0 ? breaks[0].minQty : 0;
  const floor = Math.max(needed, minOrderOf(offer), lowestBreak);
  return roundUpToMultiple(floor, orderMultipleOf(offer));
}

/**
 * Unit price at an ordered quantity: the break with the highest minQty <= qty (the cheaper one when two
 * breaks share a minQty). null when the offer has no usable break at or below qty.
 */
export function unitPriceAt(breaks: readonly PriceBreak[], qty: number): number | null {
  let best: PriceBreak | null = null;
  for (const b of validBreaks(breaks)) {
    if (b.minQty <= qty && (best === null || b.minQty > best.minQty)) best = b;
  }
  return best === null ? null : best.unitPriceCents;
}

export interface OfferQuote {
  /** Pieces ordered. */
  qty: number;
  /** Unit price in minor units of the offer currency. */
  unitPriceCents: number;
  /** qty x unitPriceCents, minor units of the offer currency (exact integer). */
  costCents: number;
}

/** Quote for `needed` pieces from an offer in its own currency, or null when it has no usable price. */
export function quoteOffer(needed: number, offer: Offer): OfferQuote | null {
  if (validBreaks(offer.breaks).length === 0) return null;
  const qty = orderQty(needed, offer);
  if (qty === 0) return { qty: 0, unitPriceCents: 0, costCents: 0 };
  const unit = unitPriceAt(offer.breaks, qty);
  if (unit === null) return null;
  return { qty, unitPriceCents: unit, costCents: qty * unit };
}

/**
 * The least-cost quote for at least `needed` pieces from one offer, over every quantity the offer allows
 * (>= need, >= minimum order, >= lowest break, a whole multiple). Ties go to the smaller quantity.
 * Why the candidates below are enough: between two consecutive break thresholds the unit price is fixed, so
 * the cost grows with the quantity and the cheapest allowed quantity in that interval is the smallest one,
 * i.e. the plain order quantity or a break threshold raised to the minimum order and the multiple. Above the
 * highest threshold the same holds. (Elementary; the brute-force property test checks it.)
 */
export function bestQuote(needed: number, offer: Offer): OfferQuote | null {
  const plain = quoteOffer(needed, offer);
  if (plain === null || plain.qty === 0) return plain;
  let best = plain;
  const multiple = orderMultipleOf(offer);
  for (const b of validBreaks(offer.breaks)) {
    if (b.minQty <= plain.qty) continue;
    const qty = roundUpToMultiple(Math.max(b.minQty, minOrderOf(offer)), multiple);
    const unit = unitPriceAt(offer.breaks, qty);
    if (unit === null) continue;
    const cost = qty * unit;
    if (cost < best.costCents || (cost === best.costCents && qty < best.qty)) {
      best = { qty, unitPriceCents: unit, costCents: cost };
    }
  }
  return best;
}

/** Minimum quantity of the price break that sets the unit price at `qty`; null when none applies. */
export function breakMinQtyAt(breaks: readonly PriceBreak[], qty: number): number | null {
  let best: PriceBreak | null = null;
  for (const b of validBreaks(breaks)) {
    if (b.minQty <= qty && (best === null || b.minQty > best.minQty)) best = b;
  }
  return best === null ? null : best.minQty;
}
