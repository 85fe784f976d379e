// One rail on the supply page: a collapsible card whose form fits the rail's kind. Fields come from the rail specs.
import type { Child, FC } from 'hono/jsx';
import type { Project, Rail } from '../../src/core/model';
import { formatValue } from '../../src/core/units';
import { formValues } from '../../src/core/spec/derive';
import { RAIL_SPECS, batterySpec, rectifiedSpec, regulatedSpec } from '../../src/core/spec/supply-rails';
import { FormErrors, type FieldState } from './fields';
import { SpecField } from './spec-fields';
import { stateFor, type Failed } from './failed';
import { Version, hx } from './supply-transformer';

const KIND_LABEL = { rectified: 'Rectified', regulated: 'Regulated', battery: 'Battery' } as const;

/** The form text of a stored rail. */
export const railValues = (r: Rail): Record<string, string> => formValues(RAIL_SPECS[r.kind], r);

/** A regulator kind in words: the stored key, with the low-dropout one spelled out (not a bare "ldo"). */
export function regulatorWords(kind: string): string {
  return kind === 'ldo' ? 'low-dropout (LDO)' : kind;
}

/** One line under the rail name, so a closed card still says what the rail is. */
function summary(p: Project, r: Rail): string {
  if (r.kind === 'rectified') {
    const w = p.supply.transformers.flatMap((t) => t.windings).find((x) => x.id === r.windingId);
    return `${r.topology} from ` +
      `${w ? `${w.name} (${formatValue(w.ratedVrms, 'V')} rms)` : 'a missing winding'}` +
      `, ${formatValue(r.reservoirF, 'F')} reservoir${needs(r.minimumV)}`;
  }
  if (r.kind === 'regulated') {
    const parent = p.supply.rails.find((x) => x.id === r.parentId);
    return `${regulatorWords(r.regulator)} regulator (${r.setting.method}) fed from ` +
      `${parent ? parent.name : 'a missing rail'}`;
  }
  return `${r.chemistry} ${formatValue(r.nominalV, 'V')}, ${formatValue(r.capacityAh, 'Ah')}${needs(r.minimumV)}`;
}

const needs = (v: number | null | undefined) =>
  typeof v === 'number' ? `; its loads need ${formatValue(v, 'V')} or more` : '';

type FormProps = { project: Project; rail: Rail; state: FieldState; idp: string };

const RectifiedFields: FC<FormProps> = ({ project, state, idp }) => {
  const windings = project.supply.transformers.flatMap((t) =>
    t.windings.map((w): [string, string] => [w.id, `${t.name} · ${w.name}`]),
  );
  const f = (k: string, size = 6, hint?: string) => (
    <SpecField spec={rectifiedSpec} k={k} state={state} idp={idp} size={size} hint={hint} />
  );
  return (
    <>
      <div class="row">
        <SpecField spec={rectifiedSpec} k="windingId" state={state} idp={idp} options={windings} />
        {f('topology')}
        {f('diodeDropV')}
        {f('diodeResistanceOhm')}
      </div>
      <div class="row">
        {f('reservoirF', 8)}
        {f('esrOhm')}
        {f('capacitorRatedV')}
        {f('capacitorRippleA')}
        {f('bleederOhm', 7)}
        {f('bleederRatedW', 5)}
      </div>
      <div class="row">
        {f('ripplePpTargetV')}
        {f('marginV')}
        {f('fuseA')}
        {f('minimumV', 6)}
      </div>
      <div class="row">
        {f('windingFuseA')}
        {f('windingFuseSheet')}
      </div>
      <div class="row">
        {f('bridgeMount.thetaJcKPerW', 5)}
        {f('bridgeMount.thetaCsKPerW', 5)}
        {f('bridgeMount.thetaSaKPerW', 5)}
        {f('bridgeMount.tjMaxC', 5)}
        {f('bridgeFreeAirKPerW', 5)}
        <span class="hint">
          The rectifier's datasheet values; leave them empty for an assumed 4-8 A bridge with no heatsink.
        </span>
      </div>
    </>
  );
};

/** A field shown only for some output-setting methods (the page's CSS hides the others). */
const ForMethods: FC<{ methods: string; children?: Child }> = ({ methods, children }) => (
  <div class={`m ${methods.split(' ').map((x) => `m-${x}`).join(' ')}`}>{children}</div>
);

const RegulatedFields: FC<FormProps & { parents: [string, string][] }> = ({ state, idp, parents }) => {
  const f = (k: string, size = 6) => <SpecField spec={regulatedSpec} k={k} state={state} idp={idp} size={size} />;
  return (
    <>
      <div class="row">
        <SpecField spec={regulatedSpec} k="parentId" state={state} idp={idp} options={parents} />
        {f('regulator')}
        {f('setting.method')}
      </div>
      <div class="row method-fields">
        <ForMethods methods="fixed raised-diodes raised-resistor">{f('setting.nominalV')}</ForMethods>
        <ForMethods methods="adjustable">{f('setting.vrefV')}</ForMethods>
        <ForMethods methods="adjustable">{f('setting.adjustA')}</ForMethods>
        <ForMethods methods="adjustable raised-resistor">{f('setting.r1Ohm', 7)}</ForMethods>
        <ForMethods methods="adjustable raised-resistor">{f('setting.r2Ohm', 7)}</ForMethods>
        <ForMethods methods="raised-diodes">{f('setting.diodes', 4)}</ForMethods>
        <ForMethods methods="raised-diodes">{f('setting.diodeDropV')}</ForMethods>
      </div>
      <div class="row">
        {f('dropoutV')}
        {f('quiescentA', 7)}
        {f('efficiency', 5)}
        {f('maxOutputA')}
        {f('maxInputV')}
      </div>
      <div class="row">
        {f('rippleRejectionDb', 5)}
        {f('rippleTargetV', 6)}
      </div>
      <div class="row">
        {f('outputF', 7)}
        {f('bleederOhm', 7)}
        {f('bleederRatedW', 5)}
      </div>
      <div class="row">
        {f('mount.thetaJcKPerW', 5)}
        {f('mount.thetaCsKPerW', 5)}
        {f('mount.thetaSaKPerW', 5)}
        {f('mount.tjMaxC', 5)}
        <span class="hint">Leave all four heatsink fields empty if there is no heatsink data.</span>
      </div>
    </>
  );
};

const BatteryFields: FC<FormProps> = ({ state, idp }) => {
  const f = (k: string, size = 6) => <SpecField spec={batterySpec} k={k} state={state} idp={idp} size={size} />;
  return (
    <>
      <div class="row">
        {f('chemistry', 10)}
        {f('nominalV')}
        {f('fullV')}
        {f('endV')}
      </div>
      <div class="row">
        {f('capacityAh')}
        {f('usableFraction', 4)}
        {f('internalOhm')}
        {f('minimumV')}
      </div>
    </>
  );
};

export const RailCard: FC<{
  project: Project;
  rail: Rail;
  failed?: Failed;
  parents: [string, string][];
  open?: boolean;
}> = ({ project, rail, failed, parents, open }) => {
  const base = `/projects/${project.id}/supply/rails/${rail.id}`;
  const state = stateFor(`rail-${rail.id}`, failed, () => railValues(rail));
  const hasErrors = Object.keys(state.errors).length > 0;
  const idp = `r-${rail.id}`;
  return (
    <details class="card supply-item rail" id={`rail-${rail.id}`} open={hasErrors || open}>
      <summary>
        <strong>{rail.name}</strong> <span class="kind">{KIND_LABEL[rail.kind]}</span>{' '}
        <span class="summary-line">{summary(project, rail)}</span>
      </summary>
      <form {...hx(base)} class={`rail-form kind-${rail.kind}`} aria-label={`Rail ${rail.name}`}>
        <Version version={project.version} />
        <FormErrors state={state} />
        <div class="row">
          <SpecField spec={RAIL_SPECS[rail.kind]} k="name" state={state} idp={idp} size={32} />
        </div>
        {rail.kind === 'rectified' ? <RectifiedFields project={project} rail={rail} state={state} idp={idp} /> : null}
        {rail.kind === 'regulated' ? (
          <RegulatedFields project={project} rail={rail} state={state} idp={idp} parents={parents} />
        ) : null}
        {rail.kind === 'battery' ? <BatteryFields project={project} rail={rail} state={state} idp={idp} /> : null}
        <div class="row">
          <button type="submit">Save rail</button>
          <a class="danger" href={`${base}/delete`}>
            Delete rail…
          </a>
        </div>
      </form>
    </details>
  );
};
