// One path for every project edit: validate -> load -> change under the version check -> re-render.
// A refused edit saves nothing and re-renders the form with what the user typed and why.
import type { Context } from 'hono';
import type { Child } from 'hono/jsx';
import type { z } from 'zod';
import type { Project } from '../core/model';
import { loadProject, updateProject, VersionConflict, NotFound } from '../db/projects';
import { parseForm, versionField, type FieldErrors } from './form';
import { formValues, isHtmx, sendPage, sendPartial } from './render';
import type { Deps } from './deps';
import type { Failed } from '../../views/components/failed';

export type ChangeResult = Project | { errors: FieldErrors };

export interface EditSpec<S extends z.ZodType> {
  form: string | ((c: Context) => string);
  schema: S;
  change: (project: Project, data: z.output<S>, c: Context) => ChangeResult;
  /** where a browser without JavaScript goes after a successful save (Post/Redirect/Get) */
  redirect: (project: Project, c: Context) => string;
  /** the partial htmx swaps in */
  partial: (project: Project, failed?: Failed, notice?: string) => Child | Promise<Child>;
  /** the full page (no-JavaScript path and refused submissions) */
  page: (project: Project, failed?: Failed, notice?: string) => Child | Promise<Child>;
}

export function projectEdit<S extends z.ZodType>(deps: Deps, spec: EditSpec<S>) {
  return async (c: Context) => {
    const id = c.req.param('id')!;
    const values = await formValues(c);
    const formKey = typeof spec.form === 'string' ? spec.form : spec.form(c);
    const current = await loadProject(deps.database.db, id);
    if (!current) return c.notFound();
    const respond = async (project: Project, status: 200 | 409 | 422, failed?: Failed, notice?: string) =>
      isHtmx(c) ? sendPartial(c, await spec.partial(project, failed, notice), status) : sendPage(c, await spec.page(project, failed, notice), status);

    const version = versionField.safeParse(values.version);
    const parsed = parseForm(spec.schema, values);
    if (!parsed.ok) return respond(current, 422, { form: formKey, state: { values, errors: parsed.errors } });
    if (!version.success) return respond(current, 422, { form: formKey, state: { values, errors: { _form: 'The form had no version number; reload the page.' } } });

    // Validate the change against the current project before writing (it may refuse with field messages).
    const trial = spec.change(structuredClone(current), parsed.data, c);
    if ('errors' in trial) return respond(current, 422, { form: formKey, state: { values, errors: trial.errors } });
    try {
      const saved = await updateProject(deps.database, id, version.data, (p) => {
        const r = spec.change(p, parsed.data, c);
        if ('errors' in r) throw new Error('change refused on retry');
        return r;
      }, deps.now().toISOString());
      if (!isHtmx(c)) return c.redirect(withDone(spec.redirect(saved, c), 'saved'), 303);
      return sendPartial(c, await spec.partial(saved, undefined, 'Saved.'));
    } catch (e) {
      if (e instanceof VersionConflict) {
        const fresh = (await loadProject(deps.database.db, id)) ?? current;
        const message =
          'Not saved: this project was changed in another tab or window since you opened this page. The page now shows the stored project; your entries in this form are kept — check them and save again to apply them.';
        return respond(fresh, 409, { form: formKey, state: { values: { ...values, version: String(fresh.version) }, errors: { _form: message } } });
      }
      if (e instanceof NotFound) return c.notFound();
      throw e;
    }
  };
}

/** Mark a Post/Redirect/Get target with what was done (unless it says already), so the page without JavaScript says it too. */
export function withDone(url: string, done: 'saved' | 'deleted'): string {
  if (/[?&]done=/.test(url)) return url;
  const hash = url.indexOf('#');
  const [path, frag] = hash < 0 ? [url, ''] : [url.slice(0, hash), url.slice(hash)];
  return `${path}${path.includes('?') ? '&' : '?'}done=${done}${frag}`;
}

/** The status line for a page reached by such a redirect. */
export function doneNotice(c: Context): string | undefined {
  const done = c.req.query('done');
  return done === 'saved' ? 'Saved.' : done === 'deleted' ? 'Deleted.' : undefined;
}
