// Parts-list forms: one line as typed -> line fields (src/core/spec/parts-list.ts); the CSV import's column choices.
import type { ColumnMapping, ImportField } from '../core/csv';
import { IMPORT_FIELDS, overrideMapping } from '../core/csv';
import { bomLineSpec } from '../core/spec';
import type { LineFields } from '../core/edits/parts-list';
import { specFormSchema } from './forms/spec-schema';

export const lineSchema = specFormSchema<LineFields>(bomLineSpec);

/** Column choices from the form (`map_<field>` = column index or "" for none) over the guessed mapping. */
export function mappingFrom(
  values: Record<string, string>,
  guessed: ColumnMapping,
  columnCount: number,
): ColumnMapping {
  const overrides: Partial<Record<ImportField, number | null>> = {};
  for (const f of IMPORT_FIELDS) {
    const v = values[`map_${f}`];
    if (v === undefined) continue;
    overrides[f] = v === '' ? null : Number(v);
  }
  return overrideMapping(guessed, overrides, columnCount);
}
