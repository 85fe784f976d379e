// Stage page forms: stored values -> form text, and form text -> SI values (zod).
import { z } from 'zod';
import type { Stage, PaParams, LpfParams, RelayParams } from '../core/model';
import { MODES, STAGE_KINDS } from '../core/model';
import { inputText, percentText } from './input-text';
import { num, optNum, pct, text, choice, checkbox } from './form';

const pctText = percentText;

export const stageSchema = z.object({
  name: text('Stage name'),
  kind: choice('Stage kind', STAGE_KINDS),
  notes: text('Notes', 5000, false),
  dissipation: optNum('W', { label: 'Dissipation', min: 0, max: 10_000 }),
});

export function stageValues(s: Stage): Record<string, string> {
  const v: Record<string, string> = { name: s.name, kind: s.kind, notes: s.notes, dissipation: inputText(s.dissipationW, 'W') };
  s.loads.forEach((l, i) => {
    v[`rail${i}`] = l.railId;
    for (const m of MODES) v[`l${i}_${m}`] = inputText(l.currentA[m], 'A');
  });
  return v;
}

const mountFields = {
  thetaJc: num('K/W', { label: 'θjc junction–case', min: 0, max: 100 }),
  thetaCs: num('K/W', { label: 'θcs case–heatsink', min: 0, max: 100 }),
  thetaSa: optNum('K/W', { label: 'θsa heatsink–air', min: 0, exclusiveMin: true, max: 1000 }),
  tjMax: num('°C', { label: 'Tj max', min: 25, max: 250 }),
};

export const paSchema = z.object({
  topology: choice('Topology', ['push-pull', 'single-ended']),
  amplifierClass: choice('Class', ['B', 'C', 'D', 'E']),
  railId: z.string().min(1, 'Choose the rail that feeds the final'),
  devices: num('', { label: 'Devices', min: 1, max: 16, integer: true }),
  saturation: optNum('V', { label: 'Saturation voltage', min: 0, max: 100 }),
  rdsOn: optNum('Ω', { label: 'Rds(on)', min: 0, max: 100 }),
  turnsRatio: optNum('', { label: 'Turns ratio', min: 0, exclusiveMin: true, max: 100 }),
  load: num('Ω', { label: 'Load', min: 0, exclusiveMin: true, max: 10_000 }),
  efficiency: z
    .string()
    .optional()
    .transform((s, ctx) => {
      if (!s || !s.trim()) return null;
      const r = pct({ label: 'Drain efficiency', min: 1, max: 100 }).safeParse(s);
      if (!r.success) {
        ctx.addIssue({ code: 'custom', message: r.error.issues[0].message });
        return z.NEVER;
      }
      return r.data;
    }),
  vdsMax: num('V', { label: 'Device V(BR)DSS', min: 0, exclusiveMin: true, max: 10_000 }),
  idMax: num('A', { label: 'Device max drain current', min: 0, exclusiveMin: true, max: 1000 }),
  biasIdle: num('A', { label: 'Bias preset maximum idle current', min: 0, max: 100 }),
  referencePower: num('W', { label: 'Reference power', min: 0, exclusiveMin: true, max: 1e6 }),
  ...mountFields,
});

export function paValues(p: PaParams): Record<string, string> {
  return {
    topology: p.topology,
    amplifierClass: p.amplifierClass,
    railId: p.railId,
    devices: String(p.devices),
    saturation: inputText(p.saturationV, 'V'),
    rdsOn: inputText(p.rdsOnOhm, 'Ω'),
    turnsRatio: p.turnsRatio === null ? '' : String(p.turnsRatio),
    load: inputText(p.loadOhm, 'Ω'),
    efficiency: p.efficiency === null ? '' : pctText(p.efficiency),
    vdsMax: inputText(p.deviceVdsMaxV, 'V'),
    idMax: inputText(p.deviceIdMaxA, 'A'),
    biasIdle: inputText(p.biasIdleMaxA, 'A'),
    referencePower: inputText(p.referencePowerW, 'W'),
    thetaJc: String(p.mount.thetaJcKPerW),
    thetaCs: String(p.mount.thetaCsKPerW),
    thetaSa: p.mount.thetaSaKPerW === null ? '' : String(p.mount.thetaSaKPerW),
    tjMax: String(p.mount.tjMaxC),
  };
}

export function toPa(d: z.output<typeof paSchema>): PaParams {
  return {
    topology: d.topology,
    amplifierClass: d.amplifierClass,
    railId: d.railId,
    devices: d.devices,
    saturationV: d.saturation,
    rdsOnOhm: d.rdsOn,
    turnsRatio: d.turnsRatio,
    loadOhm: d.load,
    efficiency: d.efficiency,
    deviceVdsMaxV: d.vdsMax,
    deviceIdMaxA: d.idMax,
    mount: { thetaJcKPerW: d.thetaJc, thetaCsKPerW: d.thetaCs, thetaSaKPerW: d.thetaSa, tjMaxC: d.tjMax },
    biasIdleMaxA: d.biasIdle,
    referencePowerW: d.referencePower,
  };
}

export const lpfSchema = z
  .object({
    response: choice('Response', ['butterworth', 'chebyshev']),
    ripple: num('dB', { label: 'Passband ripple', min: 0, max: 100 }),
    order: num('', { label: 'Order', min: 1, max: 15, integer: true }),
    // not named "form": an input called form would shadow HTMLFormElement.form for scripts
    layout: choice('Form', ['capacitor-input', 'inductor-input']),
    cutoff: optNum('Hz', { label: 'Cutoff', min: 100e3, max: 100e6 }),
    capacitorSeries: choice('Capacitor series', ['E12', 'E24']),
    allowParallelPairs: checkbox,
    coreAl: num('H/t²', { label: 'Core AL', min: -1, max: 1e-3 }),
    coreName: text('Core', 120, false),
    inductorQ: num('', { label: 'Inductor Q', min: 1, max: 10_000 }),
    capacitorQ: num('', { label: 'Capacitor Q', min: 1, max: 100_000 }),
    capacitorTolerance: pct({ label: 'Capacitor tolerance', min: 0, max: 50 }),
    inductorTolerance: pct({ label: 'Inductor tolerance', min: 0, max: 50 }),
    trials: num('', { label: 'Monte Carlo trials', min: 0, max: 20_000, integer: true }),
    seed: num('', { label: 'Random seed', min: 0, max: 2 ** 32 - 1, integer: true }),
  })
  .superRefine((d, ctx) => {
    // Source: Matthaei, Young & Jones (1964) §4.05: an even-order Chebyshev prototype needs unequal
    // terminations; between two 50 Ω ports only odd orders are realisable.
    if (d.order % 2 === 0) ctx.addIssue({ code: 'custom', path: ['order'], message: `Order must be odd (3, 5, 7 or 9): an even-order filter cannot sit between two equal 50 Ω terminations; you entered ${d.order}` });
    else if (d.order < 3 || d.order > 9) ctx.addIssue({ code: 'custom', path: ['order'], message: `Order must be 3, 5, 7 or 9; you entered ${d.order}` });
    if (d.response === 'chebyshev' && (d.ripple < 0.01 || d.ripple > 0.5))
      ctx.addIssue({ code: 'custom', path: ['ripple'], message: `Chebyshev ripple must be between 0.01 and 0.5 dB (more ripple means poor input match); you entered ${d.ripple} dB` });
    // a Butterworth design ignores the ripple, but it is kept as typed for a later switch to Chebyshev
    else if (d.ripple > 0.5) ctx.addIssue({ code: 'custom', path: ['ripple'], message: `Ripple must be at most 0.5 dB (a Butterworth filter does not use it; leave it or enter 0); you entered ${d.ripple} dB` });
    if (d.coreAl <= 0) ctx.addIssue({ code: 'custom', path: ['coreAl'], message: 'Core AL must be a positive inductance per turn squared, e.g. 4.9n (4.9 nH/t²)' });
  });

export function lpfValues(p: LpfParams): Record<string, string> {
  return {
    response: p.response,
    ripple: String(p.rippleDb),
    order: String(p.order),
    layout: p.form,
    cutoff: inputText(p.cutoffHz, 'Hz'),
    capacitorSeries: p.capacitorSeries,
    allowParallelPairs: p.allowParallelPairs ? 'true' : '',
    coreAl: inputText(p.coreAlHPerTurn2, 'H/t²').replace(' H/t²', ''),
    coreName: p.coreName,
    inductorQ: String(p.inductorQ),
    capacitorQ: String(p.capacitorQ),
    capacitorTolerance: pctText(p.capacitorTolerance),
    inductorTolerance: pctText(p.inductorTolerance),
    trials: String(p.monteCarloTrials),
    seed: String(p.seed),
  };
}

export function toLpf(d: z.output<typeof lpfSchema>): LpfParams {
  return {
    response: d.response,
    rippleDb: d.ripple,
    order: d.order,
    form: d.layout,
    cutoffHz: d.cutoff,
    capacitorSeries: d.capacitorSeries,
    allowParallelPairs: d.allowParallelPairs,
    coreAlHPerTurn2: d.coreAl,
    coreName: d.coreName,
    inductorQ: d.inductorQ,
    capacitorQ: d.capacitorQ,
    capacitorTolerance: d.capacitorTolerance,
    inductorTolerance: d.inductorTolerance,
    monteCarloTrials: d.trials,
    seed: d.seed,
  };
}

export const relaySchema = z.object({
  contactCarry: num('A', { label: 'Contact carry rating', min: 0, exclusiveMin: true, max: 1000 }),
  contactSwitch: num('A', { label: 'Contact switching rating', min: 0, exclusiveMin: true, max: 1000 }),
  contactV: num('V', { label: 'Contact voltage rating', min: 0, exclusiveMin: true, max: 100_000 }),
  rfV: optNum('V', { label: 'RF peak voltage rating', min: 0, exclusiveMin: true, max: 100_000 }),
  coil: num('A', { label: 'Coil current', min: 0, max: 10 }),
  coilRailId: z.string().optional().transform((s) => (s ? s : null)),
  coilReceive: checkbox,
  coilKeyUp: checkbox,
  coilKeyDown: checkbox,
  isolation: num('dB', { label: 'Isolation at the operating frequency', min: 0, max: 200 }),
  operate: num('s', { label: 'Operate time', min: 0, max: 1 }),
  release: num('s', { label: 'Release time', min: 0, max: 1 }),
  bounce: num('s', { label: 'Bounce time', min: 0, max: 1 }),
  dcSwitched: num('A', { label: 'DC current switched', min: 0, max: 1000 }),
  position: choice('Position', ['before-lpf', 'after-lpf']),
  rxMax: num('W', { label: 'Receiver maximum input', min: 0, exclusiveMin: true, max: 1e6 }),
  txDelay: num('s', { label: 'Transmit delay', min: 0, max: 10 }),
  wpm: num('', { label: 'Keying speed (WPM)', min: 1, max: 100 }),
});

export function relayValues(r: RelayParams): Record<string, string> {
  return {
    contactCarry: inputText(r.contactCarryA, 'A'),
    contactSwitch: inputText(r.contactSwitchA, 'A'),
    contactV: inputText(r.contactRatedV, 'V'),
    rfV: inputText(r.rfRatedVpeak, 'V'),
    coil: inputText(r.coilA, 'A'),
    coilRailId: r.coilRailId ?? '',
    coilReceive: r.coilModes.includes('receive') ? 'true' : '',
    coilKeyUp: r.coilModes.includes('keyUp') ? 'true' : '',
    coilKeyDown: r.coilModes.includes('keyDown') ? 'true' : '',
    isolation: String(r.isolationDb),
    operate: inputText(r.operateS, 's'),
    release: inputText(r.releaseS, 's'),
    bounce: inputText(r.bounceS, 's'),
    dcSwitched: inputText(r.dcSwitchedA, 'A'),
    position: r.position,
    rxMax: inputText(r.receiverMaxInputW, 'W'),
    txDelay: inputText(r.txDelayS, 's'),
    wpm: String(r.wpm),
  };
}

export function toRelay(d: z.output<typeof relaySchema>): RelayParams {
  return {
    contactCarryA: d.contactCarry,
    contactSwitchA: d.contactSwitch,
    contactRatedV: d.contactV,
    rfRatedVpeak: d.rfV,
    coilA: d.coil,
    coilRailId: d.coilRailId,
    coilModes: [...(d.coilReceive ? (['receive'] as const) : []), ...(d.coilKeyUp ? (['keyUp'] as const) : []), ...(d.coilKeyDown ? (['keyDown'] as const) : [])],
    isolationDb: d.isolation,
    operateS: d.operate,
    releaseS: d.release,
    bounceS: d.bounce,
    dcSwitchedA: d.dcSwitched,
    position: d.position,
    receiverMaxInputW: d.rxMax,
    txDelayS: d.txDelay,
    wpm: d.wpm,
  };
}
