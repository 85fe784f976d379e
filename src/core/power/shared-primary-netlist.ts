// SPICE netlist of several rectified windings on one transformer with a shared primary resistance and leakage, for
// cross-checking simulateSharedPrimary with any SPICE (tested with ngspice). The ideal transformer is written with
// controlled sources: each secondary EMF E_i = k_i V(pp) (VCVS), and the primary draws Σ k_i i_i (CCCS through the
// winding's 0 V sense source). Diodes are the behavioural piecewise-linear Vf + r_d model of spice-netlist.ts.
// Leakage inductances (primary and per winding) are series inductors. .meas lines report each rail terminal's
// (reservoir plus ESR) minimum and mean over the last whole cycle (vmin<i>, vavg<i>).
import type { JointInput } from './shared-primary';

const num = (x: number) => (Number.isFinite(x) ? Number(x.toPrecision(8)).toString() : '0');

export function sharedPrimaryNetlist(input: JointInput, cycles: number, stepsPerCycle = 1000): string {
  const f = input.frequencyHz;
  const period = 1 / f;
  const vpk = Math.SQRT2 * input.primaryVrms;
  const lines = [
    `* ${input.windings.length} rectified windings on one transformer, shared primary ${num(input.primaryOhm)} ohm`,
    `Vs p 0 SIN(0 ${num(vpk)} ${num(f)})`,
    ...((input.primaryH ?? 0) > 0
      ? [`Rp p pl ${num(Math.max(input.primaryOhm, 1e-6))}`, `Lp pl pp ${num(input.primaryH!)}`]
      : [`Rp p pp ${num(Math.max(input.primaryOhm, 1e-6))}`]),
    `Rdcp pp 0 100Meg`,
  ];
  input.windings.forEach((w, i) => {
    const k = w.secondaryVrms / input.primaryVrms;
    const rd = Math.max(w.diodeResistanceOhm, 1e-4);
    const diode = (name: string, a: string, c: string) =>
      `${name} ${a} ${c} I = max(V(${a},${c}) - ${num(w.diodeDropV)}, 0) / ${num(rd)}`;
    const rw = num(Math.max(w.ownOhm, 1e-6));
    const out = `out${i}`;
    const lw = w.ownH && w.ownH > 0 ? num(w.ownH) : null;
    // the winding's resistance, then its leakage inductance when there is one, into the 0 V sense source
    const series = (r: string, from: string, to: string, via: string) =>
      lw ? [`${r} ${from} ${via} ${rw}`, `L${r} ${via} ${to} ${lw}`] : [`${r} ${from} ${to} ${rw}`];
    if (w.topology === 'bridge') {
      lines.push(
        `E${i} p${i} n${i} pp 0 ${num(k)}`,
        ...series(`Rw${i}`, `p${i}`, `q${i}`, `m${i}`),
        `Vse${i} q${i} a${i} 0`,
        `F${i} pp 0 Vse${i} ${num(k)}`,
        diode(`Ba${i}`, `a${i}`, out),
        diode(`Bb${i}`, `n${i}`, out),
        diode(`Bc${i}`, '0', `a${i}`),
        diode(`Bd${i}`, '0', `n${i}`),
        `Rdn${i} n${i} 0 100Meg`,
        `Rda${i} a${i} 0 100Meg`,
      );
    } else if (w.topology === 'centre-tap') {
      lines.push(
        `E${i} p${i} 0 pp 0 ${num(k)}`,
        `Eb${i} pb${i} 0 pp 0 ${num(-k)}`,
        ...series(`Rw${i}`, `p${i}`, `q${i}`, `m${i}`),
        ...series(`Rwb${i}`, `pb${i}`, `qb${i}`, `mb${i}`),
        `Vse${i} q${i} a${i} 0`,
        `Vseb${i} qb${i} b${i} 0`,
        `F${i} pp 0 Vse${i} ${num(k)}`,
        `Fb${i} pp 0 Vseb${i} ${num(-k)}`,
        diode(`Ba${i}`, `a${i}`, out),
        diode(`Bb${i}`, `b${i}`, out),
        `Rda${i} a${i} 0 100Meg`,
        `Rdb${i} b${i} 0 100Meg`,
      );
    } else {
      lines.push(
        `E${i} p${i} 0 pp 0 ${num(k)}`,
        ...series(`Rw${i}`, `p${i}`, `q${i}`, `m${i}`),
        `Vse${i} q${i} a${i} 0`,
        `F${i} pp 0 Vse${i} ${num(k)}`,
        diode(`Ba${i}`, `a${i}`, out),
        `Rda${i} a${i} 0 100Meg`,
      );
    }
    const ic = Math.max(0, k * vpk - (w.topology === 'bridge' ? 2 : 1) * w.diodeDropV);
    lines.push(
      `Resr${i} ${out} c${i} ${num(Math.max(w.esrOhm, 1e-6))}`,
      `C${i} c${i} 0 ${num(w.capacitanceF)} IC=${num(ic)}`,
      `Rdo${i} ${out} 0 100Meg`,
      `Il${i} ${out} 0 DC ${num(w.loadA)}`,
    );
    if (w.bleederOhm && w.bleederOhm > 0) lines.push(`Rbl${i} ${out} 0 ${num(w.bleederOhm)}`);
  });
  const t1 = num((cycles - 1) * period);
  const t2 = num(cycles * period);
  const step = num(period / stepsPerCycle);
  lines.push(`.tran ${step} ${t2} 0 ${step} uic`);
  input.windings.forEach((_, i) => {
    lines.push(`.meas tran vmin${i} MIN v(out${i}) FROM=${t1} TO=${t2}`,
      `.meas tran vavg${i} AVG v(out${i}) FROM=${t1} TO=${t2}`);
  });
  lines.push('.end');
  return lines.join('\n') + '\n';
}
