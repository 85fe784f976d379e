// One transformer on the supply page: its own form (name, construction) and one form per winding; fields from specs.
import type { FC } from 'hono/jsx';
import type { Project, Transformer, Winding } from '../../src/core/model';
import { formatValue } from '../../src/core/units';
import { defaults, formValues } from '../../src/core/spec/derive';
import { percentText } from '../../src/core/spec/input-text';
import { transformerSpec, windingSpec } from '../../src/core/spec/supply';
import { FormErrors, type FieldState } from './fields';
import { SpecField } from './spec-fields';
import { stateFor, type Failed } from './failed';

export const Version: FC<{ version: number }> = ({ version }) => (
  <input type="hidden" name="version" value={String(version)} />
);

/** Attributes that make a form post through htmx and swap the supply body in place. */
export const hx = (action: string, target = '#supply') => ({
  method: 'post' as const,
  action,
  'hx-post': action,
  'hx-target': target,
  'hx-swap': 'outerHTML',
});

export const pctText = percentText;

/** The form text of a winding; a new winding starts with the spec's regulation and empty name, voltage and current
 *  (those must come from the transformer in hand, not from a default). */
export function windingValues(w: Winding | null): Record<string, string> {
  if (w) return formValues(windingSpec, w);
  return { ...formValues(windingSpec, defaults(windingSpec)), name: '', ratedV: '', ratedA: '' };
}

const WindingFields: FC<{ state: FieldState; idp: string }> = ({ state, idp }) => (
  <>
    <SpecField spec={windingSpec} k="name" label="Winding" state={state} idp={idp} size={16} />
    <SpecField spec={windingSpec} k="ratedVrms" state={state} idp={idp} size={7} />
    <SpecField spec={windingSpec} k="ratedA" state={state} idp={idp} size={7} />
    <SpecField spec={windingSpec} k="regulationFraction" state={state} idp={idp} size={4} />
    <SpecField spec={windingSpec} k="resistanceOhm" label="Resistance" state={state} idp={idp} size={7} />
    <SpecField spec={windingSpec} k="leakageH" label="Leakage" state={state} idp={idp} size={7} />
  </>
);

const WindingRow: FC<{ project: Project; t: Transformer; w: Winding; failed?: Failed }> = ({
  project,
  t,
  w,
  failed,
}) => {
  const base = `/projects/${project.id}/supply/windings/${w.id}`;
  const state = stateFor(`winding-${w.id}`, failed, () => windingValues(w));
  return (
    <form {...hx(base)} class="item-row" id={`winding-${w.id}`} aria-label={`Winding ${w.name} of ${t.name}`}>
      <Version version={project.version} />
      <FormErrors state={state} />
      <div class="row">
        <WindingFields idp={`w-${w.id}`} state={state} />
        <button type="submit">Save</button>
        <a class="danger" href={`${base}/delete`}>
          Delete…
        </a>
      </div>
    </form>
  );
};

export const transformerValues = (t: Transformer): Record<string, string> => formValues(transformerSpec, t);

export const TransformerCard: FC<{ project: Project; t: Transformer; failed?: Failed }> = ({ project, t, failed }) => {
  const base = `/projects/${project.id}/supply/transformers/${t.id}`;
  const state = stateFor(`transformer-${t.id}`, failed, () => transformerValues(t));
  const addState = stateFor(`add-winding-${t.id}`, failed, () => windingValues(null));
  const va = t.windings.reduce((s, w) => s + w.ratedVrms * w.ratedA, 0);
  return (
    <section class="card supply-item" id={`transformer-${t.id}`}>
      <form {...hx(base)} aria-label={`Transformer ${t.name}`}>
        <Version version={project.version} />
        <FormErrors state={state} />
        <div class="row">
          <SpecField
            spec={transformerSpec}
            k="name"
            label="Transformer"
            hint=""
            state={state}
            idp={`t-${t.id}`}
            size={28}
          />
          <SpecField spec={transformerSpec} k="construction" state={state} idp={`t-${t.id}`} />
          <SpecField
            spec={transformerSpec}
            k="secondaryToleranceFraction"
            label="Secondary ±"
            state={state}
            idp={`t-${t.id}`}
            size={4}
          />
          <button type="submit">Save</button>
          <a class="danger" href={`${base}/delete`}>
            Delete transformer…
          </a>
          <span class="hint">Secondaries total {formatValue(va, 'VA')} as entered.</span>
        </div>
      </form>
      <h3>Windings</h3>
      {t.windings.length ? (
        t.windings.map((w) => <WindingRow project={project} t={t} w={w} failed={failed} />)
      ) : (
        <p class="hint">No windings yet: add the secondaries below.</p>
      )}
      <form {...hx(`${base}/windings`)} class="item-row add" aria-label={`Add a winding to ${t.name}`}>
        <Version version={project.version} />
        <FormErrors state={addState} />
        <div class="row">
          <span class="row-label">Add a winding:</span>
          <WindingFields idp={`aw-${t.id}`} state={addState} />
          <button type="submit">Add winding</button>
        </div>
      </form>
    </section>
  );
};
