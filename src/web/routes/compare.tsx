// Variants: clone a project as a variant of another, compare two or three side by side, sweep one parameter of one.
// Compare and sweep are plain GET forms (they change nothing); the variant clone is a POST like the other clones.
import { Hono } from 'hono';
import type { Context } from 'hono';
import { listProjects, loadProject, insertProject } from '../../db/projects';
import { cloneProject } from '../../core/new-project';
import type { Project } from '../../core/model';
import { projectMetrics } from '../../core/compare/metrics';
import { compareRows } from '../../core/compare/rows';
import { runSweep, sweepStart, sweepTargets, type SweepTarget } from '../../core/compare/sweep';
import { SWEEP_PARAMETERS, SWEEP_SPECS, isSweepParameter, type SweepParameter } from '../../core/spec/sweep';
import { formValues as specFormValues, parseForm, type NumberField } from '../../core/spec';
import { evaluateCached } from '../cache/reports';
import { sendPage } from '../render';
import { newId } from '../ids';
import type { Deps } from '../deps';
import type { FieldState } from '../../../views/components/fields';
import { ComparePage, SweepPage } from '../../../views/pages/compare';

const SLOTS = ['p1', 'p2', 'p3'] as const;
const SLOT_LABEL = { p1: 'First (reference)', p2: 'Second', p3: 'Third (optional)' } as const;

const NOT_AVAILABLE: Record<SweepParameter, string> = {
  mainsV: 'this project has no mains supply (battery or DC only)',
  windingV: 'this project has no transformer winding',
  reservoirF: 'this project has no rectified rail with a reservoir',
  paLoadOhm: 'this project has no final amplifier stage with PA data',
  lpfOrder: 'this project has no low-pass filter stage',
};

export function compareRoutes(deps: Deps) {
  const app = new Hono();

  app.get('/compare', async (c) => {
    const all = await listProjects(deps.database.db);
    const values = Object.fromEntries(SLOTS.map((s) => [s, c.req.query(s) ?? '']));
    const state: FieldState = { values, errors: {} };
    const chosenIds = SLOTS.filter((s) => values[s] !== '');
    if (!chosenIds.length) return sendPage(c, <ComparePage all={all} chosen={[]} rows={null} state={state} />);
    const projects: Project[] = [];
    for (const s of chosenIds) {
      const p = await loadProject(deps.database.db, values[s]);
      if (p) projects.push(p);
      else
        state.errors[s] =
          `${SLOT_LABEL[s]}: there is no project "${values[s].slice(0, 80)}" (deleted in another window?)`;
    }
    if (!values.p1) state.errors.p1 = `${SLOT_LABEL.p1}: choose a project`;
    const errors = Object.values(state.errors);
    if (errors.length)
      return sendPage(
        c,
        <ComparePage all={all} chosen={[]} rows={null} state={state} message={errors.join(' ')} />,
        422,
      );
    // one project (the list's Compare link on a project without variants): ask for the second, nothing is wrong
    if (projects.length < 2)
      return sendPage(
        c,
        <ComparePage
          all={all}
          chosen={[]}
          rows={null}
          state={state}
          prompt="Choose a second project to compare with."
        />,
      );
    const rows = compareRows(projects.map((p) => projectMetrics(p, evaluateCached(p))));
    const chosen = projects.map((p) => all.find((x) => x.id === p.id)!).filter(Boolean);
    return sendPage(c, <ComparePage all={all} chosen={chosen} rows={rows} state={state} />);
  });

  // From a project's pages: compare it with its original, or with its first two variants.
  app.get('/projects/:id/compare', async (c) => {
    const id = c.req.param('id');
    const all = await listProjects(deps.database.db);
    const self = all.find((p) => p.id === id);
    if (!self) return c.notFound();
    const ids = self.variantOf
      ? [self.variantOf, id]
      : [
          id,
          ...all
            .filter((p) => p.variantOf === id)
            .map((p) => p.id)
            .slice(0, 2),
        ];
    const q = new URLSearchParams(ids.map((x, i) => [SLOTS[i], x]));
    return c.redirect(`/compare?${q}`, 303);
  });

  app.post('/projects/:id/variant', async (c) => {
    const source = await loadProject(deps.database.db, c.req.param('id'));
    if (!source) return c.notFound();
    const copy = {
      ...cloneProject(source, newId('prj'), `Variant of ${source.name}`.slice(0, 200), newId),
      variantOf: source.id,
    };
    await insertProject(deps.database, copy, deps.now().toISOString());
    return c.redirect(
      `/?notice=${encodeURIComponent(`Made "${copy.name}": change it, then compare it with its original.`)}`,
      303,
    );
  });

  app.get('/projects/:id/sweep', async (c) => sweepPage(c, deps));

  return app;
}

async function sweepPage(c: Context, deps: Deps) {
  const project = await loadProject(deps.database.db, c.req.param('id')!);
  if (!project) return c.notFound();
  const targets = Object.fromEntries(SWEEP_PARAMETERS.map((p) => [p, sweepTargets(project, p)])) as Record<
    SweepParameter,
    SweepTarget[]
  >;
  // each form starts from a range round its first item's value
  const states = Object.fromEntries(
    SWEEP_PARAMETERS.map((p) => {
      const t = targets[p][0];
      const start = t ? sweepStart(p, t.currentValue, SWEEP_SPECS[p].fields.from as NumberField) : null;
      const values = start ? specFormValues(SWEEP_SPECS[p], { target: t.id, ...start }) : {};
      return [p, { values, errors: {} }];
    }),
  ) as Record<SweepParameter, FieldState>;
  const page = (
    active: SweepParameter | null,
    result: Parameters<typeof SweepPage>[0]['result'],
    status: 200 | 422 = 200,
  ) =>
    sendPage(
      c,
      <SweepPage
        project={project}
        targets={targets}
        states={states}
        active={active}
        result={result}
        unavailable={NOT_AVAILABLE}
      />,
      status,
    );

  const param = c.req.query('param');
  if (param === undefined) return page(null, null);
  if (!isSweepParameter(param)) {
    const message = `Parameter: "${param.slice(0, 40)}" is not one that can be swept; choose one of the forms below`;
    return sendPage(
      c,
      <SweepPage
        project={project}
        targets={targets}
        states={states}
        active={null}
        result={null}
        unavailable={NOT_AVAILABLE}
        message={message}
      />,
      422,
    );
  }
  const typed = {
    target: c.req.query('target') ?? '',
    from: c.req.query('from') ?? '',
    to: c.req.query('to') ?? '',
    points: c.req.query('points') ?? '',
  };
  states[param] = { values: typed, errors: {} };
  const parsed = parseForm(SWEEP_SPECS[param], typed);
  if (!parsed.ok) {
    states[param].errors = parsed.errors;
    return page(param, null, 422);
  }
  const v = parsed.value as { target: string; from: number; to: number; points: number };
  const outcome = runSweep(project, { parameter: param, ...v }, evaluateCached);
  if (!outcome.ok) {
    states[param].errors = outcome.errors;
    return page(param, null, 422);
  }
  return page(param, outcome.result);
}
