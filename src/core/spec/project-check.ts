// The whole project checked against the input specs: every stored object where it lives in the project, with the
// same limits as the forms and the project file. A value that fails is a fail finding naming the item and the field;
// it is never replaced by 0 or a default. Used by evaluate() on every load (database rows, imported files).
import type { Project } from '../model';
import type { Finding } from '../findings';
import type { Spec } from './field';
import { validate } from './derive';
import { loadSpec, stageSpec } from './stage';
import { STAGE_DATA } from './stage-data';
import { offerSpec, partSpec, supplierSpec } from './parts';
import { bomLineSpec } from './parts-list';
import { costingSpec } from './costing';
import { coreSpec } from './cores';
import { settingsSpec } from './settings';
import { rfSettingsSpec } from './rf-settings';
import { addRailSpec, enclosureSpec, primaryFuseSpec, transformerSpec, windingSpec } from './supply';
import { batterySpec, rectifiedSpec, regulatedSpec } from './supply-rails';
import { supplyChoices, supplyChoicesSpec } from './supply-choices';

/** One stored object and the words that name it ("Stage 'PA', PA data"). */
export interface Located {
  subject: string;
  value: unknown;
}

/** Where each spec's objects live in a project. Every spec in ALL_SPECS needs an entry (a test checks it). */
export const LOCATIONS: { spec: Spec; at: (p: Project) => Located[] }[] = [
  { spec: stageSpec, at: (p) => p.stages.map((s) => ({ subject: `Stage "${s.name}"`, value: s })) },
  {
    spec: loadSpec,
    at: (p) =>
      p.stages.flatMap((s) => s.loads.map((l, i) => ({ subject: `Stage "${s.name}", load row ${i + 1}`, value: l }))),
  },
  // each kind's data block (PA, filter, relay), wherever a stage holds one
  ...STAGE_DATA.map((d) => ({
    spec: d.spec,
    at: (p: Project) =>
      p.stages.flatMap((s) => (s[d.key] ? [{ subject: `Stage "${s.name}", ${d.what}`, value: s[d.key] }] : [])),
  })),
  { spec: partSpec, at: (p) => p.parts.map((x) => ({ subject: `Part "${x.description}"`, value: x })) },
  {
    spec: offerSpec,
    at: (p) =>
      p.parts.flatMap((x) =>
        x.offers.map((o) => ({ subject: `Part "${x.description}", ${o.supplier} offer`, value: o })),
      ),
  },
  { spec: supplierSpec, at: (p) => p.costing.suppliers.map((s) => ({ subject: `Supplier "${s.name}"`, value: s })) },
  {
    spec: bomLineSpec,
    at: (p) => p.bom.map((l, i) => ({ subject: `Parts-list line ${i + 1}${l.refs ? ` (${l.refs})` : ''}`, value: l })),
  },
  { spec: costingSpec, at: (p) => [{ subject: 'Costing settings', value: p.costing }] },
  { spec: coreSpec, at: (p) => (p.cores ?? []).map((c) => ({ subject: `Core "${c.name}"`, value: c })) },
  { spec: settingsSpec, at: (p) => [{ subject: 'Project settings', value: p }] },
  { spec: rfSettingsSpec, at: (p) => [{ subject: 'RF settings', value: p.rf }] },
  { spec: enclosureSpec, at: (p) => [{ subject: 'Enclosure', value: p.supply }] },
  // absent in older data: read as T3 and duty (the defaults), a stored value outside the choices is refused
  { spec: supplyChoicesSpec, at: (p) => [{ subject: 'Supply choices', value: supplyChoices(p.supply) }] },
  // The supply's objects are checked by the supply design itself (power/supply-inputs.ts, same specs), because a
  // refused transformer, winding or rail must also be left out of the design with everything that depends on it;
  // listing them here too would report each refusal twice. The add-rail form has no stored object.
  ...[transformerSpec, windingSpec, primaryFuseSpec, addRailSpec, rectifiedSpec, regulatedSpec, batterySpec].map(
    (spec) => ({
      spec,
      at: (): Located[] => [],
    }),
  ),
];

/** Fail findings for every stored value outside its field's definition. */
export function checkProjectInputs(p: Project): Finding[] {
  return LOCATIONS.flatMap(({ spec, at }) =>
    at(p).flatMap(({ subject, value }) =>
      validate(spec, value).map((e): Finding => ({
        severity: 'fail',
        rule: 'input.stored',
        subject: `${subject}: ${e.label}`,
        value: null,
        limit: null,
        unit: '',
        source: 'design.input',
        message: `Stored value refused: ${e.message}. Open the item and enter a valid value; nothing is computed ` +
          `from it until then.`,
      })),
    ),
  );
}
