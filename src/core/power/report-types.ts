// The supply report: plain JSON-friendly objects (no Maps, no NaN). SI units; the unit of every key is in its doc.
import type { Finding } from '../findings';
import type { SourceKey } from '../sources/registry';
import type { FuseSheet, Mode, PerMode, RectifierTopology } from '../model';

export type { FuseSheet } from '../model';
import type { RectifierWaveform } from './rectifier-sim';
import type { ThermalResult } from '../thermal/junction';
import type { BatteryCurveResult } from './battery-curve';
import type { InrushReport } from './inrush';
import type { CrossRegulation } from './cross-regulation';
import type { KeyingTransient } from './keying-transient';
import type { RailLoadModel } from './rail-load-model';
import type { BridgeThermal } from '../thermal/bridge';
import type { RegulatedBleederReport } from './regulated-bleeder';
import type { SupplyChoices } from '../spec/supply-choices';

/** Which load a corner applies: a mode, the duty-weighted thermal load, or a continuous tune-up carrier. */
export type CornerLoad = Mode | 'thermal' | 'tuneUp';

/** Mains corners. */
export type MainsCorner = 'low' | 'nominal' | 'high';

export interface CornerSpec {
  /** Stable id, e.g. "low-keyDown". */
  id: string;
  /** Words for the table, e.g. "Low mains, TX key-down". */
  label: string;
  mains: MainsCorner;
  /** Mains voltage over nominal (1 - lowFraction, 1, 1 + highFraction); dimensionless. */
  mainsFactor: number;
  /** Mains RMS voltage at this corner (V). */
  mainsV: number;
  load: CornerLoad;
  /**
   * Fraction of time the key is down for this load (0..1): keyDown 1, keyUp/receive 0, thermal = keying duty, tuneUp 1.
   */
  duty: number;
  /** True for the corner with each transformer's secondary at the low end of its stated tolerance. */
  secondaryTolerance?: boolean;
}

/** One row of a rectified rail's corners table: simulation summary at one corner. */
export interface RectifiedCorner extends CornerSpec {
  /** Output current the rail delivers at this corner (A). */
  loadA: number;
  /** Set where the voltages (mean, ripple, trough, peak) come from all windings of the transformer simulated together
   *  (shared primary, leakage): the trough of this rail's own simulation then (V). Currents stay the rail's own. */
  aloneTroughV?: number;
  /** Mean rail voltage (V). */
  dcMeanV: number;
  /** Ripple peak-to-peak (V). */
  ripplePpV: number;
  /** Lowest rail voltage in the cycle (V). */
  troughV: number;
  /** Highest rail voltage in the cycle (V). */
  peakV: number;
  /** Rail voltage with no load at this mains voltage (V). */
  noLoadPeakV: number;
  /** Secondary RMS current (A); per half for centre-tap. */
  secondaryRmsA: number;
  /** Repetitive peak current of one diode (A). */
  diodePeakA: number;
  /** Reservoir ripple current RMS (A). */
  capacitorRippleRmsA: number;
  /** Fraction of the cycle in which the diodes conduct (0..1). */
  conductionFraction: number;
  /** Switch-on surge estimate into a discharged reservoir (A). */
  surgeA: number;
  /** Trough minus the rail's required minimum (V); negative = regulators drop out. */
  headroomMarginV: number;
  converged: boolean;
  /** Mains cycles simulated (count). */
  cycles: number;
  note: string | null;
}

export interface Recommendation {
  /** What it is about: "transformer", "reservoir", "fuse", "heatsink", "bleeder", "battery". */
  topic: string;
  /** One line for the builder, e.g. "18 V 5.6 A winding (100 VA)". */
  text: string;
  /** The reasoning in words, with the rule used. */
  reasoning: string;
  /** Source registry key; users see its registry text. */
  source: SourceKey;
}

export interface FuseRecommendation {
  /** Recommended IEC 60127 rated current (A), null when beyond the series. */
  ratedA: number | null;
  /** "T" time-lag or "F" quick-acting. */
  characteristic: 'T' | 'F';
  /** Current the fuse must carry continuously (A). */
  loadA: number;
  /** Multiplier applied to loadA before rounding up (dimensionless). */
  factor: number;
  reasoning: string;
}

/** Dissipation of a rectifier's diodes at high mains (W). */
export interface RectifierLoss {
  keyDownW: number;
  keyUpW: number;
  /** Averaged over the keying duty (W). */
  thermalW: number;
  /** With a continuous carrier (W). */
  tuneUpW: number;
}

/** A fuse against one fault current, by the IEC 60127-2 pre-arcing limits of its sheet. */
export interface FaultCheck {
  /** Fault current through the fuse, RMS (A). */
  faultA: number;
  /** Fuse rated current In (A). */
  fuseA: number;
  sheet: FuseSheet;
  /** faultA / fuseA (dimensionless). */
  multiple: number;
  /** Latest pre-arcing time the sheet allows at this multiple (s); null = below 2.1 In, no clearing time guaranteed. */
  latestS: number | null;
  /** Time within which the fault must be cleared (s). */
  allowedS: number;
  /** True when latestS is known and at most allowedS. */
  clears: boolean;
}

/** The fuse in a winding lead ahead of the rectifier and the faults it must clear. */
export interface WindingFuseReport {
  windingId: string;
  windingName: string;
  /** Recommended fuse (rating from the continuous key-down winding RMS current at high mains). */
  fuse: FuseRecommendation;
  /** Fitted fuse (A), null = none entered. */
  fittedA: number | null;
  sheet: FuseSheet;
  /** Source resistance referred to the secondary: the winding's resistance (Ω). */
  sourceOhm: number;
  /** The winding's leakage inductance (H, entered or split from its regulation) and its reactance at the mains
   *  frequency (Ω), both in the fault currents; absent in reports made before leakage was modelled. */
  leakageH?: number;
  reactanceOhm?: number;
  /** Dead short at the rectifier's input (failed bridge), low mains (A RMS). */
  inputShortLowA: number;
  /** The same at high mains: the most the winding and fuse can see (A RMS). */
  inputShortHighA: number;
  /** Shorted reservoir, current through the diodes and the fuse, low mains (A RMS): the smallest fault. */
  outputShortLowA: number;
  /** The fuse in use (fitted, else recommended) against outputShortLowA; null when no fuse size is known. */
  check: FaultCheck | null;
  /** Turns ratio secondary/primary used to reflect faults to the primary (V_NL / V_mains, dimensionless). */
  turnsRatio: number;
  reasoning: string;
}

/** The primary fuse against a winding fault reflected to the primary. */
export interface PrimaryFaultCheck {
  windingName: string;
  /**
   * Smallest fault (shorted reservoir, low mains) reflected by the turns ratio (A
   * RMS), load of other windings not added.
   */
  reflectedA: number;
  check: FaultCheck;
}

export interface WindingRecommendation {
  windingId: string;
  windingName: string;
  /**
   * Lowest rated secondary (V RMS at full load) keeping the trough above the rail
   * requirement (V); null = no requirement.
   */
  minimumRatedV: number | null;
  /** Nearest standard secondary voltage at or above the minimum (V), null when beyond the list. */
  standardRatedV: number | null;
  /** Heating-equivalent secondary RMS current at the thermal load (A): sqrt(d I_kd^2 + (1-d) I_ku^2). */
  thermalRmsA: number;
  /** Secondary RMS current with a continuous carrier (tune-up) at high mains (A). */
  tuneUpRmsA: number;
  /** Repetitive peak winding current, worst corner (A). */
  peakA: number;
  /** Recommended current rating (A) = thermal RMS current. */
  ratedA: number;
  /** VA this winding needs at the thermal load: standard (or fitted) volts x ratedA (VA). */
  va: number;
  /** The volts used for va and the tune-up VA: the standard voltage, or the fitted one when there is none (V RMS). */
  vaRatedV?: number;
  /** Trough at low mains, key-down with the recommended winding (V), null when not simulated. */
  checkTroughV: number | null;
  /** A PA on this rail at that trough: its output (W) and its output with the fitted winding at low mains (W). */
  paAtCheck?: { stageName: string; railV: number; outputW: number; fittedOutputW: number };
  /**
   * This winding's share of the primary current, worst continuous key-down,
   * referred by the turns ratio V_NL/V_mains (A).
   */
  primaryReferredA: number;
  /** 2 for a centre-tapped winding (two halves, each of ratedA), otherwise 1. */
  halves: number;
  reasoning: string;
}

export interface ReservoirReport {
  /** Fitted capacitance (F). */
  fittedF: number;
  /** Ripple target (V p-p), null = none set. */
  ripplePpTargetV: number | null;
  /** Smallest capacitance meeting the ripple target at low mains, key-down, by simulation (F); null = no target. */
  minimumF: number | null;
  /** Conservative textbook value I/(k f Vpp) (F); null = no target. */
  textbookF: number | null;
  /** Next E6 value at or above minimumF (F). */
  standardF: number | null;
  /** Highest voltage across the reservoir: no-load peak at high mains (V). */
  noLoadPeakHighV: number;
  /** Recommended minimum voltage rating (V), a standard step >= 1.2 x noLoadPeakHighV. */
  recommendedRatedV: number | null;
  /** Ripple current RMS at the thermal load, high mains (A). */
  thermalRippleA: number;
  /** Ripple current RMS with a continuous carrier, high mains (A). */
  tuneUpRippleA: number;
}

export interface BleederReport {
  /** Voltage the reservoir starts from: no-load peak at high mains (V). */
  startV: number;
  /** Safe threshold used (V d.c.). */
  thresholdV: number;
  /** Time allowed to reach the threshold (s). */
  allowedS: number;
  /** Fitted bleeder (Ω), null = none. */
  fittedOhm: number | null;
  /** Voltage the discharge time is measured to (V): thresholdV for rails above it, else a low, spark-free level. */
  safeV: number;
  /** Where safeV comes from, in words. */
  safeSource: string;
  /** Time for the fitted bleeder to bring the reservoir to safeV (s); 0 = starts below it; null = none fitted. */
  fittedTimeS: number | null;
  /** Dissipation of the fitted bleeder at startV (W), P = V^2 / R; null = none fitted. */
  fittedW: number | null;
  /** Fitted bleeder's power rating (W); null = not stated. */
  ratedW: number | null;
  /** Suggested bleeder (Ω, E12). */
  suggestedOhm: number | null;
  /** Dissipation of the suggested bleeder at startV (W). */
  suggestedW: number | null;
  /** Energy stored at startV (J). */
  storedJ: number;
  /** Short-circuit current limited only by the ESR (A). */
  shortCircuitA: number;
  reasoning: string;
}

interface RailBase {
  railId: string;
  railName: string;
  /** Findings, most severe first. */
  findings: Finding[];
  recommendations: Recommendation[];
  /** Its loads and how each follows the rail voltage (null: a load is unknown; absent before the RF model ran). */
  loadModel?: RailLoadModel | null;
}

export interface RectifiedRailReport extends RailBase {
  kind: 'rectified';
  topology: RectifierTopology;
  /** Required minimum rail voltage at the trough (V). */
  requiredMinV: number;
  /** How requiredMinV was found. */
  requirementNote: string;
  /** Output current per mode the lead's budget asked for (A). */
  outputA: PerMode;
  corners: RectifiedCorner[];
  /** Corner id that sets headroom (low mains, key-down). */
  worstVoltageCornerId: string;
  /** Corner id that sets heating (high mains, thermal load). */
  worstThermalCornerId: string;
  /** Two mains cycles at the worst voltage corner, for the plot. */
  waveform: RectifierWaveform;
  winding: WindingRecommendation | null;
  reservoir: ReservoirReport;
  bleeder: BleederReport;
  fuse: FuseRecommendation;
  /** Fuse in the winding lead ahead of the rectifier and its fault check; null without a winding. */
  windingFuse: WindingFuseReport | null;
  /** Diode dissipation of the rectifier at high mains. */
  rectifierLoss: RectifierLoss;
  /** The rectifier package's junction temperature and the heatsink it needs (absent in reports of older code). */
  bridgeThermal?: BridgeThermal;
  /** A PA rail keyed with a dot train from rest at nominal mains, with the rail's load model (null: not simulated,
   * a finding says why; absent: no PA on the rail, or before the RF model ran). */
  keyingTransient?: KeyingTransient | null;
}

/** One corner for a regulated rail. */
export interface RegulatedCorner extends CornerSpec {
  /** Output current (A). */
  outputA: number;
  /** Input current drawn from the parent (A). */
  inputA: number;
  /** Lowest input voltage (ripple trough) (V). */
  inputTroughV: number;
  /** Mean input voltage (V). */
  inputMeanV: number;
  /** Trough minus output voltage (V). */
  headroomV: number;
  /** Regulator dissipation at the mean input (W). */
  dissipationW: number;
  /** Ripple on the input (V p-p). */
  inputRipplePpV: number;
  /** True when the input trough is below output + dropout (no regulation, no rejection). */
  inDropout: boolean;
  /** Ripple at the output (V p-p); null when the rejection is not stated. */
  outputRipplePpV: number | null;
}

export interface RegulatedRailReport extends RailBase {
  kind: 'regulated';
  parentId: string;
  regulator: 'linear' | 'ldo' | 'switching';
  /** Output voltage from the setting (V). */
  outputV: number;
  /** Dropout the regulator needs (V). */
  dropoutV: number;
  corners: RegulatedCorner[];
  worstVoltageCornerId: string;
  worstThermalCornerId: string;
  /** Dissipation in the worst thermal corner (W). */
  thermalDissipationW: number;
  /** Dissipation with a continuous carrier at high mains (W). */
  tuneUpDissipationW: number;
  thermal: ThermalResult | null;
  tuneUpThermal: ThermalResult | null;
  /** Ripple rejection entered from the datasheet (dB), null = not stated. */
  rippleRejectionDb: number | null;
  /** Output ripple target (V p-p), null = none. */
  rippleTargetV: number | null;
  /** Corner with the most output ripple, null when the rejection is not stated. */
  worstRippleCornerId: string | null;
  /** The output's discharge after switch-off through its bleeder (absent in reports of older code). */
  bleeder?: RegulatedBleederReport;
}

export interface BatteryRailReport extends RailBase {
  kind: 'battery';
  /** Highest voltage (fresh charge) (V). */
  fullV: number;
  /** End-of-discharge voltage (V). */
  endV: number;
  /** End voltage less the key-down drop across the internal resistance (V). */
  loadedEndV: number;
  /** Required minimum from the regulators fed (V). */
  requiredMinV: number;
  /** Receive share of operating time (0..1). */
  receiveFraction: number;
  /** Average current over the operating split (A). */
  averageA: number;
  /** Runtime on the usable capacity (s). */
  runtimeS: number;
  outputA: PerMode;
  fuse: FuseRecommendation;
  /** The chemistry's discharge curve for this battery (null: external supply, or not a whole number of cells). */
  curve: BatteryCurveResult | null;
  /** The PA on this battery: its output on the curve's plateau and at the end voltage, under key-down (null: no PA). */
  pa: BatteryPaOutput | null;
}

export interface BatteryPaOutput {
  stageName: string;
  /** Loaded plateau voltage (V) and the output there (W): what the PA gives for most of the charge. */
  plateauRailV: number;
  plateauOutputW: number;
  /** Lowest key-down voltage (loaded end voltage) (V) and the output there (W). */
  endRailV: number;
  endOutputW: number;
}

export type RailReport = RectifiedRailReport | RegulatedRailReport | BatteryRailReport;

export interface TransformerReport {
  transformerId: string;
  name: string;
  construction: 'laminated' | 'toroidal';
  windings: WindingRecommendation[];
  /** Total VA at the thermal load (sum over windings of rated V x thermal RMS A) (VA). */
  thermalVA: number;
  /** Total VA with a continuous carrier (VA). */
  tuneUpVA: number;
  /** Nearest standard VA at or above thermalVA, null when beyond the list. */
  standardVA: number | null;
  /** Primary RMS current at the worst continuous key-down corner, referred by turns ratio (A). */
  primaryA: number;
  /** Its rectified rails simulated together (shared primary, leakage) at low mains, key-down and key-up, and at the
   * secondary tolerance corner; null when no rail on it is designed, absent where not computed (earlier passes). */
  crossRegulation?: CrossRegulation | null;
}

export interface PrimaryReport {
  /** Sum of the transformers' primary currents, worst continuous key-down (A). */
  loadA: number;
  fuse: FuseRecommendation;
  /** Fitted primary fuse (A), null = none entered. */
  fittedA: number | null;
  /** The primary fuse in use (fitted, else recommended; taken as T, sheet 3) against each winding's reflected fault. */
  faultChecks: PrimaryFaultCheck[];
  /** Switch-on inrush of all transformers against the primary fuse in use; null when no fuse size is known. */
  inrush: InrushReport | null;
  findings: Finding[];
}

export interface SupplyReport {
  /** Mains at the three corners (V RMS); null for a DC-only station. */
  mains: { nominalV: number; lowV: number; highV: number; frequencyHz: number } | null;
  /** Keying duty used for the thermal load (0..1). */
  keyingDuty: number;
  /** Transmit share of operating time for battery runtimes (0..1). */
  transmitFraction: number;
  rails: RailReport[];
  transformers: TransformerReport[];
  primary: PrimaryReport | null;
  /** Every finding of the supply, most severe first. */
  findings: Finding[];
  /** Number of rectifier simulations run (count). */
  simulations: number;
  /** False when any simulation did not reach steady state. */
  allConverged: boolean;
  /** The primary fuse's type and the transformer sizing basis used (absent in reports of older code). */
  choices?: SupplyChoices;
  /** Air the thermal checks inside the box used (°C) and whether it is the enclosure's inside temperature. */
  thermalAmbient?: { ambientC: number; inside: boolean };
}
