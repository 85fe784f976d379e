// The PA round the circle of the worst SWR: the worst of each stress with its load, and the points every 15°.
import type { FC } from 'hono/jsx';
import { ohmText, type PaSwrStress, type Worst } from '../../src/core/rf/pa-swr';
import { formatValue as fv } from '../../src/core/units';

const load = (w: { loadReOhm: number; loadImOhm: number }) => ohmText(w.loadReOhm, w.loadImOhm);
const antenna = (w: { antennaReOhm: number | null; antennaImOhm: number | null }) =>
  w.antennaReOhm === null || w.antennaImOhm === null ? '—' : ohmText(w.antennaReOhm, w.antennaImOhm);

/** How the stage is solved at each load, in one or two plain sentences. */
export function swrHowText(s: PaSwrStress): string {
  const ring = s.clip
    ? ` Where it clips, the drain peak carries a ${Math.round(s.clip.ringMargin * 100)} % margin for the ring.` : '';
  if (s.model === 'class-e-simulated') return 'Class E: the stage is simulated in the time domain at each load.';
  if (s.clip?.model === 'harmonic-balance') {
    return 'The stage follows its load line at each complex load; where the swing reaches the supply rails, each ' +
      `device is balanced against the filter's impedance at each harmonic.${ring}`;
  }
  if (s.clip) {
    return 'The stage follows its load line at each complex load; where the swing reaches the supply rails, the ' +
      `drain is flat-topped there (the upper end).${ring}`;
  }
  return 'The stage follows its load line at each complex load.';
}

/** What "phase" means, with the circle's own loads at 0° and 180° (the points of the sweep). */
function phaseText(s: PaSwrStress): string {
  const atAntenna = s.circleAt === 'antenna';
  const of = atAntenna ? "the antenna's" : "the PA's load's";
  const z = (deg: number) => {
    const p = s.points.find((q) => q.phaseDeg === deg);
    if (!p) return '';
    const re = atAntenna ? p.antennaReOhm : p.loadReOhm;
    return re === null ? '' : ` (${fv(re, 'Ω')})`;
  };
  const worsts = [s.worstDrainPeak, s.worstPeakCurrent, s.worstDissipation, s.maxOutput, s.minOutput];
  const matched = atAntenna && worsts.some((w) => w.phaseDeg === null);
  return `Phase is the angle of ${of} reflection coefficient: 0° a resistance above the design load${z(0)}, ` +
    `180° one below${z(180)}, 90° inductive, 270° capacitive` +
    `${matched ? '; "matched" is the antenna at its design load' : ''}.`;
}

export const PaSwrTable: FC<{ s: PaSwrStress | null; maxRailV?: number; hotRailV?: number }> = (
  { s, maxRailV, hotRailV },
) => {
  if (!s) return null;
  const rows: [string, Worst, string][] = [
    ['Highest drain peak', s.worstDrainPeak, 'V'],
    ['Highest device current', s.worstPeakCurrent, 'A'],
    ['Most dissipation (key-down, all devices)', s.worstDissipation, 'W'],
    ['Most output', s.maxOutput, 'W'],
    ['Least output', s.minOutput, 'W'],
  ];
  const atAntenna = s.circleAt === 'antenna';
  const supplies = maxRailV !== undefined && hotRailV !== undefined
    ? (maxRailV > hotRailV
      ? ` Drain peaks are at the highest supply, ${fv(maxRailV, 'V')} (before the rail sags); current, ` +
        `dissipation and output at the highest key-down supply, ${fv(hotRailV, 'V')}.`
      : ` All at the highest supply, ${fv(maxRailV, 'V')}.`)
    : '';
  return (
    <div class="swr-circle-block">
      <table class="grid swr-circle">
        <caption>
          Worst cases round the SWR {s.swr} circle {atAntenna ? 'at the antenna' : "at the PA's output"}
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
      <p class="explain">
        {atAntenna
          ? `Each antenna load on the SWR ${s.swr} circle, every 15°, is taken through the low-pass filter as ` +
            'built to the PA.'
          : `No low-pass filter is known, so the SWR ${s.swr} circle is placed at the PA's output, every 15°.`}
        {supplies} {phaseText(s)}
      </p>
      <details class="explain">
        <summary>How the stage is computed at each load</summary>
        <p>{swrHowText(s)}</p>
      </details>
    </div>
  );
};
