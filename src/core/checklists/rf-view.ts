// The few RF numbers the checklists and the PDF read, in one place, so a change in the RF report's
// shape touches only this file. Pure.

/** Placeholder until the RF report lands: the PDF and checklists print "not computed" for null. */
export type RfReport = Record<string, unknown>;

export interface RfElementView {
  label: string; // "C1", "L2"
  kind: 'capacitor' | 'inductor';
  idealValue: number; // F or H
  builtValue: number; // F or H
  partsText: string; // "470 pF + 56 pF" or "22 turns"
  turns: number | null;
}

export interface RfHarmonicView {
  n: number;
  frequencyHz: number;
  paLevelDbc: number;
  filterAttenuationDb: number;
  predictedDbc: number;
  requiredDb: number;
  marginDb: number;
  severity: 'ok' | 'caution' | 'fail';
}

export interface RfExposureView {
  label: string;
  distanceM: number;
}

export interface RfView {
  paOutputW: number | null;
  paKeyDownA: number | null;
  paRailV: number | null;
  paEfficiency: number | null;
  paPeakDrainV: number | null;
  paDissipationW: number | null;
  paJunctionC: number | null;
  paThetaSaNeededKPerW: number | null;
  lpfCutoffHz: number | null;
  lpfText: string;
  lpfElements: RfElementView[];
  lpfCoreName: string;
  lpfBandLossDb: number | null;
  /** |S21| sweep (Hz, dB of loss as negative gain) for the plot. */
  s21: { frequencyHz: number; gainDb: number }[];
  harmonicRule: string;
  harmonics: RfHarmonicView[];
  relayOperateS: number | null;
  relayReleaseS: number | null;
  relayBounceS: number | null;
  txDelayS: number | null;
  exposure: RfExposureView[];
}

export function rfView(rf: RfReport | null): RfView | null {
  if (!rf) return null;
  return null;
}
