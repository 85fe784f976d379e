// One catalog part: its own form, one form per supplier offer, and a form to add an offer.
import type { FC } from 'hono/jsx';
import type { Offer, Part, Project } from '../../src/core/model';
import { formValues, offerSpec, partSpec } from '../../src/core/spec';
import { categoryOf, PART_CATEGORIES } from '../../src/core/spec/parts-categories';
import { ratingBoxSpec, ratingBoxValues } from '../../src/core/spec/rating-boxes';
import { fieldId } from './field-id';
import { FormErrors, type FieldState } from './fields';
import { SpecField } from './spec-fields';
import { stateFor, type Failed } from './failed';
import { Version, hx } from './supply-transformer';

// Form text of stored values, from the specs (src/core/spec/parts.ts); a new part or offer starts with empty boxes.
// The ratings: one box per rating of the category (rating-boxes.ts), the rest as readable text ("Other ratings").
export function partValues(p: Part | null): Record<string, string> {
  if (!p) return { description: '', category: '', ratings: '' };
  return { ...formValues(partSpec, p), ...ratingBoxValues(p) };
}

export function offerValues(o: Offer | null, currency: string): Record<string, string> {
  if (o) return formValues(offerSpec, o);
  return { ...formValues(offerSpec, { minOrder: 1, orderMultiple: 1 }), currency };
}

/** The category list, with a stored name that is not on it (an older alias, or a name of the builder's) kept. */
function categoryOptions(value: string): [string, string][] {
  const list: [string, string][] = PART_CATEGORIES.map((d) => [d.id, d.label]);
  if (value && !PART_CATEGORIES.some((d) => d.id === value)) {
    const d = categoryOf(value);
    list.unshift([value, d.id === 'other' ? `${value} (not on the list: read as Other)` : `${d.label} (${value})`]);
  }
  return list;
}

/**
 * The boxes of one category's ratings, each from its spec (label, display unit, range); swapped on a category
 * change.
 */
export const RatingBoxes: FC<{ state: FieldState; idp: string; category: string }> = ({ state, idp, category }) => {
  const spec = ratingBoxSpec(category);
  const keys = Object.keys(spec.fields);
  return (
    <span id={`ratings-${idp}`} class="rating-boxes">
      {keys.length ? (
        keys.map((k) => <SpecField spec={spec} k={k} idp={idp} state={state} size={7} hint="" />)
      ) : (
        <span class="hint">
          {category
            ? 'No rated fields for this category: use Other ratings.'
            : 'Choose a category to get its rating boxes.'}
        </span>
      )}
    </span>
  );
};

/** The category as a choice from the list; changing it redraws the rating boxes (keeping what was typed). */
const CategorySelect: FC<{ state: FieldState; idp: string; projectId: string }> = ({ state, idp, projectId }) => {
  const value = state.values.category ?? '';
  const error = state.errors.category;
  const id = fieldId(partSpec.name, idp, 'category');
  return (
    <label class={`field${error ? ' has-error' : ''}`} for={id}>
      <span class="label">Category</span>
      <select id={id} name="category" aria-invalid={error ? 'true' : undefined}
        hx-get={`/projects/${projectId}/parts/rating-boxes?idp=${encodeURIComponent(idp)}`} hx-trigger="change"
        hx-target={`#ratings-${idp}`} hx-swap="outerHTML" hx-include="closest form">
        {value === '' ? <option value="" selected>(choose a category)</option> : null}
        {categoryOptions(value).map(([v, t]) => (
          <option value={v} selected={v === value}>
            {t}
          </option>
        ))}
      </select>
      {error ? <span class="error" role="alert">{error}</span> : null}
    </label>
  );
};

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

export const PartFields: FC<{ state: FieldState; idp: string; projectId: string; help?: boolean }> = ({
  state,
  idp,
  projectId,
  help,
}) => (
  <>
    <SpecField spec={partSpec} k="description" idp={idp} state={state} size={56} hint={help ? undefined : ''} />
    <CategorySelect state={state} idp={idp} projectId={projectId} />
    <RatingBoxes state={state} idp={idp} category={state.values.category ?? ''} />
    <SpecField
      spec={partSpec}
      k="ratings"
      idp={idp}
      state={state}
      size={36}
      label="Other ratings"
      hint={help ? partSpec.fields.ratings.help : ''}
    />
  </>
);

function offersLine(p: Part): string {
  if (!p.offers.length) return 'no supplier offers';
  const unpriced = p.offers.filter((o) => !o.breaks.length).length;
  return `${p.offers.length} offer(s): ` +
    `${p.offers.map((o) => o.supplier).join(', ')}${unpriced ? ` (${unpriced} without prices)` : ''}`;
}

export const PartCard: FC<{ project: Project; part: Part; failed?: Failed; uses: number; open?: boolean }> = ({
  project,
  part,
  failed,
  uses,
  open,
}) => {
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
          <PartFields state={state} idp={`p-${part.id}`} projectId={project.id} />
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
      <form
        {...hx(`${base}/offers`, '#parts')}
        class="item-row add"
        aria-label={`Add an offer for ${part.description}`}
      >
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
