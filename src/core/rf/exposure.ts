// RF exposure estimate: OET Bulletin 65 far-field method against the limits of the project's rule set:
// 47 CFR 1.1310 (US) or the ICNIRP 1998 reference levels (ITU / CEPT).
import type { Finding } from '../findings';
import type { RfSettings } from '../model';
import { validateRfSettings } from './lpf-validate';
import { fieldLabel } from './field-labels';

export const EXPOSURE_CAUTION =
  'This is a far-field estimate for planning only. Local rules and your licence conditions govern RF exposure; ' +
  'evaluate the finished station as they require, keep people away from the antenna while transmitting, and never ' +
  'touch an antenna or feedline while keyed.';

/** Power-density limits in mW/cm^2 at f (MHz); null outside 0.3–100,000 MHz. */
export function mpeLimitsMwPerCm2(fMHz: number): { controlled: number; general: number } | null {
  if (!(fMHz >= 0.3 && fMHz <= 100_000)) return null;
  // Source: 47 CFR 1.1310 Table 1 (A) occupational/controlled (plane-wave equivalent below 30 MHz)
  const controlled = fMHz < 3 ? 100 : fMHz < 30 ? 900 / fMHz ** 2 : fMHz < 300 ? 1.0 : fMHz < 1500 ? fMHz / 300 : 5;
  // Source: 47 CFR 1.1310 Table 1 (B) general population/uncontrolled
  const general = fMHz < 1.34 ? 100 : fMHz < 30 ? 180 / fMHz ** 2 : fMHz < 300 ? 0.2 : fMHz < 1500 ? fMHz / 1500 : 1.0;
  return { controlled, general };
}

/**
 * ICNIRP (1998) electric-field reference levels as plane-wave equivalent power density, W/m^2 (S = E^2 / 377);
 * null outside 0.15-400 MHz. Below 10 MHz ICNIRP gives no power-density level, so the E-field level is converted.
 */
export function icnirpLimitsWPerM2(
  fMHz: number,
): { occupational: number; general: number; occupationalEVPerM: number; generalEVPerM: number } | null {
  if (!(fMHz >= 0.15 && fMHz <= 400)) return null;
  // Source: ICNIRP (1998) Table 7 = EU Council Recommendation 1999/519/EC: 0.15-1 MHz
  // 87 V/m, 1-10 MHz 87/f^0.5, 10-400 MHz 28
  const generalEVPerM = fMHz < 1 ? 87 : fMHz < 10 ? 87 / Math.sqrt(fMHz) : 28;
  // Source: ICNIRP (1998) Table 6 (occupational): up to 1 MHz 610 V/m, 1-10 MHz 610/f, 10-400 MHz 61 V/m
  const occupationalEVPerM = fMHz < 1 ? 610 : fMHz < 10 ? 610 / fMHz : 61;
  // Source: plane-wave impedance of free space, 377 ohm: S = E^2 / 377
  return {
    occupational: occupationalEVPerM ** 2 / 377,
    general: generalEVPerM ** 2 / 377,
    occupationalEVPerM,
    generalEVPerM,
  };
}

/** ERP threshold (W) for exemption at distance R (m), f in MHz. */
export function exemptionThresholdW(fMHz: number, distanceM: number): number {
  const r2 = distanceM * distanceM;
  // Source: 47 CFR 1.1307(b)(3)(i)(C), Table 1 (single RF source thresholds)
  if (fMHz < 1.34) return 1920 * r2;
  if (fMHz < 30) return (3450 * r2) / (fMHz * fMHz);
  if (fMHz < 300) return 3.83 * r2;
  if (fMHz < 1500) return 0.0128 * r2 * fMHz;
  return 19.2 * r2;
}

export interface ExposureResult {
  /** Rule set whose limits were used ('us-97-307': 47 CFR 1.1310; 'itu-app3': ICNIRP 1998). */
  ruleSet: RfSettings['spuriousRule'];
  /** Name of the limits, and of the two groups of people they protect. */
  limitsName: string;
  generalLabel: string;
  controlledLabel: string;
  /** Operating frequency, Hz. */
  frequencyHz: number;
  /** Key-down transmitter output, W. */
  peakPowerW: number;
  /** Time-averaged power at the transmitter: peak x duty factor x fraction of the averaging period on air, W. */
  averagePowerW: number;
  /** Time-averaged EIRP and ERP (ERP = EIRP / 1.64), W. */
  eirpW: number;
  erpW: number;
  /** Whether the 2.56 ground-reflection factor was applied. */
  groundReflection: boolean;
  /** Limits at this frequency, W/m^2 (1 mW/cm^2 = 10 W/m^2); null outside the table. */
  limitControlledWPerM2: number | null;
  limitGeneralWPerM2: number | null;
  /** Minimum distance from the antenna, m (null outside the table). */
  controlledDistanceM: number | null;
  generalDistanceM: number | null;
  /** lambda / 2 pi, m: inside it the far-field figures are estimates only. */
  nearFieldDistanceM: number;
  /** True when both distances are at least lambda / 2 pi. */
  farFieldValid: boolean;
  /** ERP threshold at lambda/2pi, W; exempt = time-averaged ERP at or below it; distance beyond which exempt, m. */
  exemptionThresholdW: number | null;
  exempt: boolean | null;
  exemptBeyondM: number | null;
  /** Caution text to show beside the distances (local rules govern). */
  caution: string;
  findings: Finding[];
}

const LIMITS = {
  'us-97-307': {
    name: '47 CFR 1.1310 (FCC)',
    general: 'general public (uncontrolled)',
    controlled: 'you and your household (controlled)',
  },
  'itu-app3': {
    name: 'ICNIRP (1998) reference levels',
    general: 'general public',
    controlled: 'occupational level (only where local rules allow it for the licensee)',
  },
} as const;

export function evaluateExposure(peakPowerW: number, frequencyHz: number, rf: RfSettings): ExposureResult {
  const bad = validateRfSettings(rf).filter((e) => e.field !== 'evenHarmonicDbc' && e.field !== 'worstSwr');
  if (bad.length > 0) {
    return {
      ruleSet: rf.spuriousRule,
      limitsName: LIMITS[rf.spuriousRule].name,
      generalLabel: LIMITS[rf.spuriousRule].general,
      controlledLabel: LIMITS[rf.spuriousRule].controlled,
      frequencyHz: Number.isFinite(frequencyHz) ? frequencyHz : 0,
      peakPowerW: 0,
      averagePowerW: 0,
      eirpW: 0,
      erpW: 0,
      groundReflection: rf.groundReflection,
      limitControlledWPerM2: null,
      limitGeneralWPerM2: null,
      controlledDistanceM: null,
      generalDistanceM: null,
      nearFieldDistanceM: 0,
      farFieldValid: false,
      exemptionThresholdW: null,
      exempt: null,
      exemptBeyondM: null,
      caution: EXPOSURE_CAUTION,
      findings: [
        ...bad.map((e): Finding => ({
          severity: 'fail',
          rule: 'exposure.input',
          subject: `RF exposure: ${fieldLabel(e.field)}`,
          value: null,
          limit: null,
          unit: '',
          source: 'design.input',
          message: e.message,
        })),
        {
          severity: 'caution',
          rule: 'exposure.local-rules',
          subject: 'RF exposure',
          value: null,
          limit: null,
          unit: '',
          source: 'exposure.local-rules',
          kind: 'standing',
          message: EXPOSURE_CAUTION,
        },
      ],
    };
  }
  const fMHz = frequencyHz / 1e6;
  const p = Math.max(0, Number.isFinite(peakPowerW) ? peakPowerW : 0);
  // Source: OET-65 Supplement B (1997): average = PEP x duty factor x fraction of averaging time on air
  const averagePowerW =
    p * Math.min(1, Math.max(0, rf.exposureDutyFactor)) * Math.min(1, Math.max(0, rf.exposureOnFraction));
  // Source: OET Bulletin 65 (1997): EIRP = P G, feedline loss reduces P
  const eirpW = averagePowerW * 10 ** (-Math.max(0, rf.feedlineLossDb) / 10) * 10 ** (rf.antennaGainDbi / 10);
  const erpW = eirpW / 1.64;
  const us = rf.spuriousRule === 'us-97-307';
  const names = LIMITS[rf.spuriousRule];
  const icnirp = us ? null : icnirpLimitsWPerM2(fMHz);
  // both in mW/cm^2 (1 W/m^2 = 0.1 mW/cm^2)
  const lim = us
    ? mpeLimitsMwPerCm2(fMHz)
    : icnirp
      ? { controlled: icnirp.occupational / 10, general: icnirp.general / 10 }
      : null;
  // Source: OET Bulletin 65 (1997): R = sqrt(k EIRP / (4 pi S)), k = 2.56 with ground reflection (EPA model)
  const k = rf.groundReflection ? 2.56 : 1;
  const dist = (sMwPerCm2: number) => Math.sqrt((k * eirpW * 1e3) / (4 * Math.PI * sMwPerCm2)) / 100;
  // Source: 47 CFR 1.1307(b)(3)(i)(C) / FCC 19-126 note 143: lambda/2pi = 47.7/f m
  const nearFieldDistanceM = fMHz >= 0.01 ? 47.7 / fMHz : 0;
  const controlledDistanceM = lim ? dist(lim.controlled) : null;
  const generalDistanceM = lim ? dist(lim.general) : null;
  const farFieldValid =
    generalDistanceM !== null &&
    controlledDistanceM !== null &&
    Math.min(generalDistanceM, controlledDistanceM) >= nearFieldDistanceM;
  // the exemption is a US rule: the ITU / CEPT rule set has none
  const thr = lim && us ? exemptionThresholdW(fMHz, nearFieldDistanceM) : null;
  const exempt = thr === null ? null : erpW <= thr;
  const exemptBeyondM =
    thr === null
      ? null
      : Math.max(nearFieldDistanceM, Math.sqrt((erpW * nearFieldDistanceM ** 2) / Math.max(thr, 1e-30)));
  const findings: Finding[] = [];
  if (!lim) {
    findings.push({
      severity: 'fail',
      rule: 'exposure.range',
      subject: 'RF exposure',
      value: frequencyHz,
      limit: us ? 3e5 : 1.5e5,
      unit: 'Hz',
      source: us ? 'exposure.fcc-range' : 'exposure.icnirp-range',
      message: `The operating frequency is outside the exposure ` +
        `limit table (${us ? '0.3 MHz to 100 GHz' : '0.15 MHz to 400 MHz'}); no estimate is possible.`,
    });
  } else {
    findings.push({
      severity: 'caution',
      kind: 'standing',
      rule: 'exposure.distance',
      subject: 'RF exposure',
      value: generalDistanceM,
      limit: null,
      unit: 'm',
      source: us ? 'exposure.fcc-distance' : 'exposure.icnirp-distance',
      message: `Keep people at least ${(generalDistanceM as number).toFixed(2)} m (${names.general}) and ` +
        `${(controlledDistanceM as number).toFixed(2)} m (${names.controlled}) from the antenna (${names.name}).`,
    });
    if (!farFieldValid) {
      findings.push({
        severity: 'caution',
        rule: 'exposure.near-field',
        subject: 'RF exposure',
        value: generalDistanceM,
        limit: nearFieldDistanceM,
        unit: 'm',
        source: 'exposure.near-field',
        kind: 'standing',
        message: `These distances lie inside λ/2π = ${nearFieldDistanceM.toFixed(2)} m (reactive near field), ` +
          `where the far-field formula is only a rough estimate.`,
      });
    }
    if (thr !== null)
      findings.push({
        severity: exempt ? 'ok' : 'caution',
        rule: 'exposure.exemption',
        subject: 'RF exposure',
        value: erpW,
        limit: thr,
        unit: 'W',
        source: 'exposure.fcc-exemption',
        message: exempt
          ? `Time-averaged ERP ${erpW.toFixed(1)} W is within the ${(thr as number).toFixed(0)} W exemption ` +
            `threshold for people at ${nearFieldDistanceM.toFixed(2)} m or more (US rule).`
          : `Time-averaged ERP ${erpW.toFixed(1)} W exceeds the exemption ` +
            `threshold at ${nearFieldDistanceM.toFixed(2)} m; a routine evaluation is needed for people ` +
            `closer than ${(exemptBeyondM as number).toFixed(1)} m (US rule).`,
      });
  }
  findings.push({
    severity: 'caution',
    rule: 'exposure.local-rules',
    subject: 'RF exposure',
    value: null,
    limit: null,
    unit: '',
    source: 'exposure.local-rules',
    kind: 'standing',
    message: EXPOSURE_CAUTION,
  });
  return {
    ruleSet: rf.spuriousRule, limitsName: names.name, generalLabel: names.general, controlledLabel: names.controlled,
    frequencyHz, peakPowerW: p, averagePowerW, eirpW, erpW, groundReflection: rf.groundReflection,
    limitControlledWPerM2: lim ? lim.controlled * 10 : null, limitGeneralWPerM2: lim ? lim.general * 10 : null,
    controlledDistanceM, generalDistanceM, nearFieldDistanceM, farFieldValid,
    exemptionThresholdW: thr, exempt, exemptBeyondM, caution: EXPOSURE_CAUTION, findings,
  };
}
