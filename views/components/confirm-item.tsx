// "Delete this?" page for items inside a project (rails, windings, parts, offers, parts-list lines).
// When something still uses the item, the page says what and offers no delete button.
import type { FC } from 'hono/jsx';
import type { Section } from '../layout';
import { Layout } from '../layout';

export interface ConfirmItemProps {
  project: { id: string; name: string; version: number };
  section: Section;
  title: string;
  /** What is deleted, in words ("rail “PA rail”"). */
  what: string;
  action: string;
  back: string;
  /** Things that still use the item; non-empty = refuse. */
  users: string[];
  /** Extra sentence on what else goes with it (e.g. the windings of a transformer). */
  also?: string;
}

export const ConfirmItemPage: FC<ConfirmItemProps> = ({ project, section, title, what, action, back, users, also }) => (
  <Layout title={title} project={project} section={section}>
    <section class="card confirm">
      <h1>{title}</h1>
      {users.length ? (
        <>
          <div class="form-errors" role="alert">
            <p>
              {what.charAt(0).toUpperCase() + what.slice(1)} cannot be deleted while it is in use. Change or delete
              these first:
            </p>
            <ul>
              {users.map((u) => (
                <li>{u}</li>
              ))}
            </ul>
          </div>
          <p>
            <a href={back}>Back</a>
          </p>
        </>
      ) : (
        <>
          <p>
            Delete {what}? {also ?? ''} This cannot be undone.
          </p>
          <form method="post" action={action} class="inline">
            <input type="hidden" name="version" value={String(project.version)} />
            <button type="submit" class="danger">
              Yes, delete
            </button>
          </form>{' '}
          <a href={back}>Cancel</a>
        </>
      )}
    </section>
  </Layout>
);
