// Rendering of the keyed spectrum (views/plots/keying-plot.ts) on the RF results partial and in the CLI text.
import { describe, expect, it } from 'vitest';
import { evaluateRf } from '../../../src/core/rf/evaluate-rf';
import { evaluateKeying } from '../../../src/core/rf/keying-eval';
import { keyingPlotSvg } from '../../../views/plots/keying-plot';
import { RfResults } from '../../../views/partials/rf-results';
import { project, relayParams } from './fixture';

describe('keying plot', () => {
  const k = evaluateKeying(relayParams({ keyRiseS: 0.002 }), 'T/R').result!;
  const svg = keyingPlotSvg('T/R <&>', k);
  it('is a standalone SVG with lines, the click marks, both bandwidths, axes and an escaped title', () => {
    expect(svg.startsWith('<svg')).toBe(true);
    expect(svg.endsWith('</svg>')).toBe(true);
    expect(svg).toContain('class="lines"');
    expect((svg.match(/class="click"/g) ?? []).length).toBe(5);
    expect(svg).toContain('class="necessary"');
    expect(svg).toContain('class="occupied"');
    expect(svg).toContain('Offset from the carrier (Hz)');
    expect(svg).toContain('T/R &lt;&amp;&gt;');
    expect(svg).not.toContain('T/R <&>');
    expect(svg).not.toMatch(/NaN|Infinity|undefined/);
  });
  it('places the 1 kHz click mark where the linear axis puts it', () => {
    // x = 56 + f / fMax × (720 − 56 − 16), fMax the last line at or below 3 kHz (hand-worked placement)
    const fMax = k.spectrum.offsetsHz[k.spectrum.offsetsHz.length - 1];
    const x = 56 + (1000 / fMax) * 648;
    const marks = [...svg.matchAll(/class="click" d="M([\d.]+) /g)].map((m) => Number(m[1]) + 5);
    expect(marks.some((m) => Math.abs(m - x) < 0.2)).toBe(true);
  });
});

describe('RF results with keying', () => {
  it('shows the keying table and plot of a T/R stage with edges entered', () => {
    const p = project();
    const tr = p.stages.find((s) => s.kind === 'tr');
    expect(tr, 'fixture has a T/R stage').toBeTruthy();
    tr!.relay = { ...tr!.relay!, keyRiseS: 0.005, keyFallS: null, keyShapingRcS: null };
    const report = evaluateRf(p, { paRailV: { pa: 13.8 } });
    const html = String(<RfResults report={report} />);
    expect(html).toContain('keying-plot');
    expect(html).toContain('Necessary bandwidth Bn = B K');
    expect(report.findings.some((f) => f.rule === 'keying.edges' && f.severity === 'ok')).toBe(true);
  });
});
