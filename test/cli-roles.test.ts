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
const cli = (args: string[]) =>
  spawnSync(process.execPath, ['scripts/rigwright.mjs', ...args], { encoding: 'utf8', timeout: 60_000 });

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
    expect(reservoir).toMatchObject({
      state: 'ok',
      bound: [{ lineId: expect.any(String), partId: 'p-c6800' }],
      problems: [],
    });
    expect(reservoir.role.requirement).toMatch(
      /^Capacitance ≥ [\d.]+ µF, Voltage ≥ [\d.]+ V, Ripple ≥ [\d.]+ A$/,
    );
  });

  it('the bleeders are the one mismatch, with the reason; the generic fuse and filter-capacitor lines cannot be ' +
    'checked', () => {
    expect(roles.filter((s) => s.state !== 'ok').map((s) => s.role.id)).toEqual([
      'fuses',
      'bleeders',
      'lpf-capacitors:st-lpf',
    ]);
    const short = roles.filter((s) => s.problems.some((m) => m.includes('does not meet'))).map((s) => s.role.id);
    expect(short).toEqual(['bleeders']);
    const caps = roles.find((s) => s.role.id === 'lpf-capacitors:st-lpf')!;
    expect(caps.problems).toEqual([
      expect.stringMatching(
        /^The line C10–C14 \(Capacitor [^)]*values per RF page\) does not state capacitance, so it cannot be checked/,
      ),
    ]);
    const b = roles.find((s) => s.role.id === 'bleeders')!;
    expect(b.bound[0]).toMatchObject({ refs: 'R1, R2', partId: 'p-bleed-05' });
    expect(b.problems[0]).toMatch(/^Power 500 mW does not meet at least 9\d\d mW/);
  });
});

// The plain text (no --json) lists the same roles: label, verdict, requirement, the bound lines, the reasons, and
// the unbound roles. Checked against the JSON of the same file (this program's own output, compared only for
// agreement; the verdicts above are the checked values) and on a copy with the transformer line unbound.
describe('evaluate (plain text): design roles', () => {
  const file = join(dir, 'club-text.json');
  let text = '';
  let roles: RoleJson[] = [];
  beforeAll(() => {
    writeFileSync(file, toProjectFile(DEMO_PROJECTS[0], '2026-12-01T00:00:00Z'));
    text = cli(['evaluate', file]).stdout;
    roles = JSON.parse(cli(['evaluate', file, '--json']).stdout).roles.statuses;
  }, 60_000);

  it('each role with its verdict, requirement and bound line; the reasons of the roles short of ok', () => {
    const block = text.slice(text.indexOf('Design roles ('), text.indexOf('\nFindings ('));
    expect(block).toContain(`Design roles (${roles.length}:`);
    for (const s of roles) {
      expect(block).toContain(`  ${s.role.label} [${s.state.toUpperCase()}]\n    needs: ${s.role.requirement}\n`);
      for (const b of s.bound) expect(block).toContain(`    bound: ${b.refs ? `${b.refs}: ` : ''}${b.part}, `);
      for (const p of s.problems) expect(block).toContain(`    why: ${p}\n`);
    }
    expect(block).toMatch(
      / {2}Bleeder resistors \[CAUTION\]\n {4}needs: Resistance 2 × 2\.2 kΩ ±5 %, Power ≥ 9\d\d mW\n {4}bound: R1, R2: Resistor 2\.2 kΩ 0\.5 W metal film, 2 per rig \(line b9\)\n {4}why: Power 500 mW does not meet/,
    );
    expect(block).toContain('Unbound roles: none');
  });

  it('a copy with the transformer line unbound lists it under the unbound roles with its requirement', () => {
    const copy = structuredClone(DEMO_PROJECTS[0]);
    copy.bom = copy.bom.map((l) => (l.roleId === 'transformer:tr-main' ? { ...l, roleId: null } : l));
    const f = join(dir, 'club-unbound.json');
    writeFileSync(f, toProjectFile(copy, '2026-12-01T00:00:00Z'));
    const out = cli(['evaluate', f]).stdout;
    expect(out).toMatch(
      /\nUnbound roles \(1: no parts-list line is bound to them\)\n {2}Mains transformer T1 mains transformer: needs VA ≥ [\d.]+ VA, /,
    );
    expect(out).not.toContain('Mains transformer T1 mains transformer [');
  });
});
