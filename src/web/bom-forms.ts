// Parts-list forms: one line as typed -> BomLine fields; the CSV import's column choices and merge.
import { z } from 'zod';
import type { BomLine, Part, Project } from '../core/model';
import { IMPORT_FIELDS, overrideMapping, type ColumnMapping, type ImportField } from '../core/csv';
import { num, text } from './form';

export const lineSchema = z.object({
  stageId: z.string().default('').transform((s) => (s === '' ? null : s)),
  partId: z.string({ message: 'Part: choose one' }).min(1, 'Part: choose one'),
  qty: num('', { label: 'Quantity per rig', min: 0, exclusiveMin: true, max: 100_000 }),
  refs: text('Reference designators', 300, false),
  notes: text('Notes', 500, false),
});
export type LineData = z.output<typeof lineSchema>;

/** Check the line's references against the project; field messages when they are gone. */
export function lineErrors(p: Project, d: LineData): Record<string, string> | null {
  const errors: Record<string, string> = {};
  if (!p.parts.some((x) => x.id === d.partId)) errors.partId = 'Part: that part is not in the catalog (deleted?); choose another';
  if (d.stageId !== null && !p.stages.some((s) => s.id === d.stageId)) errors.stageId = 'Stage: that stage no longer exists; choose another or General';
  return Object.keys(errors).length ? errors : null;
}

export const lineFrom = (id: string, d: LineData): BomLine => ({ id, stageId: d.stageId, partId: d.partId, qtyPerRig: d.qty, refs: d.refs, notes: d.notes });

// ------------------------------------------------------------ CSV import

/** Column choices from the form (`map_<field>` = column index or "" for none) over the guessed mapping. */
export function mappingFrom(values: Record<string, string>, guessed: ColumnMapping, columnCount: number): ColumnMapping {
  const overrides: Partial<Record<ImportField, number | null>> = {};
  for (const f of IMPORT_FIELDS) {
    const v = values[`map_${f}`];
    if (v === undefined) continue;
    overrides[f] = v === '' ? null : Number(v);
  }
  return overrideMapping(guessed, overrides, columnCount);
}

const partKey = (p: Part) => [p.description, typeof p.ratings.value === 'string' ? p.ratings.value : String(p.ratings.value ?? ''), p.category].map((x) => x.trim().toLowerCase()).join('\u0000');

/**
 * Add imported parts and lines to the project. An imported part equal to a catalog part (same description,
 * value and category, ignoring case) is not added again: its new supplier offers join the catalog part.
 */
export function mergeImport(p: Project, data: { parts: Part[]; bom: BomLine[] }): { project: Project; newParts: number; reusedParts: number } {
  const byKey = new Map(p.parts.map((x) => [partKey(x), x.id]));
  const idMap = new Map<string, string>();
  let parts = [...p.parts];
  let newParts = 0;
  for (const imported of data.parts) {
    const existing = byKey.get(partKey(imported));
    if (existing === undefined) {
      parts.push(imported);
      byKey.set(partKey(imported), imported.id);
      idMap.set(imported.id, imported.id);
      newParts++;
      continue;
    }
    idMap.set(imported.id, existing);
    parts = parts.map((x) => {
      if (x.id !== existing) return x;
      const fresh = imported.offers.filter((o) => !x.offers.some((e) => e.supplier.toLowerCase() === o.supplier.toLowerCase() && e.sku === o.sku));
      return { ...x, offers: [...x.offers, ...fresh] };
    });
  }
  const bom = [...p.bom, ...data.bom.map((l) => ({ ...l, partId: idMap.get(l.partId) ?? l.partId }))];
  return { project: { ...p, parts, bom }, newParts, reusedParts: data.parts.length - newParts };
}
