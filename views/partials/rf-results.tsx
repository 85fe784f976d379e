// RF results: PA, low-pass filter (ideal vs fitted vs as-wound), |S21| plot, harmonics against the rule,
// T/R relay checks, RF exposure distances and the findings. Renders only what evaluateRf computed.
import type { FC } from 'hono/jsx';
import { raw } from 'hono/html';
import type { Finding } from '../../src/core/findings';
import { actionable, standingCautions } from '../../src/core/findings';
import { sourceText } from '../../src/core/sources/registry';
import { GOVERNS, RULE_SETS } from '../../src/core/rules/rule-set';
import { StandingCautions } from '../components/standing-cautions';
import type { PaResult } from '../../src/core/rf/pa';
import type { LpfStageResult, RfReport } from '../../src/core/rf/report';
import type { RelayResult } from '../../src/core/rf/tr-relay';
import { CONSTRUCTION_FLOOR_DBC, type HarmonicBasis } from '../../src/core/rf/harmonics';
import { MIN_DBC } from '../../src/core/rf/pa-spectrum';
import { formatValue as fv } from '../../src/core/units';
import { partsPowerLine, relayPowerLine } from '../../src/core/rf/stress-power';
import { marginText, worstMarginText } from '../components/harmonic-margin';
import { filterPlotSvg } from '../plots/filter-plot';
import { keyingPlotSvg } from '../plots/keying-plot';
import type { KeyingResult } from '../../src/core/rf/keying-eval';
import type { CoreRealisation } from '../../src/core/rf/cores-check';
import type { LNetwork, RfChoke } from '../../src/core/rf/output-network';
import { PaSwrTable } from './pa-swr-table';
import { ohmText } from '../../src/core/rf/pa-swr';
import { clampText } from '../../src/core/rf/pa-clamp';
import { KV, PaMagnetics } from './pa-magnetics';

const pct = (x: number) => `${(x * 100).toFixed(1)} %`;
const sevClass = (s: Finding['severity']) => `sev sev-${s}`;

/** A refused PA has no numbers to show (its result holds placeholders): say so instead of a table of zeros. */
const PaRefused: FC<{ name: string; pa: PaResult }> = ({ name, pa }) => (
  <div class="rf-pa">
    <h3>{name}: final amplifier</h3>
    <p class="form-errors" role="alert">
      Not computed: the PA data is refused (
      {pa.findings
        .filter((f) => f.severity === 'fail')
        .map((f) => f.subject)
        .join('; ')}
      ). Output, current and heat are unknown until it is corrected; see the failed checks below.
    </p>
  </div>
);

/** Which waveform gives the power, the budgeted current and the harmonics, in words. */
function waveformText(pa: PaResult): string {
  const w = pa.waveform;
  if (!w) return 'unknown';
  // "band" here is the spread of the waveform (typical to worst harmonics), not the amateur band
  const worstEnd = w.model === 'cosine-pulse'
    ? 'driven into hard saturation' : 'at the worst end of the harmonic bands';
  const band = `${fv(w.designOutputW, 'W')} at the design point, up to ${fv(w.bandMaxOutputW, 'W')} ${worstEnd}`;
  if (w.model === 'trapezoid')
    return `switched, ${fv(w.transitionTimeS, 's')} edges${w.transitionAssumed ? ' (assumed)' : ''}: ${band}`;
  if (w.model === 'class-e-simulated')
    return `simulated class E, loaded Q ${w.classELoadedQ?.[1]} to ${w.classELoadedQ?.[0]}: ${band}`;
  return `current pulse, edge of saturation to flat-topped: ${band}`;
}

/** The PA's design output after the filter, at the antenna connector (the report's, for the PA it was taken from). */
interface AfterFilter { outputW: number; lossDb: number }

const PaTable: FC<{ name: string; pa: PaResult; after: AfterFilter | null }> = ({ name, pa, after }) =>
  pa.refused ? (
    <PaRefused name={name} pa={pa} />
  ) : (
    <div class="rf-pa">
      <h3>{name}: final amplifier</h3>
      <KV
        rows={[
          [
            'Output at the PA (design load)',
            `${fv(pa.outputW, 'W')} = ${fv(pa.outputDbm, 'dBm')} = ${fv(pa.outputDbw, 'dBW')} at ` +
              `${fv(pa.railV, 'V')}` +
              (after
                ? `; ${fv(after.outputW, 'W')} at the antenna connector after the filter's ` +
                  `${fv(after.lossDb, 'dB')} loss`
                : ''),
          ],
          [
            'Against reference',
            `${fv(pa.vsReferenceDb, 'dB')} (${pa.vsReferenceSUnits.toFixed(1)} S-units at 6 dB each)`,
          ],
          ['Supply', `${fv(pa.railV, 'V')} (saturation drop ${fv(pa.saturationV, 'V')})`],
          pa.turnsRatioSource === 'network'
            ? ['Output match', `matching network presenting ${fv(pa.primaryOhm, 'Ω')} at the drain (no transformer)`]
            : [
                'Turns ratio (secondary : full primary)',
                `${pa.turnsRatio.toFixed(3)}` +
                  ` (${pa.turnsRatioSource})${
                    pa.idealTurnsRatio !== null
                      ? `; ${pa.idealTurnsRatio.toFixed(3)} would give the target power exactly`
                      : ''
                  }`,
              ],
          ['Drain load (full primary)', fv(pa.primaryOhm, 'Ω')],
          [
            'Efficiency',
            `${pct(pa.efficiency)}` +
              ` (${pa.efficiencySource === 'entered' ? 'entered' : 'class default, common practice'}; ` +
              `the ideal waveform's ${pct(pa.waveform?.idealEfficiency ?? NaN)})`,
          ],
          ['Waveform', waveformText(pa)],
          [
            'DC input / key-down current',
            // the budget carries the band's most (keyDownCurrentA); the design drive's is shown beside it
            `${fv(pa.keyDownCurrentA, 'A')} budgeted: the most the waveform draws` +
              (pa.waveform?.model === 'cosine-pulse' ? ', at hard saturation' : '') +
              ', where the worst harmonics are judged' +
              (pa.waveform && pa.keyDownCurrentA > pa.waveform.bandMaxCurrentA
                ? ` (${fv(pa.waveform.bandMaxCurrentA, 'A')} for the RF and ` +
                  `${fv(pa.keyDownCurrentA - pa.waveform.bandMaxCurrentA, 'A')} bias idle)`
                : '') +
              `${
                pa.waveform
                  ? `; at the design drive ${fv(
                      pa.waveform.designCurrentA + (pa.keyDownCurrentA - pa.waveform.bandMaxCurrentA),
                      'A',
                    )} (DC input ${fv(pa.dcInputW, 'W')})`
                  : `; DC input ${fv(pa.dcInputW, 'W')}`
              }`,
          ],
          ...(pa.swrKeyDownCurrentA !== null && pa.swrKeyDownCurrentA > pa.keyDownCurrentA
            ? [
                [
                  'Key-down current at the worst SWR',
                  `${fv(pa.swrKeyDownCurrentA, 'A')} (above the budgeted ${fv(pa.keyDownCurrentA, 'A')})`,
                ] as [string, string],
              ]
            : []),
          [
            'Peak drain voltage / device current (design load)',
            pa.maxRailV > pa.railV
              ? `${fv(pa.peakDrainV, 'V')} at the highest supply, ${fv(pa.maxRailV, 'V')} / ` +
                `${fv(pa.peakDeviceA, 'A')} at ${fv(pa.railV, 'V')}`
              : `${fv(pa.peakDrainV, 'V')} / ${fv(pa.peakDeviceA, 'A')}`,
          ],
          ...(pa.swr?.designLoad
            ? [
                [
                  'With a matched antenna, through the filter as built',
                  `the PA sees ${ohmText(pa.swr.designLoad.loadReOhm, pa.swr.designLoad.loadImOhm)} (filter input ` +
                    `SWR ${pa.swr.designLoad.inputSwr.toFixed(2)}): ${fv(pa.swr.designLoad.outputW, 'W')} ` +
                    `(${fv(pa.hotOutputW, 'W')} into the design load), drain peak ` +
                    `${fv(pa.swr.designLoad.drainPeakV, 'V')}, device current ` +
                    `${fv(pa.swr.designLoad.peakDeviceA, 'A')}` +
                    (pa.maxRailV > pa.hotRailV
                      ? ` (at the highest supply: ${fv(pa.maxRailV, 'V')} for the drain peak, ` +
                        `${fv(pa.hotRailV, 'V')} key-down for the rest)`
                      : ` (at the highest supply, ${fv(pa.maxRailV, 'V')})`),
                ] as [string, string],
              ]
            : []),
          ...(pa.clamp ? [['Drain clamp', clampText(pa.clamp)] as [string, string]] : []),
          [
            'Dissipation',
            `${fv(pa.thermal.dissipationTotalW, 'W')} key-down in all devices; ` +
              `${fv(pa.thermal.dissipationPerDeviceW, 'W')} per device, ` +
              `${fv(pa.thermal.averagePerDeviceW, 'W')} averaged over CW keying`,
          ],
          [
            (pa.thermal.sharedBy > 1
              ? `Heatsink needed, one per ${pa.thermal.sharedBy} devices`
              : 'Heatsink needed per device') +
              ' (Tj ≤ ' +
              fv(pa.thermal.tjTargetC, '°C') +
              ')',
            `${fv(pa.thermal.thetaSaNeededAverageKPerW, 'K/W')} for CW keying, ` +
              `${fv(pa.thermal.thetaSaNeededContinuousKPerW, 'K/W')} for a continuous tune-up carrier`,
          ],
          [
            'Junction with fitted heatsink',
            pa.thermal.tjAverageC === null
              ? 'no heatsink chosen'
              : `${fv(pa.thermal.tjAverageC, '°C')} keying, ${fv(pa.thermal.tjContinuousC, '°C')} continuous`,
          ],
        ]}
      />
      <PaSwrTable s={pa.swr} maxRailV={pa.maxRailV} hotRailV={pa.hotRailV} />
      {pa.ratioOptions.length > 0 ? (
        <table class="grid ratios">
          <caption>Practical transformer ratios (primary : secondary turns) and the power each gives</caption>
          <thead>
            <tr>
              <th>Turns</th>
              <th class="num">Secondary / primary</th>
              <th class="num">Drain load</th>
              <th class="num">Output</th>
            </tr>
          </thead>
          <tbody>
            {pa.ratioOptions.map((o) => (
              <tr class={o.turnsRatio === pa.turnsRatio ? 'chosen' : ''}>
                <td>
                  {o.label}
                  {o.turnsRatio === pa.turnsRatio ? ' ✓' : ''}
                </td>
                <td class="num">{o.turnsRatio.toFixed(3)}</td>
                <td class="num">{fv(o.primaryOhm, 'Ω')}</td>
                <td class="num">{fv(o.outputW, 'W')}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </div>
  );

const LpfTable: FC<{ name: string; lpf: LpfStageResult; report: RfReport; stageId: string }> = ({
  name,
  lpf,
  report,
  stageId,
}) => {
  const d = lpf.design;
  const a = lpf.analysis;
  const mc = lpf.monteCarlo;
  const svg = filterPlotSvg(report, stageId);
  return (
    <div class="rf-lpf">
      <h3>{name}: low-pass filter</h3>
      {lpf.errors.length > 0 ? (
        <ul class="field-errors">
          {lpf.errors.map((e) => (
            <li data-field={e.field}>{e.message}</li>
          ))}
        </ul>
      ) : null}
      {d ? (
        <>
          <p class="explain">
            {d.response === 'chebyshev'
              ? `Chebyshev, ${d.rippleDb} dB ripple (cutoff = ripple edge)`
              : 'Butterworth (cutoff = 3 dB point)'}
            , order {d.order}, {d.form}, cutoff {fv(d.cutoffHz, 'Hz')} (
            {d.cutoffSource === 'band-rule'
              ? 'chosen from the band: 1.2 × f for Chebyshev, 1.4 × f for Butterworth, at least 1.05 × the band ' +
                'top; common practice'
              : 'entered'}
            ), {fv(d.r0Ohm, 'Ω')}. Core: {d.coreName}; turns computed with AL {fv(d.coreAlHPerTurn2, 'H')}/turn².
            Shunt
            capacitors see up to {fv(lpf.capacitorPeakV, 'V')} peak.
          </p>
          <table class="grid lpf-parts">
            <thead>
              <tr>
                <th>Part</th>
                <th class="num">g</th>
                <th class="num">Ideal</th>
                <th>Fitted / wound</th>
                <th class="num">As built</th>
                <th class="num">Error</th>
              </tr>
            </thead>
            <tbody>
              {d.elements.map((e) => {
                const cap = e.kind === 'shunt-capacitor';
                const unit = cap ? 'F' : 'H';
                return (
                  <tr>
                    <td>{cap ? `C${e.index} (shunt)` : `L${e.index} (series)`}</td>
                    <td class="num">{e.g.toFixed(4)}</td>
                    <td class="num">{fv(e.idealValue, unit)}</td>
                    <td>{cap ? e.capacitorPartsF.map((c) => fv(c, 'F', 2)).join(' ∥ ') : `${e.turns} turns`}</td>
                    <td class="num">{fv(e.builtValue, unit)}</td>
                    <td class="num">{pct(e.errorFraction)}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </>
      ) : null}
      {a ? (
        <KV
          rows={[
            [
              'At the operating frequency',
              `loss ${fv(a.atOperating.lossDb, 'dB')}, input SWR ` +
                `${a.atOperating.inputSwr.toFixed(2)}, about ${fv(lpf.filterLossW, 'W')} dissipated as heat` +
                // the same power the parts' stress is taken at (the most the stage delivers as built)
                (lpf.realisation ? ` at ${fv(lpf.realisation.powerW, 'W')} from the PA` : '') +
                ' (reflected power excluded)',
            ],
            [
              'Across the band',
              `${fv(a.bandLowHz, 'Hz', 5)} – ${fv(a.bandHighHz, 'Hz', 5)}: worst loss ` +
                `${fv(a.bandMaxLossDb, 'dB')}, worst SWR ${a.bandMaxSwr.toFixed(2)}`,
            ],
            ...a.harmonics.map((h): [string, string] => {
              const m = mc?.harmonics.find((x) => x.n === h.n);
              return [
                `Attenuation at ${h.n}f (${fv(h.frequencyHz, 'Hz')})`,
                `${fv(h.attenuationDb, 'dB')}${
                  m
                    ? `; tolerances: worst ${fv(m.worstAttenuationDb, 'dB')}, ` +
                      `${mc?.percentile}th percentile ${fv(m.percentileAttenuationDb, 'dB')}`
                    : ''
                }`,
              ];
            }),
            ...(mc
              ? [
                  ['Monte Carlo', `${mc.trials} trials, seed ${mc.seed}, each part uniform within its tolerance`] as [
                    string,
                    string,
                  ],
                ]
              : []),
          ]}
        />
      ) : null}
      {svg ? <figure class="plot">{raw(svg)}</figure> : null}
      {lpf.realisation ? <Realisation r={lpf.realisation} basis={partsLine(report)} /> : null}
    </div>
  );
};

/** The capacitors' entered ratings ("500 V, 3 A"), or 'not entered'. */
const capRating = (r: CoreRealisation) =>
  [
    r.capacitorRatedV != null ? fv(r.capacitorRatedV, 'V') : null,
    r.capacitorRatedA != null ? fv(r.capacitorRatedA, 'A') : null,
  ]
    .filter((x) => x !== null)
    .join(', ') || 'not entered';

/** Which power the filter's and relay's parts are checked at, one line. */
const partsLine = (report: RfReport): string => partsPowerLine(report.powerBasis);

const Realisation: FC<{ r: CoreRealisation; basis: string }> = ({ r, basis }) => (
  <div class="rf-realisation">
    <h4>
      Parts at {fv(r.powerW, 'W')} into SWR {r.swr} (worst load phase)
    </h4>
    {basis ? <p class="explain" data-power-basis="parts">{basis}</p> : null}
    <p class="explain">
      {r.aeM2 !== null && r.leM !== null && r.permeability !== null
        ? `Core: Ae ${(r.aeM2 * 1e6).toFixed(1)} mm², le ${(r.leM * 1e3).toFixed(1)} mm, permeability about ` +
          `${r.permeability.toFixed(0)} from its AL. `
        : 'Core dimensions not entered: flux not checked. '}
      Self-resonance is an estimate (about 2 pF across a winding, 5 nH of capacitor lead).
    </p>
    <table class="grid realisation">
      <thead>
        <tr>
          <th>Part</th>
          <th class="num">Value</th>
          <th class="num">RF voltage (RMS)</th>
          <th class="num">RF current (RMS)</th>
          <th class="num">Peak flux</th>
          <th class="num">Limit / rating</th>
          <th class="num">Turns (fit)</th>
          <th class="num">Self-resonance</th>
        </tr>
      </thead>
      <tbody>
        {r.inductors.map((l) => (
          <tr>
            <td>L{l.index}</td>
            <td class="num">{fv(l.inductanceH, 'H')}</td>
            <td class="num">{fv(l.rmsV, 'V')}</td>
            <td class="num">{fv(l.rmsA, 'A')}</td>
            <td class="num">{l.peakFluxT !== null ? `${(l.peakFluxT * 1e3).toFixed(1)} mT` : 'not checked'}</td>
            <td class="num">
              {r.fluxLimitT != null ? `flux ≤ ${(r.fluxLimitT * 1e3).toFixed(1)} mT` : 'no flux limit'}
            </td>
            <td class="num">{`${l.turns}${l.fitTurns !== null ? ` (${l.fitTurns})` : ''}`}</td>
            <td class="num">{fv(l.selfResonanceHz, 'Hz', 3)}</td>
          </tr>
        ))}
        {r.capacitors.map((c) => (
          <tr>
            <td>C{c.index}</td>
            <td class="num">{fv(c.capacitanceF, 'F')}</td>
            <td class="num">{`${fv(c.rmsV, 'V')} (${fv(c.peakV, 'V')} peak)`}</td>
            <td class="num">{fv(c.rmsA, 'A')}</td>
            <td class="num">—</td>
            <td class="num">{capRating(r)}</td>
            <td class="num">—</td>
            <td class="num">{fv(c.selfResonanceHz, 'Hz', 3)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  </div>
);

const RelayTable: FC<{ name: string; r: RelayResult; basis: string }> = ({ name, r, basis }) => (
  <div class="rf-relay">
    <h3>{name}: T/R relay</h3>
    <KV
      rows={[
        ...(basis ? [['Power through the relay', `${fv(r.powerW, 'W')} (${basis})`] as [string, string]] : []),
        [
          'RF on the contacts',
          `${fv(r.rfPeakV, 'V')} peak (${fv(r.rfRmsV, 'V')} RMS), ${fv(r.rfRmsA, 'A')} RMS at SWR ` +
            `${r.swr} and ${fv(r.powerW, 'W')}`,
        ],
        ...(r.peakWithHarmonicsV !== null
          ? [['With harmonics (before the filter, upper bound)', fv(r.peakWithHarmonicsV, 'V')] as [string, string]]
          : []),
        [
          'Rating compared',
          `${fv(r.ratedPeakV, 'V')} peak (${r.ratedIsRf ? 'RF rating' : 'DC rating: no RF rating entered'})`,
        ],
        ['Receiver input during transmit', `${fv(r.receiverPowerW, 'W')} (${fv(r.receiverPowerDbm, 'dBm')})`],
        ['Timing', `dot ${fv(r.dotS, 's')}; transmit delay minus (operate + bounce) = ${fv(r.hotSwitchMarginS, 's')}`],
      ]}
    />
  </div>
);

const OutputNetworkTable: FC<{ name: string; n: LNetwork | null; c: RfChoke | null }> = ({ name, n, c }) => (
  <div class="rf-network">
    <h3>{name}: output network and feed choke</h3>
    <KV
      rows={[
        ...(n
          ? ([
              [
                'L network',
                `${fv(n.drainOhm, 'Ω')} drain load to ${fv(n.loadOhm, 'Ω')}` +
                  `, Q ${n.q.toFixed(2)}; series inductor on the ` +
                  `${n.shuntAt === 'load' ? 'drain' : 'load'} side, shunt capacitor across the ${n.shuntAt} side`,
              ],
              [
                'Series inductor',
                `${fv(n.seriesH, 'H')} ideal` +
                  `${
                    n.turns !== null && n.builtSeriesH !== null
                      ? `; ${n.turns} turns on the chosen core (the PA's output core, else the filter's) = ` +
                        `${fv(n.builtSeriesH, 'H')}`
                      : '; no core to count turns on'
                  }`,
              ],
              [
                'Shunt capacitor',
                `${fv(n.shuntF, 'F')} ideal; fit ` +
                  `${n.capacitorPartsF.map((x) => fv(x, 'F', 2)).join(' ∥ ')} = ${fv(n.builtShuntF, 'F')}`,
              ],
              ...(n.builtDrainReOhm !== null && n.builtDrainImOhm !== null
                ? [
                    [
                      'Drain load as built',
                      `${fv(n.builtDrainReOhm, 'Ω')} ${n.builtDrainImOhm < 0 ? '−' : '+'}` +
                        ` j${fv(Math.abs(n.builtDrainImOhm), 'Ω')}`,
                    ] as [string, string],
                  ]
                : []),
            ] as [string, string][])
          : []),
        ...(c
          ? [
              [
                'Feed choke',
                `at least ${fv(c.minInductanceH, 'H')} (reactance 10 × the drain load), carrying ` +
                  `${fv(c.currentA, 'A')} key-down`,
              ] as [string, string],
            ]
          : []),
      ]}
    />
  </div>
);

const ms = (s: number) => `${(s * 1e3).toFixed(1)} ms`;

const KeyingTable: FC<{ name: string; k: KeyingResult }> = ({ name, k }) => (
  <div class="rf-keying">
    <h3>{name}: keying</h3>
    <p class="explain">
      Spectrum of a steady dot train at {k.spectrum.wpm} WPM (lines every {fv(k.spectrum.lineSpacingHz, 'Hz')}), from
      the keyed envelope's{' '}
      {k.edges.shape === 'rc' ? `RC shaping (τ = ${ms(k.edges.timeConstantS)})` : 'raised-cosine edges'}. Key clicks
      are
      the strongest line at or beyond each offset, relative to the carrier.
    </p>
    <KV
      rows={[
        ['Rise / fall (10–90 %)', `${ms(k.riseS)} / ${ms(k.fallS)}`],
        [
          'Key clicks',
          k.spectrum.clicks.map((c) => `${fv(c.offsetHz, 'Hz')}: ${c.levelDbc.toFixed(0)} dBc`).join('; '),
        ],
        ['Occupied bandwidth (99 %)', fv(k.spectrum.occupiedBandwidthHz, 'Hz')],
        [
          'Necessary bandwidth Bn = B K',
          `${fv(k.necessaryFadingHz, 'Hz')} fading (K = 5), ${fv(k.necessaryNonFadingHz, 'Hz')} non-fading (K = 3); ` +
            `B = ${k.baud.toFixed(1)} Bd`,
        ],
        [
          'First element after the relay',
          `${ms(k.firstElementHalfS)} at half amplitude, ` +
            `${k.firstElementFullS > 0 ? ms(k.firstElementFullS) : 'never'} above 90 %`,
        ],
      ]}
    />
    <figure class="plot">{raw(keyingPlotSvg(name, k))}</figure>
  </div>
);

const Harmonics: FC<{ report: RfReport }> = ({ report }) => {
  const h = report.harmonics;
  if (!h) return <p class="explain">Harmonics not computed: see the findings.</p>;
  return (
    <div class="rf-harmonics">
      <h3>Harmonics at the antenna</h3>
      {report.powerBasis ? <p class="explain" data-power-basis="spurious">{report.powerBasis.spurious}</p> : null}
      <p class="explain">
        Rule: {h.ruleTitle}
        {h.ruleFromMemory ? ' (from memory, not confirmed: check the current text)' : ''}. Required{' '}
        {fv(h.requiredDb, 'dB')} below {fv(h.fundamentalW, 'W')} at the antenna connector. Each harmonic is a band
        from the PA's class (best to
        worst); compliance is judged on the worst end, and anything below {CONSTRUCTION_FLOOR_DBC} dBc at the antenna is
        limited by construction. Filter rejection (relative to the fundamental){' '}
        {h.rows[0] && h.rows[0].sourceBasis !== '50 Ω' ? (
          <>
            from the PA's own source at each harmonic: <span data-source-basis>{h.rows[0].sourceBasis}</span>; the 50 Ω
            figure below it for comparison.
          </>
        ) : (
          'between 50 Ω terminations.'
        )}
        {h.loadsCovered ? (
          <>
            {' '}
            The bands cover <span data-loads-covered>{h.loadsCovered}</span>: the stage's harmonics change with the load
            it meets, and each band runs from the best to the worst of them at the antenna.
          </>
        ) : null}
      </p>
      <table class="grid harmonics">
        <thead>
          <tr>
            <th class="num">n</th>
            <th class="num">Frequency</th>
            <th class="num">At PA</th>
            <th class="num">Filter</th>
            <th class="num">
              Filter,
              <br />
              worst tolerances
            </th>
            <th class="num">Predicted</th>
            <th class="num">Margin</th>
            <th class="num">
              Margin,
              <br />
              worst tolerances
            </th>
            <th>Check</th>
          </tr>
        </thead>
        <tbody>
          {h.rows.map((x) => (
            <tr data-harmonic={x.n}>
              <td class="num">{x.n}</td>
              <td class="num">{fv(x.frequencyHz, 'Hz')}</td>
              <td class="num">
                {band(x.paLevelBestDbc, x.paLevelDbc, false, false)}
                <span class="sub">{BASIS_WORDS[x.paLevelBasis]}</span>
              </td>
              <td class="num">
                {fv(x.filterAttenuationDb, 'dB')}
                {x.filterAttenuation50Db !== null && x.sourceBasis !== '50 Ω' ? (
                  <span class="sub">50 Ω: {fv(x.filterAttenuation50Db, 'dB')}</span>
                ) : null}
              </td>
              <td class="num">{fv(x.worstFilterAttenuationDb, 'dB')}</td>
              <td class="num">
                {band(x.predictedBestDbc, x.predictedDbc, x.bestLimitedByConstruction, x.limitedByConstruction)}
              </td>
              {/* below the construction floor the margin is counted from the floor: at least that much */}
              <td class="num">{marginText(x)}</td>
              <td class="num">{worstMarginText(x) ?? '—'}</td>
              <td>
                <span class={sevClass(x.severity)}>{x.severity}</span>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {h.loadsCovered ? (
        <ul class="explain" data-worst-loads>
          {h.rows.filter((x) => x.worstLoad !== null).map((x) => (
            <li>
              Harmonic {x.n}, worst end at {x.worstLoad}; best end at {x.bestLoad}.
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
};

const cap = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/** The relay's power in words; before the filter it carries the harmonics bound (tr-relay), no filter loss there. */
const relayLine = (report: RfReport, r: RelayResult): string =>
  relayPowerLine(report.powerBasis, report.lpfStageId !== null && r.peakWithHarmonicsV === null);

const Exposure: FC<{ report: RfReport }> = ({ report }) => {
  const e = report.exposure;
  if (!e) return null;
  return (
    <div class="rf-exposure">
      <h3>RF exposure (far-field estimate)</h3>
      {report.powerBasis ? <p class="explain" data-power-basis="exposure">{report.powerBasis.exposure}</p> : null}
      <KV
        rows={[
          [
            'Time-averaged power',
            `${fv(e.averagePowerW, 'W')} from ${fv(e.peakPowerW, 'W')} key-down; EIRP ` +
              `${fv(e.eirpW, 'W')}, ERP ${fv(e.erpW, 'W')}`,
          ],
          [
            'Limits',
            `${e.limitsName} (source: ` +
              `${sourceText(e.ruleSet === 'us-97-307' ? 'exposure.fcc-distance' : 'exposure.icnirp-distance')})`,
          ],
          [cap(e.generalLabel), `${fv(e.generalDistanceM, 'm')} (limit ${fv(e.limitGeneralWPerM2, 'W')}/m²)`],
          [cap(e.controlledLabel), `${fv(e.controlledDistanceM, 'm')} (limit ${fv(e.limitControlledWPerM2, 'W')}/m²)`],
          [
            'Near-field boundary λ/2π',
            `${fv(e.nearFieldDistanceM, 'm')}${
              e.farFieldValid ? '' : ': the distances above lie inside it and are estimates only'
            }`,
          ],
          ['Ground reflection', e.groundReflection ? 'included (factor 2.56)' : 'not included'],
          [
            'US exemption (47 CFR 1.1307(b)(3)(i)(C))',
            e.ruleSet !== 'us-97-307'
              ? 'not part of the ITU / CEPT rule set'
              : e.exempt === null
                ? '—'
                : e.exempt
                  ? `exempt for people at ${fv(e.nearFieldDistanceM, 'm')} or more (threshold ` +
                    `${fv(e.exemptionThresholdW, 'W')} ERP)`
                  : `evaluate for people closer than ${fv(e.exemptBeyondM, 'm')}`,
          ],
        ]}
      />
      <p class="caution">{e.caution}</p>
    </div>
  );
};

/** How each PA harmonic level was estimated, in words. */
const BASIS_WORDS: Record<HarmonicBasis, string> = {
  'square-wave-1/n': 'square wave (1/n)',
  'rectangular-50%-1/n': 'single-ended, 50 % duty (1/n)',
  'balance-residual': 'push-pull residual as entered',
  'cosine-pulse': 'current pulse, edge of saturation to flat-topped',
  'push-pull-imbalance': 'push-pull imbalance, typical to worst',
  'saturation-bound': 'clean to saturated',
  'trapezoid-wave': 'switched wave with its edges, duty band',
  'class-e-simulated': 'simulated class E, loaded Q band',
  'clipped-at-swr': 'flat-topped at the supply, worst SWR load (equivalent level)',
  'class-e-over-loads': 'simulated class E over loaded Q and the loads met (equivalent level)',
};

/**
 * "−62.0 to −38.5 dBc", "below −70 dBc to −41.0 dBc" (best end under the construction floor), or one number.
 */
function band(best: number, worst: number, bestLimited: boolean, worstLimited: boolean): string {
  const one = (x: number) => (x <= MIN_DBC ? 'none (ideal)' : fv(x, 'dBc'));
  if (worstLimited) return 'limited by construction';
  if (Math.abs(best - worst) < 0.05) return one(worst);
  return `${bestLimited ? `below ${CONSTRUCTION_FLOOR_DBC} dBc` : one(best)} to ${one(worst)}`;
}

export const RfFindings: FC<{ findings: Finding[] }> = ({ findings }) => (
  <>
    <ul class="findings">
      {actionable(findings).map((f) => (
        <li data-rule={f.rule}>
          <span class={sevClass(f.severity)}>{f.severity}</span> <strong>{f.subject}</strong>: {f.message}{' '}
          <span class="sub">(Source: {sourceText(f.source)})</span>
        </li>
      ))}
    </ul>
    <StandingCautions findings={standingCautions(findings)} />
  </>
);

/** The rule set in force, its sources, and who governs. */
export const RuleSetBlock: FC<{ ruleSet: RfReport['ruleSet'] }> = ({ ruleSet }) => {
  const info = RULE_SETS[ruleSet];
  return (
    <div class="rule-set" data-rule-set={ruleSet}>
      <p>
        <strong>Rule set: {info.label}.</strong> {GOVERNS}
      </p>
      <ul class="sources">
        {info.sources.map((k) => (
          <li data-source={k}>{sourceText(k)}</li>
        ))}
      </ul>
    </div>
  );
};

/** The report's output at the antenna connector belongs to its PA: the filter's loss at the operating frequency. */
function afterFilter(report: RfReport, stageId: string): AfterFilter | null {
  if (stageId !== report.paStageId || report.lpfStageId === null) return null;
  const lpf = report.stages.find((x) => x.stageId === report.lpfStageId)?.lpf;
  const lossDb = lpf?.analysis?.atOperating.lossDb;
  return lossDb === undefined ? null : { outputW: report.outputPowerW, lossDb };
}

/** The line under "RF design": where the output figure is taken and what it is compared with. */
function outputLine(report: RfReport): string {
  const pa = report.stages.find((x) => x.stageId === report.paStageId)?.pa;
  const target = `target ${fv(report.targetPowerW, 'W')}`;
  if (!pa || pa.refused) {
    return `${fv(report.outputPowerW, 'W')} at the antenna connector, taken from the ${target} (no PA computed)`;
  }
  const after = afterFilter(report, report.paStageId ?? '');
  return after
    ? `${fv(after.outputW, 'W')} at the antenna connector (${fv(pa.outputW, 'W')} from the PA into its design ` +
      `load at ${fv(pa.railV, 'V')}, less the filter's ${fv(after.lossDb, 'dB')}); ${target}`
    : `${fv(pa.outputW, 'W')} from the PA into its design load at ${fv(pa.railV, 'V')}; ${target}`;
}

export const RfResults: FC<{ report: RfReport }> = ({ report }) => (
  <section class="card" id="rf-results">
    <h2>RF design</h2>
    <p class="summary-line">
      {fv(report.frequencyHz, 'Hz', 5)}: {outputLine(report)}
    </p>
    <RuleSetBlock ruleSet={report.ruleSet} />
    {report.inputErrors.length > 0 ? (
      <ul class="field-errors">
        {report.inputErrors.map((e) => (
          <li data-field={e.field}>{e.message}</li>
        ))}
      </ul>
    ) : null}
    {report.stages.map((s) =>
      s.pa ? (
        <>
          <PaTable name={s.stageName} pa={s.pa} after={afterFilter(report, s.stageId)} />
          {s.network || s.choke ? (
            <OutputNetworkTable name={s.stageName} n={s.network ?? null} c={s.choke ?? null} />
          ) : null}
          <PaMagnetics s={s} />
        </>
      ) : s.lpf ? (
        <LpfTable name={s.stageName} lpf={s.lpf} report={report} stageId={s.stageId} />
      ) : s.relay ? (
        <>
          <RelayTable name={s.stageName} r={s.relay} basis={relayLine(report, s.relay)} />
          {s.keying ? <KeyingTable name={s.stageName} k={s.keying} /> : null}
        </>
      ) : null,
    )}
    <Harmonics report={report} />
    <Exposure report={report} />
    <h3>Findings</h3>
    <RfFindings findings={report.findings} />
  </section>
);
