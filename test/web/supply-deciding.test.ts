// The supply page's first results ("Does the supply hold up?") and the overview's first screen name the same
// deciding point for headroom: on the club demo low mains with the secondary at the low end of its 5 % tolerance,
// a caution on the raw and PA rails. A consistency check between two pages of one report (no computed value is
// an expected value here); the caution itself is the one a user walk reported (16.4 V against a 16.9 V minimum).
import { describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';

const ID = 'demo-club-30m';

/** The glance's table for one rail. */
const glanceTable = (html: string, railId: string) => {
  const glance = html.slice(html.indexOf('id="supply-glance"'), html.indexOf('class="supply-sections"'));
  const start = glance.indexOf(`data-rail="${railId}"`);
  expect(start, railId).toBeGreaterThan(0);
  return glance.slice(start, glance.indexOf('</table>', start));
};
/** One row of it by corner id: its cells' text and its headroom verdict. */
const row = (table: string, corner: string) => {
  const m = new RegExp(`<tr data-corner="${corner}"[\\s\\S]*?</tr>`).exec(table);
  expect(m, corner).not.toBeNull();
  const cells = [...m![0].matchAll(/<t[hd][^>]*>([\s\S]*?)<\/t[hd]>/g)].map((c) => c[1].replace(/<[^>]+>/g, '').trim());
  return { cells, verdict: /data-headroom-verdict="(\w+)"/.exec(m![0])?.[1] ?? null };
};

describe('supply page and first screen agree on the deciding headroom corner', () => {
  it('club demo: the tolerance corner is shown, named, with the first screen’s caution and trough', async () => {
    const { get } = await demoApp();
    const supply = await (await get(`/projects/${ID}/supply`)).text();
    const overview = await (await get(`/projects/${ID}`)).text();
    for (const railId of ['rail-raw', 'rail-pa']) {
      const table = glanceTable(supply, railId);
      const plain = row(table, 'low-keyDown');
      const tol = row(table, 'lowTol-keyDown');
      // named as such: the row says it is the secondary's tolerance corner, and the corner its percentage
      expect(tol.cells[0]).toBe('Headroom, secondary at its low tolerance');
      expect(tol.cells[1]).toMatch(/^Low mains, secondary −5 %, TX key-down$/);
      // the user walk: plain low mains meets the need, the tolerance corner falls below it (a caution)
      expect(plain.verdict).toBe('ok');
      expect(tol.verdict).toBe('caution');
      // the first screen's power-flow diagram draws the rail with the same verdict
      expect(overview).toContain(`data-rail="${railId}" data-headroom="caution"`);
      // and its trough chart names the same lowest trough (the tolerance row's trough) in its note
      const name = /<caption><a href="#supply-[^"]+">([^<]+)<\/a>/.exec(table)?.[1];
      expect(name).toBeTruthy();
      const chart = overview.slice(overview.indexOf('id="troughs"'));
      const note = chart.slice(chart.indexOf(`<text x="0" y="`, chart.indexOf(`>${name}<title>`) - 30));
      const lowest = /! lowest ([\d.]+ m?V)/.exec(note)?.[1];
      expect(lowest, name).toBe(tol.cells[3]);
    }
  });

  it('club demo: the rail card further down leads with the same two headroom rows', async () => {
    const { get } = await demoApp();
    const supply = await (await get(`/projects/${ID}/supply`)).text();
    const card = supply.slice(supply.indexOf('id="supply-rail-raw"'));
    const table = card.slice(card.indexOf('<table class="grid deciding"'), card.indexOf('</table>'));
    expect(row(table, 'low-keyDown').verdict).toBe('ok');
    expect(row(table, 'lowTol-keyDown').verdict).toBe('caution');
  });

  it('club demo: a tune-up load above the key-down budget says why, naming the budget it exceeds', async () => {
    const { get } = await demoApp();
    const supply = await (await get(`/projects/${ID}/supply`)).text();
    const overview = await (await get(`/projects/${ID}`)).text();
    // the overview's budget figure for the PA rail with the key down
    const cell = /data-rail="rail-pa" data-mode="keyDown"><strong>([^<]+)<\/strong>/.exec(overview)?.[1];
    expect(cell).toBeTruthy();
    const pa = row(glanceTable(supply, 'rail-pa'), 'high-tuneUp');
    expect(parseFloat(pa.cells[2])).toBeGreaterThan(parseFloat(cell!));
    expect(pa.cells[1]).toContain('a carrier held at high mains');
    expect(pa.cells[1]).toContain(`than the ${cell} key-down budget, taken at nominal mains`);
    // the raw rail carries no PA: its tune-up load is its key-down budget, with nothing to explain
    expect(row(glanceTable(supply, 'rail-raw'), 'high-tuneUp').cells[1]).toBe('High mains, tune-up carrier');
  });
});
