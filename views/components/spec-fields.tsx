// A form field drawn from its spec: label, the display unit beside the box, the help line and the message.
import type { FC } from 'hono/jsx';
import type { Spec } from '../../src/core/spec/field';
import { formName } from '../../src/core/spec/field';
import { Field, Select, Check, TextArea, type FieldState } from './fields';

interface Props {
  spec: Spec;
  /** model key of the field in the spec */
  k: string;
  state: FieldState;
  size?: number;
  idp?: string;
  /** options for a reference field (rails, stages), as [id, name] */
  options?: [string, string][];
  /** the first option of an optional reference ('(not on a rail here)') */
  none?: string;
  label?: string;
  hint?: string;
  /** the form field name when one spec is drawn several times (rows of a table) */
  name?: string;
  /** the unit shown beside the box when it depends on the project (a currency) */
  unit?: string;
  /** id of a datalist offering known values (supplier names, categories) */
  list?: string;
  cls?: string;
  /** rows of a multi-line text box */
  rows?: number;
}

export const SpecField: FC<Props> = ({ spec, k, state, size, idp, options, none, label, hint, name: nameIn, unit: unitIn, list, cls, rows }) => {
  const f = spec.fields[k];
  if (!f) throw new Error(`no field ${k} in spec ${spec.name}`);
  const name = nameIn ?? formName(k, f);
  const text = label ?? f.label;
  const help = hint ?? f.help;
  if (f.type === 'choice') return <Select name={name} label={text} state={state} idp={idp} hint={help} options={f.options.map(([v, t]) => [v, t])} cls={cls} />;
  if (f.type === 'bool') return <Check name={name} label={text} state={state} idp={idp} />;
  if (f.type === 'ref') {
    const list = options ?? [];
    return <Select name={name} label={text} state={state} idp={idp} hint={help} options={f.optional ? [['', none ?? '(none)'], ...list] : list} cls={cls} />;
  }
  if (f.type === 'text' && f.multiline && rows) return <TextArea name={name} label={text} state={state} idp={idp} hint={help} rows={rows} cols={size} cls={cls} />;
  const unit = unitIn ?? (f.type === 'number' ? f.display.symbol : undefined);
  return <Field name={name} label={text} unit={unit || undefined} state={state} idp={idp} hint={help} size={size ?? (f.type === 'text' ? 30 : 7)} list={list} cls={cls} />;
};
