// Current budget per rail and operating mode.
import type { FC } from 'hono/jsx';
import type { BudgetReport } from '../../src/core/budget';
import { MODES, MODE_LABELS } from '../../src/core/model';
import { formatValue } from '../../src/core/units';

/** A budget figure; NaN means a computed load could not be computed (the failed findings say why). */
const Amount: FC<{ value: number; unit: string }> = ({ value, unit }) =>
  Number.isNaN(value) ? (
    <span class="unknown" title="A computed load could not be computed: see the failed checks">
      unknown
    </span>
  ) : (
    <>{formatValue(value, unit)}</>
  );

const VOLTAGE_TITLE =
  'Mean rail voltage in receive → with the key down, at nominal mains; below it, the lowest point of the ' +
  'ripple with the key down';

export const BudgetTable: FC<{ budget: BudgetReport }> = ({ budget }) => (
  <section class="card" id="budget">
    <h2>Current budget</h2>
    <p class="explain">
      What each rail delivers in each operating mode: its own stage loads plus the input current of every regulator it
      feeds (linear: output + quiescent current; switching: from its efficiency at the lowest input voltage). Computed
      loads (PA key-down current, relay coil) are marked ◆; one that cannot be computed from the entered data shows as
      unknown, and the supply is not designed until it is known. Powers are each mode's current times the rail's mean
      voltage in that mode at nominal mains (from the supply design); the trough is the lowest point of the ripple with
      the key down.
    </p>
    <div class="scroll-x">
      <table class="grid budget">
        <thead>
          <tr>
            <th>Rail</th>
            <th class="num" title={VOLTAGE_TITLE}>
              Voltage <span class="sub">RX → key-down mean; trough</span>
            </th>
            {MODES.map((m) => (
              <th class="num">{MODE_LABELS[m]}</th>
            ))}
          </tr>
        </thead>
        <tbody>
          {budget.rails.map((r) => (
            <>
              <tr class="rail-row">
                <th scope="row" style={`padding-left:${0.5 + r.depth * 1.2}rem`}>
                  {r.depth > 0 ? '└ ' : ''}
                  {r.name}
                </th>
                <td class="num" title={r.voltageCondition}>
                  {r.modeV ? (
                    <>
                      {formatValue(r.modeV.receive, 'V')} → {formatValue(r.modeV.keyDown, 'V')}
                      <span class="sub">
                        trough {r.keyDownTroughV != null ? formatValue(r.keyDownTroughV, 'V') : '—'}
                      </span>
                    </>
                  ) : (
                    <>
                      {formatValue(r.nominalV, 'V')}
                      <span class="sub">estimate</span>
                    </>
                  )}
                </td>
                {MODES.map((m) => (
                  <td class="num" data-rail={r.railId} data-mode={m}>
                    <strong>
                      <Amount value={r.outputA[m]} unit="A" />
                    </strong>
                    <span class="sub">
                      <Amount value={r.outputW[m]} unit="W" />
                    </span>
                  </td>
                ))}
              </tr>
              {r.loads.map((l) => (
                <tr class="load-row">
                  <td style={`padding-left:${1.6 + r.depth * 1.2}rem`}>
                    {l.stageName}
                    {l.computed ? <span title="computed"> ◆</span> : null}
                    {/* a stage listed twice on one rail: say which row is typed in and which computed */}
                    {r.loads.some((o) => o !== l && o.stageId === l.stageId) ? (
                      <span class="sub">{l.computed ? 'computed' : 'entered'}</span>
                    ) : null}
                  </td>
                  <td></td>
                  {MODES.map((m) => (
                    <td class="num">
                      <Amount value={l.currentA[m]} unit="A" />
                    </td>
                  ))}
                </tr>
              ))}
              {MODES.some((m) => r.regulatorsA[m] !== 0) ? (
                <tr class="load-row">
                  <td style={`padding-left:${1.6 + r.depth * 1.2}rem`}>regulators fed from this rail</td>
                  <td></td>
                  {MODES.map((m) => (
                    <td class="num">
                      <Amount value={r.regulatorsA[m]} unit="A" />
                    </td>
                  ))}
                </tr>
              ) : null}
            </>
          ))}
        </tbody>
        <tfoot>
          <tr>
            <th scope="row">All sources, DC power</th>
            <td></td>
            {MODES.map((m) => (
              <td class="num" data-total-mode={m}>
                <strong>
                  <Amount value={budget.totalW[m]} unit="W" />
                </strong>
              </td>
            ))}
          </tr>
        </tfoot>
      </table>
    </div>
  </section>
);
