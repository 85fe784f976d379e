// A core of the project's catalog (the cores page): what a filter inductor or an output transformer is wound on.
import { defineSpec, U, type DisplayUnit, type FieldError } from './field';
import { num, optNum, text } from './make';

const MM: DisplayUnit = { symbol: 'mm', scale: 1e-3 };
const MM2: DisplayUnit = { symbol: 'mm²', scale: 1e-6 };
const MT: DisplayUnit = { symbol: 'mT', scale: 1e-3 };

export const coreSpec = defineSpec({
  name: 'core',
  label: 'Core',
  fields: {
    name: text('Core (size and material)', 120, true, 'Iron-powder toroid 12.7 mm, 2–30 MHz mix', {
      help: 'describe it by size and material',
    }),
    alHPerTurn2: num('AL', 'H/t²', U.nHt2, 1e-12, 1e-4, 4.9e-9, {
      form: 'al',
      exclusiveMin: true,
      example: '4.9',
      help: 'per turn²; a data sheet’s µH per 100 turns is taken as typed, e.g. 49 µH/100t',
    }),
    // Common practice, no published source: HF cores from a few mm² (small beads) to a few thousand mm² (stacks)
    aeM2: num('Effective area Ae', 'm²', MM2, 0.5e-6, 5e-3, 11.4e-6, {
      form: 'ae',
      example: '11.4',
      help: 'of the cross-section',
    }),
    leM: num('Effective path length le', 'm', MM, 5e-3, 0.5, 31.2e-3, { form: 'le', example: '31.2' }),
    innerDiameterM: optNum('Inner diameter', 'm', MM, 1e-3, 0.1, 7.7e-3, {
      form: 'innerDiameter', example: '7.7', help: 'a toroid’s hole; empty = give the window area',
    }),
    windowAreaM2: optNum('Window area', 'm²', MM2, 0.5e-6, 5e-3, null, {
      form: 'window', example: '46', help: 'the winding space (binocular or pot core); empty = from the inner diameter',
    }),
    minFrequencyHz: num('Material from', 'Hz', U.MHz, 1e3, 1e9, 2e6, { form: 'fmin', example: '2' }),
    maxFrequencyHz: num('Material up to', 'Hz', U.MHz, 1e3, 1e9, 30e6, { form: 'fmax', example: '30' }),
    // Common practice, no published source: HF powdered-iron and ferrite limits lie between a few mT and 0.5 T
    fluxLimitT: num('Flux density limit (peak)', 'T', MT, 1e-4, 1, 0.015, {
      form: 'bmax', example: '15', help: 'the maker’s limit in this range (core heating)',
    }),
  },
  refine: (v) => {
    const errors: FieldError[] = [];
    const n = (k: string) => (typeof v[k] === 'number' ? (v[k] as number) : null);
    const fmin = n('minFrequencyHz');
    const fmax = n('maxFrequencyHz');
    if (fmin !== null && fmax !== null && fmin >= fmax)
      errors.push({
        field: 'maxFrequencyHz',
        label: 'Material up to',
        message: 'Material up to: must be above “Material from”',
      });
    if (n('innerDiameterM') === null && n('windowAreaM2') === null)
      errors.push({
        field: 'innerDiameterM',
        label: 'Inner diameter',
        message: 'Inner diameter: give it or the window area',
      });
    return errors;
  },
});
