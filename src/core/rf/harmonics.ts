// Harmonic (spurious) compliance: PA harmonic levels, minus filter attenuation, against the chosen rule.
import type { Finding } from '../findings';
import type { SourceKey } from '../sources/registry';
import type { PaParams, RfSettings } from '../model';
import type { MonteCarloResult } from './lpf-monte-carlo';

export type SpuriousRule = RfSettings['spuriousRule'];

export const RULE_INFO: Record<SpuriousRule, { title: string; source: SourceKey; fromMemory: boolean }> = {
  'us-97-307': {
    title: '47 CFR 97.307(d): spurious emissions at least 43 dB below the fundamental (below 30 MHz, installed after 2003)',
    source: 'spurious.us-97-307d',
    fromMemory: false,
  },
  'itu-app3': {
    title: 'ITU RR Appendix 3, amateur below 30 MHz: 43 + 10 log10(P) dB or 50 dBc, whichever is less stringent',
    source: 'spurious.itu-app3',
    fromMemory: true,
  },
};

/** Attenuation the rule requires below the fundamental mean power, dB (positive). */
export function requiredAttenuationDb(rule: SpuriousRule, fundamentalW: number): number {
  // Source: 47 CFR 97.307(d): at least 43 dB below the mean power of the fundamental
  if (rule === 'us-97-307') return 43;
  // Source: ITU RR Appendix 3 amateur < 30 MHz, 43 + 10 log10(PEP) or 50 dBc, less stringent (from memory)
  return Math.min(43 + 10 * Math.log10(Math.max(fundamentalW, 1e-12)), 50);
}

export type HarmonicBasis = 'square-wave-1/n' | 'balance-residual' | 'rectangular-bound-1/n';

/** Level of harmonic n at the PA output relative to the fundamental, dBc, and what it is based on. */
export function paHarmonicDbc(topology: PaParams['topology'], evenHarmonicDbc: number, n: number): { dbc: number; basis: HarmonicBasis } {
  if (n % 2 === 1) {
    // Source: Fourier series of a symmetric square wave, odd harmonic n at 1/n (REFERENCE-VALUES §3.3)
    return { dbc: 20 * Math.log10(1 / n), basis: 'square-wave-1/n' };
  }
  // Balanced push-pull cancels even harmonics; the residual is the builder's balance figure (RfSettings).
  if (topology === 'push-pull') return { dbc: Math.min(0, evenHarmonicDbc), basis: 'balance-residual' };
  // Source: rectangular wave of duty D, harmonic n ~ |sin(n pi D)|/n <= 1/n (REFERENCE-VALUES §3.3): upper bound
  return { dbc: 20 * Math.log10(1 / n), basis: 'rectangular-bound-1/n' };
}

export interface HarmonicRow {
  /** Harmonic number (2..5). */
  n: number;
  frequencyHz: number;
  /** Level at the PA output, dBc. */
  paLevelDbc: number;
  paLevelBasis: HarmonicBasis;
  /** Filter attenuation at n f relative to its loss at f (nominal as built), dB; 0 when there is no filter. */
  filterAttenuationDb: number;
  /** Same at the Monte Carlo worst case and percentile (null without Monte Carlo). */
  worstFilterAttenuationDb: number | null;
  percentileFilterAttenuationDb: number | null;
  /** Predicted level at the antenna, dBc. */
  predictedDbc: number;
  worstPredictedDbc: number | null;
  /** Required attenuation below the fundamental, dB. */
  requiredDb: number;
  /** Filter attenuation needed at this harmonic to meet the rule, dB. */
  neededFilterAttenuationDb: number;
  /** -predictedDbc - requiredDb (positive = passes), dB. */
  marginDb: number;
  /** Same with the Monte Carlo worst-case filter, dB (null without Monte Carlo). */
  worstMarginDb: number | null;
  /** fail: nominal margin < 0; caution: worst-case margin < 0 or nominal margin < 3 dB. */
  severity: Finding['severity'];
}

export interface HarmonicsReport {
  rule: SpuriousRule;
  /** The rule in words, its citation, and whether the figure is from memory (unconfirmed). */
  ruleTitle: string;
  ruleSource: SourceKey;
  ruleFromMemory: boolean;
  /** Fundamental mean power used for the rule, W. */
  fundamentalW: number;
  /** Required attenuation, dB. */
  requiredDb: number;
  /** Harmonics 2..5. */
  rows: HarmonicRow[];
  findings: Finding[];
}

export interface HarmonicInput {
  rule: SpuriousRule;
  topology: PaParams['topology'];
  evenHarmonicDbc: number;
  fundamentalW: number;
  /** Operating (fundamental) frequency, Hz. */
  frequencyHz: number;
  /** Filter loss at the operating frequency, dB (0 without a filter). */
  passbandLossDb: number;
  /** Nominal filter attenuation at harmonics; null = no filter. */
  filter: { n: number; attenuationDb: number }[] | null;
  monteCarlo: MonteCarloResult | null;
}

export function harmonicCompliance(inp: HarmonicInput): HarmonicsReport {
  const info = RULE_INFO[inp.rule];
  const requiredDb = requiredAttenuationDb(inp.rule, inp.fundamentalW);
  const findings: Finding[] = [];
  const rows: HarmonicRow[] = [2, 3, 4, 5].map((n) => {
    const pa = paHarmonicDbc(inp.topology, inp.evenHarmonicDbc, n);
    const nominal = inp.filter?.find((h) => h.n === n)?.attenuationDb ?? 0;
    const mc = inp.monteCarlo?.harmonics.find((h) => h.n === n) ?? null;
    const rel = (a: number) => a - inp.passbandLossDb;
    const filterAttenuationDb = inp.filter ? rel(nominal) : 0;
    const predictedDbc = pa.dbc - filterAttenuationDb;
    const worst = mc ? rel(mc.worstAttenuationDb) : null;
    const worstPredictedDbc = worst === null ? null : pa.dbc - worst;
    const marginDb = -predictedDbc - requiredDb;
    const worstMarginDb = worstPredictedDbc === null ? null : -worstPredictedDbc - requiredDb;
    const severity: Finding['severity'] = marginDb < 0 ? 'fail' : (worstMarginDb !== null && worstMarginDb < 0) || marginDb < 3 ? 'caution' : 'ok';
    const row: HarmonicRow = {
      n, frequencyHz: n * inp.frequencyHz, paLevelDbc: pa.dbc, paLevelBasis: pa.basis, filterAttenuationDb,
      worstFilterAttenuationDb: worst, percentileFilterAttenuationDb: mc ? rel(mc.percentileAttenuationDb) : null,
      predictedDbc, worstPredictedDbc, requiredDb, neededFilterAttenuationDb: requiredDb + pa.dbc, marginDb, worstMarginDb, severity,
    };
    const what = n % 2 === 1 ? 'square-wave estimate' : pa.basis === 'balance-residual' ? 'push-pull balance residual' : 'single-ended upper bound';
    findings.push({
      severity, rule: 'spurious.harmonic', subject: `Harmonic ${n}`, value: -predictedDbc, limit: requiredDb, unit: 'dB', source: info.source,
      message: !inp.filter
        ? `No low-pass filter: harmonic ${n} is only ${(-pa.dbc).toFixed(1)} dB down (${what}); a filter is required before transmitting.`
        : marginDb < 0
          ? `Harmonic ${n} is predicted ${(-predictedDbc).toFixed(1)} dB down, short of the ${requiredDb.toFixed(1)} dB required: raise the filter order or lower its cutoff.`
          : worstMarginDb !== null && worstMarginDb < 0
            ? `Harmonic ${n} passes nominally (${marginDb.toFixed(1)} dB margin) but can fail with component tolerances (worst case ${worstMarginDb.toFixed(1)} dB); check it on a spectrum analyser.`
            : `Harmonic ${n} is predicted ${(-predictedDbc).toFixed(1)} dB down (${what}), ${marginDb.toFixed(1)} dB better than required.`,
    });
    return row;
  });
  if (info.fromMemory) {
    findings.push({ severity: 'caution', kind: 'standing', rule: 'spurious.rule-source', subject: 'Spurious-emission rule', value: null, limit: null, unit: '', source: info.source,
      message: 'The ITU limit formula used here is from memory and not confirmed against the Radio Regulations; check the current text and your licence conditions.' });
  }
  findings.push({ severity: 'caution', rule: 'spurious.measure', subject: 'Spurious emissions', value: null, limit: null, unit: '', source: 'spurious.measure', kind: 'standing',
    message: 'These are predictions from idealised waveforms; measure the finished transmitter into a dummy load before going on the air, and follow your licence conditions.' });
  return { rule: inp.rule, ruleTitle: info.title, ruleSource: info.source, ruleFromMemory: info.fromMemory, fundamentalW: inp.fundamentalW, requiredDb, rows, findings };
}
