// SPICE export of the as-built filter (ngspice dialect: AC analysis in a .control block).
import type { LpfDesign } from './lpf-design';

function num(x: number): string {
  return x.toExponential(6);
}

/**
 * Netlist of the as-built ladder between 50 ohm terminations. The source is 2 V AC behind 50 ohm, so
 * |V(out)| equals |S21|. Losses use the same constant-Q model as the ABCD analysis: before each AC point
 * the loss resistors are set (`alter`) to wL/Q_L (in series with each inductor) and Q_C/(wC) (across each
 * capacitor) at that frequency. Prints `s21_<i> = <magnitude>` for each frequency i.
 */
export function lpfNetlist(design: LpfDesign, frequenciesHz?: number[]): string {
  const f0 = design.operatingFrequencyHz;
  const freqs = frequenciesHz ?? [f0, 2 * f0, 3 * f0, 4 * f0, 5 * f0];
  const lines: string[] = [];
  lines.push(
    `* Low-pass filter as built: ${design.response} order ${design.order}, ${design.form}, fc ${num(design.cutoffHz)}` +
      ` Hz`,
  );
  lines.push(`V1 src 0 DC 0 AC 2`);
  lines.push(`RS src n0 ${design.r0Ohm}`);
  let node = 0;
  const lossLines: { name: string; kind: 'L' | 'C'; value: number }[] = [];
  for (const e of design.elements) {
    const here = `n${node}`;
    if (e.kind === 'shunt-capacitor') {
      lines.push(`C${e.index} ${here} 0 ${num(e.builtValue)}`);
      lines.push(`RC${e.index} ${here} 0 1e12`);
      lossLines.push({ name: `RC${e.index}`, kind: 'C', value: e.builtValue });
    } else {
      const mid = `m${e.index}`;
      const next = `n${node + 1}`;
      lines.push(`L${e.index} ${here} ${mid} ${num(e.builtValue)}`);
      lines.push(`RL${e.index} ${mid} ${next} 1e-9`);
      lossLines.push({ name: `RL${e.index}`, kind: 'L', value: e.builtValue });
      node += 1;
    }
  }
  lines.push(`RLOAD n${node} 0 ${design.r0Ohm}`);
  lines.push(`.control`);
  freqs.forEach((f, i) => {
    const w = 2 * Math.PI * f;
    for (const r of lossLines) {
      const ohms = r.kind === 'L' ? (w * r.value) / design.inductorQ : design.capacitorQ / (w * r.value);
      const v = Number.isFinite(ohms) && ohms > 0 ? Math.min(Math.max(ohms, 1e-9), 1e15) : r.kind === 'L' ? 1e-9 : 1e15;
      lines.push(`alter ${r.name} = ${num(v)}`);
    }
    lines.push(`ac lin 1 ${num(f)} ${num(f)}`);
    lines.push(`let s21_${i} = mag(v(n${node}))`);
    lines.push(`print s21_${i}`);
  });
  lines.push(`.endc`);
  lines.push(`.end`);
  return lines.join('\n') + '\n';
}
