// The PA's SWR-circle table on the RF page (views/partials/pa-swr-table.tsx).
import { describe, expect, it } from 'vitest';
import { evaluateRf } from '../../../src/core/rf/evaluate-rf';
import { RfResults } from '../../../views/partials/rf-results';
import { paParams, project, rfSettings } from './fixture';

describe('SWR circle on the RF page', () => {
  it('class C at SWR 2: the worst drain peak with its load and phase, the dissipation worst at 180° (25 Ω)', async () => {
    const report = evaluateRf(project({ rf: rfSettings({ worstSwr: 2 }) }), { paRailV: { pa: 13.8 } });
    const html = String(await (<RfResults report={report} />));
    expect(html).toContain('Round the SWR 2 circle');
    // Definition of Γ: phase 180° at SWR 2 is z = 1/2, 25 Ω on a 50 Ω load
    expect(html).toMatch(/Most dissipation[^]*?25\.0 \+ j0\.0 Ω[^]*?180°/);
    // with a low-pass filter the clipping loads are balanced against it, and the drain peak carries the ring margin
    expect(html).toContain('balanced against the filter at each harmonic');
    expect(html).toContain('12 % ring margin where it clips');
  });
  it('class E says its stress round the circle comes from the time-domain simulation', async () => {
    const p = project({ rf: rfSettings({ worstSwr: 2 }) });
    p.stages[0].pa = paParams({ amplifierClass: 'E', topology: 'single-ended', devices: 1 });
    const html = String(await (<RfResults report={evaluateRf(p, { paRailV: { pa: 13.8 } })} />));
    expect(html).toContain('class E by time-domain simulation');
  });
});
