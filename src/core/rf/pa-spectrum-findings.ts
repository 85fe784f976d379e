// What the PA's harmonic spectrum rests on: assumed inputs, and the class-E estimate.
import type { Finding } from '../findings';
import type { PaParams } from '../model';
import type { PaSpectrum } from './pa-spectrum';

export function spectrumFindings(pa: PaParams, s: PaSpectrum, subject: string): Finding[] {
  const f: Finding[] = [];
  const a = s.assumed;
  const base = { subject, limit: null };
  if (a.conductionAngleDeg !== undefined) {
    f.push({
      ...base, severity: 'ok', rule: 'pa.conduction-angle', value: a.conductionAngleDeg, unit: '°', source: 'pa.harmonics-class-c',
      message: `No conduction angle entered: ${a.conductionAngleDeg}° assumed (±15° with drive and supply) for the ` +
        'class-C harmonics; enter it when known.',
    });
  }
  if (a.imbalanceTypical !== undefined || a.imbalanceWorst !== undefined) {
    const what = pa.topology === 'push-pull' ? 'push-pull imbalance' : 'duty error';
    f.push({
      ...base, severity: 'ok', rule: 'pa.imbalance', value: s.imbalanceWorst, unit: '', source: 'pa.harmonics-imbalance',
      message: `No ${what} entered: ${Math.round(s.imbalanceTypical * 100)} % typical and ` +
        `${Math.round(s.imbalanceWorst * 100)} % worst assumed for the harmonic bands; enter your own when measured.`,
    });
  }
  if (pa.amplifierClass === 'E') {
    f.push({
      ...base, severity: 'caution', rule: 'pa.harmonics-class-e', value: null, unit: '', source: 'pa.harmonics-rectangular',
      message: 'Class-E harmonics are taken from a rectangular wave: its series-tuned output makes them lower ' +
        '(not computed here), so these bands are pessimistic.',
    });
  }
  return f;
}
