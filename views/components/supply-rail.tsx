// One rail on the supply page: a collapsible card whose form fits the rail's kind.
import type { FC } from 'hono/jsx';
import type { BatteryRail, Project, Rail, RectifiedRail, RegulatedRail } from '../../src/core/model';
import { formatValue } from '../../src/core/units';
import { inputText } from '../../src/core/spec/input-text';
import { FormErrors, type FieldState, Field, Select } from './fields';
import { stateFor, type Failed } from './failed';
import { Version, hx, pctText } from './supply-transformer';

const KIND_LABEL = { rectified: 'Rectified', regulated: 'Regulated', battery: 'Battery' } as const;
const TOPOLOGY: [string, string][] = [['bridge', 'Bridge (4 diodes)'], ['centre-tap', 'Centre-tap (2 diodes)'], ['half-wave', 'Half-wave (1 diode)']];
const REGULATORS: [string, string][] = [['linear', 'Linear (3-terminal)'], ['ldo', 'Low-dropout linear'], ['switching', 'Switching module']];
const METHODS: [string, string][] = [['fixed', 'Fixed output'], ['adjustable', 'Adjustable: Vref, R1, R2'], ['raised-diodes', 'Fixed, raised by diodes'], ['raised-resistor', 'Fixed, raised by R1/R2']];

export function rectifiedValues(r: RectifiedRail): Record<string, string> {
  return {
    name: r.name, windingId: r.windingId, topology: r.topology,
    diodeDrop: inputText(r.diodeDropV, 'V'), diodeR: inputText(r.diodeResistanceOhm, 'Ω'),
    reservoir: inputText(r.reservoirF, 'F'), esr: inputText(r.esrOhm, 'Ω'), bleeder: inputText(r.bleederOhm, 'Ω'),
    capV: inputText(r.capacitorRatedV, 'V'), capRipple: inputText(r.capacitorRippleA, 'A'),
    rippleTarget: inputText(r.ripplePpTargetV, 'V'), margin: inputText(r.marginV, 'V'), fuse: inputText(r.fuseA, 'A'),
  };
}

export function regulatedValues(r: RegulatedRail): Record<string, string> {
  const s = r.setting;
  const v: Record<string, string> = {
    name: r.name, parentId: r.parentId, regulator: r.regulator, method: s.method,
    nominalV: 'nominalV' in s ? inputText(s.nominalV, 'V') : '',
    vref: s.method === 'adjustable' ? inputText(s.vrefV, 'V') : '',
    iadj: s.method === 'adjustable' ? inputText(s.adjustA, 'A') : '',
    r1: 'r1Ohm' in s ? inputText(s.r1Ohm, 'Ω') : '', r2: 'r2Ohm' in s ? inputText(s.r2Ohm, 'Ω') : '',
    diodes: s.method === 'raised-diodes' ? String(s.diodes) : '', raiseDrop: s.method === 'raised-diodes' ? inputText(s.diodeDropV, 'V') : '',
    dropout: inputText(r.dropoutV, 'V'), quiescent: inputText(r.quiescentA, 'A'),
    efficiency: r.efficiency === null ? '' : pctText(r.efficiency),
    maxOut: inputText(r.maxOutputA, 'A'), maxIn: inputText(r.maxInputV, 'V'),
    thetaJc: inputText(r.mount?.thetaJcKPerW, 'K/W'), thetaCs: inputText(r.mount?.thetaCsKPerW, 'K/W'),
    thetaSa: inputText(r.mount?.thetaSaKPerW, 'K/W'), tjMax: inputText(r.mount?.tjMaxC, '°C'),
  };
  return v;
}

export function batteryValues(r: BatteryRail): Record<string, string> {
  return {
    name: r.name, chemistry: r.chemistry, nominalV: inputText(r.nominalV, 'V'), fullV: inputText(r.fullV, 'V'),
    endV: inputText(r.endV, 'V'), capacity: inputText(r.capacityAh, 'Ah'), usable: pctText(r.usableFraction), internal: inputText(r.internalOhm, 'Ω'),
  };
}

export function railValues(r: Rail): Record<string, string> {
  return r.kind === 'rectified' ? rectifiedValues(r) : r.kind === 'regulated' ? regulatedValues(r) : batteryValues(r);
}

/** One line under the rail name, so a closed card still says what the rail is. */
function summary(p: Project, r: Rail): string {
  if (r.kind === 'rectified') {
    const w = p.supply.transformers.flatMap((t) => t.windings).find((x) => x.id === r.windingId);
    return `${r.topology} from ${w ? `${w.name} (${formatValue(w.ratedVrms, 'V')} rms)` : 'a missing winding'}, ${formatValue(r.reservoirF, 'F')} reservoir`;
  }
  if (r.kind === 'regulated') {
    const parent = p.supply.rails.find((x) => x.id === r.parentId);
    return `${r.regulator} regulator (${r.setting.method}) fed from ${parent ? parent.name : 'a missing rail'}`;
  }
  return `${r.chemistry} ${formatValue(r.nominalV, 'V')}, ${formatValue(r.capacityAh, 'Ah')}`;
}

type FormProps = { project: Project; rail: Rail; state: FieldState; idp: string };

const RectifiedFields: FC<FormProps> = ({ project, state, idp }) => {
  const windings = project.supply.transformers.flatMap((t) => t.windings.map((w): [string, string] => [w.id, `${t.name} · ${w.name}`]));
  return (
    <>
      <div class="row">
        <Select idp={idp} name="windingId" label="Winding" state={state} options={windings} />
        <Select idp={idp} name="topology" label="Rectifier" state={state} options={TOPOLOGY} />
        <Field idp={idp} name="diodeDrop" label="Diode drop" unit="V" state={state} size={6} />
        <Field idp={idp} name="diodeR" label="Diode resistance" unit="Ω" state={state} size={6} />
      </div>
      <div class="row">
        <Field idp={idp} name="reservoir" label="Reservoir" unit="F" state={state} size={8} hint="e.g. 4700u" />
        <Field idp={idp} name="esr" label="ESR" unit="Ω" state={state} size={6} />
        <Field idp={idp} name="capV" label="Capacitor rating" unit="V" state={state} size={6} hint="empty = not chosen" />
        <Field idp={idp} name="capRipple" label="Ripple rating" unit="A rms" state={state} size={6} hint="empty = not chosen" />
        <Field idp={idp} name="bleeder" label="Bleeder" unit="Ω" state={state} size={7} hint="empty = none fitted" />
      </div>
      <div class="row">
        <Field idp={idp} name="rippleTarget" label="Ripple target" unit="V p-p" state={state} size={6} hint="empty = none" />
        <Field idp={idp} name="margin" label="Headroom margin" unit="V" state={state} size={6} />
        <Field idp={idp} name="fuse" label="Fitted rail fuse" unit="A" state={state} size={6} hint="empty = recommend one" />
      </div>
    </>
  );
};

const RegulatedFields: FC<FormProps & { parents: [string, string][] }> = ({ state, idp, parents }) => (
  <>
    <div class="row">
      <Select idp={idp} name="parentId" label="Fed from" state={state} options={parents} />
      <Select idp={idp} name="regulator" label="Regulator" state={state} options={REGULATORS} />
      <Select idp={idp} name="method" label="Output setting" state={state} options={METHODS} />
    </div>
    <div class="row method-fields">
      <Field idp={idp} name="nominalV" label="Regulator voltage" unit="V" state={state} size={6} cls="m m-fixed m-raised-diodes m-raised-resistor" />
      <Field idp={idp} name="vref" label="Vref" unit="V" state={state} size={6} cls="m m-adjustable" />
      <Field idp={idp} name="iadj" label="Iadj" unit="A" state={state} size={6} cls="m m-adjustable" hint="empty = 0" />
      <Field idp={idp} name="r1" label="R1 (output to adj)" unit="Ω" state={state} size={7} cls="m m-adjustable m-raised-resistor" />
      <Field idp={idp} name="r2" label="R2 (adj to ground)" unit="Ω" state={state} size={7} cls="m m-adjustable m-raised-resistor" />
      <Field idp={idp} name="diodes" label="Diodes in the ground leg" state={state} size={4} cls="m m-raised-diodes" />
      <Field idp={idp} name="raiseDrop" label="Drop per diode" unit="V" state={state} size={6} cls="m m-raised-diodes" />
    </div>
    <div class="row">
      <Field idp={idp} name="dropout" label="Dropout" unit="V" state={state} size={6} />
      <Field idp={idp} name="quiescent" label="Quiescent" unit="A" state={state} size={7} />
      <Field idp={idp} name="efficiency" label="Efficiency (switching)" unit="%" state={state} size={5} hint="at lowest input" />
      <Field idp={idp} name="maxOut" label="Max output" unit="A" state={state} size={6} hint="empty = unknown" />
      <Field idp={idp} name="maxIn" label="Max input" unit="V" state={state} size={6} hint="empty = unknown" />
    </div>
    <div class="row">
      <Field idp={idp} name="thetaJc" label="θjc" unit="°C/W" state={state} size={5} />
      <Field idp={idp} name="thetaCs" label="θcs" unit="°C/W" state={state} size={5} />
      <Field idp={idp} name="thetaSa" label="Heatsink θsa" unit="°C/W" state={state} size={5} hint="empty = compute needed" />
      <Field idp={idp} name="tjMax" label="Tj max" unit="°C" state={state} size={5} />
      <span class="hint">Leave all four heatsink fields empty if there is no heatsink data.</span>
    </div>
  </>
);

const BatteryFields: FC<FormProps> = ({ state, idp }) => (
  <div class="row">
    <Field idp={idp} name="chemistry" label="Chemistry" state={state} size={10} />
    <Field idp={idp} name="nominalV" label="Nominal" unit="V" state={state} size={6} />
    <Field idp={idp} name="fullV" label="Full" unit="V" state={state} size={6} />
    <Field idp={idp} name="endV" label="End of discharge" unit="V" state={state} size={6} />
    <Field idp={idp} name="capacity" label="Capacity" unit="Ah" state={state} size={6} />
    <Field idp={idp} name="usable" label="Usable" unit="%" state={state} size={4} />
    <Field idp={idp} name="internal" label="Internal resistance" unit="Ω" state={state} size={6} />
  </div>
);

export const RailCard: FC<{ project: Project; rail: Rail; failed?: Failed; parents: [string, string][]; open?: boolean }> = ({ project, rail, failed, parents, open }) => {
  const base = `/projects/${project.id}/supply/rails/${rail.id}`;
  const state = stateFor(`rail-${rail.id}`, failed, () => railValues(rail));
  const hasErrors = Object.keys(state.errors).length > 0;
  const idp = `r-${rail.id}`;
  return (
    <details class="card supply-item rail" id={`rail-${rail.id}`} open={hasErrors || open}>
      <summary>
        <strong>{rail.name}</strong> <span class="kind">{KIND_LABEL[rail.kind]}</span> <span class="summary-line">{summary(project, rail)}</span>
      </summary>
      <form {...hx(base)} class={`rail-form kind-${rail.kind}`} aria-label={`Rail ${rail.name}`}>
        <Version version={project.version} />
        <FormErrors state={state} />
        <div class="row">
          <Field idp={idp} name="name" label="Rail name" state={state} size={32} />
        </div>
        {rail.kind === 'rectified' ? <RectifiedFields project={project} rail={rail} state={state} idp={idp} /> : null}
        {rail.kind === 'regulated' ? <RegulatedFields project={project} rail={rail} state={state} idp={idp} parents={parents} /> : null}
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
