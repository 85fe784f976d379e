// Memory part of `npm run bench`: 2,000 overview requests spread over 50 projects, in this process through
// app.request() on a temporary database file, with the heap measured after a full garbage collection before the
// first request and after the last. The per-version caches are bounded, so the heap must stay about flat.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { openDatabase } from '../src/db/client';
import { insertProject } from '../src/db/projects';
import { buildApp } from '../src/app';
import { DEMO_PROJECTS } from '../seed-demo/index';
import { cloneProject } from '../src/core/new-project';

setFlagsFromString('--expose_gc');
const gc = runInNewContext('gc') as () => void;

function heapMiB(): number {
  gc();
  gc();
  return process.memoryUsage().heapUsed / 1024 / 1024;
}

export async function benchMemory(
  projects = 50,
  requests = 2000,
): Promise<{ startMiB: number; endMiB: number; text: string }> {
  const dir = mkdtempSync(join(tmpdir(), 'rigwright-bench-mem-'));
  const database = await openDatabase(`file:${join(dir, 'mem.db')}`);
  try {
    const now = '2026-01-01T00:00:00.000Z';
    const ids: string[] = [];
    for (let i = 0; i < projects; i++) {
      const base = DEMO_PROJECTS[i % DEMO_PROJECTS.length];
      // each project differs (its own name, target power and notes), so no two share a report
      let n = 0;
      const copy = cloneProject(base, `mem-${i}`, `${base.name} #${i}`, (prefix: string) => `${prefix}-m${i}-${n++}`);
      const p = { ...copy, targetPowerW: base.targetPowerW * (1 + i / 100), notes: `copy ${i}` };
      await insertProject(database, p, now);
      ids.push(p.id);
    }
    const app = buildApp({ database, now: () => new Date(now) });
    // one request to load every module of the route before the first measurement
    await (await app.request('http://localhost/healthz')).text();
    const startMiB = heapMiB();
    let bad = 0;
    for (let n = 0; n < requests; n++) {
      const res = await app.request(`http://localhost/projects/${ids[n % ids.length]}`);
      if (res.status !== 200) bad++;
      await res.text();
    }
    const endMiB = heapMiB();
    const text = `memory: ${requests} overview requests over ${projects} projects (in ` +
      `process): heap ${startMiB.toFixed(1)} MiB before, ${endMiB.toFixed(1)} MiB after ` +
      `(after full GC)${bad ? `, ${bad} requests not 200` : ''}`;
    if (bad) throw new Error(text);
    return { startMiB, endMiB, text };
  } finally {
    database.close();
    rmSync(dir, { recursive: true, force: true });
  }
}
