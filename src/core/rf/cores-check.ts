// Checks of the filter's realisation: inductor cores (flux density at the highest output, winding fit, material
// frequency range), self-resonance of inductors and capacitors, and each element's RF voltage and current.
import type { Finding } from '../findings';
import type { ToroidCore } from '../model';
import type { LpfDesign } from './lpf-design';
import { elementStress, swrCircle } from './lpf-stress';
import {
  CAPACITOR_LEAD_INDUCTANCE_H,
  WINDING_CAPACITANCE_F,
  effectivePermeability,
  peakFluxDensityT,
  resonanceHz,
} from './cores';
import { enteredCore, fitTurns, type WoundCore } from './core-catalog';

/** Highest harmonic whose rejection the filter is judged on; a part resonating below it stops behaving as itself. */
const HIGHEST_HARMONIC = 5;

export interface InductorRealisation {
  index: number;
  inductanceH: number;
  turns: number;
  rmsV: number;
  rmsA: number;
  /** Peak flux density at the worst load, T (null without the core's dimensions). */
  peakFluxT: number | null;
  /** Turns that fit in one layer (null without the inner diameter and wire). */
  fitTurns: number | null;
  selfResonanceHz: number;
}

export interface CapacitorRealisation {
  index: number;
  capacitanceF: number;
  rmsV: number;
  peakV: number;
  rmsA: number;
  selfResonanceHz: number;
}

export interface CoreRealisation {
  /** The core's effective path length (m), area (m²) and permeability, when its dimensions are entered. */
  leM: number | null;
  aeM2: number | null;
  permeability: number | null;
  inductors: InductorRealisation[];
  capacitors: CapacitorRealisation[];
  /** Power and SWR the stress is computed for. */
  powerW: number;
  swr: number;
  /** The core's peak flux limit and the capacitors' entered ratings the parts are judged against (null = not given). */
  fluxLimitT?: number | null;
  capacitorRatedV?: number | null;
  capacitorRatedA?: number | null;
}

/** The entered toroid as a wound core (its dimensions give Ae and le), or the catalog core as it is. */
const asWound = (c: ToroidCore | WoundCore | null | undefined, alHPerTurn2: number): WoundCore | null => {
  if (!c) return null;
  if ('from' in c) return c;
  return enteredCore({ coreName: '', coreAlHPerTurn2: alHPerTurn2, core: c });
};
const dims = (c: WoundCore | null) => (c && c.aeM2 !== null && c.leM !== null ? { aeM2: c.aeM2, leM: c.leM } : null);

/** Share of a capacitor's voltage rating an RF peak may use before a caution. */
// Common practice, no published source: keep RF peaks within about 70 % of a capacitor's working voltage
const CAPACITOR_DERATING = 0.7;

export function realiseLpf(
  d: LpfDesign, coreIn: ToroidCore | WoundCore | null | undefined, powerW: number, swr: number, subject: string,
  capacitorRatedV: number | null = null, capacitorRatedA: number | null = null,
) {
  const core = asWound(coreIn, d.coreAlHPerTurn2);
  const f0 = d.operatingFrequencyHz;
  const stress = elementStress(d, f0, powerW, swrCircle(d.r0Ohm, swr));
  const geo = dims(core);
  const findings: Finding[] = [];
  const inductors: InductorRealisation[] = [];
  const capacitors: CapacitorRealisation[] = [];
  const topHz = HIGHEST_HARMONIC * f0;
  const mhz = (hz: number) => `${(hz / 1e6).toFixed(1)} MHz`;
  for (const e of d.elements) {
    const s = stress.find((x) => x.index === e.index)!;
    if (e.kind === 'series-inductor') {
      const turns = e.turns ?? 0;
      const peakFluxT = geo && turns > 0 ? peakFluxDensityT(s.rmsV, f0, turns, geo.aeM2) : null;
      const fit = core ? fitTurns(core) : null;
      const fitN = fit?.turns ?? null;
      const selfResonanceHz = resonanceHz(e.builtValue, WINDING_CAPACITANCE_F);
      inductors.push({
        index: e.index,
        inductanceH: e.builtValue,
        turns,
        rmsV: s.rmsV,
        rmsA: s.rmsA,
        peakFluxT,
        fitTurns: fitN,
        selfResonanceHz,
      });
      const who = `${subject}: L${e.index}`;
      const limit = core?.fluxLimitT ?? null;
      if (peakFluxT !== null && limit !== null) {
        findings.push({
          severity: peakFluxT > limit ? 'fail' : 'ok',
          rule: 'core.flux',
          subject: who,
          value: peakFluxT,
          limit,
          unit: 'T',
          source: 'core.emf-equation',
          message:
            peakFluxT > limit
              ? `${turns} turns carry ${s.rmsV.toFixed(1)} V RMS at the worst load: ${(peakFluxT * 1e3).toFixed(1)}` +
                ` mT peak, above the core's ${(limit * 1e3).toFixed(1)} mT limit; the core will heat. Use a larger ` +
                `core (more area).`
              : `${turns} turns carry ${s.rmsV.toFixed(1)} V RMS at the worst load: ${(peakFluxT * 1e3).toFixed(1)}` +
                ` mT peak against the core's ${(limit * 1e3).toFixed(1)} mT limit.`,
        });
      }
      if (fit && fitN !== null) {
        const where = fit.how === 'window' ? 'in the core’s window' : 'in one layer inside the core';
        findings.push({
          severity: turns > fitN ? 'fail' : 'ok',
          rule: 'core.fit',
          subject: who,
          value: turns,
          limit: fitN,
          unit: '',
          source: fit.how === 'window' ? 'core.window-fit' : 'core.winding-fit',
          message:
            turns > fitN
              ? `${turns} turns do not fit ${where} (about ${fitN} of this wire): use thinner wire or a larger core.`
              : `${turns} turns fit ${where} (room for about ${fitN}).`,
        });
      }
      if (selfResonanceHz < topHz) {
        findings.push({
          severity: 'caution',
          rule: 'core.self-resonance',
          subject: who,
          value: selfResonanceHz,
          limit: topHz,
          unit: 'Hz',
          source: 'core.self-resonance',
          message: `With about ${WINDING_CAPACITANCE_F * 1e12} pF across its winding this inductor ` +
            `resonates near ${mhz(selfResonanceHz)}, below the ${HIGHEST_HARMONIC}th harmonic (${mhz(topHz)}` +
            `): the filter rejects less there than computed.`,
        });
      }
    } else {
      const selfResonanceHz = resonanceHz(CAPACITOR_LEAD_INDUCTANCE_H, e.builtValue);
      capacitors.push({
        index: e.index,
        capacitanceF: e.builtValue,
        rmsV: s.rmsV,
        peakV: Math.SQRT2 * s.rmsV,
        rmsA: s.rmsA,
        selfResonanceHz,
      });
      const peakV = Math.SQRT2 * s.rmsV;
      if (capacitorRatedV !== null) {
        const sev = peakV > capacitorRatedV ? 'fail' : peakV > CAPACITOR_DERATING * capacitorRatedV ? 'caution' : 'ok';
        findings.push({
          severity: sev,
          rule: 'lpf.capacitor-rating',
          subject: `${subject}: C${e.index}`,
          value: peakV,
          limit: capacitorRatedV,
          unit: 'V',
          source: 'lpf.capacitor-rating',
          message:
            sev === 'ok'
              ? `${peakV.toFixed(0)} V RF peak at the worst load against its ${capacitorRatedV} V rating.`
              : `${peakV.toFixed(0)} V RF peak at ` +
                `the worst load ${sev === 'fail' ? 'exceeds' : 'uses more than 70 % of'} its ${capacitorRatedV}` +
                ` V rating: use a capacitor rated higher.`,
        });
      }
      if (capacitorRatedA !== null) {
        const over = s.rmsA > capacitorRatedA;
        findings.push({
          severity: over ? 'fail' : 'ok',
          rule: 'lpf.capacitor-current',
          subject: `${subject}: C${e.index}`,
          value: s.rmsA,
          limit: capacitorRatedA,
          unit: 'A',
          source: 'lpf.capacitor-current',
          message: over
            ? `${s.rmsA.toFixed(2)} A RMS of RF current at the worst load exceeds its ${capacitorRatedA} A rating: ` +
              `it will heat; use a part rated for more current or two in parallel.`
            : `${s.rmsA.toFixed(2)} A RMS of RF current at the worst load against its ${capacitorRatedA} A rating.` });
      }
      if (selfResonanceHz < topHz) {
        findings.push({
          severity: 'caution',
          rule: 'core.self-resonance',
          subject: `${subject}: C${e.index}`,
          value: selfResonanceHz,
          limit: topHz,
          unit: 'Hz',
          source: 'core.self-resonance',
          message: `With about ${CAPACITOR_LEAD_INDUCTANCE_H * 1e9} nH of lead this capacitor ` +
            `resonates near ${mhz(selfResonanceHz)}, below the ${HIGHEST_HARMONIC}th harmonic (${mhz(topHz)}` +
            `): keep its leads very short or use a chip part.`,
        });
      }
    }
  }
  if (
    core &&
    core.minFrequencyHz !== null &&
    core.maxFrequencyHz !== null &&
    (f0 < core.minFrequencyHz || f0 > core.maxFrequencyHz)
  ) {
    findings.push({
      severity: 'caution',
      rule: 'core.frequency',
      subject,
      value: f0,
      limit: f0 < core.minFrequencyHz ? core.minFrequencyHz : core.maxFrequencyHz,
      unit: 'Hz',
      source: 'design.maker-rating',
      message: `The core material is made for ${mhz(core.minFrequencyHz)}–${mhz(core.maxFrequencyHz)}; at ` +
        `${mhz(f0)} its losses or permeability differ from its data: choose a material for this band.`,
    });
  }
  if (!geo) {
    findings.push({
      severity: 'caution',
      rule: 'core.not-entered',
      subject,
      value: null,
      limit: null,
      unit: '',
      source: 'design.consistency',
      message:
        "The core's outer and inner diameter and height are not entered (or no core is chosen from the catalog), so " +
          "the flux density in the inductors is not checked.",
    });
  }
  const realisation: CoreRealisation = {
    leM: geo?.leM ?? null,
    aeM2: geo?.aeM2 ?? null,
    permeability: geo ? effectivePermeability(d.coreAlHPerTurn2, geo.leM, geo.aeM2) : null,
    inductors,
    capacitors,
    powerW,
    swr,
    fluxLimitT: core?.fluxLimitT ?? null,
    capacitorRatedV,
    capacitorRatedA,
  };
  return { realisation, findings };
}
