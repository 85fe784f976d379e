// RF checks page and its settings; the filter's SPICE netlist download.
import { Hono } from 'hono';
import type { Project, RfSettings } from '../../core/model';
import { evaluateCached as evaluate } from '../cache/reports';
import { loadProject } from '../../db/projects';
import { specFormSchema } from '../forms/spec-schema';
import { rfSettingsSpec, rfSettingsFormValues } from '../../core/spec/rf-settings';
import { applyRfSettings } from '../../core/edits/settings';
import { projectEdit, doneNotice } from '../edit';
import { sendPage } from '../render';
import type { Deps } from '../deps';
import { Layout } from '../../../views/layout';
import { RfBody } from '../../../views/pages/rf';
import type { Failed } from '../../../views/components/failed';

const rfSettingsSchema = specFormSchema<RfSettings>(rfSettingsSpec);

const body = (p: Project, failed?: Failed, notice?: string) => (
  <RfBody project={p} report={evaluate(p)} failed={failed} notice={notice} />
);
const page = (p: Project, failed?: Failed, notice?: string) => (
  <Layout title={`RF checks · ${p.name}`} project={p} section="rf">
    {body(p, failed, notice)}
  </Layout>
);

export function rfRoutes(deps: Deps) {
  const app = new Hono();
  app.get('/projects/:id/rf', async (c) => {
    const p = await loadProject(deps.database.db, c.req.param('id'));
    if (!p) return c.notFound();
    return sendPage(c, page(p, undefined, doneNotice(c)));
  });
  app.post(
    '/projects/:id/rf/settings',
    projectEdit(deps, {
      form: 'rf-settings',
      schema: rfSettingsSchema,
      values: rfSettingsFormValues,
      change: applyRfSettings,
      redirect: (p) => `/projects/${p.id}/rf`,
      partial: body,
      page,
    }),
  );
  return app;
}
