// Concrete URLs for every route the app registers (read from app.routes), so the security suites
// cover pages and actions added later without being edited.
import type { Hono } from 'hono';

export const DEMO_ID = 'demo-club-30m';
export const DEMO_STAGE_ID = 'st-rx';

export interface RouteRef {
  method: string;
  pattern: string;
  path: string;
}

/**
 * Fill path parameters: :id -> project id, :sid -> a stage id, anything else -> `ids[name]` or the first item id given.
 */
export function fillPath(pattern: string, ids: Record<string, string>): string {
  return pattern.replace(/:([A-Za-z0-9_]+)(\{[^}]*\})?/g, (_m, name: string) =>
    encodeURIComponent(ids[name] ?? ids._other ?? 'x'),
  );
}

export function appRoutes(app: Hono, ids: Record<string, string> = { id: DEMO_ID, sid: DEMO_STAGE_ID }): RouteRef[] {
  const seen = new Set<string>();
  const out: RouteRef[] = [];
  for (const r of app.routes) {
    if (r.method === 'ALL' || r.path.includes('*')) continue;
    const key = `${r.method} ${r.path}`;
    if (seen.has(key)) continue;
    seen.add(key);
    out.push({ method: r.method, pattern: r.path, path: fillPath(r.path, ids) });
  }
  return out;
}

export const STATE_CHANGING = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/** Path parameters filled with the real ids of a project, so item pages render its content. */
export function idsFor(p: import('../../src/core/model').Project): Record<string, string> {
  const rail = p.supply.rails.find((r) => r.kind === 'rectified') ?? p.supply.rails[0];
  const part = p.parts.find((x) => x.offers.length) ?? p.parts[0];
  return {
    id: p.id,
    sid: p.stages.find((s) => s.lpf)?.id ?? p.stages[0]?.id ?? 'x',
    tid: p.supply.transformers[0]?.id ?? 'x',
    wid: p.supply.transformers[0]?.windings[0]?.id ?? 'x',
    rid: rail?.id ?? 'x',
    railId: rail?.id ?? 'x',
    item: rail?.id ?? 'x',
    pid: part?.id ?? 'x',
    oid: part?.offers[0]?.id ?? 'x',
    lid: p.bom[0]?.id ?? 'x',
    n: '0',
  };
}
