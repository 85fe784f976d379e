// A supplier's price list imported into the catalog: the upload form on the parts catalog page, and the preview with
// the column choices, per-row messages and what importing would change (prices up or down, new parts, offers gone).
// The column choices, summary and row messages are the parts-list import's own components.
import type { FC } from 'hono/jsx';
import type { Offer, Project } from '../../src/core/model';
import type { ImportPreview } from '../../src/core/csv';
import type { CatalogChange, CatalogUpdate } from '../../src/core/csv/catalog-update';
import { ratingsReadable } from '../../src/core/spec/ratings-readable';
import { formatMoney } from '../../src/core/cost/money';
import { Version } from './supply-transformer';
import { FormAlert, PreviewMapping, PreviewSummary, RowProblems } from './bom-import';

const action = (p: Project) => `/projects/${p.id}/parts/import`;

export const CatalogImportForm: FC<{ project: Project; error?: string }> = ({ project, error }) => (
  <form
    method="post"
    action={action(project)}
    enctype="multipart/form-data"
    class="card add"
    aria-label="Import a supplier price list"
    id="catalog-import"
  >
    <h2>Import a supplier’s price list (CSV)</h2>
    <Version version={project.version} />
    <FormAlert message={error} />
    <div class="row">
      <label class="field" for="cat-file">
        <span class="label">
          CSV file (description, category, ratings, SKU, price or price breaks, minimum order, multiple, currency)
        </span>
        <input id="cat-file" type="file" name="file" accept=".csv,.txt,text/csv" />
      </label>
      <label class="field" for="cat-supplier">
        <span class="label">Supplier (for rows with no supplier column)</span>
        <input id="cat-supplier" name="supplier" list="supplier-names" maxlength={120} />
      </label>
      <button type="submit">Preview…</button>
    </div>
    <p class="hint">
      You will see every row and what would change before anything is saved. Offers are matched by supplier and SKU, so
      importing an updated list changes their prices in place.
    </p>
  </form>
);

export interface CatalogPreviewProps {
  project: Project;
  csv: string;
  fileName: string;
  supplier: string;
  decimal: '.' | ',';
  takeGoodRows: boolean;
  removeGone: boolean;
  preview: ImportPreview;
  /** What the good rows would change; null while the file or a row blocks the import. */
  update: CatalogUpdate | null;
  message?: string;
}

const breaksText = (o: Offer | undefined) =>
  o
    ? o.breaks.map((b) => `${b.minQty}: ${formatMoney(b.unitPriceCents, o.currency)}`).join(', ') +
      (o.minOrder > 1 || o.orderMultiple > 1 ? ` (min ${o.minOrder}, ×${o.orderMultiple})` : '')
    : '';

const CHANGE_WORDS: Record<string, string> = {
  up: 'price up', down: 'price down', mixed: 'prices up and down', terms: 'terms changed', same: 'unchanged',
  'new-part': 'new part', 'new-offer': 'new offer for a catalog part', gone: 'gone from the list',
};
const word = (c: CatalogChange) => CHANGE_WORDS[c.kind === 'changed' ? c.move : c.kind];

export const CatalogPreviewBody: FC<CatalogPreviewProps> = (props) => {
  const { project, csv, fileName, supplier, decimal, takeGoodRows, removeGone, preview, update, message } = props;
  const shown = update?.changes.filter((c) => !(c.kind === 'changed' && c.move === 'same')) ?? [];
  const n = update?.counts;
  return (
    <section class="card import-preview" id="catalog-import-preview">
      <h1>Price list preview{fileName ? `: ${fileName}` : ''}</h1>
      <FormAlert message={message} />
      <PreviewSummary preview={preview} />
      {update?.errors.length ? (
        <div class="form-errors" role="alert">
          {update.errors.map((e) => (
            <p>
              Row {e.row}: {e.message}
            </p>
          ))}
        </div>
      ) : null}
      <form method="post" action={action(project)}>
        <PreviewMapping version={project.version} fileName={fileName} csv={csv} preview={preview} decimal={decimal}>
          <label class="field" for="cat-supplier2">
            <span class="label">Supplier (for rows with no supplier column)</span>
            <input id="cat-supplier2" name="supplier" value={supplier} maxlength={120} />
          </label>
        </PreviewMapping>
        {n ? (
          <p class="summary-line" data-changes>
            Importing changes the catalog: {n.up} price(s) up, {n.down} down, {n.mixed} up and down, {n.terms} with
            other terms, {n['new-part']} new part(s), {n['new-offer']} new offer(s) for catalog parts, {n.gone} offer(s)
            gone from the list; {n.same} unchanged.
            {update?.newSuppliers.length
              ? ` New supplier(s) with no shipping entry yet: ${update.newSuppliers.join(', ')} (add it below the ` +
                `import; until then their shipping counts as 0).`
              : ''}
          </p>
        ) : null}
        <div class="row">
          <button type="submit" name="action" value="preview">
            Update the preview
          </button>
          <label class="field check" for="cat-good">
            <input id="cat-good" type="checkbox" name="takeGoodRows" value="true" checked={takeGoodRows} />
            <span class="label">Import only the good rows (skip the {preview.invalidRows} refused)</span>
          </label>
          <label class="field check" for="cat-gone">
            <input id="cat-gone" type="checkbox" name="removeGone" value="true" checked={removeGone} />
            <span class="label">Remove the offers gone from the list (otherwise kept as they are)</span>
          </label>
          <button type="submit" name="action" value="import" class="primary" disabled={preview.fileErrors.length > 0}>
            Import
          </button>
          <a href={`/projects/${project.id}/parts`}>Cancel</a>
        </div>
      </form>
      {shown.length ? (
        <>
          <h2>What would change</h2>
          <table class="grid compact catalog-changes">
            <thead>
              <tr>
                <th>Row</th>
                <th>Change</th>
                <th>Part</th>
                <th>Supplier · SKU</th>
                <th>Before</th>
                <th>After</th>
              </tr>
            </thead>
            <tbody>
              {shown.map((c) => (
                <tr data-change={c.kind === 'changed' ? c.move : c.kind} data-sku={c.sku}>
                  <td>{'row' in c ? c.row : '–'}</td>
                  <td>{word(c)}</td>
                  <td>{c.description}</td>
                  <td>{[c.supplier, c.sku].filter(Boolean).join(' · ')}</td>
                  <td>{breaksText('before' in c ? c.before : undefined)}</td>
                  <td>{breaksText('after' in c ? c.after : undefined)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </>
      ) : null}
      <h2>Rows of the file</h2>
      <table class="grid compact import-rows">
        <thead>
          <tr>
            <th>Row</th>
            <th>Description / value</th>
            <th>Category</th>
            <th>Ratings</th>
            <th>Supplier · SKU</th>
            <th>Price breaks</th>
            <th>Problems</th>
          </tr>
        </thead>
        <tbody>
          {preview.rows.map((r) => (
            <tr class={r.errors.length ? 'refused' : ''}>
              <td data-label="Row">{r.row}</td>
              <td data-label="Description">
                {r.values.description}
                {r.values.value ? <span class="sub"> {r.values.value}</span> : null}
              </td>
              <td data-label="Category">{r.values.category}</td>
              <td data-label="Ratings">{r.values.catalog ? ratingsReadable(r.values.catalog.ratings) : ''}</td>
              <td data-label="Supplier · SKU">{[r.values.supplier, r.values.sku].filter(Boolean).join(' · ')}</td>
              <td data-label="Price breaks">
                {r.values.catalog?.breaks
                  .map((b) => `${b.minQty}: ${formatMoney(b.unitPriceCents, r.values.currency ?? project.currency)}`)
                  .join(', ')}
              </td>
              <RowProblems row={r} />
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
};
