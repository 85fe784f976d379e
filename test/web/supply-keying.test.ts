// The supply page shows the PA rail's keying transient (plot, first dot, loads) and every other rectified rail's
// load model, through t.app.request() on the demo database.
import { describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';

describe('supply page: keying transient', () => {
  it('the PA rail card has the transient plot with one shaded band per dot; the raw rail lists its loads', async () => {
    const t = await demoApp();
    const res = await t.app.request('http://localhost/projects/demo-club-30m/supply');
    expect(res.status).toBe(200);
    const html = await res.text();
    const pa = html.slice(html.indexOf('id="supply-rail-pa"'));
    const card = pa.slice(0, pa.indexOf('</section>'));
    expect(card).toContain('Keying transient');
    expect(card).toContain('class="plot keying-transient-plot"');
    expect((card.match(/class="key-down"/g) ?? []).length).toBeGreaterThanOrEqual(3);
    // the demo's relay keys at 20 WPM (PARIS: 60 ms dots)
    expect(card).toContain('20 WPM');
    expect(card).toContain('PA load line');
    const raw = html.slice(html.indexOf('id="supply-rail-raw"'));
    const rawCard = raw.slice(0, raw.indexOf('</section>'));
    expect(rawCard).not.toContain('Keying transient');
    expect(rawCard).toContain('Loads on this rail and how each follows its voltage');
    expect(rawCard).toContain('13.8 V signal rail');
  });
});
