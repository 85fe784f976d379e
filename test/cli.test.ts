import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, writeFileSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { DEMO_PROJECTS } from '../seed-demo/index';
import { toProjectFile } from '../src/io/project-file';
import { readEnv, describeDatabase } from '../src/env';
import { startServer, spawnServer, exited, type RunningServer } from './helpers/server';
import { hasPoppler, pagesText } from './pdf/pdf-text';

const dir = mkdtempSync(join(tmpdir(), 'rw-cli-'));
const cli = (args: string[], env: Record<string, string> = {}) =>
  spawnSync(process.execPath, ['scripts/rigwright.mjs', ...args], {
    encoding: 'utf8',
    env: { ...process.env, ...env },
    timeout: 60_000,
  });

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
    // each harmonic is a band at the antenna, judged on its worst end
    expect(r.stdout).toMatch(
      /Harmonic 3: .*-\d+\.\d dBc at the antenna \(judged on the worst end\), margin \d+\.\d dB/,
    );
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

  // What each part holds is the pack's own test (test/pdf/pack-parts.test.ts); here: the CLI passes the choice through.
  it.skipIf(!hasPoppler)('--pack builder|organiser|both writes that part of the pack', () => {
    const text: Record<string, string> = {};
    for (const part of ['builder', 'organiser', 'both']) {
      const pdf = join(dir, `pack-${part}.pdf`);
      const r = cli(['pdf', file, '--pack', part, '--out', pdf]);
      expect(r.status, r.stderr).toBe(0);
      expect(r.stdout).toContain(
        `Wrote ` +
          `${pdf}: ${
            part === 'both'
              ? 'Builder’s and organiser’s pack'
              : part === 'builder'
                ? 'Builder’s pack'
                : 'Organiser’s pack'
          }`,
      );
      text[part] = pagesText(pdf).join('\n').replace(/\s+/g, ' ');
    }
    expect(text.builder).toContain('Build checklist');
    expect(text.builder.includes('Order sheets per supplier')).toBe(false);
    expect(text.organiser).toContain('Order sheets per supplier');
    expect(text.organiser.includes('Build checklist')).toBe(false);
    for (const heading of ['Build checklist', 'Order sheets per supplier']) expect(text.both).toContain(heading);
  });

  it('without --pack writes both parts in one file, as --help says', () => {
    const r = cli(['pdf', file, '--out', join(dir, 'default.pdf')]);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('Builder’s and organiser’s pack');
    const help = cli(['--help']);
    expect(help.stdout).toContain('[--pack builder|organiser|both]');
    expect(help.stdout).toMatch(/or both in one file \(the default\)/);
  });

  it('refuses an unknown --pack with the choices and writes nothing', () => {
    const out = join(dir, 'nope.pdf');
    const r = cli(['pdf', file, '--pack', 'kits', '--out', out]);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('--pack must be both, builder, organiser (got "kits")');
    expect(existsSync(out)).toBe(false);
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
    [['pdf', 'FILE', '--pack', '--out', 'x.pdf'], "'--pack'"],
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

describe('command line: the first hour', () => {
  it('--help prints the usage on stdout and exits 0', () => {
    const r = cli(['--help']);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('Usage:');
    expect(r.stdout).toContain('rigwright backup FILE.db');
  });

  it('list on an empty database says so and names the database it opened', () => {
    const path = join(dir, 'empty.db');
    const r = cli(['list'], { DATABASE_URL: `file:${path}` });
    expect(r.status).toBe(0);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain(`Database: ${path}`);
    expect(r.stderr).toContain('No projects in this database');
  });

  it('the default database is data/rigwright.db in the project folder, whatever the current folder', () => {
    const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
    const env = readEnv({});
    expect(env.databaseUrl).toBe(`file:${join(root, 'data', 'rigwright.db')}`);
    expect(env.databaseIsDefault).toBe(true);
    expect(describeDatabase(env.databaseUrl, true)).toBe(
      `${join(root, 'data', 'rigwright.db')} (the default; set DATABASE_URL for another)`,
    );
    expect(readEnv({ DATABASE_URL: 'file:x.db' }).databaseIsDefault).toBe(false);
  });

  describe('with the server running', () => {
    let server: RunningServer;
    beforeAll(async () => {
      server = await startServer();
    }, 90_000);
    afterAll(async () => {
      await server?.stop();
      server?.cleanup();
    });

    it('backup writes a consistent copy that lists the same projects, and refuses to overwrite', () => {
      const env = { DATABASE_URL: `file:${server.dbPath}` };
      const original = cli(['list'], env);
      expect(original.status).toBe(0);
      expect(original.stdout.trim().split('\n').length).toBe(DEMO_PROJECTS.length);
      const copy = join(dir, 'backup.db');
      const r = cli(['backup', copy], env);
      expect(r.stderr).toContain(`Database: ${server.dbPath}`);
      expect(r.status).toBe(0);
      expect(r.stdout).toContain(`Wrote a copy of the database to ${copy}`);
      const listed = cli(['list'], { DATABASE_URL: `file:${copy}` });
      expect(listed.stdout).toBe(original.stdout);
      const again = cli(['backup', copy], env);
      expect(again.status).toBe(2);
      expect(again.stderr).toContain('already exists');
    });

    it('a second server on the same PORT stops with one line naming PORT, not a stack trace', async () => {
      const proc = spawnServer({
        PORT: String(server.port),
        DATABASE_URL: `file:${join(dir, 'second.db')}`,
        RIGWRIGHT_NO_DEMO: 'true',
      });
      let err = '';
      proc.stderr!.on('data', (d) => (err += d));
      const code = await exited(proc);
      expect(code).toBe(2);
      expect(err.trim().split('\n')).toHaveLength(1);
      expect(err).toContain(`port ${server.port} on 127.0.0.1 is already in use`);
      expect(err).toContain(`PORT=${server.port + 1} npm start`);
      expect(err).not.toMatch(/\n\s+at /);
    }, 60_000);
  });
});
