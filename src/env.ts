// Environment, parsed once with zod.
import { z } from 'zod';

const schema = z.object({
  PORT: z.coerce.number().int().min(1).max(65535).default(8787),
  HOST: z.string().min(1).default('127.0.0.1'),
  DATABASE_URL: z.string().min(1).default('file:./data/rigwright.db'),
  DATABASE_AUTH_TOKEN: z.string().optional(),
  RIGWRIGHT_SECRET: z.string().optional(),
  RIGWRIGHT_NO_DEMO: z.stringbool().optional(),
});

export interface Env {
  port: number;
  host: string;
  databaseUrl: string;
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
    databaseAuthToken: e.DATABASE_AUTH_TOKEN,
    accessSecret: e.RIGWRIGHT_SECRET,
    loadDemo: !e.RIGWRIGHT_NO_DEMO,
  };
}

/** Loopback addresses need no access secret; anything else does. */
export function isLoopback(host: string): boolean {
  return host === 'localhost' || host === '::1' || /^127\./.test(host);
}
