// Parts catalog page: costing settings, suppliers, and the parts with their supplier offers.
// The body (#parts) is both the page content and the htmx partial.
import type { FC } from 'hono/jsx';
import { PageMessages } from '../components/messages';
import type { Project } from '../../src/core/model';
import { FormErrors } from '../components/fields';
import { stateFor, type Failed } from '../components/failed';
import { Version, hx } from '../components/supply-transformer';
import { PartCard, PartFields, partValues } from '../components/parts-part';
import { CostingCard, SuppliersCard } from '../components/parts-costing';
import { EmptyState } from '../components/empty-state';
import { PART_CATEGORIES } from '../../src/core/spec/parts-categories';
import { CatalogImportForm } from '../components/catalog-import';

export interface PartsBodyProps {
  project: Project;
  failed?: Failed;
  notice?: string;
  /** Part to show opened (just added). */
  openPart?: string;
}

export const PartsBody: FC<PartsBodyProps> = ({ project, failed, notice, openPart }) => {
  const addState = stateFor('add-part', failed, () => partValues(null));
  const uses = (id: string) => project.bom.filter((l) => l.partId === id).length;
  // the category list the design roles read ratings by, then any other names the catalog uses
  const categories = [
    ...new Set([
      ...PART_CATEGORIES.map((c) => c.id),
      ...project.parts
        .map((p) => p.category)
        .filter(Boolean)
        .sort(),
    ]),
  ];
  const suppliers = [
    ...new Set([
      ...project.costing.suppliers.map((s) => s.name),
      ...project.parts.flatMap((p) => p.offers.map((o) => o.supplier)),
    ]),
  ].sort();
  return (
    <div id="parts">
      <PageMessages notice={notice} failed={failed} />
      <datalist id="supplier-names">
        {suppliers.map((s) => (
          <option value={s} />
        ))}
      </datalist>
      <datalist id="part-categories">
        {categories.map((c) => (
          <option value={c} />
        ))}
      </datalist>
      <div class="columns">
        <CostingCard project={project} failed={failed} />
        <SuppliersCard project={project} failed={failed} />
      </div>
      <section>
        <h2>Parts ({project.parts.length})</h2>
        {project.parts.length ? null : (
          <EmptyState label="No parts yet">
            the catalog is empty. Add each part you will buy below (type and ratings, then its supplier offers with
            price breaks), or import a CSV on the <a href={`/projects/${project.id}/bom`}>Parts list</a> page; then put
            the parts on the parts list with a quantity per rig to see the cost.
          </EmptyState>
        )}
        <p class="explain">
          Open a part to change it or its supplier offers. Price breaks are written as quantity: unit price in the
          offer's currency, e.g. <code>1: 0.95, 10: 0.78, 100: 0.52</code>. Describe parts by type and ratings.
        </p>
        <form {...hx(`/projects/${project.id}/parts`, '#parts')} class="card add" aria-label="Add a part">
          <Version version={project.version} />
          <FormErrors state={addState} />
          <div class="row">
            <span class="row-label">Add a part:</span>
            <PartFields state={addState} idp="ap" projectId={project.id} help />
            <button type="submit">Add part</button>
          </div>
        </form>
        <CatalogImportForm
          project={project}
          error={failed?.form === 'catalog-import' ? failed.state.errors._form : undefined}
        />
        {project.parts.map((part) => (
          <PartCard project={project} part={part} failed={failed} uses={uses(part.id)} open={part.id === openPart} />
        ))}
      </section>
    </div>
  );
};
