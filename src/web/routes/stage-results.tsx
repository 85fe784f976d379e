// The computed results shown under a stage's own forms: its RF findings and where the detail lives.
import type { Project, Stage } from '../../core/model';
import { evaluateCached as evaluate } from '../cache/reports';
import { RfFindings } from '../../../views/partials/rf-results';

export function stageResults(p: Project, s: Stage) {
  if (s.kind !== 'final' && s.kind !== 'lpf' && s.kind !== 'tr') return null;
  const result = evaluate(p).rf.stages.find((r) => r.stageId === s.id);
  if (!result) return null;
  return (
    <section class="card">
      <h2>Checks for this stage</h2>
      <RfFindings findings={result.findings} />
      <p>
        Full results (tables, filter response, harmonics, exposure): <a href={`/projects/${p.id}/rf`}>RF checks</a>.
      </p>
    </section>
  );
}
