// The few RF numbers the checklists and the PDF read, in one place, so a change in the RF report's
// shape touches only this file. Pure.

import type { RfReport } from '../rf/report';
import { formatValue } from '../units';

export type { RfReport };

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
  /** Key-down current the supply budget carries: the PA waveform band's most (hard saturation), bias included (A). */
  paKeyDownA: number | null;
  /** Key-down current at the design drive, bias included (A): what a builder measures at the design output. */
  paDesignKeyDownA: number | null;
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
  /** T/R delay minus (operate + bounce), s; negative = RF on moving contacts. */
  relayMarginS: number | null;
  exposure: RfExposureView[];
}

export function rfView(rf: RfReport | null): RfView | null {
  if (!rf) return null;
  const paStage = rf.stages.find((s) => s.stageId === rf.paStageId && s.pa) ?? rf.stages.find((s) => s.pa);
  const lpfStage = rf.stages.find((s) => s.stageId === rf.lpfStageId && s.lpf) ?? rf.stages.find((s) => s.lpf);
  const trStage = rf.stages.find((s) => s.relay);
  // a refused PA's numbers are placeholder zeros: the checklist must not print them as expected readings
  const pa = paStage?.pa && !paStage.pa.refused ? paStage.pa : null;
  const design = lpfStage?.lpf?.design ?? null;
  const analysis = lpfStage?.lpf?.analysis ?? null;
  const relay = trStage?.relay ?? null;
  const exp = rf.exposure;
  const exposure: RfExposureView[] = [];
  if (exp?.controlledDistanceM != null)
    exposure.push({
      label: 'controlled / occupational: you, aware of the exposure',
      distanceM: exp.controlledDistanceM,
    });
  if (exp?.generalDistanceM != null)
    exposure.push({ label: 'general public and neighbours', distanceM: exp.generalDistanceM });
  return {
    paOutputW: pa?.outputW ?? null,
    paKeyDownA: pa?.keyDownCurrentA ?? null,
    // the budget's figure is the band's most with the bias: the design drive's is its design current with the same bias
    paDesignKeyDownA: pa ? (pa.waveform ? pa.waveform.designCurrentA + pa.keyDownCurrentA - pa.waveform.bandMaxCurrentA
      : pa.keyDownCurrentA) : null,
    paRailV: pa?.railV ?? null,
    paEfficiency: pa?.efficiency ?? null,
    paPeakDrainV: pa?.peakDrainV ?? null,
    paDissipationW: pa?.thermal.dissipationTotalW ?? null,
    paJunctionC: pa?.thermal.tjContinuousC ?? null,
    paThetaSaNeededKPerW: pa?.thermal.thetaSaNeededContinuousKPerW ?? null,
    lpfCutoffHz: design?.cutoffHz ?? null,
    lpfText: design
      ? `${design.response === 'chebyshev' ? `Chebyshev ${design.rippleDb} dB` : 'Butterworth'}, order ` +
        `${design.order}, ${design.form}`
      : '',
    lpfElements: (design?.elements ?? []).map((e) => {
      const cap = e.kind === 'shunt-capacitor';
      return {
        label: `${cap ? 'C' : 'L'}${e.index}`,
        kind: cap ? ('capacitor' as const) : ('inductor' as const),
        idealValue: e.idealValue,
        builtValue: e.builtValue,
        partsText: cap ? e.capacitorPartsF.map((c) => formatValue(c, 'F')).join(' + ') : `${e.turns ?? '—'} turns`,
        turns: e.turns,
      };
    }),
    lpfCoreName: design?.coreName ?? '',
    lpfBandLossDb: analysis?.bandMaxLossDb ?? null,
    s21: (analysis?.sweep ?? []).map((p) => ({ frequencyHz: p.frequencyHz, gainDb: p.s21Db })),
    harmonicRule: rf.harmonics ? rf.harmonics.ruleTitle : '',
    harmonics: (rf.harmonics?.rows ?? []).map((h) => ({
      n: h.n,
      frequencyHz: h.frequencyHz,
      paLevelDbc: h.paLevelDbc,
      filterAttenuationDb: h.filterAttenuationDb,
      predictedDbc: h.predictedDbc,
      requiredDb: h.requiredDb,
      marginDb: h.marginDb,
      severity: h.severity,
    })),
    relayMarginS: relay?.hotSwitchMarginS ?? null,
    exposure,
  };
}
