// The app in-process (buildApp) on its own temp database file with the demo loaded, for app.request()
// suites that also count rows (security, faults). (app.ts beside it is the web suite's in-memory variant.)
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { openDatabase, type Database, type OpenOptions } from '../../src/db/client';
import { seedDemo } from '../../seed-demo/index';
import { buildApp } from '../../src/app';

export const ORIGIN = 'http://localhost';
export const FIXED_NOW = new Date('2026-01-02T03:04:05Z');

export interface TestApp {
  app: ReturnType<typeof buildApp>;
  database: Database;
  dbPath: string;
  close: () => void;
}

export async function makeApp(
  opts: { accessSecret?: string; demo?: boolean; db?: OpenOptions } = {},
): Promise<TestApp> {
  const dir = mkdtempSync(join(tmpdir(), 'rigwright-app-'));
  const dbPath = join(dir, 'test.db');
  const database = await openDatabase(`file:${dbPath}`, undefined, opts.db);
  if (opts.demo !== false) await seedDemo(database, FIXED_NOW.toISOString());
  const app = buildApp({ database, now: () => FIXED_NOW, accessSecret: opts.accessSecret });
  return {
    app,
    database,
    dbPath,
    close: () => {
      database.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** A same-origin form post (the csrf() middleware wants an Origin header). */
export function postForm(
  app: TestApp['app'],
  path: string,
  fields: Record<string, string>,
  headers: Record<string, string> = {},
) {
  return app.request(path, {
    method: 'POST',
    headers: { Origin: ORIGIN, 'Content-Type': 'application/x-www-form-urlencoded', ...headers },
    body: new URLSearchParams(fields).toString(),
  });
}

/** Row counts of every user table: the fingerprint that shows nothing was written. */
export async function rowCounts(database: Database): Promise<Record<string, number>> {
  const tables = await database.client.execute(
    "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' AND name NOT LIKE '__drizzle%' " +
      "ORDER BY name",
  );
  const out: Record<string, number> = {};
  for (const row of tables.rows) {
    const name = String(row.name);
    const r = await database.client.execute(`SELECT count(*) AS n FROM "${name}"`);
    out[name] = Number(r.rows[0].n);
  }
  return out;
}
