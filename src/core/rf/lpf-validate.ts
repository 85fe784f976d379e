// Validation of filter, PA and relay parameters: errors as values, for display beside form fields.
import type { LpfParams, PaParams, RelayParams, RfSettings } from '../model';
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
  if (p.cutoffHz !== null && !(pos(p.cutoffHz) && p.cutoffHz <= 1e10)) e.push({ field: 'cutoffHz', message: 'Cutoff must be above zero (or left blank to choose it from the band).' });
  if (!(pos(p.coreAlHPerTurn2) && p.coreAlHPerTurn2 >= 1e-12 && p.coreAlHPerTurn2 <= 1e-4)) {
    e.push({ field: 'coreAlHPerTurn2', message: 'The core AL value must be above zero (between 0.001 and 100,000 nH per turn²).' });
  }
  if (!(pos(p.inductorQ) && p.inductorQ >= 1 && p.inductorQ <= 1e6)) e.push({ field: 'inductorQ', message: 'Inductor Q must be between 1 and 1,000,000.' });
  if (!(pos(p.capacitorQ) && p.capacitorQ >= 1 && p.capacitorQ <= 1e6)) e.push({ field: 'capacitorQ', message: 'Capacitor Q must be between 1 and 1,000,000.' });
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
  if (!(Number.isInteger(p.devices) && p.devices >= 1 && p.devices <= 1000)) e.push({ field: 'devices', message: 'Number of devices must be 1 or more.' });
  if (p.topology === 'push-pull' && p.devices < 2) e.push({ field: 'devices', message: 'A push-pull stage has at least 2 devices.' });
  if (p.saturationV !== null && !nonNeg(p.saturationV)) e.push({ field: 'saturationV', message: 'Saturation voltage cannot be negative.' });
  if (p.rdsOnOhm !== null && !nonNeg(p.rdsOnOhm)) e.push({ field: 'rdsOnOhm', message: 'Rds(on) cannot be negative.' });
  if (p.turnsRatio !== null && !(pos(p.turnsRatio) && p.turnsRatio >= 0.05 && p.turnsRatio <= 20)) {
    e.push({ field: 'turnsRatio', message: 'Turns ratio must be between 0.05 and 20 (or blank to design for the target power).' });
  }
  if (!(pos(p.loadOhm) && p.loadOhm >= 0.1 && p.loadOhm <= 1e4)) e.push({ field: 'loadOhm', message: 'Load resistance must be between 0.1 Ω and 10 kΩ.' });
  if (p.efficiency !== null && !(p.efficiency >= 0.05 && p.efficiency <= 1)) e.push({ field: 'efficiency', message: 'Efficiency must be between 5 % and 100 %.' });
  if (!within(p.deviceVdsMaxV, 1e-3, 1e5)) e.push({ field: 'deviceVdsMaxV', message: 'Device voltage rating must be above zero.' });
  if (!within(p.deviceIdMaxA, 1e-6, 1e4)) e.push({ field: 'deviceIdMaxA', message: 'Device current rating must be above zero.' });
  if (!within(p.biasIdleMaxA, 0, 1e3)) e.push({ field: 'biasIdleMaxA', message: 'Bias idle current cannot be negative.' });
  if (!within(p.referencePowerW, 1e-9, 1e6)) e.push({ field: 'referencePowerW', message: 'Reference power must be above zero.' });
  if (!within(p.mount.thetaJcKPerW, 0, 1e4)) e.push({ field: 'mount.thetaJcKPerW', message: 'θjc cannot be negative.' });
  if (!within(p.mount.thetaCsKPerW, 0, 1e4)) e.push({ field: 'mount.thetaCsKPerW', message: 'θcs cannot be negative.' });
  if (p.mount.thetaSaKPerW !== null && !within(p.mount.thetaSaKPerW, 0, 1e4)) e.push({ field: 'mount.thetaSaKPerW', message: 'θsa cannot be negative.' });
  if (!within(p.mount.tjMaxC, 1, 500)) e.push({ field: 'mount.tjMaxC', message: 'Maximum junction temperature must be between 1 and 500 °C.' });
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

/**
 * Smallest target power, W: the PA divides by it (load line, dB from target), and a subnormal such as 5e-324 W passed
 * `> 0` and gave "Infinity dB". Common practice, no published source: 1 mW (0 dBm) is below any transmitter built here.
 */
export const MIN_TARGET_POWER_W = 1e-3;

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
