// Builder pack: the checklists on screen and the PDF download (A4 or US Letter).
import { Hono } from 'hono';
import { z } from 'zod';
import { evaluateCached as evaluate } from '../cache/reports';
import { buildChecklist, safetyChecklist, SAFETY_PREAMBLE } from '../../core/checklists';
import { buildPack, PACK_PARTS } from '../../pdf';
import { loadProject } from '../../db/projects';
import { sendPage } from '../render';
import type { Deps } from '../deps';
import { Layout } from '../../../views/layout';
import { PackBody } from '../../../views/pages/pack';

const querySchema = z.object({
  paper: z.enum(['a4', 'letter'], { message: 'paper must be "a4" or "letter"' }).default('a4'),
  part: z
    .enum(PACK_PARTS, { message: `part must be one of ${PACK_PARTS.map((x) => `"${x}"`).join(', ')}` })
    .default('both'),
});

export function packRoutes(deps: Deps) {
  const app = new Hono();
  app.get('/projects/:id/pack', async (c) => {
    const p = await loadProject(deps.database.db, c.req.param('id'));
    if (!p) return c.notFound();
    const report = evaluate(p);
    return sendPage(
      c,
      <Layout title={`Builder pack · ${p.name}`} project={p} section="pack">
        <PackBody
          project={p}
          build={buildChecklist(p, report)}
          safety={safetyChecklist(p, report)}
          safetyPreamble={SAFETY_PREAMBLE}
        />
      </Layout>,
    );
  });
  app.get('/projects/:id/pack.pdf', async (c) => {
    const q = querySchema.safeParse(c.req.query());
    if (!q.success) return c.text(`Bad request: ${q.error.issues.map((i) => i.message).join('; ')}.`, 400);
    const p = await loadProject(deps.database.db, c.req.param('id'));
    if (!p) return c.notFound();
    const { paper, part } = q.data;
    const bytes = await buildPack(p, evaluate(p), { paper, part, dataDate: deps.now().toISOString().slice(0, 10) });
    // the full pack keeps its old name; a builder's or organiser's pack says which in the file name
    const name = `${p.name.replace(/[^A-Za-z0-9._-]+/g, '-').slice(0, 60) || 'project'}${
      part === 'both' ? '' : `-${part}`
    }-${paper}.pdf`;
    c.header('Content-Disposition', `attachment; filename="${name}"`);
    return c.body(bytes as unknown as ArrayBuffer, 200, { 'Content-Type': 'application/pdf' });
  });
  return app;
}
