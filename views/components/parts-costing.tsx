// Costing settings (attrition, spares, exchange rates) and the supplier list with shipping charges.
import type { FC } from 'hono/jsx';
import type { Project, Supplier } from '../../src/core/model';
import { FormErrors, Field, TextArea } from './fields';
import { stateFor, type Failed } from './failed';
import { Version, hx, pctText } from './supply-transformer';
import { centsText } from './parts-part';

export const ratesText = (r: Record<string, number>) =>
  Object.entries(r)
    .map(([k, v]) => `${k} = ${v}`)
    .join('\n');

export function costingValues(p: Project): Record<string, string> {
  return { attrition: pctText(p.costing.attritionFraction), spares: String(p.costing.sparesPerLine), rates: ratesText(p.costing.exchangeRates) };
}

export function supplierValues(s: Supplier | null, currency: string): Record<string, string> {
  return s ? { name: s.name, shipping: centsText(s.shippingCents), currency: s.currency, was: s.name } : { name: '', shipping: '0.00', currency };
}

export const CostingCard: FC<{ project: Project; failed?: Failed }> = ({ project, failed }) => {
  const state = stateFor('costing', failed, () => costingValues(project));
  return (
    <section class="card">
      <h2>Quantities and currencies</h2>
      <form {...hx(`/projects/${project.id}/costing`, '#parts')} aria-label="Costing settings">
        <Version version={project.version} />
        <FormErrors state={state} />
        <div class="row">
          <Field idp="cs" name="attrition" label="Attrition allowance" unit="%" state={state} size={5} hint="extra for losses and mistakes" />
          <Field idp="cs" name="spares" label="Spares per line" state={state} size={5} hint="whole pieces added to each line" />
          <TextArea idp="cs" name="rates" label={`Exchange rates (${project.currency} per 1 unit)`} state={state} rows={3} cols={18} hint="one per line, e.g. EUR = 1.08" />
          <button type="submit">Save</button>
        </div>
        <p class="hint">
          Project currency {project.currency} and the number of kits ({project.kits}) are set on the <a href={`/projects/${project.id}`}>Stages &amp; budget</a> page.
        </p>
      </form>
    </section>
  );
};

export const SuppliersCard: FC<{ project: Project; failed?: Failed }> = ({ project, failed }) => {
  const addState = stateFor('add-supplier', failed, () => supplierValues(null, project.currency));
  return (
    <section class="card">
      <h2>Suppliers and shipping</h2>
      {project.costing.suppliers.length ? null : <p class="hint">No suppliers yet. Offers name their supplier; add it here with its shipping charge.</p>}
      {project.costing.suppliers.map((s, i) => {
        const state = stateFor(`supplier-${i}`, failed, () => supplierValues(s, project.currency));
        const base = `/projects/${project.id}/suppliers/${i}`;
        return (
          <form {...hx(base, '#parts')} class="item-row" aria-label={`Supplier ${s.name}`}>
            <Version version={project.version} />
            <input type="hidden" name="was" value={s.name} />
            <FormErrors state={state} />
            <div class="row">
              <Field idp={`s${i}`} name="name" label="Supplier" state={state} size={24} />
              <Field idp={`s${i}`} name="shipping" label="Shipping per order" state={state} size={7} />
              <Field idp={`s${i}`} name="currency" label="Currency" state={state} size={4} />
              <button type="submit">Save</button>
              <a class="danger" href={`${base}/delete`}>
                Delete…
              </a>
            </div>
          </form>
        );
      })}
      <form {...hx(`/projects/${project.id}/suppliers`, '#parts')} class="item-row add" aria-label="Add a supplier">
        <Version version={project.version} />
        <FormErrors state={addState} />
        <div class="row">
          <span class="row-label">Add a supplier:</span>
          <Field idp="as" name="name" label="Supplier" state={addState} size={24} />
          <Field idp="as" name="shipping" label="Shipping per order" state={addState} size={7} />
          <Field idp="as" name="currency" label="Currency" state={addState} size={4} />
          <button type="submit">Add supplier</button>
        </div>
      </form>
      <p class="hint">Renaming a supplier renames it in the offers too.</p>
    </section>
  );
};
