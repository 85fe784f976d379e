// Edits of the parts catalog as pure functions: parts, their supplier offers, suppliers (a rename follows into the
// offers) and the costing settings. Each returns the new project, or field messages keyed by form field name.
import type { Costing, Offer, Part, Project, Supplier } from '../model';

export type EditResult = Project | { errors: Record<string, string> };

export type PartFields = Pick<Part, 'description' | 'category' | 'ratings'>;
export type OfferFields = Omit<Offer, 'id'>;
export type CostingFields = Pick<Costing, 'attritionFraction' | 'sparesPerLine' | 'exchangeRates'>;

const sameName = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();
const withParts = (p: Project, parts: Part[]): Project => ({ ...p, parts });
const withSuppliers = (p: Project, suppliers: Supplier[]): Project => ({ ...p, costing: { ...p.costing, suppliers } });

/** The message for an edit whose item was deleted meanwhile (another window). */
export const gone = (what: string): EditResult => ({
  errors: {
    _form: `That ${what} no longer exists (deleted in another window?). The page now shows the stored catalog.`,
  },
});

export function saveCosting(p: Project, d: CostingFields): EditResult {
  const own = Object.keys(d.exchangeRates).find((k) => sameName(k, p.currency));
  if (own) return { errors: { rates: `${p.currency} is the project currency; it needs no exchange rate` } };
  return { ...p, costing: { ...p.costing, ...d } };
}

/** Add a supplier (index null) or change supplier `index`; a new name is carried into the offers using the old one. */
export function saveSupplier(p: Project, index: number | null, s: Supplier): EditResult {
  const list = p.costing.suppliers;
  if (index !== null && !list[index]) return gone('supplier');
  if (list.some((x, i) => i !== index && sameName(x.name, s.name))) {
    return { errors: { name: `Supplier “${s.name}” is already in the list` } };
  }
  if (index === null) return withSuppliers(p, [...list, s]);
  const old = list[index].name;
  const renamed = (o: Offer): Offer => (sameName(o.supplier, old) ? { ...o, supplier: s.name } : o);
  const parts = p.parts.map((part) => ({ ...part, offers: part.offers.map(renamed) }));
  return withSuppliers({ ...p, parts }, list.map((x, i) => (i === index ? s : x)));
}

export const addPart = (p: Project, id: string, d: PartFields): EditResult =>
  withParts(p, [...p.parts, { id, ...d, offers: [] }]);

export function savePart(p: Project, partId: string, d: PartFields): EditResult {
  if (!p.parts.some((x) => x.id === partId)) return gone('part');
  return withParts(p, p.parts.map((x) => (x.id === partId ? { ...x, ...d } : x)));
}

/** Add an offer to part `partId` (offerId new) or replace offer `offerId`. */
export function saveOffer(p: Project, partId: string, offerId: string, d: OfferFields, isNew: boolean): EditResult {
  const part = p.parts.find((x) => x.id === partId);
  if (!part) return gone('part');
  if (!isNew && !part.offers.some((o) => o.id === offerId)) return gone('offer');
  const offer: Offer = { id: offerId, ...d };
  const offers = isNew ? [...part.offers, offer] : part.offers.map((o) => (o.id === offerId ? offer : o));
  return withParts(p, p.parts.map((x) => (x.id === partId ? { ...x, offers } : x)));
}
