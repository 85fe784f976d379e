// The three kinds of rail: rectified from a winding, regulated from another rail, and a battery (or external DC).
// Field keys are the stored (model) key paths; `form:` keeps the supply page's field names.
import { defineSpec, U, type FieldError, type Spec } from './field';
import { getPath } from './derive';
import type { Rail, RectifiedRail, RegulatorSetting } from '../model';
import { choice, num, optNum, ref, text } from './make';
import { ARMS } from './supply';
import { BATTERY_CHEMISTRIES, CHEMISTRY_LABEL } from '../power/battery-curve';

type Obj = Record<string, unknown>;

const railName = text('Rail name', 200, true, 'New rail');

/** The lowest voltage the rail's direct loads (a PA, a relay coil) need; checks and checklists use it. */
const minimumV = optNum('Lowest voltage its loads need', 'V', U.V, 0, 1000, null, {
  exclusiveMin: true,
  help: 'direct loads only; empty = not stated',
  example: '12',
});

export const TOPOLOGIES = [
  ['bridge', 'Bridge (4 diodes)'],
  ['centre-tap', 'Centre-tap (2 diodes)'],
  ['half-wave', 'Half-wave (1 diode)'],
] as const;

/** IEC 60127-2 standard sheets of 5 x 20 mm fuse-links. */
export const FUSE_SHEETS = [
  ['T3', 'T, time-lag, low breaking (sheet 3)'],
  ['T5', 'T, time-lag, high breaking (sheet 5)'],
  ['F2', 'F, quick-acting (sheet 2)'],
] as const;

export const rectifiedSpec = defineSpec({
  name: 'rectified-rail',
  label: 'Rectified rail',
  fields: {
    name: railName,
    windingId: ref('Winding', 'winding', false),
    topology: choice('Rectifier', TOPOLOGIES, 'bridge'),
    diodeDropV: num('Diode drop', 'V', U.V, 0, 5, 0.9, { form: 'diodeDrop' }),
    diodeResistanceOhm: num('Diode resistance', 'Ω', U.ohm, 0, 100, 0.03, { form: 'diodeR' }),
    reservoirF: num('Reservoir', 'F', U.uF, 0, 10, 4700e-6, { form: 'reservoir', exclusiveMin: true, example: '4700' }),
    esrOhm: num('Capacitor ESR', 'Ω', U.ohm, 0, 100, 0.05, { form: 'esr' }),
    capacitorRatedV: optNum('Capacitor voltage rating', 'V', U.V, 0, 10_000, null, {
      form: 'capV',
      exclusiveMin: true,
      help: 'empty = not chosen',
    }),
    capacitorRippleA: optNum('Capacitor ripple rating', 'A', ARMS, 0, 1000, null, {
      form: 'capRipple',
      exclusiveMin: true,
      help: 'empty = not chosen',
    }),
    bleederOhm: optNum('Bleeder', 'Ω', U.ohm, 0, 1e9, null, {
      form: 'bleeder',
      exclusiveMin: true,
      help: 'empty = none fitted',
    }),
    ripplePpTargetV: optNum('Ripple target', 'V', { symbol: 'V p-p', scale: 1 }, 0, 1000, null, {
      form: 'rippleTarget',
      exclusiveMin: true,
      help: 'empty = none',
    }),
    marginV: num('Headroom margin', 'V', U.V, 0, 100, 0.5, {
      form: 'margin',
      help: 'extra above what regulators need',
    }),
    fuseA: optNum('Fitted rail fuse', 'A', U.A, 0, 63, null, {
      form: 'fuse',
      exclusiveMin: true,
      help: 'empty = recommend one',
    }),
    minimumV,
    windingFuseA: optNum('Fitted winding fuse', 'A', U.A, 0, 63, null, {
      form: 'windingFuse',
      exclusiveMin: true,
      help: 'in the winding lead, before the rectifier; empty = recommend one',
    }),
    windingFuseSheet: choice('Winding fuse type', FUSE_SHEETS, 'T3', { form: 'windingFuseSheet' }),
    bleederRatedW: optNum('Bleeder power rating', 'W', U.W, 0, 1000, null, {
      form: 'bleederW',
      exclusiveMin: true,
      help: 'empty = not stated',
      example: '1',
    }),
    // the rectifier package (bridge or diodes): datasheet values; θsa empty = no heatsink fitted
    'bridgeMount.thetaJcKPerW': optNum('Rectifier θjc', 'K/W', U.KW, 0, 100, null, {
      form: 'bridgeThetaJc',
      example: '2.2',
    }),
    'bridgeMount.thetaCsKPerW': optNum('Rectifier θcs', 'K/W', U.KW, 0, 100, null, {
      form: 'bridgeThetaCs',
      help: 'greased about 0.5',
      example: '0.5',
    }),
    'bridgeMount.thetaSaKPerW': optNum('Rectifier heatsink θsa', 'K/W', U.KW, 0, 1000, null, {
      form: 'bridgeThetaSa',
      exclusiveMin: true,
      help: 'empty = no heatsink',
      example: '5',
    }),
    'bridgeMount.tjMaxC': optNum('Rectifier Tj ' +
      'max', '°C', U.C, 50, 250, null, { form: 'bridgeTjMax', example: '150' }),
    bridgeFreeAirKPerW: optNum('Rectifier θja (free air)', 'K/W', U.KW, 0, 1000, null, {
      form: 'bridgeThetaJa',
      exclusiveMin: true,
      help: 'without heatsink; empty = assumed 22',
      example: '22',
    }),
  },
  refine: (v): FieldError[] => {
    // θsa alone may stay empty (no heatsink); once any value is entered θjc, θcs and Tj max are needed
    const keys = ['bridgeMount.thetaJcKPerW', 'bridgeMount.thetaCsKPerW', 'bridgeMount.tjMaxC'];
    if (![...keys, 'bridgeMount.thetaSaKPerW'].some((k) => present(v, k))) return [];
    const label = (k: string): string => (rectifiedSpec.fields as Record<string, { label: string }>)[k].label;
    return keys
      .filter((k) => !present(v, k))
      .map((k) => ({
        field: k,
        label: label(k),
        message: `${label(k)}: needed once any rectifier heatsink value is entered (leave them all empty for the ` +
          `assumed part)`,
      }));
  },
  view: {
    from: (stored) => stored,
    to: (v) => {
      const mount = v.bridgeMount as Obj | null | undefined;
      const hasMount = !!mount && Object.values(mount).some((x) => x !== null && x !== undefined);
      return { ...v, bridgeMount: hasMount ? mount : null };
    },
  },
});


export const REGULATOR_METHODS = [
  ['fixed', 'Fixed output'],
  ['adjustable', 'Adjustable: Vref, R1, R2'],
  ['raised-diodes', 'Fixed, raised by diodes'],
  ['raised-resistor', 'Fixed, raised by R1/R2'],
] as const;

/** The setting fields each output-setting method needs (the others stay empty and are not stored). */
const METHOD_NEEDS: Record<RegulatorSetting['method'], string[]> = {
  fixed: ['setting.nominalV'],
  adjustable: ['setting.vrefV', 'setting.r1Ohm', 'setting.r2Ohm'],
  'raised-diodes': ['setting.nominalV', 'setting.diodes', 'setting.diodeDropV'],
  'raised-resistor': ['setting.nominalV', 'setting.r1Ohm', 'setting.r2Ohm'],
};

const MOUNT_KEYS = ['mount.thetaJcKPerW', 'mount.thetaCsKPerW', 'mount.thetaSaKPerW', 'mount.tjMaxC'];
const uA = { symbol: 'µA', scale: 1e-6 };

const present = (v: Obj, key: string) => {
  const x = getPath(v, key);
  return x !== null && x !== undefined;
};

/** The stored setting of the chosen method: only its own fields (Iadj empty = 0). */
function settingOf(s: Obj): RegulatorSetting {
  const n = (k: string) => s[k] as number;
  switch (s.method as RegulatorSetting['method']) {
    case 'adjustable':
      return {
        method: 'adjustable',
        vrefV: n('vrefV'),
        adjustA: (s.adjustA as number | null) ?? 0,
        r1Ohm: n('r1Ohm'),
        r2Ohm: n('r2Ohm'),
      };
    case 'raised-diodes':
      return { method: 'raised-diodes', nominalV: n('nominalV'), diodes: n('diodes'), diodeDropV: n('diodeDropV') };
    case 'raised-resistor':
      return { method: 'raised-resistor', nominalV: n('nominalV'), r1Ohm: n('r1Ohm'), r2Ohm: n('r2Ohm') };
    default:
      return { method: 'fixed', nominalV: n('nominalV') };
  }
}

export const regulatedSpec = defineSpec({
  name: 'regulated-rail',
  label: 'Regulated rail',
  fields: {
    name: railName,
    parentId: ref('Fed from', 'rail', false),
    regulator: choice(
      'Regulator',
      [
        ['linear', 'Linear (3-terminal)'],
        ['ldo', 'Low-dropout linear'],
        ['switching', 'Switching module'],
      ],
      'linear',
    ),
    'setting.method': choice('Output setting', REGULATOR_METHODS, 'fixed', { form: 'method' }),
    'setting.nominalV': optNum('Regulator voltage', 'V', U.V, 0, 1000, 12, { form: 'nominalV', exclusiveMin: true }),
    'setting.vrefV': optNum('Vref', 'V', U.V, 0, 10, null, {
      form: 'vref',
      exclusiveMin: true,
      help: 'reference voltage',
    }),
    'setting.adjustA': optNum('Iadj', 'A', uA, 0, 0.01, null, {
      form: 'iadj',
      help: 'adjust-pin current; empty = 0',
      example: '50',
    }),
    'setting.r1Ohm': optNum('R1', 'Ω', U.ohm, 0, 1e7, null, { form: 'r1', exclusiveMin: true, help: 'output to adj' }),
    'setting.r2Ohm': optNum('R2', 'Ω', U.ohm, 0, 1e7, null, { form: 'r2', help: 'adj to ground' }),
    'setting.diodes': optNum('Diodes in the ground leg', '', U.none, 1, 10, null, {
      form: 'diodes',
      integer: true,
      example: '2',
    }),
    'setting.diodeDropV': optNum('Drop per diode', 'V', U.V, 0, 5, null, {
      form: 'raiseDrop',
      exclusiveMin: true,
      example: '0.65',
    }),
    dropoutV: num('Dropout', 'V', U.V, 0, 50, 2, { form: 'dropout' }),
    quiescentA: num('Quiescent current', 'A', U.mA, 0, 1, 0.005, { form: 'quiescent', example: '5' }),
    efficiency: optNum('Efficiency (switching)', '%', U.pct, 0, 1, null, {
      exclusiveMin: true,
      help: 'at the lowest input',
    }),
    maxOutputA: optNum('Maximum output current', 'A', U.A, 0, 100, null, {
      form: 'maxOut',
      exclusiveMin: true,
      help: 'empty = unknown',
    }),
    maxInputV: optNum('Maximum input voltage', 'V', U.V, 0, 1000, null, {
      form: 'maxIn',
      exclusiveMin: true,
      help: 'empty = unknown',
    }),
    'mount.thetaJcKPerW': optNum('θjc', 'K/W', U.KW, 0, 100, null, { form: 'thetaJc' }),
    'mount.thetaCsKPerW': optNum('θcs', 'K/W', U.KW, 0, 100, null, { form: 'thetaCs' }),
    'mount.thetaSaKPerW': optNum('Heatsink θsa', 'K/W', U.KW, 0, 1000, null, {
      form: 'thetaSa',
      exclusiveMin: true,
      help: 'empty = compute needed',
    }),
    'mount.tjMaxC': optNum('Tj max', '°C', U.C, 50, 250, null, { form: 'tjMax' }),
    rippleRejectionDb: optNum('Ripple rejection', 'dB', U.dB, 0, 140, null, {
      form: 'psrr',
      help: 'datasheet minimum at 100/120 Hz; empty = not stated',
      example: '62',
    }),
    rippleTargetV: optNum('Output ripple target', 'V', { symbol: 'mV p-p', scale: 1e-3 }, 0, 10, null, {
      form: 'rippleOut',
      exclusiveMin: true,
      help: 'e.g. a receiver rail; empty = none',
      example: '1',
    }),
    outputF: optNum('Output capacitance', 'F', U.uF, 0, 10, null, {
      form: 'outputC',
      exclusiveMin: true,
      help: 'all capacitors on the output; empty = not entered',
      example: '100',
    }),
    bleederOhm: optNum('Output bleeder', 'Ω', U.ohm, 0, 1e9, null, {
      form: 'outBleeder',
      exclusiveMin: true,
      help: 'empty = none fitted',
      example: '2200',
    }),
    bleederRatedW: optNum('Output bleeder rating', 'W', U.W, 0, 1000, null, {
      form: 'outBleederW',
      exclusiveMin: true,
      help: 'empty = not stated',
      example: '0.25',
    }),
  },
  refine: (v) => {
    const errors: FieldError[] = [];
    const label = (k: string) => regulatedSpec.fields[k as keyof typeof regulatedSpec.fields].label;
    const method = getPath(v, 'setting.method') as RegulatorSetting['method'];
    for (const k of METHOD_NEEDS[method] ?? [])
      if (!present(v, k))
        errors.push({ field: k, label: label(k), message: `${label(k)}: needed for this output setting` });
    if (v.regulator === 'switching' && !present(v, 'efficiency'))
      errors.push({
        field: 'efficiency',
        label: label('efficiency'),
        message: 'Efficiency: a switching regulator needs its efficiency at the lowest input voltage (e.g. 85 %)',
      });
    // θsa alone may stay empty (the page then reports the heatsink needed); all four empty = no heatsink data
    if (MOUNT_KEYS.some((k) => present(v, k)))
      for (const k of ['mount.thetaJcKPerW', 'mount.thetaCsKPerW', 'mount.tjMaxC'])
        if (!present(v, k))
          errors.push({
            field: k,
            label: label(k),
            message: `${label(k)}: needed once any heatsink value is entered (leave all four empty for none)`,
          });
    return errors;
  },
  view: {
    from: (stored) => stored,
    to: (v) => {
      const mount = v.mount as Obj | null | undefined;
      const hasMount = !!mount && Object.values(mount).some((x) => x !== null && x !== undefined);
      return { ...v, setting: settingOf((v.setting ?? {}) as Obj), mount: hasMount ? mount : null };
    },
  },
});

export const batterySpec = defineSpec({
  name: 'battery-rail',
  label: 'Battery rail',
  fields: {
    name: railName,
    // one of the chemistries with a discharge curve (power/battery-curve.ts), or an external DC supply; a stored
    // chemistry outside the list (free text before the curves) is refused by name
    chemistry: choice('Chemistry', BATTERY_CHEMISTRIES.map((k) => [k, CHEMISTRY_LABEL[k]] as const), 'LiFePO4', {
      help: 'sets the discharge curve: the plateau the rig runs on for most of the charge and the common end voltage',
    }),
    nominalV: num('Nominal voltage', 'V', U.V, 0, 1000, 12.8, { exclusiveMin: true }),
    fullV: num('Full-charge voltage', 'V', U.V, 0, 1000, 14.4, { exclusiveMin: true }),
    endV: num('End-of-discharge voltage', 'V', U.V, 0, 1000, 10, { exclusiveMin: true }),
    capacityAh: num('Capacity', 'Ah', U.Ah, 0, 10_000, 7, { form: 'capacity', exclusiveMin: true }),
    usableFraction: num('Usable capacity', '%', U.pct, 0, 1, 0.8, {
      form: 'usable',
      exclusiveMin: true,
      example: '80',
    }),
    internalOhm: num('Internal resistance', 'Ω', U.ohm, 0, 100, 0.05, { form: 'internal' }),
    minimumV,
  },
  refine: (v) => {
    const [nom, full, end] = [v.nominalV, v.fullV, v.endV];
    if (typeof nom !== 'number' || typeof full !== 'number' || typeof end !== 'number') return [];
    const e = (field: string, label: string, message: string): FieldError[] => [{ field, label, message }];
    if (end >= full)
      return e('endV', 'End-of-discharge voltage', 'End-of-discharge voltage must be below the full-charge voltage');
    if (nom > full)
      return e('nominalV', 'Nominal voltage', 'Nominal voltage must not be above the full-charge voltage');
    if (nom < end)
      return e('nominalV', 'Nominal voltage', 'Nominal voltage must not be below the end-of-discharge voltage');
    return [];
  },
});

/** The spec of each rail kind. */
export const RAIL_SPECS: Record<Rail['kind'], Spec> = {
  rectified: rectifiedSpec,
  regulated: regulatedSpec,
  battery: batterySpec,
};

/** A rail as stored before `minimumV` existed (old database rows, old files) reads as "not stated". */
/**
 * Rails stored before the winding fuse, bleeder rating and ripple fields existed read them as not stated (fuse type
 * T3).
 */
export function withRailDefaults(r: Rail): Rail {
  const old = r as unknown as Partial<Record<string, unknown>>;
  // the output bleeder and the rectifier's thermal data are optional in the model: absent reads as not entered
  if (r.kind === 'regulated')
    return { ...r, rippleRejectionDb: r.rippleRejectionDb ?? null, rippleTargetV: r.rippleTargetV ?? null };
  const base = { ...r, minimumV: (old.minimumV as number | null | undefined) ?? null };
  if (base.kind === 'battery') return base;
  return {
    ...base,
    windingFuseA: (old.windingFuseA as number | null | undefined) ?? null,
    windingFuseSheet: (old.windingFuseSheet as RectifiedRail['windingFuseSheet'] | undefined) ?? 'T3',
    bleederRatedW: (old.bleederRatedW as number | null | undefined) ?? null,
  };
}
