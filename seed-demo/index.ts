// The demo projects and an idempotent loader (through the same repository the app uses).
import type { Database } from '../src/db/client';
import { insertProject, loadProject } from '../src/db/projects';
import type { Project } from '../src/core/model';
import { club30m } from './club-30m';
import { portable20m } from './portable-20m';

export const DEMO_PROJECTS: Project[] = [club30m, portable20m];

/** Insert each demo project that is not there yet; returns the names inserted. */
export async function seedDemo(database: Database, nowIso: string): Promise<string[]> {
  const inserted: string[] = [];
  for (const p of DEMO_PROJECTS) {
    if (await loadProject(database.db, p.id)) continue;
    await insertProject(database, structuredClone(p), nowIso);
    inserted.push(p.name);
  }
  return inserted;
}
