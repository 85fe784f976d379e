// The PA's DC input from its waveform (pa-spectrum): the same waveforms give the output, the DC current the supply
// budget carries and the harmonic bands, so the three cannot contradict each other.
import type { PaWaveform } from './pa-spectrum';
import type { PaSwrStress, Worst } from './pa-swr';

export interface PaWaveformSummary {
  model: PaWaveform['model'];
  /** Output at the design point (edge of saturation; 50 % duty; loaded Q 30), W, and the most anywhere in the band. */
  designOutputW: number;
  bandMaxOutputW: number;
  /** Key-down DC current of the RF part (no bias) at the design point and the most anywhere in the band, A. */
  designCurrentA: number;
  bandMaxCurrentA: number;
  /** Drain efficiency of the ideal waveform at the design point (fraction): the most the efficiency used can be. */
  idealEfficiency: number;
  /** Class D: transition time used (s) and whether it was assumed; null for other classes. */
  transitionTimeS: number | null;
  transitionAssumed: boolean;
  /** Class E: the loaded Q of the series network over the band [low, high]; null for other classes. */
  classELoadedQ: [number, number] | null;
}

/** Where the supply budget's key-down current is taken, in words: the band's most for each waveform model. */
export function budgetDriveLabel(model: PaWaveform['model']): string {
  return model === 'cosine-pulse' ? 'hard saturation' : 'the worst end of the harmonic bands';
}

/**
 * Drain efficiency of the ideal design waveform, fraction: output / (Vdd I_dc) = swing / (Vdd dcRel).
 * Source: definition of drain efficiency; dcRel from the waveform's Fourier coefficients (e.g. class B: π/4 of the
 * swing over Vdd, class C (θ − sin θ cos θ)/(2 (sin θ − θ cos θ)), Krauss, Bostian & Raab 1980, from memory).
 */
export function idealEfficiency(w: PaWaveform, swingV: number, railV: number): number {
  return swingV / (railV * w.design.dcRel);
}

export interface BandFigures {
  /** DC current (RF part) at the design point and its most over the band, A. */
  designCurrentA: number;
  bandMaxCurrentA: number;
  /** Most output over the band, W. */
  bandMaxOutputW: number;
  /** The band's waveform that heats the devices most: its output and DC input, W. */
  hottest: { outputW: number; dcInputW: number };
}

/**
 * DC figures over the band for a design output `designOutputW` on a supply `railV`, with the drain efficiency used at
 * the design point (entered or class default, at most the ideal one). Each waveform of the band draws
 * I = I_design × dcRel / dcRel_design: the losses the ideal waveform leaves out scale with its DC input.
 * Source: energy balance P_dc = P_out / η (definition of drain efficiency); the scaling is common practice, no
 * published source.
 */
export function bandFigures(w: PaWaveform, designOutputW: number, railV: number, efficiency: number): BandFigures {
  const designCurrentA = designOutputW / (efficiency * railV);
  const current = (dcRel: number) => (designCurrentA * dcRel) / w.design.dcRel;
  let bandMaxCurrentA = designCurrentA;
  let bandMaxOutputW = designOutputW;
  let hottest = { outputW: designOutputW, dcInputW: designCurrentA * railV };
  for (const p of w.points) {
    const i = current(p.dcRel);
    const out = designOutputW * p.powerRel;
    bandMaxCurrentA = Math.max(bandMaxCurrentA, i);
    bandMaxOutputW = Math.max(bandMaxOutputW, out);
    if (i * railV - out > hottest.dcInputW - hottest.outputW) hottest = { outputW: out, dcInputW: i * railV };
  }
  return { designCurrentA, bandMaxCurrentA, bandMaxOutputW, hottest };
}

/**
 * Key-down DC current into the worst point of the SWR circle (A, with bias), from the circle's output and
 * dissipation: DC input = dissipation − bias + output (energy balance), scaled from the hot supply to the design
 * current. null when the circle has one point (SWR 1).
 */
export function swrKeyDownCurrent(
  swr: PaSwrStress,
  biasW: number,
  matchedDcW: number,
  designCurrentA: number,
  biasA: number,
): { currentA: number; at: Worst } | null {
  if (swr.points.length < 2 || !(matchedDcW > 0)) return null;
  const dcOf = (p: PaSwrStress['points'][number]) => Math.max(0, p.dissipationW - biasW) + p.outputW;
  const worst = swr.points.reduce((a, b) => (dcOf(b) > dcOf(a) ? b : a));
  return {
    currentA: (designCurrentA * dcOf(worst)) / matchedDcW + biasA,
    at: {
      value: dcOf(worst), phaseDeg: worst.phaseDeg, loadReOhm: worst.loadReOhm, loadImOhm: worst.loadImOhm,
      antennaReOhm: worst.antennaReOhm, antennaImOhm: worst.antennaImOhm,
    },
  };
}
