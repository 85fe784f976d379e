// The PA's duty-averaged dissipation ahead of the RF evaluation, for the enclosure's heat budget: the heat does not
// depend on the air around the heatsink, so the inside temperature can be found before the checks that use it.
import type { Project } from '../model';
import { evaluatePa } from '../rf';
import type { RfContext } from '../rf/evaluate-rf';
import type { PaHeat } from '../power/heat-budget';

const finite = (x: number) => (Number.isFinite(x) ? x : 0);

/**
 * Each final stage's duty-averaged dissipation, all devices (W), from the RF evaluation's PA model and rail voltages.
 */
type Rails = Pick<RfContext, 'paRailV' | 'paRailMaxV' | 'paRailHotV' | 'paRailLowV' | 'paRailBattery'>;
export function paHeatAhead(project: Project, ctx: Rails): PaHeat[] {
  return project.stages.flatMap((st) => {
    if (st.kind !== 'final' || !st.pa) return [];
    const id = st.pa.railId;
    const r = evaluatePa(st.pa, finite(ctx.paRailV[id] ?? NaN), project, st.name, {
      maxRailV: ctx.paRailMaxV?.[id], hotRailV: ctx.paRailHotV?.[id], lowRailV: ctx.paRailLowV?.[id],
      // no SWR circle: the heat is the design load's (the stress sweep is the RF evaluation's, through the filter)
      source: ctx.paRailBattery?.[id] ? 'battery' : 'mains',
      frequencyHz: project.frequencyHz,
    });
    const t = r.thermal;
    if (r.refused || !t || !(t.dissipationPerDeviceW > 0)) return [];
    // per-device average times the device count (dissipationTotalW / dissipationPerDeviceW)
    return [{ name: st.name, averageW: t.averagePerDeviceW * (t.dissipationTotalW / t.dissipationPerDeviceW) }];
  });
}
