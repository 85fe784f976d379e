// Parts-list line editor: one form per line laid out as a grid row, and an add-line form.
import { categoryOf } from '../../src/core/spec/parts-categories';
import type { FC } from 'hono/jsx';
import type { BomLine, Project } from '../../src/core/model';
import { bomLineSpec, defaults, formValues } from '../../src/core/spec';
import { type FieldState } from './fields';
import { SpecField } from './spec-fields';
import { stateFor, type Failed } from './failed';
import { Version, hx } from './supply-transformer';
import { EmptyState } from './empty-state';

/** Form text of a line (a new line starts from the spec's defaults: General, no part chosen, 1 per rig). */
export const lineValues = (l: BomLine | null): Record<string, string> =>
  formValues(bomLineSpec, l ?? defaults(bomLineSpec));

// In the grid the messages go in a full-width box right above the row (the narrow cells would wrap them
// word by word); the refused fields keep their red border and aria-invalid.
const Errors: FC<{ state: FieldState }> = ({ state }) => {
  const fieldMessages = Object.entries(state.errors).filter(([k]) => k !== '_form');
  if (!state.errors._form && !fieldMessages.length) return null;
  return (
    <div class="form-errors bom-span" role="alert">
      {state.errors._form ? <p>{state.errors._form}</p> : null}
      {fieldMessages.length ? (
        <p>
          Nothing was saved: {fieldMessages.map(([, m]) => m).join('; ')}. What you typed is kept below.
        </p>
      ) : null}
    </div>
  );
};

/** Design roles offered to bind a line to, as [id, label] (from the evaluation). */
export type RoleOptions = [string, string][];

const LineFields: FC<{ project: Project; state: FieldState; idp: string; roles: RoleOptions }> = ({
  project,
  state,
  idp,
  roles,
}) => {
  const stages: [string, string][] = project.stages.map((s): [string, string] => [s.id, s.name]);
  // the category by its name on the list (an older or the builder's own name as typed)
  const catName = (c: string) =>
    categoryOf(c).id === 'other' && c.trim().toLowerCase() !== 'other' ? c : categoryOf(c).label.toLowerCase();
  const parts: [string, string][] = project.parts.map((p) => [
    p.id,
    `${p.description}${p.category ? ` (${catName(p.category)})` : ''}`,
  ]);
  const partsWithPick: [string, string][] = state.values.partId ? parts : [['', 'Choose a part…'], ...parts];
  // the grid's column heads name the fields: the boxes carry no help lines (they would break the rows)
  return (
    <>
      <SpecField
        spec={bomLineSpec}
        k="stageId"
        idp={idp}
        state={state}
        options={stages}
        none="General (no stage)"
        cls="bom-stage"
      />
      <SpecField spec={bomLineSpec} k="partId" idp={idp} state={state} options={partsWithPick} cls="bom-part" />
      <SpecField spec={bomLineSpec} k="qtyPerRig" idp={idp} state={state} size={4} label="Qty per rig" cls="bom-qty" />
      <SpecField
        spec={bomLineSpec}
        k="refs"
        idp={idp}
        state={state}
        size={10}
        label="Designators"
        hint=""
        cls="bom-refs"
      />
      {/* the role shares the notes cell, so the grid keeps its columns */}
      <span class="bom-notes">
        <SpecField spec={bomLineSpec} k="notes" idp={idp} state={state} size={18} />
        <SpecField spec={bomLineSpec} k="roleId" idp={idp} state={state} options={roles} none="(not bound)" hint="" />
      </span>
    </>
  );
};

export const BomLines: FC<{ project: Project; failed?: Failed; roles?: RoleOptions }> = ({
  project,
  failed,
  roles = [],
}) => {
  const addState = stateFor('add-line', failed, () => lineValues(null));
  const base = `/projects/${project.id}/bom`;
  return (
    <section class="card">
      <h2>Parts list ({project.bom.length} lines)</h2>
      {project.bom.length || !project.parts.length ? null : (
        <EmptyState label="Parts list empty">
          the parts list is empty. Add a line below for each part a rig needs: its stage, the part from the catalog, the
          quantity per rig and the designators (R1, C10–C14); the cost per kit and for the group appears under the
          list.
        </EmptyState>
      )}
      <div class="bom-grid" aria-label="Parts-list lines">
        <div class="bom-head" aria-hidden="true">
          <span>Stage</span>
          <span>Part</span>
          <span>Qty per rig</span>
          <span>Designators</span>
          <span>Notes, design role</span>
          <span />
        </div>
        {project.bom.map((l) => {
          const state = stateFor(`line-${l.id}`, failed, () => lineValues(l));
          return (
            <form
              {...hx(`${base}/lines/${l.id}`, '#bom')}
              class="bom-row"
              id={`line-${l.id}`}
              aria-label={`Line ${l.refs || l.id}`}
            >
              <Version version={project.version} />
              <Errors state={state} />
              <LineFields project={project} state={state} idp={`l-${l.id}`} roles={roles} />
              <span class="bom-actions">
                <button type="submit">Save</button>{' '}
                <a class="danger" href={`${base}/lines/${l.id}/delete`}>
                  Delete…
                </a>
              </span>
            </form>
          );
        })}
        <form {...hx(`${base}/lines`, '#bom')} class="bom-row add" aria-label="Add a line">
          <Version version={project.version} />
          <Errors state={addState} />
          <LineFields project={project} state={addState} idp="al" roles={roles} />
          <span class="bom-actions">
            <button type="submit">Add line</button>
          </span>
        </form>
      </div>
      {project.parts.length ? null : (
        <EmptyState label="Catalog empty">
          the catalog is empty: add parts on the <a href={`/projects/${project.id}/parts`}>Parts catalog</a> page first,
          or import a CSV below; then add a line here for each part a rig needs.
        </EmptyState>
      )}
    </section>
  );
};
