// CSV import of a parts list: the upload form, and the preview with column choices and per-row errors.
// Nothing is saved until the user presses Import, and then only if no row is refused (or they chose
// to import only the good rows).
import type { Child, FC } from 'hono/jsx';
import type { Project } from '../../src/core/model';
import { IMPORT_FIELDS_FOR, IMPORT_FIELD_LABELS } from '../../src/core/csv/import-mapping';
import type { ImportPreview, PreviewRow } from '../../src/core/csv';
import { formatMoney } from '../../src/core/cost/money';
import { Version } from './supply-transformer';

const stageOptions = (p: Project): [string, string][] => [
  ['', 'General (no stage)'],
  ...p.stages.map((s): [string, string] => [s.id, s.name]),
];

export const ImportForm: FC<{ project: Project; error?: string }> = ({ project, error }) => (
  <form
    method="post"
    action={`/projects/${project.id}/bom/import`}
    enctype="multipart/form-data"
    class="card add"
    aria-label="Import a parts list from CSV"
  >
    <h2>Import lines from a CSV file</h2>
    <Version version={project.version} />
    <FormAlert message={error} />
    <div class="row">
      <label class="field" for="imp-file">
        <span class="label">CSV file (comma, semicolon or tab separated; first row = headers)</span>
        <input id="imp-file" type="file" name="file" accept=".csv,.txt,text/csv" />
      </label>
      <label class="field" for="imp-stage">
        <span class="label">Stage for the imported lines</span>
        <select id="imp-stage" name="stageId">
          {stageOptions(project).map(([v, t]) => (
            <option value={v}>{t}</option>
          ))}
        </select>
      </label>
      <button type="submit">Preview…</button>
    </div>
    <p class="hint">You will see every row, choose which column is which, and decide before anything is saved.</p>
  </form>
);

export interface ImportPreviewProps {
  project: Project;
  csv: string;
  fileName: string;
  stageId: string;
  decimal: '.' | ',';
  takeGoodRows: boolean;
  /** What to do with lines already in the list; '' = not chosen yet. */
  duplicates: '' | 'merge' | 'skip';
  /** Good rows that match a line already in the list (same part, stage and designators). */
  existingLines: number;
  preview: ImportPreview;
  /** Why the last Import press saved nothing (or the version conflict). */
  message?: string;
}

export const ImportPreviewBody: FC<ImportPreviewProps> = ({
  project,
  csv,
  fileName,
  stageId,
  decimal,
  takeGoodRows,
  duplicates,
  existingLines,
  preview,
  message,
}) => {
  const blocked = preview.fileErrors.length > 0;
  return (
    <section class="card import-preview" id="import-preview">
      <h1>Import preview{fileName ? `: ${fileName}` : ''}</h1>
      <FormAlert message={message} />
      <PreviewSummary preview={preview} />
      <form method="post" action={`/projects/${project.id}/bom/import`}>
        <PreviewMapping version={project.version} fileName={fileName} csv={csv} preview={preview} decimal={decimal}>
          <label class="field" for="imp-stage2">
            <span class="label">Stage for the imported lines</span>
            <select id="imp-stage2" name="stageId">
              {stageOptions(project).map(([v, t]) => (
                <option value={v} selected={v === stageId}>
                  {t}
                </option>
              ))}
            </select>
          </label>
        </PreviewMapping>
        {existingLines > 0 ? (
          <fieldset class="row duplicates">
            <legend>
              {existingLines} line(s) of the file are already in the parts list (same part, stage and designators)
            </legend>
            <label class="field check" for="imp-dup-merge">
              <input id="imp-dup-merge" type="radio" name="duplicates" value="merge" checked={duplicates === 'merge'} />
              <span class="label">Merge: those lines take the file's quantities</span>
            </label>
            <label class="field check" for="imp-dup-skip">
              <input id="imp-dup-skip" type="radio" name="duplicates" value="skip" checked={duplicates === 'skip'} />
              <span class="label">Skip: leave those lines as they are</span>
            </label>
          </fieldset>
        ) : null}
        <div class="row">
          <button type="submit" name="action" value="preview">
            Update the preview
          </button>
          <label class="field check" for="imp-good">
            <input id="imp-good" type="checkbox" name="takeGoodRows" value="true" checked={takeGoodRows} />
            <span class="label">Import only the good rows (skip the {preview.invalidRows} refused)</span>
          </label>
          <button type="submit" name="action" value="import" class="primary" disabled={blocked}>
            Import
          </button>
          <a href={`/projects/${project.id}/bom`}>Cancel</a>
        </div>
      </form>
      <table class="grid compact import-rows">
        <thead>
          <tr>
            <th>Row</th>
            <th>Designators</th>
            <th>Description / value</th>
            <th>Category</th>
            <th class="num">Qty</th>
            <th>Supplier · SKU</th>
            <th class="num">Price</th>
            <th>Problems</th>
          </tr>
        </thead>
        <tbody>
          {preview.rows.map((r) => (
            <tr class={r.errors.length ? 'refused' : ''}>
              <td data-label="Row">{r.row}</td>
              <td data-label="Designators">{r.values.refs}</td>
              <td data-label="Description">
                {r.values.description}
                {r.values.value ? <span class="sub"> {r.values.value}</span> : null}
              </td>
              <td data-label="Category">{r.values.category}</td>
              <td class="num" data-label="Qty">{r.values.quantity ?? '–'}</td>
              <td data-label="Supplier · SKU">{[r.values.supplier, r.values.sku].filter(Boolean).join(' · ')}</td>
              <td class="num" data-label="Price">
                {r.values.priceCents === null
                  ? ''
                  : formatMoney(r.values.priceCents, r.values.currency ?? project.currency)}
              </td>
              <RowProblems row={r} />
            </tr>
          ))}
        </tbody>
      </table>
      <p class="hint">
        Suppliers new to the catalog need a shipping entry on the Parts catalog page; until then their shipping counts
        as 0.
      </p>
    </section>
  );
};

// ------------------------------------------------------------ parts shared with the supplier price-list import

/** Why the last press saved nothing (nothing drawn without a message). */
export const FormAlert: FC<{ message?: string }> = ({ message }) =>
  message ? (
    <div class="form-errors" role="alert">
      <p>{message}</p>
    </div>
  ) : null;

/** The preview form's carried file (version, name and text, hidden) and its column choices: one select per field,
 * the decimal mark, then the import's own field (children). */
export const PreviewMapping: FC<{
  version: number; fileName: string; csv: string; preview: ImportPreview; decimal: '.' | ','; children?: Child;
}> = ({ version, fileName, csv, preview, decimal, children }) => (
  <>
    <Version version={version} />
    <input type="hidden" name="fileName" value={fileName} />
    <textarea name="csv" hidden aria-hidden="true">
      {csv}
    </textarea>
    <h2>Which column is which</h2>
    <div class="row">
      <ColumnChoices preview={preview} />
      <DecimalChoice decimal={decimal} />
      {children}
    </div>
  </>
);

/** Rows counted, the separator, totals rows skipped, and the problems that block the whole file. */
export const PreviewSummary: FC<{ preview: ImportPreview }> = ({ preview }) => (
  <>
    <p class="summary-line">
      {preview.rows.length} data row(s): <strong>{preview.validRows} good</strong>,{' '}
      <strong>{preview.invalidRows} refused</strong>. Separator “
      {preview.delimiter === '\t' ? 'tab' : preview.delimiter}”. Nothing has been saved yet.
      {preview.totalsRows.length
        ? ` ${preview.totalsRows.length} totals row(s) (rows ${preview.totalsRows.join(', ')}) are recognised and ` +
          `ignored.`
        : ''}
    </p>
    {preview.fileErrors.length ? (
      <div class="form-errors" role="alert">
        {preview.fileErrors.map((e) => (
          <p>
            {e.column ? `${e.column}: ` : ''}
            {e.message}
          </p>
        ))}
      </div>
    ) : null}
  </>
);

/** One select per field the kind of import reads: which column feeds it. */
export const ColumnChoices: FC<{ preview: ImportPreview }> = ({ preview }) => {
  const colOptions: [string, string][] = [
    ['', '(not imported)'],
    ...preview.headers.map((h, i): [string, string] => [String(i), `Column ${i + 1}: ${h || '(no header)'}`]),
  ];
  return (
    <>
      {IMPORT_FIELDS_FOR[preview.kind].map((f) => (
        <label class="field" for={`map-${f}`}>
          <span class="label">{IMPORT_FIELD_LABELS[f]}</span>
          <select id={`map-${f}`} name={`map_${f}`}>
            {colOptions.map(([v, t]) => (
              <option value={v} selected={String(preview.mapping[f] ?? '') === v}>
                {t}
              </option>
            ))}
          </select>
        </label>
      ))}
    </>
  );
};

export const DecimalChoice: FC<{ decimal: '.' | ',' }> = ({ decimal }) => (
  <label class="field" for="imp-decimal">
    <span class="label">Decimal mark in prices</span>
    <select id="imp-decimal" name="decimal">
      <option value="." selected={decimal === '.'}>
        point (1,250.50)
      </option>
      <option value="," selected={decimal === ','}>
        comma (1.250,50)
      </option>
    </select>
  </label>
);

/** A preview row's refusals and warnings, each naming its column. */
export const RowProblems: FC<{ row: PreviewRow }> = ({ row: r }) => (
  <td data-label="Problems">
    {r.errors.map((e) => (
      <span class="row-error">
        <span class="sev sev-fail">refused</span> {e.column ? `${e.column}: ` : ''}
        {e.message}{' '}
      </span>
    ))}
    {r.warnings.map((e) => (
      <span class="row-warning">
        <span class="sev sev-caution">check</span> {e.column ? `${e.column}: ` : ''}
        {e.message}{' '}
      </span>
    ))}
  </td>
);
