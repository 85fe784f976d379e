// The low-pass filter design inputs on a stage of kind 'lpf'.
import { defineSpec, U, type FieldError } from './field';
import { bool, choice, num, optNum, text } from './make';

export const lpfSpec = defineSpec({
  name: 'lpf',
  label: 'Low-pass filter design',
  fields: {
    response: choice('Response', [['chebyshev', 'Chebyshev (equal ripple)'], ['butterworth', 'Butterworth (maximally flat)']], 'chebyshev'),
    rippleDb: num('Passband ripple', 'dB', U.dB, 0, 0.5, 0.1, { form: 'ripple', help: '0.01–0.5 dB (Chebyshev)' }),
    order: num('Order', '', U.none, 3, 9, 5, { integer: true, help: '3, 5, 7 or 9', example: '5' }),
    // not named "form" in the page: an input called form would shadow HTMLFormElement.form for scripts
    form: choice('Form', [['capacitor-input', 'Capacitor input (π)'], ['inductor-input', 'Inductor input (T)']], 'capacitor-input', {
      form: 'layout',
    }),
    cutoffHz: optNum('Cutoff', 'Hz', U.MHz, 100e3, 100e6, null, { form: 'cutoff', help: 'empty = chosen from the band', example: '12.5' }),
    capacitorSeries: choice('Capacitor values', [['E12', 'E12'], ['E24', 'E24']], 'E12'),
    allowParallelPairs: bool('Allow a parallel pair when closer', true),
    coreName: text('Core', 120, false, 'Iron-powder toroid 12.7 mm, 1–30 MHz mix (AL 4.9 nH/t²)'),
    coreAlHPerTurn2: num('Core AL', 'H/t²', U.nHt2, 1e-12, 1e-4, 4.9e-9, {
      form: 'coreAl',
      exclusiveMin: true,
      example: '4.9',
      help: 'per turn²; a data sheet’s µH per 100 turns is taken as typed, e.g. 49 µH/100t',
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
      errors.push({ field: 'order', label: 'Order', message: `Order must be odd (3, 5, 7 or 9): an even-order filter cannot sit between two equal 50 Ω terminations; you entered ${v.order}` });
    if (v.response === 'chebyshev' && typeof v.rippleDb === 'number' && v.rippleDb < 0.01)
      errors.push({ field: 'rippleDb', label: 'Passband ripple', message: `Passband ripple of a Chebyshev filter must be from 0.01 to 0.5 dB; you entered ${v.rippleDb} dB` });
    return errors;
  },
});
