// Supply routes: transformers, windings, rails and the primary fuse; every edit re-renders #supply.
import { Hono, type Context } from 'hono';
import { z } from 'zod';
import type { Project, Rail } from '../../core/model';
import { enclosureSpec, formValues, primaryFuseSpec, transformerSpec, windingSpec } from '../../core/spec';
import { RAIL_SPECS } from '../../core/spec/supply-rails';
import { addRail, editRail } from '../../core/edits/supply-rails';
import { evaluateCached as evaluate } from '../cache/reports';
import { loadProject } from '../../db/projects';
import { projectEdit, doneNotice, type ChangeResult } from '../edit';
import { sendPage } from '../render';
import type { Deps } from '../deps';
import { newId } from '../ids';
import * as F from '../supply-forms';
import { Layout } from '../../../views/layout';
import { SupplyBody } from '../../../views/pages/supply';
import { ConfirmItemPage } from '../../../views/components/confirm-item';
import type { Failed } from '../../../views/components/failed';
import type { EvaluationReport } from '../../core/evaluate';
import { SupplyResults, FindingList } from '../../../views/partials/supply-results';
import { SupplyGlance } from '../../../views/components/supply-corners';
import { sortFindings } from '../../core/findings';
import { supplyChoices, supplyChoicesSpec, type SupplyChoices } from '../../core/spec/supply-choices';
import { specFormSchema } from '../forms/spec-schema';

const choicesSchema = specFormSchema<SupplyChoices>(supplyChoicesSpec);

function supplyResultsFor(project: Project, report: EvaluationReport) {
  if (!report.supply)
    return (
      <p class="hint card">
        No computed supply results: add a rail (and, for a mains station, a transformer with a winding) to see rail
        voltages at the mains corners, ripple, fuses and heat.
      </p>
    );
  const rectified = project.supply.rails.filter((r) => r.kind === 'rectified');
  return (
    <>
      {rectified.length && project.mains ? (
        <p class="hint">
          SPICE netlists at the worst voltage corner (low mains, key-down), with .meas lines for the mean, ripple,
          trough, winding RMS and peak diode current:{' '}
          {rectified.map((r, i) => (
            <>
              {i ? ', ' : ''}
              <a href={`/projects/${project.id}/supply/${r.id}/netlist.cir`} download>
                {r.name}
              </a>
            </>
          ))}
          .
        </p>
      ) : null}
      <SupplyResults report={report.supply} heat={report.heat} />
      {report.catalog.length ? (
        <section class="card">
          <h3>Parts on the parts list against this design</h3>
          <FindingList findings={sortFindings(report.catalog)} />
        </section>
      ) : null}
    </>
  );
}

function body(project: Project, failed?: Failed, notice?: string, openRail?: string) {
  const parentsFor = (railId: string) =>
    F.possibleParents(project, railId).map((r): [string, string] => [r.id, r.name]);
  const report = evaluate(project);
  const results = supplyResultsFor(project, report);
  const glance = report.supply?.rails.length ? <SupplyGlance report={report.supply} /> : null;
  return (
    <SupplyBody
      project={project}
      parentsFor={parentsFor}
      results={results}
      glance={glance}
      failed={failed}
      notice={notice}
      openRail={openRail}
    />
  );
}

export function supplyPage(project: Project, failed?: Failed, notice?: string, openRail?: string) {
  return (
    <Layout title={`Supply · ${project.name}`} project={project} section="supply">
      {body(project, failed, notice, openRail)}
    </Layout>
  );
}

const gone = (what: string): ChangeResult => ({
  errors: {
    _form: `That ${what} no longer exists (deleted in another window?). The page now shows the stored supply.`,
  },
});
const railAt = (p: Project, id: string | undefined) => p.supply.rails.find((r) => r.id === id);
const withRails = (p: Project, rails: Rail[]): Project => ({ ...p, supply: { ...p.supply, rails } });
const railEdit = (r: ReturnType<typeof editRail>): ChangeResult => (r.ok ? r.project : { errors: r.errors });

export function supplyRoutes(deps: Deps) {
  const app = new Hono();
  const pageUrl = (p: Project) => `/projects/${p.id}/supply`;
  const common = {
    partial: (p: Project, f?: Failed, n?: string) => body(p, f, n),
    page: (p: Project, f?: Failed, n?: string) => supplyPage(p, f, n),
    redirect: pageUrl,
  };
  const rawValues = z.record(z.string(), z.string());
  const noFields = z.object({});

  app.get('/projects/:id/supply', async (c) => {
    const project = await loadProject(deps.database.db, c.req.param('id'));
    if (!project) return c.notFound();
    return sendPage(c, supplyPage(project, undefined, doneNotice(c), c.req.query('open')));
  });

  // ------------------------------------------------------------ transformers and windings
  app.post(
    '/projects/:id/supply/transformers',
    projectEdit(deps, {
      ...common,
      form: 'add-transformer',
      schema: F.transformerSchema,
      values: () => ({}),
      change: (p, d) => ({
        ...p,
        supply: {
          ...p.supply,
          transformers: [
            ...p.supply.transformers,
            {
              id: newId('tr'),
              name: d.name,
              construction: d.construction,
              secondaryToleranceFraction: d.secondaryToleranceFraction,
              windings: [],
            },
          ],
        },
      }),
    }),
  );

  app.post(
    '/projects/:id/supply/transformers/:tid',
    projectEdit(deps, {
      ...common,
      form: (c) => `transformer-${c.req.param('tid')}`,
      schema: F.transformerSchema,
      values: (p, c) => {
        const t = p.supply.transformers.find((x) => x.id === c.req.param('tid'));
        return t ? formValues(transformerSpec, t) : null;
      },
      change: (p, d, c) => {
        const tid = c.req.param('tid');
        if (!p.supply.transformers.some((t) => t.id === tid)) return gone('transformer');
        return {
          ...p,
          supply: {
            ...p.supply,
            transformers: p.supply.transformers.map((t) =>
              t.id === tid
                ? {
                    ...t,
                    name: d.name,
                    construction: d.construction,
                    secondaryToleranceFraction: d.secondaryToleranceFraction,
                  }
                : t,
            ),
          },
        };
      },
    }),
  );

  app.post(
    '/projects/:id/supply/transformers/:tid/windings',
    projectEdit(deps, {
      ...common,
      form: (c) => `add-winding-${c.req.param('tid')}`,
      schema: F.windingSchema,
      values: (p, c) => (p.supply.transformers.some((x) => x.id === c.req.param('tid')) ? {} : null),
      change: (p, d, c) => {
        const tid = c.req.param('tid');
        if (!p.supply.transformers.some((t) => t.id === tid)) return gone('transformer');
        const w = { ...d, id: newId('w') };
        return {
          ...p,
          supply: {
            ...p.supply,
            transformers: p.supply.transformers.map((t) => (t.id === tid ? { ...t, windings: [...t.windings, w] } : t)),
          },
        };
      },
    }),
  );

  app.post(
    '/projects/:id/supply/windings/:wid',
    projectEdit(deps, {
      ...common,
      form: (c) => `winding-${c.req.param('wid')}`,
      schema: F.windingSchema,
      values: (p, c) => {
        const w = p.supply.transformers.flatMap((t) => t.windings).find((x) => x.id === c.req.param('wid'));
        return w ? formValues(windingSpec, w) : null;
      },
      change: (p, d, c) => {
        const wid = c.req.param('wid');
        if (!p.supply.transformers.some((t) => t.windings.some((w) => w.id === wid))) return gone('winding');
        return {
          ...p,
          supply: {
            ...p.supply,
            transformers: p.supply.transformers.map((t) => ({
              ...t,
              windings: t.windings.map((w) => (w.id === wid ? { ...w, ...d } : w)),
            })),
          },
        };
      },
    }),
  );

  // ------------------------------------------------------------ rails and the primary fuse
  app.post(
    '/projects/:id/supply/rails',
    projectEdit(deps, {
      ...common,
      form: 'add-rail',
      schema: F.addRailSchema,
      values: () => ({}),
      partial: (p, f, n) =>
        body(
          p,
          f,
          n && !f ? 'Rail added with typical values: enter your parts below and save.' : n,
          f ? undefined : p.supply.rails.at(-1)?.id,
        ),
      redirect: (p) =>
        `${pageUrl(p)}?open=${encodeURIComponent(p.supply.rails.at(-1)?.id ?? '')}#rail-` +
          `${p.supply.rails.at(-1)?.id ?? ''}`,
      change: (p, d) => railEdit(addRail(p, newId('rail'), d.name, d.source)),
    }),
  );

  // The edited rail stays open after the swap (a fresh spec per request knows which rail that is).
  app.post('/projects/:id/supply/rails/:rid', (c) =>
    projectEdit(deps, {
      ...common,
      form: `rail-${c.req.param('rid')}`,
      schema: rawValues,
      change: (p, v) => railEdit(editRail(p, c.req.param('rid') ?? '', v)),
      values: (p) => {
        const r = railAt(p, c.req.param('rid'));
        return r ? formValues(RAIL_SPECS[r.kind], r) : null;
      },
      partial: (p, f, n) => body(p, f, n, c.req.param('rid')),
      page: (p, f, n) => supplyPage(p, f, n, c.req.param('rid')),
      redirect: (p) =>
        `${pageUrl(p)}?open=${encodeURIComponent(c.req.param('rid') ?? '')}#rail-${c.req.param('rid') ?? ''}`,
    })(c),
  );

  app.post(
    '/projects/:id/supply/fuse',
    projectEdit(deps, {
      ...common,
      form: 'primary-fuse',
      schema: F.fuseSchema,
      values: (p) => formValues(primaryFuseSpec, p.supply),
      change: (p, d) => ({ ...p, supply: { ...p.supply, primaryFuseA: d.primaryFuseA } }),
    }),
  );

  app.post(
    '/projects/:id/supply/choices',
    projectEdit(deps, {
      ...common,
      form: 'supply-choices',
      schema: choicesSchema,
      values: (p) => formValues(supplyChoicesSpec, supplyChoices(p.supply)),
      change: (p, d) => ({
        ...p,
        supply: { ...p.supply, primaryFuseSheet: d.primaryFuseSheet, transformerSizing: d.transformerSizing },
      }),
    }),
  );

  app.post(
    '/projects/:id/supply/enclosure',
    projectEdit(deps, {
      ...common,
      form: 'enclosure',
      schema: F.enclosureSchema,
      values: (p) => formValues(enclosureSpec, p.supply),
      change: (p, d) => ({
        ...p,
        supply: { ...p.supply, enclosureAreaM2: d.enclosureAreaM2, enclosureUWPerM2K: d.enclosureUWPerM2K },
      }),
    }),
  );

  // ------------------------------------------------------------ deletes: confirm page, then the post
  type Target = { what: string; users: string[]; also?: string } | null;
  const targets: Record<string, (p: Project, itemId: string) => Target> = {
    rails: (p, id) => {
      const r = railAt(p, id);
      return r ? { what: `rail “${r.name}”`, users: F.railUsers(p, id) } : null;
    },
    windings: (p, id) => {
      const w = p.supply.transformers.flatMap((t) => t.windings).find((x) => x.id === id);
      return w ? { what: `winding “${w.name}”`, users: F.windingUsers(p, id) } : null;
    },
    transformers: (p, id) => {
      const t = p.supply.transformers.find((x) => x.id === id);
      return t
        ? {
            what: `transformer “${t.name}”`,
            users: F.transformerUsers(p, id),
            also: t.windings.length ? `Its ${t.windings.length} winding(s) go with it.` : undefined,
          }
        : null;
    },
  };
  const remove: Record<string, (p: Project, id: string) => Project> = {
    rails: (p, id) =>
      withRails(
        p,
        p.supply.rails.filter((r) => r.id !== id),
      ),
    windings: (p, id) => ({
      ...p,
      supply: {
        ...p.supply,
        transformers: p.supply.transformers.map((t) => ({ ...t, windings: t.windings.filter((w) => w.id !== id) })),
      },
    }),
    transformers: (p, id) => ({
      ...p,
      supply: { ...p.supply, transformers: p.supply.transformers.filter((t) => t.id !== id) },
    }),
  };

  for (const kind of Object.keys(targets)) {
    app.get(`/projects/:id/supply/${kind}/:item/delete`, async (c) => {
      const project = await loadProject(deps.database.db, c.req.param('id'));
      if (!project) return c.notFound();
      const t = targets[kind](project, c.req.param('item'));
      if (!t) return c.notFound();
      const url = `${pageUrl(project)}/${kind}/${c.req.param('item')}/delete`;
      return sendPage(
        c,
        <ConfirmItemPage
          project={project}
          section="supply"
          title={`Delete ${t.what}`}
          what={t.what}
          action={url}
          back={pageUrl(project)}
          users={t.users}
          also={t.also}
        />,
      );
    });
    app.post(
      `/projects/:id/supply/${kind}/:item/delete`,
      projectEdit(deps, {
        ...common,
        form: (c) => `delete-${kind}-${c.req.param('item')}`,
        schema: noFields,
        redirect: (p) => `${pageUrl(p)}?done=deleted`,
        change: (p, _d, c) => {
          const id = c.req.param('item')!;
          const t = targets[kind](p, id);
          if (!t) return gone(kind.slice(0, -1));
          if (t.users.length) return { errors: { _form: F.refusal(t.what, t.users) } };
          return remove[kind](p, id);
        },
      }),
    );
  }

  return app;
}
