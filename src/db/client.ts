// Opens a libSQL database (embedded file, memory, or a libSQL server) and applies the committed migrations.
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
  /** Serialises write transactions: libSQL refuses overlapping ones (see STACK.md). */
  write<T>(fn: (tx: Tx) => Promise<T>): Promise<T>;
  close(): void;
}

export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

const MIGRATIONS = resolve(dirname(fileURLToPath(import.meta.url)), '../../migrations');

export async function openDatabase(url: string, authToken?: string): Promise<Database> {
  if (url.startsWith('file:')) {
    const path = url.slice('file:'.length);
    if (path && !path.startsWith(':')) mkdirSync(dirname(resolve(path)), { recursive: true });
  }
  const client = createClient({ url, authToken });
  if (url.startsWith('file:')) {
    await client.execute('PRAGMA journal_mode = WAL');
  }
  await client.execute('PRAGMA foreign_keys = ON');
  const db = drizzle(client, { schema });
  await migrate(db, { migrationsFolder: MIGRATIONS });
  let queue: Promise<unknown> = Promise.resolve();
  const write = <T>(fn: (tx: Tx) => Promise<T>): Promise<T> => {
    const run = queue.then(() => db.transaction(fn));
    queue = run.catch(() => undefined);
    return run;
  };
  return { db, client, write, close: () => client.close() };
}
