// The data a stage kind owns (a final's PA data, a filter's design, a T/R stage's relay data), in one registry:
// the stage page's forms and routes, the project file, the database's stage params, the stored-value check and
// the kind-change question are all built from it. Adding a kind with its own data means: its spec, one entry
// here, its computation in core (wired into evaluate), and a line in model.ts's Stage type.
import type { Project, Stage, StageKind } from '../model';
import type { FieldError, Spec } from './field';
import { paSpec } from './pa';
import { lpfSpec } from './lpf';
import { relaySpec } from './relay';

export type StageDataKey = 'pa' | 'lpf' | 'relay';

export interface StageData {
  key: StageDataKey; // the Stage property, the form id and the URL segment (/stages/:sid/pa)
  kind: StageKind; // the one kind that owns it
  spec: Spec;
  what: string; // in words, for "drops its PA data"
  submit: string; // the form's button
  rows: string[][]; // field keys in the form's rows, as drawn on the stage page
}

export const STAGE_DATA: readonly StageData[] = [
  {
    key: 'pa',
    kind: 'final',
    spec: paSpec,
    what: 'PA data',
    submit: 'Save PA data',
    rows: [
      ['topology', 'amplifierClass', 'railId', 'devices'],
      ['saturationV', 'rdsOnOhm', 'turnsRatio', 'loadOhm', 'efficiency'],
      ['deviceVdsMaxV', 'drainClampV', 'deviceIdMaxA', 'biasIdleMaxA', 'referencePowerW'],
      ['mount.thetaJcKPerW', 'mount.thetaCsKPerW', 'mount.thetaSaKPerW', 'mount.tjMaxC', 'heatsinkSharedBy'],
      [
        'networkLoadOhm',
        'conductionAngleDeg',
        'imbalanceTypical',
        'imbalanceWorst',
        'deviceCossF',
        'outputLeakageH',
        'transitionTimeS',
      ],
      ['outputCoreId', 'outputPrimaryTurns', 'outputWireDiameterM'],
    ],
  },
  {
    key: 'lpf',
    kind: 'lpf',
    spec: lpfSpec,
    what: 'filter design',
    submit: 'Save and redesign',
    rows: [
      ['response', 'rippleDb', 'order', 'form', 'cutoffHz'],
      ['capacitorSeries', 'allowParallelPairs', 'coreId', 'coreName', 'coreAlHPerTurn2'],
      ['core.outerDiameterM', 'core.innerDiameterM', 'core.heightM', 'core.wireDiameterM'],
      ['core.fluxLimitT', 'core.minFrequencyHz', 'core.maxFrequencyHz', 'capacitorRatedV', 'capacitorRatedA'],
      ['inductorQ', 'capacitorQ', 'capacitorTolerance', 'inductorTolerance', 'monteCarloTrials', 'seed'],
    ],
  },
  {
    key: 'relay',
    kind: 'tr',
    spec: relaySpec,
    what: 'relay data',
    submit: 'Save relay data',
    rows: [
      ['contactCarryA', 'contactSwitchA', 'contactRatedV', 'rfRatedVpeak', 'dcSwitchedA'],
      ['coilA', 'coilRailId', 'coilReceive', 'coilKeyUp', 'coilKeyDown'],
      ['isolationDb', 'position', 'receiverMaxInputW'],
      ['operateS', 'releaseS', 'bounceS', 'txDelayS', 'wpm'],
      ['keyRiseS', 'keyFallS', 'keyShapingRcS'],
    ],
  },
];

/** The data block a stage of this kind owns, if any. */
export const dataOfKind = (kind: StageKind): StageData | undefined => STAGE_DATA.find((d) => d.kind === kind);

/** The stage's own data block and its value (undefined when its kind owns none or it has none yet). */
export function stageData(s: Stage): { data: StageData; value: unknown } | undefined {
  const data = dataOfKind(s.kind);
  const value = data ? s[data.key] : undefined;
  return data && value ? { data, value } : undefined;
}

/** Rails, stages, ... named by the block's reference fields that the project does not have. */
export function missingRefs(p: Project, spec: Spec, value: Record<string, unknown>): FieldError[] {
  const ids = {
    rail: new Set(p.supply.rails.map((r) => r.id)),
    stage: new Set(p.stages.map((s) => s.id)),
    core: new Set((p.cores ?? []).map((c) => c.id)),
  } as Record<string, Set<string>>;
  const errors: FieldError[] = [];
  for (const [key, f] of Object.entries(spec.fields)) {
    const id = value[key];
    if (f.type !== 'ref' || typeof id !== 'string' || !ids[f.to] || ids[f.to].has(id)) continue;
    errors.push({ field: key, label: f.label, message: `${f.label}: that ${f.to} no longer exists; choose another` });
  }
  return errors;
}
