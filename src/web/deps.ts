// What the web layer needs from outside: the database and a clock (injected, so tests control both).
import type { Database } from '../db/client';

export interface Deps {
  database: Database;
  now: () => Date;
  accessSecret?: string;
}
