// ETags and a per-version page cache for the GET routes of one project (/projects/:id and below).
//
// Every such page or download depends only on the stored project (at its version), the request path and query
// (e.g. ?done=saved, ?paper=letter), whether htmx asked (a partial instead of the page), the day (the PDF's data
// date) and the program itself. The ETag is a hash of exactly those, so a client holding the current one gets
// 304 Not Modified (RFC 9110 §13.1.2, §15.4.5), and a response already rendered for that ETag is sent again from a
// bounded cache without loading, evaluating or rendering anything. The version comes from the database on every
// request, so a write from another app process changes the ETag at once.
import { createHash } from 'node:crypto';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { MiddlewareHandler } from 'hono';
import { projectStamp } from '../../db/project-stamp';
import type { Deps } from '../deps';
import { Lru, type LruLimits } from './lru';

export const PAGE_CACHE_LIMITS: LruLimits = { maxEntries: 256, maxBytes: 32 * 1024 * 1024 };

/** Downloads stamped with the time of the request are revalidated by ETag but never re-sent from the cache. */
const NOT_KEPT = /\/export\.json$/;

interface Kept {
  body: ArrayBuffer;
  headers: [string, string][];
}

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '../../..');

/** A hash of the program's own files (src, views, the lock file): a new release changes every ETag. */
function programId(): string {
  const h = createHash('sha1');
  const walk = (dir: string) => {
    for (const name of readdirSync(dir).sort()) {
      const p = join(dir, name);
      if (statSync(p).isDirectory()) walk(p);
      else if (/\.(ts|tsx|css|json)$/.test(name)) h.update(p.slice(ROOT.length)).update(readFileSync(p));
    }
  };
  for (const d of ['src', 'views']) walk(join(ROOT, d));
  h.update(readFileSync(join(ROOT, 'package-lock.json')));
  return h.digest('base64url').slice(0, 12);
}

let PROGRAM_ID: string | undefined;

/** RFC 9110 §13.1.2: If-None-Match is "*" or a list of entity tags, compared weakly. */
export function matchesIfNoneMatch(header: string | undefined, etag: string): boolean {
  if (!header) return false;
  if (header.trim() === '*') return true;
  const opaque = (t: string) => t.trim().replace(/^W\//, '');
  return header.split(',').some((t) => opaque(t) === opaque(etag));
}

export interface PageCache {
  middleware: MiddlewareHandler;
  /** responses held (count, approximate bytes) */
  stats: () => { entries: number; bytes: number; hits: number; notModified: number };
}

export function pageCache(deps: Deps, limits: LruLimits = PAGE_CACHE_LIMITS): PageCache {
  PROGRAM_ID ??= programId();
  const program = PROGRAM_ID;
  const lru = new Lru<Kept>(limits);
  let hits = 0;
  let notModified = 0;
  const middleware: MiddlewareHandler = async (c, next) => {
    const id = c.req.param('id');
    if ((c.req.method !== 'GET' && c.req.method !== 'HEAD') || !id) return next();
    const stamp = await projectStamp(deps.database.client, id);
    if (!stamp) return next();
    const url = new URL(c.req.url);
    const parts = [
      program,
      stamp.id,
      stamp.version,
      stamp.createdAt,
      stamp.updatedAt,
      url.pathname,
      url.search,
      c.req.header('HX-Request') === 'true' ? 'htmx' : 'page',
      deps.now().toISOString().slice(0, 10),
    ];
    // weak: the same content, not necessarily the same bytes (a download's time stamp may differ)
    const etag = `W/"${stamp.version}-` +
      `${createHash('sha1').update(parts.join('\u0000')).digest('base64url').slice(0, 22)}"`;
    const validators = { ETag: etag, 'Cache-Control': 'private, no-cache', Vary: 'HX-Request' };
    if (matchesIfNoneMatch(c.req.header('If-None-Match'), etag)) {
      notModified++;
      return c.body(null, 304, validators);
    }
    const kept = lru.get(etag);
    if (kept) {
      hits++;
      return c.body(kept.body, 200, Object.fromEntries([...kept.headers, ...Object.entries(validators)]));
    }
    await next();
    if (c.res.status !== 200) return;
    for (const [k, v] of Object.entries(validators)) c.res.headers.set(k, v);
    if (NOT_KEPT.test(url.pathname) || c.req.method === 'HEAD') return;
    const body = await c.res.clone().arrayBuffer();
    const headers = [...c.res.headers].filter(([k]) => !(k.toLowerCase() in lowerValidators));
    lru.set(etag, { body, headers }, body.byteLength + 512);
  };
  return { middleware, stats: () => ({ entries: lru.size, bytes: lru.bytes, hits, notModified }) };
}

const lowerValidators: Record<string, true> = { etag: true, 'cache-control': true, vary: true };
