// One path for every project edit: validate -> load -> change under the version check -> re-render.
// A refused edit saves nothing and re-renders the form with what the user typed and why.
//
// Edits merge: a form sent with an older version still applies when the fields it changes have not been
// changed by anyone since the form was loaded (compared with the snapshot of that version, see
// src/web/merge-form.ts); only a field changed by both to different text is refused (409, both values shown).
// The merge runs inside the write transaction, so it always compares with the latest stored project.
import type { Context } from 'hono';
import { jsx, type Child } from 'hono/jsx';
import type { z } from 'zod';
import type { Project } from '../core/model';
import { DatabaseBusy, isBusyError } from '../db/client';
import { loadProject, loadSnapshot, changeProject, VersionConflict, NotFound } from '../db/projects';
import { parseForm, versionField, type FieldErrors, type FormValues } from './form';
import { formValues, isHtmx, sendPage, sendPartial } from './render';
import { mergeForm, conflictMessage, conflictSummary } from './merge-form';
import { fieldLabel } from './forms/spec-schema';
import type { Deps } from './deps';
import type { Failed } from '../../views/components/failed';
import { KeptEntries, KeptEntriesPage } from '../../views/components/kept-entries';

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
  /**
   * The text this form shows for a project (the same function the page uses to fill it), or null when what
   * the form edits no longer exists. With it, a save from an older version is merged field by field, and a
   * save into a deleted item says so and shows the typed text. Without it, any older version is refused.
   */
  values?: (project: Project, c: Context) => FormValues | null;
  /** for numbered rows: the field that identifies the row a field belongs to (see mergeForm) */
  rowOf?: (field: string) => string | undefined;
  /** for a save into a deleted item: what to say (default GONE_MESSAGE) and where to go back (default: redirect) */
  gone?: { message?: string; back?: (project: Project, c: Context) => string };
}

export const STALE_MESSAGE =
  'Not saved: this project was changed in another tab or window since you opened this page. The page now shows the ' +
    'stored project; your entries in this form are kept — check them and save again to apply them.';
export const CONFLICT_MESSAGE =
  'Not saved: someone else changed the same field since you opened this page; your entries are kept — check them ' +
    'and save again';
export const BUSY_MESSAGE = 'The database is busy; nothing was saved. Try again.';
export const GONE_MESSAGE =
  'Not saved: what this form edits no longer exists (it was deleted in another tab or window). Nothing was changed.';

/** Refusals raised inside the write transaction (so nothing is written), answered after it. */
class MergeConflict extends Error {
  constructor(
    readonly current: Project,
    readonly values: FormValues,
    readonly errors: FieldErrors,
  ) {
    super('merge conflict');
  }
}
class Refused extends Error {
  constructor(
    readonly current: Project,
    readonly values: FormValues,
    readonly errors: FieldErrors,
  ) {
    super('change refused');
  }
}
class Gone extends Error {
  constructor(readonly current: Project) {
    super('item gone');
  }
}

export function projectEdit<S extends z.ZodType>(deps: Deps, spec: EditSpec<S>) {
  return async (c: Context) => {
    const id = c.req.param('id')!;
    const values = await formValues(c);
    const formKey = typeof spec.form === 'string' ? spec.form : spec.form(c);
    const current = await loadProject(deps.database.db, id);
    if (!current) return c.notFound();
    const respond = async (project: Project, status: 200 | 409 | 422 | 503, failed?: Failed, notice?: string) =>
      isHtmx(c)
        ? sendPartial(c, await spec.partial(project, failed, notice), status)
        : sendPage(c, await spec.page(project, failed, notice), status);
    const gone = (project: Project) => {
      const back = spec.gone?.back?.(project, c) ?? spec.redirect(project, c).replace(/[?#].*$/, '');
      const props = { message: spec.gone?.message ?? GONE_MESSAGE, values, back };
      if (isHtmx(c)) return sendPartial(c, jsx(KeptEntries, { ...props, id: targetId(c) }), 409);
      return sendPage(c, jsx(KeptEntriesPage, { ...props, project }), 409);
    };

    const version = versionField.safeParse(values.version);
    const parsed = parseForm(spec.schema, values);
    if (spec.values && spec.values(current, c) === null) return gone(current);
    if (!parsed.ok) return respond(current, 422, { form: formKey, state: { values, errors: parsed.errors } });
    if (!version.success)
      return respond(current, 422, {
        form: formKey,
        state: { values, errors: { _form: 'The form had no version number; reload the page.' } },
      });

    // Validate the change against the current project before writing (it may refuse with field messages).
    if (current.version === version.data) {
      const trial = spec.change(structuredClone(current), parsed.data, c);
      if ('errors' in trial) return respond(current, 422, { form: formKey, state: { values, errors: trial.errors } });
    }
    try {
      const saved = await changeProject(
        deps.database,
        id,
        async (latest, tx) => {
          let data = parsed.data;
          let used = values;
          if (latest.version !== version.data) {
            const merged = await mergeWith(
              spec,
              c,
              latest,
              values,
              spec.values ? await loadSnapshot(tx, id, version.data) : null,
            );
            used = merged.values;
            const reparsed = parseForm(spec.schema, used);
            if (!reparsed.ok) throw new Refused(latest, used, reparsed.errors);
            data = reparsed.data;
          }
          const r = spec.change(latest, data, c);
          if ('errors' in r) throw new Refused(latest, used, r.errors);
          return r;
        },
        deps.now().toISOString(),
      );
      if (!isHtmx(c)) return c.redirect(withDone(spec.redirect(saved, c), 'saved'), 303);
      return sendPartial(c, await spec.partial(saved, undefined, 'Saved.'));
    } catch (e) {
      const at = (p: Project, v: FormValues) => ({ ...v, version: String(p.version) });
      if (e instanceof MergeConflict)
        return respond(e.current, 409, { form: formKey, state: { values: at(e.current, e.values), errors: e.errors } });
      if (e instanceof Refused)
        return respond(e.current, 422, { form: formKey, state: { values: at(e.current, e.values), errors: e.errors } });
      if (e instanceof Gone) return gone(e.current);
      if (e instanceof VersionConflict) {
        const fresh = (await loadProject(deps.database.db, id)) ?? current;
        return respond(fresh, 409, {
          form: formKey,
          state: { values: at(fresh, values), errors: { _form: STALE_MESSAGE } },
        });
      }
      if (e instanceof NotFound) return c.notFound();
      // Another process kept the database locked through every retry: nothing was written; keep the entries.
      if (e instanceof DatabaseBusy || isBusyError(e))
        return respond(current, 503, { form: formKey, state: { values, errors: { _form: BUSY_MESSAGE } } });
      throw e;
    }
  };
}

/** Merge a form loaded at an older version with the latest project, or throw the refusal to answer with. */
async function mergeWith<S extends z.ZodType>(
  spec: EditSpec<S>,
  c: Context,
  latest: Project,
  typed: FormValues,
  base: Project | null,
) {
  if (!spec.values || !base) throw new VersionConflict(Number(typed.version), latest.version);
  const currentValues = spec.values(latest, c);
  if (currentValues === null) throw new Gone(latest);
  const baseValues = spec.values(base, c);
  if (baseValues === null) throw new VersionConflict(Number(typed.version), latest.version);
  const m = mergeForm({ base: baseValues, current: currentValues, typed, rowOf: spec.rowOf });
  if (!m.ok) {
    // Both values beside each field, and in the form's message too (not every form shows a message at every field).
    const list = Object.entries(m.conflicts).map(
      ([k, conflict]) => `${fieldLabel(spec.schema, k)}: ${conflictSummary(conflict)}`,
    );
    const errors: FieldErrors = { _form: `${CONFLICT_MESSAGE} (${list.join('; ')})` };
    for (const [k, conflict] of Object.entries(m.conflicts)) errors[k] = conflictMessage(conflict);
    throw new MergeConflict(latest, m.values, errors);
  }
  return m;
}

/** The id of the element an htmx request swaps (htmx 4 sends it as "tag#id" or "#id"). */
function targetId(c: Context): string | undefined {
  return /#([A-Za-z][\w-]*)/.exec(c.req.header('HX-Target') ?? '')?.[1];
}

/**
 * Mark a Post/Redirect/Get target with what was done (unless it says already), so the page without JavaScript says it
 * too.
 */
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
