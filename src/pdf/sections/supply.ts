// Supply design summary: transformer, reservoirs, fuses, bleeders, regulators, heatsinks, battery runtime,
// the rectifier waveform plot, and the supply's findings. Reads the supply report only.
import type {
  SupplyReport,
  RectifiedRailReport,
  RegulatedRailReport,
  BatteryRailReport,
  FaultCheck,
} from '../../core/power/report-types';
import { inrushSummary, type InrushReport } from '../../core/power/inrush';
import { STEADY_INPUT_WORDS, steadyInput } from '../../core/power/ripple-rejection';
import type { HeatBudget } from '../../core/power/heat-budget';
import { GREY, type Layout, type Row } from '../layout';
import { plot, BLUE, ORANGE } from '../plot';
import { findingsList, fv, keyValues, notComputed } from './common';
import { FUSE_SHEET_LABEL } from '../../core/power/fault';
import { airWords } from '../../core/thermal/bridge';

export function supplySection(l: Layout, supply: SupplyReport | null, heat: HeatBudget | null = null): void {
  l.heading('Power supply design');
  if (!supply) return notComputed(l, 'Supply design');
  if (supply.mains)
    keyValues(l, [
      [
        'Mains',
        `${fv(supply.mains.nominalV, 'V')} nominal, ${fv(supply.mains.lowV, 'V')} low, ` +
          `${fv(supply.mains.highV, 'V')} high, ${fv(supply.mains.frequencyHz, 'Hz')}`,
      ],
      ['Keying duty (heating)', `${Math.round(supply.keyingDuty * 100)} %`],
    ]);
  for (const t of supply.transformers) {
    l.heading(`Transformer: ${t.name} (${t.construction})`, 2);
    const rows: Row[] = t.windings.map((w) => ({
      cells: [
        w.windingName,
        fv(w.minimumRatedV, 'V'),
        fv(w.standardRatedV, 'V'),
        fv(w.ratedA, 'A'),
        fv(w.tuneUpRmsA, 'A'),
        fv(w.va, 'VA'),
      ],
    }));
    l.table(
      [
        { header: 'Winding', width: 0.3 },
        { header: 'Min. rated', width: 0.14, align: 'right' },
        { header: 'Standard', width: 0.14, align: 'right' },
        { header: 'Rated current', width: 0.14, align: 'right' },
        { header: 'Tune-up RMS', width: 0.14, align: 'right' },
        { header: 'VA', width: 0.14, align: 'right' },
      ],
      rows,
    );
    const tuneUp = supply.choices?.transformerSizing === 'tune-up';
    keyValues(l, [
      [
        'Transformer VA',
        `${fv(t.thermalVA, 'VA')} ${
          tuneUp ? 'sized for tune-up (a continuous carrier)' : 'at the thermal load (CW duty)'
        } → ${t.standardVA !== null ? fv(t.standardVA, 'VA') + ' standard' : 'beyond the standard list'}${
          tuneUp ? '' : ` (${fv(t.tuneUpVA, 'VA')} with a continuous carrier)`
        }`,
      ],
      ['Primary current', fv(t.primaryA, 'A')],
      ...t.windings
        .filter((w) => w.paAtCheck)
        .map((w): [string, string] => [
          `${w.windingName}, recommended${w.standardRatedV !== null ? ` ${fv(w.standardRatedV, 'V')}` : ''}`,
          `with it the rail is ${fv(w.paAtCheck!.railV, 'V')} at low mains, key-down, and ` +
            `${w.paAtCheck!.stageName} gives about ${fv(w.paAtCheck!.outputW, 'W')} ` +
            `(${fv(w.paAtCheck!.fittedOutputW, 'W')} with the winding as fitted)`,
        ]),
      ...(t.crossRegulation?.rails ?? []).map((x): [string, string] => [
        `${x.railName}, together`,
        `${fv(x.keyDownTroughV, 'V')} key-down, ${fv(x.keyUpTroughV, 'V')} key-up at low mains with the primary ` +
          `shared (alone ${fv(x.aloneTroughV, 'V')})`,
      ]),
    ]);
  }
  if (supply.primary) {
    const f = supply.primary.fuse;
    keyValues(l, [
      [
        'Primary fuse',
        `${f.ratedA !== null ? fv(f.ratedA, 'A') : 'beyond the series'} ${f.characteristic} (load ` +
          `${fv(f.loadA, 'A')} × ${f.factor})${
            supply.primary.fittedA !== null ? `; fitted ${fv(supply.primary.fittedA, 'A')}` : ''
          }; type ${FUSE_SHEET_LABEL[supply.choices?.primaryFuseSheet ?? 'T3']}`,
      ],
      ...supply.primary.faultChecks.map((c): [string, string] => [
        `${c.windingName} fault`,
        `${fv(c.reflectedA, 'A')} on the primary, ${c.check.multiple.toFixed(1)} × In: ${clearWords(c.check)}`,
      ]),
      ...(supply.primary.inrush ? [['Switch-on inrush', inrushWords(supply.primary.inrush)] as [string, string]] : []),
    ]);
  }
  for (const r of supply.rails) {
    if (r.kind === 'rectified') rectified(l, r);
    else if (r.kind === 'regulated') regulated(l, r);
    else battery(l, r);
  }
  if (heat) {
    l.heading('Heat in the enclosure', 2, 80);
    keyValues(
      l,
      [
        ...heat.sources.map((s): [string, string] => [s.name, `${fv(s.watts, 'W')} (${s.note})`]),
        [
          'Total inside',
          `${fv(heat.totalW, 'W')}${
            heat.riseK !== null
              ? `; rise ${fv(heat.riseK, 'K')}, about ${fv(heat.insideC, '°C')} inside`
              : '; enclosure not entered'
          }`,
        ],
      ],
      110,
      8.5,
    );
    findingsList(l, heat.findings, true);
  }
  l.heading('All supply findings', 2);
  findingsList(l, supply.findings);
}

/** The rectifier's dissipation, air, junction and the heatsink it needs, in words. */
function bridgeWords(r: RectifiedRailReport): string {
  const b = r.bridgeThermal!;
  const t = b.result;
  const tj = b.heatsinkFitted
    ? `${fv(t.junctionC, '°C')} on the ${fv(b.mount.thetaSaKPerW, 'K/W')} heatsink`
    : `${fv(t.freeAirJunctionC, '°C')} without a heatsink`;
  const need =
    t.requiredThetaSaKPerW !== null
      ? `heatsink ≤ ${fv(t.requiredThetaSaKPerW, 'K/W')} meets it`
      : 'no heatsink meets it';
  return `${fv(t.powerW, 'W')} ${b.basis === 'tune-up' ? 'continuous carrier' : 'CW duty'}` +
    `, ${airWords(t.ambientC, b.inside)}; junction ${tj} (target ${fv(t.targetC, '°C')}` +
    `); ${need}${b.assumed ? ' (assumed part)' : ''}`;
}

/** A fault check in words (IEC 60127-2 latest pre-arcing time against the time wanted). */
function clearWords(c: FaultCheck): string {
  if (c.latestS === null) return 'below 2.1 × In, IEC 60127-2 guarantees no time: may never clear';
  return `IEC 60127-2 ${c.sheet}: within ${fv(c.latestS, 's')} at most ` +
    `(${c.clears ? 'in time' : `wanted ${fv(c.allowedS, 's')}`})`;
}

function recommendations(
  l: Layout,
  r: { recommendations: { topic: string; text: string; reasoning: string }[] },
): void {
  for (const rec of r.recommendations) {
    l.text(`${rec.topic}: ${rec.text}`, { sizePt: 8.5, bold: true, afterPt: 0 });
    l.text(rec.reasoning, { sizePt: 8, color: GREY, indentPt: 10, afterPt: 3 });
  }
}

function rectified(l: Layout, r: RectifiedRailReport): void {
  l.heading(`${r.railName} (${r.topology} rectifier)`, 2, 120);
  l.text(`Required minimum at the ripple trough: ${fv(r.requiredMinV, 'V')} (${r.requirementNote})`, {
    sizePt: 8.5,
    color: GREY,
    afterPt: 4,
  });
  const rows: Row[] = r.corners.map((c) => ({
    cells: [
      c.label,
      fv(c.loadA, 'A'),
      fv(c.noLoadPeakV, 'V'),
      fv(c.dcMeanV, 'V'),
      fv(c.ripplePpV, 'V'),
      fv(c.troughV, 'V'),
      fv(c.headroomMarginV, 'V'),
    ],
    bold: c.id === r.worstVoltageCornerId,
  }));
  l.table(
    [
      { header: 'Corner', width: 0.31 },
      { header: 'Load', width: 0.11, align: 'right' },
      { header: 'No load', width: 0.115, align: 'right' },
      { header: 'Mean', width: 0.115, align: 'right' },
      { header: 'Ripple p-p', width: 0.115, align: 'right' },
      { header: 'Trough', width: 0.115, align: 'right' },
      { header: 'Margin', width: 0.12, align: 'right' },
    ],
    rows,
    8,
  );
  const res = r.reservoir;
  const b = r.bleeder;
  keyValues(
    l,
    [
      [
        'Reservoir',
        `${fv(res.fittedF, 'F')} fitted` +
          `${res.minimumF !== null ? `; ${fv(res.minimumF, 'F')} needed (${fv(res.standardF, 'F')} standard)` : ''}` +
          `; rated ≥ ${fv(res.recommendedRatedV, 'V')} (peak ${fv(res.noLoadPeakHighV, 'V')}); ripple current ` +
          `${fv(res.thermalRippleA, 'A')} RMS (${fv(res.tuneUpRippleA, 'A')} tune-up)`,
      ],
      ...(r.windingFuse?.check
        ? ([
            [
              'Winding fuse',
              `${
                r.windingFuse.fittedA !== null
                  ? `${fv(r.windingFuse.fittedA, 'A')} ${r.windingFuse.sheet} fitted`
                  : `none fitted; T${fv(r.windingFuse.fuse.ratedA, 'A')} recommended`
              } before the rectifier; shorted reservoir ` +
                `${fv(r.windingFuse.outputShortLowA, 'A')} (low mains), ` +
                `${r.windingFuse.check.multiple.toFixed(1)} × In: ${clearWords(r.windingFuse.check)}`,
            ],
          ] as [string, string][])
        : []),
      [
        'Rail fuse',
        `${r.fuse.ratedA !== null ? fv(r.fuse.ratedA, 'A') : 'beyond the series'} ` +
          `${r.fuse.characteristic} (load ${fv(r.fuse.loadA, 'A')} × ${r.fuse.factor})`,
      ],
      [
        'Bleeder',
        `${
          b.fittedOhm !== null
            ? `${fv(b.fittedOhm, 'Ω')} fitted: ${
              b.fittedTimeS !== null
                ? `below ${fv(b.safeV, 'V')} in ${fv(b.fittedTimeS, 's')}${
                  b.fittedW !== null
                    ? `, ${fv(b.fittedW, 'W')}${b.ratedW !== null ? ` of ${fv(b.ratedW, 'W')} rated` : ''}`
                    : ''
                }`
                : `the rail starts below ${fv(b.thresholdV, 'V')}`
            }`
            : 'none fitted'
        }; suggested ` +
          `${fv(b.suggestedOhm, 'Ω')} ` +
          `${b.suggestedW !== null ? `(${fv(b.suggestedW, 'W')})` : ''}; stored ${fv(b.storedJ, 'J')}`,
      ],
      ...(r.winding
        ? ([
            [
              'Winding',
              `${fv(r.winding.standardRatedV, 'V')} ${fv(r.winding.ratedA, 'A')} (peak ${fv(r.winding.peakA, 'A')})`,
            ],
          ] as [string, string][])
        : []),
      ...(r.bridgeThermal ? ([['Rectifier heat', bridgeWords(r)]] as [string, string][]) : []),
    ],
    110,
    8.5,
  );
  recommendations(l, r);
  const w = r.waveform;
  const worst = r.corners.find((c) => c.id === r.worstVoltageCornerId);
  const title = `${r.railName}: two mains cycles at ${worst?.label ?? 'the worst corner'}`;
  plot(l, {
    title,
    xLabel: 'time (ms)',
    yLabel: 'rail (V)',
    xTick: (v) => (v * 1000).toFixed(0),
    yTick: (v) => v.toFixed(1),
    series: [{ label: 'rail voltage (V)', xs: w.timeS, ys: w.outputV, color: BLUE }],
    heightPt: 95,
  });
  plot(l, {
    title: '',
    xLabel: 'time (ms)',
    yLabel: 'winding (A)',
    xTick: (v) => (v * 1000).toFixed(0),
    yTick: (v) => v.toFixed(1),
    series: [{ label: 'winding current (A)', xs: w.timeS, ys: w.windingA, color: ORANGE }],
    heightPt: 70,
  });
  keyingTransient(l, r);
  findingsList(l, r.findings, true);
}

/** The PA rail keyed from rest: the rail through the first dots and the first dot against a held key. */
function keyingTransient(l: Layout, r: RectifiedRailReport): void {
  const k = r.keyingTransient;
  if (!k || !k.elements.length) return;
  const sdb = (x: number) => `${x >= 0 ? '+' : ''}${x.toFixed(1)} dB`;
  const key = k.waveform.keyed.map((d) => (d ? k.keyDownMeanV : k.keyUpMeanV));
  const title = `${r.railName}: keyed from rest at ${k.wpm} WPM, nominal mains (dots of ${fv(k.dotS, 's')})`;
  plot(l, {
    title,
    xLabel: 'time from the first key-down (ms)',
    yLabel: 'rail (V)',
    xTick: (v) => (v * 1000).toFixed(0),
    yTick: (v) => v.toFixed(1),
    series: [
      { label: 'rail voltage (V)', xs: k.waveform.timeS, ys: k.waveform.railV, color: BLUE },
      { label: 'key: up / down (key-up and held-key levels)', xs: k.waveform.timeS, ys: key, color: ORANGE },
    ],
    heightPt: 95,
  });
  const first = k.elements[0];
  l.text(
    `${k.stageName}: the first dot gives ${fv(first.leadOutputW, 'W')} over its first ` +
      `${fv(k.leadS, 's')} (${sdb(first.leadVsSteadyDb)}) and ${fv(first.outputW, 'W')} over the dot ` +
      `(${sdb(first.vsSteadyDb)}) against ${fv(k.steadyOutputW, 'W')} with the key held ` +
      `(${fv(k.keyDownMeanV, 'V')}; ${fv(k.keyUpMeanV, 'V')} key-up).`,
    { sizePt: 8.5, color: GREY, afterPt: 4 },
  );
}

function regulated(l: Layout, r: RegulatedRailReport): void {
  l.heading(`${r.railName} (${r.regulator} regulator)`, 2, 100);
  const rows: Row[] = r.corners.map((c) => ({
    cells: [c.label, fv(c.outputA, 'A'), fv(c.inputTroughV, 'V'), fv(c.headroomV, 'V'), fv(c.dissipationW, 'W')],
    bold: c.id === r.worstVoltageCornerId,
  }));
  l.table(
    [
      { header: 'Corner', width: 0.4 },
      { header: 'Output', width: 0.15, align: 'right' },
      { header: 'Input trough', width: 0.15, align: 'right' },
      { header: 'Headroom', width: 0.15, align: 'right' },
      { header: 'Dissipation', width: 0.15, align: 'right' },
    ],
    rows,
    8,
  );
  const t = r.thermal;
  const kv: [string, string][] = [
    ['Output', `${fv(r.outputV, 'V')}, dropout ${fv(r.dropoutV, 'V')}`],
    ['Dissipation', `${fv(r.thermalDissipationW, 'W')} thermal load, ${fv(r.tuneUpDissipationW, 'W')} tune-up`],
  ];
  const rc = r.corners.find((c) => c.id === r.worstRippleCornerId);
  kv.push([
    'Output ripple',
    rc && rc.outputRipplePpV !== null
      ? `${fv(rc.outputRipplePpV, 'V')} p-p from ${fv(rc.inputRipplePpV, 'V')} p-p in ` +
        `(${r.rippleRejectionDb} dB, ${rc.label})` +
        `${r.rippleTargetV !== null ? `; target ${fv(r.rippleTargetV, 'V')}` : ''}`
      : steadyInput(r.corners)
        ? STEADY_INPUT_WORDS
        : 'unknown: ripple rejection not stated',
  ]);
  const ob = r.bleeder;
  if (ob)
    kv.push([
      'Output bleeder',
      ob.fittedTimeS !== null
        ? `${ob.fittedOhm !== null ? `${fv(ob.fittedOhm, 'Ω')}: ` : ''}below ` +
          `${fv(ob.safeV, 'V')} within about ${fv(ob.fittedTimeS, 's')} (upper bound)` +
          `${
            ob.fittedW !== null
              ? `, ${fv(ob.fittedW, 'W')}${ob.ratedW !== null ? ` of ${fv(ob.ratedW, 'W')} rated` : ''}`
              : ''
          }`
        : `may stay at ${fv(ob.startV, 'V')}` +
          `: ${ob.why}${ob.suggestedOhm !== null ? `; suggested ${fv(ob.suggestedOhm, 'Ω')}` : ''}`,
    ]);
  if (t)
    kv.push([
      'Heatsink',
      t.needsHeatsink
        ? `needed: at most ${fv(t.requiredThetaSaKPerW, 'K/W')}; junction ` +
          `${t.junctionC !== null ? fv(t.junctionC, '°C') : 'no heatsink chosen'} (target ≤ ${fv(t.targetC, '°C')})`
        : `none needed (free air ${fv(t.freeAirJunctionC, '°C')})`,
    ]);
  keyValues(l, kv, 110, 8.5);
  recommendations(l, r);
  findingsList(l, r.findings, true);
}

function battery(l: Layout, r: BatteryRailReport): void {
  l.heading(`${r.railName} (battery)`, 2, 80);
  keyValues(
    l,
    [
      [
        'Voltage',
        `${fv(r.fullV, 'V')} full, ${fv(r.endV, 'V')} end, ${fv(r.loadedEndV, 'V')} at end under key-down load (need ` +
          `≥ ${fv(r.requiredMinV, 'V')})`,
      ],
      ['Average current', `${fv(r.averageA, 'A')} (receive ${Math.round(r.receiveFraction * 100)} % of the time)`],
      ['Runtime', `about ${fv(r.runtimeS / 3600, '', 2)} h on the usable capacity`],
      ...(r.curve
        ? [
            [
              'Discharge curve',
              `${r.curve.chemistry}, ${r.curve.cells} cells: plateau ` +
                `${fv(r.curve.plateauV, 'V')} (${fv(r.curve.loadedPlateauV, 'V')} under key-down); the loads run to ` +
                `${fv(r.curve.stopV, 'V')}, ${Math.round(r.curve.usedFraction * 100)} % of the capacity, about ` +
                `${fv(r.curve.runtimeS / 3600, '', 2)} h`,
            ] as [string, string],
          ]
        : []),
      ...(r.pa
        ? [
            [
              r.pa.stageName,
              `about ${fv(r.pa.plateauOutputW, 'W')} for most of the charge ` +
                `(${fv(r.pa.plateauRailV, 'V')}), ${fv(r.pa.endOutputW, 'W')} near the end (${fv(r.pa.endRailV, 'V')})`,
            ] as [string, string],
          ]
        : []),
      [
        'Battery fuse',
        `${r.fuse.ratedA !== null ? fv(r.fuse.ratedA, 'A') : 'beyond the series'} ` +
          `${r.fuse.characteristic}, at the battery terminal`,
      ],
    ],
    110,
    8.5,
  );
  recommendations(l, r);
  findingsList(l, r.findings, true);
  void GREY;
}

/** The inrush against the primary fuse (the same words as the supply page). */
const inrushWords = (r: InrushReport): string => inrushSummary(r);
