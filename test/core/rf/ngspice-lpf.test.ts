// Cross-check of the ABCD analysis against ngspice AC analysis of the exported netlist.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { NGSPICE, requireTool } from '../../helpers/tools';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { ladderOf, pointAt } from '../../../src/core/rf/lpf-analysis';
import { designLpf } from '../../../src/core/rf/lpf-design';
import { lpfNetlist } from '../../../src/core/rf/lpf-netlist';
import { lpfParams } from './fixture';

const haveNgspice = requireTool(NGSPICE, 'SPICE cross-check of the low-pass filter', 'apt-get install ngspice');

// Both sides solve the same linear circuit (constant-Q losses set per frequency with `alter`); the only
// difference is the 7-significant-digit component values in the netlist.
const toleranceDb = 0.002;

const cases = [
  { name: 'Chebyshev 0.1 dB n=5 C-input, Q 150/1000', over: { cutoffHz: 8.4e6 }, f0: 7.0e6 },
  {
    name: 'Chebyshev 0.5 dB n=7 L-input, Q 80/500',
    over: { order: 7, rippleDb: 0.5, form: 'inductor-input' as const, inductorQ: 80, capacitorQ: 500 },
    f0: 14.05e6,
  },
  {
    name: 'Butterworth n=3 C-input, Q 100/800',
    over: { response: 'butterworth' as const, order: 3, inductorQ: 100, capacitorQ: 800 },
    f0: 3.55e6,
  },
  {
    name: 'Butterworth n=9 L-input, E12, no pairs',
    over: {
      response: 'butterworth' as const,
      order: 9,
      form: 'inductor-input' as const,
      capacitorSeries: 'E12' as const,
      allowParallelPairs: false,
    },
    f0: 21.05e6,
  },
];

const dir = haveNgspice ? mkdtempSync(join(tmpdir(), 'rw-lpf-')) : '';
afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe.skipIf(!haveNgspice)('LPF netlist in ngspice vs ABCD analysis', () => {
  for (const c of cases) {
    it(c.name, () => {
      const d = designLpf(lpfParams(c.over), c.f0);
      if (!d.ok) throw new Error(JSON.stringify(d.errors));
      const freqs = [0.5, 1, 1.2, 2, 3, 5].map((k) => k * c.f0);
      const file = join(dir, `${c.name.replace(/\W+/g, '_')}.cir`);
      writeFileSync(file, lpfNetlist(d.value, freqs));
      // ngspice exits 1 in batch mode when the netlist has only a .control block ("no simulations run"
      // note), so the exit status is not used; the printed values are.
      const run = spawnSync(NGSPICE as string, ['-b', file], { cwd: dir, encoding: 'utf8' });
      const out = run.stdout;
      const got = new Map<number, number>();
      for (const m of out.matchAll(/^s21_(\d+)\s*=\s*(\S+)/gm)) got.set(Number(m[1]), Number(m[2]));
      expect(got.size, `ngspice output:\n${out}\n${run.stderr}`).toBe(freqs.length);
      const l = ladderOf(d.value);
      freqs.forEach((f, i) => {
        const spiceDb = 20 * Math.log10(got.get(i)!);
        const abcdDb = pointAt(l, f).s21Db;
        expect(
          Math.abs(spiceDb - abcdDb),
          `${f} Hz: ngspice ${spiceDb.toFixed(3)} dB, ABCD ${abcdDb.toFixed(3)} dB`,
        ).toBeLessThanOrEqual(toleranceDb);
      });
    });
  }
});
