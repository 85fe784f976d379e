// SPICE netlist downloads: each rectified rail at its worst voltage corner, and the as-built filter.
import { Hono, type Context } from 'hono';
import { evaluateCached as evaluate } from '../cache/reports';
import { railNetlist } from '../../core/power/spice-netlist';
import { designLpf, lpfNetlist } from '../../core/rf';
import { loadProject } from '../../db/projects';
import type { Deps } from '../deps';

function download(c: Context, fileName: string, text: string) {
  c.header('Content-Disposition', `attachment; filename="${fileName.replace(/[^A-Za-z0-9._-]+/g, '-')}"`);
  return c.body(text, 200, { 'Content-Type': 'text/plain; charset=utf-8' });
}

export function netlistRoutes(deps: Deps) {
  const app = new Hono();

  app.get('/projects/:id/supply/:railId/netlist.cir', async (c) => {
    const p = await loadProject(deps.database.db, c.req.param('id'));
    const rail = p?.supply.rails.find((r) => r.id === c.req.param('railId'));
    if (!p || !rail) return c.notFound();
    if (rail.kind !== 'rectified') return c.text('Only a rectified rail has a rectifier netlist.', 404);
    const winding = p.supply.transformers.flatMap((t) => t.windings).find((w) => w.id === rail.windingId);
    if (!winding || !p.mains)
      return c.text(
        'This rail has no winding or the project has no mains settings, so there is nothing to simulate.',
        422,
      );
    // the worst voltage corner: low mains, the key-down current from the budget
    const report = evaluate(p);
    const loadA = report.budget.rails.find((r) => r.railId === rail.id)?.outputA.keyDown;
    // an unknown key-down load (a computed current core refused) gets no netlist rather than one for no load
    if (loadA === undefined || !Number.isFinite(loadA))
      return c.text(
        'The key-down load of this rail is unknown (see the failed checks on the overview), so no netlist was made.',
        422,
      );
    const mainsFactor = 1 - p.mains.lowFraction;
    return download(
      c,
      `${rail.id}-low-mains-keydown.cir`,
      railNetlist(rail, winding, p.mains.frequencyHz, mainsFactor, loadA),
    );
  });

  app.get('/projects/:id/stages/:sid/lpf.cir', async (c) => {
    const p = await loadProject(deps.database.db, c.req.param('id'));
    const stage = p?.stages.find((s) => s.id === c.req.param('sid'));
    if (!p || !stage?.lpf) return c.notFound();
    const d = designLpf(stage.lpf, p.frequencyHz);
    if (!d.ok)
      return c.text(
        `The filter data has errors, so no netlist was ` +
          `made:\n${d.errors.map((e) => `${e.field}: ${e.message}`).join('\n')}\n`,
        422,
      );
    return download(c, `${stage.id}-lpf.cir`, lpfNetlist(d.value));
  });

  return app;
}
