// The low-pass filter design inputs on a stage of kind 'lpf'.
import { defineSpec, U, type DisplayUnit, type FieldError } from './field';
import { bool, choice, num, optNum, ref, text } from './make';

const MM: DisplayUnit = { symbol: 'mm', scale: 1e-3 };
const MT: DisplayUnit = { symbol: 'mT', scale: 1e-3 };
// Common practice, no published source: toroids for HF filters from 2 mm to 100 mm across
const coreDim = (label: string, form: string, example: string) =>
  optNum(label, 'm', MM, 0.002, 0.1, null, {
    form,
    exclusiveMin: true,
    example,
    help: 'toroid; empty = flux not checked',
  });

export const lpfSpec = defineSpec({
  name: 'lpf',
  label: 'Low-pass filter design',
  fields: {
    response: choice(
      'Response',
      [
        ['chebyshev', 'Chebyshev (equal ripple)'],
        ['butterworth', 'Butterworth (maximally flat)'],
      ],
      'chebyshev',
    ),
    rippleDb: num('Passband ripple', 'dB', U.dB, 0, 0.5, 0.1, { form: 'ripple', help: '0.01–0.5 dB (Chebyshev)' }),
    order: num('Order', '', U.none, 3, 9, 5, { integer: true, help: '3, 5, 7 or 9', example: '5' }),
    // not named "form" in the page: an input called form would shadow HTMLFormElement.form for scripts
    form: choice(
      'Form',
      [
        ['capacitor-input', 'Capacitor input (π)'],
        ['inductor-input', 'Inductor input (T)'],
      ],
      'capacitor-input',
      {
        form: 'layout',
      },
    ),
    cutoffHz: optNum('Cutoff', 'Hz', U.MHz, 100e3, 100e6, null, {
      form: 'cutoff',
      help: 'empty = chosen from the band',
      example: '12.5',
    }),
    capacitorSeries: choice(
      'Capacitor values',
      [
        ['E12', 'E12'],
        ['E24', 'E24'],
      ],
      'E12',
    ),
    allowParallelPairs: bool('Allow a parallel pair when closer', true),
    coreId: ref('Core from the catalog', 'core', true, {
      form: 'catalogCore', help: 'its AL, area, window, range and flux limit are used; none = the core entered here',
    }),
    coreName: text('Core', 120, false, 'Iron-powder toroid 12.7 mm, 1–30 MHz mix (AL 4.9 nH/t²)'),
    coreAlHPerTurn2: num('Core AL', 'H/t²', U.nHt2, 1e-12, 1e-4, 4.9e-9, {
      form: 'coreAl',
      exclusiveMin: true,
      example: '4.9',
      help: 'per turn²; a data sheet’s µH per 100 turns is taken as typed, e.g. 49 µH/100t',
    }),
    capacitorRatedV: optNum('Capacitor voltage rating', 'V', U.V, 0, 100_000, null, {
      form: 'capRatedV',
      exclusiveMin: true,
      example: '500',
      help: 'the filter capacitors’ working voltage; empty = not checked',
    }),
    capacitorRatedA: optNum('Capacitor RF current rating', 'A', U.A, 0, 1000, null, {
      form: 'capRatedA',
      exclusiveMin: true,
      example: '2',
      help: 'RMS, the filter capacitors’ maker rating at HF; empty = not checked',
    }),
    'core.outerDiameterM': coreDim('Core outer diameter', 'coreOd', '12.7'),
    'core.innerDiameterM': coreDim('Core inner diameter', 'coreId', '7.7'),
    'core.heightM': coreDim('Core height', 'coreHeight', '4.8'),
    // Common practice, no published source: HF powdered-iron and ferrite limits lie between a few mT and 0.5 T
    'core.fluxLimitT': optNum('Core flux density limit (peak)', 'T', MT, 0, 1, null, {
      form: 'coreBmax',
      exclusiveMin: true,
      example: '10',
      help: 'the maker’s limit at this frequency (core heating); empty = not checked',
    }),
    'core.minFrequencyHz': optNum('Core material from', 'Hz', U.MHz, 1e3, 1e9, null, {
      form: 'coreFmin',
      example: '2',
      help: 'the material’s frequency range',
    }),
    'core.maxFrequencyHz': optNum('Core material up to', 'Hz', U.MHz, 1e3, 1e9, null, {
      form: 'coreFmax',
      example: '30',
    }),
    'core.wireDiameterM': optNum('Wire diameter over enamel', 'm', MM, 5e-5, 0.005, null, {
      form: 'wire',
      exclusiveMin: true,
      example: '0.8',
      help: 'empty = fit not checked',
    }),
    inductorQ: num('Inductor Q', '', U.none, 1, 10_000, 150),
    capacitorQ: num('Capacitor Q', '', U.none, 1, 100_000, 1000),
    capacitorTolerance: num('Capacitor tolerance', '%', U.pct, 0, 0.5, 0.05),
    inductorTolerance: num('Inductor tolerance', '%', U.pct, 0, 0.5, 0.05),
    monteCarloTrials: num('Monte Carlo trials', '', U.none, 0, 20_000, 2000, { form: 'trials', integer: true }),
    seed: num('Random seed', '', U.none, 0, 2 ** 32 - 1, 1, { integer: true }),
  },
  refine: (v) => {
    const errors: FieldError[] = [];
    // Source: Matthaei, Young & Jones (1964) §4.05: an even-order Chebyshev prototype needs unequal
    // terminations; between two 50 Ω ports only odd orders are realisable.
    if (typeof v.order === 'number' && v.order % 2 === 0)
      errors.push({
        field: 'order',
        label: 'Order',
        message: `Order must be odd (3, 5, 7 or 9): an even-order filter cannot sit between two equal 50 Ω ` +
          `terminations; you entered ${v.order}`,
      });
    if (v.response === 'chebyshev' && typeof v.rippleDb === 'number' && v.rippleDb < 0.01)
      errors.push({
        field: 'rippleDb',
        label: 'Passband ripple',
        message: `Passband ripple of a Chebyshev filter must be from 0.01 to 0.5 dB; you entered ${v.rippleDb} dB`,
      });
    const n = (k: string) => (typeof v[k] === 'number' ? (v[k] as number) : null);
    const od = n('core.outerDiameterM');
    const id = n('core.innerDiameterM');
    const given = [od, id, n('core.heightM')].filter((x) => x !== null).length;
    if (given > 0 && given < 3)
      errors.push({
        field: 'core.outerDiameterM',
        label: 'Core outer diameter',
        message: 'Core outer diameter: give the outer and inner diameter and the height together, or none',
      });
    if (od !== null && id !== null && id >= od)
      errors.push({
        field: 'core.innerDiameterM',
        label: 'Core inner diameter',
        message: `Core inner diameter must be less than the outer diameter (${od * 1e3} mm)`,
      });
    const fmin = n('core.minFrequencyHz');
    const fmax = n('core.maxFrequencyHz');
    if ((fmin === null) !== (fmax === null) || (fmin !== null && fmax !== null && fmin >= fmax))
      errors.push({
        field: 'core.maxFrequencyHz',
        label: 'Core material up to',
        message: 'Core material up to: give both ends of the range, the upper above the lower',
      });
    const wire = n('core.wireDiameterM');
    if (wire !== null && id !== null && wire * 2 >= id)
      errors.push({
        field: 'core.wireDiameterM',
        label: 'Wire diameter over enamel',
        message: 'Wire diameter over enamel: must be under half the core’s inner diameter',
      });
    return errors;
  },
});
