// One catalog part: its own form, one form per supplier offer, and a form to add an offer.
import type { FC } from 'hono/jsx';
import type { Offer, Part, Project } from '../../src/core/model';
import { formValues, offerSpec, partSpec } from '../../src/core/spec';
import { ratingKeysHelp } from '../../src/core/spec/parts-categories';
import { FormErrors, type FieldState } from './fields';
import { SpecField } from './spec-fields';
import { stateFor, type Failed } from './failed';
import { Version, hx } from './supply-transformer';

// Form text of stored values, from the specs (src/core/spec/parts.ts); a new part or offer starts with empty boxes.
export function partValues(p: Part | null): Record<string, string> {
  return p ? formValues(partSpec, p) : { description: '', category: '', ratings: '' };
}

export function offerValues(o: Offer | null, currency: string): Record<string, string> {
  if (o) return formValues(offerSpec, o);
  return { ...formValues(offerSpec, { minOrder: 1, orderMultiple: 1 }), currency };
}

// The help lines show on the add forms only: repeated under every stored row they push the rows apart.
const OfferFields: FC<{ state: FieldState; idp: string; help?: boolean }> = ({ state, idp, help }) => (
  <>
    <SpecField spec={offerSpec} k="supplier" idp={idp} state={state} size={20} list="supplier-names" />
    <SpecField spec={offerSpec} k="sku" idp={idp} state={state} size={10} hint="" />
    <SpecField spec={offerSpec} k="currency" idp={idp} state={state} size={4} hint="" />
    <SpecField spec={offerSpec} k="breaks" idp={idp} state={state} size={24} hint={help ? undefined : ''} />
    <SpecField spec={offerSpec} k="minOrder" idp={idp} state={state} size={4} label="Min. order" />
    <SpecField spec={offerSpec} k="orderMultiple" idp={idp} state={state} size={4} label="Multiple" />
    <SpecField spec={offerSpec} k="stockNote" idp={idp} state={state} size={10} />
  </>
);

export const PartFields: FC<{ state: FieldState; idp: string; help?: boolean }> = ({ state, idp, help }) => (
  <>
    <SpecField spec={partSpec} k="description" idp={idp} state={state} size={56} hint={help ? undefined : ''} />
    <SpecField spec={partSpec} k="category" idp={idp} state={state} size={16} list="part-categories" />
    {/* the ratings the part's category is checked with (design roles), e.g. "Heatsink: thetaSaKPerW (K/W)" */}
    <SpecField spec={partSpec} k="ratings" idp={idp} state={state} size={48} hint={`${help ? `${partSpec.fields.ratings.help} · ` : ''}${ratingKeysHelp(state.values.category ?? '')}`} />
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
          <OfferFields state={addState} idp={`ao-${part.id}`} help />
          <button type="submit">Add offer</button>
        </div>
      </form>
    </details>
  );
};
