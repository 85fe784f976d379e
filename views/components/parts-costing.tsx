// Costing settings (attrition, spares, exchange rates) and the supplier list with shipping charges.
import type { FC } from 'hono/jsx';
import type { Project, Supplier } from '../../src/core/model';
import { costingSpec, formValues, supplierSpec } from '../../src/core/spec';
import { FormErrors, type FieldState } from './fields';
import { SpecField } from './spec-fields';
import { stateFor, type Failed } from './failed';
import { Version, hx } from './supply-transformer';
import { exchangeRateHint } from '../../src/core/cost/rate-text';

// Form text of stored values, from the specs (src/core/spec/costing.ts, parts.ts).
export const costingValues = (p: Project): Record<string, string> => formValues(costingSpec, p.costing);

export function supplierValues(s: Supplier | null, currency: string): Record<string, string> {
  return s
    ? { ...formValues(supplierSpec, s), was: s.name }
    : { ...formValues(supplierSpec, { shippingCents: 0 }), currency };
}

const SupplierFields: FC<{ state: FieldState; idp: string }> = ({ state, idp }) => (
  <>
    <SpecField spec={supplierSpec} k="name" idp={idp} state={state} size={24} label="Supplier" />
    <SpecField spec={supplierSpec} k="shippingCents" idp={idp} state={state} size={7} hint="" />
    <SpecField spec={supplierSpec} k="currency" idp={idp} state={state} size={4} hint="" />
  </>
);

export const CostingCard: FC<{ project: Project; failed?: Failed }> = ({ project, failed }) => {
  const state = stateFor('costing', failed, () => costingValues(project));
  return (
    <section class="card">
      <h2>Quantities and currencies</h2>
      <form {...hx(`/projects/${project.id}/costing`, '#parts')} aria-label="Costing settings">
        <Version version={project.version} />
        <FormErrors state={state} />
        <div class="row">
          <SpecField spec={costingSpec} k="attritionFraction" idp="cs" state={state} size={5} />
          <SpecField spec={costingSpec} k="sparesPerLine" idp="cs" state={state} size={5} />
          <SpecField
            spec={costingSpec}
            k="exchangeRates"
            idp="cs"
            state={state}
            rows={3}
            size={18}
            label={`Exchange rates into ${project.currency}`}
            hint={exchangeRateHint(project.currency)}
          />
          <button type="submit">Save</button>
        </div>
        <p class="hint">
          Project currency {project.currency} and the number of kits ({project.kits}) are set on the{' '}
          <a href={`/projects/${project.id}`}>Stages &amp; budget</a> page.
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
      {project.costing.suppliers.length ? null : (
        <p class="hint">No suppliers yet. Offers name their supplier; add it here with its shipping charge.</p>
      )}
      {project.costing.suppliers.map((s, i) => {
        const state = stateFor(`supplier-${i}`, failed, () => supplierValues(s, project.currency));
        const base = `/projects/${project.id}/suppliers/${i}`;
        return (
          <form {...hx(base, '#parts')} class="item-row" aria-label={`Supplier ${s.name}`}>
            <Version version={project.version} />
            <input type="hidden" name="was" value={s.name} />
            <FormErrors state={state} />
            <div class="row">
              <SupplierFields idp={`s${i}`} state={state} />
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
          <SupplierFields idp="as" state={addState} />
          <button type="submit">Add supplier</button>
        </div>
      </form>
      <p class="hint">Renaming a supplier renames it in the offers too.</p>
    </section>
  );
};
