// Supply page: first every rail's deciding corners (does it hold up?), then the editors for transformers and
// windings, rails (rectified, regulated, battery) and the primary fuse, then the full computed supply results.
// The body is the htmx partial (#supply) and the page content alike.
import type { Child, FC } from 'hono/jsx';
import { PageMessages } from '../components/messages';
import type { Project } from '../../src/core/model';
import { defaults, formValues } from '../../src/core/spec/derive';
import { addRailSpec, enclosureSpec, primaryFuseSpec, transformerSpec } from '../../src/core/spec/supply';
import { FormErrors, type FieldState } from '../components/fields';
import { SpecField } from '../components/spec-fields';
import { stateFor, type Failed } from '../components/failed';
import { TransformerCard, Version, hx } from '../components/supply-transformer';
import { RailCard } from '../components/supply-rail';
import { EmptyState } from '../components/empty-state';
import { SupplyChoicesForm } from '../components/supply-choices';
import { supplyChoices, supplyChoicesSpec } from '../../src/core/spec/supply-choices';

export interface SupplyBodyProps {
  project: Project;
  /** Rail id -> the rails it may be fed from ([id, label] pairs, no loops). */
  parentsFor: (railId: string) => [string, string][];
  /** The computed results, rendered by the supply-results partial (null while not available). */
  results: Child | null;
  /** The deciding corners of every rail, shown first, above the editors (null while not available). */
  glance?: Child | null;
  failed?: Failed;
  notice?: string;
  /** Rail to show opened (just added). */
  openRail?: string;
}

/** The sources a new rail can be fed from (also offered where a stage's load row creates a rail). */
export function sourceOptions(p: Project): [string, string][] {
  const w = p.supply.transformers.flatMap((t) =>
    t.windings.map((x): [string, string] => [`w:${x.id}`, `Rectified from ${t.name} · ${x.name}`]),
  );
  const r = p.supply.rails.map((x): [string, string] => [`r:${x.id}`, `Regulated from ${x.name}`]);
  return [...w, ...r, ['battery', 'Battery (or external DC source)']];
}

const AddTransformer: FC<{ project: Project; state: FieldState }> = ({ project, state }) => (
  <form {...hx(`/projects/${project.id}/supply/transformers`)} class="card add" aria-label="Add a transformer">
    <Version version={project.version} />
    <FormErrors state={state} />
    <div class="row">
      <SpecField spec={transformerSpec} k="name" label="New transformer" state={state} idp="at" size={24} />
      <SpecField spec={transformerSpec} k="construction" state={state} idp="at" />
      <SpecField
        spec={transformerSpec}
        k="secondaryToleranceFraction"
        label="Secondary ±"
        state={state}
        idp="at"
        size={4}
      />
      <button type="submit">Add transformer</button>
    </div>
  </form>
);

const PrimaryFuse: FC<{ project: Project; state: FieldState }> = ({ project, state }) => (
  <form {...hx(`/projects/${project.id}/supply/fuse`)} class="card" aria-label="Primary fuse">
    <Version version={project.version} />
    <FormErrors state={state} />
    <div class="row">
      <SpecField spec={primaryFuseSpec} k="primaryFuseA" state={state} idp="pf" size={6} />
      <button type="submit">Save fuse</button>
    </div>
  </form>
);

const Enclosure: FC<{ project: Project; state: FieldState }> = ({ project, state }) => (
  <form {...hx(`/projects/${project.id}/supply/enclosure`)} class="card" aria-label="Enclosure">
    <Version version={project.version} />
    <FormErrors state={state} />
    <div class="row">
      <SpecField spec={enclosureSpec} k="enclosureAreaM2" state={state} idp="enc" size={7} />
      <SpecField spec={enclosureSpec} k="enclosureUWPerM2K" state={state} idp="enc" size={5} />
      <button type="submit">Save enclosure</button>
    </div>
  </form>
);

export const SupplyBody: FC<SupplyBodyProps> = ({ project, parentsFor, results, glance, failed, notice, openRail }) => {
  const base = `/projects/${project.id}/supply`;
  // new items start with an empty name (the builder names them); the other fields from the specs' defaults
  const addTrafo = stateFor('add-transformer', failed, () => ({
    ...formValues(transformerSpec, defaults(transformerSpec)),
    name: '',
  }));
  const addRail = stateFor('add-rail', failed, () => ({
    name: '',
    source: sourceOptions(project)[0]?.[0] ?? 'battery',
  }));
  const fuse = stateFor('primary-fuse', failed, () => formValues(primaryFuseSpec, project.supply));
  const enclosure = stateFor('enclosure', failed, () => formValues(enclosureSpec, project.supply));
  const choices = stateFor('supply-choices', failed, () =>
    formValues(supplyChoicesSpec, supplyChoices(project.supply)),
  );
  return (
    <div id="supply">
      <PageMessages notice={notice} failed={failed} />
      {project.mains ? (
        <p class="caution-box">
          Mains wiring, charged reservoir capacitors and hot regulators can injure. Fuse the primary, earth the chassis,
          fit bleeders, and follow your local electrical code; these figures are planning aids, not a safety approval.
          Mains voltage and frequency are set on the <a href={`/projects/${project.id}`}>Stages &amp; budget</a> page.
        </p>
      ) : (
        <p class="caution-box">
          This station runs from a battery or external DC (set on the{' '}
          <a href={`/projects/${project.id}`}>Stages &amp; budget</a> page). A battery can deliver a very large fault
          current: fuse the positive lead close to the battery, and charge it only with a charger made for its
          chemistry. These figures are planning aids, not a safety approval.
        </p>
      )}
      {glance ?? null}
      <div class="supply-sections">
        <section>
          <h2>Transformers</h2>
          {project.supply.transformers.map((t) => (
            <TransformerCard project={project} t={t} failed={failed} />
          ))}
          {project.mains ? (
            <>
              {project.supply.transformers.length ? null : (
                <p class="hint">No transformer yet: add the mains transformer, then its secondaries.</p>
              )}
              <AddTransformer project={project} state={addTrafo} />
              <PrimaryFuse project={project} state={fuse} />
              <SupplyChoicesForm project={project} state={choices} />
            </>
          ) : (
            <p class="hint">A battery / DC station needs no mains transformer or primary fuse.</p>
          )}
          <Enclosure project={project} state={enclosure} />
        </section>
        <section>
          <h2>Rails</h2>
          {project.supply.rails.length ? null : (
            <EmptyState label="No rails yet">
              {project.mains
                ? project.supply.transformers.some((t) => t.windings.length)
                  ? 'no rails yet. Add a rail fed from a winding (rectified), then a regulated rail fed from it if a ' +
                    'stage needs a steady voltage. '
                  : 'no rails yet. Add the mains transformer and its secondary windings (left), then a rail fed from ' +
                    'each winding. '
                : 'no rails yet. Add a battery rail (Fed from: Battery), then a regulated rail fed from it if a ' +
                  'stage needs a lower, steady voltage. '}
              Stages on the <a href={`/projects/${project.id}`}>Stages &amp; budget</a> page then draw their current
              from these rails; state each rail's minimum voltage so its headroom can be judged.
            </EmptyState>
          )}
          {project.supply.rails.map((r) => (
            <RailCard project={project} rail={r} failed={failed} parents={parentsFor(r.id)} open={r.id === openRail} />
          ))}
          <form {...hx(`${base}/rails`)} class="card add" aria-label="Add a rail">
            <Version version={project.version} />
            <FormErrors state={addRail} />
            <div class="row">
              <SpecField spec={addRailSpec} k="name" label="New rail" state={addRail} idp="ar" size={22} />
              <SpecField spec={addRailSpec} k="source" state={addRail} idp="ar" options={sourceOptions(project)} />
              <button type="submit">Add rail</button>
            </div>
            <p class="hint">The new rail starts with typical values; open it to enter your parts.</p>
          </form>
        </section>
      </div>
      <section class="supply-results-wrap" aria-label="Computed supply results">
        <h2>Computed supply results</h2>
        {results}
      </section>
    </div>
  );
};
