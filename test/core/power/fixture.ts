// A small project built around the reference values §4.2 worked example: 230 V 50 Hz, 18 V 100 VA winding
// with 6 % regulation, bridge with 0.75 V + 0.02 Ω diodes, 10,000 µF reservoir, 3 A key-down load.
import type { PerMode, Project, RectifiedRail, RegulatedRail } from '../../../src/core/model';

export const refRail: RectifiedRail = {
  kind: 'rectified',
  id: 'raw',
  name: 'Raw rail',
  windingId: 'w18',
  topology: 'bridge',
  diodeDropV: 0.75,
  diodeResistanceOhm: 0.02,
  reservoirF: 0.01,
  esrOhm: 0,
  bleederOhm: null,
  capacitorRatedV: 35,
  capacitorRippleA: 5.5,
  ripplePpTargetV: null,
  marginV: 0,
  fuseA: null,
  minimumV: null,
  windingFuseA: null,
  windingFuseSheet: 'T3',
  bleederRatedW: null,
};

export const regulator13v8: RegulatedRail = {
  kind: 'regulated',
  id: 'reg',
  name: '13.8 V regulator',
  parentId: 'raw',
  regulator: 'linear',
  setting: { method: 'fixed', nominalV: 13.8 },
  dropoutV: 2.5,
  quiescentA: 0,
  efficiency: null,
  maxOutputA: 5,
  maxInputV: 40,
  mount: { thetaJcKPerW: 5, thetaCsKPerW: 1, thetaSaKPerW: 1.0, tjMaxC: 125 },
  rippleRejectionDb: null,
  rippleTargetV: null,
};

export function refProject(over: Partial<Project['supply']> = {}): Project {
  return {
    id: 'p', name: 'ref §4.2', notes: '', frequencyHz: 7e6, targetPowerW: 10,
    mains: { nominalV: 230, frequencyHz: 50, lowFraction: 0.1, highFraction: 0.1 },
    ambientC: 40, currency: 'EUR', kits: 1, keyingDuty: 0.4, version: 1,
    supply: {
      transformers: [
        {
          id: 't1',
          name: 'T1',
          construction: 'laminated',
          windings: [
            {
              id: 'w18',
              name: '18 V winding',
              ratedVrms: 18,
              ratedA: 100 / 18,
              regulationFraction: 0.06,
              resistanceOhm: null,
            },
          ],
        },
      ],
      rails: [refRail],
      primaryFuseA: null,
      ...over,
    },
    stages: [], rf: {} as Project['rf'], parts: [], bom: [], costing: {} as Project['costing'],
  };
}

export const flat = (a: number): PerMode => ({ receive: a, keyUp: a, keyDown: a });
