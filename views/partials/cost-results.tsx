// Costed parts list: lines grouped by stage with subtotals, totals per kit and build, the chosen
// supplier per line, quantities raised to a price break, the single-supplier comparison and the flags.
// Renders only what costProject computed: no arithmetic here.
import type { FC } from 'hono/jsx';
import { formatMoney } from '../../src/core/cost/money';
import { rateInWords } from '../../src/core/cost/rate-text';
import type { CostLine, CostReport, LineFlag } from '../../src/core/cost/report-types';

const FLAG_LABELS: Record<LineFlag, string> = {
  'unknown-part': 'part missing from the catalog',
  'unknown-stage': 'stage no longer exists',
  'bad-qty': 'quantity not valid',
  'zero-qty': 'nothing needed',
  'no-offer': 'no supplier offer',
  'no-price': 'no usable price',
  'no-rate': 'no exchange rate',
  'too-large': 'cost too large: check the offer',
};

const Flags: FC<{ line: CostLine }> = ({ line }) =>
  line.flags.length ? (
    <span class="cost-flags">
      {line.flags.map((f) => (
        <span class={f === 'zero-qty' ? 'sev sev-ok' : 'sev sev-caution'} title={f}>
          {FLAG_LABELS[f]}
        </span>
      ))}
    </span>
  ) : null;

const LineRow: FC<{ line: CostLine; currency: string }> = ({ line, currency }) => (
  <tr class={line.supplier === null && line.neededQty > 0 ? 'cost-line unpriced' : 'cost-line'} data-line={line.lineId}>
    <td data-label="Refs">{line.refs}</td>
    <td data-label="Part">
      {line.description}
      {line.value ? <span class="sub"> {line.value}</span> : null} <Flags line={line} />
    </td>
    <td class="num" data-label="Per rig">{line.qtyPerRig}</td>
    <td class="num" data-label="Needed">{line.neededQty}</td>
    <td class="num" data-label="Ordered">{line.supplier === null ? '–' : line.orderQty}</td>
    <td data-label="Supplier">
      {line.supplier ?? '–'}
      {line.sku ? <span class="sub">{line.sku}</span> : null}
    </td>
    <td class="num" data-label="Unit price">
      {line.unitPriceCents === null || line.offerCurrency === null
        ? '–'
        : formatMoney(line.unitPriceCents, line.offerCurrency)}
      {line.offerCurrency !== null && line.offerCurrency !== currency && line.exchangeRate !== null ? (
        <span class="sub">at {rateInWords(line.offerCurrency, line.exchangeRate, currency)}</span>
      ) : null}
    </td>
    <td class="num" data-label="Line cost">{formatMoney(line.lineCostCents, currency)}</td>
    <td data-label="Price break">
      {line.breakMinQty !== null ? <span class="sub">from {line.breakMinQty}</span> : null}
      {line.raised ? (
        <span class="suggestion">
          {' '}
          +{line.raised.extraQty} over the plain {line.raised.plainQty}: saves{' '}
          {formatMoney(line.raised.savingCents, currency)}
        </span>
      ) : null}
    </td>
  </tr>
);

export const CostResults: FC<{ report: CostReport; currency: string }> = ({ report, currency }) => {
  const byId = new Map(report.lines.map((l) => [l.lineId, l]));
  const t = report.totals;
  const single = report.singleSupplier;
  const problems = report.findings.filter((f) => f.severity !== 'ok');
  return (
    <section class="card" id="cost-results">
      <h2>Cost</h2>
      <p class="summary-line">
        Build
        of {report.kits} kit{report.kits === 1 ? '' : 's'}: <strong>{formatMoney(t.buildCents, currency)}</strong>{' '}
        (parts {formatMoney(t.partsCents, currency)}, shipping {formatMoney(t.shippingCents, currency)})
        {t.perKitCents !== null ? (
          <>
            {' '}
            · per kit <strong>{formatMoney(t.perKitCents, currency)}</strong>
          </>
        ) : null}
        {t.unpricedLines > 0 ? <span class="sev sev-caution">{t.unpricedLines} line(s) unpriced</span> : null}
      </p>
      <p class="explain">Supplier choice: {report.methodNote}</p>
      <p class="explain single-supplier">
        {single.available ? (
          <>
            Everything from one supplier: cheapest
            is {single.supplier} at {formatMoney(single.totalCents, currency)}{' '}
            (shipping {formatMoney(single.shippingCents, currency)}),{' '}
            {single.extraCents > 0 ? (
              <>{formatMoney(single.extraCents, currency)} more than the plan below.</>
            ) : (
              <>the same as the plan below.</>
            )}
            {single.unpricedLines > 0 ? (
              <span class="sev sev-caution">
                Incomplete: {single.unpricedLines} needed line(s) have no usable price and are left out of both figures.
              </span>
            ) : null}
          </>
        ) : (
          <>One supplier for everything: not possible. {single.reason}</>
        )}
      </p>
      <table class="grid cost">
        <thead>
          <tr>
            <th>Refs</th>
            <th>Part</th>
            <th class="num">Per rig</th>
            <th class="num">Needed</th>
            <th class="num">Ordered</th>
            <th>Supplier</th>
            <th class="num">Unit price</th>
            <th class="num">Line cost</th>
            <th>Price break</th>
          </tr>
        </thead>
        {report.stages.map((s) => (
          <tbody data-stage={s.stageId ?? 'general'}>
            <tr class="stage-head">
              <th colspan={9} scope="rowgroup">
                {s.name}
              </th>
            </tr>
            {s.lineIds.map((id) => {
              const line = byId.get(id);
              return line ? <LineRow line={line} currency={currency} /> : null;
            })}
            <tr class="subtotal">
              <td colspan={7}>Subtotal {s.name}</td>
              <td class="num">
                <strong>{formatMoney(s.partsCents, currency)}</strong>
              </td>
              <td></td>
            </tr>
          </tbody>
        ))}
        <tfoot>
          <tr>
            <th colspan={7} scope="row">Parts</th>
            <td class="num">{formatMoney(t.partsCents, currency)}</td>
            <td></td>
          </tr>
          {report.suppliers.map((s) => (
            <tr>
              <td colspan={7}>
                Shipping {s.supplier} ({s.lineCount} line{s.lineCount === 1 ? '' : 's'}, parts{' '}
                {formatMoney(s.partsCents, currency)})
              </td>
              <td class="num">{formatMoney(s.shippingCents, currency)}</td>
              <td></td>
            </tr>
          ))}
          <tr>
            <th colspan={7} scope="row">Build total ({report.kits} kit{report.kits === 1 ? '' : 's'})</th>
            <td class="num">
              <strong>{formatMoney(t.buildCents, currency)}</strong>
            </td>
            <td></td>
          </tr>
          <tr>
            <th colspan={7} scope="row">Per kit</th>
            <td class="num">{t.perKitCents === null ? '–' : formatMoney(t.perKitCents, currency)}</td>
            <td></td>
          </tr>
        </tfoot>
      </table>
      <h3>By section</h3>
      <table class="grid compact cost-sections">
        <tbody>
          {report.sections.map((s) => (
            <tr>
              <td>{s.label}</td>
              <td class="num">
                {s.lineCount} line{s.lineCount === 1 ? '' : 's'}
              </td>
              <td class="num">{formatMoney(s.partsCents, currency)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {report.raisedSavingsCents > 0 ? (
        <p class="notice">
          Buying up to a price break where that is cheaper saves {formatMoney(report.raisedSavingsCents, currency)} in
          all (see the Price break column; the totals above include it).
        </p>
      ) : null}
      {problems.length ? (
        <ul class="findings">
          {problems.map((f) => (
            <li class={`finding sev-${f.severity}`}>
              <span class={`sev sev-${f.severity}`}>{f.severity}</span> <strong>{f.subject}</strong>: {f.message}
            </li>
          ))}
        </ul>
      ) : null}
      <details class="explain">
        <summary>How the cost is worked out</summary>
        <ul>
          {report.notes.map((n) => (
            <li>{n}</li>
          ))}
        </ul>
      </details>
    </section>
  );
};
