// Invented sample cores for the demos, described by size and material only (no maker's part codes). Their AL and
// flux limits are illustrative values for the demos, not any maker's data: take a real core's from its data sheet.
import type { CatalogCore, ToroidCore } from '../src/core/model';
import { toroidEffective } from '../src/core/rf/cores';

export interface SampleCore {
  name: string;
  alHPerTurn2: number;
  core: ToroidCore;
}

export const SAMPLE_CORES: Record<'iron12' | 'iron17' | 'ferrite23', SampleCore> = {
  iron12: {
    name: 'Iron-powder toroid 12.7 mm, 2–30 MHz mix (AL 4.9 nH/t²)',
    alHPerTurn2: 4.9e-9,
    core: {
      outerDiameterM: 12.7e-3,
      innerDiameterM: 7.7e-3,
      heightM: 4.8e-3,
      fluxLimitT: 0.015,
      minFrequencyHz: 2e6,
      maxFrequencyHz: 30e6,
      wireDiameterM: 0.8e-3,
    },
  },
  iron17: {
    name: 'Iron-powder toroid 17.5 mm, 2–30 MHz mix (AL 5.7 nH/t²)',
    alHPerTurn2: 5.7e-9,
    core: {
      outerDiameterM: 17.5e-3,
      innerDiameterM: 9.4e-3,
      heightM: 4.8e-3,
      fluxLimitT: 0.015,
      minFrequencyHz: 2e6,
      maxFrequencyHz: 30e6,
      wireDiameterM: 0.8e-3,
    },
  },
  ferrite23: {
    name: 'Ferrite toroid 23 mm, broadband transformer material 1–50 MHz (AL 900 nH/t²)',
    alHPerTurn2: 900e-9,
    core: {
      outerDiameterM: 23e-3,
      innerDiameterM: 14e-3,
      heightM: 7.5e-3,
      fluxLimitT: 0.02,
      minFrequencyHz: 1e6,
      maxFrequencyHz: 50e6,
      wireDiameterM: 0.6e-3,
    },
  },
};

/** A catalog core made from a sample toroid: Ae and le from its dimensions (src/core/rf/cores.ts). Row ids are
 *  unique across the database, so each demo passes its own id. */
export function toroidEntry(id: string, s: SampleCore): CatalogCore {
  const c = s.core;
  const geo = toroidEffective(c.outerDiameterM!, c.innerDiameterM!, c.heightM!);
  // stored as the boxes read them (nH/t², mm², mm to two decimals), so each value shows as typed on the page
  const inUnit = (x: number, scale: number) => Number((x / scale).toFixed(2)) / Math.round(1 / scale);
  return {
    id,
    name: s.name,
    alHPerTurn2: inUnit(s.alHPerTurn2, 1e-9),
    aeM2: inUnit(geo.aeM2, 1e-6),
    leM: inUnit(geo.leM, 1e-3),
    innerDiameterM: inUnit(c.innerDiameterM!, 1e-3),
    windowAreaM2: null,
    minFrequencyHz: c.minFrequencyHz!,
    maxFrequencyHz: c.maxFrequencyHz!,
    fluxLimitT: c.fluxLimitT!,
  };
}

/** An invented binocular core for the club demo's output transformer (illustrative figures, not any maker's data). */
export const CATALOG_BINOCULAR: CatalogCore = {
  id: 'core-club-bino14',
  name: 'Ferrite binocular core 14 × 8 × 12 mm, HF power material 1–30 MHz (AL 2000 nH/t²)',
  alHPerTurn2: 2000 / 1e9,
  aeM2: 25 / 1e6,
  leM: 25 / 1e3,
  innerDiameterM: null,
  windowAreaM2: 18 / 1e6,
  minFrequencyHz: 1e6,
  maxFrequencyHz: 30e6,
  fluxLimitT: 0.03,
};
