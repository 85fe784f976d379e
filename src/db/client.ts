// Opens a libSQL database (embedded file, memory, or a libSQL server) and applies the committed migrations.
// Several app processes may share one database file: each connection waits a short while for a lock (busy
// timeout), and a write transaction that still meets one is retried whole, with backoff, before it gives up
// with DatabaseBusy (the web layer answers 503 "nothing was saved"), never a half-written project.
import { createClient, type Client } from '@libsql/client';
import { drizzle, type LibSQLDatabase } from 'drizzle-orm/libsql';
import { migrate } from 'drizzle-orm/libsql/migrator';
import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import * as schema from './schema';

export type Db = LibSQLDatabase<typeof schema>;

export interface Database {
  db: Db;
  client: Client;
  /**
   * Runs `fn` in a write transaction (BEGIN IMMEDIATE). Serialised within this process: libSQL refuses
   * overlapping ones (see STACK.md). When another process holds the lock past the busy timeout, the whole
   * transaction is run again (so `fn` must read what it needs through `tx`); after `retryForMs` it throws
   * DatabaseBusy.
   */
  write<T>(fn: (tx: Tx) => Promise<T>): Promise<T>;
  close(): void;
}

export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

export interface OpenOptions {
  /**
   * How long one statement waits for another process's lock, ms. The embedded driver waits synchronously
   * (the event loop stands still meanwhile), so this stays short; the retries below wait asynchronously.
   */
  busyTimeoutMs?: number;
  /** How long a write keeps retrying before DatabaseBusy, ms. */
  retryForMs?: number;
}

export const DEFAULT_BUSY_TIMEOUT_MS = 500;
export const DEFAULT_RETRY_FOR_MS = 8000;

/** Another process held the database lock for longer than the write was willing to wait. Nothing was written. */
export class DatabaseBusy extends Error {
  constructor(
    readonly attempts: number,
    cause?: unknown,
  ) {
    super(`The database is busy (locked by another process); nothing was saved after ${attempts} attempts.`, { cause });
  }
}

/** SQLITE_BUSY and its extended codes (BUSY_SNAPSHOT, BUSY_RECOVERY, BUSY_TIMEOUT), also when drizzle wraps it. */
export function isBusyError(e: unknown): boolean {
  for (let x: unknown = e, depth = 0; x && depth < 5; x = (x as { cause?: unknown }).cause, depth++) {
    if (x instanceof DatabaseBusy) return true;
    const { code, extendedCode, message } = x as { code?: unknown; extendedCode?: unknown; message?: unknown };
    if (typeof code === 'string' && code.startsWith('SQLITE_BUSY')) return true;
    if (typeof extendedCode === 'string' && extendedCode.startsWith('SQLITE_BUSY')) return true;
    if (typeof message === 'string' && /\bdatabase is locked\b/i.test(message)) return true;
  }
  return false;
}

const MIGRATIONS = resolve(dirname(fileURLToPath(import.meta.url)), '../../migrations');

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/**
 * Run `op` again while it fails with SQLITE_BUSY, with jittered exponential backoff, for up to `retryForMs`.
 * `recover` runs after each busy failure, after a wait (a timer turn at least), before anything else.
 */
export async function retryBusy<T>(
  op: () => Promise<T>,
  retryForMs: number,
  recover?: () => void | Promise<void>,
): Promise<T> {
  const start = Date.now();
  for (let attempt = 1; ; attempt++) {
    try {
      return await op();
    } catch (e) {
      if (!isBusyError(e)) throw e;
      if (Date.now() - start >= retryForMs) {
        await sleep(0);
        await recover?.();
        throw new DatabaseBusy(attempt, e);
      }
      // Jitter spreads the retries of several processes apart. Common practice, no published source.
      await sleep(Math.min(400, 10 * 2 ** attempt) * (0.5 + Math.random() / 2));
      await recover?.();
    }
  }
}

export async function openDatabase(url: string, authToken?: string, opts: OpenOptions = {}): Promise<Database> {
  const retryForMs = opts.retryForMs ?? DEFAULT_RETRY_FOR_MS;
  if (url.startsWith('file:')) {
    const path = url.slice('file:'.length);
    if (path && !path.startsWith(':')) mkdirSync(dirname(resolve(path)), { recursive: true });
  }
  // `timeout` is the per-connection busy timeout of the embedded driver (PRAGMA busy_timeout on every pooled
  // connection; a PRAGMA run through `execute` would reach only one of them).
  const client = createClient({ url, authToken, timeout: opts.busyTimeoutMs ?? DEFAULT_BUSY_TIMEOUT_MS });
  if (url.startsWith('file:')) {
    await retryBusy(() => client.execute('PRAGMA journal_mode = WAL'), retryForMs);
  }
  await client.execute('PRAGMA foreign_keys = ON');
  const db = drizzle(client, { schema });
  // two processes starting at once both try to migrate: the second waits, then finds nothing to do
  await retryBusy(() => migrate(db, { migrationsFolder: MIGRATIONS }), retryForMs, () => client.reconnect());
  // A statement that failed with SQLITE_BUSY stays "in progress" on its connection until it is garbage
  // collected: that connection keeps an old read snapshot (stale pages) and every later COMMIT on it fails
  // ("cannot commit transaction - SQL statements in progress"). So a busy write drops all pooled connections
  // before it tries again or gives up. No other transaction is open then (writes are serialised here), and reads
  // borrow a connection only for one synchronous call, done before the timer turn this waits for, so nothing in
  // flight loses its connection.
  const freshConnections = () => client.reconnect();
  let queue: Promise<unknown> = Promise.resolve();
  const write = <T>(fn: (tx: Tx) => Promise<T>): Promise<T> => {
    const run = queue.then(() => retryBusy(() => db.transaction(fn), retryForMs, freshConnections));
    queue = run.catch(() => undefined);
    return run;
  };
  return { db, client, write, close: () => client.close() };
}
