// A PA's output parts beyond the L network: the pi network (balanced for push-pull), the class-E shunt capacitor
// beside the device, and the output transformer on its catalog core (flux and fit).
import type { FC } from 'hono/jsx';
import type { RfStageResult } from '../../src/core/rf/report';
import { paOutputRows } from '../../src/core/rf/pa-output-rows';

/** A two-column table of label and value rows. */
export const KV: FC<{ rows: [string, string][] }> = ({ rows }) => (
  <table class="grid kv">
    <tbody>
      {rows.map(([k, v]) => (
        <tr>
          <th scope="row">{k}</th>
          <td>{v}</td>
        </tr>
      ))}
    </tbody>
  </table>
);

export const PaMagnetics: FC<{ s: RfStageResult }> = ({ s }) => {
  const rows = paOutputRows(s);
  if (!rows.length) return null;
  return (
    <div class="rf-network">
      <h3>{s.stageName}: output parts</h3>
      <KV rows={rows} />
    </div>
  );
};
