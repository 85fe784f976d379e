// The first screen's two supply pictures agree with each other and with the findings: a rail whose trough falls
// below its minimum only at the secondary-tolerance corner is a caution in both (not 'headroom OK' in the power flow
// and a failure in the trough chart), and that corner is labelled apart from plain low mains.
// Expected values are what the findings say (consistency of the design as entered); no published source applies.
import { describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { troughChartSvg, harmonicBarsSvg, TOLERANCE_MARK, type TroughRow } from '../../views/plots/margin-charts';
import type { HarmonicRow, HarmonicsReport } from '../../src/core/rf/harmonics';

const CAUTION = '#a86500';
const FAIL = '#b3261e';

describe('trough chart', () => {
  // invented rails: 24 V minimum; troughs in volts
  const row = (points: [string, number][]): TroughRow => ({
    name: 'PA rail',
    points: points.map(([label, troughV]) => ({ label, troughV })),
    minimumV: 24,
  });

  it('below the minimum only at the tolerance corner: a caution note and dot, no ✗', () => {
    const svg = troughChartSvg([row([[`L${TOLERANCE_MARK}`, 23.5], ['L', 24.5], ['N', 26], ['H', 28]])]);
    expect(svg).toContain(`fill="${CAUTION}">! lowest 23.5 V / min 24 V</text>`);
    expect(svg).toContain(`fill="${CAUTION}"/>`);
    expect(svg).not.toContain('✗');
  });

  it('below the minimum at plain low mains: a failure', () => {
    const svg = troughChartSvg([row([[`L${TOLERANCE_MARK}`, 23], ['L', 23.5], ['N', 26], ['H', 28]])]);
    expect(svg).toContain(`fill="${FAIL}">✗ lowest 23 V / min 24 V</text>`);
  });

  it('no rail: the one line fits the picture', () => {
    expect(troughChartSvg([])).toMatch(/viewBox="0 0 \d+ 24"[^]*No rails designed yet\./);
  });
});

describe('harmonic bars', () => {
  // 43 dB below the fundamental: 47 CFR 97.307(d) (installed after 2003, below 30 MHz). A harmonic below the
  // -70 dBc construction floor (the project's stated floor, a design choice) is judged from the floor:
  // 70 - 43 = 27 dB, a lower bound. Invented rows; only the fields the bars read matter.
  const row = (n: number, predictedDbc: number, worstPredictedDbc: number): HarmonicRow =>
    ({
      n,
      predictedDbc,
      limitedByConstruction: predictedDbc < -70,
      worstPredictedDbc,
      marginDb: -Math.max(predictedDbc, -70) - 43,
      worstMarginDb: -Math.max(worstPredictedDbc, -70) - 43,
      severity: 'ok',
    }) as HarmonicRow;
  const svg = harmonicBarsSvg({ rows: [row(2, -55, -52.5), row(4, -80, -78), row(5, -75, -66)] } as HarmonicsReport);

  it('a margin counted from the construction floor reads "at least", never as a signed exact figure', () => {
    expect(svg).toContain('>at least 27 dB, worst too</text>');
    expect(svg).toContain('>at least 27 dB, worst 23 dB</text>');
    expect(svg).not.toContain('+27.0');
  });

  it('a predicted harmonic keeps its plain margin', () => {
    expect(svg).toContain('>12 dB, worst 9.5 dB</text>');
  });
});

describe('club demo first screen', () => {
  it('a rail with a tolerance-corner headroom caution is not drawn as headroom OK in the power flow', async () => {
    const { get } = await demoApp();
    const html = await (await get('/projects/demo-club-30m')).text();
    const flow = html.slice(html.indexOf('id="power-flow"'), html.indexOf('id="troughs"'));
    const troughs = html.slice(html.indexOf('id="troughs"'));
    // the rails the trough chart marks with a caution note ("! lowest") are cautions in the power flow
    const cautionNotes = [...troughs.matchAll(/! lowest/g)].length;
    const cautionRails = [...flow.matchAll(/data-headroom="caution"/g)].length;
    expect(cautionNotes).toBeGreaterThan(0);
    expect(cautionRails).toBeGreaterThanOrEqual(cautionNotes);
    // the tolerance corner is labelled Lt and explained under the chart
    expect(troughs).toContain(`>L${TOLERANCE_MARK}</text>`);
    expect(troughs).toContain('secondary at the low end of its tolerance');
  });
});
