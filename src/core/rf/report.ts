// Shape of the RF engine's report: plain JSON (no Maps, no NaN), SI units unless a key says otherwise.
import type { StressPower } from './stress-power';
import type { Finding } from '../findings';
import type { ExposureResult } from './exposure';
import type { RfSettings } from '../model';
import type { HarmonicsReport } from './harmonics';
import type { LpfAnalysis } from './lpf-analysis';
import type { LpfDesign } from './lpf-design';
import type { MonteCarloResult } from './lpf-monte-carlo';
import type { FieldError } from './lpf-validate';
import type { PaResult } from './pa';
import type { RelayResult } from './tr-relay';
import type { KeyingResult } from './keying-eval';
import type { CoreRealisation } from './cores-check';
import type { LNetwork, RfChoke } from './output-network';
import type { ClassEShunt, PiNetwork } from './pi-network';
import type { OutputTransformerCheck } from './core-catalog';

export interface LpfStageResult {
  /** Field errors of the filter parameters (design/analysis null when not empty). */
  errors: FieldError[];
  design: LpfDesign | null;
  analysis: LpfAnalysis | null;
  monteCarlo: MonteCarloResult | null;
  /** Peak RF voltage across the shunt capacitors at the worst SWR, V (choose capacitors rated well above it). */
  capacitorPeakV: number;
  /** Heat in the filter at key-down from its insertion loss, W. */
  filterLossW: number;
  /**
   * Each element's RF voltage and current at the worst SWR, the core's flux, fit and
   * self-resonance (absent when not designed).
   */
  realisation?: CoreRealisation | null;
}

export interface RfStageResult {
  stageId: string;
  stageName: string;
  kind: 'final' | 'lpf' | 'tr';
  /** PA results (kind 'final'). */
  pa: PaResult | null;
  /** Filter results (kind 'lpf'). */
  lpf: LpfStageResult | null;
  /** Relay results (kind 'tr'). */
  relay: RelayResult | null;
  /** PA (kind 'final'): the L network of a single-ended stage matched by a network, and its drain feed choke. */
  network?: LNetwork | null;
  choke?: RfChoke | null;
  /** PA matched by a network: the pi network for the same drain load (balanced for push-pull). */
  pi?: PiNetwork | null;
  /** Class E: the shunt capacitance needed per switch against the device's own, and the part to add. */
  classEShunt?: ClassEShunt | null;
  /** PA with an output transformer on a catalog core: flux at the highest output and the windings' fit. */
  outputTransformer?: OutputTransformerCheck | null;
  /** Keyed spectrum of a T/R stage (kind 'tr'; null or absent when no edges are entered or its data is refused). */
  keying?: KeyingResult | null;
  /** This stage's findings, most severe first. */
  findings: Finding[];
}

export interface RfReport {
  /** Operating frequency, Hz. */
  frequencyHz: number;
  /** Target output power, W. */
  targetPowerW: number;
  /** Power at the transmitter output after the filter (PA result, else the target), W. */
  outputPowerW: number;
  /** Stage id of the PA and filter used for harmonics and exposure (null when absent). */
  paStageId: string | null;
  lpfStageId: string | null;
  /** Project-level input errors (frequency, power). */
  inputErrors: FieldError[];
  stages: RfStageResult[];
  /** The project's rule set (spurious, exposure and mains sources). */
  ruleSet: RfSettings['spuriousRule'];
  harmonics: HarmonicsReport | null;
  exposure: ExposureResult | null;
  /**
   * Which power each check uses, one short line each: the filter's and relay's parts (the most the stage delivers as
   * built, null when no PA stage is computed: they then take the target), RF exposure and the spurious reference.
   */
  powerBasis?: { parts: StressPower | null; exposure: string; spurious: string };
  /** All findings, most severe first. */
  findings: Finding[];
}
