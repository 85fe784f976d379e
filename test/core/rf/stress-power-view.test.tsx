// The RF page says which power each check uses, one line each (views/partials/rf-results.tsx).
import { describe, expect, it } from 'vitest';
import { evaluateRf } from '../../../src/core/rf/evaluate-rf';
import { RfResults } from '../../../views/partials/rf-results';
import { project } from './fixture';

describe('RF page: the power each check uses', () => {
  const report = evaluateRf(project(), { paRailV: { pa: 13.8 }, paRailHotV: { pa: 15 } });
  const html = String(<RfResults report={report} />);
  const esc = (t: string) => t.replace(/'/g, '&#39;');
  it('one line each for the parts, exposure and the spurious reference', () => {
    for (const k of ['parts', 'exposure', 'spurious']) {
      expect((html.match(new RegExp(`data-power-basis="${k}"`, 'g')) ?? []).length, k).toBe(1);
    }
    expect(html).toContain(esc(`Power: ${report.powerBasis!.parts!.text}`));
    expect(html).toContain('RF exposure: at ');
    expect(html).toContain('Spurious emissions: relative to ');
  });
  it('the relay row names its power and where it comes from', () => {
    const relay = report.stages.find((s) => s.relay)!.relay!;
    expect(html).toContain('Power through the relay');
    expect(html).toContain(esc(`${report.powerBasis!.parts!.text} less the filter`));
    expect(relay.powerW).toBeGreaterThan(0);
  });
});
