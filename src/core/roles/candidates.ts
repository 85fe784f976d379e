// Catalog parts that meet a role's requirement, ranked by what buying them costs at the group quantity: the
// quantity the bound line needs (or the role's pieces per rig for an unbound role) for all kits with attrition and
// spares, each offer priced by its least-cost order (price breaks, minimum order, multiple), converted to the
// project currency. Shipping is apportioned so: a supplier the plan already uses for another line adds nothing (its
// charge is paid anyway); a supplier the plan does not otherwise use adds its full shipping charge. Common practice,
// no published source: the marginal cost of choosing the candidate, with the rest of the plan held as it is.
import type { Part, Project } from '../model';
import { convertCents, minorRate, rateFor } from '../cost/money';
import { supplierShipping } from '../cost/cost-project';
import { bestQuote, neededQty, validBreaks } from '../cost/quantities';
import { kitsOf } from '../cost/line-options';
import { groupOf, partMeetsRole } from './role-checks';
import type { DesignRole } from './types';
import { formatValue } from '../units';

export interface Candidate {
  partId: string;
  description: string;
  /** Pieces to buy for the build (the group quantity). */
  neededQty: number;
  /** Parts cost of the chosen offer, project-currency minor units; null = no usable price. */
  costCents: number | null;
  /** Shipping the candidate adds (0 when the plan already uses its supplier); null when unpriced. */
  shippingCents: number | null;
  /** costCents + shippingCents: what the ranking compares; null when unpriced. */
  totalCents: number | null;
  /** Why shipping was counted as 0 although the supplier is new to the plan (no shipping entry, no rate). */
  shippingNote: string | null;
  /** The offer that gives it: supplier and pieces ordered (raised to a break or multiple when that is cheaper). */
  supplier: string | null;
  orderQty: number | null;
  /** True for the part the role's line is bound to now. */
  bound: boolean;
  /** For a grouped role: the value of the group the part fills ("400 mA", "270 pF"); null otherwise. */
  group: string | null;
}

/** Shipping a candidate adds for a supplier: 0 for one the plan already uses, else its charge (null: unknown). */
export type ShippingOf = (supplier: string) => { cents: number; note: string | null };

interface PartCost {
  costCents: number;
  shippingCents: number;
  shippingNote: string | null;
  supplier: string;
  orderQty: number;
}

/**
 * Least cost of `needed` pieces of a part over its offers, in project minor units (null when none is usable): the
 * parts cost plus the shipping `shippingOf` says the offer's supplier adds (none when not given).
 */
export function partCost(project: Project, part: Part, needed: number, shippingOf?: ShippingOf): PartCost | null {
  let best: PartCost | null = null;
  for (const offer of part.offers) {
    if (!validBreaks(offer.breaks).length) continue;
    const rate = rateFor(offer.currency, project.currency, project.costing.exchangeRates);
    const q = bestQuote(needed, offer);
    if (rate === null || q === null) continue;
    const costCents = convertCents(q.costCents, minorRate(rate, offer.currency, project.currency));
    if (!Number.isSafeInteger(costCents)) continue;
    const ship = shippingOf ? shippingOf(offer.supplier) : { cents: 0, note: null };
    const total = costCents + ship.cents;
    if (best === null || total < best.costCents + best.shippingCents)
      best = {
        costCents,
        shippingCents: ship.cents,
        shippingNote: ship.note,
        supplier: offer.supplier,
        orderQty: q.qty,
      };
  }
  return best;
}

/**
 * The shipping rule of the ranking: suppliers the plan uses for lines other than the role's own add nothing; any
 * other supplier adds its full charge. `planSuppliers` maps each parts-list line id to its chosen supplier.
 */
export function shippingForRole(
  project: Project,
  role: DesignRole,
  planSuppliers: ReadonlyMap<string, string | null>,
): ShippingOf {
  const own = new Set(project.bom.filter((l) => l.roleId === role.id).map((l) => l.id));
  const used = new Set<string>();
  for (const [lineId, supplier] of planSuppliers)
    if (!own.has(lineId) && supplier) used.add(supplier.trim().toLowerCase());
  return (supplier) => {
    if (used.has(supplier.trim().toLowerCase())) return { cents: 0, note: null };
    const s = supplierShipping(project, supplier);
    return s.ok ? { cents: s.cents, note: null } : { cents: 0, note: s.message };
  };
}

/** Pieces the role needs for the build: its bound line's quantity per rig (else the role's), all kits, spares. */
export function roleNeededQty(project: Project, role: DesignRole, part?: Pick<Part, 'category' | 'ratings'>): number {
  const spares = (perRig: number) =>
    neededQty(perRig, kitsOf(project), project.costing.attritionFraction, project.costing.sparesPerLine);
  // a grouped role: a part with one of its values is needed as many times per rig as the design uses that value
  const group = part ? groupOf(role, part) : null;
  if (group) return spares(group.count);
  const line = project.bom.find((l) => l.roleId === role.id);
  const perRig = line && Number.isFinite(line.qtyPerRig) && line.qtyPerRig > 0 ? line.qtyPerRig : role.qtyPerRig;
  return spares(perRig);
}

/**
 * The catalog parts meeting the role, cheapest first (unpriced last, then by description). With the plan's suppliers
 * per line, a candidate's cost includes the shipping it adds (shippingForRole); without, shipping is left out.
 */
export function candidatesFor(
  project: Project,
  role: DesignRole,
  planSuppliers?: ReadonlyMap<string, string | null>,
): Candidate[] {
  const boundIds = new Set(project.bom.filter((l) => l.roleId === role.id).map((l) => l.partId));
  const shippingOf = planSuppliers ? shippingForRole(project, role, planSuppliers) : undefined;
  return project.parts
    .filter((p) => partMeetsRole(p, role))
    .map((p): Candidate => {
      const needed = roleNeededQty(project, role, p);
      const g = groupOf(role, p);
      const unit = g ? (role.rules.find((r) => r.key === g.key)?.unit ?? '') : '';
      const group = g === null ? null : typeof g.value === 'number' ? formatValue(g.value, unit) : g.value;
      const c = needed > 0 ? partCost(project, p, needed, shippingOf) : null;
      return {
        partId: p.id,
        description: p.description,
        neededQty: needed,
        costCents: c?.costCents ?? null,
        shippingCents: c?.shippingCents ?? null,
        totalCents: c ? c.costCents + c.shippingCents : null,
        shippingNote: c?.shippingNote ?? null,
        supplier: c?.supplier ?? null,
        orderQty: c?.orderQty ?? null,
        bound: boundIds.has(p.id),
        group,
      };
    })
    .sort(
      (a, b) => (a.totalCents ?? Infinity) - (b.totalCents ?? Infinity) || a.description.localeCompare(b.description),
    );
}
