// Catalog parts that meet a role's requirement, ranked by what buying them costs at the group quantity: the
// quantity the bound line needs (or the role's pieces per rig for an unbound role) for all kits with attrition and
// spares, each offer priced by its least-cost order (price breaks, minimum order, multiple), converted to the
// project currency. Shipping is per supplier and shared across lines, so it is not part of a candidate's cost.
import type { Part, Project } from '../model';
import { convertCents, minorRate, rateFor } from '../cost/money';
import { bestQuote, neededQty, validBreaks } from '../cost/quantities';
import { kitsOf } from '../cost/line-options';
import { partMeetsRole } from './role-checks';
import type { DesignRole } from './types';

export interface Candidate {
  partId: string;
  description: string;
  /** Pieces to buy for the build (the group quantity). */
  neededQty: number;
  /** Least cost over its offers, project-currency minor units; null = no usable price. */
  costCents: number | null;
  /** The offer that gives it: supplier and pieces ordered (raised to a break or multiple when that is cheaper). */
  supplier: string | null;
  orderQty: number | null;
  /** True for the part the role's line is bound to now. */
  bound: boolean;
}

/** Least cost of `needed` pieces of a part over its offers, in project minor units (null when none is usable). */
export function partCost(project: Project, part: Part, needed: number): { costCents: number; supplier: string; orderQty: number } | null {
  let best: { costCents: number; supplier: string; orderQty: number } | null = null;
  for (const offer of part.offers) {
    if (!validBreaks(offer.breaks).length) continue;
    const rate = rateFor(offer.currency, project.currency, project.costing.exchangeRates);
    const q = bestQuote(needed, offer);
    if (rate === null || q === null) continue;
    const costCents = convertCents(q.costCents, minorRate(rate, offer.currency, project.currency));
    if (!Number.isSafeInteger(costCents)) continue;
    if (best === null || costCents < best.costCents) best = { costCents, supplier: offer.supplier, orderQty: q.qty };
  }
  return best;
}

/** Pieces the role needs for the build: its bound line's quantity per rig (else the role's), all kits, spares. */
export function roleNeededQty(project: Project, role: DesignRole): number {
  const line = project.bom.find((l) => l.roleId === role.id);
  const perRig = line && Number.isFinite(line.qtyPerRig) && line.qtyPerRig > 0 ? line.qtyPerRig : role.qtyPerRig;
  return neededQty(perRig, kitsOf(project), project.costing.attritionFraction, project.costing.sparesPerLine);
}

/** The catalog parts meeting the role, cheapest first (unpriced last, then by description). */
export function candidatesFor(project: Project, role: DesignRole): Candidate[] {
  const needed = roleNeededQty(project, role);
  const boundIds = new Set(project.bom.filter((l) => l.roleId === role.id).map((l) => l.partId));
  return project.parts
    .filter((p) => partMeetsRole(p, role))
    .map((p) => {
      const c = needed > 0 ? partCost(project, p, needed) : null;
      return { partId: p.id, description: p.description, neededQty: needed, costCents: c?.costCents ?? null, supplier: c?.supplier ?? null, orderQty: c?.orderQty ?? null, bound: boundIds.has(p.id) };
    })
    .sort((a, b) => (a.costCents ?? Infinity) - (b.costCents ?? Infinity) || a.description.localeCompare(b.description));
}
