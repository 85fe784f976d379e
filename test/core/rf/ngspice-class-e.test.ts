// The class-E simulation (src/core/rf/class-e-sim.ts) against ngspice on the same circuit, written from scratch
// (test/fixtures/pa-chain/class-e.cir.tmpl): design load and the SWR 2 circle at four phases. Both solve the same
// idealised circuit; the tolerance covers ngspice's switch edges (1 % of the period) and the body-diode model.
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
  CLASS_E_SHUNT,
  simulateClassE,
} from '../../../src/core/rf/class-e-sim';
import { loadOnCircle } from '../../../src/core/rf/pa-swr';

const haveNgspice = requireTool(NGSPICE, 'SPICE cross-check of the class-E simulation', 'apt-get install ngspice');
const TOL = 0.05; // relative, drain peak and output power

// Invented stage: 7.03 MHz into 10 Ω, Vdd 12 V (the program's simulation is normalised to Vdd), Rds(on) 0.05 Ω
const F0 = 7.03e6;
const VDD = 12;
const R = 10;
const RON = 0.05;
const W = 2 * Math.PI * F0;

const dir = haveNgspice ? mkdtempSync(join(tmpdir(), 'rw-classe-')) : '';
afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

function spice(zRe: number, zIm: number, name: string) {
  const per = 1 / F0;
  const x = R * zIm;
  // a resistive load joins through 1 µΩ (a 0 V source there stalled ngspice's time step at zero-voltage switching)
  const load =
    Math.abs(x) < 1e-9
      ? 'RX b nr 1e-6'
      : x > 0
        ? `LX b nr ${(x / W).toPrecision(7)}`
        : `CX b nr ${(1 / (W * -x)).toPrecision(7)}`;
  const vals: Record<string, string> = {
    VDD: String(VDD),
    PERIOD: per.toPrecision(9),
    TON: (per / 2 - per / 100).toPrecision(9),
    TRISE: (per / 200).toPrecision(9),
    LCHOKE: ((CHOKE_REACTANCE_RATIO * R) / W).toPrecision(7),
    RON: String(RON),
    C1: (CLASS_E_SHUNT / (W * R)).toPrecision(7),
    L0: ((CLASS_E_QL * R) / W).toPrecision(7),
    C0: (1 / (W * (CLASS_E_QL - CLASS_E_EXCESS) * R)).toPrecision(7),
    LOAD: load,
    RLOAD: (R * zRe).toPrecision(7),
    TSTEP: (per / 500).toPrecision(6),
    TMAX: (per / 500).toPrecision(6),
    TSTOP: (400 * per).toPrecision(9),
    TFROM: (380 * per).toPrecision(9),
  };
  const tmpl = readFileSync(join(__dirname, '../../fixtures/pa-chain/class-e.cir.tmpl'), 'utf8');
  const file = join(dir, `${name}.cir`);
  writeFileSync(file, tmpl.replace(/\{\{(\w+)\}\}/g, (_, k: string) => vals[k]));
  const r = spawnSync(NGSPICE as string, ['-b', file], { cwd: dir, encoding: 'utf8' });
  const num = (k: string) => Number(r.stdout.match(new RegExp(`^${k}\\s*=\\s*(\\S+)`, 'm'))?.[1]);
  return { vdpk: num('vdpk') / VDD, pout: num('pout') / VDD ** 2, out: r.stdout + r.stderr };
}

describe.skipIf(!haveNgspice)('class-E simulation vs ngspice', () => {
  const cases: [string, number, number][] = [
    ['design load', 1, 0],
    ...[0, 90, 180, 270].map((ph): [string, number, number] => {
      const z = loadOnCircle(2, ph);
      return [`SWR 2 at ${ph} deg`, z.re, z.im];
    }),
  ];
  for (const [name, zr, zi] of cases) {
    it(`${name}: drain peak and output power within ${TOL * 100} %`, () => {
      const s = spice(zr, zi, name.replace(/\W+/g, '_'));
      expect(Number.isFinite(s.vdpk), s.out).toBe(true);
      const e = simulateClassE(zr, zi, RON / R);
      // normalised: V / Vdd, P / (Vdd² / R)
      expect(
        Math.abs(s.vdpk / e.drainPeakRatio - 1),
        `peak: ngspice ${s.vdpk.toFixed(3)}, program ${e.drainPeakRatio.toFixed(3)}`,
      ).toBeLessThanOrEqual(TOL);
      expect(
        Math.abs((s.pout * R) / e.outputRatio - 1),
        `power: ngspice ${(s.pout * R).toFixed(4)}, program ${e.outputRatio.toFixed(4)}`,
      ).toBeLessThanOrEqual(TOL);
    });
  }
});
