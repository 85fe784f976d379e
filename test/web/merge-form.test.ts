// The three-way merge of one form's text (src/web/merge-form.ts). The rule under test is the one the issue
// states: a field changed only by the user is applied, a field changed only by someone else is taken from the
// stored project, and only a field both changed to different text is a conflict (common practice for
// three-way merges, no published source).
import { describe, expect, it } from 'vitest';
import { mergeForm, conflictMessage } from '../../src/web/merge-form';

const base = { name: 'Driver', notes: '', kind: 'driver', dissipation: '1 W', version: '3' };

describe('mergeForm', () => {
  it('applies the user’s field over a field someone else changed', () => {
    const r = mergeForm({ base, current: { ...base, dissipation: '2 W' }, typed: { ...base, name: 'Driver 2' } });
    expect(r).toEqual({
      ok: true,
      values: { name: 'Driver 2', notes: '', kind: 'driver', dissipation: '2 W' },
      changed: ['name'],
    });
  });

  it('refuses the same field changed by both to different text, keeping the typed text and showing both', () => {
    const r = mergeForm({
      base,
      current: { ...base, name: 'Buffer' },
      typed: { ...base, name: 'Driver 2', notes: 'new' },
    });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.conflicts).toEqual({ name: { current: 'Buffer', typed: 'Driver 2' } });
    expect(r.values).toEqual({ name: 'Driver 2', notes: 'new', kind: 'driver', dissipation: '1 W' });
    expect(conflictMessage(r.conflicts.name)).toBe(
      'Changed by someone else to “Buffer” since you opened this page; you typed “Driver 2”. Check it and ' +
        'save again to keep yours.',
    );
  });

  it('accepts the same field changed by both to the same text', () => {
    const r = mergeForm({ base, current: { ...base, name: 'Buffer' }, typed: { ...base, name: 'Buffer' } });
    expect(r.ok).toBe(true);
  });

  it('does not count browser line ends (CRLF) or a leading line break in a textarea as an edit', () => {
    const b = { notes: 'line one\nline two' };
    const r = mergeForm({
      base: b,
      current: { notes: 'changed elsewhere' },
      typed: { notes: '\r\nline one\r\nline two' },
    });
    expect(r).toEqual({ ok: true, values: { notes: 'changed elsewhere' }, changed: [] });
  });

  it('reads an absent ticked checkbox as unticked, and any other absent field as unchanged', () => {
    const b = { allowParallelPairs: 'true', mainsV: '230 V' };
    const r = mergeForm({ base: b, current: { allowParallelPairs: 'true', mainsV: '240 V' }, typed: {} });
    expect(r).toEqual({
      ok: true,
      values: { allowParallelPairs: '', mainsV: '240 V' },
      changed: ['allowParallelPairs'],
    });
  });

  it('a row whose item someone else changed makes the user’s edit in that row a conflict', () => {
    // row 0 fed rail A when the form was loaded; someone deleted that row, so row 0 is now rail B's row with
    // the same key-down current: the user's new current must not land on rail B silently
    const rowOf = (f: string) => /^l(\d+)_/.exec(f)?.[1];
    const b = { rail0: 'A', l0_keyDown: '1 A', rail1: 'B', l1_keyDown: '1 A' };
    const current = { rail0: 'B', l0_keyDown: '1 A' };
    const typed = { ...b, l0_keyDown: '2 A' };
    const r = mergeForm({
      base: b,
      current,
      typed,
      rowOf: (f) => (rowOf(f) === undefined ? undefined : `rail${rowOf(f)}`),
    });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(Object.keys(r.conflicts)).toEqual(['l0_keyDown']);
  });

  it('a new row typed into the form is the user’s change; identity keys (#) never appear in the result', () => {
    const r = mergeForm({
      base: { rail0: 'A', '#0': 'A' },
      current: { rail0: 'A', '#0': 'A' },
      typed: { rail0: 'A', rail1: 'B', l1_keyUp: '5 mA' },
    });
    expect(r).toEqual({
      ok: true,
      values: { rail0: 'A', rail1: 'B', l1_keyUp: '5 mA' },
      changed: ['rail1', 'l1_keyUp'],
    });
  });
});
