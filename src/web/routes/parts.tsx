// Parts catalog routes: parts and their supplier offers, suppliers with shipping, costing settings.
import { Hono, type Context } from 'hono';
import { z } from 'zod';
import type { Part, Project, Supplier } from '../../core/model';
import { addPart, gone, saveCosting, saveOffer, savePart, saveSupplier } from '../../core/edits/catalog';
import { loadProject, updateProject, VersionConflict, NotFound } from '../../db/projects';
import { guessDelimiter, guessMapping, parseCsv, planImport, previewImport } from '../../core/csv';
import { applyCatalogUpdate, planCatalogUpdate } from '../../core/csv/catalog-update';
import { storedProblem } from '../../core/spec/derive';
import { offerSpec } from '../../core/spec/parts';
import { versionField } from '../form';
import { readCsvUpload } from '../csv-upload';
import { mappingFrom } from '../bom-forms';
import { CatalogPreviewBody } from '../../../views/components/catalog-import';
import { projectEdit, doneNotice } from '../edit';
import { sendPage } from '../render';
import type { Deps } from '../deps';
import { newId } from '../ids';
import * as F from '../parts-forms';
import { refusal } from '../supply-forms';
import { Layout } from '../../../views/layout';
import { PartsBody } from '../../../views/pages/parts';
import { partValues, offerValues, RatingBoxes } from '../../../views/components/parts-part';
import { costingValues } from '../../../views/components/parts-costing';
import { ConfirmItemPage } from '../../../views/components/confirm-item';
import type { Failed } from '../../../views/components/failed';

export function partsPage(project: Project, failed?: Failed, notice?: string, openPart?: string) {
  return (
    <Layout title={`Parts catalog · ${project.name}`} project={project} section="parts">
      <PartsBody project={project} failed={failed} notice={notice} openPart={openPart} />
    </Layout>
  );
}

const withParts = (p: Project, parts: Part[]): Project => ({ ...p, parts });
const withSuppliers = (p: Project, suppliers: Supplier[]): Project => ({ ...p, costing: { ...p.costing, suppliers } });

function supplierAt(p: Project, c: Context): { index: number; s: Supplier } | null {
  const index = Number(c.req.param('n'));
  const s = Number.isInteger(index) ? p.costing.suppliers[index] : undefined;
  return s ? { index, s } : null;
}

/** The line after a price-list import, from the counts in the redirect's query. */
function importedNotice(c: Context): string | undefined {
  if (c.req.query('done') !== 'catalog') return undefined;
  const n = (k: string) => Number(c.req.query(k)) || 0;
  return (
    `Price list imported: ${n('changed')} offer(s) changed, ${n('parts')} new part(s), ` +
    `${n('offers')} new offer(s) for catalog parts` +
    (n('gone') ? `, ${n('gone')} offer(s) gone from the list removed` : '') +
    (n('kept') ? `, ${n('kept')} offer(s) gone from the list kept` : '') +
    (n('skipped') ? `; ${n('skipped')} refused row(s) skipped` : '') +
    '.'
  );
}

export function partsRoutes(deps: Deps) {
  const app = new Hono();
  const pageUrl = (p: Project) => `/projects/${p.id}/parts`;
  const common = {
    partial: (p: Project, f?: Failed, n?: string) => <PartsBody project={p} failed={f} notice={n} />,
    page: (p: Project, f?: Failed, n?: string) => partsPage(p, f, n),
    redirect: pageUrl,
  };
  const noFields = z.object({});

  app.get('/projects/:id/parts', async (c) => {
    const project = await loadProject(deps.database.db, c.req.param('id'));
    if (!project) return c.notFound();
    return sendPage(c, partsPage(project, undefined, doneNotice(c) ?? importedNotice(c), c.req.query('open')));
  });

  // the part form's rating boxes for the category just chosen, with what was typed in the form kept (htmx swap)
  app.get('/projects/:id/parts/rating-boxes', (c) => {
    const values = c.req.query();
    const idp = /^[\w-]{1,80}$/.test(values.idp ?? '') ? values.idp! : 'ap';
    return c.html(<RatingBoxes state={{ values, errors: {} }} idp={idp} category={values.category ?? ''} />);
  });

  // ------------------------------------------------------------ a supplier's price list: preview until Import
  app.post('/projects/:id/parts/import', async (c) => {
    const id = c.req.param('id');
    const project = await loadProject(deps.database.db, id);
    if (!project) return c.notFound();
    const upload = await readCsvUpload(c);
    if ('error' in upload)
      return sendPage(
        c,
        partsPage(project, { form: 'catalog-import', state: { values: {}, errors: { _form: upload.error } } }),
        upload.status,
      );
    const { values, csv, fileName } = upload;
    const supplier = (values.supplier ?? '').trim();
    const supplierProblem = supplier === '' ? '' : storedProblem(offerSpec.fields.supplier, supplier);
    const decimal = values.decimal === ',' ? ',' : '.';
    const delimiter = guessDelimiter(csv);
    const headers = (parseCsv(csv, delimiter).records[0] ?? []).map((h) => h.trim());
    const mapping = mappingFrom(values, guessMapping(headers, 'catalog'), headers.length);
    const preview = previewImport(csv, {
      kind: 'catalog',
      defaultCurrency: project.currency,
      decimal,
      delimiter,
      mapping,
      defaultSupplier: supplierProblem ? '' : supplier,
    });
    const takeGoodRows = values.takeGoodRows === 'true';
    const removeGone = values.removeGone === 'true';
    const plan = planImport(preview, { takeGoodRows });
    const refused = preview.rows.filter((r) => r.errors.length > 0).map((r) => r.values);
    const updateOf = (p: Project) => (plan.ok ? planCatalogUpdate(p, plan.rows, refused) : null);
    const show = (p: Project, status: 200 | 409 | 422, message?: string) =>
      sendPage(
        c,
        <Layout title={`Price list preview · ${p.name}`} project={p} section="parts">
          <CatalogPreviewBody
            project={p}
            csv={csv}
            fileName={fileName}
            supplier={supplier}
            decimal={decimal}
            takeGoodRows={takeGoodRows}
            removeGone={removeGone}
            preview={preview}
            update={updateOf(p)}
            message={message}
          />
        </Layout>,
        status,
      );
    if (supplierProblem) return show(project, 422, `Supplier ${supplierProblem}; nothing was imported.`);
    if (values.action !== 'import') return show(project, 200);
    if (!plan.ok) {
      const why = preview.fileErrors.length
        ? 'the file or the column choices have problems (listed above)'
        : `${preview.invalidRows} row(s) are refused`;
      return show(
        project,
        422,
        `Nothing was imported: ${why}. Correct the file or the column choices, or tick “Import only the good ` +
          `rows”.`,
      );
    }
    const version = versionField.safeParse(values.version);
    if (!version.success) return show(project, 422, 'The form had no version number; reload the page.');
    const update = planCatalogUpdate(project, plan.rows, refused);
    if (update.errors.length)
      return show(project, 422, 'Nothing was imported: the file names an offer twice (listed above).');
    const makeId = (k: 'part' | 'offer') => newId(k === 'part' ? 'p' : 'o');
    try {
      await updateProject(
        deps.database,
        id,
        version.data,
        (p) => applyCatalogUpdate(p, planCatalogUpdate(p, plan.rows, refused), { removeGone, makeId, rows: plan.rows }),
        deps.now().toISOString(),
      );
    } catch (e) {
      if (e instanceof VersionConflict) {
        const fresh = (await loadProject(deps.database.db, id)) ?? project;
        return show(
          fresh,
          409,
          'Not imported: this project was changed in another tab or window since the preview was made. The preview ' +
            'now compares with the stored catalog; press Import again to apply it.',
        );
      }
      if (e instanceof NotFound) return c.notFound();
      throw e;
    }
    const n = update.counts;
    const q = `done=catalog&changed=${n.up + n.down + n.mixed + n.terms}&parts=${n['new-part']}&offers=` +
      `${n['new-offer']}&gone=${removeGone ? n.gone : 0}&kept=${removeGone ? 0 : n.gone}&skipped=` +
      `${new Set(plan.skipped.map((e) => e.row)).size}`;
    return c.redirect(`${pageUrl(project)}?${q}`, 303);
  });

  app.post(
    '/projects/:id/costing',
    projectEdit(deps, {
      ...common,
      form: 'costing',
      schema: F.costingSchema,
      values: costingValues,
      change: saveCosting,
    }),
  );

  // ------------------------------------------------------------ suppliers
  app.post(
    '/projects/:id/suppliers',
    projectEdit(deps, {
      ...common,
      form: 'add-supplier',
      schema: F.supplierSchema,
      values: () => ({}),
      change: (p, d) => saveSupplier(p, null, d),
    }),
  );

  app.post(
    '/projects/:id/suppliers/:n',
    projectEdit(deps, {
      ...common,
      form: (c) => `supplier-${c.req.param('n')}`,
      schema: F.supplierSchema,
      change: (p, d, c) => {
        const at = supplierAt(p, c);
        return at ? saveSupplier(p, at.index, d) : gone('supplier');
      },
    }),
  );

  // ------------------------------------------------------------ parts and offers
  app.post(
    '/projects/:id/parts',
    projectEdit(deps, {
      ...common,
      form: 'add-part',
      schema: F.partSchema,
      values: () => ({}),
      partial: (p, f, n) => (
        <PartsBody
          project={p}
          failed={f}
          notice={n && !f ? 'Part added: open it below to add supplier offers.' : n}
          openPart={f ? undefined : p.parts.at(-1)?.id}
        />
      ),
      redirect: (p) =>
        `${pageUrl(p)}?open=${encodeURIComponent(p.parts.at(-1)?.id ?? '')}#part-${p.parts.at(-1)?.id ?? ''}`,
      change: (p, d) => addPart(p, newId('p'), d),
    }),
  );

  // After an edit the part stays open (a fresh spec per request knows which part that is).
  const keepOpen = (c: Context) => ({
    partial: (p: Project, f?: Failed, n?: string) => (
      <PartsBody project={p} failed={f} notice={n} openPart={c.req.param('pid')} />
    ),
    page: (p: Project, f?: Failed, n?: string) => partsPage(p, f, n, c.req.param('pid')),
    redirect: (p: Project) =>
      `${pageUrl(p)}?open=${encodeURIComponent(c.req.param('pid') ?? '')}#part-${c.req.param('pid') ?? ''}`,
  });

  app.post('/projects/:id/parts/:pid', (c) =>
    projectEdit(deps, {
      ...common,
      ...keepOpen(c),
      form: `part-${c.req.param('pid')}`,
      schema: F.partSchema,
      values: (p) => {
        const part = p.parts.find((x) => x.id === c.req.param('pid'));
        return part ? partValues(part) : null;
      },
      change: (p, d, c) => savePart(p, c.req.param('pid')!, d),
    })(c),
  );

  app.post('/projects/:id/parts/:pid/offers', (c) =>
    projectEdit(deps, {
      ...common,
      ...keepOpen(c),
      form: `add-offer-${c.req.param('pid')}`,
      schema: F.offerSchema,
      values: (p) => (p.parts.some((x) => x.id === c.req.param('pid')) ? {} : null),
      change: (p, d, c) => saveOffer(p, c.req.param('pid')!, newId('o'), d, true),
    })(c),
  );

  app.post('/projects/:id/parts/:pid/offers/:oid', (c) =>
    projectEdit(deps, {
      ...common,
      ...keepOpen(c),
      form: `offer-${c.req.param('oid')}`,
      schema: F.offerSchema,
      values: (p) => {
        const o = p.parts.find((x) => x.id === c.req.param('pid'))?.offers.find((x) => x.id === c.req.param('oid'));
        return o ? offerValues(o, p.currency) : null;
      },
      change: (p, d, c) => saveOffer(p, c.req.param('pid')!, c.req.param('oid')!, d, false),
    })(c),
  );

  // ------------------------------------------------------------ deletes: confirm page, then the post
  type Target = { what: string; users: string[]; also?: string; remove: (p: Project) => Project } | null;
  const targets: Record<string, { path: string; find: (p: Project, c: Context) => Target }> = {
    part: {
      path: '/projects/:id/parts/:pid/delete',
      find: (p, c) => {
        const part = p.parts.find((x) => x.id === c.req.param('pid'));
        if (!part) return null;
        const also = part.offers.length ? `Its ${part.offers.length} supplier offer(s) go with it.` : undefined;
        return {
          what: `part “${part.description}”`,
          users: F.partUsers(p, part.id),
          also,
          remove: (q) =>
            withParts(
              q,
              q.parts.filter((x) => x.id !== part.id),
            ),
        };
      },
    },
    offer: {
      path: '/projects/:id/parts/:pid/offers/:oid/delete',
      find: (p, c) => {
        const part = p.parts.find((x) => x.id === c.req.param('pid'));
        const o = part?.offers.find((x) => x.id === c.req.param('oid'));
        if (!part || !o) return null;
        const remove = (q: Project) =>
          withParts(
            q,
            q.parts.map((x) => (x.id === part.id ? { ...x, offers: x.offers.filter((y) => y.id !== o.id) } : x)),
          );
        return {
          what: `the ${o.supplier} offer${o.sku ? ` “${o.sku}”` : ''} for “${part.description}”`,
          users: [],
          remove,
        };
      },
    },
    supplier: {
      path: '/projects/:id/suppliers/:n/delete',
      find: (p, c) => {
        const at = supplierAt(p, c);
        if (!at) return null;
        return {
          what: `supplier “${at.s.name}”`,
          users: F.supplierUsers(p, at.s.name),
          remove: (q) =>
            withSuppliers(
              q,
              q.costing.suppliers.filter((_, i) => i !== at.index),
            ),
        };
      },
    },
  };

  for (const [kind, t] of Object.entries(targets)) {
    app.get(t.path, async (c) => {
      const project = await loadProject(deps.database.db, c.req.param('id')!);
      if (!project) return c.notFound();
      const found = t.find(project, c);
      if (!found) return c.notFound();
      return sendPage(
        c,
        <ConfirmItemPage
          project={project}
          section="parts"
          title={`Delete ${kind}`}
          what={found.what}
          action={c.req.path}
          back={pageUrl(project)}
          users={found.users}
          also={found.also}
        />,
      );
    });
    app.post(
      t.path,
      projectEdit(deps, {
        ...common,
        form: (c) => `delete-${kind}`,
        schema: noFields,
        redirect: (p) => `${pageUrl(p)}?done=deleted`,
        change: (p, _d, c) => {
          const found = t.find(p, c);
          if (!found) return gone(kind);
          if (found.users.length) return { errors: { _form: refusal(found.what, found.users) } };
          return found.remove(p);
        },
      }),
    );
  }

  return app;
}
