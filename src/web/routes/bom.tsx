// Parts-list routes: lines (add, edit, delete), costing view, CSV export, CSV import with preview.
import { Hono, type Context } from 'hono';
import { z } from 'zod';
import type { Project } from '../../core/model';
import { costProject } from '../../core/cost';
import {
  costReportToCsv,
  orderSheetsToCsv,
  planImport,
  previewImport,
  rowsToProjectData,
  guessDelimiter,
  parseCsv,
  guessMapping,
  type IdKind,
} from '../../core/csv';
import { loadProject, updateProject, VersionConflict, NotFound } from '../../db/projects';
import { projectEdit, doneNotice } from '../edit';
import { sendPage } from '../render';
import { versionField } from '../form';
import type { Deps } from '../deps';
import { newId } from '../ids';
import { readCsvUpload } from '../csv-upload';
import { lineSchema, mappingFrom } from '../bom-forms';
import { deleteLine, mergeImport, saveLine } from '../../core/edits/parts-list';
import { bindCandidate } from '../../core/edits/bind-role';
import { evaluate } from '../../core/evaluate';
import { Layout } from '../../../views/layout';
import { BomBody } from '../../../views/pages/bom';
import { lineValues } from '../../../views/components/bom-lines';
import { ImportPreviewBody, type ImportPreviewProps } from '../../../views/components/bom-import';
import { ConfirmItemPage } from '../../../views/components/confirm-item';
import type { Failed } from '../../../views/components/failed';

export { CSV_IMPORT_LIMIT_BYTES } from '../csv-upload';

const body = (p: Project, failed?: Failed, notice?: string) => {
  const report = evaluate(p);
  return <BomBody project={p} report={report.cost} roles={report.roles.statuses} failed={failed} notice={notice} />;
};

export function bomPage(project: Project, failed?: Failed, notice?: string) {
  return (
    <Layout title={`Parts list · ${project.name}`} project={project} section="bom">
      {body(project, failed, notice)}
    </Layout>
  );
}

type ImportState = Omit<ImportPreviewProps, 'project' | 'preview' | 'message'> & { values: Record<string, string> };

const importIds = (kind: IdKind) => newId(kind === 'part' ? 'p' : kind === 'offer' ? 'o' : 'b');

/** Read the import request: an uploaded file (first step) or the CSV text carried by the preview form. */
async function readImport(c: Context): Promise<ImportState | { error: string; status: 413 | 422 }> {
  const upload = await readCsvUpload(c);
  if ('error' in upload) return upload;
  const { values, csv, fileName } = upload;
  const duplicates = values.duplicates === 'merge' || values.duplicates === 'skip' ? values.duplicates : '';
  return {
    values,
    csv,
    fileName,
    stageId: values.stageId ?? '',
    decimal: values.decimal === ',' ? ',' : '.',
    takeGoodRows: values.takeGoodRows === 'true',
    duplicates,
    existingLines: 0,
  };
}

export function bomRoutes(deps: Deps) {
  const app = new Hono();
  const pageUrl = (p: Project) => `/projects/${p.id}/bom`;
  const common = { partial: body, page: bomPage, redirect: pageUrl };

  app.get('/projects/:id/bom', async (c) => {
    const project = await loadProject(deps.database.db, c.req.param('id'));
    if (!project) return c.notFound();
    const q = c.req.query();
    const n = (k: string) => Number(q[k]) || 0;
    const imported = () =>
      `Imported ${n('lines')} line(s); ${n('parts')} new catalog part(s); ${n('skipped')} refused row(s) skipped` +
      (n('merged') ? `; ${n('merged')} line(s) already in the list took the file's quantities` : '') +
      (n('kept') ? `; ${n('kept')} line(s) already in the list were left as they were` : '') +
      (n('totals') ? `; ${n('totals')} totals row(s) ignored` : '') +
      '.';
    const notice =
      q.done === 'deleted' || q.done === 'saved' ? doneNotice(c) : q.done === 'imported' ? imported() : undefined;
    return sendPage(c, bomPage(project, undefined, notice));
  });

  const csvRoute = (suffix: string, write: typeof costReportToCsv) => async (c: Context) => {
    const project = await loadProject(deps.database.db, c.req.param('id')!);
    if (!project) return c.notFound();
    const sep = c.req.query('sep') ?? 'comma';
    if (sep !== 'comma' && sep !== 'semicolon')
      return c.text(`Bad request: sep must be "comma" or "semicolon" (you gave "${sep.slice(0, 40)}").`, 400);
    const semicolon = sep === 'semicolon';
    const text = write(costProject(project), { delimiter: semicolon ? ';' : ',' });
    const fileName = `${project.name.replace(/[^A-Za-z0-9._-]+/g, '-').slice(0, 60) || 'parts-list'}-${suffix}.csv`;
    return c.body(text, 200, {
      'Content-Type': 'text/csv; charset=utf-8',
      'Content-Disposition': `attachment; filename="${fileName}"`,
    });
  };
  app.get('/projects/:id/bom.csv', csvRoute('parts', costReportToCsv));
  app.get('/projects/:id/orders.csv', csvRoute('orders', orderSheetsToCsv));

  app.post(
    '/projects/:id/bom/lines',
    projectEdit(deps, {
      ...common,
      form: 'add-line',
      schema: lineSchema,
      values: () => ({}),
      change: (p, d) => saveLine(p, newId('b'), d, true),
    }),
  );
  app.post(
    '/projects/:id/bom/lines/:lid',
    projectEdit(deps, {
      ...common,
      form: (c) => `line-${c.req.param('lid')}`,
      schema: lineSchema,
      values: (p, c) => {
        const l = p.bom.find((x) => x.id === c.req.param('lid'));
        return l ? lineValues(l) : null;
      },
      change: (p, d, c) => saveLine(p, c.req.param('lid')!, d, false),
    }),
  );

  // a candidate for a design role: the role is found in the design as it is now (it may have changed since the page)
  const bindSchema = z.object({
    roleId: z.string().trim().min(1, 'Design role: missing').max(200),
    partId: z.string().trim().min(1, 'Part: missing').max(200),
  });
  app.post(
    '/projects/:id/bom/roles/bind',
    projectEdit(deps, {
      ...common,
      form: 'bind-role',
      schema: bindSchema,
      change: (p, d) =>
        bindCandidate(
          p,
          evaluate(p).roles.list.find((r) => r.id === d.roleId),
          d.partId,
          newId('b'),
        ),
    }),
  );

  app.get('/projects/:id/bom/lines/:lid/delete', async (c) => {
    const project = await loadProject(deps.database.db, c.req.param('id'));
    const line = project?.bom.find((l) => l.id === c.req.param('lid'));
    if (!project || !line) return c.notFound();
    const part = project.parts.find((x) => x.id === line.partId);
    const what = `the line ${line.refs ? `“${line.refs}” ` : ''}(${line.qtyPerRig}` +
      ` × ${part?.description ?? 'unknown part'})`;
    return sendPage(
      c,
      <ConfirmItemPage
        project={project}
        section="bom"
        title="Delete parts-list line"
        what={what}
        action={c.req.path}
        back={pageUrl(project)}
        users={[]}
        also="The part stays in the catalog."
      />,
    );
  });

  app.post(
    '/projects/:id/bom/lines/:lid/delete',
    projectEdit(deps, {
      ...common,
      form: (c) => `delete-line-${c.req.param('lid')}`,
      schema: z.object({}),
      redirect: (p) => `${pageUrl(p)}?done=deleted`,
      change: (p, _d, c) => deleteLine(p, c.req.param('lid')!),
    }),
  );

  // ------------------------------------------------------------ CSV import: preview until the user imports
  app.post('/projects/:id/bom/import', async (c) => {
    const id = c.req.param('id');
    const project = await loadProject(deps.database.db, id);
    if (!project) return c.notFound();
    const input = await readImport(c);
    if ('error' in input)
      return sendPage(
        c,
        bomPage(project, { form: 'import', state: { values: {}, errors: { _form: input.error } } }, undefined),
        input.status,
      );
    const { values, ...state } = input;
    const delimiter = guessDelimiter(state.csv);
    const headers = (parseCsv(state.csv, delimiter).records[0] ?? []).map((h) => h.trim());
    const mapping = mappingFrom(values, guessMapping(headers), headers.length);
    const preview = previewImport(state.csv, {
      kind: 'parts-list',
      defaultCurrency: project.currency,
      decimal: state.decimal,
      delimiter,
      mapping,
      stages: project.stages,
    });
    const stageId = state.stageId === '' ? null : state.stageId;
    const plan = planImport(preview, { takeGoodRows: state.takeGoodRows });
    // Lines of the file already in the list (same part, stage and designators): the user chooses merge or skip.
    const existing = (p: Project) =>
      plan.ok
        ? mergeImport(p, rowsToProjectData(plan.rows, { makeId: importIds, stageId, asBomLines: true }), 'skip').matched
        : 0;
    state.existingLines = existing(project);
    const show = (p: Project, status: 200 | 409 | 422, message?: string) =>
      sendPage(
        c,
        <Layout title={`Import preview · ${p.name}`} project={p} section="bom">
          <ImportPreviewBody project={p} preview={preview} message={message} {...state} />
        </Layout>,
        status,
      );
    if (values.action !== 'import') return show(project, 200);

    if (stageId !== null && !project.stages.some((s) => s.id === stageId))
      return show(project, 422, 'The chosen stage no longer exists; choose another.');
    if (!plan.ok) {
      const refused = preview.invalidRows;
      const why = preview.fileErrors.length
        ? 'the file or the column choices have problems (listed above)'
        : `${refused} row(s) are refused`;
      return show(
        project,
        422,
        `Nothing was imported: ${why}. Correct the file or the column choices, or tick “Import only the good ` +
          `rows”.`,
      );
    }
    const version = versionField.safeParse(values.version);
    if (!version.success) return show(project, 422, 'The form had no version number; reload the page.');
    if (state.existingLines > 0 && state.duplicates === '') {
      return show(
        project,
        422,
        `Nothing was imported: ${state.existingLines} line(s) of the file are already in the parts list. Choose ` +
          `whether to merge them (take the file's quantities) or skip them.`,
      );
    }
    const duplicates = state.duplicates === '' ? 'skip' : state.duplicates;
    const data = rowsToProjectData(plan.rows, { makeId: importIds, stageId, asBomLines: true });
    let stats = { newParts: 0, added: 0, matched: 0 };
    try {
      await updateProject(deps.database, id, version.data, (p) => {
        const merged = mergeImport(p, data, duplicates);
        stats = merged;
        return merged.project;
      }, deps.now().toISOString());
    } catch (e) {
      if (e instanceof VersionConflict) {
        const fresh = (await loadProject(deps.database.db, id)) ?? project;
        state.existingLines = existing(fresh);
        return show(
          fresh,
          409,
          'Not imported: this project was changed in another tab or window since the preview was made. The preview ' +
            'now uses the stored project; press Import again to add the rows to it.',
        );
      }
      if (e instanceof NotFound) return c.notFound();
      throw e;
    }
    const done = `done=imported&lines=${stats.added}&parts=${stats.newParts}&skipped=` +
      `${new Set(plan.skipped.map((e) => e.row)).size}`;
    return c.redirect(
      `${pageUrl(project)}?${done}&${duplicates === 'merge' ? 'merged' : 'kept'}=` +
        `${stats.matched}&totals=${preview.totalsRows.length}`,
      303,
    );
  });

  return app;
}
