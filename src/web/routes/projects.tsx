// Project list routes: create, clone, rename, delete (confirmed), export and import JSON.
import { Hono } from 'hono';
import { z } from 'zod';
import {
  listProjects,
  loadProject,
  insertProject,
  deleteProject,
  updateProject,
  VersionConflict,
  NotFound,
} from '../../db/projects';
import { newProject, cloneProject } from '../../core/new-project';
import { projectFromTemplate } from '../../core/templates';
import { newProjectSpec, type NewProjectInput } from '../../core/spec/settings';
import { specFormSchema } from '../forms/spec-schema';
import { parseProjectFile, toProjectFile } from '../../io/project-file';
import { text, parseForm, versionField } from '../form';
import { formValues, sendPage } from '../render';
import { newId } from '../ids';
import type { Deps } from '../deps';
import { ProjectsPage, ConfirmDelete, type ProjectsPageProps } from '../../../views/pages/projects';

export const IMPORT_LIMIT_BYTES = 5 * 1024 * 1024;

const createSchema = specFormSchema<NewProjectInput>(newProjectSpec);

export function projectRoutes(deps: Deps) {
  const app = new Hono();
  const listPage = async (props: Omit<ProjectsPageProps, 'projects'>) => (
    <ProjectsPage projects={await listProjects(deps.database.db)} {...props} />
  );

  app.get('/', async (c) => sendPage(c, await listPage({ notice: c.req.query('notice') })));

  app.post('/projects', async (c) => {
    const values = await formValues(c);
    const parsed = parseForm(createSchema, values);
    if (!parsed.ok) return sendPage(c, await listPage({ create: { values, errors: parsed.errors } }), 422);
    const d = parsed.data;
    const id = newId('prj');
    const project = d.template
      ? projectFromTemplate(d.template, d, id, newId)
      : newProject(id, d.name, d.frequencyHz, d.targetPowerW, d.mains);
    await insertProject(deps.database, project, deps.now().toISOString());
    return c.redirect(`/projects/${project.id}`, 303);
  });

  app.post('/projects/:id/clone', async (c) => {
    const source = await loadProject(deps.database.db, c.req.param('id'));
    if (!source) return c.notFound();
    const copy = cloneProject(source, newId('prj'), `Copy of ${source.name}`.slice(0, 200), newId);
    await insertProject(deps.database, copy, deps.now().toISOString());
    return c.redirect(`/?notice=${encodeURIComponent(`Cloned as "${copy.name}".`)}`, 303);
  });

  app.post('/projects/:id/rename', async (c) => {
    const id = c.req.param('id');
    const values = await formValues(c);
    const parsed = parseForm(z.object({ name: text('Name'), version: versionField }), values);
    if (!parsed.ok)
      return sendPage(c, await listPage({ renameFailed: { id, state: { values, errors: parsed.errors } } }), 422);
    try {
      await updateProject(
        deps.database,
        id,
        parsed.data.version,
        (p) => ({ ...p, name: parsed.data.name }),
        deps.now().toISOString(),
      );
    } catch (e) {
      if (e instanceof VersionConflict) {
        const errors = {
          name: 'Not renamed: the project was changed elsewhere meanwhile. The list now shows the stored name; ' +
            'rename again if you still want to.',
        };
        return sendPage(c, await listPage({ renameFailed: { id, state: { values, errors } } }), 409);
      }
      // deleted in another window meanwhile: say so on the list instead of failing
      if (e instanceof NotFound)
        return sendPage(
          c,
          await listPage({
            notice: `Not renamed: that project no longer exists (deleted in another window?). Nothing was saved.`,
          }),
          404,
        );
      throw e;
    }
    return c.redirect('/?notice=Renamed.', 303);
  });

  app.get('/projects/:id/delete', async (c) => {
    const p = await loadProject(deps.database.db, c.req.param('id'));
    if (!p) return c.notFound();
    return sendPage(
      c,
      <ConfirmDelete
        title="Delete project"
        what={p.name}
        version={p.version}
        action={`/projects/${p.id}/delete`}
        back="/"
      />,
    );
  });

  // The confirmation carries the version it showed: a project changed since then is asked about again.
  app.post('/projects/:id/delete', async (c) => {
    const id = c.req.param('id');
    const version = versionField.safeParse((await formValues(c)).version);
    const reconfirm = async () => {
      const p = await loadProject(deps.database.db, id);
      if (!p) return c.notFound();
      const why = version.success
        ? 'Not deleted: this project was changed in another tab or window after this confirmation was shown.'
        : 'Not deleted: the confirmation had no version number.';
      return sendPage(
        c,
        <ConfirmDelete
          title="Delete project"
          what={p.name}
          version={p.version}
          action={`/projects/${p.id}/delete`}
          back="/"
          refusal={`${why} Check it, then confirm again if you still want to delete it.`}
        />,
        409,
      );
    };
    if (!version.success) return reconfirm();
    try {
      const ok = await deleteProject(deps.database, id, version.data);
      if (!ok) return c.notFound();
    } catch (e) {
      if (e instanceof VersionConflict) return reconfirm();
      throw e;
    }
    return c.redirect('/?notice=Project deleted.', 303);
  });

  app.get('/projects/:id/export.json', async (c) => {
    const p = await loadProject(deps.database.db, c.req.param('id'));
    if (!p) return c.notFound();
    const fileName = `${p.name.replace(/[^A-Za-z0-9._-]+/g, '-').slice(0, 60) || 'project'}.json`;
    c.header('Content-Disposition', `attachment; filename="${fileName}"`);
    return c.body(toProjectFile(p, deps.now().toISOString()), 200, {
      'Content-Type': 'application/json; charset=utf-8',
    });
  });

  app.post('/import', async (c) => {
    const body = await c.req.parseBody();
    const file = body.file;
    let textIn: string | null = null;
    if (file instanceof File) {
      if (file.size > IMPORT_LIMIT_BYTES)
        return sendPage(
          c,
          await listPage({
            importErrors: [`file: ${file.size} bytes is larger than the ${IMPORT_LIMIT_BYTES / 1024 / 1024} MiB limit`],
          }),
          413,
        );
      textIn = await file.text();
    } else if (typeof body.json === 'string') textIn = body.json;
    if (!textIn) return sendPage(c, await listPage({ importErrors: ['file: no file was chosen'] }), 422);
    const parsed = parseProjectFile(textIn);
    if (!parsed.ok) return sendPage(c, await listPage({ importErrors: parsed.errors }), 422);
    // Always a new project: fresh ids, so an import never overwrites or collides with what is stored.
    const project = cloneProject(parsed.project, newId('prj'), parsed.project.name, newId);
    await insertProject(deps.database, project, deps.now().toISOString());
    return c.redirect(`/projects/${project.id}`, 303);
  });

  return app;
}
