// RF findings: PA, low-pass filter (components, turns, |S21| plot), harmonics, T/R relay, exposure.
import type { RfReport } from '../../core/rf/report';
import { GREY, FAIL, CAUTION, type Layout, type Row } from '../layout';
import { plot, BLUE, ORANGE } from '../plot';
import type { KeyingResult } from '../../core/rf/keying-eval';
import { SPECTRUM_FLOOR_DBC } from '../../core/rf/keying';
import { findingsList, fv, keyValues, notComputed } from './common';
import { sourceText } from '../../core/sources/registry';
import { ohmText, type PaSwrStress, type Worst } from '../../core/rf/pa-swr';
import { budgetDriveLabel, type PaWaveformSummary } from '../../core/rf/pa-dc';
import { CONSTRUCTION_FLOOR_DBC } from '../../core/rf/harmonics';
import { MIN_DBC } from '../../core/rf/pa-spectrum';
import { paOutputRows } from '../../core/rf/pa-output-rows';
import { clampText } from '../../core/rf/pa-clamp';
import { partsPowerLine, relayPowerLine } from '../../core/rf/stress-power';

// the load at the antenna with its phase and what the PA sees through the filter, or the PA's load with its phase
const loadText = (w: Worst) =>
  w.antennaReOhm === null || w.antennaImOhm === null
    ? `${ohmText(w.loadReOhm, w.loadImOhm)}, phase ${(w.phaseDeg ?? 0).toFixed(0)}°`
    : `antenna ${ohmText(w.antennaReOhm, w.antennaImOhm)}${w.phaseDeg === null ? ' (matched)' : `, phase ` +
      `${w.phaseDeg.toFixed(0)}°`}; at the PA ${ohmText(w.loadReOhm, w.loadImOhm)}`;

/**
 * Worst drain peak, current, dissipation and the output range round the SWR circle, each with its load; then where
 * the loads are, at which supplies, and what "phase" means.
 */
function swrText(s: PaSwrStress, maxRailV: number, hotRailV: number): string {
  const where = s.circleAt === 'antenna'
    ? 'Each antenna load on the circle (every 15°) is taken through the low-pass filter as built to the PA'
    : "No low-pass filter is known, so the circle (every 15°) is placed at the PA's output";
  const supplies = maxRailV > hotRailV
    ? `drain peaks at the highest supply, ${fv(maxRailV, 'V')}, the rest at the highest key-down supply, ` +
      `${fv(hotRailV, 'V')}`
    : `all at the highest supply, ${fv(maxRailV, 'V')}`;
  return (
    `drain peak ${fv(s.worstDrainPeak.value, 'V')} (${loadText(s.worstDrainPeak)}); ` +
    `current ${fv(s.worstPeakCurrent.value, 'A')} (${loadText(s.worstPeakCurrent)}); ` +
    `dissipation ${fv(s.worstDissipation.value, 'W')} (${loadText(s.worstDissipation)}); ` +
    `output ${fv(s.minOutput.value, 'W')} to ${fv(s.maxOutput.value, 'W')}. ${where}; ${supplies}. Phase is the ` +
    `angle of the ${s.circleAt === 'antenna' ? "antenna's" : "load's"} reflection coefficient (0° the highest ` +
    'resistance, 180° the lowest).'
  );
}

/** The waveform that gives the output, the budgeted current (the band's most) and the harmonics. */
function waveformLine(w: PaWaveformSummary, keyDownA: number): string {
  const what =
    w.model === 'trapezoid'
      ? `switched, ${fv(w.transitionTimeS, 's')} edges${w.transitionAssumed ? ' (assumed)' : ''}`
      : w.model === 'class-e-simulated'
        ? `simulated class E, loaded Q ${w.classELoadedQ?.[1]} to ${w.classELoadedQ?.[0]}`
        : 'current pulse, edge of saturation to flat-topped';
  // keyDownA is the band's most with the bias idle current
  const bias = keyDownA - w.bandMaxCurrentA;
  return (
    `${what}: ${fv(w.designOutputW, 'W')} and ${fv(w.designCurrentA + bias, 'A')} key-down at the design drive; ` +
    `up to ${fv(w.bandMaxOutputW, 'W')} and ${fv(keyDownA, 'A')} ` +
    `${w.model === 'cosine-pulse' ? 'driven into hard saturation' : 'at the worst end'}, where the worst harmonics ` +
    'are judged ' +
    '(the supply budget carries this)'
  );
}

/** The PA's design output at the antenna connector, after the filter's loss (for the report's own PA). */
function afterFilter(rf: RfReport, stageId: string): { outputW: number; lossDb: number } | null {
  if (stageId !== rf.paStageId || rf.lpfStageId === null) return null;
  const lossDb = rf.stages.find((x) => x.stageId === rf.lpfStageId)?.lpf?.analysis?.atOperating.lossDb;
  return lossDb === undefined ? null : { outputW: rf.outputPowerW, lossDb };
}

export function rfSection(l: Layout, rf: RfReport | null): void {
  l.heading('RF design');
  if (!rf) return notComputed(l, 'RF design');
  for (const s of rf.stages) {
    if (s.pa?.refused) {
      // a refused PA's numbers are placeholders: print none of them
      l.heading(`${s.stageName}: final amplifier`, 2);
      l.text('Not computed: the PA data is refused; output, current and heat are unknown (see the findings).', {
        color: GREY,
      });
    } else if (s.pa) {
      const p = s.pa;
      const after = afterFilter(rf, s.stageId);
      l.heading(`${s.stageName}: final amplifier`, 2);
      keyValues(
        l,
        [
          [
            'Output',
            `${fv(p.outputW, 'W')} (${fv(p.outputDbm, 'dBm')}) at the PA into its design load at ${fv(p.railV, 'V')}` +
              (after ? `; ${fv(after.outputW, 'W')} at the antenna connector after the filter's ` +
                `${fv(after.lossDb, 'dB')} loss` : '') +
              `; ${fv(p.vsReferenceDb, 'dB')} vs. reference (${p.vsReferenceSUnits.toFixed(1)} S-units)`,
          ],
          [
            'Supply',
            `${fv(p.railV, 'V')} rail, key-down ${fv(p.keyDownCurrentA, 'A')} budgeted (` +
              (p.waveform ? budgetDriveLabel(p.waveform.model) : 'the worst end of the harmonic bands') +
              '), ' +
              `DC input ${fv(p.dcInputW, 'W')} at the design drive, ` +
              `efficiency ${Math.round(p.efficiency * 100)} % ` +
              `(${p.efficiencySource === 'entered' ? 'entered' : 'class default, common practice'})`,
          ],
          ...(p.waveform ? [['Waveform', waveformLine(p.waveform, p.keyDownCurrentA)] as [string, string]] : []),
          [
            'Load',
            p.turnsRatioSource === 'network'
              ? `matching network, ${fv(p.primaryOhm, 'Ω')} at the drain`
              : `turns ratio ${p.turnsRatio.toFixed(2)} (${p.turnsRatioSource}), primary ${fv(p.primaryOhm, 'Ω')}`,
          ],
          [
            'Device stress',
            `into the design load: peak drain ${fv(p.peakDrainV, 'V')}` +
              (p.maxRailV > p.railV ? ` at the highest supply, ${fv(p.maxRailV, 'V')}` : '') +
              `, peak current ${fv(p.peakDeviceA, 'A')} at ${fv(p.railV, 'V')}`,
          ],
          ...(p.swr?.designLoad
            ? [
                [
                  'Matched antenna',
                  `through the filter as built the PA sees ` +
                    `${ohmText(p.swr.designLoad.loadReOhm, p.swr.designLoad.loadImOhm)} (filter input SWR ` +
                    `${p.swr.designLoad.inputSwr.toFixed(2)}): ${fv(p.swr.designLoad.outputW, 'W')} ` +
                    `(${fv(p.hotOutputW, 'W')} into the design load), peak drain ` +
                    `${fv(p.swr.designLoad.drainPeakV, 'V')}, peak current ${fv(p.swr.designLoad.peakDeviceA, 'A')}` +
                    (p.maxRailV > p.hotRailV
                      ? ` (drain peak at ${fv(p.maxRailV, 'V')}, the rest at ${fv(p.hotRailV, 'V')} key-down)`
                      : ` (at ${fv(p.maxRailV, 'V')})`),
                ] as [string, string],
              ]
            : []),
          ...(p.swr && p.swr.swr > 1
            ? [[`At SWR ${p.swr.swr}`, swrText(p.swr, p.maxRailV, p.hotRailV)] as [string, string]]
            : []),
          ...(p.clamp ? [['Drain clamp', clampText(p.clamp)] as [string, string]] : []),
          [
            'Heat',
            `${fv(p.thermal.dissipationTotalW, 'W')} key-down in all devices; junction ` +
              `${fv(p.thermal.tjAverageC, '°C')} average, ${fv(p.thermal.tjContinuousC, '°C')} continuous (target ` +
              `≤ ${fv(p.thermal.tjTargetC, '°C')}); heatsink ≤ ` +
              `${fv(p.thermal.thetaSaNeededContinuousKPerW, 'K/W')} for tune-up` +
              `${p.thermal.sharedBy > 1 ? ` (one heatsink for ${p.thermal.sharedBy} devices)` : ''}`,
          ],
        ],
        110,
        8.5,
      );
    }
    if (s.lpf) {
      l.heading(`${s.stageName}: low-pass filter`, 2, 120);
      const d = s.lpf.design;
      if (!d) {
        l.text('Filter not designed: see the findings below.', { color: GREY });
      } else {
        l.text(
          `${d.response === 'chebyshev' ? `Chebyshev, ${d.rippleDb} dB ripple` : 'Butterworth'}, order ${d.order}, ` +
            `${d.form}; cutoff ${fv(d.cutoffHz, 'Hz')} ` +
            `(${d.cutoffSource === 'entered' ? 'entered' : 'chosen from the band'}); ${fv(d.r0Ohm, 'Ω')}. ` +
            `Core: ${d.coreName}` +
            `. Shunt capacitors see up to ${fv(s.lpf.capacitorPeakV, 'V')} peak.`,
          { sizePt: 8.5, afterPt: 5 },
        );
        const rows: Row[] = d.elements.map((e) => {
          const cap = e.kind === 'shunt-capacitor';
          const unit = cap ? 'F' : 'H';
          return {
            cells: [
              `${cap ? 'C' : 'L'}${e.index}`,
              cap ? 'shunt capacitor' : 'series inductor',
              fv(e.idealValue, unit),
              cap ? e.capacitorPartsF.map((c) => fv(c, 'F')).join(' + ') : `${e.turns ?? '—'} turns`,
              fv(e.builtValue, unit),
              `${(e.errorFraction * 100).toFixed(1)} %`,
            ],
          };
        });
        l.table(
          [
            { header: 'Part', width: 0.08 },
            { header: 'Kind', width: 0.2 },
            { header: 'Ideal', width: 0.15, align: 'right' },
            { header: 'Fit', width: 0.27 },
            { header: 'As built', width: 0.15, align: 'right' },
            { header: 'Error', width: 0.15, align: 'right' },
          ],
          rows,
        );
      }
      const a = s.lpf.analysis;
      if (a) {
        plot(l, {
          title: `${s.stageName}: |S21| as built, with component losses`,
          xLabel: 'frequency (MHz)',
          yLabel: '|S21| (dB)',
          xLog: true,
          yMin: -80,
          yMax: 5,
          xTick: (v) => (v / 1e6).toPrecision(2).replace(/\.0$/, ''),
          yTick: (v) => v.toFixed(0),
          series: [
            {
              label: '|S21| (dB)',
              xs: a.sweep.map((p) => p.frequencyHz),
              ys: a.sweep.map((p) => p.s21Db),
              color: BLUE,
            },
          ],
          markers: [
            { x: rf.frequencyHz, label: 'f' },
            ...a.harmonics.map((h) => ({ x: h.frequencyHz, label: `${h.n}f` })),
          ],
          heightPt: 150,
        });
        keyValues(
          l,
          [
            [
              'Passband',
              `worst loss ${fv(a.bandMaxLossDb, 'dB')}, worst SWR ${a.bandMaxSwr.toFixed(2)} across ` +
                `${fv(a.bandLowHz, 'Hz', 5)}–${fv(a.bandHighHz, 'Hz', 5)}`,
            ],
          ],
          110,
          8.5,
        );
      }
      const re = s.lpf.realisation;
      if (re) {
        l.text(
          `Parts at ${fv(re.powerW, 'W')} into SWR ${re.swr} (worst load ` +
            `phase)` +
            `${
              re.aeM2 !== null && re.leM !== null
                ? `; core Ae ${(re.aeM2 * 1e6).toFixed(1)} mm², le ${(re.leM * 1e3).toFixed(1)} mm`
                : '; core dimensions not entered'
            }. Self-resonance estimated with about 2 pF across a winding and 5 nH of capacitor lead. ` +
            partsPowerLine(rf.powerBasis),
          { sizePt: 8.5, afterPt: 4 },
        );
        const flux = re.fluxLimitT ?? null;
        const ratedV = re.capacitorRatedV ?? null;
        const ratedA = re.capacitorRatedA ?? null;
        const over = (x: boolean) => (x ? FAIL : undefined);
        const capRating =
          [ratedV !== null ? `${fv(ratedV, 'V')}` : null, ratedA !== null ? `${fv(ratedA, 'A')}` : null]
            .filter((x) => x !== null)
            .join(', ') || 'not entered';
        const rows: Row[] = [
          ...re.inductors.map((x) => ({
            cells: [
              `L${x.index}`,
              fv(x.inductanceH, 'H'),
              fv(x.rmsV, 'V'),
              fv(x.rmsA, 'A'),
              x.peakFluxT !== null ? `${(x.peakFluxT * 1e3).toFixed(1)} mT` : 'not checked',
              flux !== null ? `flux ≤ ${(flux * 1e3).toFixed(1)} mT` : 'no flux limit',
              `${x.turns}${x.fitTurns !== null ? ` (fit ${x.fitTurns})` : ''}`,
              fv(x.selfResonanceHz, 'Hz', 3),
            ],
            color: over(
              (flux !== null && x.peakFluxT !== null && x.peakFluxT > flux) ||
                (x.fitTurns !== null && x.turns > x.fitTurns),
            ),
          })),
          ...re.capacitors.map((x) => ({
            cells: [
              `C${x.index}`,
              fv(x.capacitanceF, 'F'),
              `${fv(x.rmsV, 'V')} (${fv(x.peakV, 'V')} pk)`,
              fv(x.rmsA, 'A'),
              '—',
              capRating,
              '—',
              fv(x.selfResonanceHz, 'Hz', 3),
            ],
            color: over((ratedV !== null && x.peakV > ratedV) || (ratedA !== null && x.rmsA > ratedA)),
          })),
        ];
        l.table(
          [
            { header: 'Part', width: 0.06 },
            { header: 'Value', width: 0.1, align: 'right' },
            { header: 'RF voltage RMS', width: 0.17, align: 'right' },
            { header: 'RF current RMS', width: 0.12, align: 'right' },
            { header: 'Peak flux', width: 0.1, align: 'right' },
            { header: 'Limit / rating', width: 0.18, align: 'right' },
            { header: 'Turns', width: 0.11, align: 'right' },
            { header: 'Self-resonance', width: 0.16, align: 'right' },
          ],
          rows,
        );
        l.text(
          "Red: over the core's flux limit, turns that do not fit, or a capacitor over its voltage or current rating " +
            "(see the findings).",
          { sizePt: 8, color: GREY },
        );
      }
    }
    if (s.relay) {
      const r = s.relay;
      l.heading(`${s.stageName}: T/R relay`, 2);
      keyValues(
        l,
        [
          ...(rf.powerBasis
            ? [['Power through the relay', `${fv(r.powerW, 'W')} (${relayPowerLine(rf.powerBasis,
              rf.lpfStageId !== null && r.peakWithHarmonicsV === null)})`] as [string, string]]
            : []),
          [
            'RF on the contacts',
            `${fv(r.rfPeakV, 'V')} peak, ${fv(r.rfRmsA, 'A')} RMS at SWR ${r.swr} (rated ${fv(r.ratedPeakV, 'V')}` +
              ` peak${r.ratedIsRf ? ', RF rating' : ', DC rating'})`,
          ],
          ['Receiver leakage', `${fv(r.receiverPowerDbm, 'dBm')} during transmit`],
          [
            'Timing',
            `T/R delay minus (operate + bounce) = ${fv(r.hotSwitchMarginS, 's')}` +
              `${r.hotSwitchMarginS < 0 ? ': RF reaches moving contacts' : ''}; dot ${fv(r.dotS, 's')}`,
          ],
        ],
        110,
        8.5,
      );
    }
    if (s.keying) keying(l, s.stageName, s.keying);
    const n = s.network;
    const out = paOutputRows(s);
    if (n || s.choke || out.length) {
      l.heading(`${s.stageName}: output network${s.choke ? ' and feed choke' : ''}`, 2);
      keyValues(
        l,
        [
          ...(n
            ? [
                [
                  'L network',
                  `${fv(n.drainOhm, 'Ω')} to ${fv(n.loadOhm, 'Ω')}, Q ${n.q.toFixed(2)}: series ` +
                    `${fv(n.seriesH, 'H')}` +
                    `${
                      n.turns !== null && n.builtSeriesH !== null
                        ? ` (${n.turns} turns on the filter's core, ${fv(n.builtSeriesH, 'H')})`
                        : ''
                    }, shunt ${n.capacitorPartsF.map((x) => fv(x, 'F', 2)).join(' ∥ ')} across the ${n.shuntAt} side`,
                ] as [string, string],
              ]
            : []),
          ...(s.choke
            ? [
                [
                  'Feed choke',
                  `at least ${fv(s.choke.minInductanceH, 'H')}, carrying ${fv(s.choke.currentA, 'A')} key-down`,
                ] as [string, string],
              ]
            : []),
          ...out,
        ],
        110,
        8.5,
      );
    }
  }
  harmonics(l, rf);
  exposure(l, rf);
  l.heading('All RF findings', 2);
  findingsList(l, rf.findings);
}

function keying(l: Layout, name: string, k: KeyingResult): void {
  const ms = (x: number) => `${(x * 1e3).toFixed(1)} ms`;
  l.heading(`${name}: keying`, 2, 120);
  keyValues(
    l,
    [
      [
        'Edges (10–90 %)',
        `rise ${ms(k.riseS)}, fall ${ms(k.fallS)} (${k.edges.shape === 'rc' ? 'RC shaping network' : 'raised-cosine'}` +
          `) at ${k.spectrum.wpm} WPM`,
      ],
      ['Key clicks', k.spectrum.clicks.map((c) => `${fv(c.offsetHz, 'Hz')}: ${c.levelDbc.toFixed(0)} dBc`).join('; ')],
      [
        'Bandwidth',
        `occupied (99 %) ${fv(k.spectrum.occupiedBandwidthHz, 'Hz')}; necessary Bn = B K ` +
          `${fv(k.necessaryFadingHz, 'Hz')} (K = 5), ${fv(k.necessaryNonFadingHz, 'Hz')} (K = 3), B = ` +
          `${k.baud.toFixed(1)} Bd`,
      ],
      [
        'First element',
        `${ms(k.firstElementHalfS)} at half amplitude, ${k.firstElementFullS > 0 ? ms(k.firstElementFullS) : 'never'}` +
          ` above 90 %`,
      ],
    ],
    110,
    8.5,
  );
  const shown = k.spectrum.levelsDbc.map((v, i) => (v > SPECTRUM_FLOOR_DBC ? i : -1)).filter((i) => i >= 0);
  plot(l, {
    title: `${name}: keyed spectrum of a steady dot train (tops of the lines, one side of the carrier)`,
    xLabel: 'offset from the carrier (Hz)',
    yLabel: 'line level (dBc)',
    yMin: -120,
    yMax: 5,
    xTick: (v) => v.toFixed(0),
    yTick: (v) => v.toFixed(0),
    // the tops of the lines that carry power (a symmetric dot train has no even lines): the spectrum's envelope
    series: [
      {
        label: 'line level (dBc)',
        xs: shown.map((i) => k.spectrum.offsetsHz[i]),
        ys: shown.map((i) => Math.max(-120, k.spectrum.levelsDbc[i])),
        color: BLUE,
      },
    ],
    markers: k.spectrum.clicks.map((c) => ({ x: c.offsetHz, label: `${c.offsetHz}` })),
    heightPt: 130,
  });
}

const lvl = (x: number) =>
  x <= MIN_DBC ? 'none (ideal)' : x < CONSTRUCTION_FLOOR_DBC ? 'by construction' : fv(x, 'dBc');

function harmonics(l: Layout, rf: RfReport): void {
  const h = rf.harmonics;
  l.heading('Harmonics at the antenna', 2, 100);
  if (!h) return notComputed(l, 'Harmonics');
  l.text(
    `Rule: ${h.ruleTitle} — ${fv(h.requiredDb, 'dB')} below ${fv(h.fundamentalW, 'W')} at the antenna connector` +
      `${h.ruleFromMemory ? ' (from memory; check the current text)' : ''}. Source: ${sourceText(h.ruleSource)}` +
      (rf.powerBasis ? ` ${rf.powerBasis.spurious}` : ''),
    { sizePt: 8.5, afterPt: 4 },
  );
  const rows: Row[] = h.rows.map((x) => ({
    cells: [
      `${x.n}`,
      fv(x.frequencyHz, 'Hz'),
      lvl(x.paLevelDbc),
      fv(x.filterAttenuationDb, 'dB'),
      lvl(x.predictedBestDbc),
      lvl(x.predictedDbc),
      x.worstPredictedDbc !== null ? lvl(x.worstPredictedDbc) : '—',
      // below the construction floor the margin is counted from the floor: at least that much
      `${x.limitedByConstruction ? 'at least ' : ''}${fv(x.marginDb, 'dB')}`,
    ],
    color: x.severity === 'fail' ? FAIL : x.severity === 'caution' ? CAUTION : undefined,
  }));
  l.table(
    [
      { header: 'n', width: 0.05 },
      { header: 'Frequency', width: 0.13, align: 'right' },
      { header: 'At PA (worst)', width: 0.13, align: 'right' },
      { header: 'Filter', width: 0.11, align: 'right' },
      { header: 'Best end', width: 0.14, align: 'right' },
      { header: 'Worst end', width: 0.14, align: 'right' },
      { header: 'Worst end, worst tolerances', width: 0.16, align: 'right' },
      { header: 'Margin', width: 0.14, align: 'right' },
    ],
    rows,
  );
  l.text(
    `Each harmonic at the antenna is a band from the PA's class (best to worst end); compliance is judged on the ` +
      `worst end. "by construction": below ${CONSTRUCTION_FLOOR_DBC} dBc, where the build, not the filter, sets the ` +
      `level.`,
    { sizePt: 8, color: GREY },
  );
  if (h.loadsCovered) {
    // class E: the bands span the loads the stage meets; say which, and where each worst end lies
    const ends = h.rows.filter((x) => x.worstLoad !== null).map((x) => `${x.n}f at ${x.worstLoad}`).join('; ');
    l.text(`The bands cover ${h.loadsCovered}. Worst ends: ${ends}.`, { sizePt: 8, color: GREY });
  }
  const basis = h.rows[0]?.sourceBasis;
  if (basis)
    l.text(
      basis === '50 Ω'
        ? 'Filter rejection between 50 Ω terminations.'
        : `Filter rejection from the PA's own source at each harmonic: ${basis} (between 50 Ω terminations: ` +
          `${h.rows.map((x) => `${x.n}f ${fv(x.filterAttenuation50Db, 'dB')}`).join(', ')}).`,
      { sizePt: 8, color: GREY },
    );
  void ORANGE;
}

function exposure(l: Layout, rf: RfReport): void {
  const e = rf.exposure;
  l.heading('RF exposure', 2, 80);
  if (!e) return notComputed(l, 'RF exposure');
  if (rf.powerBasis) l.text(rf.powerBasis.exposure, { sizePt: 8.5, afterPt: 4 });
  keyValues(
    l,
    [
      [
        'Power',
        `${fv(e.peakPowerW, 'W')} key-down, ${fv(e.averagePowerW, 'W')} time-averaged, EIRP ${fv(e.eirpW, 'W')}`,
      ],
      [
        'Limits',
        `${e.limitsName}. Source: ` +
          `${sourceText(e.ruleSet === 'us-97-307' ? 'exposure.fcc-distance' : 'exposure.icnirp-distance')}`,
      ],
      [
        'Minimum distance',
        `${e.controlledDistanceM !== null ? fv(e.controlledDistanceM, 'm', 2) : 'outside the table'} ` +
          `${e.controlledLabel}; ` +
          `${e.generalDistanceM !== null ? fv(e.generalDistanceM, 'm', 2) : 'outside the table'} ${e.generalLabel}` +
          `${e.groundReflection ? ', ground reflection included' : ''}`,
      ],
      [
        'Near field',
        `inside ${fv(e.nearFieldDistanceM, 'm', 2)} the figures are estimates ` +
          `only${e.farFieldValid ? '' : ' (a distance above lies inside it)'}`,
      ],
    ],
    110,
    8.5,
  );
  l.text(e.caution, { sizePt: 8.5, color: CAUTION });
}
