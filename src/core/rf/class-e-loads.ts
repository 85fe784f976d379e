// Class E: each harmonic at the antenna over the loads the stage meets, the design load and the circle of the worst
// SWR at the antenna, as well as over the series network's loaded Q. A class-E waveform changes with the load it sees
// at the fundamental, so the band at the design load alone does not describe the other loads.
// For each antenna load the filter as built presents its input impedance to the stage; the simulated stage into that
// load gives the load current's harmonics; with the series network they give the drain's harmonic voltages, which drive
// the filter into the antenna load. Each harmonic is taken relative to the fundamental delivered into that load.
// The stress sweep (pa-swr) takes the same loads (loadsThroughFilter), so its class-E runs at the loaded Q it uses are
// shared with these through the simulation's own memo.
import { CLASS_E_EXCESS, CLASS_E_QL, CLASS_E_QL_LOW, simulateClassE } from './class-e-sim';
import { chainMatrix, harmonicsFromSource, type Cx, type Ladder } from './lpf-analysis';
import { loadOnCircle } from './pa-swr';
import { MIN_DBC, type HarmonicBand } from './pa-spectrum';

/**
 * Reflection phases round the antenna's circle: every 30°. On the ngspice chain-test stage the worst ends came within
 * 0.3 dB (2nd) and 0.8 dB (3rd) of a 5° sweep's; every 15° halves the gap at twice the runs.
 */
export const CLASS_E_LOAD_PHASES = 12;

export interface ClassELoadPoint {
  /** Reflection phase of the antenna load, degrees; null = the design load at the antenna. */
  phaseDeg: number | null;
  loadedQ: number;
  /** The antenna load at the fundamental, Ω. */
  antennaReOhm: number;
  antennaImOhm: number;
  /** The load the stage meets: the filter's input impedance, referred to the drain as a fraction of its design load. */
  drainLoadRe: number;
  drainLoadIm: number;
  /** Harmonic n at the antenna relative to the fundamental delivered into that load, dBc. */
  levels: { n: number; dbc: number }[];
}

export interface ClassELoadBands {
  swr: number;
  /** Phases simulated and the loaded Q range, for the wording of the band. */
  phases: number;
  loadedQ: [number, number];
  points: ClassELoadPoint[];
}

export interface ClassELoadInput {
  /** The filter as built; its r0Ohm is the antenna's design load. */
  ladder: Ladder;
  frequencyHz: number;
  /** Load side of the PA's transformer or network (its design load), Ω. */
  loadOhm: number;
  /** Rds(on) over the drain load of one class-E half (the stress sweep's). */
  rdsOnRatio: number;
  swr: number;
  harmonics?: readonly number[];
  /** Phases round the circle (default CLASS_E_LOAD_PHASES). */
  phases?: number;
}

const cx = (re: number, im = 0): Cx => ({ re, im });
const mul = (a: Cx, b: Cx): Cx => cx(a.re * b.re - a.im * b.im, a.re * b.im + a.im * b.re);
const add = (a: Cx, b: Cx): Cx => cx(a.re + b.re, a.im + b.im);
const div = (a: Cx, b: Cx): Cx => {
  const d = b.re * b.re + b.im * b.im;
  return cx((a.re * b.re + a.im * b.im) / d, (a.im * b.re - a.re * b.im) / d);
};

/**
 * The load at harmonic n of a load re + j im at the fundamental: its resistance with the reactance as a series
 * inductor (n X) or capacitor (X / n). A lumped model (an antenna's impedance at harmonics is its own); the class-E
 * simulation takes its load the same way.
 */
export const lumpedLoadAt = (z: Cx) => (n: number): Cx => cx(z.re, z.im >= 0 ? n * z.im : z.im / n);

/**
 * The series network of loaded Q `ql` at harmonic n, normalised to the drain load: j(QL n − (QL − X_excess)/n)
 * (L0 = QL R/ω, 1/(ωC0) = (QL − X_excess) R, class-e-sim.ts).
 */
const seriesAt = (ql: number, n: number): Cx => cx(0, ql * n - (ql - CLASS_E_EXCESS) / n);

/** Source: definition of the decibel for amplitude ratios, 20 log10. */
const dbOf = (r: number) => (r > 10 ** (MIN_DBC / 20) ? 20 * Math.log10(r) : MIN_DBC);

/** An antenna load and the load the filter as built presents at its input for it, at the fundamental (Ω). */
export interface FilterLoad {
  /** Reflection phase of the antenna load against the filter's design load r0, degrees; null = r0 itself. */
  phaseDeg: number | null;
  antenna: Cx;
  input: Cx;
}

/**
 * The antenna at the filter's design load r0 (first) and round the circle of `swr` at `phases` reflection phases
 * (every 360/phases degrees from 0), each with the filter's input impedance at f0.
 */
export function loadsThroughFilter(ladder: Ladder, frequencyHz: number, swr: number, phases: number): FilterLoad[] {
  const r0 = ladder.r0Ohm;
  const [a, b, c, d] = chainMatrix(ladder, frequencyHz);
  // Source: two-port chain (ABCD) relations, circuit theory: Z_in = (A Z_L + B)/(C Z_L + D)
  const through = (zl: Cx): FilterLoad['input'] => div(add(mul(a, zl), b), add(mul(c, zl), d));
  const out: FilterLoad[] = [{ phaseDeg: null, antenna: cx(r0), input: through(cx(r0)) }];
  for (let i = 0; i < phases; i++) {
    const phaseDeg = (360 * i) / phases;
    const g = loadOnCircle(swr, phaseDeg);
    const zl = cx(g.re * r0, g.im * r0);
    out.push({ phaseDeg, antenna: zl, input: through(zl) });
  }
  return out;
}

/**
 * The stage at each antenna load, the design load r0 and the SWR circle at reflection phases every
 * 360/CLASS_E_LOAD_PHASES degrees, for loaded Q CLASS_E_QL and CLASS_E_QL_LOW, and each harmonic at the antenna.
 */
export function classELoadBands(inp: ClassELoadInput): ClassELoadBands {
  const ns = inp.harmonics ?? [2, 3, 4, 5];
  const f0 = inp.frequencyHz;
  const points: ClassELoadPoint[] = [];
  const phases = inp.phases ?? CLASS_E_LOAD_PHASES;
  for (const { phaseDeg, antenna: zl, input: zin } of loadsThroughFilter(inp.ladder, f0, inp.swr, phases)) {
    // referred to the drain as a fraction of the design load (the transformer scales both alike)
    const z = cx(zin.re / inp.loadOhm, zin.im / inp.loadOhm);
    for (const ql of [CLASS_E_QL, CLASS_E_QL_LOW]) {
      const e = simulateClassE(z.re, z.im, inp.rdsOnRatio, 0.5, ql);
      // the drain's harmonic voltage drives the series network and the load the simulation saw: E_n = I_n (Z_s + Z_n)
      // (Ohm's law; the drain waveform taken as unchanged by the filter's different impedance at harmonics, which the
      // series network's high reactance there keeps small), in load-side ohms through the transformer
      const simLoad = lumpedLoadAt(z);
      const drainV = (n: number) => {
        const s = add(seriesAt(ql, n), simLoad(n));
        return (n === 1 ? 1 : e.loadHarmonics[n - 1]) * Math.hypot(s.re, s.im);
      };
      const zsAt = (n: number) => {
        const s = seriesAt(ql, n);
        return cx(s.re * inp.loadOhm, s.im * inp.loadOhm);
      };
      const rows = harmonicsFromSource(inp.ladder, f0, 'thevenin', zsAt, ns, lumpedLoadAt(zl));
      const levels = rows.map((r) => ({ n: r.n, dbc: dbOf(drainV(r.n) / drainV(1)) - r.relativeAttenuationDb }));
      points.push({
        phaseDeg, loadedQ: ql, antennaReOhm: zl.re, antennaImOhm: zl.im, drainLoadRe: z.re, drainLoadIm: z.im, levels,
      });
    }
  }
  return { swr: inp.swr, phases, loadedQ: [CLASS_E_QL_LOW, CLASS_E_QL], points };
}

/**
 * Where a band's end lies, in words for a builder: "SWR 2 at the antenna, reflection phase 120° (25.0 + j38.0 Ω),
 * loaded Q 5"; null = the stage into exactly its design load (its own band over loaded Q).
 */
function endText(p: ClassELoadPoint | null, swr: number): string {
  if (!p) return 'the stage into its design load';
  const sign = p.antennaImOhm < 0 ? '−' : '+';
  const z = `${p.antennaReOhm.toFixed(1)} ${sign} j${Math.abs(p.antennaImOhm).toFixed(1)} Ω`;
  const where = p.phaseDeg === null ? `the design load at the antenna (${z}) through the filter as built`
    : `SWR ${swr} at the antenna, reflection phase ${p.phaseDeg}° (${z})`;
  return `${where}, loaded Q ${p.loadedQ}`;
}

/**
 * The class-E bands (at the design load, over loaded Q) widened to the levels over the circle's loads. The bands are
 * judged through the filter's rejection from the stage's own source into the design load, `rejectSourceDb`; a load's
 * level at the antenna L enters as the equivalent source level L + rejectSource, so the compliance row reads L at
 * the antenna. A push-pull pair's even harmonics are each half's times the stated imbalance ε/2, typical for the best
 * end and worst for the worst (as pa-spectrum takes them at the design load).
 */
export function foldClassELoads(
  bands: readonly HarmonicBand[], loads: ClassELoadBands, rejectSourceDb: (n: number) => number | null,
  pushPullImbalance: { typical: number; worst: number } | null = null,
): HarmonicBand[] {
  return bands.map((band) => {
    const rs = rejectSourceDb(band.n);
    const out: HarmonicBand = { ...band, bestLoad: endText(null, loads.swr), worstLoad: endText(null, loads.swr) };
    if (rs === null || loads.points.length === 0) return out;
    out.basis = 'class-e-over-loads';
    const even = band.n % 2 === 0 && pushPullImbalance !== null;
    // Source: linear superposition of the halves (1 ± ε/2): even harmonic ε a_n against the fundamental 2 a_1
    const bestShift = even ? dbOf(pushPullImbalance.typical / 2) : 0;
    const worstShift = even ? dbOf(pushPullImbalance.worst / 2) : 0;
    for (const p of loads.points) {
      const l = p.levels.find((x) => x.n === band.n);
      if (!l) continue;
      const equivalent = l.dbc + rs;
      if (equivalent + worstShift > out.worstDbc) {
        out.worstDbc = equivalent + worstShift;
        out.worstLoad = endText(p, loads.swr);
      }
      if (equivalent + bestShift < out.bestDbc) {
        out.bestDbc = Math.max(MIN_DBC, equivalent + bestShift);
        out.bestLoad = endText(p, loads.swr);
      }
    }
    return out;
  });
}

/** "the design load and SWR 2 at 12 phases (every 30°) at the antenna, loaded Q 30 to 5". */
export function loadsCoveredText(loads: ClassELoadBands): string {
  return `the design load and SWR ${loads.swr} at ${loads.phases} phases (every ${360 / loads.phases}°) at the ` +
    `antenna, loaded Q ${loads.loadedQ[1]} to ${loads.loadedQ[0]}`;
}

/**
 * The class-E stage's bands over the loads it meets, for the compliance rows: the loads' levels (classELoadBands)
 * folded into the design load's bands (foldClassELoads), and which loads they cover in words.
 */
export function classEOverLoads(
  spectrum: { bands: readonly HarmonicBand[]; imbalanceTypical: number; imbalanceWorst: number },
  inp: ClassELoadInput & { pushPull: boolean }, rejectSourceDb: (n: number) => number | null,
): { bands: HarmonicBand[]; loads: ClassELoadBands; loadsCovered: string } {
  const loads = classELoadBands({ ...inp, harmonics: inp.harmonics ?? spectrum.bands.map((b) => b.n) });
  const imbalance = inp.pushPull ? { typical: spectrum.imbalanceTypical, worst: spectrum.imbalanceWorst } : null;
  const bands = foldClassELoads(spectrum.bands, loads, rejectSourceDb, imbalance);
  return { bands, loads, loadsCovered: loadsCoveredText(loads) };
}
