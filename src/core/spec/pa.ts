// The final amplifier's data on a stage of kind 'final'.
import { defineSpec, U, type DisplayUnit } from './field';
import { choice, num, optNum, ref } from './make';

const MM: DisplayUnit = { symbol: 'mm', scale: 1e-3 };

export const mountFields = (tjMinC: number) => ({
  'mount.thetaJcKPerW': num('θjc junction–case', 'K/W', U.KW, 0, 100, 2, { form: 'thetaJc' }),
  'mount.thetaCsKPerW': num('θcs case–heatsink', 'K/W', U.KW, 0, 100, 1, {
    form: 'thetaCs',
    help: 'washer and grease',
  }),
  'mount.thetaSaKPerW': optNum('Heatsink θsa', 'K/W', U.KW, 0, 1000, null, {
    form: 'thetaSa',
    exclusiveMin: true,
    help: 'empty = tell me the heatsink I need',
  }),
  'mount.tjMaxC': num('Tj max', '°C', U.C, tjMinC, 250, 150, { form: 'tjMax' }),
});

export const paSpec = defineSpec({
  name: 'pa',
  label: 'Final amplifier data',
  fields: {
    topology: choice('Topology', [['push-pull', 'Push-pull'], ['single-ended', 'Single-ended']], 'push-pull'),
    amplifierClass: choice('Class', [['B', 'B'], ['C', 'C'], ['D', 'D (switching)'], ['E', 'E (switching)']], 'C'),
    railId: ref('Fed from rail', 'rail', false),
    devices: num('Devices', '', U.none, 1, 16, 2, { integer: true, example: '2' }),
    saturationV: optNum('Saturation voltage', 'V', U.V, 0, 100, 1, { form: 'saturation', help: 'or give Rds(on)' }),
    rdsOnOhm: optNum('Rds(on)', 'Ω', U.ohm, 0, 100, null, { form: 'rdsOn' }),
    turnsRatio: optNum('Output turns ratio (sec : full pri)', '', U.none, 0.05, 20, null, {
      form: 'turnsRatio',
      help: 'empty = design it for the target power',
      example: '1.5',
    }),
    loadOhm: num('Output load (antenna side)', 'Ω', U.ohm, 0.1, 10_000, 50, {
      form: 'load',
      help: 'what the output transformer or network drives, usually 50 Ω',
    }),
    // Common practice, no published source: below 5 % a "PA" is a heater; above 100 % is impossible
    efficiency: optNum('Drain efficiency', '%', U.pct, 0.05, 1, null, { help: 'empty = default for the class' }),
    deviceVdsMaxV: num('Device V(BR)DSS', 'V', U.V, 0, 10_000, 100, { form: 'vdsMax', exclusiveMin: true }),
    // same range as the device rating it protects
    drainClampV: optNum('Drain clamp voltage', 'V', U.V, 0, 10_000, null, {
      form: 'drainClamp', exclusiveMin: true, example: '90',
      help: 'a TVS or zener fitted from drain to ground: its clamping voltage; empty = no clamp',
    }),
    deviceIdMaxA: num('Device max drain current', 'A', U.A, 0, 1000, 5, { form: 'idMax', exclusiveMin: true }),
    biasIdleMaxA: num('Bias preset max idle current', 'A', U.mA, 0, 100, 0.05, { form: 'biasIdle', example: '50' }),
    referencePowerW: num('Reference power for dB and S-units', 'W', U.W, 0, 1e6, 5, {
      form: 'referencePower',
      exclusiveMin: true,
      help: 'the output is also given in dB and S-units against this, e.g. the 5 W of a rig you know',
      example: '5',
    }),
    ...mountFields(25),
    heatsinkSharedBy: optNum('Devices on one heatsink', '', U.none, 1, 16, null, {
      integer: true,
      form: 'heatsinkSharedBy',
      help: 'their heat flows through one θsa; empty = each device on its own heatsink',
      example: '2',
    }),
    // Common practice, no published source: class C below 60° gives little power; 180° is class B
    conductionAngleDeg: optNum('Conduction angle (class C)', '°', U.deg, 60, 180, 150, {
      form: 'conductionAngle',
      help: 'of each device per cycle; empty = 150° assumed; sets the class-C harmonics',
      example: '150',
    }),
    // Common practice, no published source: mismatch of the two halves, as a fraction (drive, device or timing)
    imbalanceTypical: optNum('Push-pull imbalance, typical', '%', U.pct, 0, 0.5, 0.05, {
      form: 'imbalanceTypical',
      help: 'halves’ current (B, C) or timing (D, E) mismatch; empty = 5 %',
    }),
    imbalanceWorst: optNum('Push-pull imbalance, worst', '%', U.pct, 0, 0.5, 0.2, {
      form: 'imbalanceWorst',
      help: 'sets the worst end of the even harmonics; empty = 20 %',
    }),
    deviceCossF: optNum('Device output capacitance Coss', 'F', U.pF, 0, 1e-6, null, {
      form: 'coss',
      help: 'class E: part of the shunt capacitor; push-pull class D: the drain ring; empty = not given',
      example: '150',
    }),
    // Common practice, no published source: a bifilar HF output transformer has a few to a few tens of nH
    outputLeakageH: optNum(
      'Output transformer leakage, half to half',
      'H',
      { symbol: 'nH', scale: 1e-9 },
      0,
      1e-5,
      null,
      {
        form: 'leakage',
        exclusiveMin: true,
        example: '6',
        help: 'one primary half measured with the other shorted; push-pull class D drain ring; empty = not given',
      },
    ),
    // Common practice, no published source: up to 1 µs (a slow switch at 160 m); 0 = ideal edges
    transitionTimeS: optNum('Switching transition time (class D)', 's', U.ns, 0, 1e-6, null, {
      form: 'transitionTime',
      help: 'rise/fall time of the drain voltage; empty = 10 ns assumed; sets the class-D power and harmonics',
      example: '10',
    }),
    networkLoadOhm: optNum('Drain load set by a matching network', 'Ω', U.ohm, 0.1, 10_000, null, {
      form: 'networkLoad',
      help: 'L or pi network instead of a transformer; empty = transformer (turns ratio)',
      example: '12.5',
    }),
    outputCoreId: ref('Output transformer core', 'core', true, {
      form: 'outputCore', help: 'from the project’s core catalog; none = flux not checked',
    }),
    // Common practice, no published source: an HF output transformer's primary has 1 to a few tens of turns
    outputPrimaryTurns: optNum('Output transformer primary turns', '', U.none, 1, 200, null, {
      form: 'outputTurns', integer: true, example: '2', help: 'the full primary; empty = flux not checked',
    }),
    outputWireDiameterM: optNum('Primary wire diameter over enamel', 'm', MM, 5e-5, 0.005, null, {
      form: 'outputWire', exclusiveMin: true, example: '0.8', help: 'empty = fit not checked',
    }),
  },
  refine: (v) => {
    const errors = [];
    if (v.saturationV === null && v.rdsOnOhm === null)
      errors.push({
        field: 'saturationV',
        label: 'Saturation voltage',
        message: 'Saturation voltage: give it or Rds(on) (or both)',
      });
    if (v.topology === 'push-pull' && typeof v.devices === 'number' && v.devices < 2)
      errors.push({ field: 'devices', label: 'Devices', message: 'Devices: a push-pull stage has at least 2' });
    const shared = v.heatsinkSharedBy;
    if (typeof shared === 'number' && typeof v.devices === 'number' && shared > v.devices)
      errors.push({
        field: 'heatsinkSharedBy',
        label: 'Devices on one heatsink',
        message: 'Devices on one heatsink: at most the number of devices',
      });
    if (
      typeof v.imbalanceTypical === 'number' &&
      typeof v.imbalanceWorst === 'number' &&
      v.imbalanceTypical > v.imbalanceWorst
    )
      errors.push({
        field: 'imbalanceWorst',
        label: 'Push-pull imbalance, worst',
        message: 'Push-pull imbalance, worst: at least the typical imbalance',
      });
    if (typeof v.networkLoadOhm === 'number' && typeof v.turnsRatio === 'number')
      errors.push({
        field: 'networkLoadOhm',
        label: 'Drain load set by a matching network',
        message: 'Drain load set by a matching network: give it or a turns ratio, not both',
      });
    return errors;
  },
});
