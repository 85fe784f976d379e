// Whole-chain cross-check in ngspice: a single-ended class-E stage (switch with Rds(on) and body diode, shunt C1,
// series-tuned L0–C0 with the excess reactance, RF choke) into the low-pass filter and a load of 50 Ω or on the SWR
// 2 circle. The netlist is written here from scratch (element syntax per the ngspice user's manual).
// Drain peak and power: the program's class-E simulation at the load the filter presents (pa-swr classEStressAt,
// scaled from its matched figures), at 50 Ω and SWR 2 at four phases; and the program's own stress sweep with the
// circle at the antenna (evaluatePa with the filter known) at 50 Ω and eight phases, and at its worst drain peak.
// Harmonics at the antenna: the program's band as the evaluation judges it (pa-spectrum's band at the design load over
// loaded Q 30 to 5, widened over the design load and the SWR 2 circle at the antenna by class-e-loads, less the
// filter's rejection from the stage's own source into the design load), against ngspice at loaded Q 30 and 5 with the
// antenna at 50 Ω and on the SWR 2 circle at eight phases (four of them between the program's 30° points).
// While the band was the design load's alone (−64.8 to −49.0 dBc at the 2nd harmonic, −102.7 to −84.4 dBc at
// the 3rd), ngspice at loaded Q 5 reached −40.2 dBc at the 2nd (SWR 2 at 135°), 8.8 dB above its worst end, and
// −75.9 dBc at the 3rd (180°), 8.5 dB above; at loaded Q 30 it fell to −76.7 dBc at the 2nd (315°), 11.9 dB below
// its best end. Over the loads (−77.4 to −40.6 dBc and −109.0 to −74.8 dBc) every run lies inside, and ngspice
// at the load of the worst end reaches it within 0.1 dB.
// The sweep at the antenna (seen when written): ngspice's drain peak 1.8 to 3.1 % above the program's at 50 Ω and at
// every phase (worst at 225°: ngspice 93.5 V, program 90.8 V, the PA seeing 25.8 − j24.7 Ω).
// Invented design: 20 V, drain load 50 Ω (no transformer), 7.03 MHz, Rds(on) 0.05 Ω, nominal class-E values
// C1 = 0.1836/(ωR), excess reactance 1.1525 R (Sokal and Sokal, IEEE JSSC SC-10(3), 1975, from memory), QL 30.
import { describe, expect, it } from 'vitest';
import { NGSPICE, requireTool } from '../../helpers/tools';
import {
  type Complex as C,
  ladderAndLoadLines,
  ladderInputOhm,
  runSpice,
  spiceScratchDir,
} from '../../helpers/ngspice';
import {
  CHOKE_REACTANCE_RATIO,
  CLASS_E_EXCESS,
  CLASS_E_QL,
  CLASS_E_QL_LOW,
  CLASS_E_SHUNT,
} from '../../../src/core/rf/class-e-sim';
import { designLpf, type LpfDesign } from '../../../src/core/rf/lpf-design';
import { harmonicsFromSource, ladderOf } from '../../../src/core/rf/lpf-analysis';
import { evaluatePa } from '../../../src/core/rf/pa';
import { paSource } from '../../../src/core/rf/pa-source';
import { paSpectrum } from '../../../src/core/rf/pa-spectrum';
import { classEOverLoads } from '../../../src/core/rf/class-e-loads';
import { classEStressAt, loadOnCircle } from '../../../src/core/rf/pa-swr';
import { lpfParams, paParams } from './fixture';

const haveNgspice = requireTool(NGSPICE, 'SPICE whole-chain check of the class-E stage', 'apt-get install ngspice');

// Stated tolerances. Power and drain peak: the program's simulation is the same idealised stage (its own test against
// ngspice holds 5 %); here the filter's input impedance also carries the harmonics, which the program's stage sees
// only at the fundamental.
const TOL_POWER = 0.05;
const TOL_DRAIN = 0.05;

const F0 = 7.03e6;
const VDD = 20;
const R = 50;
const RON = 0.05;
const W = 2 * Math.PI * F0;
// simulated periods (the last 20 measured) and time steps per period
const TSTOP = 150;
const STEPS = 300;
// steps per period for the harmonic runs (the 3rd, 90–110 dB down at loaded Q 30, moved by 1.5 dB from 300 to 1000)
const STEPS_HARMONIC = 1000;

/** Input impedance of the lossless ladder (as built) loaded by zl at F0. */
const filterInputOhm = (d: LpfDesign, zl: C): C => ladderInputOhm(d, zl, W);

/**
 * The chain's netlist. For the harmonic runs (`fine`): loaded Q `ql`, STEPS_HARMONIC steps per period, and a body
 * diode with 1 pF of junction capacitance (1.2 % of C1): with none, ngspice's time step stalled at the diode at three
 * of the eighteen loads (loaded Q 5, SWR 2 at 90°, 135° and 180°) whatever
 * the tolerances or step; with 1 pF at none.
 */
function netlist(d: LpfDesign, zl: C, ql = CLASS_E_QL, fine = false): string {
  const steps = fine ? STEPS_HARMONIC : STEPS;
  const per = 1 / F0;
  return [
    '* class-E stage, low-pass filter, load (written from scratch for this test)',
    `VDD vdd 0 DC ${VDD}`,
    `LCH vdd d ${((CHOKE_REACTANCE_RATIO * R) / W).toPrecision(7)}`,
    `VG g 0 PULSE(0 1 0 ${(per / 200).toPrecision(6)} ${(per / 200).toPrecision(6)} ` +
      `${(per / 2 - per / 100).toPrecision(9)} ${per.toPrecision(9)})`,
    'VI d s 0',
    'S1 s 0 g 0 SWMOD',
    'DB 0 s DBODY',
    `.model SWMOD SW(Ron=${RON} Roff=1e6 Vt=0.5 Vh=0)`,
    `.model DBODY D(Is=1e-12 N=1 Rs=0.01${fine ? ' Cjo=1p' : ''})`,
    `C1 d 0 ${(CLASS_E_SHUNT / (W * R)).toPrecision(7)}`,
    `L0 d a ${((ql * R) / W).toPrecision(7)}`,
    `C0 a b ${(1 / (W * (ql - CLASS_E_EXCESS) * R)).toPrecision(7)}`,
    ...ladderAndLoadLines(d, 'b', zl, W),
    `RL nr 0 ${zl.re.toPrecision(7)}`,
    '* Gear integration: with the default method the time step stalled at the body diode near zero-voltage switching',
    '.options method=gear',
    `.tran ${(per / steps).toPrecision(6)} ${(TSTOP * per).toPrecision(9)} 0 ${(per / steps).toPrecision(6)}`,
    `.meas tran vdpk MAX v(d) from=${((TSTOP - 20) * per).toPrecision(9)} to=${(TSTOP * per).toPrecision(9)}`,
    `.meas tran pout AVG par('v(nr)*v(nr)/${zl.re.toPrecision(7)}') from=${((TSTOP - 20) * per).toPrecision(9)} to=` +
      `${(TSTOP * per).toPrecision(9)}`,
    `.four ${F0} v(nr)`,
    '.end',
  ].join('\n');
}

const dir = spiceScratchDir('rw-echain-', haveNgspice);

const cache = new Map<string, ReturnType<typeof spiceRun>>();
function spiceRun(d: LpfDesign, zl: C, name: string) {
  const r = runSpice(dir, name, netlist(d, zl));
  return { vdpk: r.measure('vdpk'), pout: r.measure('pout'), harm: r.harm, out: r.out };
}
const run = (d: LpfDesign, zl: C, name: string) => {
  if (!cache.has(name)) cache.set(name, spiceRun(d, zl, name));
  return cache.get(name)!;
};

describe.skipIf(!haveNgspice)('class E + low-pass filter in ngspice vs the program', () => {
  const dd = designLpf(lpfParams({ inductorQ: 10000, capacitorQ: 100000 }), F0);
  if (!dd.ok) throw new Error(JSON.stringify(dd.errors));
  const d = dd.value;
  const paIn = paParams({
    amplifierClass: 'E',
    topology: 'single-ended',
    devices: 1,
    turnsRatio: 1,
    loadOhm: R,
    rdsOnOhm: RON,
    saturationV: null,
    efficiency: 0.9,
  });
  const pa = evaluatePa(paIn, VDD, { targetPowerW: 5, ambientC: 25, keyingDuty: 0.4 });
  const m = {
    drainPeakV: pa.peakDrainV,
    maxRailV: VDD,
    peakDeviceA: pa.peakDeviceA,
    outputW: pa.outputW,
    dcInputW: pa.dcInputW,
    biasW: 0,
  };
  const loads: [string, C][] = [
    ['50 ohm', { re: R, im: 0 }],
    ...[0, 90, 180, 270].map((ph): [string, C] => {
      const z = loadOnCircle(2, ph);
      return [`SWR 2 at ${ph} deg`, { re: R * z.re, im: R * z.im }];
    }),
  ];
  for (const [name, zl] of loads) {
    it(`${name}: drain peak and output power`, () => {
      const zin = filterInputOhm(d, zl);
      const pred = classEStressAt(m, { re: zin.re / R, im: zin.im / R }, RON / R).stress;
      const s = run(d, zl, name.replace(/\W+/g, '_'));
      expect(Number.isFinite(s.vdpk), s.out).toBe(true);
      expect(
        Math.abs(s.vdpk / pred.drainPeakV - 1),
        `drain: ngspice ${s.vdpk.toFixed(1)} V, program ${pred.drainPeakV.toFixed(1)} V`,
      ).toBeLessThanOrEqual(TOL_DRAIN);
      expect(
        Math.abs(s.pout / pred.outputW - 1),
        `power: ngspice ${s.pout.toFixed(2)} W, program ${pred.outputW.toFixed(2)} W`,
      ).toBeLessThanOrEqual(TOL_POWER);
    });
  }
});

describe.skipIf(!haveNgspice)('class E + low-pass filter: the circle at the antenna, program sweep vs ngspice', () => {
  // the program's own sweep (evaluatePa with the filter known): the circle drawn at the antenna, each load through the
  // filter to the stage; ngspice with the same antenna load behind the same (lossless) filter
  const dd = designLpf(lpfParams({ inductorQ: 10000, capacitorQ: 100000 }), F0);
  if (!dd.ok) throw new Error(JSON.stringify(dd.errors));
  const d = dd.value;
  const paIn = paParams({
    amplifierClass: 'E', topology: 'single-ended', devices: 1, turnsRatio: 1, loadOhm: R, rdsOnOhm: RON,
    saturationV: null, efficiency: 0.9,
  });
  const pa = evaluatePa(paIn, VDD, { targetPowerW: 5, ambientC: 25, keyingDuty: 0.4 }, 'PA', {
    worstSwr: 2, frequencyHz: F0, filterLadder: ladderOf(d, 'built', true),
  });
  const sweep = pa.swr!;
  it('the sweep is drawn at the antenna, through the filter', () => expect(sweep.circleAt).toBe('antenna'));
  it(`matched antenna (50 Ω): ngspice's drain peak within ${TOL_DRAIN * 100} % of the program's`, () => {
    const s = run(d, { re: R, im: 0 }, '50_ohm');
    const pred = sweep.designLoad!.drainPeakV;
    const msg = `50 Ω: ngspice ${s.vdpk.toFixed(1)} V, program ${pred.toFixed(1)} V`;
    if (process.env.RW_PRINT) console.log(msg);
    expect(Math.abs(s.vdpk / pred - 1), msg).toBeLessThanOrEqual(TOL_DRAIN);
  });
  for (const ph of [0, 45, 90, 135, 180, 225, 270, 315]) {
    it(`SWR 2 at the antenna, phase ${ph}°: ngspice's drain peak within ${TOL_DRAIN * 100} % of the program's`, () => {
      const z = loadOnCircle(2, ph);
      const zl = { re: R * z.re, im: R * z.im };
      const p = sweep.points.find((q) => q.phaseDeg === ph)!;
      // the program's point is for the same antenna load as the netlist's
      expect(Math.abs(p.antennaReOhm! - zl.re) + Math.abs(p.antennaImOhm! - zl.im)).toBeLessThan(1e-9);
      const s = run(d, zl, `SWR 2 at ${ph} deg`.replace(/\W+/g, '_'));
      expect(Number.isFinite(s.vdpk), s.out).toBe(true);
      const msg = `phase ${ph}°: ngspice ${s.vdpk.toFixed(1)} V, program ${p.drainPeakV.toFixed(1)} V (the PA sees ` +
        `${p.loadReOhm.toFixed(1)} ${p.loadImOhm < 0 ? '−' : '+'} j${Math.abs(p.loadImOhm).toFixed(1)} Ω)`;
      if (process.env.RW_PRINT) console.log(msg);
      expect(Math.abs(s.vdpk / p.drainPeakV - 1), msg).toBeLessThanOrEqual(TOL_DRAIN);
    });
  }
  it(`the worst drain peak over the circle: ngspice at its antenna load within ${TOL_DRAIN * 100} %`, () => {
    const w = sweep.worstDrainPeak;
    const s = run(d, { re: w.antennaReOhm!, im: w.antennaImOhm! }, 'worst_drain');
    const msg = `worst at ${w.phaseDeg}°: ngspice ${s.vdpk.toFixed(1)} V, program ${w.value.toFixed(1)} V`;
    if (process.env.RW_PRINT) console.log(msg);
    expect(Math.abs(s.vdpk / w.value - 1), msg).toBeLessThanOrEqual(TOL_DRAIN);
  });
});

// Stated tolerance: each harmonic at the antenna within the program's band widened by this much, dB (the program's
// switch is instant, ngspice's has edges of 0.5 % of the period and a body diode with its own drop; the stage-only
// comparison holds 1 dB, ngspice-class-e-harmonics.test.ts)
const TOL_BAND_DB = 1;
// levels are compared floored at this, 20 dB under the construction floor (where the program shows no number): there a
// transient run's Fourier analysis moves by dB with its step and length (1.5 dB from 300 to 1000 steps per period)
const SPICE_FLOOR_DBC = -90;

describe.skipIf(!haveNgspice)('class E + low-pass filter in ngspice: harmonics at the antenna, SWR 2 circle', () => {
  const dd = designLpf(lpfParams({ inductorQ: 10000, capacitorQ: 100000 }), F0);
  if (!dd.ok) throw new Error(JSON.stringify(dd.errors));
  const d = dd.value;
  const paIn = paParams({
    amplifierClass: 'E', topology: 'single-ended', devices: 1, turnsRatio: 1, loadOhm: R, rdsOnOhm: RON,
    saturationV: null, efficiency: 0.9,
  });
  const pa = evaluatePa(paIn, VDD, { targetPowerW: 5, ambientC: 25, keyingDuty: 0.4 });
  const spectrum = paSpectrum(paIn, [2, 3], { frequencyHz: F0, classERdsRatio: RON / R });
  const src = paSource({ pa: paIn, primaryOhm: R, peakDeviceA: pa.peakDeviceA, classESimulated: true });
  // the filter as the netlist has it (lossless), as the evaluation takes it: rejection from the stage's own source into
  // the design load, and the bands widened over the loads (evaluate-rf does the same with the filter as built)
  const ladder = ladderOf(d, 'built', true);
  const sourced = harmonicsFromSource(ladder, F0, src.kind, src.zsAt, [2, 3]);
  const rej = (n: number) => sourced.find((r) => r.n === n)!.relativeAttenuationDb;
  const over = classEOverLoads(spectrum, {
    ladder, frequencyHz: F0, loadOhm: R, rdsOnRatio: RON / R, swr: 2, pushPull: false, harmonics: [2, 3],
  }, rej);
  const band = (n: number) => {
    const b = over.bands.find((x) => x.n === n)!;
    return { best: b.bestDbc - rej(n), worst: b.worstDbc - rej(n) };
  };
  const harmonic = (zl: C, ql: number, name: string) => {
    const r = runSpice(dir, name, netlist(d, zl, ql, true));
    expect(r.out, `${name}: ngspice did not finish`).not.toMatch(/aborted|Timestep too small/);
    return (n: number) => 20 * Math.log10(r.harm.get(n)! / r.harm.get(1)!);
  };
  const floor = (x: number) => Math.max(x, SPICE_FLOOR_DBC);
  const loads: [string, C][] = [
    ['50 ohm', { re: R, im: 0 }],
    ...[0, 45, 90, 135, 180, 225, 270, 315].map((ph): [string, C] => {
      const z = loadOnCircle(2, ph);
      return [`SWR 2 at ${ph} deg`, { re: R * z.re, im: R * z.im }];
    }),
  ];
  for (const [name, zl] of loads) {
    it(`${name}, loaded Q 30 and 5: harmonics 2 and 3 at the antenna within the band ± ${TOL_BAND_DB} dB`, () => {
      for (const ql of [CLASS_E_QL, CLASS_E_QL_LOW]) {
        const level = harmonic(zl, ql, `h_${name.replace(/\W+/g, '_')}_q${ql}`);
        for (const n of [2, 3]) {
          const b = band(n);
          const msg = `Q ${ql}, n=${n}: ngspice ${level(n).toFixed(1)} dBc, ` +
            `program ${b.best.toFixed(1)} to ${b.worst.toFixed(1)} dBc`;
          if (process.env.RW_PRINT) console.log(`${name}: ${msg}`);
          expect(floor(level(n)), msg).toBeLessThanOrEqual(floor(b.worst) + TOL_BAND_DB);
          expect(floor(level(n)), msg).toBeGreaterThanOrEqual(floor(b.best) - TOL_BAND_DB);
        }
      }
    });
  }
  it(`the worst end is met: ngspice at the program's worst load (loaded Q 5) within ${TOL_BAND_DB} dB of it`, () => {
    for (const n of [2, 3]) {
      // the load of the worst end, from the program's points
      const worst = over.loads.points.filter((p) => p.loadedQ === CLASS_E_QL_LOW).reduce((a, p) => {
        const lv = (q: typeof p) => q.levels.find((x) => x.n === n)!.dbc;
        return lv(p) > lv(a) ? p : a;
      });
      const zl = { re: worst.antennaReOhm, im: worst.antennaImOhm };
      const level = harmonic(zl, CLASS_E_QL_LOW, `worst_n${n}`)(n);
      const msg = `n=${n} at ${zl.re.toFixed(1)} + j${zl.im.toFixed(1)} Ω: ngspice ${level.toFixed(1)} dBc, ` +
        `worst end ${band(n).worst.toFixed(1)} dBc`;
      if (process.env.RW_PRINT) console.log(msg);
      expect(Math.abs(level - band(n).worst), msg).toBeLessThanOrEqual(TOL_BAND_DB);
    }
  });
});
