// A fresh project with sensible defaults (pure: ids and clock come from the caller).
import type { LpfParams, Mains, PaParams, Project, RelayParams, RfSettings, Stage } from './model';
import { lpfSpec, paSpec, relaySpec } from './spec';
import { dataOfKind } from './spec/stage-data';
import { paDefaultRailId, relayCoilDefaultRailId } from './role-defaults';
import { defaultRuleSet } from './rules/rule-set';
import { defaults } from './spec/derive';
import { settingsSpec } from './spec/settings';
import { rfSettingsSpec } from './spec/rf-settings';

export { MAINS_PRESETS } from './spec/settings';

export function newProject(
  id: string,
  name: string,
  frequencyHz: number,
  targetPowerW: number,
  mains: Mains | null,
): Project {
  return {
    id,
    name,
    notes: '',
    frequencyHz,
    targetPowerW,
    mains,
    // ambient, currency, kits and keying duty start at the settings spec's defaults (sources there)
    ...settingStart(),
    version: 1,
    supply: { transformers: [], rails: [], primaryFuseA: null },
    stages: [],
    // the rule set follows the mains preset (120 V / 60 Hz: US; other mains: ITU / CEPT); editable in the RF settings
    rf: { ...defaultRfSettings(), spuriousRule: defaultRuleSet(mains) ?? defaultRfSettings().spuriousRule },
    parts: [],
    bom: [],
    costing: { attritionFraction: 0, sparesPerLine: 0, exchangeRates: {}, suppliers: [] },
  };
}

/** RF settings for a new project: the RF settings spec's defaults (US rule, 2:1 worst SWR, a dipole, CW duty). */
export function defaultRfSettings(): RfSettings {
  return defaults(rfSettingsSpec) as unknown as RfSettings;
}

function settingStart(): Pick<Project, 'ambientC' | 'currency' | 'kits' | 'keyingDuty'> {
  const d = defaults(settingsSpec) as unknown as Project;
  return { ambientC: d.ambientC, currency: d.currency, kits: d.kits, keyingDuty: d.keyingDuty };
}

/** A copy with fresh ids for every row, so it can live beside the original. */
export function cloneProject(
  p: Project,
  newProjectId: string,
  name: string,
  makeId: (prefix: string) => string,
): Project {
  const map = new Map<string, string>();
  const remap = (old: string, prefix: string) => {
    if (!map.has(old)) map.set(old, makeId(prefix));
    return map.get(old)!;
  };
  const r = (old: string) => map.get(old) ?? old;
  const transformers = p.supply.transformers.map((t) => ({
    ...t,
    id: remap(t.id, 'tr'),
    windings: t.windings.map((w) => ({ ...w, id: remap(w.id, 'w') })),
  }));
  p.supply.rails.forEach((rail) => remap(rail.id, 'rail'));
  p.stages.forEach((s) => remap(s.id, 'st'));
  p.parts.forEach((x) => remap(x.id, 'part'));
  (p.cores ?? []).forEach((c) => remap(c.id, 'core'));
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
    ...(s.pa
      ? {
          pa: { ...s.pa, railId: r(s.pa.railId), ...(s.pa.outputCoreId ? { outputCoreId: r(s.pa.outputCoreId) } : {}) },
        }
      : {}),
    ...(s.lpf ? { lpf: { ...structuredClone(s.lpf), ...(s.lpf.coreId ? { coreId: r(s.lpf.coreId) } : {}) } } : {}),
    ...(s.relay ? { relay: { ...s.relay, coilRailId: s.relay.coilRailId ? r(s.relay.coilRailId) : null } } : {}),
  }));
  const parts = p.parts.map((x) => ({
    ...structuredClone(x),
    id: r(x.id),
    offers: x.offers.map((o) => ({ ...o, id: makeId('of') })),
  }));
  // a design role names the item it belongs to ("reservoir:<rail id>"): the binding follows the item's new id
  const role = (id: string | null | undefined) =>
    id ? id.replace(/^([^:]+):(.+)$/, (_m, kind: string, item: string) => `${kind}:${r(item)}`) : id;
  const bom = p.bom.map((b) => ({
    ...b,
    id: makeId('bl'),
    partId: r(b.partId),
    stageId: b.stageId ? r(b.stageId) : null,
    ...(b.roleId !== undefined ? { roleId: role(b.roleId) } : {}),
  }));
  const cores = p.cores?.map((c) => ({ ...c, id: r(c.id) }));
  return {
    ...structuredClone(p),
    id: newProjectId,
    name,
    version: 1,
    supply: { ...p.supply, transformers, rails },
    stages,
    parts,
    bom,
    ...(cores ? { cores } : {}),
  };
}

// Starting values for a new final, filter or relay stage come from their field specs (the spec's defaults); the
// builder edits them on the stage page.
export const defaultPa = (railId: string) => ({ ...defaults(paSpec), railId }) as PaParams;
export const defaultLpfParams = () => defaults(lpfSpec) as unknown as LpfParams;
export const defaultRelay = (coilRailId: string | null) => ({ ...defaults(relaySpec), coilRailId }) as RelayParams;

/**
 * A stage whose kind owns a data block (PA, filter, relay: STAGE_DATA) gets it with the spec's starting values when
 * it has none. Its rail references follow the roles (role-defaults.ts): the PA feeds from the highest-voltage rail
 * that is not a regulator's raw input (one of the stage's own load rails when one qualifies), the relay coil from
 * the signal rail. With no such rail the PA has no rail ('') and the coil none (null): the evaluation reports
 * either as a failure instead of leaving the current out.
 */
export function withKindDefaults(p: Project, s: Stage): Stage {
  const own = dataOfKind(s.kind);
  if (!own || s[own.key]) return s;
  const roles: Record<string, unknown> = {
    pa: { railId: paDefaultRailId(p, s.loads.map((l) => l.railId)) ?? '' },
    relay: { coilRailId: relayCoilDefaultRailId(p) },
  };
  return { ...s, [own.key]: { ...defaults(own.spec), ...(roles[own.key] as object | undefined) } };
}
