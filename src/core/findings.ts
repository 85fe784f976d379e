// Findings: the result of every domain check, returned as values (never thrown).

export type Severity = 'ok' | 'caution' | 'fail';

export interface Finding {
  severity: Severity;
  rule: string; // short id, e.g. "regulator.headroom"
  subject: string; // what was checked, e.g. "13.8 V regulator"
  value: number | null; // measured / computed value (SI)
  limit: number | null; // the limit it was compared against (SI)
  unit: string; // unit symbol of value and limit ("V", "A", "°C", "dB", "")
  source: string; // standard, handbook or "common practice, no published source"
  message: string; // one sentence a builder understands
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
