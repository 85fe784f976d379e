// The organiser's order sheets on the parts-list page: one table per supplier of the plan (SKU, order quantity, the
// need, the price break reached, unit and line totals), then its parts, shipping and order total. Read from the
// cost report through orderSheets(), the same sheets the CSV and the pack print.
import type { FC } from 'hono/jsx';
import { formatMoney, type CostReport } from '../../src/core/cost';
import { orderSheets } from '../../src/core/cost/order-sheet';

export const OrderSheets: FC<{ report: CostReport; csvHref: string }> = ({ report, csvHref }) => {
  const sheets = orderSheets(report);
  if (!sheets.length) return null;
  const money = (c: number) => formatMoney(c, report.currency);
  return (
    <details class="card order-sheets" id="order-sheets">
      <summary>
        <strong>Order sheets per supplier</strong> ({sheets.length}): what to type into each supplier’s order form
      </summary>
      <p class="hint">
        The same sheets as the <a href={csvHref}>orders CSV</a> and the organiser’s pack. Amounts
        in {report.currency};
        the unit price and offer line in the supplier’s currency.
      </p>
      {sheets.map((s) => (
        <table class="grid cost order-sheet" data-supplier={s.supplier}>
          <caption>{s.supplier}</caption>
          <thead>
            <tr>
              <th>SKU</th>
              <th>Part</th>
              <th class="num">Order</th>
              <th class="num">Needed</th>
              <th class="num">Break from</th>
              <th class="num">Unit price</th>
              <th class="num">Offer line</th>
              <th class="num">Line cost</th>
            </tr>
          </thead>
          <tbody>
            {s.lines.map((l) => (
              <tr class="cost-line" data-line={l.lineId}>
                <td data-label="SKU">{l.sku || '–'}</td>
                <td data-label="Part">
                  {l.description}
                  {l.refs ? ` (${l.refs})` : ''}
                </td>
                <td class="num" data-label="Order">{l.qty}</td>
                <td class="num" data-label="Needed">{l.neededQty}</td>
                <td class="num" data-label="Break from">{l.breakMinQty ?? '–'}</td>
                <td class="num" data-label="Unit price">{formatMoney(l.unitPriceCents, l.offerCurrency)}</td>
                <td class="num" data-label="Offer line">{formatMoney(l.offerCostCents, l.offerCurrency)}</td>
                <td class="num" data-label="Line cost">{money(l.lineCostCents)}</td>
              </tr>
            ))}
          </tbody>
          <tfoot>
            <tr>
              <td colspan={7}>Parts</td>
              <td class="num">{money(s.partsCents)}</td>
            </tr>
            <tr>
              <td colspan={7}>Shipping</td>
              <td class="num">{money(s.shippingCents)}</td>
            </tr>
            <tr data-total="order">
              <th colspan={7} scope="row">Order total {s.supplier}</th>
              <td class="num">
                <strong>{money(s.totalCents)}</strong>
              </td>
            </tr>
          </tfoot>
        </table>
      ))}
    </details>
  );
};
