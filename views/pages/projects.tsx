// Project list: open, create, clone, rename, export, import, delete (with confirmation).
import type { FC } from 'hono/jsx';
import type { ProjectSummary } from '../../src/db/projects';
import { formatValue } from '../../src/core/units';
import { Layout } from '../layout';
import { Field, Select, FormErrors, type FieldState, emptyState } from '../components/fields';

export const BANDS: [string, string][] = [
  ['1.83 MHz', '160 m (1.83 MHz)'],
  ['3.56 MHz', '80 m (3.56 MHz)'],
  ['7.03 MHz', '40 m (7.03 MHz)'],
  ['10.11 MHz', '30 m (10.11 MHz)'],
  ['14.06 MHz', '20 m (14.06 MHz)'],
  ['18.086 MHz', '17 m (18.086 MHz)'],
  ['21.06 MHz', '15 m (21.06 MHz)'],
];

export interface ProjectsPageProps {
  projects: ProjectSummary[];
  create?: FieldState;
  importErrors?: string[];
  renameFailed?: { id: string; state: FieldState };
  notice?: string;
}

export const ProjectsPage: FC<ProjectsPageProps> = ({ projects, create, importErrors, renameFailed, notice }) => {
  const createState = create ?? { values: { band: '10.11 MHz', power: '5 W', mains: '230-50' }, errors: {} };
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
              const rs = renameFailed && renameFailed.id === p.id ? renameFailed.state : { values: { name: p.name }, errors: {} };
              return (
                <tr>
                  <td>
                    <a href={`/projects/${p.id}`}>{p.name}</a>
                  </td>
                  <td class="num">{formatValue(p.frequencyHz, 'Hz', 4)}</td>
                  <td class="num">{formatValue(p.targetPowerW, 'W')}</td>
                  <td class="num">{p.kits}</td>
                  <td class="num">{p.stageCount}</td>
                  <td>
                    <form method="post" action={`/projects/${p.id}/rename`} class="inline">
                      <input type="hidden" name="version" value={String(p.version)} />
                      <Field name="name" id={`rename-${p.id}`} label="New name" state={rs} size={24} />
                      <button type="submit">Rename</button>
                    </form>
                  </td>
                  <td class="actions">
                    <form method="post" action={`/projects/${p.id}/clone`} class="inline">
                      <button type="submit">Clone</button>
                    </form>
                    <a href={`/projects/${p.id}/export.json`} download>
                      Export JSON
                    </a>
                    <a href={`/projects/${p.id}/delete`} class="danger">
                      Delete…
                    </a>
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
            <Field name="name" label="Name" state={createState} size={32} />
            <div class="row">
              <Select name="band" label="Band" state={createState} options={BANDS} />
              <Field name="power" label="Target output" unit="W" state={createState} size={6} />
              <Select
                name="mains"
                label="Supply"
                state={createState}
                options={[
                  ['230-50', 'Mains 230 V 50 Hz'],
                  ['120-60', 'Mains 120 V 60 Hz'],
                  ['100-50', 'Mains 100 V 50 Hz'],
                  ['battery', 'Battery / external DC'],
                ]}
              />
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

export const ConfirmDelete: FC<{ title: string; what: string; version: number; action: string; back: string; refusal?: string }> = ({ title, what, version, action, back, refusal }) => (
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
