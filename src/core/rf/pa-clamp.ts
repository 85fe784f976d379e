// A drain clamp the builder fitted (TVS or zener from drain to ground): the drain peak it leaves at the worst load
// of the SWR circle, and an estimate of the power it takes while it conducts, into that load and into the design load.
import type { Finding } from '../findings';
import type { PaSwrStress, Worst } from './pa-swr';
import { describeLoad, whereLoad } from './pa-swr';

export interface ClampPoint {
  /** Drain peak without the clamp, V, and with it (the lower of the two), V. */
  unclampedPeakV: number;
  clampedPeakV: number;
  /** Share of each cycle the clamp conducts (0 = never), and the power it takes then, W (key-down). */
  conductionFraction: number;
  dissipationW: number;
}

export interface DrainClamp {
  clampV: number;
  /** Into the design load at the highest supply. */
  design: ClampPoint;
  /** At the worst drain peak of the SWR circle (the design load when no SWR is given), and that load. */
  worst: ClampPoint;
  worstLoad: Worst;
}

/**
 * The clamp at one load. Common practice, no published source: the unclamped drain taken as a cosine swing about
 * the supply, v = Vdd + (Vpk − Vdd) cos θ, so the clamp conducts while cos θ > (Vc − Vdd)/(Vpk − Vdd), a share
 * θc/π of the cycle; the current it diverts is at most the stage's peak device current, so P ≤ Vc Ipk θc/π (an
 * upper estimate: the real current is smaller at the edges of the interval; a class-E drain is not a cosine, an
 * approximation). Energy balance (textbook): the clamp cannot take more than the stage draws from its supply at that
 * load, so P is also at most that DC input (maxW).
 */
export function clampAt(clampV: number, supplyV: number, peakV: number, peakA: number, maxW = Infinity): ClampPoint {
  const clampedPeakV = Math.min(peakV, clampV);
  if (!(peakV > clampV)) return { unclampedPeakV: peakV, clampedPeakV, conductionFraction: 0, dissipationW: 0 };
  const swing = peakV - supplyV;
  const c = swing > 0 ? (clampV - supplyV) / swing : -1;
  const thetaC = Math.acos(Math.max(-1, Math.min(1, c)));
  const conductionFraction = thetaC / Math.PI;
  return {
    unclampedPeakV: peakV,
    clampedPeakV,
    conductionFraction,
    dissipationW: Math.min(clampV * peakA * conductionFraction, maxW),
  };
}

/** The fitted clamp at the design load and at the worst drain peak of the circle (null when none is fitted). */
export function drainClamp(
  clampV: number | null | undefined,
  s: PaSwrStress,
  design: { peakV: number; peakA: number; supplyV: number; dcInputW: number },
): DrainClamp | null {
  if (clampV === null || clampV === undefined || !(clampV > 0)) return null;
  const w = s.worstDrainPeak;
  // DC input at the worst load: all of it leaves as output or heat in the devices (energy balance)
  // the worst may lie with the antenna at its design load (phase null: the filter's own input there)
  const at = w.phaseDeg === null ? s.designLoad : s.points.find((p) => p.phaseDeg === w.phaseDeg);
  const worstDcW = at ? at.outputW + at.dissipationW : Infinity;
  return {
    clampV,
    design: clampAt(clampV, design.supplyV, design.peakV, design.peakA, design.dcInputW),
    worst: clampAt(clampV, design.supplyV, w.value, s.worstPeakCurrent.value, worstDcW),
    worstLoad: w,
  };
}

export function clampFindings(
  c: DrainClamp,
  vdsMaxV: number,
  supplyV: number,
  swr: number,
  subject: string,
): Finding[] {
  const base = { rule: 'pa.drain-clamp', subject, unit: 'V', source: 'pa.drain-clamp' as const };
  const v = (x: number) => `${x.toFixed(1)} V`;
  const w = (x: number) => `${x.toFixed(1)} W`;
  const f: Finding[] = [];
  if (c.clampV >= vdsMaxV) {
    f.push({
      ...base,
      severity: 'fail',
      value: c.clampV,
      limit: vdsMaxV,
      message:
        `The ${v(c.clampV)} drain clamp is not below the device's ${vdsMaxV} V rating, so it does not protect it: ` +
        'choose a clamp voltage below the rating (its clamping voltage at the peak current, not its ' +
        'stand-off voltage).',
    });
  }
  if (c.clampV <= supplyV) {
    f.push({
      ...base,
      severity: 'fail',
      value: c.clampV,
      limit: supplyV,
      message:
        `The ${v(c.clampV)} drain clamp is at or below the ${v(supplyV)} supply: it would conduct all the time. ` +
        `Choose one above the ${v(c.design.unclampedPeakV)} drain peak into the design load.`,
    });
    return f;
  }
  if (c.design.conductionFraction > 0) {
    f.push({
      ...base,
      severity: 'caution',
      value: c.clampV,
      limit: c.design.unclampedPeakV,
      message:
        `The ${v(c.clampV)} clamp is below the ${v(c.design.unclampedPeakV)} drain peak into the design load: it ` +
        `conducts every cycle (about ${Math.round(c.design.conductionFraction * 100)} % of it) and takes up to ` +
        `${w(c.design.dissipationW)} key-down, power the antenna does not get. Choose a clamp above ` +
        `${v(c.design.unclampedPeakV)} and below the device rating.` });
  }
  const where = whereLoad(c.worstLoad, swr);
  if (c.worst.conductionFraction > 0 && c.design.conductionFraction === 0) {
    f.push({ ...base, severity: 'caution', value: c.worst.dissipationW, limit: null, unit: 'W',
      message: `The ${v(c.clampV)} clamp holds the drain peak ${where} to ${v(c.worst.clampedPeakV)} (it would reach ` +
        `${v(c.worst.unclampedPeakV)}); while that mismatch lasts it takes up to about ${w(c.worst.dissipationW)} ` +
        '(an upper estimate). A TVS\'s steady-state power rating, not its pulse rating, must cover that, or add SWR ' +
        'foldback so the clamp only catches short faults.' });
  } else if (c.worst.conductionFraction === 0) {
    f.push({
      ...base,
      severity: 'ok',
      value: c.clampV,
      limit: c.worst.unclampedPeakV,
      message:
        `The ${v(c.clampV)} clamp stays above the ${v(c.worst.unclampedPeakV)} drain peak ${where}: it does not ` +
        'conduct in normal use and catches only faults beyond it.',
    });
  }
  return f;
}

/** One line for the page and the pack: the clamp, the drain peak it leaves and the power it takes. */
export function clampText(c: DrainClamp): string {
  const p = (x: ClampPoint) =>
    x.conductionFraction > 0
      ? `held to ${x.clampedPeakV.toFixed(1)} V (${x.unclampedPeakV.toFixed(1)} V without it), up to ` +
        `${x.dissipationW.toFixed(1)} W in the clamp`
      : `${x.unclampedPeakV.toFixed(1)} V, clamp idle`;
  return `${c.clampV} V fitted; design load: ${p(c.design)}; worst load (${describeLoad(c.worstLoad)}): ${p(c.worst)}` +
    ` (upper estimate)`;
}
