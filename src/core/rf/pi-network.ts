// Pi output network of a PA matched by a network instead of a transformer: shunt C at the drain, series L, shunt C
// at the load, for the drain load the stage needs; standard capacitors and turns on the chosen core. A push-pull
// stage gets the same network for its drain-to-drain load, balanced (the series inductance split into two legs),
// followed by a 1:1 balun to the coax. Class E: the shunt capacitance the stage needs beyond the device's own.
import type { Finding } from '../findings';
import { snapCapacitance, type ESeries } from './e-series';
import { turnsForInductance } from './lpf-design';
import { CLASS_E_SHUNT } from './class-e-sim';

type C = [number, number];

/** Loaded Q of a pi network's higher-resistance side, chosen above the least Q the match needs. */
// Common practice, no published source: a loaded Q of about 3 for a transistor PA's pi network, and at least 1 more
// than the least Q the resistance ratio forces, so the virtual resistance sits below both ends
export const PI_MIN_Q = 3;

export interface PiIdeal {
  q: number;
  /** Q of the lower side's L section. */
  q2: number;
  /** Virtual resistance between the two L sections, Ω. */
  virtualOhm: number;
  /** Shunt capacitance at the drain and at the load, F; series inductance, H. */
  drainShuntF: number;
  loadShuntF: number;
  seriesH: number;
}

/** Ideal pi network between a drain resistance and a load resistance at f, with loaded Q `q` on the higher side. */
export function piNetworkIdeal(drainOhm: number, loadOhm: number, frequencyHz: number, q: number): PiIdeal {
  const w = 2 * Math.PI * frequencyHz;
  const hi = Math.max(drainOhm, loadOhm);
  const lo = Math.min(drainOhm, loadOhm);
  // Source: pi network as two back-to-back L networks through a virtual resistance (textbook relations, e.g.
  // C. Bowick, RF Circuit Design, 1982, ch. 4; from memory): R_v = R_H / (Q² + 1), X_CH = R_H / Q,
  // Q_2 = √(R_L / R_v − 1), X_CL = R_L / Q_2, X_L = R_v (Q + Q_2)
  const rv = hi / (q * q + 1);
  const q2 = Math.sqrt(lo / rv - 1);
  const xHi = hi / q;
  const xLo = lo / q2;
  const xL = rv * (q + q2);
  const cHi = 1 / (w * xHi);
  const cLo = 1 / (w * xLo);
  const drainHigh = drainOhm >= loadOhm;
  return {
    q,
    q2,
    virtualOhm: rv,
    drainShuntF: drainHigh ? cHi : cLo,
    loadShuntF: drainHigh ? cLo : cHi,
    seriesH: xL / w,
  };
}

const par = (a: C, b: C): C => {
  // Source: circuit theory, Z1 ∥ Z2 = Z1 Z2 / (Z1 + Z2)
  const n: C = [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
  const d: C = [a[0] + b[0], a[1] + b[1]];
  const m = d[0] * d[0] + d[1] * d[1];
  return [(n[0] * d[0] + n[1] * d[1]) / m, (n[1] * d[0] - n[0] * d[1]) / m];
};

/** Impedance looking into the drain side of a pi network loaded by rLoadOhm, [re, im] Ω. */
export function piNetworkInput(
  drainShuntF: number,
  seriesH: number,
  loadShuntF: number,
  rLoadOhm: number,
  frequencyHz: number,
): C {
  const w = 2 * Math.PI * frequencyHz;
  const zcLoad: C = [0, -1 / (w * loadShuntF)];
  const zcDrain: C = [0, -1 / (w * drainShuntF)];
  const back = par([rLoadOhm, 0], zcLoad);
  return par(zcDrain, [back[0], back[1] + w * seriesH]);
}

export interface PiNetwork {
  drainOhm: number;
  loadOhm: number;
  /** 'balanced': push-pull, drain-to-drain load, series L split into two legs of half each, 1:1 balun after it. */
  form: 'single-ended' | 'balanced';
  ideal: PiIdeal;
  drainCapacitorPartsF: number[];
  loadCapacitorPartsF: number[];
  builtDrainShuntF: number;
  builtLoadShuntF: number;
  /** Turns on the core (each leg's turns when balanced) and the as-built series inductance, H (null without a core). */
  turns: number | null;
  builtSeriesH: number | null;
  /** Drain load the built parts give, [re, im] Ω, or null without turns. */
  builtDrainOhm: C | null;
}

export interface NetworkCore {
  alHPerTurn2: number;
  series: ESeries;
  pairs: boolean;
}

/** The pi network a stage needs, with standard capacitors and turns; null when the loads make no sense. */
export function designPiNetwork(
  drainOhm: number,
  loadOhm: number,
  frequencyHz: number,
  pushPull: boolean,
  core: NetworkCore | null,
  series: ESeries = 'E12',
): PiNetwork | null {
  if (!(drainOhm > 0) || !(loadOhm > 0) || !(frequencyHz > 0)) return null;
  const hi = Math.max(drainOhm, loadOhm);
  const lo = Math.min(drainOhm, loadOhm);
  // Source: least Q of an L match, Q = √(R_H / R_L − 1) (textbook relation)
  const qMin = Math.sqrt(hi / lo - 1);
  const ideal = piNetworkIdeal(drainOhm, loadOhm, frequencyHz, Math.max(PI_MIN_Q, qMin + 1));
  const s = core?.series ?? series;
  const pairs = core?.pairs ?? true;
  const cd = snapCapacitance(ideal.drainShuntF, s, pairs);
  const cl = snapCapacitance(ideal.loadShuntF, s, pairs);
  // balanced: each leg carries half the series inductance (the two legs in series make the whole)
  const legH = pushPull ? ideal.seriesH / 2 : ideal.seriesH;
  const turns = core ? turnsForInductance(legH, core.alHPerTurn2) : null;
  // Source: definition of the inductance factor, L = AL N² (IEC 60205)
  const builtLegH = core && turns !== null ? core.alHPerTurn2 * turns * turns : null;
  const builtSeriesH = builtLegH === null ? null : pushPull ? 2 * builtLegH : builtLegH;
  const built = builtSeriesH !== null ? piNetworkInput(cd.total, builtSeriesH, cl.total, loadOhm, frequencyHz) : null;
  return {
    drainOhm,
    loadOhm,
    form: pushPull ? 'balanced' : 'single-ended',
    ideal,
    drainCapacitorPartsF: cd.parts,
    loadCapacitorPartsF: cl.parts,
    builtDrainShuntF: cd.total,
    builtLoadShuntF: cl.total,
    turns,
    builtSeriesH,
    builtDrainOhm: built,
  };
}

export interface ClassEShunt {
  /** Shunt capacitance the design needs per switch, F, the device's own, and what to add (standard parts). */
  neededF: number;
  cossF: number;
  addPartsF: number[];
  addF: number;
  /** Highest frequency at which the device's own capacitance is not more than the design needs, Hz (null: Coss 0). */
  maxFrequencyHz: number | null;
}

/** Class E: the external shunt capacitor beside the device (null when the device alone has too much, or no Coss). */
export function classEShuntCapacitor(
  drainOhm: number,
  frequencyHz: number,
  cossF: number | null,
  series: ESeries,
): ClassEShunt | null {
  if (cossF === null || !(cossF >= 0) || !(drainOhm > 0) || !(frequencyHz > 0)) return null;
  // Source: nominal class-E design, C1 = 0.1836 / (ω R) (N. O. Sokal and A. D. Sokal, IEEE JSSC SC-10(3), 1975;
  // constant from memory); solved for f with C1 = Coss for the highest usable frequency
  const neededF = CLASS_E_SHUNT / (2 * Math.PI * frequencyHz * drainOhm);
  const maxFrequencyHz = cossF > 0 ? CLASS_E_SHUNT / (2 * Math.PI * drainOhm * cossF) : null;
  const extra = neededF - cossF;
  if (!(extra > 0)) return { neededF, cossF, addPartsF: [], addF: 0, maxFrequencyHz };
  // one standard part (a pair would add a trimmer-sized crumb here; the part is trimmed on test anyway)
  const snap = snapCapacitance(extra, series, false);
  return { neededF, cossF, addPartsF: snap.parts, addF: snap.total, maxFrequencyHz };
}

/** How far the built network's drain load may stray from the design before a caution. */
// Common practice, no published source: within 10 % in resistance and 20 % of it in reactance a PA is matched well
// enough; beyond, adjust the turns or the capacitors on test
const PI_R_TOLERANCE = 0.1;
const PI_X_TOLERANCE = 0.2;

/** One finding on the designed pi network: the drain load its built parts give against the one the stage needs. */
export function piFindings(pi: PiNetwork, subject: string): Finding[] {
  const source = pi.form === 'balanced' ? 'network.push-pull' : 'network.pi';
  const base = { rule: 'network.pi', subject: `${subject}: pi network`, unit: 'Ω', source } as const;
  if (!pi.builtDrainOhm) {
    return [
      {
        ...base,
        severity: 'ok',
        value: null,
        limit: pi.drainOhm,
        message: `A pi network for ${pi.drainOhm.toFixed(1)} Ω is designed; choose a core to count its turns and ` +
          `check the built network.`,
      },
    ];
  }
  const [re, im] = pi.builtDrainOhm;
  const off = Math.abs(re / pi.drainOhm - 1) > PI_R_TOLERANCE || Math.abs(im) > PI_X_TOLERANCE * pi.drainOhm;
  const z = `${re.toFixed(1)} ${im < 0 ? '−' : '+'} j${Math.abs(im).toFixed(1)} Ω`;
  return [
    {
      ...base,
      severity: off ? 'caution' : 'ok',
      value: re,
      limit: pi.drainOhm,
      message: off
        ? `Built with standard capacitors and ${pi.turns} turns the pi network gives ${z} at the drain instead of ` +
          `${pi.drainOhm.toFixed(1)} Ω: ` +
          'adjust the turns (spread or squeeze them) or a capacitor on test.'
        : `Built with standard capacitors and ${pi.turns} turns the pi network gives ${z} at the drain (target ` +
          `${pi.drainOhm.toFixed(1)} Ω).`,
    },
  ];
}
