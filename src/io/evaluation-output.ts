// The evaluation as the CLI prints it: a readable table, or JSON with stable keys (documented in README).
import type { Project } from '../core/model';
import { MODES, MODE_LABELS } from '../core/model';
import type { EvaluationReport } from '../core/evaluate';
import { formatValue } from '../core/units';
import type { Worst } from '../core/rf/pa-swr';
import { budgetDriveLabel } from '../core/rf/pa-dc';
import { formatMoney } from '../core/cost/money';
import { actionable, standingCautions } from '../core/findings';
import { isSourceKey, sourceText } from '../core/sources/registry';
import { GOVERNS, RULE_SETS } from '../core/rules/rule-set';
import { roleLines } from './roles-text';
import { inrushSummary } from '../core/power/inrush';
import { STEADY_INPUT_WORDS, steadyInput } from '../core/power/ripple-rejection';

export const EVALUATION_FORMAT = 'rigwright-evaluation';
export const EVALUATION_FORMAT_VERSION = 1;

export function evaluationJson(project: Project, report: EvaluationReport) {
  return {
    format: EVALUATION_FORMAT,
    formatVersion: EVALUATION_FORMAT_VERSION,
    project: {
      id: project.id,
      name: project.name,
      frequencyHz: project.frequencyHz,
      targetPowerW: project.targetPowerW,
      kits: project.kits,
    },
    ...(withSourceText(report) as EvaluationReport),
  };
}

/**
 * The report with every source key replaced by the registry text a reader can look up (the key is kept beside it as
 * `sourceKey`), and every finding's kind written out ('actionable' or 'standing').
 */
export function withSourceText(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(withSourceText);
  if (value === null || typeof value !== 'object') return value;
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(value)) out[k] = withSourceText(v);
  for (const k of ['source', 'ruleSource'] as const) {
    const key = out[k];
    if (typeof key === 'string' && isSourceKey(key)) {
      out[k] = sourceText(key);
      out[`${k}Key`] = key;
    }
  }
  if ('severity' in out && 'rule' in out && 'sourceKey' in out) out.kind = out.kind ?? 'actionable';
  return out;
}

const pad = (s: string, n: number) => (s.length >= n ? s.slice(0, n) : s + ' '.repeat(n - s.length));
const lpad = (s: string, n: number) => (s.length >= n ? s : ' '.repeat(n - s.length) + s);

export function renderEvaluationText(project: Project, report: EvaluationReport): string {
  const out: string[] = [];
  out.push(`${project.name}`);
  out.push(
    `${formatValue(project.frequencyHz, 'Hz', 4)}, ${formatValue(project.targetPowerW, 'W')}, ${project.kits} kit(s)`,
  );
  out.push(`Rule set: ${RULE_SETS[project.rf.spuriousRule].label}. ${GOVERNS}`);
  out.push('');
  out.push('Current budget (A delivered per rail)');
  out.push(
    "  Volts: mean at nominal mains, receive / key-down, and the key-down trough (supply design); powers use each " +
      "mode's mean",
  );
  out.push(`${pad('Rail', 40)}${lpad('Volts', 9)}${MODES.map((m) => lpad(MODE_LABELS[m], 13)).join('')}`);
  for (const r of report.budget.rails) {
    out.push(
      `${pad('  '.repeat(r.depth) + r.name, 40)}${lpad(formatValue(r.modeV?.receive ?? r.nominalV, 'V'), 9)}${
        MODES.map((m) => lpad(formatValue(r.outputA[m], 'A'), 13)).join('')
      }`,
    );
    if (r.modeV)
      out.push(
        `${pad('', 40)}  key-down ${formatValue(r.modeV.keyDown, 'V')}, trough ` +
          `${formatValue(r.keyDownTroughV ?? NaN, 'V')}`,
      );
  }
  out.push(
    `${pad('All sources, DC power', 49)}${
      MODES.map((m) => lpad(formatValue(report.budget.totalW[m], 'W'), 13)).join('')
    }`,
  );
  out.push(...supplyLines(report), ...rfLines(report), ...costLines(report), ...roleLines(report));
  out.push('');
  const act = actionable(report.findings);
  out.push(`Findings (${act.length}, most severe first)`);
  for (const f of act)
    out.push(`  [${f.severity.toUpperCase()}] ${f.subject}: ${f.message} (Source: ${sourceText(f.source)})`);
  const standing = standingCautions(report.findings);
  if (standing.length) {
    out.push('');
    out.push('Standing cautions (true of every station of this kind; not counted in the verdict)');
    for (const f of standing) out.push(`  ${f.subject}: ${f.message} (Source: ${sourceText(f.source)})`);
  }
  return `${out.join('\n')}\n`;
}

function supplyLines(report: EvaluationReport): string[] {
  const s = report.supply;
  if (!s) return [];
  const out = [
    '',
    s.mains ? 'Supply design (headroom at the worst voltage corner: low mains, key-down)' : 'Supply design',
  ];
  for (const r of s.rails) {
    if (r.kind === 'rectified') {
      const c = r.corners.find((x) => x.id === r.worstVoltageCornerId);
      const fuse =
        r.fuse.ratedA !== null ? `${r.fuse.characteristic}${formatValue(r.fuse.ratedA, 'A')}` : 'beyond the series';
      out.push(
        `  ${r.railName}: trough ${formatValue(c?.troughV, 'V')}` +
          ` (${
            r.requiredMinV > 0 ? `needs ${formatValue(r.requiredMinV, 'V')}` : 'no regulator fed, no minimum stated'
          }), ripple ${formatValue(c?.ripplePpV, 'V')} p-p, reservoir >= ` +
            `${formatValue(r.reservoir.recommendedRatedV, 'V')} rated, rail fuse ${fuse}`,
      );
      const b = r.bleeder;
      if (b.fittedOhm !== null)
        out.push(
          `    bleeder ${formatValue(b.fittedOhm, 'Ω')}: below ${formatValue(b.safeV, 'V')}` +
            ` in ${formatValue(b.fittedTimeS ?? 0, 's')}, ${formatValue(b.fittedW ?? 0, 'W')}` +
            ` at ${formatValue(b.startV, 'V')}${b.ratedW !== null ? ` (rated ${formatValue(b.ratedW, 'W')})` : ''}`,
        );
      else out.push(`    no bleeder fitted (reservoir up to ${formatValue(b.startV, 'V')})`);
      const bt = r.bridgeThermal;
      if (bt)
        out.push(
          `    rectifier ${formatValue(bt.result.powerW, 'W')}` +
            ` (${bt.basis === 'tune-up' ? 'continuous carrier' : 'CW duty'}) at ` +
            `${formatValue(bt.result.ambientC, '°C')} ${bt.inside ? 'inside the box' : 'room'}: junction ` +
            `${formatValue(bt.heatsinkFitted ? bt.result.junctionC! : bt.result.freeAirJunctionC, '°C')} ${
              bt.heatsinkFitted ? 'on its heatsink' : 'without heatsink'
            } (target ` +
              `${formatValue(bt.result.targetC, '°C')})${
                bt.result.requiredThetaSaKPerW !== null
                  ? `, heatsink <= ${formatValue(bt.result.requiredThetaSaKPerW, 'K/W')} meets it`
                  : ''
              }`,
        );
      const wf = r.windingFuse;
      if (wf?.check) {
        const clear =
          wf.check.latestS === null
            ? 'not cleared (below 2.1 x In)'
            : `cleared within ${formatValue(wf.check.latestS, 's')} (IEC 60127-2 ${wf.check.sheet})`;
        out.push(
          `    ${wf.windingName} fuse ${wf.fittedA !== null ? 'fitted' : 'recommended'}` +
            ` T${formatValue(wf.check.fuseA, 'A')}: shorted reservoir ` +
            `${formatValue(wf.outputShortLowA, 'A')} at low mains (input short ` +
            `${formatValue(wf.inputShortLowA, 'A')} to ${formatValue(wf.inputShortHighA, 'A')}), ${clear}`,
        );
      }
      const kt = r.keyingTransient;
      if (kt?.elements.length) {
        const sdb = (x: number) => `${x >= 0 ? '+' : ''}${x.toFixed(1)} dB`;
        out.push(
          `    keyed from rest at ${kt.wpm} WPM (nominal mains): ` +
            `${formatValue(kt.keyUpMeanV, 'V')} key-up, ${formatValue(kt.keyDownMeanV, 'V')} key held; first dot ` +
            `${sdb(kt.firstLeadDb)} over its first ${formatValue(kt.leadS, 's')}` +
            `, ${sdb(kt.firstElementDb)} over the dot, against a held key`,
        );
      }
    } else if (r.kind === 'regulated') {
      const tj = r.thermal?.junctionC != null ? `, junction ${formatValue(r.thermal.junctionC, '°C')}` : '';
      out.push(
        `  ${r.railName}: ${formatValue(r.outputV, 'V')}, ${formatValue(r.thermalDissipationW, 'W')} in CW use${tj}`,
      );
      const rc = r.corners.find((c) => c.id === r.worstRippleCornerId);
      if (rc && rc.outputRipplePpV !== null)
        out.push(
          `    ripple ${formatValue(rc.inputRipplePpV, 'V')} p-p in, ` +
            `${formatValue(rc.outputRipplePpV, 'V')} p-p out (${r.rippleRejectionDb} dB, ` +
            `${rc.label})${r.rippleTargetV !== null ? `, target ${formatValue(r.rippleTargetV, 'V')}` : ''}`,
        );
      else if (steadyInput(r.corners)) out.push(`    ${STEADY_INPUT_WORDS}`);
      else out.push(`    ripple at the output unknown: ripple rejection not stated`);
      const ob = r.bleeder;
      if (ob)
        out.push(
          ob.fittedTimeS !== null
            ? `    output below ${formatValue(ob.safeV, 'V')} within ` +
              `${formatValue(ob.fittedTimeS, 's')} after switch-off (upper ` +
              `bound)${ob.fittedW !== null ? `, bleeder ${formatValue(ob.fittedW, 'W')}` : ''}`
            : `    output may stay charged: ` +
              `${ob.why}${ob.suggestedOhm !== null ? `; suggested bleeder ${formatValue(ob.suggestedOhm, 'Ω')}` : ''}`,
        );
    } else {
      out.push(
        `  ${r.railName}: runtime about ${(r.runtimeS / 3600).toFixed(1)} h, end of discharge under load ` +
          `${formatValue(r.loadedEndV, 'V')}`,
      );
      if (r.curve)
        out.push(
          `    ${r.curve.chemistry} curve (${r.curve.cells} cells): plateau ` +
            `${formatValue(r.curve.plateauV, 'V')} (${formatValue(r.curve.loadedPlateauV, 'V')} under key-down), ` +
            `loads run to ${formatValue(r.curve.stopV, 'V')}` +
            `: ${Math.round(r.curve.usedFraction * 100)} % of capacity, about ` +
            `${(r.curve.runtimeS / 3600).toFixed(1)} h`,
        );
      if (r.pa)
        out.push(
          `    ${r.pa.stageName}: about ${formatValue(r.pa.plateauOutputW, 'W')} on the plateau ` +
            `(${formatValue(r.pa.plateauRailV, 'V')}), ${formatValue(r.pa.endOutputW, 'W')} at the end ` +
            `(${formatValue(r.pa.endRailV, 'V')})`,
        );
    }
  }
  for (const t of s.transformers) {
    out.push(
      s.choices?.transformerSizing === 'tune-up'
        ? `  ${t.name}: ${t.thermalVA.toFixed(0)} VA with a continuous carrier -> ` +
          `${t.standardVA ?? '?'} VA standard (sized for tune-up), primary ${formatValue(t.primaryA, 'A')}`
        : `  ${t.name}: ${t.thermalVA.toFixed(0)} VA in CW use -> ${t.standardVA ?? '?'} VA standard (sized for CW; ` +
          `${t.tuneUpVA.toFixed(0)} VA with a continuous carrier), primary ${formatValue(t.primaryA, 'A')}`,
    );
    for (const w of t.windings)
      if (w.paAtCheck)
        out.push(
          `    recommended ${w.windingName}: ${formatValue(w.paAtCheck.railV, 'V')} at low mains, key-down; ` +
            `${w.paAtCheck.stageName} about ${formatValue(w.paAtCheck.outputW, 'W')} (fitted: ` +
            `${formatValue(w.paAtCheck.fittedOutputW, 'W')})`,
        );
    const cr = t.crossRegulation;
    if (cr)
      out.push(
        `    windings together: primary ${formatValue(cr.primaryOhm, 'Ω')} and ` +
          `${formatValue(cr.primaryH, 'H')} leakage ` +
          `shared` +
          `${
            cr.toleranceFraction !== null ? `, secondary tolerance ${formatValue(cr.toleranceFraction * 100, '%')}` : ''
          }`,
      );
    for (const x of cr?.rails ?? [])
      out.push(
        `    together, low mains: ${x.railName} ${formatValue(x.keyDownTroughV, 'V')} key-down` +
          `${x.toleranceTroughV !== null ? ` (${formatValue(x.toleranceTroughV, 'V')} at the low tolerance)` : ''}, ${
            formatValue(x.keyUpTroughV, 'V')
          } key-up (alone ${formatValue(x.aloneTroughV, 'V')}); ${x.windingName} leakage ` +
            `${formatValue(x.leakageH, 'H')}${x.leakageFromRegulation ? ' estimated' : ''}`,
      );
  }
  const h = report.heat;
  if (h)
    out.push(
      `  Heat inside: ${formatValue(h.totalW, 'W')} in CW use` +
        `${
          h.riseK !== null
            ? `, rise ${formatValue(h.riseK, 'K')} (about ${formatValue(h.insideC, '°C')} inside)`
            : ' (enclosure not entered)'
        }`,
    );
  if (s.primary?.fuse.ratedA)
    out.push(
      `  Primary fuse: ` +
        `${s.primary.fuse.characteristic}${formatValue(s.primary.fuse.ratedA, 'A')} (IEC 60127-2 ` +
        `${s.choices?.primaryFuseSheet ?? 'T3'}, IEC 60127 series)`,
    );
  for (const f of s.primary?.faultChecks ?? []) {
    out.push(
      `    ${f.windingName} fault reflected to the primary: ${formatValue(f.reflectedA, 'A')}` +
        `, ${f.check.multiple.toFixed(1)} x In: ${f.check.clears ? 'cleared' : 'not cleared'} within ` +
        `${f.check.allowedS} s`,
    );
  }
  const ir = s.primary?.inrush;
  if (ir) out.push(`    switch-on inrush: ${inrushSummary(ir)}`);
  return out;
}

const zText = (re: number, im: number) => `${re.toFixed(1)} ${im < 0 ? '-' : '+'} j${Math.abs(im).toFixed(1)} ohm`;

/** Where the worst SWR load lies: at the antenna and what the PA sees through the filter, else the PA's own load. */
function ohmAt(w: Worst): string {
  if (w.antennaReOhm === null || w.antennaImOhm === null) {
    return `into ${zText(w.loadReOhm, w.loadImOhm)} (phase ${(w.phaseDeg ?? 0).toFixed(0)} deg, at the PA output)`;
  }
  const at = w.phaseDeg === null ? `with a matched antenna (${zText(w.antennaReOhm, w.antennaImOhm)})`
    : `with the antenna at ${zText(w.antennaReOhm, w.antennaImOhm)} (phase ${w.phaseDeg.toFixed(0)} deg)`;
  return `${at}, the PA seeing ${zText(w.loadReOhm, w.loadImOhm)} through the filter`;
}

function rfLines(report: EvaluationReport): string[] {
  const rf = report.rf;
  const out = ['', 'RF'];
  for (const st of rf.stages) {
    if (st.pa)
      out.push(
        `  ${st.stageName}: ${formatValue(st.pa.outputW, 'W')} out from ` +
          `${formatValue(st.pa.railV, 'V')}, key-down ` +
          `${formatValue(st.pa.keyDownCurrentA, 'A')} budgeted` +
          `${st.pa.waveform ? ` (${budgetDriveLabel(st.pa.waveform.model)})` : ''}, ` +
          `drain peak ${formatValue(st.pa.peakDrainV, 'V')}`,
      );
    if (st.network)
      out.push(
        `    L network ${formatValue(st.network.drainOhm, 'ohm')}` +
          ` to ${formatValue(st.network.loadOhm, 'ohm')}: series ` +
          `${formatValue(st.network.seriesH, 'H')}` +
          `${st.network.turns !== null ? ` (${st.network.turns} turns)` : ''}, shunt ${
            formatValue(st.network.builtShuntF, 'F')
          }`,
      );
    if (st.choke)
      out.push(
        `    feed choke at least ${formatValue(st.choke.minInductanceH, 'H')}` +
          `, ${formatValue(st.choke.currentA, 'A')} key-down`,
      );
    const w = st.pa?.swr?.worstDrainPeak;
    if (w && st.pa?.swr && st.pa.swr.swr > 1) {
      out.push(
        `    at SWR ${st.pa.swr.swr}: drain peak up to ${formatValue(w.value, 'V')} ${ohmAt(w)}, device current ` +
          `up to ${formatValue(st.pa.swr.worstPeakCurrent.value, 'A')}`,
      );
    }
    if (st.lpf?.design)
      out.push(
        `  ${st.stageName}: ${st.lpf.design.response} order ${st.lpf.design.order}, cutoff ` +
          `${formatValue(st.lpf.design.cutoffHz, 'Hz', 4)}, loss ${st.lpf.analysis?.atOperating.lossDb.toFixed(2)} dB`,
      );
    for (const l of st.lpf?.realisation?.inductors ?? []) {
      if (l.peakFluxT !== null)
        out.push(
          `    L${l.index}: ${l.turns} turns, ${formatValue(l.rmsV, 'V')} RMS at the worst SWR, peak flux ` +
            `${formatValue(l.peakFluxT, 'T')}`,
        );
    }
    if (st.relay)
      out.push(
        `  ${st.stageName}: RF ${formatValue(st.relay.rfPeakV, 'V')} peak, ` +
          `${formatValue(st.relay.rfRmsA, 'A')} RMS at the worst SWR`,
      );
    const k = st.keying;
    if (k) {
      const clicks = k.spectrum.clicks
        .map((c) => `${formatValue(c.offsetHz, 'Hz')} ${c.levelDbc.toFixed(0)} dBc`)
        .join(', ');
      out.push(
        `    keying at ${k.spectrum.wpm} WPM, rise ${formatValue(k.riseS, 's')}: occupied ` +
          `${formatValue(k.spectrum.occupiedBandwidthHz, 'Hz')} (99 %), necessary ` +
          `${formatValue(k.necessaryFadingHz, 'Hz')} (K = 5); clicks ${clicks}`,
      );
    }
  }
  const lvl = (x: number, limited: boolean) => (limited ? 'limited by construction' : `${x.toFixed(1)} dBc`);
  for (const h of rf.harmonics?.rows ?? []) {
    const band = h.limitedByConstruction
      ? 'limited by construction'
      : `${lvl(h.predictedBestDbc, h.bestLimitedByConstruction)} to ${lvl(h.predictedDbc, false)}`;
    out.push(
      `  Harmonic ${h.n}: ${band} at the antenna (judged on the worst end), margin ` +
        `${h.marginDb.toFixed(1)} dB, ${h.severity}`,
    );
    if (h.worstLoad !== null) out.push(`    worst end at ${h.worstLoad}`);
  }
  const covered = rf.harmonics?.loadsCovered;
  if (covered) out.push(`  (the bands cover ${covered})`);
  const basis = rf.harmonics?.rows[0]?.sourceBasis;
  if (basis && basis !== '50 Ω') out.push(`  (filter rejection from the PA's own source: ${basis})`);
  if (rf.exposure)
    out.push(
      `  RF exposure: keep the public ${formatValue(rf.exposure.generalDistanceM, 'm')} and yourself ` +
        `${formatValue(rf.exposure.controlledDistanceM, 'm')} from the antenna (far-field estimate)`,
    );
  return out;
}

function costLines(report: EvaluationReport): string[] {
  const c = report.cost;
  const t = c.totals;
  const perKit = t.perKitCents !== null ? `, per kit ${formatMoney(t.perKitCents, c.currency)}` : '';
  return [
    '',
    `Cost: build of ${c.kits} kit(s) ${formatMoney(t.buildCents, c.currency)} (parts ` +
      `${formatMoney(t.partsCents, c.currency)}, shipping ` +
      `${formatMoney(t.shippingCents, c.currency)})${perKit}${
        t.unpricedLines ? `; ${t.unpricedLines} line(s) unpriced` : ''
      }`,
  ];
}
