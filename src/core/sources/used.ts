// The sources one project's report rests on, each with the checks it backs: for the Sources page and the pack.
import type { Finding } from '../findings';
import type { SupplyReport } from '../power/report-types';
import type { RfReport } from '../rf/report';
import type { Project } from '../model';
import { RULE_SETS } from '../rules/rule-set';
import { SOURCES, type SourceKey, type SourceStatus } from './registry';

export interface SourceUse {
  key: SourceKey;
  text: string;
  status: SourceStatus;
  /** What it backs in this project: each finding's subject, or the rule set / a recommendation, once each. */
  checks: string[];
}

/** What a finding is about in the words the pages use: its subject, else its first sentence (never the rule key). */
function checkWords(f: Finding): string {
  if (f.subject) return f.subject;
  const first = f.message.split(/(?<=\.)\s/)[0];
  return first.length > 90 ? `${first.slice(0, 89)}…` : first;
}

const STATUS_ORDER: Record<SourceStatus, number> = { published: 0, analogy: 1, memory: 2, practice: 3, design: 4 };

/** Every registry source the report cites (findings, supply recommendations, the harmonic rule, the rule set). */
export function sourcesUsed(
  project: Project,
  report: { findings: Finding[]; supply: SupplyReport | null; rf: RfReport | null },
): SourceUse[] {
  const uses = new Map<SourceKey, Set<string>>();
  const add = (key: SourceKey, what: string) => {
    if (!uses.has(key)) uses.set(key, new Set());
    uses.get(key)!.add(what);
  };
  for (const f of report.findings) add(f.source, checkWords(f));
  for (const r of report.supply?.rails ?? [])
    for (const rec of r.recommendations) add(rec.source, `${r.railName}: ${rec.topic} recommendation`);
  if (report.rf?.harmonics) add(report.rf.harmonics.ruleSource, 'Harmonics at the antenna: the required attenuation');
  const rs = RULE_SETS[project.rf.spuriousRule];
  for (const k of rs.sources) add(k, `Rule set: ${rs.label}`);
  return [...uses.entries()]
    .map(([key, checks]) => ({ key, text: SOURCES[key].text, status: SOURCES[key].status, checks: [...checks] }))
    .sort((a, b) => STATUS_ORDER[a.status] - STATUS_ORDER[b.status] || a.key.localeCompare(b.key));
}

export const STATUS_WORDS: Record<SourceStatus, string> = {
  published: 'Published source',
  analogy: 'Borrowed by analogy',
  memory: 'From memory, not confirmed',
  practice: 'Common practice, no published source',
  design: 'Your design and entered data',
};
