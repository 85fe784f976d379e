// Entry point of the RF engine: PA, filter, relay, harmonics and exposure for a project.
import { type Finding, sortFindings } from '../findings';
import type { Project, Stage } from '../model';
import { evaluateExposure } from './exposure';
import { harmonicCompliance, paHarmonicDbc } from './harmonics';
import { analyseLpf, harmonicsFromSource, inputImpedance, ladderOf } from './lpf-analysis';
import { lpfSwrFinding } from './lpf-swr-finding';
import { harmonicCurrentFinding, harmonicCurrentRatio, paSource } from './pa-source';
import { designLpf } from './lpf-design';
import { monteCarloLpf } from './lpf-monte-carlo';
import { validateRfInputs, validateRfSettings } from './lpf-validate';
import { evaluatePa } from './pa';
import { spectrumFindings } from './pa-spectrum-findings';
import { clipEstimateFinding, clipEstimates, clipOverdrive, foldClipping } from './pa-clip';
import { classEOverLoads } from './class-e-loads';
import { stressPower, type StressPower } from './stress-power';
import type { LpfStageResult, RfReport, RfStageResult } from './report';
import { lineMaxima, evaluateRelay } from './tr-relay';
import { fieldLabel } from './field-labels';
import { evaluateKeying } from './keying-eval';
import { realiseLpf } from './cores-check';
import { designOutputNetwork, feedChoke } from './output-network';
import { checkOutputTransformer, findCore, lpfCore } from './core-catalog';
import { classEShuntCapacitor, designPiNetwork, piFindings, type NetworkCore } from './pi-network';

export interface RfContext {
  /** Voltage per PA rail id (key-down trough from the supply design when known, else nominal), V. */
  paRailV: Record<string, number>;
  /** Highest voltage per PA rail id (high-mains no-load peak, full battery), V: judges the drain-voltage rating. */
  paRailMaxV?: Record<string, number>;
  /** Voltage per PA rail id at high mains key-down (mean), V: judges heating. */
  paRailHotV?: Record<string, number>;
  /** Lowest key-down voltage per PA rail id (low-mains trough, loaded battery end voltage), V. */
  paRailLowV?: Record<string, number>;
  /** PA rail ids fed from a battery (wording of the PA corner findings). */
  paRailBattery?: Record<string, boolean>;
  /** Optional progress of the filter Monte Carlo runs: (done, total) trials. */
  onMonteCarloProgress?: (done: number, total: number) => void;
  /** Air inside the enclosure (°C) when its rise is known: the PA's heatsink checks use it. */
  insideC?: number;
}

const finite = (x: number, fallback = 0) => (Number.isFinite(x) ? x : fallback);

/** The filter as built: the inductors' core is the catalog core chosen on the filter (its AL sets the turns), else the
 * one entered there. */
function designOf(p: NonNullable<Stage['lpf']>, project: Project) {
  const core = lpfCore(project, p);
  const d = designLpf(
    core?.from === 'catalog' && core.alHPerTurn2 !== null
      ? { ...p, coreAlHPerTurn2: core.alHPerTurn2, coreName: core.name }
      : p,
    project.frequencyHz,
  );
  return { core, d };
}

function lpfStage(
  stage: Stage,
  project: Project,
  powerW: number,
  ctx: RfContext,
): { res: LpfStageResult; findings: Finding[] } {
  const p = stage.lpf!;
  const { core, d } = designOf(p, project);
  const swr = Math.min(100, Math.max(1, finite(project.rf.worstSwr, 1)));
  const capacitorPeakV = lineMaxima(powerW, 50, swr).peakV;
  if (!d.ok) {
    return {
      res: { errors: d.errors, design: null, analysis: null, monteCarlo: null, capacitorPeakV, filterLossW: 0 },
      findings: d.errors.map((e) => ({
        severity: 'fail',
        rule: 'lpf.input',
        subject: `${stage.name}: ${fieldLabel(e.field)}`,
        value: null,
        limit: null,
        unit: '',
        source: 'design.input',
        message: e.message,
      })),
    };
  }
  const design = d.value;
  const analysis = analyseLpf(design);
  const monteCarlo = monteCarloLpf(design, {
    trials: p.monteCarloTrials,
    seed: p.seed,
    onProgress: ctx.onMonteCarloProgress,
  });
  const il = analysis.atOperating.lossDb;
  // Power balance of a two-port into a matched load: dissipated = P_avail (1 - |Gamma_in|^2 - |S21|^2), with
  // |Gamma| = (SWR - 1)/(SWR + 1) (definitions of S-parameters and SWR): reflected power is not heat
  const swrIn = analysis.atOperating.inputSwr;
  const gammaIn = (swrIn - 1) / (swrIn + 1);
  const filterLossW = Math.max(0, powerW * (1 - gammaIn ** 2 - 10 ** (-il / 10)));
  const s = stage.name;
  const f: Finding[] = [];
  f.push({
    severity: analysis.bandMaxLossDb > 1 ? 'caution' : 'ok',
    rule: 'lpf.passband',
    subject: s,
    value: analysis.bandMaxLossDb,
    limit: 1,
    unit: 'dB',
    source: 'lpf.abcd',
    message: `Loss across the band up to ${analysis.bandMaxLossDb.toFixed(2)} dB (${il.toFixed(2)} dB at the ` +
      `operating frequency, about ${filterLossW.toFixed(2)} W dissipated as heat).`,
  });
  // the filter's input SWR across the band against what its response allows by design (lpf-swr-finding)
  f.push(lpfSwrFinding(design, analysis, s));
  for (const e of design.elements) {
    // Common practice, no published source: keep as-built values within 5 % of ideal
    if (Math.abs(e.errorFraction) > 0.05) {
      f.push({
        severity: 'caution',
        rule: 'lpf.snap',
        subject: `${s}: ${e.kind === 'shunt-capacitor' ? 'C' : 'L'}${e.index}`,
        value: e.builtValue,
        limit: e.idealValue,
        unit: e.kind === 'shunt-capacitor' ? 'F' : 'H',
        source: 'lpf.snap',
        message: `Built value is ${(e.errorFraction * 100).toFixed(1)} % from ideal` +
          `${e.turns !== null && e.turns < 6 ? '; with so few turns a core with a lower AL gives finer steps' : ''}.`,
      });
    }
  }
  f.push({
    severity: 'caution',
    kind: 'standing',
    rule: 'lpf.capacitor-voltage',
    subject: s,
    value: capacitorPeakV,
    limit: null,
    unit: 'V',
    source: 'line.standing-wave',
    message: `Shunt capacitors can see about ${capacitorPeakV.toFixed(0)} V peak at SWR ${swr}; use RF-rated ` +
      `(silver-mica or C0G) parts rated well above it.`,
  });
  // the parts themselves: element stress at the most RF the PA delivers into the worst SWR, core flux, fit, resonance
  const real = realiseLpf(design, core, powerW, swr, s, p.capacitorRatedV ?? null, p.capacitorRatedA ?? null);
  f.push(...real.findings);
  if (p.coreId && !core) {
    f.push({
      severity: 'fail',
      rule: 'core.missing',
      subject: s,
      value: null,
      limit: null,
      unit: '',
      source: 'design.consistency',
      message:
        'The filter’s core is not in the project’s core catalog (deleted?) or its data there is refused: choose ' +
          'another on the filter form or correct the core; the flux is not checked.',
    });
  }
  return {
    res: { errors: [], design, analysis, monteCarlo, capacitorPeakV, filterLossW, realisation: real.realisation },
    findings: f,
  };
}

/** Evaluate all RF stages of a project. Never throws for bad data; problems become findings. */
export function evaluateRf(project: Project, ctx: RfContext): RfReport {
  const inputErrors = validateRfInputs(project.frequencyHz, project.targetPowerW);
  const all: Finding[] = inputErrors.map((e) => ({
    severity: 'fail',
    rule: 'rf.input',
    subject: e.field,
    value: null,
    limit: null,
    unit: '',
    source: 'design.input',
    message: e.message,
  }));
  for (const e of validateRfSettings(project.rf)) {
    all.push({
      severity: 'fail',
      rule: 'rf.settings',
      subject: e.field,
      value: null,
      limit: null,
      unit: '',
      source: 'design.input',
      message: e.message,
    });
  }
  const frequencyHz = finite(project.frequencyHz);
  const targetPowerW = Math.max(0, finite(project.targetPowerW));
  const stages: RfStageResult[] = [];
  const paStage = project.stages.find((s) => s.kind === 'final' && s.pa);
  const lpfStageDef = project.stages.find((s) => s.kind === 'lpf' && s.lpf);
  let paPowerW = targetPowerW;
  // Component stress (filter capacitors and heat, relay contacts, receiver leakage) is judged at the most RF the PA
  // delivers: high mains or a full battery. Common practice, no published source (worst-case design).
  let paStressW = targetPowerW;
  // RF exposure is taken at the design drive's output at high mains or a full battery (not the stage's most)
  let paHotW = targetPowerW;
  let stress: StressPower | null = null;
  const okFreq = inputErrors.every((e) => e.field !== 'frequencyHz');
  let paRefused = false;
  // the filter's input impedance at each harmonic (as built, into its design termination): a class B/C stage is
  // balanced against it at the clipping loads of the SWR circle (pa-clip-balance)
  const early = lpfStageDef?.lpf && okFreq ? designOf(lpfStageDef.lpf, project).d : null;
  const filterLadder = early?.ok ? ladderOf(early.value) : null;
  const filterInputOhmAt = filterLadder ? (n: number) => inputImpedance(filterLadder, n * frequencyHz) : undefined;

  for (const st of project.stages) {
    if (st.kind === 'final' && st.pa) {
      const pa = evaluatePa(st.pa, finite(ctx.paRailV[st.pa.railId] ?? NaN), project, st.name, {
        maxRailV: ctx.paRailMaxV?.[st.pa.railId],
        hotRailV: ctx.paRailHotV?.[st.pa.railId],
        lowRailV: ctx.paRailLowV?.[st.pa.railId],
        source: ctx.paRailBattery?.[st.pa.railId] ? 'battery' : 'mains',
        worstSwr: project.rf.worstSwr,
        frequencyHz: project.frequencyHz,
        insideC: ctx.insideC,
        filterInputOhmAt,
        // the SWR circle at the antenna, each load through the filter as built (absent: at the PA's output)
        ...(filterLadder ? { filterLadder } : {}),
        ...(early?.ok ? { filterDesign: early.value } : {}),
      });
      if (st === paStage && pa.outputW > 0) {
        paPowerW = pa.outputW;
        paHotW = Math.max(pa.outputW, finite(pa.hotOutputW));
        // the parts take the most the stage delivers as built: saturated drive or round the worst-SWR circle
        stress = stressPower({
          hotDesignW: paHotW,
          designW: pa.waveform?.designOutputW ?? null,
          bandMaxW: pa.waveform?.bandMaxOutputW ?? null,
          circleMax: pa.swr?.maxOutput ?? null, swr: pa.swr?.swr ?? 1, model: pa.waveform?.model ?? null,
          battery: ctx.paRailBattery?.[st.pa.railId] === true,
        });
        paStressW = stress.powerW;
      }
      // a single-ended stage: its L network (when a network sets the drain load)
      // on the filter's core, and its feed choke
      const single = !pa.refused && st.pa.topology === 'single-ended' && pa.primaryOhm > 0 && frequencyHz > 0;
      const lp = lpfStageDef?.lpf;
      // the network's inductor: on the PA's chosen catalog core, else on the filter's core (catalog or entered AL)
      const lpAl = lp ? (findCore(project, lp.coreId)?.alHPerTurn2 ?? lp.coreAlHPerTurn2) : null;
      const netAl = findCore(project, st.pa.outputCoreId)?.alHPerTurn2 ?? lpAl;
      const netCore: NetworkCore | null =
        netAl !== null
          ? { alHPerTurn2: netAl, series: lp?.capacitorSeries ?? 'E12', pairs: lp?.allowParallelPairs ?? true }
          : null;
      const network =
        single && pa.turnsRatioSource === 'network'
          ? designOutputNetwork(st.pa, pa.primaryOhm, frequencyHz, netCore)
          : null;
      const byNetwork = !pa.refused && pa.turnsRatioSource === 'network' && pa.primaryOhm > 0 && frequencyHz > 0;
      const pi = byNetwork
        ? designPiNetwork(pa.primaryOhm, st.pa.loadOhm, frequencyHz, st.pa.topology === 'push-pull', netCore)
        : null;
      // class E: each switch's shunt capacitance (half the drain-to-drain load per half of a push-pull pair)
      const classEShunt =
        !pa.refused && st.pa.amplifierClass === 'E' && pa.primaryOhm > 0
          ? classEShuntCapacitor(
              st.pa.topology === 'push-pull' ? pa.primaryOhm / 2 : pa.primaryOhm,
              frequencyHz,
              st.pa.deviceCossF ?? null,
              lp?.capacitorSeries ?? 'E12',
            )
          : null;
      // the output transformer on its catalog core: flux at the PA's highest output and the windings' fit
      const ot =
        !pa.refused && pa.turnsRatioSource !== 'network'
          ? checkOutputTransformer(
              project,
              st.pa,
              pa.primaryOhm,
              // into the design load the primary's voltage is √(P R): the saturated drive at the highest supply
              stressPower({
                hotDesignW: Math.max(pa.outputW, finite(pa.hotOutputW)),
                designW: pa.waveform?.designOutputW ?? null,
                bandMaxW: pa.waveform?.bandMaxOutputW ?? null,
                circleMax: null, swr: 1, battery: false,
              }).powerW,
              pa.turnsRatio,
              st.name,
            )
          : { check: null, findings: [] };
      const choke = single ? feedChoke(pa.primaryOhm, frequencyHz, pa.keyDownCurrentA) : null;
      stages.push({
        stageId: st.id,
        stageName: st.name,
        kind: 'final',
        pa,
        lpf: null,
        relay: null,
        network,
        pi,
        classEShunt,
        choke,
        outputTransformer: ot.check,
        findings: sortFindings([...pa.findings, ...ot.findings, ...(pi ? piFindings(pi, st.name) : [])]),
      });
      if (st === paStage) paRefused = pa.refused;
      if (st === paStage && pa.refused) {
        // the stress checks below need a power: say that they take the target instead of the PA's (unknown) output
        all.push({
          severity: 'caution',
          rule: 'rf.pa-unknown',
          subject: st.name,
          value: targetPowerW,
          limit: null,
          unit: 'W',
          source: 'design.consistency',
          message: `The PA output is unknown (its data is refused), so the filter, relay, harmonic and exposure ` +
            `checks use the ${targetPowerW} W target power instead.`,
        });
      }
    }
  }
  let lpfRes: LpfStageResult | null = null;
  for (const st of project.stages) {
    if (st.kind === 'lpf' && st.lpf && okFreq) {
      const { res, findings } = lpfStage(st, project, paStressW, ctx);
      if (st === lpfStageDef) lpfRes = res;
      stages.push({
        stageId: st.id,
        stageName: st.name,
        kind: 'lpf',
        pa: null,
        lpf: res,
        relay: null,
        findings: sortFindings(findings),
      });
    }
  }
  const passbandLossDb = lpfRes?.analysis?.atOperating.lossDb ?? 0;
  // Source: definition of insertion loss in dB: P_out = P_in 10^(-IL/10)
  const outputPowerW = paPowerW * 10 ** (-passbandLossDb / 10);
  const topology = paStage?.pa?.topology ?? 'single-ended';
  const evenDbc = Math.min(0, Math.max(-120, finite(project.rf.evenHarmonicDbc, 0)));
  // Amplitude ratio from dBc: 10^(dBc/20) (definition of the decibel for voltages)
  // The PA's harmonic bands by class when there is a PA, else the square-wave / entered-residual estimate
  // the bands of the PA's own waveform (the one that gave its power and key-down current)
  const spectrum =
    paStage?.pa && !paRefused ? (stages.find((x) => x.stageId === paStage.id)?.pa?.spectrum ?? null) : null;
  if (spectrum && paStage) all.push(...spectrumFindings(paStage.pa!, spectrum, paStage.name));
  const levelDbc = (n: number) =>
    spectrum?.bands.find((b) => b.n === n)?.worstDbc ?? paHarmonicDbc(topology, evenDbc, n).dbc;
  const harmonicAmplitudeSum = [2, 3, 4, 5].reduce((a, n) => a + 10 ** (levelDbc(n) / 20), 0);
  for (const st of project.stages) {
    if (st.kind === 'tr' && st.relay) {
      const relay = evaluateRelay(st.relay, {
        powerW: st.relay.position === 'before-lpf' ? paStressW : paStressW * 10 ** (-passbandLossDb / 10),
        swr: finite(project.rf.worstSwr, 1),
        harmonicAmplitudeSum,
        subject: st.name,
      });
      // keying from the relay's own data (speed, delay, edges), once that data is accepted
      const keyed = relay.findings.some((f) => f.rule === 'relay.input') ? null : evaluateKeying(st.relay, st.name);
      stages.push({
        stageId: st.id,
        stageName: st.name,
        kind: 'tr',
        pa: null,
        lpf: null,
        relay,
        keying: keyed?.result ?? null,
        findings: sortFindings([...relay.findings, ...(keyed?.findings ?? [])]),
      });
    }
  }
  if (stress && paStressW > paPowerW * 1.001) {
    // Say which power the stress figures are for, so they do not look inconsistent with the PA's nominal output
    const note = ` Figures at ${stress.text}.`;
    const stressed = new Set([
      'lpf.capacitor-voltage',
      'lpf.passband',
      'lpf.capacitor-rating',
      'lpf.capacitor-current',
      'core.flux',
      'relay.rf-voltage',
      'relay.rf-current',
      'relay.isolation',
    ]);
    for (const st of stages) {
      st.findings = st.findings.map((f) =>
        stressed.has(f.rule) ? { ...f, message: `${f.message}${note}` } : f,
      );
      if (st.relay) st.relay.findings = st.findings.filter((f) => f.rule.startsWith('relay.'));
    }
  }
  for (const s of stages) all.push(...s.findings);
  if (!paStage) {
    all.push({
      severity: 'caution',
      rule: 'rf.no-pa',
      subject: 'Final amplifier',
      value: null,
      limit: null,
      unit: '',
      source: 'design.consistency',
      message: 'No final amplifier stage with PA settings: harmonics, relay and exposure use the target power instead.',
    });
  }
  // the PA's source impedance at each harmonic into the filter (issue item: not 50 Ω for a switching stage)
  const paRes = stages.find((x) => x.stageId === paStage?.id)?.pa ?? null;
  const src = paStage?.pa && paRes && !paRes.refused && paRes.primaryOhm > 0 && lpfRes?.design
    ? paSource({
      pa: paStage.pa, primaryOhm: paRes.primaryOhm, peakDeviceA: paRes.peakDeviceA,
      classESimulated: spectrum?.bands.some((b) => String(b.basis) === 'class-e-simulated') ?? false,
    })
    : null;
  const sourced = src && lpfRes?.design
    ? { label: src.label, rows: harmonicsFromSource(ladderOf(lpfRes.design), frequencyHz, src.kind, src.zsAt) }
    : null;
  // a class B/C stage clips into the SWR circle's loads above its design load (worst at reflection phase 0, |z| = S):
  // its flat-topped harmonics there, through the filter into that load, fold into the bands' worst end (pa-clip)
  const swrWorst = Math.min(100, Math.max(1, finite(project.rf.worstSwr, 1)));
  const cls = paStage?.pa?.amplifierClass;
  // class E: its waveform changes with the load it meets, so each harmonic is also taken with the antenna at its design
  // load and round the worst-SWR circle, the stage into the filter's input impedance, relative to the fundamental there
  const paSwr = paRes?.swr ?? null;
  const overLoads = spectrum && sourced && lpfRes?.design && cls === 'E' && paStage?.pa && paSwr && paSwr.swr > 1
    && paSwr.classERdsOnRatio !== null
    ? classEOverLoads(spectrum, {
      ladder: ladderOf(lpfRes.design), frequencyHz, loadOhm: paStage.pa.loadOhm, rdsOnRatio: paSwr.classERdsOnRatio,
      swr: paSwr.swr, pushPull: paStage.pa.topology === 'push-pull',
    }, (n) => sourced.rows.find((r) => r.n === n)?.relativeAttenuationDb ?? null)
    : null;
  const bands = spectrum && sourced && lpfRes?.design && (cls === 'B' || cls === 'C') && swrWorst > 1
    ? (() => {
      const l = ladderOf(lpfRes.design);
      const clipped = harmonicsFromSource(l, frequencyHz, 'thevenin', () => ({ re: 0, im: 0 }), [2, 3, 4, 5],
        () => ({ re: swrWorst * l.r0Ohm, im: 0 }));
      const rej = (rows: { n: number; relativeAttenuationDb: number }[]) => (n: number) =>
        rows.find((r) => r.n === n)?.relativeAttenuationDb ?? null;
      // the flat top at the largest load the stage meets (through the filter it can exceed the SWR; pa-clip)
      const overdrive = clipOverdrive(swrWorst, paRes?.swr);
      const folded = foldClipping(spectrum.bands, overdrive, rej(sourced.rows), rej(clipped));
      // beside the flat-topped upper end: the stage balanced against the filter at reflection phase 0 (pa-swr)
      const ratios = paRes?.swr?.clip?.drainHarmonicsAtPhase0;
      const est = ratios ? clipEstimates(folded, ratios, overdrive, rej(clipped)) : [];
      const note = paStage ? clipEstimateFinding(est, swrWorst, l.r0Ohm, paStage.name) : null;
      if (note) all.push(note);
      return folded;
    })()
    : spectrum?.bands;
  const judged = overLoads ? overLoads.bands : bands;
  const band3 = spectrum?.bands.find((b) => b.n === 3);
  if (src && src.kind === 'thevenin' && lpfRes?.design && paStage && band3) {
    // a voltage-switching stage: the 3rd harmonic current the filter's input takes (worst end of the source band)
    const l = ladderOf(lpfRes.design);
    // Source: definition of the decibel for voltages, ratio = 10^(dBc/20)
    const e3 = 10 ** (band3.worstDbc / 20);
    const ratio = harmonicCurrentRatio(src.zsAt, (n) => inputImpedance(l, n * frequencyHz), 3, e3);
    const f = harmonicCurrentFinding(ratio, 3, paStage.name);
    if (f) all.push(f);
  }
  const harmonics =
    okFreq && targetPowerW > 0
      ? harmonicCompliance({
          rule: project.rf.spuriousRule,
          topology,
          evenHarmonicDbc: evenDbc,
          fundamentalW: outputPowerW,
          frequencyHz,
          passbandLossDb,
          filter: lpfRes?.analysis ? lpfRes.analysis.harmonics : null,
          monteCarlo: lpfRes?.monteCarlo ?? null,
          ...(judged ? { spectrum: judged } : {}),
          ...(sourced ? { source: sourced } : {}),
          ...(overLoads ? { loadsCovered: overLoads.loadsCovered } : {}),
        })
      : null;
  if (harmonics) all.push(...harmonics.findings);
  if (frequencyHz >= 30e6) {
    all.push({
      severity: 'caution',
      rule: 'spurious.range',
      subject: 'Spurious-emission rule',
      value: frequencyHz,
      limit: 30e6,
      unit: 'Hz',
      source: project.rf.spuriousRule === 'us-97-307' ? 'spurious.us-97-307e' : 'spurious.itu-range',
      message: 'The spurious-emission limits used here apply below 30 MHz; other limits apply at this frequency.',
    });
  }
  // RF exposure is a safety estimate: the most the station radiates (high mains or a full battery), not the nominal
  // output. Source: OET Bulletin 65 Supplement B (1997), averaging starts from the transmitter PEP (ref
  // §2.3; "worst case" wording from memory).
  const battery = paStage?.pa ? ctx.paRailBattery?.[paStage.pa.railId] === true : false;
  const exposure = okFreq ? evaluateExposure(paHotW * 10 ** (-passbandLossDb / 10), frequencyHz, project.rf) : null;
  if (exposure) all.push(...exposure.findings);
  return {
    frequencyHz,
    targetPowerW,
    outputPowerW,
    paStageId: paStage?.id ?? null,
    lpfStageId: lpfStageDef?.id ?? null,
    inputErrors,
    ruleSet: project.rf.spuriousRule,
    stages,
    harmonics,
    exposure,
    powerBasis: {
      parts: stress,
      exposure: `RF exposure: at ${(paHotW * 10 ** (-passbandLossDb / 10)).toPrecision(3)} W at the antenna, the ` +
        `design drive's output at ${battery ? 'a full battery' : 'high mains'} after the filter.`,
      spurious: `Spurious emissions: relative to ${outputPowerW.toPrecision(3)} W, the design output after the ` +
        'filter.',
    },
    findings: sortFindings(all),
  };
}
