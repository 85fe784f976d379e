// The supply results partial and the rectifier plot render what evaluateSupply computed (ref §4.2 project).
import { describe, expect, it } from 'vitest';
import { evaluateSupply } from '../../../src/core/power/evaluate-supply';
import { SupplyResults } from '../../../views/partials/supply-results';
import { rectifierPlotData, rectifierPlotSvg } from '../../../views/plots/rectifier-plot';
import type { RectifiedRailReport } from '../../../src/core/power/report-types';
import { flat, refProject, regulator13v8 } from './fixture';
import { evaluate } from '../../../src/core/evaluate';
import { DEMO_PROJECTS } from '../../../seed-demo/index';
import { steadyInput } from '../../../src/core/power/ripple-rejection';

const project = refProject({ rails: [refProject().supply.rails[0], regulator13v8] });
const report = evaluateSupply(project, { raw: flat(3), reg: flat(3) });

describe('rectifier plot', () => {
  const svg = rectifierPlotSvg(rectifierPlotData(report.rails[0] as RectifiedRailReport));
  it('is a standalone SVG with a viewBox, both axis titles, a legend and the dashed minimum line', () => {
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg).toMatch(/viewBox="0 0 720 360"/);
    expect(svg).toContain('rail voltage (V)');
    expect(svg).toContain('winding current (A)');
    expect(svg).toContain('reservoir voltage');
    expect(svg).toMatch(/needed minimum 16\.3 V/); // 13.8 V + 2.5 V dropout (ref §6.2 headroom)
    expect(svg).toMatch(/stroke-dasharray="6 4"/);
    expect(svg.match(/<polyline /g)).toHaveLength(2);
  });
  it('says so when there is no waveform', () => {
    expect(
      rectifierPlotSvg({ title: 't', timeS: [], outputV: [], windingA: [], minimumV: null, minimumLabel: '' }),
    ).toContain('No waveform');
  });
});

describe('supply results partial', () => {
  const html = String(SupplyResults({ report }));
  it('renders a corners table per rail, the findings with severity badges, recommendations and the plot', () => {
    expect(html.match(/<table class="grid corners">/g)).toHaveLength(2);
    expect(html).toMatch(/class="sev sev-(ok|caution|fail)"/);
    expect(html).toContain('Low mains, TX key-down');
    expect(html).toContain('sets headroom');
    expect(html).toContain('sets heating');
    expect(html).toContain('<svg');
    expect(html).toMatch(/transformer:<\/strong>/);
    expect(html).toMatch(/heatsink:<\/strong>/);
    expect(html).toContain('Primary fuse:');
  });
  it('escapes names', () => {
    const p = refProject({ rails: [{ ...refProject().supply.rails[0], name: '<b>raw</b>' }] });
    const out = String(SupplyResults({ report: evaluateSupply(p, { raw: flat(1) }) }));
    expect(out).not.toContain('<b>raw</b>');
    expect(out).toContain('&lt;b&gt;raw&lt;/b&gt;');
  });
});

describe('a regulated rail fed from a battery (portable demo)', () => {
  // a battery feeds no ripple: whatever the regulator's rejection, none reaches the output (0 V in, 0 V out)
  const portable = evaluate(DEMO_PROJECTS[1]).supply!;
  const html = String(SupplyResults({ report: portable }));
  it('says no ripple reaches the output instead of "unknown", and the PA-on-battery card is not called ' +
    'transformers', () => {
    expect(portable.transformers).toHaveLength(0);
    expect(html).toContain('No ripple at the input (a steady source such as a battery), so none at the output.');
    expect(html).not.toContain('Ripple at the output unknown');
    expect(html).not.toContain('rejection not stated');
    expect(html).toContain('<h3>The supply as a whole</h3>');
    expect(html).not.toContain('Transformers and primary');
  });
  it('a regulated rail with no ripple in any corner is steady; one with ripple is not', () => {
    expect(steadyInput([{ inputRipplePpV: 0 }, { inputRipplePpV: 0 }])).toBe(true);
    expect(steadyInput([{ inputRipplePpV: 0 }, { inputRipplePpV: 0.2 }])).toBe(false);
    expect(steadyInput([])).toBe(false);
  });
});
