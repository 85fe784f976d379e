// Core catalog page: the project's cores, each with its own form, a delete link, and a form to add one.
import type { FC } from 'hono/jsx';
import type { CatalogCore, Project } from '../../src/core/model';
import { coreSpec } from '../../src/core/spec/cores';
import { formValues } from '../../src/core/spec/derive';
import { FormErrors, type FieldState } from '../components/fields';
import { SpecField } from '../components/spec-fields';
import { stateFor, type Failed } from '../components/failed';

const ROWS: string[][] = [
  ['name'],
  ['alHPerTurn2', 'aeM2', 'leM', 'innerDiameterM', 'windowAreaM2'],
  ['minFrequencyHz', 'maxFrequencyHz', 'fluxLimitT'],
];

const CoreForm: FC<{ action: string; version: number; state: FieldState; idp: string; submit: string }> = ({
  action,
  version,
  state,
  idp,
  submit,
}) => (
  <form method="post" action={action} hx-post={action} hx-target="#cores" hx-swap="outerHTML">
    <input type="hidden" name="version" value={String(version)} />
    <FormErrors state={state} />
    {ROWS.map((row) => (
      <div class="row">
        {row.map((k) => (
          <SpecField spec={coreSpec} k={k} state={state} idp={idp} size={k === 'name' ? 60 : 7} />
        ))}
      </div>
    ))}
    <button type="submit" class="primary">
      {submit}
    </button>
  </form>
);

/** What winds on a core, in words, for its card. */
function usedBy(p: Project, c: CatalogCore): string {
  const users = p.stages.flatMap((s) => [
    ...(s.lpf?.coreId === c.id ? [`${s.name} (inductors)`] : []),
    ...(s.pa?.outputCoreId === c.id ? [`${s.name} (output transformer)`] : []),
  ]);
  return users.length ? `Used by ${users.join(', ')}.` : 'Not used yet: choose it on a filter or PA form.';
}

export const CoresBody: FC<{ project: Project; failed?: Failed; notice?: string }> = ({ project, failed, notice }) => {
  const base = `/projects/${project.id}/cores`;
  const cores = project.cores ?? [];
  return (
    <div id="cores">
      {notice ? (
        <p class="notice" role="status">
          {notice}
        </p>
      ) : null}
      <section class="card">
        <h2>Core catalog</h2>
        <p class="hint">
          The cores this project's filter inductors and output transformer are wound on, described by size and material.
          Take AL, the effective area and path length, the window and the flux limit from the core's data sheet (AL also
          as µH per 100 turns, e.g. 49 µH/100t). A filter or PA picks its core on its stage page; the checks then use
          these figures for turns, flux density and winding fit.
        </p>
        {cores.length === 0 ? <p class="hint">No cores yet: add one below.</p> : null}
      </section>
      {cores.map((c) => (
        <section class="card" id={`core-${c.id}`} aria-label={c.name}>
          <h3>{c.name}</h3>
          <p class="hint">
            {usedBy(project, c)} <a href={`${base}/${c.id}/delete`}>Delete this core</a>
          </p>
          <CoreForm action={`${base}/${c.id}`} version={project.version} idp={`c-${c.id}`} submit="Save core"
            state={stateFor(`core-${c.id}`, failed, () => formValues(coreSpec, c))} />
        </section>
      ))}
      <section class="card">
        <h3>Add a core</h3>
        <CoreForm
          action={base}
          version={project.version}
          idp="nc"
          submit="Add core"
          state={stateFor('add-core', failed, () => formValues(coreSpec, {}))}
        />
      </section>
    </div>
  );
};
