// Starting rails for a stage's role: a new final amplifier feeds from the highest-voltage rail that is not a
// regulator's raw input, a relay coil from the signal rail. Pure; the builder changes either on the stage page.
import type { Project, Rail, RectifierTopology } from './model';
import { regulatorOutputV } from './power/regulator';

/** Diodes conducting in series with the load in each half-cycle of a capacitor-input rectifier. */
const CONDUCTING_DIODES: Record<RectifierTopology, number> = { bridge: 2, 'centre-tap': 1, 'half-wave': 1 };

/**
 * DC estimate of a capacitor-input rectified rail from its winding's rated RMS voltage, V (no ripple, no regulation).
 * Source: REFERENCE-VALUES §4.1 (textbook): secondary peak = sqrt(2) Vrms; at the capacitor, minus the conducting
 * diode drops (two in a bridge, one in a centre-tap or half-wave rectifier).
 */
export function rectifiedEstimateV(ratedVrms: number, topology: RectifierTopology, diodeDropV: number): number {
  return Math.SQRT2 * ratedVrms - CONDUCTING_DIODES[topology] * diodeDropV;
}

/** Nominal voltage of a rail for choosing defaults, V; NaN when it cannot be told (a rail with no winding). */
export function railEstimateV(rail: Rail, project: Pick<Project, 'supply'>): number {
  if (rail.kind === 'battery') return rail.nominalV;
  if (rail.kind === 'regulated') return regulatorOutputV(rail.setting, rail.quiescentA);
  const winding = project.supply.transformers.flatMap((t) => t.windings).find((w) => w.id === rail.windingId);
  return winding ? rectifiedEstimateV(winding.ratedVrms, rail.topology, rail.diodeDropV) : NaN;
}

/** Ids of the rails that feed a regulator. */
function regulatorInputs(project: Pick<Project, 'supply'>): Set<string> {
  return new Set(project.supply.rails.flatMap((r) => (r.kind === 'regulated' ? [r.parentId] : [])));
}

const byVoltage = (project: Pick<Project, 'supply'>, rails: Rail[]) =>
  rails.map((r) => ({ r, v: railEstimateV(r, project) })).filter((x) => Number.isFinite(x.v));

/**
 * Rail for a new final amplifier: the highest-voltage rail that does not feed a regulator (a rectified rail that
 * feeds one is the regulator's raw input, sized for its headroom, not for a PA). A battery is the exception: it
 * is the station's source and a PA commonly runs straight from it even when it also feeds a regulator. Among
 * `preferIds` (the stage's own load rails) when one of them qualifies. Null when no rail qualifies.
 */
export function paDefaultRailId(project: Pick<Project, 'supply'>, preferIds: readonly string[] = []): string | null {
  const inputs = regulatorInputs(project);
  const candidates = byVoltage(project, project.supply.rails.filter((r) => r.kind === 'battery' || !inputs.has(r.id)));
  const preferred = candidates.filter((c) => preferIds.includes(c.r.id));
  const pool = preferred.length ? preferred : candidates;
  const best = pool.reduce<(typeof pool)[number] | null>((a, b) => (a === null || b.v > a.v ? b : a), null);
  return best?.r.id ?? null;
}

/** Lowest coil voltage the signal rail must have, V. Common practice, no published source (5 V relay coils). */
export const SIGNAL_RAIL_MIN_V = 5;

/**
 * Rail for a relay coil: the signal rail, taken as the regulated rail with the lowest voltage of at least 5 V.
 * Without one, the lowest-voltage rail of at least 5 V that does not feed a regulator (a battery counts). Null when
 * none qualifies (the coil then has no rail, which the budget reports as a failure while it draws current).
 */
export function relayCoilDefaultRailId(project: Pick<Project, 'supply'>): string | null {
  const inputs = regulatorInputs(project);
  const lowest = (rails: Rail[]) =>
    byVoltage(project, rails)
      .filter((x) => x.v >= SIGNAL_RAIL_MIN_V)
      .reduce<{ r: Rail; v: number } | null>((a, b) => (a === null || b.v < a.v ? b : a), null)?.r.id ?? null;
  const rails = project.supply.rails;
  return (
    lowest(rails.filter((r) => r.kind === 'regulated')) ??
    lowest(rails.filter((r) => r.kind === 'battery' || !inputs.has(r.id)))
  );
}
