// The PA rail's keying transient (power/keying-sim.ts, power/keying-transient.ts) and the rail load model
// (power/rail-load-model.ts): hand-worked load laws, the integrator against closed forms, and the keyed rail against
// ngspice on a netlist written here from scratch (sine source behind the winding resistance, behavioural diodes
// Vf + r_d, reservoir with ESR, bleeder, a keyed behavioural load I(V) for the PA).
import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { NGSPICE, requireTool } from '../../helpers/tools';
import { loadAt, paOutputW, type ModeLoads, type PaLoadLaw } from '../../../src/core/power/rail-load-model';
import { KeyingSimulator, runKeying, steadyCycle, type KeyingCircuit } from '../../../src/core/power/keying-sim';
import { dotTrain, elementsFor, simulateKeyingTransient } from '../../../src/core/power/keying-transient';
import { near } from './helpers';

const hasNgspice = requireTool(NGSPICE, 'Keying transient against ngspice', 'apt-get install ngspice');

// A PA of 20 W at 24 V with a 1 V saturation drop, 70 % efficient, 50 mA bias idle (round numbers chosen here).
const pa: PaLoadLaw = {
  stageId: 's',
  stageName: 'PA',
  referenceV: 24,
  referenceOutputW: 20,
  saturationV: 1,
  efficiency: 0.7,
  idleA: 0.05,
};
const keyUp: ModeLoads = { constantA: 0.05, constantPower: [], pa: null };
const keyDown: ModeLoads = { constantA: 0, constantPower: [], pa };

describe('load laws', () => {
  it('the PA on its load line: P ∝ (V - Vsat)², I = idle + P / (eta V)', () => {
    // Source: load line P = (Vdd - Vsat)² / (2R) (textbook), DC input P / eta. Hand-worked at 28 V:
    // P = 20 x (27 / 23)² = 20 x 1.378072 = 27.5614 W; I = 27.5614 / (0.7 x 28) + 0.05 = 1.406196 + 0.05 = 1.456196 A
    near(paOutputW(pa, 28), 27.5614, 1e-3, 'output at 28 V (W)');
    near(loadAt(keyDown, 28).currentA, 1.456196, 1e-5, 'current at 28 V (A)');
    // at the reference point: 20 / (0.7 x 24) + 0.05 = 1.190476 + 0.05 = 1.240476 A
    near(loadAt(keyDown, 24).currentA, 1.240476, 1e-5, 'current at 24 V (A)');
    // below the saturation drop only the idle current flows
    near(loadAt(keyDown, 0.8).currentA, 0.05, 1e-12, 'current below Vsat (A)');
  });

  it('with no saturation drop the PA draws a current in proportion to its supply (a resistance)', () => {
    // Source: same relation with Vsat = 0: I = P0 V / (eta V0²), so I(2 V) = 2 I(V) and dI/dV = I / V
    const ideal: ModeLoads = { constantA: 0, constantPower: [], pa: { ...pa, saturationV: 0, idleA: 0 } };
    const i12 = loadAt(ideal, 12);
    near(loadAt(ideal, 24).currentA / i12.currentA, 2, 1e-12, 'I(24 V) / I(12 V)');
    near(i12.slopeAPerV, i12.currentA / 12, 1e-12, 'dI/dV = I/V (A/V)');
  });

  it('a switching regulator is a constant power, a linear one a constant current', () => {
    // Source: energy balance P_in = P_out / eta: 5 V x 2 A / 0.8 = 12.5 W; at 25 V 0.5 A, at 12.5 V 1 A
    const m: ModeLoads = { constantA: 0.1, constantPower: [{ name: 'buck', powerW: 12.5, minimumV: 7 }], pa: null };
    near(loadAt(m, 25).currentA, 0.6, 1e-12, 'at 25 V (A)');
    near(loadAt(m, 12.5).currentA, 1.1, 1e-12, 'at 12.5 V (A)');
    near(loadAt(m, 25).slopeAPerV, -12.5 / 625, 1e-12, 'dI/dV at 25 V (A/V)');
    // below its minimum input the module is out of regulation: its draw is held at the minimum's
    near(loadAt(m, 5).currentA, 0.1 + 12.5 / 7, 1e-12, 'below the minimum (A)');
  });
});

describe('dot timing', () => {
  it('PARIS dots of 1.2 / WPM s with one-unit spaces (ITU-R M.1677-1 ratios)', () => {
    // Source: PARIS word of 50 units (common practice): 20 WPM -> 60 ms dots; element and space one unit each
    const t = dotTrain(1.2 / 20, 3, 0.05);
    expect(t.intervals.map((i) => [i.startS, i.endS].map((x) => Math.round(x * 1e6) / 1e6))).toEqual([
      [0.05, 0.11],
      [0.17, 0.23],
      [0.29, 0.35],
    ]);
    expect(elementsFor(0.06)).toBeGreaterThanOrEqual(3);
  });
});

// Club-like PA rail (values from the demo's data, worked by hand): 20 V 2.5 A winding with 8 % regulation at 120 V
// 60 Hz nominal: V_NL = 20 x 1.08 = 21.6 V RMS; R = 0.08 x 20 / 2.5 = 0.64 ohm; bridge 0.9 V + 0.03 ohm per diode;
// 6800 µF, 30 mΩ ESR, 2.2 kΩ bleeder.
const circuit: KeyingCircuit = {
  topology: 'bridge', secondaryVrms: 21.6, windingOhm: 0.64, leakageH: 0, frequencyHz: 60, diodeDropV: 0.9,
  diodeResistanceOhm: 0.03, capacitanceF: 6800e-6, esrOhm: 0.03, bleederOhm: 2200,
};

describe('integrator against closed forms', () => {
  it('no conduction, constant current: the reservoir falls at I / C', () => {
    // Source: C dv/dt = -I. With 1 mV of EMF no diode conducts; no bleeder, no ESR: v(T) = v0 - I T / C
    const c: KeyingCircuit = { ...circuit, secondaryVrms: 1e-3, bleederOhm: null, esrOhm: 0 };
    const sim = new KeyingSimulator(c, 200);
    const v = sim.cycle(20, { constantA: 1, constantPower: [], pa: null });
    near(v, 20 - (1 * (1 / 60)) / 6800e-6, 1e-9, 'after one cycle (V)');
  });

  it('no conduction, bleeder only: exponential decay', () => {
    // Source: v(t) = v0 exp(-t / RC); 10 cycles at 60 Hz, RC = 2200 x 6800 µF = 14.96 s
    const c: KeyingCircuit = { ...circuit, secondaryVrms: 1e-3, esrOhm: 0 };
    const sim = new KeyingSimulator(c, 200);
    let v = 30;
    for (let i = 0; i < 10; i++) v = sim.cycle(v, { constantA: 0, constantPower: [], pa: null });
    near(v, 30 * Math.exp(-(10 / 60) / (2200 * 6800e-6)), 1e-6, 'after ten cycles (V)');
  });
});

/** Run ngspice on a netlist; returns the .meas values by name. */
function ngspice(netlist: string, names: string[]): Record<string, number> {
  const dir = mkdtempSync(join(tmpdir(), 'rigwright-keying-'));
  try {
    writeFileSync(join(dir, 'k.cir'), netlist);
    const run = spawnSync(NGSPICE as string, ['-b', 'k.cir'], { cwd: dir, encoding: 'utf8', timeout: 180_000 });
    const out = `${run.stdout ?? ''}\n${run.stderr ?? ''}`;
    return Object.fromEntries(names.map((n) => {
      const m = out.match(new RegExp(`^${n}\\s*=\\s*([-+0-9.eE]+)`, 'm'));
      if (!m) throw new Error(`ngspice gave no ${n}:\n${out.slice(-2000)}`);
      return [n, Number(m[1])];
    }));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/**
 * The keyed rail written from scratch for ngspice: the bridge of behavioural diodes I = max(V - Vf, 0) / r_d, the
 * winding as a sine behind its resistance (and leakage inductance), the key as a pulse source, the load as one
 * behavioural current: key-up 50 mA; key-down idle + K (V - Vsat)² / V with K = P0 / (eta (V0 - Vsat)²).
 */
function keyedNetlist(c: KeyingCircuit, keyAtS: number, dotS: number, dots: number, leakageH: number): string {
  const vpk = Math.SQRT2 * c.secondaryVrms;
  const k = pa.referenceOutputW / (pa.efficiency * (pa.referenceV - pa.saturationV) ** 2);
  const d = (name: string, a: string, b: string) =>
    `${name} ${a} ${b} I = max(V(${a},${b}) - ${c.diodeDropV}, 0) / ${c.diodeResistanceOhm}`;
  const end = keyAtS + 2 * dots * dotS;
  const lines = [
    '* keyed PA rail: bridge, reservoir, switched PA load',
    `Vs p sn SIN(0 ${vpk} ${c.frequencyHz})`,
    leakageH > 0 ? `Rw p pl ${c.windingOhm}` : `Rw p a ${c.windingOhm}`,
    ...(leakageH > 0 ? [`Lk pl a ${leakageH}`] : []),
    d('B1', 'a', 'out'), d('B2', 'sn', 'out'), d('B3', '0', 'a'), d('B4', '0', 'sn'),
    'Rdc1 a 0 100Meg', 'Rdc2 sn 0 100Meg',
    `Resr out cc ${c.esrOhm}`,
    // starts below its key-up level, so it charges within a few cycles (a start above would bleed away slowly)
    `C1 cc 0 ${c.capacitanceF} IC=25`,
    `Rb out 0 ${c.bleederOhm}`,
    `Vkey key 0 PULSE(0 1 ${keyAtS} 1u 1u ${dotS - 2e-6} ${2 * dotS})`,
    'Rkey key 0 1Meg',
    `Bload out 0 I = (1 - V(key)) * 0.05 + V(key) * (${pa.idleA} + ${k} * max(V(out) - ${pa.saturationV}, 0)^2 / ` +
      `max(V(out), 1))`,
    `.tran 10u ${end} 0 10u uic`,
    `.meas tran up AVG v(out) FROM=${keyAtS - 1 / c.frequencyHz} TO=${keyAtS}`,
    ...AT_MS.map((ms, i) => `.meas tran at${i} FIND v(out) AT=${keyAtS + ms / 1000}`),
  ];
  for (let i = 0; i < dots; i++) {
    const s = keyAtS + 2 * i * dotS;
    lines.push(`.meas tran avg${i} AVG v(out) FROM=${s} TO=${s + dotS}`);
    lines.push(`.meas tran lead${i} AVG v(out) FROM=${s} TO=${s + 1 / (2 * c.frequencyHz)}`);
    lines.push(`.meas tran min${i} MIN v(out) FROM=${s} TO=${s + dotS}`);
  }
  lines.push('.end');
  return lines.join('\n') + '\n';
}

// Tolerances (named with units): the element means, troughs and instants against ngspice
const toleranceMeanV = 0.05; // 50 mV on about 25 V (0.2 %)
const toleranceMinV = 0.05; // the trough is an instant, sampled on each simulator's own step
const toleranceAtV = 0.08; // an instant on a ripple slope of up to about 1 V/ms: 80 mV
/** Instants after the first key-down (ms): early in the sag, late in the first dot, in the space, in the second dot. */
const AT_MS = [3, 20, 45, 90, 125];

describe.skipIf(!hasNgspice)('keyed PA rail against ngspice', () => {
  for (const leakageH of [0, 0.3e-3]) {
    it(`20 WPM dot train from rest${leakageH ? ', 0.3 mH leakage' : ''}`, () => {
      const c = { ...circuit, leakageH };
      const sim = new KeyingSimulator(c, 200);
      expect(sim.leakageH).toBe(leakageH);
      const up = sim.steadyStartV(keyUp, 28, 1e-4);
      const dotS = 0.06;
      const lead = 30 / 60; // 30 mains cycles of key-up before the first dot
      const dots = 3;
      const run = runKeying(sim, keyUp, keyDown, dotTrain(dotS, dots, 0.05), up.v, 1, 1 / 120);
      const upMean = steadyCycle(sim, keyUp, up.v).meanV;
      const names = [
        'up',
        ...AT_MS.map((_, i) => `at${i}`),
        ...[...Array(dots).keys()].flatMap((i) => [`avg${i}`, `lead${i}`, `min${i}`]),
      ];
      const sp = ngspice(keyedNetlist(c, lead, dotS, dots, leakageH), names);
      near(upMean, sp.up, toleranceMeanV, 'key-up mean (V)');
      for (let i = 0; i < dots; i++) {
        near(run.intervals[i].meanV, sp[`avg${i}`], toleranceMeanV, `dot ${i + 1} mean (V)`);
        near(run.intervals[i].minV, sp[`min${i}`], toleranceMinV, `dot ${i + 1} trough (V)`);
      }
      AT_MS.forEach((ms, i) => {
        const idx = run.timeS.findIndex((t) => t >= 0.05 + ms / 1000 - 1e-9);
        near(run.railV[idx], sp[`at${i}`], toleranceAtV, `rail at ${ms} ms (V)`);
      });
    });
  }
});

describe('the club-like rail keyed at 20 WPM', () => {
  it('starts at the key-up level and sags towards the held-key level; the first dot is hotter than a held key', () => {
    const model = { railId: 'r', railName: 'PA rail', keyUp, keyDown, parts: [] };
    const kt = simulateKeyingTransient(circuit, model, 20)!;
    expect(kt).not.toBeNull();
    // the held-key level lies below the key-up level by the winding's drop (about 1.3 A x (0.64 + 0.06) ohm and more:
    // the peak-charging current is several times the mean); the first dot lies between them
    expect(kt.keyDownMeanV).toBeLessThan(kt.keyUpMeanV - 2);
    expect(kt.elements[0].meanV).toBeGreaterThan(kt.keyDownMeanV);
    expect(kt.elements[0].meanV).toBeLessThan(kt.keyUpMeanV);
    // leading edge hotter than the whole dot, and the whole dot hotter than a held key
    expect(kt.firstLeadDb).toBeGreaterThan(kt.firstElementDb);
    expect(kt.firstElementDb).toBeGreaterThan(0);
  });
});
