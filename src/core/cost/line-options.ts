// Per-line preparation: needed quantity, flags and every usable offer priced in the project currency.

import type { Offer, Project, Stage } from '../model';
import { convertCents, minorRate, rateFor } from './money';
import { bestQuote, neededQty, quoteOffer, validBreaks, type OfferQuote } from './quantities';
import type { LineFlag } from './report-types';
import { sectionOf, type CostSection } from './sections';

export interface OfferOption {
  offer: Offer;
  /** The least-cost order from this offer (possibly raised to a price break or multiple). */
  quote: OfferQuote;
  /** The plain order: need raised only to the minimum order, lowest break and multiple. */
  plain: OfferQuote;
  /** Project-currency units per offer-currency unit (major units, as the rate table holds it). */
  rate: number;
  /** Project-currency minor units per offer-currency minor unit (ISO 4217 minor units of each). */
  minorRate: number;
  /** quote.costCents converted half-up, project-currency minor units. */
  costCents: number;
}

export interface LineContext {
  lineId: string;
  partId: string;
  description: string;
  value: string;
  category: string;
  refs: string;
  /** The design role the line is bound to (src/core/roles), null = none. */
  roleId: string | null;
  qtyPerRig: number;
  stage: Stage | null;
  stageName: string;
  section: CostSection;
  neededQty: number;
  flags: LineFlag[];
  /** Usable offers, empty when the line is unpriced or needs nothing. */
  options: OfferOption[];
}

export const GENERAL_STAGE_NAME = 'General';

/** More pieces than this on one line is taken as a typing error (flag 'bad-qty'), not a purchase. */
export const MAX_PIECES_PER_LINE = 1e7;

/** Whole number of kits (floor), 0 when the entry is not a finite number >= 1. */
export function kitsOf(project: Project): number {
  return Number.isFinite(project.kits) && project.kits >= 1 ? Math.floor(project.kits) : 0;
}

export function prepareLines(project: Project): LineContext[] {
  const parts = new Map(project.parts.map((p) => [p.id, p]));
  const stages = new Map(project.stages.map((s) => [s.id, s]));
  const kits = kitsOf(project);
  const { attritionFraction, sparesPerLine, exchangeRates } = project.costing;

  return project.bom.map((line) => {
    const flags: LineFlag[] = [];
    const part = parts.get(line.partId) ?? null;
    if (part === null) flags.push('unknown-part');
    let stage: Stage | null = null;
    if (line.stageId !== null) {
      stage = stages.get(line.stageId) ?? null;
      if (stage === null) flags.push('unknown-stage');
    }
    const category = part?.category ?? '';
    const qtyOk = Number.isFinite(line.qtyPerRig) && line.qtyPerRig >= 0;
    if (!qtyOk) flags.push('bad-qty');
    const raw = qtyOk ? neededQty(line.qtyPerRig, kits, attritionFraction, sparesPerLine) : 0;
    const absurd = !(raw <= MAX_PIECES_PER_LINE);
    if (qtyOk && absurd) flags.push('bad-qty');
    const needed = absurd ? 0 : raw;
    if (qtyOk && !absurd && needed === 0) flags.push('zero-qty');

    const options: OfferOption[] = [];
    let overflow = false;
    if (part !== null && needed > 0) {
      const offers = part.offers;
      const priced = offers.filter((o) => validBreaks(o.breaks).length > 0);
      if (offers.length === 0) flags.push('no-offer');
      else if (priced.length === 0) flags.push('no-price');
      for (const offer of priced) {
        const rate = rateFor(offer.currency, project.currency, exchangeRates);
        const plain = quoteOffer(needed, offer);
        const quote = bestQuote(needed, offer);
        if (rate === null || quote === null || plain === null) continue;
        // Absurd prices or rates would leave exact integer arithmetic: such an offer is not used.
        const worst = Math.max(quote.costCents, plain.costCents);
        const toMinor = minorRate(rate, offer.currency, project.currency);
        if (!Number.isSafeInteger(worst) || !(worst * toMinor < Number.MAX_SAFE_INTEGER)) {
          overflow = true;
          continue;
        }
        options.push({
          offer,
          quote,
          plain,
          rate,
          minorRate: toMinor,
          costCents: convertCents(quote.costCents, toMinor),
        });
      }
      if (priced.length > 0 && options.length === 0) flags.push(overflow ? 'too-large' : 'no-rate');
    }

    return {
      lineId: line.id,
      partId: line.partId,
      description: part?.description ?? '',
      value: part === null || part.ratings.value === undefined ? '' : String(part.ratings.value),
      category,
      refs: line.refs,
      roleId: line.roleId ?? null,
      qtyPerRig: qtyOk ? line.qtyPerRig : 0,
      stage,
      stageName: stage?.name ?? GENERAL_STAGE_NAME,
      section: sectionOf(category, stage?.kind ?? null),
      neededQty: needed,
      flags,
      options,
    };
  });
}

/** Cheapest option per supplier name for a line (ties: first offer id in alphabetical order). */
export function cheapestBySupplier(options: readonly OfferOption[]): Map<string, OfferOption> {
  const best = new Map<string, OfferOption>();
  for (const o of options) {
    const name = o.offer.supplier.trim();
    const cur = best.get(name);
    if (
      cur === undefined ||
      o.costCents < cur.costCents ||
      (o.costCents === cur.costCents && o.offer.id < cur.offer.id)
    ) {
      best.set(name, o);
    }
  }
  return best;
}
