// A PA's output parts beyond the L network, as label/text rows shared by the RF page and the builder's pack: the pi
// network (balanced for push-pull), the class-E shunt capacitor beside the device, and the output transformer on its
// catalog core (flux and fit). Words only; the figures come from pi-network.ts and core-catalog.ts.
import type { RfStageResult } from './report';
import { formatValue as fv } from '../units';

const parts = (xs: number[]) => xs.map((x) => fv(x, 'F', 2)).join(' ∥ ');
const z = (c: [number, number]) => `${fv(c[0], 'Ω')} ${c[1] < 0 ? '−' : '+'} j${fv(Math.abs(c[1]), 'Ω')}`;

export function paOutputRows(s: Pick<RfStageResult, 'pi' | 'classEShunt' | 'outputTransformer'>): [string, string][] {
  const { pi, classEShunt: ce, outputTransformer: ot } = s;
  const rows: [string, string][] = [];
  if (pi) {
    const balanced = pi.form === 'balanced';
    rows.push([
      'Pi network',
      `${fv(pi.drainOhm, 'Ω')} ${balanced ? 'drain to drain' : 'drain load'} to ${fv(pi.loadOhm, 'Ω')}, loaded Q ` +
        `${pi.ideal.q.toFixed(2)}` +
        (balanced ? '; balanced: the series inductance split into two legs, then a 1:1 balun to the coax' : ''),
    ]);
    rows.push([
      'Drain-side capacitor',
      `${fv(pi.ideal.drainShuntF, 'F')} ideal; fit ${parts(pi.drainCapacitorPartsF)} = ${fv(pi.builtDrainShuntF, 'F')}`,
    ]);
    const legs = balanced ? ' in each leg' : '';
    rows.push([
      'Series inductor',
      `${fv(pi.ideal.seriesH, 'H')} ideal${balanced ? ` (${fv(pi.ideal.seriesH / 2, 'H')} a leg)` : ''}` +
        (pi.turns !== null && pi.builtSeriesH !== null
          ? `; ${pi.turns} turns${legs} on the chosen core = ${fv(pi.builtSeriesH, 'H')} in all`
          : '; no core to count turns on'),
    ]);
    rows.push([
      'Load-side capacitor',
      `${fv(pi.ideal.loadShuntF, 'F')} ideal; fit ${parts(pi.loadCapacitorPartsF)} = ${fv(pi.builtLoadShuntF, 'F')}`,
    ]);
    if (pi.builtDrainOhm) rows.push(['Drain load as built (pi)', z(pi.builtDrainOhm)]);
  }
  if (ce) {
    rows.push([
      'Class-E shunt capacitance',
      `${fv(ce.neededF, 'F')} per switch needed; the device gives ${fv(ce.cossF, 'F')}` +
        (ce.addF > 0
          ? `; add ${parts(ce.addPartsF)} = ${fv(ce.addF, 'F')} beside it`
          : '; the device alone has more than that (see the finding)') +
        (ce.maxFrequencyHz !== null ? `; usable up to ${fv(ce.maxFrequencyHz, 'Hz')} with this device` : ''),
    ]);
  }
  if (ot) {
    rows.push([
      'Output transformer core',
      `${ot.coreName}: ${ot.primaryTurns} primary and ${ot.secondaryTurns} secondary turns`,
    ]);
    rows.push([
      'Flux density (peak)',
      `${fv(ot.peakFluxT, 'T')} at ${fv(ot.primaryRmsV, 'V')} RMS and ${fv(ot.frequencyHz, 'Hz')} (B = V / (4.44 f N ` +
        `Ae)) against the core's ${fv(ot.fluxLimitT, 'T')}`,
    ]);
    if (ot.fitTurns !== null)
      rows.push([
        'Winding fit',
        `${ot.primaryTurns + ot.secondaryTurns} turns of the entered wire; room for about ${ot.fitTurns}`,
      ]);
  }
  return rows;
}
