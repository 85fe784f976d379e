// Overview routes: project settings, stages (add, reorder, currents) and the live budget.
import { Hono } from 'hono';
import { z } from 'zod';
import { STAGE_KIND_LABELS } from '../../core/model';
import type { Project, Stage } from '../../core/model';
import { MODES, STAGE_KINDS } from '../../core/model';
import { evaluateCached as evaluate } from '../cache/reports';
import { withKindDefaults } from '../../core/new-project';
import { loadProject } from '../../db/projects';
import { text, choice } from '../form';
import { readLoadCurrents } from '../../core/edits/stage-loads';
import { specFormSchema } from '../forms/spec-schema';
import { settingsSpec, settingsFormValues, type ProjectSettings } from '../../core/spec/settings';
import { applySettings } from '../../core/edits/settings';
import { projectEdit, doneNotice } from '../edit';
import { sendPage } from '../render';
import type { Deps } from '../deps';
import { Layout, ProjectCrumb } from '../../../views/layout';
import { OverviewBody, loadValues } from '../../../views/pages/overview';
import type { Failed } from '../../../views/components/failed';
import { newId } from '../ids';

const settingsSchema = specFormSchema<ProjectSettings>(settingsSpec);

const addStageSchema = z.object({ kind: choice('Stage kind', STAGE_KINDS), name: text('Stage name', 200, false) });
const moveSchema = z.object({ direction: choice('Direction', ['up', 'down']) });

export function overviewPage(project: Project, failed?: Failed, notice?: string) {
  const report = evaluate(project);
  return (
    <Layout title={project.name} project={project} section="overview">
      <OverviewBody project={project} report={report} failed={failed} notice={notice} />
    </Layout>
  );
}

/** The htmx swap: the overview, and the header's project name (the settings form can rename it). */
export function overviewPartial(project: Project, failed?: Failed, notice?: string) {
  return (
    <>
      <OverviewBody project={project} report={evaluate(project)} failed={failed} notice={notice} />
      <ProjectCrumb name={project.name} oob />
    </>
  );
}

function findStage(p: Project, id: string | undefined): Stage | undefined {
  return p.stages.find((s) => s.id === id);
}

export function overviewRoutes(deps: Deps) {
  const app = new Hono();
  const common = { partial: overviewPartial, page: overviewPage, redirect: (p: Project) => `/projects/${p.id}` };

  app.get('/projects/:id', async (c) => {
    const project = await loadProject(deps.database.db, c.req.param('id'));
    if (!project) return c.notFound();
    return sendPage(c, overviewPage(project, undefined, doneNotice(c)));
  });

  app.post(
    '/projects/:id/settings',
    projectEdit(deps, {
      ...common,
      form: 'settings',
      schema: settingsSchema,
      values: settingsFormValues,
      change: applySettings,
    }),
  );

  app.post(
    '/projects/:id/stages',
    projectEdit(deps, {
      ...common,
      form: 'add-stage',
      schema: addStageSchema,
      values: () => ({}),
      change: (p, d) => {
        const name = d.name || defaultStageName(d.kind);
        const stage = withKindDefaults(p, {
          id: newId('st'),
          kind: d.kind,
          name,
          notes: '',
          loads: [],
          dissipationW: null,
        });
        return { ...p, stages: [...p.stages, stage] };
      },
    }),
  );

  app.post(
    '/projects/:id/stages/:sid/move',
    projectEdit(deps, {
      ...common,
      form: (c) => `move-${c.req.param('sid')}`,
      schema: moveSchema,
      change: (p, d, c) => {
        const i = p.stages.findIndex((s) => s.id === c.req.param('sid'));
        if (i < 0) return { errors: { _form: 'That stage no longer exists; the page has been refreshed.' } };
        const j = d.direction === 'up' ? i - 1 : i + 1;
        if (j < 0 || j >= p.stages.length) return p;
        const stages = [...p.stages];
        [stages[i], stages[j]] = [stages[j], stages[i]];
        return { ...p, stages };
      },
    }),
  );

  app.post(
    '/projects/:id/stages/:sid/loads',
    projectEdit(deps, {
      ...common,
      form: (c) => `loads-${c.req.param('sid')}`,
      schema: z.record(z.string(), z.string()),
      // the currents of numbered rows; '#i' (never typed) names row i's rail, so a row that now feeds another
      // rail is a conflict rather than a silent edit of the wrong row
      values: (p, c) => {
        const s = findStage(p, c.req.param('sid'));
        return s ? { ...loadValues(s), ...Object.fromEntries(s.loads.map((l, i) => [`#${i}`, l.railId])) } : null;
      },
      rowOf: (f) => {
        const row = /^l(\d+)_/.exec(f);
        return row ? `#${row[1]}` : undefined;
      },
      change: (p, values, c) => {
        const stage = findStage(p, c.req.param('sid'));
        if (!stage) return { errors: { _form: 'That stage no longer exists.' } };
        const r = readLoadCurrents(stage.loads, values);
        if (!r.ok) return { errors: r.errors };
        const loads = r.loads;
        return { ...p, stages: p.stages.map((s) => (s.id === stage.id ? { ...s, loads } : s)) };
      },
    }),
  );

  return app;
}

/** A new stage's name when none is typed: its kind in words. */
export function defaultStageName(kind: Stage['kind']): string {
  return STAGE_KIND_LABELS[kind];
}
