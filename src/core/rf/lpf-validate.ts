// Validation of filter, PA and relay parameters: errors as values, for display beside form fields.
import type { LpfParams, PaParams, RelayParams } from '../model';

export interface FieldError {
  /** Name of the offending field in the params object. */
  field: string;
  /** Sentence a builder understands. */
  message: string;
}

export type Checked<T> = { ok: true; value: T } | { ok: false; errors: FieldError[] };

const pos = (v: unknown) => typeof v === 'number' && Number.isFinite(v) && v > 0;
const nonNeg = (v: unknown) => typeof v === 'number' && Number.isFinite(v) && v >= 0;

export function validateLpfParams(p: LpfParams): FieldError[] {
  const e: FieldError[] = [];
  if (!Number.isInteger(p.order) || p.order < 3 || p.order > 9) {
    e.push({ field: 'order', message: 'Filter order must be a whole number from 3 to 9.' });
  } else if (p.order % 2 === 0) {
    e.push({ field: 'order', message: 'Use an odd order (3, 5, 7 or 9): even-order Chebyshev filters do not match 50 Ω at both ends.' });
  }
  if (p.response === 'chebyshev' && !(p.rippleDb >= 0.01 && p.rippleDb <= 0.5)) {
    e.push({ field: 'rippleDb', message: 'Passband ripple must be between 0.01 dB and 0.5 dB.' });
  }
  if (p.cutoffHz !== null && !pos(p.cutoffHz)) e.push({ field: 'cutoffHz', message: 'Cutoff must be above zero (or left blank to choose it from the band).' });
  if (!pos(p.coreAlHPerTurn2)) e.push({ field: 'coreAlHPerTurn2', message: 'The core AL value must be above zero.' });
  if (!pos(p.inductorQ)) e.push({ field: 'inductorQ', message: 'Inductor Q must be above zero.' });
  if (!pos(p.capacitorQ)) e.push({ field: 'capacitorQ', message: 'Capacitor Q must be above zero.' });
  if (!(nonNeg(p.capacitorTolerance) && p.capacitorTolerance < 0.5)) e.push({ field: 'capacitorTolerance', message: 'Capacitor tolerance must be from 0 to 50 %.' });
  if (!(nonNeg(p.inductorTolerance) && p.inductorTolerance < 0.5)) e.push({ field: 'inductorTolerance', message: 'Inductor tolerance must be from 0 to 50 %.' });
  if (!(Number.isInteger(p.monteCarloTrials) && p.monteCarloTrials >= 0 && p.monteCarloTrials <= 200_000)) {
    e.push({ field: 'monteCarloTrials', message: 'Monte Carlo trials must be a whole number from 0 to 200,000.' });
  }
  if (!Number.isFinite(p.seed)) e.push({ field: 'seed', message: 'The random seed must be a number.' });
  return e;
}

export function validatePaParams(p: PaParams): FieldError[] {
  const e: FieldError[] = [];
  if (!(Number.isInteger(p.devices) && p.devices >= 1)) e.push({ field: 'devices', message: 'Number of devices must be 1 or more.' });
  if (p.topology === 'push-pull' && p.devices < 2) e.push({ field: 'devices', message: 'A push-pull stage has at least 2 devices.' });
  if (p.saturationV !== null && !nonNeg(p.saturationV)) e.push({ field: 'saturationV', message: 'Saturation voltage cannot be negative.' });
  if (p.rdsOnOhm !== null && !nonNeg(p.rdsOnOhm)) e.push({ field: 'rdsOnOhm', message: 'Rds(on) cannot be negative.' });
  if (p.turnsRatio !== null && !pos(p.turnsRatio)) e.push({ field: 'turnsRatio', message: 'Turns ratio must be above zero (or blank to design for the target power).' });
  if (!pos(p.loadOhm)) e.push({ field: 'loadOhm', message: 'Load resistance must be above zero.' });
  if (p.efficiency !== null && !(p.efficiency > 0 && p.efficiency <= 1)) e.push({ field: 'efficiency', message: 'Efficiency must be above 0 and at most 100 %.' });
  if (!pos(p.deviceVdsMaxV)) e.push({ field: 'deviceVdsMaxV', message: 'Device voltage rating must be above zero.' });
  if (!pos(p.deviceIdMaxA)) e.push({ field: 'deviceIdMaxA', message: 'Device current rating must be above zero.' });
  if (!nonNeg(p.biasIdleMaxA)) e.push({ field: 'biasIdleMaxA', message: 'Bias idle current cannot be negative.' });
  if (!pos(p.referencePowerW)) e.push({ field: 'referencePowerW', message: 'Reference power must be above zero.' });
  if (!nonNeg(p.mount.thetaJcKPerW)) e.push({ field: 'mount.thetaJcKPerW', message: 'θjc cannot be negative.' });
  if (!nonNeg(p.mount.thetaCsKPerW)) e.push({ field: 'mount.thetaCsKPerW', message: 'θcs cannot be negative.' });
  if (p.mount.thetaSaKPerW !== null && !nonNeg(p.mount.thetaSaKPerW)) e.push({ field: 'mount.thetaSaKPerW', message: 'θsa cannot be negative.' });
  if (!pos(p.mount.tjMaxC)) e.push({ field: 'mount.tjMaxC', message: 'Maximum junction temperature must be above 0 °C.' });
  return e;
}

export function validateRelayParams(p: RelayParams): FieldError[] {
  const e: FieldError[] = [];
  for (const f of ['contactCarryA', 'contactSwitchA', 'contactRatedV', 'receiverMaxInputW', 'wpm'] as const) {
    if (!pos(p[f])) e.push({ field: f, message: 'Must be above zero.' });
  }
  if (p.rfRatedVpeak !== null && !pos(p.rfRatedVpeak)) e.push({ field: 'rfRatedVpeak', message: 'RF voltage rating must be above zero (or blank if not stated).' });
  for (const f of ['coilA', 'isolationDb', 'operateS', 'releaseS', 'bounceS', 'dcSwitchedA', 'txDelayS'] as const) {
    if (!nonNeg(p[f])) e.push({ field: f, message: 'Cannot be negative.' });
  }
  return e;
}

/** Project-level inputs the RF engine needs. */
export function validateRfInputs(frequencyHz: number, powerW: number): FieldError[] {
  const e: FieldError[] = [];
  if (!pos(frequencyHz)) e.push({ field: 'frequencyHz', message: 'Operating frequency must be above zero.' });
  if (!pos(powerW)) e.push({ field: 'targetPowerW', message: 'Target power must be above zero.' });
  return e;
}
