// Rendering of the RF results partial and the filter plot (views/partials/rf-results.tsx, views/plots/filter-plot.ts).
import { describe, expect, it } from 'vitest';
import { evaluateRf } from '../../../src/core/rf/evaluate-rf';
import { filterPlotData, filterPlotSvg, renderFilterPlot } from '../../../views/plots/filter-plot';
import { RfResults } from '../../../views/partials/rf-results';
import { project } from './fixture';

const report = evaluateRf(project(), { paRailV: { pa: 13.8 } });

describe('filter plot', () => {
  const svg = filterPlotSvg(report);
  it('is a standalone SVG with curve, band, harmonics, limit line, worst-case marks, axis labels and legend', () => {
    expect(svg.startsWith('<svg')).toBe(true);
    expect(svg.endsWith('</svg>')).toBe(true);
    expect(svg).toContain('class="response"');
    expect(svg).toContain('class="band"');
    expect((svg.match(/class="harmonic"/g) ?? []).length).toBe(4);
    expect(svg).toContain('class="limit"');
    expect((svg.match(/class="mc-worst"/g) ?? []).length).toBe(4);
    expect(svg).toContain('Frequency (MHz, log scale)');
    expect(svg).toContain('|S21| (dB)');
    expect(svg).toContain('Monte Carlo worst');
    expect(svg).not.toMatch(/NaN|Infinity|undefined/);
  });
  it('places the 3f marker where the log axis puts 21.09 MHz', () => {
    const d = filterPlotData(report)!;
    const s = renderFilterPlot(d, 720, 380);
    const f0 = d.sweep[0].frequencyHz,
      f1 = d.sweep[d.sweep.length - 1].frequencyHz;
    const xExpected =
      56 + ((Math.log10(3 * 7.03e6) - Math.log10(f0)) / (Math.log10(f1) - Math.log10(f0))) * (720 - 56 - 16);
    const m = [...s.matchAll(/class="harmonic" x1="([\d.]+)"/g)].map((x) => Number(x[1]));
    expect(m.some((x) => Math.abs(x - xExpected) < 0.1)).toBe(true);
  });
  it('is empty without an analysed filter', () => {
    const r = evaluateRf(project({ stages: project().stages.filter((s) => s.kind !== 'lpf') }), {
      paRailV: { pa: 13.8 },
    });
    expect(filterPlotSvg(r)).toBe('');
  });
});

describe('RfResults partial', () => {
  it('renders PA, filter parts, harmonics, relay, exposure caution and findings', async () => {
    const html = String(await (<RfResults report={report} />).toString());
    expect(html).toContain('id="rf-results"');
    expect(html).toContain('final amplifier');
    expect(html).toMatch(/C1 \(shunt\)/);
    expect(html).toMatch(/\d+ turns/);
    expect(html).toContain('class="grid harmonics"');
    expect(html).toContain('T/R relay');
    expect(html).toContain('Local rules and your licence conditions govern');
    expect(html).toMatch(/class="sev sev-(ok|caution|fail)"/);
    expect(html).toContain('<svg');
    expect(html).not.toMatch(/NaN|undefined/);
  });
});
