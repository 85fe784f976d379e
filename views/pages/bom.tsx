// Parts list & cost page: the line editor, the costing below it, CSV export and import; the body (#bom) is
// both the page content and the htmx partial. The import form is a plain form (file upload, own preview page).
import { PageMessages } from '../components/messages';
import type { FC } from 'hono/jsx';
import type { Project } from '../../src/core/model';
import type { CostReport } from '../../src/core/cost';
import type { Failed } from '../components/failed';
import { BomLines } from '../components/bom-lines';
import { BomRoles } from '../components/bom-roles';
import type { RoleStatus } from '../../src/core/roles';
import { ImportForm } from '../components/bom-import';
import { CostResults } from '../partials/cost-results';
import { OrderSheets } from '../components/order-sheets';

export interface BomBodyProps {
  project: Project;
  report: CostReport;
  /** the design's roles and their bound lines (absent: not shown) */
  roles?: RoleStatus[];
  failed?: Failed;
  notice?: string;
}

export const BomBody: FC<BomBodyProps> = ({ project, report, roles = [], failed, notice }) => {
  const csv = `/projects/${project.id}/bom.csv`;
  return (
    <div id="bom">
      <PageMessages notice={notice} failed={failed} />
      <BomLines
        project={project}
        failed={failed}
        roles={roles.map((s): [string, string] => [s.role.id, s.role.label])}
      />
      <BomRoles project={project} statuses={roles} failed={failed} report={report} />
      <p class="bom-export">
        Export the costed parts list: <a href={csv}>CSV (comma separated)</a> ·{' '}
        <a href={`${csv}?sep=semicolon`}>CSV (semicolon, decimal comma)</a>
        <br />
        Order sheets per supplier (SKU, quantity, price break, line totals, shipping):{' '}
        <a href={`/projects/${project.id}/orders.csv`}>CSV</a> ·{' '}
        <a href={`/projects/${project.id}/orders.csv?sep=semicolon`}>CSV (semicolon)</a>
      </p>
      <CostResults report={report} currency={project.currency} />
      <OrderSheets report={report} csvHref={`/projects/${project.id}/orders.csv`} />
      <ImportForm project={project} error={failed?.form === 'import' ? failed.state.errors._form : undefined} />
    </div>
  );
};
