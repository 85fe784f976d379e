// SIGKILL in the middle of a stream of edits: after a restart on the same file the database is intact
// and every edit the server acknowledged (303) is there. Three rounds on the same file.
import { describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createClient } from '@libsql/client';
import fc from 'fast-check';
import { startServer, type RunningServer } from '../helpers/server';
import { forms } from '../helpers/html';
import { readNumber } from '../../src/core/spec/number-text';
import { loadCurrentFields } from '../../src/core/spec/stage';

const DEMO = '/projects/demo-club-30m';
const FIELD = 'l0_keyUp';
const toleranceA = 1e-9;

interface StageForm {
  action: string;
  fields: Record<string, string>;
}

async function readState(server: RunningServer): Promise<{ version: number; stages: StageForm[] }> {
  const html = await (await fetch(server.url + DEMO)).text();
  const stages = forms(html).filter((f) => /\/stages\/[^/]+\/loads$/.test(f.action) && FIELD in f.fields);
  const version = Number(stages[0].fields.version);
  return { version, stages: stages.map((s) => ({ action: s.action, fields: s.fields })) };
}

async function integrityCheck(dbPath: string): Promise<string> {
  const client = createClient({ url: `file:${dbPath}` });
  try {
    const r = await client.execute('PRAGMA integrity_check');
    return String(r.rows[0][0]);
  } finally {
    client.close();
  }
}

const currentA = (text: string) => {
  // the current boxes show mA (the load spec's display unit); a bare number there is mA
  const r = readNumber(text, loadCurrentFields['currentA.receive']);
  if (!r.ok) throw new Error(`stored current not readable: ${text}`);
  return r.value;
};

describe('crash safety under a stream of edits', () => {
  it('keeps every acknowledged edit across SIGKILL and restart (integrity_check = ok)', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'rigwright-crash-'));
    const dbPath = join(dir, 'crash.db');
    // seeded: how many acknowledged edits before the kill, and how long the in-flight request runs first
    const acks = fc.sample(fc.integer({ min: 15, max: 40 }), { numRuns: 3, seed: 20261201 });
    const plan = [0, 8, 25].map((delayMs, i) => ({ acks: acks[i], delayMs }));
    /** what each stage's field must hold: the last acknowledged value per stage action */
    const expected = new Map<string, number>();
    let acknowledged = 0;
    let editNo = 0;
    const log: string[] = [];
    try {
      for (const round of plan) {
        const server = await startServer({ dbPath });
        const state = await readState(server);
        expect(state.stages.length).toBeGreaterThanOrEqual(3);
        let version = state.version;
        const post = (s: StageForm, amps: number) =>
          fetch(server.url + s.action, {
            method: 'POST',
            redirect: 'manual',
            headers: { Origin: server.url, 'Content-Type': 'application/x-www-form-urlencoded' },
            body: new URLSearchParams({ ...s.fields, version: String(version), [FIELD]: `${amps * 1000} mA` }),
          });
        let inFlight: { action: string; amps: number } | null = null;
        for (let i = 0; ; i++) {
          const s = state.stages[editNo % state.stages.length];
          const amps = (100 + editNo) / 1000;
          editNo++;
          if (i < round.acks) {
            const res = await post(s, amps).catch((e: Error) => {
              // diagnostics: did the server die under us (something outside killed it)?
              throw new Error(
                `edit ${editNo} got no answer: ${e.message}; server exit ${server.proc.exitCode} signal ` +
                  `${server.proc.signalCode}; output:\n${server.output().slice(-2000)}`,
              );
            });
            expect(res.status, `edit ${editNo}: ${(await res.text()).slice(0, 500)}`).toBe(303);
            version++;
            acknowledged++;
            expected.set(s.action, amps);
            s.fields[FIELD] = `${amps * 1000} mA`;
            continue;
          }
          // the last request: kill the server while it is (most likely) being handled
          inFlight = { action: s.action, amps };
          const pending = post(s, amps).then(
            (r) => r.status,
            () => 'no answer',
          );
          await new Promise((r) => setTimeout(r, round.delayMs));
          await server.kill('SIGKILL');
          const outcome = await pending;
          log.push(
            `round: ${round.acks} acknowledged, kill after ${round.delayMs} ms, last edit -> ` +
              `${outcome === 303 ? '303 (acknowledged before the kill)' : outcome}`,
          );
          if (outcome === 303) {
            acknowledged++;
            expected.set(s.action, amps);
            inFlight = null;
          }
          break;
        }

        expect(await integrityCheck(dbPath)).toBe('ok');
        const again = await startServer({ dbPath });
        try {
          const after = await readState(again);
          // every acknowledged edit bumped the version once; the unacknowledged one may or may not have landed
          const landed = after.version - (1 + acknowledged);
          expect([0, inFlight ? 1 : 0]).toContain(landed);
          for (const s of after.stages) {
            const want =
              landed === 1 && inFlight && inFlight.action === s.action ? inFlight.amps : expected.get(s.action);
            if (want === undefined) continue;
            expect(Math.abs(currentA(s.fields[FIELD]) - want), `${s.action}`).toBeLessThan(toleranceA);
          }
          if (inFlight)
            log[log.length - 1] += `; after restart that unacknowledged edit was ${landed ? 'present' : 'absent'}`;
          if (landed === 1 && inFlight) {
            acknowledged++;
            expected.set(inFlight.action, inFlight.amps);
          }
        } finally {
          await again.stop();
        }
        expect(await integrityCheck(dbPath)).toBe('ok');
      }
      expect(acknowledged).toBeGreaterThanOrEqual(45);
      console.log(log.join('\n'));
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 240_000);
});
