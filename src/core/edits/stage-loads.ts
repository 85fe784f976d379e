// The stage's current table from the submitted rows: each row is a rail and its current in each mode (loadSpec).
// A row with currents but no rail is refused (the currents would otherwise vanish on save).
import type { StageLoad } from '../model';
import { MODES } from '../model';
import { loadCurrentFields, loadFormName, loadSpec } from '../spec/stage';
import { formValues, readField } from '../spec/derive';

/** The rail choice that removes an existing row (the empty choice belongs to the new row). */
export const REMOVE_LOAD = 'remove';

export type LoadsResult = { ok: true; loads: StageLoad[] } | { ok: false; errors: Record<string, string> };

export function readLoads(railIds: ReadonlySet<string>, values: Record<string, string | undefined>): LoadsResult {
  const errors: Record<string, string> = {};
  const loads: StageLoad[] = [];
  for (let i = 0; loadFormName(i, 'railId') in values; i++) {
    const railKey = loadFormName(i, 'railId');
    const railId = values[railKey] ?? '';
    const typed = MODES.filter((m) => (values[loadFormName(i, `currentA.${m}`)] ?? '').trim() !== '');
    if (railId === REMOVE_LOAD) continue; // "(remove this load)" on an existing row
    if (!railId) {
      if (typed.length)
        errors[railKey] = 'Rail: choose the rail this row’s currents are drawn from (or clear the currents)';
      continue;
    }
    if (!railIds.has(railId)) {
      errors[railKey] = 'Rail: that rail no longer exists; choose another';
      continue;
    }
    const currentA = { receive: 0, keyUp: 0, keyDown: 0 };
    for (const m of MODES) {
      const key = loadFormName(i, `currentA.${m}`);
      const r = readField(loadCurrentFields[`currentA.${m}`], values[key]);
      if (r.ok) currentA[m] = r.value as number;
      else errors[key] = r.message;
    }
    loads.push({ railId, currentA });
  }
  return Object.keys(errors).length ? { ok: false, errors } : { ok: true, loads };
}

/** The currents of a stage's existing rows (the overview's short form): each box read with the load spec. */
export function readLoadCurrents(loads: readonly StageLoad[], values: Record<string, string | undefined>): LoadsResult {
  const errors: Record<string, string> = {};
  const next = loads.map((l, i) => {
    const currentA = { ...l.currentA };
    for (const m of MODES) {
      const key = loadFormName(i, `currentA.${m}`);
      const r = readField(loadCurrentFields[`currentA.${m}`], values[key]);
      if (r.ok) currentA[m] = r.value as number;
      else errors[key] = r.message;
    }
    return { ...l, currentA };
  });
  return Object.keys(errors).length ? { ok: false, errors } : { ok: true, loads: next };
}

/** The text of a stage's current boxes, row by row (rail names are shown, not edited, in the short form). */
export function loadCurrentValues(loads: readonly StageLoad[]): Record<string, string> {
  const v: Record<string, string> = {};
  loads.forEach((l, i) => {
    const row = formValues(loadSpec, l);
    for (const m of MODES) v[loadFormName(i, `currentA.${m}`)] = row[`currentA.${m}`];
  });
  return v;
}
