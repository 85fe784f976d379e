// A fresh project with sensible defaults (pure: ids and clock come from the caller).
import type { Project, Mains } from './model';

export const MAINS_PRESETS: Record<string, Mains | null> = {
  '230-50': { nominalV: 230, frequencyHz: 50, lowFraction: 0.1, highFraction: 0.1 },
  '120-60': { nominalV: 120, frequencyHz: 60, lowFraction: 0.1, highFraction: 0.1 },
  '100-50': { nominalV: 100, frequencyHz: 50, lowFraction: 0.1, highFraction: 0.1 },
  battery: null,
};

export function newProject(id: string, name: string, frequencyHz: number, targetPowerW: number, mains: Mains | null): Project {
  return {
    id,
    name,
    notes: '',
    frequencyHz,
    targetPowerW,
    mains,
    ambientC: 30,
    currency: 'USD',
    kits: 1,
    // Source: FCC OET Bulletin 65 Supplement B (1997), Table 2: conversational CW duty factor 40 %
    keyingDuty: 0.4,
    version: 1,
    supply: { transformers: [], rails: [], primaryFuseA: null },
    stages: [],
    rf: {
      spuriousRule: 'us-97-307',
      evenHarmonicDbc: -30,
      worstSwr: 2,
      antennaGainDbi: 2.15,
      feedlineLossDb: 0.5,
      groundReflection: true,
      exposureDutyFactor: 0.4,
      exposureOnFraction: 1,
    },
    parts: [],
    bom: [],
    costing: { attritionFraction: 0, sparesPerLine: 0, exchangeRates: {}, suppliers: [] },
  };
}

/** A copy with fresh ids for every row, so it can live beside the original. */
export function cloneProject(p: Project, newProjectId: string, name: string, makeId: (prefix: string) => string): Project {
  const map = new Map<string, string>();
  const remap = (old: string, prefix: string) => {
    if (!map.has(old)) map.set(old, makeId(prefix));
    return map.get(old)!;
  };
  const r = (old: string) => map.get(old) ?? old;
  const transformers = p.supply.transformers.map((t) => ({ ...t, id: remap(t.id, 'tr'), windings: t.windings.map((w) => ({ ...w, id: remap(w.id, 'w') })) }));
  p.supply.rails.forEach((rail) => remap(rail.id, 'rail'));
  p.stages.forEach((s) => remap(s.id, 'st'));
  p.parts.forEach((x) => remap(x.id, 'part'));
  const rails = p.supply.rails.map((rail) => {
    const id = r(rail.id);
    if (rail.kind === 'rectified') return { ...rail, id, windingId: r(rail.windingId) };
    if (rail.kind === 'regulated') return { ...rail, id, parentId: r(rail.parentId) };
    return { ...rail, id };
  });
  const stages = p.stages.map((s) => ({
    ...structuredClone(s),
    id: r(s.id),
    loads: s.loads.map((l) => ({ ...l, railId: r(l.railId) })),
    ...(s.pa ? { pa: { ...s.pa, railId: r(s.pa.railId) } } : {}),
    ...(s.relay ? { relay: { ...s.relay, coilRailId: s.relay.coilRailId ? r(s.relay.coilRailId) : null } } : {}),
  }));
  const parts = p.parts.map((x) => ({ ...structuredClone(x), id: r(x.id), offers: x.offers.map((o) => ({ ...o, id: makeId('of') })) }));
  const bom = p.bom.map((b) => ({ ...b, id: makeId('bl'), partId: r(b.partId), stageId: b.stageId ? r(b.stageId) : null }));
  return { ...structuredClone(p), id: newProjectId, name, version: 1, supply: { ...p.supply, transformers, rails }, stages, parts, bom };
}
