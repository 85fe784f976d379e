// Stage page: name, kind, notes, loads per rail and mode, and the kind's own data (PA, filter, relay).
import type { FC } from 'hono/jsx';
import type { Project, Stage } from '../../src/core/model';
import { MODES, STAGE_KINDS, STAGE_KIND_LABELS } from '../../src/core/model';
import { Select, FormErrors, type FieldState } from '../components/fields';
import { stateFor, type Failed } from '../components/failed';
import { formValues, loadSpec, stageSpec } from '../../src/core/spec';
import { stageData, type StageData } from '../../src/core/spec/stage-data';
import { loadFormName, stageFormValues } from '../../src/core/spec/stage';
import { SpecField } from '../components/spec-fields';
import { ITEM } from '../components/field-id';
import { LoadTableHead } from '../components/load-table-head';
import { REMOVE_LOAD } from '../../src/core/edits/stage-loads';
import { NEW_RAIL, NEW_RAIL_FORM } from '../../src/core/edits/rail-in-place';
import { addRailSpec } from '../../src/core/spec/supply';
import { sourceOptions } from './supply';

const Hidden: FC<{ version: number }> = ({ version }) => <input type="hidden" name="version" value={String(version)} />;

interface Props {
  project: Project;
  stage: Stage;
  failed?: Failed;
  notice?: string;
  results?: unknown;
}

const FormShell: FC<{
  project: Project;
  stage: Stage;
  path: string;
  title: string;
  state: FieldState;
  children?: unknown;
  submit: string;
}> = ({ project, stage, path, title, state, children, submit }) => {
  const action = `/projects/${project.id}/stages/${stage.id}${path}`;
  return (
    <section class="card">
      <h2>{title}</h2>
      <form method="post" action={action} hx-post={action} hx-target="#stage" hx-swap="outerHTML">
        <Hidden version={project.version} />
        <FormErrors state={state} />
        {children as never}
        <button type="submit" class="primary">
          {submit}
        </button>
      </form>
    </section>
  );
};

export const StageBody: FC<Props> = ({ project, stage, failed, notice, results }) => {
  const railOptions: [string, string][] = project.supply.rails.map((r) => [r.id, r.name]);
  const general = stateFor('stage', failed, () => stageFormValues(stage));
  const loadRows = Math.max(stage.loads.length + 1, 1);
  const own = stageData(stage);
  return (
    <div id="stage">
      <p>
        <a href={`/projects/${project.id}`}>← All stages and the budget</a>
      </p>
      {notice ? (
        <p class="notice" role="status">
          {notice}
        </p>
      ) : null}
      <FormShell
        project={project}
        stage={stage}
        path=""
        title={`${stage.name} (${STAGE_KIND_LABELS[stage.kind]})`}
        state={general}
        submit="Save stage"
      >
        <div class="row">
          <SpecField spec={stageSpec} k="name" label="Name" state={general} item={ITEM.stage(stage.id)} size={36} />
          <Select
            name="kind"
            label="Kind"
            state={general}
            options={STAGE_KINDS.map((k) => [k, STAGE_KIND_LABELS[k]])}
            hint="A new kind starts from typical data. A change that would drop PA, filter or relay data asks first."
          />
          <SpecField spec={stageSpec} k="dissipationW" state={general} item={ITEM.stage(stage.id)} size={8} />
        </div>
        <label class="field wide">
          <span class="label">Notes</span>
          <textarea name="notes" rows={2}>
            {general.values.notes ?? ''}
          </textarea>
        </label>
        <h3>Current drawn from each rail</h3>
        {railOptions.length === 0 ? (
          <p class="hint">
            This project has no rails yet: choose "(a new rail, named below)" for the row and say what feeds it, or set
            up the supply on the <a href={`/projects/${project.id}/supply`}>Supply</a> page.
          </p>
        ) : null}
        <table class="grid compact">
          <LoadTableHead />
          <tbody>
            {Array.from({ length: loadRows }, (_, i) => (
              <tr>
                <td>
                  <Select
                    name={loadFormName(i, 'railId')}
                    label="Rail"
                    state={general}
                    options={[
                      i < stage.loads.length ? [REMOVE_LOAD, '(remove this load)'] : ['', '(add a load…)'],
                      ...railOptions,
                      ...(i < stage.loads.length ? [] : [[NEW_RAIL, '(a new rail, named below)'] as [string, string]]),
                    ]}
                  />
                </td>
                {MODES.map((m) => (
                  <td>
                    <SpecField
                      spec={loadSpec}
                      k={`currentA.${m}`}
                      name={loadFormName(i, `currentA.${m}`)}
                      state={general}
                      item={ITEM.stage(stage.id)}
                      size={8}
                      hint=""
                    />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        <div class="row new-rail-in-place" aria-label="New rail for the new row">
          <SpecField
            spec={addRailSpec}
            k="name"
            name={NEW_RAIL_FORM.name}
            label="New rail (for a row set to it): name"
            state={general}
            idp="nr"
            size={22}
          />
          <SpecField
            spec={addRailSpec}
            k="source"
            name={NEW_RAIL_FORM.source}
            state={general}
            idp="nr"
            options={sourceOptions(project)}
          />
          <span class="hint">Added with typical values when the stage is saved; set its parts on the Supply page.</span>
        </div>
        <p class="hint">
          Currents are in mA: 350 means 350 mA; 1.2 A, 350m or 0.35 A are read as written; an empty box means none
          drawn. Choose "(remove this load)" to drop a row.
        </p>
      </FormShell>
      {own ? (
        <DataForm
          project={project}
          stage={stage}
          data={own.data}
          state={stateFor(own.data.key, failed, () => formValues(own.data.spec, own.value))}
          rails={railOptions}
        />
      ) : null}
      {results as never}
    </div>
  );
};

/** The form of the data block this stage's kind owns, drawn from its registry entry (rows of spec fields). */
const DataForm: FC<{
  project: Project;
  stage: Stage;
  data: StageData;
  state: FieldState;
  rails: [string, string][];
}> = ({ project, stage, data, state, rails }) => (
  <FormShell
    project={project}
    stage={stage}
    path={`/${data.key}`}
    title={data.spec.label}
    state={state}
    submit={data.submit}
  >
    {data.rows.map((row) => (
      <div class="row">
        {row.map((k) => {
          const f = data.spec.fields[k];
          const cores = (project.cores ?? []).map((c): [string, string] => [c.id, c.name]);
          const refOptions =
            f.type === 'ref' ? (f.to === 'rail' ? rails : f.to === 'core' ? cores : undefined) : undefined;
          const none =
            f.type === 'ref' ? (f.to === 'core' ? '(none: entered here)' : '(not on a rail here)') : undefined;
          return (
            <SpecField
              spec={data.spec}
              k={k}
              state={state}
              item={ITEM.stage(stage.id)}
              options={refOptions}
              none={none}
              size={f.type === 'text' ? 30 : undefined}
            />
          );
        })}
      </div>
    ))}
  </FormShell>
);
