// Per-version evaluation cache: (project id, version) -> report. Every page, partial and download of a project at
// one version shows the same report, so it is computed once. The version is the one read from the database with the
// project, so a write by another app process (a new version) is never answered from here. The key also carries a
// fingerprint of the project's content, checked on every hit: a project recreated under an old id and version, or
// two databases in one process, can never share a report by accident.
import { createHash } from 'node:crypto';
import type { Project } from '../../core/model';
import { evaluate, type EvaluationReport } from '../../core/evaluate';
import { Lru, type LruLimits } from './lru';

/** Defaults: about 150 kB of report JSON for the club demo, 400 kB for a 500-line parts list. */
export const REPORT_CACHE_LIMITS: LruLimits = { maxEntries: 64, maxBytes: 48 * 1024 * 1024 };

/** Content fingerprint of a project (its JSON, hashed). */
export function projectFingerprint(project: Project): string {
  return createHash('sha1').update(JSON.stringify(project)).digest('base64url');
}

export class ReportCache {
  private readonly lru: Lru<{ fingerprint: string; report: EvaluationReport }>;
  hits = 0;
  misses = 0;

  constructor(limits: LruLimits = REPORT_CACHE_LIMITS) {
    this.lru = new Lru(limits);
  }

  /** The report of this project at its version: from the cache, or evaluated and kept. */
  report(project: Project): EvaluationReport {
    const key = `${project.id}\u0000${project.version}`;
    const fingerprint = projectFingerprint(project);
    const held = this.lru.get(key);
    if (held && held.fingerprint === fingerprint) {
      this.hits++;
      return held.report;
    }
    this.misses++;
    const report = evaluate(project);
    // approximate size: UTF-16 string of its JSON (twice its length in bytes) is close to the heap it holds
    this.lru.set(key, { fingerprint, report }, 2 * JSON.stringify(report).length);
    return report;
  }

  /** The cached report when there is one for this exact project, else undefined (nothing is evaluated). */
  peek(project: Project): EvaluationReport | undefined {
    const held = this.lru.get(`${project.id}\u0000${project.version}`);
    return held && held.fingerprint === projectFingerprint(project) ? held.report : undefined;
  }

  get size(): number {
    return this.lru.size;
  }

  get bytes(): number {
    return this.lru.bytes;
  }

  clear(): void {
    this.lru.clear();
  }
}

/** The process's cache: reports are pure functions of the project, so one bounded cache serves every app. */
export const reportCache = new ReportCache();

/** evaluate(project), through the process's per-version cache. Callers must not change the report. */
export const evaluateCached = (project: Project): EvaluationReport => reportCache.report(project);
