// Which input clears a finding, by its rule: the field (a key of the spec that draws it) a builder changes first.
// Where several would do, the one named in the finding's message comes first, then the cheapest change.
import type { Rail } from '../../src/core/model';

type RailKind = Rail['kind'];

/** Rail rules → the field of the rail's own spec (rectified, regulated, battery); `*` = any other rule. */
export const RAIL_FIELDS: Record<RailKind, Record<string, string>> = {
  rectified: {
    'rail.headroom': 'reservoirF',
    'rail.winding': 'windingId',
    'rail.mains': 'windingId',
    'rectifier.half-wave': 'topology',
    'rectifier.simulation': 'reservoirF',
    'reservoir.ripple': 'reservoirF',
    'reservoir.ripple-current': 'capacitorRippleA',
    'reservoir.voltage': 'capacitorRatedV',
    'catalog.reservoir-voltage': 'capacitorRatedV',
    'catalog.reservoir-ripple': 'capacitorRippleA',
    'catalog.reservoir-ratings': 'capacitorRatedV',
    'catalog.reservoir-match': 'reservoirF',
    'bleeder.discharge': 'bleederOhm',
    'bleeder.power': 'bleederRatedW',
    'fuse.rating': 'fuseA',
    'fuse.fault-clearing': 'windingFuseA',
    'budget.rail-voltage': 'minimumV',
    // the hot first elements come from the winding's regulation (a stiffer winding); more reservoir only slows the sag
    'supply.keying-transient': 'windingId',
    '*': 'reservoirF',
  },
  regulated: {
    'regulator.headroom': 'dropoutV',
    'regulator.max-input': 'maxInputV',
    'regulator.max-output': 'maxOutputA',
    'regulator.ripple': 'rippleRejectionDb',
    'regulator.setting': 'setting.method',
    'regulator.switching': 'regulator',
    'thermal.mount': 'mount.thetaSaKPerW',
    'thermal.tune-up': 'mount.thetaSaKPerW',
    'thermal.junction': 'mount.thetaSaKPerW',
    'thermal.heatsink': 'mount.thetaSaKPerW',
    'supply.parent': 'parentId',
    'budget.rail-voltage': 'setting.nominalV',
    'bleeder.discharge': 'name',
    '*': 'regulator',
  },
  battery: {
    'battery.capacity': 'capacityAh',
    'battery.runtime': 'capacityAh',
    'battery.curve-runtime': 'capacityAh',
    'battery.end-voltage': 'endV',
    'battery.deep-discharge': 'endV',
    'battery.window': 'minimumV',
    'battery.curve': 'chemistry',
    'budget.rail-voltage': 'nominalV',
    '*': 'capacityAh',
  },
};

/** PA rules → field of the PA spec on the stage page. */
export const PA_FIELDS: Record<string, string> = {
  'pa.vds': 'deviceVdsMaxV',
  'pa.drain-clamp': 'drainClampV',
  'pa.id': 'deviceIdMaxA',
  'pa.tj-carrier': 'mount.thetaSaKPerW',
  'pa.tj-keying': 'mount.thetaSaKPerW',
  'pa.heatsink': 'mount.thetaSaKPerW',
  'pa.heat-safety': 'mount.thetaSaKPerW',
  'pa.swr-dissipation': 'mount.thetaSaKPerW',
  'pa.swr-output': 'loadOhm',
  'pa.class-e-shunt': 'deviceCossF',
  'core.output-flux': 'outputPrimaryTurns',
  'network.pi': 'networkLoadOhm',
  'core.output-fit': 'outputWireDiameterM',
  'core.missing': 'outputCoreId',
  'core.frequency': 'outputCoreId',
  'pa.class-e-switching': 'networkLoadOhm',
  'pa.harmonics-class-e': 'topology',
  'pa.leakage-ring': 'outputLeakageH',
  'pa.conduction-angle': 'conductionAngleDeg',
  'pa.imbalance': 'imbalanceWorst',
  'pa.efficiency': 'efficiency',
  'pa.power': 'loadOhm',
  'pa.power-low-supply': 'loadOhm',
  'battery.pa-output': 'loadOhm',
  'budget.pa-current': 'loadOhm',
  'pa.model': 'topology',
  '*': 'topology',
};

/** Low-pass filter rules → field of the filter spec. A snapped capacitor is cured by parallel pairs, an inductor
 * by its core's AL (turns are whole numbers). */
export const LPF_FIELDS: Record<string, string> = {
  'lpf.swr': 'allowParallelPairs',
  'lpf.snap:C': 'allowParallelPairs',
  'lpf.snap:L': 'coreAlHPerTurn2',
  'lpf.passband': 'cutoffHz',
  'lpf.capacitor-voltage': 'capacitorRatedV',
  'lpf.capacitor-rating': 'capacitorRatedV',
  'lpf.capacitor-current': 'capacitorRatedA',
  'core.missing': 'coreId',
  'core.fit': 'core.outerDiameterM',
  'core.flux': 'core.fluxLimitT',
  'core.frequency': 'core.maxFrequencyHz',
  'core.not-entered': 'coreAlHPerTurn2',
  'core.self-resonance': 'coreAlHPerTurn2',
  'spurious.harmonic': 'order',
  '*': 'order',
};

/** T/R relay and keying rules → field of the relay spec. */
export const RELAY_FIELDS: Record<string, string> = {
  'relay.rf-voltage': 'rfRatedVpeak',
  'relay.swr': 'rfRatedVpeak',
  'relay.isolation': 'isolationDb',
  'relay.rf-current': 'contactCarryA',
  'relay.dc-contacts': 'dcSwitchedA',
  'relay.hot-switch': 'txDelayS',
  'relay.keying': 'txDelayS',
  'relay.coil': 'coilA',
  'keying.bandwidth': 'keyRiseS',
  'keying.edges': 'keyRiseS',
  'keying.not-entered': 'keyRiseS',
  'keying.first-element': 'txDelayS',
  '*': 'contactCarryA',
};

/** Project-settings rules (overview) → field of the settings spec. */
export const SETTINGS_FIELDS: Record<string, string> = {
  'mains.corners': 'mains.lowFraction',
  'mains.values': 'mains.nominalV',
  'cost.kits': 'kits',
  'enclosure.ambient': 'ambientC',
};

/** RF-settings rules (RF page) → field of the RF settings spec. */
export const RF_SETTINGS_FIELDS: Record<string, string> = {
  'spurious.range': 'spuriousRule',
  'spurious.rule-source': 'spuriousRule',
  'exposure.distance': 'exposureDutyFactor',
  'exposure.range': 'exposureDutyFactor',
  'exposure.near-field': 'antennaGainDbi',
  'exposure.exemption': 'exposureDutyFactor',
  'rf.settings': 'worstSwr',
  '*': 'worstSwr',
};
