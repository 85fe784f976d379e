// SPICE netlist of a rectified rail, for cross-checking the built-in simulation with any SPICE (tested with ngspice).
//
// Model choice: each diode is a behavioural current source I = max(V_ak - Vf, 0) / r_d, exactly the
// piecewise-linear Vf + r_d model the built-in simulation uses (no exponential junction, no recovery), with
// a 0 V source in series with one diode to measure its current. The winding is an ideal sine source of the
// open-circuit RMS (V_NL x mains factor) behind its resistance, with a 0 V source to measure its current.
// The reservoir starts at the no-load peak (uic) and the run covers enough whole cycles to settle;
// .meas lines report the last whole cycle. Every node has a DC path (100 MΩ to ground).
import type { RectifiedRail, Winding } from '../model';
import type { RectifierSimInput } from './rectifier-sim';
import { diodesInPath } from './rectifier-sim';
import { simInputFor } from './rectified-rail';

export interface NetlistOptions {
  /** Mains cycles to simulate (default from a settling estimate, 20..400). */
  cycles?: number;
  /** Time steps per cycle for the maximum step (default 1000). */
  stepsPerCycle?: number;
  title?: string;
}

/** Names of the .meas results in the netlist, with units. */
export const SPICE_MEASURES = {
  vavg: 'DC mean rail voltage (V)',
  vpp: 'ripple peak-to-peak (V)',
  vmin: 'trough (V)',
  vmax: 'peak (V)',
  isec: 'secondary RMS current (A), per half for centre-tap',
  idpk: 'peak current of one diode (A)',
} as const;

const num = (x: number) => (Number.isFinite(x) ? Number(x.toPrecision(8)).toString() : '0');

/**
 * Cycles needed to settle from the no-load peak: the reservoir must droop by about the load's
 * ripple-free share plus a few time constants of the charging path. Common practice, no published source.
 */
export function settleCycles(input: RectifierSimInput): number {
  const f = input.frequencyHz > 0 ? input.frequencyHz : 50;
  const i =
    input.load.kind === 'current'
      ? input.load.currentA
      : (Math.SQRT2 * input.secondaryVrms) / Math.max(input.load.resistanceOhm, 1e-3);
  const rPath = Math.max(input.windingResistanceOhm + 2 * input.diodeResistanceOhm + input.esrOhm, 1e-3);
  // charging time constant stretched by a ~25 % conduction fraction; droop of ~1 V at I/C V/s
  const tauS = (input.capacitanceF * rPath) / 0.25;
  const droopS = i > 0 ? (input.capacitanceF * 1) / i : 0;
  const cycles = Math.ceil((6 * tauS + droopS) * f) + 10;
  return Math.min(400, Math.max(20, Number.isFinite(cycles) ? cycles : 400));
}

export function rectifierNetlist(input: RectifierSimInput, options: NetlistOptions = {}): string {
  const f = input.frequencyHz;
  const period = 1 / f;
  const cycles = Math.max(3, Math.round(options.cycles ?? settleCycles(input)));
  const steps = options.stepsPerCycle ?? 1000;
  const vpk = Math.SQRT2 * input.secondaryVrms;
  const vf = input.diodeDropV;
  const rd = Math.max(input.diodeResistanceOhm, 1e-4);
  const rw = Math.max(input.windingResistanceOhm, 1e-6);
  const esr = Math.max(input.esrOhm, 1e-6);
  const n = diodesInPath(input.topology);
  const ic = Math.max(0, vpk - n * vf);
  const diode = (name: string, a: string, k: string) =>
    `${name} ${a} ${k} I = max(V(${a},${k}) - ${num(vf)}, 0) / ${num(rd)}`;
  const lines: string[] = [
    `* ${oneLine(
      options.title ?? `${input.topology} rectifier, ${num(input.secondaryVrms)} V rms open circuit, ${num(f)} Hz`,
    )}`,
    `* Diodes: behavioural I = max(Vak - ${num(vf)} V, 0) / ${num(rd)} ohm (piecewise-linear Vf + r_d model).`,
    `* Results: .meas over the last whole cycle (${cycles} cycles simulated from the no-load peak).`,
  ];
  if (input.topology === 'bridge') {
    lines.push(
      `Vs p sn SIN(0 ${num(vpk)} ${num(f)})`,
      `Rw p p1 ${num(rw)}`,
      `Vsense p1 a 0`,
      `Vd1 a d1 0`,
      diode('B1', 'd1', 'out'),
      diode('B2', 'sn', 'out'),
      diode('B3', '0', 'a'),
      diode('B4', '0', 'sn'),
      `Rdc1 sn 0 100Meg`,
      `Rdc2 a 0 100Meg`,
    );
  } else if (input.topology === 'centre-tap') {
    lines.push(
      `Va pa 0 SIN(0 ${num(vpk)} ${num(f)})`,
      `Vb pb 0 SIN(0 ${num(-vpk)} ${num(f)})`,
      `Rwa pa pa1 ${num(rw)}`,
      `Rwb pb pb1 ${num(rw)}`,
      `Vsense pa1 a 0`,
      `Vsenseb pb1 b 0`,
      `Vd1 a d1 0`,
      diode('B1', 'd1', 'out'),
      diode('B2', 'b', 'out'),
      `Rdc1 a 0 100Meg`,
      `Rdc2 b 0 100Meg`,
    );
  } else {
    lines.push(
      `Vs p 0 SIN(0 ${num(vpk)} ${num(f)})`,
      `Rw p p1 ${num(rw)}`,
      `Vsense p1 a 0`,
      `Vd1 a d1 0`,
      diode('B1', 'd1', 'out'),
      `Rdc1 a 0 100Meg`,
    );
  }
  lines.push(`Resr out c1 ${num(esr)}`, `C1 c1 0 ${num(input.capacitanceF)} IC=${num(ic)}`, `Rdc3 out 0 100Meg`);
  if (input.load.kind === 'current') lines.push(`Iload out 0 DC ${num(input.load.currentA)}`);
  else lines.push(`Rload out 0 ${num(input.load.resistanceOhm)}`);
  if (input.bleederOhm && input.bleederOhm > 0) lines.push(`Rbleed out 0 ${num(input.bleederOhm)}`);
  const t1 = num((cycles - 1) * period);
  const t2 = num(cycles * period);
  const step = num(period / steps);
  lines.push(
    `.tran ${step} ${t2} 0 ${step} uic`,
    `.meas tran vavg AVG v(out) FROM=${t1} TO=${t2}`,
    `.meas tran vpp PP v(out) FROM=${t1} TO=${t2}`,
    `.meas tran vmin MIN v(out) FROM=${t1} TO=${t2}`,
    `.meas tran vmax MAX v(out) FROM=${t1} TO=${t2}`,
    `.meas tran isec RMS i(Vsense) FROM=${t1} TO=${t2}`,
    `.meas tran idpk MAX i(Vd1) FROM=${t1} TO=${t2}`,
    `.end`,
  );
  return lines.join('\n') + '\n';
}

/** Project text in a netlist stays on its comment line: line breaks and control characters become spaces,
 *  so a name can never start a SPICE command line (e.g. a `.control` block with `shell`). */
export function oneLine(text: string): string {
  return text.replace(/[\u0000-\u001f\u007f\u2028\u2029]+/g, ' ');
}

/** Netlist of a project's rectified rail at a mains factor and load current (A). */
export function railNetlist(
  rail: RectifiedRail,
  winding: Winding,
  frequencyHz: number,
  mainsFactor: number,
  loadA: number,
  options: NetlistOptions = {},
): string {
  return rectifierNetlist(simInputFor(rail, winding, frequencyHz, mainsFactor, loadA), {
    title: `${rail.name}: mains x${mainsFactor}, ${loadA} A`,
    ...options,
  });
}
