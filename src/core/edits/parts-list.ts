// Edits of the parts list as pure functions: one line (its part and stage must exist), and the merge of a CSV
// import into the catalog and the list.
import type { BomLine, Part, Project } from '../model';
import type { EditResult } from './catalog';

export type LineFields = Omit<BomLine, 'id'>;

const GONE = 'That line no longer exists (deleted in another window?). The page now shows the stored parts list.';

/** Add line `id` (isNew) or replace it; a part or stage deleted meanwhile is refused on its field. */
export function saveLine(p: Project, id: string, d: LineFields, isNew: boolean): EditResult {
  const errors: Record<string, string> = {};
  if (!p.parts.some((x) => x.id === d.partId)) {
    errors.partId = 'Part: that part is not in the catalog (deleted?); choose another';
  }
  if (d.stageId !== null && !p.stages.some((s) => s.id === d.stageId)) {
    errors.stageId = 'Stage: that stage no longer exists; choose another or General';
  }
  if (Object.keys(errors).length) return { errors };
  const line: BomLine = { id, ...d };
  if (isNew) return { ...p, bom: [...p.bom, line] };
  if (!p.bom.some((l) => l.id === id)) return { errors: { _form: GONE } };
  return { ...p, bom: p.bom.map((l) => (l.id === id ? line : l)) };
}

export function deleteLine(p: Project, id: string): EditResult {
  return p.bom.some((l) => l.id === id) ? { ...p, bom: p.bom.filter((l) => l.id !== id) } : { errors: { _form: GONE } };
}

const valueOf = (p: Part) => (typeof p.ratings.value === 'string' ? p.ratings.value : String(p.ratings.value ?? ''));
const partKey = (p: Part) => [p.description, valueOf(p), p.category].map((x) => x.trim().toLowerCase()).join('\u0000');
const sameOffer = (a: { supplier: string; sku: string }, b: { supplier: string; sku: string }) =>
  a.supplier.trim().toLowerCase() === b.supplier.trim().toLowerCase() && a.sku === b.sku;

/** What to do with an imported line whose part and stage already have a line in the list. */
export type DuplicateMode = 'merge' | 'skip';

export interface MergeStats {
  newParts: number;
  reusedParts: number;
  /** Lines added to the list. */
  added: number;
  /** Imported lines that matched an existing line: updated from the file (merge) or left out (skip). */
  matched: number;
}

/**
 * Add imported parts and lines to the project. An imported part equal to a catalog part (same description,
 * value and category, ignoring case) is not added again: its new supplier offers join the catalog part.
 * An imported line "already exists" when the list has a line of the same part, stage and designators (spaces and
 * case ignored; each existing line matches one imported line at most). `merge` sets that line's quantity from the
 * file; `skip` leaves it as it is. Either way the line is not added a second time.
 */
export function mergeImport(
  p: Project,
  data: { parts: Part[]; bom: BomLine[] },
  duplicates: DuplicateMode,
): { project: Project } & MergeStats {
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
    const fresh = (x: Part) => imported.offers.filter((o) => !x.offers.some((e) => sameOffer(e, o)));
    parts = parts.map((x) => (x.id !== existing ? x : { ...x, offers: [...x.offers, ...fresh(x)] }));
  }
  const bom = [...p.bom];
  const taken = new Set<string>();
  let added = 0;
  let matched = 0;
  for (const raw of data.bom) {
    const l = { ...raw, partId: idMap.get(raw.partId) ?? raw.partId };
    const hit = p.bom.find(
      (e) =>
        !taken.has(e.id) && e.partId === l.partId && e.stageId === l.stageId && normRefs(e.refs) === normRefs(l.refs),
    );
    if (hit === undefined) {
      bom.push(l);
      added++;
      continue;
    }
    taken.add(hit.id);
    matched++;
    if (duplicates === 'merge') {
      const k = bom.findIndex((e) => e.id === hit.id);
      // the file's binding when it names one; a file without a role column leaves the stored binding alone
      bom[k] = { ...bom[k], qtyPerRig: l.qtyPerRig, ...(l.roleId ? { roleId: l.roleId } : {}) };
    }
  }
  return { project: { ...p, parts, bom }, newParts, reusedParts: data.parts.length - newParts, added, matched };
}

const normRefs = (r: string) => r.replace(/\s+/g, '').toLowerCase();
