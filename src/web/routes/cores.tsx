// The project's core catalog: list, add, edit and delete cores (what filter inductors and output transformers are
// wound on). Every edit goes through projectEdit; a core a filter or a PA uses cannot be deleted.
import { Hono } from 'hono';
import { z } from 'zod';
import type { CatalogCore, Project } from '../../core/model';
import { coreSpec } from '../../core/spec/cores';
import { formValues } from '../../core/spec/derive';
import { loadProject } from '../../db/projects';
import { specFormSchema } from '../forms/spec-schema';
import { projectEdit, doneNotice, type ChangeResult } from '../edit';
import { sendPage } from '../render';
import type { Deps } from '../deps';
import { newId } from '../ids';
import { refusal } from '../supply-forms';
import { Layout } from '../../../views/layout';
import { CoresBody } from '../../../views/pages/cores';
import { ConfirmItemPage } from '../../../views/components/confirm-item';
import type { Failed } from '../../../views/components/failed';

const coreSchema = specFormSchema<Omit<CatalogCore, 'id'>>(coreSpec);

/** Sentences naming what winds on core `id` (empty = free to delete). */
export function coreUsers(p: Project, id: string): string[] {
  const out: string[] = [];
  for (const s of p.stages) {
    if (s.lpf?.coreId === id) out.push(`the filter “${s.name}” winds its inductors on it`);
    if (s.pa?.outputCoreId === id) out.push(`the final amplifier “${s.name}” winds its output transformer on it`);
  }
  return out;
}

const body = (p: Project, failed?: Failed, notice?: string) => (
  <CoresBody project={p} failed={failed} notice={notice} />
);
const page = (p: Project, failed?: Failed, notice?: string) => (
  <Layout title={`Core catalog · ${p.name}`} project={p} section="rf">
    {body(p, failed, notice)}
  </Layout>
);
const gone = (): ChangeResult => ({
  errors: { _form: 'That core no longer exists (deleted in another window?). The page now shows the stored catalog.' },
});

export function coreRoutes(deps: Deps) {
  const app = new Hono();
  const pageUrl = (p: Project) => `/projects/${p.id}/cores`;
  const common = { partial: body, page, redirect: pageUrl };

  app.get('/projects/:id/cores', async (c) => {
    const p = await loadProject(deps.database.db, c.req.param('id'));
    if (!p) return c.notFound();
    return sendPage(c, page(p, undefined, doneNotice(c)));
  });

  app.post(
    '/projects/:id/cores',
    projectEdit(deps, {
      ...common,
      form: 'add-core',
      schema: coreSchema,
      values: () => ({}),
      change: (p, d) => ({ ...p, cores: [...(p.cores ?? []), { ...d, id: newId('core') }] }),
    }),
  );

  app.post(
    '/projects/:id/cores/:cid',
    projectEdit(deps, {
      ...common,
      form: (c) => `core-${c.req.param('cid')}`,
      schema: coreSchema,
      values: (p, c) => {
        const k = p.cores?.find((x) => x.id === c.req.param('cid'));
        return k ? formValues(coreSpec, k) : null;
      },
      change: (p, d, c) => {
        const cid = c.req.param('cid');
        if (!p.cores?.some((k) => k.id === cid)) return gone();
        return { ...p, cores: p.cores.map((k) => (k.id === cid ? { ...d, id: cid } : k)) };
      },
    }),
  );

  app.get('/projects/:id/cores/:cid/delete', async (c) => {
    const p = await loadProject(deps.database.db, c.req.param('id'));
    const k = p?.cores?.find((x) => x.id === c.req.param('cid'));
    if (!p || !k) return c.notFound();
    const what = `core “${k.name}”`;
    return sendPage(
      c,
      <ConfirmItemPage
        project={p}
        section="rf"
        title={`Delete ${what}`}
        what={what}
        action={`${pageUrl(p)}/${k.id}/delete`}
        back={pageUrl(p)}
        users={coreUsers(p, k.id)}
      />,
    );
  });

  app.post(
    '/projects/:id/cores/:cid/delete',
    projectEdit(deps, {
      ...common,
      form: (c) => `delete-core-${c.req.param('cid')}`,
      schema: z.object({}),
      redirect: (p) => `${pageUrl(p)}?done=deleted`,
      change: (p, _d, c) => {
        const cid = c.req.param('cid')!;
        const k = p.cores?.find((x) => x.id === cid);
        if (!k) return gone();
        const users = coreUsers(p, cid);
        if (users.length) return { errors: { _form: refusal(`core “${k.name}”`, users) } };
        return { ...p, cores: p.cores!.filter((x) => x.id !== cid) };
      },
    }),
  );
  return app;
}
