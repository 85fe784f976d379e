// Class-E harmonics at the load: the program's simulation (src/core/rf/class-e-sim.ts, whose load-current Fourier
// series gives the class-E harmonic bands in pa-spectrum.ts) against ngspice on the same circuit, netlist written
// from scratch below. ngspice writes the load voltage over the last periods; the Fourier series is taken here.
// Stated tolerance: the ngspice switch has edges of 0.5 % of the period and a body diode with its own drop, the
// program an instant switch; harmonics 19–65 dB down are compared in dB within TOL_DB (1 dB).
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { NGSPICE, requireTool } from '../../helpers/tools';
import {
  CHOKE_REACTANCE_RATIO,
  CLASS_E_EXCESS,
  CLASS_E_QL,
  CLASS_E_QL_LOW,
  CLASS_E_SHUNT,
  simulateClassE,
} from '../../../src/core/rf/class-e-sim';

const haveNgspice = requireTool(NGSPICE, 'SPICE cross-check of the class-E harmonics', 'apt-get install ngspice');
const TOL_DB = 1;

// Invented stage: 14.06 MHz into 12 Ω, Vdd 12 V, Rds(on) 0.06 Ω
const F0 = 14.06e6;
const R = 12;
const RON = 0.06;
const W = 2 * Math.PI * F0;
const PER = 1 / F0;
const STEPS = 500; // samples per period written out

const dir = haveNgspice ? mkdtempSync(join(tmpdir(), 'rw-classe-h-')) : '';
afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

/** The netlist: supply through a choke, switch (Ron) with body diode, shunt C1, series L0–C0 (loaded Q), load R. */
function netlist(ql: number, periods: number, out: string): string {
  const p = (x: number) => x.toPrecision(9);
  return [
    '* Single-ended class-E stage for the harmonic cross-check (written from scratch for this test)',
    'VDD vdd 0 DC 12',
    `LCH vdd d ${p((CHOKE_REACTANCE_RATIO * R) / W)}`,
    // switch on for half the period less 1 %, edges 0.5 % of the period
    `VG g 0 PULSE(0 1 0 ${p(PER / 200)} ${p(PER / 200)} ${p(PER / 2 - PER / 100)} ${p(PER)})`,
    'S1 d 0 g 0 SWMOD',
    'DB 0 d DBODY',
    `.model SWMOD SW(Ron=${RON} Roff=1e6 Vt=0.5 Vh=0)`,
    '.model DBODY D(Is=1e-12 N=1 Rs=0.01)',
    // Sokal's nominal design at 50 % duty (the same constants as the program): C1 = 0.1836/(ωR), L0 = Q R/ω,
    // 1/(ω C0) = (Q − 1.1525) R
    `C1 d 0 ${p(CLASS_E_SHUNT / (W * R))}`,
    `L0 d a ${p((ql * R) / W)}`,
    `C0 a b ${p(1 / (W * (ql - CLASS_E_EXCESS) * R))}`,
    `RL b 0 ${R}`,
    '.options method=gear',
    '.control',
    `tran ${p(PER / STEPS)} ${p(periods * PER)} ${p((periods - 4) * PER)} ${p(PER / STEPS)}`,
    'linearize v(b)',
    'set wr_singlescale',
    `wrdata ${out} v(b)`,
    'quit',
    '.endc',
    '.end',
  ].join('\n');
}

/** |V_n| / |V_1| over the last two whole periods of the written waveform (Fourier series, trapezoid rule). */
function harmonicsFromSpice(file: string): number[] {
  const rows = readFileSync(file, 'utf8').trim().split('\n').map((l) => l.trim().split(/\s+/).map(Number));
  const tEnd = rows[rows.length - 1][0];
  const span = 2 * PER;
  const use = rows.filter(([t]) => t >= tEnd - span - 1e-15);
  const mags: number[] = [];
  for (let n = 1; n <= 5; n++) {
    let a = 0, b = 0;
    for (let k = 1; k < use.length; k++) {
      const [t0, v0] = use[k - 1];
      const [t1, v1] = use[k];
      const dt = t1 - t0;
      a += 0.5 * dt * (v0 * Math.cos(n * W * t0) + v1 * Math.cos(n * W * t1));
      b += 0.5 * dt * (v0 * Math.sin(n * W * t0) + v1 * Math.sin(n * W * t1));
    }
    mags.push(Math.hypot(a, b));
  }
  return mags.map((m) => m / mags[0]);
}

describe.skipIf(!haveNgspice)('class-E harmonics at the load vs ngspice', () => {
  // loaded Q 30 settles in about Q cycles (the series network's time constant): 400 periods; Q 5 in 150
  for (const [ql, periods] of [[CLASS_E_QL, 400], [CLASS_E_QL_LOW, 150]] as const) {
    it(`loaded Q ${ql}: harmonics 2–5 within ${TOL_DB} dB`, () => {
      const out = join(dir, `q${ql}.txt`);
      const file = join(dir, `q${ql}.cir`);
      writeFileSync(file, netlist(ql, periods, out));
      const run = spawnSync(NGSPICE as string, ['-b', file], { cwd: dir, encoding: 'utf8' });
      const spice = harmonicsFromSpice(out);
      const prog = simulateClassE(1, 0, RON / R, 0.5, ql).loadHarmonics;
      for (let n = 2; n <= 5; n++) {
        const s = 20 * Math.log10(spice[n - 1]);
        const p = 20 * Math.log10(prog[n - 1]);
        expect(Number.isFinite(s), run.stderr).toBe(true);
        expect(Math.abs(s - p), `H${n}: ngspice ${s.toFixed(1)} dBc, program ${p.toFixed(1)} dBc`).toBeLessThanOrEqual(
          TOL_DB,
        );
      }
    });
  }
});
