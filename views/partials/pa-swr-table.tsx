// The PA round the circle of the worst SWR: the worst of each stress with its load, and the points every 15°.
import type { FC } from 'hono/jsx';
import type { PaSwrStress, Worst } from '../../src/core/rf/pa-swr';
import { formatValue as fv } from '../../src/core/units';

const load = (w: { loadReOhm: number; loadImOhm: number }) =>
  `${w.loadReOhm.toFixed(1)} ${w.loadImOhm < 0 ? '−' : '+'} j${Math.abs(w.loadImOhm).toFixed(1)} Ω`;

export const PaSwrTable: FC<{ s: PaSwrStress | null }> = ({ s }) => {
  if (!s) return null;
  const ring = s.clip ? `, drain peaks with a ${Math.round(s.clip.ringMargin * 100)} % ring margin where it clips` : '';
  const how = s.model === 'class-e-simulated'
    ? 'class E by time-domain simulation, every 15°'
    : s.clip?.model === 'harmonic-balance'
      ? 'load line at a complex load; where the swing reaches the rails, balanced against the filter at each ' +
        `harmonic, every 15°${ring}`
      : s.clip
        ? `load line at a complex load, flat-topped at the rails where it reaches them (the upper end)${ring}`
        : 'load line at a complex load';
  const rows: [string, Worst, string][] = [
    ['Highest drain peak', s.worstDrainPeak, 'V'],
    ['Highest device current', s.worstPeakCurrent, 'A'],
    ['Most dissipation (key-down, all devices)', s.worstDissipation, 'W'],
    ['Most output', s.maxOutput, 'W'],
    ['Least output', s.minOutput, 'W'],
  ];
  return (
    <table class="grid swr-circle">
      <caption>
        Round the SWR {s.swr} circle ({how},
        loads at the PA output; phase of the reflection coefficient)
      </caption>
      <thead>
        <tr>
          <th>Worst case</th>
          <th class="num">Value</th>
          <th class="num">Load</th>
          <th class="num">Phase</th>
        </tr>
      </thead>
      <tbody>
        {rows.map(([what, w, unit]) => (
          <tr>
            <th scope="row">{what}</th>
            <td class="num">{fv(w.value, unit)}</td>
            <td class="num">{load(w)}</td>
            <td class="num">{w.phaseDeg.toFixed(0)}°</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
};
