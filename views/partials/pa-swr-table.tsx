// The PA round the circle of the worst SWR: the worst of each stress with its load, and the points every 15°.
import type { FC } from 'hono/jsx';
import { ohmText, type PaSwrStress, type Worst } from '../../src/core/rf/pa-swr';
import { formatValue as fv } from '../../src/core/units';

const load = (w: { loadReOhm: number; loadImOhm: number }) => ohmText(w.loadReOhm, w.loadImOhm);
const antenna = (w: { antennaReOhm: number | null; antennaImOhm: number | null }) =>
  w.antennaReOhm === null || w.antennaImOhm === null ? '' : ohmText(w.antennaReOhm, w.antennaImOhm);

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
  const atAntenna = s.circleAt === 'antenna';
  const d = s.designLoad;
  return (
    <table class="grid swr-circle">
      <caption>
        {atAntenna
          ? <>Round the SWR {s.swr} circle at the antenna ({how}; each load through the low-pass filter as built to
            the PA; phase of the antenna's reflection coefficient)</>
          : <>Round the SWR {s.swr} circle ({how}, loads at the PA output: no low-pass filter known, so the circle is
            placed there; phase of the reflection coefficient)</>}
        {d ? <> With a matched antenna the filter presents {load(d)} to the PA (input SWR {d.inputSwr.toFixed(2)}):
          {' '}{fv(d.outputW, 'W')}, drain peak {fv(d.drainPeakV, 'V')}.</> : null}
      </caption>
      <thead>
        <tr>
          <th>Worst case</th>
          <th class="num">Value</th>
          {atAntenna ? <th class="num">Load at the antenna</th> : null}
          <th class="num">Phase</th>
          <th class="num">{atAntenna ? 'Load at the PA' : 'Load'}</th>
        </tr>
      </thead>
      <tbody>
        {rows.map(([what, w, unit]) => (
          <tr>
            <th scope="row">{what}</th>
            <td class="num">{fv(w.value, unit)}</td>
            {atAntenna ? <td class="num">{antenna(w)}</td> : null}
            <td class="num">{w.phaseDeg === null ? 'matched' : `${w.phaseDeg.toFixed(0)}°`}</td>
            <td class="num">{load(w)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
};
