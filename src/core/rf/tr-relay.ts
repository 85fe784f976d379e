// T/R relay checks: RF voltage/current at worst SWR, DC contacts, coil load, isolation, keying timing.
import type { Finding } from '../findings';
import type { Mode, PerMode, RelayParams, Stage } from '../model';
import { MODES } from '../model';
import { validateRelayParams } from './lpf-validate';
import { fieldLabel } from './field-labels';

export interface RelayResult {
  /** Net power through the relay, W, and the worst SWR assumed. */
  powerW: number;
  swr: number;
  /** Standing-wave maxima on the line at that SWR: RMS and peak voltage (V), RMS and peak current (A). */
  rfRmsV: number;
  rfPeakV: number;
  rfRmsA: number;
  rfPeakA: number;
  /** Before the filter: upper bound of the peak with PA harmonics added in phase, V (null after the filter). */
  peakWithHarmonicsV: number | null;
  /** Voltage rating compared against, V peak, and whether it is an RF rating. */
  ratedPeakV: number;
  ratedIsRf: boolean;
  /** Power reaching the receiver through the open contacts during transmit, W and dBm. */
  receiverPowerW: number;
  receiverPowerDbm: number;
  /** Morse dot length at the set speed, s. */
  dotS: number;
  /** txDelayS - (operate + bounce), s; negative = RF applied to moving contacts. */
  hotSwitchMarginS: number;
  findings: Finding[];
}

/** Standing-wave maxima on a lossless line for net power P, impedance Z0 and SWR S. */
export function lineMaxima(powerW: number, z0Ohm: number, swr: number) {
  // Source: standard transmission-line theory (REFERENCE-VALUES §9): V_max,rms =
  // sqrt(P Z0 S), I_max,rms = sqrt(P S / Z0)
  const rmsV = Math.sqrt(powerW * z0Ohm * swr);
  const rmsA = Math.sqrt((powerW * swr) / z0Ohm);
  return { rmsV, peakV: Math.SQRT2 * rmsV, rmsA, peakA: Math.SQRT2 * rmsA };
}

// Source: PARIS word convention (a word of 50 dot units; common practice, no published source), dot = 60 / (50 WPM) =
// 1.2/WPM s. ITU-R M.1677 defines the code's unit ratios (dot 1, dash 3, gaps 1/3/7), not the speed in words/min.
export function dotLengthS(wpm: number): number {
  return 1.2 / wpm;
}

export interface RelayInput {
  powerW: number;
  swr: number;
  /** Sum of PA harmonic amplitudes relative to the fundamental (for the before-filter bound). */
  harmonicAmplitudeSum: number;
  subject: string;
}

export function evaluateRelay(r: RelayParams, inp: RelayInput): RelayResult {
  const f: Finding[] = [];
  const s = inp.subject;
  const errors = validateRelayParams(r);
  if (errors.length > 0) {
    return {
      powerW: 0,
      swr: 1,
      rfRmsV: 0,
      rfPeakV: 0,
      rfRmsA: 0,
      rfPeakA: 0,
      peakWithHarmonicsV: null,
      ratedPeakV: 0,
      ratedIsRf: false,
      receiverPowerW: 0,
      receiverPowerDbm: -999,
      dotS: 0,
      hotSwitchMarginS: 0,
      findings: errors.map((e) => ({
        severity: 'fail',
        rule: 'relay.input',
        subject: `${s}: ${fieldLabel(e.field)}`,
        value: null,
        limit: null,
        unit: '',
        source: 'design.input',
        message: e.message,
      })),
    };
  }
  const swr = Number.isFinite(inp.swr) ? Math.min(Math.max(1, inp.swr), 100) : 1;
  if (swr !== inp.swr) {
    f.push({
      severity: 'caution',
      rule: 'relay.swr',
      subject: s,
      value: swr,
      limit: null,
      unit: '',
      source: 'design.input',
      message: `The worst-case SWR was taken as ${swr} (the entered value is outside 1 to 100).`,
    });
  }
  const powerW = Number.isFinite(inp.powerW) ? Math.max(0, inp.powerW) : 0;
  const m = lineMaxima(powerW, 50, swr);
  const before = r.position === 'before-lpf';
  // Source: triangle inequality on the Fourier components (REFERENCE-VALUES §9 note):
  // peak <= fundamental x (1 + sum of harmonics)
  const peakWithHarmonicsV = before ? m.peakV * (1 + Math.max(0, inp.harmonicAmplitudeSum)) : null;
  const ratedIsRf = r.rfRatedVpeak !== null;
  const ratedPeakV = r.rfRatedVpeak ?? r.contactRatedV;
  const checkV = peakWithHarmonicsV ?? m.peakV;
  f.push({
    severity: checkV > ratedPeakV ? 'fail' : !ratedIsRf || checkV > 0.8 * ratedPeakV ? 'caution' : 'ok',
    rule: 'relay.rf-voltage', subject: s, value: checkV, limit: ratedPeakV, unit: 'V', source: 'line.standing-wave',
    message: (checkV > ratedPeakV
      ? `RF peaks up to ${checkV.toFixed(0)} V at SWR ${swr} exceed the ${ratedPeakV} V rating: the contacts can arc.`
      : `RF peaks up to ${checkV.toFixed(0)} V at SWR ${swr} against a ${ratedPeakV} V rating.`) +
      (ratedIsRf ? '' : ' No RF rating is entered, so the DC contact rating is used; RF ratings are usually lower.') +
      (before
        ? ' The relay sits before the low-pass filter, where harmonics add to the peaks; this value is an upper bound.'
        : ''),
  });
  f.push({
    severity: m.rmsA > r.contactCarryA ? 'fail' : m.rmsA > 0.8 * r.contactCarryA ? 'caution' : 'ok',
    rule: 'relay.rf-current',
    subject: s,
    value: m.rmsA,
    limit: r.contactCarryA,
    unit: 'A',
    source: 'line.standing-wave',
    message: `RF current up to ${m.rmsA.toFixed(2)} A RMS at SWR ${swr} against a ${r.contactCarryA} A carry rating.`,
  });
  if (r.dcSwitchedA > 0) {
    const bad = r.dcSwitchedA > r.contactSwitchA || r.dcSwitchedA > r.contactCarryA;
    f.push({
      severity: bad ? 'fail' : r.dcSwitchedA > 0.8 * r.contactSwitchA ? 'caution' : 'ok',
      rule: 'relay.dc-contacts',
      subject: s,
      value: r.dcSwitchedA,
      limit: Math.min(r.contactSwitchA, r.contactCarryA),
      unit: 'A',
      source: 'design.maker-rating',
      message: bad
        ? `The DC contacts switch ${r.dcSwitchedA} A, above their ${r.contactSwitchA} A switching / ` +
          `${r.contactCarryA} A carry rating.`
        : `The DC contacts switch ${r.dcSwitchedA} A within their ${r.contactSwitchA} A switching rating.`,
    });
  }
  // Source: definition of isolation in dB: P_rx = P_tx x 10^(-isolation/10)
  const receiverPowerW = powerW * 10 ** (-r.isolationDb / 10);
  f.push({
    severity:
      receiverPowerW > r.receiverMaxInputW ? 'fail' : receiverPowerW > 0.5 * r.receiverMaxInputW ? 'caution' : 'ok',
    rule: 'relay.isolation',
    subject: s,
    value: receiverPowerW,
    limit: r.receiverMaxInputW,
    unit: 'W',
    source: 'design.maker-rating',
    message:
      receiverPowerW > r.receiverMaxInputW
        ? `About ${(receiverPowerW * 1e3).toPrecision(3)} mW leaks to the receiver ` +
          `input, above its ${(r.receiverMaxInputW * 1e3).toPrecision(3)} mW maximum: add a protection diode pair or ` +
          `a second relay section.`
        : `About ${(receiverPowerW * 1e3).toPrecision(3)} mW reaches the receiver ` +
          `input (maximum ${(r.receiverMaxInputW * 1e3).toPrecision(3)} mW).`,
  });
  const dotS = dotLengthS(r.wpm);
  const hotSwitchMarginS = r.txDelayS - (r.operateS + r.bounceS);
  f.push({
    severity: hotSwitchMarginS < 0 ? 'fail' : 'ok',
    rule: 'relay.hot-switch',
    subject: s,
    value: r.txDelayS,
    limit: r.operateS + r.bounceS,
    unit: 's',
    source: 'design.maker-rating',
    message:
      hotSwitchMarginS < 0
        ? `RF starts ${(r.txDelayS * 1e3).toFixed(1)} ms after the key, before the ` +
          `contacts settle (${((r.operateS + r.bounceS) * 1e3).toFixed(1)} ms): hot switching burns contacts and ` +
          `stresses the PA. Lengthen the transmit delay.`
        : `RF starts ${(r.txDelayS * 1e3).toFixed(1)} ms after the key, after the ` +
          `contacts settle (${((r.operateS + r.bounceS) * 1e3).toFixed(1)} ms).`,
  });
  const cycleS = r.operateS + r.releaseS;
  f.push({
    severity: r.txDelayS > 0.5 * dotS ? 'caution' : 'ok',
    rule: 'relay.keying',
    subject: s,
    value: r.txDelayS,
    limit: 0.5 * dotS,
    unit: 's',
    source: 'relay.keying',
    message:
      (r.txDelayS > 0.5 * dotS
        ? `At ${r.wpm} WPM a dot lasts ${(dotS * 1e3).toFixed(0)} ms; a ${(r.txDelayS * 1e3).toFixed(0)} ms transmit ` +
          `delay clips the first element noticeably.`
        : `At ${r.wpm} WPM a dot lasts ${(dotS * 1e3).toFixed(0)} ms; the transmit delay clips the ` +
          `first element by ${((r.txDelayS / dotS) * 100).toFixed(0)} %.`) +
      (cycleS > dotS
        ? ' The relay is too slow to follow single elements, so it suits semi-break-in with a hang time, not ' +
          'full break-in.'
        : ''),
  });
  return {
    powerW,
    swr,
    rfRmsV: m.rmsV,
    rfPeakV: m.peakV,
    rfRmsA: m.rmsA,
    rfPeakA: m.peakA,
    peakWithHarmonicsV,
    ratedPeakV,
    ratedIsRf,
    receiverPowerW,
    receiverPowerDbm: receiverPowerW > 0 ? 10 * Math.log10(receiverPowerW / 1e-3) : -999,
    dotS,
    hotSwitchMarginS,
    findings: f,
  };
}

export interface CoilLoad {
  railId: string;
  currentA: PerMode;
}

/**
 * Coil current drawn per mode (energised in coilModes) for the supply budget. `load` is null when the stage has no
 * relay or its coil draws nothing. A coil current core refuses, or a coil that draws current from no rail (or from a
 * rail the project does not have), is a refusal with a fail finding naming the stage and field: its current must not
 * leave the budget silently.
 */
export function relayCoilLoads(
  stage: Stage,
  railIds?: ReadonlySet<string>,
): { ok: true; load: CoilLoad | null } | { ok: false; findings: Finding[] } {
  const r = stage.relay;
  if (!r) return { ok: true, load: null };
  const fail = (field: string, message: string): { ok: false; findings: Finding[] } => ({
    ok: false,
    findings: [
      {
        severity: 'fail',
        rule: 'relay.coil',
        subject: `${stage.name}: ${field}`,
        value: Number.isFinite(r.coilA) ? r.coilA : null,
        limit: null,
        unit: 'A',
        source: 'design.input',
        message,
      },
    ],
  });
  if (!nonNegative(r.coilA))
    return fail(
      'relay coil current',
      'The relay coil current must be a number, zero or more; the coil current is unknown in the budget.',
    );
  if (r.coilA === 0) return { ok: true, load: null };
  const amps = `${(r.coilA * 1e3).toPrecision(3)} mA`;
  if (r.coilRailId === null || r.coilRailId === '') {
    return fail(
      'relay coil rail',
      `The relay coil draws ${amps} but no rail is chosen for it, so no rail's budget carries it. Choose the ` +
        `coil's rail.`,
    );
  }
  if (railIds && !railIds.has(r.coilRailId)) {
    return fail(
      'relay coil rail',
      `The relay coil draws ${amps} from a rail that is not in this project's supply. Choose the coil's rail.`,
    );
  }
  const currentA = Object.fromEntries(MODES.map((m: Mode) => [m, r.coilModes.includes(m) ? r.coilA : 0])) as PerMode;
  return { ok: true, load: { railId: r.coilRailId, currentA } };
}

const nonNegative = (v: number) => Number.isFinite(v) && v >= 0;
