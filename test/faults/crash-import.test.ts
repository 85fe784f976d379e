// SIGKILL while a large import is being written: after a restart the project is either all there or
// not there at all (no partial rows), and the database passes integrity_check.
import { describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createClient } from '@libsql/client';
import { startServer, type RunningServer } from '../helpers/server';
import { DEMO_PROJECTS } from '../../seed-demo/index';
import { toProjectFile } from '../../src/io/project-file';
import { largeBomProject } from '../../src/pdf/bench';

async function tableCounts(dbPath: string): Promise<{ counts: Record<string, number>; integrity: string }> {
  const client = createClient({ url: `file:${dbPath}` });
  try {
    const integrity = String((await client.execute('PRAGMA integrity_check')).rows[0][0]);
    const tables = await client.execute(
      "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' AND name NOT LIKE '__drizzle%'",
    );
    const counts: Record<string, number> = {};
    for (const r of tables.rows)
      counts[String(r.name)] = Number(
        (await client.execute(`SELECT count(*) AS n FROM "${String(r.name)}"`)).rows[0].n,
      );
    return { counts, integrity };
  } finally {
    client.close();
  }
}

function importBody(server: RunningServer, json: string) {
  return fetch(`${server.url}/import`, {
    method: 'POST',
    redirect: 'manual',
    headers: { Origin: server.url, 'Content-Type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ json }),
  });
}

const diff = (a: Record<string, number>, b: Record<string, number>) =>
  Object.fromEntries(Object.keys(a).map((k) => [k, a[k] - (b[k] ?? 0)]));

describe('crash during an import', () => {
  it('leaves the project whole or absent, never half-written', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'rigwright-crash-import-'));
    const dbPath = join(dir, 'crash.db');
    const json = toProjectFile(largeBomProject(DEMO_PROJECTS[0], 1500), '2026-01-01T00:00:00Z');
    const outcomes: string[] = [];
    try {
      // calibration: one complete import gives the rows a whole project adds and how long it takes
      let server = await startServer({ dbPath });
      const base = (await tableCounts(dbPath)).counts;
      const t0 = Date.now();
      const first = await importBody(server, json);
      expect(first.status).toBe(303);
      const fullMs = Date.now() - t0;
      await server.stop();
      const whole = diff((await tableCounts(dbPath)).counts, base);
      expect(whole.parts).toBe(1500);

      for (const fraction of [0.1, 0.3, 0.5, 0.7, 0.9]) {
        server = await startServer({ dbPath });
        const before = (await tableCounts(dbPath)).counts;
        const pending = importBody(server, json).then(
          (r) => r.status,
          () => 'no answer',
        );
        await new Promise((r) => setTimeout(r, Math.round(fullMs * fraction)));
        await server.kill('SIGKILL');
        const answer = await pending;
        const { counts, integrity } = await tableCounts(dbPath);
        expect(integrity).toBe('ok');
        const added = diff(counts, before);
        const none = Object.values(added).every((n) => n === 0);
        const all = Object.keys(whole).every((k) => added[k] === whole[k]);
        outcomes.push(
          `kill at ${Math.round(fullMs * fraction)} ms of ~${fullMs} ms: answer ${answer}, project ` +
            `${none ? 'absent' : all ? 'whole' : 'PARTIAL'}`,
        );
        expect(none || all, `partial rows after the kill: ${JSON.stringify(added)}`).toBe(true);
        if (answer === 303) expect(all, 'an acknowledged import must be there').toBe(true);
      }
      console.log(outcomes.join('\n'));
      // the database still works after all that: a restart serves the list
      server = await startServer({ dbPath });
      expect((await fetch(`${server.url}/`)).status).toBe(200);
      await server.stop();
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 300_000);
});
