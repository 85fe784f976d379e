// Stage routes: edit a stage (general data and loads, PA / filter / relay data) and delete it.
import { Hono, type Context } from 'hono';
import { z } from 'zod';
import type { Project, Stage, StageLoad } from '../../core/model';
import { MODES, STAGE_KIND_LABELS } from '../../core/model';
import { withKindDefaults } from '../../core/new-project';
import { droppedByKindChange, keepOwnData } from '../../core/edits/stage-kind';
import { loadProject, updateProject, VersionConflict } from '../../db/projects';
import { num, parseForm, type FieldErrors } from '../form';
import { projectEdit, doneNotice, type ChangeResult } from '../edit';
import { sendPage, sendPartial, formValues, isHtmx } from '../render';
import type { Deps } from '../deps';
import { readLoads } from '../../core/edits/stage-loads';
import { railInPlace } from '../../core/edits/rail-in-place';
import { newId } from '../ids';
import { stageSchema, stageValues } from '../stage-forms';
import { STAGE_DATA, missingRefs } from '../../core/spec/stage-data';
import { formValues as specText } from '../../core/spec/derive';
import { formName } from '../../core/spec/field';
import { specFormSchema } from '../forms/spec-schema';
import { Layout } from '../../../views/layout';
import { StageBody } from '../../../views/pages/stage';
import { ConfirmItemPage } from '../../../views/components/confirm-item';
import { KindChangeConfirm } from '../../../views/pages/stage-kind-confirm';
import type { Failed } from '../../../views/components/failed';
import { stageResults } from './stage-results';

const sid = (c: Context) => c.req.param('sid')!;

/** Each stage form's text (as the page fills it), or null when the stage no longer has that data. */
const formText: Record<string, (s: Stage) => Record<string, string> | null> = {
  stage: stageValues,
  ...Object.fromEntries(
    STAGE_DATA.map((d) => [d.key, (s: Stage) => (s.kind === d.kind && s[d.key] ? specText(d.spec, s[d.key]) : null)]),
  ),
};

function withStage(p: Project, id: string, f: (s: Stage) => Stage | { errors: FieldErrors }): ChangeResult {
  const stage = p.stages.find((s) => s.id === id);
  if (!stage) return { errors: { _form: 'That stage no longer exists (deleted in another window?).' } };
  const next = f(stage);
  if ('errors' in next) return next;
  return { ...p, stages: p.stages.map((s) => (s.id === id ? next : s)) };
}

/** The stage form as typed (version included), without the kind-change question's own answers. */
const typedStage = (values: Record<string, string>) =>
  Object.fromEntries(Object.entries(values).filter(([k]) => k !== 'confirmDrop' && k !== 'keepKind'));

const railName = (p: Project) => (id: string) => p.supply.rails.find((r) => r.id === id)?.name ?? id;

function parseLoads(p: Project, values: Record<string, string>): { loads: StageLoad[] } | { errors: FieldErrors } {
  const r = readLoads(new Set(p.supply.rails.map((x) => x.id)), values);
  return r.ok ? { loads: r.loads } : { errors: r.errors };
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
    return stage ? (
      <StageBody project={p} stage={stage} failed={failed} notice={notice} results={stageResults(p, stage)} />
    ) : (
      <StageGone project={p} />
    );
  };
  const edit =
    <S extends z.ZodType>(form: string, schema: S, change: (p: Project, d: z.output<S>, c: Context) => ChangeResult) =>
    (c: Context) =>
      projectEdit(deps, {
        form,
        schema,
        change,
        // the form's text for a project (null when the stage or its data is gone): saves from an older version
        // merge field by field; load rows are numbered, so a row's fields belong to its rail (rowOf)
        values: (p) => {
          const stage = p.stages.find((s) => s.id === sid(c));
          return stage ? (formText[form]?.(stage) ?? null) : null;
        },
        rowOf: (f) => {
          const row = /^l(\d+)_/.exec(f);
          return row ? `rail${row[1]}` : undefined;
        },
        gone: {
          message: 'Not saved: this stage no longer exists (deleted in another tab or window?). Nothing was changed.',
          back: (p) => `/projects/${p.id}`,
        },
        redirect: (p) => `/projects/${p.id}/stages/${sid(c)}`,
        partial: (p, f, n) => partial(p, c)(f, n),
        page: (p, f, n) => page(p, c)(f, n),
      })(c);

  app.get('/projects/:id/stages/:sid', async (c) => {
    const p = await loadProject(deps.database.db, c.req.param('id'));
    if (!p || !p.stages.some((s) => s.id === sid(c))) return c.notFound();
    return sendPage(c, page(p, c)(undefined, doneNotice(c)));
  });

  const saveStage = edit('stage', z.record(z.string(), z.string()), (before, typedValues, c) => {
    const general = parseForm(stageSchema, typedValues);
    // a load row may choose a new rail, named and fed as the form says: it is added with the stage
    const placed = railInPlace(before, typedValues, newId('rail'));
    if (!placed.ok) return { errors: { ...(general.ok ? {} : general.errors), ...placed.errors } };
    const { project: p, values } = placed;
    const loads = parseLoads(p, values);
    const errors = { ...(general.ok ? {} : general.errors), ...('errors' in loads ? loads.errors : {}) };
    if (!general.ok || 'errors' in loads) return { errors };
    const d = general.data;
    return withStage(p, sid(c), (s) => {
      // The question is asked before this runs for a form of the current version; a form from an older version
      // (merged with changes made meanwhile) is refused here instead, and its next save asks.
      const dropped = values.confirmDrop === '1' || d.kind === s.kind ? [] : droppedByKindChange(s, d.kind);
      if (dropped.length) {
        const what = dropped.map((x) => x.what).join(' and ');
        const to = STAGE_KIND_LABELS[d.kind];
        const message = `Not saved: changing the kind to ${to} drops this stage’s ${what}. Save again to see it.`;
        return { errors: { kind: message } };
      }
      const typed = { name: d.name, kind: d.kind, notes: d.notes, dissipationW: d.dissipationW, loads: loads.loads };
      return withKindDefaults(p, { ...keepOwnData(s, d.kind), ...typed });
    });
  });

  /** A valid stage form that changes the kind of a stage with PA, filter or relay data, not yet confirmed: the
   *  question (what is dropped, with both answers); undefined when there is nothing to ask. */
  const kindChangeQuestion = (p: Project, stage: Stage, values: Record<string, string>) => {
    // a form from an older version is merged by projectEdit first; the change itself refuses an unconfirmed drop
    if (values.confirmDrop === '1' || values.version !== String(p.version)) return undefined;
    const general = parseForm(stageSchema, values);
    if (!general.ok || 'errors' in parseLoads(p, values) || general.data.kind === stage.kind) return undefined;
    const dropped = droppedByKindChange(stage, general.data.kind, railName(p));
    if (!dropped.length) return undefined;
    const [kind, typed] = [general.data.kind, typedStage(values)];
    return <KindChangeConfirm project={p} stage={stage} newKind={kind} dropped={dropped} values={typed} />;
  };

  /** "Keep the kind": the stage form again with everything typed except the new kind; nothing is saved. */
  const keepKind = (p: Project, stage: Stage, values: Record<string, string>): Failed => {
    const stale = Number(values.version) !== p.version;
    const note =
      'This project was changed in another tab or window meanwhile: the page shows the stored project with your ' +
      'entries in this form; check them before saving.';
    const errors: FieldErrors = stale ? { _form: note } : {};
    const state = { values: { ...typedStage(values), kind: stage.kind }, errors };
    return { form: 'stage', state };
  };

  app.post('/projects/:id/stages/:sid', async (c) => {
    const values = await formValues(c);
    const p = await loadProject(deps.database.db, c.req.param('id'));
    const stage = p?.stages.find((s) => s.id === sid(c));
    if (p && stage && values.keepKind === '1') {
      const failed = keepKind(p, stage, values);
      const kind = STAGE_KIND_LABELS[stage.kind];
      const notice =
        `Not saved yet: the kind stays ${kind}. ` + 'Your other entries are below; press Save stage to save them.';
      return isHtmx(c) ? sendPartial(c, partial(p, c)(failed, notice)) : sendPage(c, page(p, c)(failed, notice));
    }
    const question = p && stage ? kindChangeQuestion(p, stage, values) : undefined;
    if (question) {
      if (isHtmx(c)) return sendPartial(c, question);
      return sendPage(
        c,
        <Layout title={`Change the kind of ${stage!.name}?`} project={p!} section="overview">
          {question}
        </Layout>,
      );
    }
    return saveStage(c);
  });

  // the data block each kind owns (PA, filter, relay): one route per registry entry
  for (const d of STAGE_DATA) {
    const change = (p: Project, value: Record<string, unknown>, c: Context): ChangeResult => {
      const missing = missingRefs(p, d.spec, value);
      if (missing.length)
        return {
          errors: Object.fromEntries(missing.map((e) => [formName(e.field, d.spec.fields[e.field]), e.message])),
        };
      return withStage(p, sid(c), (s) => ({ ...s, [d.key]: value }));
    };
    app.post(
      `/projects/:id/stages/:sid/${d.key}`,
      edit(d.key, specFormSchema<Record<string, unknown>>(d.spec), change),
    );
  }

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
        (q) => ({
          ...q,
          stages: q.stages.filter((s) => s.id !== sid(c)),
          bom: q.bom.map((b) => (b.stageId === sid(c) ? { ...b, stageId: null } : b)),
        }),
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
