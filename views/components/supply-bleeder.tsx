// The fitted bleeder of a rectified rail: time to its safe voltage (the voltage and where it comes from) and its
// dissipation at the highest voltage. Renders what evaluateSupply computed (src/core/power/bleeder.ts).
import type { FC } from 'hono/jsx';
import type { BleederReport } from '../../src/core/power/report-types';
import { formatValue as fv } from '../../src/core/units';

export const BleederLine: FC<{ b: BleederReport }> = ({ b }) => (
  <p class="summary-line bleeder">
    <strong>Bleeder:</strong>{' '}
    {b.fittedOhm === null ? (
      <>none fitted; the reservoir stays at up to {fv(b.startV, 'V')} after switch-off ({fv(b.storedJ, 'J')} stored).</>
    ) : (
      <>
        {fv(b.fittedOhm, 'Ω')} brings {fv(b.startV, 'V')} below {fv(b.safeV, 'V')} in{' '}
        {fv(b.fittedTimeS ?? 0, 's')}{' '}
        (safe level: {b.safeSource}); it dissipates {fv(b.fittedW ?? 0, 'W')} at that voltage
        {b.ratedW !== null ? `, rated ${fv(b.ratedW, 'W')}` : ', rating not stated'}.
      </>
    )}
  </p>
);
