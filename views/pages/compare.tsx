// Variants side by side (two or three projects, each figure against the first, differences said in words), and a
// sweep of one parameter of one project (five plain GET forms, a chart of the margins and the table of every point).
import type { FC } from 'hono/jsx';
import { raw } from 'hono/html';
import { Layout } from '../layout';
import { Select, type FieldState } from '../components/fields';
import { SpecField } from '../components/spec-fields';
import type { ProjectSummary } from '../../src/core/project-summary';
import type { CompareCell, CompareRow } from '../../src/core/compare/rows';
import { VERDICT_WORDS } from '../../src/core/compare/rows';
import type { Metric } from '../../src/core/compare/metrics';
import type { SweepResult, SweepTarget } from '../../src/core/compare/sweep';
import { SWEEP_LABELS, SWEEP_PARAMETERS, SWEEP_SPECS, type SweepParameter } from '../../src/core/spec/sweep';
import type { NumberField } from '../../src/core/spec/field';
import { formatMoney } from '../../src/core/cost/money';
import { sweepPlotSvg } from '../plots/sweep-plot';

const DECIMALS: Record<string, number> = { V: 2, VA: 0, W: 1, dB: 1, m: 2 };

/** A figure as the table shows it; money in its currency. */
export function figure(value: number | null, unit: string, currency?: string, signed = false): string {
  if (value === null || !Number.isFinite(value)) return '—';
  const sign = signed && value > 0 ? '+' : '';
  if (unit === 'cents') return `${sign}${formatMoney(value, currency ?? '')}`;
  return `${sign}${value.toFixed(DECIMALS[unit] ?? 2)} ${unit}`;
}

const Cell: FC<{ c: CompareCell; row: CompareRow; first: boolean }> = ({ c, row, first }) => (
  <td class={`cmp-cell verdict-${c.verdict}`} data-cmp={first ? undefined : c.verdict}>
    <span class="cmp-value">{figure(c.value, row.unit, c.currency)}</span>
    {c.value === null && c.why ? <span class="hint"> ({c.why})</span> : null}
    {first ? null : c.verdict === 'same' ? (
      <span class="cmp-verdict"> · same</span>
    ) : (
      <strong class="cmp-verdict">
        {' '}
        · {c.delta !== null ? `${figure(c.delta, row.unit, c.currency, true)}, ` : ''}
        {VERDICT_WORDS[c.verdict]}
      </strong>
    )}
  </td>
);

export interface ComparePageProps {
  all: ProjectSummary[];
  chosen: ProjectSummary[];
  rows: CompareRow[] | null;
  state: FieldState;
  message?: string;
  /** what to do next, when nothing is wrong */
  prompt?: string;
}

export const ComparePage: FC<ComparePageProps> = ({ all, chosen, rows, state, message, prompt }) => {
  const options: [string, string][] = all.map((p) => [p.id, p.variantOf ? `${p.name} (variant)` : p.name]);
  const differing = rows?.filter((r) => r.differs).length ?? 0;
  return (
    <Layout title="Compare variants">
      <section class="card">
        <h1>Compare variants</h1>
        <p class="hint">
          Two or three projects side by side. Each figure of the second and third is set against the first: the
          difference and whether it is better or worse. Make a variant with “Clone as variant” on the projects list.
        </p>
        <form method="get" action="/compare" class="compare-pick">
          <Select name="p1" label="First (reference)" state={state} options={[['', '(choose)'], ...options]} />
          <Select name="p2" label="Second" state={state} options={[['', '(choose)'], ...options]} />
          <Select name="p3" label="Third (optional)" state={state} options={[['', '(none)'], ...options]} />
          <button type="submit">Compare</button>
        </form>
        {message ? (
          <p class="form-errors" role="alert">
            {message}
          </p>
        ) : null}
        {prompt ? (
          <p class="notice" role="status" id="compare-prompt">
            {prompt}
          </p>
        ) : null}
      </section>
      {rows ? (
        <section class="card" id="comparison">
          <h2>Side by side</h2>
          <p id="compare-summary">
            {differing ? `${differing} of ${rows.length} figures differ (marked ` +
              `“differs”).` : 'No figure differs.'}{' '}
            Against the first project; “better” and “worse” follow what is good for each figure (a higher
            margin, a
            lower cost).
          </p>
          <table class="compare-table">
            <thead>
              <tr>
                <th scope="col">Figure</th>
                {chosen.map((p, i) => (
                  <th scope="col">
                    <a href={`/projects/${p.id}`}>{p.name}</a>
                    {i === 0 ? <span class="hint"> (reference)</span> : null}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {rows.map((r) => (
                <tr class={r.differs ? 'differs' : 'same'} data-key={r.key}>
                  <th scope="row">
                    {r.differs ? <span class="differs-mark">≠ differs: </span> : null}
                    {r.label}
                    <span class="hint"> ({r.better} is better)</span>
                  </th>
                  {r.cells.map((c, i) => (
                    <Cell c={c} row={r} first={i === 0} />
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
          <p>
            Sweep one parameter:{' '}
            {chosen.map((p, i) => (
              <>
                {i ? ' · ' : ''}
                <a href={`/projects/${p.id}/sweep`}>{p.name}</a>
              </>
            ))}
          </p>
        </section>
      ) : null}
    </Layout>
  );
};

export interface SweepPageProps {
  project: { id: string; name: string };
  targets: Record<SweepParameter, SweepTarget[]>;
  /** per parameter, the text in its form (the submitted one keeps what was typed) and messages */
  states: Record<SweepParameter, FieldState>;
  active: SweepParameter | null;
  result: SweepResult | null;
  unavailable: Record<SweepParameter, string>;
  message?: string;
}

const MetricCell: FC<{ m: Metric | undefined }> = ({ m }) =>
  !m ? (
    <td>—</td>
  ) : (
    <td>
      {figure(m.value, m.unit, m.currency)}
      {m.value === null ? (
        <span class="hint"> ({m.why})</span>
      ) : m.margin && m.value < 0 ? (
        <strong> fails</strong>
      ) : null}
    </td>
  );

export const SweepPage: FC<SweepPageProps> = ({ project, targets, states, active, result, unavailable, message }) => {
  const display = result ? (SWEEP_SPECS[result.parameter].fields.from as NumberField).display : null;
  return (
    <Layout title={`Sweep · ${project.name}`} project={project}>
      <section class="card">
        <h1>Sweep one parameter</h1>
        <p class="hint">
          Each point is a copy of this project with one value changed, evaluated whole; nothing is saved. At most 12
          points.
        </p>
        {message ? (
          <p class="form-errors" role="alert">
            {message}
          </p>
        ) : null}
        {SWEEP_PARAMETERS.map((p) => {
          const spec = SWEEP_SPECS[p];
          const st = states[p];
          return (
            <form
              method="get"
              action={`/projects/${project.id}/sweep`}
              class={`sweep-form${active === p ? ' active' : ''}`}
              id={`sweep-${p}`}
            >
              <input type="hidden" name="param" value={p} />
              <h2>{SWEEP_LABELS[p]}</h2>
              {targets[p].length ? (
                <div class="fields-row">
                  <Select
                    name="target"
                    label={spec.fields.target.label}
                    state={st}
                    idp={p}
                    options={targets[p].map((t) => [t.id, t.name])}
                  />
                  {/* the heading names the quantity; the spec's longer label names it in messages */}
                  <SpecField spec={spec} k="from" state={st} idp={p} label="From" />
                  <SpecField spec={spec} k="to" state={st} idp={p} label="To" />
                  <SpecField spec={spec} k="points" state={st} idp={p} size={4} />
                  <button type="submit">Sweep</button>
                </div>
              ) : st.errors.target ? (
                <p class="error" role="alert">
                  {st.errors.target}
                </p>
              ) : (
                <p class="hint">Not available: {unavailable[p]}.</p>
              )}
              {st.errors._form ? <p class="error">{st.errors._form}</p> : null}
            </form>
          );
        })}
      </section>
      {result && display ? (
        <section class="card" id="sweep-result">
          <h2>
            {result.label} of {result.target.name}
          </h2>
          <div class="scroll-x">{raw(sweepPlotSvg(result, display))}</div>
          <div class="scroll-x">
          <table class="sweep-table">
            <thead>
              <tr>
                <th scope="col">
                  {result.label}
                  {display.symbol ? ` (${display.symbol})` : ''}
                </th>
                {result.points[0].metrics.map((m) => (
                  <th scope="col">{m.label}</th>
                ))}
              </tr>
            </thead>
            <tbody>
              {result.points.map((pt) => (
                <tr>
                  <th scope="row">{Number((pt.value / display.scale).toPrecision(4))}</th>
                  {result.points[0].metrics.map((m) => (
                    <MetricCell m={pt.metrics.find((x) => x.key === m.key)} />
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
          </div>
        </section>
      ) : null}
    </Layout>
  );
};
