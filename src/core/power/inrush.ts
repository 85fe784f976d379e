// Switch-on inrush at the primary: each transformer's magnetising inrush plus its reservoirs charging from empty
// (reflected by the turns ratio), against the primary fuse's melting I²t estimated from its IEC 60127-2 sheet.
import type { Finding } from '../findings';
import type { Mains, RectifiedRail, Transformer } from '../model';
import type { FuseSheet } from './report-types';
import { IEC_60127_2_PRE_ARC, faultCheck } from './fault';
import { fuseMarking } from './fuses';
import { IEC_60127_FUSES_A } from './standard-values';
import { noLoadVrms, windingResistanceOhm } from './winding';

/**
 * Magnetising inrush peak as a multiple of the rated primary RMS current. Common practice, no published source
 * (from memory, not confirmed): laminated (EI) cores about 10 x, toroids (no air gap, high remanence) about 30 x.
 * Capped by the resistance bound (a fully saturated core): peak <= sqrt(2) V / R_primary.
 */
export const INRUSH_MULTIPLE = { laminated: 10, toroidal: 30 } as const;
/** Share of the copper loss taken to be in the primary. Common practice, no published source. */
export const PRIMARY_COPPER_SHARE = 0.5;
/** Each mains cycle's inrush peak is about half the one before. Common practice, no published source (from memory). */
export const INRUSH_DECAY_PER_CYCLE = 0.5;
/**
 * Largest switch-on I²t as a share of the fuse's melting I²t, so that repeated switching does not age the element.
 * Common practice, no published source (makers' pulse derating, from memory, not confirmed).
 */
export const PULSE_SHARE = 0.3;
/** Peak an NTC soft-start is sized for, as a multiple of the rated primary RMS current. Common practice, no source. */
export const NTC_TARGET_MULTIPLE = 10;

export interface InrushTransformer {
  transformerId: string;
  name: string;
  construction: Transformer['construction'];
  /** Nameplate VA (sum of rated V x rated A over the windings) and rated primary RMS current at nominal mains (A). */
  ratedVA: number;
  ratedPrimaryA: number;
  /** Primary resistance from the regulation figures and the copper split (Ω). */
  primaryOhm: number;
  /** The common-practice multiple of the rated primary current (INRUSH_MULTIPLE); whether √2 V / R_p capped it. */
  magnetisingMultiple: number;
  magnetisingCapped: boolean;
  /** Magnetising inrush peak (A) and its I²t (A² s). */
  magnetisingPeakA: number;
  magnetisingI2t: number;
  /** Reservoirs charging from empty at the mains peak, reflected to the primary: peak (A) and I²t (A² s). */
  chargingPeakA: number;
  chargingI2t: number;
}

export interface InrushReport {
  transformers: InrushTransformer[];
  /** At the primary, the worse of switching at a voltage zero (magnetising) and at a peak (charging) (A, A² s). */
  peakA: number;
  i2t: number;
  /** Primary fuse in use (A), its sheet, and its melting I²t estimated from the sheet's minimum pre-arcing times. */
  fuseA: number;
  sheet: FuseSheet;
  fuseMeltI2t: number;
  /** The same for a quick-acting (F, sheet 2) fuse of the same rating (A² s). */
  quickMeltI2t: number;
  /** Cold resistance of an NTC soft-start keeping the resistance-limited peak to NTC_TARGET_MULTIPLE x rated (Ω). */
  ntcOhm: number;
  /** Continuous primary current the NTC (or soft-start resistor's relay) carries once warm (A); null when not given. */
  ntcCarriesA: number | null;
  /** The smallest time-lag rating that takes the inrush within PULSE_SHARE of its melting I²t. */
  timeLag: TimeLagSuggestion;
}

export interface TimeLagSuggestion {
  /** IEC 60127 rating (A), at least the fuse in use; null when none in the series is large enough. */
  ratedA: number | null;
  /** The time-lag sheet judged: the chosen one when time-lag, else sheet 3. */
  sheet: FuseSheet;
  /** Its melting I²t floor (A² s); null without a rating. */
  meltI2t: number | null;
  /** Whether it still clears every reflected winding fault given within FAULT_CLEAR_S; null when none given. */
  clearsFaults: boolean | null;
}

/**
 * Lowest I²t the fuse can melt at, from its sheet (A² s): min over the rows of (m In)² t_min. Common practice, no
 * published source: the minimum pre-arcing times of IEC 60127-2 read as a melting-I²t floor for a short pulse.
 */
export function meltI2tFloor(sheet: FuseSheet, ratedA: number): number {
  const rows = IEC_60127_2_PRE_ARC[sheet].filter((r) => r.minS !== null);
  return Math.min(...rows.map((r) => (r.multiple * ratedA) ** 2 * r.minS!));
}

const DIODES_IN_PATH = { bridge: 2, 'centre-tap': 1, 'half-wave': 1 } as const;

/** Nameplate VA: the sum of rated V x rated A over the windings. */
export function nameplateVA(t: Transformer): number {
  return t.windings.reduce((s, w) => s + Math.max(0, w.ratedVrms * w.ratedA), 0);
}

/**
 * Primary resistance (Ω) from the windings' regulation figures, with PRIMARY_COPPER_SHARE of the copper loss in the
 * primary. Copper loss at full load = reg x VA (resistive regulation: I² R = reg V I), reg VA-weighted over the
 * windings; I_p² R_p = share x reg x VA with I_p = VA / V_p gives R_p = share x reg x V_p² / VA.
 */
export function primaryOhmFromRegulation(t: Transformer, mainsNominalV: number): number {
  const va = nameplateVA(t);
  if (!(va > 0)) return 0;
  const reg = t.windings.reduce((s, w) => s + Math.max(0, w.regulationFraction) * w.ratedVrms * w.ratedA, 0) / va;
  return (PRIMARY_COPPER_SHARE * reg * mainsNominalV ** 2) / va;
}

/** One transformer's switch-on inrush at high mains. */
export function transformerInrush(t: Transformer, rails: RectifiedRail[], mains: Mains): InrushTransformer {
  const highV = mains.nominalV * (1 + Math.max(0, mains.highFraction));
  const periodS = 1 / mains.frequencyHz;
  const ratedVA = nameplateVA(t);
  const ratedPrimaryA = ratedVA / mains.nominalV;
  const primaryOhm = primaryOhmFromRegulation(t, mains.nominalV);
  const boundA = primaryOhm > 0 ? (Math.SQRT2 * highV) / primaryOhm : Infinity;
  const magnetisingMultiple = INRUSH_MULTIPLE[t.construction];
  const magnetisingPeakA = Math.min(magnetisingMultiple * ratedPrimaryA, boundA);
  // Half-sine pulse over a half-cycle, ∫ = I² T/4, each cycle's peak r times the last: sum 1 / (1 - r²).
  // An upper bound: the saturation pulse is narrower than a half-cycle.
  const magnetisingI2t = (magnetisingPeakA ** 2 * periodS) / 4 / (1 - INRUSH_DECAY_PER_CYCLE ** 2);
  let chargingPeakA = 0;
  let chargingRootI2t = 0;
  for (const w of t.windings) {
    for (const r of rails.filter((x) => x.windingId === w.id)) {
      const n = DIODES_IN_PATH[r.topology];
      const vNl = noLoadVrms(w) * (highV / mains.nominalV);
      const v = Math.max(0, Math.SQRT2 * vNl - n * r.diodeDropV);
      const rOhm = windingResistanceOhm(w) + n * r.diodeResistanceOhm + Math.max(0, r.esrOhm);
      const k = noLoadVrms(w) / mains.nominalV; // turns ratio secondary / primary
      if (!(rOhm > 0) || !(r.reservoirF > 0)) continue;
      // Source: RC charge from a step (switched at the mains peak, the worst case): i = V/R e^(-t/RC),
      // ∫ i² dt = V² C / (2R)
      chargingPeakA += k * (v / rOhm);
      // reflected by the turns ratio: the primary current is k x the secondary, so I²t scales by k²
      chargingRootI2t += Math.sqrt(k ** 2 * ((v ** 2 * r.reservoirF) / (2 * rOhm)));
    }
  }
  return {
    transformerId: t.id, name: t.name, construction: t.construction, ratedVA, ratedPrimaryA, primaryOhm,
    magnetisingMultiple, magnetisingCapped: magnetisingMultiple * ratedPrimaryA > boundA, magnetisingPeakA,
    magnetisingI2t, chargingPeakA, chargingI2t: chargingRootI2t ** 2,
  };
}

/** What the primary carries besides the inrush: its worst continuous current, each winding fault on it (A). */
export interface PrimaryDuty {
  loadA?: number;
  reflectedFaultA?: readonly number[];
}

/**
 * The smallest time-lag rating in the IEC 60127 series, at least fuseA, whose melting I²t floor takes the inrush
 * within PULSE_SHARE, and whether it still clears the reflected faults (IEC 60127-2 maximum pre-arcing times).
 */
export function timeLagFor(
  i2t: number, fuseA: number, sheet: FuseSheet, faultsA?: readonly number[],
): TimeLagSuggestion {
  const tSheet: FuseSheet = sheet.startsWith('F') ? 'T3' : sheet;
  const takes = (a: number) => a >= fuseA - 1e-9 && PULSE_SHARE * meltI2tFloor(tSheet, a) >= i2t;
  const ratedA = IEC_60127_FUSES_A.find(takes) ?? null;
  const clearsFaults = ratedA === null || !faultsA?.length
    ? null : faultsA.every((f) => faultCheck(f, ratedA, tSheet).clears);
  return { ratedA, sheet: tSheet, meltI2t: ratedA === null ? null : meltI2tFloor(tSheet, ratedA), clearsFaults };
}

/** All transformers switched on together behind the primary fuse (fuseA, of the IEC 60127-2 sheet chosen; else T3). */
export function inrushReport(
  transformers: Transformer[], rails: RectifiedRail[], mains: Mains, fuseA: number, sheet: FuseSheet = 'T3',
  duty: PrimaryDuty = {},
): InrushReport {
  const parts = transformers.map((t) => transformerInrush(t, rails, mains));
  // Switched at a voltage zero the magnetising inrush is worst (full flux offset) and the reservoirs charge gently
  // with the rising sine; switched at a peak the reservoirs take the step and the core has no offset. The worse of
  // the two is taken, the other part neglected. Common practice, no published source.
  const magPeakA = parts.reduce((s, p) => s + p.magnetisingPeakA, 0);
  const chgPeakA = parts.reduce((s, p) => s + p.chargingPeakA, 0);
  // Minkowski: the I²t of a sum of currents (all transformers together) is at most (Σ sqrt(I²t))²
  const magI2t = parts.reduce((s, p) => s + Math.sqrt(p.magnetisingI2t), 0) ** 2;
  const chgI2t = parts.reduce((s, p) => s + Math.sqrt(p.chargingI2t), 0) ** 2;
  const peakA = Math.max(magPeakA, chgPeakA);
  const i2t = Math.max(magI2t, chgI2t);
  const ratedA = parts.reduce((s, p) => s + p.ratedPrimaryA, 0);
  const primaryOhm = parts.length ? 1 / parts.reduce((s, p) => s + (p.primaryOhm > 0 ? 1 / p.primaryOhm : 0), 0) : 0;
  const highV = mains.nominalV * (1 + Math.max(0, mains.highFraction));
  // resistance-limited peak sqrt(2) V / (R_NTC + R_p) = target  =>  R_NTC = sqrt(2) V / target - R_p
  const rpOhm = Number.isFinite(primaryOhm) ? primaryOhm : 0;
  const ntcOhm = ratedA > 0 ? Math.max(0, (Math.SQRT2 * highV) / (NTC_TARGET_MULTIPLE * ratedA) - rpOhm) : 0;
  const loadA = duty.loadA;
  return {
    transformers: parts, peakA, i2t, fuseA, sheet,
    fuseMeltI2t: meltI2tFloor(sheet, fuseA), quickMeltI2t: meltI2tFloor('F2', fuseA), ntcOhm,
    ntcCarriesA: loadA !== undefined && Number.isFinite(loadA) && loadA > 0 ? loadA : null,
    timeLag: timeLagFor(i2t, fuseA, sheet, duty.reflectedFaultA),
  };
}

/** Each transformer's magnetising peak with the common-practice multiple it rests on, in words. */
export function magnetisingWords(r: InrushReport): string {
  const each = r.transformers.map((t) => {
    const base = `${t.name}: ${t.magnetisingMultiple} x its ${fmtA(t.ratedPrimaryA)} rated primary current ` +
      `(${t.construction})`;
    return t.magnetisingCapped ? `${base}, capped by the primary resistance at ${fmtA(t.magnetisingPeakA)}`
      : `${base} = ${fmtA(t.magnetisingPeakA)}`;
  });
  return `${each.join('; ')}. The multiples (${INRUSH_MULTIPLE.laminated} x laminated, ${INRUSH_MULTIPLE.toroidal} x ` +
    'toroidal) are common practice, no published source';
}

/** What to do when the inrush is too much for the fuse: a time-lag rating that takes it, an NTC, a soft-start. */
function remedies(r: InrushReport): string {
  const out: string[] = [];
  const tl = r.timeLag;
  if (tl.ratedA !== null && tl.meltI2t !== null) {
    const t = `${fuseMarking(tl.ratedA, 'T')} (IEC 60127-2 ${tl.sheet})`;
    if (tl.clearsFaults === false) {
      out.push(`A time-lag fuse that takes it, ${t}, would no longer clear every winding fault on the primary: ` +
        'keep the fuse and limit the inrush instead.');
    } else {
      const faults = tl.clearsFaults ? ' and still clears the winding faults reflected to the primary' : '';
      out.push(`A ${t} fuse melts from about ${tl.meltI2t.toFixed(2)} A²s, so it takes the inrush within ` +
        `${Math.round(PULSE_SHARE * 100)} %${faults}.`);
    }
  } else {
    out.push('No time-lag fuse in the series takes it: limit the inrush.');
  }
  const carries = r.ntcCarriesA !== null ? `, rated for the ${fmtA(r.ntcCarriesA)} the primary draws continuously` : '';
  if (r.ntcOhm >= 1) {
    out.push(`Or fit an NTC thermistor of about ${r.ntcOhm.toFixed(0)} Ω cold in the primary${carries} (it limits ` +
      'only while cool: switched off and on again at once it is still hot), or a soft-start relay that shorts a ' +
      'series resistor of that size once the reservoirs have charged (common practice, no published source).');
  } else {
    out.push('The primary resistance already limits the magnetising peak, so an NTC adds little; a soft-start relay ' +
      'that shorts a series resistor once the reservoirs have charged limits their charging pulse (common practice, ' +
      'no published source).');
  }
  return out.join(' ');
}

function fmtA(a: number): string {
  return a < 1 ? `${Math.round(a * 1000)} mA` : `${Number(a.toPrecision(3))} A`;
}

export function inrushFindings(r: InrushReport): Finding[] {
  const base = {
    rule: 'fuse.inrush', subject: 'Primary fuse', value: r.i2t, limit: r.fuseMeltI2t, unit: 'A²s',
    source: 'supply.inrush-fuse' as const,
  };
  const letter = r.sheet.startsWith('F') ? 'F' : 'T';
  const fuse = fuseMarking(r.fuseA, letter);
  const what = 'Switch-on inrush (the worse of magnetising inrush and reservoir charging) peaks near ' +
    `${r.peakA.toFixed(1)} A with about ${r.i2t.toFixed(2)} A²s; the ${fuse} primary fuse melts from about ` +
    `${r.fuseMeltI2t.toFixed(2)} A²s`;
  const mag = ` Magnetising inrush: ${magnetisingWords(r)}.`;
  const quick = letter === 'T' && r.i2t > PULSE_SHARE * r.quickMeltI2t
    ? ' Keep it time-lag (T): a quick-acting (F) fuse of that rating would not survive it.'
    : '';
  const share = `${Math.round(PULSE_SHARE * 100)} %`;
  if (r.i2t > r.fuseMeltI2t) {
    return [{
      ...base, severity: 'caution',
      message: `${what}: it may blow at switch-on. ${remedies(r)}${quick} Mains wiring must follow your local ` +
        `electrical code.${mag}`,
    }];
  }
  if (r.i2t > PULSE_SHARE * r.fuseMeltI2t) {
    return [{
      ...base, severity: 'caution',
      message: `${what}: more than ${share} of it, so repeated switching ages the fuse until it blows one day. ` +
        `${remedies(r)}${quick}${mag}`,
    }];
  }
  return [{ ...base, severity: 'ok', message: `${what}: the inrush stays within ${share} of it.${quick}${mag}` }];
}

/** The inrush against the primary fuse in a few sentences (supply page, pack, CLI): the peaks, the multiples and
 * their basis, and what to do when the fuse would not take it. */
export function inrushSummary(r: InrushReport): string {
  const fuse = fuseMarking(r.fuseA, r.sheet.startsWith('F') ? 'F' : 'T');
  const reservoirs = r.transformers.map((t) => `${t.name} reservoirs ${fmtA(t.chargingPeakA)}`).join('; ');
  const head = `peak ${fmtA(r.peakA)}, ${r.i2t.toFixed(3)} A²s against about ${r.fuseMeltI2t.toFixed(3)} ` +
    `A²s to melt the ${fuse} fuse. Magnetising: ${magnetisingWords(r)}. Charging from empty: ${reservoirs}.`;
  if (r.i2t <= PULSE_SHARE * r.fuseMeltI2t) {
    return `${head} Within ${Math.round(PULSE_SHARE * 100)} % of the fuse's melting I²t: no NTC or soft-start needed.`;
  }
  return `${head} ${remedies(r)}`;
}
