// The filter's and relay's parts are judged at the most the PA stage delivers: the larger of its saturated-drive
// output (at the highest supply) and the most round the worst-SWR circle; the stress relations are worked by hand.
import { describe, expect, it } from 'vitest';
import { stressPower } from '../../../src/core/rf/stress-power';
import { elementStress, swrCircle } from '../../../src/core/rf/lpf-stress';
import type { LpfDesign } from '../../../src/core/rf/lpf-design';
import type { Worst } from '../../../src/core/rf/pa-swr';
import { evaluateRelay } from '../../../src/core/rf/tr-relay';
import { evaluateRf } from '../../../src/core/rf/evaluate-rf';
import { relayParams, project } from './fixture';
import { near } from './helpers';

const worst = (value: number, phaseDeg: number | null): Worst => ({
  value, phaseDeg, loadReOhm: 50, loadImOhm: 0, antennaReOhm: null, antennaImOhm: null,
});

describe('stressPower: the larger of the two sources (constructed cases, worked by hand)', () => {
  it('saturated drive wins: 12 W / 8 W of the band at the design supply × 10 W at high mains = 15 W > 14 W', () => {
    const s = stressPower({
      hotDesignW: 10, designW: 8, bandMaxW: 12, circleMax: worst(14, 90), swr: 2, battery: false,
      model: 'cosine-pulse',
    });
    near(s.powerW, 15, 1e-12, 'P');
    expect(s.basis).toBe('saturated');
    expect(s.text).toBe("15.0 W, the stage's output driven into hard saturation (design load, high mains)");
  });
  it('the circle wins: 20 W at phase 90° against the saturated 15 W; the text names the phase', () => {
    const s = stressPower({
      hotDesignW: 10, designW: 8, bandMaxW: 12, circleMax: worst(20, 90), swr: 2, battery: true, model: null,
    });
    near(s.powerW, 20, 1e-12, 'P');
    expect(s.basis).toBe('swr-circle');
    expect(s.phaseDeg).toBe(90);
    expect(s.text).toBe('20.0 W, the most the stage gives round the SWR 2 circle (phase 90°)');
  });
  it('neither gives more than the high-mains design output: that output, said so', () => {
    const s = stressPower({
      hotDesignW: 10, designW: 8, bandMaxW: 8, circleMax: worst(9, 0), swr: 2, battery: true, model: null,
    });
    near(s.powerW, 10, 1e-12, 'P');
    expect(s.basis).toBe('design');
    expect(s.text).toBe("10.0 W, the PA's output at a full battery");
  });
  it('at SWR 1 there is no circle: only the saturated source counts', () => {
    const s = stressPower({
      hotDesignW: 10, designW: 10, bandMaxW: 10, circleMax: worst(30, 0), swr: 1, battery: false,
    });
    near(s.powerW, 10, 1e-12, 'P');
  });
});

describe('stress relations by hand', () => {
  it('a lone shunt capacitor across a line at SWR 2: worst V = √(P Z0 S) RMS, peak √(2 P Z0 S)', () => {
    // Source: transmission-line theory (textbook): V_max,rms = √(P Z0 S). A lone shunt C takes no real power, so
    // P = V² Re(1/Z_L); the least Re(1/Z_L) on the SWR 2 circle of 50 Ω is 1/100 Ω (phase 0, Z_L = 100 Ω), so the
    // worst V = √(P · 100 Ω). At P = 8 W: √800 = 28.28 V RMS, √1600 = 40 V peak.
    const d = { elements: [{ index: 1, kind: 'shunt-capacitor', builtValue: 100e-12 }] } as unknown as LpfDesign;
    const [c] = elementStress(d, 14e6, 8, swrCircle(50, 2));
    near(c.rmsV, Math.sqrt(800), 1e-9, 'V rms');
    near(c.rmsV * Math.SQRT2, 40, 1e-9, 'V peak');
    // its current: I = ω C V = 2π · 14 MHz · 100 pF · 28.28 V = 0.2488 A
    near(c.rmsA, 2 * Math.PI * 14e6 * 100e-12 * Math.sqrt(800), 1e-9, 'I rms');
  });
  it('the relay at 8 W into SWR 2 (after the filter): 40 V peak, √(8 · 2 / 50) = 0.566 A RMS', () => {
    // Source: transmission-line theory (textbook): V_max = √(2 P Z0 S) peak, I_max = √(P S / Z0) RMS
    const r = evaluateRelay(relayParams(), { powerW: 8, swr: 2, harmonicAmplitudeSum: 0, subject: 'T/R' });
    near(r.rfPeakV, 40, 1e-9, 'Vpk');
    near(r.rfRmsA, Math.sqrt(16 / 50), 1e-9, 'A rms');
  });
});

describe('evaluateRf: the parts take the chosen power, exposure keeps the design output', () => {
  const r = evaluateRf(project(), { paRailV: { pa: 13.8 }, paRailHotV: { pa: 15 } });
  const pa = r.stages.find((s) => s.pa)!.pa!;
  const lpf = r.stages.find((s) => s.lpf)!.lpf!;
  // the two sources, from the PA's own figures: saturated = band ratio × the high-mains output; the circle's most
  const sat = (pa.waveform!.bandMaxOutputW / pa.waveform!.designOutputW) * pa.hotOutputW;
  const chosen = Math.max(sat, pa.swr?.maxOutput.value ?? 0, pa.hotOutputW);
  it('the filter capacitors see √(2 P Z0 S) at the larger of the two (SWR 2, Z0 50 Ω)', () => {
    expect(chosen).toBeGreaterThan(pa.hotOutputW);
    near(lpf.capacitorPeakV, Math.sqrt(2 * chosen * 50 * 2), 1e-9, 'Vpk');
    expect(r.powerBasis!.parts!.powerW).toBe(chosen);
    const f = r.findings.find((x) => x.rule === 'lpf.capacitor-voltage')!;
    expect(f.message).toContain(`Figures at ${chosen.toPrecision(3)} W`);
  });
  it('the relay after the filter: the chosen power less the filter loss; exposure at the high-mains output', () => {
    const loss = 10 ** (-lpf.analysis!.atOperating.lossDb / 10);
    const relay = r.stages.find((s) => s.relay)!.relay!;
    near(relay.rfPeakV, Math.sqrt(2 * chosen * loss * 50 * 2), 1e-9, 'relay Vpk');
    near(r.exposure!.peakPowerW, pa.hotOutputW * loss, 1e-9, 'exposure P');
    expect(r.powerBasis!.exposure).toContain(`${(pa.hotOutputW * loss).toPrecision(3)} W`);
  });
  it('a refused PA keeps today\'s behaviour: the target power, said so', () => {
    const x = evaluateRf(project(), { paRailV: {} });
    expect(x.powerBasis!.parts).toBeNull();
    expect(x.findings.some((f) => f.rule === 'rf.pa-unknown' && /target power/.test(f.message))).toBe(true);
    const l = x.stages.find((s) => s.lpf)!.lpf!;
    near(l.capacitorPeakV, Math.sqrt(2 * x.targetPowerW * 50 * 2), 1e-9, 'Vpk at target');
  });
});
