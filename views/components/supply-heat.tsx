// Heat inside the enclosure: each source's duty-averaged dissipation, the total and the internal rise.
// Renders what evaluate() computed (src/core/power/heat-budget.ts); no maths beyond formatting.
import type { FC } from 'hono/jsx';
import type { HeatBudget } from '../../src/core/power/heat-budget';
import { formatValue as fv } from '../../src/core/units';
import { sourceText } from '../../src/core/sources/registry';

export const HeatCard: FC<{ heat: HeatBudget }> = ({ heat }) => (
  <section class="card supply-heat" aria-label="Heat in the enclosure">
    <h3>Heat in the enclosure</h3>
    <table class="grid">
      <thead>
        <tr>
          <th scope="col">Source</th>
          <th class="num">CW use</th>
          <th scope="col">How</th>
        </tr>
      </thead>
      <tbody>
        {heat.sources.map((s) => (
          <tr>
            <th scope="row">{s.name}</th>
            <td class="num">{fv(s.watts, 'W')}</td>
            <td>{s.note}</td>
          </tr>
        ))}
        <tr class="worst">
          <th scope="row">Total inside</th>
          <td class="num">{fv(heat.totalW, 'W')}</td>
          <td>
            {heat.riseK !== null
              ? `rise ${fv(heat.riseK, 'K')} over the ${fv(heat.ambientC, '°C')} room ` +
                `(${fv(heat.areaM2! * 1e4, 'cm²')} at ${heat.uWPerM2K} W/(m²·K)): about ` +
                `${fv(heat.insideC, '°C')} ` +
                'inside, the ambient of the rectifier, regulator and PA heatsink checks'
              : 'enclosure not entered: no rise computed'}
          </td>
        </tr>
      </tbody>
    </table>
    <ul class="findings">
      {heat.findings.map((f) => (
        <li>
          <span class={`sev sev-${f.severity}`}>{f.severity}</span> {f.message}{' '}
          <span class="source">(Source: {sourceText(f.source)})</span>
        </li>
      ))}
    </ul>
  </section>
);
