// One regulated rail: headroom at the worst voltage corner, dissipation and junction temperature at the worst
// thermal corner (and with a tune-up carrier), input current per corner for the parent rail.
import type { Finding } from '../findings';
import { sortFindings } from '../findings';
import type { PerMode, RegulatedRail } from '../model';
import type { CornerSpec, Recommendation, RegulatedCorner, RegulatedRailReport } from './report-types';
import { BATTERY_LABEL, LOAD_LABEL, cornerCurrent, worstIds } from './corners';
import {
  headroomFinding,
  ratingFindings,
  regulatorDissipationW,
  regulatorInputCurrentA,
  regulatorOutputV,
} from './regulator';
import { DEFAULT_TO220_MOUNT, junctionTemperature, thermalFindings } from '../thermal/junction';
import { outputRipplePpV, rippleFindings, worstRippleCorner } from './ripple-rejection';

/** Voltage a rail presents at one corner (V). */
export interface RailVoltage {
  troughV: number;
  meanV: number;
  /** Ripple (V p-p); absent = none known. */
  ripplePpV?: number;
}

export interface RegulatedEvaluation {
  report: RegulatedRailReport;
  /** Output voltage this rail presents to its own children, per corner id. */
  outputAt: Record<string, RailVoltage>;
}

export function evaluateRegulatedRail(
  rail: RegulatedRail,
  outputA: PerMode,
  specs: CornerSpec[],
  parentAt: Record<string, RailVoltage>,
  parentMaxV: number,
  rootIsBattery: boolean,
  keyingDuty: number,
  ambientC: number,
): RegulatedEvaluation {
  const findings: Finding[] = [];
  const recommendations: Recommendation[] = [];
  const ids = worstIds();
  const vOut = regulatorOutputV(rail.setting, rail.quiescentA);
  const dropout = Number.isFinite(rail.dropoutV) ? Math.max(0, rail.dropoutV) : 0;
  const outputAt: Record<string, RailVoltage> = {};
  const rej = rail.rippleRejectionDb ?? null;
  const rejection = rej !== null && Number.isFinite(rej) && rej >= 0 ? rej : null;
  const tgt = rail.rippleTargetV ?? null;
  const rippleTarget = tgt !== null && Number.isFinite(tgt) && tgt > 0 ? tgt : null;
  const corners: RegulatedCorner[] = specs.map((spec) => {
    const p = parentAt[spec.id] ?? { troughV: 0, meanV: 0 };
    const out = cornerCurrent(outputA, spec.load, keyingDuty);
    const label = rootIsBattery ? `${BATTERY_LABEL[spec.mains]}, ${LOAD_LABEL[spec.load]}` : spec.label;
    const inputRipplePpV = Number.isFinite(p.ripplePpV) ? Math.max(0, p.ripplePpV!) : 0;
    const inDropout = p.troughV < vOut + dropout;
    const outRipple = rejection !== null ? outputRipplePpV(inputRipplePpV, rejection, inDropout) : null;
    // Common practice, no published source: a regulator in dropout passes its input through less the dropout
    outputAt[spec.id] = {
      troughV: Math.max(0, Math.min(vOut, p.troughV - dropout)),
      meanV: Math.max(0, Math.min(vOut, p.meanV - dropout)),
      ripplePpV: outRipple ?? inputRipplePpV,
    }; // rejection unknown: the ripple is not assumed removed
    return {
      ...spec, label, outputA: out,
      inputA: regulatorInputCurrentA(rail, out, p.troughV),
      inputTroughV: p.troughV, inputMeanV: p.meanV, headroomV: p.troughV - vOut,
      dissipationW: regulatorDissipationW(rail, out, p.meanV),
      inputRipplePpV, inDropout, outputRipplePpV: outRipple,
    };
  });
  const worst = corners.find((c) => c.id === ids.voltage) ?? corners[0];
  const thermalC = corners.find((c) => c.id === ids.thermal) ?? corners[0];
  const tuneC = corners.find((c) => c.id === ids.tuneUp) ?? corners[0];
  findings.push(headroomFinding(rail, worst.inputTroughV, worst.label));
  findings.push(...rippleFindings(rail.name, rejection, rippleTarget, corners));
  findings.push(...ratingFindings(rail, parentMaxV, outputA.keyDown));

  let thermal = null;
  let tuneUpThermal = null;
  if (rail.regulator !== 'switching') {
    const mount = rail.mount ?? DEFAULT_TO220_MOUNT;
    if (!rail.mount)
      findings.push({
        severity: 'caution',
        rule: 'thermal.mount',
        subject: rail.name,
        value: null,
        limit: null,
        unit: '',
        source: 'thermal.assumed-mount',
        message: `${rail.name}: no package or heatsink entered; a TO-220 with greased mounting (θjc 5 K/W, θcs 1 ` +
          `K/W, Tj max 125 °C) is assumed.`,
      });
    thermal = junctionTemperature(thermalC.dissipationW, ambientC, mount);
    tuneUpThermal = junctionTemperature(tuneC.dissipationW, ambientC, mount);
    findings.push(...thermalFindings(rail.name, thermal, `${thermalC.label}, ${thermalC.dissipationW.toFixed(2)} W`));
    const tj = tuneUpThermal.junctionC;
    if (tj !== null && tj > tuneUpThermal.tjMaxC) {
      findings.push({
        severity: 'caution',
        rule: 'thermal.tune-up',
        subject: rail.name,
        value: tj,
        limit: tuneUpThermal.tjMaxC,
        unit: '°C',
        source: 'thermal.tune-up',
        message: `${rail.name}: a continuous tune-up carrier would take the junction to about ${tj.toFixed(0)}` +
          ` °C given time; keep tune-up short.`,
      });
    }
    const need = thermal.requiredThetaSaKPerW;
    recommendations.push({
      topic: 'heatsink',
      text: !thermal.needsHeatsink
        ? 'No heatsink needed'
        : need !== null
          ? `Heatsink ${need.toFixed(1)} K/W or lower`
          : 'No single heatsink is enough: reduce the input voltage or share the heat',
      reasoning: `Dissipation ${thermal.powerW.toFixed(2)} W at ${thermalC.label.toLowerCase()} (tune-up ` +
        `${tuneC.dissipationW.toFixed(2)} W). θsa = (Tj,target - Ta)/P - θjc - θcs with Tj,target = 0.8 x ` +
        `${mount.tjMaxC} °C = ${thermal.targetC.toFixed(0)} °C and Ta = ${Number(thermal.ambientC.toFixed(1))} °C.`,
      source: 'thermal.series-path',
    });
  } else {
    findings.push({
      severity: 'ok',
      rule: 'regulator.switching',
      subject: rail.name,
      value: thermalC.dissipationW,
      limit: null,
      unit: 'W',
      source: 'design.energy-balance',
      message: `${rail.name}: switching module dissipates about ${thermalC.dissipationW.toFixed(2)} W and draws ` +
        `${worst.inputA.toFixed(3)} A at the lowest input voltage.`,
    });
  }
  recommendations.push({
    topic: 'fuse',
    text: 'No separate fuse',
    reasoning: `${rail.name} is current-limited by its ` +
      `regulator${rail.regulator === 'switching' ? ' module' : ' (internal limit and thermal shutdown)'}; the fuse ` +
      `of the rail that feeds it protects the wiring.`,
    source: 'supply.no-fuse',
  });
  return {
    report: {
      kind: 'regulated',
      railId: rail.id,
      railName: rail.name,
      parentId: rail.parentId,
      regulator: rail.regulator,
      outputV: vOut,
      dropoutV: dropout,
      corners,
      worstVoltageCornerId: worst.id,
      worstThermalCornerId: thermalC.id,
      thermalDissipationW: thermalC.dissipationW,
      tuneUpDissipationW: tuneC.dissipationW,
      thermal,
      tuneUpThermal,
      rippleRejectionDb: rejection,
      rippleTargetV: rippleTarget,
      worstRippleCornerId: worstRippleCorner(corners)?.id ?? null,
      findings: sortFindings(findings),
      recommendations,
    },
    outputAt,
  };
}
