// Whole-chain cross-check in ngspice: a single-ended class-E stage (switch with Rds(on) and body diode, shunt C1,
// series-tuned L0–C0 with the excess reactance, RF choke) into the low-pass filter and a load of 50 Ω or on the SWR 2
// circle at four phases. The netlist is written here from scratch (element syntax per the ngspice user's manual).
// The program's prediction: its class-E simulation at the load the filter presents (pa-swr classEStressAt, scaled
// from its matched figures), and each harmonic's band (pa-spectrum, loaded Q 30 best to 5 worst) less the filter's
// rejection from the stage's own series-tuned source into the load at each harmonic (lpf-analysis harmonicsFromSource,
// pa-source).
// Invented design: 20 V, drain load 50 Ω (no transformer), 7.03 MHz, Rds(on) 0.05 Ω, nominal class-E values
// C1 = 0.1836/(ωR), excess reactance 1.1525 R (Sokal and Sokal, IEEE JSSC SC-10(3), 1975, from memory), QL 30.
import { describe, expect, it } from 'vitest';
import { NGSPICE, requireTool } from '../../helpers/tools';
import { type Complex as C, ladderAndLoadLines, ladderInputOhm, runSpice, spiceScratchDir } from '../../helpers/ngspice';
import { CHOKE_REACTANCE_RATIO, CLASS_E_EXCESS, CLASS_E_QL, CLASS_E_SHUNT } from '../../../src/core/rf/class-e-sim';
import { designLpf, type LpfDesign } from '../../../src/core/rf/lpf-design';
import { harmonicsFromSource, ladderOf } from '../../../src/core/rf/lpf-analysis';
import { evaluatePa } from '../../../src/core/rf/pa';
import { paSource } from '../../../src/core/rf/pa-source';
import { paSpectrum } from '../../../src/core/rf/pa-spectrum';
import { classEStressAt, loadOnCircle } from '../../../src/core/rf/pa-swr';
import { CONSTRUCTION_FLOOR_DBC } from '../../../src/core/rf/harmonics';
import { lpfParams, paParams } from './fixture';

const haveNgspice = requireTool(NGSPICE, 'SPICE whole-chain check of the class-E stage', 'apt-get install ngspice');

// Stated tolerances. Power and drain peak: the program's simulation is the same idealised stage (its own test against
// ngspice holds 5 %); here the filter's input impedance also carries the harmonics, which the program's stage sees
// only at the fundamental.
const TOL_POWER = 0.05;
const TOL_DRAIN = 0.05;
// harmonic at the antenna: within the program's band widened by this much, dB (or both below the construction floor)
const TOL_HARMONIC_DB = 3;
// below the band's best end at the SWR loads, dB: the band is the stage's spectrum into its design load, and a class-E
// waveform changes with the load it sees at the fundamental (about 8 dB lower at SWR 2, 0° here); the worst end,
// on which compliance is judged, still bounds it within TOL_HARMONIC_DB
const TOL_HARMONIC_BELOW_SWR_DB = 10;

const F0 = 7.03e6;
const VDD = 20;
const R = 50;
const RON = 0.05;
const W = 2 * Math.PI * F0;
// simulated periods (the last 20 measured) and time steps per period
const TSTOP = 150;
const STEPS = 300;

/** Input impedance of the lossless ladder (as built) loaded by zl at F0. */
const filterInputOhm = (d: LpfDesign, zl: C): C => ladderInputOhm(d, zl, W);

function netlist(d: LpfDesign, zl: C): string {
  const per = 1 / F0;
  return [
    '* class-E stage, low-pass filter, load (written from scratch for this test)',
    `VDD vdd 0 DC ${VDD}`,
    `LCH vdd d ${((CHOKE_REACTANCE_RATIO * R) / W).toPrecision(7)}`,
    `VG g 0 PULSE(0 1 0 ${(per / 200).toPrecision(6)} ${(per / 200).toPrecision(6)} ${(per / 2 - per / 100).toPrecision(9)} ${per.toPrecision(9)})`,
    'VI d s 0',
    'S1 s 0 g 0 SWMOD',
    'DB 0 s DBODY',
    `.model SWMOD SW(Ron=${RON} Roff=1e6 Vt=0.5 Vh=0)`,
    '.model DBODY D(Is=1e-12 N=1 Rs=0.01)',
    `C1 d 0 ${(CLASS_E_SHUNT / (W * R)).toPrecision(7)}`,
    `L0 d a ${((CLASS_E_QL * R) / W).toPrecision(7)}`,
    `C0 a b ${(1 / (W * (CLASS_E_QL - CLASS_E_EXCESS) * R)).toPrecision(7)}`,
    ...ladderAndLoadLines(d, 'b', zl, W),
    `RL nr 0 ${zl.re.toPrecision(7)}`,
    '* Gear integration: with the default method the time step stalled at the body diode near zero-voltage switching',
    '.options method=gear',
    `.tran ${(per / STEPS).toPrecision(6)} ${(TSTOP * per).toPrecision(9)} 0 ${(per / STEPS).toPrecision(6)}`,
    `.meas tran vdpk MAX v(d) from=${((TSTOP - 20) * per).toPrecision(9)} to=${(TSTOP * per).toPrecision(9)}`,
    `.meas tran pout AVG par('v(nr)*v(nr)/${zl.re.toPrecision(7)}') from=${((TSTOP - 20) * per).toPrecision(9)} to=${(TSTOP * per).toPrecision(9)}`,
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

/** The load at harmonic n: its resistance with the series reactance scaled as an inductor (n X) or capacitor (X/n). */
const loadAt = (zl: C) => (n: number): C => ({ re: zl.re, im: zl.im >= 0 ? n * zl.im : zl.im / n });

describe.skipIf(!haveNgspice)('class E + low-pass filter in ngspice vs the program', () => {
  const dd = designLpf(lpfParams({ inductorQ: 10000, capacitorQ: 100000 }), F0);
  if (!dd.ok) throw new Error(JSON.stringify(dd.errors));
  const d = dd.value;
  const paIn = paParams({
    amplifierClass: 'E', topology: 'single-ended', devices: 1, turnsRatio: 1, loadOhm: R, rdsOnOhm: RON, saturationV: null, efficiency: 0.9,
  });
  const pa = evaluatePa(paIn, VDD, { targetPowerW: 5, ambientC: 25, keyingDuty: 0.4 });
  const bands = paSpectrum(paIn, [2, 3], { frequencyHz: F0, classERdsRatio: RON / R }).bands;
  const src = paSource({ pa: paIn, primaryOhm: R, peakDeviceA: pa.peakDeviceA, classESimulated: true });
  const m = { drainPeakV: pa.peakDrainV, maxRailV: VDD, peakDeviceA: pa.peakDeviceA, outputW: pa.outputW, dcInputW: pa.dcInputW, biasW: 0 };
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
      expect(Math.abs(s.vdpk / pred.drainPeakV - 1), `drain: ngspice ${s.vdpk.toFixed(1)} V, program ${pred.drainPeakV.toFixed(1)} V`).toBeLessThanOrEqual(TOL_DRAIN);
      expect(Math.abs(s.pout / pred.outputW - 1), `power: ngspice ${s.pout.toFixed(2)} W, program ${pred.outputW.toFixed(2)} W`).toBeLessThanOrEqual(TOL_POWER);
    });
    it(`${name}: harmonics 2 and 3 at the antenna lie in the program's band (or both below the construction floor)`, () => {
      const s = run(d, zl, name.replace(/\W+/g, '_'));
      // the program's band from the series-tuned source, through the filter into this load at each harmonic
      const rows = harmonicsFromSource(ladderOf(d, 'built', true), F0, src.kind, src.zsAt, [2, 3], loadAt(zl));
      for (const n of [2, 3]) {
        const spiceDbc = 20 * Math.log10(s.harm.get(n)! / s.harm.get(1)!);
        const rej = rows.find((r) => r.n === n)!.relativeAttenuationDb;
        const b = bands.find((x) => x.n === n)!;
        const lo = b.bestDbc - rej;
        const hi = b.worstDbc - rej;
        const msg = `n=${n}: ngspice ${spiceDbc.toFixed(1)} dBc, program ${lo.toFixed(1)} to ${hi.toFixed(1)} dBc`;
        if (hi < CONSTRUCTION_FLOOR_DBC) {
          // the program says "limited by construction": ngspice's ideal circuit must be below the floor too
          expect(spiceDbc, msg).toBeLessThan(CONSTRUCTION_FLOOR_DBC + TOL_HARMONIC_DB);
        } else {
          expect(spiceDbc, msg).toBeGreaterThanOrEqual(lo - (zl.re === R && zl.im === 0 ? TOL_HARMONIC_DB : TOL_HARMONIC_BELOW_SWR_DB));
          expect(spiceDbc, msg).toBeLessThanOrEqual(hi + TOL_HARMONIC_DB);
        }
      }
    });
  }
});
