// A fresh project with sensible defaults (pure: ids and clock come from the caller).
import type { Project, Mains, RfSettings } from './model';
import { paDefaultRailId, relayCoilDefaultRailId } from './role-defaults';
import { defaultRuleSet } from './rules/rule-set';
import { defaults } from './spec/derive';
import { settingsSpec } from './spec/settings';
import { rfSettingsSpec } from './spec/rf-settings';

export { MAINS_PRESETS } from './spec/settings';

export function newProject(id: string, name: string, frequencyHz: number, targetPowerW: number, mains: Mains | null): Project {
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

// Starting values for a new final, filter or relay stage; the builder edits them on the stage page.
export function defaultPa(railId: string): import('./model').PaParams {
  return {
    topology: 'push-pull',
    amplifierClass: 'C',
    railId,
    devices: 2,
    saturationV: 1,
    rdsOnOhm: null,
    turnsRatio: null,
    loadOhm: 50,
    efficiency: null,
    deviceVdsMaxV: 100,
    deviceIdMaxA: 5,
    mount: { thetaJcKPerW: 2, thetaCsKPerW: 1, thetaSaKPerW: null, tjMaxC: 150 },
    biasIdleMaxA: 0.05,
    referencePowerW: 5,
  };
}

export function defaultLpfParams(): import('./model').LpfParams {
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

export function defaultRelay(coilRailId: string | null): import('./model').RelayParams {
  return {
    contactCarryA: 2,
    contactSwitchA: 1,
    contactRatedV: 125,
    rfRatedVpeak: null,
    coilA: 0.03,
    coilRailId,
    coilModes: ['keyUp', 'keyDown'],
    isolationDb: 30,
    operateS: 0.005,
    releaseS: 0.003,
    bounceS: 0.001,
    dcSwitchedA: 0,
    position: 'after-lpf',
    receiverMaxInputW: 0.01,
    txDelayS: 0.008,
    wpm: 20,
  };
}

/**
 * A stage of kind final, lpf or tr gets its kind's data (with starting values) when it has none. The PA feeds from
 * the highest-voltage rail that is not a regulator's raw input (one of the stage's own load rails when one
 * qualifies), the relay coil from the signal rail (role-defaults.ts). With no such rail the PA has no rail ('') and
 * the coil none (null): the evaluation reports either as a failure instead of leaving the current out.
 */
export function withKindDefaults(p: Project, s: import('./model').Stage): import('./model').Stage {
  if (s.kind === 'final' && !s.pa) return { ...s, pa: defaultPa(paDefaultRailId(p, s.loads.map((l) => l.railId)) ?? '') };
  if (s.kind === 'lpf' && !s.lpf) return { ...s, lpf: defaultLpfParams() };
  if (s.kind === 'tr' && !s.relay) return { ...s, relay: defaultRelay(relayCoilDefaultRailId(p)) };
  return s;
}
