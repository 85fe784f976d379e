// HTTP part of `npm run bench`: autocannon against the real server for a bounded time per route,
// each beside the trivial /healthz of the same server.
import autocannon from 'autocannon';
import { forms } from '../test/helpers/html';
import type { RunningServer } from '../test/helpers/server';
import { table, ms } from './bench-util';

export interface HttpResult {
  name: string;
  rps: number;
  p50: number;
  p99: number;
  requests: number;
  bad: number;
  statuses: Record<string, number>;
}

interface Route {
  name: string;
  connections: number;
  requests: autocannon.Request[];
  /** statuses that count as success */
  ok: (status: number) => boolean;
  /** called after the warm-up, before the timed run */
  prepare?: () => Promise<void>;
}

const DEMO = '/projects/demo-club-30m';

async function run(server: RunningServer, r: Route, seconds: number): Promise<HttpResult> {
  const result = await autocannon({
    url: server.url,
    connections: r.connections,
    duration: seconds,
    requests: r.requests,
    timeout: 30,
  });
  const statuses: Record<string, number> = {};
  let bad = result.errors + result.timeouts;
  for (const [code, s] of Object.entries(result.statusCodeStats ?? {})) {
    statuses[code] = s.count;
    if (!r.ok(Number(code))) bad += s.count;
  }
  return {
    name: r.name,
    rps: result.requests.average,
    p50: result.latency.p50,
    p99: result.latency.p99,
    requests: result.requests.total,
    bad,
    statuses,
  };
}

/** The edit round trip: an htmx POST of the first stage's currents with the version the last answer carried. */
async function editRoute(server: RunningServer): Promise<Route> {
  const html = await (await fetch(server.url + DEMO)).text();
  const form = forms(html).find((f) => /\/stages\/[^/]+\/loads$/.test(f.action));
  if (!form) throw new Error('no stage currents form on the overview');
  let version = Number(form.fields.version);
  let n = 0;
  const resync = async () => {
    const page = await (await fetch(server.url + DEMO)).text();
    version = Number(forms(page).find((f) => f.action === form.action)!.fields.version);
  };
  return {
    name: 'edit round trip (htmx POST currents)',
    // one connection: edits to one project are sequential by nature (version-checked)
    connections: 1,
    // 409 = the version moved on (e.g. a request the warm-up left in flight); its body carries the new
    // version, which the next request uses: a handled version change, not an error
    ok: (s) => s === 200 || s === 409,
    prepare: resync,
    requests: [
      {
        method: 'POST',
        path: form.action,
        headers: { 'Content-Type': 'application/x-www-form-urlencoded', Origin: server.url, 'HX-Request': 'true' },
        setupRequest: (req) => {
          n++;
          const body = new URLSearchParams({
            ...form.fields,
            version: String(version),
            l0_receive: `${20 + (n % 7)} mA`,
          }).toString();
          return { ...req, body };
        },
        onResponse: (_status, body) => {
          // 200 and 409 both carry the version now stored: take it for the next request
          const m = /name="version" value="(\d+)"/.exec(body);
          if (m) version = Number(m[1]);
        },
      },
    ],
  };
}

export async function benchHttp(
  server: RunningServer,
  seconds: number,
): Promise<{ results: HttpResult[]; text: string }> {
  const get = (name: string, path: string, connections = 8): Route => ({
    name,
    connections,
    ok: (s) => s >= 200 && s < 300,
    requests: [{ method: 'GET', path }],
  });
  const routes: Route[] = [
    get('GET /healthz (trivial)', '/healthz'),
    get('GET overview page', DEMO),
    await editRoute(server),
    get('GET project JSON export', `${DEMO}/export.json`),
  ];
  const csv = await fetch(`${server.url}${DEMO}/bom.csv`);
  await csv.arrayBuffer();
  if (csv.status === 200) routes.push(get('GET parts list CSV', `${DEMO}/bom.csv`));
  const pdf = await fetch(`${server.url}${DEMO}/pack.pdf`);
  await pdf.arrayBuffer();
  if (pdf.status === 200) routes.push(get('GET PDF pack', `${DEMO}/pack.pdf`, 2));
  const results: HttpResult[] = [];
  for (const r of routes) {
    // one second of warm-up so the JIT and the page caches settle before the timed run
    await autocannon({ url: server.url, connections: 1, duration: 1, requests: r.requests });
    await new Promise((done) => setTimeout(done, 200));
    await r.prepare?.();
    results.push(await run(server, r, seconds));
  }
  const trivial = results[0];
  const rows = results.map((r) => [
    r.name,
    r.rps.toFixed(0),
    // autocannon's latency resolution is 1 ms: 0 means under a millisecond
    r.p50 === 0 ? '<1' : ms(r.p50),
    r.p99 === 0 ? '<1' : ms(r.p99),
    r === trivial ? '1' : `${(trivial.rps / Math.max(r.rps, 1e-9)).toFixed(1)}x`,
    r.requests,
    Object.entries(r.statuses).map(([k, v]) => `${k}:${v}`).join(' '),
    r.bad,
  ]);
  let text = table(['route', 'req/s', 'p50 ms', 'p99 ms', 'cost vs trivial', 'requests', 'statuses', 'errors'], rows);
  if (pdf.status !== 200) text += `\n(PDF pack route answered ${pdf.status}: not benchmarked)`;
  return { results, text };
}
