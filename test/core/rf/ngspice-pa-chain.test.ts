// Whole-chain cross-check in ngspice: a push-pull voltage-switching (class D) stage on a centre-tapped transformer,
// the low-pass filter, and a load of 50 Ω or on the SWR 2 circle at four phases (netlist written from scratch:
// test/fixtures/pa-chain/pushpull-d-lpf.cir.tmpl). The program's prediction is the load line at the complex load the
// filter presents plus the undamped ring of the transformer's leakage with the device capacitance at each hard edge
// (pa-swr.ts stressAt / leakageRing), and its harmonic band less the filter's rejection from the stage's own stiff
// source (lpf-analysis harmonicsFromSource, pa-source); ngspice solves the switched circuit in the time domain.
// Invented design: 12 V, 1:1 transformer (k = 0.998, leakage about 23 nH half to half), 7.03 MHz, Rds(on) 0.1 Ω,
// Coss 200 pF.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { NGSPICE, requireTool } from '../../helpers/tools';
import { designLpf, type LpfDesign } from '../../../src/core/rf/lpf-design';
import { harmonicsFromSource, ladderOf } from '../../../src/core/rf/lpf-analysis';
import { paSource } from '../../../src/core/rf/pa-source';
import { evaluatePa } from '../../../src/core/rf/pa';
import { loadOnCircle, stressAt } from '../../../src/core/rf/pa-swr';
import { paSpectrum } from '../../../src/core/rf/pa-spectrum';
import { lpfParams, paParams } from './fixture';

const haveNgspice = requireTool(NGSPICE, 'SPICE cross-check of the PA and filter chain', 'apt-get install ngspice');

// Stated tolerances (what the program leaves out: the square wave's harmonic currents in the filter, magnetising
// inductance, switching edges and dead time, body-diode drop, the ring's damping by Rds(on) and the Coss loss)
// output power, relative, both ways: the program's load line leaves out the transformer's series leakage reactance
// (about j4 Ω at the secondary here), which lowers the power most into the lowest load (about 15 % at 180°)
const TOL_POWER = 0.17;
// drain peak: the program's undamped bound may stand up to 12 % above ngspice's ring (damped by Rds(on), the Coss
// loss and Gear integration), and never more than 5 % below it
const DRAIN_BELOW = 0.12;
const DRAIN_ABOVE = 0.05;
// device current: between the load-line peak (less 10 %) and the program's undamped bound (plus 5 %)
const CURRENT_BELOW_LOAD_LINE = 0.1;
const CURRENT_ABOVE = 0.05;
// the 3rd harmonic at the load, dB both ways: the switch edges (1 % of the period) and the transformer's leakage are
// not in the source model (they differ by under 1 dB here)
const TOL_HARMONIC_DB = 1.5;

const F0 = 7.03e6;
const VDD = 12;
const RON = 0.1;
// device output capacitance (invented) and the transformer's coupling in the netlist
const COSS = 200e-12;
const COSS_ESR = 0.05;
const KCOUP = 0.998;
const R0 = 50;
const W = 2 * Math.PI * F0;

type C = { re: number; im: number };
const cmul = (a: C, b: C): C => ({ re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re });
const cadd = (a: C, b: C): C => ({ re: a.re + b.re, im: a.im + b.im });
const cdiv = (a: C, b: C): C => {
  const d = b.re * b.re + b.im * b.im;
  return { re: (a.re * b.re + a.im * b.im) / d, im: (a.im * b.re - a.re * b.im) / d };
};

/** Input impedance of the lossless ladder (as built) loaded by zl at F0: chain (ABCD) matrices, textbook. */
function filterInputOhm(d: LpfDesign, zl: C): C {
  let m = [{ re: 1, im: 0 }, { re: 0, im: 0 }, { re: 0, im: 0 }, { re: 1, im: 0 }];
  for (const e of d.elements) {
    const step = e.kind === 'series-inductor'
      ? [{ re: 1, im: 0 }, { re: 0, im: W * e.builtValue }, { re: 0, im: 0 }, { re: 1, im: 0 }]
      : [{ re: 1, im: 0 }, { re: 0, im: 0 }, { re: 0, im: W * e.builtValue }, { re: 1, im: 0 }];
    m = [
      cadd(cmul(m[0], step[0]), cmul(m[1], step[2])), cadd(cmul(m[0], step[1]), cmul(m[1], step[3])),
      cadd(cmul(m[2], step[0]), cmul(m[3], step[2])), cadd(cmul(m[2], step[1]), cmul(m[3], step[3])),
    ];
  }
  // Zin = (A ZL + B) / (C ZL + D)
  return cdiv(cadd(cmul(m[0], zl), m[1]), cadd(cmul(m[2], zl), m[3]));
}

function netlist(d: LpfDesign, zl: C): string {
  const per = 1 / F0;
  const lines: string[] = [];
  let node = 'f0';
  d.elements.forEach((e, i) => {
    if (e.kind === 'series-inductor') {
      const next = `n${i + 1}`;
      lines.push(`LF${i + 1} ${node} ${next} ${e.builtValue.toPrecision(7)}`);
      node = next;
    } else {
      lines.push(`CF${i + 1} ${node} 0 ${e.builtValue.toPrecision(7)}`);
    }
  });
  const load = Math.abs(zl.im) < 1e-9 ? `VX ${node} nr 0`
    : zl.im > 0 ? `LX ${node} nr ${(zl.im / W).toPrecision(7)}` : `CX ${node} nr ${(1 / (W * -zl.im)).toPrecision(7)}`;
  // full-primary reactance 20 x the 50 Ω drain-to-drain load (1:1): magnetising current small (common practice)
  const lFull = (20 * R0) / W;
  const vals: Record<string, string> = {
    VDD: String(VDD),
    PERIOD: per.toPrecision(9),
    TON: (per / 2 - per / 100).toPrecision(9),
    TRISE: (per / 200).toPrecision(9),
    RON: String(RON),
    LHALF: (lFull / 4).toPrecision(7),
    LSEC: lFull.toPrecision(7),
    KCOUP: String(KCOUP),
    FILTER: lines.join('\n'),
    LOAD: load,
    RLOAD: zl.re.toPrecision(7),
    TSTEP: (per / 400).toPrecision(6),
    COSS: COSS.toPrecision(7),
    COSS_ESR: String(COSS_ESR),
    TSTOP: (120 * per).toPrecision(9),
    TMAX: (per / 400).toPrecision(6),
    TFROM: (100 * per).toPrecision(9),
    F0: String(F0),
  };
  const tmpl = readFileSync(join(__dirname, '../../fixtures/pa-chain/pushpull-d-lpf.cir.tmpl'), 'utf8');
  return tmpl.replace(/\{\{(\w+)\}\}/g, (_, k: string) => vals[k]);
}

const dir = haveNgspice ? mkdtempSync(join(tmpdir(), 'rw-pachain-')) : '';
afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

const cache = new Map<string, ReturnType<typeof spiceRun>>();
/** One ngspice run per load, shared by the tests of that load. */
function run(d: LpfDesign, zl: C, name: string) {
  if (!cache.has(name)) cache.set(name, spiceRun(d, zl, name));
  return cache.get(name)!;
}

function spiceRun(d: LpfDesign, zl: C, name: string) {
  const file = join(dir, `${name}.cir`);
  writeFileSync(file, netlist(d, zl));
  const r = spawnSync(NGSPICE as string, ['-b', file], { cwd: dir, encoding: 'utf8' });
  const out = r.stdout;
  const num = (k: string) => Number(out.match(new RegExp(`^${k}\\s*=\\s*(\\S+)`, 'm'))?.[1]);
  // fourier table rows: harmonic, frequency, magnitude, phase, ...
  const harm = new Map<number, number>();
  for (const m of out.matchAll(/^\s*(\d+)\s+(\S+)\s+(\S+)\s+(\S+)\s+(\S+)\s+(\S+)\s*$/gm))
    harm.set(Number(m[1]), Number(m[3]));
  return {
    pout: num('pout'),
    vd1pk: num('vd1pk'),
    i1pk: Math.max(num('i1pk'), -num('i1min')),
    harm,
    out: out + r.stderr,
  };
}

describe.skipIf(!haveNgspice)('push-pull class D + low-pass filter in ngspice vs the program', () => {
  const dd = designLpf(lpfParams({ form: 'inductor-input', order: 5, inductorQ: 10000, capacitorQ: 100000 }), F0);
  if (!dd.ok) throw new Error(JSON.stringify(dd.errors));
  const d = dd.value;
  const pa = evaluatePa(
    paParams({
      amplifierClass: 'D',
      topology: 'push-pull',
      turnsRatio: 1,
      loadOhm: R0,
      rdsOnOhm: RON,
      saturationV: null,
      efficiency: 0.9,
    }),
    VDD,
    { targetPowerW: 10, ambientC: 25, keyingDuty: 0.4 },
  );
  // leakage between the primary halves, one half with the other shorted: L_half
  // (1 − k²) (coupled inductors, textbook)
  const lHalf = (20 * R0) / W / 4;
  const leakageH = lHalf * (1 - KCOUP ** 2);
  const base = {
    drainPeakV: pa.peakDrainV,
    maxRailV: VDD,
    peakDeviceA: pa.peakDeviceA,
    outputW: pa.outputW,
    dcInputW: pa.dcInputW,
    biasW: 0,
  };
  const matched = { ...base, ring: { leakageH, cossF: COSS } };
  // ideal square wave (no transition time given): odd harmonics 1/n
  const band3 = paSpectrum({
    topology: 'push-pull',
    amplifierClass: 'D',
    imbalanceTypical: 0,
    imbalanceWorst: 0,
  }).bands.find((b) => b.n === 3)!;
  const src = paSource({
    pa: paParams({ amplifierClass: 'D', topology: 'push-pull', rdsOnOhm: RON, saturationV: null }),
    primaryOhm: R0,
    peakDeviceA: pa.peakDeviceA,
    classESimulated: false,
  });
  const loads: [string, C][] = [
    ['50 ohm', { re: R0, im: 0 }],
    ...[0, 90, 180, 270].map((ph): [string, C] => {
      const z = loadOnCircle(2, ph);
      return [`SWR 2 at ${ph} deg`, { re: R0 * z.re, im: R0 * z.im }];
    }),
  ];
  for (const [name, zl] of loads) {
    it(`${name}: output power, drain peak and device current`, () => {
      const zin = filterInputOhm(d, zl);
      const zn = { re: zin.re / R0, im: zin.im / R0 };
      const pred = stressAt('D', matched, zn);
      const loadLine = stressAt('D', base, zn);
      const s = run(d, zl, name.replace(/\W+/g, '_'));
      expect(Number.isFinite(s.pout), s.out).toBe(true);
      expect(
        Math.abs(s.pout / pred.outputW - 1),
        `power: ngspice ${s.pout.toFixed(2)} W, program ${pred.outputW.toFixed(2)} W`,
      ).toBeLessThanOrEqual(TOL_POWER);
      const vMsg = `drain: ngspice ${s.vd1pk.toFixed(2)} V, program ${pred.drainPeakV.toFixed(2)} V`;
      expect(s.vd1pk, vMsg).toBeGreaterThanOrEqual(pred.drainPeakV * (1 - DRAIN_BELOW));
      expect(s.vd1pk, vMsg).toBeLessThanOrEqual(pred.drainPeakV * (1 + DRAIN_ABOVE));
      const iMsg = `current: ngspice ${s.i1pk.toFixed(2)} A, load line ${loadLine.peakDeviceA.toFixed(2)} A, bound ` +
        `${pred.peakDeviceA.toFixed(2)} A`;
      expect(s.i1pk, iMsg).toBeGreaterThanOrEqual(loadLine.peakDeviceA * (1 - CURRENT_BELOW_LOAD_LINE));
      expect(s.i1pk, iMsg).toBeLessThanOrEqual(pred.peakDeviceA * (1 + CURRENT_ABOVE));
    });
    it(`${name}: the 3rd harmonic at the load from the stiff source, into this load at 3f`, () => {
      const s = run(d, zl, name.replace(/\W+/g, '_'));
      const spiceDbc = 20 * Math.log10(s.harm.get(3)! / s.harm.get(1)!);
      // the load at 3f: its resistance with the series reactance scaled as an inductor (3X) or a capacitor (X/3)
      const zlAt = (n: number): C => ({ re: zl.re, im: zl.im >= 0 ? n * zl.im : zl.im / n });
      const rows = harmonicsFromSource(ladderOf(d, 'built', true), F0, src.kind, src.zsAt, [3], zlAt);
      const predicted = band3.worstDbc - rows[0].relativeAttenuationDb;
      expect(
        Math.abs(spiceDbc - predicted),
        `3rd: ngspice ${spiceDbc.toFixed(1)} dBc, program ${predicted.toFixed(1)} dBc`,
      ).toBeLessThanOrEqual(TOL_HARMONIC_DB);
    });
  }
});

describe.skipIf(!haveNgspice)('push-pull class D: the SWR circle at the antenna, program sweep vs ngspice', () => {
  // the program's own stress sweep (evaluatePa with the filter known, the leakage and Coss entered): the circle drawn
  // at the antenna and each load taken through the (lossless) filter to the stage; ngspice with the same antenna load.
  // Seen when written: ngspice 7 to 10 % below the program's undamped bound at 50 Ω and every phase (135°: 47.2 V
  // against 51.7 V)
  const dd = designLpf(lpfParams({ form: 'inductor-input', order: 5, inductorQ: 10000, capacitorQ: 100000 }), F0);
  if (!dd.ok) throw new Error(JSON.stringify(dd.errors));
  const d = dd.value;
  // leakage between the primary halves, one half with the other shorted: L_half
  // (1 − k²) (coupled inductors, textbook)
  const leakageH = ((20 * R0) / W / 4) * (1 - KCOUP ** 2);
  const pa = evaluatePa(paParams({
    amplifierClass: 'D', topology: 'push-pull', turnsRatio: 1, loadOhm: R0, rdsOnOhm: RON, saturationV: null,
    efficiency: 0.9, outputLeakageH: leakageH, deviceCossF: COSS,
  }), VDD, { targetPowerW: 10, ambientC: 25, keyingDuty: 0.4 }, 'PA', {
    worstSwr: 2, frequencyHz: F0, filterLadder: ladderOf(d, 'built', true),
  });
  const sweep = pa.swr!;
  const check = (name: string, zl: C, predV: number) => {
    const s = run(d, zl, name.replace(/\W+/g, '_'));
    expect(Number.isFinite(s.vd1pk), s.out).toBe(true);
    const msg = `${name}: ngspice ${s.vd1pk.toFixed(2)} V, program ${predV.toFixed(2)} V`;
    if (process.env.RW_PRINT) console.log(msg);
    expect(s.vd1pk, msg).toBeGreaterThanOrEqual(predV * (1 - DRAIN_BELOW));
    expect(s.vd1pk, msg).toBeLessThanOrEqual(predV * (1 + DRAIN_ABOVE));
  };
  it('the sweep is drawn at the antenna, through the filter', () => expect(sweep.circleAt).toBe('antenna'));
  it('matched antenna (50 Ω): the drain peak within the stated band of the program\'s', () => {
    check('50 ohm', { re: R0, im: 0 }, sweep.designLoad!.drainPeakV);
  });
  for (const ph of [0, 45, 90, 135, 180, 225, 270, 315]) {
    it(`SWR 2 at the antenna, phase ${ph}°: the drain peak within the stated band of the program's`, () => {
      const z = loadOnCircle(2, ph);
      const zl = { re: R0 * z.re, im: R0 * z.im };
      const p = sweep.points.find((q) => q.phaseDeg === ph)!;
      // the program's point is for the same antenna load as the netlist's
      expect(Math.abs(p.antennaReOhm! - zl.re) + Math.abs(p.antennaImOhm! - zl.im)).toBeLessThan(1e-9);
      check(`SWR 2 at ${ph} deg`, zl, p.drainPeakV);
    });
  }
});
