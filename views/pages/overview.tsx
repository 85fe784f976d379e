// Project overview: first the verdict, what to fix, the cost and pictures of the station (first-screen.tsx); then
// settings, stages in build order with their currents, the live current budget and every check.
import type { FC } from 'hono/jsx';
import type { Project, Stage } from '../../src/core/model';
import { MODES, MODE_LABELS, STAGE_KINDS, STAGE_KIND_LABELS } from '../../src/core/model';
import type { EvaluationReport } from '../../src/core/evaluate';
import type { Finding } from '../../src/core/findings';
import { actionable, standingCautions, worstSeverity } from '../../src/core/findings';
import { sourceText } from '../../src/core/sources/registry';
import { StandingCautions } from '../components/standing-cautions';
import { formatValue } from '../../src/core/units';
import { inputText } from '../../src/core/spec/input-text';
import { settingsSpec, settingsFormValues } from '../../src/core/spec/settings';
import { Field, Select, TextArea, FormErrors, type FieldState } from '../components/fields';
import { SpecField } from '../components/spec-fields';
import { LoadTableHead } from '../components/load-table-head';
import { loadCurrentValues } from '../../src/core/edits/stage-loads';
import { loadFormName, loadSpec } from '../../src/core/spec/stage';
import { stateFor, type Failed } from '../components/failed';
import { BudgetTable } from '../components/budget-table';
import { FirstScreen } from '../components/first-screen';
import { EmptyState } from '../components/empty-state';
import { fixLink } from '../components/fix-link';

export const loadValues = (s: Stage): Record<string, string> => loadCurrentValues(s.loads);

const Hidden: FC<{ version: number }> = ({ version }) => <input type="hidden" name="version" value={String(version)} />;

const SettingsForm: FC<{ project: Project; state: FieldState }> = ({ project, state }) => (
  <details class="card settings" id="settings" open={Object.keys(state.errors).length > 0}>
    <summary>
      <h2>Project settings</h2>
      <span class="summary-line">
        {formatValue(project.frequencyHz, 'Hz', 4)} · {formatValue(project.targetPowerW, 'W')} ·{' '}
        {project.mains
          ? `${formatValue(project.mains.nominalV, 'V')} ${formatValue(project.mains.frequencyHz, 'Hz')} mains`
          : 'battery / DC'}{' '}
        · {project.kits} {project.kits === 1 ? 'kit' : 'kits'} · ambient {project.ambientC} °C
      </span>
    </summary>
    <form
      method="post"
      action={`/projects/${project.id}/settings`}
      hx-post={`/projects/${project.id}/settings`}
      hx-target="#overview"
      hx-swap="outerHTML"
    >
      <Hidden version={project.version} />
      <FormErrors state={state} />
      <div class="row">
        <SpecField spec={settingsSpec} k="name" state={state} size={40} />
        <SpecField spec={settingsSpec} k="frequencyHz" state={state} size={9} />
        <SpecField spec={settingsSpec} k="targetPowerW" state={state} size={7} />
      </div>
      <div class="row">
        <SpecField spec={settingsSpec} k="supplyKind" state={state} />
        <SpecField spec={settingsSpec} k="mains.nominalV" state={state} size={7} />
        <SpecField spec={settingsSpec} k="mains.frequencyHz" state={state} size={7} />
        <SpecField spec={settingsSpec} k="mains.lowFraction" state={state} size={4} />
        <SpecField spec={settingsSpec} k="mains.highFraction" state={state} size={4} />
      </div>
      <div class="row">
        <SpecField spec={settingsSpec} k="ambientC" state={state} size={5} />
        <SpecField spec={settingsSpec} k="keyingDuty" state={state} size={5} />
        <SpecField spec={settingsSpec} k="kits" state={state} size={5} />
        <SpecField spec={settingsSpec} k="currency" state={state} size={5} />
      </div>
      <TextArea name="notes" label={settingsSpec.fields.notes.label} state={state} rows={2} cls="wide" />
      <button type="submit">Save settings</button>
    </form>
  </details>
);

const StageRow: FC<{
  project: Project;
  stage: Stage;
  index: number;
  state: FieldState;
  railName: (id: string) => string;
  report: EvaluationReport;
}> = ({ project, stage, index, state, railName, report }) => {
  const computed = report.budget.rails.flatMap((r) =>
    r.loads.filter((l) => l.computed && l.stageId === stage.id).map((l) => ({ rail: r.name, currentA: l.currentA })),
  );
  const base = `/projects/${project.id}/stages/${stage.id}`;
  const computedNote = stage.pa
    ? 'key-down current on the PA rail is computed from the PA model'
    : stage.relay?.coilRailId
      ? 'relay coil current is added automatically'
      : null;
  return (
    <li class="stage" id={`stage-${stage.id}`}>
      <div class="stage-head">
        <span class="order">{index + 1}</span>
        <a class="stage-name" href={base}>
          {stage.name}
        </a>
        <span class="kind">{STAGE_KIND_LABELS[stage.kind]}</span>
        <span class="actions">
          <form
            method="post"
            action={`${base}/move`}
            hx-post={`${base}/move`}
            hx-target="#overview"
            hx-swap="outerHTML"
            class="inline"
          >
            <Hidden version={project.version} />
            <button
              name="direction"
              value="up"
              disabled={index === 0}
              title="Move earlier in the build order"
              aria-label={`Move ${stage.name} up`}
            >
              ↑
            </button>
            <button
              name="direction"
              value="down"
              disabled={index === project.stages.length - 1}
              title="Move later in the build order"
              aria-label={`Move ${stage.name} down`}
            >
              ↓
            </button>
          </form>
          <a href={base}>Edit</a>
          <a href={`${base}/delete`} class="danger">
            Delete…
          </a>
        </span>
      </div>
      {stage.loads.length ? (
        <form
          method="post"
          action={`${base}/loads`}
          hx-post={`${base}/loads`}
          hx-target="#overview"
          hx-swap="outerHTML"
          class="loads"
        >
          <Hidden version={project.version} />
          <FormErrors state={state} />
          <table class="grid compact">
            <LoadTableHead />
            <tbody>
              {stage.loads.map((l, i) => (
                <tr>
                  <td>{railName(l.railId)}</td>
                  {MODES.map((m) => (
                    <td>
                      <SpecField
                        spec={loadSpec}
                        k={`currentA.${m}`}
                        name={loadFormName(i, `currentA.${m}`)}
                        idp={`s-${stage.id}`}
                        state={state}
                        size={8}
                        hint=""
                      />
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
          <button type="submit">Save currents</button>
          {computedNote ? <span class="hint"> Note: {computedNote}.</span> : null}
          {computed.map((c) => (
            <p class="computed-load">
              ◆ Computed and used in the budget ({c.rail}):{' '}
              {MODES.filter((m) => c.currentA[m] !== 0)
                .map(
                  (m) =>
                    `${MODE_LABELS[m]} ${
                      Number.isNaN(c.currentA[m]) ? 'unknown (see the failed checks)' : formatValue(c.currentA[m], 'A')
                    }`,
                )
                .join(', ') || 'none'}
            </p>
          ))}
        </form>
      ) : (
        <p class="hint">
          Draws no current from the supply. {stage.kind === 'lpf' ? '' : <a href={base}>Add a load</a>}
        </p>
      )}
    </li>
  );
};

const SECTIONS: { key: string; label: string; path: string; findings: (r: EvaluationReport) => Finding[] }[] = [
  { key: 'budget', label: 'Current budget', path: '', findings: (r) => r.budget.findings },
  { key: 'supply', label: 'Supply', path: '/supply', findings: (r) => [...(r.supply?.findings ?? []), ...r.catalog] },
  { key: 'rf', label: 'RF checks', path: '/rf', findings: (r) => r.rf.findings },
  { key: 'cost', label: 'Parts and cost', path: '/bom', findings: (r) => r.cost.findings },
];

/** Counts per section and the findings that need attention; the detail lives on each section's page. */
/** The link to the input that clears a finding (views/components/fix-link.ts). */
const FixAnchor: FC<{ project: Project; f: Finding }> = ({ project, f }) => {
  const link = fixLink(project, f);
  return (
    <a class="fix-link" href={link.href}>
      Fix: {link.label} →
    </a>
  );
};

const ChecksSummary: FC<{ project: Project; report: EvaluationReport }> = ({ project, report }) => {
  // only findings a design change can clear count; standing cautions have their own block below
  const counted = actionable(report.findings);
  const attention = counted.filter((f) => f.severity !== 'ok');
  const verdict = worstSeverity(counted);
  const standing = standingCautions(report.findings);
  return (
    <section class="card" id="checks">
      <h2>Checks at a glance</h2>
      <p class="verdict">
        Verdict: <span class={`sev sev-${verdict}`}>{verdict === 'ok' ? 'OK' : verdict}</span>
        {verdict === 'ok'
          ? ' — no check of this design fails or needs caution.'
          : ` — ${attention.length} finding(s) need attention.`}
      </p>
      <table class="grid summary">
        <thead>
          <tr>
            <th>Section</th>
            <th class="num">Fail</th>
            <th class="num">Caution</th>
            <th class="num">OK</th>
          </tr>
        </thead>
        <tbody>
          {SECTIONS.map((s) => {
            const f = actionable(s.findings(report));
            const n = (sev: string) => f.filter((x) => x.severity === sev).length;
            return (
              <tr>
                <td>
                  <a href={`/projects/${project.id}${s.path}`}>{s.label}</a>
                </td>
                <td class="num">{n('fail') ? <span class="sev sev-fail">{n('fail')}</span> : '0'}</td>
                <td class="num">{n('caution') ? <span class="sev sev-caution">{n('caution')}</span> : '0'}</td>
                <td class="num">{n('ok')}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {attention.length ? (
        <>
          <h3>Needs attention ({attention.length})</h3>
          <ul class="findings">
            {attention.map((f) => (
              <li class={`finding sev-${f.severity}`} data-rule={f.rule}>
                <span class={`sev sev-${f.severity}`}>{f.severity}</span> <strong>{f.subject}</strong>: {f.message}{' '}
                <FixAnchor project={project} f={f} />{' '}
                <span class="source">(Source: {sourceText(f.source)})</span>
              </li>
            ))}
          </ul>
        </>
      ) : (
        <p>No check fails or needs caution.</p>
      )}
      <StandingCautions findings={standing} />
    </section>
  );
};

export const OverviewBody: FC<{ project: Project; report: EvaluationReport; failed?: Failed; notice?: string }> = ({
  project,
  report,
  failed,
  notice,
}) => {
  const railName = (id: string) => project.supply.rails.find((r) => r.id === id)?.name ?? `(missing rail ${id})`;
  const addState = stateFor('add-stage', failed, () => ({ kind: 'receiver', name: '' }));
  return (
    <div id="overview">
      {notice ? (
        <p class="notice" role="status">
          {notice}
        </p>
      ) : null}
      <FirstScreen project={project} report={report} />
      <p class="variant-links" id="variant-links">
        {project.variantOf ? 'This project is a variant. ' : ''}
        <a href={`/projects/${project.id}/compare`}>
          {project.variantOf ? 'Compare with its original' : 'Compare with its variants'}
        </a>{' '}
        · <a href={`/projects/${project.id}/sweep`}>Sweep one parameter</a> (mains, winding, reservoir, PA load, filter
        order)
      </p>
      <SettingsForm project={project} state={stateFor('settings', failed, () => settingsFormValues(project))} />
      <div class="columns">
        <section class="card" id="stages">
          <h2>Stages in build order</h2>
          {project.stages.length ? null : project.supply.rails.length ? (
            <EmptyState label="No stages yet">
              no stages yet. Add them below in build order (receiver, oscillator, driver, final, low-pass filter, T/R
              switching), then enter each stage's current per mode on its rail. A new project can also start from a
              station template on the <a href="/">project list</a>.
            </EmptyState>
          ) : (
            <EmptyState label="No stages and no rails yet">
              a stage draws its current from a rail, and there is none yet. Set up the supply first on the{' '}
              <a href={`/projects/${project.id}/supply`}>Supply</a> page (
              {project.mains
                ? 'transformer, its windings, a rectified rail from a winding, a regulated rail from it'
                : 'a battery rail, then any regulated rail from it'}
              ), then add the stages below. Or start a new project from a station template on the{' '}
              <a href="/">project list</a>: it sets up the supply, the stages and a starter parts list.
            </EmptyState>
          )}
          <ol class="stages">
            {project.stages.map((s, i) => (
              <StageRow
                project={project}
                stage={s}
                index={i}
                railName={railName}
                report={report}
                state={stateFor(`loads-${s.id}`, failed, () => loadValues(s))}
              />
            ))}
          </ol>
          <form
            method="post"
            action={`/projects/${project.id}/stages`}
            hx-post={`/projects/${project.id}/stages`}
            hx-target="#overview"
            hx-swap="outerHTML"
            class="add-stage"
          >
            <Hidden version={project.version} />
            <FormErrors state={addState} />
            <div class="row">
              <Select
                name="kind"
                label="Add a stage"
                state={addState}
                options={STAGE_KINDS.map((k) => [k, STAGE_KIND_LABELS[k]])}
              />
              <Field name="name" label="Name" state={addState} size={28} />
              <button type="submit">Add stage</button>
            </div>
          </form>
        </section>
        <BudgetTable budget={report.budget} />
      </div>
      <ChecksSummary project={project} report={report} />
    </div>
  );
};
