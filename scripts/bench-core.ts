// Core part of `npm run bench`: evaluate() per demo project, one rectifier corner, a filter sweep and its
// Monte Carlo, a 500-line PDF pack; the rectifier and the filter sweep each beside ngspice on the same netlist.
import { performance } from 'node:perf_hooks';
import { DEMO_PROJECTS } from '../seed-demo/index';
import { evaluate } from '../src/core/evaluate';
import { computeBudget } from '../src/core/budget';
import type { PerMode } from '../src/core/model';
import { supplyBenchCases, REF_42_INPUT } from '../src/core/power/bench';
import { simulateRectifier } from '../src/core/power/rectifier-sim';
import { rectifierNetlist } from '../src/core/power/spice-netlist';
import { designLpf } from '../src/core/rf/lpf-design';
import { analyseLpf } from '../src/core/rf/lpf-analysis';
import { monteCarloLpf } from '../src/core/rf/lpf-monte-carlo';
import { lpfNetlist } from '../src/core/rf/lpf-netlist';
import { largeBomProject, benchPack } from '../src/pdf/bench';
import { timeIt, runNgspice, ngspicePath, table, ms, type Timing } from './bench-util';

async function spiceTiming(name: string, netlist: string, check: (out: string) => string): Promise<Timing> {
  let note = '';
  const t = await timeIt(name, () => (note = check(runNgspice(netlist))), 1500, 3);
  return { ...t, note };
}

export async function benchCore(): Promise<{ timings: Timing[]; text: string; failures: string[] }> {
  const timings: Timing[] = [];
  const failures: string[] = [];
  const spice = ngspicePath();

  for (const p of DEMO_PROJECTS) timings.push(await timeIt(`evaluate(): ${p.name}`, () => evaluate(p)));

  // one rectifier corner (reference §4.2 worked example) beside ngspice on the netlist the module exports
  const corner = simulateRectifier(REF_42_INPUT);
  timings.push(
    await timeIt(
      'rectifier, one corner (18 V / 3 A / 10,000 µF bridge)',
      () => simulateRectifier(REF_42_INPUT),
      1500,
      3,
      `DC mean ${corner.dcMeanV.toFixed(3)} V, ripple ${corner.ripplePpV.toFixed(3)} V p-p`,
    ),
  );
  if (spice)
    timings.push(
      await spiceTiming('  same corner in ngspice (process incl.)', rectifierNetlist(REF_42_INPUT), (out) => {
        const v = /^vavg\s*=\s*([-+0-9.eE]+)/m.exec(out);
        const pp = /^vpp\s*=\s*([-+0-9.eE]+)/m.exec(out);
        if (!v) failures.push('ngspice gave no vavg for the rectifier netlist');
        return v
          ? `DC mean ${Number(v[1]).toFixed(3)} V, ripple ${pp ? Number(pp[1]).toFixed(3) : '?'} V p-p`
          : 'no result';
      }),
    );

  // the whole supply evaluation of the club demo (all corners, searches, recommendations)
  const club = DEMO_PROJECTS[0];
  const railOutputA: Record<string, PerMode> = Object.fromEntries(
    computeBudget(club).rails.map((r) => [r.railId, r.outputA]),
  );
  for (const c of supplyBenchCases(club, railOutputA).filter((x) => x.name.startsWith('evaluateSupply')))
    timings.push(await timeIt(c.name, c.run));

  // filter: the demo's low-pass filter, a 161-point sweep, its Monte Carlo, and the same sweep in ngspice
  const stage = club.stages.find((s) => s.lpf);
  if (stage?.lpf) {
    const d = designLpf(stage.lpf, club.frequencyHz);
    if (!d.ok) failures.push(`designLpf refused the demo filter: ${d.errors.map((e) => e.message).join('; ')}`);
    else {
      const design = d.value;
      const sweep = analyseLpf(design, 161);
      const h2 = sweep.harmonics[0];
      timings.push(
        await timeIt(
          `filter sweep, 161 points (${design.response} order ${design.order})`,
          () => analyseLpf(design, 161),
          1500,
          3,
          `2nd harmonic ${h2.attenuationDb.toFixed(2)} dB`,
        ),
      );
      const trials = stage.lpf.monteCarloTrials || 2000;
      timings.push(
        await timeIt(
          `filter Monte Carlo, ${trials} trials`,
          () => monteCarloLpf(design, { trials, seed: stage.lpf!.seed }),
          2000,
          3,
        ),
      );
      if (spice) {
        const freqs = sweep.sweep.map((p) => p.frequencyHz);
        const h2Index = freqs.length;
        timings.push(
          await spiceTiming(
            '  same 161-point sweep in ngspice',
            lpfNetlist(design, [...freqs, h2.frequencyHz]),
            (out) => {
              const m = new RegExp(`^s21_${h2Index}\\s*=\\s*([-+0-9.eE]+)`, 'm').exec(out);
              if (!m) failures.push('ngspice gave no result for the filter netlist');
              return m ? `2nd harmonic ${(-20 * Math.log10(Number(m[1]))).toFixed(2)} dB` : 'no result';
            },
          ),
        );
      }
    }
  }

  // the builder pack for a 500-line parts list
  const big = largeBomProject(club, 500);
  const bigReport = evaluate(big);
  let pages = 0;
  timings.push(
    await timeIt(
      'PDF pack, 500-line parts list',
      async () => (pages = (await benchPack(big, bigReport)).pageCount),
      3000,
      2,
    ),
  );
  timings.at(-1)!.note = pages ? `${pages} pages` : undefined;
  const t0 = performance.now();
  evaluate(big);
  timings.push({
    name: '  evaluate() of that 500-line project',
    runs: 1,
    medianMs: performance.now() - t0,
    p90Ms: performance.now() - t0,
  });

  const text = table(
    ['core workload', 'runs', 'median ms', 'p90 ms', 'result'],
    timings.map((t) => [t.name, t.runs, ms(t.medianMs), ms(t.p90Ms), t.note ?? '']),
  );
  return {
    timings,
    text: spice ? text : `${text}\n(ngspice missing: the SPICE rows were left out; apt-get install ngspice)`,
    failures,
  };
}
