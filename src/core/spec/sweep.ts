// The inputs of a one-parameter sweep (compare page): which parameter, which item of the project it belongs to,
// from, to and how many points. From and to take their unit, display unit and range from the parameter's own field
// (mains voltage, winding voltage, reservoir, PA load, filter order), so a sweep can never leave the range the
// forms allow. Not in ALL_SPECS: these are GET-form inputs with no stored object (like the new-project form).
import { defineSpec, U, type FieldError, type NumberField, type Spec } from './field';
import { num, text } from './make';
import { mainsSpec } from './settings';
import { windingSpec } from './supply';
import { rectifiedSpec } from './supply-rails';
import { paSpec } from './pa';
import { lpfSpec } from './lpf';

export const SWEEP_PARAMETERS = ['mainsV', 'windingV', 'reservoirF', 'paLoadOhm', 'lpfOrder'] as const;
export type SweepParameter = (typeof SWEEP_PARAMETERS)[number];

/** The field each parameter edits: its unit, display unit and range are the sweep's. */
const BASE: Record<SweepParameter, { field: NumberField; name: string; from: number; to: number }> = {
  mainsV: { field: mainsSpec.fields.nominalV as NumberField, name: 'mains nominal voltage', from: 200, to: 250 },
  windingV: { field: windingSpec.fields.ratedVrms as NumberField, name: 'winding rated voltage', from: 16, to: 24 },
  reservoirF: {
    field: rectifiedSpec.fields.reservoirF as NumberField,
    name: 'reservoir capacitance',
    from: 2200e-6,
    to: 15000e-6,
  },
  paLoadOhm: { field: paSpec.fields.loadOhm as NumberField, name: 'PA load', from: 25, to: 100 },
  lpfOrder: { field: lpfSpec.fields.order as NumberField, name: 'filter order', from: 3, to: 9 },
};

export const SWEEP_LABELS: Record<SweepParameter, string> = {
  mainsV: 'Mains voltage (transformer wound for the nominal mains)',
  windingV: 'Winding voltage',
  reservoirF: 'Reservoir capacitance',
  paLoadOhm: 'PA load',
  lpfOrder: 'Filter order',
};

/** Most points a sweep evaluates: each is a whole evaluation of the project (tens of ms for the club demo). */
export const MAX_SWEEP_POINTS = 12;

const bound = (p: SweepParameter, end: 'from' | 'to'): NumberField => {
  const { field, name } = BASE[p];
  return {
    type: 'number',
    label: `${end === 'from' ? 'From' : 'To'} (${name})`,
    unit: field.unit,
    display: field.display,
    min: field.min,
    max: field.max,
    exclusiveMin: field.exclusiveMin,
    integer: field.integer,
    default: BASE[p][end],
    example: field.example,
    form: end,
  };
};

function sweepSpec(p: SweepParameter): Spec {
  const from = bound(p, 'from');
  return defineSpec({
    name: `sweep-${p}`,
    label: `Sweep of the ${BASE[p].name}`,
    fields: {
      target: text('Item to vary', 80, false, '', { help: 'empty = the item the PA depends on, else the first one' }),
      from,
      to: bound(p, 'to'),
      points: num('Points', '', U.none, 2, MAX_SWEEP_POINTS, 7, {
        integer: true,
        example: '7',
        help: p === 'lpfOrder' ? 'each odd order from–to is one point' : `2 to ${MAX_SWEEP_POINTS}, evenly spaced`,
      }),
    },
    refine: (v) => {
      const errors: FieldError[] = [];
      // a bad stored value (NaN, Infinity) is its own field's error; the range check needs two finite ends
      if (typeof v.from === 'number' && typeof v.to === 'number' && Number.isFinite(v.from) && Number.isFinite(v.to)) {
        if (!(v.to > v.from))
          errors.push({
            field: 'to',
            label: `To (${BASE[p].name})`,
            message: `To (${BASE[p].name}) must be above From`,
          });
        // Source: Matthaei, Young & Jones (1964) §4.05: only odd orders sit between two equal terminations
        else if (p === 'lpfOrder' && oddBetween(v.from, v.to).length < 2)
          errors.push({
            field: 'to',
            label: `To (${BASE[p].name})`,
            message: `To (${BASE[p].name}): the range holds fewer than two odd orders (3, 5, 7 or 9)`,
          });
      }
      return errors;
    },
  });
}

/** Odd whole numbers from..to (filter orders). */
export const oddBetween = (from: number, to: number): number[] => {
  const out: number[] = [];
  for (let n = Math.ceil(from); n <= to; n++) if (n % 2 === 1) out.push(n);
  return out;
};

export const SWEEP_SPECS: Record<SweepParameter, Spec> = Object.fromEntries(
  SWEEP_PARAMETERS.map((p) => [p, sweepSpec(p)]),
) as Record<SweepParameter, Spec>;

export const isSweepParameter = (x: unknown): x is SweepParameter =>
  (SWEEP_PARAMETERS as readonly unknown[]).includes(x);
