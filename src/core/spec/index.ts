// Every input spec, so sweeps and the contributor guide can reach them all from one place.
import type { Spec } from './field';
import { paSpec } from './pa';
import { lpfSpec } from './lpf';
import { relaySpec } from './relay';
import { loadSpec, stageSpec } from './stage';

export * from './field';
export { validate, formValues, parseForm, defaults, pick, readField } from './derive';
export { paSpec, lpfSpec, relaySpec, stageSpec, loadSpec };

export const ALL_SPECS: Spec[] = [stageSpec, loadSpec, paSpec, lpfSpec, relaySpec];
