// Battery or external DC source: voltage window against regulator headroom, and runtime for an operating split.
import type { Finding } from '../findings';
import type { BatteryRail, PerMode } from '../model';
import { safeDuty } from './corners';
import { quotient } from '../numeric';

export interface BatteryRuntime {
  /** Average current over the receive/transmit split (A). */
  averageA: number;
  /** Transmit-time current = keyDown x duty + keyUp x (1 - duty) (A). */
  transmitA: number;
  /** Runtime on the usable capacity (s); 0 when the battery or the load is not usable. */
  runtimeS: number;
}

/**
 * Runtime = usable charge / average current; the transmit current is the CW duty-weighted mean of key-down and key-up.
 * Source: charge balance Q = I t; CW duty factor 0.40 from FCC OET Bulletin 65 Supplement B (1997), Table 2 (ref §2.3
 * [C2]).
 */
/**
 * Average current below which no runtime is given, A. Common practice, no published source: below 1 µA the battery's
 * own self-discharge, not the rig, sets how long it lasts.
 */
export const NEGLIGIBLE_CURRENT_A = 1e-6;

export function batteryRuntime(
  battery: BatteryRail,
  outputA: PerMode,
  keyingDuty: number,
  transmitFraction: number,
): BatteryRuntime {
  const d = safeDuty(keyingDuty);
  const tx = Number.isFinite(transmitFraction) ? Math.min(1, Math.max(0, transmitFraction)) : 0.2;
  const clean = (x: number) => (Number.isFinite(x) && x > 0 ? x : 0);
  const transmitA = clean(outputA.keyDown) * d + clean(outputA.keyUp) * (1 - d);
  const averageA = (1 - tx) * clean(outputA.receive) + tx * transmitA;
  const usableAh = clean(battery.capacityAh) * Math.min(1, clean(battery.usableFraction));
  // 0 = not computed: batteryFindings says why (a subnormal average current made the quotient Infinity)
  const runtimeS = quotient(usableAh * 3600, averageA, NEGLIGIBLE_CURRENT_A) ?? 0;
  return { averageA, transmitA, runtimeS };
}

/** Terminal voltage at end of discharge with the key-down current through the internal resistance (V). */
export function loadedEndV(battery: BatteryRail, keyDownA: number): number {
  const r = Number.isFinite(battery.internalOhm) && battery.internalOhm > 0 ? battery.internalOhm : 0;
  const i = Number.isFinite(keyDownA) && keyDownA > 0 ? keyDownA : 0;
  // Source: Thevenin source model, V = E - I R
  return Math.max(0, (Number.isFinite(battery.endV) ? battery.endV : 0) - i * r);
}

/** `needNote` says where the minimum comes from ('the regulators', 'its loads (stated)'). */
export function batteryFindings(
  battery: BatteryRail,
  requiredMinV: number,
  loadedEnd: number,
  runtime: BatteryRuntime,
  needNote = 'the regulators',
): Finding[] {
  const out: Finding[] = [];
  const subject = battery.name;
  if (!(battery.fullV >= battery.endV) || !(battery.endV > 0)) {
    out.push({
      severity: 'fail',
      rule: 'battery.window',
      subject,
      value: battery.endV,
      limit: battery.fullV,
      unit: 'V',
      source: 'supply.battery-data',
      message: `The end-of-discharge voltage must be above 0 V and not above the full-charge voltage.`,
    });
  }
  if (!(battery.capacityAh > 0)) {
    out.push({
      severity: 'fail',
      rule: 'battery.capacity',
      subject,
      value: battery.capacityAh,
      limit: null,
      unit: 'Ah',
      source: 'supply.battery-data',
      message: `Enter the capacity to get a runtime.`,
    });
  }
  if (requiredMinV > 0) {
    const base = {
      rule: 'battery.end-voltage',
      subject,
      value: loadedEnd,
      limit: requiredMinV,
      unit: 'V',
      source: 'supply.battery-end' as const,
    };
    if (loadedEnd < requiredMinV) {
      const fullLoaded = battery.fullV - (loadedEnd < battery.endV ? battery.endV - loadedEnd : 0);
      const sev = fullLoaded < requiredMinV ? 'fail' : 'caution';
      out.push({
        ...base,
        severity: sev,
        message:
          sev === 'fail'
            ? `${subject}: even fully charged the voltage under key-down load (${fullLoaded.toFixed(2)} V) is below ` +
              `the ${requiredMinV.toFixed(2)} V ${needNote} need.`
            : `${subject}: near end of discharge the voltage under key-down load falls to ${loadedEnd.toFixed(2)}` +
              ` V, below the ${requiredMinV.toFixed(2)} V ${needNote} need; they stop working before the battery is ` +
              `flat, so less capacity is usable than the runtime shows.`,
      });
    } else {
      out.push({
        ...base,
        severity: 'ok',
        message: `At end of discharge under key-down load (${loadedEnd.toFixed(2)} V) ${needNote} still get the ` +
          `${requiredMinV.toFixed(2)} V they need.`,
      });
    }
  }
  if (runtime.runtimeS === 0 && battery.capacityAh > 0 && !(runtime.averageA >= NEGLIGIBLE_CURRENT_A)) {
    out.push({
      severity: 'ok', rule: 'battery.runtime', subject, value: runtime.averageA, limit: NEGLIGIBLE_CURRENT_A, unit: 'A',
      source: 'supply.battery-runtime',
      message: 'No runtime given: the rig draws almost no current from the battery (under 1 µA on average), '
        + 'so self-discharge sets how long it lasts.',
    });
  }
  if (runtime.runtimeS > 0) {
    out.push({
      severity: 'ok',
      rule: 'battery.runtime',
      subject,
      value: runtime.runtimeS,
      limit: null,
      unit: 's',
      source: 'supply.battery-runtime',
      message: `About ${(runtime.runtimeS / 3600).toFixed(1)} h of operation at ` +
        `${(runtime.averageA * 1000).toFixed(0)} mA average.`,
    });
  }
  return out;
}
