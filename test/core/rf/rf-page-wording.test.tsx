// The RF page as a builder reads it on the two demos: each harmonic's band worded without implying the construction
// floor sets its worst end, the filter parts beside the core's flux limit and the capacitors' entered ratings, and the
// design-load drain peak said to be at the highest supply (where it is computed). Wording checks; the figures are the
// demos' own inputs (seed-demo/*.ts).
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../../src/core/evaluate';
import { RfResults } from '../../../views/partials/rf-results';
import { club30m } from '../../../seed-demo/club-30m';
import { portable20m } from '../../../seed-demo/portable-20m';

const html = async (p: typeof club30m) => String(await (<RfResults report={evaluate(p).rf} />).toString());

describe('RF page wording on the demos', () => {
  it('club: the 2nd harmonic band reads "below -70 dBc to ..." (not "limited by construction to ...")', async () => {
    const h = await html(club30m);
    const row = /<tr data-harmonic="2">([\s\S]*?)<\/tr>/.exec(h)![1];
    expect(row).toMatch(/push-pull imbalance, typical to worst/);
    expect(row).toMatch(/below -70 dBc to -?[\d.]+ dBc/);
    expect(h).not.toMatch(/limited by construction to/);
  });
  it('club: the filter parts show the 15 mT flux limit and the 500 V, 3 A capacitor ratings; the AL ' +
    'is said once', async () => {
    const h = await html(club30m);
    expect(h).toContain('Limit / rating');
    expect(h).toContain('flux ≤ 15.0 mT');
    expect(h).toContain('500 V, 3 A');
    expect(h).toMatch(/turns computed with AL 4\.9 nH\/turn²/);
    expect(h).not.toMatch(/\(AL [\d.]+ nH\/t²\) \(AL/);
  });
  it('portable: the design-load drain peak is labelled with the highest supply, 14.4 V (a full ' +
    'LiFePO4 battery)', async () => {
    const h = await html(portable20m);
    expect(h).toMatch(
      /Peak drain voltage \/ device current \(design load\)<\/th><td>[\d.]+ V at the highest supply, 14\.4 V \/ /,
    );
  });
  it('club: which output is where: the subtitle at the antenna connector, the PA row at the PA', async () => {
    const h = await html(club30m);
    // wording only: the figures are the program's own, so the checks take any number in their place
    const n = String.raw`[\d.]+`;
    expect(h).toMatch(new RegExp(`10\\.11 MHz: ${n} W at the antenna connector \\(${n} W from the PA into its ` +
      `design load at ${n} V, less the filter&#39;s ${n} dB\\); target 20 W`));
    expect(h).toMatch(new RegExp(`Output at the PA \\(design load\\)</th><td>${n} W = [^<]*; ${n} W at the ` +
      'antenna connector after the filter&#39;s'));
    // the matched-antenna row names its supplies (drain peak at the highest, the rest key-down) and the design load's
    expect(h).toMatch(new RegExp(`the PA sees [^<]*Ω \\(filter input SWR ${n}\\): ${n} W \\(${n} W into the ` +
      'design load\\)'));
    expect(h).toMatch(new RegExp(`\\(at the highest supply: ${n} V for the drain peak, ${n} V key-down for the ` +
      'rest\\)'));
  });
  it('club: a harmonic limited by construction has its margin counted from the floor, "at least"', async () => {
    const h = await html(club30m);
    // floor −70 dBc (common practice) against the 43 dB of 47 CFR 97.307(d): at least 70 − 43 = 27 dB
    const row4 = /<tr data-harmonic="4">([\s\S]*?)<\/tr>/.exec(h)![1];
    expect(row4).toContain('limited by construction');
    expect(row4).toContain('<td class="num">at least 27 dB</td>');
    expect(h).toMatch(/Required 43 dB below [\d.]+ W at the antenna connector\./);
  });
  it('portable (class E, SWR 2): the bands say which loads they cover and where each worst end lies', async () => {
    const h = await html(portable20m);
    const covered = /data-loads-covered[^>]*>([^<]*)<\/span>/.exec(h)?.[1];
    expect(covered).toBe('the design load and SWR 2 at 12 phases (every 30°) at the antenna, loaded Q 30 to 5');
    const ends = /<ul class="explain" data-worst-loads[^>]*>([\s\S]*?)<\/ul>/.exec(h)![1];
    for (const n of [2, 3, 4, 5]) {
      expect(ends).toMatch(new RegExp(`Harmonic ${n}, worst end at SWR 2 at the antenna, reflection phase \\d+°`));
    }
  });
  it('club (class C): no loads line (its bands are the design load\'s, clipping folded in)', async () => {
    const h = await html(club30m);
    expect(h).not.toContain('data-loads-covered');
    expect(h).not.toContain('data-worst-loads');
  });
});
