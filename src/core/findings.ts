// Findings: the result of every domain check, returned as values (never thrown).
import type { SourceKey } from './sources/registry';

export type Severity = 'ok' | 'caution' | 'fail';

/**
 * actionable: a design change clears it (counted in the verdict); standing: a caution always true of this kind of
 * station (spurious prediction, RF exposure, hot heatsinks), shown in its own block, never counted in the verdict.
 */
export type FindingKind = 'actionable' | 'standing';

export interface Finding {
  severity: Severity;
  rule: string; // short id, e.g. "regulator.headroom"
  subject: string; // what was checked, e.g. "13.8 V regulator"
  value: number | null; // measured / computed value (SI)
  limit: number | null; // the limit it was compared against (SI)
  unit: string; // unit symbol of value and limit ("V", "A", "°C", "dB", "")
  source: SourceKey; // registry key (src/core/sources/registry.ts); users see only the registry text
  message: string; // one sentence a builder understands
  /** Absent = actionable: only the producers of standing cautions set it. */
  kind?: FindingKind;
}

export const isStanding = (f: Finding): boolean => f.kind === 'standing';

/** Findings a design change can clear: the verdict, "Checks at a glance" and "Needs attention" count only these. */
export const actionable = (findings: readonly Finding[]): Finding[] => findings.filter((f) => !isStanding(f));

/** Standing cautions, once each (same rule and message). */
export function standingCautions(findings: readonly Finding[]): Finding[] {
  const seen = new Set<string>();
  return findings.filter((f) => {
    const key = `${f.rule}\u0000${f.message}`;
    if (!isStanding(f) || seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

const RANK: Record<Severity, number> = { fail: 0, caution: 1, ok: 2 };

/** Most severe first; stable within a severity. */
export function sortFindings(findings: readonly Finding[]): Finding[] {
  return findings
    .map((f, i) => ({ f, i }))
    .sort((a, b) => RANK[a.f.severity] - RANK[b.f.severity] || a.i - b.i)
    .map(({ f }) => f);
}

export function worstSeverity(findings: readonly Finding[]): Severity {
  return findings.reduce<Severity>((w, f) => (RANK[f.severity] < RANK[w] ? f.severity : w), 'ok');
}

export function finding(f: Finding): Finding {
  return f;
}
