// The order sheets per supplier on the parts-list page (t.app.request): the stored club demo's Copperleaf sheet
// with the figures worked by hand in test/core/cost/order-sheet-club.test.ts (PCB1 10 at EUR 8.90 = USD 96.12, C2 10
// at the EUR 2.62 break = USD 28.30, U2 9 at EUR 1.99 = USD 19.34; parts USD 143.76, shipping EUR 12.00 = USD 12.96,
// order USD 156.72), one table per supplier, and a link to the orders CSV.
import { beforeEach, describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';

const ID = 'demo-club-30m';
let t: Awaited<ReturnType<typeof demoApp>>;
beforeEach(async () => {
  t = await demoApp();
});

const text = (html: string) => html.replace(/<[^>]+>/g, ' ').replace(/&#39;|&rsquo;/g, "'").replace(/\s+/g, ' ');

describe('order sheets on the parts-list page', () => {
  it('one table per supplier; the Copperleaf sheet line by line with its totals', async () => {
    const html = await (await t.app.request(`http://localhost/projects/${ID}/bom`)).text();
    const sheets = [...html.matchAll(/<table class="grid cost order-sheet" data-supplier="([^"]+)"/g)].map((m) => m[1]);
    expect(sheets.sort()).toEqual(['Copperleaf Elektronik', 'Harbor Radio Surplus', 'Northfield Components']);
    const start = html.indexOf('data-supplier="Copperleaf Elektronik"');
    const sheet = text(html.slice(start, html.indexOf('</table>', start)));
    expect(sheet).toContain(
      'CL-40968 Electrolytic capacitor 6800 µF 50 V, 105 °C, ripple 3.6 A (C2) 10 9 10 EUR 2.62 EUR 26.20 USD 28.30',
    );
    expect(sheet).toContain('CL-11602 Double-balanced mixer IC, 8-pin DIP (U2) 9 9 1 EUR 1.99 EUR 17.91 USD 19.34');
    expect(sheet).toContain(
      'CL-PCB-RVRS-B Printed circuit board, club design rev B (PCB1) 10 9 10 EUR 8.90 EUR 89.00 USD 96.12',
    );
    expect(sheet).toContain('Parts USD 143.76 Shipping USD 12.96 Order total Copperleaf Elektronik USD 156.72');
    expect(html).toContain(`href="/projects/${ID}/orders.csv"`);
  });
});
