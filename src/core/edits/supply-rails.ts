// Rail edits as pure functions: a new rail with the spec's starting values, and a rail form saved. The handler
// parses nothing itself: it loads, calls these, saves and renders.
import type { Project, Rail } from '../model';
import { defaults, parseForm } from '../spec/derive';
import { RAIL_SPECS } from '../spec/supply-rails';

export type RailEdit = { ok: true; project: Project } | { ok: false; errors: Record<string, string> };

const withRails = (p: Project, rails: Rail[]): Project => ({ ...p, supply: { ...p.supply, rails } });
const hasWinding = (p: Project, id: unknown) => p.supply.transformers.some((t) => t.windings.some((w) => w.id === id));

/** Rails a regulated rail may be fed from: any rail except itself and the rails it feeds (no loops). */
export function possibleParents(p: Project, railId: string | null): Rail[] {
  const below = new Set<string>();
  if (railId) {
    below.add(railId);
    let grew = true;
    while (grew) {
      grew = false;
      for (const r of p.supply.rails)
        if (r.kind === 'regulated' && below.has(r.parentId) && !below.has(r.id)) {
          below.add(r.id);
          grew = true;
        }
    }
  }
  return p.supply.rails.filter((r) => !below.has(r.id));
}

/**
 * Add a rail named `name` fed from `source` (w:<winding id> rectified, r:<rail id> regulated, battery), starting
 * from its kind's spec defaults; `id` comes from the caller (core has no randomness).
 */
export function addRail(p: Project, id: string, name: string, source: string): RailEdit {
  const ref = source.slice(2);
  let rail: Rail;
  if (source === 'battery') rail = { ...(defaults(RAIL_SPECS.battery) as object), kind: 'battery', id, name } as Rail;
  else if (source.startsWith('w:') && hasWinding(p, ref))
    rail = { ...(defaults(RAIL_SPECS.rectified) as object), kind: 'rectified', id, name, windingId: ref } as Rail;
  else if (source.startsWith('r:') && p.supply.rails.some((r) => r.id === ref))
    rail = { ...(defaults(RAIL_SPECS.regulated) as object), kind: 'regulated', id, name, parentId: ref } as Rail;
  else return { ok: false, errors: { source: 'Fed from: that winding or rail no longer exists; choose another' } };
  return { ok: true, project: withRails(p, [...p.supply.rails, rail]) };
}

/** Save rail `railId` from its form (display text); messages are keyed by form field name. */
export function editRail(p: Project, railId: string, values: Record<string, string | undefined>): RailEdit {
  const rail = p.supply.rails.find((r) => r.id === railId);
  if (!rail)
    return {
      ok: false,
      errors: {
        _form: 'That rail no longer exists (deleted in another window?). The page now shows the stored supply.',
      },
    };
  const r = parseForm(RAIL_SPECS[rail.kind], values);
  if (!r.ok) return r;
  const next = { ...r.value, kind: rail.kind, id: rail.id } as Rail;
  if (next.kind === 'rectified' && !hasWinding(p, next.windingId))
    return { ok: false, errors: { windingId: 'Winding: that winding no longer exists; choose another' } };
  if (next.kind === 'regulated' && !possibleParents(p, rail.id).some((x) => x.id === next.parentId))
    return {
      ok: false,
      errors: { parentId: 'Fed from: that rail does not exist or is fed from this one (a loop); choose another' },
    };
  return {
    ok: true,
    project: withRails(
      p,
      p.supply.rails.map((x) => (x.id === rail.id ? next : x)),
    ),
  };
}
