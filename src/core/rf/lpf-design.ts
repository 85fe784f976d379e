// Low-pass filter synthesis: prototype -> 50 ohm ladder -> standard capacitors and wound inductors.
import type { LpfParams } from '../model';
import { defaultCutoffHz } from './bands';
import { snapCapacitance } from './e-series';
import { type Checked, validateLpfParams } from './lpf-validate';
import { prototypeG } from './prototype';
import { rfInputsSpec } from '../spec/settings';
import { storedProblem } from '../spec/derive';

const FREQUENCY = rfInputsSpec.fields.frequencyHz;

/** System impedance of the filter (source and load), ohms. */
export const LPF_R0_OHM = 50;

export type LpfElementKind = 'shunt-capacitor' | 'series-inductor';

export interface LpfElement {
  /** Position in the ladder from the input, 1..n. */
  index: number;
  kind: LpfElementKind;
  /** Prototype value g_index (dimensionless). */
  g: number;
  /** Ideal value: farads (capacitor) or henries (inductor). */
  idealValue: number;
  /** Capacitor parts fitted in parallel, farads (empty for an inductor). */
  capacitorPartsF: number[];
  /** Turns on the chosen core (null for a capacitor). */
  turns: number | null;
  /** As-built value: sum of capacitor parts (F) or AL N^2 (H). */
  builtValue: number;
  /** (built - ideal) / ideal. */
  errorFraction: number;
}

export interface LpfDesign {
  response: 'butterworth' | 'chebyshev';
  /** Passband ripple, dB (0 for Butterworth). */
  rippleDb: number;
  order: number;
  form: 'capacitor-input' | 'inductor-input';
  /** Cutoff, Hz: 3 dB point (Butterworth) or ripple-band edge (Chebyshev). */
  cutoffHz: number;
  /** Where the cutoff came from. */
  cutoffSource: 'entered' | 'band-rule';
  /** Operating (carrier) frequency, Hz. */
  operatingFrequencyHz: number;
  /** Termination resistance, ohms. */
  r0Ohm: number;
  elements: LpfElement[];
  coreName: string;
  /** Core AL, H/turn^2. */
  coreAlHPerTurn2: number;
  inductorQ: number;
  capacitorQ: number;
  /** Fractional tolerance (0.05 = 5 %). */
  capacitorTolerance: number;
  inductorTolerance: number;
}

/** Turns giving the nearest inductance on a core: L = AL N^2, at least one turn. */
export function turnsForInductance(inductanceH: number, alHPerTurn2: number): number {
  // Source: definition of the inductance factor AL (IEC 60205 / core makers' data): L = AL N^2
  return Math.max(1, Math.round(Math.sqrt(inductanceH / alHPerTurn2)));
}

/** Synthesise the filter. Invalid parameters give field errors, never a throw. */
export function designLpf(p: LpfParams, operatingFrequencyHz: number): Checked<LpfDesign> {
  const errors = validateLpfParams(p);
  // the project's frequency field (settings spec): one limit for the forms, the file and every check
  const frequencyProblem = storedProblem(FREQUENCY, operatingFrequencyHz);
  if (frequencyProblem) errors.push({ field: 'frequencyHz', message: `${FREQUENCY.label} ${frequencyProblem}` });
  if (errors.length > 0) return { ok: false, errors };
  const rippleDb = p.response === 'chebyshev' ? p.rippleDb : 0;
  const cutoffHz = p.cutoffHz ?? defaultCutoffHz(operatingFrequencyHz, p.response);
  if (cutoffHz <= operatingFrequencyHz) {
    return { ok: false, errors: [{ field: 'cutoffHz', message: 'Cutoff must be above the operating frequency.' }] };
  }
  const g = prototypeG(p.response, p.order, rippleDb);
  const wc = 2 * Math.PI * cutoffHz;
  const elements: LpfElement[] = g.map((gk, i) => {
    const shunt = (i % 2 === 0) === (p.form === 'capacitor-input');
    if (shunt) {
      // Source: standard impedance/frequency scaling (Matthaei, Young & Jones 1964, §4.04, from memory): C = g/(R0 wc)
      const ideal = gk / (LPF_R0_OHM * wc);
      const snap = snapCapacitance(ideal, p.capacitorSeries, p.allowParallelPairs);
      return {
        index: i + 1,
        kind: 'shunt-capacitor',
        g: gk,
        idealValue: ideal,
        capacitorPartsF: snap.parts,
        turns: null,
        builtValue: snap.total,
        errorFraction: snap.errorFraction,
      };
    }
    // Source: standard impedance/frequency scaling (Matthaei, Young & Jones 1964, §4.04, from memory): L = g R0 / wc
    const ideal = (gk * LPF_R0_OHM) / wc;
    const turns = turnsForInductance(ideal, p.coreAlHPerTurn2);
    const built = p.coreAlHPerTurn2 * turns * turns;
    return {
      index: i + 1,
      kind: 'series-inductor',
      g: gk,
      idealValue: ideal,
      capacitorPartsF: [],
      turns,
      builtValue: built,
      errorFraction: built / ideal - 1,
    };
  });
  return {
    ok: true,
    value: {
      response: p.response,
      rippleDb,
      order: p.order,
      form: p.form,
      cutoffHz,
      cutoffSource: p.cutoffHz === null ? 'band-rule' : 'entered',
      operatingFrequencyHz,
      r0Ohm: LPF_R0_OHM,
      elements,
      coreName: p.coreName,
      coreAlHPerTurn2: p.coreAlHPerTurn2,
      inductorQ: p.inductorQ,
      capacitorQ: p.capacitorQ,
      capacitorTolerance: p.capacitorTolerance,
      inductorTolerance: p.inductorTolerance,
    },
  };
}
