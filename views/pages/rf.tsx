// RF checks page: the project's RF settings (spurious rule, SWR, antenna) and every RF result.
import type { FC } from 'hono/jsx';
import type { Project } from '../../src/core/model';
import type { EvaluationReport } from '../../src/core/evaluate';
import { Field, Select, Check, FormErrors, type FieldState } from '../components/fields';
import { stateFor, type Failed } from '../components/failed';
import { RfResults } from '../partials/rf-results';
import { percentText } from '../../src/core/spec/input-text';

export function rfSettingsValues(p: Project): Record<string, string> {
  const r = p.rf;
  return {
    spuriousRule: r.spuriousRule,
    evenHarmonic: String(r.evenHarmonicDbc),
    worstSwr: String(r.worstSwr),
    antennaGain: String(r.antennaGainDbi),
    feedlineLoss: String(r.feedlineLossDb),
    groundReflection: r.groundReflection ? 'true' : '',
    dutyFactor: percentText(r.exposureDutyFactor),
    onFraction: percentText(r.exposureOnFraction),
  };
}

const Settings: FC<{ project: Project; state: FieldState }> = ({ project, state }) => {
  const action = `/projects/${project.id}/rf/settings`;
  return (
    <section class="card">
      <h2>RF settings</h2>
      <form method="post" action={action} hx-post={action} hx-target="#rf" hx-swap="outerHTML">
        <input type="hidden" name="version" value={String(project.version)} />
        <FormErrors state={state} />
        <div class="row">
          <Select
            name="spuriousRule"
            label="Spurious-emission rule"
            state={state}
            options={[
              ['us-97-307', 'US 47 CFR 97.307(d): 43 dB below the fundamental'],
              ['itu-app3', 'ITU Radio Regulations Appendix 3 (amateur, below 30 MHz)'],
            ]}
          />
          <Field name="evenHarmonic" label="2nd-harmonic balance residual" unit="dBc" state={state} size={5} hint="push-pull imbalance, e.g. −30" />
          <Field name="worstSwr" label="Worst-case SWR" state={state} size={4} />
        </div>
        <div class="row">
          <Field name="antennaGain" label="Antenna gain" unit="dBi" state={state} size={5} />
          <Field name="feedlineLoss" label="Feedline loss" unit="dB" state={state} size={5} />
          <Check name="groundReflection" label="Include ground reflection (×2.56)" state={state} />
          <Field name="dutyFactor" label="Mode duty factor" unit="%" state={state} size={4} hint="CW 40 %" />
          <Field name="onFraction" label="Worst share of the averaging time on the air" unit="%" state={state} size={4} />
        </div>
        <button type="submit" class="primary">
          Save and recompute
        </button>
      </form>
    </section>
  );
};

export const RfBody: FC<{ project: Project; report: EvaluationReport; failed?: Failed; notice?: string }> = ({ project, report, failed, notice }) => (
  <div id="rf">
    {notice ? (
      <p class="notice" role="status">
        {notice}
      </p>
    ) : null}
    <p class="caution-box">
      Transmit only within your licence. Predicted harmonic levels and exposure distances are estimates from idealised models: measure the finished
      transmitter into a dummy load with a suitable instrument before going on the air, and evaluate RF exposure as your local rules require.
    </p>
    <Settings project={project} state={stateFor('rf-settings', failed, () => rfSettingsValues(project))} />
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
