// The costing result: plain JSON (no Infinity, no NaN, no Maps). Money is integer minor units
// ("cents") of the project currency unless a key says "offer currency".

import type { Finding } from '../findings';
import type { StageKind } from '../model';
import type { CostSection } from './sections';
import type { PlanMethod } from './supplier-plan';

/** Why a line is not (fully) priced or is otherwise suspect. */
export type LineFlag =
  | 'unknown-part' // line.partId matches no part
  | 'unknown-stage' // line.stageId matches no stage; costed under General
  | 'bad-qty' // qtyPerRig negative, not a number, or over 10 million pieces needed; nothing ordered
  | 'too-large' // every priced offer gives a cost too large to add up exactly (absurd price or rate)
  | 'zero-qty' // nothing needed (qtyPerRig 0 or kits 0)
  | 'no-offer' // the part has no supplier offers
  | 'no-price' // offers exist but none has a usable price break
  | 'no-rate'; // priced offers exist but none in a currency with an exchange rate

/** The plan bought more than the plain order because a price break or multiple made that cheaper. */
export interface QuantityRaise {
  /** Pieces the plain rule would order from the same offer (need raised to minimum order, lowest break, multiple). */
  plainQty: number;
  /** Extra pieces bought over plainQty. */
  extraQty: number;
  /** Line cost at plainQty from the same offer, project-currency minor units. */
  plainCostCents: number;
  /** plainCostCents minus the line cost (> 0), project-currency minor units. */
  savingCents: number;
}

export interface CostLine {
  lineId: string;
  partId: string;
  /** Part description ('' when the part is unknown). */
  description: string;
  /** The part's ratings.value as text (e.g. "100 nF"), '' when none. */
  value: string;
  category: string;
  /** Reference designators as entered. */
  refs: string;
  /** The design role the line is bound to, null = none. */
  roleId: string | null;
  /** Pieces per rig. */
  qtyPerRig: number;
  stageId: string | null;
  /** Stage name, "General" for no stage. */
  stageName: string;
  section: CostSection;
  /** Pieces needed for the build: ceil(qtyPerRig x kits x (1 + attrition)) + spares. */
  neededQty: number;
  /** Pieces ordered from the chosen offer: the least-cost allowed quantity >= need; 0 if none. */
  orderQty: number;
  /** Minimum quantity of the price break that sets the unit price; null when unpriced. */
  breakMinQty: number | null;
  /** Chosen supplier name, null when unpriced. */
  supplier: string | null;
  offerId: string | null;
  sku: string | null;
  /** Currency of the chosen offer (ISO code), null when unpriced. */
  offerCurrency: string | null;
  /** Unit price at orderQty, minor units of the offer currency. */
  unitPriceCents: number | null;
  /** orderQty x unitPriceCents, minor units of the offer currency. */
  offerCostCents: number | null;
  /** Project-currency units per 1 offer-currency unit used for this line. */
  exchangeRate: number | null;
  /** Line cost in project-currency minor units, rounded half-up once per line; 0 when unpriced. */
  lineCostCents: number;
  /** Set when the plan buys more than the plain order because that costs less; null otherwise. */
  raised: QuantityRaise | null;
  flags: LineFlag[];
}

export interface StageSubtotal {
  stageId: string | null;
  /** Stage name, "General" for lines with no stage. */
  name: string;
  kind: StageKind | null;
  /** Line ids in this group, in BOM order. */
  lineIds: string[];
  /** Sum of lineCostCents, project-currency minor units (shipping not included). */
  partsCents: number;
}

export interface SectionSubtotal {
  section: CostSection;
  label: string;
  /** Sum of lineCostCents in the section, project-currency minor units. */
  partsCents: number;
  lineCount: number;
}

export interface SupplierUse {
  supplier: string;
  /** Lines bought there. */
  lineCount: number;
  /** Parts bought there, project-currency minor units. */
  partsCents: number;
  /** Shipping charge, project-currency minor units (converted half-up from the supplier's currency). */
  shippingCents: number;
}

export type SingleSupplierComparison =
  | {
      available: true;
      supplier: string;
      /** Parts, project-currency minor units. */
      partsCents: number;
      /** That supplier's shipping, project-currency minor units. */
      shippingCents: number;
      /** partsCents + shippingCents. */
      totalCents: number;
      /** totalCents minus the chosen plan's total (>= 0): what one-stop shopping costs extra. */
      extraCents: number;
      /** Needed lines with no usable price, left out of both totals: the comparison is incomplete when > 0. */
      unpricedLines: number;
    }
  | { available: false; reason: string };

export interface CostTotals {
  /** All line costs, project-currency minor units. */
  partsCents: number;
  /** Shipping of the suppliers used, project-currency minor units. */
  shippingCents: number;
  /** partsCents + shippingCents. */
  buildCents: number;
  /** buildCents / kits rounded half-up; null when kits < 1. */
  perKitCents: number | null;
  /** partsCents / kits rounded half-up; null when kits < 1. */
  perKitPartsCents: number | null;
  /** Lines left out of the totals because they have no usable price. */
  unpricedLines: number;
}

export interface CostReport {
  /** Project currency (ISO code); every "...Cents" key without another note is in it. */
  currency: string;
  /** Number of rigs built (whole number >= 0). */
  kits: number;
  /** Supplier-choice method that ran. */
  method: PlanMethod;
  /** One sentence describing the method and whether the result is proven optimal. */
  methodNote: string;
  /** True when the plan is proven the least total (under one offer per line). */
  proven: boolean;
  /** No plan (one offer per line) costs less than this, project-currency minor units; null when nothing is priced. */
  lowerBoundCents: number | null;
  /** Suppliers that could be chosen (had a usable offer for a needed line). */
  candidateSuppliers: number;
  lines: CostLine[];
  /** Project stage order, then General (no stage) last; only groups with lines. */
  stages: StageSubtotal[];
  /** supply, rf, other, always in that order. */
  sections: SectionSubtotal[];
  /** Suppliers in the chosen plan, by name. */
  suppliers: SupplierUse[];
  singleSupplier: SingleSupplierComparison;
  totals: CostTotals;
  /** Total saved by buying up to a price break or multiple over the plain orders, project-currency minor units. */
  raisedSavingsCents: number;
  findings: Finding[];
  /** The rules applied, in words (rounding, quantities, sections), for reports and the PDF. */
  notes: string[];
}
