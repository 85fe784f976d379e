// The corners that decide a rail's design, shown first: headroom (lowest trough), heating (high mains at the CW
// duty) and tune-up (a continuous carrier at high mains). The full corner table follows behind a disclosure.
import type { Child, FC } from 'hono/jsx';
import type { RectifiedRailReport, RegulatedRailReport } from '../../src/core/power/report-types';
import { formatValue as fv } from '../../src/core/units';

type Role = { role: string; id: string };
const roles = (voltage: string, thermal: string): Role[] => [
  { role: 'Headroom', id: voltage },
  { role: 'Heating', id: thermal },
  { role: 'Tune-up', id: 'high-tuneUp' },
];

export const RectifiedDeciding: FC<{ rail: RectifiedRailReport }> = ({ rail }) => (
  <table class="grid deciding">
    <caption>Deciding corners</caption>
    <thead>
      <tr>
        <th scope="col">Decides</th>
        <th scope="col">Corner</th>
        <th class="num">Load</th>
        <th class="num">Trough</th>
        <th class="num">Margin</th>
        <th class="num">Winding RMS</th>
        <th class="num">Cap. ripple RMS</th>
      </tr>
    </thead>
    <tbody>
      {roles(rail.worstVoltageCornerId, rail.worstThermalCornerId).map(({ role, id }) => {
        const c = rail.corners.find((x) => x.id === id);
        return c ? (
          <tr>
            <th scope="row">{role}</th>
            <td>{c.label}</td>
            <td class="num">{fv(c.loadA, 'A')}</td>
            <td class="num">{fv(c.troughV, 'V')}</td>
            <td class="num">{fv(c.headroomMarginV, 'V')}</td>
            <td class="num">{fv(c.secondaryRmsA, 'A')}</td>
            <td class="num">{fv(c.capacitorRippleRmsA, 'A')}</td>
          </tr>
        ) : null;
      })}
    </tbody>
  </table>
);

export const RegulatedDeciding: FC<{ rail: RegulatedRailReport }> = ({ rail }) => (
  <table class="grid deciding">
    <caption>Deciding corners</caption>
    <thead>
      <tr>
        <th scope="col">Decides</th>
        <th scope="col">Corner</th>
        <th class="num">Input trough</th>
        <th class="num">Headroom</th>
        <th class="num">Dissipation</th>
      </tr>
    </thead>
    <tbody>
      {roles(rail.worstVoltageCornerId, rail.worstThermalCornerId).map(({ role, id }) => {
        const c = rail.corners.find((x) => x.id === id);
        return c ? (
          <tr>
            <th scope="row">{role}</th>
            <td>{c.label}</td>
            <td class="num">{fv(c.inputTroughV, 'V')}</td>
            <td class="num">{fv(c.headroomV, 'V')}</td>
            <td class="num">{fv(c.dissipationW, 'W')}</td>
          </tr>
        ) : null;
      })}
    </tbody>
  </table>
);

/** The full corner table behind a native disclosure (keyboard: Tab to the summary, Enter or Space opens it). */
export const AllCorners: FC<{ count: number; children?: Child }> = ({ count, children }) => (
  <details class="all-corners">
    <summary>All {count} corners (every mains voltage and load)</summary>
    {children}
  </details>
);
