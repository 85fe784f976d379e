// The project's core catalog in use: the core a filter's inductors or a PA's output transformer are wound on
// (picked from the catalog, or for the filter entered on the stage as before), the turns that fit its window, and
// the output transformer's flux density at the PA's highest output.
import type { Finding } from '../findings';
import type { CatalogCore, LpfParams, PaParams, Project } from '../model';
import { bandOf } from './bands';
import { peakFluxDensityT, singleLayerTurns, toroidEffective } from './cores';
import { coreSpec } from '../spec/cores';
import { validate } from '../spec/derive';

/** A core as the checks need it, whichever way it was given (SI; null = not given). */
export interface WoundCore {
  name: string;
  alHPerTurn2: number | null;
  aeM2: number | null;
  leM: number | null;
  innerDiameterM: number | null;
  windowAreaM2: number | null;
  wireDiameterM: number | null;
  fluxLimitT: number | null;
  minFrequencyHz: number | null;
  maxFrequencyHz: number | null;
  /** 'catalog': from the project's catalog; 'entered': the filter's own core boxes. */
  from: 'catalog' | 'entered';
}

/** The catalog core `id`, or null when there is none or its stored data fails its spec (a fail finding names it). */
export function findCore(p: Project, id: string | null | undefined): CatalogCore | null {
  const c = id ? p.cores?.find((x) => x.id === id) : undefined;
  return c && validate(coreSpec, c).length === 0 ? c : null;
}

export function fromCatalog(c: CatalogCore, wireDiameterM: number | null): WoundCore {
  const { name, alHPerTurn2, aeM2, leM, innerDiameterM, windowAreaM2, fluxLimitT, minFrequencyHz, maxFrequencyHz } = c;
  return {
    name,
    alHPerTurn2,
    aeM2,
    leM,
    innerDiameterM,
    windowAreaM2,
    wireDiameterM,
    fluxLimitT,
    minFrequencyHz,
    maxFrequencyHz,
    from: 'catalog',
  };
}

/**
 * The filter's core: its catalog core when one is chosen (null when that id is not in the catalog), else as entered.
 */
export function lpfCore(p: Project, lpf: LpfParams): WoundCore | null {
  const wire = lpf.core?.wireDiameterM ?? null;
  if (lpf.coreId) {
    const c = findCore(p, lpf.coreId);
    return c ? fromCatalog(c, wire) : null;
  }
  return enteredCore(lpf);
}

/** The core entered in the filter's own boxes (a toroid by its dimensions). */
export function enteredCore(lpf: Pick<LpfParams, 'coreName' | 'coreAlHPerTurn2' | 'core'>): WoundCore {
  const wire = lpf.core?.wireDiameterM ?? null;
  const t = lpf.core;
  const geo = t && t.outerDiameterM !== null && t.innerDiameterM !== null && t.heightM !== null
    ? toroidEffective(t.outerDiameterM, t.innerDiameterM, t.heightM)
    : null;
  return {
    name: lpf.coreName,
    alHPerTurn2: lpf.coreAlHPerTurn2,
    aeM2: geo?.aeM2 ?? null,
    leM: geo?.leM ?? null,
    innerDiameterM: t?.innerDiameterM ?? null,
    windowAreaM2: null,
    wireDiameterM: wire,
    fluxLimitT: t?.fluxLimitT ?? null,
    minFrequencyHz: t?.minFrequencyHz ?? null,
    maxFrequencyHz: t?.maxFrequencyHz ?? null,
    from: 'entered',
  };
}

/** Share of a winding window that round enamelled wire wound by hand fills. */
// Common practice, no published source: about 40 % of the window
export const WINDOW_FILL = 0.4;

/**
 * Turns of a wire that fit the core: one layer inside a toroid's hole, else 40 % of the window area; null = unknown.
 */
export function fitTurns(c: WoundCore): { turns: number; how: 'single-layer' | 'window' } | null {
  const d = c.wireDiameterM;
  if (d === null || !(d > 0)) return null;
  if (c.innerDiameterM !== null && c.innerDiameterM > 2 * d)
    return { turns: singleLayerTurns(c.innerDiameterM, d), how: 'single-layer' };
  // Common practice, no published source: each round wire takes π d²/4 of the window at the fill factor above
  if (c.windowAreaM2 !== null)
    return { turns: Math.floor((WINDOW_FILL * c.windowAreaM2) / ((Math.PI * d * d) / 4)), how: 'window' };
  return null;
}

export interface OutputTransformerCheck {
  coreName: string;
  primaryTurns: number;
  secondaryTurns: number;
  /**
   * RMS voltage across the full primary at the PA's highest output into its design load (saturated drive at the
   * highest supply), V; frequency it is judged at, Hz.
   */
  primaryRmsV: number;
  frequencyHz: number;
  peakFluxT: number;
  fluxLimitT: number;
  /** Turns that fit (primary and secondary in the same wire), or null without the wire. */
  fitTurns: number | null;
}

/**
 * The output transformer on its catalog core: peak flux density by the transformer EMF equation at the PA's highest
 * output (the primary's RMS voltage √(P R_primary)) and at the lowest frequency of the operating band, against the
 * core's limit; the windings' fit in the window. Null (with no finding) when no core or no turns are given.
 */
export function checkOutputTransformer(
  project: Project, pa: PaParams, primaryOhm: number, highestOutputW: number, turnsRatio: number, subject: string,
): { check: OutputTransformerCheck | null; findings: Finding[] } {
  const findings: Finding[] = [];
  if (!pa.outputCoreId || !pa.outputPrimaryTurns) return { check: null, findings };
  const c = findCore(project, pa.outputCoreId);
  if (!c) {
    findings.push({
      severity: 'fail',
      rule: 'core.missing',
      subject,
      value: null,
      limit: null,
      unit: '',
      source: 'design.consistency',
      message:
        'The output transformer core is not in the project’s core catalog (deleted?) or its data there is refused: ' +
          'choose another on the PA form or correct the core.',
    });
    return { check: null, findings };
  }
  if (!(primaryOhm > 0) || !(highestOutputW > 0) || !(project.frequencyHz > 0)) return { check: null, findings };
  const band = bandOf(project.frequencyHz);
  const fHz = band ? band.lowHz : project.frequencyHz;
  // Source: P = V² / R for the fundamental across the primary's load (definition of power in a resistance)
  const primaryRmsV = Math.sqrt(highestOutputW * primaryOhm);
  const n = pa.outputPrimaryTurns;
  const peakFluxT = peakFluxDensityT(primaryRmsV, fHz, n, c.aeM2);
  // the secondary's turns from the turns ratio in use (secondary : full primary), at least one
  const secondaryTurns = Math.max(1, Math.round(n * turnsRatio));
  const fit = fitTurns(fromCatalog(c, pa.outputWireDiameterM ?? null));
  const check: OutputTransformerCheck = {
    coreName: c.name,
    primaryTurns: n,
    secondaryTurns,
    primaryRmsV,
    frequencyHz: fHz,
    peakFluxT,
    fluxLimitT: c.fluxLimitT,
    fitTurns: fit?.turns ?? null,
  };
  const mt = (t: number) => `${(t * 1e3).toFixed(1)} mT`;
  const at = `${primaryRmsV.toFixed(1)} V RMS (${highestOutputW.toPrecision(3)} W into the design load) across ${n} ` +
    `primary turns at ${(fHz / 1e6).toFixed(3)} MHz`;
  const over = peakFluxT > c.fluxLimitT;
  findings.push({
    severity: over ? 'fail' : 'ok',
    rule: 'core.output-flux',
    subject: `${subject}: output transformer`,
    value: peakFluxT,
    limit: c.fluxLimitT,
    unit: 'T',
    source: 'core.output-transformer-flux',
    message: over
      ? `${at} give ${mt(peakFluxT)} peak in the ${c.name}, above its ${mt(c.fluxLimitT)} limit: the core will heat. ` +
        `Use more primary turns (keeping the ratio) or a core with more area.`
      : `${at} give ${mt(peakFluxT)} peak in the ${c.name}, within its ${mt(c.fluxLimitT)} limit.` });
  if (fit) {
    const need = n + secondaryTurns;
    findings.push({
      severity: need > fit.turns ? 'fail' : 'ok',
      rule: 'core.output-fit',
      subject: `${subject}: output transformer`,
      value: need,
      limit: fit.turns,
      unit: '',
      source: fit.how === 'window' ? 'core.window-fit' : 'core.winding-fit',
      message:
        need > fit.turns
          ? `${n} + ${secondaryTurns} turns of this wire do not fit the core (room for about ${fit.turns}` +
            `): use thinner wire or a larger core.`
          : `${n} + ${secondaryTurns} turns of this wire fit the core (room for about ${fit.turns}).`,
    });
  }
  if (fHz < c.minFrequencyHz || project.frequencyHz > c.maxFrequencyHz) {
    findings.push({
      severity: 'caution',
      rule: 'core.frequency',
      subject: `${subject}: output transformer`,
      value: project.frequencyHz,
      limit: fHz < c.minFrequencyHz ? c.minFrequencyHz : c.maxFrequencyHz,
      unit: 'Hz',
      source: 'design.maker-rating',
      message: `The ${c.name} is made for ${(c.minFrequencyHz / 1e6).toFixed(1)}–` +
        `${(c.maxFrequencyHz / 1e6).toFixed(1)} MHz: choose a material for this band.`,
    });
  }
  return { check, findings };
}
