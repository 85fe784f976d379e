// A save into an item deleted in another tab or window: say so, and show what the user typed so nothing is lost.
import type { FC } from 'hono/jsx';
import { Layout, type Section } from '../layout';

interface Props {
  message: string;
  values: Record<string, string>;
  /** the page to go back to */
  back: string;
  /** the id of the element an htmx swap replaces, so the page keeps its shape */
  id?: string;
}

export const KeptEntries: FC<Props> = ({ message, values, back, id }) => {
  const entries = Object.entries(values).filter(([k, v]) => k !== 'version' && v.trim() !== '');
  return (
    <section class="card" id={id}>
      <div class="form-errors" role="alert">
        <p>{message}</p>
      </div>
      {entries.length ? (
        <>
          <p>What you typed (copy what you still need):</p>
          <dl class="kept-entries">
            {entries.map(([k, v]) => (
              <>
                <dt>{k}</dt>
                <dd>
                  <textarea readonly rows={Math.min(8, v.split('\n').length)} cols={60} aria-label={k}>
                    {v}
                  </textarea>
                </dd>
              </>
            ))}
          </dl>
        </>
      ) : null}
      <p>
        <a href={back}>← Back to the page as stored now</a>
      </p>
    </section>
  );
};

export const KeptEntriesPage: FC<Props & { project: { id: string; name: string }; section?: Section }> = ({
  project,
  section,
  ...props
}) => (
  <Layout title="Not saved" project={project} section={section}>
    <KeptEntries {...props} />
  </Layout>
);
