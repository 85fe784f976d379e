// `npm run bench`: the real server on loopback with its own temp database, driven by autocannon for a
// bounded time per route beside /healthz; then core timings (evaluate, rectifier, filter, Monte Carlo,
// PDF) beside ngspice where a netlist exists. Prints tables; exits 1 if any request failed.
// Numbers are printed, never asserted (speed targets do not belong in tests).
import { startServer } from '../test/helpers/server';
import { benchHttp } from './bench-http';
import { benchCore } from './bench-core';
import { machineLine } from './bench-util';
import { benchMemory } from './bench-memory';
import type { HttpResult } from './bench-http';
import type { Timing } from './bench-util';

const SECONDS_PER_ROUTE = Number(process.env.BENCH_SECONDS ?? 6);

async function main(): Promise<number> {
  const started = Date.now();
  console.log(machineLine());
  console.log(`date: ${new Date().toISOString()} · ${SECONDS_PER_ROUTE} s per route (BENCH_SECONDS to change)\n`);

  const server = await startServer({ env: { NODE_ENV: 'production' } });
  let failures: string[] = [];
  let httpResults: HttpResult[] = [];
  try {
    console.log(`HTTP (server ${server.url}, temp database, demo projects loaded)`);
    const http = await benchHttp(server, SECONDS_PER_ROUTE);
    console.log(http.text + '\n');
    httpResults = http.results;
    for (const r of http.results)
      if (r.bad > 0) failures.push(`${r.name}: ${r.bad} failed requests (${JSON.stringify(r.statuses)})`);
  } finally {
    await server.stop();
    server.cleanup();
  }

  console.log('Core (in this process)');
  const core = await benchCore();
  console.log(core.text + '\n');
  failures = [...failures, ...core.failures];

  console.log('Memory');
  const mem = await benchMemory();
  console.log(mem.text + '\n');

  // The goals (issue 15), each as a ratio within this run so that bigger is better and VALUE >= GOAL meets it
  for (const line of goalLines(httpResults, core.timings, mem)) console.log(line);

  console.log(`total bench time ${((Date.now() - started) / 1000).toFixed(1)} s`);
  if (failures.length) {
    console.error(`FAILED:\n  ${failures.join('\n  ')}`);
    return 1;
  }
  console.log('bench: no request errors');
  return 0;
}

/** `ratio NAME VALUE goal GOAL` lines; a figure the run could not measure prints NaN (not met). */
function goalLines(http: HttpResult[], core: Timing[], mem: { startMiB: number; endMiB: number }): string[] {
  const route = (prefix: string) => http.find((r) => r.name.startsWith(prefix));
  const timing = (prefix: string) => core.find((t) => t.name.startsWith(prefix))?.medianMs ?? NaN;
  const trivial = route('GET /healthz');
  const overview = route('GET overview');
  const edit = route('edit round trip');
  // autocannon reports latency in whole milliseconds: 0 means under 1 ms, counted as 1 ms
  const p99 = (r: HttpResult | undefined) => (r ? Math.max(r.p99, 1) : NaN);
  const spice = timing('  same corner in ngspice');
  const club = core.find((t) => t.name.startsWith('evaluate(): Club'))?.medianMs ?? NaN;
  const goals: [string, number, number][] = [
    ['overview/trivial-throughput', (overview?.rps ?? NaN) / (trivial?.rps ?? NaN), 0.25],
    ['trivial-p99/overview-p99', p99(trivial) / p99(overview), 0.05],
    ['edit/trivial-throughput', (edit?.rps ?? NaN) / (trivial?.rps ?? NaN), 0.1],
    ['ngspice-corner/evaluate-club', spice / club, 30],
    ['ngspice-corner/pdf-500-lines', spice / timing('PDF pack, 500-line'), 0.5],
    // flat memory: the heap after 2,000 overview requests over 50 projects at most 25 % above the heap before
    ['heap-start/heap-end', mem.startMiB / mem.endMiB, 0.8],
  ];
  const fmt = (x: number) =>
    Number.isFinite(x) ? (x >= 10 ? x.toFixed(1) : x >= 0.1 ? x.toFixed(3) : x.toPrecision(3)) : 'NaN';
  return goals.map(([name, value, goal]) => `ratio ${name} ${fmt(value)} goal ${goal}`);
}

main().then(
  (code) => process.exit(code),
  (e) => {
    console.error(e);
    process.exit(1);
  },
);
