// Shared pieces of the whole-chain ngspice cross-checks: the low-pass ladder's input impedance and netlist lines, a
// scratch directory for netlists, and one batch run read back (.meas values and the .four table). Netlist syntax per
// the ngspice user's manual.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll } from 'vitest';
import type { LpfDesign } from '../../src/core/rf/lpf-design';
import { NGSPICE } from './tools';

export type Complex = { re: number; im: number };

/** Input impedance of the lossless ladder (as built) loaded by zl at angular frequency wRadS, folded element by
 * element from the load (series Z adds; shunt C: Z ∥ 1/(jωC) = Z / (1 + jωC Z); circuit theory). */
export function ladderInputOhm(d: LpfDesign, zl: Complex, wRadS: number): Complex {
  let z: Complex = zl;
  for (let i = d.elements.length - 1; i >= 0; i--) {
    const e = d.elements[i];
    if (e.kind === 'series-inductor') z = { re: z.re, im: z.im + wRadS * e.builtValue };
    else {
      // shunt C: Z ∥ 1/(jωC) = Z / (1 + jωC Z)
      const b = wRadS * e.builtValue;
      const den = { re: 1 - b * z.im, im: b * z.re };
      const m = den.re * den.re + den.im * den.im;
      z = { re: (z.re * den.re + z.im * den.im) / m, im: (z.im * den.re - z.re * den.im) / m };
    }
  }
  return z;
}

/** Netlist lines of the ladder from node `from`, then the load's reactive part from the ladder's end to node nr (a
 * resistive load joins through 1 µΩ: a 0 V source there stalled the time step in the stage-only test). The load's
 * resistance from nr to ground is the caller's. */
export function ladderAndLoadLines(d: LpfDesign, from: string, zl: Complex, wRadS: number): string[] {
  const lines: string[] = [];
  let node = from;
  d.elements.forEach((e, i) => {
    if (e.kind === 'series-inductor') {
      lines.push(`LF${i} ${node} n${i} ${e.builtValue.toPrecision(7)}`);
      node = `n${i}`;
    } else {
      lines.push(`CF${i} ${node} 0 ${e.builtValue.toPrecision(7)}`);
    }
  });
  lines.push(Math.abs(zl.im) < 1e-9 ? `RX ${node} nr 1e-6`
    : zl.im > 0 ? `LX ${node} nr ${(zl.im / wRadS).toPrecision(7)}`
      : `CX ${node} nr ${(1 / (wRadS * -zl.im)).toPrecision(7)}`);
  return lines;
}

/** A scratch directory for one test file's netlists, removed after its tests ('' when ngspice is missing). */
export function spiceScratchDir(prefix: string, haveNgspice: boolean): string {
  const dir = haveNgspice ? mkdtempSync(join(tmpdir(), prefix)) : '';
  afterAll(() => {
    if (dir) rmSync(dir, { recursive: true, force: true });
  });
  return dir;
}

export interface SpiceRun {
  /** a `.meas` result by name (NaN when ngspice did not print it) */
  measure: (name: string) => number;
  /** the `.four` table: harmonic number → magnitude */
  harm: Map<number, number>;
  /** ngspice's whole output, for a failing assertion's message */
  out: string;
}

/** Write the netlist as `name`.cir in dir and run ngspice in batch mode on it. */
export function runSpice(dir: string, name: string, netlist: string): SpiceRun {
  const file = join(dir, `${name}.cir`);
  writeFileSync(file, netlist);
  const r = spawnSync(NGSPICE as string, ['-b', file], { cwd: dir, encoding: 'utf8' });
  const measure = (k: string) => Number(r.stdout.match(new RegExp(`^${k}\\s*=\\s*(\\S+)`, 'm'))?.[1]);
  const harm = new Map<number, number>();
  for (const m of r.stdout.matchAll(/^\s*(\d+)\s+(\S+)\s+(\S+)\s+(\S+)\s+(\S+)\s+(\S+)\s*$/gm)) {
    harm.set(Number(m[1]), Number(m[3]));
  }
  return { measure, harm, out: r.stdout + r.stderr };
}
