// A supplier's price list against the catalog: each good row matched to an offer by supplier and SKU (both compared
// trimmed, any case; a row with no SKU matches by supplier and description), and what importing it would change:
// prices up or down, new offers and parts, and the offers of the listed suppliers the file no longer has. Pure: the
// page shows the changes, and the same function applies them.
import type { Offer, Part, PriceBreak, Project } from '../model';
import { categoryOf } from '../spec/parts-categories';
import type { RowError } from './import-preview';
import type { ImportedRow } from './import-plan';

export type PriceMove = 'up' | 'down' | 'mixed' | 'terms' | 'same';

export type CatalogChange =
  | { kind: 'new-part'; row: number; description: string; supplier: string; sku: string; after: Offer }
  | { kind: 'new-offer'; row: number; partId: string; description: string; supplier: string; sku: string; after: Offer }
  | {
      kind: 'changed';
      move: PriceMove;
      row: number;
      partId: string;
      offerId: string;
      description: string;
      supplier: string;
      sku: string;
      before: Offer;
      after: Offer;
    }
  | {
      kind: 'gone';
      partId: string;
      offerId: string;
      description: string;
      supplier: string;
      sku: string;
      before: Offer;
    };

export interface CatalogUpdate {
  changes: CatalogChange[];
  /** Rows naming an offer an earlier row of the file already named; the update is refused while there are any. */
  errors: RowError[];
  /** Suppliers in the file with no shipping entry in the costing yet. */
  newSuppliers: string[];
  counts: Record<'new-part' | 'new-offer' | 'gone' | PriceMove, number>;
}

const norm = (s: string) => s.trim().toLowerCase();
const offerKey = (supplier: string, sku: string, description: string) =>
  `${norm(supplier)}\u0000${sku.trim() === '' ? `description:${norm(description)}` : norm(sku)}`;
/** The category as stored: the list's id when the text names one, else the text as written. */
const storedCategory = (c: string) =>
  categoryOf(c).id === 'other' && norm(c) !== 'other' ? c.trim() : categoryOf(c).id;

/** Unit price at `qty` from a break list (the largest break at or below it); null below the first break. */
export function priceAt(breaks: readonly PriceBreak[], qty: number): number | null {
  let p: number | null = null;
  for (const b of [...breaks].sort((x, y) => x.minQty - y.minQty)) if (b.minQty <= qty) p = b.unitPriceCents;
  return p;
}

/**
 * Up when no quantity got cheaper and one got dearer, down the other way, mixed when both; compared at every break
 * quantity of either list. Same prices but another minimum order, multiple or currency: 'terms'.
 */
export function priceMove(before: Offer, after: Offer): PriceMove {
  if (norm(before.currency) !== norm(after.currency)) return 'terms';
  let up = false;
  let down = false;
  for (const q of new Set([...before.breaks, ...after.breaks].map((b) => b.minQty))) {
    const a = priceAt(before.breaks, q);
    const b = priceAt(after.breaks, q);
    if (a === null || b === null) {
      if (a !== b) up = down = true; // a quantity priced in one list only: neither simply up nor down
    } else if (b > a) up = true;
    else if (b < a) down = true;
  }
  if (up && down) return 'mixed';
  if (up) return 'up';
  if (down) return 'down';
  return before.minOrder !== after.minOrder || before.orderMultiple !== after.orderMultiple ? 'terms' : 'same';
}

function offerOf(r: ImportedRow, id: string, stockNote = ''): Offer {
  const c = r.catalog;
  return {
    id, supplier: r.supplier, sku: r.sku, currency: r.currency ?? '', breaks: c?.breaks ?? [],
    minOrder: c?.minOrder ?? 1, orderMultiple: c?.orderMultiple ?? 1, stockNote,
  };
}

/**
 * What importing the good rows of a supplier list into the project would change. `refused` are the file's rows left
 * out (good rows only): the offers they name are still listed, so they are never counted as gone.
 */
export function planCatalogUpdate(
  project: Pick<Project, 'parts' | 'costing'>,
  rows: readonly ImportedRow[],
  refused: readonly Pick<ImportedRow, 'supplier' | 'sku' | 'description' | 'value'>[] = [],
): CatalogUpdate {
  const existing = new Map<string, { part: Part; offer: Offer }>();
  for (const part of project.parts)
    for (const offer of part.offers)
      existing.set(offerKey(offer.supplier, offer.sku, part.description), { part, offer });
  const changes: CatalogChange[] = [];
  const errors: RowError[] = [];
  const seen = new Map<string, number>();
  const newPartKeys = new Set<string>();
  for (const r of rows) {
    const description = r.description || r.value;
    const key = offerKey(r.supplier, r.sku, description);
    const first = seen.get(key);
    if (first !== undefined) {
      errors.push({
        row: r.row,
        column: null,
        message: `Supplier “${r.supplier}”${r.sku ? `, SKU “${r.sku}”` : ''} is already in row ${first}` +
          `; each offer once per file.`,
      });
      continue;
    }
    seen.set(key, r.row);
    const hit = existing.get(key);
    if (hit) {
      const after = offerOf(r, hit.offer.id, hit.offer.stockNote);
      changes.push({
        kind: 'changed',
        move: priceMove(hit.offer, after),
        row: r.row,
        partId: hit.part.id,
        offerId: hit.offer.id,
        description: hit.part.description,
        supplier: hit.offer.supplier,
        sku: hit.offer.sku,
        before: hit.offer,
        after,
      });
      continue;
    }
    const same = project.parts.find(
      (p) =>
        norm(p.description) === norm(description) &&
        categoryOf(p.category).id === categoryOf(r.category).id &&
        norm(storedCategory(p.category)) === norm(storedCategory(r.category)),
    );
    if (same)
      changes.push({
        kind: 'new-offer',
        row: r.row,
        partId: same.id,
        description: same.description,
        supplier: r.supplier,
        sku: r.sku,
        after: offerOf(r, ''),
      });
    else {
      changes.push({
        kind: 'new-part',
        row: r.row,
        description,
        supplier: r.supplier,
        sku: r.sku,
        after: offerOf(r, ''),
      });
      newPartKeys.add(`${norm(description)}\u0000${norm(storedCategory(r.category))}`);
    }
  }
  // offers of the suppliers this file lists that the file no longer has
  const listed = new Set(rows.map((r) => norm(r.supplier)));
  const stillListed = new Set(refused.map((r) => offerKey(r.supplier, r.sku, r.description || r.value)));
  for (const [key, { part, offer }] of existing)
    if (listed.has(norm(offer.supplier)) && !seen.has(key) && !stillListed.has(key))
      changes.push({
        kind: 'gone',
        partId: part.id,
        offerId: offer.id,
        description: part.description,
        supplier: offer.supplier,
        sku: offer.sku,
        before: offer,
      });
  const known = new Set(project.costing.suppliers.map((s) => norm(s.name)));
  const newSuppliers = [
    ...new Map(rows.filter((r) => !known.has(norm(r.supplier))).map((r) => [norm(r.supplier), r.supplier])).values(),
  ];
  const counts = { 'new-part': 0, 'new-offer': 0, gone: 0, up: 0, down: 0, mixed: 0, terms: 0, same: 0 };
  for (const c of changes) counts[c.kind === 'changed' ? c.move : c.kind]++;
  counts['new-part'] = newPartKeys.size;
  return { changes, errors, newSuppliers, counts };
}

export interface ApplyOptions {
  /** Remove the offers the file no longer lists (default: keep them). */
  removeGone: boolean;
  makeId: (kind: 'part' | 'offer', n: number) => string;
  /** Rows for new parts, to take their category and ratings from. */
  rows: readonly ImportedRow[];
}

/** The catalog with the update applied: offers changed in place (their ids kept), new offers and parts added. */
export function applyCatalogUpdate<P extends Pick<Project, 'parts'>>(
  project: P,
  update: CatalogUpdate,
  opts: ApplyOptions,
): P {
  const byRow = new Map(opts.rows.map((r) => [r.row, r]));
  const changed = new Map<string, Offer>();
  const added = new Map<string, Offer[]>();
  const gone = new Set<string>();
  const newParts: Part[] = [];
  const newPartByKey = new Map<string, Part>();
  let offers = 0;
  for (const c of update.changes) {
    if (c.kind === 'changed') changed.set(c.offerId, c.after);
    else if (c.kind === 'gone') {
      if (opts.removeGone) gone.add(c.offerId);
    } else if (c.kind === 'new-offer')
      added.set(c.partId, [...(added.get(c.partId) ?? []), { ...c.after, id: opts.makeId('offer', offers++) }]);
    else {
      const r = byRow.get(c.row);
      const category = storedCategory(r?.category ?? '');
      const key = `${norm(c.description)}\u0000${norm(category)}`;
      let part = newPartByKey.get(key);
      if (!part) {
        const ratings = { ...(r?.value ? { value: r.value } : {}), ...(r?.catalog?.ratings ?? {}) };
        part = { id: opts.makeId('part', newParts.length), description: c.description, category, ratings, offers: [] };
        newParts.push(part);
        newPartByKey.set(key, part);
      }
      part.offers.push({ ...c.after, id: opts.makeId('offer', offers++) });
    }
  }
  const parts = project.parts.map((p) => ({
    ...p,
    offers: [...p.offers.filter((o) => !gone.has(o.id)).map((o) => changed.get(o.id) ?? o), ...(added.get(p.id) ?? [])],
  }));
  return { ...project, parts: [...parts, ...newParts] };
}
