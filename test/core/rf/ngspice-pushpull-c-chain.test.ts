// Whole-chain cross-check in ngspice: a push-pull transformer-coupled class-C (150° conduction) and class-B (180°)
// stage (each device a current source giving a cosine pulse, falling off as its drain reaches the saturation knee) on
// a centre-tapped transformer, the low-pass filter, and 50 Ω or the SWR 2 circle at four phases. Netlist written
// here from scratch (behavioural B sources, coupled inductors; ngspice user's manual). The drive is set from the
// textbook push-pull relation so that the swing just reaches the supply at the design load (the program's design
// point): each half sees R_dd/4, so V1 = (R_dd/4) 2 α1(θ) Ipk with α1 the cosine pulse's fundamental coefficient
// (cosine-pulse coefficients as tabulated in Krauss, Bostian & Raab, Solid State Radio Engineering, 1980; from
// memory). The drive rises over RAMP periods (the netlist).
// The program's prediction: its load line at the filter's input impedance, balanced against the filter's input at
// each harmonic where the swing reaches the rails (pa-swr stressAt with pa-clip-balance), and each odd harmonic's band
// (pa-spectrum, its worst end raised by the clipped drain voltage where that is higher, pa-clip) less the filter's
// rejection from a current source into the load at that harmonic (lpf-analysis harmonicsFromSource); beside the band,
// the balanced drain voltage's harmonic through the filter from a stiff source (the best estimate).
// Invented design: 13.8 V, 1:1 transformer (k = 0.9995), 7.03 MHz, 50 Ω.
import { describe, expect, it } from 'vitest';
import { NGSPICE, requireTool } from '../../helpers/tools';
import {
  type Complex as C, ladderAndLoadLines, ladderInputOhm, runSpice, spiceScratchDir,
} from '../../helpers/ngspice';
import { designLpf, type LpfDesign } from '../../../src/core/rf/lpf-design';
import { harmonicsFromSource, inputImpedance, ladderOf } from '../../../src/core/rf/lpf-analysis';
import { evaluatePa } from '../../../src/core/rf/pa';
import { paSource } from '../../../src/core/rf/pa-source';
import { paSpectrum } from '../../../src/core/rf/pa-spectrum';
import { loadOnCircle, stressAt } from '../../../src/core/rf/pa-swr';
import { foldClipping } from '../../../src/core/rf/pa-clip';
import { clipBalance, drainHarmonicLoad } from '../../../src/core/rf/pa-clip-balance';
import { CONSTRUCTION_FLOOR_DBC } from '../../../src/core/rf/harmonics';
import { lpfParams, paParams } from './fixture';

const haveNgspice = requireTool(NGSPICE, 'SPICE whole-chain check of the push-pull class-C stage',
  'apt-get install ngspice');

// Stated tolerances. The program's prediction is the harmonic balance of the stage against the filter's input at each
// harmonic with the 50 pF per drain (pa-clip-balance, via pa-swr stressAt). Power, ngspice against it: class B 50 Ω
// +1.2 %, SWR 2 at 0° −1.7 %, 90° +0.9 %, 180° +0.3 %, 270° +2.4 %; class C +2.2, −0.3, +0.9, +0.3, +1.1 %; so
// TOL_POWER is 3 % both ways. (Before: the drain voltage flat-topped at the rail limits, which the filter's shunt
// capacitor does not let form: ngspice 14 % (B) and 17 % (C) below it at 0°, 20 % allowed below the program; the
// flat-topped model stays checked as the upper end at 0°.)
// Drain peak: where the limit takes a device's drive current the drain rings with the leakage and the 50 pF (a device
// held fully off is rung below 0 V and the transformer carries the opposite drain as far above 2 Vdd); the program
// carries CLIP_RING_MARGIN (12 %) times the share of the drive the limit takes (pa-swr). Seen (ngspice / program, V),
// class C: 50 Ω 27.67 / 28.57, SWR 2 at 0° 30.49 / 31.48, 90° 26.65 / 26.58,
// 180° 21.67 / 21.71, 270° 27.95 / 29.51;
// class B: 27.47 / 28.09, 30.46 / 31.70, 26.96 / 27.07, 21.00 / 21.12, 27.91 / 28.71. So ngspice may stand DRAIN_ABOVE
// (2 %) above the program at every load (a device-rating check must not sit below the drain) and DRAIN_BELOW (7 %)
// below it (at most 6.0 %, class C at 45° in the sweep below; 5.3 % at 270°, where the limit takes half the drive but
// the device stays in its knee, which holds its drain and damps the ring). (Before: the margin only where
// the peak current was cut, 7 % allowed above at loads that do not clip, 5 % below.) The drive rises over RAMP periods:
// stepped on at full level, the filter and load ring for longer than the 60 periods before the window (up to 7 % above
// the steady state at 225°), a start no keyed stage makes.
const TOL_POWER = 0.03;
const DRAIN_ABOVE = 0.02;
const DRAIN_BELOW = 0.07;
// 3rd harmonic at the antenna: within the program's band widened by this much, dB (or both below the floor), at
// every load. At the clipping loads the band's worst end includes the flat-topped drain voltage through the filter
// from a voltage source (pa-clip foldClipping): at SWR 2, 0° it sits 5 dB (B) and 10 dB (C) above ngspice, which is
// again the upper end. (Before: the band from the design load only, 6 dB allowed above its worst end at the SWR loads,
// where class B at 0° came 5.3 dB above it.)
const TOL_HARMONIC_DB = 3;
// The balanced drain voltage's 3rd (pa-clip-balance) through the filter from a stiff source, against ngspice: class C
// within 1.3 dB at every load (50 Ω −68.7 / −67.8, SWR 2 at 0° −65.6 / −65.2, 90° −71.8 / −71.7, 180°
// −63.1 / −63.0, 270° −65.1 / −63.8 dBc, program / ngspice); class B at 0° −61.3 / −60.4 dBc, elsewhere
// both below the −70 dBc construction floor. The band's worst end stays the flat-topped fold above
// (the upper end); this is its best estimate.
const TOL_BALANCED_DB = 1.5;

const F0 = 7.03e6;
const VDD = 13.8;
const VSAT = 0.3; // the drain's lowest excursion at the design load (the knee), V; the program is given the same
const R0 = 50;
const W = 2 * Math.PI * F0;
const KNEE = 0.05; // saturation knee of the behavioural device, V
const TSTOP = 80;
const STEPS = 250;
/** Periods over which the drive rises; the measurement window is periods 60 to 80. */
const RAMP = 20;

/** Pulse peak for half conduction angle θ: the swing (VDD − VSAT) at the design load, with the knee's own drop. */
function pulsePeakA(thetaRad: number): number {
  // α1(θ) = (θ − sin θ cos θ) / (π (1 − cos θ)) (Krauss, Bostian & Raab 1980, from memory)
  const alpha1 = (thetaRad - Math.sin(thetaRad) * Math.cos(thetaRad)) / (Math.PI * (1 - Math.cos(thetaRad)));
  return ((VDD - VSAT) / ((R0 / 4) * 2 * alpha1)) / (1 - Math.exp(-VSAT / KNEE));
}

/** Input impedance of the lossless ladder (as built) loaded by zl at F0. */
const filterInputOhm = (d: LpfDesign, zl: C): C => ladderInputOhm(d, zl, W);

function netlist(d: LpfDesign, zl: C, thetaRad: number): string {
  const ipk = pulsePeakA(thetaRad);
  const per = 1 / F0;
  const lFull = (20 * R0) / W; // full-primary reactance 20 x the drain-to-drain load: small magnetising current
  const cth = Math.cos(thetaRad).toPrecision(9);
  // cosine pulse of device k (phase 0 or π), falling off as the drain nears 0 V (saturation knee)
  // the drive rises over RAMP periods (raised cosine), as a keyed envelope does (a real edge is milliseconds, slower
  // still): a drive stepped on at full level rings the filter and load for more than the 60 periods before the window
  const tr = (RAMP * per).toPrecision(9);
  const ramp = `(0.5 - 0.5*cos(${Math.PI.toPrecision(12)}*min(time, ${tr})/${tr}))`;
  const dev = (k: 1 | 2, ph: string) => `B${k} d${k} 0 I = ${ramp} * ${ipk.toPrecision(7)}` +
    ` * max(0, (cos(${W.toPrecision(9)}*time${ph}) - ${cth})/(1 - ${cth})) * (1 - exp(-max(v(d${k}), 0)/${KNEE}))`;
  return [
    '* push-pull class-C stage, low-pass filter, load (written from scratch for this test)',
    `VDD vdd 0 DC ${VDD}`,
    dev(1, ''),
    dev(2, ` - ${Math.PI.toPrecision(12)}`),
    // device output capacitance (invented, 50 pF): gives the drain nodes a capacitance to ground for the time step
    'CO1 d1 0 50p', 'CO2 d2 0 50p',
    // transformer: half primaries vdd->d1 and d2->vdd in series aiding drain to drain, secondary to the filter
    `LP1 vdd d1 ${(lFull / 4).toPrecision(7)}`,
    `LP2 d2 vdd ${(lFull / 4).toPrecision(7)}`,
    `LS1 f0 0 ${lFull.toPrecision(7)}`,
    'K1 LP1 LP2 0.9995', 'K2 LP1 LS1 0.9995', 'K3 LP2 LS1 0.9995',
    ...ladderAndLoadLines(d, 'f0', zl, W),
    `RL nr 0 ${zl.re.toPrecision(7)}`,
    `.tran ${(per / STEPS).toPrecision(6)} ${(TSTOP * per).toPrecision(9)} 0 ${(per / STEPS).toPrecision(6)}`,
    `.meas tran vdpk MAX v(d1) from=${((TSTOP - 20) * per).toPrecision(9)} to=${(TSTOP * per).toPrecision(9)}`,
    `.meas tran pout AVG par('v(nr)*v(nr)/${zl.re.toPrecision(7)}') from=${((TSTOP - 20) * per).toPrecision(9)}` +
      ` to=${(TSTOP * per).toPrecision(9)}`,
    `.four ${F0} v(nr)`,
    '.end',
  ].join('\n');
}

const dir = spiceScratchDir('rw-cchain-', haveNgspice);

const cache = new Map<string, { vdpk: number; pout: number; harm: Map<number, number>; out: string }>();
function run(d: LpfDesign, zl: C, name: string, thetaRad: number) {
  const hit = cache.get(name);
  if (hit) return hit;
  const r = runSpice(dir, name, netlist(d, zl, thetaRad));
  const res = { vdpk: r.measure('vdpk'), pout: r.measure('pout'), harm: r.harm, out: r.out };
  cache.set(name, res);
  return res;
}

// class C at 150° conduction; class B at 180° (half-sine pulses)
const CLASSES: ['B' | 'C', number][] = [['C', 150], ['B', 180]];

const CHAIN_TITLE = 'push-pull class %s (%i° conduction) + low-pass filter in ngspice vs the program';
describe.skipIf(!haveNgspice).each(CLASSES)(CHAIN_TITLE, (cls, conductionDeg) => {
  const thetaRad = (conductionDeg / 2) * (Math.PI / 180);
  const dd = designLpf(lpfParams({ inductorQ: 10000, capacitorQ: 100000 }), F0);
  if (!dd.ok) throw new Error(JSON.stringify(dd.errors));
  const d = dd.value;
  const paIn = paParams({
    amplifierClass: cls, topology: 'push-pull', turnsRatio: 1, loadOhm: R0, saturationV: VSAT, rdsOnOhm: null,
    efficiency: 0.7, conductionAngleDeg: cls === 'C' ? conductionDeg : null, imbalanceTypical: 0, imbalanceWorst: 0,
  });
  const pa = evaluatePa(paIn, VDD, { targetPowerW: 5, ambientC: 25, keyingDuty: 0.4 });
  const band3 = paSpectrum(paIn, [3], { frequencyHz: F0 }).bands.find((b) => b.n === 3)!;
  const src = paSource({ pa: paIn, primaryOhm: R0, peakDeviceA: pa.peakDeviceA, classESimulated: false });
  // the filter's input at each harmonic (50 Ω beyond it) with the netlist's 50 pF per drain, seen from the drains
  const zAt = drainHarmonicLoad((n) => inputImpedance(ladderOf(d, 'built', true), n * F0, R0),
    { primaryOhm: R0, loadOhm: R0, cossF: 50e-12, frequencyHz: F0, topology: 'push-pull' });
  const harmonics = { zAt, thetaRad, topology: 'push-pull' as const };
  const m = {
    drainPeakV: pa.peakDrainV, maxRailV: VDD, peakDeviceA: pa.peakDeviceA, outputW: pa.outputW, dcInputW: pa.dcInputW,
    biasW: 0, harmonics,
  };
  const flat = { ...m, harmonics: undefined };
  const loads: [string, C][] = [
    ['50 ohm', { re: R0, im: 0 }],
    ...[0, 90, 180, 270].map((ph): [string, C] => {
      const z = loadOnCircle(2, ph);
      return [`SWR 2 at ${ph} deg`, { re: R0 * z.re, im: R0 * z.im }];
    }),
  ];
  for (const [name, zl] of loads) {
    it(`${name}: drain peak and output power`, () => {
      const zin = filterInputOhm(d, zl);
      const zn = { re: zin.re / R0, im: zin.im / R0 };
      const pred = stressAt(cls, m, zn);
      const upper = stressAt(cls, flat, zn);
      const s = run(d, zl, `${cls}_${name.replace(/\W+/g, '_')}`, thetaRad);
      expect(Number.isFinite(s.vdpk), s.out).toBe(true);
      const vmsg = `drain: ngspice ${s.vdpk.toFixed(2)} V, program ${pred.drainPeakV.toFixed(2)} V`;
      if (process.env.RW_PRINT) console.log(`class ${cls} ${name} ${vmsg}, zn ${zn.re.toFixed(3)} ${zn.im.toFixed(3)}`);
      expect(s.vdpk / pred.drainPeakV - 1, vmsg).toBeLessThanOrEqual(DRAIN_ABOVE);
      expect(1 - s.vdpk / pred.drainPeakV, vmsg).toBeLessThanOrEqual(DRAIN_BELOW);
      const pmsg = `power: ngspice ${s.pout.toFixed(2)} W, program ${pred.outputW.toFixed(2)} W`;
      if (process.env.RW_PRINT) console.log(`class ${cls} ${name} ${pmsg}`);
      expect(Math.abs(s.pout / pred.outputW - 1), pmsg).toBeLessThanOrEqual(TOL_POWER);
      // the flat-topped model stays the upper end where the stage clips hard (SWR 2 at 0°, |z_in| = 1.96)
      if (Math.hypot(zn.re, zn.im) > 1.5) expect(upper.outputW, pmsg).toBeGreaterThanOrEqual(s.pout);
    });
    it(`${name}: the 3rd at the antenna lies in the program's band from a current source (or below the floor)`, () => {
      const s = run(d, zl, `${cls}_${name.replace(/\W+/g, '_')}`, thetaRad);
      // the load at 3f: its resistance with the series reactance scaled as an inductor (3X) or a capacitor (X/3)
      const zlAt = (n: number): C => ({ re: zl.re, im: zl.im >= 0 ? n * zl.im : zl.im / n });
      const ladder = ladderOf(d, 'built', true);
      const rej = harmonicsFromSource(ladder, F0, src.kind, src.zsAt, [3], zlAt)[0].relativeAttenuationDb;
      // the flat-topped drain held at the rails: a stiff voltage source into the filter (pa-clip)
      const stiff = () => ({ re: 0, im: 0 });
      const rejClip = harmonicsFromSource(ladder, F0, 'thevenin', stiff, [3], zlAt)[0].relativeAttenuationDb;
      const zin = filterInputOhm(d, zl);
      const folded = foldClipping([band3], Math.hypot(zin.re, zin.im) / R0, () => rej, () => rejClip)[0];
      const spiceDbc = 20 * Math.log10(s.harm.get(3)! / s.harm.get(1)!);
      const lo = folded.bestDbc - rej;
      const hi = folded.worstDbc - rej;
      const msg = `3rd: ngspice ${spiceDbc.toFixed(1)} dBc, program ${lo.toFixed(1)} to ${hi.toFixed(1)} dBc`;
      if (hi < CONSTRUCTION_FLOOR_DBC && zl.re === R0 && zl.im === 0) {
        expect(spiceDbc, msg).toBeLessThan(CONSTRUCTION_FLOOR_DBC + TOL_HARMONIC_DB);
      } else {
        expect(spiceDbc, msg).toBeGreaterThanOrEqual(lo - TOL_HARMONIC_DB);
        expect(spiceDbc, msg).toBeLessThanOrEqual(hi + TOL_HARMONIC_DB);
      }
    });
    it(`${name}: the 3rd at the antenna from the balanced drain voltage, within TOL_BALANCED_DB`, () => {
      const zin = filterInputOhm(d, zl);
      const hb = clipBalance({ ...harmonics, z: { re: zin.re / R0, im: zin.im / R0 } });
      expect(hb.converged).toBe(true);
      // the balanced drain voltage's 3rd through the filter from its input (a stiff source) into this load at 3f
      const zlAt = (n: number): C => ({ re: zl.re, im: zl.im >= 0 ? n * zl.im : zl.im / n });
      const stiff = () => ({ re: 0, im: 0 });
      const ladder = ladderOf(d, 'built', true);
      const rejClip = harmonicsFromSource(ladder, F0, 'thevenin', stiff, [3], zlAt)[0].relativeAttenuationDb;
      const predicted = 20 * Math.log10(hb.harmonicRatios[2]) - rejClip;
      const s = run(d, zl, `${cls}_${name.replace(/\W+/g, '_')}`, thetaRad);
      const spiceDbc = 20 * Math.log10(s.harm.get(3)! / s.harm.get(1)!);
      const msg = `3rd balanced: ngspice ${spiceDbc.toFixed(1)} dBc, program ${predicted.toFixed(1)} dBc`;
      if (process.env.RW_PRINT) console.log(`class ${cls} ${name} ${msg}`);
      // below the construction floor (−70 dBc) only that is asserted
      if (predicted < CONSTRUCTION_FLOOR_DBC) {
        expect(spiceDbc, msg).toBeLessThan(CONSTRUCTION_FLOOR_DBC + TOL_BALANCED_DB);
        return;
      }
      expect(Math.abs(spiceDbc - predicted), msg).toBeLessThanOrEqual(TOL_BALANCED_DB);
    });
  }
});

// The program's own sweep with the circle at the antenna, all eight phases held to the same band (ngspice / program,
// V), class C: 45° 29.03 / 30.88, 135° 21.97 / 21.89, 225° 24.10 / 24.28, 315° 29.99 / 31.21 (the PA seeing
// 57.4 − j50.4 Ω: the peak current is not cut, but a device is held fully off and rings: the whole margin carried);
// class B: 29.78 / 31.33, 21.91 / 21.96, 23.43 / 23.65, 29.58 / 31.12. (Before: the margin only where the peak current
// was cut and the drive stepped on: at 315° ngspice 7.6 % (C) and 6.5 % (B)
// above the program, held by 8 % either way.)
const SWEEP_TITLE = 'push-pull class %s (%i° conduction): the SWR circle at the antenna, program sweep vs ngspice';
describe.skipIf(!haveNgspice).each(CLASSES)(SWEEP_TITLE, (cls, conductionDeg) => {
  // the program's own stress sweep (evaluatePa with the filter known and the 50 pF per drain entered): the circle drawn
  // at the antenna, each load through the (lossless) filter to the stage; ngspice with the same antenna load; the
  // tolerances above at 50 Ω and at every phase
  const thetaRad = (conductionDeg / 2) * (Math.PI / 180);
  const dd = designLpf(lpfParams({ inductorQ: 10000, capacitorQ: 100000 }), F0);
  if (!dd.ok) throw new Error(JSON.stringify(dd.errors));
  const d = dd.value;
  const ladder = ladderOf(d, 'built', true);
  const paIn = paParams({
    amplifierClass: cls, topology: 'push-pull', turnsRatio: 1, loadOhm: R0, saturationV: VSAT, rdsOnOhm: null,
    efficiency: 0.7, conductionAngleDeg: cls === 'C' ? conductionDeg : null, imbalanceTypical: 0, imbalanceWorst: 0,
    deviceCossF: 50e-12,
  });
  const pa = evaluatePa(paIn, VDD, { targetPowerW: 5, ambientC: 25, keyingDuty: 0.4 }, 'PA', {
    worstSwr: 2, frequencyHz: F0, filterLadder: ladder, filterInputOhmAt: (n) => inputImpedance(ladder, n * F0, R0),
  });
  const sweep = pa.swr!;
  type Point = { drainPeakV: number; loadReOhm: number; loadImOhm: number; ringMarginFraction?: number };
  const check = (name: string, zl: C, p: Point) => {
    const s = run(d, zl, `${cls}_${name.replace(/\W+/g, '_')}`, thetaRad);
    expect(Number.isFinite(s.vdpk), s.out).toBe(true);
    const clipping = Math.hypot(p.loadReOhm, p.loadImOhm) / R0 > 1;
    const msg = `${name}: ngspice ${s.vdpk.toFixed(2)} V, program ${p.drainPeakV.toFixed(2)} V` +
      `${clipping ? ' (clipping)' : ''}, the PA seeing ${p.loadReOhm.toFixed(1)} ${p.loadImOhm < 0 ? '−' : '+'} ` +
      `j${Math.abs(p.loadImOhm).toFixed(1)} Ω` +
      `${p.ringMarginFraction ? `, ring margin ${(100 * p.ringMarginFraction).toFixed(1)} %` : ''}`;
    if (process.env.RW_PRINT) console.log(`class ${cls} ${msg}`);
    expect(s.vdpk / p.drainPeakV - 1, msg).toBeLessThanOrEqual(DRAIN_ABOVE);
    expect(1 - s.vdpk / p.drainPeakV, msg).toBeLessThanOrEqual(DRAIN_BELOW);
  };
  it('the sweep is drawn at the antenna and balanced against the filter', () => {
    expect(sweep.circleAt).toBe('antenna');
    expect(sweep.clip?.model).toBe('harmonic-balance');
  });
  it('matched antenna (50 Ω): the drain peak within the stated band of the program\'s', () => {
    check('50 ohm', { re: R0, im: 0 }, sweep.designLoad!);
  });
  for (const ph of [0, 45, 90, 135, 180, 225, 270, 315]) {
    it(`SWR 2 at the antenna, phase ${ph}°: the drain peak within the stated band of the program's`, () => {
      const z = loadOnCircle(2, ph);
      const zl = { re: R0 * z.re, im: R0 * z.im };
      const p = sweep.points.find((q) => q.phaseDeg === ph)!;
      // the program's point is for the same antenna load as the netlist's
      expect(Math.abs(p.antennaReOhm! - zl.re) + Math.abs(p.antennaImOhm! - zl.im)).toBeLessThan(1e-9);
      check(`SWR 2 at ${ph} deg`, zl, p);
    });
  }
});
