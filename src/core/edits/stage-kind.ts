// A stage's kind owns its data: a final has PA data, a low-pass filter its design, a T/R stage its relay data.
// Changing the kind drops the data the new kind does not own; this module says what that is, in words,
// so the builder can confirm before it is gone.
import type { LpfParams, PaParams, RelayParams, Stage, StageKind } from '../model';
import { MODE_LABELS } from '../model';
import { formatValue } from '../units';
import { STAGE_DATA, type StageDataKey } from '../spec/stage-data';

/** The kind that owns each optional block of stage data. */
export const DATA_OWNER = Object.fromEntries(STAGE_DATA.map((d) => [d.key, d.kind])) as Record<StageDataKey, StageKind>;

/** The stage without the data of other kinds: a stage changed from final to driver no longer carries (and is no
 *  longer evaluated with) hidden PA data. */
export function keepOwnData(s: Stage, kind: StageKind): Stage {
  const out: Stage = { ...s };
  for (const d of STAGE_DATA) if (d.kind !== kind) delete out[d.key];
  return out;
}

export interface DroppedData {
  /** the block in words, for "drops its PA data" */
  what: 'PA data' | 'filter design' | 'relay data';
  /** its stored values, one short line per group */
  items: string[];
}

/** A rail id in words (the project's rail name); the id itself when no name is given. */
export type RailName = (railId: string) => string;

const plural = (n: number, one: string) => `${n} ${one}${n === 1 ? '' : 's'}`;
// θ in K/W is the same number in °C/W, the unit the stage form shows.
const kPerW = (v: number) => `${formatValue(v, '')} °C/W`;
const pctOf = (fraction: number) => `${formatValue(fraction * 100, '')} %`;

function paItems(pa: PaParams, rail: RailName): string[] {
  const m = pa.mount;
  const v = formatValue;
  const saturation = `saturation voltage ${v(pa.saturationV, 'V')}`;
  const drop = pa.saturationV === null ? `Rds(on) ${v(pa.rdsOnOhm, 'Ω')}` : saturation;
  const ratio = pa.turnsRatio === null ? 'turns ratio designed for the target power' : `turns ratio ${pa.turnsRatio}`;
  const efficiency = pa.efficiency === null ? '' : `, drain efficiency ${pctOf(pa.efficiency)}`;
  const thetaSa = m.thetaSaKPerW === null ? 'θsa to be chosen' : `θsa ${kPerW(m.thetaSaKPerW)}`;
  return [
    `${pa.topology}, class ${pa.amplifierClass}, ${plural(pa.devices, 'device')}`,
    `fed from rail “${rail(pa.railId)}”`,
    drop,
    `output: ${ratio}, load ${formatValue(pa.loadOhm, 'Ω')}${efficiency}`,
    `device ratings: V(BR)DSS ${formatValue(pa.deviceVdsMaxV, 'V')}, drain ${formatValue(pa.deviceIdMaxA, 'A')}`,
    `bias preset max idle ${formatValue(pa.biasIdleMaxA, 'A')}`,
    `heatsink: θjc ${kPerW(m.thetaJcKPerW)}, θcs ${kPerW(m.thetaCsKPerW)}, ${thetaSa}, ` +
      `Tj max ${formatValue(m.tjMaxC, '°C')}`,
    `output compared with ${formatValue(pa.referencePowerW, 'W')}`,
  ];
}

function lpfItems(f: LpfParams): string[] {
  const response = f.response === 'chebyshev' ? `Chebyshev ${formatValue(f.rippleDb, 'dB')} ripple` : 'Butterworth';
  const form = f.form === 'capacitor-input' ? 'capacitor input (π)' : 'inductor input (T)';
  const tolerances = `tolerances L ${pctOf(f.inductorTolerance)}, C ${pctOf(f.capacitorTolerance)}`;
  return [
    `order ${f.order}, ${response}, ${form}`,
    f.cutoffHz === null ? 'cutoff chosen from the band' : `cutoff ${formatValue(f.cutoffHz, 'Hz')}`,
    `capacitors ${f.capacitorSeries}${f.allowParallelPairs ? ' (parallel pairs allowed)' : ''}`,
    `core “${f.coreName}”, AL ${formatValue(f.coreAlHPerTurn2, 'H')}/t²`,
    `inductor Q ${f.inductorQ}, capacitor Q ${f.capacitorQ}, ${tolerances}`,
    `Monte Carlo ${plural(f.monteCarloTrials, 'trial')}, seed ${f.seed}`,
  ];
}

function relayItems(r: RelayParams, rail: RailName): string[] {
  const v = formatValue;
  const rf = r.rfRatedVpeak === null ? '' : `, RF ${v(r.rfRatedVpeak, 'V')} peak`;
  const dc = r.dcSwitchedA > 0 ? `; DC it switches here ${v(r.dcSwitchedA, 'A')}` : '';
  const coilRail = r.coilRailId === null ? ' (not on a rail here)' : ` from rail “${rail(r.coilRailId)}”`;
  const modes = r.coilModes.map((m) => MODE_LABELS[m]).join(', ') || 'no mode';
  const side = r.position === 'after-lpf' ? 'after' : 'before';
  return [
    `contacts: carry ${v(r.contactCarryA, 'A')}, switch ${v(r.contactSwitchA, 'A')}, ` +
      `rated ${v(r.contactRatedV, 'V')}${rf}${dc}`,
    `coil ${v(r.coilA, 'A')}${coilRail}, energised in ${modes}`,
    `isolation ${v(r.isolationDb, 'dB')}, ${side} the low-pass filter, ` +
      `receiver max input ${v(r.receiverMaxInputW, 'W')}`,
    `timing: operate ${v(r.operateS, 's')}, release ${v(r.releaseS, 's')}, bounce ${v(r.bounceS, 's')}, ` +
      `transmit delay ${v(r.txDelayS, 's')} at ${r.wpm} WPM`,
  ];
}

/** What changing `stage` to `newKind` drops (exactly what keepOwnData leaves out); empty = nothing is lost. */
export function droppedByKindChange(
  stage: Stage,
  newKind: StageKind,
  rail: RailName = (id) => id,
): DroppedData[] {
  const out: DroppedData[] = [];
  if (stage.pa && newKind !== DATA_OWNER.pa) out.push({ what: 'PA data', items: paItems(stage.pa, rail) });
  if (stage.lpf && newKind !== DATA_OWNER.lpf) out.push({ what: 'filter design', items: lpfItems(stage.lpf) });
  if (stage.relay && newKind !== DATA_OWNER.relay) {
    out.push({ what: 'relay data', items: relayItems(stage.relay, rail) });
  }
  return out;
}
