// Three-way merge of one form's text: what the form showed when it was loaded (base), what the stored
// project gives now (current), and what the user sent (typed). A field counts as changed by the user when
// typed differs from base, and as changed by someone else when current differs from base; only a field
// changed by both, to different text, is a conflict. Pure: no I/O.
import type { FormValues } from './form';

export interface FieldConflict {
  /** the text the stored project gives now */
  current: string;
  /** the text the user sent */
  typed: string;
}

export type MergeResult =
  | { ok: true; values: FormValues; changed: string[] }
  | { ok: false; values: FormValues; conflicts: Record<string, FieldConflict> };

export interface MergeInput {
  base: FormValues;
  current: FormValues;
  typed: FormValues;
  /**
   * The field that says which item a row-field belongs to (e.g. 'l1_keyUp' -> 'rail1'), for forms whose rows
   * are numbered: when someone else changed that, the user's change in the row is a conflict, because the
   * row may now be a different item.
   */
  rowOf?: (field: string) => string | undefined;
}

/** Fields never merged: the version travels separately. Keys starting with '#' are identity-only (never typed). */
const skip = (k: string) => k === 'version' || k.startsWith('#');

/** Browsers send textareas with CRLF line ends and may drop a leading line break: those are not edits. */
const norm = (s: string) => s.replace(/\r\n?/g, '\n').trim();
const same = (a: string, b: string) => norm(a) === norm(b);

/**
 * Merge the user's changes over the current text. On success `values` is what to apply (the current text with
 * the user's changed fields over it). On conflict `values` is what to show again: the same, with the user's
 * text kept in the conflicting fields.
 */
export function mergeForm({ base, current, typed, rowOf }: MergeInput): MergeResult {
  const keys = new Set([...Object.keys(typed), ...Object.keys(base), ...Object.keys(current)].filter((k) => !skip(k)));
  const values: FormValues = {};
  const changed: string[] = [];
  const conflicts: Record<string, FieldConflict> = {};
  for (const k of keys) {
    const b = base[k] ?? '';
    const cur = current[k] ?? '';
    // A field the form did not send is unchanged, except an unticked checkbox (which sends nothing).
    const t = k in typed ? typed[k] : base[k] === 'true' ? '' : b;
    if (same(t, b)) {
      if (k in current) values[k] = cur;
      else if (k in typed) values[k] = t;
      continue;
    }
    values[k] = t;
    changed.push(k);
    const row = rowOf?.(k);
    const rowMoved = row !== undefined && !same(base[row] ?? '', current[row] ?? '');
    if (!rowMoved && (same(cur, b) || same(cur, t))) continue;
    conflicts[k] = { current: cur, typed: t };
  }
  return Object.keys(conflicts).length ? { ok: false, values, conflicts } : { ok: true, values, changed };
}

const shown = (s: string) => (norm(s) === '' ? '(empty)' : `“${s.length > 200 ? s.slice(0, 200) + '…' : s}”`);

/** The message beside a conflicting field: both values, in words. */
export function conflictMessage(c: FieldConflict): string {
  return `Changed by someone else to ${shown(c.current)} since you opened this page; you typed ` +
    `${shown(c.typed)}. Check it and save again to keep yours.`;
}

/** Both values in a few words, for the form's own message. */
export function conflictSummary(c: FieldConflict): string {
  return `changed by someone else to ${shown(c.current)}, you typed ${shown(c.typed)}`;
}
