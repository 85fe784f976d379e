// Harmonic (spurious) compliance: PA harmonic levels, minus filter attenuation, against the chosen rule.
import type { Finding } from '../findings';
import type { SourceKey } from '../sources/registry';
import type { PaParams, RfSettings } from '../model';
import type { MonteCarloResult } from './lpf-monte-carlo';
import type { HarmonicBand, SpectrumBasis } from './pa-spectrum';
import type { SourcedHarmonic } from './lpf-analysis';

/**
 * Harmonic level at the antenna below which a home-built filter and layout no longer set it,
 * dBc. Common practice, no published source.
 */
export const CONSTRUCTION_FLOOR_DBC = -70;

export type SpuriousRule = RfSettings['spuriousRule'];

export const RULE_INFO: Record<SpuriousRule, { title: string; source: SourceKey; fromMemory: boolean }> = {
  'us-97-307': {
    title:
      '47 CFR 97.307(d): spurious emissions at least 43 dB below the fundamental (below 30 MHz, installed after 2003)',
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

export type HarmonicBasis = 'square-wave-1/n' | 'balance-residual' | 'rectangular-50%-1/n' | SpectrumBasis;

/** Level of harmonic n at the PA output relative to the fundamental, dBc, and what it is based on. */
export function paHarmonicDbc(
  topology: PaParams['topology'],
  evenHarmonicDbc: number,
  n: number,
): { dbc: number; basis: HarmonicBasis } {
  if (n % 2 === 1) {
    // Source: Fourier series of a symmetric square wave, odd harmonic n at 1/n (REFERENCE-VALUES §3.3)
    return { dbc: 20 * Math.log10(1 / n), basis: 'square-wave-1/n' };
  }
  // Balanced push-pull cancels even harmonics; the residual is the builder's balance figure (RfSettings).
  if (topology === 'push-pull') return { dbc: Math.min(0, evenHarmonicDbc), basis: 'balance-residual' };
  // Source: rectangular wave of duty D, harmonic n = |sin(n pi D)|/(n |sin(pi D)|) (REFERENCE-VALUES §3.3);
  // 1/n is its value at 50 % duty, not a bound at other duties
  return { dbc: 20 * Math.log10(1 / n), basis: 'rectangular-50%-1/n' };
}

const BASIS_WHAT: Partial<Record<string, string>> = {
  'square-wave-1/n': 'square-wave estimate',
  'balance-residual': 'push-pull balance residual as entered',
  'rectangular-50%-1/n': 'single-ended estimate at 50 % duty',
  'cosine-pulse':
    'drain current pulse over the conduction angle, from a plain cosine pulse at the edge of saturation to a ' +
      'flat-topped pulse when saturated',
  'push-pull-imbalance': 'even harmonic from the stated push-pull imbalance, typical to worst',
  'saturation-bound': 'clean sine to hard-clipped square wave',
  'clipped-at-swr': 'drain voltage flat-topped at the supply into the worst SWR load, as the equivalent source level',
  'rectangular-wave': 'rectangular wave, duty 50 % to the stated worst imbalance',
  'class-e-estimate': 'class E taken as a rectangular wave (pessimistic, not simulated)',
  'trapezoid-wave': 'switched wave with finite edges, duty 50 % to the stated worst imbalance',
  'class-e-simulated': 'load current of the simulated class-E stage',
  'class-e-over-loads': 'load current of the simulated class-E stage, as the equivalent source level',
};

export interface HarmonicRow {
  /** Harmonic number (2..5). */
  n: number;
  frequencyHz: number;
  /** Level at the PA output, dBc: the worst end of its band (paLevelBestDbc the best end). */
  paLevelDbc: number;
  paLevelBestDbc: number;
  paLevelBasis: HarmonicBasis;
  /**
   * Filter attenuation at n f relative to its loss at f (nominal as built), dB; 0 when there is no filter. With the
   * PA's source impedance (sourceBasis) when known, else between 50 Ω terminations.
   */
  filterAttenuationDb: number;
  /** The same between 50 Ω terminations, dB (null without a filter). */
  filterAttenuation50Db: number | null;
  /** What the filter attenuation assumes at the source: the PA's source (in words) or '50 Ω'. */
  sourceBasis: string;
  /** The PA's source impedance at n f at the filter's input, Ω (null = infinite or not used). */
  sourceZsReOhm: number | null;
  sourceZsImOhm: number | null;
  /** Same at the Monte Carlo worst case and percentile (null without Monte Carlo). */
  worstFilterAttenuationDb: number | null;
  percentileFilterAttenuationDb: number | null;
  /** Predicted level at the antenna, dBc: worst end of the band (predictedBestDbc the best end), nominal filter. */
  predictedDbc: number;
  predictedBestDbc: number;
  /** The worst (best) end lies below CONSTRUCTION_FLOOR_DBC: shown as "limited by construction", not a number. */
  limitedByConstruction: boolean;
  bestLimitedByConstruction: boolean;
  worstPredictedDbc: number | null;
  /** Required attenuation below the fundamental, dB. */
  requiredDb: number;
  /** Filter attenuation needed at this harmonic to meet the rule, dB. */
  neededFilterAttenuationDb: number;
  /** -max(predictedDbc, floor) - requiredDb (positive = passes), dB: judged on the worst end. */
  marginDb: number;
  /** Same with the Monte Carlo worst-case filter, dB (null without Monte Carlo). */
  worstMarginDb: number | null;
  /** fail: nominal margin < 0; caution: worst-case margin < 0 or nominal margin < 3 dB. */
  severity: Finding['severity'];
  /** Class E over the loads met: the load (and loaded Q) of the best and worst ends, in words; null otherwise. */
  bestLoad: string | null;
  worstLoad: string | null;
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
  /** Which loads the bands cover, in words (class E: design load and worst-SWR circle); null = the design load. */
  loadsCovered: string | null;
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
  /** The PA's harmonic bands by class (pa-spectrum); absent = square-wave odd / balance-residual even estimate. */
  spectrum?: HarmonicBand[];
  /** Filter rejection with the PA's source impedance at each harmonic (lpf-analysis harmonicsFromSource). */
  source?: { label: string; rows: SourcedHarmonic[] };
  /** Which loads the bands cover, in words, when more than the design load (class-e-loads loadsCoveredText). */
  loadsCovered?: string;
}

export function harmonicCompliance(inp: HarmonicInput): HarmonicsReport {
  const info = RULE_INFO[inp.rule];
  const requiredDb = requiredAttenuationDb(inp.rule, inp.fundamentalW);
  const findings: Finding[] = [];
  const rows: HarmonicRow[] = [2, 3, 4, 5].map((n) => {
    const band = inp.spectrum?.find((b) => b.n === n);
    const old = paHarmonicDbc(inp.topology, inp.evenHarmonicDbc, n);
    const pa = band
      ? { dbc: band.worstDbc, best: band.bestDbc, basis: band.basis as HarmonicBasis }
      : { ...old, best: old.dbc };
    const nominal = inp.filter?.find((h) => h.n === n)?.attenuationDb ?? 0;
    const mc = inp.monteCarlo?.harmonics.find((h) => h.n === n) ?? null;
    const rel = (a: number) => a - inp.passbandLossDb;
    const src = inp.filter ? inp.source?.rows.find((r) => r.n === n) ?? null : null;
    // the PA's own source impedance changes the rejection by (sourced − 50 Ω); the tolerance spread is taken as
    // the 50 Ω Monte Carlo's, shifted by the same amount (approximation)
    const shift = src ? src.relativeAttenuationDb - rel(nominal) : 0;
    const filterAttenuationDb = inp.filter ? rel(nominal) + shift : 0;
    const predictedDbc = pa.dbc - filterAttenuationDb;
    const worst = mc ? rel(mc.worstAttenuationDb) + shift : null;
    const worstPredictedDbc = worst === null ? null : pa.dbc - worst;
    const predictedBestDbc = pa.best - filterAttenuationDb;
    const floor = (x: number) => Math.max(x, CONSTRUCTION_FLOOR_DBC);
    const marginDb = -floor(predictedDbc) - requiredDb;
    const worstMarginDb = worstPredictedDbc === null ? null : -floor(worstPredictedDbc) - requiredDb;
    const severity: Finding['severity'] =
      marginDb < 0 ? 'fail' : (worstMarginDb !== null && worstMarginDb < 0) || marginDb < 3 ? 'caution' : 'ok';
    const row: HarmonicRow = {
      n,
      frequencyHz: n * inp.frequencyHz,
      paLevelDbc: pa.dbc,
      paLevelBestDbc: pa.best,
      paLevelBasis: pa.basis,
      filterAttenuationDb,
      filterAttenuation50Db: inp.filter ? rel(nominal) : null,
      sourceBasis: src ? inp.source!.label : '50 Ω',
      sourceZsReOhm: src?.zsReOhm ?? null,
      sourceZsImOhm: src?.zsImOhm ?? null,
      predictedBestDbc,
      limitedByConstruction: predictedDbc < CONSTRUCTION_FLOOR_DBC,
      bestLimitedByConstruction: predictedBestDbc < CONSTRUCTION_FLOOR_DBC,
      worstFilterAttenuationDb: worst,
      percentileFilterAttenuationDb: mc ? rel(mc.percentileAttenuationDb) + shift : null,
      predictedDbc,
      worstPredictedDbc,
      requiredDb,
      neededFilterAttenuationDb: requiredDb + pa.dbc,
      marginDb,
      worstMarginDb,
      severity,
      bestLoad: band?.bestLoad ?? null,
      worstLoad: band?.worstLoad ?? null,
    };
    const srcWhat = src ? `; filter from the PA's source, ${inp.source!.label}` : '';
    const loads = inp.loadsCovered && band?.worstLoad ? `; over ${inp.loadsCovered}, worst at ${band.worstLoad}` : '';
    const what = `${BASIS_WHAT[pa.basis] ?? pa.basis}${loads}${srcWhat}`;
    const lvl = (x: number) => (x < CONSTRUCTION_FLOOR_DBC ? 'limited by construction' : `${x.toFixed(1)} dBc`);
    const bandText = !band
      ? null
      : predictedDbc < CONSTRUCTION_FLOOR_DBC
        ? 'limited by construction at the antenna'
        : `${
            predictedBestDbc < CONSTRUCTION_FLOOR_DBC
              ? `below ${CONSTRUCTION_FLOOR_DBC} dBc (the construction floor)`
              : lvl(predictedBestDbc)
          } to ${lvl(predictedDbc)} at the antenna`;
    const down =
      predictedDbc < CONSTRUCTION_FLOOR_DBC
        ? `below the ${CONSTRUCTION_FLOOR_DBC} dBc construction floor`
        : `${(-predictedDbc).toFixed(1)} dB down`;
    findings.push({
      severity,
      rule: 'spurious.harmonic',
      subject: `Harmonic ${n}`,
      value: -predictedDbc,
      limit: requiredDb,
      unit: 'dB',
      source: info.source,
      message: !inp.filter
        ? `No low-pass filter: harmonic ${n} is only ${(-pa.dbc).toFixed(1)} dB down (${what}); a filter is required ` +
          `before transmitting.`
        : marginDb < 0
          ? `Harmonic ${n} is predicted up to ${(-predictedDbc).toFixed(1)} dB down at ` +
            `the worst end${bandText ? ` (${bandText}, ${what})` : ''}, short of the ${requiredDb.toFixed(1)}` +
            ` dB required: raise the filter order or lower its cutoff.`
          : worstMarginDb !== null && worstMarginDb < 0
            ? `Harmonic ${n} passes nominally (${marginDb.toFixed(1)} dB margin) but can fail with component ` +
              `tolerances (worst case ${worstMarginDb.toFixed(1)} dB); check it on a spectrum analyser.`
            : bandText
              ? `Harmonic ${n}: ${bandText} (${what}); judged on the worst end, ${down}, ${marginDb.toFixed(1)}` +
                ` dB better than required.`
              : `Harmonic ${n} is predicted ${down} (${what}), ${marginDb.toFixed(1)} dB better than required.`,
    });
    return row;
  });
  if (rows.some((r) => r.limitedByConstruction || r.bestLimitedByConstruction)) {
    findings.push({
      severity: 'caution',
      kind: 'standing',
      rule: 'spurious.construction-floor',
      subject: 'Spurious emissions',
      value: CONSTRUCTION_FLOOR_DBC,
      limit: null,
      unit: 'dBc',
      source: 'spurious.construction-floor',
      message: `Levels predicted below ${CONSTRUCTION_FLOOR_DBC} dBc are shown as limited by construction: coupling ` +
        `around the filter and ground currents, not the filter, set them in a home-built transmitter.`,
    });
  }
  if (info.fromMemory) {
    findings.push({
      severity: 'caution',
      kind: 'standing',
      rule: 'spurious.rule-source',
      subject: 'Spurious-emission rule',
      value: null,
      limit: null,
      unit: '',
      source: info.source,
      message:
        'The ITU limit formula used here is from memory and not confirmed against the Radio Regulations; check the ' +
          'current text and your licence conditions.',
    });
  }
  findings.push({
    severity: 'caution',
    rule: 'spurious.measure',
    subject: 'Spurious emissions',
    value: null,
    limit: null,
    unit: '',
    source: 'spurious.measure',
    kind: 'standing',
    message:
      'These are predictions from idealised waveforms; measure the finished transmitter into a dummy load before ' +
        'going on the air, and follow your licence conditions.',
  });
  return {
    rule: inp.rule, ruleTitle: info.title, ruleSource: info.source, ruleFromMemory: info.fromMemory,
    fundamentalW: inp.fundamentalW, requiredDb, rows, loadsCovered: inp.loadsCovered ?? null, findings,
  };
}
