// The real server refuses to listen beyond loopback without RIGWRIGHT_SECRET, and says why.
import { describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { spawnServer, startServer } from '../helpers/server';
import { freePort } from '../helpers/free-port';

/** Run until exit; a death by signal with no output (something outside killed it) is retried once. */
async function runToExit(env: Record<string, string>, timeoutMs = 60_000) {
  const first = await runOnce(env, timeoutMs);
  return first.code === null && first.out === '' ? runOnce(env, timeoutMs) : first;
}

async function runOnce(env: Record<string, string>, timeoutMs: number) {
  const proc = spawnServer(env);
  let out = '';
  proc.stdout!.on('data', (d) => (out += d));
  proc.stderr!.on('data', (d) => (out += d));
  const t0 = Date.now();
  const timer = setTimeout(() => proc.kill('SIGKILL'), timeoutMs);
  const [code, signal] = await new Promise<[number | null, NodeJS.Signals | null]>((r) =>
    proc.once('exit', (c, s) => r([c, s])),
  );
  clearTimeout(timer);
  return {
    code,
    out,
    how: `exit code ${code}, signal ${signal}, after ${Date.now() - t0} ms, output: ${out.slice(0, 400)}`,
  };
}

describe('server start-up guard', () => {
  for (const host of ['0.0.0.0', '::', '192.0.2.10']) {
    it(`refuses HOST=${host} without RIGWRIGHT_SECRET: non-zero exit, a message naming the fix, no database ` +
      `created`, async () => {
      const dir = mkdtempSync(join(tmpdir(), 'rigwright-guard-'));
      try {
        const { code, out, how } = await runToExit({
          HOST: host,
          PORT: String(await freePort()),
          DATABASE_URL: `file:${join(dir, 'x.db')}`,
        });
        expect(code, how).not.toBe(0);
        expect(code, how).not.toBeNull(); // it exited by itself, not by our timeout kill
        expect(out).toMatch(/Refusing to listen on/);
        expect(out).toMatch(/RIGWRIGHT_SECRET/);
        expect(existsSync(join(dir, 'x.db'))).toBe(false);
      } finally {
        rmSync(dir, { recursive: true, force: true });
      }
    });
  }

  it('an empty RIGWRIGHT_SECRET counts as none', async () => {
    const { code, out } = await runToExit({
      HOST: '0.0.0.0',
      PORT: String(await freePort()),
      RIGWRIGHT_SECRET: '',
      DATABASE_URL: 'file::memory:',
    });
    expect(code).not.toBe(0);
    expect(out).toMatch(/RIGWRIGHT_SECRET/);
  });

  it('control: on loopback it starts without a secret and answers /healthz', async () => {
    const s = await startServer({ env: { RIGWRIGHT_NO_DEMO: 'true' } });
    try {
      expect(await (await fetch(`${s.url}/healthz`)).text()).toBe('ok');
    } finally {
      await s.stop();
      s.cleanup();
    }
  });

  it('with a secret on loopback, the real server asks for it over HTTP', async () => {
    const secret = 'test-secret-' + Date.now();
    const authHeader = `Basic ${Buffer.from(`op:${secret}`).toString('base64')}`;
    const s = await startServer({ env: { RIGWRIGHT_SECRET: secret, RIGWRIGHT_NO_DEMO: 'true' }, authHeader });
    try {
      expect((await fetch(`${s.url}/`)).status).toBe(401);
      expect((await fetch(`${s.url}/`, { headers: { Authorization: authHeader } })).status).toBe(200);
    } finally {
      await s.stop();
      s.cleanup();
    }
  });
});
