// The low-pass filter's parts as design roles: its capacitors (each value the design chose, voltage, RF current,
// dielectric, tolerance), its cores (AL, size, the turns of the wire fitting the hole) and, when the filter states the
// wire, the wire (diameter, length for every turn). Read from the RF report's as-built design and the stage's inputs.
import type { CatalogCore, Stage } from '../model';
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

/**
 * The filter's roles. `catalogCore`: the catalog core the filter picks (its coreId), or null when it picks none; a
 * bound core is then checked against that core's AL and hole, not the filter's own core boxes (which the design
 * ignores). A filter that names a catalog core that is gone or refused gets only the AL checked (a fail finding
 * on the RF page names the missing core).
 */
/**
 * A catalog toroid's outer diameter and height from its hole, le and Ae (null for a core with no hole given).
 * Source: the toroid core constants (cores.ts toroidEffective): le = π ln(D/d)/(1/d − 1/D) rises with D at a fixed
 * d, so D is found by bisection; then h = 2 Ae (1/d − 1/D)/ln²(D/d).
 */
export function toroidSection(
  c: CatalogCore,
): { outerDiameterM: number; innerDiameterM: number; heightM: number } | null {
  const d = c.innerDiameterM;
  if (!finite(d) || !finite(c.leM) || !finite(c.aeM2) || c.leM <= Math.PI * d) return null;
  const le = (D: number) => (Math.PI * Math.log(D / d)) / (1 / d - 1 / D);
  let lo = d;
  let hi = 2 * d;
  while (le(hi) < c.leM && hi < 1e3 * d) hi *= 2;
  if (le(hi) < c.leM) return null;
  for (let i = 0; i < 60; i++) {
    const mid = (lo + hi) / 2;
    if (le(mid) < c.leM) lo = mid;
    else hi = mid;
  }
  const D = (lo + hi) / 2;
  const ln = Math.log(D / d);
  return { outerDiameterM: D, innerDiameterM: d, heightM: (2 * c.aeM2 * (1 / d - 1 / D)) / (ln * ln) };
}

export function filterRoles(
  stage: Stage,
  s: RfStageResult,
  frequencyHz: number,
  catalogCore: CatalogCore | null = null,
): DesignRole[] {
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
    {
      key: 'capacitanceF',
      label: 'Capacitance',
      unit: 'F',
      op: 'eachOf',
      values,
      tolerance: tol,
      required: false,
      source: 'roles.capacitor-value',
      why: 'the values the filter was designed and analysed with',
    },
    {
      key: 'voltageV',
      label: 'Voltage',
      unit: 'V',
      op: 'min',
      limit: s.lpf.capacitorPeakV,
      required: true,
      source: 'line.standing-wave',
      why: 'the peak RF voltage at the worst SWR',
    },
    {
      key: 'rfCurrentA',
      label: 'RF current',
      unit: 'A',
      op: 'min',
      limit: rfA,
      required: false,
      source: 'line.standing-wave',
      why: 'the RMS current of the largest shunt capacitor at that voltage',
    },
    {
      key: 'dielectric',
      label: 'Dielectric',
      unit: '',
      op: 'oneOf',
      options: ['C0G', 'mica'],
      required: false,
      source: 'roles.rf-dielectric',
      why: 'a stable, low-loss dielectric',
    },
  ];
  if (tol > 0)
    capRules.push({
      key: 'toleranceFraction',
      label: 'Tolerance',
      unit: '%',
      op: 'max',
      limit: tol,
      required: false,
      source: 'roles.capacitor-value',
      why: 'the tolerance the filter’s yield was computed with',
    });
  const shown = caps.map((e) => e.capacitorPartsF.map((c) => f(c, 'F')).join(' ∥ ')).join('; ');
  out.push(
    role(
      `lpf-capacitors:${s.stageId}`,
      `Filter capacitors, ${s.stageName}`,
      'capacitor',
      s.stageId,
      caps.reduce((n, e) => n + e.capacitorPartsF.length, 0),
      capRules,
      `values: ${shown}`,
    ),
  );

  const inds = d.elements.filter((e) => e.kind === 'series-inductor');
  if (!inds.length) return out;
  const core = stage.lpf.core ?? null;
  const picks = !!stage.lpf.coreId;
  const wireM = core?.wireDiameterM ?? null;
  const maxTurns = Math.max(0, ...inds.map((e) => e.turns ?? 0));
  // d.coreAlHPerTurn2 is the catalog core's AL when the filter picks one (the design is computed with it)
  const alWhy = catalogCore
    ? `the AL of the catalog core ${catalogCore.name} the turns were computed with`
    : 'the AL the turns were computed with';
  const coreRules: RoleRule[] = [
    {
      key: 'alHPerTurn2',
      label: 'AL',
      unit: 'H',
      op: 'near',
      limit: d.coreAlHPerTurn2,
      tolerance: AL_TOLERANCE,
      required: true,
      source: 'roles.core-al',
      why: alWhy,
    },
  ];
  // the catalog describes a core by AL, Ae, le and its hole (no outer diameter or height); the filter's own boxes
  // only count when it picks no catalog core
  const size: [string, string, number | null | undefined][] = catalogCore
    ? [['innerDiameterM', 'Inner diameter', catalogCore.innerDiameterM]]
    : picks
      ? []
      : [
          ['outerDiameterM', 'Outer diameter', core?.outerDiameterM],
          ['innerDiameterM', 'Inner diameter', core?.innerDiameterM],
          ['heightM', 'Height', core?.heightM],
        ];
  const sizeWhy = catalogCore
    ? `the size of the catalog core ${catalogCore.name} the flux density and fit were computed with`
    : 'the size the flux density and fit were computed with';
  for (const [key, label, v] of size)
    if (finite(v))
      coreRules.push({
        key,
        label,
        unit: 'm',
        op: 'near',
        limit: v,
        tolerance: CORE_SIZE_TOLERANCE,
        required: false,
        source: 'roles.core-size',
        why: sizeWhy,
      });
  // Source: one layer of N turns of diameter d fits when N ≤ π (ID − d)/d (core.winding-fit), so ID ≥ N d/π + d
  if (finite(wireM) && maxTurns > 0)
    coreRules.push({
      key: 'innerDiameterM',
      label: 'Hole for the turns',
      unit: 'm',
      op: 'min',
      limit: (maxTurns * wireM) / Math.PI + wireM,
      required: false,
      source: 'core.winding-fit',
      why: `${maxTurns} turns of ${f(wireM, 'm')} wire in one layer`,
    });
  out.push(
    role(
      `lpf-cores:${s.stageId}`,
      `Filter cores, ${s.stageName}`,
      'core',
      s.stageId,
      inds.length,
      coreRules,
      `turns: ${inds.map((e) => e.turns).join(', ')}`,
    ),
  );

  if (finite(wireM)) {
    const wireRules: RoleRule[] = [
      {
        key: 'diameterM',
        label: 'Diameter',
        unit: 'm',
        op: 'near',
        limit: wireM,
        tolerance: WIRE_TOLERANCE,
        required: true,
        source: 'roles.wire',
        why: 'the wire the fit of the turns was checked with',
      },
    ];
    // the wire length needs the section: the filter's own boxes, or the catalog toroid's section from its hole, le, Ae
    const sec = catalogCore ? toroidSection(catalogCore) : picks ? null : core;
    const od = sec?.outerDiameterM;
    const id = sec?.innerDiameterM;
    const h = sec?.heightM;
    if (finite(od) && finite(id) && finite(h)) {
      // Source: one turn round a rectangular toroid section is 2 h + (OD − ID) (geometry),
      // plus two leads per inductor
      const turns = inds.reduce((n, e) => n + (e.turns ?? 0), 0);
      const lengthM = turns * (2 * h + (od - id)) + inds.length * LEAD_LENGTH_M;
      wireRules.push({
        key: 'lengthM',
        label: 'Length',
        unit: 'm',
        op: 'min',
        limit: lengthM,
        required: false,
        source: 'roles.wire',
        why: `${turns} turns round the core and the leads, one rig`,
      });
    }
    out.push(role(`lpf-wire:${s.stageId}`, `Filter inductor wire, ${s.stageName}`, 'wire', s.stageId, 1, wireRules));
  }
  return out;
}
