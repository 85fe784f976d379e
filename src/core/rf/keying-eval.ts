// Keying checks of a T/R stage: the keyed spectrum, necessary bandwidth, hard edges and the first element.
import type { Finding } from '../findings';
import type { RelayParams } from '../model';
import { RC_10_90, type KeyedEdges } from './keying-envelope';
import { keyingSpectrum, necessaryBandwidthHz, telegraphyBaud, type KeyingSpectrum } from './keying';

/** Edges softer than this (10–90 %) are taken as shaped keying for HF CW, s. */
// Source: W. G. Pierpont, The Art and Skill of Radio-Telegraphy, 2nd rev. ed., ch. 24 (5–7 ms shaping); a guide,
// not a regulation
export const MIN_RISE_S = 0.005;

export interface KeyingResult {
  /** The edges analysed and how they were given. */
  edges: KeyedEdges;
  /** 10–90 % rise and fall time of the envelope, s. */
  riseS: number;
  fallS: number;
  spectrum: KeyingSpectrum;
  /** Modulation rate, baud, and the necessary bandwidth at K = 5 (fading) and K = 3 (non-fading), Hz. */
  baud: number;
  necessaryFadingHz: number;
  necessaryNonFadingHz: number;
  /** First element after the relay: width at half amplitude and time above 90 % amplitude (negative = never), s. */
  firstElementHalfS: number;
  firstElementFullS: number;
}

/** The edges entered on the relay data, or null when neither a rise time nor a shaping RC is given. */
export function relayEdges(r: RelayParams): KeyedEdges | null {
  const rc = r.keyShapingRcS ?? null;
  if (rc !== null) return { shape: 'rc', timeConstantS: rc };
  const rise = r.keyRiseS ?? null;
  if (rise === null) return null;
  return { shape: 'raised-cosine', riseS: rise, fallS: r.keyFallS ?? rise };
}

export function evaluateKeying(r: RelayParams, subject: string): { result: KeyingResult | null; findings: Finding[] } {
  const edges = relayEdges(r);
  if (edges === null) {
    return {
      result: null,
      findings: [
        {
          severity: 'caution',
          rule: 'keying.not-entered',
          subject,
          value: null,
          limit: null,
          unit: 's',
          source: 'design.consistency',
          message:
            'No keyed-envelope rise time or shaping RC is entered on the relay data, so the key clicks are ' +
              'not estimated.',
        },
      ],
    };
  }
  const riseS = edges.shape === 'rc' ? edges.timeConstantS * RC_10_90 : edges.riseS;
  const fallS = edges.shape === 'rc' ? edges.timeConstantS * RC_10_90 : edges.fallS;
  const spectrum = keyingSpectrum(r.wpm, edges);
  const baud = telegraphyBaud(r.wpm);
  const necessaryFadingHz = necessaryBandwidthHz(baud, 5);
  const necessaryNonFadingHz = necessaryBandwidthHz(baud, 3);
  const f: Finding[] = [];
  const hardest = Math.min(riseS, fallS);
  const ms = (s: number) => `${(s * 1e3).toFixed(1)} ms`;
  const click = (hz: number) => spectrum.clicks.find((c) => c.offsetHz === hz)!.levelDbc.toFixed(0);
  f.push({
    severity: hardest < MIN_RISE_S ? 'caution' : 'ok',
    rule: 'keying.edges',
    subject,
    value: hardest,
    limit: MIN_RISE_S,
    unit: 's',
    source: 'keying.rise-time',
    message:
      hardest < MIN_RISE_S
        ? `The keyed envelope rises in ${ms(riseS)} and falls in ${ms(fallS)}, harder than the ${ms(MIN_RISE_S)}` +
          ` usual for HF CW: key clicks reach ${click(500)} dBc at 500 Hz and ${click(1000)} dBc at 1 kHz from the ` +
          `carrier. Slow the edges (a larger shaping capacitor or a longer ramp).`
        : `The keyed envelope rises in ${ms(riseS)} and falls in ${ms(fallS)}; key clicks ${click(500)} dBc at 500 ` +
          `Hz and ${click(1000)} dBc at 1 kHz from the carrier.`,
  });
  f.push({
    severity: 'ok',
    rule: 'keying.bandwidth',
    subject,
    value: spectrum.occupiedBandwidthHz,
    limit: necessaryFadingHz,
    unit: 'Hz',
    source: 'keying.necessary-bandwidth',
    message: `At ${r.wpm} WPM (${baud.toFixed(1)} Bd) the necessary bandwidth is ${necessaryFadingHz.toFixed(0)}` +
      ` Hz for fading circuits (${necessaryNonFadingHz.toFixed(0)} Hz non-fading); a steady dot train with these ` +
      `edges occupies ${spectrum.occupiedBandwidthHz.toFixed(0)} Hz (99 % of its power).`,
  });
  // The first element starts when the sequencer lets RF through (txDelayS after the key) and ends with the dot; its
  // width at half amplitude is dot − delay. Time above 90 % amplitude = that width less, on each edge, the time from
  // the 50 % to the 90 % point. Source (algebra on the edge shapes of keying-envelope.ts): raised cosine
  // half the 10–90 % time for a raised cosine (symmetric about 50 %); RC rise τ ln 5, RC fall τ ln 1.8
  const rcTau = edges.shape === 'rc' ? edges.timeConstantS : 0;
  const riseTo90S = edges.shape === 'rc' ? rcTau * Math.log(5) : riseS / 2;
  const fallFrom90S = edges.shape === 'rc' ? rcTau * Math.log(1.8) : fallS / 2;
  const firstElementHalfS = spectrum.dotS - r.txDelayS;
  const firstElementFullS = firstElementHalfS - riseTo90S - fallFrom90S;
  f.push({
    severity: firstElementFullS <= 0 ? 'caution' : 'ok',
    rule: 'keying.first-element',
    subject,
    value: firstElementFullS,
    limit: 0,
    unit: 's',
    source: 'keying.first-element',
    message:
      firstElementFullS <= 0
        ? `The first dot after the relay closes is ${ms(Math.max(0, firstElementHalfS))} wide and never reaches 90 % ` +
          `amplitude with these edges: shorten the transmit delay or use a hang time so the relay stays closed.`
        : `The first dot after the relay closes is ${ms(firstElementHalfS)} wide (a dot is ${ms(spectrum.dotS)}` +
          `), above 90 % amplitude for ${ms(firstElementFullS)}.`,
  });
  return {
    result: {
      edges,
      riseS,
      fallS,
      spectrum,
      baud,
      necessaryFadingHz,
      necessaryNonFadingHz,
      firstElementHalfS,
      firstElementFullS,
    },
    findings: f,
  };
}
