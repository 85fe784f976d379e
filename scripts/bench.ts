// `npm run bench`: the real server on loopback with its own temp database, driven by autocannon for a
// bounded time per route beside /healthz; then core timings (evaluate, rectifier, filter, Monte Carlo,
// PDF) beside ngspice where a netlist exists. Prints tables; exits 1 if any request failed.
// Numbers are printed, never asserted (speed targets do not belong in tests).
import { startServer } from '../test/helpers/server';
import { benchHttp } from './bench-http';
import { benchCore } from './bench-core';
import { machineLine } from './bench-util';

const SECONDS_PER_ROUTE = Number(process.env.BENCH_SECONDS ?? 6);

async function main(): Promise<number> {
  const started = Date.now();
  console.log(machineLine());
  console.log(`date: ${new Date().toISOString()} · ${SECONDS_PER_ROUTE} s per route (BENCH_SECONDS to change)\n`);

  const server = await startServer({ env: { NODE_ENV: 'production' } });
  let failures: string[] = [];
  try {
    console.log(`HTTP (server ${server.url}, temp database, demo projects loaded)`);
    const http = await benchHttp(server, SECONDS_PER_ROUTE);
    console.log(http.text + '\n');
    for (const r of http.results) if (r.bad > 0) failures.push(`${r.name}: ${r.bad} failed requests (${JSON.stringify(r.statuses)})`);
  } finally {
    await server.stop();
    server.cleanup();
  }

  console.log('Core (in this process)');
  const core = await benchCore();
  console.log(core.text + '\n');
  failures = [...failures, ...core.failures];

  console.log(`total bench time ${((Date.now() - started) / 1000).toFixed(1)} s`);
  if (failures.length) {
    console.error(`FAILED:\n  ${failures.join('\n  ')}`);
    return 1;
  }
  console.log('bench: no request errors');
  return 0;
}

main().then(
  (code) => process.exit(code),
  (e) => {
    console.error(e);
    process.exit(1);
  },
);
