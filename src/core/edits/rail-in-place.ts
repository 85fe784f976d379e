// A stage's load row can draw from a rail that does not exist yet: the row chooses NEW_RAIL and the stage form
// carries the new rail's name and source (the add-a-rail spec's fields under their own form names, since the
// stage form has its own "name"). The rail is added as the supply page's "Add rail" adds it (typical values).
import type { Project } from '../model';
import { loadFormName } from '../spec/stage';
import { addRailSpec } from '../spec/supply';
import { parseForm } from '../spec/derive';
import { addRail } from './supply-rails';

/** The rail choice of a load row that creates a new rail. */
export const NEW_RAIL = 'new-rail';
/** Form names of the new rail's fields on the stage form. */
export const NEW_RAIL_FORM = { name: 'newRailName', source: 'newRailSource' } as const;

export type RailInPlace =
  | { ok: true; project: Project; values: Record<string, string> }
  | { ok: false; errors: Record<string, string> };

/**
 * When a row of the stage form chooses NEW_RAIL: the project with the new rail (id from the caller) and the form
 * values with every such row pointing at it. Unchanged when no row chooses it. Messages name the new rail's fields.
 */
export function railInPlace(p: Project, values: Record<string, string>, id: string): RailInPlace {
  const rows: string[] = [];
  for (let i = 0; loadFormName(i, 'railId') in values; i++)
    if (values[loadFormName(i, 'railId')] === NEW_RAIL) rows.push(loadFormName(i, 'railId'));
  if (!rows.length) return { ok: true, project: p, values };
  const parsed = parseForm(addRailSpec, { name: values[NEW_RAIL_FORM.name], source: values[NEW_RAIL_FORM.source] });
  if (!parsed.ok) {
    const errors: Record<string, string> = {};
    for (const [k, m] of Object.entries(parsed.errors))
      errors[k === 'source' ? NEW_RAIL_FORM.source : NEW_RAIL_FORM.name] = `New rail: ${m}`;
    return { ok: false, errors };
  }
  const d = parsed.value as { name: string; source: string };
  const added = addRail(p, id, d.name, d.source);
  if (!added.ok)
    return { ok: false, errors: { [NEW_RAIL_FORM.source]: `New rail: ${Object.values(added.errors).join('; ')}` } };
  return { ok: true, project: added.project, values: { ...values, ...Object.fromEntries(rows.map((r) => [r, id])) } };
}
