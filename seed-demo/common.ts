// Small builders shared by the demo projects.
import type { Offer, PerMode, RfSettings, LpfParams } from '../src/core/model';

export const perMode = (receive: number, keyUp: number, keyDown: number): PerMode => ({ receive, keyUp, keyDown });

export function offer(id: string, supplier: string, sku: string, currency: string, breaks: [number, number][], minOrder = 1, orderMultiple = 1, stockNote = ''): Offer {
  return { id, supplier, sku, currency, breaks: breaks.map(([minQty, unitPriceCents]) => ({ minQty, unitPriceCents })), minOrder, orderMultiple, stockNote };
}

export function defaultRf(): RfSettings {
  return {
    spuriousRule: 'us-97-307',
    evenHarmonicDbc: -30,
    worstSwr: 2,
    antennaGainDbi: 2.15,
    feedlineLossDb: 0.5,
    groundReflection: true,
    exposureDutyFactor: 0.4,
    exposureOnFraction: 1,
  };
}

export function defaultLpf(): LpfParams {
  return {
    response: 'chebyshev',
    rippleDb: 0.1,
    order: 5,
    form: 'capacitor-input',
    cutoffHz: null,
    capacitorSeries: 'E12',
    allowParallelPairs: true,
    coreAlHPerTurn2: 4.9e-9,
    coreName: 'Iron-powder toroid 12.7 mm, 1–30 MHz mix (AL 4.9 nH/t²)',
    inductorQ: 150,
    capacitorQ: 1000,
    capacitorTolerance: 0.05,
    inductorTolerance: 0.05,
    monteCarloTrials: 2000,
    seed: 1,
  };
}
