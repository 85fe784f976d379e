// `rigwright evaluate --json` lists the design roles: each with its requirement, the bound line and part, and the
// verdict with its reasons. The club demo binds every role; its 0.5 W bleeders are the deliberate mismatch (0.92 W
// needed: P = V²/R at the no-load peak, rated at most 50 % loaded), so only that role is not "ok".
import { describe, it, expect, beforeAll } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DEMO_PROJECTS } from '../seed-demo/index';
import { toProjectFile } from '../src/io/project-file';

const dir = mkdtempSync(join(tmpdir(), 'rw-cli-roles-'));
const cli = (args: string[]) => spawnSync(process.execPath, ['scripts/rigwright.mjs', ...args], { encoding: 'utf8', timeout: 60_000 });

interface RoleJson {
  role: { id: string; label: string; requirement: string; rules: { key: string; sourceKey: string }[] };
  state: string;
  bound: { lineId: string; refs: string; partId: string; part: string }[];
  problems: string[];
}

describe('evaluate --json: design roles', () => {
  const file = join(dir, 'club.json');
  let roles: RoleJson[] = [];
  beforeAll(() => {
    writeFileSync(file, toProjectFile(DEMO_PROJECTS[0], '2026-12-01T00:00:00Z'));
    const r = cli(['evaluate', file, '--json']);
    expect(r.status).toBe(0);
    roles = JSON.parse(r.stdout).roles.statuses;
  }, 60_000);

  it('each role has its requirement, bound part and verdict', () => {
    expect(roles.length).toBeGreaterThan(10);
    for (const s of roles) {
      expect(s.role.requirement.length).toBeGreaterThan(0);
      expect(['ok', 'caution', 'fail', 'unbound']).toContain(s.state);
      expect(s.bound.length).toBeGreaterThan(0); // the club binds every role
      for (const r of s.role.rules) expect(typeof r.sourceKey).toBe('string'); // sources as registry text and key
    }
    const reservoir = roles.find((s) => s.role.id === 'reservoir:rail-pa')!;
    expect(reservoir).toMatchObject({ state: 'ok', bound: [{ lineId: expect.any(String), partId: 'p-c6800' }], problems: [] });
    expect(reservoir.role.requirement).toMatch(/^Capacitance ≥ [\d.]+ µF, Voltage ≥ [\d.]+ V, Ripple ≥ [\d.]+ A$/);
  });

  it('the bleeders are the one role short of ok, with the reason', () => {
    expect(roles.filter((s) => s.state !== 'ok').map((s) => s.role.id)).toEqual(['bleeders']);
    const b = roles.find((s) => s.role.id === 'bleeders')!;
    expect(b.bound[0]).toMatchObject({ refs: 'R1, R2', partId: 'p-bleed-05' });
    expect(b.problems[0]).toMatch(/^Power 500 mW does not meet at least 9\d\d mW/);
  });
});
