// Stage building blocks the station templates share: typical currents per mode and the PA, filter and relay data.
// Invented scenario data with typical values for small HF CW rigs; the builder replaces them with the measured or
// datasheet figures of the chosen circuit.
import type { PaParams, PerMode, RelayParams, Stage } from '../model';
import { defaultLpfParams } from '../new-project';

const perMode = (receive: number, keyUp: number, keyDown: number): PerMode => ({ receive, keyUp, keyDown });

const stage = (
  id: string,
  kind: Stage['kind'],
  name: string,
  notes: string,
  railId: string | null,
  current: PerMode,
): Stage => ({
  id,
  kind,
  name,
  notes,
  loads: railId ? [{ railId, currentA: current }] : [],
  dissipationW: null,
});

export const receiver = (railId: string) =>
  stage(
    'st-rx',
    'receiver',
    'Direct-conversion receiver',
    'Mixer, audio preamp, CW filter and 1 W audio amplifier.',
    railId,
    perMode(0.055, 0.012, 0.012),
  );
export const vxo = (railId: string) =>
  stage(
    'st-vxo',
    'vxo',
    'Crystal VXO',
    'Crystal oscillator pulled by a variable capacitor, buffered.',
    railId,
    perMode(0.018, 0.018, 0.018),
  );
export const driver = (railId: string) =>
  stage('st-drv', 'driver', 'Driver', 'Keyed broadband driver.', railId, perMode(0, 0.06, 0.16));
export const keyer = (railId: string) =>
  stage(
    'st-keyer',
    'other',
    'Keyer and sidetone',
    'Keyer with sidetone into the audio amplifier.',
    railId,
    perMode(0.008, 0.012, 0.012),
  );

/**
 * The final's key-down DC current for the target power on a rail of `railV`: DC input = output / efficiency.
 * Source: DC input power = RF output / drain efficiency (definition). The efficiency is a typical figure for the
 * class; common practice, no published source (the evaluation then computes the final from its own data).
 * Rounded up to the next whole mA, as a builder would type it into the stage's box (never rounded down).
 */
export function finalKeyDownA(targetPowerW: number, railV: number, efficiency: number): number {
  const exactA = targetPowerW / (efficiency * railV);
  // the 1e-9 keeps a value that is a whole mA within floating-point noise from moving up a step
  return Math.ceil(exactA * 1000 - 1e-9) / 1000;
}

const PA_COMMON = {
  rdsOnOhm: null,
  turnsRatio: null, // designed for the target power
  loadOhm: 50,
  efficiency: null,
  networkLoadOhm: null,
  conductionAngleDeg: null,
  imbalanceTypical: null,
  imbalanceWorst: null,
  deviceCossF: null,
};

/** Push-pull class-C MOSFET final on one shared heatsink (typical 200 V 9 A devices). */
export function pushPullFinal(railId: string, keyDownA: number): Stage {
  const pa: PaParams = {
    ...PA_COMMON,
    topology: 'push-pull',
    amplifierClass: 'C',
    railId,
    devices: 2,
    saturationV: 1.0,
    deviceVdsMaxV: 200,
    deviceIdMaxA: 9,
    mount: { thetaJcKPerW: 1.7, thetaCsKPerW: 1.2, thetaSaKPerW: 2.5, tjMaxC: 150 },
    biasIdleMaxA: 0.05,
    referencePowerW: 5,
    heatsinkSharedBy: 2,
  };
  return {
    ...stage(
      'st-pa',
      'final',
      'Push-pull MOSFET final',
      'Two MOSFETs on one heatsink with mica washers; output transformer ' + 'on a binocular core.',
      railId,
      perMode(0, 0.05, keyDownA),
    ),
    pa,
  };
}

/** Single-ended class-E final (one 100 V 10 A MOSFET) straight from a battery. */
export function classEFinal(railId: string, keyDownA: number): Stage {
  const pa: PaParams = {
    ...PA_COMMON,
    topology: 'single-ended',
    amplifierClass: 'E',
    railId,
    devices: 1,
    saturationV: 0.4,
    deviceVdsMaxV: 100,
    deviceIdMaxA: 10,
    mount: { thetaJcKPerW: 2.5, thetaCsKPerW: 1, thetaSaKPerW: 12, tjMaxC: 150 },
    biasIdleMaxA: 0,
    referencePowerW: 1,
    heatsinkSharedBy: null,
  };
  return {
    ...stage(
      'st-pa',
      'final',
      'Single-ended class-E final',
      'One MOSFET; shunt capacitor and series tuned circuit.',
      railId,
      perMode(0, 0, keyDownA),
    ),
    pa,
  };
}

export const lowPassFilter = (bandName: string): Stage => ({
  ...stage(
    'st-lpf',
    'lpf',
    `${bandName} low-pass filter`.trim(),
    'Filter on iron-powder toroids; C0G/silver-mica capacitors.',
    null,
    perMode(0, 0, 0),
  ),
  // seventh order: the 2nd harmonic of a push-pull final and a class-E final's harmonics need the steeper skirt
  lpf: { ...defaultLpfParams(), order: 7 },
});

/** T/R relay (12 V coil) switching the antenna after the filter; its coil on `coilRailId`. */
export function trRelay(coilRailId: string, dcSwitchedA: number): Stage {
  const relay: RelayParams = {
    contactCarryA: 2,
    contactSwitchA: 2,
    contactRatedV: 125,
    rfRatedVpeak: null,
    coilA: 0.036,
    coilRailId,
    coilModes: ['keyUp', 'keyDown'],
    // a second contact set grounds the receiver input on transmit: 45 dB at HF assumed (from memory, not confirmed:
    // one small-signal set gives about 35 dB); 42 W saturated then leaks about 1.3 mW, under the 10 mW maximum
    isolationDb: 45,
    operateS: 0.005,
    releaseS: 0.003,
    bounceS: 0.001,
    dcSwitchedA,
    position: 'after-lpf',
    receiverMaxInputW: 0.01,
    txDelayS: 0.008,
    wpm: 20,
  };
  return {
    ...stage(
      'st-tr',
      'tr',
      'T/R relay and sequencer',
      'Relay switches the antenna; transmit starts after the contacts settle.',
      coilRailId,
      perMode(0.002, 0.004, 0.004),
    ),
    relay,
  };
}
