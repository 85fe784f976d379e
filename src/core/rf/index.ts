// Public API of the RF engine.
export { evaluateRf, type RfContext } from './evaluate-rf';
export type { RfReport, RfStageResult, LpfStageResult } from './report';
export {
  evaluatePa,
  paKeyDownCurrentA,
  DEFAULT_EFFICIENCY,
  type PaResult,
  type RatioOption,
  type ComputedCurrent,
} from './pa';
export { PRACTICAL_RATIOS } from './pa-load-line';
export { designLpf, type LpfDesign, type LpfElement } from './lpf-design';
export { analyseLpf, type LpfAnalysis, type LadderPoint } from './lpf-analysis';
export { monteCarloLpf, mulberry32, type MonteCarloResult, type MonteCarloOptions } from './lpf-monte-carlo';
export { lpfNetlist } from './lpf-netlist';
export {
  validateLpfParams,
  validatePaParams,
  validateRelayParams,
  validateRfInputs,
  validateRfSettings,
  validateThermalInputs,
  type FieldError,
  type Checked,
} from './lpf-validate';
export { harmonicCompliance, requiredAttenuationDb, type HarmonicsReport, type HarmonicRow } from './harmonics';
export { evaluateRelay, relayCoilLoads, lineMaxima, dotLengthS, type RelayResult, type CoilLoad } from './tr-relay';
export {
  evaluateExposure,
  mpeLimitsMwPerCm2,
  exemptionThresholdW,
  EXPOSURE_CAUTION,
  type ExposureResult,
} from './exposure';
export { prototypeG, prototypeLossDb } from './prototype';
export { E12, E24, nearestStandard, snapCapacitance } from './e-series';
export { HF_BANDS, bandOf, defaultCutoffHz } from './bands';
