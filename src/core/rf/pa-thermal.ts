// PA device heating: dissipation per device, heatsink needed, junction temperature with a fitted heatsink.
import type { Finding } from '../findings';
import type { PaParams } from '../model';
import { quotient } from '../numeric';
import { NEGLIGIBLE_DISSIPATION_W } from '../thermal/junction';

export interface PaThermal {
  /** Key-down dissipation of all devices (DC in - RF out + bias idle), W. */
  dissipationTotalW: number;
  /** Key-down dissipation of one device, W. */
  dissipationPerDeviceW: number;
  /** Duty-averaged dissipation of one device (keying duty key-down, bias idle otherwise), W. */
  averagePerDeviceW: number;
  /** Junction temperature target, 0.8 x Tjmax, °C. */
  tjTargetC: number;
  /**
   * Largest heatsink-to-air resistance meeting the target for the duty-averaged load, K/W (null: none possible;
   * NO_HEATSINK_NEEDED_K_PER_W when the dissipation is below NEGLIGIBLE_DISSIPATION_W).
   */
  thetaSaNeededAverageKPerW: number | null;
  /** Same for a continuous key-down (tune-up) carrier, K/W (null: none possible). */
  thetaSaNeededContinuousKPerW: number | null;
  /** Devices whose heat flows through one heatsink (θsa); 1 = one heatsink per device. */
  sharedBy: number;
  /** Junction temperature with the fitted heatsink (null when none chosen), °C. */
  tjAverageC: number | null;
  tjContinuousC: number | null;
}

export { NEGLIGIBLE_DISSIPATION_W };
/** θsa reported when the dissipation is negligible: any heatsink, or none, will do, K/W. */
export const NO_HEATSINK_NEEDED_K_PER_W = 1e6;

const SRC = 'pa.thermal';

export function paThermal(
  pa: PaParams,
  outputW: number,
  dcInputW: number,
  biasW: number,
  ambientC: number,
  keyingDuty: number,
): PaThermal & { findings: Finding[] } {
  const m = pa.mount;
  const n = Math.max(1, pa.devices);
  const dissipationTotalW = Math.max(0, dcInputW - outputW) + biasW;
  const perDevice = dissipationTotalW / n;
  const duty = Math.min(1, Math.max(0, keyingDuty));
  // Source: OET-65 Supplement B (1997), Table 2: conversational CW duty 40 % (used here for heating)
  const average = perDevice * duty + (biasW / n) * (1 - duty);
  // Source: reference page on derating practice (REFERENCE-VALUES §7): target Tj <= 0.8 Tjmax
  const tjTargetC = 0.8 * m.tjMaxC;
  const jc = m.thetaJcKPerW + m.thetaCsKPerW;
  // Devices on one heatsink: their heat adds in the one θsa, each keeps its own θjc + θcs
  const sharedBy = Math.min(n, Math.max(1, Math.round(pa.heatsinkSharedBy ?? 1)));
  // Source: series/parallel thermal network (textbook; REFERENCE-VALUES §7 extended to s devices on one sink):
  // Tj = Ta + P (θjc + θcs) + s P θsa, so θsa,max = ((Tj,target - Ta)/P - θjc - θcs) / s
  // A subnormal p (from a rail of 1.5e-322 V) makes the quotient Infinity: below the floor no heatsink is needed.
  const need = (p: number): number | null => {
    if (p < NEGLIGIBLE_DISSIPATION_W) return tjTargetC > ambientC ? NO_HEATSINK_NEEDED_K_PER_W : null;
    const perW = quotient(tjTargetC - ambientC, p, NEGLIGIBLE_DISSIPATION_W);
    const v = perW === null ? null : (perW - jc) / sharedBy;
    return v !== null && v > 0 ? v : null;
  };
  const thetaSaNeededAverageKPerW = need(average);
  const thetaSaNeededContinuousKPerW = need(perDevice);
  const sa = m.thetaSaKPerW;
  // Source: series thermal path Tj = Ta + P (θjc + θcs) + s P θsa (REFERENCE-VALUES §7, s devices on one heatsink)
  const tjAverageC = sa === null ? null : ambientC + average * (jc + sharedBy * sa);
  const tjContinuousC = sa === null ? null : ambientC + perDevice * (jc + sharedBy * sa);
  const sinkWord = sharedBy > 1 ? `for each heatsink shared by ${sharedBy} devices` : 'per device';
  const findings: Finding[] = [];
  if (sa === null && average < NEGLIGIBLE_DISSIPATION_W && thetaSaNeededAverageKPerW !== null) {
    findings.push({
      severity: thetaSaNeededContinuousKPerW === null ? 'caution' : 'ok', rule: 'pa.heatsink', subject: '',
      value: average, limit: NEGLIGIBLE_DISSIPATION_W, unit: 'W', source: SRC,
      message: `The devices dissipate almost nothing (under 1 mW each) in CW keying: no heatsink is needed` +
        (thetaSaNeededContinuousKPerW === null ? '; no heatsink allows a continuous tune-up carrier.' : '.'),
    });
  } else if (sa === null) {
    findings.push({
      severity: thetaSaNeededAverageKPerW === null ? 'fail' : 'ok',
      rule: 'pa.heatsink',
      subject: '',
      value: thetaSaNeededAverageKPerW,
      limit: null,
      unit: 'K/W',
      source: SRC,
      message:
        thetaSaNeededAverageKPerW === null
          ? `No heatsink can hold the junction below ${tjTargetC.toFixed(0)} °C at ${average.toFixed(1)}` +
            ` W per device: share the heat over more devices or lower the power.`
          : `Choose a heatsink of at most ${thetaSaNeededAverageKPerW.toFixed(2)} K/W ${sinkWord} for CW keying` +
            (thetaSaNeededContinuousKPerW === null
              ? '; no heatsink allows a continuous tune-up carrier.'
              : ` (${thetaSaNeededContinuousKPerW.toFixed(2)} K/W for a continuous tune-up carrier).`),
    });
  } else {
    const ta = tjAverageC as number;
    const tc = tjContinuousC as number;
    findings.push({
      severity: ta > tjTargetC ? 'fail' : 'ok',
      rule: 'pa.tj-keying',
      subject: '',
      value: ta,
      limit: tjTargetC,
      unit: '°C',
      source: SRC,
      message:
        ta > tjTargetC
          ? `With the fitted heatsink${sharedBy > 1 ? ` (shared by ${sharedBy} devices)` : ''} the junction averages ` +
            `${ta.toFixed(0)} °C in CW keying, above the ${tjTargetC.toFixed(0)} °C target: fit a larger heatsink.`
          : `Junction about ${ta.toFixed(0)} °C in CW keying (target ${tjTargetC.toFixed(0)} °C)` +
            `${sharedBy > 1 ? `, ${sharedBy} devices sharing one heatsink` : ''}.`,
    });
    findings.push({
      severity: tc > tjTargetC ? 'caution' : 'ok',
      rule: 'pa.tj-carrier',
      subject: '',
      value: tc,
      limit: tjTargetC,
      unit: '°C',
      source: SRC,
      message:
        tc > m.tjMaxC
          ? `A continuous carrier would take the junction to ${tc.toFixed(0)} °C, beyond its ${m.tjMaxC}` +
            ` °C maximum: keep tune-up to a few seconds or tune at reduced power.`
          : tc > tjTargetC
            ? `A continuous carrier would reach ${tc.toFixed(0)} °C, above the ${tjTargetC.toFixed(0)} °C target: ` +
              `keep tune-up short.`
            : `A continuous tune-up carrier stays at about ${tc.toFixed(0)} °C.`,
    });
  }
  findings.push({
    severity: 'caution',
    rule: 'pa.heat-safety',
    subject: '',
    value: null,
    limit: null,
    unit: '',
    source: 'pa.heat',
    kind: 'standing',
    message:
      'Heatsinks and device tabs get hot enough to burn; tabs are often at drain voltage, so insulate them or keep ' +
        'fingers away when keyed.',
  });
  return {
    dissipationTotalW, dissipationPerDeviceW: perDevice, averagePerDeviceW: average, tjTargetC, sharedBy,
    thetaSaNeededAverageKPerW, thetaSaNeededContinuousKPerW, tjAverageC, tjContinuousC, findings,
  };
}
