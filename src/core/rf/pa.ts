// Final amplifier: output power, turns ratio, DC input, dissipation, heatsink and device ratings.
import type { Finding } from '../findings';
import type { PaParams, Project } from '../model';
import { MIN_TARGET_POWER_W, validatePaParams, validateThermalInputs } from './lpf-validate';
import { operatingPoint, peakDrainFactor, PRACTICAL_RATIOS, primaryOhmForPower } from './pa-load-line';
import { paThermal, type PaThermal } from './pa-thermal';
import { fieldLabel } from './field-labels';
import { swrStress, whereLoad, type PaSwrStress } from './pa-swr';
import { drainHarmonicLoad } from './pa-clip-balance';
import type { Cx, Ladder } from './lpf-analysis';
import type { LpfDesign } from './lpf-design';
import { loadsThroughFilter } from './class-e-loads';
import { filterLoadFindings } from './pa-filter-load';
import { paSpectrum, switchingPowerShape, type PaSpectrum } from './pa-spectrum';
import { bandFigures, budgetDriveLabel, idealEfficiency, swrKeyDownCurrent, type PaWaveformSummary } from './pa-dc';
import { waveformFindings } from './pa-spectrum-findings';
import { classEShuntFindings, swrFindings } from './pa-swr-findings';
import { clampFindings, drainClamp, type DrainClamp } from './pa-clamp';
import { usablePositive } from '../numeric';
import { insideNote } from '../thermal/inside';

/** Drain efficiency used when none is entered. Common practice, no published source (ref §8.2 ranges). */
export const DEFAULT_EFFICIENCY: Record<PaParams['amplifierClass'], number> = { B: 0.6, C: 0.7, D: 0.8, E: 0.85 };

export interface RatioOption {
  /** "primary:secondary" turns. */
  label: string;
  /** Secondary / full primary turns. */
  turnsRatio: number;
  /** Drain load referred to the full primary, ohms. */
  primaryOhm: number;
  /** Output power with this ratio, W. */
  outputW: number;
}

export interface PaResult {
  /** Supply voltage used (key-down trough when known), V. */
  railV: number;
  /** Saturation drop used (entered, or Rds(on) x peak current after iteration), V. */
  saturationV: number;
  /** Secondary / full primary turns ratio in use. */
  turnsRatio: number;
  /** 'network': the drain load is set by an L/pi network (networkLoadOhm); turnsRatio is then its equivalent. */
  turnsRatioSource: 'entered' | 'designed' | 'network';
  /** Exact ratio for the target power (design mode), else null. */
  idealTurnsRatio: number | null;
  /** Practical ratios with the power each gives (design mode: all; entered: empty). */
  ratioOptions: RatioOption[];
  /** Drain load referred to the full primary (drain to drain for push-pull), ohms. */
  primaryOhm: number;
  /** Output power into the load, W. */
  outputW: number;
  /** Output power in dBm and dBW (-999 when there is no output). */
  outputDbm: number;
  outputDbw: number;
  /** Output relative to referencePowerW, dB, and in S-units (6 dB each, common practice). */
  vsReferenceDb: number;
  vsReferenceSUnits: number;
  /** Drain efficiency used (fraction, 0.7 = 70 %). */
  efficiency: number;
  /** 'class-default' = DEFAULT_EFFICIENCY (common practice, no published source). */
  efficiencySource: 'entered' | 'class-default';
  /** DC input power key-down (RF part only), W. */
  dcInputW: number;
  /**
   * Key-down DC current including bias idle current, A: the band's most (hard saturation, pa-spectrum), what the
   * supply budget carries; the design drive's is waveform.designCurrentA (plus the bias).
   */
  keyDownCurrentA: number;
  /** Key-down DC current into the worst load of the SWR circle (with bias), A; null at SWR 1 or when refused. */
  swrKeyDownCurrentA: number | null;
  /** What the waveform gives: design and band-maximum output and DC current, ideal efficiency, class D edges. */
  waveform: PaWaveformSummary | null;
  /** The harmonic bands of the same waveform, with the inputs assumed (null when refused). */
  spectrum: Omit<PaSpectrum, 'waveform'> | null;
  /** Drain peak, device current, dissipation and output round the circle of the worst SWR (null when refused). */
  swr: PaSwrStress | null;
  /** A fitted drain clamp: the peak it leaves and the power it takes (null/absent when none is entered). */
  clamp?: DrainClamp | null;
  /**
   * Highest supply voltage the drains can see (high mains with the PA unkeyed, or
   * a full battery), V; railV when unknown.
   */
  maxRailV: number;
  /** Supply voltage used for heating (high mains, key-down), V; railV when unknown. */
  hotRailV: number;
  /**
   * Lowest key-down supply voltage (low mains trough, flat battery), V, and the
   * output there, W; railV / outputW when unknown.
   */
  lowRailV: number;
  lowOutputW: number;
  /**
   * Output at the hot supply (hotRailV), W: the most RF the stage delivers at its design
   * drive, for filter, relay and heat checks.
   */
  hotOutputW: number;
  /** Peak drain voltage at the highest supply voltage (maxRailV), V, and peak current of one conducting device, A. */
  peakDrainV: number;
  peakDeviceA: number;
  /** Heating: dissipation (W), heatsink needed (K/W), junction temperatures (°C). */
  thermal: PaThermal;
  /** This stage's findings. */
  findings: Finding[];
  /** Core refused the inputs (the fail findings say which): every number above is a placeholder 0, not a result. */
  refused: boolean;
}

/**
 * Lowest PA supply voltage, V. Common practice, no published source: no transistor PA gives useful output below 1 V.
 */
export const MIN_PA_RAIL_V = 1;

/** Smallest reference power for the dB comparison, W. Common practice, no published source (1 nW = -60 dBm). */
const MIN_REFERENCE_POWER_W = 1e-9;

const SRC_LOADLINE = 'pa.load-line';

function zeroResult(railV: number, findings: Finding[]): PaResult {
  return {
    railV,
    maxRailV: railV,
    hotRailV: railV,
    lowRailV: railV,
    lowOutputW: 0,
    hotOutputW: 0,
    saturationV: 0,
    turnsRatio: 0,
    turnsRatioSource: 'entered',
    idealTurnsRatio: null,
    ratioOptions: [],
    primaryOhm: 0,
    outputW: 0,
    outputDbm: -999,
    outputDbw: -999,
    vsReferenceDb: -999,
    vsReferenceSUnits: -999 / 6,
    efficiency: 0,
    efficiencySource: 'entered',
    dcInputW: 0,
    keyDownCurrentA: 0,
    peakDrainV: 0,
    peakDeviceA: 0,
    thermal: {
      dissipationTotalW: 0,
      dissipationPerDeviceW: 0,
      averagePerDeviceW: 0,
      tjTargetC: 0,
      sharedBy: 1,
      thetaSaNeededAverageKPerW: null,
      thetaSaNeededContinuousKPerW: null,
      tjAverageC: null,
      tjContinuousC: null,
    },
    swr: null,
    swrKeyDownCurrentA: null,
    waveform: null,
    spectrum: null,
    findings,
    refused: true,
  };
}

const db = (x: number) => (x > 0 ? 10 * Math.log10(x) : -999);

/**
 * Supply corners beyond the operating point: the highest rail voltage (device
 * voltage stress) and the hot one (heating).
 */
export interface PaSupplyCorners {
  /** Air inside the enclosure (°C) when its rise is known: the heatsink and junction checks use it, not the room. */
  insideC?: number;
  /** Highest rail voltage while the PA can be keyed (high mains, no load; full battery), V. */
  maxRailV?: number;
  /** Rail voltage at high mains, key-down (mean), V: sets the heating. */
  hotRailV?: number;
  /** Lowest rail voltage under key-down (low-mains trough, battery at end of discharge under load), V. */
  lowRailV?: number;
  /** The project's worst-case SWR: device stress is judged round its circle; absent = the design load only. */
  worstSwr?: number;
  /**
   * Operating frequency, Hz: checks a class-E stage's shunt capacitance against the device's own; absent = no check.
   */
  frequencyHz?: number;
  /** What the rail comes from, for the wording of the findings; default 'mains'. */
  source?: 'mains' | 'battery';
  /**
   * The low-pass filter's input impedance at harmonic n ≥ 2 of the operating frequency (Ω, at the PA's output
   * terminals): a class B/C stage at the clipping loads of the SWR circle is then balanced against it
   * (pa-clip-balance); absent = its drain flat-topped at the rails (the upper end).
   */
  filterInputOhmAt?: (n: number) => Cx;
  /**
   * The low-pass filter as built (its r0Ohm the antenna's design load): the SWR circle is then drawn at the antenna
   * and the stage meets the filter's input impedance at the fundamental (with frequencyHz); absent = the circle at
   * the PA's output (no filter, or its data refused).
   */
  filterLadder?: Ladder;
  /** The same filter's design (ideal values, response, ripple): what its input SWR is by design. */
  filterDesign?: LpfDesign;
}

export function evaluatePa(
  pa: PaParams,
  railV: number,
  project: Pick<Project, 'targetPowerW' | 'ambientC' | 'keyingDuty'>,
  subject = 'Final amplifier',
  corners: PaSupplyCorners = {},
): PaResult {
  const errors = [...validatePaParams(pa), ...validateThermalInputs(project.ambientC, project.keyingDuty)];
  // A rail must be usable, not merely above 0: 1.5e-322 V passed `railV > 0` and made the heat quotients Infinity.
  if (!(usablePositive(railV, MIN_PA_RAIL_V) && railV <= 5000)) {
    errors.push({
      field: 'railId',
      message: `No usable supply voltage (at least ${MIN_PA_RAIL_V} V, at most 5 kV) is known for the PA rail.`,
    });
  }
  // The output is compared with it in dB: a reference of 5e-324 W passed `> 0` and gave Infinity dB.
  if (
    !usablePositive(pa.referencePowerW, MIN_REFERENCE_POWER_W) &&
    !errors.some((e) => e.field === 'referencePowerW')
  ) {
    errors.push({ field: 'referencePowerW', message: 'The reference power must be at least 1 nW.' });
  }
  const vsat0 = pa.saturationV ?? 0;
  if (errors.length === 0 && railV <= vsat0)
    errors.push({ field: 'saturationV', message: 'Saturation drop is not below the supply voltage.' });
  if (errors.length > 0) {
    return zeroResult(
      Number.isFinite(railV) ? railV : 0,
      errors.map((e) => ({
        severity: 'fail',
        rule: 'pa.input',
        subject: `${subject}: ${fieldLabel(e.field)}`,
        value: null,
        limit: null,
        unit: '',
        source: 'design.input',
        message: e.message,
      })),
    );
  }
  const findings: Finding[] = [];
  // 0 = no usable target (a subnormal one divided to Infinity dB): then a turns ratio must be entered (finding below)
  const target = usablePositive(project.targetPowerW, MIN_TARGET_POWER_W) ? project.targetPowerW : 0;
  let turnsRatio: number;
  let idealTurnsRatio: number | null = null;
  let ratioOptions: RatioOption[] = [];
  const network = pa.networkLoadOhm ?? null;
  if (network !== null) {
    // Source: impedance transformation, equivalent ratio sqrt(Z_load / Z_drain) (REFERENCE-VALUES §8.1)
    turnsRatio = Math.sqrt(pa.loadOhm / network);
  } else if (pa.turnsRatio !== null) {
    turnsRatio = pa.turnsRatio;
  } else if (target > 0) {
    // Source: impedance transformation N_s/N_p = sqrt(Z_s/Z_p) (REFERENCE-VALUES §8.1)
    idealTurnsRatio = Math.sqrt(
      pa.loadOhm / primaryOhmForPower(pa, railV, target, switchingPowerShape(pa, corners.frequencyHz)),
    );
    ratioOptions = PRACTICAL_RATIOS.map((r) => {
      const primaryOhm = pa.loadOhm / r.turnsRatio ** 2;
      return {
        ...r,
        primaryOhm,
        outputW: operatingPoint(pa, railV, primaryOhm, switchingPowerShape(pa, corners.frequencyHz)).outputW,
      };
    });
    const best = ratioOptions.reduce((a, b) =>
      Math.abs(db(b.outputW / target)) < Math.abs(db(a.outputW / target)) ? b : a,
    );
    turnsRatio = best.turnsRatio;
  } else {
    return zeroResult(railV, [
      {
        severity: 'fail',
        rule: 'pa.input',
        subject,
        value: target,
        limit: 0,
        unit: 'W',
        source: 'design.input',
        message: 'Enter a turns ratio or a target power above zero.',
      },
    ]);
  }
  // Source: impedance transformation Z_p = Z_s / (N_s/N_p)^2 (REFERENCE-VALUES §8.1)
  const primaryOhm = network ?? pa.loadOhm / turnsRatio ** 2;
  const fixWord = network !== null ? "the network's drain load" : 'the turns ratio';
  // The stage's waveform (pa-spectrum): class D's switching edges lower its fundamental; class E is simulated
  const shape = switchingPowerShape(pa, corners.frequencyHz);
  const opLoadLine = operatingPoint(pa, railV, primaryOhm, shape);
  const rdsRatio = classERdsRatio(pa, primaryOhm, opLoadLine.peakDeviceA, railV);
  const spectrum = paSpectrum(pa, [2, 3, 4, 5], { frequencyHz: corners.frequencyHz, classERdsRatio: rdsRatio });
  const wave = spectrum.waveform;
  /** The design waveform at a supply of v (class E: Sokal's load line, which the simulation reproduces within 3 %). */
  const at = (v: number) => (v === railV ? opLoadLine : operatingPoint(pa, v, primaryOhm, shape));
  const op = opLoadLine;
  // the voltage the waveform swings: Vdd − Vsat, or Vdd for the simulated class E (its switch loss is simulated)
  const swingOf = (v: number, o: typeof op) => (wave.classE ? v : Math.max(1e-9, v - o.saturationV));
  const ideal = idealEfficiency(wave, swingOf(railV, op), railV);
  const efficiencyAsked = pa.efficiency ?? DEFAULT_EFFICIENCY[pa.amplifierClass];
  const efficiency = Math.min(efficiencyAsked, ideal);
  const band = bandFigures(wave, op.outputW, railV, efficiency);
  const dcInputW = op.outputW / efficiency;
  // one waveform for power, current and harmonics: the supply carries the band's most current (hard saturation, the
  // end where the harmonics are judged), the design drive's is shown beside it (waveformFindings)
  const keyDownCurrentA = band.bandMaxCurrentA + pa.biasIdleMaxA;
  // Device stress and heating are judged at their own worst corners, not at the operating point: the drains swing
  // to k x Vdd at the highest rail voltage (high mains, reservoir charged with the PA unkeyed, or a full battery),
  // and the heat is largest at high mains key-down. Common practice, no published source (worst-case design).
  const usable = (v: number | undefined) =>
    v !== undefined && Number.isFinite(v) && v > railV && v <= 5000 ? v : railV;
  const maxRailV = usable(corners.maxRailV);
  const hotRailV = usable(corners.hotRailV);
  // Source: Sokal & Sokal (1975) 3.56 Vdd for class E; 2 Vdd for B, C, D (REFERENCE-VALUES §8.1)
  const peakDrainV = peakDrainFactor(pa.amplifierClass) * maxRailV;
  const opHot = hotRailV === railV ? op : at(hotRailV);
  const hotBand = hotRailV === railV ? band : bandFigures(wave, opHot.outputW, hotRailV, efficiency);
  // heating: the waveform of the band that dissipates most, at the hot supply
  // the air around the heatsink: inside the box when the enclosure's rise is known (an outside heatsink sees less)
  const inside = corners.insideC !== undefined && Number.isFinite(corners.insideC);
  const airC = inside ? corners.insideC! : project.ambientC;
  const thermalRaw = paThermal(
    pa,
    hotBand.hottest.outputW,
    hotBand.hottest.dcInputW,
    pa.biasIdleMaxA * hotRailV,
    airC,
    project.keyingDuty,
  );
  const lowRailV =
    corners.lowRailV !== undefined &&
    Number.isFinite(corners.lowRailV) &&
    corners.lowRailV > 0 &&
    corners.lowRailV < railV
      ? corners.lowRailV
      : railV;
  const lowOutputW = lowRailV === railV ? op.outputW : at(lowRailV).outputW;
  const bat = corners.source === 'battery';
  const hotNote =
    hotRailV > railV
      ? ` (with the supply at ${hotRailV.toFixed(1)} V: ${bat ? 'battery full' : 'high mains'}, key-down)`
      : '';
  const noted = thermalRaw.findings.map((f) =>
    f.rule === 'pa.heat-safety' ? f : { ...f, message: f.message.replace(/\.$|:/, (m) => `${hotNote}${m}`) },
  );
  const thermal = { ...thermalRaw, findings: insideNote(noted, inside ? airC : null, project.ambientC) };

  const pct = (x: number) => `${Math.round(x * 100)} %`;
  if (efficiencyAsked > ideal) {
    // an efficiency above the ideal waveform's would draw less DC than the waveform delivers (energy balance)
    findings.push({
      severity: pa.efficiency === null ? 'ok' : 'caution',
      rule: 'pa.efficiency',
      subject,
      value: efficiencyAsked,
      limit: ideal,
      unit: '',
      source: 'pa.waveform-dc',
      message: `${pa.efficiency === null ? `The class-${pa.amplifierClass} default of` : 'The entered efficiency,'} ` +
        `${pct(efficiencyAsked)} is above what this stage's ideal waveform gives (${pct(ideal)} at this supply and ` +
        `saturation drop): ${pct(ideal)} used.`,
    });
  } else if (pa.efficiency === null) {
    findings.push({
      severity: 'ok',
      rule: 'pa.efficiency',
      subject,
      value: efficiency,
      limit: null,
      unit: '',
      source: 'pa.efficiency',
      message: `No efficiency entered: ${pct(efficiency)} assumed for class ${pa.amplifierClass}; measure DC input ` +
        `at full output to confirm.`,
    });
  }
  findings.push(
    ...waveformFindings(pa, wave, {
      subject,
      designOutputW: op.outputW,
      band,
      railV,
      frequencyHz: corners.frequencyHz,
    }),
  );
  if (pa.amplifierClass === 'D' && pa.topology === 'single-ended') {
    findings.push({
      severity: 'ok',
      rule: 'pa.model',
      subject,
      value: null,
      limit: null,
      unit: '',
      source: 'pa.trapezoid',
      message:
        'Single-ended class D is modelled as a half-bridge driving a 0 to Vdd switched wave (with its transition ' +
          'time) into the transformer.',
    });
  }
  if (pa.amplifierClass === 'E' && pa.topology === 'push-pull') {
    findings.push({
      severity: 'caution',
      rule: 'pa.model',
      subject,
      value: null,
      limit: null,
      unit: '',
      source: 'pa.push-pull-e',
      message:
        'Push-pull class E is modelled as two single-ended class-E halves each driving half the load; treat the ' +
          'power as an estimate.',
    });
  }
  if (target > 0) {
    const dev = db(op.outputW / target);
    findings.push({
      severity: Math.abs(dev) > 1 ? 'caution' : 'ok',
      rule: 'pa.power',
      subject,
      value: op.outputW,
      limit: target,
      unit: 'W',
      source: SRC_LOADLINE,
      message:
        Math.abs(dev) > 1
          ? `Predicted output ${op.outputW.toFixed(1)} W is ${dev.toFixed(1)} dB from the ${target} W target; change ` +
            `${fixWord} or the rail voltage.`
          : `Predicted output ${op.outputW.toFixed(1)} W is within 1 dB of the ${target} W target.`,
    });
  }
  if (target > 0 && lowRailV < railV) {
    // Same load line at the lowest key-down rail (REFERENCE-VALUES §8.1); 1 dB as for the target check above
    const devLow = db(lowOutputW / target);
    findings.push({
      severity: devLow < -1 ? 'caution' : 'ok',
      rule: 'pa.power-low-supply',
      subject,
      value: lowOutputW,
      limit: target,
      unit: 'W',
      source: SRC_LOADLINE,
      message: `With the supply at its lowest under key-down (${lowRailV.toFixed(1)} V: ` +
        `${bat ? 'battery at its end voltage' : 'low mains'}) the output falls to about ${lowOutputW.toFixed(1)} W (` +
        `${devLow.toFixed(1)} dB from the ${target} W target)` +
        `${devLow < -1 ? `; a higher rail or a different ${network !== null ? 'network drain load' : 'turns ratio'} ` +
          'keeps the power up' : ''}.`,
    });
  }
  const atMax =
    maxRailV > railV
      ? ` at the highest supply of ${maxRailV.toFixed(1)} V (` +
        `${bat ? 'battery full' : 'high mains, before the rail sags under key-down'})`
      : '';
  // Stress round the circle of the worst SWR (1 when none is given: the design load only)
  const swrIn = corners.worstSwr;
  const swrUsed = swrIn !== undefined && Number.isFinite(swrIn) ? Math.min(100, Math.max(1, swrIn)) : 1;
  const hotDcW = opHot.outputW / efficiency;
  const swr = swrStress(
    pa.amplifierClass,
    {
      drainPeakV: peakDrainV,
      maxRailV,
      peakDeviceA: opHot.peakDeviceA,
      outputW: opHot.outputW,
      dcInputW: hotDcW,
      biasW: pa.biasIdleMaxA * hotRailV,
      // a hard-switched push-pull stage on a centre-tapped transformer rings at each edge (leakage with Coss)
      ...(pa.amplifierClass === 'D' && pa.topology === 'push-pull' && network === null
        ? { ring: { leakageH: pa.outputLeakageH ?? null, cossF: pa.deviceCossF ?? null } }
        : {}),
      // class B/C on a transformer: the filter at each harmonic seen from the drains, and the drive pulse's half angle
      // (as its spectrum); a matching network's own harmonic impedance is not modelled (flat-topped, the upper end)
      ...((pa.amplifierClass === 'B' || pa.amplifierClass === 'C') &&
      network === null &&
      corners.filterInputOhmAt &&
      corners.frequencyHz
        ? {
            harmonics: {
              zAt: drainHarmonicLoad(corners.filterInputOhmAt, {
                primaryOhm,
                loadOhm: pa.loadOhm,
                cossF: pa.deviceCossF ?? null,
                frequencyHz: corners.frequencyHz,
                topology: pa.topology,
              }),
              thetaRad: (pa.amplifierClass === 'B' ? 180 : (spectrum.conductionAngleDeg ?? 180)) * (Math.PI / 360),
              topology: pa.topology,
            },
          }
        : {}),
    },
    swrUsed,
    pa.loadOhm,
    rdsRatio,
    corners.filterLadder && corners.frequencyHz && corners.frequencyHz > 0
      ? (phases) => loadsThroughFilter(corners.filterLadder!, corners.frequencyHz!, swrUsed, phases)
      : undefined,
  );
  findings.push(
    ...filterLoadFindings(swr, subject, {
      design: corners.filterDesign ?? null,
      matchedOutputW: opHot.outputW,
      deviceVdsMaxV: pa.deviceVdsMaxV,
    }),
  );
  const swrCurrent = swrKeyDownCurrent(swr, pa.biasIdleMaxA * hotRailV, hotDcW, band.designCurrentA, pa.biasIdleMaxA);
  if (swrCurrent && swrCurrent.currentA > keyDownCurrentA * 1.001) {
    findings.push({
      severity: 'caution',
      rule: 'pa.swr-current',
      subject,
      value: swrCurrent.currentA,
      limit: keyDownCurrentA,
      unit: 'A',
      source: 'pa.waveform-dc',
      message:
        `The key-down current at the design drive rises to ${swrCurrent.currentA.toFixed(2)} A ` +
        `${whereLoad(swrCurrent.at, swr.swr)}. That is above the ${keyDownCurrentA.toFixed(2)} A the supply budget ` +
        `carries (matched load, ${budgetDriveLabel(wave.model)}); size the supply and its fuse for it, or fold ` +
        'the drive back at high SWR.',
    });
  }
  const clamp = drainClamp(pa.drainClampV, swr, {
    peakV: peakDrainV, peakA: opHot.peakDeviceA, supplyV: maxRailV, dcInputW: hotDcW + pa.biasIdleMaxA * hotRailV,
  });
  if (clamp) findings.push(...clampFindings(clamp, pa.deviceVdsMaxV, maxRailV, swr.swr, subject));
  findings.push(
    ...swrFindings(pa, swr, {
      clampV: clamp?.clampV ?? null,
      subject,
      atMax,
      ambientC: airC,
      keyingDuty: project.keyingDuty,
      matchedOutputW: opHot.outputW,
      matchedDissipationW: thermalRaw.dissipationTotalW,
      sharedBy: thermalRaw.sharedBy,
      tjTargetC: thermalRaw.tjTargetC,
    }),
  );
  findings.push(...classEShuntFindings(pa, primaryOhm, corners.frequencyHz, subject));
  findings.push(...thermal.findings.map((f) => ({ ...f, subject })));
  const { findings: _drop, ...thermalValues } = thermal;
  void _drop;
  const ref = pa.referencePowerW;
  const vsReferenceDb = db(op.outputW / ref);
  const waveform: PaWaveformSummary = {
    model: wave.model,
    designOutputW: op.outputW,
    bandMaxOutputW: band.bandMaxOutputW,
    designCurrentA: band.designCurrentA,
    bandMaxCurrentA: band.bandMaxCurrentA,
    idealEfficiency: ideal,
    transitionTimeS: wave.transitionTimeS,
    transitionAssumed: spectrum.assumed.transitionTimeS !== undefined,
    classELoadedQ: wave.classE?.loadedQ ?? null,
  };
  const { waveform: _w, ...spectrumValues } = spectrum;
  void _w;
  return {
    waveform,
    spectrum: spectrumValues,
    swrKeyDownCurrentA: swrCurrent?.currentA ?? null,
    railV,
    maxRailV,
    hotRailV,
    lowRailV,
    lowOutputW,
    hotOutputW: opHot.outputW,
    saturationV: op.saturationV,
    turnsRatio,
    turnsRatioSource: network !== null ? 'network' : pa.turnsRatio === null ? 'designed' : 'entered',
    idealTurnsRatio,
    ratioOptions,
    primaryOhm,
    outputW: op.outputW,
    // Source: definitions of dBm and dBW (power relative to 1 mW / 1 W)
    outputDbm: db(op.outputW / 1e-3), outputDbw: db(op.outputW),
    // Common practice, no published source: one S-unit = 6 dB
    vsReferenceDb,
    vsReferenceSUnits: vsReferenceDb / 6,
    efficiency,
    efficiencySource: pa.efficiency === null ? 'class-default' : 'entered',
    dcInputW,
    keyDownCurrentA,
    peakDrainV,
    peakDeviceA: op.peakDeviceA,
    thermal: thermalValues,
    swr,
    clamp,
    findings,
    refused: false,
  };
}

/**
 * Rds(on) of one class-E switch over the drain load of its half (push-pull halves each drive half the drain-to-drain
 * load): the entered Rds(on), else the saturation drop over the matched peak current (Ohm's law).
 */
function classERdsRatio(pa: PaParams, primaryOhm: number, peakA: number, railV: number): number {
  const half = pa.topology === 'push-pull' ? primaryOhm / 2 : primaryOhm;
  const rds = pa.rdsOnOhm ?? (peakA > 0 ? Math.min(pa.saturationV ?? 0, railV) / peakA : 0);
  // three significant figures: the passes of one evaluation (rail voltages a few mV apart) share one simulation
  return Number((rds / half).toPrecision(3));
}

/** A computed current, or the findings that say why it cannot be computed (never a silent 0). */
export type ComputedCurrent = { ok: true; currentA: number } | { ok: false; findings: Finding[] };

/**
 * Key-down DC current of the PA from railV (A), for the lead's budget. When core refuses the PA data (or the rail
 * voltage) the result carries the refusing findings instead, so the caller can mark the current unknown.
 */
export function paKeyDownCurrentA(
  pa: PaParams,
  railV: number,
  project: Pick<Project, 'targetPowerW' | 'ambientC' | 'keyingDuty'> & { frequencyHz?: number },
  subject = 'Final amplifier',
): ComputedCurrent {
  // the frequency sets a class-D stage's switching edges, and so its waveform and current
  const r = evaluatePa(pa, railV, project, subject, { frequencyHz: project.frequencyHz });
  if (r.refused) return { ok: false, findings: r.findings.filter((f) => f.severity === 'fail') };
  if (!Number.isFinite(r.keyDownCurrentA) || r.keyDownCurrentA < 0) {
    return {
      ok: false,
      findings: [
        {
          severity: 'fail',
          rule: 'pa.input',
          subject: `${subject}: key-down current`,
          value: null,
          limit: null,
          unit: 'A',
          source: 'design.input',
          message: 'The PA key-down current could not be computed from the entered data.',
        },
      ],
    };
  }
  return { ok: true, currentA: r.keyDownCurrentA };
}
