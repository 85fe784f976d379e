// Invented test data for the RF engine (no real products or people).
import type { LpfParams, PaParams, Project, RelayParams, RfSettings } from '../../../src/core/model';

export function lpfParams(over: Partial<LpfParams> = {}): LpfParams {
  return {
    response: 'chebyshev',
    rippleDb: 0.1,
    order: 5,
    form: 'capacitor-input',
    cutoffHz: null,
    capacitorSeries: 'E24',
    allowParallelPairs: true,
    coreAlHPerTurn2: 4.9e-9,
    coreName: 'iron-powder toroid, AL 4.9 nH/t²',
    inductorQ: 150,
    capacitorQ: 1000,
    capacitorTolerance: 0.05,
    inductorTolerance: 0.05,
    monteCarloTrials: 2000,
    seed: 12345,
    ...over,
  };
}

export function paParams(over: Partial<PaParams> = {}): PaParams {
  return {
    topology: 'push-pull',
    amplifierClass: 'C',
    railId: 'pa',
    devices: 2,
    saturationV: 1.0,
    rdsOnOhm: null,
    turnsRatio: null,
    loadOhm: 50,
    efficiency: 0.7,
    deviceVdsMaxV: 60,
    deviceIdMaxA: 10,
    mount: { thetaJcKPerW: 2.5, thetaCsKPerW: 1.0, thetaSaKPerW: null, tjMaxC: 150 },
    biasIdleMaxA: 0.05, referencePowerW: 5, ...over,
  };
}

export function relayParams(over: Partial<RelayParams> = {}): RelayParams {
  return {
    contactCarryA: 2,
    contactSwitchA: 1,
    contactRatedV: 125,
    rfRatedVpeak: 300,
    coilA: 0.03,
    coilRailId: 'sig',
    coilModes: ['keyUp', 'keyDown'],
    isolationDb: 35,
    operateS: 0.004,
    releaseS: 0.003,
    bounceS: 0.001,
    dcSwitchedA: 0,
    position: 'after-lpf',
    receiverMaxInputW: 0.02,
    txDelayS: 0.008,
    wpm: 20,
    ...over,
  };
}

export function rfSettings(over: Partial<RfSettings> = {}): RfSettings {
  return {
    spuriousRule: 'us-97-307',
    evenHarmonicDbc: -30,
    worstSwr: 2,
    antennaGainDbi: 2.15,
    feedlineLossDb: 0,
    groundReflection: true,
    exposureDutyFactor: 0.4,
    exposureOnFraction: 1,
    ...over,
  };
}

export function project(over: Partial<Project> = {}): Project {
  return {
    id: 'p1',
    name: 'Test 40 m rig',
    notes: '',
    frequencyHz: 7.03e6,
    targetPowerW: 10,
    mains: null,
    ambientC: 35,
    currency: 'EUR',
    kits: 1,
    keyingDuty: 0.4,
    version: 1,
    supply: { transformers: [], rails: [], primaryFuseA: null },
    stages: [
      { id: 's-pa', kind: 'final', name: 'PA', notes: '', loads: [], dissipationW: null, pa: paParams() },
      { id: 's-lpf', kind: 'lpf', name: 'Low-pass filter', notes: '', loads: [], dissipationW: null, lpf: lpfParams() },
      { id: 's-tr', kind: 'tr', name: 'T/R relay', notes: '', loads: [], dissipationW: null, relay: relayParams() },
    ],
    rf: rfSettings(),
    parts: [], bom: [], costing: { attritionFraction: 0, sparesPerLine: 0, exchangeRates: {}, suppliers: [] },
    ...over,
  };
}
