// Every input spec, so sweeps and the contributor guide can reach them all from one place.
import type { Spec } from './field';
import { paSpec } from './pa';
import { lpfSpec } from './lpf';
import { relaySpec } from './relay';
import { loadSpec, stageSpec } from './stage';
import { mainsSpec, newProjectSpec, settingsSpec } from './settings';
import { rfSettingsSpec } from './rf-settings';
import { addRailSpec, enclosureSpec, primaryFuseSpec, transformerSpec, windingSpec } from './supply';
import { batterySpec, rectifiedSpec, regulatedSpec } from './supply-rails';
import { supplyChoicesSpec } from './supply-choices';
import { offerSpec, partSpec, supplierSpec } from './parts';
import { bomLineSpec } from './parts-list';
import { costingSpec } from './costing';
import { coreSpec } from './cores';

export * from './field';
export { validate, formValues, parseForm, defaults, pick, readField } from './derive';
export { paSpec, lpfSpec, relaySpec, stageSpec, loadSpec };
export { settingsSpec, mainsSpec, newProjectSpec, rfSettingsSpec };
export {
  transformerSpec,
  windingSpec,
  primaryFuseSpec,
  enclosureSpec,
  addRailSpec,
  rectifiedSpec,
  regulatedSpec,
  batterySpec,
};
export { supplyChoicesSpec };
export { partSpec, offerSpec, supplierSpec, bomLineSpec, costingSpec, coreSpec };

export const ALL_SPECS: Spec[] = [stageSpec, loadSpec, paSpec, lpfSpec, relaySpec,
  settingsSpec, rfSettingsSpec,
  transformerSpec, windingSpec, primaryFuseSpec, enclosureSpec, addRailSpec, rectifiedSpec, regulatedSpec, batterySpec,
  supplyChoicesSpec,
  partSpec, offerSpec, supplierSpec, bomLineSpec, costingSpec, coreSpec];
