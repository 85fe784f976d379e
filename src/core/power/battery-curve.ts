// Battery discharge curves by chemistry: the plateau a rig runs on for most of the charge, the usable charge before
// the loads stop (the loaded curve reaching the highest of the end voltage and what the loads need), and the runtime
// over that part of the curve. Loads are constant-current here (as in the rest of the supply model).
import type { Finding } from '../findings';
import type { BatteryRail } from '../model';

/** Chemistries with a curve; 'external' = an external DC supply (no discharge curve). */
export const BATTERY_CHEMISTRIES = ['LiFePO4', 'lead-acid', 'Li-ion', 'NiMH', 'external'] as const;
export type BatteryChemistry = (typeof BATTERY_CHEMISTRIES)[number];

export const CHEMISTRY_LABEL: Record<BatteryChemistry, string> = {
  LiFePO4: 'LiFePO4 (lithium iron phosphate)',
  'lead-acid': 'Lead-acid (sealed / AGM / gel)',
  'Li-ion': 'Li-ion (NMC / LCO)',
  NiMH: 'NiMH',
  external: 'External DC supply (no discharge curve)',
};

export interface CellCurve {
  /** Nominal cell voltage (V): the maker's rating, used to count the cells from the battery's nominal voltage. */
  nominalV: number;
  /** Cell voltage at the common end-of-discharge cut-off (V). */
  endV: number;
  /** Resting cell voltage just after a full charge (V). */
  fullRestV: number;
  /** Cell voltage (V) against depth of discharge (0 = full, 1 = at the cut-off), at a moderate rate (about 0.2 C). */
  points: readonly (readonly [number, number])[];
}

// Common practice, no published source: cell figures and curve shapes typical of makers' discharge curves at about
// 0.2 C and 20-25 °C, from memory. LiFePO4 3.2 V nominal, 2.5 V cut-off, flat plateau near 3.3 V.
// Lead-acid 2.0 V nominal, 1.75 V/cell end at the 20-hour rate, falling steadily. Li-ion (NMC / LCO) 3.6-3.7 V
// nominal, 3.0 V cut-off, sloping. NiMH 1.2 V nominal, 1.0 V/cell end, flat near 1.2 V.
export const CELL_CURVES: Record<Exclude<BatteryChemistry, 'external'>, CellCurve> = {
  LiFePO4: {
    nominalV: 3.2, endV: 2.5, fullRestV: 3.4,
    points: [[0, 3.45], [0.05, 3.35], [0.1, 3.32], [0.3, 3.3], [0.5, 3.29], [0.7, 3.27], [0.9, 3.2], [0.95, 3.05],
      [1, 2.5]],
  },
  'lead-acid': {
    nominalV: 2.0, endV: 1.75, fullRestV: 2.13,
    points: [[0, 2.12], [0.1, 2.08], [0.3, 2.04], [0.5, 2.0], [0.7, 1.96], [0.9, 1.9], [1, 1.75]],
  },
  'Li-ion': {
    nominalV: 3.6, endV: 3.0, fullRestV: 4.15,
    points: [[0, 4.15], [0.1, 4.0], [0.3, 3.85], [0.5, 3.72], [0.7, 3.62], [0.9, 3.45], [1, 3.0]],
  },
  NiMH: {
    nominalV: 1.2, endV: 1.0, fullRestV: 1.38,
    points: [[0, 1.38], [0.05, 1.3], [0.2, 1.25], [0.5, 1.22], [0.8, 1.18], [0.9, 1.14], [1, 1.0]],
  },
};

/** The plateau is the mean over this part of the discharge (depth of discharge). Common practice, no source. */
export const PLATEAU_FROM = 0.1;
export const PLATEAU_TO = 0.9;

export function isChemistry(x: string): x is BatteryChemistry {
  return (BATTERY_CHEMISTRIES as readonly string[]).includes(x);
}

/** Cell voltage at a depth of discharge (0..1), by linear interpolation of the curve. */
export function cellVoltageAt(curve: CellCurve, depth: number): number {
  const p = curve.points;
  const d = Math.min(1, Math.max(0, depth));
  for (let i = 1; i < p.length; i++) {
    if (d <= p[i][0]) {
      const [d0, v0] = p[i - 1];
      const [d1, v1] = p[i];
      return v0 + ((v1 - v0) * (d - d0)) / (d1 - d0);
    }
  }
  return p[p.length - 1][1];
}

/** Mean of a piecewise-linear curve between two depths (trapezoid rule on the curve's own points; exact for it). */
export function meanCellV(curve: CellCurve, from: number, to: number): number {
  const xs = [from, ...curve.points.map(([d]) => d).filter((d) => d > from && d < to), to];
  let area = 0;
  for (let i = 1; i < xs.length; i++) {
    area += ((cellVoltageAt(curve, xs[i - 1]) + cellVoltageAt(curve, xs[i])) / 2) * (xs[i] - xs[i - 1]);
  }
  return area / (to - from);
}

/** Depth where the cell voltage first falls to v (the curve only falls); 1 if it never does, 0 if it starts below. */
export function depthAtCellV(curve: CellCurve, v: number): number {
  const p = curve.points;
  if (p[0][1] <= v) return 0;
  for (let i = 1; i < p.length; i++) {
    if (p[i][1] <= v) {
      const [d0, v0] = p[i - 1];
      const [d1, v1] = p[i];
      return d0 + ((d1 - d0) * (v0 - v)) / (v0 - v1);
    }
  }
  return 1;
}

export interface BatteryCurveResult {
  chemistry: BatteryChemistry;
  cells: number;
  /** Open-circuit plateau (mean over 10-90 % depth of discharge) (V), and the same under key-down load (V). */
  plateauV: number;
  loadedPlateauV: number;
  /** The chemistry's own end and full voltages for this many cells (V). */
  chemistryEndV: number;
  chemistryFullRestV: number;
  /** Voltage at which the rig stops (the higher of the entered end voltage and what the loads need) (V). */
  stopV: number;
  /** Share of the rated capacity used before the loaded curve reaches stopV (also capped by the usable fraction). */
  usedFraction: number;
  /** Runtime over the curve (s): the used charge over the average current; 0 when no current is drawn. */
  runtimeS: number;
  /** The battery's curve for this many cells, open circuit: [depth of discharge, V]. */
  points: [number, number][];
}

/**
 * The battery's discharge curve scaled to its cell count (from its nominal voltage), the loaded plateau, and the
 * runtime to the point where the loaded voltage reaches the stop voltage. null for an external supply, an unknown
 * chemistry, or a nominal voltage that is not a whole number of cells (within 5 %, common practice, no source).
 */
export function batteryCurve(
  b: BatteryRail, keyDownA: number, averageA: number, requiredMinV: number,
): BatteryCurveResult | null {
  if (!isChemistry(b.chemistry) || b.chemistry === 'external') return null;
  const curve = CELL_CURVES[b.chemistry];
  const cells = Math.round(b.nominalV / curve.nominalV);
  if (!(cells >= 1) || Math.abs(b.nominalV / (cells * curve.nominalV) - 1) > 0.05) return null;
  const r = Number.isFinite(b.internalOhm) && b.internalOhm > 0 ? b.internalOhm : 0;
  const dropV = (Number.isFinite(keyDownA) && keyDownA > 0 ? keyDownA : 0) * r;
  const plateauV = cells * meanCellV(curve, PLATEAU_FROM, PLATEAU_TO);
  const stopV = Math.max(b.endV, requiredMinV);
  // Thevenin source model, V = E - I R: the loaded curve reaches stopV where the open-circuit curve is stopV + I R
  const depth = depthAtCellV(curve, (stopV + dropV) / cells);
  const usedFraction = Math.min(depth, Math.min(1, Math.max(0, b.usableFraction)));
  // Source: charge balance Q = I t (constant-current loads)
  const runtimeS = averageA > 0 && b.capacityAh > 0 ? (b.capacityAh * usedFraction * 3600) / averageA : 0;
  return {
    chemistry: b.chemistry, cells, plateauV, loadedPlateauV: plateauV - dropV,
    chemistryEndV: cells * curve.endV, chemistryFullRestV: cells * curve.fullRestV,
    stopV, usedFraction, runtimeS,
    points: curve.points.map(([d, v]) => [d, cells * v]),
  };
}

/** The curve's findings: no curve (why), a deep-discharge end voltage, and the runtime over the curve. */
export function batteryCurveFindings(b: BatteryRail, c: BatteryCurveResult | null, flatRuntimeS: number): Finding[] {
  const subject = b.name;
  const base = { subject, source: 'supply.battery-curve' as const };
  if (!c) {
    if (!isChemistry(b.chemistry) || b.chemistry === 'external') return [];
    const cellV = CELL_CURVES[b.chemistry].nominalV;
    return [{
      ...base, severity: 'caution', rule: 'battery.curve', value: b.nominalV, limit: cellV, unit: 'V',
      message: `${subject}: ${b.nominalV} V nominal is not a whole number of ${cellV} V ${b.chemistry} cells, ` +
        'so no discharge curve is used; check the chemistry or the nominal voltage.',
    }];
  }
  const out: Finding[] = [];
  const v = (x: number) => `${x.toFixed(2)} V`;
  // 2 % below the chemistry's cut-off. Common practice, no published source
  if (b.endV < c.chemistryEndV * 0.98) {
    out.push({
      ...base, severity: 'caution', rule: 'battery.deep-discharge', value: b.endV, limit: c.chemistryEndV, unit: 'V',
      message: `${subject}: the end voltage ${v(b.endV)} (${v(b.endV / c.cells)} a cell) is below the ` +
        `${v(c.chemistryEndV)} common for ${c.cells} ${b.chemistry} cells; discharging that far can damage them: ` +
        'raise the end voltage or fit a low-voltage cut-off.',
    });
  }
  const hours = (s: number) => (s / 3600).toFixed(1);
  const short = c.usedFraction < b.usableFraction - 0.05;
  const usable = Math.round(b.usableFraction * 100);
  out.push({
    ...base, severity: short ? 'caution' : 'ok', rule: 'battery.curve-runtime',
    value: c.runtimeS, limit: flatRuntimeS, unit: 's',
    message: `${subject}: on the ${b.chemistry} curve the battery sits near ${v(c.plateauV)} ` +
      `(${v(c.loadedPlateauV)} under key-down) for most of the charge; the loads run until ${v(c.stopV)}, ` +
      `${Math.round(c.usedFraction * 100)} % of the capacity: about ${hours(c.runtimeS)} h` +
      (short ? `, not the ${hours(flatRuntimeS)} h from the ${usable} % usable you entered: ` +
        'the loads stop before the battery is flat.' : '.'),
  });
  return out;
}
