// What the PA's waveform and harmonic spectrum rest on: assumed inputs, the band of waveforms, class-D edges.
import type { Finding } from '../findings';
import type { PaParams } from '../model';
import type { BandFigures } from './pa-dc';
import type { PaSpectrum, PaWaveform } from './pa-spectrum';

export function spectrumFindings(pa: PaParams, s: Omit<PaSpectrum, 'waveform'>, subject: string): Finding[] {
  const f: Finding[] = [];
  const a = s.assumed;
  const base = { subject, limit: null };
  if (a.conductionAngleDeg !== undefined) {
    f.push({
      ...base,
      severity: 'ok',
      rule: 'pa.conduction-angle',
      value: a.conductionAngleDeg,
      unit: '°',
      source: 'pa.harmonics-class-c',
      message:
        `No conduction angle entered: ${a.conductionAngleDeg}° assumed (±15° with drive and supply) for the ` +
        'class-C harmonics; enter it when known.',
    });
  }
  if (a.imbalanceTypical !== undefined || a.imbalanceWorst !== undefined) {
    const what = pa.topology === 'push-pull' ? 'push-pull imbalance' : 'duty error';
    f.push({
      ...base,
      severity: 'ok',
      rule: 'pa.imbalance',
      value: s.imbalanceWorst,
      unit: '',
      source: 'pa.harmonics-imbalance',
      message:
        `No ${what} entered: ${Math.round(s.imbalanceTypical * 100)} % typical and ` +
        `${Math.round(s.imbalanceWorst * 100)} % worst assumed for the harmonic bands; enter your own when measured.`,
    });
  }
  if (a.transitionTimeS !== undefined) {
    f.push({
      ...base, severity: 'ok', rule: 'pa.transition-time', value: a.transitionTimeS, unit: 's', source: 'pa.trapezoid',
      message: `No switching transition time entered: ${(a.transitionTimeS * 1e9).toFixed(0)} ns assumed for the ` +
        'class-D waveform (power and harmonics); enter the drain rise and fall time when measured.',
    });
  }
  return f;
}

export interface WaveformContext {
  subject: string;
  /** Output of the design waveform, W, and the band's DC figures. */
  designOutputW: number;
  band: BandFigures;
  railV: number;
  frequencyHz?: number;
}

const w1 = (x: number) => `${x.toFixed(1)} W`;
const a2 = (x: number) => `${x.toFixed(2)} A`;

/** One line saying which waveforms give the power, the budgeted current and the harmonics; class-D edge checks. */
export function waveformFindings(pa: PaParams, w: PaWaveform, c: WaveformContext): Finding[] {
  const base = { subject: c.subject, limit: null } as const;
  const f: Finding[] = [];
  // the supply budget carries the band's most current (pa.ts), the same waveform that sets the worst harmonics
  const budget = `the supply budget carries the most the stage draws, ${a2(c.band.bandMaxCurrentA)} key-down ` +
    'for the RF';
  // Common practice, no published source: 5 % more current than at the design drive is worth saying
  if (c.band.bandMaxCurrentA > c.band.designCurrentA * 1.05) {
    // exposure and the spurious reference take the design drive's output (the parts take the stage's most,
    // stress-power): a caution only where the band's most
    // is more than the power check's 1 dB above it (common practice, no published source)
    const aboveDb = 10 * Math.log10(c.band.bandMaxOutputW / c.designOutputW);
    const totalA = c.band.bandMaxCurrentA + pa.biasIdleMaxA;
    const withBias = pa.biasIdleMaxA > 0.005 * totalA ? ` (${a2(totalA)} with the bias idle current)` : '';
    const advice = w.model === 'class-e-simulated'
      ? 'the loaded Q of the series network sets it'
      : 'set the drive no higher than the design point needs';
    const what =
      w.model === 'cosine-pulse'
        ? 'Driven into hard saturation (the worst end of the harmonic bands)'
        : w.model === 'class-e-simulated'
          ? 'With a low loaded Q of the series network (the worst end of the harmonic bands)'
          : 'At the worst end of the harmonic bands';
    f.push({
      ...base,
      limit: c.band.designCurrentA,
      severity: aboveDb > 1 ? 'caution' : 'ok',
      rule: 'pa.saturation-current',
      value: c.band.bandMaxCurrentA,
      unit: 'A',
      source: 'pa.waveform-dc',
      message:
        `${what} the stage gives up to ${w1(c.band.bandMaxOutputW)} and draws up to ` +
        `${a2(c.band.bandMaxCurrentA)} key-down for the RF${withBias}; at its design drive ` +
        `${w1(c.designOutputW)} for ${a2(c.band.designCurrentA)}. The supply budget carries the ${a2(totalA)} ` +
        '(the supply page sizes the rail, its fuses and the transformer for it). ' +
        (aboveDb > 1
          ? 'The filter\'s and relay\'s parts are checked at the most the stage gives (this at the highest supply, ' +
            'or more round the SWR circle); RF exposure and the spurious reference take the design drive\'s output, ' +
            `${aboveDb.toFixed(1)} dB ` +
            `below this: ${advice}; the extra power comes with the worst harmonics and more heat.`
          : 'That is within 1 dB of the design drive\'s output, on which RF exposure and the spurious reference ' +
            'are taken; the filter\'s and relay\'s parts are checked at the most the stage gives.') });
  }
  if (w.model === 'cosine-pulse') {
    f.push({
      ...base,
      severity: 'ok',
      rule: 'pa.waveform',
      value: c.band.bandMaxOutputW,
      unit: 'W',
      source: 'pa.waveform-pulse',
      message:
        `Drain-current pulse from the edge of saturation (${w1(c.designOutputW)}) to hard saturation, flat-topped ` +
        `(up to ${w1(c.band.bandMaxOutputW)}); ${budget}; the harmonic bands come from the same pulses.`,
    });
  } else if (w.model === 'trapezoid') {
    const tau = w.transitionFraction ?? 0;
    const ns = ((w.transitionTimeS ?? 0) * 1e9).toFixed(0);
    if (w.transitionTooLong) {
      f.push({
        ...base,
        severity: 'fail',
        rule: 'pa.transition-time',
        value: w.transitionTimeS,
        unit: 's',
        source: 'pa.trapezoid',
        message:
          `The switching transition time (${ns} ns) is ${(tau * 100).toFixed(0)} % of the period: longer than the ` +
          'shorter half of the switching cycle at the worst imbalance, so the drain never settles at the rails; ' +
          'switch faster (stronger gate drive, lower-capacitance devices) or use a linear class.' });
    }
    f.push({ ...base, severity: 'ok', rule: 'pa.waveform', value: c.designOutputW, unit: 'W', source: 'pa.trapezoid',
      message: `Switched (trapezoidal) drain voltage with ${ns} ns edges, ${(tau * 100).toFixed(1)} % of the period: ` +
        `${w1(c.designOutputW)} at 50 % duty; ${budget}; the harmonic bands come from the same waveform.` });
  } else if (w.classE) {
    const [lo, hi] = w.classE.loadedQ;
    f.push({
      ...base,
      severity: 'ok',
      rule: 'pa.waveform',
      value: c.designOutputW,
      unit: 'W',
      source: 'pa.class-e-harmonics',
      message:
        `Simulated class-E stage: ${w1(c.designOutputW)} with a series network of loaded Q ${hi}; ${budget}; ` +
        `the harmonics are those of its load current, from loaded Q ${hi} (best) to ${lo} (worst, not entered).`,
    });
  }
  return f;
}
