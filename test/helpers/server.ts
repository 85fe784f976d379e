// Start the real server (src/server.ts) as a child process on a free port with its own database file.
// Runs `node --import tsx` (one process) rather than the tsx CLI, which forks a second node process:
// a SIGKILL must hit the process that holds the database open.
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { freePort } from './free-port';

export const REPO_ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '../..');

export interface ServerOptions {
  /** database file path; default: a new temp dir's rigwright.db */
  dbPath?: string;
  /** extra environment (HOST, RIGWRIGHT_SECRET, RIGWRIGHT_NO_DEMO, ...) */
  env?: Record<string, string>;
  /** how long to wait for /healthz, ms */
  readyTimeoutMs?: number;
  /** Authorization header for the readiness probe (when a secret is set) */
  authHeader?: string;
}

export interface RunningServer {
  url: string;
  port: number;
  dbPath: string;
  dir: string;
  proc: ChildProcess;
  output: () => string;
  /** graceful stop (SIGTERM), resolves when the process has exited */
  stop: () => Promise<void>;
  /** hard kill, resolves when the process has exited */
  kill: (signal?: NodeJS.Signals) => Promise<void>;
  /** delete the temp dir (only if this helper made it) */
  cleanup: () => void;
}

/** Environment for the child without anything that would change its behaviour by accident. */
export function childEnv(extra: Record<string, string | undefined>): NodeJS.ProcessEnv {
  const env: NodeJS.ProcessEnv = { ...process.env };
  for (const k of [
    'PORT',
    'HOST',
    'DATABASE_URL',
    'DATABASE_AUTH_TOKEN',
    'RIGWRIGHT_SECRET',
    'RIGWRIGHT_NO_DEMO',
    'NODE_OPTIONS',
  ])
    delete env[k];
  for (const [k, v] of Object.entries(extra)) if (v !== undefined) env[k] = v;
  return env;
}

export function spawnServer(env: Record<string, string | undefined>): ChildProcess {
  return spawn(process.execPath, ['--import', 'tsx', 'src/server.ts'], {
    cwd: REPO_ROOT,
    env: childEnv(env),
    stdio: ['ignore', 'pipe', 'pipe'],
  });
}

export function exited(proc: ChildProcess): Promise<number | null> {
  if (proc.exitCode !== null || proc.signalCode !== null) return Promise.resolve(proc.exitCode);
  return new Promise((r) => proc.once('exit', (code) => r(code)));
}

/** Start the server; when the chosen port was taken meanwhile (EADDRINUSE), try again on another. */
export async function startServer(opts: ServerOptions = {}): Promise<RunningServer> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await startOnce(opts);
    } catch (e) {
      if (attempt >= 3 || !/EADDRINUSE/.test(String((e as Error).message))) throw e;
    }
  }
}

async function startOnce(opts: ServerOptions): Promise<RunningServer> {
  const ownDir = opts.dbPath ? null : mkdtempSync(join(tmpdir(), 'rigwright-test-'));
  try {
    return await startIn(opts, ownDir);
  } catch (e) {
    if (ownDir) rmSync(ownDir, { recursive: true, force: true });
    throw e;
  }
}

async function startIn(opts: ServerOptions, ownDir: string | null): Promise<RunningServer> {
  const dbPath = opts.dbPath ?? join(ownDir!, 'rigwright.db');
  const port = await freePort();
  const host = opts.env?.HOST ?? '127.0.0.1';
  const proc = spawnServer({ PORT: String(port), HOST: host, DATABASE_URL: `file:${dbPath}`, ...opts.env });
  let out = '';
  proc.stdout!.on('data', (d) => (out += d));
  proc.stderr!.on('data', (d) => (out += d));
  const probeHost = host === '0.0.0.0' || host === '::' ? '127.0.0.1' : host;
  const url = `http://${probeHost}:${port}`;
  const deadline = Date.now() + (opts.readyTimeoutMs ?? 60_000);
  for (;;) {
    if (proc.exitCode !== null || proc.signalCode !== null)
      throw new Error(`server exited (${proc.exitCode ?? proc.signalCode}) before it was ready:\n${out}`);
    try {
      const res = await fetch(`${url}/healthz`, { headers: opts.authHeader ? { Authorization: opts.authHeader } : {} });
      if (res.ok) break;
    } catch {
      /* not listening yet */
    }
    if (Date.now() > deadline) {
      proc.kill('SIGKILL');
      throw new Error(`server not ready on ${url} within the timeout:\n${out}`);
    }
    await new Promise((r) => setTimeout(r, 150));
  }
  const kill = async (signal: NodeJS.Signals = 'SIGKILL') => {
    const done = exited(proc);
    if (proc.exitCode === null && proc.signalCode === null) proc.kill(signal);
    await done;
  };
  return {
    url,
    port,
    dbPath,
    dir: ownDir ?? '',
    proc,
    output: () => out,
    stop: () => kill('SIGTERM'),
    kill,
    cleanup: () => {
      if (ownDir) rmSync(ownDir, { recursive: true, force: true });
    },
  };
}
