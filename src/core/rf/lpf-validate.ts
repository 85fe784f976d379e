// Validation of filter, PA and relay parameters: errors as values, for display beside form fields.
import type { LpfParams, PaParams, RelayParams, RfSettings } from '../model';
import { lpfSpec, paSpec, relaySpec, validate } from '../spec';
import { usablePositive } from '../numeric';

export interface FieldError {
  /** Name of the offending field in the params object. */
  field: string;
  /** Sentence a builder understands. */
  message: string;
}

export type Checked<T> = { ok: true; value: T } | { ok: false; errors: FieldError[] };

const pos = (v: unknown) => typeof v === 'number' && Number.isFinite(v) && v > 0;
const within = (v: unknown, lo: number, hi: number) => typeof v === 'number' && v >= lo && v <= hi;
const nonNeg = (v: unknown) => typeof v === 'number' && Number.isFinite(v) && v >= 0;

/**
 * Smallest target power, W: the PA divides by it (load line, dB from target), and a subnormal such as 5e-324 W passed
 * `> 0` and gave "Infinity dB". Common practice, no published source: 1 mW (0 dBm) is below any transmitter built here.
 */
export const MIN_TARGET_POWER_W = 1e-3;

// Filter, PA and relay data: the checks come from their input specs, the same limits the forms and files use.
export const validateLpfParams = (p: LpfParams): FieldError[] => validate(lpfSpec, p);
export const validatePaParams = (p: PaParams): FieldError[] => validate(paSpec, p);
export const validateRelayParams = (p: RelayParams): FieldError[] => validate(relaySpec, p);

/** Project-level inputs the RF engine needs. */
export function validateRfInputs(frequencyHz: number, powerW: number): FieldError[] {
  const e: FieldError[] = [];
  if (!(pos(frequencyHz) && frequencyHz >= 10e3 && frequencyHz <= 1e9)) {
    e.push({ field: 'frequencyHz', message: 'Operating frequency must be between 10 kHz and 1 GHz.' });
  }
  if (!(usablePositive(powerW, MIN_TARGET_POWER_W) && powerW <= 10e3)) {
    e.push({ field: 'targetPowerW', message: 'Target power must be at least 1 mW and at most 10 kW.' });
  }
  return e;
}

/** Project RF settings (spurious rule, SWR, antenna, exposure). Field names are keys of RfSettings. */
export function validateRfSettings(rf: RfSettings): FieldError[] {
  const e: FieldError[] = [];
  if (!within(rf.worstSwr, 1, 100)) e.push({ field: 'worstSwr', message: 'Worst-case SWR must be between 1 and 100.' });
  if (!within(rf.antennaGainDbi, -30, 30)) e.push({ field: 'antennaGainDbi', message: 'Antenna gain must be between -30 and 30 dBi.' });
  if (!within(rf.feedlineLossDb, 0, 30)) e.push({ field: 'feedlineLossDb', message: 'Feedline loss must be between 0 and 30 dB.' });
  if (!within(rf.evenHarmonicDbc, -120, 0)) e.push({ field: 'evenHarmonicDbc', message: 'Even-harmonic residual must be between -120 and 0 dBc.' });
  if (!within(rf.exposureDutyFactor, 0, 1)) e.push({ field: 'exposureDutyFactor', message: 'Duty factor must be between 0 and 100 %.' });
  if (!within(rf.exposureOnFraction, 0, 1)) e.push({ field: 'exposureOnFraction', message: 'Fraction of the averaging time on the air must be between 0 and 100 %.' });
  return e;
}

/** Project heating inputs used by the PA. */
export function validateThermalInputs(ambientC: number, keyingDuty: number): FieldError[] {
  const e: FieldError[] = [];
  if (!within(ambientC, -60, 150)) e.push({ field: 'ambientC', message: 'Ambient temperature must be between -60 and 150 °C.' });
  if (!within(keyingDuty, 0, 1)) e.push({ field: 'keyingDuty', message: 'Keying duty must be between 0 and 100 %.' });
  return e;
}
