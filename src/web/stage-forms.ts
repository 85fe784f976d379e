// Stage page forms, derived from the field specs in src/core/spec: stored values -> form text, form text -> SI.
import type { Stage, PaParams, LpfParams, RelayParams } from '../core/model';
import { formValues, lpfSpec, paSpec, relaySpec, stageSpec } from '../core/spec';
import { specFormSchema } from './forms/spec-schema';

export const stageSchema = specFormSchema<Pick<Stage, 'name' | 'kind' | 'notes' | 'dissipationW'>>(stageSpec);
export const paSchema = specFormSchema<PaParams>(paSpec);
export const lpfSchema = specFormSchema<LpfParams>(lpfSpec);
export const relaySchema = specFormSchema<RelayParams>(relaySpec);

export { stageFormValues as stageValues } from '../core/spec/stage';

export const paValues = (p: PaParams) => formValues(paSpec, p);
export const lpfValues = (p: LpfParams) => formValues(lpfSpec, p);
export const relayValues = (r: RelayParams) => formValues(relaySpec, r);
