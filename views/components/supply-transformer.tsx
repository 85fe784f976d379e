// One transformer on the supply page: its own form (name, construction) and one form per winding.
import type { FC } from 'hono/jsx';
import type { Project, Transformer, Winding } from '../../src/core/model';
import { formatValue } from '../../src/core/units';
import { inputText, percentText } from '../../src/core/spec/input-text';
import { FormErrors, type FieldState, Field, Select } from './fields';
import { stateFor, type Failed } from './failed';

export const Version: FC<{ version: number }> = ({ version }) => <input type="hidden" name="version" value={String(version)} />;

/** Attributes that make a form post through htmx and swap the supply body in place. */
export const hx = (action: string, target = '#supply') => ({ method: 'post' as const, action, 'hx-post': action, 'hx-target': target, 'hx-swap': 'outerHTML' });

export const pctText = percentText;

export function windingValues(w: Winding | null): Record<string, string> {
  if (!w) return { name: '', ratedV: '', ratedA: '', regulation: '8', resistance: '' };
  return {
    name: w.name,
    ratedV: inputText(w.ratedVrms, 'V'),
    ratedA: inputText(w.ratedA, 'A'),
    regulation: pctText(w.regulationFraction),
    resistance: inputText(w.resistanceOhm, 'Ω'),
  };
}

const WindingFields: FC<{ state: FieldState; idp: string }> = ({ state, idp }) => (
  <>
    <Field idp={idp} name="name" label="Winding" state={state} size={16} />
    <Field idp={idp} name="ratedV" label="Rated voltage" unit="V rms" state={state} size={7} />
    <Field idp={idp} name="ratedA" label="Rated current" unit="A rms" state={state} size={7} />
    <Field idp={idp} name="regulation" label="Regulation" unit="%" state={state} size={4} />
    <Field idp={idp} name="resistance" label="Resistance" unit="Ω" state={state} size={7} hint="empty = from regulation" />
  </>
);

const WindingRow: FC<{ project: Project; t: Transformer; w: Winding; failed?: Failed }> = ({ project, t, w, failed }) => {
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

export function transformerValues(t: Transformer): Record<string, string> {
  return { name: t.name, construction: t.construction };
}

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
           <Field idp={`t-${t.id}`} name="name" label="Transformer" state={state} size={28} />
          <Select idp={`t-${t.id}`} name="construction" label="Construction" state={state} options={[['laminated', 'Laminated (EI)'], ['toroidal', 'Toroidal']]} />
          <button type="submit">Save</button>
          <a class="danger" href={`${base}/delete`}>
            Delete transformer…
          </a>
          <span class="hint">Secondaries total {formatValue(va, 'VA')} as entered.</span>
        </div>
      </form>
      <h3>Windings</h3>
      {t.windings.length ? t.windings.map((w) => <WindingRow project={project} t={t} w={w} failed={failed} />) : <p class="hint">No windings yet: add the secondaries below.</p>}
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
