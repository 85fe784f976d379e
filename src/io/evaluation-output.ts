// The evaluation as the CLI prints it: a readable table, or JSON with stable keys (documented in README).
import type { Project } from '../core/model';
import { MODES, MODE_LABELS } from '../core/model';
import type { EvaluationReport } from '../core/evaluate';
import { formatValue } from '../core/units';

export const EVALUATION_FORMAT = 'rigwright-evaluation';
export const EVALUATION_FORMAT_VERSION = 1;

export function evaluationJson(project: Project, report: EvaluationReport) {
  return {
    format: EVALUATION_FORMAT,
    formatVersion: EVALUATION_FORMAT_VERSION,
    project: { id: project.id, name: project.name, frequencyHz: project.frequencyHz, targetPowerW: project.targetPowerW, kits: project.kits },
    ...report,
  };
}

const pad = (s: string, n: number) => (s.length >= n ? s.slice(0, n) : s + ' '.repeat(n - s.length));
const lpad = (s: string, n: number) => (s.length >= n ? s : ' '.repeat(n - s.length) + s);

export function renderEvaluationText(project: Project, report: EvaluationReport): string {
  const out: string[] = [];
  out.push(`${project.name}`);
  out.push(`${formatValue(project.frequencyHz, 'Hz', 4)}, ${formatValue(project.targetPowerW, 'W')}, ${project.kits} kit(s)`);
  out.push('');
  out.push('Current budget (A delivered per rail)');
  out.push(`${pad('Rail', 40)}${lpad('Volts', 9)}${MODES.map((m) => lpad(MODE_LABELS[m], 13)).join('')}`);
  for (const r of report.budget.rails) {
    out.push(`${pad('  '.repeat(r.depth) + r.name, 40)}${lpad(formatValue(r.nominalV, 'V'), 9)}${MODES.map((m) => lpad(formatValue(r.outputA[m], 'A'), 13)).join('')}`);
  }
  out.push(`${pad('All sources, DC power', 49)}${MODES.map((m) => lpad(formatValue(report.budget.totalW[m], 'W'), 13)).join('')}`);
  out.push('');
  out.push(`Findings (${report.findings.length}, most severe first)`);
  for (const f of report.findings) out.push(`  [${f.severity.toUpperCase()}] ${f.subject}: ${f.message} (${f.source})`);
  return `${out.join('\n')}\n`;
}
