// The PA's SWR-circle table on the RF page (views/partials/pa-swr-table.tsx).
import { describe, expect, it } from 'vitest';
import { evaluateRf } from '../../../src/core/rf/evaluate-rf';
import { RfResults } from '../../../views/partials/rf-results';
import { paParams, project, rfSettings } from './fixture';

describe('SWR circle on the RF page', () => {
  it('class C at SWR 2, no filter: the circle at the PA output, the dissipation worst at 180° (25 Ω)', async () => {
    const p = project({ rf: rfSettings({ worstSwr: 2 }) });
    p.stages = p.stages.filter((s) => s.kind !== 'lpf');
    const html = String(await (<RfResults report={evaluateRf(p, { paRailV: { pa: 13.8 } })} />));
    expect(html).toContain("<caption>Worst cases round the SWR 2 circle at the PA&#39;s output</caption>");
    expect(html).toContain('No low-pass filter is known, so the SWR 2 circle is placed at the PA&#39;s output');
    // Definition of Γ: phase 180° at SWR 2 is z = 1/2, 25 Ω on a 50 Ω load
    expect(html).toMatch(/Most dissipation[^]*?180°[^]*?25\.0 \+ j0\.0 Ω/);
  });
  it('class C at SWR 2 with the filter: the circle at the antenna, each worst with its antenna load and the PA\'s',
    async () => {
      const report = evaluateRf(project({ rf: rfSettings({ worstSwr: 2 }) }), { paRailV: { pa: 13.8 } });
      const html = String(await (<RfResults report={report} />));
      // a short caption; what the loads are, how they are taken and what "phase" means in plain sentences below
      expect(html).toContain('<caption>Worst cases round the SWR 2 circle at the antenna</caption>');
      expect(html).toContain('Each antenna load on the SWR 2 circle, every 15°, is taken through the low-pass');
      // definition of Γ: at SWR 2, phase 0° is z = 2 (100 Ω), 180° is z = 1/2 (25 Ω) on a 50 Ω design load
      expect(html).toContain('0° a resistance above the design load (100 Ω), 180° one below (25 Ω)');
      expect(html).toContain('Load at the antenna');
      expect(html).toContain('Load at the PA');
      expect(html).toMatch(/the PA sees [^<]*Ω \(filter input SWR \d\.\d\d\)/);
      // the design-load row beside it: the stage into what the filter presents with a matched antenna
      expect(html).toContain('With a matched antenna, through the filter as built');
      // with a low-pass filter the clipping loads are balanced against it, and the drain peak carries the ring margin
      expect(html).toContain("balanced against the filter&#39;s impedance at each harmonic");
      expect(html).toContain('the drain peak carries a 12 % margin for the ring');
    });
  it('class E says its stress round the circle comes from the time-domain simulation', async () => {
    const p = project({ rf: rfSettings({ worstSwr: 2 }) });
    p.stages[0].pa = paParams({ amplifierClass: 'E', topology: 'single-ended', devices: 1 });
    const html = String(await (<RfResults report={evaluateRf(p, { paRailV: { pa: 13.8 } })} />));
    expect(html).toContain('Class E: the stage is simulated in the time domain at each load.');
  });
});
