// Field names of the RF inputs in words, for findings a builder reads (the names stay for the forms).
const LABELS: Record<string, string> = {
  ambientC: 'ambient temperature',
  antennaGainDbi: 'antenna gain',
  biasIdleMaxA: 'bias idle current',
  capacitorQ: 'capacitor Q',
  capacitorTolerance: 'capacitor tolerance',
  coreAlHPerTurn2: 'core AL',
  cutoffHz: 'cutoff',
  deviceIdMaxA: 'device current rating',
  deviceVdsMaxV: 'device voltage rating',
  devices: 'number of devices',
  efficiency: 'efficiency',
  evenHarmonicDbc: '2nd-harmonic residual',
  exposureDutyFactor: 'mode duty factor',
  exposureOnFraction: 'share of time on the air',
  feedlineLossDb: 'feedline loss',
  frequencyHz: 'operating frequency',
  inductorQ: 'inductor Q',
  inductorTolerance: 'inductor tolerance',
  keyingDuty: 'keying duty',
  loadOhm: 'load',
  monteCarloTrials: 'Monte Carlo trials',
  order: 'order',
  railId: 'supply rail',
  rdsOnOhm: 'Rds(on)',
  referencePowerW: 'reference power',
  rfRatedVpeak: 'RF voltage rating',
  rippleDb: 'ripple',
  saturationV: 'saturation voltage',
  seed: 'random seed',
  targetPowerW: 'target power',
  turnsRatio: 'turns ratio',
  worstSwr: 'worst-case SWR',
};

/** "coreAlHPerTurn2" -> "core AL"; an unknown name is split at its capitals. */
export function fieldLabel(field: string): string {
  return LABELS[field] ?? field.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
}
