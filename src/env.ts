// Environment, parsed once with zod.
import { z } from 'zod';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The project folder (the one holding package.json), whatever the current folder is. */
export const PROJECT_ROOT = join(dirname(fileURLToPath(import.meta.url)), '..');
/**
 * The default database file, resolved from the project folder so that the server and the CLI open the same
 * file from any current folder (a relative DATABASE_URL the user sets is still read from the current folder).
 */
export const DEFAULT_DATABASE_URL = `file:${join(PROJECT_ROOT, 'data', 'rigwright.db')}`;

const schema = z.object({
  PORT: z.coerce.number().int().min(1).max(65535).default(8787),
  HOST: z.string().min(1).default('127.0.0.1'),
  DATABASE_URL: z.string().min(1).default(DEFAULT_DATABASE_URL),
  DATABASE_AUTH_TOKEN: z.string().optional(),
  RIGWRIGHT_SECRET: z.string().optional(),
  RIGWRIGHT_NO_DEMO: z.stringbool().optional(),
});

export interface Env {
  port: number;
  host: string;
  databaseUrl: string;
  /** true when DATABASE_URL was not set and the default file in the project folder is used */
  databaseIsDefault: boolean;
  databaseAuthToken?: string;
  accessSecret?: string;
  loadDemo: boolean;
}

export function readEnv(source: Record<string, string | undefined>): Env {
  const clean = Object.fromEntries(Object.entries(source).filter(([, v]) => v !== undefined && v !== ''));
  const parsed = schema.safeParse(clean);
  if (!parsed.success) {
    const msg = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ');
    throw new Error(`Bad environment: ${msg}`);
  }
  const e = parsed.data;
  return {
    port: e.PORT,
    host: e.HOST,
    databaseUrl: e.DATABASE_URL,
    databaseIsDefault: clean.DATABASE_URL === undefined,
    databaseAuthToken: e.DATABASE_AUTH_TOKEN,
    accessSecret: e.RIGWRIGHT_SECRET,
    loadDemo: !e.RIGWRIGHT_NO_DEMO,
  };
}

/**
 * Which database a command opened, for the line every command prints: a file as its absolute path (the
 * default one marked so), anything else as its URL without query or credentials.
 */
export function describeDatabase(url: string, isDefault = false): string {
  if (url.startsWith('file:')) {
    const path = url.slice('file:'.length);
    if (!path || path.startsWith(':')) return `${url} (in memory, not kept)`;
    return `${resolve(path)}${isDefault ? ' (the default; set DATABASE_URL for another)' : ''}`;
  }
  try {
    const u = new URL(url);
    return `${u.protocol}//${u.host}${u.pathname === '/' ? '' : u.pathname}`;
  } catch {
    return url;
  }
}

/** Loopback addresses need no access secret; anything else does. */
export function isLoopback(host: string): boolean {
  return host === 'localhost' || host === '::1' || /^127\./.test(host);
}
