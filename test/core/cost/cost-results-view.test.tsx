// Rendering check for views/partials/cost-results.tsx (kept beside the costing tests it displays).
// The expected amounts are the hand-worked example of cost-project.test.ts (multi-supplier case).
import { describe, expect, it } from 'vitest';
import { costProject } from '../../../src/core/cost/cost-project';
import { CostResults } from '../../../views/partials/cost-results';
import { line, offer, part, project, stage } from './fixture';

describe('CostResults view', () => {
  it('shows groups, subtotals, totals, suppliers, raised order, comparison and flags; escapes text', async () => {
    const flat = (c: number) => [{ minQty: 1, unitPriceCents: c }];
    const r = costProject(
      project({
        stages: [stage('pa', 'final', 'PA')],
        parts: [
          part(
            'p1',
            [
              offer({ id: 'a1', supplier: 'Alpha', breaks: flat(100) }),
              offer({ id: 'b1', supplier: 'Bravo', breaks: flat(300) }),
            ],
            { description: '<script>x</script> 10 kΩ' },
          ),
          part('p2', [
            offer({ id: 'a2', supplier: 'Alpha', breaks: flat(300) }),
            offer({
              id: 'b2',
              supplier: 'Bravo',
              breaks: [{ minQty: 1, unitPriceCents: 100 }, { minQty: 12, unitPriceCents: 50 }],
            }),
          ]),
          part('p3', []),
        ],
        bom: [line('L1', 'p1', 10, { stageId: 'pa' }), line('L2', 'p2', 10), line('L3', 'p3', 1)],
        suppliers: [
          { name: 'Alpha', shippingCents: 500, currency: 'USD' },
          { name: 'Bravo', shippingCents: 500, currency: 'USD' },
        ],
      }),
    );
    const html = String(await (<CostResults report={r} currency="USD" />).toString());
    // Hand-worked (cents): L1 Alpha 10 x 100 = 1000; L2 Bravo plain 10 x 100 = 1000, up to the 12 break
    // 12 x 50 = 600 (saves 400, bought); shipping 500 + 500; build 1000 + 600 + 1000 = 2600 = USD 26.00.
    // One supplier: Alpha 1000 + 3000 + 500 = 4500; Bravo 3000 + 600 + 500 = 4100, 1500 more than 2600.
    expect(html).toContain('<strong>USD 26.00</strong>');
    expect(html).toContain('+2 over the plain 10');
    expect(html).toContain('Build total (1 kit)');
    expect(html).toContain('Subtotal PA');
    expect(html).toContain('Subtotal General');
    expect(html).toContain('saves USD 4.00');
    expect(html).toContain('USD 15.00 more');
    expect(html).toContain('no supplier offer');
    expect(html).toContain('&lt;script&gt;');
    expect(html).not.toContain('<script>x');
    expect(html).not.toMatch(/NaN|undefined/);
  });
});
