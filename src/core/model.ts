// The build project as the core sees it: plain data, SI units, no I/O.
// src/db maps table rows to these types; src/web forms convert display units to these.

export const MODES = ['receive', 'keyUp', 'keyDown'] as const;
export type Mode = (typeof MODES)[number];
export const MODE_LABELS: Record<Mode, string> = {
  receive: 'Receive',
  keyUp: 'TX key-up',
  keyDown: 'TX key-down',
};

export type PerMode = Record<Mode, number>;

export interface Mains {
  nominalV: number; // RMS
  frequencyHz: number;
  lowFraction: number; // 0.10 = mains may sag 10 % below nominal
  highFraction: number; // 0.10 = mains may rise 10 % above nominal
}

// ---------------------------------------------------------------- supply tree

export interface Winding {
  id: string;
  name: string;
  ratedVrms: number; // full-load secondary voltage at nominal mains
  ratedA: number; // rated secondary RMS current
  regulationFraction: number; // (V_NL - V_FL) / V_FL, e.g. 0.06
  resistanceOhm: number | null; // measured/entered; null = from regulation
  leakageH?: number | null; // leakage inductance referred to this winding; null/absent = split from regulation
}

export interface Transformer {
  id: string;
  name: string;
  construction: 'laminated' | 'toroidal';
  /** Secondary voltage tolerance (fraction, e.g. 0.05): the low-tolerance corner; null/absent = no such corner. */
  secondaryToleranceFraction?: number | null;
  windings: Winding[];
}

export type RectifierTopology = 'bridge' | 'centre-tap' | 'half-wave';

/** Fuse-link type by its IEC 60127-2 standard sheet: T3 time-lag low breaking, T5 time-lag high breaking, F2 quick. */
export type FuseSheet = 'T3' | 'T5' | 'F2';

export interface RectifiedRail {
  kind: 'rectified';
  id: string;
  name: string;
  windingId: string;
  topology: RectifierTopology;
  diodeDropV: number; // forward drop of one diode at moderate current
  diodeResistanceOhm: number; // incremental resistance of one diode
  reservoirF: number;
  esrOhm: number;
  bleederOhm: number | null;
  capacitorRatedV: number | null; // chosen reservoir part's voltage rating
  capacitorRippleA: number | null; // chosen part's ripple-current rating (RMS, at 100/120 Hz)
  ripplePpTargetV: number | null; // designer's ripple target, null = none
  marginV: number; // extra headroom the designer wants above regulator needs
  fuseA: number | null; // fitted rail fuse, null = recommend one
  minimumV: number | null; // lowest voltage its direct loads need, null = not stated
  windingFuseA: number | null; // fitted fuse in the winding lead ahead of the rectifier, null = recommend one
  windingFuseSheet: FuseSheet; // its type (old rows and files read T3)
  bleederRatedW: number | null; // fitted bleeder's power rating, null = not stated
  // the rectifier package's thermal data, θsa null = no heatsink; null/absent = assumed
  bridgeMount?: HeatsinkMount | null;
  bridgeFreeAirKPerW?: number | null; // its θja in free air (no heatsink), K/W; null/absent = assumed
}

export type RegulatorSetting =
  | { method: 'fixed'; nominalV: number }
  | { method: 'adjustable'; vrefV: number; adjustA: number; r1Ohm: number; r2Ohm: number }
  | { method: 'raised-diodes'; nominalV: number; diodes: number; diodeDropV: number }
  | { method: 'raised-resistor'; nominalV: number; r1Ohm: number; r2Ohm: number };

export interface HeatsinkMount {
  thetaJcKPerW: number;
  thetaCsKPerW: number;
  thetaSaKPerW: number | null; // null = no heatsink chosen yet: report the one needed
  tjMaxC: number;
}

export interface RegulatedRail {
  kind: 'regulated';
  id: string;
  name: string;
  parentId: string; // rail that feeds it
  regulator: 'linear' | 'ldo' | 'switching';
  setting: RegulatorSetting;
  dropoutV: number; // minimum input - output
  quiescentA: number; // ground-pin / standby current
  efficiency: number | null; // switching modules: at lowest input voltage
  maxOutputA: number | null;
  maxInputV: number | null;
  mount: HeatsinkMount | null;
  rippleRejectionDb: number | null; // datasheet ripple rejection at 100/120 Hz, null = not stated
  rippleTargetV: number | null; // largest output ripple wanted (V p-p, e.g. a receiver's rail), null = none
  outputF?: number | null; // capacitance across its output, F; null/absent = not entered
  bleederOhm?: number | null; // bleeder across its output, null/absent = none fitted
  bleederRatedW?: number | null; // that bleeder's power rating, null/absent = not stated
}

export interface BatteryRail {
  kind: 'battery';
  id: string;
  name: string;
  chemistry: string;
  nominalV: number;
  fullV: number; // highest voltage (fresh charge / external source max)
  endV: number; // end-of-discharge voltage
  capacityAh: number;
  usableFraction: number; // fraction of capacity usable before endV
  internalOhm: number;
  minimumV: number | null; // lowest voltage its direct loads need, null = not stated
}

export type Rail = RectifiedRail | RegulatedRail | BatteryRail;

export interface Supply {
  transformers: Transformer[];
  rails: Rail[];
  primaryFuseA: number | null; // fitted primary fuse, null = recommend one
  enclosureAreaM2?: number | null; // enclosure surface that sheds heat, null/absent = not stated
  enclosureUWPerM2K?: number | null; // its heat transfer coefficient, null/absent = not stated
  primaryFuseSheet?: FuseSheet | null; // the fitted primary fuse's IEC 60127-2 sheet, null/absent = T3
  transformerSizing?: TransformerSizing | null; // what the transformer is sized for, null/absent = 'duty'
}

/** Size the transformer (and judge the rectifier's heat) for CW at the keying duty or a continuous tune-up carrier. */
export type TransformerSizing = 'duty' | 'tune-up';

// ---------------------------------------------------------------- stages

export const STAGE_KINDS = ['receiver', 'vxo', 'driver', 'final', 'lpf', 'tr', 'other'] as const;
export type StageKind = (typeof STAGE_KINDS)[number];
export const STAGE_KIND_LABELS: Record<StageKind, string> = {
  receiver: 'Receiver',
  vxo: 'Oscillator (VXO)',
  driver: 'Driver',
  final: 'Final amplifier (PA)',
  lpf: 'Low-pass filter',
  tr: 'T/R switching',
  other: 'Other',
};

export interface StageLoad {
  railId: string;
  currentA: PerMode;
}

export interface PaParams {
  topology: 'push-pull' | 'single-ended';
  amplifierClass: 'B' | 'C' | 'D' | 'E';
  railId: string;
  devices: number; // devices sharing the dissipation
  saturationV: number | null; // device saturation / I x Rds(on) drop
  rdsOnOhm: number | null; // alternative to saturationV
  turnsRatio: number | null; // secondary : (full) primary; null = design for target power
  loadOhm: number;
  efficiency: number | null; // null = default per class
  deviceVdsMaxV: number;
  deviceIdMaxA: number;
  mount: HeatsinkMount;
  biasIdleMaxA: number; // total idle current at the bias preset's maximum
  referencePowerW: number; // compare output against this (dB and S-units)
  heatsinkSharedBy?: number | null; // devices on one heatsink (their heat through one θsa); null/absent = one each
  networkLoadOhm?: number | null; // drain load set by an L/pi matching network, ohms; null/absent = transformer
  conductionAngleDeg?: number | null; // class C conduction angle per device, degrees; null/absent = 150 assumed
  imbalanceTypical?: number | null; // push-pull halves' mismatch (fraction), typical; null/absent = 0.05 assumed
  imbalanceWorst?: number | null; // same, worst; null/absent = 0.2 assumed
  deviceCossF?: number | null; // device output capacitance (class E: part of the shunt C), F; null/absent = not given
  // a drain clamp fitted (TVS or zener, drain to ground), its clamping voltage, V; null/absent = none
  drainClampV?: number | null;
  // push-pull output transformer: leakage between the primary halves, H; null/absent = not given
  outputLeakageH?: number | null;
  transitionTimeS?: number | null; // class D drain-voltage rise/fall time, s; null/absent = 10 ns assumed
  outputCoreId?: string | null; // the output transformer's core (a catalog core id); null/absent = not given
  outputPrimaryTurns?: number | null; // turns of the transformer's full primary; null/absent = flux not checked
  outputWireDiameterM?: number | null; // its primary wire over the enamel, m; null/absent = fit not checked
}

export interface LpfParams {
  response: 'butterworth' | 'chebyshev';
  rippleDb: number;
  order: number;
  form: 'capacitor-input' | 'inductor-input';
  cutoffHz: number | null; // null = chosen from the band
  capacitorSeries: 'E12' | 'E24';
  allowParallelPairs: boolean;
  coreAlHPerTurn2: number; // AL value in H/turn^2 (e.g. 4.9e-9 for 49 nH/t^2)
  coreName: string;
  inductorQ: number;
  capacitorQ: number;
  capacitorTolerance: number; // fraction
  inductorTolerance: number; // fraction
  monteCarloTrials: number;
  seed: number;
  core?: ToroidCore | null; // the inductors' core, for flux, fit and resonance; null/absent = not entered
  capacitorRatedV?: number | null; // the filter capacitors' voltage rating, V; null/absent = not checked
  capacitorRatedA?: number | null; // the filter capacitors' RF current rating (RMS), A; null/absent = not checked
  coreId?: string | null; // the inductors' core from the project's catalog (overrides core and AL); null = entered
}

/** A core of the project's catalog, described by size and material; filter inductors and output transformers pick
 *  one. SI units; AL in H/turn², Ae in m², le in m. */
export interface CatalogCore {
  id: string;
  name: string;
  alHPerTurn2: number;
  aeM2: number; // effective cross-section
  leM: number; // effective magnetic path length
  innerDiameterM: number | null; // toroid inner diameter (winding fit), null = not given
  windowAreaM2: number | null; // winding window (non-toroids, or instead of the diameter), null = not given
  minFrequencyHz: number; // the material's frequency range
  maxFrequencyHz: number;
  fluxLimitT: number; // the maker's peak flux density limit (heating) in that range
}

/**
 * A toroidal core as entered on the filter: dimensions, material data and the wire wound on it (SI; null = not given).
 */
export interface ToroidCore {
  outerDiameterM: number | null;
  innerDiameterM: number | null;
  heightM: number | null;
  fluxLimitT: number | null; // the maker's peak flux density limit at the operating frequency (heating)
  minFrequencyHz: number | null; // the material's frequency range
  maxFrequencyHz: number | null;
  wireDiameterM: number | null; // over the enamel
}

export interface RelayParams {
  contactCarryA: number;
  contactSwitchA: number;
  contactRatedV: number;
  rfRatedVpeak: number | null;
  coilA: number;
  coilRailId: string | null;
  coilModes: Mode[];
  isolationDb: number;
  operateS: number;
  releaseS: number;
  bounceS: number;
  dcSwitchedA: number; // DC current the relay's power contacts carry/switch, 0 = none
  position: 'before-lpf' | 'after-lpf';
  receiverMaxInputW: number;
  txDelayS: number;
  wpm: number;
  // keyed RF envelope 10–90 % rise, raised-cosine edges, s; 0 = hard keying; null = not given
  keyRiseS?: number | null;
  keyFallS?: number | null; // 10–90 % fall, s; null/absent = same as the rise
  keyShapingRcS?: number | null; // time constant of a single RC shaping network (exponential edges), s; null = none
}

export interface Stage {
  id: string;
  kind: StageKind;
  name: string;
  notes: string;
  loads: StageLoad[];
  dissipationW: number | null; // entered heat, null = from rail voltage x current
  pa?: PaParams;
  lpf?: LpfParams;
  relay?: RelayParams;
}

// ---------------------------------------------------------------- RF settings

export interface RfSettings {
  spuriousRule: 'us-97-307' | 'itu-app3';
  evenHarmonicDbc: number; // push-pull balance residual of the 2nd harmonic (negative dBc)
  worstSwr: number;
  antennaGainDbi: number;
  feedlineLossDb: number;
  groundReflection: boolean;
  exposureDutyFactor: number; // mode duty factor (CW 0.4)
  exposureOnFraction: number; // worst fraction of the averaging period on the air
}

// ---------------------------------------------------------------- parts and costing

export interface PriceBreak {
  minQty: number;
  unitPriceCents: number;
}

export interface Offer {
  id: string;
  supplier: string;
  sku: string;
  currency: string;
  breaks: PriceBreak[];
  minOrder: number;
  orderMultiple: number;
  stockNote: string;
}

export interface Part {
  id: string;
  description: string;
  category: string;
  ratings: Record<string, number | string>;
  offers: Offer[];
}

export interface Supplier {
  name: string;
  shippingCents: number;
  currency: string;
}

export interface BomLine {
  id: string;
  stageId: string | null;
  partId: string;
  qtyPerRig: number;
  refs: string;
  notes: string;
  /** The design role this line fills (src/core/roles); null or absent = not bound (older data has no binding). */
  roleId?: string | null;
}

export interface Costing {
  attritionFraction: number;
  sparesPerLine: number;
  exchangeRates: Record<string, number>; // units of project currency per 1 unit of key currency
  suppliers: Supplier[];
}

// ---------------------------------------------------------------- the project

export interface Project {
  id: string;
  name: string;
  notes: string;
  frequencyHz: number;
  targetPowerW: number;
  mains: Mains | null; // null = battery / DC-only station
  ambientC: number;
  currency: string;
  kits: number;
  keyingDuty: number; // CW conversational duty factor for heating (0.4)
  /** id of the project this one was cloned from as a variant (absent: not a variant, or its original was deleted) */
  variantOf?: string;
  version: number;
  supply: Supply;
  stages: Stage[];
  rf: RfSettings;
  parts: Part[];
  bom: BomLine[];
  costing: Costing;
  /** The project's core catalog (absent in older data: none). */
  cores?: CatalogCore[];
}
