// Supply results: per rail the corners table, findings, recommendations (transformer, capacitor, fuses,
// heatsink) and, for rectified rails, the waveform plot; then the transformers and the primary fuse.
// Renders only what evaluateSupply computed; no maths beyond formatting.
import type { FC } from 'hono/jsx';
import type { Finding } from '../../src/core/findings';
import { actionable, standingCautions } from '../../src/core/findings';
import { sourceText } from '../../src/core/sources/registry';
import { StandingCautions } from '../components/standing-cautions';
import type {
  BatteryRailReport,
  Recommendation,
  RectifiedRailReport,
  RegulatedRailReport,
  SupplyReport,
  TransformerReport,
} from '../../src/core/power/report-types';
import { formatValue as fv } from '../../src/core/units';
import { rectifierPlotData, rectifierPlotSvg } from '../plots/rectifier-plot';
import { KeyingTransientBlock, LoadModelDetails } from '../components/supply-keying';
import { PrimaryFaultTable, WindingFuseTable } from '../components/supply-faults';
import { inrushSummary } from '../../src/core/power/inrush';
import { STEADY_INPUT_WORDS, steadyInput } from '../../src/core/power/ripple-rejection';
import { BleederLine } from '../components/supply-bleeder';
import { BridgeLine, RegulatedBleederLine, primaryTypeWords, sizedForTuneUp } from '../components/supply-thermal';
import { HeatCard } from '../components/supply-heat';
import { regulatorWords } from '../components/supply-rail';
import { AllCorners, RectifiedDeciding, RegulatedDeciding } from '../components/supply-corners';
import type { HeatBudget } from '../../src/core/power/heat-budget';

const sevClass = (s: Finding['severity']) => `sev sev-${s}`;
const pct = (x: number) => `${(x * 100).toFixed(0)} %`;

export const FindingList: FC<{ findings: Finding[] }> = ({ findings }) =>
  findings.length ? (
    <>
      <ul class="findings">
        {actionable(findings).map((f) => (
          <li>
            <span class={sevClass(f.severity)}>{f.severity}</span> {f.message}{' '}
            <span class="source">(Source: {sourceText(f.source)})</span>
          </li>
        ))}
      </ul>
      <StandingCautions findings={standingCautions(findings)} />
    </>
  ) : (
    <p class="hint">No findings.</p>
  );

const Recommendations: FC<{ items: Recommendation[] }> = ({ items }) =>
  items.length ? (
    <dl class="recommendations">
      {items.map((r) => (
        <>
          <dt>
            <strong>{r.topic}:</strong> {r.text}
          </dt>
          <dd>
            {r.reasoning} <span class="source">(Source: {sourceText(r.source)})</span>
          </dd>
        </>
      ))}
    </dl>
  ) : null;

const Tag: FC<{ id: string; voltage: string; thermal: string }> = ({ id, voltage, thermal }) =>
  id === voltage ? (
    <span class="hint"> · sets headroom</span>
  ) : id === thermal ? (
    <span class="hint"> · sets heating</span>
  ) : null;

const RectifiedCard: FC<{ rail: RectifiedRailReport }> = ({ rail }) => (
  <section class="card supply-rail" id={`supply-${rail.railId}`}>
    <h3>
      {rail.railName}{' '}
      <span class="hint">
        ({rail.topology} rectifier; needs {fv(rail.requiredMinV, 'V')} at the trough: {rail.requirementNote})
      </span>
    </h3>
    <RectifiedDeciding rail={rail} />
    <AllCorners count={rail.corners.length}>
      <table class="grid corners">
        <thead>
          <tr>
            <th scope="col">Corner</th>
            <th class="num">Load</th>
            <th class="num">Mean</th>
            <th class="num">Trough</th>
            <th class="num">Ripple p-p</th>
            <th class="num">Peak / no-load</th>
            <th class="num">Winding RMS</th>
            <th class="num">Diode peak</th>
            <th class="num">Cap. ripple RMS</th>
            <th class="num">Conduction</th>
            <th class="num">Margin</th>
          </tr>
        </thead>
        <tbody>
          {rail.corners.map((c) => (
            <tr class={c.id === rail.worstVoltageCornerId || c.id === rail.worstThermalCornerId ? 'worst' : ''}>
              <th scope="row">
                {c.label}
                <Tag id={c.id} voltage={rail.worstVoltageCornerId} thermal={rail.worstThermalCornerId} />
                {c.converged ? null : <span class="hint"> · not converged</span>}
                {c.aloneTroughV !== undefined ? <span class="hint"> · windings together</span> : null}
              </th>
              <td class="num">{fv(c.loadA, 'A')}</td>
              <td class="num">{fv(c.dcMeanV, 'V')}</td>
              <td class="num">
                {fv(c.troughV, 'V')}
                {c.aloneTroughV !== undefined ? <span class="sub">alone {fv(c.aloneTroughV, 'V')}</span> : null}
              </td>
              <td class="num">{fv(c.ripplePpV, 'V')}</td>
              <td class="num">
                {fv(c.peakV, 'V')}
                <span class="sub">{fv(c.noLoadPeakV, 'V')}</span>
              </td>
              <td class="num">{fv(c.secondaryRmsA, 'A')}</td>
              <td class="num">{fv(c.diodePeakA, 'A')}</td>
              <td class="num">{fv(c.capacitorRippleRmsA, 'A')}</td>
              <td class="num">{pct(c.conductionFraction)}</td>
              <td class="num">{fv(c.headroomMarginV, 'V')}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p class="hint">
        Rows marked “windings together” take their volts from all windings of the transformer simulated at once
        (shared
        primary, leakage), with this rail's own trough beneath; the other rows and every current are this winding's own.
      </p>
    </AllCorners>
    <div class="plot-wrap" dangerouslySetInnerHTML={{ __html: rectifierPlotSvg(rectifierPlotData(rail)) }} />
    {rail.keyingTransient ? (
      <KeyingTransientBlock rail={rail} />
    ) : rail.loadModel ? (
      <LoadModelDetails model={rail.loadModel} />
    ) : null}
    {rail.windingFuse ? <WindingFuseTable wf={rail.windingFuse} /> : null}
    <BleederLine b={rail.bleeder} />
    {rail.bridgeThermal ? <BridgeLine b={rail.bridgeThermal} /> : null}
    <h4>Findings</h4>
    <FindingList findings={rail.findings} />
    <h4>Recommendations</h4>
    <Recommendations items={rail.recommendations} />
  </section>
);

const RegulatedCard: FC<{ rail: RegulatedRailReport }> = ({ rail }) => (
  <section class="card supply-rail" id={`supply-${rail.railId}`}>
    <h3>
      {rail.railName}{' '}
      <span class="hint">
        ({regulatorWords(rail.regulator)} regulator, {fv(rail.outputV, 'V')} out, dropout {fv(rail.dropoutV, 'V')})
      </span>
    </h3>
    <RegulatedDeciding rail={rail} />
    {rail.bleeder ? <RegulatedBleederLine b={rail.bleeder} /> : null}
    <AllCorners count={rail.corners.length}>
      <table class="grid corners">
        <thead>
          <tr>
            <th scope="col">Corner</th>
            <th class="num">Output</th>
            <th class="num">Input current</th>
            <th class="num">Input trough</th>
            <th class="num">Input mean</th>
            <th class="num">Headroom</th>
            <th class="num">Dissipation</th>
            <th class="num">Ripple in / out</th>
          </tr>
        </thead>
        <tbody>
          {rail.corners.map((c) => (
            <tr class={c.id === rail.worstVoltageCornerId || c.id === rail.worstThermalCornerId ? 'worst' : ''}>
              <th scope="row">
                {c.label}
                <Tag id={c.id} voltage={rail.worstVoltageCornerId} thermal={rail.worstThermalCornerId} />
              </th>
              <td class="num">{fv(c.outputA, 'A')}</td>
              <td class="num">{fv(c.inputA, 'A')}</td>
              <td class="num">{fv(c.inputTroughV, 'V')}</td>
              <td class="num">{fv(c.inputMeanV, 'V')}</td>
              <td class="num">{fv(c.headroomV, 'V')}</td>
              <td class="num">{fv(c.dissipationW, 'W')}</td>
              <td class="num">
                {fv(c.inputRipplePpV, 'V')}
                <span class="sub">
                  {c.outputRipplePpV !== null
                    ? fv(c.outputRipplePpV, 'V')
                    : c.inputRipplePpV === 0
                      ? fv(0, 'V')
                      : 'rejection not stated'}
                  {c.inDropout ? ' (dropout)' : ''}
                </span>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </AllCorners>
    <p class="summary-line ripple">
      {(() => {
        // a rail fed without ripple (a battery) has none to pass on, whatever the rejection
        if (steadyInput(rail.corners)) return `${STEADY_INPUT_WORDS[0].toUpperCase()}${STEADY_INPUT_WORDS.slice(1)}.`;
        const rc = rail.corners.find((c) => c.id === rail.worstRippleCornerId);
        const out =
          rc && rc.outputRipplePpV !== null
            ? `Ripple at the output up to ${fv(rc.outputRipplePpV, 'V')} p-p (${fv(rc.inputRipplePpV, 'V')} p-p in, ` +
              `${rc.label.toLowerCase()}). `
            : 'Ripple at the output unknown. ';
        const db = rail.rippleRejectionDb !== null ? `${rail.rippleRejectionDb} dB` : 'not stated';
        const target =
          rail.rippleTargetV !== null
            ? `; output ripple target ${fv(rail.rippleTargetV, 'V')} p-p`
            : '; no output ripple target';
        return `${out}Ripple rejection ${db}${target}.`;
      })()}
    </p>
    {rail.thermal ? (
      <p class="summary-line">
        Heat: {fv(rail.thermalDissipationW, 'W')} in CW operation, {fv(rail.tuneUpDissipationW, 'W')} with a tune-up
        carrier; junction{' '}
        {rail.thermal.junctionC !== null
          ? fv(rail.thermal.junctionC, '°C')
          : `about ${fv(rail.thermal.freeAirJunctionC, '°C')} without a heatsink`}{' '}
        against a target of {fv(rail.thermal.targetC, '°C')} (0.8 × {fv(rail.thermal.tjMaxC, '°C')}).
      </p>
    ) : null}
    <h4>Findings</h4>
    <FindingList findings={rail.findings} />
    <h4>Recommendations</h4>
    <Recommendations items={rail.recommendations} />
  </section>
);

const BatteryCard: FC<{ rail: BatteryRailReport }> = ({ rail }) => (
  <section class="card supply-rail" id={`supply-${rail.railId}`}>
    <h3>{rail.railName}</h3>
    <table class="grid kv">
      <tbody>
        <tr>
          <th scope="row">Voltage window</th>
          <td>
            {fv(rail.fullV, 'V')} full to {fv(rail.endV, 'V')} end ({fv(rail.loadedEndV, 'V')} under key-down load)
          </td>
        </tr>
        <tr>
          <th scope="row">Needed by the regulators</th>
          <td>{fv(rail.requiredMinV, 'V')}</td>
        </tr>
        <tr>
          <th scope="row">Average current</th>
          <td>
            {fv(rail.averageA, 'A')} ({pct(rail.receiveFraction)} receive)
          </td>
        </tr>
        <tr>
          <th scope="row">Runtime</th>
          <td>{(rail.runtimeS / 3600).toFixed(1)} h</td>
        </tr>
        <tr>
          <th scope="row">Bleeder</th>
          <td>
            none applies: a battery holds its voltage while connected; disconnect it (or pull its fuse) before working
            on the rig
          </td>
        </tr>
        {rail.curve ? (
          <>
            <tr>
              <th scope="row">Discharge curve</th>
              <td>
                {rail.curve.chemistry}, {rail.curve.cells} cells: plateau {fv(rail.curve.plateauV, 'V')} (
                {fv(rail.curve.loadedPlateauV, 'V')} under key-down), common end {fv(rail.curve.chemistryEndV, 'V')}
              </td>
            </tr>
            <tr>
              <th scope="row">Runtime over the curve</th>
              <td>
                {(rail.curve.runtimeS / 3600).toFixed(1)} h: the loads run to {fv(rail.curve.stopV, 'V')},{' '}
                {pct(rail.curve.usedFraction)} of the capacity
              </td>
            </tr>
          </>
        ) : null}
        {rail.pa ? (
          <tr>
            <th scope="row">{rail.pa.stageName}</th>
            <td>
              about {fv(rail.pa.plateauOutputW, 'W')} for most of the charge ({fv(rail.pa.plateauRailV, 'V')}),{' '}
              {fv(rail.pa.endOutputW, 'W')} near the end ({fv(rail.pa.endRailV, 'V')})
            </td>
          </tr>
        ) : null}
      </tbody>
    </table>
    <h4>Findings</h4>
    <FindingList findings={rail.findings} />
    <h4>Recommendations</h4>
    <Recommendations items={rail.recommendations} />
  </section>
);

const TransformerCard: FC<{ t: TransformerReport; tuneUp?: boolean }> = ({ t, tuneUp }) => (
  <div class="transformer-result">
    <h4>
      {t.name} <span class="hint">({t.construction})</span>
    </h4>
    <table class="grid">
      <thead>
        <tr>
          <th scope="col">Winding</th>
          <th class="num">Lowest rated V</th>
          <th class="num">Standard V</th>
          <th class="num">Current rating ({tuneUp ? 'tune-up' : 'CW'})</th>
          <th class="num">Tune-up RMS</th>
          <th class="num">Peak</th>
          <th class="num">VA</th>
        </tr>
      </thead>
      <tbody>
        {t.windings.map((w) => (
          <tr>
            <th scope="row">
              {w.windingName}
              {w.halves === 2 ? ' (per half)' : ''}
            </th>
            <td class="num">{w.minimumRatedV !== null ? fv(w.minimumRatedV, 'V') : '—'}</td>
            <td class="num">{w.standardRatedV !== null ? fv(w.standardRatedV, 'V') : '—'}</td>
            <td class="num">{fv(w.ratedA, 'A')}</td>
            <td class="num">{fv(w.tuneUpRmsA, 'A')}</td>
            <td class="num">{fv(w.peakA, 'A')}</td>
            <td class="num">{fv(w.va, 'VA')}</td>
          </tr>
        ))}
      </tbody>
    </table>
    <p class="summary-line">
      {tuneUp
        ? `Sized for tune-up (a continuous carrier, as chosen): total ${fv(t.thermalVA, 'VA')}`
        : `Sized for CW operation: total ${fv(t.thermalVA, 'VA')} (${fv(t.tuneUpVA, 'VA')} with a continuous tune-up ` +
          `carrier, which this size carries only briefly)`}
      : choose {t.standardVA !== null ? fv(t.standardVA, 'VA') : 'a larger transformer than the list holds'}. Primary
      current {fv(t.primaryA, 'A')}.
    </p>
    {t.windings.map((w) =>
      w.paAtCheck ? (
        <p class="summary-line">
          With the recommended {w.windingName.replace(/ winding$/, '')} replacement (
          {w.standardRatedV !== null ? fv(w.standardRatedV, 'V') : '?'}, {fv(w.ratedA, 'A')}) the rail falls to{' '}
          {fv(w.paAtCheck.railV, 'V')} at low mains, key-down: {w.paAtCheck.stageName} gives about{' '}
          {fv(w.paAtCheck.outputW, 'W')} there ({fv(w.paAtCheck.fittedOutputW, 'W')} with the fitted winding).
        </p>
      ) : null,
    )}
    {t.crossRegulation ? (
      <table class="grid cross-regulation">
        <caption>
          Windings simulated together (the troughs the headroom checks use), the primary's{' '}
          {fv(t.crossRegulation.primaryOhm, 'Ω')} and {fv(t.crossRegulation.primaryH, 'H')} leakage shared, at low
          mains
          ({fv(t.crossRegulation.mainsV, 'V')})
        </caption>
        <thead>
          <tr>
            <th scope="col">Rail</th>
            <th class="num">Winding leakage</th>
            <th class="num">Trough alone</th>
            <th class="num">Together, key down</th>
            {t.crossRegulation.toleranceFraction !== null ? (
              <th class="num">Secondary −{fv(t.crossRegulation.toleranceFraction * 100, '%', 2)}</th>
            ) : null}
            <th class="num">Together, key up</th>
            <th class="num">Needed</th>
          </tr>
        </thead>
        <tbody>
          {t.crossRegulation.rails.map((x) => (
            <tr>
              <th scope="row">{x.railName}</th>
              <td class="num">
                {fv(x.leakageH, 'H')}
                {x.leakageFromRegulation ? ' (estimated)' : ''}
              </td>
              <td class="num">{fv(x.aloneTroughV, 'V')}</td>
              <td class="num">{fv(x.keyDownTroughV, 'V')}</td>
              {t.crossRegulation!.toleranceFraction !== null ? (
                <td class="num">{fv(x.toleranceTroughV, 'V')}</td>
              ) : null}
              <td class="num">{fv(x.keyUpTroughV, 'V')}</td>
              <td class="num">{x.requiredMinV > 0 ? fv(x.requiredMinV, 'V') : '—'}</td>
            </tr>
          ))}
        </tbody>
      </table>
    ) : null}
  </div>
);

export const SupplyResults: FC<{ report: SupplyReport; heat?: HeatBudget | null }> = ({ report, heat }) => {
  const inRails = new Set(report.rails.flatMap((r) => r.findings));
  const general = report.findings.filter((f) => !inRails.has(f));
  return (
    <div class="supply-results">
      <p class="summary-line">
        {report.mains
          ? `Mains ${fv(report.mains.lowV, 'V')} / ${fv(report.mains.nominalV, 'V')}` +
            ` / ${fv(report.mains.highV, 'V')} ` +
            `at ${fv(report.mains.frequencyHz, 'Hz')}. `
          : 'No mains: battery or external DC supply. '}
        {report.mains
          ? 'Headroom is judged at the lowest voltage (low mains, key-down); heat at the highest (high mains, CW ' +
            `duty ${pct(report.keyingDuty)}); a continuous tune-up carrier is shown too.`
          : "Headroom is judged at the battery's end voltage with the key down; heat with it fully charged (CW " +
            `duty ${pct(report.keyingDuty)}); a continuous tune-up carrier is shown too.`}
        {report.allConverged ? '' : ' Some simulations did not settle: their rows are marked.'}
      </p>
      <p class="caution-box">
        Mains, charged capacitors and shorted batteries can kill or burn: these are planning figures, not a safety
        approval. Fuse and earth the supply, discharge reservoirs before touching, and follow your local electrical code
        and licensed practice.
      </p>
      {report.rails.map((r) =>
        r.kind === 'rectified' ? (
          <RectifiedCard rail={r} />
        ) : r.kind === 'regulated' ? (
          <RegulatedCard rail={r} />
        ) : (
          <BatteryCard rail={r} />
        ),
      )}
      {heat ? <HeatCard heat={heat} /> : null}
      {report.transformers.length || report.primary || general.length ? (
        <section class="card supply-transformers">
          <h3>{report.transformers.length || report.primary ? 'Transformers and primary' : 'The supply as a whole'}</h3>
          {report.transformers.map((t) => (
            <TransformerCard t={t} tuneUp={sizedForTuneUp(report)} />
          ))}
          {report.primary ? (
            <p>
              <strong>Primary fuse:</strong>{' '}
              {report.primary.fuse.ratedA !== null
                ? `${report.primary.fuse.characteristic}${fv(report.primary.fuse.ratedA, 'A')}`
                : 'beyond the IEC 60127 series'}{' '}
              ({primaryTypeWords(report)})
              {report.primary.fittedA !== null ? ` (fitted ${fv(report.primary.fittedA, 'A')})` : ''}.{' '}
              {report.primary.fuse.reasoning}
            </p>
          ) : null}
          {report.primary ? <PrimaryFaultTable checks={report.primary.faultChecks} /> : null}
          {report.primary?.inrush ? (
            <p>
              <strong>Switch-on inrush:</strong> {inrushSummary(report.primary.inrush)}
            </p>
          ) : null}
          <FindingList findings={general} />
        </section>
      ) : null}
    </div>
  );
};
