// Stage page: name, kind, notes, loads per rail and mode, and the kind's own data (PA, filter, relay).
import type { FC } from 'hono/jsx';
import type { Project, Stage } from '../../src/core/model';
import { MODES, MODE_LABELS, STAGE_KINDS, STAGE_KIND_LABELS } from '../../src/core/model';
import { Field, Select, Check, FormErrors, type FieldState } from '../components/fields';
import { stateFor, type Failed } from '../components/failed';
import { formValues, lpfSpec, loadSpec, paSpec, relaySpec, stageSpec } from '../../src/core/spec';
import { loadCurrentFields, loadFormName, stageFormValues } from '../../src/core/spec/stage';
import { SpecField } from '../components/spec-fields';
import { REMOVE_LOAD } from '../../src/core/edits/stage-loads';

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
  const general = stateFor('stage', failed, () => stageFormValues(stage));
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
          <SpecField spec={stageSpec} k="name" label="Name" state={general} size={36} />
          <Select name="kind" label="Kind" state={general} options={STAGE_KINDS.map((k) => [k, STAGE_KIND_LABELS[k]])} hint="A new kind starts from typical data. A change that would drop PA, filter or relay data asks first." />
          <SpecField spec={stageSpec} k="dissipationW" state={general} size={8} />
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
                  <th>
                    {MODE_LABELS[m]} ({loadCurrentFields[`currentA.${m}`].display.symbol})
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {Array.from({ length: loadRows }, (_, i) => (
                <tr>
                  <td>
                    <Select name={loadFormName(i, 'railId')} label="Rail" state={general} options={[i < stage.loads.length ? [REMOVE_LOAD, '(remove this load)'] : ['', '(add a load…)'], ...railOptions]} />
                  </td>
                  {MODES.map((m) => (
                    <td>
                      <SpecField spec={loadSpec} k={`currentA.${m}`} name={loadFormName(i, `currentA.${m}`)} state={general} size={8} />
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        )}
        <p class="hint">Currents are in mA: 350 means 350 mA; 1.2 A, 350m or 0.35 A are read as written. Choose "(remove this load)" to drop a row.</p>
      </FormShell>
      {stage.kind === 'final' && stage.pa ? <PaForm project={project} stage={stage} state={stateFor('pa', failed, () => formValues(paSpec, stage.pa))} rails={railOptions} /> : null}
      {stage.kind === 'lpf' && stage.lpf ? <LpfForm project={project} stage={stage} state={stateFor('lpf', failed, () => formValues(lpfSpec, stage.lpf))} /> : null}
      {stage.kind === 'tr' && stage.relay ? <RelayForm project={project} stage={stage} state={stateFor('relay', failed, () => formValues(relaySpec, stage.relay))} rails={railOptions} /> : null}
      {results as never}
    </div>
  );
};

const PaForm: FC<{ project: Project; stage: Stage; state: FieldState; rails: [string, string][] }> = ({ project, stage, state, rails }) => (
  <FormShell project={project} stage={stage} path="/pa" title="Final amplifier data" state={state} submit="Save PA data">
    <div class="row">
      <SpecField spec={paSpec} k="topology" state={state} />
      <SpecField spec={paSpec} k="amplifierClass" state={state} />
      <SpecField spec={paSpec} k="railId" state={state} options={rails} />
      <SpecField spec={paSpec} k="devices" state={state} />
    </div>
    <div class="row">
      <SpecField spec={paSpec} k="saturationV" state={state} />
      <SpecField spec={paSpec} k="rdsOnOhm" state={state} />
      <SpecField spec={paSpec} k="turnsRatio" state={state} />
      <SpecField spec={paSpec} k="loadOhm" state={state} />
      <SpecField spec={paSpec} k="efficiency" state={state} />
    </div>
    <div class="row">
      <SpecField spec={paSpec} k="deviceVdsMaxV" state={state} />
      <SpecField spec={paSpec} k="deviceIdMaxA" state={state} />
      <SpecField spec={paSpec} k="biasIdleMaxA" state={state} />
      <SpecField spec={paSpec} k="referencePowerW" state={state} />
    </div>
    <div class="row">
      <SpecField spec={paSpec} k="mount.thetaJcKPerW" state={state} />
      <SpecField spec={paSpec} k="mount.thetaCsKPerW" state={state} />
      <SpecField spec={paSpec} k="mount.thetaSaKPerW" state={state} />
      <SpecField spec={paSpec} k="mount.tjMaxC" state={state} />
    </div>
  </FormShell>
);

const LpfForm: FC<{ project: Project; stage: Stage; state: FieldState }> = ({ project, stage, state }) => (
  <FormShell project={project} stage={stage} path="/lpf" title="Low-pass filter design" state={state} submit="Save and redesign">
    <div class="row">
      <SpecField spec={lpfSpec} k="response" state={state} />
      <SpecField spec={lpfSpec} k="rippleDb" state={state} />
      <SpecField spec={lpfSpec} k="order" state={state} />
      <SpecField spec={lpfSpec} k="form" state={state} />
      <SpecField spec={lpfSpec} k="cutoffHz" state={state} />
    </div>
    <div class="row">
      <SpecField spec={lpfSpec} k="capacitorSeries" state={state} />
      <SpecField spec={lpfSpec} k="allowParallelPairs" state={state} />
      <SpecField spec={lpfSpec} k="coreName" state={state} size={30} />
      <SpecField spec={lpfSpec} k="coreAlHPerTurn2" state={state} />
    </div>
    <div class="row">
      <SpecField spec={lpfSpec} k="inductorQ" state={state} />
      <SpecField spec={lpfSpec} k="capacitorQ" state={state} />
      <SpecField spec={lpfSpec} k="capacitorTolerance" state={state} />
      <SpecField spec={lpfSpec} k="inductorTolerance" state={state} />
      <SpecField spec={lpfSpec} k="monteCarloTrials" state={state} />
      <SpecField spec={lpfSpec} k="seed" state={state} />
    </div>
  </FormShell>
);

const RelayForm: FC<{ project: Project; stage: Stage; state: FieldState; rails: [string, string][] }> = ({ project, stage, state, rails }) => (
  <FormShell project={project} stage={stage} path="/relay" title="T/R relay data" state={state} submit="Save relay data">
    <div class="row">
      <SpecField spec={relaySpec} k="contactCarryA" state={state} />
      <SpecField spec={relaySpec} k="contactSwitchA" state={state} />
      <SpecField spec={relaySpec} k="contactRatedV" state={state} />
      <SpecField spec={relaySpec} k="rfRatedVpeak" state={state} />
      <SpecField spec={relaySpec} k="dcSwitchedA" state={state} />
    </div>
    <div class="row">
      <SpecField spec={relaySpec} k="coilA" state={state} />
      <SpecField spec={relaySpec} k="coilRailId" state={state} options={rails} none="(not on a rail here)" />
      <SpecField spec={relaySpec} k="coilReceive" state={state} />
      <SpecField spec={relaySpec} k="coilKeyUp" state={state} />
      <SpecField spec={relaySpec} k="coilKeyDown" state={state} />
    </div>
    <div class="row">
      <SpecField spec={relaySpec} k="isolationDb" state={state} />
      <SpecField spec={relaySpec} k="position" state={state} />
      <SpecField spec={relaySpec} k="receiverMaxInputW" state={state} />
    </div>
    <div class="row">
      <SpecField spec={relaySpec} k="operateS" state={state} />
      <SpecField spec={relaySpec} k="releaseS" state={state} />
      <SpecField spec={relaySpec} k="bounceS" state={state} />
      <SpecField spec={relaySpec} k="txDelayS" state={state} />
      <SpecField spec={relaySpec} k="wpm" state={state} />
    </div>
  </FormShell>
);
