// Sources page: the published sources (or their honest status) behind this project's checks.
import { Hono } from 'hono';
import { evaluateCached as evaluate } from '../cache/reports';
import { loadProject } from '../../db/projects';
import { sourcesUsed } from '../../core/sources/used';
import { sendPage } from '../render';
import type { Deps } from '../deps';
import { Layout } from '../../../views/layout';
import { SourcesBody } from '../../../views/pages/sources';

export function sourcesRoutes(deps: Deps) {
  const app = new Hono();
  app.get('/projects/:id/sources', async (c) => {
    const p = await loadProject(deps.database.db, c.req.param('id'));
    if (!p) return c.notFound();
    const report = evaluate(p);
    return sendPage(
      c,
      <Layout title={`Sources · ${p.name}`} project={p} section="sources">
        <SourcesBody ruleSet={p.rf.spuriousRule} uses={sourcesUsed(p, report)} />
      </Layout>,
    );
  });
  return app;
}
