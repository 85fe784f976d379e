// L network and feed choke of a single-ended PA matched by a network.
import { describe, expect, it } from 'vitest';
import { designOutputNetwork, feedChoke, lNetworkIdeal, lNetworkInput } from '../../../src/core/rf/output-network';
import { paParams } from './fixture';
import { near } from './helpers';

/** Z = jωL + 1 / (1/R + jωC), written out (circuit theory), as [re, im]. */
function zIn(l: number, c: number, r: number, f: number): [number, number] {
  const w = 2 * Math.PI * f;
  const gr = 1 / r;
  const b = w * c;
  const d = gr * gr + b * b;
  return [gr / d, -b / d + w * l];
}

describe('L network', () => {
  it('12.5 Ω to 50 Ω at 14 MHz: Q = √3, X_L = 21.65 Ω, X_C = 28.87 Ω', () => {
    // Hand-worked from the L-network equations (Bowick, RF Circuit Design, 1982, ch. 4; from memory):
    // Q = √(50/12.5 − 1) = 1.7321; X_s = 1.7321 × 12.5 = 21.65 Ω → L = 21.65 / (2π 14e6) = 246.1 nH;
    // X_p = 50 / 1.7321 = 28.87 Ω → C = 1 / (2π 14e6 × 28.87) = 393.8 pF
    const n = lNetworkIdeal(12.5, 50, 14e6);
    near(n.q, Math.sqrt(3), 1e-12, 'Q');
    near(n.seriesH, 246.1e-9, 0.1e-9, 'L');
    near(n.shuntF, 393.8e-12, 0.1e-12, 'C');
  });
  it('the ideal network presents exactly the drain load (checked by circuit theory, not by the ' +
    'design equations)', () => {
    for (const [lo, hi, f] of [[12.5, 50, 14e6], [3, 50, 7e6], [22, 50, 10.1e6]]) {
      const n = lNetworkIdeal(lo, hi, f);
      const [re, im] = zIn(n.seriesH, n.shuntF, hi, f);
      near(re, lo, lo * 1e-9, `R at ${lo} Ω`);
      near(im, 0, lo * 1e-9, `X at ${lo} Ω`);
      const [re2, im2] = lNetworkInput(n.seriesH, n.shuntF, hi, f);
      near(re2, re, 1e-9, 're');
      near(im2, im, 1e-9, 'im');
    }
  });
  it('fits standard capacitors and turns, and reports the drain load the built parts give', () => {
    const n = designOutputNetwork(paParams({ topology: 'single-ended', loadOhm: 50 }), 12.5, 14e6, {
      alHPerTurn2: 4.9e-9,
      series: 'E12',
      pairs: true,
    })!;
    // 246 nH on AL 4.9 nH/t²: √(246.1/4.9) = 7.09 → 7 turns, 240.1 nH (L = AL N²)
    expect(n.turns).toBe(7);
    near(n.builtSeriesH!, 240.1e-9, 0.1e-9, 'built L');
    near(n.builtShuntF, n.capacitorPartsF.reduce((a, b) => a + b, 0), 1e-18, 'parts add up');
    near(n.builtShuntF, 393.8e-12, 0.03 * 393.8e-12, 'built C within 3 %');
    const [re, im] = zIn(n.builtSeriesH!, n.builtShuntF, 50, 14e6);
    near(n.builtDrainReOhm!, re, 1e-9, 'built R');
    near(n.builtDrainImOhm!, im, 1e-9, 'built X');
  });
});

describe('feed choke', () => {
  it('reactance 10 × the drain load: 12.5 Ω at 14 MHz needs 1.42 µH, carrying the key-down current', () => {
    // 10 × 12.5 / (2π 14e6) = 1.421 µH (X = ωL; the factor 10 is common practice, no published source)
    const c = feedChoke(12.5, 14e6, 0.8);
    near(c.minInductanceH, 1.421e-6, 0.001e-6, 'L');
    expect(c.currentA).toBe(0.8);
  });
});

describe('on the RF page', () => {
  it('a single-ended stage matched by a network shows its L network and choke', async () => {
    const { evaluateRf } = await import('../../../src/core/rf/evaluate-rf');
    const { RfResults } = await import('../../../views/partials/rf-results');
    const { project } = await import('./fixture');
    const p = project();
    const st = p.stages.find((s) => s.kind === 'final')!;
    st.pa = {
      ...st.pa!,
      topology: 'single-ended',
      devices: 1,
      turnsRatio: null,
      networkLoadOhm: 12.5,
      heatsinkSharedBy: null,
    };
    const report = evaluateRf(p, { paRailV: { pa: 13.8 } });
    const r = report.stages.find((s) => s.kind === 'final')!;
    expect(r.pa!.refused, JSON.stringify(r.findings.filter((f) => f.severity === 'fail').map((f) => f.message))).toBe(
      false,
    );
    expect(r.network?.drainOhm).toBe(12.5);
    expect(r.choke?.currentA).toBe(r.pa!.keyDownCurrentA);
    const html = String(RfResults({ report }));
    expect(html).toContain('output network and feed choke');
    expect(html).toContain('Feed choke');
  });
});
