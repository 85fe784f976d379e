// The four station templates as data: supply tree, stages and the starter parts list of each. Invented scenario
// data with typical values (the same kind of values as the demo projects); `railV` below is each PA rail's typical
// key-down voltage, used only to size the final's starting current (the evaluation computes the rail itself).
import type { BatteryRail, RectifiedRail, RegulatedRail, Stage, Supply, Winding } from '../model';
import type { TemplateKey } from './choices';
import {
  classEFinal,
  driver,
  finalKeyDownA,
  keyer,
  lowPassFilter,
  pushPullFinal,
  receiver,
  trRelay,
  vxo,
} from './stages';

/** One starter parts-list line: a part of the starter catalog (parts.ts), its stage, quantity and references. */
export interface StarterLine {
  partId: string;
  stageId: string | null;
  qty: number;
  refs: string;
  notes?: string;
  /** the design role the line fills (src/core/roles: "<kind>:<template id>" or a bare kind), so it is checked */
  role?: string;
}

export interface StationData {
  supply: Supply;
  stages: Stage[];
  lines: StarterLine[];
}

// Typical drain efficiencies; common practice, no published source.
const CLASS_C_EFFICIENCY = 0.6;
const CLASS_E_EFFICIENCY = 0.8;

const winding = (id: string, name: string, ratedVrms: number, ratedA: number, regulationFraction: number): Winding => ({
  id,
  name,
  ratedVrms,
  ratedA,
  regulationFraction,
  resistanceOhm: null,
});

const rectified = (
  id: string,
  name: string,
  windingId: string,
  reservoirF: number,
  capRatedV: number,
  capRippleA: number,
  minimumV: number | null,
  windingFuseA: number | null = null,
): RectifiedRail => ({
  kind: 'rectified',
  id,
  name,
  windingId,
  topology: 'bridge',
  diodeDropV: 0.9,
  diodeResistanceOhm: 0.03,
  reservoirF,
  esrOhm: 0.04,
  bleederOhm: 2200,
  capacitorRatedV: capRatedV,
  capacitorRippleA: capRippleA,
  ripplePpTargetV: null,
  marginV: 0.5,
  fuseA: null,
  minimumV,
  windingFuseA,
  windingFuseSheet: 'T3',
  // 2 W: the 22 V windings' no-load peak (about 35 V at high mains) puts about 0.56 W in 2.2 kΩ, over half of 1 W
  bleederRatedW: 2,
});

/** An adjustable linear regulator set by 240 Ω / R2 (Vout = 1.25 V (1 + R2/R1) + Iadj R2) on a 4.5 °C/W heatsink. */
const adjustable = (id: string, name: string, parentId: string, r2Ohm: number): RegulatedRail => ({
  kind: 'regulated',
  id,
  name,
  parentId,
  regulator: 'linear',
  setting: { method: 'adjustable', vrefV: 1.25, adjustA: 50e-6, r1Ohm: 240, r2Ohm },
  dropoutV: 2.5,
  quiescentA: 0.005,
  efficiency: null,
  maxOutputA: 1.5,
  maxInputV: 40,
  mount: { thetaJcKPerW: 5, thetaCsKPerW: 1, thetaSaKPerW: 4.5, tjMaxC: 125 },
  rippleRejectionDb: 65,
  rippleTargetV: null,
});

const transformer = (name: string, windings: Winding[]) => ({
  id: 'tr-1', name, construction: 'laminated' as const, secondaryToleranceFraction: 0.05, windings,
});
const supply = (transformers: Supply['transformers'], rails: Supply['rails']): Supply => ({
  transformers,
  rails,
  primaryFuseA: null,
  enclosureAreaM2: null,
  enclosureUWPerM2K: null,
});

const MAINS_LINES: StarterLine[] = [
  { partId: 'tp-inlet', stageId: null, qty: 1, refs: 'J1', notes: 'Earth pin bonded to the chassis' },
  {
    partId: 'tp-fuse',
    stageId: null,
    qty: 3,
    refs: 'F1–F3',
    notes: 'Primary, winding and rail fuses; ratings from the supply page',
    role: 'fuses',
  },
  { partId: 'tp-bleed', stageId: null, qty: 1, refs: 'R1', role: 'bleeders' },
];
const RX_LINES: StarterLine[] = [
  { partId: 'tp-mixer', stageId: 'st-rx', qty: 1, refs: 'U2' },
  { partId: 'tp-audio', stageId: 'st-rx', qty: 1, refs: 'U3' },
  { partId: 'tp-jack', stageId: 'st-rx', qty: 2, refs: 'J3, J4', notes: 'Phones and key' },
  { partId: 'tp-xtal', stageId: 'st-vxo', qty: 2, refs: 'Y1, Y2' },
];
const RF_LINES: StarterLine[] = [
  { partId: 'tp-toroid', stageId: 'st-lpf', qty: 2, refs: 'L1, L2', role: 'lpf-cores:st-lpf' },
  { partId: 'tp-cmica', stageId: 'st-lpf', qty: 5, refs: 'C10–C14', role: 'lpf-capacitors:st-lpf' },
  { partId: 'tp-relay', stageId: 'st-tr', qty: 1, refs: 'K1', role: 'relay:st-tr' },
  { partId: 'tp-bnc', stageId: 'st-tr', qty: 1, refs: 'J2' },
  { partId: 'tp-case', stageId: null, qty: 1, refs: 'Enclosure' },
];
const PUSH_PULL_LINES: StarterLine[] = [
  { partId: 'tp-mosfet-200', stageId: 'st-pa', qty: 2, refs: 'Q3, Q4', role: 'pa-devices:st-pa' },
  { partId: 'tp-hs-pa', stageId: 'st-pa', qty: 1, refs: 'HS2', role: 'pa-heatsink:st-pa' },
  { partId: 'tp-mica', stageId: 'st-pa', qty: 2, refs: 'for Q3, Q4' },
  { partId: 'tp-bino', stageId: 'st-pa', qty: 1, refs: 'T2' },
];

function mainsTwoRail(bandName: string, targetPowerW: number): StationData {
  // typical key-down voltage of the ~26 V rail from a 22 V winding
  const railV = 26.5;
  const paA = finalKeyDownA(targetPowerW, railV, CLASS_C_EFFICIENCY);
  return {
    supply: supply(
      // 22 V 3.5 A: the supply carries the final's saturated drive (about 1.5 A at 20 W); a 20 V winding let the PA
      // rail dip below 20 V at 120 V low mains, and a tune-up carrier at that drive draws about 3.2 A RMS from it
      [transformer('T1 mains transformer', [
        winding('w-sig', '16 V winding', 16, 1, 0.1),
        winding('w-pa', '22 V winding', 22, 3.5, 0.08),
      ])],
      [
        // a short on the small winding reflects too little primary current to blow the primary fuse: its own fuse
        rectified('rail-raw', 'Raw DC for the 13.8 V regulator', 'w-sig', 0.0047, 35, 2.4, null, 0.8),
        adjustable('rail-sig', '13.8 V signal rail', 'rail-raw', 2400),
        // below about 20 V a 20 W push-pull final falls short of its output; stated so headroom is judged
        // no winding fuse needed: the larger winding's shorted reservoir reflects over 5 x the primary fuse, which
        // clears it (the supply page still recommends one)
        rectified('rail-pa', 'PA rail (unregulated, ~26 V)', 'w-pa', 0.0068, 50, 3.6, 20),
      ],
    ),
    stages: [
      receiver('rail-sig'),
      vxo('rail-sig'),
      driver('rail-sig'),
      pushPullFinal('rail-pa', paA),
      lowPassFilter(bandName),
      trRelay('rail-sig', 0.16),
      keyer('rail-sig'),
    ],
    lines: [
      ...MAINS_LINES,
      { partId: 'tp-trafo-2', stageId: null, qty: 1, refs: 'T1', role: 'transformer:tr-1' },
      { partId: 'tp-bridge', stageId: null, qty: 2, refs: 'BR1, BR2' },
      { partId: 'tp-c4700', stageId: null, qty: 1, refs: 'C1', role: 'reservoir:rail-raw' },
      { partId: 'tp-c6800', stageId: null, qty: 1, refs: 'C2', role: 'reservoir:rail-pa' },
      { partId: 'tp-reg', stageId: null, qty: 1, refs: 'U1', role: 'regulator:rail-sig' },
      { partId: 'tp-hs-reg', stageId: null, qty: 1, refs: 'HS1', role: 'heatsink:rail-sig' },
      ...RX_LINES,
      ...PUSH_PULL_LINES,
      ...RF_LINES,
    ],
  };
}

function batteryPortable(bandName: string, targetPowerW: number): StationData {
  const battery: BatteryRail = {
    kind: 'battery',
    id: 'rail-bat',
    name: '12.8 V battery (4-cell LiFePO4, 6 Ah)',
    chemistry: 'LiFePO4',
    nominalV: 12.8,
    fullV: 14.4,
    endV: 10.4,
    capacityAh: 6,
    usableFraction: 0.9,
    internalOhm: 0.04,
    minimumV: 10.4,
  };
  const ldo: RegulatedRail = {
    ...adjustable('rail-9v', '9 V low-dropout rail', 'rail-bat', 0),
    regulator: 'ldo',
    setting: { method: 'fixed', nominalV: 9 },
    dropoutV: 0.5,
    quiescentA: 0.0005,
    maxOutputA: 0.5,
    maxInputV: 26,
    mount: { thetaJcKPerW: 5, thetaCsKPerW: 1, thetaSaKPerW: null, tjMaxC: 125 },
    rippleRejectionDb: null,
  };
  const paA = finalKeyDownA(targetPowerW, battery.nominalV, CLASS_E_EFFICIENCY);
  return {
    supply: supply([], [battery, ldo]),
    stages: [
      receiver('rail-9v'),
      vxo('rail-9v'),
      driver('rail-bat'),
      classEFinal('rail-bat', paA),
      lowPassFilter(bandName),
      trRelay('rail-bat', 0),
    ],
    lines: [
      { partId: 'tp-battery', stageId: null, qty: 1, refs: 'BT1' },
      { partId: 'tp-bladefuse', stageId: null, qty: 1, refs: 'F1', notes: 'Fit at the battery terminal' },
      { partId: 'tp-ldo', stageId: null, qty: 1, refs: 'U1', role: 'regulator:rail-9v' },
      ...RX_LINES,
      { partId: 'tp-mosfet-100', stageId: 'st-pa', qty: 1, refs: 'Q2', role: 'pa-devices:st-pa' },
      ...RF_LINES,
    ],
  };
}

function singleRail(bandName: string, targetPowerW: number): StationData {
  // typical key-down voltage of the regulated 13.8 V rail
  const paA = finalKeyDownA(targetPowerW, 13.8, CLASS_C_EFFICIENCY);
  return {
    supply: supply(
      // 17 V: with its leakage and the primary's share of the copper (the transformer simulated as one) a 16 V winding
      // left the regulator input about 0.15 V short of its margin at 120 V low mains
      [transformer('T1 mains transformer', [winding('w-1', '17 V winding', 17, 2, 0.08)])],
      [
        rectified('rail-raw', 'Raw DC for the 13.8 V regulator', 'w-1', 0.0068, 50, 3.6, null),
        adjustable('rail-sig', '13.8 V rail', 'rail-raw', 2400),
      ],
    ),
    stages: [
      receiver('rail-sig'),
      vxo('rail-sig'),
      driver('rail-sig'),
      pushPullFinal('rail-sig', paA),
      lowPassFilter(bandName),
      trRelay('rail-sig', 0.16),
    ],
    lines: [
      ...MAINS_LINES,
      { partId: 'tp-trafo-1', stageId: null, qty: 1, refs: 'T1', role: 'transformer:tr-1' },
      { partId: 'tp-bridge', stageId: null, qty: 1, refs: 'BR1' },
      { partId: 'tp-c6800', stageId: null, qty: 1, refs: 'C1', role: 'reservoir:rail-raw' },
      { partId: 'tp-reg', stageId: null, qty: 1, refs: 'U1', role: 'regulator:rail-sig' },
      { partId: 'tp-hs-reg', stageId: null, qty: 1, refs: 'HS1', role: 'heatsink:rail-sig' },
      ...RX_LINES,
      ...PUSH_PULL_LINES,
      ...RF_LINES,
    ],
  };
}

function amplifierOnly(bandName: string, targetPowerW: number): StationData {
  const paA = finalKeyDownA(targetPowerW, 26.5, CLASS_C_EFFICIENCY);
  return {
    supply: supply(
      // 22 V 3.5 A, as the two-rail template's PA winding: a 20 V 3 A winding let the rail dip below 20 V at 120 V low
      // mains once the supply carries the saturated drive
      [transformer('T1 mains transformer', [winding('w-pa', '22 V winding', 22, 3.5, 0.08)])],
      [
        rectified('rail-pa', 'PA rail (unregulated, ~26 V)', 'w-pa', 0.0068, 50, 3.6, 20),
        // 240 Ω / 2 kΩ: 1.25 V × (1 + 2000/240) + 50 µA × 2 kΩ ≈ 11.8 V for the relay coil and bias
        adjustable('rail-12v', '12 V relay and bias rail', 'rail-pa', 2000),
      ],
    ),
    stages: [pushPullFinal('rail-pa', paA), lowPassFilter(bandName), trRelay('rail-12v', 0)],
    lines: [
      ...MAINS_LINES,
      { partId: 'tp-trafo-pa', stageId: null, qty: 1, refs: 'T1', role: 'transformer:tr-1' },
      { partId: 'tp-bridge', stageId: null, qty: 1, refs: 'BR1' },
      { partId: 'tp-c6800', stageId: null, qty: 1, refs: 'C1', role: 'reservoir:rail-pa' },
      { partId: 'tp-reg', stageId: null, qty: 1, refs: 'U1', role: 'regulator:rail-12v' },
      ...PUSH_PULL_LINES,
      ...RF_LINES.filter((l) => l.partId !== 'tp-case'),
    ],
  };
}

export const STATIONS: Record<TemplateKey, (bandName: string, targetPowerW: number) => StationData> = {
  'mains-two-rail': mainsTwoRail,
  'battery-portable': batteryPortable,
  'single-rail': singleRail,
  'amplifier-only': amplifierOnly,
};
