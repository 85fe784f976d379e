// The overview's first screen: will it work (the verdict from actionable findings), what to fix first (three links to
// where each is fixed), what it costs, and pictures of the station: power flow, rail troughs, harmonic margins.
import type { FC } from 'hono/jsx';
import { raw } from 'hono/html';
import type { Project } from '../../src/core/model';
import type { EvaluationReport } from '../../src/core/evaluate';
import { actionable, sortFindings, worstSeverity } from '../../src/core/findings';
import { formatMoney } from '../../src/core/cost/money';
import { fixLink } from './fix-link';
import { EmptyState } from './empty-state';
import { powerFlowData, powerFlowSvg } from '../plots/power-flow';
import { troughRows, troughChartSvg, harmonicBarsSvg, TOLERANCE_MARK } from '../plots/margin-charts';
import { CONSTRUCTION_FLOOR_DBC } from '../../src/core/rf/harmonics';

const VERDICT_TEXT = {
  ok: { sign: '✓', head: 'Will work as designed', tail: () => 'no check of this design fails or needs caution.' },
  caution: {
    sign: '!',
    head: 'Should work, with cautions',
    tail: (n: number, f: number) => `${n} finding(s) need a look${f ? `, ${f} fail` : ''}.`,
  },
  fail: {
    sign: '✗',
    head: 'Will not work as designed',
    tail: (n: number, f: number) => `${f} check(s) fail, ${n - f} more need caution.`,
  },
} as const;

/** The first words of a long message (the whole of it stands under "All checks"), cut at a word. */
const short = (m: string, max = 150) => (m.length <= max ? m : `${m.slice(0, m.lastIndexOf(' ', max))} …`);

export const FirstScreen: FC<{ project: Project; report: EvaluationReport }> = ({ project, report }) => {
  const counted = actionable(report.findings);
  const verdict = worstSeverity(counted);
  const attention = sortFindings(counted).filter((f) => f.severity !== 'ok');
  const fails = attention.filter((f) => f.severity === 'fail').length;
  const top = attention.slice(0, 3);
  const v = VERDICT_TEXT[verdict];
  const t = report.cost.totals;
  const cur = report.cost.currency;
  const harmonics = report.rf.harmonics;
  const base = `/projects/${project.id}`;
  const troughs = troughRows(report.supply);
  const tolerance = troughs.some((r) => r.points.some((p) => p.label.endsWith(TOLERANCE_MARK)));
  return (
    <section class="first-screen" id="first-screen" aria-label="At a glance">
      <div class="fs-left">
        <div class={`card verdict-card sev-box-${verdict}`} id="verdict" data-verdict={verdict}>
          <p class="verdict-head">
            <span class={`verdict-sign sev-${verdict}`} aria-hidden="true">
              {v.sign}
            </span>{' '}
            {v.head}
          </p>
          <p class="verdict-tail">
            {v.tail(attention.length, fails)}{' '}
            <a href="#checks">All checks</a>
          </p>
          {project.stages.length && project.supply.rails.length ? null : (
            <EmptyState label="Nothing designed yet">
              {project.supply.rails.length ? 'add the stages' : (
                <>
                  set up the supply on the <a href={`${base}/supply`}>Supply</a> page, then add the stages
                </>
              )}{' '}
              under <a href="#stages">Stages in build order</a>; the verdict counts only what is entered. Or start a new
              project from a station template on the <a href="/">project list</a>.
            </EmptyState>
          )}
        </div>
        <div class="card top-fixes" id="top-fixes">
          <h2>{top.length ? `Fix first (${top.length} of ${attention.length})` : 'Nothing to fix'}</h2>
          {top.length ? (
            <ol>
              {top.map((f) => {
                const link = fixLink(project, f);
                return (
                  <li class={`fix sev-${f.severity}`} data-rule={f.rule}>
                    <span class={`sev sev-${f.severity}`}>{f.severity}</span> <strong>{f.subject}</strong>:{' '}
                    {short(f.message)}{' '}
                    <a class="fix-link" href={link.href}>
                      Fix in {link.label} →
                    </a>
                  </li>
                );
              })}
            </ol>
          ) : (
            <p>No check fails or needs caution.</p>
          )}
        </div>
        <div class="card cost-glance" id="cost-glance">
          <h2>Cost</h2>
          {project.bom.length ? (
            <p>
              <strong>{t.perKitCents === null ? '—' : formatMoney(t.perKitCents, cur)}</strong> per kit ·{' '}
              <strong>{formatMoney(t.buildCents, cur)}</strong> for the group of {report.cost.kits} (parts and shipping)
              {t.unpricedLines ? (
                <span class="cost-warn"> ({t.unpricedLines} line(s) without a price: the real cost is higher)</span>
              ) : null}{' '}
              <a href={`${base}/bom`}>Parts list</a>
            </p>
          ) : (
            <EmptyState label="No parts yet">
              no parts in the list yet, so no cost. Add parts on the <a href={`${base}/parts`}>Parts catalog</a>, then
              their quantities on the <a href={`${base}/bom`}>Parts list</a>.
            </EmptyState>
          )}
        </div>
        <div class="card harmonic-glance" id="harmonic-glance">
          <h2>Harmonic margins</h2>
          {raw(harmonicBarsSvg(harmonics))}
          {harmonics ? (
            <p class="hint">
              Below the limit of {harmonics.ruleTitle}; the bar is the nominal filter, the tick its worst built case.
              {harmonics.rows.some((r) => r.limitedByConstruction)
                ? ` "At least": the harmonic falls below ${String(CONSTRUCTION_FLOOR_DBC).replace('-', '−')} dBc, ` +
                  'where the build (layout, shielding), not the filter, sets the level, so the margin is counted ' +
                  'from there.'
                : ''}
            </p>
          ) : null}
        </div>
      </div>
      <div class="fs-right">
        <div class="card flow-card" id="power-flow">
          <h2>Power flow at key-down</h2>
          {raw(powerFlowSvg(powerFlowData(project, report)))}
          <p class="hint">
            Currents are key-down (TX) DC currents{project.mains ? '; the mains box shows the primary RMS current' : ''}
            . A rail's voltage is its nominal value (a rectified rail: the rated winding's peak less the diode drops,
            before load); its troughs are in the chart. Rails: ● headroom OK, ▲ caution, ■ fails, – not
            checked.{' '}
            <a href={`${base}/supply`}>Supply page</a>
          </p>
        </div>
        <div class="card trough-card" id="troughs">
          <h2>Lowest rail voltage at key-down</h2>
          {raw(troughChartSvg(troughs))}
          <p class="hint">
            Dots: the trough at{' '}
            {project.mains ? 'low (L), nominal (N) and high (H) mains' : 'battery at end voltage, nominal and full'}
            {tolerance
              ? `; L${TOLERANCE_MARK}: low mains with the transformer's secondary at the low end of its tolerance`
              : ''}
            ; red dashed line: the least the rail may fall to.
          </p>
        </div>
      </div>
    </section>
  );
};
