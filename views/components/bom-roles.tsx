// The parts the design needs (design roles): each with its requirement, the line bound to it and its state, and the
// catalog parts that meet it ranked by cost at the group quantity, each with a button that binds it.
import type { FC } from 'hono/jsx';
import type { Project } from '../../src/core/model';
import type { RoleStatus } from '../../src/core/roles';
import { candidatesFor } from '../../src/core/roles';
import { formatMoney, type CostReport } from '../../src/core/cost';
import { Version, hx } from './supply-transformer';
import type { Failed } from './failed';
import { ratingsReadable } from '../../src/core/spec/ratings-readable';

const STATE_TEXT: Record<RoleStatus['state'], string> = {
  ok: 'meets the design',
  caution: 'check (why below)',
  fail: 'does not meet the design',
  unbound: 'no line bound',
};

/** How many candidates are listed per role (cheapest first). */
const SHOWN = 3;

/** A candidate's ratings in names and units ("Capacitance 4700 µF; rated voltage 35 V"), '' when it states none. */
const ratingsOf = (project: Project, partId: string): string => {
  const part = project.parts.find((p) => p.id === partId);
  return part ? ratingsReadable(part.ratings) : '';
};

export const BomRoles: FC<{ project: Project; statuses: RoleStatus[]; failed?: Failed; report?: CostReport }> = ({
  project,
  statuses,
  failed,
  report,
}) => {
  if (!statuses.length) return null;
  const refused = failed?.form === 'bind-role' ? Object.values(failed.state.errors) : [];
  const base = `/projects/${project.id}/bom`;
  const parts = new Map(project.parts.map((p) => [p.id, p]));
  // the supplier the cost plan chose for each line: a candidate from a supplier used for another line adds no shipping
  const planSuppliers = report
    ? new Map(report.lines.map((l): [string, string | null] => [l.lineId, l.supplier]))
    : undefined;
  const money = (c: number) => formatMoney(c, project.currency);
  return (
    <section class="card" id="design-roles">
      <h2>Parts the design needs</h2>
      {refused.length ? (
        <div class="form-errors" role="alert">
          <p>Nothing was bound: {refused.join('; ')}</p>
        </div>
      ) : null}
      <p class="hint">
        Each part of the design with what it must be rated for. Bind a line to it (the “Design role” box of the
        line) or
        use a candidate: catalog parts meeting every rating, cheapest first at the quantity the build needs (price
        breaks, minimum orders and multiples included).
        {planSuppliers
          ? ' Shipping counts in the ranking: a supplier the plan already uses for another line adds nothing (its ' +
            'shipping is paid anyway); a supplier not otherwise used adds its full shipping charge.'
          : ''}
      </p>
      <ul class="role-list">
        {statuses.map((s) => {
          const lines = project.bom.filter((l) => s.lineIds.includes(l.id));
          // a grouped role (one line per value): the cheapest candidate of each value, else the cheapest few
          const all = candidatesFor(project, s.role, planSuppliers);
          const candidates = all.some((c) => c.group !== null)
            ? all.filter((c, i) => all.findIndex((x) => x.group === c.group) === i)
            : all.slice(0, SHOWN);
          return (
            <li class={`role role-${s.state}`} data-role={s.role.id} data-state={s.state}>
              <strong>{s.role.label}</strong>: <span class="role-state">{STATE_TEXT[s.state]}</span>
              <br />
              <span class="role-requirement">Needs {s.role.requirement}</span>
              {lines.length ? (
                <>
                  <br />
                  Bound:{' '}
                  {lines
                    .map((l) => `${l.refs ? `${l.refs} ` : ''}${parts.get(l.partId)?.description ?? l.partId}`)
                    .join('; ')}
                </>
              ) : null}
              {s.state !== 'ok' && s.state !== 'unbound' && s.problems?.length ? (
                <ul class="role-problems">
                  {s.problems.map((m) => (
                    <li>
                      <strong>Why:</strong> {m}
                    </li>
                  ))}
                </ul>
              ) : null}
              {candidates.length ? (
                <ul class="role-candidates">
                  {candidates.map((c) => (
                    <li data-candidate={c.partId} data-total={c.totalCents ?? ''}>
                      {c.group ? <strong>{c.group}: </strong> : null}
                      {c.description}
                      {ratingsOf(project, c.partId) ? <span class="sub"> ({ratingsOf(project, c.partId)})</span> : null}
                      : {c.costCents === null ? 'no price' : `${money(c.costCents)} for ${c.neededQty}`}
                      {c.orderQty !== null && c.orderQty !== c.neededQty ? ` (buying ${c.orderQty})` : ''}
                      {c.supplier ? ` from ${c.supplier}` : ''}
                      {c.shippingCents
                        ? ` + ${money(c.shippingCents)} shipping (supplier not otherwise used) = ` +
                          `${money(c.totalCents ?? 0)}`
                        : ''}
                      {c.shippingNote ? ` (${c.shippingNote})` : ''}{' '}
                      {c.bound ? (
                        <em>(bound)</em>
                      ) : (
                        <form {...hx(`${base}/roles/bind`, '#bom')} class="inline">
                          <Version version={project.version} />
                          <input type="hidden" name="roleId" value={s.role.id} />
                          <input type="hidden" name="partId" value={c.partId} />
                          <button type="submit" aria-label={`Use ${c.description} for ${s.role.label}`}>
                            Use
                          </button>
                        </form>
                      )}
                    </li>
                  ))}
                </ul>
              ) : (
                <>
                  <br />
                  <em>No catalog part meets every rating: add one on the parts catalog page (with its ratings).</em>
                </>
              )}
            </li>
          );
        })}
      </ul>
    </section>
  );
};
