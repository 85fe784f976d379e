// RF checks page: the project's RF settings (spurious rule, SWR, antenna) and every RF result.
import type { FC } from 'hono/jsx';
import type { Project } from '../../src/core/model';
import type { EvaluationReport } from '../../src/core/evaluate';
import { FormErrors, type FieldState } from '../components/fields';
import { SpecField } from '../components/spec-fields';
import { stateFor, type Failed } from '../components/failed';
import { RfResults } from '../partials/rf-results';
import { EmptyState } from '../components/empty-state';
import { rfSettingsSpec, rfSettingsFormValues } from '../../src/core/spec/rf-settings';

const Settings: FC<{ project: Project; state: FieldState }> = ({ project, state }) => {
  const action = `/projects/${project.id}/rf/settings`;
  return (
    <section class="card">
      <h2>RF settings</h2>
      <form method="post" action={action} hx-post={action} hx-target="#rf" hx-swap="outerHTML">
        <input type="hidden" name="version" value={String(project.version)} />
        <FormErrors state={state} />
        <div class="row">
          <SpecField spec={rfSettingsSpec} k="spuriousRule" state={state} />
          <SpecField spec={rfSettingsSpec} k="evenHarmonicDbc" state={state} size={5} />
          <SpecField spec={rfSettingsSpec} k="worstSwr" state={state} size={4} />
        </div>
        <div class="row">
          <SpecField spec={rfSettingsSpec} k="antennaGainDbi" state={state} size={5} />
          <SpecField spec={rfSettingsSpec} k="feedlineLossDb" state={state} size={5} />
          <SpecField spec={rfSettingsSpec} k="groundReflection" state={state} />
          <SpecField spec={rfSettingsSpec} k="exposureDutyFactor" state={state} size={4} />
          <SpecField spec={rfSettingsSpec} k="exposureOnFraction" state={state} size={4} />
        </div>
        <button type="submit" class="primary">
          Save and recompute
        </button>
      </form>
    </section>
  );
};

/** What to add first when the RF checks have no final or no filter to work from. */
const RfNext: FC<{ project: Project }> = ({ project }) => {
  const pa = project.stages.some((s) => s.kind === 'final' && s.pa);
  const lpf = project.stages.some((s) => s.lpf);
  if (pa && lpf) return null;
  const missing = [
    pa ? null : 'a final amplifier stage with its PA settings',
    lpf ? null : 'a low-pass filter stage',
  ].filter(Boolean);
  return (
    <EmptyState label="RF stages missing">
      add {missing.join(' and ')} on the <a href={`/projects/${project.id}`}>Stages &amp; budget</a> page (add the
      stage, then open it).{pa ? '' : ' Until then the checks below work from the target power alone.'}
      {lpf ? '' : ' Without a filter the harmonics below fail.'}
    </EmptyState>
  );
};

export const RfBody: FC<{ project: Project; report: EvaluationReport; failed?: Failed; notice?: string }> = ({
  project,
  report,
  failed,
  notice,
}) => (
  <div id="rf">
    {notice ? (
      <p class="notice" role="status">
        {notice}
      </p>
    ) : null}
    <p class="caution-box">
      Transmit only within your licence. Predicted harmonic levels and exposure distances are estimates from idealised
      models: measure the finished transmitter into a dummy load with a suitable instrument before going on the air, and
      evaluate RF exposure as your local rules require.
    </p>
    <RfNext project={project} />
    <Settings project={project} state={stateFor('rf-settings', failed, () => rfSettingsFormValues(project))} />
    <p>
      <a href={`/projects/${project.id}/cores`}>Core catalog</a> ({(project.cores ?? []).length} cores): the cores the
      filter inductors and the output transformer are wound on.
    </p>
    <RfResults report={report.rf} />
    {report.rf.lpfStageId ? (
      <p>
        <a href={`/projects/${project.id}/stages/${report.rf.lpfStageId}/lpf.cir`} download>
          Download the as-built filter as a SPICE netlist
        </a>{' '}
        (AC analysis with 50 Ω terminations; runs in ngspice and other SPICE programs).
      </p>
    ) : null}
  </div>
);
