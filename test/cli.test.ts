import { describe, it, expect, beforeAll } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DEMO_PROJECTS } from '../seed-demo/index';
import { toProjectFile } from '../src/io/project-file';

const dir = mkdtempSync(join(tmpdir(), 'rw-cli-'));
const cli = (args: string[], env: Record<string, string> = {}) =>
  spawnSync(process.execPath, ['scripts/rigwright.mjs', ...args], { encoding: 'utf8', env: { ...process.env, ...env }, timeout: 60_000 });

describe('command line', () => {
  const file = join(dir, 'club.json');
  beforeAll(() => writeFileSync(file, toProjectFile(DEMO_PROJECTS[0], '2026-12-01T00:00:00Z')));

  it('evaluates the exported demo as a table', () => {
    const r = cli(['evaluate', file]);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('Current budget');
    // entered loads 83 / 106 / 206 mA plus the relay coil (36 mA in key-up and key-down)
    expect(r.stdout).toMatch(/13\.8 V signal rail\s+13\.9 V\s+83 mA\s+142 mA\s+242 mA/);
    // the other sections appear with the same numbers as the JSON (checked there)
    expect(r.stdout).toContain('Supply design (headroom at the worst voltage corner');
    expect(r.stdout).toMatch(/Primary fuse: T\d/);
    expect(r.stdout).toMatch(/Harmonic 3: -\d+\.\d dBc, margin \d+\.\d dB/);
    expect(r.stdout).toMatch(/Cost: build of 8 kit\(s\) USD [\d,]+\.\d\d/);
  });

  it('evaluates as JSON with the documented keys', () => {
    const r = cli(['evaluate', file, '--json']);
    expect(r.status).toBe(0);
    const json = JSON.parse(r.stdout);
    expect(json.format).toBe('rigwright-evaluation');
    expect(json.formatVersion).toBe(1);
    const rail = json.budget.rails.find((x: { railId: string }) => x.railId === 'rail-13v8');
    expect(rail.outputA.keyDown).toBeCloseTo(0.242, 9);
    expect(Array.isArray(json.findings)).toBe(true);
  });

  it('refuses a broken file with a message and exit code 2', () => {
    const bad = join(dir, 'bad.json');
    writeFileSync(bad, '{"format":"rigwright-project","formatVersion":1,"project":{"name":""}}');
    const r = cli(['evaluate', bad]);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('project.name');
  });

  it('imports into and exports from a database', () => {
    const env = { DATABASE_URL: `file:${join(dir, 'cli.db')}` };
    const imp = cli(['import', file], env);
    expect(imp.status).toBe(0);
    const id = /as (\S+)/.exec(imp.stdout)![1];
    const exp = cli(['export', '--id', id, '--out', join(dir, 'back.json')], env);
    expect(exp.status).toBe(0);
    const again = cli(['evaluate', join(dir, 'back.json'), '--json']);
    expect(JSON.parse(again.stdout).project.name).toBe(DEMO_PROJECTS[0].name);
  });

  it('writes the builder pack PDF and the costed CSV from a project file', () => {
    const pdf = join(dir, 'pack.pdf');
    const r = cli(['pdf', file, '--paper', 'letter', '--out', pdf]);
    expect(r.status).toBe(0);
    expect(readFileSync(pdf).subarray(0, 5).toString()).toBe('%PDF-');
    const csv = cli(['csv', file]);
    expect(csv.status).toBe(0);
    expect(csv.stdout).toContain('Stage,Section,Refs');
    expect(csv.stdout).toContain('"Mains cord with IEC plug, 3-core, earthed"');
  });

  it('refuses a bad paper size', () => {
    const r = cli(['pdf', file, '--paper', 'a3', '--out', join(dir, 'x.pdf')]);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('--paper must be a4 or letter');
  });
});

describe('command line: bad arguments are refused with a message', () => {
  const file = join(dir, 'club-args.json');
  beforeAll(() => writeFileSync(file, toProjectFile(DEMO_PROJECTS[0], '2026-12-01T00:00:00Z')));

  it.each([
    [['evaluate', 'FILE', '--jsn'], "Unknown option '--jsn'"],
    [['evaluate', 'FILE', 'FILE'], 'unexpected argument'],
    [['evaluate'], 'give the project file to read'],
    [['pdf', 'FILE', '--paper', '--out', 'x.pdf'], "'--paper'"],
    [['csv', 'FILE', '--id', 'demo'], 'either a project file or --id, not both'],
    [['export', '--id'], "'--id <value>' argument missing"],
    [['bogus'], 'Unknown command "bogus"'],
  ])('%j', (args, message) => {
    const r = cli(args.map((a) => (a === 'FILE' ? file : a)));
    expect(r.status).toBe(2);
    expect(r.stderr).toContain(message);
    expect(r.stdout).toBe('');
  });

  it('a bad DATABASE_URL or PORT is a message, not a stack trace', () => {
    const db = cli(['list'], { DATABASE_URL: 'nosuchscheme://x' });
    expect(db.status).toBe(2);
    expect(db.stderr).toContain('Cannot open the database nosuchscheme://x (DATABASE_URL)');
    expect(db.stderr).not.toMatch(/\n\s+at /);
    const port = cli(['list'], { PORT: 'abc' });
    expect(port.status).toBe(2);
    expect(port.stderr).toContain('Bad environment: PORT');
  });

  it('an output path that cannot be written is a message, not a stack trace', () => {
    const r = cli(['csv', file, '--out', join(dir, 'no-such-folder', 'parts.csv')]);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain(`Cannot write ${join(dir, 'no-such-folder', 'parts.csv')}`);
    expect(r.stderr).not.toMatch(/\n\s+at /);
  });
});
