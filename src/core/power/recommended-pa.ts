// The PA's output at low mains with the recommended winding: the recommendation re-simulates the rail at low mains,
// key-down (checkTroughV); the PA's output follows its load line from the low-mains figure the RF model computed.
import type { Finding } from '../findings';
import type { Project } from '../model';
import type { RfReport } from '../rf';
import type { SupplyReport } from './report-types';

/**
 * Output at another rail voltage on the same load line: P2 = P1 ((V2 - Vsat) / (V1 - Vsat))^2.
 * Source: PA load line P = (V - Vsat)^2 / (2 R) (textbook; the RF model's own relation), so P scales with the square
 * of the swing. Rds(on) is taken as the same at both voltages.
 */
export function outputAtRailW(outputW: number, railV: number, saturationV: number, newRailV: number): number {
  const swing = railV - saturationV;
  const newSwing = Math.max(0, newRailV - saturationV);
  if (!(swing > 0) || !(outputW >= 0)) return NaN;
  return outputW * (newSwing / swing) ** 2;
}

/** Attach the PA's low-mains output with the recommended winding to each winding recommendation of a PA rail. */
export function withRecommendedPa(
  supply: SupplyReport | null,
  project: Project,
  rf: RfReport,
): { supply: SupplyReport | null; findings: Finding[] } {
  if (!supply) return { supply, findings: [] };
  const findings: Finding[] = [];
  const target = project.targetPowerW;
  const rails = supply.rails.map((r) => {
    if (r.kind !== 'rectified' || !r.winding || r.winding.checkTroughV === null) return r;
    const stage = project.stages.find((s) => s.pa && s.pa.railId === r.railId);
    const pa = stage ? rf.stages.find((st) => st.stageId === stage.id)?.pa : undefined;
    if (!stage || !pa || pa.refused) return r;
    const outputW = outputAtRailW(pa.lowOutputW, pa.lowRailV, pa.saturationV, r.winding.checkTroughV);
    if (!Number.isFinite(outputW)) return r;
    const paAtCheck = { stageName: stage.name, railV: r.winding.checkTroughV, outputW, fittedOutputW: pa.lowOutputW };
    // 1 dB, as for the PA's own low-supply check
    const dbBelow = target > 0 ? 10 * Math.log10(target / Math.max(outputW, 1e-12)) : 0;
    findings.push({
      severity: dbBelow > 1 ? 'caution' : 'ok',
      rule: 'transformer.recommended-pa',
      subject: r.winding.windingName,
      value: outputW,
      limit: target,
      unit: 'W',
      source: 'supply.recommended-pa',
      message: `With the recommended ${r.winding.standardRatedV ?? '?'} V ${r.winding.ratedA.toFixed(2)} A winding ` +
        `(sized for ${
          supply.choices?.transformerSizing === 'tune-up'
            ? 'tune-up, a continuous carrier'
            : `CW at ${Math.round(supply.keyingDuty * 100)} % duty`
        }) the ${r.railName} falls to ${r.winding.checkTroughV.toFixed(1)} V at low mains, key-down, and ` +
        `${stage.name} gives about ${outputW.toFixed(1)} W (${pa.lowOutputW.toFixed(1)} W with the fitted winding; ` +
        `target ${target} W).`,
    });
    return { ...r, winding: { ...r.winding, paAtCheck } };
  });
  // the transformer's copy of each winding recommendation carries the same figure
  const byWinding = new Map(
    rails.flatMap((r) =>
      r.kind === 'rectified' && r.winding?.paAtCheck ? [[r.winding.windingId, r.winding.paAtCheck] as const] : [],
    ),
  );
  const transformers = supply.transformers.map((t) => ({
    ...t,
    windings: t.windings.map((w) => (byWinding.has(w.windingId) ? { ...w, paAtCheck: byWinding.get(w.windingId) } : w)),
  }));
  return { supply: { ...supply, rails, transformers, findings: [...supply.findings, ...findings] }, findings };
}
