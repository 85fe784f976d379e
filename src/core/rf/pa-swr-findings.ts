// Device-rating and heating findings of the PA at the worst load phase on the SWR circle, with protection advice.
import type { Finding } from '../findings';
import type { PaParams } from '../model';
import { describeLoad, whereLoad, type PaSwrStress } from './pa-swr';
import { CLASS_E_SHUNT } from './class-e-sim';

/**
 * Class E: the shunt capacitance the design needs, C1 = 0.1836 / (ωR) per switch (Sokal and Sokal, IEEE JSSC
 * SC-10(3), 1975; constant from memory), against the device's own output capacitance: fail when the device alone
 * exceeds it, with the highest frequency at which it would not.
 */
export function classEShuntFindings(
  pa: PaParams,
  primaryOhm: number,
  frequencyHz: number | undefined,
  subject: string,
): Finding[] {
  const coss = pa.deviceCossF ?? null;
  if (pa.amplifierClass !== 'E' || coss === null || frequencyHz === undefined || !(frequencyHz > 0) || !(coss > 0))
    return [];
  // push-pull: each class-E half drives half the drain-to-drain load (the model's assumption)
  const r = pa.topology === 'push-pull' ? primaryOhm / 2 : primaryOhm;
  const w = 2 * Math.PI * frequencyHz;
  const c1 = CLASS_E_SHUNT / (w * r);
  // Same equation solved for f with C1 = Coss: f_max = 0.1836 / (2π R Coss)
  const fMax = CLASS_E_SHUNT / (2 * Math.PI * r * coss);
  const pf = (x: number) => `${(x * 1e12).toFixed(0)} pF`;
  const base = { rule: 'pa.class-e-shunt', subject, unit: 'F', source: 'pa.class-e-sim' as const };
  if (coss > c1) {
    return [
      {
        ...base,
        severity: 'fail',
        value: coss,
        limit: c1,
        message:
          `The device's output capacitance ${pf(coss)} exceeds the ${pf(c1)} shunt capacitance class E needs at this ` +
          `frequency into ${r.toFixed(1)} Ω: it cannot switch at zero voltage. It works up to about ` +
          `${(fMax / 1e6).toFixed(2)} MHz; use a device with less capacitance or a lower drain load (higher power ` +
          'for the supply).',
      },
    ];
  }
  return [
    {
      ...base,
      severity: 'ok',
      value: coss,
      limit: c1,
      message:
        `Class-E shunt capacitance ${pf(c1)} per switch: the device gives ${pf(coss)}, add about ${pf(c1 - coss)} ` +
        `(usable up to about ${(fMax / 1e6).toFixed(2)} MHz with this device).`,
    },
  ];
}

export interface SwrFindingContext {
  subject: string;
  /** " at the highest supply of 15.2 V (...)" or ''. */
  atMax: string;
  ambientC: number;
  keyingDuty: number;
  /** Matched-load output at the hot supply, W, and dissipation, W. */
  matchedOutputW: number;
  matchedDissipationW: number;
  /** Devices sharing one heatsink. */
  sharedBy: number;
  tjTargetC: number;
  /** A drain clamp fitted (V), which holds the drain peak to itself; null/absent = none. */
  clampV?: number | null;
}

// Common practice, no published source: device voltage rating at least 1.25 x the peak drain voltage
const V_MARGIN = 1.25;
// Common practice, no published source: peak current at most 80 % of the rating
const I_MARGIN = 0.8;

export function swrFindings(pa: PaParams, s: PaSwrStress, c: SwrFindingContext): Finding[] {
  const { subject } = c;
  const f: Finding[] = [];
  const isE = s.model === 'class-e-simulated';
  const swrSource = isE ? 'pa.class-e-sim' : 'pa.swr-load-line';
  // the load named at the antenna (and what the PA sees through the filter) when the circle is drawn there
  const where = (w: PaSwrStress['worstDrainPeak']) => whereLoad(w, s.swr);
  const clamped = c.clampV != null && c.clampV > 0 && c.clampV < s.worstDrainPeak.value;
  // a fitted clamp holds the drain to its own voltage (pa-clamp.ts): the device sees the lower of the two
  const vPk = clamped ? c.clampV! : s.worstDrainPeak.value;
  // class B/C at a clipping load: the peak includes the margin for the drain's ring (pa-swr CLIP_RING_MARGIN)
  const ring = s.worstDrainPeak.ringMargin && s.clip
    ? ` The ${clamped ? 'unclamped ' : ''}peak includes a ` +
      `${Math.round((s.worstDrainPeak.ringMarginFraction ?? s.clip.ringMargin) * 100)} % margin for the ` +
      'drain\'s ring where the stage clips (the harmonic voltages and the transformer\'s leakage carry it past ' +
      'twice the supply).' : '';
  const vWhere = `${where(s.worstDrainPeak)}` +
    `${clamped ? ` (held there by the ${c.clampV} V drain clamp; ` +
      `${s.worstDrainPeak.value.toFixed(1)} V without it)` : ''}`;
  f.push({
    severity: pa.deviceVdsMaxV < vPk ? 'fail' : pa.deviceVdsMaxV < V_MARGIN * vPk ? 'caution' : 'ok',
    rule: 'pa.vds',
    subject,
    value: vPk,
    limit: pa.deviceVdsMaxV,
    unit: 'V',
    source: clamped ? 'pa.drain-clamp' : s.swr > 1 || isE ? swrSource : 'pa.vds',
    message:
      pa.deviceVdsMaxV < vPk
        ? `Drain peaks reach ${vPk.toFixed(1)} V ${vWhere}${c.atMax}, above the ${pa.deviceVdsMaxV} V device rating: ` +
          `fit a drain clamp (TVS or zener below the rating), fold the drive back on high SWR, or use a device rated ` +
          `${Math.ceil(V_MARGIN * vPk)} V or more.${ring}`
        : pa.deviceVdsMaxV < V_MARGIN * vPk
          ? `Drain peaks reach ${vPk.toFixed(1)} V ${vWhere}${c.atMax}, less than 25 % below the ` +
            `${pa.deviceVdsMaxV} V rating; a drain clamp or a higher-rated device adds margin.${ring}`
          : `Device rating ${pa.deviceVdsMaxV} V covers the ${vPk.toFixed(1)} V drain peaks ${vWhere}${c.atMax} ` +
            `with margin.${ring}`,
  });
  const iPk = s.worstPeakCurrent.value;
  const iWhere = where(s.worstPeakCurrent);
  f.push({
    severity: iPk > pa.deviceIdMaxA ? 'fail' : iPk > I_MARGIN * pa.deviceIdMaxA ? 'caution' : 'ok',
    rule: 'pa.id', subject, value: iPk, limit: pa.deviceIdMaxA, unit: 'A',
    source: isE && s.swr <= 1 ? 'pa.peak-current-e' : s.swr > 1 ? swrSource : 'pa.peak-current',
    message: iPk > pa.deviceIdMaxA
      ? `Peak device current ${iPk.toFixed(2)} A ${iWhere} exceeds the ${pa.deviceIdMaxA} A rating: add current ` +
        `foldback (a sense resistor that cuts the drive) or use a device rated ${Math.ceil(iPk / I_MARGIN)} A or more.`
      : iPk > I_MARGIN * pa.deviceIdMaxA
        ? `Peak device current ${iPk.toFixed(2)} A ${iWhere}, above 80 % of the ${pa.deviceIdMaxA} A rating: current ` +
          'foldback or a device rated higher adds margin.'
        : `Peak device current ${iPk.toFixed(2)} A ${iWhere} against a ${pa.deviceIdMaxA} A rating.`,
  });
  if (isE && s.swr > 1 && s.classETurnOnRatio !== null && s.classETurnOnRatio > 0.1) {
    // Source: energy ½ C1 V² lost at each hard turn-on (capacitor switching loss,
    // textbook); 10 % of Vdd: common practice
    f.push({
      severity: 'caution',
      rule: 'pa.class-e-switching',
      subject,
      value: s.classETurnOnRatio,
      limit: 0.1,
      unit: '',
      source: 'pa.class-e-sim',
      message:
        `Into part of the SWR ${s.swr} circle the switch turns on with the drain at up to ` +
        `${s.classETurnOnRatio.toFixed(2)} × the supply (no longer zero-voltage switching): the shunt capacitor ` +
        'discharges into the device every cycle, which heats it and stresses it beyond these figures; add SWR ' +
        'foldback of the drive or supply.',
    });
  }
  if (pa.topology === 'push-pull' && (pa.networkLoadOhm ?? null) === null && pa.amplifierClass === 'D') {
    // Hard switching on a centre-tapped transformer: the leakage rings with the device capacitance (pa-swr leakageRing)
    const l = pa.outputLeakageH ?? null;
    const c = pa.deviceCossF ?? null;
    const known = l !== null && c !== null && l > 0 && c > 0;
    f.push({
      severity: known ? 'ok' : 'caution', rule: 'pa.leakage-ring', subject, value: vPk, limit: null, unit: 'V',
      source: 'pa.leakage-ring',
      message: known
        ? `The drain peak includes the undamped ring of the transformer's ${(l * 1e9).toFixed(1)} nH leakage ` +
          `with the ${(c * 1e12).toFixed(0)} pF device capacitance (√(L/C) = ${Math.sqrt(l / c).toFixed(1)} Ω) at ` +
          'each hard switching edge; an RC snubber or a drain clamp lowers it.'
        : 'The drain peak includes the ring of the output transformer\'s leakage with the device capacitance, ' +
          'bounded by its step (twice the load-line swing); the turn-off current adds to it in proportion to ' +
          "√(leakage / Coss), and the ring's current flows through the devices beyond the load-line current: enter " +
          'both (the leakage measured across one primary half with the other shorted) to include them.',
    });
  }
  if (s.swr <= 1) return f;
  const d = s.worstDissipation;
  const n = Math.max(1, pa.devices);
  const m = pa.mount;
  const perDevice = d.value / n;
  // Source: series thermal path Tj = Ta + P (θjc + θcs) + s P θsa (REFERENCE-VALUES §7), at the worst load
  const tj = m.thetaSaKPerW === null ? null
    : c.ambientC + perDevice * (m.thetaJcKPerW + m.thetaCsKPerW + c.sharedBy * m.thetaSaKPerW);
  const ratio = c.matchedDissipationW > 0 ? d.value / c.matchedDissipationW : null;
  f.push({
    severity: tj !== null && tj > m.tjMaxC ? 'caution' : 'ok',
    rule: 'pa.swr-dissipation',
    subject,
    value: d.value,
    limit: c.matchedDissipationW,
    unit: 'W',
    source: swrSource,
    message:
      `Key-down dissipation rises to ${d.value.toFixed(1)} W` +
      `${ratio !== null ? ` (${ratio.toFixed(2)} × matched)` : ''} ` +
      `${whereLoad(d, s.swr)}` +
      (tj === null ? '.' : `; a continuous carrier into it takes the junction to about ${tj.toFixed(0)} °C` +
        (tj > m.tjMaxC ? `, beyond its ${m.tjMaxC} °C maximum: tune at reduced power into a mismatch.` : '.')),
  });
  f.push({
    severity: 'ok', rule: 'pa.swr-output', subject, value: s.maxOutput.value, limit: null, unit: 'W', source: swrSource,
    message: `Around the SWR ${s.swr} circle the output ranges from ${s.minOutput.value.toFixed(1)} W into ` +
      `${describeLoad(s.minOutput)} to ${s.maxOutput.value.toFixed(1)} W into ${describeLoad(s.maxOutput)}, against ` +
      `${c.matchedOutputW.toFixed(1)} W into the design load (all at the highest key-down supply).`,
  });
  return f;
}
