// The PA rail's keying transient on the supply page (the plot, one line on the first dot) and a rail's load model.
// Renders only what the report holds.
import type { Child, FC } from 'hono/jsx';
import type { RectifiedRailReport } from '../../src/core/power/report-types';
import type { RailLoadModel } from '../../src/core/power/rail-load-model';
import { formatValue as fv } from '../../src/core/units';
import { keyingTransientSvg } from '../plots/keying-transient-plot';

const sdb = (x: number) => `${x >= 0 ? '+' : ''}${x.toFixed(1)} dB`;

export const KeyingTransientBlock: FC<{ rail: RectifiedRailReport }> = ({ rail }) => {
  const k = rail.keyingTransient;
  if (!k) return null;
  const first = k.elements[0];
  return (
    <div class="keying-transient">
      <h4>Keying transient</h4>
      <div class="plot-wrap" dangerouslySetInnerHTML={{ __html: keyingTransientSvg(rail.railName, k) }} />
      <p class="summary-line">
        {k.stageName} at {k.wpm} WPM (from {k.wpmFrom}): the first dot
        gives {fv(first.leadOutputW, 'W')} over its first{' '}
        {fv(k.leadS, 's', 2)} ({sdb(first.leadVsSteadyDb)}) and {fv(first.outputW, 'W')} over the dot
        ({sdb(first.vsSteadyDb)}), against {fv(k.steadyOutputW, 'W')} with the key
        held at {fv(k.keyDownMeanV, 'V')}; the rail rests at {fv(k.keyUpMeanV, 'V')} key-up.
        Caution above {sdb(k.limitDb)}.
      </p>
      <LoadModelDetails model={k.loadModel}>
        Simulated at {fv(k.mainsV, 'V')} mains with the winding's {fv(k.windingOhm, 'Ω')}
        {k.leakageH > 0 ? ` and ${fv(k.leakageH, 'H')} leakage` : ' (leakage not included)'}, {k.stepsPerCycle} steps
        per mains cycle; the
        winding is simulated on its own (the load of the transformer's other windings on the shared primary is in the
        transformer's joint simulation, not here).
      </LoadModelDetails>
    </div>
  );
};

/** A rail's loads and the law each follows, behind a disclosure; `children` adds a note below the table. */
export const LoadModelDetails: FC<{ model: RailLoadModel; children?: Child }> = ({ model, children }) => (
  <details class="load-model">
    <summary>Loads on this rail and how each follows its voltage</summary>
    <table class="grid">
      <thead>
        <tr>
          <th scope="col">Load</th>
          <th scope="col">How it follows the rail</th>
          <th class="num">Key-up / key-down</th>
        </tr>
      </thead>
      <tbody>
        {model.parts.map((p) => (
          <tr>
            <th scope="row">{p.name}</th>
            <td>{p.law === 'PA load line' ? `PA load line, P ∝ (V − Vsat)²` : p.law}</td>
            <td class="num">
              {fv(p.keyUpA, 'A')} / {fv(p.keyDownA, 'A')}
              {p.law === 'PA load line'
                ? <span class="sub">at {fv(model.keyDown.pa?.referenceV ?? NaN, 'V')}</span> : null}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
    {children ? <p class="hint">{children}</p> : null}
  </details>
);
