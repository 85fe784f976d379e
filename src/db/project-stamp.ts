// What a cached page of a project depends on, read cheaply (one row, four columns): id, version and the times it
// was created and last written. A project deleted and made again under the same id has a new creation time.
import { eq } from 'drizzle-orm';
import type { Db } from './client';
import * as t from './schema';

export interface ProjectStamp {
  id: string;
  version: number;
  createdAt: string;
  updatedAt: string;
}

export async function projectStamp(db: Db, id: string): Promise<ProjectStamp | null> {
  const [row] = await db
    .select({ id: t.projects.id, version: t.projects.version, createdAt: t.projects.createdAt, updatedAt: t.projects.updatedAt })
    .from(t.projects)
    .where(eq(t.projects.id, id));
  return row ?? null;
}
