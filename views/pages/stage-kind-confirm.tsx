// "Change the kind and drop its data?": asked before a stage save that would drop PA, filter or relay data.
// Both answers are plain forms that carry everything typed on the stage form (works without JavaScript);
// htmx swaps the answer into #stage. Rendered as the fragment; the route wraps it in the layout for a full page.
import type { FC } from 'hono/jsx';
import type { Project, Stage, StageKind } from '../../src/core/model';
import { STAGE_KIND_LABELS } from '../../src/core/model';
import type { DroppedData } from '../../src/core/edits/stage-kind';

interface Props {
  project: Project;
  stage: Stage;
  newKind: StageKind;
  dropped: DroppedData[];
  /** the stage form as typed, version included */
  values: Record<string, string>;
}

const Typed: FC<{ values: Record<string, string> }> = ({ values }) => (
  <>
    {Object.entries(values).map(([name, value]) => (
      <input type="hidden" name={name} value={value} />
    ))}
  </>
);

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
const joinAnd = (words: string[]) =>
  words.length < 2 ? words.join('') : `${words.slice(0, -1).join(', ')} and ${words.at(-1)}`;

export const KindChangeConfirm: FC<Props> = ({ project, stage, newKind, dropped, values }) => {
  const action = `/projects/${project.id}/stages/${stage.id}`;
  const from = STAGE_KIND_LABELS[stage.kind];
  const to = STAGE_KIND_LABELS[newKind];
  return (
    <div id="stage">
      <p>
        <a href={`/projects/${project.id}`}>← All stages and the budget</a>
      </p>
      <section class="card confirm kind-change" aria-labelledby="kind-change-title">
        <h2 id="kind-change-title">Change the kind and drop its data?</h2>
        <p>
          Changing “{stage.name}” from {from} to {to} drops its {joinAnd(dropped.map((d) => d.what))}:
        </p>
        {dropped.map((d) => (
          <>
            {dropped.length > 1 ? <h3>{capital(d.what)}</h3> : null}
            <ul class="dropped">
              {d.items.map((item) => (
                <li>{item}</li>
              ))}
            </ul>
          </>
        ))}
        <p>
          <strong>Nothing has been saved yet.</strong> Your other entries on the stage form (name, notes, heat,
          currents) are kept with either answer.
        </p>
        <div class="answers">
          <form method="post" action={action} hx-post={action} hx-target="#stage" hx-swap="outerHTML">
            <Typed values={{ ...values, kind: newKind, confirmDrop: '1' }} />
            <button type="submit" class="danger">
              Change kind and drop the data
            </button>
            <span class="hint">
              Saves the stage as {to} with your other entries; the data listed above is deleted.
            </span>
          </form>
          <form method="post" action={action} hx-post={action} hx-target="#stage" hx-swap="outerHTML">
            <Typed values={{ ...values, keepKind: '1' }} />
            <button type="submit">Keep the kind</button>
            <span class="hint">
              Back to the stage form as {from}, with your other entries filled in, not yet saved.
            </span>
          </form>
        </div>
      </section>
    </div>
  );
};
