// The corners that decide a rail's design, shown first: headroom (lowest trough; with a stated secondary tolerance
// also low mains with the secondary at the low end of it), heating (high mains at the CW duty) and tune-up (a
// continuous carrier at high mains). The full corner table follows behind a disclosure. The headroom verdicts are
// the rail's own headroom findings, the ones the overview's first screen draws, so both pages agree.
import type { Child, FC } from 'hono/jsx';
import type { Finding, Severity } from '../../src/core/findings';
import type {
  BatteryRailReport, RectifiedRailReport, RegulatedRailReport, SupplyReport,
} from '../../src/core/power/report-types';
import { formatValue as fv } from '../../src/core/units';

type Role = { role: string; id: string; headroom?: 'plain' | 'tolerance' };
const TOLERANCE_ID = 'lowTol-keyDown';
const roles = (voltage: string, thermal: string, tolerance: boolean): Role[] => [
  { role: 'Headroom', id: voltage, headroom: 'plain' },
  ...(tolerance
    ? [{ role: 'Headroom, secondary at its low tolerance', id: TOLERANCE_ID, headroom: 'tolerance' as const }]
    : []),
  { role: 'Heating', id: thermal },
  { role: 'Tune-up', id: 'high-tuneUp' },
];

const severityOf = (findings: Finding[], rule: string): Severity | null =>
  findings.find((f) => f.rule === rule)?.severity ?? null;

/** A rectified rail's headroom verdict at the plain low-mains corner and at the secondary-tolerance corner. */
function rectifiedVerdict(rail: RectifiedRailReport, which: 'plain' | 'tolerance'): Severity | null {
  const plain = severityOf(rail.findings, 'rail.headroom');
  if (which === 'plain') return plain;
  // the tolerance check is a caution of its own; without one the corner meets the need, or the plain corner fails
  const tol = severityOf(rail.findings, 'rail.headroom-tolerance');
  const c = rail.corners.find((x) => x.id === TOLERANCE_ID);
  return tol ?? (c && c.headroomMarginV >= 0 ? 'ok' : plain);
}

type DecidingRail<C> = { worstVoltageCornerId: string; worstThermalCornerId: string; corners: C[] };
/**
 * One row per deciding role whose corner the rail has: the role, the corner's label (with `note`'s words under it,
 * if any), then the rail's own cells.
 */
function decidingRows<C extends { id: string; label: string }>(
  rail: DecidingRail<C>,
  cells: (corner: C, headroom: Role['headroom']) => Child,
  note: (corner: C) => string | null = () => null,
) {
  const tolerance = rail.corners.some((x) => x.id === TOLERANCE_ID);
  return roles(rail.worstVoltageCornerId, rail.worstThermalCornerId, tolerance).map(({ role, id, headroom }) => {
    const c = rail.corners.find((x) => x.id === id);
    return c ? (
      <tr data-corner={id} class={headroom ? 'headroom-row' : ''}>
        <th scope="row">{role}</th>
        <td>
          {c.label}
          {note(c) ? <span class="sub corner-note">{note(c)}</span> : null}
        </td>
        {cells(c, headroom)}
      </tr>
    ) : null;
  });
}

const VERDICT_WORDS: Record<Severity, string> = { ok: 'ok', caution: 'caution', fail: 'fail' };
const Verdict: FC<{ sev: Severity | null; none?: string }> = ({ sev, none }) =>
  sev ? (
    <span class={`sev sev-${sev}`} data-headroom-verdict={sev}>{VERDICT_WORDS[sev]}</span>
  ) : (
    <span class="hint">{none ?? '—'}</span>
  );

/**
 * Why the tune-up corner loads a rail more than the key-down budget: the corner holds the key-down current at high
 * mains, where the PA's rail is higher and a PA of fixed load draws more (I ∝ V; evaluate.ts takes the high-mains
 * corners' PA current at the high-mains key-down mean), while the budget's key-down is the PA at the nominal-mains
 * key-down trough. Only the PA's current depends on the rail, so a higher load here is the PA's.
 */
function tuneUpNote(rail: RectifiedRailReport, c: RectifiedRailReport['corners'][number]): string | null {
  const budget = rail.corners.find((x) => x.id === 'nominal-keyDown');
  const hot = rail.corners.find((x) => x.id === 'high-keyDown');
  if (c.load !== 'tuneUp' || !budget || !hot || !(c.loadA > budget.loadA * 1.005)) return null;
  return `a carrier held at high mains: the PA's rail is higher (${fv(hot.dcMeanV, 'V')} mean), so it draws more ` +
    `than the ${fv(budget.loadA, 'A')} key-down budget, taken at nominal mains (${fv(budget.troughV, 'V')} trough)`;
}

export const RectifiedDeciding: FC<{ rail: RectifiedRailReport; caption?: Child }> = ({ rail, caption }) => (
  <table class="grid deciding" data-rail={rail.railId}>
    <caption>{caption ?? 'Deciding corners'}</caption>
    <thead>
      <tr>
        <th scope="col">Decides</th>
        <th scope="col">Corner</th>
        <th class="num">Load</th>
        <th class="num">Trough</th>
        <th class="num" title="Trough less the least the rail may fall to">Margin</th>
        <th scope="col">Verdict</th>
        <th class="num">Winding RMS</th>
        <th class="num">Cap. ripple RMS</th>
      </tr>
    </thead>
    <tbody>
      {decidingRows(rail, (c, headroom) => (
        <>
          <td class="num">{fv(c.loadA, 'A')}</td>
          <td class="num">{fv(c.troughV, 'V')}</td>
          <td class="num">{fv(c.headroomMarginV, 'V')}</td>
          <td>{headroom ? <Verdict sev={rectifiedVerdict(rail, headroom)} none="no need stated" /> : null}</td>
          <td class="num">{fv(c.secondaryRmsA, 'A')}</td>
          <td class="num">{fv(c.capacitorRippleRmsA, 'A')}</td>
        </>
      ), (c) => tuneUpNote(rail, c))}
    </tbody>
  </table>
);

export const RegulatedDeciding: FC<{ rail: RegulatedRailReport; caption?: Child }> = ({ rail, caption }) => (
  <table class="grid deciding" data-rail={rail.railId}>
    <caption>{caption ?? 'Deciding corners'}</caption>
    <thead>
      <tr>
        <th scope="col">Decides</th>
        <th scope="col">Corner</th>
        <th class="num">Input trough</th>
        <th class="num">Headroom</th>
        <th scope="col">Verdict</th>
        <th class="num">Dissipation</th>
      </tr>
    </thead>
    <tbody>
      {decidingRows(rail, (c, headroom) => (
        <>
          <td class="num">{fv(c.inputTroughV, 'V')}</td>
          <td class="num">{fv(c.headroomV, 'V')}</td>
          <td>
            {headroom === 'plain' ? <Verdict sev={severityOf(rail.findings, 'regulator.headroom')} /> : null}
            {/* the feeding rail's own tolerance check judges this corner */}
            {headroom === 'tolerance' ? <span class="hint">judged on the rail that feeds it</span> : null}
          </td>
          <td class="num">{fv(c.dissipationW, 'W')}</td>
        </>
      ))}
    </tbody>
  </table>
);

/** A battery rail's one deciding point: the end voltage under key-down load against what its regulators need. */
const BatteryDeciding: FC<{ rail: BatteryRailReport }> = ({ rail }) => {
  const sev = severityOf(rail.findings, 'battery.end-voltage') ?? severityOf(rail.findings, 'battery.window');
  return (
    <table class="grid deciding" data-rail={rail.railId}>
      <caption>
        <a href={`#supply-${rail.railId}`}>{rail.railName}</a>
      </caption>
      <tbody>
        <tr class="headroom-row">
          <th scope="row">Headroom</th>
          <td>At end voltage under key-down load: {fv(rail.loadedEndV, 'V')}; needed {fv(rail.requiredMinV, 'V')}</td>
          <td><Verdict sev={sev} none="no need stated" /></td>
        </tr>
      </tbody>
    </table>
  );
};

/** The page's first results: every rail's deciding corners, each linking to its full results further down. */
export const SupplyGlance: FC<{ report: SupplyReport }> = ({ report }) => (
  <section class="card supply-glance" id="supply-glance" aria-labelledby="supply-glance-h">
    <h2 id="supply-glance-h">Does the supply hold up?</h2>
    <p class="hint">
      Per rail, the corners that decide it: headroom at the lowest trough
      {report.mains ? ' (low mains, and with a stated secondary tolerance its low end too)' : ''}, heating in CW use
      and a tune-up carrier. The editors, every corner, the plots and the findings follow below.
    </p>
    {report.rails.map((r) => {
      const caption = <a href={`#supply-${r.railId}`}>{r.railName}</a>;
      // a wide table scrolls inside its card on a phone instead of widening the page
      return (
        <div class="scroll-x">
          {r.kind === 'rectified' ? (
            <RectifiedDeciding rail={r} caption={caption} />
          ) : r.kind === 'regulated' ? (
            <RegulatedDeciding rail={r} caption={caption} />
          ) : (
            <BatteryDeciding rail={r} />
          )}
        </div>
      );
    })}
  </section>
);

/** The full corner table behind a native disclosure (keyboard: Tab to the summary, Enter or Space opens it). */
export const AllCorners: FC<{ count: number; children?: Child }> = ({ count, children }) => (
  <details class="all-corners">
    <summary>All {count} corners (every supply voltage and load)</summary>
    {children}
  </details>
);
