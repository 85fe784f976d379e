// Whole-chain cross-check in ngspice: a single-ended transformer-coupled class-C (150° conduction) and class-B (180°)
// stage (one device, a current source giving a cosine pulse that falls off as its drain reaches the saturation knee;
// the supply fed through the primary), the low-pass filter, and 50 Ω or the SWR 2 circle at five phases. Netlist
// written here from scratch (behavioural B source, coupled inductors; ngspice user's manual). The drive is set from the
// textbook relation V1 = R α1(θ) Ipk so that the swing just reaches the supply at the design load (cosine-pulse
// coefficient α1 as tabulated in Krauss, Bostian & Raab, Solid State Radio Engineering, 1980; from memory).
// The program's prediction: its load line at the filter's input impedance, balanced against the filter's input at
// each harmonic (pa-swr stressAt with pa-clip-balance). A single device leaves the 2nd harmonic to the filter alone,
// so its drain is far from a sinusoid even at the design load.
// Invented design: 13.8 V, 1:1 transformer (k = 0.9995), 7.03 MHz, 50 Ω, 50 pF at the drain.
import { describe, expect, it } from 'vitest';
import { NGSPICE, requireTool } from '../../helpers/tools';
import {
  type Complex as C, ladderAndLoadLines, ladderInputOhm, runSpice, spiceScratchDir,
} from '../../helpers/ngspice';
import { designLpf, type LpfDesign } from '../../../src/core/rf/lpf-design';
import { inputImpedance, ladderOf } from '../../../src/core/rf/lpf-analysis';
import { evaluatePa } from '../../../src/core/rf/pa';
import { loadOnCircle, stressAt } from '../../../src/core/rf/pa-swr';
import { drainHarmonicLoad } from '../../../src/core/rf/pa-clip-balance';
import { lpfParams, paParams } from './fixture';

const haveNgspice = requireTool(
  NGSPICE, 'SPICE whole-chain check of the single-ended class-C stage', 'apt-get install ngspice',
);

// Stated tolerances, from the runs (ngspice against the program). Power: class C 50 Ω −10.4 %, SWR 2 at 0° −1.5
// %, 45° −4.2 %, 90° +4.4 %, 180° −1.7 %, 270° −10.6 %; class B −7.7, +0.3, −3.4, +4.9, −1.7, −9.3 %:
// TOL_POWER 12 % both ways (the flat-topped model, before, gave 1.31 W at 0°: 32 % (C) and 14 % (B) more than
// ngspice). The balance leaves out the leakage inductance and the knee's softness, which matter more here than in
// push-pull, where the devices share the swing.
// Drain peak (the program's includes the 12 % ring margin where the limit cuts the current), ngspice against it:
// class C 50 Ω +3.1 %, SWR 2 at 0° −10.2 %, 45° −13.6 %, 90° +1.2 %, 180° +8.2 %, 270° +7.4 %; class B
// −0.2, −12.5, −12.8, +3.2, +12.2, +5.7 %. ngspice is above it only at the loads that do not clip (180°: 23.9 V
// against 21.3 V, far below 2 Vdd); the highest peak round the circle is 31.0 V in ngspice against 35.6 V in the
// program. So ngspice may stand DRAIN_ABOVE (13 %) above and DRAIN_BELOW (15 %) below the
// program. The push-pull test holds it closer.
const TOL_POWER = 0.12;
const DRAIN_BELOW = 0.15;
const DRAIN_ABOVE = 0.13;

const F0 = 7.03e6;
const VDD = 13.8;
const VSAT = 0.3; // the drain's lowest excursion at the design load (the knee), V; the program is given the same
const R0 = 50;
const W = 2 * Math.PI * F0;
const KNEE = 0.05; // saturation knee of the behavioural device, V
const TSTOP = 80;
const STEPS = 250;

function netlist(d: LpfDesign, zl: C, thetaRad: number): string {
  // α1(θ) = (θ − sin θ cos θ) / (π (1 − cos θ)) (Krauss, Bostian & Raab 1980, from memory); V1 = R α1 Ipk
  const alpha1 = (thetaRad - Math.sin(thetaRad) * Math.cos(thetaRad)) / (Math.PI * (1 - Math.cos(thetaRad)));
  const ipk = (VDD - VSAT) / (R0 * alpha1) / (1 - Math.exp(-VSAT / KNEE));
  const per = 1 / F0;
  const lFull = (20 * R0) / W; // primary reactance 20 x the drain load: small magnetising current
  const cth = Math.cos(thetaRad).toPrecision(9);
  const from = ((TSTOP - 20) * per).toPrecision(9);
  const to = (TSTOP * per).toPrecision(9);
  return [
    '* single-ended class-C stage, low-pass filter, load (written from scratch for this test)',
    `VDD vdd 0 DC ${VDD}`,
    `B1 d1 0 I = ${ipk.toPrecision(7)} * max(0, (cos(${W.toPrecision(9)}*time) - ${cth})/(1 - ${cth}))` +
      ` * (1 - exp(-max(v(d1), 0)/${KNEE}))`,
    'CO1 d1 0 50p',
    `LP1 vdd d1 ${lFull.toPrecision(7)}`,
    `LS1 f0 0 ${lFull.toPrecision(7)}`,
    'K1 LP1 LS1 0.9995',
    ...ladderAndLoadLines(d, 'f0', zl, W),
    `RL nr 0 ${zl.re.toPrecision(7)}`,
    `.tran ${(per / STEPS).toPrecision(6)} ${to} 0 ${(per / STEPS).toPrecision(6)}`,
    `.meas tran vdpk MAX v(d1) from=${from} to=${to}`,
    `.meas tran pout AVG par('v(nr)*v(nr)/${zl.re.toPrecision(7)}') from=${from} to=${to}`,
    '.end',
  ].join('\n');
}

const dir = spiceScratchDir('rw-sechain-', haveNgspice);

const CLASSES: ['B' | 'C', number][] = [['C', 150], ['B', 180]];

const cache = new Map<string, { vdpk: number; pout: number; out: string }>();
/** One ngspice run per class and load, shared by the tests of that load. */
function run(d: LpfDesign, zl: C, name: string, thetaRad: number) {
  const hit = cache.get(name);
  if (hit) return hit;
  const r = runSpice(dir, name, netlist(d, zl, thetaRad));
  const res = { vdpk: r.measure('vdpk'), pout: r.measure('pout'), out: r.out };
  cache.set(name, res);
  return res;
}

describe.skipIf(!haveNgspice).each(CLASSES)('single-ended class %s (%i°) + low-pass filter in ngspice', (cls, deg) => {
  const thetaRad = (deg / 2) * (Math.PI / 180);
  const dd = designLpf(lpfParams({ inductorQ: 10000, capacitorQ: 100000 }), F0);
  if (!dd.ok) throw new Error(JSON.stringify(dd.errors));
  const d = dd.value;
  const paIn = paParams({
    amplifierClass: cls, topology: 'single-ended', devices: 1, turnsRatio: 1, loadOhm: R0, saturationV: VSAT,
    rdsOnOhm: null, efficiency: 0.7, conductionAngleDeg: cls === 'C' ? deg : null,
  });
  const pa = evaluatePa(paIn, VDD, { targetPowerW: 5, ambientC: 25, keyingDuty: 0.4 });
  // the filter's input at each harmonic (50 Ω beyond it) with the netlist's 50 pF at the drain
  const zAt = drainHarmonicLoad((n) => inputImpedance(ladderOf(d, 'built', true), n * F0, R0),
    { primaryOhm: R0, loadOhm: R0, cossF: 50e-12, frequencyHz: F0, topology: 'single-ended' });
  const m = {
    drainPeakV: pa.peakDrainV, maxRailV: VDD, peakDeviceA: pa.peakDeviceA, outputW: pa.outputW, dcInputW: pa.dcInputW,
    biasW: 0, harmonics: { zAt, thetaRad, topology: 'single-ended' as const },
  };
  const loads: [string, C][] = [
    ['50 ohm', { re: R0, im: 0 }],
    ...[0, 45, 90, 180, 270].map((ph): [string, C] => {
      const z = loadOnCircle(2, ph);
      return [`SWR 2 at ${ph} deg`, { re: R0 * z.re, im: R0 * z.im }];
    }),
  ];
  for (const [name, zl] of loads) {
    it(`${name}: drain peak and output power`, () => {
      const zin = ladderInputOhm(d, zl, W);
      const pred = stressAt(cls, m, { re: zin.re / R0, im: zin.im / R0 });
      const r = run(d, zl, `${cls}_${name.replace(/\W+/g, '_')}`, thetaRad);
      const { vdpk, pout } = r;
      expect(Number.isFinite(vdpk), r.out).toBe(true);
      const vmsg = `drain: ngspice ${vdpk.toFixed(2)} V, program ${pred.drainPeakV.toFixed(2)} V`;
      expect(vdpk / pred.drainPeakV - 1, vmsg).toBeLessThanOrEqual(DRAIN_ABOVE);
      expect(1 - vdpk / pred.drainPeakV, vmsg).toBeLessThanOrEqual(DRAIN_BELOW);
      const pmsg = `power: ngspice ${pout.toFixed(3)} W, program ${pred.outputW.toFixed(3)} W`;
      expect(Math.abs(pout / pred.outputW - 1), pmsg).toBeLessThanOrEqual(TOL_POWER);
    });
  }
  it('the highest drain peak over these loads, which the rating check uses, is not below ngspice\'s highest', () => {
    const spice = Math.max(...loads.map(([name, zl]) => run(d, zl, `${cls}_${name.replace(/\W+/g, '_')}`, thetaRad)
      .vdpk));
    const program = Math.max(...loads.map(([, zl]) => {
      const zin = ladderInputOhm(d, zl, W);
      return stressAt(cls, m, { re: zin.re / R0, im: zin.im / R0 }).drainPeakV;
    }));
    expect(program, `ngspice ${spice.toFixed(2)} V, program ${program.toFixed(2)} V`).toBeGreaterThanOrEqual(spice);
  });
});
