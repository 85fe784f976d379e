// Stage page: name, kind, notes, loads per rail and mode, and the kind's own data (PA, filter, relay).
import type { FC } from 'hono/jsx';
import type { Project, Stage } from '../../src/core/model';
import { MODES, MODE_LABELS, STAGE_KINDS, STAGE_KIND_LABELS } from '../../src/core/model';
import { Field, Select, Check, FormErrors, type FieldState } from '../components/fields';
import { stateFor, type Failed } from '../components/failed';
import { stageValues, paValues, lpfValues, relayValues } from '../../src/web/stage-forms';

const Hidden: FC<{ version: number }> = ({ version }) => <input type="hidden" name="version" value={String(version)} />;

interface Props {
  project: Project;
  stage: Stage;
  failed?: Failed;
  notice?: string;
  results?: unknown;
}

const FormShell: FC<{ project: Project; stage: Stage; path: string; title: string; state: FieldState; children?: unknown; submit: string }> = ({ project, stage, path, title, state, children, submit }) => {
  const action = `/projects/${project.id}/stages/${stage.id}${path}`;
  return (
    <section class="card">
      <h2>{title}</h2>
      <form method="post" action={action} hx-post={action} hx-target="#stage" hx-swap="outerHTML">
        <Hidden version={project.version} />
        <FormErrors state={state} />
        {children as never}
        <button type="submit" class="primary">
          {submit}
        </button>
      </form>
    </section>
  );
};

export const StageBody: FC<Props> = ({ project, stage, failed, notice, results }) => {
  const railOptions: [string, string][] = project.supply.rails.map((r) => [r.id, r.name]);
  const general = stateFor('stage', failed, () => stageValues(stage));
  const loadRows = Math.max(stage.loads.length + 1, 1);
  return (
    <div id="stage">
      <p>
        <a href={`/projects/${project.id}`}>← All stages and the budget</a>
      </p>
      {notice ? (
        <p class="notice" role="status">
          {notice}
        </p>
      ) : null}
      <FormShell project={project} stage={stage} path="" title={`${stage.name} (${STAGE_KIND_LABELS[stage.kind]})`} state={general} submit="Save stage">
        <div class="row">
          <Field name="name" label="Name" state={general} size={36} />
          <Select name="kind" label="Kind" state={general} options={STAGE_KINDS.map((k) => [k, STAGE_KIND_LABELS[k]])} hint="A new kind starts from typical data; the old kind's PA, filter or relay data is dropped" />
          <Field name="dissipation" label="Heat dissipated (empty = rail V × key-down current)" unit="W" state={general} size={8} />
        </div>
        <label class="field wide">
          <span class="label">Notes</span>
          <textarea name="notes" rows={2}>
            {general.values.notes ?? ''}
          </textarea>
        </label>
        <h3>Current drawn from each rail</h3>
        {railOptions.length === 0 ? (
          <p class="hint">
            This project has no rails yet: add them on the <a href={`/projects/${project.id}/supply`}>Supply</a> page first.
          </p>
        ) : (
          <table class="grid compact">
            <thead>
              <tr>
                <th>Rail</th>
                {MODES.map((m) => (
                  <th>{MODE_LABELS[m]}</th>
                ))}
              </tr>
            </thead>
            <tbody>
              {Array.from({ length: loadRows }, (_, i) => (
                <tr>
                  <td>
                    <Select name={`rail${i}`} label="Rail" state={general} options={[['', i < stage.loads.length ? '(remove this load)' : '(add a load…)'], ...railOptions]} />
                  </td>
                  {MODES.map((m) => (
                    <td>
                      <Field name={`l${i}_${m}`} label={`${MODE_LABELS[m]} current`} state={general} size={8} />
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        )}
        <p class="hint">Currents accept 350 mA, 350m, 0.35 or 1.2 A. Choose "(remove this load)" to drop a row.</p>
      </FormShell>
      {stage.kind === 'final' && stage.pa ? <PaForm project={project} stage={stage} state={stateFor('pa', failed, () => paValues(stage.pa!))} rails={railOptions} /> : null}
      {stage.kind === 'lpf' && stage.lpf ? <LpfForm project={project} stage={stage} state={stateFor('lpf', failed, () => lpfValues(stage.lpf!))} /> : null}
      {stage.kind === 'tr' && stage.relay ? <RelayForm project={project} stage={stage} state={stateFor('relay', failed, () => relayValues(stage.relay!))} rails={railOptions} /> : null}
      {results as never}
    </div>
  );
};

const PaForm: FC<{ project: Project; stage: Stage; state: FieldState; rails: [string, string][] }> = ({ project, stage, state, rails }) => (
  <FormShell project={project} stage={stage} path="/pa" title="Final amplifier data" state={state} submit="Save PA data">
    <div class="row">
      <Select name="topology" label="Topology" state={state} options={[['push-pull', 'Push-pull'], ['single-ended', 'Single-ended']]} />
      <Select name="amplifierClass" label="Class" state={state} options={[['B', 'B'], ['C', 'C'], ['D', 'D (switching)'], ['E', 'E (switching)']]} />
      <Select name="railId" label="Fed from rail" state={state} options={rails} />
      <Field name="devices" label="Devices" state={state} size={3} />
    </div>
    <div class="row">
      <Field name="saturation" label="Saturation voltage" unit="V" state={state} size={6} hint="or give Rds(on)" />
      <Field name="rdsOn" label="Rds(on)" unit="Ω" state={state} size={6} />
      <Field name="turnsRatio" label="Output turns ratio (sec : full pri)" state={state} size={6} hint="empty = design it for the target power" />
      <Field name="load" label="Load" unit="Ω" state={state} size={5} />
      <Field name="efficiency" label="Drain efficiency" unit="%" state={state} size={5} hint="empty = default for the class" />
    </div>
    <div class="row">
      <Field name="vdsMax" label="Device V(BR)DSS" unit="V" state={state} size={6} />
      <Field name="idMax" label="Device max drain current" unit="A" state={state} size={6} />
      <Field name="biasIdle" label="Bias preset max idle current" unit="A" state={state} size={6} />
      <Field name="referencePower" label="Compare with" unit="W" state={state} size={6} />
    </div>
    <div class="row">
      <Field name="thetaJc" label="θjc" unit="°C/W" state={state} size={5} />
      <Field name="thetaCs" label="θcs (washer, grease)" unit="°C/W" state={state} size={5} />
      <Field name="thetaSa" label="Heatsink θsa" unit="°C/W" state={state} size={5} hint="empty = tell me what I need" />
      <Field name="tjMax" label="Tj max" unit="°C" state={state} size={5} />
    </div>
  </FormShell>
);

const LpfForm: FC<{ project: Project; stage: Stage; state: FieldState }> = ({ project, stage, state }) => (
  <FormShell project={project} stage={stage} path="/lpf" title="Low-pass filter design" state={state} submit="Save and redesign">
    <div class="row">
      <Select name="response" label="Response" state={state} options={[['chebyshev', 'Chebyshev (equal ripple)'], ['butterworth', 'Butterworth (maximally flat)']]} />
      <Field name="ripple" label="Ripple" unit="dB" state={state} size={5} hint="0.01–0.5 dB" />
      <Field name="order" label="Order" state={state} size={3} hint="3, 5, 7 or 9" />
      <Select name="layout" label="Form" state={state} options={[['capacitor-input', 'Capacitor input (π)'], ['inductor-input', 'Inductor input (T)']]} />
      <Field name="cutoff" label="Cutoff" unit="Hz" state={state} size={9} hint="empty = chosen from the band" />
    </div>
    <div class="row">
      <Select name="capacitorSeries" label="Capacitor values" state={state} options={[['E12', 'E12'], ['E24', 'E24']]} />
      <Check name="allowParallelPairs" label="Allow a parallel pair when closer" state={state} />
      <Field name="coreName" label="Core" state={state} size={30} />
      <Field name="coreAl" label="Core AL" unit="H/t²" state={state} size={7} hint="e.g. 4.9n" />
    </div>
    <div class="row">
      <Field name="inductorQ" label="Inductor Q" state={state} size={5} />
      <Field name="capacitorQ" label="Capacitor Q" state={state} size={5} />
      <Field name="capacitorTolerance" label="C tolerance" unit="%" state={state} size={4} />
      <Field name="inductorTolerance" label="L tolerance" unit="%" state={state} size={4} />
      <Field name="trials" label="Monte Carlo trials" state={state} size={6} />
      <Field name="seed" label="Seed" state={state} size={6} />
    </div>
  </FormShell>
);

const RelayForm: FC<{ project: Project; stage: Stage; state: FieldState; rails: [string, string][] }> = ({ project, stage, state, rails }) => (
  <FormShell project={project} stage={stage} path="/relay" title="T/R relay data" state={state} submit="Save relay data">
    <div class="row">
      <Field name="contactCarry" label="Contact carry" unit="A" state={state} size={5} />
      <Field name="contactSwitch" label="Contact switching" unit="A" state={state} size={5} />
      <Field name="contactV" label="Contact voltage rating" unit="V" state={state} size={5} />
      <Field name="rfV" label="RF peak voltage rating" unit="V" state={state} size={5} hint="empty = use the contact rating" />
      <Field name="dcSwitched" label="DC current its contacts switch" unit="A" state={state} size={5} />
    </div>
    <div class="row">
      <Field name="coil" label="Coil current" unit="A" state={state} size={6} />
      <Select name="coilRailId" label="Coil rail" state={state} options={[['', '(not on a rail here)'], ...rails]} />
      <Check name="coilReceive" label="energised in receive" state={state} />
      <Check name="coilKeyUp" label="in TX key-up" state={state} />
      <Check name="coilKeyDown" label="in TX key-down" state={state} />
    </div>
    <div class="row">
      <Field name="isolation" label="Isolation at the operating frequency" unit="dB" state={state} size={4} />
      <Select name="position" label="Position" state={state} options={[['after-lpf', 'After the low-pass filter'], ['before-lpf', 'Before the low-pass filter']]} />
      <Field name="rxMax" label="Receiver max input" unit="W" state={state} size={6} />
    </div>
    <div class="row">
      <Field name="operate" label="Operate time" unit="s" state={state} size={6} />
      <Field name="release" label="Release time" unit="s" state={state} size={6} />
      <Field name="bounce" label="Bounce time" unit="s" state={state} size={6} />
      <Field name="txDelay" label="Transmit delay after relay drive" unit="s" state={state} size={6} />
      <Field name="wpm" label="Keying speed" unit="WPM" state={state} size={4} />
    </div>
  </FormShell>
);
