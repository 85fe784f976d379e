// The whole evaluation responds to the builder's changes the way a supply designer would expect.
import { describe, it, expect } from 'vitest';
import { evaluate } from '../../src/core/evaluate';
import { DEMO_PROJECTS } from '../../seed-demo/index';
import type { RectifiedRailReport } from '../../src/core/power/report-types';
import fc from 'fast-check';
import { propertyOptions, PROPERTY_SEED } from '../helpers/property';
import { isSourceKey, sourceText } from '../../src/core/sources/registry';

/** Every finding and supply recommendation carries a registry key whose text a reader sees (not empty, not a key). */
function expectRegistered(r: ReturnType<typeof evaluate>): void {
  const recs = (r.supply?.rails ?? []).flatMap((x) => x.recommendations);
  for (const x of [...r.findings, ...recs]) {
    expect(isSourceKey(x.source), `unregistered source "${x.source}"`).toBe(true);
    expect(sourceText(x.source).trim().length, x.source).toBeGreaterThan(10);
  }
  for (const f of r.findings) expect(f.message.length, f.rule).toBeGreaterThan(10);
}

const club = () => structuredClone(DEMO_PROJECTS[0]);
const paRail = (r: ReturnType<typeof evaluate>) =>
  r.supply!.rails.find((x) => x.railId === 'rail-pa') as RectifiedRailReport;

describe('evaluate(): changes ripple through the design', () => {
  it('230 V / 50 Hz mains: the primary current and fuse fall, the reservoir for the same ripple grows', () => {
    const a = evaluate(club());
    const p = club();
    p.mains = { nominalV: 230, frequencyHz: 50, lowFraction: 0.1, highFraction: 0.1 };
    const b = evaluate(p);
    // same secondary load on roughly twice the primary voltage: about half the primary current
    expect(b.supply!.primary!.loadA).toBeLessThan(a.supply!.primary!.loadA * 0.6);
    expect(b.supply!.primary!.fuse.ratedA!).toBeLessThan(a.supply!.primary!.fuse.ratedA!);
    // Source: ripple ~ I / (2 f C) (ref §4.1): at 50 Hz instead of 60 Hz the capacitance for the same ripple rises
    expect(paRail(b).reservoir.minimumF!).toBeGreaterThan(paRail(a).reservoir.minimumF!);
  });

  it('a PA drawing more current raises the winding current and transformer VA and lowers the trough', () => {
    const a = evaluate(club());
    const p = club();
    p.stages.find((s) => s.id === 'st-pa')!.pa!.efficiency = 0.5; // less efficient: more DC input for the same RF
    const b = evaluate(p);
    expect(b.budget.rails.find((r) => r.railId === 'rail-pa')!.outputA.keyDown).toBeGreaterThan(
      a.budget.rails.find((r) => r.railId === 'rail-pa')!.outputA.keyDown,
    );
    expect(paRail(b).winding!.thermalRmsA).toBeGreaterThan(paRail(a).winding!.thermalRmsA);
    expect(b.supply!.transformers[0].thermalVA).toBeGreaterThan(a.supply!.transformers[0].thermalVA);
    const trough = (r: ReturnType<typeof evaluate>) => paRail(r).corners.find((c) => c.id === 'low-keyDown')!.troughV;
    expect(trough(b)).toBeLessThan(trough(a));
  });

  it('the PA model sees the simulated key-down trough at nominal mains, and its current is in the budget', () => {
    const r = evaluate(club());
    const nominalTrough = paRail(r).corners.find((c) => c.mains === 'nominal' && c.load === 'keyDown')!.troughV;
    expect(r.paRailV['rail-pa']).toBeCloseTo(nominalTrough, 9);
    const pa = r.rf.stages.find((s) => s.stageId === 'st-pa')!.pa!;
    const load = r.budget.rails.find((x) => x.railId === 'rail-pa')!.loads.find((l) => l.computed)!;
    // same model; the passes settle the rail within 5 mV
    expect(Math.abs(load.currentA.keyDown - pa.keyDownCurrentA)).toBeLessThan(0.002);
  });

  it('every finding and recommendation of both demos resolves to a registry source with text, and has a ' +
    'message', () => {
    for (const p of DEMO_PROJECTS) {
      const r = evaluate(structuredClone(p));
      expect(r.findings.length).toBeGreaterThan(10);
      expectRegistered(r);
    }
  });

  it('so does every finding of fuzzed projects (seeded): changed mains, rule set, power, band, stages and bad ' +
    'values', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(0, 1),
        fc.option(
          fc.record({
            nominalV: fc.constantFrom(100, 120, 230, 0, Number.NaN),
            frequencyHz: fc.constantFrom(50, 60),
            lowFraction: fc.constantFrom(0.05, 0.1, 0.2),
            highFraction: fc.constantFrom(0.05, 0.1),
          }),
          { nil: null },
        ),
        fc.constantFrom('us-97-307' as const, 'itu-app3' as const),
        fc.constantFrom(0.5, 5, 20, 100, -1, Number.NaN),
        fc.constantFrom(1.9e6, 7.03e6, 10.11e6, 14.06e6, 28.1e6, 50.1e6, 0.1e6),
        fc.integer({ min: 0, max: 5 }),
        (demo, mains, ruleSet, targetPowerW, frequencyHz, dropStage) => {
          const p = structuredClone(DEMO_PROJECTS[demo]);
          p.mains = mains;
          p.rf = { ...p.rf, spuriousRule: ruleSet };
          p.targetPowerW = targetPowerW;
          p.frequencyHz = frequencyHz;
          if (dropStage < p.stages.length) p.stages.splice(dropStage, 1);
          expectRegistered(evaluate(p));
        },
      ),
      propertyOptions(PROPERTY_SEED, 25),
    );
  });
});

describe('evaluate(): the PA is judged at the supply corners that stress it', () => {
  it('drain peak = 2 x the PA rail high-mains no-load peak (push-pull, REFERENCE-VALUES §8.1), not the nominal ' +
    'trough', () => {
    const r = evaluate(club());
    const pa = r.rf.stages.find((s) => s.stageId === 'st-pa')!.pa!;
    const rail = paRail(r);
    const toleranceV = 1e-9;
    expect(Math.abs(pa.maxRailV - rail.reservoir.noLoadPeakHighV)).toBeLessThan(toleranceV);
    expect(Math.abs(pa.peakDrainV - 2 * rail.reservoir.noLoadPeakHighV)).toBeLessThan(toleranceV);
    expect(pa.peakDrainV).toBeGreaterThan(2 * r.paRailV['rail-pa']);
    const hot = rail.corners.find((c) => c.id === 'high-keyDown')!;
    expect(Math.abs(pa.hotRailV - hot.dcMeanV)).toBeLessThan(toleranceV);
  });
});

describe('evaluate(): high-mains heating corners carry the PA current at the high-mains rail', () => {
  it('PA rail high-mains key-down load = nominal budget + the extra PA current at the hotter rail (I_dc = k V / (eta ' +
    'R), REFERENCE-VALUES §8.1)', async () => {
    const { paKeyDownCurrentA } = await import('../../src/core/rf/pa');
    const p = club();
    const r = evaluate(p);
    const pa = r.rf.stages.find((s) => s.stageId === 'st-pa')!.pa!;
    const rail = paRail(r);
    const nominalKd = r.budget.rails.find((x) => x.railId === 'rail-pa')!.outputA.keyDown;
    const high = rail.corners.find((c) => c.id === 'high-keyDown')!.loadA;
    const low = rail.corners.find((c) => c.id === 'low-keyDown')!.loadA;
    const paStage = p.stages.find((s) => s.id === 'st-pa')!.pa!;
    const current = (v: number) => {
      const kd = paKeyDownCurrentA(paStage, v, p);
      return kd.ok ? kd.currentA : NaN;
    };
    const extra = current(pa.hotRailV) - current(r.paRailV['rail-pa']);
    const toleranceA = 0.002; // the passes settle the hot rail within 5 mV
    expect(extra).toBeGreaterThan(0.1);
    expect(Math.abs(high - (nominalKd + extra))).toBeLessThan(toleranceA);
    // the headroom corner keeps the nominal budget (more conservative than the lower low-mains PA current)
    expect(Math.abs(low - nominalKd)).toBeLessThan(1e-12);
  });
});

describe('evaluate(): filter and relay stress at the most RF the PA delivers (saturated or round the circle)', () => {
  it('relay peak = sqrt(2 P Z0 S) with P the stage\'s most after the filter loss (REFERENCE-VALUES §9)', () => {
    const p = club();
    const r = evaluate(p);
    const pa = r.rf.stages.find((s) => s.stageId === 'st-pa')!.pa!;
    const relayStage = r.rf.stages.find((s) => s.kind === 'tr')!;
    const lpf = r.rf.stages.find((s) => s.kind === 'lpf')!.lpf!;
    const swr = p.rf.worstSwr;
    const before = p.stages.find((s) => s.id === relayStage.stageId)!.relay!.position === 'before-lpf';
    // the most the stage delivers as built: the larger of its saturated drive at the highest supply (the band's ratio
    // times the high-mains output) and the most round the SWR circle
    const most = Math.max(
      (pa.waveform!.bandMaxOutputW / pa.waveform!.designOutputW) * pa.hotOutputW, pa.swr?.maxOutput.value ?? 0,
    );
    const pStress = most * (before ? 1 : 10 ** (-lpf.analysis!.atOperating.lossDb / 10));
    const toleranceV = 1e-6;
    expect(pa.hotOutputW).toBeGreaterThan(pa.outputW);
    expect(Math.abs(relayStage.relay!.rfPeakV - Math.sqrt(2 * pStress * 50 * swr))).toBeLessThan(toleranceV);
    // the filter's shunt capacitors: same maxima at the stage's most (before the filter loss)
    expect(most).toBeGreaterThan(pa.hotOutputW);
    expect(Math.abs(lpf.capacitorPeakV - Math.sqrt(2 * most * 50 * swr))).toBeLessThan(toleranceV);
  });
});

describe('evaluate(): RF exposure from the most the station radiates', () => {
  it('exposure uses the high-mains PA output after the filter: R = sqrt(2.56 EIRP / (4 pi S)) grows with sqrt(P) ' +
    '(REFERENCE-VALUES §2.2, §2.5)', () => {
    const r = evaluate(club());
    const pa = r.rf.stages.find((s) => s.stageId === 'st-pa')!.pa!;
    const lossDb = r.rf.stages.find((s) => s.kind === 'lpf')!.lpf!.analysis!.atOperating.lossDb;
    const toleranceW = 1e-9;
    expect(Math.abs(r.rf.exposure!.peakPowerW - pa.hotOutputW * 10 ** (-lossDb / 10))).toBeLessThan(toleranceW);
    expect(r.rf.exposure!.peakPowerW).toBeGreaterThan(r.rf.outputPowerW);
  });
});

describe('evaluate(): a switching regulator draws its input current at the lowest simulated input voltage', () => {
  it('I_in = V_out I_out / (eta V_trough) + I_q at the low-mains key-down trough (energy balance P_in = P_out / ' +
    'eta)', async () => {
    const { regulatorOutputV } = await import('../../src/core/power/regulator');
    const p = club();
    const reg = p.supply.rails.find((r) => r.id === 'rail-13v8')!;
    if (reg.kind !== 'regulated') throw new Error('fixture');
    reg.regulator = 'switching';
    reg.efficiency = 0.85;
    reg.dropoutV = 1;
    const r = evaluate(p);
    const b = r.budget.rails.find((x) => x.railId === 'rail-13v8')!;
    const raw = r.supply!.rails.find((x) => x.railId === 'rail-raw') as RectifiedRailReport;
    const trough = raw.corners.find((c) => c.id === 'low-keyDown')!.troughV;
    const vOut = regulatorOutputV(reg.setting, reg.quiescentA);
    const expected = (vOut * b.outputA.keyDown) / (0.85 * trough) + reg.quiescentA;
    const toleranceA = 0.0005; // the passes settle the trough within 5 mV
    expect(Math.abs(b.inputA!.keyDown - expected)).toBeLessThan(toleranceA);
    // the older estimate, nominal x (1 - low fraction), is higher than the trough and gave less current
    const nominalLow = r.budget.rails.find((x) => x.railId === 'rail-raw')!.nominalV * 0.9;
    expect(trough).toBeLessThan(nominalLow);
  });
});
