// One catalog part: its own form, one form per supplier offer, and a form to add an offer.
import type { FC } from 'hono/jsx';
import type { Offer, Part, Project } from '../../src/core/model';
import { FormErrors, type FieldState, Field } from './fields';
import { stateFor, type Failed } from './failed';
import { parseValue } from '../../src/core/units';
import { Version, hx } from './supply-transformer';

// Display text for model values (the inverse of src/web/parts-forms.ts parsing).
export const ratingsText = (r: Record<string, number | string>) =>
  Object.entries(r)
    .map(([k, v]) => `${k}=${typeof v === 'string' && needsQuotes(v) ? JSON.stringify(v) : v}`)
    .join('; ');

/** Text that would not come back as the same text unquoted: it reads as a number, or holds a separator. */
const needsQuotes = (v: string) => v === '' || v !== v.trim() || /[;\n",]/.test(v) || parseValue(v, '').ok;
export const centsText = (cents: number) => (cents / 100).toFixed(2);
export const breaksText = (b: Offer['breaks']) => b.map((x) => `${x.minQty}: ${centsText(x.unitPriceCents)}`).join(', ');

export function partValues(p: Part | null): Record<string, string> {
  return p ? { description: p.description, category: p.category, ratings: ratingsText(p.ratings) } : { description: '', category: '', ratings: '' };
}

export function offerValues(o: Offer | null, currency: string): Record<string, string> {
  if (!o) return { supplier: '', sku: '', currency, breaks: '', minOrder: '1', orderMultiple: '1', stockNote: '' };
  return { supplier: o.supplier, sku: o.sku, currency: o.currency, breaks: breaksText(o.breaks), minOrder: String(o.minOrder), orderMultiple: String(o.orderMultiple), stockNote: o.stockNote };
}

const OfferFields: FC<{ state: FieldState; idp: string }> = ({ state, idp }) => (
  <>
    <Field idp={idp} name="supplier" label="Supplier" state={state} size={20} list="supplier-names" />
    <Field idp={idp} name="sku" label="SKU" state={state} size={12} />
    <Field idp={idp} name="currency" label="Currency" state={state} size={4} />
    <Field idp={idp} name="breaks" label="Price breaks (qty: unit price)" state={state} size={30} />
    <Field idp={idp} name="minOrder" label="Min. order" state={state} size={4} />
    <Field idp={idp} name="orderMultiple" label="Multiple" state={state} size={4} />
    <Field idp={idp} name="stockNote" label="Stock note" state={state} size={14} />
  </>
);

export const PartFields: FC<{ state: FieldState; idp: string }> = ({ state, idp }) => (
  <>
    <Field idp={idp} name="description" label="Description (type and ratings, no brand numbers)" state={state} size={56} />
    <Field idp={idp} name="category" label="Category" state={state} size={16} list="part-categories" />
    <Field idp={idp} name="ratings" label="Ratings (key=value; …)" state={state} size={48} hint="e.g. voltageV=35; rippleA=2.4" />
  </>
);

function offersLine(p: Part): string {
  if (!p.offers.length) return 'no supplier offers';
  const unpriced = p.offers.filter((o) => !o.breaks.length).length;
  return `${p.offers.length} offer(s): ${p.offers.map((o) => o.supplier).join(', ')}${unpriced ? ` (${unpriced} without prices)` : ''}`;
}

export const PartCard: FC<{ project: Project; part: Part; failed?: Failed; uses: number; open?: boolean }> = ({ project, part, failed, uses, open }) => {
  const base = `/projects/${project.id}/parts/${part.id}`;
  const state = stateFor(`part-${part.id}`, failed, () => partValues(part));
  const addState = stateFor(`add-offer-${part.id}`, failed, () => offerValues(null, project.currency));
  const offerStates = part.offers.map((o) => stateFor(`offer-${o.id}`, failed, () => offerValues(o, project.currency)));
  const anyErrors = [state, addState, ...offerStates].some((s) => Object.keys(s.errors).length > 0);
  return (
    <details class="card part" id={`part-${part.id}`} open={anyErrors || open}>
      <summary>
        <strong>{part.description}</strong> <span class="kind">{part.category}</span>{' '}
        <span class="summary-line">
          {offersLine(part)} · {uses ? `used on ${uses} parts-list line(s)` : 'not on the parts list'}
        </span>
      </summary>
      <form {...hx(base, '#parts')} aria-label={`Part ${part.description}`}>
        <Version version={project.version} />
        <FormErrors state={state} />
        <div class="row">
          <PartFields state={state} idp={`p-${part.id}`} />
          <button type="submit">Save part</button>
          <a class="danger" href={`${base}/delete`}>
            Delete part…
          </a>
        </div>
      </form>
      <h3>Supplier offers</h3>
      {part.offers.length ? null : <p class="hint">No offers yet: the parts list shows this part as unpriced.</p>}
      {part.offers.map((o, i) => (
        <form {...hx(`${base}/offers/${o.id}`, '#parts')} class="item-row" aria-label={`Offer ${o.supplier} ${o.sku}`}>
          <Version version={project.version} />
          <FormErrors state={offerStates[i]} />
          <div class="row">
            <OfferFields state={offerStates[i]} idp={`o-${o.id}`} />
            <button type="submit">Save</button>
            <a class="danger" href={`${base}/offers/${o.id}/delete`}>
              Delete…
            </a>
          </div>
        </form>
      ))}
      <form {...hx(`${base}/offers`, '#parts')} class="item-row add" aria-label={`Add an offer for ${part.description}`}>
        <Version version={project.version} />
        <FormErrors state={addState} />
        <div class="row">
          <span class="row-label">Add an offer:</span>
          <OfferFields state={addState} idp={`ao-${part.id}`} />
          <button type="submit">Add offer</button>
        </div>
      </form>
    </details>
  );
};
