// Shared bits of `npm run bench`: timing loops, the machine line, table printing, ngspice runs.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { cpus, tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';

export interface Timing {
  name: string;
  runs: number;
  medianMs: number;
  p90Ms: number;
  note?: string;
}

/** Run `fn` for about `budgetMs` (at least `minRuns` times, after one warm-up call) and report the median. */
export async function timeIt(
  name: string,
  fn: () => unknown,
  budgetMs = 1500,
  minRuns = 3,
  note?: string,
): Promise<Timing> {
  await fn();
  const samples: number[] = [];
  const start = performance.now();
  while (samples.length < minRuns || performance.now() - start < budgetMs) {
    const t0 = performance.now();
    await fn();
    samples.push(performance.now() - t0);
    if (samples.length >= 10_000) break;
  }
  samples.sort((a, b) => a - b);
  return {
    name,
    runs: samples.length,
    medianMs: samples[Math.floor(samples.length / 2)],
    p90Ms: samples[Math.floor(samples.length * 0.9)],
    note,
  };
}

export function machineLine(): string {
  const c = cpus();
  const spice = ngspicePath()
    ? (spawnSync(ngspicePath()!, ['-v'], { encoding: 'utf8' }).stdout.match(/ngspice-\S+/)?.[0] ?? 'ngspice')
    : 'ngspice missing';
  return `machine: ${c[0]?.model ?? 'unknown cpu'} · ${c.length} cores · node ${process.version} · ` +
    `${process.platform}-${process.arch} · ${spice}`;
}

export function ngspicePath(): string | null {
  if (existsSync('/usr/bin/ngspice')) return '/usr/bin/ngspice';
  return spawnSync('ngspice', ['-v'], { encoding: 'utf8' }).status === 0 ? 'ngspice' : null;
}

/** Run one netlist in batch mode; returns the text output (stdout + stderr). */
export function runNgspice(netlist: string): string {
  const exe = ngspicePath();
  if (!exe) throw new Error('ngspice missing');
  const dir = mkdtempSync(join(tmpdir(), 'rigwright-bench-spice-'));
  try {
    writeFileSync(join(dir, 'bench.cir'), netlist);
    const run = spawnSync(exe, ['-b', 'bench.cir'], { cwd: dir, encoding: 'utf8', timeout: 60_000 });
    return `${run.stdout ?? ''}\n${run.stderr ?? ''}`;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

export function table(headers: string[], rows: (string | number)[][]): string {
  const cells = [headers, ...rows.map((r) => r.map((x) => String(x)))];
  const widths = headers.map((_, i) => Math.max(...cells.map((r) => (r[i] ?? '').length)));
  const line = (r: string[]) => r.map((x, i) => (i === 0 ? x.padEnd(widths[i]) : x.padStart(widths[i]))).join('  ');
  return [line(cells[0]), widths.map((w) => '-'.repeat(w)).join('  '), ...cells.slice(1).map(line)].join('\n');
}

export const ms = (x: number) => (x >= 100 ? x.toFixed(0) : x >= 10 ? x.toFixed(1) : x.toFixed(2));
