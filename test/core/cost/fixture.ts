// Minimal project builder for costing tests: only the parts/BOM/costing fields matter here.
import type { BomLine, Offer, Part, Project, Stage, Supplier } from '../../../src/core/model';

export function offer(o: Partial<Offer> & Pick<Offer, 'id' | 'supplier' | 'breaks'>): Offer {
  return { sku: `SKU-${o.id}`, currency: 'USD', minOrder: 1, orderMultiple: 1, stockNote: '', ...o };
}

export function part(id: string, offers: Offer[], extra: Partial<Part> = {}): Part {
  return { id, description: `Part ${id}`, category: 'resistor', ratings: {}, offers, ...extra };
}

export function line(id: string, partId: string, qtyPerRig: number, extra: Partial<BomLine> = {}): BomLine {
  return { id, stageId: null, partId, qtyPerRig, refs: '', notes: '', ...extra };
}

export function stage(id: string, kind: Stage['kind'], name: string): Stage {
  return { id, kind, name, notes: '', loads: [], dissipationW: null };
}

export interface Fixture {
  parts: Part[];
  bom: BomLine[];
  suppliers?: Supplier[];
  stages?: Stage[];
  kits?: number;
  attritionFraction?: number;
  sparesPerLine?: number;
  exchangeRates?: Record<string, number>;
  currency?: string;
}

export function project(f: Fixture): Project {
  return {
    id: 'p1',
    name: 'Test rig',
    notes: '',
    frequencyHz: 7.03e6,
    targetPowerW: 5,
    mains: null,
    ambientC: 25,
    currency: f.currency ?? 'USD',
    kits: f.kits ?? 1,
    keyingDuty: 0.4,
    version: 1,
    supply: { transformers: [], rails: [], primaryFuseA: null },
    stages: f.stages ?? [],
    rf: {
      spuriousRule: 'itu-app3',
      evenHarmonicDbc: -30,
      worstSwr: 2,
      antennaGainDbi: 2.15,
      feedlineLossDb: 0.5,
      groundReflection: true,
      exposureDutyFactor: 0.4,
      exposureOnFraction: 1,
    },
    parts: f.parts,
    bom: f.bom,
    costing: {
      attritionFraction: f.attritionFraction ?? 0,
      sparesPerLine: f.sparesPerLine ?? 0,
      exchangeRates: f.exchangeRates ?? {},
      suppliers: f.suppliers ?? [],
    },
  };
}
