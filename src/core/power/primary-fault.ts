// The primary fuse against each winding's fault reflected to the primary.
import type { Finding } from '../findings';
import type { FuseSheet, PrimaryFaultCheck, RailReport, RectifiedRailReport } from './report-types';
import { faultCheck } from './fault';
import { faultWords } from './winding-fuse';

/** Rectified rail reports that carry a winding fuse report. */
export function railsReported(reports: Map<string, RailReport>): RectifiedRailReport[] {
  return [...reports.values()].filter(
    (r): r is RectifiedRailReport => r.kind === 'rectified' && r.windingFuse !== null,
  );
}

/**
 * The smallest winding fault (shorted reservoir, low mains) seen on the primary: I_p = I_s x N_s/N_p, the turns
 * ratio taken as V_NL / V_mains. Source: ideal-transformer current ratio (textbook); magnetising current and the
 * other windings' load are not added, so the primary current is a lower bound. The primary fuse is of the sheet chosen
 * for it (IEC 60127-2; T3 when none is chosen, what the recommendation names).
 */
export function primaryFaultChecks(
  rails: RectifiedRailReport[],
  primaryFuseA: number,
  sheet: FuseSheet = 'T3',
): PrimaryFaultCheck[] {
  const out: PrimaryFaultCheck[] = [];
  for (const r of rails) {
    const wf = r.windingFuse!;
    const reflectedA = wf.outputShortLowA * wf.turnsRatio;
    if (!(reflectedA > 0)) continue;
    out.push({ windingName: wf.windingName, reflectedA, check: faultCheck(reflectedA, primaryFuseA, sheet) });
  }
  return out;
}

export function primaryFaultFindings(checks: PrimaryFaultCheck[], reports: Map<string, RailReport>): Finding[] {
  const byWinding = new Map(railsReported(reports).map((r) => [r.windingFuse!.windingName, r.windingFuse!]));
  return checks.map((c) => {
    const base = {
      rule: 'fuse.primary-fault',
      subject: 'Primary fuse',
      value: c.check.multiple,
      limit: 2.1,
      unit: 'x In',
      source: 'supply.fuse-clearing' as const,
    };
    const what = `A shorted reservoir on the ${c.windingName} reflects to ${faultWords(c.check)} on the primary`;
    if (c.check.clears)
      return {
        ...base,
        value: c.check.latestS,
        limit: c.check.allowedS,
        unit: 's',
        severity: 'ok' as const,
        message: `${what}, within ${c.check.allowedS} s.`,
      };
    const wf = byWinding.get(c.windingName);
    const guarded = wf !== undefined && wf.fittedA !== null && wf.check !== null && wf.check.clears;
    return guarded
      ? {
          ...base,
          severity: 'caution' as const,
          message: `${what}; the fitted ${c.windingName} fuse clears it instead, so the primary fuse is only a ` +
            `backup there.`,
        }
      : {
          ...base,
          severity: 'fail' as const,
          message: `${what}, and no fitted winding fuse clears it: the winding can burn. Fit a fuse in the ` +
            `${c.windingName} lead before the rectifier.`,
        };
  });
}
