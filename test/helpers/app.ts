// In-process app with a fresh in-memory database holding the demo projects.
import { openDatabase, type Database } from '../../src/db/client';
import { seedDemo } from '../../seed-demo/index';
import { buildApp } from '../../src/app';

export const ORIGIN = 'http://localhost';

export async function demoApp(opts: { seed?: boolean; accessSecret?: string } = {}) {
  const database: Database = await openDatabase('file::memory:');
  if (opts.seed !== false) await seedDemo(database, '2026-12-01T00:00:00.000Z');
  const app = buildApp({ database, now: () => new Date('2026-12-01T12:00:00Z'), accessSecret: opts.accessSecret });
  const post = (path: string, form: Record<string, string>, headers: Record<string, string> = {}) =>
    app.request(`${ORIGIN}${path}`, {
      method: 'POST',
      body: new URLSearchParams(form),
      headers: { Origin: ORIGIN, 'Content-Type': 'application/x-www-form-urlencoded', ...headers },
    });
  const get = (path: string, headers: Record<string, string> = {}) => app.request(`${ORIGIN}${path}`, { headers });
  return { app, database, post, get };
}
