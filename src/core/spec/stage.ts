// A stage's own fields and one row of its current table (the current it draws from one rail in each mode).
import { defineSpec, U, type NumberField } from './field';
import { MODE_LABELS, MODES, STAGE_KINDS, STAGE_KIND_LABELS, type Stage } from '../model';
import { formValues } from './derive';
import { choice, num, optNum, ref, text } from './make';

export const stageSpec = defineSpec({
  name: 'stage',
  label: 'Stage',
  fields: {
    name: text('Stage name', 200, true, 'New stage'),
    kind: choice('Kind', STAGE_KINDS.map((k) => [k, STAGE_KIND_LABELS[k]] as const), 'other'),
    notes: text('Notes', 5000, false, '', { multiline: true }),
    dissipationW: optNum('Heat dissipated', 'W', U.W, 0, 10_000, null, {
      form: 'dissipation',
      help: 'empty = rail voltage × key-down current',
    }),
  },
});

/** The current a stage draws from one rail in each mode, keyed 'currentA.receive' etc. */
export const loadCurrentFields: Record<string, NumberField> = Object.fromEntries(
  MODES.map((m) => [
    `currentA.${m}`,
    num(`${MODE_LABELS[m]} current`, 'A', U.mA, 0, 100, 0, { example: '350', emptyAs: 0, help: 'empty = none drawn' }),
  ]),
);

/** One load row; the form names carry the row number (rail0, l0_keyDown), see loadFormName. */
export const loadSpec = defineSpec({
  name: 'load',
  label: 'Stage load',
  rowName: (row: number, key: string) => loadFormName(row, key),
  fields: {
    railId: ref('Rail', 'rail', false),
    ...loadCurrentFields,
  },
});

export function loadFormName(row: number, key: string): string {
  return key === 'railId' ? `rail${row}` : `l${row}_${key.replace('currentA.', '')}`;
}

/** The stage form's text: the stage's own fields and one row per load (rail0, l0_receive, ...). */
export function stageFormValues(s: Stage): Record<string, string> {
  const v = formValues(stageSpec, s);
  s.loads.forEach((l, i) => {
    const row = formValues(loadSpec, l);
    for (const key of Object.keys(row)) v[loadFormName(i, key)] = row[key];
  });
  return v;
}
