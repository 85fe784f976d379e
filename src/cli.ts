// Command line: evaluate an exported project file without a server; export and import projects.
//   rigwright evaluate FILE.json [--json]
//   rigwright export [--id ID] [--out FILE]        (from DATABASE_URL; all project ids listed without --id)
//   rigwright import FILE.json                      (into DATABASE_URL, always as a new project)
//   rigwright pdf FILE.json|--id ID [--paper a4|letter] [--pack builder|organiser|both] --out PACK.pdf
//   rigwright csv FILE.json|--id ID [--out PARTS.csv]
//   rigwright backup FILE.db                       (a consistent copy of the database, also while the server runs)
// Every command that opens the database names it on stderr (stdout stays the data).
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { parseArgs } from 'node:util';
import { parseProjectFile, toProjectFile } from './io/project-file';
import { evaluate } from './core/evaluate';
import { renderEvaluationText, evaluationJson } from './io/evaluation-output';
import { readEnv, describeDatabase } from './env';

const USAGE = `Usage:
  rigwright evaluate FILE.json [--json]   evaluate an exported project file (no server, no database)
  rigwright export [--id ID] [--out FILE] export a project from the database (DATABASE_URL)
  rigwright import FILE.json              import a project file into the database as a new project
  rigwright list                          list the projects in the database
  rigwright pdf FILE.json|--id ID [--paper a4|letter] [--pack builder|organiser|both] --out PACK.pdf
                                          the pack as PDF: --pack builder (one rig's parts without prices, the
                                          design, build and safety checklists), organiser (costed list, order
                                          sheets, a packing sheet per kit) or both in one file (the default)
  rigwright csv FILE.json|--id ID [--out PARTS.csv]                    the costed parts list as CSV
  rigwright backup FILE.db                a consistent copy of the database (works while the server runs)
  rigwright --help                        this text

The database is DATABASE_URL, by default data/rigwright.db in the Rigwright folder (from any current folder).`;

interface Args {
  positionals: string[];
  values: { id?: string; out?: string; paper?: string; pack?: string; json?: boolean };
}

/** Which options each command takes; anything else is refused with a message (never silently ignored). */
const OPTIONS: Record<string, { options: ('id' | 'out' | 'paper' | 'pack' | 'json')[]; files: [number, number] }> = {
  evaluate: { options: ['json'], files: [1, 1] },
  list: { options: [], files: [0, 0] },
  export: { options: ['id', 'out'], files: [0, 0] },
  import: { options: [], files: [1, 1] },
  pdf: { options: ['id', 'paper', 'pack', 'out'], files: [0, 1] },
  csv: { options: ['id', 'out'], files: [0, 1] },
  backup: { options: [], files: [1, 1] },
};

function readArgs(command: string, rest: string[]): Args {
  const spec = OPTIONS[command];
  const all = {
    id: { type: 'string' },
    out: { type: 'string' },
    paper: { type: 'string' },
    pack: { type: 'string' },
    json: { type: 'boolean' },
  } as const;
  const options = Object.fromEntries(spec.options.map((o) => [o, all[o]]));
  let parsed: Args;
  try {
    parsed = parseArgs({ args: rest, options, strict: true, allowPositionals: true }) as Args;
  } catch (e) {
    fail(`${command}: ${(e as Error).message}\n${USAGE}`);
  }
  const [min, max] = spec.files;
  const n = parsed!.positionals.length;
  if (n > max) fail(`${command}: unexpected argument ${JSON.stringify(parsed!.positionals[max])}\n${USAGE}`);
  if (n < min)
    fail(
      `${command}: give the ${command === 'backup' ? 'file to write the copy to' : 'project file to read'}.\n${USAGE}`,
    );
  for (const [k, v] of Object.entries(parsed!.values)) if (v === '') fail(`${command}: --${k} needs a value`);
  return parsed!;
}

/** A project from a file argument, or from the database with --id (not both). */
async function projectFrom(command: string, a: Args): Promise<import('./core/model').Project> {
  const id = a.values.id;
  if (id !== undefined && a.positionals.length) fail(`${command}: give either a project file or --id, not both.`);
  if (id === undefined) {
    if (!a.positionals.length)
      fail(`${command}: give the project file to read, or --id ID for a project in the database.`);
    return readProjectFile(a.positionals[0]);
  }
  return withDb(async (d) => {
    const { loadProject } = await import('./db/projects');
    const p = await loadProject(d.db, id);
    if (!p) fail(`No project with id ${id}.`);
    return p!;
  });
}

/** Write an output file; a failure (missing folder, no permission) is a message and exit code 2, not a stack trace. */
function writeOut(path: string, data: string | Uint8Array) {
  try {
    writeFileSync(path, data);
  } catch (e) {
    fail(`Cannot write ${path}: ${(e as Error).message}. Nothing was written.`);
  }
}

function readProjectFile(path: string | undefined) {
  if (!path) fail('Give the project file to read.');
  let text: string;
  try {
    text = readFileSync(path!, 'utf8');
  } catch (e) {
    fail(`Cannot read ${path}: ${(e as Error).message}`);
  }
  const parsed = parseProjectFile(text!);
  if (!parsed.ok) fail(`${path} is not a valid project file:\n  ${parsed.errors.join('\n  ')}`);
  return (parsed as { ok: true; project: import('./core/model').Project }).project;
}

function fail(message: string): never {
  process.stderr.write(`${message}\n`);
  process.exit(2);
}

async function withDb<T>(fn: (db: import('./db/client').Database) => Promise<T>): Promise<T> {
  const { openDatabase } = await import('./db/client');
  let env: ReturnType<typeof readEnv>;
  try {
    env = readEnv(process.env);
  } catch (e) {
    fail((e as Error).message);
  }
  let database: import('./db/client').Database;
  try {
    database = await openDatabase(env!.databaseUrl, env!.databaseAuthToken);
  } catch (e) {
    fail(`Cannot open the database ${env!.databaseUrl} (DATABASE_URL): ${(e as Error).message}`);
  }
  process.stderr.write(`Database: ${describeDatabase(env!.databaseUrl, env!.databaseIsDefault)}\n`);
  try {
    return await fn(database);
  } finally {
    database.close();
  }
}

async function main(args: string[]) {
  const [command, ...rest] = args;
  if (command === '--help' || command === '-h' || command === 'help') {
    process.stdout.write(`${USAGE}\n`);
    return;
  }
  if (!command || !Object.hasOwn(OPTIONS, command)) {
    process.stderr.write(`${command ? `Unknown command ${JSON.stringify(command)}.\n` : ''}${USAGE}\n`);
    process.exit(command ? 2 : 0);
  }
  const a = readArgs(command, rest);
  switch (command) {
    case 'evaluate': {
      const project = readProjectFile(a.positionals[0]);
      const report = evaluate(project);
      process.stdout.write(
        a.values.json
          ? `${JSON.stringify(evaluationJson(project, report), null, 2)}\n`
          : renderEvaluationText(project, report),
      );
      return;
    }
    case 'list':
      await withDb(async (d) => {
        const { listProjects } = await import('./db/projects');
        const projects = await listProjects(d.db);
        if (!projects.length)
          process.stderr.write(
            'No projects in this database (start the server to load the demo, or rigwright import FILE.json).\n',
          );
        for (const p of projects) process.stdout.write(`${p.id}\t${p.name}\n`);
      });
      return;
    case 'export':
      await withDb(async (d) => {
        const { listProjects, loadProject } = await import('./db/projects');
        const id = a.values.id;
        if (!id) {
          process.stdout.write('Give --id ID. Projects:\n');
          for (const p of await listProjects(d.db)) process.stdout.write(`  ${p.id}\t${p.name}\n`);
          process.exitCode = 2;
          return;
        }
        const p = await loadProject(d.db, id);
        if (!p) fail(`No project with id ${id}.`);
        const text = toProjectFile(p!, new Date().toISOString());
        if (a.values.out) writeOut(a.values.out, text);
        else process.stdout.write(`${text}\n`);
      });
      return;
    case 'import': {
      const project = readProjectFile(a.positionals[0]);
      await withDb(async (d) => {
        const { insertProject } = await import('./db/projects');
        const { cloneProject } = await import('./core/new-project');
        const { newId } = await import('./web/ids');
        const copy = cloneProject(project, newId('prj'), project.name, newId);
        await insertProject(d, copy, new Date().toISOString());
        process.stdout.write(`Imported "${copy.name}" as ${copy.id}\n`);
      });
      return;
    }
    case 'pdf': {
      const out = a.values.out;
      if (!out) fail('Give --out PACK.pdf');
      const paper = a.values.paper ?? 'a4';
      if (paper !== 'a4' && paper !== 'letter') fail('--paper must be a4 or letter');
      const { buildPack, PACK_PARTS, PACK_PART_TITLES } = await import('./pdf');
      const part = a.values.pack ?? 'both';
      if (!(PACK_PARTS as readonly string[]).includes(part))
        fail(`--pack must be ${PACK_PARTS.join(', ')} (got ${JSON.stringify(part)})`);
      const project = await projectFrom(command, a);
      const dataDate = new Date().toISOString().slice(0, 10);
      const opts = { paper: paper as 'a4' | 'letter', part: part as import('./pdf').PackPart, dataDate };
      const bytes = await buildPack(project, evaluate(project), opts);
      writeOut(out!, bytes);
      process.stdout.write(`Wrote ${out}: ${PACK_PART_TITLES[opts.part]} (${bytes.length} bytes)\n`);
      return;
    }
    case 'csv': {
      const project = await projectFrom(command, a);
      const { costReportToCsv } = await import('./core/csv');
      const text = costReportToCsv(evaluate(project).cost);
      if (a.values.out) writeOut(a.values.out, text);
      else process.stdout.write(text);
      return;
    }
    case 'backup': {
      const target = resolve(a.positionals[0]);
      if (existsSync(target)) fail(`backup: ${target} already exists; give a new file name. Nothing was written.`);
      await withDb(async (d) => {
        try {
          // Source: SQLite documentation, "VACUUM" (sqlite.org/lang_vacuum.html), VACUUM INTO: a consistent copy
          // made in one read transaction, so the server may keep running and writing meanwhile.
          await d.client.execute({ sql: 'VACUUM INTO ?', args: [target] });
        } catch (e) {
          fail(`backup: cannot write ${target}: ${(e as Error).message}. Nothing was written.`);
        }
        process.stdout.write(`Wrote a copy of the database to ${target}\n`);
      });
      return;
    }
  }
}

await main(process.argv.slice(2));
