// Validation of filter, PA, relay and project RF/heating inputs: errors as values, from the input specs.
import type { LpfParams, PaParams, RelayParams, RfSettings } from '../model';
import { lpfSpec, paSpec, relaySpec, validate } from '../spec';
import { rfInputsSpec, thermalInputsSpec } from '../spec/settings';
import { rfSettingsSpec } from '../spec/rf-settings';

export interface FieldError {
  /** Name of the offending field in the params object. */
  field: string;
  /** Sentence a builder understands. */
  message: string;
}

export type Checked<T> = { ok: true; value: T } | { ok: false; errors: FieldError[] };

// The target power floor lives with the settings spec (one definition); re-exported for the PA.
export { MIN_TARGET_POWER_W } from '../spec/settings';

// Filter, PA and relay data: the checks come from their input specs, the same limits the forms and files use.
export const validateLpfParams = (p: LpfParams): FieldError[] => validate(lpfSpec, p);
export const validatePaParams = (p: PaParams): FieldError[] => validate(paSpec, p);
export const validateRelayParams = (p: RelayParams): FieldError[] => validate(relaySpec, p);

/** Project-level inputs the RF engine needs: the settings spec's frequency and target power fields. */
export const validateRfInputs = (frequencyHz: number, targetPowerW: number): FieldError[] =>
  validate(rfInputsSpec, { frequencyHz, targetPowerW });

/** Project RF settings (spurious rule, SWR, antenna, exposure). Field names are keys of RfSettings. */
export const validateRfSettings = (rf: RfSettings): FieldError[] => validate(rfSettingsSpec, rf);

/** Project heating inputs used by the PA: the settings spec's ambient and keying-duty fields. */
export const validateThermalInputs = (ambientC: number, keyingDuty: number): FieldError[] =>
  validate(thermalInputsSpec, { ambientC, keyingDuty });
