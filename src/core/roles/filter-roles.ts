// The low-pass filter's parts as design roles: its capacitors (each value the design chose, voltage, RF current,
// dielectric, tolerance), its cores (AL, size, the turns of the wire fitting the hole) and, when the filter states the
// wire, the wire (diameter, length for every turn). Read from the RF report's as-built design and the stage's inputs.
import type { Stage } from '../model';
import type { RfStageResult } from '../rf/report';
import type { DesignRole, RoleRule } from './types';
import { f, finite, groupValues, role } from './role-make';

/** A core's AL within this fraction of the one the filter was designed with. Common practice, no published source. */
export const AL_TOLERANCE = 0.1;
/** A core's outer and inner diameter and height within this fraction of the filter's. Common practice, no source. */
export const CORE_SIZE_TOLERANCE = 0.05;
/** The wire's diameter within this fraction of the filter's. Common practice, no published source. */
export const WIRE_TOLERANCE = 0.1;
/** Wire for the two leads of each inductor, m. Common practice, no published source. */
export const LEAD_LENGTH_M = 0.05;

export function filterRoles(stage: Stage, s: RfStageResult, frequencyHz: number): DesignRole[] {
  const d = s.lpf?.design;
  if (!s.lpf || !d || !stage.lpf) return [];
  const out: DesignRole[] = [];
  const caps = d.elements.filter((e) => e.kind === 'shunt-capacitor');
  const cMaxF = Math.max(0, ...caps.map((e) => e.builtValue));
  // Source: capacitor current I = V ω C at the standing-wave voltage maximum (line.standing-wave), largest C
  const rfA = (s.lpf.capacitorPeakV / Math.SQRT2) * 2 * Math.PI * frequencyHz * cMaxF;
  const values = groupValues(caps.flatMap((e) => e.capacitorPartsF.map((c) => ({ value: c, where: `C${e.index}` }))));
  const tol = stage.lpf.capacitorTolerance;
  const capRules: RoleRule[] = [
    // each bound capacitor one of the E-series values the design chose, within the tolerance the yield was computed
    // with; together the lines cover every value's count
    { key: 'capacitanceF', label: 'Capacitance', unit: 'F', op: 'eachOf', values, tolerance: tol, required: false, source: 'roles.capacitor-value', why: 'the values the filter was designed and analysed with' },
    { key: 'voltageV', label: 'Voltage', unit: 'V', op: 'min', limit: s.lpf.capacitorPeakV, required: true, source: 'line.standing-wave', why: 'the peak RF voltage at the worst SWR' },
    { key: 'rfCurrentA', label: 'RF current', unit: 'A', op: 'min', limit: rfA, required: false, source: 'line.standing-wave', why: 'the RMS current of the largest shunt capacitor at that voltage' },
    { key: 'dielectric', label: 'Dielectric', unit: '', op: 'oneOf', options: ['C0G', 'mica'], required: false, source: 'roles.rf-dielectric', why: 'a stable, low-loss dielectric' },
  ];
  if (tol > 0) capRules.push({ key: 'toleranceFraction', label: 'Tolerance', unit: '%', op: 'max', limit: tol, required: false, source: 'roles.capacitor-value', why: 'the tolerance the filter’s yield was computed with' });
  const shown = caps.map((e) => e.capacitorPartsF.map((c) => f(c, 'F')).join(' ∥ ')).join('; ');
  out.push(role(`lpf-capacitors:${s.stageId}`, `Filter capacitors, ${s.stageName}`, 'capacitor', s.stageId, caps.reduce((n, e) => n + e.capacitorPartsF.length, 0), capRules, `values: ${shown}`));

  const inds = d.elements.filter((e) => e.kind === 'series-inductor');
  if (!inds.length) return out;
  const core = stage.lpf.core ?? null;
  const wireM = core?.wireDiameterM ?? null;
  const maxTurns = Math.max(0, ...inds.map((e) => e.turns ?? 0));
  const coreRules: RoleRule[] = [
    { key: 'alHPerTurn2', label: 'AL', unit: 'H', op: 'near', limit: d.coreAlHPerTurn2, tolerance: AL_TOLERANCE, required: true, source: 'roles.core-al', why: 'the AL the turns were computed with' },
  ];
  const size: [string, string, number | null | undefined][] = [['outerDiameterM', 'Outer diameter', core?.outerDiameterM], ['innerDiameterM', 'Inner diameter', core?.innerDiameterM], ['heightM', 'Height', core?.heightM]];
  for (const [key, label, v] of size)
    if (finite(v)) coreRules.push({ key, label, unit: 'm', op: 'near', limit: v, tolerance: CORE_SIZE_TOLERANCE, required: false, source: 'roles.core-size', why: 'the size the flux density and fit were computed with' });
  // Source: one layer of N turns of diameter d fits when N ≤ π (ID − d)/d (core.winding-fit), so ID ≥ N d/π + d
  if (finite(wireM) && maxTurns > 0)
    coreRules.push({ key: 'innerDiameterM', label: 'Hole for the turns', unit: 'm', op: 'min', limit: (maxTurns * wireM) / Math.PI + wireM, required: false, source: 'core.winding-fit', why: `${maxTurns} turns of ${f(wireM, 'm')} wire in one layer` });
  out.push(role(`lpf-cores:${s.stageId}`, `Filter cores, ${s.stageName}`, 'core', s.stageId, inds.length, coreRules, `turns: ${inds.map((e) => e.turns).join(', ')}`));

  if (finite(wireM)) {
    const wireRules: RoleRule[] = [
      { key: 'diameterM', label: 'Diameter', unit: 'm', op: 'near', limit: wireM, tolerance: WIRE_TOLERANCE, required: true, source: 'roles.wire', why: 'the wire the fit of the turns was checked with' },
    ];
    const od = core?.outerDiameterM;
    const id = core?.innerDiameterM;
    const h = core?.heightM;
    if (finite(od) && finite(id) && finite(h)) {
      // Source: one turn round a rectangular toroid section is 2 h + (OD − ID) (geometry), plus two leads per inductor
      const turns = inds.reduce((n, e) => n + (e.turns ?? 0), 0);
      const lengthM = turns * (2 * h + (od - id)) + inds.length * LEAD_LENGTH_M;
      wireRules.push({ key: 'lengthM', label: 'Length', unit: 'm', op: 'min', limit: lengthM, required: false, source: 'roles.wire', why: `${turns} turns round the core and the leads, one rig` });
    }
    out.push(role(`lpf-wire:${s.stageId}`, `Filter inductor wire, ${s.stageName}`, 'wire', s.stageId, 1, wireRules));
  }
  return out;
}
