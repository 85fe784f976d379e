#!/usr/bin/env node
// Runs the whole vitest suite and ends with the plain line CI reads: "tests: N passed, M failed, K skipped".
// A heartbeat reporter (scripts/progress-reporter.mjs) prints which long test files are still running.
// Skipped tests are counted and shown (a missing ngspice, chromium or pdftotext skips its tests with the reason printed).
import { spawnSync } from 'node:child_process';
import { readFileSync, rmSync, existsSync } from 'node:fs';

const report = '.vitest-report.json';
rmSync(report, { force: true });
const args = ['vitest', 'run', '--reporter=default', '--reporter=./scripts/progress-reporter.mjs', '--reporter=json', `--outputFile.json=${report}`, ...process.argv.slice(2)];
const run = spawnSync('npx', args, { stdio: 'inherit', env: { ...process.env, NO_COLOR: '1' } });
let passed = 0;
let failed = 0;
let skipped = 0;
if (existsSync(report)) {
  const json = JSON.parse(readFileSync(report, 'utf8'));
  passed = json.numPassedTests ?? 0;
  skipped = (json.numPendingTests ?? 0) + (json.numTodoTests ?? 0);
  failed = (json.numFailedTests ?? 0) + (json.numRuntimeErrorTestSuites ?? 0);
  if (json.numFailedTestSuites && failed === 0) failed = json.numFailedTestSuites;
} else {
  failed = 1;
}
if (run.status !== 0 && failed === 0) failed = 1;
console.log(`tests: ${passed} passed, ${failed} failed, ${skipped} skipped`);
process.exit(failed === 0 && passed > 0 ? 0 : 1);
