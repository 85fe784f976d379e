// The rectifier's junction and heatsink line, a regulated rail's output bleeder line, and the words for the supply
// choices. Renders what evaluateSupply computed (src/core/thermal/bridge.ts, src/core/power/regulated-bleeder.ts).
import type { FC } from 'hono/jsx';
import type { BridgeThermal } from '../../src/core/thermal/bridge';
import { airWords } from '../../src/core/thermal/bridge';
import type { RegulatedBleederReport } from '../../src/core/power/regulated-bleeder';
import { FUSE_SHEET_LABEL } from '../../src/core/power/fault';
import type { SupplyReport } from '../../src/core/power/report-types';
import { formatValue as fv } from '../../src/core/units';

export const BridgeLine: FC<{ b: BridgeThermal }> = ({ b }) => {
  const t = b.result;
  const load = b.basis === 'tune-up' ? 'continuous carrier (sized for tune-up)' : 'CW duty-averaged';
  const part = b.assumed
    ? 'assumed 4-8 A bridge' : `θjc ${fv(b.mount.thetaJcKPerW, 'K/W')}, Tj max ${fv(b.mount.tjMaxC, '°C')}`;
  return (
    <p class="summary-line bridge-thermal">
      <strong>Rectifier heat:</strong> {fv(t.powerW, 'W')} {load} ({fv(b.otherW, 'W')}{' '}
      {b.basis === 'tune-up' ? 'in CW use' : 'key-down held'}),{' '}
      {airWords(t.ambientC, b.inside)}; {part}.{' '}
      {b.heatsinkFitted
        ? `On the ${fv(b.mount.thetaSaKPerW!, 'K/W')} heatsink the junction reaches about ${fv(t.junctionC!, '°C')}`
        : `Without a heatsink (θja ${fv(b.freeAirKPerW, 'K/W')}) the junction reaches about ` +
          `${fv(t.freeAirJunctionC, '°C')}`}{' '}
      against a {fv(t.targetC, '°C')} target;{' '}
      {t.requiredThetaSaKPerW !== null
        ? `a heatsink of ${fv(t.requiredThetaSaKPerW, 'K/W')} or lower meets it` : 'no single heatsink meets it'}
      {!t.needsHeatsink ? ' (none needed)' : ''}.
    </p>
  );
};

export const RegulatedBleederLine: FC<{ b: RegulatedBleederReport }> = ({ b }) => (
  <p class="summary-line bleeder">
    <strong>Output bleeder:</strong>{' '}
    {b.fittedTimeS !== null ? (
      <>
        {b.fittedOhm !== null ? `${fv(b.fittedOhm, 'Ω')}: ` : ''}below {fv(b.safeV, 'V')} within about
        {' '}{fv(b.fittedTimeS, 's')} after switch-off (an upper bound; safe level: {b.safeSource})
        {b.fittedW !== null
          ? `; it dissipates ${fv(b.fittedW, 'W')} at ${fv(b.startV, 'V')}` +
            (b.ratedW !== null ? `, rated ${fv(b.ratedW, 'W')}` : ', rating not stated')
          : ''}.
      </>
    ) : (
      <>
        the output may stay at {fv(b.startV, 'V')}: {b.why}.
        {b.suggestedOhm !== null
          ? ` Suggested: ${fv(b.suggestedOhm, 'Ω')} (${fv(b.suggestedW!, 'W')} at ${fv(b.startV, 'V')}).` : ''}
        {b.fittedW !== null ? ` The fitted bleeder dissipates ${fv(b.fittedW, 'W')}.` : ''}
      </>
    )}
  </p>
);

/** "T, time-lag, low breaking capacity (IEC 60127-2 sheet 3)" for the report's primary fuse type. */
export const primaryTypeWords = (s: SupplyReport): string => FUSE_SHEET_LABEL[s.choices?.primaryFuseSheet ?? 'T3'];

/** True when the transformer was sized for a continuous carrier. */
export const sizedForTuneUp = (s: SupplyReport): boolean => s.choices?.transformerSizing === 'tune-up';
