// The T/R relay data on a stage of kind 'tr'.
import { defineSpec, U } from './field';
import type { Mode } from '../model';
import { bool, choice, num, optNum, ref } from './make';

const COIL_MODES: [string, Mode][] = [['coilReceive', 'receive'], ['coilKeyUp', 'keyUp'], ['coilKeyDown', 'keyDown']];

export const relaySpec = defineSpec({
  name: 'relay',
  label: 'T/R relay data',
  fields: {
    contactCarryA: num('Contact carry rating', 'A', U.A, 0, 1000, 2, { form: 'contactCarry', exclusiveMin: true }),
    contactSwitchA: num('Contact switching rating', 'A', U.A, 0, 1000, 1, {
      form: 'contactSwitch',
      exclusiveMin: true,
    }),
    contactRatedV: num('Contact voltage rating', 'V', U.V, 0, 100_000, 125, { form: 'contactV', exclusiveMin: true }),
    rfRatedVpeak: optNum('RF peak voltage rating', 'V', U.V, 0, 100_000, null, {
      form: 'rfV',
      exclusiveMin: true,
      help: 'empty = use the contact rating',
    }),
    dcSwitchedA: num('DC current its contacts switch', 'A', U.A, 0, 1000, 0, { form: 'dcSwitched' }),
    coilA: num('Coil current', 'A', U.mA, 0, 10, 0.03, { form: 'coil', example: '30' }),
    coilRailId: ref('Coil rail', 'rail', true),
    coilReceive: bool('Coil energised in receive', false),
    coilKeyUp: bool('Coil energised in TX key-up', true),
    coilKeyDown: bool('Coil energised in TX key-down', true),
    isolationDb: num('Isolation at the operating frequency', 'dB', U.dB, 0, 200, 30, { form: 'isolation' }),
    position: choice(
      'Position',
      [
        ['after-lpf', 'After the low-pass filter'],
        ['before-lpf', 'Before the low-pass filter'],
      ],
      'after-lpf',
    ),
    receiverMaxInputW: num('Receiver maximum input', 'W', U.W, 0, 1e6, 0.01, { form: 'rxMax', exclusiveMin: true }),
    operateS: num('Operate time', 's', U.ms, 0, 1, 0.005, { form: 'operate', example: '5' }),
    releaseS: num('Release time', 's', U.ms, 0, 1, 0.003, { form: 'release', example: '3' }),
    bounceS: num('Bounce time', 's', U.ms, 0, 1, 0.001, { form: 'bounce', example: '1' }),
    txDelayS: num('Transmit delay after relay drive', 's', U.ms, 0, 10, 0.008, { form: 'txDelay', example: '8' }),
    wpm: num('Keying speed', '', U.wpm, 1, 100, 20, { example: '20' }),
    // Common practice, no published source: edges beyond 50 ms blur even slow CW into a tone that swells and fades
    keyRiseS: optNum('Keyed envelope rise time (10–90 %)', 's', U.ms, 0, 0.05, 0.005, {
      form: 'keyRise',
      help: 'of the RF envelope, raised-cosine edges; 0 = hard keying; empty = not estimated',
      example: '5',
    }),
    keyFallS: optNum('Keyed envelope fall time (10–90 %)', 's', U.ms, 0, 0.05, null, {
      form: 'keyFall',
      help: 'empty = same as the rise',
      example: '5',
    }),
    keyShapingRcS: optNum('Shaping network time constant R·C', 's', U.ms, 0, 0.05, null, {
      form: 'keyRc',
      help: 'exponential edges of one RC network, instead of the rise and fall times; e.g. 10 kΩ × 220 nF = 2.2',
      example: '2.2',
    }),
  },
  refine: (v) => {
    const errors = [];
    if (typeof v.keyShapingRcS === 'number' && (typeof v.keyRiseS === 'number' || typeof v.keyFallS === 'number'))
      errors.push({
        field: 'keyShapingRcS',
        label: 'Shaping network time constant R·C',
        message: 'Shaping network time constant R·C: give it or the rise and fall times, not both',
      });
    if (typeof v.keyFallS === 'number' && typeof v.keyRiseS !== 'number')
      errors.push({
        field: 'keyRiseS',
        label: 'Keyed envelope rise time (10–90 %)',
        message: 'Keyed envelope rise time (10–90 %): give it with the fall time',
      });
    return errors;
  },
  view: {
    from: (r) => {
      const { coilModes, ...rest } = r as { coilModes?: unknown };
      // a stored list that is not a list of known modes leaves the flags unreadable, so the check names them
      const known = Array.isArray(coilModes) && coilModes.every((m) => COIL_MODES.some(([, x]) => x === m));
      const flag = (m: Mode) =>
        known ? (coilModes as Mode[]).includes(m) : `unreadable modes ${JSON.stringify(coilModes)}`;
      return { ...rest, ...Object.fromEntries(COIL_MODES.map(([k, m]) => [k, flag(m)])) };
    },
    to: (v) => {
      const out: Record<string, unknown> = {
        ...v,
        coilModes: COIL_MODES.filter(([k]) => v[k] === true).map(([, m]) => m),
      };
      for (const [k] of COIL_MODES) delete out[k];
      return out;
    },
  },
});
