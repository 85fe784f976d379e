// The supply tree's own inputs: a transformer, one of its windings, the fitted primary fuse and the add-a-rail form.
// The rails themselves are in supply-rails.ts.
import { defineSpec, U } from './field';
import { choice, num, optNum, ref, text } from './make';

/** Units as a builder reads them off a transformer's label. */
export const VRMS = { symbol: 'V rms', scale: 1 } as const;
export const ARMS = { symbol: 'A rms', scale: 1 } as const;

export const CONSTRUCTIONS = [['laminated', 'Laminated (EI)'], ['toroidal', 'Toroidal']] as const;

export const transformerSpec = defineSpec({
  name: 'transformer',
  label: 'Transformer',
  fields: {
    name: text('Transformer name', 200, true, 'Mains transformer', { help: 'e.g. T1 mains transformer' }),
    construction: choice('Construction', CONSTRUCTIONS, 'laminated'),
    // Common practice, no published source: makers commonly hold the secondary voltage to about ±5 %
    secondaryToleranceFraction: optNum('Secondary voltage tolerance', '%', U.pct, 0, 0.2, 0.05, {
      form: 'secondaryTolerance',
      help: 'the maker\'s ± on the secondary voltage, often 5 %; empty = no tolerance corner',
      example: '5',
    }),
  },
});

export const windingSpec = defineSpec({
  name: 'winding',
  label: 'Transformer winding',
  fields: {
    name: text('Winding name', 200, true, 'Secondary'),
    ratedVrms: num('Rated voltage', 'V', VRMS, 0, 1000, 12, { form: 'ratedV', exclusiveMin: true, example: '18' }),
    ratedA: num('Rated current', 'A', ARMS, 0, 100, 1, { form: 'ratedA', exclusiveMin: true, example: '2' }),
    // (V_no-load - V_full-load) / V_full-load as printed on the transformer's data sheet
    regulationFraction: num('Regulation', '%', U.pct, 0, 1, 0.08, {
      form: 'regulation',
      example: '8',
      help: 'rise from full load to no load, as on the data sheet',
    }),
    resistanceOhm: optNum('Winding resistance', 'Ω', U.ohm, 0, 1000, null, {
      form: 'resistance',
      exclusiveMin: true,
      help: 'empty = from regulation',
    }),
    leakageH: optNum('Leakage inductance', 'H', { symbol: 'µH', scale: 1e-6 }, 0, 1, null, {
      form: 'leakage',
      help: 'referred to this winding, e.g. 250 or 1.2 mH; empty = estimated from the regulation',
      example: '250',
    }),
  },
});

/** The fitted primary (mains) fuse, stored on the supply. */
export const primaryFuseSpec = defineSpec({
  name: 'primary-fuse',
  label: 'Primary fuse',
  fields: {
    primaryFuseA: optNum('Fitted primary (mains) fuse', 'A', U.A, 0, 63, null, {
      form: 'primaryFuse',
      exclusiveMin: true,
      help: 'empty = recommend one',
    }),
  },
});

/** The enclosure the supply sits in: its surface and heat transfer coefficient give its internal temperature rise. */
export const enclosureSpec = defineSpec({
  name: 'enclosure',
  label: 'Enclosure',
  fields: {
    enclosureAreaM2: optNum('Enclosure surface', 'm²', { symbol: 'cm²', scale: 1e-4 }, 0, 100, null, {
      form: 'enclosureArea',
      exclusiveMin: true,
      help: 'faces that shed heat; empty = no rise computed',
      example: '1160',
    }),
    // Sealed enclosures in still air: steel about 5.5, aluminium about 6.5 W/(m² K) (a vendor's sizing page)
    enclosureUWPerM2K: optNum('Heat transfer coefficient', 'W/(m²·K)', { symbol: 'W/(m²·K)' +
      '', scale: 1 }, 0, 100, 5.5, {
      form: 'enclosureU',
      exclusiveMin: true,
      help: 'sealed steel about 5.5, aluminium 6.5',
      example: '5.5',
    }),
  },
});

/** The add-a-rail form: the source decides the kind (w:<winding id> rectified, r:<rail id> regulated, battery). */
export const addRailSpec = defineSpec({
  name: 'add-rail',
  label: 'New rail',
  fields: {
    name: text('Rail name', 200, true, 'New rail', { help: 'e.g. 12 V receiver rail' }),
    source: ref('Fed from', 'rail', false),
  },
});
