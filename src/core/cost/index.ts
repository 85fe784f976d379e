// Public API of the costing engine.
export { costProject, COST_NOTES, type CostOptions } from './cost-project';
export { formatMoney, convertCents, roundHalfUp, rateFor, centsToMajor } from './money';
export { neededQty, orderQty, unitPriceAt, quoteOffer, bestQuote, breakMinQtyAt, type OfferQuote } from './quantities';
export {
  sectionOf,
  SUPPLY_CATEGORIES,
  RF_STAGE_KINDS,
  COST_SECTION_LABELS,
  SECTION_RULE,
  type CostSection,
} from './sections';
export {
  choosePlan,
  planExact,
  planBranchAndBound,
  planLocalSearch,
  planSingleSupplier,
  DEFAULT_EXACT_LIMIT,
  DEFAULT_NODE_LIMIT,
} from './supplier-plan';
export type { PlanInput, PlanResult, PlanMethod, PlanChoice, BoundResult } from './supplier-plan';
export { orderSheets, type OrderSheet, type OrderSheetLine } from './order-sheet';
export type * from './report-types';
