// The fuse in a winding lead and the faults it must clear; the primary fuse against the reflected faults.
// Renders what evaluateSupply computed (src/core/power/winding-fuse.ts, primary-fault.ts); no maths beyond formatting.
import type { FC } from 'hono/jsx';
import type { FaultCheck, PrimaryFaultCheck, WindingFuseReport } from '../../src/core/power/report-types';
import { formatValue as fv } from '../../src/core/units';

const clearText = (c: FaultCheck) =>
  c.latestS === null ? 'no time guaranteed (below 2.1 × In)' : `melts within ${fv(c.latestS, 's')} at most`;
const verdict = (c: FaultCheck) => (c.clears ? 'clears in time' : c.latestS === null ? 'may never clear' : 'too slow');
const sev = (c: FaultCheck) => (c.clears ? 'sev sev-ok' : c.latestS === null ? 'sev sev-fail' : 'sev sev-caution');

export const WindingFuseTable: FC<{ wf: WindingFuseReport }> = ({ wf }) => (
  <>
    <h4>Winding fuse and faults</h4>
    <table class="grid kv winding-fuse">
      <tbody>
        <tr>
          <th scope="row">Fuse in the {wf.windingName} lead, before the rectifier</th>
          <td>
            {wf.fittedA !== null ? `fitted ${fv(wf.fittedA, 'A')} (${wf.sheet})` : 'none entered'}; recommended{' '}
            {wf.fuse.ratedA !== null ? `T${fv(wf.fuse.ratedA, 'A')}` : 'beyond the series'} for
            {' '}{fv(wf.fuse.loadA, 'A')} RMS continuous
          </td>
        </tr>
        <tr>
          <th scope="row">
            Fault current (winding {fv(wf.sourceOhm, 'Ω')}
            {wf.reactanceOhm ? `, leakage ${fv(wf.leakageH ?? 0, 'H')} = ${fv(wf.reactanceOhm, 'Ω')} reactance` : ''})
          </th>
          <td>
            shorted reservoir {fv(wf.outputShortLowA, 'A')} (low mains); short at the rectifier input
            {' '}{fv(wf.inputShortLowA, 'A')} to{' '}
            {fv(wf.inputShortHighA, 'A')}
          </td>
        </tr>
        {wf.check ? (
          <tr>
            <th scope="row">Clearing (IEC 60127-2 {wf.check.sheet})</th>
            <td>
              {wf.check.multiple.toFixed(1)} × In: {clearText(wf.check)}, wanted within
              {' '}{fv(wf.check.allowedS, 's')}:{' '}
              <span class={sev(wf.check)}>{verdict(wf.check)}</span>
            </td>
          </tr>
        ) : null}
      </tbody>
    </table>
  </>
);

export const PrimaryFaultTable: FC<{ checks: PrimaryFaultCheck[] }> = ({ checks }) =>
  checks.length ? (
    <table class="grid primary-faults">
      <caption>Primary fuse against each winding's shorted reservoir (low mains, reflected by the turns ratio)</caption>
      <thead>
        <tr>
          <th scope="col">Winding</th>
          <th class="num">On the primary</th>
          <th class="num">× In</th>
          <th scope="col">IEC 60127-2 {checks[0].check.sheet}</th>
          <th scope="col">Verdict</th>
        </tr>
      </thead>
      <tbody>
        {checks.map((c) => (
          <tr>
            <th scope="row">{c.windingName}</th>
            <td class="num">{fv(c.reflectedA, 'A')}</td>
            <td class="num">{c.check.multiple.toFixed(1)}</td>
            <td>{clearText(c.check)}</td>
            <td>
              <span class={sev(c.check)}>{verdict(c.check)}</span>
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  ) : null;
