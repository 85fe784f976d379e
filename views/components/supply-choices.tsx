// The supply-wide choices form: the primary fuse's type (IEC 60127-2 sheet) and what the transformer is sized for.
import type { FC } from 'hono/jsx';
import type { Project } from '../../src/core/model';
import { supplyChoicesSpec } from '../../src/core/spec/supply-choices';
import { FormErrors, type FieldState } from './fields';
import { SpecField } from './spec-fields';
import { Version, hx } from './supply-transformer';

export const SupplyChoicesForm: FC<{ project: Project; state: FieldState }> = ({ project, state }) => (
  <form {...hx(`/projects/${project.id}/supply/choices`)} class="card" aria-label="Supply choices">
    <Version version={project.version} />
    <FormErrors state={state} />
    <div class="row">
      <SpecField spec={supplyChoicesSpec} k="primaryFuseSheet" state={state} idp="sc" />
      <SpecField spec={supplyChoicesSpec} k="transformerSizing" state={state} idp="sc" />
      <button type="submit">Save choices</button>
    </div>
  </form>
);
