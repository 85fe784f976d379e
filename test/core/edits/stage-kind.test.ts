// What a kind change drops, in words, and that the list agrees with what keepOwnData really drops.
// The stages are written out here (invented values); the expected lines are worked by hand from them.
import { describe, it, expect } from 'vitest';
import type { Stage, StageKind } from '../../../src/core/model';
import { STAGE_KINDS } from '../../../src/core/model';
import { droppedByKindChange, keepOwnData } from '../../../src/core/edits/stage-kind';
import { defaultLpfParams, defaultPa, defaultRelay } from '../../../src/core/new-project';

const base = (kind: StageKind): Stage => ({ id: 's1', kind, name: 'Stage', notes: '', loads: [], dissipationW: null });
const railNames: Record<string, string> = { 'rail-pa': 'PA rail', 'rail-13': '13.8 V rail' };
const rail = (id: string) => railNames[id] ?? id;

const final: Stage = {
  ...base('final'),
  pa: {
    topology: 'push-pull',
    amplifierClass: 'C',
    railId: 'rail-pa',
    devices: 2,
    saturationV: 1,
    rdsOnOhm: null,
    turnsRatio: 1.5,
    loadOhm: 50,
    efficiency: 0.65,
    deviceVdsMaxV: 200,
    deviceIdMaxA: 9,
    mount: { thetaJcKPerW: 1.7, thetaCsKPerW: 1.2, thetaSaKPerW: 2.5, tjMaxC: 150 },
    biasIdleMaxA: 0.05,
    referencePowerW: 5,
  },
};

describe('droppedByKindChange', () => {
  it('lists the PA data of a final turned into a driver, with its values', () => {
    expect(droppedByKindChange(final, 'driver', rail)).toEqual([
      {
        what: 'PA data',
        items: [
          'push-pull, class C, 2 devices',
          'fed from rail “PA rail”',
          'saturation voltage 1 V',
          'output: turns ratio 1.5, load 50 Ω, drain efficiency 65 %',
          'device ratings: V(BR)DSS 200 V, drain 9 A',
          'bias preset max idle 50 mA',
          'heatsink: θjc 1.7 °C/W, θcs 1.2 °C/W, θsa 2.5 °C/W, Tj max 150 °C',
          'output compared with 5 W',
        ],
      },
    ]);
  });

  it('says Rds(on), a designed turns ratio and a heatsink still to be chosen where those are not given', () => {
    const mount = { ...final.pa!.mount, thetaSaKPerW: null };
    const pa = { ...final.pa!, saturationV: null, rdsOnOhm: 0.25, turnsRatio: null, efficiency: null, mount };
    const items = droppedByKindChange({ ...final, pa }, 'other')[0].items;
    expect(items).toContain('Rds(on) 250 mΩ');
    expect(items).toContain('output: turns ratio designed for the target power, load 50 Ω');
    expect(items.find((i) => i.startsWith('heatsink'))).toContain('θsa to be chosen');
  });

  it('lists the filter design of a low-pass filter turned into another kind', () => {
    // defaultLpfParams: Chebyshev 0.1 dB, order 5, capacitor input, cutoff from the band, E12 with pairs,
    // AL 4.9 nH/t², Q 150 / 1000, 5 % tolerances, 2000 trials, seed 1.
    const [dropped] = droppedByKindChange({ ...base('lpf'), lpf: defaultLpfParams() }, 'other', rail);
    expect(dropped.what).toBe('filter design');
    expect(dropped.items).toEqual([
      'order 5, Chebyshev 0.1 dB ripple, capacitor input (π)',
      'cutoff chosen from the band',
      'capacitors E12 (parallel pairs allowed)',
      'core “Iron-powder toroid 12.7 mm, 1–30 MHz mix (AL 4.9 nH/t²)”, AL 4.9 nH/t²',
      'inductor Q 150, capacitor Q 1000, tolerances L 5 %, C 5 %',
      'Monte Carlo 2000 trials, seed 1',
    ]);
  });

  it('lists the relay data of a T/R stage turned into another kind, naming the coil rail', () => {
    // defaultRelay: 2 A carry, 1 A switch, 125 V, coil 30 mA in key-up and key-down, 30 dB, after the filter,
    // receiver 10 mW, 5 / 3 / 1 ms, 8 ms delay, 20 WPM.
    const [dropped] = droppedByKindChange({ ...base('tr'), relay: defaultRelay('rail-13') }, 'receiver', rail);
    expect(dropped).toEqual({
      what: 'relay data',
      items: [
        'contacts: carry 2 A, switch 1 A, rated 125 V',
        'coil 30 mA from rail “13.8 V rail”, energised in TX key-up, TX key-down',
        'isolation 30 dB, after the low-pass filter, receiver max input 10 mW',
        'timing: operate 5 ms, release 3 ms, bounce 1 ms, transmit delay 8 ms at 20 WPM',
      ],
    });
  });

  it('names an RF rating and DC switched by the contacts when they are given', () => {
    const relay = { ...defaultRelay(null), rfRatedVpeak: 300, dcSwitchedA: 0.16 };
    expect(droppedByKindChange({ ...base('tr'), relay }, 'other')[0].items.slice(0, 2)).toEqual([
      'contacts: carry 2 A, switch 1 A, rated 125 V, RF 300 V peak; DC it switches here 160 mA',
      'coil 30 mA (not on a rail here), energised in TX key-up, TX key-down',
    ]);
  });

  it('drops nothing when the kind keeps its data or the stage has none', () => {
    expect(droppedByKindChange(final, 'final')).toEqual([]);
    expect(droppedByKindChange(base('driver'), 'final')).toEqual([]);
    expect(droppedByKindChange(base('receiver'), 'tr')).toEqual([]);
  });

  it('names the rail by id when no names are given', () => {
    expect(droppedByKindChange(final, 'driver')[0].items[1]).toBe('fed from rail “rail-pa”');
  });

  // Every pair of kinds on a stage carrying all three blocks: the listed blocks are exactly the ones keepOwnData
  // leaves out, so the confirmation never hides a loss and never names one that does not happen.
  const pairs = STAGE_KINDS.flatMap((from) => STAGE_KINDS.map((to) => [from, to] as const));
  it.each(pairs)('%s -> %s agrees with keepOwnData', (from, to) => {
    const full: Stage =
      { ...base(from), pa: defaultPa('rail-pa'), lpf: defaultLpfParams(), relay: defaultRelay(null) };
    const kept = keepOwnData(full, to);
    const lost = (['pa', 'lpf', 'relay'] as const).filter((k) => full[k] && !kept[k]);
    const names = { pa: 'PA data', lpf: 'filter design', relay: 'relay data' } as const;
    expect(droppedByKindChange(full, to).map((d) => d.what)).toEqual(lost.map((k) => names[k]));
    expect(lost).toHaveLength(to === 'final' || to === 'lpf' || to === 'tr' ? 2 : 3);
  });
});
