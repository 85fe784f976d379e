// The PA rail's keying transient: the rail at nominal mains, resting at its key-up level, keyed with a dot train at
// the project's CW speed. The reservoir holds the key-up voltage for the first elements and sags to the key-down
// level over a few mains cycles, so the first elements come out stronger than the PA settles to.
import { sortFindings, type Finding } from '../findings';
import type { Project, RectifiedRail, Winding } from '../model';
import type { BudgetReport } from '../budget';
import type { RfReport } from '../rf';
import type { SupplyReport } from './report-types';
import { railLoadModel, type PaOperatingPoint, type RailLoadModel } from './rail-load-model';
import { KeyingSimulator, runKeying, steadyCycle, type KeyingCircuit, type KeyingSchedule } from './keying-sim';
import { noLoadVrms, windingLeakage, windingResistanceOhm } from './winding';
import { dotLengthS } from '../rf/tr-relay';

/** First elements this much above the settled key-down output are reported (dB). Common practice, no published
 * source: the same 1 dB as the PA's own power checks. */
export const HOT_ELEMENT_LIMIT_DB = 1;

/** Integration steps per mains cycle: within 1 % of ngspice on the club demo (test/core/power/keying-transient). */
export const TRANSIENT_STEPS_PER_CYCLE = 200;

/** Keyed time simulated: dots until at least this long, between MIN and MAX elements (s). Common practice, no
 * published source: a reservoir rail settles within a few mains cycles, well inside half a second. */
const MIN_TRAIN_S = 0.4;
const MIN_ELEMENTS = 3;
const MAX_ELEMENTS = 10;
/** Plot samples over the whole run (count). */
const PLOT_POINTS = 480;

export interface KeyingElement {
  /** 1 = the first dot (count). */
  index: number;
  startS: number;
  endS: number;
  /** Rail voltage while the element is keyed: mean and lowest (V). */
  meanV: number;
  minV: number;
  /** Mean PA output over the element (W), and relative to the held key's output (dB). */
  outputW: number;
  vsSteadyDb: number;
  /** Mean PA output over the element's leading edge, its first ripple period (W), and relative to the held key (dB). */
  leadOutputW: number;
  leadVsSteadyDb: number;
}

export interface KeyingTransient {
  stageName: string;
  /** Keying speed (WPM) and the T/R stage it was entered on. */
  wpm: number;
  wpmFrom: string;
  /** Dot length 1.2 / WPM (s). */
  dotS: number;
  /** Mains RMS simulated (V): nominal. */
  mainsV: number;
  /** Winding resistance and leakage inductance used, referred to the secondary (Ω, H). */
  windingOhm: number;
  leakageH: number;
  stepsPerCycle: number;
  /** Key-up periodic steady state, mean rail voltage (V). */
  keyUpMeanV: number;
  /** Continuous key-down periodic steady state: mean and trough (V) and the PA's mean output there (W). */
  keyDownMeanV: number;
  keyDownTroughV: number;
  steadyOutputW: number;
  elements: KeyingElement[];
  /** Length of the leading edge averaged for leadOutputW: one ripple period, 1/(2f) or 1/f half-wave (s). */
  leadS: number;
  /** The first element over the held key's output (dB): its leading edge (checked against limitDb) and its mean. */
  firstLeadDb: number;
  firstElementDb: number;
  limitDb: number;
  /** Rail voltage over the run, from the last key-up instants through the dot train (s, V, key state). */
  waveform: { timeS: number[]; railV: number[]; keyed: boolean[] };
  loadModel: RailLoadModel;
}

/** A dot train: `elements` dots of one unit with one-unit spaces, after `leadS` of key-up (ITU-R M.1677-1 ratios). */
export function dotTrain(dotS: number, elements: number, leadS: number): KeyingSchedule {
  const intervals = Array.from({ length: elements }, (_, i) => ({
    startS: leadS + 2 * i * dotS,
    endS: leadS + (2 * i + 1) * dotS,
  }));
  return { intervals, durationS: leadS + (2 * elements - 1) * dotS + dotS };
}

/** Elements simulated at a dot length (count). */
export function elementsFor(dotS: number): number {
  return Math.min(MAX_ELEMENTS, Math.max(MIN_ELEMENTS, Math.ceil(MIN_TRAIN_S / (2 * dotS))));
}

/** The circuit of a rectified rail at a mains factor. */
export function keyingCircuit(
  rail: RectifiedRail,
  winding: Winding,
  frequencyHz: number,
  mainsFactor: number,
  leakageH = 0,
): KeyingCircuit {
  return {
    topology: rail.topology,
    secondaryVrms: noLoadVrms(winding) * mainsFactor,
    windingOhm: windingResistanceOhm(winding),
    leakageH,
    frequencyHz,
    diodeDropV: rail.diodeDropV,
    diodeResistanceOhm: rail.diodeResistanceOhm,
    capacitanceF: rail.reservoirF,
    esrOhm: rail.esrOhm,
    bleederOhm: rail.bleederOhm,
  };
}

/** Simulate the transient; null when a steady state cannot be found (the rail collapses or the inputs are unusable). */
export function simulateKeyingTransient(
  circuit: KeyingCircuit,
  model: RailLoadModel,
  wpm: number,
  steps = TRANSIENT_STEPS_PER_CYCLE,
): Omit<KeyingTransient, 'stageName' | 'wpmFrom' | 'mainsV'> | null {
  const pa = model.keyDown.pa;
  if (!pa || !(wpm > 0) || !(circuit.frequencyHz > 0) || !(circuit.capacitanceF > 0)) return null;
  const sim = new KeyingSimulator(circuit, steps);
  const tol = 1e-4;
  const up = sim.steadyStartV(model.keyUp, 0.95 * Math.SQRT2 * circuit.secondaryVrms, tol);
  const down = sim.steadyStartV(model.keyDown, up.v, tol);
  if (!Number.isFinite(up.v) || !Number.isFinite(down.v) || !(down.v > 0)) return null;
  const upStats = steadyCycle(sim, model.keyUp, up.v);
  const downStats = steadyCycle(sim, model.keyDown, down.v);
  if (!(downStats.meanOutputW > 0)) return null;
  const dotS = dotLengthS(wpm);
  const period = 1 / circuit.frequencyHz;
  // key-up lead-in of whole mains cycles (about two dots, at least one cycle) so the plot shows the resting level
  const leadS = Math.max(1, Math.round((2 * dotS) / period)) * period;
  const n = elementsFor(dotS);
  const schedule = dotTrain(dotS, n, leadS);
  const totalSteps = Math.round(schedule.durationS / sim.h);
  const ripplePeriodS = circuit.topology === 'half-wave' ? period : period / 2;
  const edgeS = Math.min(ripplePeriodS, dotS);
  const run = runKeying(
    sim,
    model.keyUp,
    model.keyDown,
    schedule,
    up.v,
    Math.max(1, Math.floor(totalSteps / PLOT_POINTS)),
    edgeS,
  );
  // Source: definition of the decibel, 10 log10(P1 / P2)
  const db = (w: number) => 10 * Math.log10(Math.max(w, 1e-12) / downStats.meanOutputW);
  const elements = run.intervals.map((iv, i) => ({
    index: i + 1,
    startS: iv.startS - leadS,
    endS: iv.endS - leadS,
    meanV: iv.meanV,
    minV: iv.minV,
    outputW: iv.meanOutputW,
    vsSteadyDb: db(iv.meanOutputW),
    leadOutputW: iv.leadOutputW,
    leadVsSteadyDb: db(iv.leadOutputW),
  }));
  return {
    wpm,
    dotS,
    windingOhm: circuit.windingOhm,
    leakageH: sim.leakageH,
    stepsPerCycle: steps,
    keyUpMeanV: upStats.meanV,
    keyDownMeanV: downStats.meanV,
    keyDownTroughV: downStats.troughV,
    steadyOutputW: downStats.meanOutputW,
    elements,
    leadS: edgeS,
    firstLeadDb: elements[0]?.leadVsSteadyDb ?? NaN,
    firstElementDb: elements[0]?.vsSteadyDb ?? NaN,
    limitDb: HOT_ELEMENT_LIMIT_DB,
    waveform: { timeS: run.timeS.map((t) => t - leadS), railV: run.railV, keyed: run.keyed },
    loadModel: model,
  };
}

/** The keying speed entered on the project's T/R stage(s): the fastest, with the stage's name; null when none. */
export function projectWpm(project: Project): { wpm: number; from: string } | null {
  const relays = project.stages.filter((s) => s.relay && Number.isFinite(s.relay.wpm) && s.relay.wpm > 0);
  if (!relays.length) return null;
  const fastest = relays.reduce((a, b) => (b.relay!.wpm > a.relay!.wpm ? b : a));
  return { wpm: fastest.relay!.wpm, from: fastest.name };
}

const v2 = (x: number) => `${x.toFixed(1)} V`;

/** Attach every rail's load model, and the keying transient to every rectified rail feeding a PA, with its finding. */
export function withKeyingTransient(
  supply: SupplyReport | null,
  project: Project,
  budget: BudgetReport,
  rf: RfReport,
): SupplyReport | null {
  if (!supply) return supply;
  const speed = projectWpm(project);
  const added: Finding[] = [];
  const pas: PaOperatingPoint[] = rf.stages.flatMap((st) =>
    st.pa
      ? [
          {
            stageId: st.stageId,
            railV: st.pa.railV,
            outputW: st.pa.outputW,
            saturationV: st.pa.saturationV,
            efficiency: st.pa.efficiency,
            keyDownCurrentA: st.pa.keyDownCurrentA,
            refused: st.pa.refused,
          },
        ]
      : [],
  );
  const rails = supply.rails.map((r0) => {
    // every rail carries its load model; the rectified rails feeding a PA are keyed below
    const r = { ...r0, loadModel: railLoadModel(project, budget, r0.railId, pas) };
    if (r.kind !== 'rectified') return r;
    const stage = project.stages.find((s) => s.pa && s.pa.railId === r.railId);
    const railIn = project.supply.rails.find((x): x is RectifiedRail => x.kind === 'rectified' && x.id === r.railId);
    const transformer = project.supply.transformers.find((t) => t.windings.some((w) => w.id === railIn?.windingId));
    const winding = transformer?.windings.find((w) => w.id === railIn?.windingId);
    if (!stage || !railIn || !transformer || !winding) return r;
    const base = {
      rule: 'supply.keying-transient',
      subject: r.railName,
      unit: 'dB',
      source: 'supply.keying-transient' as const,
    };
    const model = r.loadModel;
    if (!project.mains) return r;
    if (!speed || !model) {
      const why = !speed
        ? 'no keying speed is entered (it is on the T/R relay stage)'
        : "a load on the rail or the PA's operating point is unknown";
      const f: Finding = {
        ...base,
        severity: 'ok',
        value: null,
        limit: null,
        message: `The keying transient of ${r.railName} is not simulated: ${why}.`,
      };
      added.push(f);
      return { ...r, keyingTransient: null, findings: sortFindings([...r.findings, f]) };
    }
    const f0 = project.mains!.frequencyHz;
    // the winding's leakage as entered, else split from its regulation figure (as the joint transformer simulation)
    const leakageH = windingLeakage(winding, transformer.construction, f0).henry;
    const sim = simulateKeyingTransient(keyingCircuit(railIn, winding, f0, 1, leakageH), model, speed.wpm);
    if (!sim) {
      const f: Finding = {
        ...base,
        severity: 'caution',
        value: null,
        limit: null,
        message: `The keying transient of ${r.railName} could not be simulated: the rail found no steady state with ` +
          `its loads.`,
      };
      added.push(f);
      return { ...r, keyingTransient: null, findings: sortFindings([...r.findings, f]) };
    }
    const kt: KeyingTransient = { ...sim, stageName: stage.name, wpmFrom: speed.from, mainsV: project.mains!.nominalV };
    const first = kt.elements[0];
    const hot = kt.firstLeadDb > HOT_ELEMENT_LIMIT_DB;
    const last = kt.elements[kt.elements.length - 1];
    const sdb = (x: number) => `${x >= 0 ? '+' : ''}${x.toFixed(1)} dB`;
    const ms = (x: number) => `${(x * 1e3).toFixed(0)} ms`;
    const f: Finding = {
      ...base, severity: hot ? 'caution' : 'ok', value: kt.firstLeadDb, limit: HOT_ELEMENT_LIMIT_DB,
      message: `Keyed at ${kt.wpm} WPM (dots of ${ms(kt.dotS)}) from rest at nominal mains, ${r.railName} falls from ` +
        `${v2(kt.keyUpMeanV)} key-up towards ${v2(kt.keyDownMeanV)} with the key held. ${stage.name} gives about ` +
        `${first.leadOutputW.toFixed(1)} W over the first ${ms(kt.leadS)} of the first dot, ${sdb(kt.firstLeadDb)}` +
        ` against the ` +
        `${kt.steadyOutputW.toFixed(1)} W of a held key (${sdb(kt.firstElementDb)} over the whole dot; dot ` +
        `${last.index}: ` +
        `${sdb(last.leadVsSteadyDb)} at its start, ${sdb(last.vsSteadyDb)} over the dot)` +
        (hot
          ? `. The elements start hot: a transformer with less regulation (a larger one) or a regulated PA supply ` +
            `keeps them level; more reservoir capacitance makes the sag slower, not smaller.`
          : `; within ${HOT_ELEMENT_LIMIT_DB} dB.`),
    };
    added.push(f);
    return { ...r, keyingTransient: kt, findings: sortFindings([...r.findings, f]) };
  });
  return { ...supply, rails, findings: sortFindings([...supply.findings, ...added]) };
}
