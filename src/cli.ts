// Command line: evaluate an exported project file without a server; export and import projects.
//   rigwright evaluate FILE.json [--json]
//   rigwright export [--id ID] [--out FILE]        (from DATABASE_URL; all project ids listed without --id)
//   rigwright import FILE.json                      (into DATABASE_URL, always as a new project)
//   rigwright pdf FILE.json|--id ID [--paper a4|letter] --out PACK.pdf
//   rigwright csv FILE.json|--id ID [--out PARTS.csv]
import { readFileSync, writeFileSync } from 'node:fs';
import { parseProjectFile, toProjectFile } from './io/project-file';
import { evaluate } from './core/evaluate';
import { renderEvaluationText, evaluationJson } from './io/evaluation-output';
import { readEnv } from './env';

const USAGE = `Usage:
  rigwright evaluate FILE.json [--json]   evaluate an exported project file (no server, no database)
  rigwright export [--id ID] [--out FILE] export a project from the database (DATABASE_URL)
  rigwright import FILE.json              import a project file into the database as a new project
  rigwright list                          list the projects in the database
  rigwright pdf FILE.json|--id ID [--paper a4|letter] --out PACK.pdf   the builder pack as PDF
  rigwright csv FILE.json|--id ID [--out PARTS.csv]                    the costed parts list as CSV`;

/** A project from a file argument, or from the database with --id. */
async function projectFrom(rest: string[]): Promise<import('./core/model').Project> {
  const id = flag(rest, '--id');
  if (!id) {
    const file = rest.find((a, i) => !a.startsWith('--') && !(i > 0 && rest[i - 1].startsWith('--')));
    return readProjectFile(file);
  }
  return withDb(async (d) => {
    const { loadProject } = await import('./db/projects');
    const p = await loadProject(d.db, id);
    if (!p) fail(`No project with id ${id}.`);
    return p!;
  });
}

function flag(args: string[], name: string): string | undefined {
  const i = args.indexOf(name);
  return i >= 0 ? args[i + 1] : undefined;
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
  const env = readEnv(process.env);
  const database = await openDatabase(env.databaseUrl, env.databaseAuthToken);
  try {
    return await fn(database);
  } finally {
    database.close();
  }
}

async function main(args: string[]) {
  const [command, ...rest] = args;
  switch (command) {
    case 'evaluate': {
      const project = readProjectFile(rest.find((a) => !a.startsWith('--')));
      const report = evaluate(project);
      process.stdout.write(rest.includes('--json') ? `${JSON.stringify(evaluationJson(project, report), null, 2)}\n` : renderEvaluationText(project, report));
      return;
    }
    case 'list':
      await withDb(async (d) => {
        const { listProjects } = await import('./db/projects');
        for (const p of await listProjects(d.db)) process.stdout.write(`${p.id}\t${p.name}\n`);
      });
      return;
    case 'export':
      await withDb(async (d) => {
        const { listProjects, loadProject } = await import('./db/projects');
        const id = flag(rest, '--id');
        if (!id) {
          process.stdout.write('Give --id ID. Projects:\n');
          for (const p of await listProjects(d.db)) process.stdout.write(`  ${p.id}\t${p.name}\n`);
          process.exitCode = 2;
          return;
        }
        const p = await loadProject(d.db, id);
        if (!p) fail(`No project with id ${id}.`);
        const text = toProjectFile(p!, new Date().toISOString());
        const out = flag(rest, '--out');
        if (out) writeFileSync(out, text);
        else process.stdout.write(`${text}\n`);
      });
      return;
    case 'import': {
      const project = readProjectFile(rest.find((a) => !a.startsWith('--')));
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
      const out = flag(rest, '--out');
      if (!out) fail('Give --out PACK.pdf');
      const paper = flag(rest, '--paper') ?? 'a4';
      if (paper !== 'a4' && paper !== 'letter') fail('--paper must be a4 or letter');
      const project = await projectFrom(rest);
      const { buildPack } = await import('./pdf');
      const bytes = await buildPack(project, evaluate(project), { paper: paper as 'a4' | 'letter', dataDate: new Date().toISOString().slice(0, 10) });
      writeFileSync(out!, bytes);
      process.stdout.write(`Wrote ${out} (${bytes.length} bytes)\n`);
      return;
    }
    case 'csv': {
      const project = await projectFrom(rest);
      const { costReportToCsv } = await import('./core/csv');
      const text = costReportToCsv(evaluate(project).cost);
      const out = flag(rest, '--out');
      if (out) writeFileSync(out, text);
      else process.stdout.write(text);
      return;
    }
    default:
      process.stderr.write(`${USAGE}\n`);
      process.exit(command ? 2 : 0);
  }
}

await main(process.argv.slice(2));
