// The stage form, derived from the field specs in src/core/spec (the kinds' data forms come from STAGE_DATA).
import type { Stage } from '../core/model';
import { stageSpec } from '../core/spec';
import { specFormSchema } from './forms/spec-schema';

export const stageSchema = specFormSchema<Pick<Stage, 'name' | 'kind' | 'notes' | 'dissipationW'>>(stageSpec);

export { stageFormValues as stageValues } from '../core/spec/stage';
