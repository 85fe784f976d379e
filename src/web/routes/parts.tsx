// Parts catalog routes: parts and their supplier offers, suppliers with shipping, costing settings.
import { Hono, type Context } from 'hono';
import { z } from 'zod';
import type { Part, Project, Supplier } from '../../core/model';
import { addPart, gone, saveCosting, saveOffer, savePart, saveSupplier } from '../../core/edits/catalog';
import { loadProject } from '../../db/projects';
import { projectEdit, doneNotice } from '../edit';
import { sendPage } from '../render';
import type { Deps } from '../deps';
import { newId } from '../ids';
import * as F from '../parts-forms';
import { refusal } from '../supply-forms';
import { Layout } from '../../../views/layout';
import { PartsBody } from '../../../views/pages/parts';
import { partValues, offerValues } from '../../../views/components/parts-part';
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

export function partsRoutes(deps: Deps) {
  const app = new Hono();
  const pageUrl = (p: Project) => `/projects/${p.id}/parts`;
  const common = { partial: (p: Project, f?: Failed, n?: string) => <PartsBody project={p} failed={f} notice={n} />, page: (p: Project, f?: Failed, n?: string) => partsPage(p, f, n), redirect: pageUrl };
  const noFields = z.object({});

  app.get('/projects/:id/parts', async (c) => {
    const project = await loadProject(deps.database.db, c.req.param('id'));
    if (!project) return c.notFound();
    return sendPage(c, partsPage(project, undefined, doneNotice(c), c.req.query('open')));
  });

  app.post('/projects/:id/costing', projectEdit(deps, { ...common, form: 'costing', schema: F.costingSchema, values: costingValues, change: saveCosting }));

  // ------------------------------------------------------------ suppliers
  app.post('/projects/:id/suppliers', projectEdit(deps, { ...common, form: 'add-supplier', schema: F.supplierSchema, values: () => ({}),
    change: (p, d) => saveSupplier(p, null, d),
  }));

  app.post('/projects/:id/suppliers/:n', projectEdit(deps, { ...common, form: (c) => `supplier-${c.req.param('n')}`, schema: F.supplierSchema,
    change: (p, d, c) => {
      const at = supplierAt(p, c);
      return at ? saveSupplier(p, at.index, d) : gone('supplier');
    },
  }));

  // ------------------------------------------------------------ parts and offers
  app.post('/projects/:id/parts', projectEdit(deps, { ...common, form: 'add-part', schema: F.partSchema, values: () => ({}),
    partial: (p, f, n) => <PartsBody project={p} failed={f} notice={n && !f ? 'Part added: open it below to add supplier offers.' : n} openPart={f ? undefined : p.parts.at(-1)?.id} />,
    redirect: (p) => `${pageUrl(p)}?open=${encodeURIComponent(p.parts.at(-1)?.id ?? '')}#part-${p.parts.at(-1)?.id ?? ''}`,
    change: (p, d) => addPart(p, newId('p'), d),
  }));

  // After an edit the part stays open (a fresh spec per request knows which part that is).
  const keepOpen = (c: Context) => ({
    partial: (p: Project, f?: Failed, n?: string) => <PartsBody project={p} failed={f} notice={n} openPart={c.req.param('pid')} />,
    page: (p: Project, f?: Failed, n?: string) => partsPage(p, f, n, c.req.param('pid')),
    redirect: (p: Project) => `${pageUrl(p)}?open=${encodeURIComponent(c.req.param('pid') ?? '')}#part-${c.req.param('pid') ?? ''}`,
  });

  app.post('/projects/:id/parts/:pid', (c) => projectEdit(deps, { ...common, ...keepOpen(c), form: `part-${c.req.param('pid')}`, schema: F.partSchema,
    values: (p) => {
      const part = p.parts.find((x) => x.id === c.req.param('pid'));
      return part ? partValues(part) : null;
    },
    change: (p, d, c) => savePart(p, c.req.param('pid')!, d),
  })(c));

  app.post('/projects/:id/parts/:pid/offers', (c) => projectEdit(deps, { ...common, ...keepOpen(c), form: `add-offer-${c.req.param('pid')}`, schema: F.offerSchema,
    values: (p) => (p.parts.some((x) => x.id === c.req.param('pid')) ? {} : null),
    change: (p, d, c) => saveOffer(p, c.req.param('pid')!, newId('o'), d, true),
  })(c));

  app.post('/projects/:id/parts/:pid/offers/:oid', (c) => projectEdit(deps, { ...common, ...keepOpen(c), form: `offer-${c.req.param('oid')}`, schema: F.offerSchema,
    values: (p) => {
      const o = p.parts.find((x) => x.id === c.req.param('pid'))?.offers.find((x) => x.id === c.req.param('oid'));
      return o ? offerValues(o, p.currency) : null;
    },
    change: (p, d, c) => saveOffer(p, c.req.param('pid')!, c.req.param('oid')!, d, false),
  })(c));

  // ------------------------------------------------------------ deletes: confirm page, then the post
  type Target = { what: string; users: string[]; also?: string; remove: (p: Project) => Project } | null;
  const targets: Record<string, { path: string; find: (p: Project, c: Context) => Target }> = {
    part: {
      path: '/projects/:id/parts/:pid/delete',
      find: (p, c) => {
        const part = p.parts.find((x) => x.id === c.req.param('pid'));
        if (!part) return null;
        const also = part.offers.length ? `Its ${part.offers.length} supplier offer(s) go with it.` : undefined;
        return { what: `part “${part.description}”`, users: F.partUsers(p, part.id), also, remove: (q) => withParts(q, q.parts.filter((x) => x.id !== part.id)) };
      },
    },
    offer: {
      path: '/projects/:id/parts/:pid/offers/:oid/delete',
      find: (p, c) => {
        const part = p.parts.find((x) => x.id === c.req.param('pid'));
        const o = part?.offers.find((x) => x.id === c.req.param('oid'));
        if (!part || !o) return null;
        const remove = (q: Project) => withParts(q, q.parts.map((x) => (x.id === part.id ? { ...x, offers: x.offers.filter((y) => y.id !== o.id) } : x)));
        return { what: `the ${o.supplier} offer${o.sku ? ` “${o.sku}”` : ''} for “${part.description}”`, users: [], remove };
      },
    },
    supplier: {
      path: '/projects/:id/suppliers/:n/delete',
      find: (p, c) => {
        const at = supplierAt(p, c);
        if (!at) return null;
        return { what: `supplier “${at.s.name}”`, users: F.supplierUsers(p, at.s.name), remove: (q) => withSuppliers(q, q.costing.suppliers.filter((_, i) => i !== at.index)) };
      },
    },
  };

  for (const [kind, t] of Object.entries(targets)) {
    app.get(t.path, async (c) => {
      const project = await loadProject(deps.database.db, c.req.param("id")!);
      if (!project) return c.notFound();
      const found = t.find(project, c);
      if (!found) return c.notFound();
      return sendPage(c, <ConfirmItemPage project={project} section="parts" title={`Delete ${kind}`} what={found.what} action={c.req.path} back={pageUrl(project)} users={found.users} also={found.also} />);
    });
    app.post(t.path, projectEdit(deps, { ...common, form: (c) => `delete-${kind}`, schema: noFields,
      redirect: (p) => `${pageUrl(p)}?done=deleted`,
      change: (p, _d, c) => {
        const found = t.find(p, c);
        if (!found) return gone(kind);
        if (found.users.length) return { errors: { _form: refusal(found.what, found.users) } };
        return found.remove(p);
      },
    }));
  }

  return app;
}
