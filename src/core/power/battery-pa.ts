// The PA's output on a battery's discharge curve: on the plateau it runs on for most of the charge, and at the end
// voltage. The RF model computed the output at the PA's rail voltage and at the lowest key-down voltage; the plateau
// figure follows the same load line.
import type { Finding } from '../findings';
import type { Project } from '../model';
import type { RfReport } from '../rf';
import type { SupplyReport } from './report-types';
import { outputAtRailW } from './recommended-pa';

/** Attach the PA's output at the loaded plateau and at the loaded end voltage to each battery rail feeding a PA. */
export function withBatteryPa(supply: SupplyReport | null, project: Project, rf: RfReport): SupplyReport | null {
  if (!supply) return supply;
  const findings: Finding[] = [];
  const target = project.targetPowerW;
  const rails = supply.rails.map((r) => {
    if (r.kind !== 'battery' || !r.curve) return r;
    const stage = project.stages.find((s) => s.pa && s.pa.railId === r.railId);
    const pa = stage ? rf.stages.find((st) => st.stageId === stage.id)?.pa : undefined;
    if (!stage || !pa || pa.refused) return r;
    const plateauOutputW = outputAtRailW(pa.outputW, pa.railV, pa.saturationV, r.curve.loadedPlateauV);
    if (!Number.isFinite(plateauOutputW)) return r;
    const out = {
      stageName: stage.name, plateauRailV: r.curve.loadedPlateauV, plateauOutputW,
      endRailV: pa.lowRailV, endOutputW: pa.lowOutputW,
    };
    // 1 dB, as for the PA's own target check
    const dbOff = target > 0 ? 10 * Math.log10(Math.max(plateauOutputW, 1e-12) / target) : 0;
    findings.push({
      severity: Math.abs(dbOff) > 1 ? 'caution' : 'ok', rule: 'battery.pa-output', subject: stage.name,
      value: plateauOutputW, limit: target, unit: 'W', source: 'supply.battery-pa',
      message: `For most of the charge (${r.railName} on its ${r.curve.chemistry} plateau, ` +
        `${out.plateauRailV.toFixed(2)} V under key-down) ${stage.name} gives about ${plateauOutputW.toFixed(1)} W ` +
        `(${dbOff.toFixed(1)} dB from the ${target} W target); near the end (${out.endRailV.toFixed(2)} V) ` +
        `about ${out.endOutputW.toFixed(1)} W.`,
    });
    return { ...r, pa: out };
  });
  return { ...supply, rails, findings: [...supply.findings, ...findings] };
}
