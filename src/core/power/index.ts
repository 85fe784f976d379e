// Public API of the mains-supply design engine (pure). See report-types.ts for every result key and its unit.
export { evaluateSupply, type SupplyOptions } from './evaluate-supply';
export type * from './report-types';
export {
  simulateRectifier,
  switchOnSurgeA,
  type RectifierSimInput,
  type RectifierSimResult,
  type RectifierWaveform,
  type SimLoad,
} from './rectifier-sim';
export { regulatorOutputV, regulatorInputCurrentA, regulatorDissipationW } from './regulator';
export { rectifierNetlist, railNetlist, SPICE_MEASURES } from './spice-netlist';
export { cornerSpecs, cornerCurrent, CW_DUTY_FACTOR, DEFAULT_TRANSMIT_FRACTION } from './corners';
export { primaryFuse, railFuse, fuseMarking } from './fuses';
export { dischargeTimeS, maxBleederOhm, SAFE_DC_V, SAFE_TIME_S } from './bleeder';
export { batteryRuntime } from './battery';
export { DEFAULT_SECONDARY_V, DEFAULT_TRANSFORMER_VA, DEFAULT_CAPACITOR_V, IEC_60127_FUSES_A } from './standard-values';
export { supplyBenchCases, type BenchCase } from './bench';
