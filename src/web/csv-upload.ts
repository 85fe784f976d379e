// The first step shared by the CSV imports (parts list, supplier price list): an uploaded file, or the CSV text the
// preview form carries back, with the other form values as typed.
import type { Context } from 'hono';

export const CSV_IMPORT_LIMIT_BYTES = 2 * 1024 * 1024;

export interface CsvUpload {
  values: Record<string, string>;
  csv: string;
  fileName: string;
}

/** Read the import request; a missing, empty or too large file is an error to show (nothing is saved). */
export async function readCsvUpload(c: Context): Promise<CsvUpload | { error: string; status: 413 | 422 }> {
  const form = await c.req.parseBody();
  const values: Record<string, string> = {};
  for (const [k, v] of Object.entries(form)) if (typeof v === 'string') values[k] = v;
  let csv = values.csv ?? '';
  let fileName = values.fileName ?? '';
  const file = form.file;
  if (file instanceof File && file.size > 0) {
    if (file.size > CSV_IMPORT_LIMIT_BYTES)
      return {
        error: `The file is ${file.size} bytes; the limit is ${CSV_IMPORT_LIMIT_BYTES / 1024 / 1024} MiB.`,
        status: 413,
      };
    csv = await file.text();
    fileName = file.name;
  }
  if (csv.trim() === '')
    return { error: 'No file was chosen (or it is empty): choose a CSV file and press Preview.', status: 422 };
  return { values, csv, fileName };
}
