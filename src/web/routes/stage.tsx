// Stage routes: edit a stage (general data and loads, PA / filter / relay data) and delete it.
import { Hono, type Context } from 'hono';
import { z } from 'zod';
import type { Project, Stage, StageLoad } from '../../core/model';
import { MODES } from '../../core/model';
import { withKindDefaults } from '../../core/new-project';
import { loadProject, updateProject, VersionConflict } from '../../db/projects';
import { num, parseForm, type FieldErrors } from '../form';
import { projectEdit, doneNotice, type ChangeResult } from '../edit';
import { sendPage, formValues } from '../render';
import type { Deps } from '../deps';
import { stageSchema, paSchema, toPa, lpfSchema, toLpf, relaySchema, toRelay } from '../stage-forms';
import { Layout } from '../../../views/layout';
import { StageBody } from '../../../views/pages/stage';
import { ConfirmItemPage } from '../../../views/components/confirm-item';
import type { Failed } from '../../../views/components/failed';
import { stageResults } from './stage-results';

const sid = (c: Context) => c.req.param('sid')!;

function withStage(p: Project, id: string, f: (s: Stage) => Stage | { errors: FieldErrors }): ChangeResult {
  const stage = p.stages.find((s) => s.id === id);
  if (!stage) return { errors: { _form: 'That stage no longer exists (deleted in another window?).' } };
  const next = f(stage);
  if ('errors' in next) return next;
  return { ...p, stages: p.stages.map((s) => (s.id === id ? next : s)) };
}

/** The stage without the data of other kinds: a stage changed from final to driver no longer carries (and is no
 *  longer evaluated with) hidden PA data; the new kind gets its starting data from withKindDefaults. */
function ownData(s: Stage, kind: Stage['kind']): Stage {
  const { pa, lpf, relay, ...rest } = s;
  return { ...rest, ...(kind === 'final' && pa ? { pa } : {}), ...(kind === 'lpf' && lpf ? { lpf } : {}), ...(kind === 'tr' && relay ? { relay } : {}) };
}

function parseLoads(p: Project, values: Record<string, string>): { loads: StageLoad[] } | { errors: FieldErrors } {
  const errors: FieldErrors = {};
  const loads: StageLoad[] = [];
  const railIds = new Set(p.supply.rails.map((r) => r.id));
  for (let i = 0; `rail${i}` in values; i++) {
    const railId = values[`rail${i}`];
    if (!railId) continue;
    if (!railIds.has(railId)) {
      errors[`rail${i}`] = 'That rail no longer exists; choose another.';
      continue;
    }
    const currentA = { receive: 0, keyUp: 0, keyDown: 0 };
    for (const m of MODES) {
      const key = `l${i}_${m}`;
      const raw = values[key] ?? '';
      if (raw.trim() === '') continue; // an empty current in a new row means 0 A
      const r = num('A', { label: 'Current', min: 0, max: 100 }).safeParse(raw);
      if (r.success) currentA[m] = r.data;
      else errors[key] = r.error.issues[0].message;
    }
    loads.push({ railId, currentA });
  }
  return Object.keys(errors).length ? { errors } : { loads };
}

/** A stage deleted in another window: the same message as a page and as the htmx swap, with the way back. */
const StageGone = ({ project }: { project: Project }) => (
  <div id="stage">
    <section class="card">
      <div class="form-errors" role="alert">
        <p>Not saved: this stage no longer exists (deleted in another tab or window?). Nothing was changed.</p>
      </div>
      <p>
        <a href={`/projects/${project.id}`}>← All stages and the budget</a>
      </p>
    </section>
  </div>
);

export function stageRoutes(deps: Deps) {
  const app = new Hono();
  const page = (p: Project, c: Context) => (failed?: Failed, notice?: string) => {
    const stage = p.stages.find((s) => s.id === sid(c));
    if (!stage)
      return (
        <Layout title="Stage not found" project={p} section="overview">
          <StageGone project={p} />
        </Layout>
      );
    return (
      <Layout title={stage.name} project={p} section="overview">
        <StageBody project={p} stage={stage} failed={failed} notice={notice} results={stageResults(p, stage)} />
      </Layout>
    );
  };
  const partial = (p: Project, c: Context) => (failed?: Failed, notice?: string) => {
    const stage = p.stages.find((s) => s.id === sid(c));
    return stage ? <StageBody project={p} stage={stage} failed={failed} notice={notice} results={stageResults(p, stage)} /> : <StageGone project={p} />;
  };
  const edit = <S extends z.ZodType>(form: string, schema: S, change: (p: Project, d: z.output<S>, c: Context) => ChangeResult) => (c: Context) =>
    projectEdit(deps, {
      form,
      schema,
      change,
      redirect: (p) => `/projects/${p.id}/stages/${sid(c)}`,
      partial: (p, f, n) => partial(p, c)(f, n),
      page: (p, f, n) => page(p, c)(f, n),
    })(c);

  app.get('/projects/:id/stages/:sid', async (c) => {
    const p = await loadProject(deps.database.db, c.req.param('id'));
    if (!p || !p.stages.some((s) => s.id === sid(c))) return c.notFound();
    return sendPage(c, page(p, c)(undefined, doneNotice(c)));
  });

  app.post(
    '/projects/:id/stages/:sid',
    edit('stage', z.record(z.string(), z.string()), (p, values, c) => {
      const general = parseForm(stageSchema, values);
      const loads = parseLoads(p, values);
      const errors = { ...(general.ok ? {} : general.errors), ...('errors' in loads ? loads.errors : {}) };
      if (!general.ok || 'errors' in loads) return { errors };
      const d = general.data;
      return withStage(p, sid(c), (s) => withKindDefaults(p, { ...ownData(s, d.kind), name: d.name, kind: d.kind, notes: d.notes, dissipationW: d.dissipation, loads: loads.loads }));
    }),
  );

  app.post(
    '/projects/:id/stages/:sid/pa',
    edit('pa', paSchema, (p, d, c) => {
      if (!p.supply.rails.some((r) => r.id === d.railId)) return { errors: { railId: 'That rail no longer exists; choose another.' } };
      if (d.saturation === null && d.rdsOn === null) return { errors: { saturation: 'Give either the saturation voltage or Rds(on).' } };
      return withStage(p, sid(c), (s) => ({ ...s, pa: toPa(d) }));
    }),
  );
  app.post('/projects/:id/stages/:sid/lpf', edit('lpf', lpfSchema, (p, d, c) => withStage(p, sid(c), (s) => ({ ...s, lpf: toLpf(d) }))));
  app.post(
    '/projects/:id/stages/:sid/relay',
    edit('relay', relaySchema, (p, d, c) => {
      if (d.coilRailId && !p.supply.rails.some((r) => r.id === d.coilRailId)) return { errors: { coilRailId: 'That rail no longer exists; choose another.' } };
      return withStage(p, sid(c), (s) => ({ ...s, relay: toRelay(d) }));
    }),
  );

  app.get('/projects/:id/stages/:sid/delete', async (c) => {
    const p = await loadProject(deps.database.db, c.req.param('id'));
    const stage = p?.stages.find((s) => s.id === sid(c));
    if (!p || !stage) return c.notFound();
    const used = p.bom.filter((b) => b.stageId === stage.id).length;
    return sendPage(
      c,
      <ConfirmItemPage
        project={p}
        section="overview"
        title="Delete stage"
        what={`stage “${stage.name}”`}
        also={used ? `Its ${used} parts-list line${used === 1 ? '' : 's'} move to "General".` : undefined}
        action={`/projects/${p.id}/stages/${stage.id}/delete`}
        back={`/projects/${p.id}`}
        users={[]}
      />,
    );
  });

  app.post('/projects/:id/stages/:sid/delete', async (c) => {
    const id = c.req.param('id');
    const values = await formValues(c);
    const version = Number(values.version);
    const p = await loadProject(deps.database.db, id);
    if (!p || !p.stages.some((s) => s.id === sid(c))) return c.notFound();
    try {
      await updateProject(
        deps.database,
        id,
        Number.isInteger(version) ? version : -1,
        (q) => ({ ...q, stages: q.stages.filter((s) => s.id !== sid(c)), bom: q.bom.map((b) => (b.stageId === sid(c) ? { ...b, stageId: null } : b)) }),
        deps.now().toISOString(),
      );
    } catch (e) {
      if (!(e instanceof VersionConflict)) throw e;
      return sendPage(
        c,
        <ConfirmItemPage
          project={p}
          section="overview"
          title="Not deleted: the project changed meanwhile"
          what={`stage “${p.stages.find((s) => s.id === sid(c))!.name}”`}
          action={`/projects/${id}/stages/${sid(c)}/delete`}
          back={`/projects/${id}`}
          users={[]}
        />,
        409,
      );
    }
    return c.redirect(`/projects/${id}`, 303);
  });

  return app;
}
