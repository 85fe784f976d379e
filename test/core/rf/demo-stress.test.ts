// Both demos' filter and relay parts are judged at the most their PA stage delivers as built (stress-power.ts).
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../../src/core/evaluate';
import { club30m } from '../../../seed-demo/club-30m';
import { portable20m } from '../../../seed-demo/portable-20m';
import { near } from './helpers';

const parts = (p: typeof club30m) => {
  const r = evaluate(p);
  const pa = r.rf.stages.find((s) => s.pa)!.pa!;
  const lpf = r.rf.stages.find((s) => s.lpf)!.lpf!;
  const relay = r.rf.stages.find((s) => s.relay)!.relay!;
  return { r, pa, lpf, relay, loss: 10 ** (-lpf.analysis!.atOperating.lossDb / 10) };
};

describe('demos: the parts take the most the stage delivers', () => {
  it('club (class C push-pull): saturated drive at high mains, the band ratio times the hot output, beats the circle',
    () => {
      const { r, pa, lpf, relay, loss } = parts(club30m);
      const sat = (pa.waveform!.bandMaxOutputW / pa.waveform!.designOutputW) * pa.hotOutputW;
      expect(sat).toBeGreaterThan(pa.swr!.maxOutput.value);
      expect(r.rf.powerBasis!.parts!.basis).toBe('saturated');
      // Source: transmission-line theory (textbook), V_max = √(2 P Z0 S) peak at SWR 2, Z0 = 50 Ω
      near(lpf.capacitorPeakV, Math.sqrt(2 * sat * 50 * 2), 1e-9, 'C peak');
      // the relay follows the filter: the same less the filter's loss; I_max = √(P S / Z0) RMS
      near(relay.rfPeakV, Math.sqrt(2 * sat * loss * 50 * 2), 1e-9, 'relay peak');
      near(relay.rfRmsA, Math.sqrt((sat * loss * 2) / 50), 1e-9, 'relay A');
      // the output transformer's primary into its design load: V = √(P R) at the saturated drive (P = V² / R)
      const ot = r.rf.stages.find((s) => s.pa)!.outputTransformer!;
      near(ot.primaryRmsV, Math.sqrt(sat * pa.primaryOhm), 1e-9, 'primary V');
    });
  it('portable (class E): the most round the SWR 2 circle beats its saturated drive', () => {
    const { r, pa, lpf, relay, loss } = parts(portable20m);
    const circle = pa.swr!.maxOutput.value;
    expect(circle).toBeGreaterThan((pa.waveform!.bandMaxOutputW / pa.waveform!.designOutputW) * pa.hotOutputW);
    expect(r.rf.powerBasis!.parts!.basis).toBe('swr-circle');
    expect(r.rf.powerBasis!.parts!.text).toContain(`round the SWR 2 circle (phase ${pa.swr!.maxOutput.phaseDeg}°)`);
    // Source: transmission-line theory (textbook), V_max = √(2 P Z0 S) peak, I_max = √(P S / Z0) RMS
    near(lpf.capacitorPeakV, Math.sqrt(2 * circle * 50 * 2), 1e-9, 'C peak');
    near(relay.rfPeakV, Math.sqrt(2 * circle * loss * 50 * 2), 1e-9, 'relay peak');
    // exposure stays at the design drive's output (full battery) after the filter
    near(r.rf.exposure!.peakPowerW, pa.hotOutputW * loss, 1e-9, 'exposure');
  });
});
