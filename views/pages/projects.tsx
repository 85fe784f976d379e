// Project list: open, create, clone, rename, export, import, delete (with confirmation).
import type { FC } from 'hono/jsx';
import type { ProjectSummary } from '../../src/core/project-summary';
import { NEW_PROJECT_BANDS, newProjectFormValues, newProjectSpec } from '../../src/core/spec/settings';
import { formatValue } from '../../src/core/units';
import { Layout } from '../layout';
import { Field, Select, FormErrors, type FieldState, emptyState } from '../components/fields';
import { SpecField } from '../components/spec-fields';
import { TEMPLATE_INFO, type TemplateKey } from '../../src/core/templates/choices';

export interface ProjectsPageProps {
  projects: ProjectSummary[];
  create?: FieldState;
  importErrors?: string[];
  renameFailed?: { id: string; state: FieldState };
  notice?: string;
}

export const ProjectsPage: FC<ProjectsPageProps> = ({ projects, create, importErrors, renameFailed, notice }) => {
  const createState = create ?? { values: newProjectFormValues(), errors: {} };
  return (
    <Layout title="Projects">
      {notice ? (
        <p class="notice" role="status">
          {notice}
        </p>
      ) : null}
      <section class="card">
        <h1>Build projects</h1>
        {projects.length === 0 ? <p>No projects yet. Create one below or import an exported file.</p> : null}
        <table class="grid projects">
          <thead>
            <tr>
              <th>Project</th>
              <th class="num">Frequency</th>
              <th class="num">Output</th>
              <th class="num">Kits</th>
              <th class="num">Stages</th>
              <th>Rename</th>
              <th>Actions</th>
            </tr>
          </thead>
          <tbody>
            {projects.map((p) => {
              const rs =
                renameFailed && renameFailed.id === p.id
                  ? renameFailed.state
                  : { values: { name: p.name }, errors: {} };
              return (
                <tr>
                  <td>
                    <a href={`/projects/${p.id}`}>{p.name}</a>
                    {p.variantOf ? (
                      <span class="hint">
                        {' '}
                        (variant of {projects.find((x) => x.id === p.variantOf)?.name ?? 'a deleted project'})
                      </span>
                    ) : null}
                  </td>
                  <td class="num" data-label="Frequency">{formatValue(p.frequencyHz, 'Hz', 4)}</td>
                  <td class="num" data-label="Output">{formatValue(p.targetPowerW, 'W')}</td>
                  <td class="num" data-label="Kits">{p.kits}</td>
                  <td class="num" data-label="Stages">{p.stageCount}</td>
                  <td class="rename">
                    <form method="post" action={`/projects/${p.id}/rename`} class="inline">
                      <input type="hidden" name="version" value={String(p.version)} />
                      <Field name="name" id={`rename-${p.id}`} label="New name" state={rs} size={24} />
                      <button type="submit">Rename</button>
                    </form>
                  </td>
                  <td class="actions">
                    <div class="action-row">
                    <form method="post" action={`/projects/${p.id}/clone`} class="inline">
                      <button type="submit">Clone</button>
                    </form>
                    <form method="post" action={`/projects/${p.id}/variant`} class="inline">
                      <button type="submit">Clone as variant</button>
                    </form>
                    <a href={`/projects/${p.id}/compare`}>Compare</a>
                    <a href={`/projects/${p.id}/export.json`} download>
                      Export JSON
                    </a>
                    <a href={`/projects/${p.id}/delete`} class="danger">
                      Delete…
                    </a>
                    </div>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </section>
      <div class="columns">
        <section class="card">
          <h2>New project</h2>
          <form method="post" action="/projects">
            <FormErrors state={createState} />
            <TemplateChoice state={createState} />
            <SpecField spec={newProjectSpec} k="name" state={createState} size={32} />
            <div class="row">
              <Select
                name="band"
                label={newProjectSpec.fields.frequencyHz.label}
                state={createState}
                options={NEW_PROJECT_BANDS}
              />
              <SpecField spec={newProjectSpec} k="targetPowerW" state={createState} size={6} />
              <SpecField spec={newProjectSpec} k="mainsPreset" state={createState} />
            </div>
            <button type="submit">Create project</button>
          </form>
        </section>
        <section class="card">
          <h2>Import a project file</h2>
          <form method="post" action="/import" enctype="multipart/form-data">
            {importErrors?.length ? (
              <div class="form-errors" role="alert">
                <p>The file was not imported; nothing was saved. What is wrong, and where:</p>
                <ul>
                  {importErrors.map((e) => (
                    <li>
                      <code>{e}</code>
                    </li>
                  ))}
                </ul>
              </div>
            ) : null}
            <label class="field">
              <span class="label">Exported project (.json)</span>
              <input type="file" name="file" accept=".json,application/json" required />
            </label>
            <p class="hint">The import always creates a new project; existing projects are never overwritten.</p>
            <button type="submit">Import</button>
          </form>
        </section>
      </div>
    </Layout>
  );
};

const capitalised = (t: string) => t.charAt(0).toUpperCase() + t.slice(1);

/** The station templates as radio buttons, each with what it sets up (the spec gives the label and options). */
const TemplateChoice: FC<{ state: FieldState }> = ({ state }) => {
  const f = newProjectSpec.fields.template;
  if (f.type !== 'choice') throw new Error('template is a choice field');
  const value = state.values.template ?? '';
  const error = state.errors.template;
  return (
    <fieldset class={`template-choice${error ? ' has-error' : ''}`}>
      <legend>{f.label}</legend>
      {f.options.map(([v, text]) => (
        <label class="template-option" for={`tpl-${v || 'empty'}`}>
          <input type="radio" id={`tpl-${v || 'empty'}`} name="template" value={v} checked={value === v} />{' '}
          <strong>{text}</strong>
          {v ? <span class="hint"> — {TEMPLATE_INFO[v as TemplateKey].summary}</span> : null}
        </label>
      ))}
      {error ? (
        <span class="error" role="alert">
          {error}
        </span>
      ) : (
        <span class="hint">
          {capitalised(f.help ?? '')}. Band, power and supply below apply to it; everything can be changed afterwards.
        </span>
      )}
    </fieldset>
  );
};

export const ConfirmDelete: FC<{
  title: string;
  what: string;
  version: number;
  action: string;
  back: string;
  refusal?: string;
}> = ({ title, what, version, action, back, refusal }) => (
  <Layout title={title}>
    <section class="card confirm">
      <h1>{title}</h1>
      {refusal ? (
        <div class="form-errors" role="alert">
          <p>{refusal}</p>
        </div>
      ) : null}
      <p>
        Delete <strong>{what}</strong>? This cannot be undone. (Export the project first if you may want it back.)
      </p>
      <form method="post" action={action} class="inline">
        <input type="hidden" name="version" value={String(version)} />
        <button type="submit" class="danger">
          Yes, delete
        </button>
      </form>{' '}
      <a href={back}>Cancel</a>
    </section>
  </Layout>
);

export { emptyState };
